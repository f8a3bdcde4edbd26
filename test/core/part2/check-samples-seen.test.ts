// What the limit-table checks screen shows beside an open entry (SAFETY.md "Checks of the limit
// tables"; renderer/screens/LimitChecksScreen.svelte calls entrySamples and documentValueProblem):
// the entry's value at three sample points (the start of its band at its shortest duration, the
// middle of the band at the middle duration, the middle of the band at its longest duration; a
// source size from 1, 3, 10, 50, 200 mrad where the entry depends on it), its stricter alternative,
// and the value the officer typed from the published document, or why that value cannot be used.
// Expected values are computed here from the formulas as the limit specification writes them
// (exposure-limits.md 4.1 factors and 4.2 eye rows, the ICNIRP 2013 set, from memory; its EU
// Directive 2006/25/EC section 5, Tables 2.3 and 2.5), never read back from the core.
import { describe, expect, it } from 'vitest';
import { checkableEntries, documentValueProblem, entrySamples, InputError, type CheckableEntry, type RuleSetId, type SamplePoint } from '../../../core/index.js';

const entry = (rs: RuleSetId, key: string): CheckableEntry => {
  const e = checkableEntries(rs).find((x) => x.key === key);
  if (!e) throw new Error(`no open entry ${key} in ${rs}`);
  return e;
};
interface Want {
  readonly lambda: number;
  readonly t: number;
  readonly alpha?: number;
  readonly asWritten: number;
  readonly stricter?: number;
  readonly typed?: number;
}
const rel = (got: string | undefined, want: number): number => (want === 0 ? Math.abs(Number(got)) : Math.abs(Number(got) / want - 1));
const expectSamples = (got: SamplePoint[], want: readonly Want[]): void => {
  expect(got).toHaveLength(want.length);
  got.forEach((p, i) => {
    const w = want[i] as Want;
    const keys = ['wavelength_nm', 'duration_s', 'asWritten', ...(w.alpha !== undefined ? ['alpha_mrad'] : []), ...(w.stricter !== undefined ? ['stricter'] : []), ...(w.typed !== undefined ? ['typed'] : [])];
    expect(Object.keys(p).sort(), `point ${i}`).toEqual(keys.sort());
    expect(rel(p.wavelength_nm, w.lambda), `point ${i} wavelength ${p.wavelength_nm}`).toBeLessThan(1e-12);
    expect(rel(p.duration_s, w.t), `point ${i} duration ${p.duration_s}`).toBeLessThan(1e-12);
    if (w.alpha !== undefined) expect(p.alpha_mrad, `point ${i} source size`).toBe(String(w.alpha));
    expect(rel(p.asWritten, w.asWritten), `point ${i} as written ${p.asWritten}`).toBeLessThan(1e-12);
    if (w.stricter !== undefined) expect(rel(p.stricter, w.stricter), `point ${i} stricter ${p.stricter}`).toBeLessThan(1e-12);
    if (w.typed !== undefined) expect(rel(p.typed, w.typed), `point ${i} typed ${p.typed}`).toBeLessThan(1e-12);
  });
};

// Factors (exposure-limits.md 4.1): C_A = 10^(0.002 (lambda - 700)) for 700-1050 nm, 5 for 1050-1400 nm;
// C_B = 10^(0.02 (lambda - 450)) for 450-700 nm; C_C = 10^(0.018 (lambda - 1150)) for 1150-1200 nm and
// 8 + 10^(0.04 (lambda - 1250)) for 1200-1400 nm (ICNIRP 2013 as written; the EU Table 2.5 gives 8);
// alpha_min = 1.5 mrad; alpha_max = 5 mrad below 625 us, 200 t^0.5 mrad to 0.25 s, 100 mrad above;
// C_E = 1, alpha / alpha_min, alpha² / (alpha_min alpha_max); T2 = 10 x 10^((alpha - 1.5)/98.5) s.
const CC = (l: number): number => 8 + 10 ** (0.04 * (l - 1250));
const alphaMax = (t: number): number => (t < 6.25e-4 ? 5 : t < 0.25 ? 200 * Math.sqrt(t) : 100);
const CE = (a: number, t: number): number => (a <= 1.5 ? 1 : a <= alphaMax(t) ? a / 1.5 : (a * a) / (1.5 * alphaMax(t)));
const vis4 = (t: number, a = 1): number => 18 * t ** 0.75 * CE(a, t);

