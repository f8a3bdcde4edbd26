// Parsing what officers type and formatting limits in the chosen unit habit.
// Sources: SI prefixes and unit symbols (BIPM, The International System of Units, 9th edition,
// 2019, Table 7 prefixes); 1 W/cm² = 1e4 W/m² and 1 J/cm² = 1e4 J/m² (limit specification
// section 1; ANSI Z136.1 states limits per cm², IEC/ICNIRP/EU per m²). 'u' for µ is common practice
// where µ cannot be typed. Safe rounding: limits DOWN, exposures and distances UP (SAFETY.md).
import { describe, expect, it } from 'vitest';
import { formatDensity, formatSI, InputError, parseQuantity, type Dimension } from '../../core/index.js';

const PARSE: ReadonlyArray<{ text: string; dim: Dimension; si: string; source: string }> = [
  { text: '5 mW', dim: 'power', si: '0.005', source: 'SI prefix m = 1e-3 (BIPM SI brochure Table 7)' },
  { text: '1064 nm', dim: 'wavelength', si: '0.000001064', source: 'SI prefix n = 1e-9' },
  { text: '10.6 µm', dim: 'wavelength', si: '0.0000106', source: 'SI prefix µ = 1e-6' },
  { text: '10.6 μm', dim: 'wavelength', si: '0.0000106', source: 'Greek mu (U+03BC) accepted for the micro sign (U+00B5)' },
  { text: '10.6 um', dim: 'wavelength', si: '0.0000106', source: "'u' for µ, common practice" },
  { text: '10 ns', dim: 'time', si: '0.00000001', source: 'SI prefix n' },
  { text: '10 us', dim: 'time', si: '0.00001', source: "'u' for µ, common practice" },
  { text: '1.5 mrad', dim: 'angle', si: '0.0015', source: 'SI prefix m on the radian' },
  { text: '3 mm', dim: 'length', si: '0.003', source: 'SI prefix m' },
  { text: '10 kHz', dim: 'frequency', si: '10000', source: 'SI prefix k = 1e3' },
  { text: '2 mJ', dim: 'energy', si: '0.002', source: 'SI prefix m' },
  { text: '0.5 J/cm²', dim: 'radiantExposure', si: '5000', source: '1 J/cm² = 1e4 J/m² (limit specification section 1)' },
  { text: '0.5 J/cm2', dim: 'radiantExposure', si: '5000', source: 'same, typed without the superscript' },
  { text: '2.5 mW/cm²', dim: 'irradiance', si: '25', source: '1 mW/cm² = 10 W/m² (limit specification section 1)' },
  { text: '25 W/m^2', dim: 'irradiance', si: '25', source: 'caret notation for the square' },
  { text: '5uW', dim: 'power', si: '0.000005', source: "no space, 'u' for µ" },
  { text: '1,5 mrad', dim: 'angle', si: '0.0015', source: 'decimal comma, common in EU practice' },
  { text: '0.5 deg', dim: 'angle', si: '0.0087266462599716475', source: 'derived: 0.5 × π/180; degree = π/180 rad (BIPM SI brochure Table 8)' },
  { text: '0.5°', dim: 'angle', si: '0.0087266462599716475', source: 'degree sign, same unit' },
  { text: '2 min', dim: 'time', si: '120', source: 'minute, SI brochure Table 8 (non-SI unit accepted for use)' },
];

describe('parseQuantity: what officers type', () => {
  it.each(PARSE)('"$text" -> $si SI [$source]', ({ text, dim, si }) => {
    const q = parseQuantity('field', text, dim);
    expect(q.value.toString()).toBe(si);
    expect(q.dimension).toBe(dim);
  });

  it('a bare number takes the default unit (a wavelength typed as 1064 means nm)', () => {
    expect(parseQuantity('wavelength', '1064', 'wavelength', 'nm').value.toString()).toBe('0.000001064');
  });
});

const BAD: ReadonlyArray<{ text: string; dim: Dimension; code: string; why: string }> = [
  { text: '5 mX', dim: 'power', code: 'unknown_unit', why: 'unknown unit' },
  { text: '5 mW', dim: 'time', code: 'unknown_unit', why: 'unit of the wrong kind' },
  { text: '10 nm', dim: 'power', code: 'unknown_unit', why: 'a length is not a power' },
  { text: 'abc', dim: 'power', code: 'unparseable', why: 'no number' },
  { text: '', dim: 'energy', code: 'unparseable', why: 'empty' },
  { text: 'NaN W', dim: 'power', code: 'unparseable', why: 'NaN is not a number an officer types' },
  { text: '5', dim: 'power', code: 'unknown_unit', why: 'no unit and no default' },
];

