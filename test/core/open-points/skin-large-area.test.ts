// Large irradiated skin areas (limit specification 4.3, from memory for IEC 60825-1 and ANSI
// Z136.1): for t > 10 s at 1400 nm - 1 mm and an irradiated area A_s above 0.01 m², the skin limit is
// E = 10/A_s W/m² (A_s in m²), 100 W/m² from 0.1 m² on. Optional input skinArea_m2.
// CO2 laser 10.6 um, 100 W CW, 1/e 10 mm, 1 mrad; skin aperture 3.5 mm;
// skin distance r = (sqrt(4P/(pi*L)) - a)/phi (range equation, domain notes 1.9).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const co2 = (extra: Partial<BeamInput>): BeamInput => ({ wavelength_nm: 10600, emission: { kind: 'cw', power_W: 100 }, beam: { diameter_m: 0.01, divergence_rad: 0.001, definition: '1/e' }, ...extra });
const r = (L: number): number => (Math.sqrt((4 * 100) / (Math.PI * L)) - 0.01) / 0.001;

// [name, input, skin limit W/m², derivation]
const CASES: ReadonlyArray<readonly [string, BeamInput, number, string]> = [
  ['no area given, 100 s: 1000 W/m²', co2({ exposureDuration_s: 100 }), 1000, 'skin far-IR limit for t >= 10 s (H-E-IR2600-long via H-S-IR)'],
  ['0.05 m², 100 s: 10/0.05 = 200 W/m²', co2({ exposureDuration_s: 100, skinArea_m2: 0.05 }), 200, 'large-area rule, from memory'],
  ['0.2 m², 100 s: 100 W/m² (floor from 0.1 m²)', co2({ exposureDuration_s: 100, skinArea_m2: 0.2 }), 100, 'large-area rule, from memory'],
  ['0.005 m², 100 s: below 0.01 m², 1000 W/m²', co2({ exposureDuration_s: 100, skinArea_m2: 0.005 }), 1000, 'the rule starts at 0.01 m²'],
  ['0.05 m², 10 s: not above 10 s, 995.8 W/m²', co2({ exposureDuration_s: 10, skinArea_m2: 0.05 }), (5.6e3 * 10 ** 0.25) / 10, 'the rule applies for t > 10 s; at exactly 10 s the lower row 5.6e3*t^0.25 J/m² governs (EU Table 2.2, read)'],
];

describe('large-area skin exposure (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, L, _derivation) => {
    const res = evaluateBeam(x);
    expect(Math.abs(Number(res.skinMpe.E_Wm2) / L - 1)).toBeLessThan(1e-9);
    expect(Math.abs(Number(res.skinHazardDistance_m) / r(L) - 1)).toBeLessThan(1e-6);
  });
  it('1064 nm is outside the rule (1400 nm - 1 mm): unchanged', () => {
    const x: BeamInput = { wavelength_nm: 1064, emission: { kind: 'cw', power_W: 100 }, beam: { diameter_m: 0.01, divergence_rad: 0.001, definition: '1/e' }, exposureDuration_s: 100 };
    expect(evaluateBeam({ ...x, skinArea_m2: 0.2 }).skinMpe.E_Wm2).toBe(evaluateBeam(x).skinMpe.E_Wm2);
  });
  it('the trace names the rule and the area', () => {
    const text = JSON.stringify(evaluateBeam(CASES[1]?.[1] as BeamInput).trace);
    expect(text).toMatch(/irradiated skin area 0\.05 m²/);
  });
});
