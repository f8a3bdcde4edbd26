// Bad input gets a typed InputError that names the field, the value and the valid range; no function
// ever returns NaN, Infinity or a non-positive limit. Coverage of the rule sets: 180 nm to 1 mm and
// 1e-13 s to 3e4 s (limit specification section 0; EU Directive 2006/25/EC Annex II Tables 2.2-2.4
// start at 180 nm and end at 1 mm). Field names follow the public query types.
import { describe, expect, it } from 'vitest';
import {
  additiveFractions,
  exposureLimit,
  pulsedExposureLimit,
  type ExposureLimitQuery,
  type PulsedLimitQuery,
} from '../../core/index.js';
import { refusal } from './refusal.js';


const OK: ExposureLimitQuery = { tissue: 'eye', wavelength_nm: 532, duration_s: 0.25 };

const LIMIT_CASES: ReadonlyArray<{ why: string; q: Record<string, unknown>; field: string; code: string }> = [
  { why: 'wavelength below 180 nm', q: { ...OK, wavelength_nm: 179.9 }, field: 'wavelength_nm', code: 'out_of_range' },
  { why: 'wavelength above 1 mm', q: { ...OK, wavelength_nm: 1.000001e6 }, field: 'wavelength_nm', code: 'out_of_range' },
  { why: 'wavelength NaN', q: { ...OK, wavelength_nm: Number.NaN }, field: 'wavelength_nm', code: 'not_finite' },
  { why: 'wavelength Infinity', q: { ...OK, wavelength_nm: Number.POSITIVE_INFINITY }, field: 'wavelength_nm', code: 'not_finite' },
  { why: 'wavelength missing', q: { tissue: 'eye', duration_s: 1 }, field: 'wavelength_nm', code: 'missing' },
  { why: 'wavelength as text', q: { ...OK, wavelength_nm: '532' }, field: 'wavelength_nm', code: 'missing' },
  { why: 'duration zero', q: { ...OK, duration_s: 0 }, field: 'duration_s', code: 'out_of_range' },
  { why: 'duration negative', q: { ...OK, duration_s: -1 }, field: 'duration_s', code: 'out_of_range' },
  { why: 'duration NaN', q: { ...OK, duration_s: Number.NaN }, field: 'duration_s', code: 'not_finite' },
  { why: 'duration beyond 3e4 s', q: { ...OK, duration_s: 3.1e4 }, field: 'duration_s', code: 'out_of_range' },
  { why: 'duration below 1e-13 s', q: { ...OK, duration_s: 1e-14 }, field: 'duration_s', code: 'out_of_range' },
  { why: 'unknown tissue', q: { ...OK, tissue: 'hand' }, field: 'tissue', code: 'invalid_choice' },
  { why: 'unknown rule set', q: { ...OK, ruleSet: 'ansi1986' }, field: 'ruleSet', code: 'invalid_choice' },
  { why: 'negative source angle', q: { ...OK, sourceAngle_rad: -0.001 }, field: 'sourceAngle_rad', code: 'out_of_range' },
  { why: 'source angle NaN', q: { ...OK, sourceAngle_rad: Number.NaN }, field: 'sourceAngle_rad', code: 'not_finite' },
];

describe('exposureLimit: each bad input names its field', () => {
  it.each(LIMIT_CASES)('$why -> $field ($code)', ({ q, field, code }) => {
    const e = refusal(() => exposureLimit(q as unknown as ExposureLimitQuery));
    expect(e.field).toBe(field);
    expect(e.code).toBe(code);
    expect(e.message).toContain(field);
    expect(e.validRange.length).toBeGreaterThan(0);
  });

  it('the edges of the coverage are valid (180 nm, 1 mm, 1e-13 s, 3e4 s)', () => {
    for (const [l, t] of [[180, 1e-13], [1e6, 3e4], [180, 3e4], [1e6, 1e-13]] as const) {
      for (const tissue of ['eye', 'skin'] as const) {
        const r = exposureLimit({ tissue, wavelength_nm: l, duration_s: t });
        expect(Number(r.H_Jm2)).toBeGreaterThan(0);
        expect(Number.isFinite(Number(r.E_Wm2))).toBe(true);
      }
    }
  });
});

