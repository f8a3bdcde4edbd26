// @vitest-environment node
/**
 * An eyewear sheet for a room whose shelf is empty: printed (it once stopped the printer), on one
 * page, telling the reader that no eyewear is listed and what each wavelength needs (required OD
 * and EN 207 / EN 208 scale numbers, as in the report). derived: the sheet by the door must still
 * say what to fetch; EN 207:2017 and EN 208:2009 give the scale numbers it lists.
 */
import { describe, expect, it } from 'vitest';
import { renderEyewearSheet } from '../../../electron/backend/pdf/index.js';
import { layoutText, pdfInfo } from './pdf-tools.js';
import { generatedDocument } from './generated-rooms.js';

describe('an empty eyewear shelf', () => {
  for (const lasers of [1, 2])
    it(`${lasers} laser${lasers === 1 ? '' : 's'}, no eyewear: one page naming what is needed`, async () => {
      const doc = generatedDocument({ lasers, eyewear: 0 });
      expect(doc.content.input.eyewear ?? []).toHaveLength(0);
      const pdf = await renderEyewearSheet(doc, { paper: 'A4', units: 'SI' });
      expect(pdfInfo(pdf).pages).toBe(1);
      const text = layoutText(pdf);
      expect(text).toContain('No eyewear is listed for this room');
      expect(text).toContain('Required OD');
      expect(text).toContain('What the eyewear must provide');
      expect(text).not.toContain('No single eyewear covers');
      expect(doc.results.requiredEyewear.length).toBeGreaterThan(0);
      expect(text).not.toContain('Use and do not use');
    }, 60_000);
});
