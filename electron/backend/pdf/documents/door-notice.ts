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
import type { Content, TableCell, TDocumentDefinitions } from 'pdfmake/interfaces';
import { dec } from '../../../../core/numeric/decimal.js';
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

function entryInstructions(doc: DocumentInput, view: RoomView): string[] {
  const needEyewear = doc.results.requiredEyewear.some((r) => dec(r.odRequired).gt(0));
  const items = ['Authorised personnel only.'];
  if (needEyewear) items.push('Put on the laser eyewear listed here BEFORE entering; check it matches the wavelengths in use.');
  items.push(`${precautionFor(view.highestClass)}.`);
  if (view.anyInvisible) items.push('Part of the radiation is invisible: a beam can be present without being seen.');
  // Administrative controls the officer accepted are the room's own entry rules.
  for (const c of doc.content.controls) {
    if (c.category === 'administrative' && c.decision === 'accepted' && items.length < 7) items.push(c.measure.endsWith('.') ? c.measure : `${c.measure}.`);
  }
  return items;
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
      { text: l.classAsLabelled === null ? 'not labelled' : `Class ${l.classAsLabelled}`, bold: true },
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
function eyewearTables(rows: TableCell[][]): Content {
  // pdfmake annotates cell objects while laying out: each table gets its own header cells.
  const header = (): TableCell[] => [{ text: 'Wavelength', bold: true }, { text: 'OD', bold: true }, { text: 'Scale numbers', bold: true }];
  const table = (body: TableCell[][], fontSize: number): Content => ({
    table: { headerRows: 1, widths: ['*', 'auto', 'auto'], body: [header(), ...body] },
    layout: CELL_LAYOUT,
    fontSize,
  });
  if (rows.length <= 4) return { margin: [0, 4, 0, 0], stack: [table(rows, 15)] };
  if (rows.length <= 8) {
    const half = Math.ceil(rows.length / 2);
    return { margin: [0, 4, 0, 0], columns: [table(rows.slice(0, half), 12.5), table(rows.slice(half), 12.5)], columnGap: 10 };
  }
  // Many wavelengths: one line per wavelength ("1064 nm  OD 6.3  D LB5, R LB7"), three to a row.
  const cells: TableCell[] = rows.map((r) => ({ text: [{ text: `${cellText(r[0])}   `, bold: true }, { text: `${cellText(r[1])}   `, bold: true }, cellText(r[2])] }));
  const body: TableCell[][] = [];
  for (let i = 0; i < cells.length; i += 3) body.push([cells[i] ?? '', cells[i + 1] ?? '', cells[i + 2] ?? '']);
  return { margin: [0, 4, 0, 0], table: { widths: ['*', '*', '*'], body }, layout: { ...CELL_LAYOUT, fillColor: () => null }, fontSize: 10.5 };
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

export function doorNoticeDefinition(doc: DocumentInput, opts: RenderOptions): TDocumentDefinitions {
  const view = roomView(doc);
  const width = contentWidth(opts.paper, SIDE);
  const choice = noticeSignal(doc, view, opts.signalWord);
  const eyewear = eyewearRows(doc);
  // The lasers table is read at the door; it shrinks for crowded rooms so the notice stays one page.
  const letter = opts.paper === 'Letter'; // 50 pt shorter than A4
  // A small room leaves space: the details are then set larger, to be read from further away.
  const roomy = view.lasers.length <= 2 && eyewear.length <= 2;
  // A crowded room: the symbol panel gives up some height so everything stays on one page.
  const dense = view.lasers.length > 7 || eyewear.length > 8;
  const detail = roomy ? 12.5 : view.lasers.length <= 4 && !letter ? 10.5 : view.lasers.length <= 7 ? 9 : 7.5;
  const listSize = roomy ? 12 : view.lasers.length <= 4 && !letter ? 10.5 : 9.5;
  const officerContact = [doc.officer.phone, doc.officer.email].filter((x) => x.trim() !== '').join(' · ');
  const suitable = doc.results.eyewearCoveringAll;
  // The room plan, small, beside the hazard lines (only when the assessment has a plan).
  const smallPlan = noticePlan(doc, view, 108, dense ? 100 : 128, opts.entranceId);
  // With the plan beside it, the symbol and the class line take the crowded-room sizes.
  const symbol = dense || smallPlan ? 96 : letter ? 112 : 124;

  const content: Content[] = [
    signalPanel(choice, width, dense ? 60 : NOTICE_SIZES.signalWord),
    {
      margin: [0, 8, 0, 0],
      columns: [
        { width: symbol, svg: laserWarningSymbolSvg(symbol), margin: [0, 2, 0, 0] },
        {
          width: '*',
          margin: [14, 0, 0, 0],
          stack: [
            ...hazardLines(view).map((t, i, all) => ({ text: t, fontSize: all.length > 1 && i === 0 ? 22 : all.length > 1 ? 30 : NOTICE_SIZES.hazardLine, bold: true, lineHeight: 1 })),
            { text: [{ text: `CLASS ${view.highestClass} `, fontSize: dense || smallPlan ? 40 : NOTICE_SIZES.classLine }, { text: 'LASER AREA', fontSize: 24 }], bold: true, margin: [0, 2, 0, 2], lineHeight: 1 },
            { text: precautionFor(view.highestClass).toUpperCase(), fontSize: 13, bold: true, lineHeight: 1.05 },
          ],
        },
        ...(smallPlan ? [smallPlan] : []),
      ],
    },
    eyewear.length > 0
      ? {
          margin: [0, 10, 0, 0],
          stack: [
            { text: 'LASER EYEWEAR REQUIRED', fontSize: NOTICE_SIZES.eyewearLine, bold: true, color: '#000000', background: '#FFD100', lineHeight: 1 },
            eyewearTables(eyewear),
            {
              text: suitable.length > 0 ? [{ text: 'Eyewear here that covers every beam: ', bold: true }, suitable.join(', ')] : [{ text: 'No single eyewear covers every beam: see the eyewear sheet by the rack.', bold: true }],
              fontSize: 11,
              margin: [0, 2, 0, 0],
            },
          ],
        }
      : { text: 'No protective eyewear is required for the beams assessed.', fontSize: 16, bold: true, margin: [0, 10, 0, 0] },
    { text: 'Lasers in this room', bold: true, fontSize: roomy ? 14 : 11.5, margin: [0, roomy ? 10 : 4, 0, 1] },
    {
      table: {
        headerRows: 1,
        widths: ['*', 120, 80, 64, 44],
        body: [[{ text: 'Laser type', bold: true }, { text: 'Wavelength', bold: true }, { text: 'Max. output', bold: true }, { text: 'Pulse', bold: true }, { text: 'Class', bold: true }], ...laserRows(view)],
      },
      layout: CELL_LAYOUT,
      fontSize: detail,
    },
    {
      margin: [0, 8, 0, 0],
      columnGap: 12,
      columns: [
        {
          width: '*',
          stack: [
            { text: 'Before you enter', bold: true, fontSize: roomy ? 14 : 12, margin: [0, 0, 0, 2] },
            { ul: entryInstructions(doc, view), fontSize: listSize, lineHeight: 1.05 },
          ],
        },
        {
          width: 170,
          stack: [
            { text: 'Laser safety officer', bold: true, fontSize: 9.5 },
            { text: doc.officer.name, fontSize: 12.5, bold: true },
            { text: officerContact, fontSize: 11 },
            { text: [{ text: 'Responsible person: ', bold: true }, `${doc.room.responsiblePerson}${doc.room.contact ? ' · ' + doc.room.contact : ''}`], fontSize: 9, margin: [0, 3, 0, 0] },
            { text: [{ text: 'Room: ', bold: true }, `${doc.room.code}${doc.room.name ? ' — ' + doc.room.name : ''}, ${doc.site.name}`], fontSize: 9 },
            { text: [{ text: 'Valid until: ', bold: true }, { text: fmt.calendarDate(doc.content.reviewBy), bold: true }], fontSize: 13, margin: [0, 3, 0, 0] },
          ],
        },
        { width: 92, stack: [fingerprintStack(doc, dense ? 64 : 76, 8.5)] },
      ],
    },
    { text: '', margin: [0, dense ? 3 : 6, 0, 0] },
    cautionBlock(10, doc),
  ];
  return {
    ...baseDocument(doc, opts.paper, 'Laser hazard notice'),
    pageMargins: dense ? [SIDE, 16, SIDE, 10] : [SIDE, 22, SIDE, 16],
    content,
  };
}
