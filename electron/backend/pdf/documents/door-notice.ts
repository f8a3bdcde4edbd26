/**
 * The door hazard notice: a one-page poster for the entrance of the laser controlled area, laid out
 * in the ANSI Z535.2 manner adopted by ANSI Z136.1-2014 (domain reference 5.1): a signal-word panel
 * across the top, the laser symbol in a left panel, the message in a right panel. The layout,
 * proportions and wording are our own.
 *
 * Legibility at 3 m: the signal word, the hazard line, the class and the eyewear requirement are
 * set with capital heights of 9 mm or more (Roboto capitals are 0.71 em: 36 pt -> 9 mm; the signal
 * word, 60-72 pt, 15-18 mm), close to 25 mm of letter height per 7.5 m of reading distance (common
 * practice, from memory). The "VISIBLE AND INVISIBLE" prefix is set smaller; the symbol carries the
 * same message. Details (lasers, contact, fingerprint) are read at the door; crowded rooms get
 * smaller details so the notice stays one page.
 */
import type { Column, Content, TableCell, TDocumentDefinitions } from 'pdfmake/interfaces';
import { dec } from '../../../../core/numeric/decimal.js';
import { frameMarkingText } from '../../../../core/eyewear/marking-text.js';
import type { DocumentInput, RenderOptions } from '../document-input.js';
import * as fmt from '../format.js';
import { baseDocument, cautionBlock, contentWidth, fingerprintStack } from '../page.js';
import { noticePlan } from '../plan/notice-plan.js';
import { roomView, type RoomView } from '../room-view.js';
import { precautionFor, signalWordFor, type SignalChoice } from '../signal-word.js';
import { laserWarningSymbolSvg, safetyAlertSymbolSvg } from '../symbols/laser-warning.js';

const SIDE = 30;

/** Point sizes of the parts read from 3 m (see the file comment). */
export const NOTICE_SIZES = { signalWord: 72, hazardLine: 36, classLine: 44, eyewearLine: 36 } as const;

export function noticeSignal(doc: DocumentInput, view: RoomView, override?: 'DANGER'): SignalChoice {
  const class3RAbove = view.beams.some((b) => (b.classAsLabelled === '3R' || b.result.classEstimate.estimate === '3R') && !dec(b.result.nohd_m).isZero());
  return signalWordFor(view.highestClass, class3RAbove, override);
}

/** "LASER RADIATION" with INVISIBLE / VISIBLE AND INVISIBLE prefixes (domain reference 5.3). */
export function hazardLine(view: RoomView): string {
  return hazardLines(view).join(' ');
}

/** The hazard line broken where it reads best on the notice. */
function hazardLines(view: RoomView): string[] {
  if (view.anyInvisible && view.anyVisible) return ['VISIBLE AND INVISIBLE', 'LASER RADIATION'];
  if (view.anyInvisible) return ['INVISIBLE', 'LASER RADIATION'];
  return ['LASER RADIATION'];
}

function signalPanel(choice: SignalChoice, width: number, size: number): Content {
  const s = choice.style;
  const word: Content = { text: s.word, fontSize: size, bold: true, color: s.text, characterSpacing: 2, lineHeight: 1 };
  return {
    table: {
      widths: [width - 2],
      body: [
        [
          {
            fillColor: s.panel,
            margin: [0, 2, 0, 0],
            columns: s.alertSymbol
              ? [{ width: '*', text: '' }, { svg: safetyAlertSymbolSvg(size * 0.94, s.text, s.panel), width: size * 0.94, margin: [0, size * 0.125, 12, 0] }, { ...word, width: 'auto' }, { width: '*', text: '' }]
              : [{ ...word, alignment: 'center', width: '*' }],
          },
        ],
      ],
    },
    layout: { hLineWidth: () => 2, vLineWidth: () => 2, hLineColor: () => '#000000', vLineColor: () => '#000000', paddingLeft: () => 0, paddingRight: () => 0 },
  };
}

/**
 * What a person at the door must know before opening it: who may enter, which eyewear, what to do
 * in an emergency and whom to call. The officer's administrative controls stay in the report.
 */
