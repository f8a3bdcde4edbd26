// @vitest-environment node
/**
 * The printed report names the correction factors with the same words as the result card and the
 * derivation window (test/renderer/factor-words.test.ts renders those for the same cases): one
 * source of the words, core/model/factor-words.ts. Read back with poppler's pdftotext. Cases and
 * their sources: test/support/factor-words-cases.ts.
 */
import { describe, expect, it } from 'vitest';
import { evaluateRoom } from '../../../core/index.js';
import { renderReport } from '../../../electron/backend/pdf/index.js';
import { benchDocument } from './ten-laser-room.js';
import { pageTexts, readBack } from './pdf-tools.js';
import { FACTOR_WORDS_CASES } from '../../support/factor-words-cases.js';

describe('the report names each factor as the card and the derivation window do', () => {
  it.each(FACTOR_WORDS_CASES)('$what', async ({ room, warningWords, stepWords }) => {
    const beam = evaluateRoom(room).beams[0];
    if (!beam) throw new Error('no beam result');
    const text = pageTexts(await renderReport(benchDocument(room), { paper: 'A4', units: 'SI' })).join(' ');
    // the symbols' subscripts are lowered on paper (core/units/formula-text.ts); pdftotext reads them inline
    for (const w of warningWords) expect(text).toContain(readBack(w));
    for (const w of stepWords) expect(text).toContain(`${readBack(w)}:`);
    // the old words ("correction factor CA" set on one line) cannot be told by pdftotext from the
    // lowered subscript it reads inline; test/renderer/factor-words.test.ts tells them apart on screen,
    // and the underscore form is refused on paper by officer-words-readthrough.test.ts
    expect(text).not.toMatch(/\bfactor C_[ABCEP]\b/);
  });
});
