// @vitest-environment node
/**
 * The report's appendix prints the derivation's numbers in engineering notation with SI prefixes
 * and every figure kept, as the derivation window shows them (test/renderer/trace-numbers.test.ts
 * renders the window for the same cases). Read back with poppler's pdftotext. Cases and their
 * sources: test/support/trace-numbers-cases.ts.
 */
import { describe, expect, it } from 'vitest';
import { renderReport } from '../../../electron/backend/pdf/index.js';
import { benchDocument } from './ten-laser-room.js';
import { pageTexts } from './pdf-tools.js';
import { TRACE_NUMBERS_CASES } from '../../support/trace-numbers-cases.js';

/** pdftotext breaks lines where the page did and keeps the narrow no-break space of digit groups. */
function squash(s: string): string {
  return s.replace(/\s+/g, ' ');
}

describe('the appendix prints the derivation numbers as the officer reads them', () => {
  it.each(TRACE_NUMBERS_CASES)('$what', async ({ room, readable, raw }) => {
    const text = squash(pageTexts(await renderReport(benchDocument(room), { paper: 'A4', units: 'SI' })).join(' '));
    for (const r of readable) expect(text).toContain(r);
    for (const r of raw) expect(text).not.toContain(r);
  });
});
