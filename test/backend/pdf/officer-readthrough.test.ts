// @vitest-environment node
/**
 * The demo site's printed documents read as a laser safety officer and an auditor read them (the
 * owner's rule: professional words, numbers in engineering notation with units, no developer
 * message, no heading stranded at a page foot, nothing spilling out of its cell). Real pdfmake, real
 * record store, text read back with poppler's pdftotext; no mocks. The demo site is invented
 * (assets/demo/demo-scenario.json): these are checks of wording and layout, not of values.
 *
 * Sources for the wording: EN 207:2017 clause 7 (frame marking: mode letter, wavelength, LB scale
 * number), EN 208:2009 (RB scale numbers); ISO 80000-1:2009 clause 7 (a number and its unit are
 * separated by a space and not split; "≥" for "greater than or equal to"). Keeping a heading with
 * the text it introduces is common practice in document layout.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { renderDoorNotice, renderEyewearSheet, renderReport, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { layoutText, pageTexts } from './pdf-tools.js';
import { useDemoRegister } from './demo-register.js';

const A4_SI: RenderOptions = { paper: 'A4', units: 'SI' };
const demo = useDemoRegister('bw-pdf-readthrough-');

function docOf(code: string) {
  return demo.documentOf(code);
}

describe('the assessment report (room B2.16: two beams of one laser add on the retina)', () => {
  let pages: string[] = [];
  /** The report's body: everything before the derivation appendix (whose step text is another check's business). */
  let whole = '';
  beforeAll(async () => {
    pages = pageTexts(await renderReport(await docOf('B2.16'), A4_SI));
    const all = pages.join(' ');
    const appendix = all.indexOf('Appendix — derivations');
    expect(appendix, 'the appendix heading').toBeGreaterThan(0);
    whole = all.slice(0, appendix);
  }, 120_000);

  it('the heading of the added-beams section shares its page with the first group (common practice: no heading at a page foot)', () => {
    const page = pages.find((p) => p.includes('Beams acting on the same tissue and effect (added)'));
    expect(page, 'a page with the heading').toBeDefined();
    expect(page ?? '').toMatch(/Beams acting on the same tissue and effect \(added\) .*sum of exposure\/limit fractions/);
  });

  it('a sum of fractions in the millions is printed in engineering notation, not as a string of zeros (ISO 80000-1 clause 7)', () => {
    const sums = [...whole.matchAll(/sum of exposure\/limit fractions (\S+(?: × 10\S+)?)/g)].map((m) => m[1] ?? '');
    expect(sums.length).toBeGreaterThan(0);
    for (const s of sums) expect(s, s).not.toMatch(/\d{5,}|e[+-]?\d/);
    expect(whole).toContain('sum of exposure/limit fractions 5.27 × 10⁶');
  });

  it('an eyewear that falls short names the marked and the needed scale number in words (EN 207:2017 clause 7), no "TOO LOW" or "<"', () => {
    expect(whole).not.toContain('TOO LOW');
    expect(whole).not.toMatch(/LB\d+ < LB\d+/);
    expect(whole).toContain('D LB5 marked, D LB6 needed');
  });

  it('the advice writes "≥", not the programmer\'s ">="', () => {
    expect(whole).not.toContain('>=');
    expect(whole).toContain('needs OD ≥ 3.8');
  });

  it('the summary says where a governing row such as "H-E-VIS-4" is cited (document, table), so an auditor can follow it', () => {
    expect(whole).toContain('row H-E-VIS-4');
    expect(whole).toContain('Row: the exposure-limit table row the limit comes from; its published source (document, edition, table) is named under "Limit-table rows used" in the appendix.');
    expect(pages.join(' ')).toMatch(/Limit-table rows used .*H-E-VIS-4/);
  });

  it('a marked band from 9 µm to 11 µm keeps one unit for both ends', () => {
    expect(whole).not.toContain('9000–11 µm');
    expect(whole).toContain('OD 7 at 9–11 µm');
  });
});

describe('the eyewear sheet (room B2.14)', () => {
  let text = '';
  beforeAll(async () => {
    text = layoutText(await renderEyewearSheet(await docOf('B2.14'), A4_SI));
  }, 120_000);

  it('one beam is "beam 3", several are "beams 4, 6, 7"', () => {
    expect(text).not.toMatch(/USE for beams \d+(?![\d,–])/);
    expect(text).toContain('USE for beam 3');
    expect(text).toContain('USE for beams 4, 6, 7');
  });

  it('the same 9–11 µm band as the report', () => {
    expect(text).toContain('OD 7 at 9–11 µm');
  });

  it('a percentage stays on one line with its number (ISO 80000-1 clause 7)', () => {
    expect(text).not.toMatch(/\d\s*\n\s*%/);
  });
});

describe('the door notice (room A0.07: classes 3B and 1M)', () => {
  let text = '';
  beforeAll(async () => {
    text = layoutText(await renderDoorNotice(await docOf('A0.07'), A4_SI));
  }, 120_000);

  it('the class in the lasers table reads on one line ("Class 3B", not "Class" above "3B")', () => {
    expect(text).toMatch(/Class 3B/);
    expect(text).toMatch(/Class 1M/);
  });

  it('the emergency heading reads as a sentence: "In an emergency, call"', () => {
    expect(text).toContain('In an emergency, call');
  });
});
