// @vitest-environment node
/**
 * The assessment report says only what its pages show (the owner's rule: every page is read by an
 * officer and an auditor; a document never claims what it does not show). Demo rooms (invented,
 * assets/demo/demo-scenario.json), real pdfmake, real record store, text read back with poppler's
 * pdftotext; no mocks. These are checks of wording, not of values.
 *
 * Sources: ISO 80000-1:2009 clause 7 (a number and its unit separated by a space; µm as the unit
 * the trade uses above 10 µm is common practice in far-infrared work, e.g. "CO2 laser, 10.6 µm");
 * three significant figures for a printed label is common practice (the result card prints the
 * same figure).
 */
import { describe, expect, it } from 'vitest';
import { renderReport, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { pageTexts, readBack } from './pdf-tools.js';
import { useDemoRegister } from './demo-register.js';
import { factorWords } from '../../../core/model/factor-words.js';

const A4_SI: RenderOptions = { paper: 'A4', units: 'SI' };
const demo = useDemoRegister('bw-pdf-says-');
const textOf = new Map<string, string>();

/** The report of a demo room, all pages joined, up to the derivation appendix. */
async function reportBody(code: string): Promise<string> {
  const hit = textOf.get(code);
  if (hit !== undefined) return hit;
  const all = pageTexts(await renderReport(await demo.documentOf(code), A4_SI)).join(' ');
  const appendix = all.indexOf('Appendix — derivations');
  const body = appendix > 0 ? all.slice(0, appendix) : all;
  textOf.set(code, body);
  return body;
}

describe('the summary legend of the Diffuse column', () => {
  const cases = [
    // room B2.16: no beam has a diffuse surface entered, every Diffuse cell reads "not assessed"
    { room: 'B2.16', listed: false, notAssessed: true },
    // room C1.03: both beams have diffuse viewing; both cases are printed under the table
    { room: 'C1.03', listed: true, notAssessed: false },
  ] as const;
  for (const c of cases) {
    it(`room ${c.room}: the legend promises the list of viewing cases only when it follows, and explains "not assessed" when shown`, async () => {
      const body = await reportBody(c.room);
      const listFollows = /diffuse reflection: accidental/.test(body);
      expect(listFollows, 'the list of viewing cases').toBe(c.listed);
      expect(body.includes('listed below the table'), 'the legend promises the list').toBe(listFollows);
      const shown = body.replace(/“Not assessed” there means/g, '').includes('not assessed');
      expect(shown, '"not assessed" in the table').toBe(c.notAssessed);
      expect(body.includes('“Not assessed” there means that no diffusely reflecting surface was entered'), 'the legend explains "not assessed"').toBe(shown);
    }, 120_000);
  }
});

describe('the plot labels write numbers as the rest of the documents do', () => {
  const cases = [
    // room C1.03, beam 2: CO2 laser at 10 600 nm; limiting aperture 1.5 × 10^0.375 mm = 3.557 mm
    // (ICNIRP 2013 / IEC 60825-1:2014, far infrared, t = 10 s)
    { room: 'C1.03', wavelength: 'eye limit, 10.6 µm', notWavelength: 'eye limit, 10600 nm', aperture: 'direct beam, 3.56 mm aperture' },
    // room A0.07: 1550 nm, the same 1.5 t^0.375 aperture at 10 s; below 10 µm the wavelength stays in nm
    { room: 'A0.07', wavelength: 'eye limit, 1550 nm', notWavelength: 'eye limit, 1.55 µm', aperture: 'direct beam, 3.56 mm aperture' },
  ] as const;
  for (const c of cases) {
    it(`room ${c.room}: "${c.wavelength}" (µm from 10 µm, as in the summary table) and "${c.aperture}" (3 significant figures)`, async () => {
      const body = await reportBody(c.room);
      expect(body).toContain(c.wavelength);
      expect(body).not.toContain(c.notWavelength);
      expect(body).toContain(c.aperture);
      expect(body, 'no aperture printed with 4 significant figures').not.toMatch(/\d\.\d{3} mm aperture/);
    }, 120_000);
  }
});

describe('the pulse correction factor is written one way throughout the report', () => {
  // Room B2.14 (conservative mode, pulse trains): the factor is named in "Points to check", in the
  // rule-set section and in the appendix. Its name comes from core/model/factor-words.ts; the symbol
  // is C with subscript P in ICNIRP 2013 and IEC 60825-1:2014 (from memory), set so on paper by the
  // one formula formatter (core/units/formula-text.ts): pdftotext reads the lowered P inline, "CP".
  it('room B2.14: "pulse correction factor C_P" (P lowered) in the points to check and the rule-set section, and the appendix writes it so, never "C_P" or "C P"', async () => {
    const all = pageTexts(await renderReport(await demo.documentOf('B2.14'), A4_SI)).join(' ');
    const name = readBack(factorWords('C_P'));
    expect(name).toBe('pulse correction factor CP');
    const points = all.slice(all.indexOf('Points to check'), all.indexOf('Inputs and assumptions'));
    const ruleSet = all.slice(all.indexOf('Rule set and conservative mode'), all.indexOf('Uncertainty bounds'));
    expect(points).toContain(name);
    expect(ruleSet).toContain(name);
    expect(all.slice(all.indexOf('Appendix — derivations'))).toContain('CP = ');
    // the same symbol everywhere: never the underscore form nor a spaced "C P"
    expect(all.match(/\bC_P\b|\bC P\b/g) ?? []).toEqual([]);
  }, 120_000);
});
