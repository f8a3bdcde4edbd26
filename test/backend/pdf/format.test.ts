/**
 * Numbers as printed: the unit habit and the rounding direction. Sources: SAFETY.md conservative
 * policy (limits rounded DOWN, distances / OD UP, 3 significant figures; project rule);
 * 1 W/cm² = 1e4 W/m² (definition of the units, limit specification section 1).
 */
import { describe, expect, it } from 'vitest';
import * as fmt from '../../../electron/backend/pdf/format.js';
import { numberRanges } from '../../../electron/backend/pdf/documents/eyewear-sheet.js';

describe('limits are printed rounded down, in the chosen habit', () => {
  const cases: ReadonlyArray<[string, 'SI' | 'ANSI', string, string]> = [
    ['25.4647908947', 'SI', '25.4 W/m²', 'down to 3 figures'],
    ['25.4647908947', 'ANSI', '2.54 mW/cm²', '25.46 W/m² = 2.546 mW/cm², down'],
    ['10', 'SI', '10 W/m²', 'exact stays exact'],
    ['0.0199999', 'SI', '19.9 mW/m²', 'never rounded up to 20 mW/m²; engineering prefix (BIPM SI brochure Table 7)'],
  ];
  it.each(cases)('E = %s W/m² (%s) -> %s (%s)', (value, units, printed) => {
    expect(fmt.limitE(value, units)).toBe(printed);
  });
  it('radiant exposure per pulse in ANSI habit: 0.0063299 J/m² = 633 nJ/cm², printed 632 (down)', () => {
    expect(fmt.limitH('0.0063299', 'ANSI')).toBe('632 nJ/cm²');
  });
});

describe('distances, outputs and OD are printed rounded up', () => {
  const distances: ReadonlyArray<[string | null, string]> = [
    ['12.3', '12.3 m'], // the core's reported value (already rounded up) printed as is
    ['0', '0 m'],
    ['27000', '27 km'],
    ['70001', '70.1 km'], // 3 figures, up
    [null, 'not assessed'],
  ];
  it.each(distances)('reported distance %s -> %s', (v, printed) => {
    expect(fmt.distance(v)).toBe(printed);
  });
  it('a full-precision distance is rounded up to 3 figures, in engineering notation: 0.0019301 m -> 1.94 mm', () => {
    expect(fmt.distanceFull('0.0019301')).toBe('1.94 mm');
  });
  it('maximum output on the door is rounded up: 4.0004 mJ -> 4.01 mJ per pulse', () => {
    expect(fmt.emission({ kind: 'pulsed', pulseEnergy_J: 0.0040004, pulseDuration_s: 3.5e-14, repetitionRate_Hz: 1000 }).output).toBe('4.01 mJ per pulse');
  });
  const ods: ReadonlyArray<[string, string]> = [
    ['7.1', 'OD 7.1'],
    ['0', 'none needed'],
  ];
  it.each(ods)('OD %s -> %s', (v, printed) => {
    expect(fmt.od(v)).toBe(printed);
  });
});

describe('small helpers', () => {
  it.each([
    ['07a5b1314b7afbe4c366', '07a5 b131 4b7a fbe4'],
    ['abc', 'abc'],
  ])('short fingerprint of %s is %s', (hex, short) => {
    expect(fmt.shortFingerprint(hex)).toBe(short);
  });
  it.each([
    [[1, 2, 4, 5, 6, 7, 8, 9], '1, 2, 4–9'],
    [[3], '3'],
    [[1, 3, 5], '1, 3, 5'],
    [[], ''],
  ] as Array<[number[], string]>)('beam numbers %j -> "%s"', (ns, text) => {
    expect(numberRanges(ns)).toBe(text);
  });
  it.each([
    [800, '800 nm'],
    [632.8, '632.8 nm'],
    [10600, '10.6 µm'],
  ])('wavelength %s nm printed as %s', (nm, text) => {
    expect(fmt.wavelength(nm)).toBe(text);
  });
  it.each([
    [0.25, '0.25 s'],
    [10, '10 s'],
    [30000, '30\u202f000 s'],
    [3.5e-14, '35 fs'],
  ])('duration %s s printed as %s', (s, text) => {
    expect(fmt.duration(s)).toBe(text);
  });
});
