/**
 * The assessment reports of every room of a site, for printing them all at once: each room's
 * current revision, exactly as its own report prints (same pages, same header and footer, its own
 * "page X of N"), one after another in one PDF, and each room's report as its own file too (the
 * command line writes those into a folder). A draft room's pages carry the DRAFT mark; a signed
 * room's pages do not.
 *
 * How the numbering stays per room: each report is first set on its own (that is also the room's
 * own file), which gives its page count; the combined document then starts every report on a new
 * page with the same margins and page-break rule, so the reports fall on the same pages as alone,
 * and the header and footer of each page are those of the room the page belongs to, numbered
 * within that room. The combined page count is checked against the sum, so a numbering that could
 * be wrong is never printed.
 */
import type { Content, DynamicContent, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { RecordStore } from '../records/types.js';
import type { DocumentInput, RenderOptions } from './document-input.js';
import { reportDefinition } from './documents/report.js';
import { documentInputFromAssessment } from './from-assessment.js';
import { COLOR, isDraft } from './page.js';
import { renderPdf } from './runtime.js';
import { pdfPageCount } from './page-count.js';

export interface SiteReportRoom {
  readonly code: string;
  readonly name: string;
  readonly revisionNo: number;
  readonly draft: boolean;
  /** First page of this room's report in the combined PDF (1-based) and its number of pages. */
  readonly firstPage: number;
  readonly pages: number;
  /** This room's report on its own. */
  readonly pdf: Buffer;
}

export interface SiteReports {
  readonly pdf: Buffer;
  /** Rooms in page order (rooms without an assessment are left out). */
  readonly rooms: readonly SiteReportRoom[];
}

interface Part {
  readonly doc: DocumentInput;
  readonly dd: TDocumentDefinitions;
  readonly pdf: Buffer;
  readonly firstPage: number;
  readonly pages: number;
}

function dynamic(d: TDocumentDefinitions['header']): DynamicContent | undefined {
  return typeof d === 'function' ? d : undefined;
}

export async function renderSiteReports(store: RecordStore, siteId: string, opts: RenderOptions): Promise<SiteReports> {
  const parts: Part[] = [];
  let next = 1;
  for (const room of await store.listRooms(siteId)) {
    const assessment = (await store.listAssessments(room.id))[0];
    if (assessment === undefined) continue;
    const doc = await documentInputFromAssessment(store, assessment.id);
    const dd = reportDefinition(doc, opts);
    const pdf = await renderPdf(dd);
    const pages = pdfPageCount(pdf);
    parts.push({ doc, dd, pdf, firstPage: next, pages });
    next += pages;
  }
  const first = parts[0];
  if (first === undefined) throw new Error('siteId: no room of this site has an assessment to print');
  const partOf = (page: number): { part: Part; local: number } => {
    const part = parts.find((p) => page >= p.firstPage && page < p.firstPage + p.pages) ?? (parts[parts.length - 1] as Part);
    return { part, local: page - part.firstPage + 1 };
  };
  const { watermark: _w, header: _h, footer: _f, content: _c, info, ...base } = first.dd;
  void _w;
  void _h;
  void _f;
  void _c;
  const dd: TDocumentDefinitions = {
    ...base,
    info: { ...info, title: `Laser hazard assessments of every room (${parts.length} rooms)` },
    content: parts.map((p, i): Content => ({ stack: p.dd.content as Content[], ...(i > 0 ? { pageBreak: 'before' as const } : {}) })),
    header: (page, _count, size) => {
      const { part, local } = partOf(page);
      return dynamic(part.dd.header)?.(local, part.pages, size) ?? null;
    },
    footer: (page, _count, size) => {
      const { part, local } = partOf(page);
      return dynamic(part.dd.footer)?.(local, part.pages, size) ?? null;
    },
    // The DRAFT mark of a draft room's own report, on that room's pages only.
    background: (page: number) =>
      isDraft(partOf(page).part.doc) ? { text: 'DRAFT', color: COLOR.draft, opacity: 0.13, bold: true, fontSize: 150, alignment: 'center', margin: [0, 300, 0, 0] } : null,
  };
  const pdf = await renderPdf(dd);
  const total = pdfPageCount(pdf);
  if (total !== next - 1) {
    throw new Error(`The reports of this site set together took ${total} pages instead of ${next - 1}; print the rooms one by one.`);
  }
  return {
    pdf,
    rooms: parts.map((p) => ({ code: p.doc.room.code, name: p.doc.room.name, revisionNo: p.doc.assessment.revisionNo, draft: isDraft(p.doc), firstPage: p.firstPage, pages: p.pages, pdf: p.pdf })),
  };
}