describe('the sample points and values the checks screen shows beside an open entry', () => {
  const CASES: ReadonlyArray<readonly [string, RuleSetId, string, readonly Want[], string?]> = [
    // 2e-3 C_E J/m² over 10 ps-1 ns, until verified the stricter 2.7e4 t^0.75 C_E (exposure-limits.md
    // 4.2, H-E-VIS-2): the entry uses C_E, so a source size is shown, the first of the list (1 mrad, C_E = 1).
    ['H-E-VIS-2: 400 nm at 10 ps, 550 nm at 100 ps (geometric middle), 550 nm at 1 ns; the stricter alternative beside it', 'icnirp2013', 'H-E-VIS-2', [
      { lambda: 400, t: 1e-11, alpha: 1, asWritten: 2e-3, stricter: 2.7e4 * 1e-11 ** 0.75 },
      { lambda: 550, t: 1e-10, alpha: 1, asWritten: 2e-3, stricter: 2.7e4 * 1e-10 ** 0.75 },
      { lambda: 550, t: 1e-9, alpha: 1, asWritten: 2e-3, stricter: 2.7e4 * 1e-9 ** 0.75 },
    ]],
    // 18 t^0.75 C_E (H-E-VIS-4, 5 us-10 s): C_E and t in the formula, no condition: the source size is shown.
    ['H-E-VIS-4: 18 t^0.75 C_E from 5 us to 10 s, with the typed 20 t^0.75 beside it', 'icnirp2013', 'H-E-VIS-4', [
      { lambda: 400, t: 5e-6, alpha: 1, asWritten: vis4(5e-6), typed: 20 * 5e-6 ** 0.75 },
      { lambda: 550, t: Math.sqrt(5e-5), alpha: 1, asWritten: vis4(Math.sqrt(5e-5)), typed: 20 * Math.sqrt(5e-5) ** 0.75 },
      { lambda: 550, t: 10, alpha: 1, asWritten: vis4(10), typed: 20 * 10 ** 0.75 },
    ], '20*t^0.75'],
    // 10 W/m² where alpha <= 1.5 mrad (H-E-VIS-5p): a condition on the source size, a formula without it.
    ['H-E-VIS-5p: the point-source row shown at 1 mrad', 'icnirp2013', 'H-E-VIS-5p', [
      { lambda: 400, t: 10, alpha: 1, asWritten: 10 },
      { lambda: 550, t: Math.sqrt(10 * 30000), alpha: 1, asWritten: 10 },
      { lambda: 550, t: 30000, alpha: 1, asWritten: 10 },
    ]],
    // 18 t^0.75 C_E where alpha > 1.5 mrad and t <= T2 (H-E-VIS-5x): at 10 s the first listed size that
    // meets the condition, 3 mrad (T2 = 10.36 s, C_E = 2). At 548 s and 30 000 s no listed size does
    // (T2 is at most 100 s): the first size, 1 mrad, is shown (derived from the list).
    ['H-E-VIS-5x: 3 mrad at 10 s (the first size meeting the condition), 1 mrad where none does', 'icnirp2013', 'H-E-VIS-5x', [
      { lambda: 400, t: 10, alpha: 3, asWritten: vis4(10, 3) },
      { lambda: 550, t: Math.sqrt(10 * 30000), alpha: 1, asWritten: vis4(Math.sqrt(10 * 30000)) },
      { lambda: 550, t: 30000, alpha: 1, asWritten: vis4(30000) },
    ]],
    // 1e-2 C_C C_E J/m² below 10 ps, until verified 1.5e-3 C_C C_E (H-E-NIR2-1): C_C as the table
    // writes it at 1225 nm (8 + 10^-1 = 8.1), not the stricter 8 that conservative mode uses in a limit.
    ['H-E-NIR2-1: C_C as written (8.1 at 1225 nm)', 'icnirp2013', 'H-E-NIR2-1', [
      { lambda: 1050, t: 1e-13, alpha: 1, asWritten: 1e-2, stricter: 1.5e-3 },
      { lambda: 1225, t: 1e-12, alpha: 1, asWritten: 1e-2 * CC(1225), stricter: 1.5e-3 * CC(1225) },
      { lambda: 1225, t: 1e-11, alpha: 1, asWritten: 1e-2 * CC(1225), stricter: 1.5e-3 * CC(1225) },
    ]],
    // The same point-source row of the EU Directive (EU-E-NIR2-5p, 10 C_A C_C W/m², Table 2.3 from
    // memory): the EU's C_C is 8 over 1200-1400 nm (Table 2.5, read), 400 W/m², not the ICNIRP 405.
    ['EU-E-NIR2-5p: the EU factors (C_C = 8 at 1225 nm)', 'eu2006', 'EU-E-NIR2-5p', [
      { lambda: 1050, t: 10, alpha: 1, asWritten: 50 },
      { lambda: 1225, t: Math.sqrt(10 * 30000), alpha: 1, asWritten: 400 },
      { lambda: 1225, t: 30000, alpha: 1, asWritten: 400 },
    ]],
    ['H-E-NIR2-5p: the ICNIRP factors at the same points (C_C = 8.1)', 'icnirp2013', 'H-E-NIR2-5p', [
      { lambda: 1050, t: 10, alpha: 1, asWritten: 50 },
      { lambda: 1225, t: Math.sqrt(10 * 30000), alpha: 1, asWritten: 50 * CC(1225) },
      { lambda: 1225, t: 30000, alpha: 1, asWritten: 50 * CC(1225) },
    ]],
    // 100 C_B J/m² (H-E-PC-1, 400-600 nm, 10-100 s): no source size in it, none shown.
    ['H-E-PC-1: 100 C_B, no source size', 'icnirp2013', 'H-E-PC-1', [
      { lambda: 400, t: 10, asWritten: 100 },
      { lambda: 500, t: Math.sqrt(1000), asWritten: 100 * 10 ** (0.02 * 50) },
      { lambda: 500, t: 100, asWritten: 100 * 10 ** (0.02 * 50) },
    ]],
    // A factor without band or duration range: 550 nm at 1 ms, 1 s and 100 s.
    ['alpha_min: no band and no durations of its own', 'icnirp2013', 'factor:alpha_min', [
      { lambda: 550, t: 1e-3, asWritten: 1.5 },
      { lambda: 550, t: 1, asWritten: 1.5 },
      { lambda: 550, t: 100, asWritten: 1.5 },
    ]],
    // A duration range starting at 0: the middle is half the end, 312.5 us.
    ['alpha_max below 625 us: the range starts at 0 s, its middle is 312.5 us', 'icnirp2013', 'factor:alpha_max[0-0.000625 s]', [
      { lambda: 550, t: 0, asWritten: 5 },
      { lambda: 550, t: 3.125e-4, asWritten: 5 },
      { lambda: 550, t: 6.25e-4, asWritten: 5 },
    ]],
    ['alpha_max from 625 us to 0.25 s: 200 t^0.5', 'icnirp2013', 'factor:alpha_max[0.000625-0.25 s]', [
      { lambda: 550, t: 6.25e-4, asWritten: 5 },
      { lambda: 550, t: Math.sqrt(6.25e-4 * 0.25), asWritten: 200 * Math.sqrt(Math.sqrt(6.25e-4 * 0.25)) },
      { lambda: 550, t: 0.25, asWritten: 100 },
    ]],
    // C_E above alpha_max: 10 mrad is the first listed size above alpha_max = 6.32 mrad at 1 ms, 200 mrad
    // the first above 100 mrad at 1 s and 100 s.
    ['C_E above alpha_max: 10 mrad at 1 ms, 200 mrad at 1 s and 100 s', 'icnirp2013', 'factor:CE[alpha > alpha_max]', [
      { lambda: 550, t: 1e-3, alpha: 10, asWritten: CE(10, 1e-3) },
      { lambda: 550, t: 1, alpha: 200, asWritten: CE(200, 1) },
      { lambda: 550, t: 100, alpha: 200, asWritten: CE(200, 100) },
    ]],
    ['C_C over 1200-1400 nm: as written and the stricter 8', 'icnirp2013', 'factor:CC[1200-1400 nm]', [
      { lambda: 1200, t: 1e-3, asWritten: CC(1200), stricter: 8 },
      { lambda: 1300, t: 1, asWritten: CC(1300), stricter: 8 },
      { lambda: 1300, t: 100, asWritten: CC(1300), stricter: 8 },
    ]],
    // A band reaching 1 mm: the middle of 2600 nm-1 mm, 501.3 um.
    ['T_i from 2600 nm to 1 mm: the middle of the band is 501.3 um', 'icnirp2013', 'factor:T_i[2600-1000000 nm]', [
      { lambda: 2600, t: 1e-3, asWritten: 1e-7 },
      { lambda: 501300, t: 1, asWritten: 1e-7 },
      { lambda: 501300, t: 100, asWritten: 1e-7 },
    ]],
  ];
  for (const [name, rs, key, want, typed] of CASES) {
    it(name, () => {
      expectSamples(entrySamples(rs, entry(rs, key), typed), want);
    });
  }
});

