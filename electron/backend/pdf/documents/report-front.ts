/** Report page 1: identification, status, caution, room verdict, and the per-beam summary table. */
import type { Content, TableCell } from 'pdfmake/interfaces';
import type { UnitHabit } from '../../../../core/units/quantities.js';
import type { DocumentInput } from '../document-input.js';
import { factTable, gridTable, heading, paragraph } from '../blocks.js';
import * as fmt from '../format.js';
import { COLOR, cautionBlock, DRAFT_HEADER } from '../page.js';
import type { RoomView } from '../room-view.js';
import { beamFigures, diffuseCases, reportedDistance } from './beam-figures.js';

const OPERATING_STATE: Readonly<Record<string, string>> = {
  normal: 'normal operation',
  alignment: 'alignment',
  maintenance: 'maintenance',
  service: 'service',
  'set-up': 'set-up',
};

export function statusText(doc: DocumentInput): Content {
  if (doc.signature === null) {
    return { text: `${DRAFT_HEADER} (revision ${doc.assessment.revisionNo})`, bold: true, color: COLOR.draft };
  }
  const superseded = doc.assessment.status === 'superseded' ? ' — SUPERSEDED by a later revision' : '';
  if (!doc.signature.keyTrusted) {
    return { text: `UNVERIFIED SIGNATURE, revision ${doc.assessment.revisionNo}, in the name of ${doc.signature.name}: the key is not on this installation's trust list${superseded}`, bold: true, color: COLOR.bad };
  }
  const co = (doc.signature.coSigners ?? []).map((c) => (c.keyTrusted ? `${c.name} (${fmt.calendarDate(c.signedAt)})` : `${c.name} (UNVERIFIED CO-SIGNATURE)`));
  return {
    text: `Signed, revision ${doc.assessment.revisionNo}, on ${fmt.calendarDate(doc.signature.signedAt)} by ${doc.signature.name}${co.length ? `; co-signed by ${co.join(', ')}` : ''}${superseded}`,
    bold: true,
    color: superseded === '' ? COLOR.good : COLOR.bad,
  };
}

function contactOf(p: { phone: string; email: string }): string {
  return [p.phone, p.email].filter((x) => x.trim() !== '').join(' · ');
}

export function frontPage(doc: DocumentInput, view: RoomView): Content[] {
  const c = doc.content;
  const r = doc.results;
  const site = [doc.site.name, doc.site.building, doc.site.address].filter((x) => x.trim() !== '').join(', ');
  const officer = `${doc.officer.name}${doc.officer.role ? ` (${doc.officer.role})` : ''}${contactOf(doc.officer) ? ' · ' + contactOf(doc.officer) : ''}`;
  const states = c.operatingStates.map((s) => OPERATING_STATE[s] ?? s).join(', ') || 'not stated';
  return [
    { text: 'Laser hazard assessment', fontSize: 22, bold: true, margin: [0, 0, 0, 2] },
    { text: `Room ${doc.room.code}${doc.room.name ? ' — ' + doc.room.name : ''}`, fontSize: 15, margin: [0, 0, 0, 2] },
    { text: c.title, fontSize: 11, color: COLOR.muted, margin: [0, 0, 0, 10] },
    factTable([
      ['Site', site],
      ['Room', `${doc.room.code}${doc.room.name ? ' — ' + doc.room.name : ''}`],
      ['Responsible person', `${doc.room.responsiblePerson || 'not named'}${doc.room.contact ? ' · ' + doc.room.contact : ''}`],
      ['Laser safety officer', officer],
      ['Status', statusText(doc)],
      ['Assessment date', `${fmt.calendarDate(doc.assessment.updatedAt)} (revision ${doc.assessment.revisionNo}, opened ${fmt.calendarDate(doc.assessment.createdAt)})`],
      ['Review by', fmt.calendarDate(c.reviewBy)],
      ['Operating states covered', states],
      ['Rule set', r.ruleSetName],
      ['Calculated with', doc.assessment.calculatedWith],
    ]),
    { text: '', margin: [0, 6, 0, 0] },
    cautionBlock(11),
    heading('Room at a glance', 2),
    factTable(
      [
        ['Highest class', `Class ${view.highestClass} (the higher of the labelled classes and the estimates)`],
        ['Largest hazard distance', fmt.distanceFull(r.largestHazardDistance_m)],
        [
          'Eyewear covering every beam',
          r.eyewearCoveringAll.length > 0
            ? r.eyewearCoveringAll.join(', ')
            : { text: 'None of the listed eyewear covers every beam — see the eyewear section.', bold: true, color: COLOR.bad },
        ],
        ['Beams assessed', `${r.beams.length} beam${r.beams.length === 1 ? '' : 's'} from ${c.input.lasers.length} laser${c.input.lasers.length === 1 ? '' : 's'}`],
      ],
      130,
      9.5,
    ),
  ];
}

