// @vitest-environment node
/**
 * The three printed documents of the invented demo site (assets/demo/demo-scenario.json), rendered
 * by the real pdfmake from a real record store and read back with poppler (pdftotext, pdftoppm) and
 * jsQR. Checks: required fields, the caution and the rule set on every page, the numbers the core
 * computed (parsed back from the text and compared in the safe direction), the DRAFT mark exactly
 * when unsigned, and the QR code decoding to the record fingerprint.
 *
 * The reference numbers come from the core itself (evaluateRoom on the stored inputs): the demo is
 * invented, so this checks that paper and core agree, not the physics (test/core does that against
 * published sources). The rounding rules checked are the project's conservative policy (SAFETY.md:
 * limits down, distances and optical densities up, 3 significant figures; OD to 0.1).
 */
import { DEMO_PASSPHRASE as PASSPHRASE } from '../../../electron/backend/records/demo.js';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateRoom } from '../../../core/index.js';
import { RESULT_CAUTION, type BeamResult, type RoomResult } from '../../../core/model/results.js';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import {
  documentInputFromAssessment,
  renderDoorNotice,
  renderEyewearSheet,
  renderReport,
  type DocumentInput,
  type RenderOptions,
} from '../../../electron/backend/pdf/index.js';
import { collapse, decodeQr, pageTexts, pdfInfo, siValue } from './pdf-tools.js';
import { benchDocument, tenLaserRoom } from './ten-laser-room.js';

interface Rendered {
  readonly doc: DocumentInput;
  readonly core: RoomResult;
  readonly report: Buffer;
  readonly notice: Buffer;
  readonly sheet: Buffer;
  readonly text: { readonly report: string[]; readonly notice: string[]; readonly sheet: string[] };
}

const A4_SI: RenderOptions = { paper: 'A4', units: 'SI' };
let dir = '';
let store: RecordStore;
const signed = new Map<string, Rendered>();
let draft: Rendered;

async function render(assessmentId: string, opts: RenderOptions = A4_SI): Promise<Rendered> {
  const doc = await documentInputFromAssessment(store, assessmentId);
  const [report, notice, sheet] = await Promise.all([renderReport(doc, opts), renderDoorNotice(doc, opts), renderEyewearSheet(doc, opts)]);
  return {
    doc,
    core: evaluateRoom(doc.content.input),
    report,
    notice,
    sheet,
    text: { report: pageTexts(report), notice: pageTexts(notice), sheet: pageTexts(sheet) },
  };
}

/** Compare ignoring white space and hyphens (pdftotext drops a hyphen where a word was wrapped). */
function squash(s: string): string {
  return s.replace(/[\s\u00ad-]+/g, '');
}
function has(pages: readonly string[], needle: string): boolean {
  return squash(pages.join(' ')).includes(squash(needle));
}
function wl(nm: number): string {
  return nm >= 10000 ? `${nm / 1000} µm` : `${nm} nm`;
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'bw-pdf-docs-'));
  store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
  const site = await store.seedDemo();
  const officer = (await store.listPeople()).find((p) => p.role === 'Laser safety officer');
  if (!officer) throw new Error('demo officer missing');
  // The demo seed gave the invented demo officer the temporary installation's first key (its trust
  // anchor), sealed with the published demo passphrase, and signed B2.14 with it.
  const rooms = await store.listRooms(site.id);
  const a007 = rooms.find((r) => r.code === 'A0.07');
  const draftId = a007 ? (await store.listAssessments(a007.id))[0]?.id : undefined;
  if (!draftId) throw new Error('demo assessment A0.07 missing');
  draft = await render(draftId); // seeded as a draft
  for (const room of rooms) {
    for (const a of await store.listAssessments(room.id)) {
      if (a.status === 'draft') await store.signAssessment(a.id, { personId: officer.id, passphrase: PASSPHRASE, statement: 'Approved (test of printed output).' });
      signed.set(room.code, await render(a.id));
    }
  }
}, 300_000);