const P: PulsedLimitQuery = { tissue: 'eye', wavelength_nm: 1064, pulseDuration_s: 1e-8, repetitionRate_Hz: 10, exposureDuration_s: 10 };

const PULSE_CASES: ReadonlyArray<{ why: string; q: Record<string, unknown>; field: string; code: string }> = [
  { why: 'pulse duration zero', q: { ...P, pulseDuration_s: 0 }, field: 'pulseDuration_s', code: 'not_positive' },
  { why: 'pulse duration negative', q: { ...P, pulseDuration_s: -1e-9 }, field: 'pulseDuration_s', code: 'not_positive' },
  { why: 'pulse duration NaN', q: { ...P, pulseDuration_s: Number.NaN }, field: 'pulseDuration_s', code: 'not_finite' },
  { why: 'pulse duration below the tables', q: { ...P, pulseDuration_s: 1e-15 }, field: 'pulseDuration_s', code: 'out_of_range' },
  { why: 'exposure duration zero', q: { ...P, exposureDuration_s: 0 }, field: 'exposureDuration_s', code: 'not_positive' },
  { why: 'exposure duration NaN', q: { ...P, exposureDuration_s: Number.NaN }, field: 'exposureDuration_s', code: 'not_finite' },
  { why: 'exposure beyond 3e4 s', q: { ...P, exposureDuration_s: 1e5 }, field: 'exposureDuration_s', code: 'out_of_range' },
  { why: 'exposure shorter than the pulse', q: { ...P, pulseDuration_s: 1, exposureDuration_s: 0.5 }, field: 'exposureDuration_s', code: 'out_of_range' },
  { why: 'repetition rate zero', q: { ...P, repetitionRate_Hz: 0 }, field: 'repetitionRate_Hz', code: 'not_positive' },
  { why: 'repetition rate negative', q: { ...P, repetitionRate_Hz: -5 }, field: 'repetitionRate_Hz', code: 'not_positive' },
  { why: 'repetition rate Infinity', q: { ...P, repetitionRate_Hz: Number.POSITIVE_INFINITY }, field: 'repetitionRate_Hz', code: 'not_finite' },
  { why: 'pulses would overlap (rate above 1/pulse duration)', q: { ...P, pulseDuration_s: 1e-3, repetitionRate_Hz: 2000 }, field: 'repetitionRate_Hz', code: 'out_of_range' },
  { why: 'wavelength out of coverage', q: { ...P, wavelength_nm: 100 }, field: 'wavelength_nm', code: 'out_of_range' },
  { why: 'unknown tissue', q: { ...P, tissue: 'lens' }, field: 'tissue', code: 'invalid_choice' },
];

describe('pulsedExposureLimit: each bad input names its field', () => {
  it.each(PULSE_CASES)('$why -> $field ($code)', ({ q, field, code }) => {
    const e = refusal(() => pulsedExposureLimit(q as unknown as PulsedLimitQuery));
    expect(e.field).toBe(field);
    expect(e.code).toBe(code);
  });
});

describe('additiveFractions: bad input names its field', () => {
  // the limit is looked up inside each case (not while the file is collected), so that the mutation
  // runs see it as covered by these tests
  type Limit = ReturnType<typeof exposureLimit>;
  it.each([
    { why: 'no exposures', items: (): unknown[] => [], field: 'items', code: 'missing' },
    { why: 'negative exposure', items: (limit: Limit): unknown[] => [{ label: 'a', H_Jm2: -1, limit }], field: 'items[0].H_Jm2', code: 'out_of_range' },
    { why: 'unreadable exposure', items: (limit: Limit): unknown[] => [{ label: 'a', H_Jm2: 1, limit }, { label: 'b', H_Jm2: 'lots', limit }], field: 'items[1].H_Jm2', code: 'unparseable' },
    { why: 'NaN exposure', items: (limit: Limit): unknown[] => [{ label: 'a', H_Jm2: Number.NaN, limit }], field: 'items[0].H_Jm2', code: 'not_finite' },
  ])('$why -> $field ($code)', ({ items, field, code }) => {
    const limit = exposureLimit({ tissue: 'eye', wavelength_nm: 532, duration_s: 10 });
    const e = refusal(() => additiveFractions(items(limit) as never));
    expect(e.field).toBe(field);
    expect(e.code).toBe(code);
  });
});
