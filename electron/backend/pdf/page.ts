/**
 * Page furniture shared by the three documents: paper, colours, the caution block, the DRAFT mark,
 * the rule-set line and the fingerprint block with its QR code.
 */
import type { Content, ContentText, DynamicContent, TDocumentDefinitions, Watermark } from 'pdfmake/interfaces';
import { RESULT_CAUTION } from '../../../core/model/results.js';
import type { DocumentInput, Paper } from './document-input.js';
import { calendarDate, shortFingerprint } from './format.js';
import { checksSentence } from './row-checks.js';
import { inPieces, pieces } from './text-pieces.js';

export const PAGE_SIZE: Readonly<Record<Paper, 'A4' | 'LETTER'>> = { A4: 'A4', Letter: 'LETTER' };

/** Printable width in points for the given paper and side margins. */
export function contentWidth(paper: Paper, sideMargin: number, landscape = false): number {
  const [w, h] = paper === 'A4' ? [595.28, 841.89] : [612, 792];
  return (landscape ? h : w) - 2 * sideMargin;
}

export const COLOR = {
  ink: '#111111',
  muted: '#555555',
  rule: '#999999',
  tint: '#F2F2F2',
  draft: '#C8102E',
  bad: '#B00020',
  badTint: '#FBE3E6',
  good: '#1B6E2E',
  goodTint: '#E2F2E5',
  caution: '#FFF4CC',
  cautionEdge: '#B38600',
} as const;

export const DRAFT_HEADER = 'DRAFT — NOT SIGNED';

export function isDraft(doc: DocumentInput): boolean {
  return doc.signature === null;
}

/** The DRAFT watermark across every page of an unsigned document. */
export function draftWatermark(doc: DocumentInput): Watermark | undefined {
  return isDraft(doc) ? { text: 'DRAFT', color: COLOR.draft, opacity: 0.13, bold: true, fontSize: 150 } : undefined;
}

/**
 * The caution sentence in a framed, tinted block: visible, never fine print. With `doc`, the rule
 * set and its edition follow inside the same block.
 */
export function cautionBlock(fontSize: number, doc?: DocumentInput): Content {
  return {
    unbreakable: true,
    table: {
      widths: ['*'],
      body: [
        [
          {
            stack: [
              { text: RESULT_CAUTION, bold: true, fontSize, color: COLOR.ink },
              ...(doc === undefined ? [] : [{ ...ruleSetLine(doc, fontSize - 1.5), margin: [0, 1, 0, 0] } as Content]),
              ...(doc === undefined ? [] : checksContent(doc, fontSize - 1.5)),
            ],
            margin: [6, 4, 6, 4],
          },
        ],
      ],
    },
    layout: {
      fillColor: () => COLOR.caution,
      hLineColor: () => COLOR.cautionEdge,
      vLineColor: () => COLOR.cautionEdge,
      hLineWidth: () => 1.2,
      vLineWidth: () => 1.2,
    },
  };
}

/** The officer's checks of the rows these figures use (issue 12), cited in words; nothing when none. */
function checksContent(doc: DocumentInput, fontSize: number): Content[] {
  const sentence = checksSentence(doc);
  return sentence === null ? [] : [{ text: sentence, fontSize, color: COLOR.ink, margin: [0, 1, 0, 0] }];
}

export function ruleSetLine(doc: DocumentInput, fontSize: number): ContentText {
  const conservative = doc.content.input.settings?.conservative !== false;
  return {
    text: [
      { text: 'Rule set: ', bold: true },
      doc.results.ruleSetName,
      conservative ? ' · conservative mode on' : ' · conservative mode OFF',
    ],
    fontSize,
  };
}

/**
 * The record fingerprint in short form with a QR code holding the full SHA-256, or the statement
 * that a draft has none.
 */
/** A key id as officers read it: the first 20 hex digits in groups of four (as the app shows it). */
function keyFingerprint(keyId: string): string {
  return (keyId.slice(0, 20).match(/.{4}/g) ?? []).join(' ');
}

export function fingerprintBlock(doc: DocumentInput, qrSize: number, fontSize: number): Content {
  if (doc.signature === null) {
    return {
      text: [
        { text: `${DRAFT_HEADER}. `, bold: true, color: COLOR.draft },
        'A draft has no record fingerprint; sign the assessment before posting or filing this document.',
      ],
      fontSize,
    };
  }
  const s = doc.signature;
  return {
    columns: [
      { qr: s.fingerprint, fit: qrSize, eccLevel: 'M', width: 'auto' },
      {
        width: '*',
        margin: [8, 0, 0, 0],
        stack: [
          { text: 'Record fingerprint', bold: true, fontSize },
          { text: shortFingerprint(s.fingerprint), fontSize: fontSize + 2, bold: true, characterSpacing: 0.5 },
          s.keyTrusted
            ? { text: `Signed by ${s.name} (${s.role}) on ${calendarDate(s.signedAt)}`, fontSize: fontSize - 1 }
            : { text: `UNVERIFIED SIGNATURE in the name of ${s.name}: the signing key is not on this installation's trust list`, bold: true, color: COLOR.draft, fontSize: fontSize - 1 },
          { text: `Signing key ${keyFingerprint(s.keyId)} · trust anchor ${s.trustAnchor ?? 'none'}`, fontSize: fontSize - 1, color: COLOR.muted },
          { text: `Assessment revision ${doc.assessment.revisionNo} · the QR code holds the full SHA-256 fingerprint`, fontSize: fontSize - 1, color: COLOR.muted },
        ],
      },
    ],
  };
}