export function entryInstructions(doc: DocumentInput, view: RoomView): string[] {
  const needEyewear = doc.results.requiredEyewear.some((r) => dec(r.odRequired).gt(0));
  const who = [doc.room.responsiblePerson, doc.officer.name].filter((x) => x.trim() !== '' && !/not named/.test(x));
  const items = [`Authorised persons only.${who.length > 0 ? ` Others: ask ${who.join(' or ')} first.` : ''}`];
  if (needEyewear) {
    const covering = coveringEyewear(doc);
    items.push(
      covering.length > 0
        ? `Put on the laser eyewear BEFORE entering: ${covering.map((e) => e.label).join(' or ')}.`
        : 'Put on the laser eyewear named for your task on the eyewear sheet BEFORE entering; no single pair covers every beam here.',
    );
  }
  items.push(`${precautionFor(view.highestClass)}.`);
  if (view.anyInvisible) items.push('Part of the radiation is invisible: a beam can be present without being seen.');
  const stop = doc.content.controls.some((c) => c.decision === 'accepted' && /emergency (beam-off|stop|off)/i.test(c.measure));
  const call = doc.emergencyContact ?? 'the emergency number below';
  items.push(`Emergency: ${stop ? 'press the emergency beam-off button or ' : ''}switch the lasers off if you can do so safely, leave the area and call ${call}.`);
  // Common practice after a suspected eye exposure: prompt examination by an eye specialist.
  items.push('Suspected eye injury: call the emergency contact, then the laser safety officer; the eye must be examined without delay.');
  return items;
}

/** The eyewear that covers every beam, named by its label and the marking on its frame (EN 207 style). */
export function coveringEyewear(doc: DocumentInput): Array<{ readonly label: string; readonly marking: string }> {
  const specs = doc.content.input.eyewear ?? [];
  return doc.results.eyewearCoveringAll.map((tag) => {
    const spec = specs.find((e) => e.id === tag);
    if (spec === undefined) return { label: tag, marking: '' };
    const nm = (a: number, b: number): string => (a === b ? `${a}` : `${a}–${b}`);
    const od = (spec.od ?? []).map((m) => `OD ${m.od} ${nm(m.from_nm, m.to_nm)} nm`);
    const marking = frameMarkingText(spec) || od.join(', ');
    const label = spec.label.includes(spec.id) ? spec.label : `${spec.id} (${spec.label})`;
    return { label, marking };
  });
}

function laserRows(view: RoomView): TableCell[][] {
  return view.lasers.map((l) => {
    const beams = l.laser.beams;
    const wl = [...new Set(beams.map((b) => fmt.wavelength(b.wavelength_nm)))].join(', ');
    const ems = beams.map((b) => fmt.emission(b.emission));
    // The maximum output of each mode, and the pulse duration where pulsed (Z136.1 sign content).
    const outputs = [...new Set(ems.map((e) => e.output))].join(' / ');
    const pulses = [...new Set(ems.map((e) => e.pulse))].join(' / ');
    return [
      { text: l.type, bold: true },
      wl,
      outputs,
      pulses,
      // a no-break space: "Class 3B" is one term and must not be split over two lines
      { text: l.classAsLabelled === null ? 'not labelled' : `Class\u00a0${l.classAsLabelled}`, bold: true },
    ];
  });
}

/**
 * Required eyewear per wavelength; wavelengths needing the same OD and scale numbers share a row
 * (the OD stays per wavelength: nothing is combined across different requirements).
 */
export function eyewearRows(doc: DocumentInput): TableCell[][] {
  const groups = new Map<string, { wl: string[]; od: string; scale: string }>();
  for (const r of doc.results.requiredEyewear) {
    if (!(dec(r.odRequired).gt(0) || r.scaleNumbers.some((s) => s.applies && s.scale > 0))) continue;
    const od = fmt.od(r.odRequired);
    const scale = fmt.scaleNumbers(r.scaleNumbers);
    const key = `${od}|${scale}`;
    const g = groups.get(key) ?? { wl: [], od, scale };
    g.wl.push(fmt.wavelength(r.wavelength_nm));
    groups.set(key, g);
  }
  return [...groups.values()].map((g) => [{ text: g.wl.join(', '), bold: true }, { text: g.od, bold: true }, g.scale]);
}

