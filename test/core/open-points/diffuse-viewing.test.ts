// Diffuse reflections, two viewing cases (issue 9 decision, SAFETY.md): accidental viewing over the
// beam's exposure duration, and deliberate viewing of the spot (alignment on a card or screen) over
// 600 s by default (customary value for deliberate viewing of diffuse reflections, from memory).
// Both are in the result; the officer says which governs, else the larger distance governs.
// r = sqrt(rho*P*cos(theta)/(pi*L)) (ANSI Z136.1 App. B, from memory; domain notes 1.4).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, type BeamInput } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const diffuse = (wavelength_nm: number, power_W: number, extra: Partial<NonNullable<BeamInput['viewing']>['diffuse']> = {}): BeamInput => ({
  wavelength_nm,
  emission: { kind: 'cw', power_W },
  beam,
  viewing: { diffuse: { reflectance: 0.9, ...extra } },
});
const r = (P: number, L: number): number => Math.sqrt((0.9 * P) / (Math.PI * L));

// [name, input, accidental m, deliberate m, governing case, derivation]
const CASES: ReadonlyArray<readonly [string, BeamInput, number, number, 'accidental' | 'deliberate', string]> = [
  ['532 nm 1 W: 0.25 s vs 600 s', diffuse(532, 1), r(1, 18 * 0.25 ** 0.75 / 0.25), r(1, 10), 'deliberate', 'L = 25.456 W/m² (0.25 s, EU Table 2.2 read) vs 10 W/m² (t >= 10 s point source, H-E-VIS-5p)'],
  ['450 nm 1 W: photochemical 1 W/m² at 600 s', diffuse(450, 1), r(1, 18 * 0.25 ** 0.75 / 0.25), r(1, 1), 'deliberate', 'L = 1*C_B = 1 W/m² at 450 nm for 100 s - 30 000 s (H-E-PC-2)'],
  ['532 nm 1 W, officer takes the accidental case', diffuse(532, 1, { governs: 'accidental' }), r(1, 18 * 0.25 ** 0.75 / 0.25), r(1, 10), 'accidental', 'as the first case; the choice is the officer\'s'],
  ['1064 nm 10 W: 10 s and 600 s give the same 50 W/m²', diffuse(1064, 10), r(10, 50), r(10, 50), 'accidental', 'L = 10*C_A*C_C = 50 W/m² from 10 s on (H-E-NIR2-5p); equal: the accidental case is kept'],
  ['532 nm 1 W, deliberate 60 s given', diffuse(532, 1, { deliberateDuration_s: 60 }), r(1, 18 * 0.25 ** 0.75 / 0.25), r(1, 10), 'deliberate', 'L = 10 W/m² from 10 s on'],
];

describe('diffuse reflection: accidental and deliberate viewing (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, acc, del, governs, _derivation) => {
    const res = evaluateBeam(x);
    const ds = res.distances.filter((d) => d.kind === 'diffuse');
    expect(ds.map((d) => d.viewing)).toEqual(['accidental', 'deliberate']);
    const [a, b] = ds;
    expect(Math.abs(Number(a?.distance_m) / acc - 1)).toBeLessThan(1e-6);
    expect(Math.abs(Number(b?.distance_m) / del - 1)).toBeLessThan(1e-6);
    expect(ds.find((d) => d.governs)?.viewing).toBe(governs);
    expect(Number(res.nhzDiffuse_m)).toBeCloseTo(governs === 'accidental' ? acc : del, 9);
    expect(b?.exposureDuration_s).toBe(x.viewing?.diffuse?.deliberateDuration_s ?? 600);
    expect(JSON.stringify(b?.trace)).toMatch(/deliberate viewing of the spot/);
  });

  it('the room ignores the diffuse case the officer did not take as governing', () => {
    // 450 nm, 1 mW, wide beam: the direct NOHD is small, the deliberate diffuse distance is not
    const x: BeamInput = { ...diffuse(450, 1e-3, { governs: 'accidental' }), beam: { diameter_m: 0.02, divergence_rad: 0.001, definition: '1/e' } };
    const room = evaluateRoom({ lasers: [{ id: 'L1', name: 'Blue module', beams: [x] }] });
    const b = room.beams[0];
    const accidental = b?.distances.find((d) => d.viewing === 'accidental');
    expect(Number(room.largestHazardDistance_m)).toBeLessThan(Number(b?.distances.find((d) => d.viewing === 'deliberate')?.distance_m));
    expect(Number(room.largestHazardDistance_m)).toBeGreaterThanOrEqual(Number(accidental?.distance_m));
  });
});
