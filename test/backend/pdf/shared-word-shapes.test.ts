/**
 * Word shapes are shared across documents (electron/backend/pdf/shared-fonts.ts) to print faster.
 * Sharing must not change a single byte of what is printed: a document set with pdfkit's own
 * per-document cache and one set from the shapes shared by earlier documents are the same file, apart from the
 * creation date and the file identifier pdfkit writes. (Self-consistency check of the printing
 * machinery; no published source.)
 */
import { describe, expect, it } from 'vitest';
import { renderDoorNotice, renderEyewearSheet, renderReport, type DocumentInput, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { clearSharedWordLayouts, setWordShapeSharing } from '../../../electron/backend/pdf/shared-fonts.js';
import { benchDocument, tenLaserRoom } from './ten-laser-room.js';

/** The PDF as text, without the two things that differ between any two renders (date, file id). */
function normalised(pdf: Buffer): string {
  return pdf
    .toString('latin1')
    .replace(/\(D:\d{14}Z\)/g, '(D:)')
    .replace(/\/ID \[[^\]]*\]/g, '/ID []');
}

const doc: DocumentInput = benchDocument(tenLaserRoom());

const cases: ReadonlyArray<{ what: string; opts: RenderOptions; render: (d: DocumentInput, o: RenderOptions) => Promise<Buffer> }> = [
  { what: 'report, A4, SI', opts: { paper: 'A4', units: 'SI' }, render: renderReport },
  { what: 'door notice, Letter', opts: { paper: 'Letter', units: 'ANSI' }, render: renderDoorNotice },
  { what: 'eyewear sheet, Letter', opts: { paper: 'Letter', units: 'SI' }, render: renderEyewearSheet },
];

describe('shared word shapes leave the printed file unchanged', () => {
  it.each(cases)('$what: shaped per document = shaped from the shared cache', async ({ opts, render }) => {
    setWordShapeSharing(false);
    let own: Buffer;
    try {
      own = await render(doc, opts); // pdfkit's own per-document cache only
    } finally {
      setWordShapeSharing(true);
    }
    clearSharedWordLayouts();
    // The words of the other documents first, then this one from the shared shapes.
    for (const c of cases) if (c.opts !== opts) await c.render(doc, c.opts);
    const shared = await render(doc, opts);
    expect(normalised(shared)).toBe(normalised(own));
  }, 120_000);
});