/** One table, or two or three side by side when the room needs many rows (keeps one page). */
function eyewearTables(rows: TableCell[][], shrink = 1): Content {
  // pdfmake annotates cell objects while laying out: each table gets its own header cells.
  const header = (): TableCell[] => [{ text: 'Wavelength', bold: true }, { text: 'OD', bold: true }, { text: 'Scale numbers', bold: true }];
  const table = (body: TableCell[][], fontSize: number): Content => ({
    table: { headerRows: 1, widths: ['*', 'auto', 'auto'], body: [header(), ...body] },
    layout: CELL_LAYOUT,
    fontSize,
  });
  if (rows.length <= 4) return { margin: [0, 4, 0, 0], stack: [table(rows, 15 * shrink)] };
  if (rows.length <= 8) {
    const half = Math.ceil(rows.length / 2);
    return { margin: [0, 4, 0, 0], columns: [table(rows.slice(0, half), 12.5 * shrink), table(rows.slice(half), 12.5 * shrink)], columnGap: 10 };
  }
  // Many wavelengths: one line per wavelength ("1064 nm  OD 6.3  D LB5, R LB7"), three to a row.
  const cells: TableCell[] = rows.map((r) => ({ text: [{ text: `${cellText(r[0])}   `, bold: true }, { text: `${cellText(r[1])}   `, bold: true }, cellText(r[2])] }));
  const body: TableCell[][] = [];
  for (let i = 0; i < cells.length; i += 3) body.push([cells[i] ?? '', cells[i + 1] ?? '', cells[i + 2] ?? '']);
  return { margin: [0, 4, 0, 0], table: { widths: ['*', '*', '*'], body }, layout: { ...CELL_LAYOUT, fillColor: () => null }, fontSize: 10.5 * shrink };
}

function cellText(c: TableCell | undefined): string {
  if (typeof c === 'string') return c;
  if (c !== undefined && typeof c === 'object' && 'text' in c && typeof c.text === 'string') return c.text;
  return '';
}

const CELL_LAYOUT = {
  hLineWidth: () => 0.8,
  vLineWidth: () => 0.8,
  hLineColor: () => '#333333',
  vLineColor: () => '#333333',
  paddingTop: () => 2,
  paddingBottom: () => 2,
  fillColor: (row: number) => (row === 0 ? '#E6E6E6' : null),
};

/** How tightly the notice is set: 0 as designed; each further level gives the details less room (see renderDoorNotice). */
export const NOTICE_FIT_LEVELS = 8;