describe('parseQuantity: bad input gives InputError naming the field', () => {
  it.each(BAD)('"$text" as $dim: $code ($why)', ({ text, dim, code }) => {
    let err: unknown;
    try {
      parseQuantity('beam.power_W', text, dim);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    const ie = err as InputError;
    expect(ie.code).toBe(code);
    expect(ie.field).toBe('beam.power_W');
    expect(ie.message).toContain('beam.power_W');
    expect(ie.validRange.length).toBeGreaterThan(0);
  });
});

// Values from limit specification section 9 (633 nm, 0.25 s: 25.46 W/m² = 2.546 mW/cm²) and the
// 0.25 s radiant exposure 6.364 J/m² = 0.6364 mJ/cm² (worked example au-appx-x-mpe-488nm-0p25s).
const FORMAT = [
  { v: '25.455844', kind: 'irradiance', habit: 'SI', dir: 'down', text: '25.4 W/m²', why: 'limit rounded down' },
  { v: '25.455844', kind: 'irradiance', habit: 'ANSI', dir: 'down', text: '2.54 mW/cm²', why: 'limit rounded down, ANSI habit' },
  { v: '25.455844', kind: 'irradiance', habit: 'ANSI', dir: 'up', text: '2.55 mW/cm²', why: 'an exposure rounds up' },
  { v: '6.3640', kind: 'radiantExposure', habit: 'ANSI', dir: 'down', text: '636 µJ/cm²', why: '0.6364 mJ/cm² shown with a readable prefix' },
  { v: '10000', kind: 'radiantExposure', habit: 'SI', dir: 'down', text: '10 kJ/m²', why: 'engineering notation, prefix on the numerator (BIPM Table 7)' },
  { v: '30000000000', kind: 'irradiance', habit: 'SI', dir: 'down', text: '30 GW/m²', why: 'UV cap 3e10 W/m² with the prefix G, never an exponent' },
  { v: '0.002', kind: 'radiantExposure', habit: 'ANSI', dir: 'down', text: '200 nJ/cm²', why: '2e-3 J/m² = 0.2 µJ/cm² (section 9, 532 nm 10 ns)' },
  { v: '0.0012574334', kind: 'radiantExposure', habit: 'SI', dir: 'down', text: '1.25 mJ/m²', why: 'rule 3 value of the worked pulse example, down' },
  { v: '0.0012574334', kind: 'radiantExposure', habit: 'SI', dir: 'up', text: '1.26 mJ/m²', why: 'same value as an exposure, up' },
] as const;

describe('formatDensity: W/m² (IEC habit) or W/cm² (ANSI habit), rounded in the safe direction', () => {
  it.each(FORMAT)('$v $kind $habit $dir -> "$text" ($why)', ({ v, kind, habit, dir, text }) => {
    expect(formatDensity(v, kind, habit, dir).text).toBe(text);
  });

  it('a limit is never shown higher than it is, an exposure never lower', () => {
    for (const v of ['25.455844', '0.0012574334', '995.8', '1.9999999']) {
      for (const habit of ['SI', 'ANSI'] as const) {
        const down = formatDensity(v, 'irradiance', habit, 'down');
        const up = formatDensity(v, 'irradiance', habit, 'up');
        const prefix = (u: string): number => ({ k: 1e3, m: 1e-3, 'µ': 1e-6, n: 1e-9 } as Record<string, number>)[u.replace(/W\/c?m²/, '')] ?? 1;
        const scale = (habit === 'SI' ? 1 : 1e-4) / prefix(down.unit);
        const scaleUp = (habit === 'SI' ? 1 : 1e-4) / prefix(up.unit);
        expect(Number(down.value)).toBeLessThanOrEqual(Number(v) * scale * (1 + 1e-12));
        expect(Number(up.value)).toBeGreaterThanOrEqual(Number(v) * scaleUp * (1 - 1e-12));
      }
    }
  });
});

describe('formatSI: SI prefixes for powers and energies', () => {
  it.each([
    { v: '0.00098', unit: 'W', dir: 'up', text: '980 µW' },
    { v: '0.0009812', unit: 'W', dir: 'down', text: '981 µW' },
    { v: '0.0009812', unit: 'W', dir: 'up', text: '982 µW' },
    { v: '1500', unit: 'W', dir: 'up', text: '1.5 kW' },
    { v: '0.5', unit: 'W', dir: 'up', text: '500 mW' },
  ] as const)('$v $unit ($dir) -> $text', ({ v, unit, dir, text }) => {
    expect(formatSI(v, unit, 3, dir)).toBe(text);
  });
});
