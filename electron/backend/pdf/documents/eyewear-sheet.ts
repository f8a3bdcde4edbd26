/**
 * The eyewear sheet, posted by the goggle rack: one landscape page that says, for each eyewear on
 * the shelf, which beams of the room it protects against and which it must NOT be used for (from
 * the core's coverage verdicts), and what the room needs per wavelength.
 */
import { checksSentence } from '../row-checks.js';
import type { Content, TableCell, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { EyewearSpec } from '../../../../core/model/inputs.js';
import type { DocumentInput, RenderOptions } from '../document-input.js';
import { baseDocument, cautionBlock, COLOR, contentWidth, fingerprintBlock, footerFor, headerFor } from '../page.js';
import { roomView } from '../room-view.js';
import { coverageMatrix, eyewearMarkings, requiredEyewearTable, verdictOf } from './eyewear-tables.js';
import type { RoomView } from '../room-view.js';
import { coveringEyewear } from './door-notice.js';

/** Beam numbers (1-based, as in the matrix) each eyewear covers and must not be used for. */
function useByNumber(doc: DocumentInput, view: RoomView): Array<{ eyewear: EyewearSpec; covers: number[]; mustNot: number[] }> {
  return (doc.content.input.eyewear ?? []).map((e) => {
    const covers: number[] = [];
    const mustNot: number[] = [];
    view.beams.forEach((b, i) => {
      const v = verdictOf(doc, b.result.beamId, e.id);
      (v !== null && v.adequate ? covers : mustNot).push(i + 1);
    });
    return { eyewear: e, covers, mustNot };
  });
}

/** 1, 2, 4, 5, 6 -> "1, 2, 4–6". */
/** "beam 3" for one beam, "beams 4, 6, 7" for several (the sheet is read aloud at the rack). */
function beamsWord(ns: readonly number[]): string {
  return ns.length === 1 ? 'beam ' : 'beams ';
}

export function numberRanges(ns: readonly number[]): string {
  const out: string[] = [];
  for (let i = 0; i < ns.length; i++) {
    const start = ns[i] as number;
    let end = start;
    while (ns[i + 1] === end + 1) {
      end++;
      i++;
    }
    out.push(end === start ? String(start) : end === start + 1 ? `${start}, ${end}` : `${start}–${end}`);
  }
  return out.join(', ');
}

const SIDE = 32;

/** The eyewear that covers every beam first (the pair to reach for), the rest in shelf order. */
function coveringFirst(doc: DocumentInput): DocumentInput {
  const all = doc.content.input.eyewear ?? [];
  const first = doc.results.eyewearCoveringAll;
  const eyewear = [...all.filter((e) => first.includes(e.id)), ...all.filter((e) => !first.includes(e.id))];
  return { ...doc, content: { ...doc.content, input: { ...doc.content.input, eyewear } } };
}

/** How tightly the sheet is set: 0 as designed; further levels give the tables less room (see renderEyewearSheet). */
export const SHEET_FIT_LEVELS = 5;

export function eyewearSheetDefinition(original: DocumentInput, opts: RenderOptions, fit = 0): TDocumentDefinitions {
  const doc = coveringFirst(original);
  const view = roomView(doc);
  const location = (tag: string): string => doc.eyewearLocations[tag] ?? '';
  const covering = coveringEyewear(doc);
  const many = view.beams.length > 8;
  const shelfSize = (doc.content.input.eyewear ?? []).length;
  // A full shelf: the use list goes into two columns, one entry per eyewear.
  const compact = fit >= 1 || shelfSize > 6;
  const matrixFont = (many ? 7 : 8) * ([1, 1, 0.9, 0.82, 0.78][Math.min(fit, SHEET_FIT_LEVELS - 1)] ?? 0.78);
  const eyewearCell = (e: EyewearSpec): TableCell => ({
    text: [{ text: e.id, bold: true, fontSize: fit >= 2 ? 9.5 : 12 }, { text: `  ${e.label === e.id ? '' : e.label.replace(e.id, '').replace(/^\s*[(–-]\s*|\)\s*$/g, '')}`, fontSize: fit >= 2 ? 6.5 : 7.5 }],
  });
  const useRows: TableCell[][] = useByNumber(doc, view).map((u) => [
    { text: [{ text: u.eyewear.id, bold: true, fontSize: 11 }, ...(location(u.eyewear.id) ? [{ text: `\n${location(u.eyewear.id)}`, fontSize: 6.5, color: COLOR.muted }] : [])] },
    u.covers.length > 0
      ? { text: [{ text: `USE for ${beamsWord(u.covers)}`, bold: true }, numberRanges(u.covers)], color: COLOR.good, fillColor: COLOR.goodTint }
      : { text: 'no beam in this room', color: COLOR.muted },
    u.mustNot.length > 0
      ? { text: [{ text: `NOT for ${beamsWord(u.mustNot)}`, bold: true, color: COLOR.bad }, numberRanges(u.mustNot)], fillColor: COLOR.badTint }
      : { text: 'usable for every beam in this room', bold: true, color: COLOR.good },
    { text: [{ text: 'marked: ', bold: true }, eyewearMarkings(u.eyewear)], fontSize: 7.5 },
  ]);
  const useEntry = (u: ReturnType<typeof useByNumber>[number]): TableCell => ({
    stack: [
      {
        text: [
          { text: `${u.eyewear.id}  `, bold: true, fontSize: 10 },
          u.covers.length > 0 ? { text: `USE for ${beamsWord(u.covers)}${numberRanges(u.covers)}`, bold: true, color: COLOR.good } : { text: 'no beam in this room', color: COLOR.muted },
          { text: '   ' },
          u.mustNot.length > 0 ? { text: `NOT for ${beamsWord(u.mustNot)}${numberRanges(u.mustNot)}`, bold: true, color: COLOR.bad } : { text: 'usable for every beam here', bold: true, color: COLOR.good },
          ...(location(u.eyewear.id) ? [{ text: `   ${location(u.eyewear.id)}`, fontSize: 6.5, color: COLOR.muted }] : []),
        ],
        fontSize: 8,
      },
      { text: [{ text: 'marked: ', bold: true }, eyewearMarkings(u.eyewear)], fontSize: fit >= 3 ? 6 : 6.5 },
    ],
  });
  const uses = useByNumber(doc, view);
  const perColumn = Math.ceil(uses.length / (fit >= 4 ? 3 : 2));
  const compactUse = (part: typeof uses): Content => ({
    table: { widths: ['*'], dontBreakRows: true, body: part.map((u) => [useEntry(u)]) },
    layout: { hLineWidth: () => 0.6, vLineWidth: () => 0.6, hLineColor: () => '#999999', vLineColor: () => '#999999' },
  });
  const checks = checksSentence(doc);
  const noEyewear = (doc.content.input.eyewear ?? []).length === 0;
  const content: Content[] = [
    {
      columns: [
        {
          width: '*',
          stack: [
            { text: `Laser eyewear — Room ${doc.room.code}`, fontSize: fit >= 4 ? 16 : 20, bold: true, lineHeight: 1 },
            { text: `${doc.room.name ? doc.room.name + ', ' : ''}${doc.site.name}`, fontSize: 11, margin: [0, 0, 0, 3] },
            {
              text:
                covering.length > 0
                  ? [
                      { text: 'Covers every beam here: ', bold: true },
                      ...covering.flatMap((e, i) => [
                        { text: `${i > 0 ? '; ' : ''}${e.label}`, bold: true, color: COLOR.good },
                        { text: e.marking === '' ? '' : `, marked ${e.marking}`, fontSize: 9 },
                      ]),
                    ]
                  : noEyewear
                    ? [{ text: 'No eyewear is listed for this room.', bold: true, color: COLOR.bad }]
                    : [{ text: 'No single eyewear covers every beam here: choose by the beams in use.', bold: true, color: COLOR.bad }],
              fontSize: 13,
            },
            {
              text: 'Eyewear protects only at the wavelengths and levels it is marked for; seeing a visible beam through it is no proof of protection. Check the frame marking before each use.',
              fontSize: fit >= 2 ? 7.5 : 8.5,
              bold: true,
              margin: [0, 2, 0, 0],
            },
          ],
        },
        { width: 290, stack: [fingerprintBlock(doc, 56, 8.5)] },
      ],
    },
    // The caution stands in every page's footer too; a full sheet keeps that one only.
    ...(fit >= 2 ? [] : [{ text: '', margin: [0, 2, 0, 0] } as Content, cautionBlock(10)]),
    { text: noEyewear ? 'What the eyewear must provide' : 'Which eyewear protects against which beam', bold: true, fontSize: fit >= 4 ? 10 : 12, margin: [0, 4, 0, 0] },
    // A room with no eyewear on its shelf still needs the sheet by the door: what to get, per wavelength.
    ...(noEyewear
      ? [
          { text: 'Do not work with the beams exposed until eyewear meeting these values is issued:', bold: true, color: COLOR.bad, fontSize: 10, margin: [0, 0, 0, 3] } as Content,
          requiredEyewearTable(doc, matrixFont + 1),
        ]
      : [coverageMatrix(doc, view, matrixFont, eyewearCell, true, fit >= 2 ? 130 : 92, fit < 3, fit >= 4)]),
    {
      text: view.beams
        .map((b, i) => `${i + 1}: ${b.result.label}`)
        .join('   ·   '),
      fontSize: fit >= 4 ? 5.5 : fit >= 3 ? 6 : 7,
      color: COLOR.muted,
      margin: [0, 0, 0, 4],
    },
    // The officer's checks of the limit-table entries these optical densities rest on (issue 12).
    ...(checks === null ? [] : [{ text: checks, fontSize: fit >= 3 ? 6 : 7, color: COLOR.ink, margin: [0, 0, 0, 4] } as Content]),
    ...(noEyewear ? [] : [{ text: 'Use and do not use (beam numbers as in the matrix)', bold: true, fontSize: fit >= 4 ? 10 : 12, margin: [0, 0, 0, 2] } as Content]),
    noEyewear
      ? { text: '' }
      : compact
      ? { columns: Array.from({ length: Math.ceil(uses.length / perColumn) }, (_, i) => compactUse(uses.slice(i * perColumn, (i + 1) * perColumn))), columnGap: 8 }
      : {
          table: { headerRows: 0, dontBreakRows: true, widths: [112, 130, 150, '*'], body: useRows },
          layout: { hLineWidth: () => 0.6, vLineWidth: () => 0.6, hLineColor: () => '#999999', vLineColor: () => '#999999' },
          fontSize: 8.5,
        },
  ];
  return {
    ...baseDocument(doc, opts.paper, 'Laser eyewear sheet'),
    pageOrientation: 'landscape',
    pageMargins: [SIDE, 30, SIDE, 52],
    header: headerFor(doc, 'Laser eyewear sheet', SIDE),
    footer: footerFor(doc, SIDE, contentWidth(opts.paper, SIDE, true)),
    content,
  };
}
