/**
 * One search over the whole register: rooms, lasers, assessments, eyewear and people, grouped by
 * kind. Besides plain words (names, maker, model, serial, location, tag) it reads what an officer
 * types when looking for a hazard: a wavelength or a range ("1064 nm", "1000-1100 nm", "10.6 µm"),
 * a class ("class 4", "3B"), a record status ("signed", "draft", "due", "overdue").
 */
import { quantityText } from '../../core/index.js';
import type { RegisterOverview } from '../../electron/api/contracts/register.js';
import type { AssessmentSummary, Eyewear } from '../../electron/api/contracts/records.js';

export type HitKind = 'room' | 'laser' | 'assessment' | 'eyewear' | 'person';

export interface Hit {
  readonly kind: HitKind;
  readonly id: string;
  readonly title: string;
  readonly detail: string;
  /** The room to show for rooms, lasers and assessments. */
  readonly roomId?: string;
  readonly assessmentId?: string;
}

export interface HitGroup {
  readonly kind: HitKind;
  readonly title: string;
  readonly hits: readonly Hit[];
}

export interface Query {
  readonly words: readonly string[];
  /** Wavelength range in nm (inclusive). */
  readonly band?: { readonly from: number; readonly to: number };
  readonly laserClass?: string;
  readonly status?: 'signed' | 'draft' | 'due' | 'overdue';
}

const UNIT_NM: Readonly<Record<string, number>> = { nm: 1, 'µm': 1000, um: 1000, 'μm': 1000 };

/** Read the officer's query; what is not a wavelength, class or status stays as words. */
export function parseQuery(text: string): Query {
  let rest = ` ${text.toLowerCase().replace(/,/g, '.')} `;
  let band: Query['band'];
  const range = /\s(\d+(?:\.\d+)?)\s*(nm|µm|um|μm)?\s*(?:-|–|to|\.\.)\s*(\d+(?:\.\d+)?)\s*(nm|µm|um|μm)?(?=\s)/.exec(rest);
  if (range) {
    const unit = UNIT_NM[range[4] ?? range[2] ?? 'nm'] ?? 1;
    const a = Number(range[1]) * unit;
    const b = Number(range[3]) * unit;
    band = { from: Math.min(a, b), to: Math.max(a, b) };
    rest = rest.replace(range[0], ' ');
  } else {
    const one = /\s(\d+(?:\.\d+)?)\s*(nm|µm|um|μm)(?=\s)/.exec(rest);
    if (one) {
      const v = Number(one[1]) * (UNIT_NM[one[2] ?? 'nm'] ?? 1);
      // a wavelength as typed matches to the last digit given (1064 nm matches 1064.0 and 1064.4)
      band = { from: v - 0.5, to: v + 0.5 };
      rest = rest.replace(one[0], ' ');
    }
  }
  let laserClass: string | undefined;
  const cls = /\s(?:class\s*)?(1m|2m|3r|3b)(?=\s)|\sclass\s*([1-4])(?=\s)/.exec(rest);
  if (cls) {
    laserClass = (cls[1] ?? cls[2] ?? '').toUpperCase();
    rest = rest.replace(cls[0], ' ');
  }
  let status: Query['status'];
  const st = /\s(signed|draft|overdue|due|review due)(?=\s)/.exec(rest);
  if (st) {
    const s = st[1] ?? '';
    status = s === 'review due' ? 'due' : (s as Query['status']);
    rest = rest.replace(st[0], ' ');
  }
  const words = rest.split(/\s+/).filter((w) => w.length > 0);
  return { words, ...(band ? { band } : {}), ...(laserClass ? { laserClass } : {}), ...(status ? { status } : {}) };
}

export function isEmptyQuery(q: Query): boolean {
  return q.words.length === 0 && !q.band && !q.laserClass && !q.status;
}

const hasWords = (q: Query, hay: string): boolean => {
  const h = hay.toLowerCase();
  return q.words.every((w) => h.includes(w));
};

function eyewearBands(e: Eyewear): Array<{ from: number; to: number }> {
  return [...(e.spec.od ?? []), ...(e.spec.en207 ?? []), ...(e.spec.en208 ?? [])].map((b) => ({ from: b.from_nm, to: b.to_nm }));
}

function assessmentState(a: AssessmentSummary, today: string, dueBy: string): { signed: boolean; draft: boolean; due: boolean; overdue: boolean } {
  const review = a.inForce?.reviewBy ?? a.reviewBy;
  return {
    signed: a.inForce !== null,
    draft: a.status === 'draft',
    due: review !== null && review <= dueBy,
    overdue: review !== null && review < today,
  };
}

