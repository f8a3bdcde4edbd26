/**
 * The eyewear sheet, posted by the goggle rack: for each eyewear on the shelf, the beams it covers
 * and the beams it must NOT be used for, then the full coverage matrix and what the room needs per
 * wavelength. Landscape, so the matrix has room for every beam.
 */
import type { Content, TableCell, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { DocumentInput, RenderOptions } from '../document-input.js';
import * as fmt from '../format.js';
import { baseDocument, cautionBlock, COLOR, contentWidth, fingerprintBlock, footerFor, headerFor, ruleSetLine } from '../page.js';
import { roomView } from '../room-view.js';
import { coverageMatrix, eyewearMarkings, eyewearUseLists, requiredEyewearTable } from './eyewear-tables.js';

const SIDE = 32;

export function eyewearSheetDefinition(doc: DocumentInput, opts: RenderOptions): TDocumentDefinitions {
  const view = roomView(doc);
  const width = contentWidth(opts.paper, SIDE, true);
  const location = (tag: string): string => doc.eyewearLocations[tag] ?? '';
  const uses = eyewearUseLists(doc, view);
  const rows: TableCell[][] = uses.map((u) => [
    {
      stack: [
        { text: u.eyewear.id, bold: true, fontSize: 16 },
        { text: u.eyewear.label, fontSize: 9 },
        ...(location(u.eyewear.id) ? [{ text: `kept at: ${location(u.eyewear.id)}`, fontSize: 8.5, color: COLOR.muted }] : []),
      ],
    },
    { text: eyewearMarkings(u.eyewear), fontSize: 8.5 },
    u.covers.length > 0
      ? { stack: u.covers.map((c) => ({ text: c, bold: true, color: COLOR.good })), fontSize: 10, fillColor: COLOR.goodTint }
      : { text: 'no beam in this room', color: COLOR.muted, fontSize: 10 },
    u.mustNot.length > 0
      ? { stack: [{ text: 'DO NOT USE FOR', bold: true, color: COLOR.bad, fontSize: 10 }, ...u.mustNot.map((c) => ({ text: c, fontSize: 8.5 }))], fillColor: COLOR.badTint }
      : { text: 'usable for every beam in this room', bold: true, color: COLOR.good, fontSize: 10 },
  ]);
  const covering = doc.results.eyewearCoveringAll;
  const content: Content[] = [
    {
      columns: [
        {
          width: '*',
          stack: [
            { text: `Laser eyewear — Room ${doc.room.code}`, fontSize: 22, bold: true },
            { text: `${doc.room.name ? doc.room.name + ', ' : ''}${doc.site.name}`, fontSize: 12, margin: [0, 0, 0, 4] },
            {
              text:
                covering.length > 0
                  ? [{ text: 'Covers every beam here: ', bold: true }, { text: covering.join(', '), bold: true, color: COLOR.good }]
                  : [{ text: 'No single eyewear covers every beam here: choose by the beams in use (table below).', bold: true, color: COLOR.bad }],
              fontSize: 14,
            },
          ],
        },
        { width: 230, stack: [fingerprintBlock(doc, 58, 8.5)] },
      ],
    },
    { text: '', margin: [0, 4, 0, 0] },
    cautionBlock(10),
    { text: 'Which eyewear for which beam', bold: true, fontSize: 13, margin: [0, 8, 0, 3] },
    {
      table: {
        headerRows: 1,
        dontBreakRows: true,
        widths: [110, 160, '*', '*'],
        body: [[{ text: 'Eyewear', bold: true }, { text: 'Marked for', bold: true }, { text: 'Use for', bold: true }, { text: 'Must not be used for', bold: true }], ...rows],
      },
      layout: {
        hLineWidth: () => 0.8,
        vLineWidth: () => 0.8,
        hLineColor: () => '#444444',
        vLineColor: () => '#444444',
        fillColor: (row: number) => (row === 0 ? COLOR.tint : null),
      },
      fontSize: 9,
    },
    { text: 'What the room needs', bold: true, fontSize: 13, margin: [0, 8, 0, 3] },
    requiredEyewearTable(doc, 10),
    { text: 'Coverage matrix', bold: true, fontSize: 13, margin: [0, 6, 0, 3] },
    coverageMatrix(doc, view, 8),
    {
      text: view.beams.map((b, i) => `${i + 1}. ${b.result.label} (${fmt.wavelength(b.result.wavelength_nm)}, ${fmt.od(b.result.odRequired)}, ${fmt.scaleNumbers(b.result.scaleNumbers)})`).join('   ·   '),
      fontSize: 7.5,
      color: COLOR.muted,
    },
    { text: 'Eyewear protects only at the wavelengths and levels it is marked for; a visible beam seen through it is no proof of protection. Check the frame marking before each use.', fontSize: 9, margin: [0, 6, 0, 0] },
    { ...ruleSetLine(doc, 8), margin: [0, 3, 0, 0] },
  ];
  void width;
  return {
    ...baseDocument(doc, opts.paper, 'Laser eyewear sheet'),
    pageOrientation: 'landscape',
    pageMargins: [SIDE, 40, SIDE, 62],
    header: headerFor(doc, 'Laser eyewear sheet', SIDE),
    footer: footerFor(doc, SIDE),
    content,
  };
}