/** The fingerprint as a narrow stack (QR above, short form below), for the door notice. */
export function fingerprintStack(doc: DocumentInput, qrSize: number, fontSize: number): Content {
  if (doc.signature === null) {
    return { text: [{ text: `${DRAFT_HEADER}\n`, bold: true, color: COLOR.draft, fontSize: fontSize + 4 }, 'No record fingerprint: do not post a draft.'], fontSize };
  }
  return {
    stack: [
      { qr: doc.signature.fingerprint, fit: qrSize, eccLevel: 'M' },
      { text: 'Record fingerprint', bold: true, fontSize: fontSize - 1, margin: [0, 2, 0, 0] },
      { text: shortFingerprint(doc.signature.fingerprint), bold: true, fontSize },
      { text: `rev. ${doc.assessment.revisionNo}, signed ${calendarDate(doc.signature.signedAt)}`, fontSize: fontSize - 1.5, color: COLOR.muted },
      { text: `trust anchor ${doc.signature.trustAnchor ?? 'none'}`, fontSize: fontSize - 1.5, color: COLOR.muted },
      ...(doc.signature.keyTrusted ? [] : [{ text: 'UNVERIFIED SIGNATURE', bold: true, color: COLOR.draft, fontSize } as Content]),
      ...(doc.signature.coSigners ?? []).map(
        (c): Content => (c.keyTrusted ? { text: `co-signed by ${c.name}`, fontSize: fontSize - 1.5, color: COLOR.muted } : { text: `UNVERIFIED CO-SIGNATURE (${c.name})`, bold: true, color: COLOR.draft, fontSize: fontSize - 1.5 }),
      ),
      ...(doc.assessment.status === 'superseded' ? [{ text: 'SUPERSEDED: replace this notice', bold: true, color: COLOR.draft, fontSize } as Content] : []),
    ],
  };
}

export function headerFor(doc: DocumentInput, title: string, sideMargin: number): DynamicContent {
  const where = `${doc.site.name}${doc.site.building ? ', ' + doc.site.building : ''} · Room ${doc.room.code}`;
  return () => ({
    margin: [sideMargin, 18, sideMargin, 0],
    columns: [
      // in pieces (text-pieces.ts): the header is laid out again on every page
      inPieces({ text: [{ text: title, bold: true }, `  ·  ${where}`], fontSize: 8.5, color: COLOR.muted }),
      isDraft(doc)
        ? { text: DRAFT_HEADER, bold: true, color: COLOR.draft, fontSize: 10, alignment: 'right', width: 'auto' }
        : doc.assessment.status === 'superseded'
          ? { text: `SUPERSEDED — revision ${doc.assessment.revisionNo}, signed ${calendarDate(doc.signature?.signedAt)}`, bold: true, color: COLOR.draft, fontSize: 10, alignment: 'right', width: 'auto' }
          : doc.signature?.keyTrusted === false
            ? { text: `Revision ${doc.assessment.revisionNo} · UNVERIFIED SIGNATURE`, bold: true, color: COLOR.draft, fontSize: 10, alignment: 'right', width: 'auto' }
            : {
            text: `Revision ${doc.assessment.revisionNo} · signed ${calendarDate(doc.signature?.signedAt)}`,
            fontSize: 8.5,
            color: COLOR.muted,
            alignment: 'right',
            width: 'auto',
          },
    ],
  });
}

/**
 * The caution as a tinted band drawn with a canvas rectangle under the text: it looks like the
 * framed block but costs a fraction of a table when repeated on every page of a long report.
 */
export function cautionBand(width: number, fontSize: number): Content {
  const h = fontSize * 1.15 + 8;
  return {
    stack: [
      { canvas: [{ type: 'rect', x: 0, y: 0, w: width, h, color: COLOR.caution, lineColor: COLOR.cautionEdge, lineWidth: 1.2 }] },
      { text: pieces(RESULT_CAUTION, {}), bold: true, fontSize, color: COLOR.ink, relativePosition: { x: 6, y: -h + 4 } },
    ],
  };
}

export function footerFor(doc: DocumentInput, sideMargin: number, width: number): DynamicContent {
  const fp =
    doc.signature === null
      ? 'no fingerprint (draft)'
      : `fingerprint ${shortFingerprint(doc.signature.fingerprint)} · trust anchor ${doc.signature.trustAnchor ?? 'none'}${doc.signature.keyTrusted ? '' : ' · UNVERIFIED SIGNATURE'}`;
  return (currentPage: number, pageCount: number) => ({
    margin: [sideMargin, 6, sideMargin, 0],
    stack: [
      cautionBand(width, 8.5),
      {
        margin: [0, 3, 0, 0],
        columns: [
          { ...ruleSetLine(doc, 7), width: '*' },
          // in pieces (text-pieces.ts): the footer is laid out again on every page; one line in its column
          { text: pieces(`${fp} · page ${currentPage} of ${pageCount}`, {}), fontSize: 7, alignment: 'right', width: 300 },
        ],
        columnGap: 8,
      },
    ],
  });
}

export function baseDocument(doc: DocumentInput, paper: Paper, title: string): Partial<TDocumentDefinitions> {
  return {
    pageSize: PAGE_SIZE[paper],
    info: {
      title: `${title} – Room ${doc.room.code}`,
      author: doc.signature?.name ?? doc.officer.name,
      subject: `${title}; ${doc.results.ruleSetName}`,
      creator: 'Beamwarden',
      producer: 'Beamwarden (pdfmake)',
    },
    defaultStyle: { font: 'Roboto', fontSize: 9.5, color: COLOR.ink, lineHeight: 1.15 },
    ...(draftWatermark(doc) ? { watermark: draftWatermark(doc) } : {}),
  };
}
