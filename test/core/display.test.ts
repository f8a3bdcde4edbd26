// The one display formatter: engineering notation with SI prefixes in the unit family, 3 significant
// figures rounded in the safe direction (SAFETY.md: limits DOWN, distances and ODs UP).
// Sources: SI prefixes, BIPM SI brochure 9th edition (2019) Table 7; 1 W/cm² = 1e4 W/m² (limit
// specification section 1). Seconds above 1 s without prefixes, metres up to 10 km: common practice.
import { describe, expect, it } from 'vitest';
import { angleText, numberText, odText, quantityText, type DisplayUnit, type Rounding, type UnitHabit } from '../../core/index.js';

const CASES: ReadonlyArray<{ v: string; unit: DisplayUnit; round?: Rounding; habit?: UnitHabit; text: string; source: string }> = [
  { v: '0.000000008', unit: 's', text: '8 ns', source: 'SI prefix n = 1e-9 (BIPM Table 7)' },
  { v: '125000000000', unit: 'W/m²', text: '125 GW/m²', source: 'SI prefix G = 1e9 on the numerator' },
  { v: '1000', unit: 's', text: '1000 s', source: 'common practice: seconds above 1 s take no prefix (never "ks")' },
  { v: '30000', unit: 's', text: '30\u202f000 s', source: 'common practice; thin-space groups (BIPM SI brochure 5.4.4)' },
  { v: '0.00000832', unit: 'J/m²', text: '8.32 µJ/m²', source: 'SI prefix µ = 1e-6' },
  { v: '0.25', unit: 's', text: '250 ms', source: 'SI prefix m = 1e-3' },
  { v: '25.455844', unit: 'W/m²', round: 'down', text: '25.4 W/m²', source: 'limit specification section 9 (633 nm, 0.25 s), limit rounded down' },
  { v: '25.455844', unit: 'W/m²', round: 'down', habit: 'ANSI', text: '2.54 mW/cm²', source: 'same, ANSI habit per cm² (section 1)' },
  { v: '999.6', unit: 'W/m²', round: 'up', text: '1 kW/m²', source: 'derived: the prefix is chosen after rounding (999.6 up is 1000)' },
  { v: '999.6', unit: 'W/m²', round: 'down', text: '999 W/m²', source: 'derived: a limit rounded down stays below the value' },
  { v: '1762.3301', unit: 'm', round: 'up', text: '1770 m', source: 'derived: distance rounded up, plain metres below 10 km' },
  { v: '36512', unit: 'm', round: 'up', text: '36.6 km', source: 'derived: km from 10 km' },
  { v: '0.0019368', unit: 'm', round: 'up', text: '1.94 mm', source: 'derived: mm below 10 cm' },
  { v: '0.0004', unit: 'rad', text: '400 µrad', source: 'SI prefix µ on the radian' },
  { v: '0.0015', unit: 'rad', text: '1.5 mrad', source: 'SI prefix m on the radian' },
  { v: '10000', unit: 'Hz', text: '10 kHz', source: 'SI prefix k = 1e3' },
  { v: '0', unit: 'm', text: '0 m', source: 'derived: zero keeps its unit' },
  { v: '632.8', unit: 'nm', text: '632.8 nm', source: 'wavelengths as typed (nm)' },
  { v: '10600', unit: 'nm', text: '10.6 µm', source: 'far infrared in µm' },
];

describe('quantityText: what the officer reads', () => {
  it.each(CASES)('$v $unit ($round, $habit) -> "$text" [$source]', ({ v, unit, round, habit, text }) => {
    expect(quantityText(v, unit, { round: round ?? 'nearest', ...(habit ? { habit } : {}) })).toBe(text);
  });
});

describe('ratios, optical densities and angle bounds', () => {
  it.each([
    { got: () => numberText('91.8126', { round: 'up' }), text: '91.9', source: 'derived: 91.8126 to 3 significant figures, UP for an exposure ratio (SAFETY.md)' },
    { got: () => odText('1.9629'), text: '2.0', source: 'SAFETY.md: OD rounded UP to one decimal' },
    { got: () => odText('-0.3'), text: '0.0', source: 'derived: OD never below 0' },
    { got: () => angleText(Math.PI), text: 'π rad', source: 'derived: the divergence bound is π rad (full angle)' },
    { got: () => angleText(Math.PI / 2), text: 'π/2 rad', source: 'derived: viewing angle bound' },
  ])('$text [$source]', ({ got, text }) => {
    expect(got()).toBe(text);
  });
});