/** Every match of the query, grouped by kind (kinds without a match are left out). */
export function searchRegister(o: RegisterOverview, text: string, today: string): HitGroup[] {
  const q = parseQuery(text);
  if (isEmptyQuery(q)) return [];
  const rooms: Hit[] = [];
  const lasers: Hit[] = [];
  const assessments: Hit[] = [];
  const eyewear: Hit[] = [];
  const people: Hit[] = [];
  const onlyRecords = q.status !== undefined;
  for (const s of o.sites) {
    for (const r of s.rooms) {
      const roomName = `${r.room.code} ${r.room.name}`;
      if (!q.band && !q.laserClass && !onlyRecords && hasWords(q, [r.room.code, r.room.name, r.room.responsiblePerson, r.room.notes].join(' '))) {
        rooms.push({ kind: 'room', id: r.room.id, roomId: r.room.id, title: roomName, detail: `${r.installations.length} laser${r.installations.length === 1 ? '' : 's'} · ${s.site.name}` });
      }
      if (!onlyRecords) {
        for (const i of r.installations) {
          const wls = i.laser.beams.map((b) => b.wavelength_nm);
          const band = q.band;
          if (band && !wls.some((w) => w >= band.from && w <= band.to)) continue;
          if (q.laserClass && i.classAsLabelled !== q.laserClass) continue;
          if (!hasWords(q, [i.laser.name, i.laserType, i.maker, i.model, i.serialNumber, i.registrationNumber, r.room.code, ...wls.map((w) => `${w} nm`)].join(' '))) continue;
          const wlText = [...new Set(wls)].map((w) => quantityText(w, 'nm')).join(', ');
          lasers.push({
            kind: 'laser',
            id: i.id,
            roomId: r.room.id,
            title: i.laser.name,
            detail: [wlText, i.classAsLabelled ? `class ${i.classAsLabelled}` : null, [i.maker, i.model].filter(Boolean).join(' ') || null, i.serialNumber ? `serial ${i.serialNumber}` : null, `room ${r.room.code}`, i.status === 'retired' ? 'retired' : null]
              .filter(Boolean)
              .join(' · '),
          });
        }
      }
      if (!q.band && !q.laserClass) {
        for (const a of r.assessments) {
          const st = assessmentState(a, today, o.dueBy);
          if (q.status && !st[q.status]) continue;
          if (!hasWords(q, [a.title, r.room.code, r.room.name].join(' '))) continue;
          const review = a.inForce?.reviewBy ?? a.reviewBy;
          assessments.push({
            kind: 'assessment',
            id: a.id,
            roomId: r.room.id,
            assessmentId: a.id,
            title: a.title,
            detail: [
              `room ${r.room.code}`,
              a.inForce ? `signed rev ${a.inForce.revisionNo} in force (${a.inForce.signedAt.slice(0, 10)})` : null,
              a.status === 'draft' ? `draft rev ${a.revisionNo} open` : null,
              review ? `review by ${review}${st.overdue ? ' (overdue)' : st.due ? ' (due soon)' : ''}` : null,
            ]
              .filter(Boolean)
              .join(' · '),
          });
        }
      }
    }
    if (!q.laserClass && !onlyRecords) {
      for (const e of s.eyewear) {
        const band = q.band;
        if (band && !eyewearBands(e).some((b) => b.from <= band.to && b.to >= band.from)) continue;
        if (!hasWords(q, [e.spec.id, e.spec.label, e.location, e.notes].join(' '))) continue;
        const bands = eyewearBands(e).map((b) => `${b.from}–${b.to} nm`);
        eyewear.push({ kind: 'eyewear', id: e.id, title: `${e.spec.id} ${e.spec.label}`, detail: [[...new Set(bands)].join(', '), e.location ? `kept at ${e.location}` : null].filter(Boolean).join(' · ') });
      }
    }
  }
  if (!q.band && !q.laserClass && !onlyRecords) {
    for (const p of o.people) {
      if (hasWords(q, [p.name, p.role, p.email, p.phone].join(' '))) people.push({ kind: 'person', id: p.id, title: p.name, detail: [p.role, p.email].filter(Boolean).join(' · ') });
    }
  }
  const groups: HitGroup[] = [
    { kind: 'room', title: 'Rooms', hits: rooms },
    { kind: 'laser', title: 'Lasers', hits: lasers },
    { kind: 'assessment', title: 'Assessments', hits: assessments },
    { kind: 'eyewear', title: 'Eyewear', hits: eyewear },
    { kind: 'person', title: 'People', hits: people },
  ];
  return groups.filter((g) => g.hits.length > 0);
}

/** "what the search understood", e.g. "wavelength 1000–1100 nm · class 4 · words: fibre". */
export function queryText(text: string): string {
  const q = parseQuery(text);
  return [
    q.band ? `wavelength ${Number(q.band.from.toFixed(1))}–${Number(q.band.to.toFixed(1))} nm` : null,
    q.laserClass ? `class ${q.laserClass}` : null,
    q.status ? `status ${q.status}` : null,
    q.words.length ? `words: ${q.words.join(' ')}` : null,
  ]
    .filter(Boolean)
    .join(' · ');
}
