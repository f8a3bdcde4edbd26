/**
 * Door notices of every room of a site in one PDF, for printing them all at once: each room's
 * current revision, one page each, set at the size that keeps that room's notice on one page. A
 * draft's page carries the DRAFT mark; a signed room's page does not.
 */
import type { Content, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { RecordStore } from '../records/types.js';
import type { RenderOptions } from './document-input.js';
import { doorNoticeDefinition, NOTICE_FIT_LEVELS } from './documents/door-notice.js';
import { documentInputFromAssessment } from './from-assessment.js';
import { COLOR } from './page.js';
import { renderPdf } from './runtime.js';
import { pdfPageCount } from './page-count.js';

export interface SiteBatch {
  readonly pdf: Buffer;
  /** Room codes in page order. */
  readonly rooms: readonly string[];
}

export async function renderSiteDoorNotices(store: RecordStore, siteId: string, opts: RenderOptions): Promise<SiteBatch> {
  const pages: Content[] = [];
  const rooms: string[] = [];
  const drafts = new Set<number>();
  let first: TDocumentDefinitions | null = null;
  for (const room of await store.listRooms(siteId)) {
    const assessment = (await store.listAssessments(room.id))[0];
    if (assessment === undefined) continue;
    const doc = await documentInputFromAssessment(store, assessment.id);
    let fit = 0;
    let dd = doorNoticeDefinition(doc, opts, fit);
    while (fit < NOTICE_FIT_LEVELS - 1 && pdfPageCount(await renderPdf(dd)) > 1) dd = doorNoticeDefinition(doc, opts, ++fit);
    first ??= dd;
    if (doc.signature === null) drafts.add(rooms.length + 1);
    pages.push({ stack: dd.content as Content[], ...(rooms.length > 0 ? { pageBreak: 'before' as const } : {}) });
    rooms.push(room.code);
  }
  if (first === null) throw new Error('siteId: no room of this site has an assessment to print');
  const { watermark: _ignored, ...base } = first;
  void _ignored;
  const dd: TDocumentDefinitions = {
    ...base,
    // Dense margins for all: a notice that fits with wider margins fits with these too.
    pageMargins: [30, 16, 30, 10],
    info: { ...base.info, title: 'Door notices of every room' },
    content: pages,
    background: (page: number) => (drafts.has(page) ? { text: 'DRAFT', color: COLOR.draft, opacity: 0.13, bold: true, fontSize: 150, alignment: 'center', margin: [0, 300, 0, 0] } : null),
  };
  return { pdf: await renderPdf(dd), rooms };
}