describe('a typed document value: accepted, or refused in officer words', () => {
  const vis4Entry = (): CheckableEntry => entry('icnirp2013', 'H-E-VIS-4');
  it.each([
    ['18*t^0.75*CE', 'the formula as the table writes it'],
    ['20*t^0.75*CB', 'C_B has a value over 400-700 nm'],
    ['1.1 - t/10', 'positive at every sample point (0.1 at 10 s)'],
  ])('%j is accepted (%s)', (expr) => {
    expect(documentValueProblem('icnirp2013', vis4Entry(), expr)).toBeNull();
  });
  it.each([
    ['2 % 3', /^cannot be read: write it as in the table, for example 18\*t\^0\.75\*CE /],
    ['(2', /^cannot be read: /],
    ['1e-3*XY', /^uses XY, which the tables do not define \(allowed: t, lambda, alpha, alpha_min, alpha_max, CA, /],
    ['XY*t*ZZ', /^uses XY, ZZ, which the tables do not define /],
    ['-5', /^gives -5 at 400 nm and 5 µs; a limit or factor must be a positive number$/],
    ['0*t', /^gives 0 at 400 nm and 5 µs; /],
    // positive at 5 us and 7.07 ms, not at 10 s: every point is checked
    ['1 - t', /^gives -9 at 550 nm and 10 s; /],
    ['1/0', /^gives no finite number at 400 nm and 5 µs; /],
    ['0/0', /^gives no finite number at 400 nm and 5 µs; /],
    // C_C is defined from 700 nm only (exposure-limits.md 4.1)
    ['2*CC', /^uses CC, which has no value at 400 nm and 5 µs$/],
    ['CC*C2', /^uses CC, C2, which have no value at 400 nm and 5 µs$/],
  ] as const)('%j is refused: %s', (expr, words) => {
    expect(documentValueProblem('icnirp2013', vis4Entry(), expr)).toMatch(words);
  });

  // The samples with a typed value (the screen's preview) refuse a value they cannot compute as an
  // input error naming the check's field, never with an internal message.
  it.each([
    ['2*CC', 'uses CC, which has no value at 400 nm and 5 µs'],
    ['2 % 3', 'cannot be read'],
  ])('entrySamples with %j: refused, field documentExpr', (expr, words) => {
    let err: unknown;
    try {
      entrySamples('icnirp2013', vis4Entry(), expr);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).field).toBe('documentExpr');
    expect((err as InputError).message).toContain(words);
    expect((err as InputError).message).not.toMatch(/limit table expression|internal/);
  });
});