export function beamSummary(doc: DocumentInput, view: RoomView, units: UnitHabit): Content[] {
  const rows: TableCell[][] = view.beams.map((b, i) => {
    const f = beamFigures(b.result, units);
    return [
      { text: `${i + 1}. ${b.result.label}`, bold: true },
      f.wavelength,
      b.result.emissionSummary,
      { text: [{ text: f.limit, bold: true }, `\n${f.governing}`] },
      { text: f.nohd, bold: true },
      f.diffuse,
      f.skin,
      { text: f.od, bold: true },
      f.scale,
      `${f.classEstimate} / ${b.classAsLabelled ?? '–'}`,
    ];
  });
  const warnings = pointsToCheck(view);
  const cases = diffuseLines(view);
  return [
    heading('Summary per beam'),
    paragraph(
      `Limits are rounded down, distances, optical densities and scale numbers up (${units === 'ANSI' ? 'W/cm², J/cm²' : 'W/m², J/m²'}). ` +
        `${diffuseLegend(view, cases.length > 0)} Class: estimate / as labelled — the manufacturer's class governs. ` +
        // the row name is the cross-reference; the readable citation is printed once, in the appendix
        'Row: the exposure-limit table row the limit comes from; its published source (document, edition, table) is named under "Limit-table rows used" in the appendix.',
      { fontSize: 8, color: COLOR.muted },
    ),
    gridTable(
      ['Beam', 'Wave-length', 'Emission', 'Eye limit (governing rule)', 'NOHD', 'Diffuse', 'Skin', 'OD', 'Scale numbers', 'Class est./ label'],
      rows,
      // The limit column takes what is left: fixed widths plus cell padding must stay inside the margins on A4.
      [72, 32, 60, '*', 32, 32, 30, 30, 46, 30],
      7.2,
    ),
    ...cases,
    ...(warnings.length === 0
      ? []
      : [
          heading('Points to check', 3),
          { ul: warnings.map((w) => ({ text: w, color: COLOR.bad })), fontSize: 8.5, margin: [0, 0, 0, 4] } as Content,
        ]),
  ];
}

/**
 * Each warning printed once, naming the beams it concerns ("Beams 3, 4 (Nd:YAG 1064 nm; Nd:YAG
 * second harmonic 532 nm): …"), in the order of first appearance: the same sentence repeated once
 * per beam hides the points that differ.
 */
export function pointsToCheck(view: RoomView): string[] {
  const byText = new Map<string, number[]>();
  view.beams.forEach((b, i) => {
    for (const w of b.result.warnings) {
      const beams = byText.get(w) ?? [];
      if (!beams.includes(i)) beams.push(i);
      byText.set(w, beams);
    }
  });
  return [...byText].map(([w, beams]) => {
    const numbers = beams.map((i) => i + 1).join(', ');
    const labels = beams.map((i) => view.beams[i]?.result.label ?? '').join('; ');
    return `${beams.length === 1 ? 'Beam' : 'Beams'} ${numbers} (${labels}): ${w}`;
  });
}

/**
 * The legend of the Diffuse column says only what the page shows: the list of both viewing cases
 * is promised only when it is printed under the table, and "not assessed" is explained only when a
 * cell reads so (no diffusely reflecting surface was entered for that beam, so none was evaluated).
 */
function diffuseLegend(view: RoomView, listed: boolean): string {
  const notAssessed = view.beams.some((b) => b.result.nhzDiffuse_m === null && reportedDistance(b.result, 'diffuse') === null);
  const what = `Diffuse: hazard zone radius for diffuse reflection (the governing viewing case${listed ? '; the accidental and the deliberate case are listed below the table' : ''}).`;
  return notAssessed ? `${what} “Not assessed” there means that no diffusely reflecting surface was entered for the beam, so none was evaluated.` : what;
}

/** One line per beam with diffuse viewing: the accidental and the deliberate case, and which governs. */
function diffuseLines(view: RoomView): Content[] {
  const lines = view.beams.flatMap((b, i) => {
    const cases = diffuseCases(b.result);
    return cases === null ? [] : [`Beam ${i + 1} (${b.result.label}), diffuse reflection: ${cases}.`];
  });
  return lines.length === 0 ? [] : [paragraph(lines.join('\n'), { fontSize: 8, color: COLOR.muted })];
}