export function doorNoticeDefinition(doc: DocumentInput, opts: RenderOptions, fit = 0): TDocumentDefinitions {
  const view = roomView(doc);
  const width = contentWidth(opts.paper, SIDE);
  const choice = noticeSignal(doc, view, opts.signalWord);
  const eyewear = eyewearRows(doc);
  // The lasers table is read at the door; it shrinks for crowded rooms so the notice stays one page.
  const letter = opts.paper === 'Letter'; // 50 pt shorter than A4
  // A small room leaves space: the details are then set larger, to be read from further away.
  const roomy = fit === 0 && view.lasers.length <= 2 && eyewear.length <= 2;
  // A crowded room: the symbol panel gives up some height so everything stays on one page.
  const dense = fit > 0 || view.lasers.length > 7 || eyewear.length > 8;
  const shrink = [1, 0.92, 0.84, 0.76, 0.7, 0.66, 0.62, 0.58][Math.min(fit, NOTICE_FIT_LEVELS - 1)] as number;
  // The texts read close up (instructions, contacts) shrink less than the table, and not below about 7.5 pt.
  const near = Math.max(shrink, 0.78);
  const base = roomy ? 12.5 : view.lasers.length <= 4 && !letter ? 10.5 : view.lasers.length <= 7 ? 9 : 7.5;
  const detail = Math.max(base * shrink, 5.8); // 5.8 pt: still read at arm's length
  const listSize = (roomy ? 11.5 : view.lasers.length <= 4 && !letter ? 10.5 : 9.5) * near;
  const symbol = (dense ? 96 : letter ? 112 : 124) * (fit >= 4 ? 0.62 : fit >= 3 ? 0.8 : 1);
  // From level 3 on, the hazard and class lines give up some size too (still far above 9 mm capitals at the lowest).
  const big = fit >= 4 ? 0.68 : fit >= 3 ? 0.82 : 1;
  const officerContact = [doc.officer.phone, doc.officer.email].filter((x) => x.trim() !== '').join(' · ');
  // The room plan (only when the assessment has a plan), beside the contacts below the entry
  // instructions: as wide as the contacts and fingerprint leave, about 90 mm on A4.
  const emergencyW = 170;
  const fingerprintW = 92;
  const planW = width - emergencyW - fingerprintW - 2 * 12;
  // The plan gives up height before the lines read from afar do (they shrink from level 3).
  // At the last levels (the most crowded rooms) the plan goes back to a small one beside the hazard
  // lines, and the contacts beside the entry instructions, so the notice stays one sheet.
  const planScale = [1, 1, 0.82, 0.72, 0.66][Math.min(fit, 4)] as number;
  const smallPlanOnly = fit >= 5;
  const roomPlan = smallPlanOnly ? null : noticePlan(doc, view, planW, (letter ? 140 : 185) * planScale, opts.entranceId, fit >= 3 ? 7.5 : 8.5);
  const headerPlan = smallPlanOnly ? noticePlan(doc, view, 92, 100, opts.entranceId, 6) : null;
  const covering = coveringEyewear(doc);
  const twoColumns = view.lasers.length > 10;

  const beforeYouEnter: Column = {
    width: '*',
    stack: [
      { text: 'Before you enter', bold: true, fontSize: roomy ? 14 : 12 * big, margin: [0, 0, 0, 2] },
      { ul: entryInstructions(doc, view), fontSize: listSize, lineHeight: 1.05 },
    ],
  };
  // Whom to call and what the notice is for; beside the entry instructions, or (with a plan) in a band below them.
  const callStack: Content[] = [
    { text: 'In an emergency, call', bold: true, fontSize: 9.5, color: '#B00020' },
    doc.emergencyContact ? { text: doc.emergencyContact, fontSize: 13 * near, bold: true } : { text: 'Emergency number: ____________________', fontSize: 11, bold: true, margin: [0, 4, 0, 0] },
    { text: 'Laser safety officer', bold: true, fontSize: 9.5, margin: [0, 4, 0, 0] },
    { text: doc.officer.name, fontSize: 12 * near, bold: true },
    { text: officerContact, fontSize: 10.5 * near },
  ];
  const roomStack: Content[] = [
    { text: [{ text: 'Responsible person: ', bold: true }, `${doc.room.responsiblePerson}${doc.room.contact ? ' · ' + doc.room.contact : ''}`], fontSize: 9 * near, margin: [0, roomPlan ? 0 : 3, 0, 0] },
    { text: [{ text: 'Room: ', bold: true }, `${doc.room.code}${doc.room.name ? ' — ' + doc.room.name : ''}, ${doc.site.name}`], fontSize: 9 * near },
    { text: [{ text: 'Valid until: ', bold: true }, { text: fmt.calendarDate(doc.content.reviewBy), bold: true }], fontSize: 13 * near, margin: [0, 3, 0, 0] },
  ];
  const fingerprintColumn: Column = { width: fingerprintW, stack: [fingerprintStack(doc, dense ? 64 : 76, 8.5)] };

  const laserHeader = (): TableCell[] => [{ text: 'Laser type', bold: true }, { text: 'Wavelength', bold: true }, { text: 'Max. output', bold: true }, { text: 'Pulse', bold: true }, { text: 'Class', bold: true }];
  const laserTable = (rows: TableCell[][], widths: Array<number | string>): Content => ({ table: { headerRows: 1, widths, body: [laserHeader(), ...rows] }, layout: CELL_LAYOUT, fontSize: detail });
  const rows = laserRows(view);
  const half = Math.ceil(rows.length / 2);
  // Many lasers: one entry per laser ("name · wavelength · output, pulse · class"), two lists side by side.
  const entry = (r: TableCell[]): TableCell => ({
    text: [{ text: `${cellText(r[0])}`, bold: true }, ` · ${cellText(r[1])} · ${cellText(r[2])}${cellText(r[3]) === '–' || cellText(r[3]) === '' ? '' : `, ${cellText(r[3])}`} · `, { text: cellText(r[4]), bold: true }],
  });
  const list = (part: TableCell[][]): Content => ({ table: { widths: ['*'], body: part.map((r) => [entry(r)]) }, layout: { ...CELL_LAYOUT, fillColor: () => null }, fontSize: detail });
  const lasersBlock: Content = twoColumns ? { columns: [list(rows.slice(0, half)), list(rows.slice(half))], columnGap: 8 } : laserTable(rows, ['*', 108, 80, 64, 56]);

  const content: Content[] = [
    signalPanel(choice, width, dense ? (fit >= 4 ? 44 : fit >= 3 ? 52 : 60) : NOTICE_SIZES.signalWord),
    {
      margin: [0, 8 * shrink, 0, 0],
      columns: [
        { width: symbol, svg: laserWarningSymbolSvg(symbol), margin: [0, 2, 0, 0] },
        {
          width: '*',
          margin: [14, 0, 0, 0],
          stack: [
            ...hazardLines(view).map((t, i, all) => ({ text: t, fontSize: (all.length > 1 && i === 0 ? 22 : all.length > 1 ? 30 : NOTICE_SIZES.hazardLine) * big, bold: true, lineHeight: 1 })),
            { text: [{ text: `CLASS ${view.highestClass} `, fontSize: (dense || headerPlan ? 40 : NOTICE_SIZES.classLine) * big }, { text: 'LASER AREA', fontSize: 24 * big }], bold: true, margin: [0, 2, 0, 2], lineHeight: 1 },
            { text: precautionFor(view.highestClass).toUpperCase(), fontSize: 13 * Math.max(big, 0.8), bold: true, lineHeight: 1.05 },
          ],
        },
        ...(headerPlan ? [headerPlan] : []),
      ],
    },
    eyewear.length > 0
      ? {
          margin: [0, 10 * shrink, 0, 0],
          stack: [
            { text: 'LASER EYEWEAR REQUIRED', fontSize: NOTICE_SIZES.eyewearLine * big, bold: true, color: '#000000', background: '#FFD100', lineHeight: 1 },
            eyewearTables(eyewear, Math.max(shrink, 0.75)),
            covering.length > 0
              ? {
                  text: [
                    { text: 'Eyewear here that covers every beam: ', bold: true },
                    ...covering.flatMap((e, i) => [{ text: `${i > 0 ? '; ' : ''}${e.label}`, bold: true }, { text: e.marking === '' ? '' : `, marked ${e.marking}` }]),
                  ],
                  fontSize: 11 * near,
                  margin: [0, 2, 0, 0],
                }
              : { text: 'No single eyewear covers every beam: see the eyewear sheet by the rack.', bold: true, fontSize: 11, margin: [0, 2, 0, 0] },
          ],
        }
      : { text: 'No protective eyewear is required for the beams assessed.', fontSize: 16, bold: true, margin: [0, 10, 0, 0] },
    { text: 'Lasers in this room', bold: true, fontSize: roomy ? 14 : 11.5 * near, margin: [0, roomy ? 10 : 4 * shrink, 0, 1] },
    lasersBlock,
    ...(roomPlan
      ? [
          { margin: [0, 8 * shrink, 0, 0], columnGap: 12, columns: [beforeYouEnter, roomPlan] } as Content,
          { margin: [0, 6 * shrink, 0, 0], columnGap: 12, columns: [{ width: '*', stack: callStack }, { width: '*', stack: roomStack }, fingerprintColumn] } as Content,
        ]
      : [{ margin: [0, 8 * shrink, 0, 0], columnGap: 12, columns: [beforeYouEnter, { width: emergencyW, stack: [...callStack, ...roomStack] }, fingerprintColumn] } as Content]),
    { text: '', margin: [0, dense ? 3 : 6, 0, 0] },
    cautionBlock(fit >= 6 ? 8.5 : 10, doc),
  ];
  return {
    ...baseDocument(doc, opts.paper, 'Laser hazard notice'),
    pageMargins: dense ? [SIDE, 16, SIDE, 10] : [SIDE, 22, SIDE, 16],
    content,
  };
}