afterAll(async () => {
  await store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

const ROOMS = ['B2.14', 'B2.16', 'C1.03', 'A0.07'] as const;

function get(code: string): Rendered {
  const r = signed.get(code);
  if (!r) throw new Error(`room ${code} not rendered`);
  return r;
}

describe('no section heading ends a page', () => {
  // Common practice in document layout: a heading alone at the foot of a page reads as a missing section.
  it.each(ROOMS)('room %s: the Plots heading shares its page with the first pair of plots', (code) => {
    const pages = get(code).text.report;
    const mark = 'Plots Left: the eye exposure limit against exposure duration';
    const page = pages.find((p) => p.includes(mark));
    expect(page, 'a page with the Plots heading').toBeDefined();
    const first = get(code).doc.results.beams[0]?.label ?? '';
    expect((page ?? '').slice((page ?? '').indexOf(mark))).toContain(`1. ${first}`);
  });
});

describe('the three documents of every demo room render', () => {
  it.each(ROOMS)('room %s: report, notice and eyewear sheet are PDFs; notice and sheet fit one page', (code) => {
    const r = get(code);
    for (const pdf of [r.report, r.notice, r.sheet]) expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdfInfo(r.notice).pages).toBe(1); // a poster for the door
    expect(pdfInfo(r.sheet).pages).toBe(1); // one sheet by the rack
    expect(pdfInfo(r.report).size).toEqual([595.28, 841.89]); // A4 (ISO 216) in points
  });
});

describe('required fields (issue: Printed output; domain reference 5.1 and 6.2)', () => {
  it.each(ROOMS)('room %s: the report names site, room, responsible person, officer, status, date, review date and every beam', (code) => {
    const r = get(code);
    const d = r.doc;
    const sig = d.signature;
    if (!sig) throw new Error('expected signed');
    const first = [r.text.report[0] ?? ''];
    // Every room is signed with the demo officer's key, the temporary installation's trust anchor
    // (B2.14 by the demo seed itself, the others here).
    const status = `Signed, revision ${d.assessment.revisionNo}`;
    expect(sig.keyTrusted).toBe(true);
    expect(has(r.text.report, `trust anchor ${sig.trustAnchor ?? '?'}`), 'trust anchor in the footer').toBe(true);
    for (const field of [d.site.name, d.room.code, d.room.name, d.room.responsiblePerson, d.officer.name, status, ...(sig.keyTrusted ? [sig.signedAt.slice(0, 10)] : []), d.content.reviewBy ?? 'not set']) {
      expect(has(first, field), `page 1 lacks '${field}'`).toBe(true);
    }
    for (const heading of ['Summary per beam', 'Inputs and assumptions', 'Plots', 'Controls chosen', 'Protective eyewear', 'Coverage matrix', 'Non-beam hazards', 'Sign-off', 'Appendix — derivations']) {
      expect(has(r.text.report, heading), heading).toBe(true);
    }
    for (const b of r.core.beams) expect(has(r.text.report, b.label), b.label).toBe(true);
    for (const c of d.content.controls) expect(has(r.text.report, c.measure), c.measure).toBe(true);
    expect(has(r.text.report, sig.statement)).toBe(true);
    expect(has(r.text.report, sig.fingerprint)).toBe(true); // full SHA-256 in the sign-off block
  });

  it.each(ROOMS)('room %s: the door notice carries signal word, lasers, eyewear, entry rules, officer contact, valid-until and fingerprint', (code) => {
    const r = get(code);
    const d = r.doc;
    const t = r.text.notice;
    // Class 3B and 4 rooms: WARNING under ANSI Z136.1-2014 with Z535.2 format [SUP-SIGN] (read), [PH-SIGN] (read).
    expect(has(t, 'WARNING')).toBe(true);
    expect(has(t, `CLASS ${r.core.highestClass === '4' || d.content.input.lasers.some((l) => l.classAsLabelled === '4') ? '4' : r.core.highestClass}`)).toBe(true);
    for (const l of d.content.input.lasers) {
      expect(has(t, l.name), l.name).toBe(true); // laser type (the demo register uses the name as type)
      for (const b of l.beams) expect(has(t, wl(b.wavelength_nm)), `${b.wavelength_nm}`).toBe(true);
      if (l.classAsLabelled) expect(has(t, `Class ${l.classAsLabelled}`)).toBe(true);
    }
    expect(has(t, 'LASER EYEWEAR REQUIRED')).toBe(true);
    expect(has(t, 'Authorised persons only')).toBe(true);
    // the demo site's emergency contact (register: site notes line "Emergency contact: ...")
    expect(has(t, 'In an emergency, call')).toBe(true);
    expect(has(t, 'Site security control room, extension 2222 (24 h)')).toBe(true);
    for (const s of [d.officer.name, d.officer.phone, d.officer.email, `Valid until: ${d.content.reviewBy ?? ''}`]) expect(has(t, s), s).toBe(true);
    expect(has(t, (d.signature?.fingerprint ?? '').slice(0, 4))).toBe(true);
  });

  it.each(ROOMS)('room %s: the eyewear sheet names every eyewear with its use and must-not-use beams', (code) => {
    const r = get(code);
    for (const e of r.doc.content.input.eyewear ?? []) expect(has(r.text.sheet, e.id)).toBe(true);
    expect(has(r.text.sheet, 'NOT for beam')).toBe(true); // 'NOT for beam 1' where the room has one beam
    for (const v of r.core.coverage) {
      const beamNo = r.core.beams.findIndex((b) => b.beamId === v.beamId) + 1;
      expect(beamNo).toBeGreaterThan(0);
    }
  });
});

describe('the caution and the rule set with its edition, visibly on every page', () => {
  it.each(ROOMS)('room %s: every page of every document', (code) => {
    const r = get(code);
    for (const [kind, pages] of Object.entries(r.text)) {
      pages.forEach((p, i) => {
        expect(p.includes(collapse(RESULT_CAUTION)), `${kind} page ${i + 1}: caution`).toBe(true);
        expect(squash(p).includes(squash(r.core.ruleSetName)), `${kind} page ${i + 1}: rule set`).toBe(true);
      });
    }
  });
});

const NUM = String.raw`(\d[\d.]*(?:e-?\d+)?)`;
interface SummaryRow {
  readonly limit: number;
  readonly nohd: number;
  readonly diffuse: number | null;
  readonly skin: number;
  readonly od: number;
}

/** The per-beam rows of the report's summary table, in beam order, as SI numbers. */
function summaryRows(pages: readonly string[], beams: number): SummaryRow[] {
  const all = pages.join(' ');
  const start = all.indexOf('Summary per beam');
  const end = all.indexOf('Inputs and assumptions', start);
  const seg = all.slice(start, end);
  const token = new RegExp(`${NUM} ((?:k|m|µ|n)?(?:W|J)/c?m²) (?:per pulse|over)|${NUM} ?((?:k|m)?m)\\b|(not assessed)|OD ${NUM}|(none needed)`, 'g');
  const rows: SummaryRow[] = [];
  let cur: Array<number | null> = [];
  for (const m of seg.matchAll(token)) {
    if (m[1] !== undefined) cur = [siValue(m[1], m[2] as string)];
    else if (cur.length === 0) continue;
    else if (m[3] !== undefined) cur.push(siValue(m[3], m[4] as string));
    else if (m[5] !== undefined) cur.push(null);
    else {
      cur.push(m[6] !== undefined ? Number(m[6]) : 0);
      const [limit, nohd, diffuse, skin, od] = cur;
      rows.push({ limit: limit as number, nohd: nohd as number, diffuse: diffuse ?? null, skin: skin as number, od: od as number });
      cur = [];
    }
  }
  expect(rows.length).toBe(beams);
  return rows;
}

/** 3 significant figures: the printed value may differ from the full one by less than 1 %. */
const STEP = 0.01;

function checkRow(b: BeamResult, row: SummaryRow): void {
  const pulsed = b.mpe.governingRule !== 'cw';
  const limitFull = Number(pulsed ? b.mpe.H_Jm2 : b.mpe.E_Wm2);
  // Limits are rounded DOWN (SAFETY.md): never above the full value, within one 3-figure step.
  expect(row.limit).toBeLessThanOrEqual(limitFull);
  expect(row.limit).toBeGreaterThanOrEqual(limitFull * (1 - STEP));
  // Distances are rounded UP: never below the full value.
  expect(row.nohd).toBeGreaterThanOrEqual(Number(b.nohd_m));
  expect(row.nohd).toBeLessThanOrEqual(Number(b.nohd_m) * (1 + STEP) + 1e-12);
  expect(row.skin).toBeGreaterThanOrEqual(Number(b.skinHazardDistance_m));
  if (b.nhzDiffuse_m === null) expect(row.diffuse).toBeNull();
  else expect(row.diffuse as number).toBeGreaterThanOrEqual(Number(b.nhzDiffuse_m));
  // OD rounded UP to one decimal (EN 207 practice of whole-step protection; SAFETY.md).
  // (A negative full OD means the exposure stays below the limit: "none needed", printed as 0.)
  const odFull = Math.max(0, Number(b.od.od));
  expect(row.od).toBe(Number(b.odRequired));
  expect(row.od).toBeGreaterThanOrEqual(odFull);
  expect(row.od - odFull).toBeLessThan(0.1 + 1e-9);
}

describe('the numbers on paper are the numbers the core computed, rounded in the safe direction', () => {
  it.each(ROOMS)('room %s: report summary table (limit, NOHD, diffuse, skin, OD per beam)', (code) => {
    const r = get(code);
    const rows = summaryRows(r.text.report, r.core.beams.length);
    r.core.beams.forEach((b, i) => checkRow(b, rows[i] as SummaryRow));
  });

  it.each(ROOMS)('room %s: eyewear sheet matrix header (OD and scale numbers per beam)', (code) => {
    const r = get(code);
    const t = r.text.sheet.join(' ');
    r.core.beams.forEach((b, i) => {
      const m = new RegExp(`${i + 1}\\. ${wl(b.wavelength_nm).replace('.', '\\.')} needs (?:OD ${NUM}|none needed)`).exec(t);
      expect(m, `beam ${i + 1}`).not.toBeNull();
      const od = m?.[1] === undefined ? 0 : Number(m[1]);
      expect(od).toBe(Number(b.odRequired));
      expect(od).toBeGreaterThanOrEqual(Number(b.od.od));
      for (const s of b.scaleNumbers.filter((x) => x.applies && x.scale > 0)) {
        expect(has([t], s.mode === 'RB' ? `RB${s.scale}` : `${s.mode} LB${s.scale}`)).toBe(true);
      }
    });
  });

  it.each(ROOMS)('room %s: door notice (OD per wavelength, never below what any beam there needs)', (code) => {
    const r = get(code);
    const t = r.text.notice.join(' ');
    for (const req of r.core.requiredEyewear.filter((q) => Number(q.odRequired) > 0)) {
      const fullMax = Math.max(...r.core.beams.filter((b) => b.wavelength_nm === req.wavelength_nm).map((b) => Number(b.od.od)));
      expect(has([t], `OD ${req.odRequired}`), `${req.wavelength_nm} nm`).toBe(true);
      expect(Number(req.odRequired)).toBeGreaterThanOrEqual(fullMax);
    }
  });

  it('US Letter with ANSI units (W/cm², J/cm²): same numbers, converted, still rounded down', async () => {
    const r0 = get('B2.16');
    const r = await render(r0.doc.assessment.id, { paper: 'Letter', units: 'ANSI' });
    expect(pdfInfo(r.report).size).toEqual([612, 792]); // US Letter, 8.5 x 11 in
    expect(has(r.text.report, '/cm²')).toBe(true);
    const rows = summaryRows(r.text.report, r.core.beams.length);
    r.core.beams.forEach((b, i) => checkRow(b, rows[i] as SummaryRow));
  }, 120_000);
});

describe('DRAFT mark exactly when unsigned, QR holds the fingerprint', () => {
  it('an unsigned assessment: DRAFT on every page of all three documents, no fingerprint, no QR', () => {
    expect(draft.doc.signature).toBeNull();
    for (const [kind, pages] of Object.entries(draft.text)) {
      pages.forEach((p, i) => expect(p.includes('DRAFT — NOT SIGNED'), `${kind} page ${i + 1}`).toBe(true));
    }
    expect(decodeQr(draft.notice, 1)).toBeNull();
  });

  it.each(ROOMS)('room %s signed: no DRAFT anywhere; the QR on notice, sheet and sign-off page decodes to the fingerprint', (code) => {
    const r = get(code);
    for (const [kind, pages] of Object.entries(r.text)) {
      pages.forEach((p, i) => expect(p.includes('DRAFT'), `${kind} page ${i + 1}`).toBe(false));
    }
    const fp = r.doc.signature?.fingerprint;
    expect(fp).toMatch(/^[0-9a-f]{64}$/);
    const signOffPage = r.text.report.findIndex((p) => p.includes('Full fingerprint (SHA-256)')) + 1;
    expect(signOffPage).toBeGreaterThan(0);
    expect(decodeQr(r.report, signOffPage)).toBe(fp);
    expect(decodeQr(r.notice, 1)).toBe(fp);
    expect(decodeQr(r.sheet, 1)).toBe(fp);
  });
});

describe('a crowded room still gets a one-page notice and sheet', () => {
  it.each(['A4', 'Letter'] as const)('ten lasers, %s', async (paper) => {
    const doc = benchDocument(tenLaserRoom());
    expect(doc.content.input.lasers).toHaveLength(10);
    const opts: RenderOptions = { paper, units: 'SI' };
    expect(pdfInfo(await renderDoorNotice(doc, opts)).pages).toBe(1);
    expect(pdfInfo(await renderEyewearSheet(doc, opts)).pages).toBe(1);
  }, 60_000);
});

describe('a superseded revision says so on every page', () => {
  it('revision 1 of A0.07 after revision 2 is signed: SUPERSEDED in the report header and on the notice', async () => {
    const r = get('A0.07');
    const id = r.doc.assessment.id;
    const officer = (await store.listPeople()).find((p) => p.role === 'Laser safety officer');
    if (!officer) throw new Error('demo officer missing');
    const current = (await store.getAssessment(id)).current;
    await store.saveAssessment(id, { ...current.content, notes: `${current.content.notes} Reviewed again.` });
    await store.signAssessment(id, { personId: officer.id, passphrase: PASSPHRASE, statement: 'Approved again (test).' });
    const first = (await store.listRevisions(id)).find((v) => v.revisionNo === 1);
    if (!first) throw new Error('revision 1 missing');
    const doc = await documentInputFromAssessment(store, id, { revisionId: first.id });
    expect(doc.assessment.status).toBe('superseded');
    const report = pageTexts(await renderReport(doc, A4_SI));
    report.forEach((p, i) => expect(p.includes('SUPERSEDED'), `report page ${i + 1}`).toBe(true));
    expect(pageTexts(await renderDoorNotice(doc, A4_SI))[0]).toContain('SUPERSEDED');
  }, 120_000);
});
