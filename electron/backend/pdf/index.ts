/**
 * Printed output: the assessment report, the door hazard notice and the eyewear sheet as PDF.
 * Plain Node (pdfmake 0.3), usable from the Electron main process, the loopback host and the CLI.
 */
import type { DocumentInput, RenderOptions } from './document-input.js';
import { renderPdf } from './runtime.js';
import { pdfPageCount } from './page-count.js';
import { reportDefinition } from './documents/report.js';
import { doorNoticeDefinition, NOTICE_FIT_LEVELS } from './documents/door-notice.js';
import { eyewearSheetDefinition, SHEET_FIT_LEVELS } from './documents/eyewear-sheet.js';

export type { DocumentInput, RenderOptions, Paper, InstallationInfo, SignatureInfo } from './document-input.js';
export { renderOptionsSchema, DEFAULT_RENDER_OPTIONS } from './document-input.js';
export { documentInputFromAssessment } from './from-assessment.js';

export function renderReport(doc: DocumentInput, opts: RenderOptions): Promise<Buffer> {
  return renderPdf(reportDefinition(doc, opts));
}

export { pdfPageCount } from './page-count.js';
export { renderSiteDoorNotices, type SiteBatch } from './site-batch.js';
export { renderSiteReports, type SiteReports, type SiteReportRoom } from './site-reports.js';

/**
 * The door notice is one page, whatever the room: when the content does not fit, it is set again
 * with the details given less room (the signal word, symbol and eyewear line keep their size first).
 */
export async function renderDoorNotice(doc: DocumentInput, opts: RenderOptions): Promise<Buffer> {
  let pdf = await renderPdf(doorNoticeDefinition(doc, opts, 0));
  for (let fit = 1; fit < NOTICE_FIT_LEVELS && pdfPageCount(pdf) > 1; fit++) pdf = await renderPdf(doorNoticeDefinition(doc, opts, fit));
  return pdf;
}

/** The eyewear sheet is one page for rooms up to 10 lasers and 10 eyewear items: set again tighter when it would spill. */
export async function renderEyewearSheet(doc: DocumentInput, opts: RenderOptions): Promise<Buffer> {
  let pdf = await renderPdf(eyewearSheetDefinition(doc, opts, 0));
  for (let fit = 1; fit < SHEET_FIT_LEVELS && pdfPageCount(pdf) > 1; fit++) pdf = await renderPdf(eyewearSheetDefinition(doc, opts, fit));
  return pdf;
}

export type DocumentKind = 'report' | 'door-notice' | 'eyewear-sheet';

export const DOCUMENT_FILE_NAME: Readonly<Record<DocumentKind, string>> = {
  report: 'assessment-report',
  'door-notice': 'door-notice',
  'eyewear-sheet': 'eyewear-sheet',
};

/** Render one of the three documents by kind (the UI's print/save actions use this). */
export function renderDocument(kind: DocumentKind, doc: DocumentInput, opts: RenderOptions): Promise<Buffer> {
  switch (kind) {
    case 'report':
      return renderReport(doc, opts);
    case 'door-notice':
      return renderDoorNotice(doc, opts);
    case 'eyewear-sheet':
      return renderEyewearSheet(doc, opts);
  }
}