// The entries the screen lists (core/limits/open-points.ts, the one enumerator): every limit row and
// factor piece whose confidence mark is 'from memory', 'from memory, uncertain' or 'ours' (SAFETY.md
// "Checks of the limit tables"), each with what the screen prints: title (tissue, effect, row id or
// factor), band, durations, condition, formula, unit, stricter alternative, source and confidence.
// The source and effect texts are the table's own (exposure-limits.md 4.1, 4.2, 4.3).
describe('the open entries the checks screen lists', () => {
  const ICNIRP_ROWS = 'ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)';
  it.each([
    ['an eye row with a stricter alternative', 'icnirp2013', 'H-E-VIS-2', {
      key: 'H-E-VIS-2', kind: 'row', name: 'H-E-VIS-2', tissue: 'eye', effect: 'retinal thermal', band_nm: [400, 700], t_s: [1e-11, 1e-9],
      quantity: 'H', expr: '2e-3*CE', unit: 'J/m^2', stricterAlt: '2.7e4*t^0.75*CE', source: ICNIRP_ROWS, confidence: 'from memory, uncertain',
    }],
    ['an eye row with a condition on the source size', 'icnirp2013', 'H-E-VIS-5x', {
      key: 'H-E-VIS-5x', kind: 'row', name: 'H-E-VIS-5x', tissue: 'eye', effect: 'retinal thermal', band_nm: [400, 700], t_s: [10, 30000],
      condition: 'alpha > 1.5 and t <= T2', quantity: 'H', expr: '18*t^0.75*CE', unit: 'J/m^2', source: `${ICNIRP_ROWS}; same as EU Tab. 2.3 (from memory)`, confidence: 'from memory',
    }],
    ['a skin row (exposure-limits.md 4.3: 10 W/m² over 1000-30 000 s, until verified 1e4/t)', 'icnirp2013', 'H-S-UVA-long', {
      key: 'H-S-UVA-long', kind: 'row', name: 'H-S-UVA-long', tissue: 'skin', effect: 'skin UV-A', band_nm: [315, 400], t_s: [1000, 30000],
      quantity: 'E', expr: '10', unit: 'W/m^2', stricterAlt: '1e4/t', source: 'ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory)', confidence: 'from memory, uncertain',
    }],
    ['a factor piece on the source size, source and confidence from the factor', 'icnirp2013', 'factor:CE[alpha_min < alpha <= alpha_max]', {
      key: 'factor:CE[alpha_min < alpha <= alpha_max]', kind: 'factor', name: 'CE', quantity: 'factor', expr: 'alpha/alpha_min', unit: '',
      condition: 'alpha_min < alpha <= alpha_max', source: 'ICNIRP2013; IEC2014; ANSI2014 Tab. 6 (from memory)', confidence: 'from memory',
    }],
    ['a factor piece with its own band, source, confidence and stricter value', 'icnirp2013', 'factor:CC[1200-1400 nm]', {
      key: 'factor:CC[1200-1400 nm]', kind: 'factor', name: 'CC', quantity: 'factor', expr: '8+10^(0.04*(lambda-1250))', unit: '', band_nm: [1200, 1400],
      stricterAlt: '8', source: 'ICNIRP2013; IEC2014 (C7); ANSI2014 Tab. 6 (from memory)', confidence: 'from memory, uncertain',
    }],
    ['a factor piece over durations, with the factor\'s unit', 'icnirp2013', 'factor:gamma_p[100-10000 s]', {
      key: 'factor:gamma_p[100-10000 s]', kind: 'factor', name: 'gamma_p', quantity: 'factor', expr: '1.1*t^0.5', unit: 'mrad', t_s: [100, 10000],
      source: 'ICNIRP2013; IEC2014 (from memory); same as EU Tab. 2.5 (read)', confidence: 'from memory',
    }],
    ['a factor without pieces: its value as the formula', 'icnirp2013', 'factor:alpha_min', {
      key: 'factor:alpha_min', kind: 'factor', name: 'alpha_min', quantity: 'factor', expr: '1.5', unit: 'mrad',
      source: 'ICNIRP2013; IEC2014; ANSI2014 (from memory); same as EU Tab. 2.5 (read)', confidence: 'from memory',
    }],
  ] as const)('%s: %s %s', (_n, rs, key, want) => {
    expect(entry(rs, key)).toStrictEqual(want);
  });

  it.each([
    ['H-S-UV', 'icnirp2013', 'an open skin row that refers to the eye rows (nothing of its own to check)'],
    ['H-E-CORNEA-1200', 'icnirp2013', 'a row read in a published source'],
    ['H-E-UV-302a', 'icnirp2013', 'a derived row'],
    ['factor:C2', 'icnirp2013', 'a derived factor'],
    ['factor:alpha_min', 'eu2006', 'a factor read in the Directive'],
    ['factor:CC[1200-1400 nm]', 'eu2006', 'a factor piece read in the Directive'],
  ] as const)('%s (%s) is not listed: %s', (key, rs, _why) => {
    expect(checkableEntries(rs).map((e) => e.key)).not.toContain(key);
  });
});
