// Input tolerances (SAFETY.md "Room plan zones ... or the upper bound from the input tolerances"):
// each toleranced input is moved to both ends of its range, then all at once to the ends that
// lengthen the NOHD; the conservative bound is the worst of every evaluation (ours; common practice
// of a worst-case stack-up). Expected values from the range equation, never read back from the core:
//   NOHD = (sqrt(4 P / (pi E)) - a) / phi (domain notes 1.2, ANSI Z136.1 App. B from memory; the
//   beam at the NOHD is wider than the 7 mm aperture), E = 18 t^0.75 / t W/m² at t = 0.25 s for
//   400-700 nm (EU Table 2.2, read; ICNIRP 2013 same, from memory), aversion response 0.25 s
//   (common practice, worked-examples.md aversion-response-time);
//   OD = log10(4 P / (pi (7 mm)²) / E) for a beam narrower than the 7 mm aperture at the exit.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const E = (18 * 0.25 ** 0.75) / 0.25;
const nohd = (P: number, a: number, phi: number): number => (Math.sqrt((4 * P) / (Math.PI * E)) - a) / phi;
const od = (P: number): number => Math.log10((4 * P) / (Math.PI * 0.007 ** 2) / E);
const rel = (got: string | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const green = (tolerances: BeamInput['tolerances'], emission: BeamInput['emission'] = { kind: 'cw', power_W: 1 }): BeamInput => ({
  wavelength_nm: 532,
  emission,
  beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' },
  ...(tolerances ? { tolerances } : {}),
});

// [case, tolerances, conservative NOHD, conservative OD, dominant input]
const CASES: ReadonlyArray<readonly [string, BeamInput['tolerances'], number, number, string | null]> = [
  ['power ±10 %: 1.1 W', { power: 0.1 }, nohd(1.1, 0.001, 0.001), od(1.1), 'power'],
  ['divergence ±10 %: 0.9 mrad', { divergence: 0.1 }, nohd(1, 0.001, 0.0009), od(1), 'divergence'],
  ['diameter ±20 %: 0.8 mm exit (the OD at the exit does not change: the beam is inside 7 mm)', { diameter: 0.2 }, nohd(1, 0.0008, 0.001), od(1), 'diameter'],
  ['power ±10 % and divergence ±10 %: all at once 1.1 W and 0.9 mrad; divergence moves the NOHD more', { power: 0.1, divergence: 0.1 }, nohd(1.1, 0.001, 0.0009), od(1.1), 'divergence'],
  ['energy ±10 % on a CW beam: does not apply, bound = nominal', { energy: 0.1 }, nohd(1, 0.001, 0.001), od(1), null],
  ['no tolerances: bound = nominal', undefined, nohd(1, 0.001, 0.001), od(1), null],
];

describe('conservative bounds from input tolerances (532 nm, 1 W CW, 1 mm, 1 mrad, 0.25 s)', () => {
  it.each(CASES)('%s', (_name, tol, nohdC, odC, dominant) => {
    const b = evaluateBeam(green(tol)).bounds;
    expect(rel(b.nohd_m.nominal, nohd(1, 0.001, 0.001))).toBeLessThan(1e-9);
    expect(rel(b.nohd_m.conservative, nohdC)).toBeLessThan(1e-9);
    expect(rel(b.odRequired.nominal, od(1))).toBeLessThan(1e-9);
    expect(rel(b.odRequired.conservative, odC)).toBeLessThan(1e-9);
    expect(rel(b.limit_E_Wm2.conservative, E)).toBeLessThan(1e-9);
    expect(b.dominantInput).toBe(dominant);
  });
});

describe('pulsed inputs', () => {
  // The per-pulse limit H is taken from the nominal result (self-consistency, E = H / t for one pulse);
  // the tolerance moves only the energy, so the NOHD follows the range equation with 1.2 Q and the OD
  // rises by log10(1.2) (derived).
  it('energy ±20 % on a single pulse: NOHD (sqrt(1.2 * 4Q/(pi H)) - a)/phi, OD + log10(1.2)', () => {
    const x = green({ energy: 0.2 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 });
    const r = evaluateBeam(x);
    const H = Number(r.bounds.limit_E_Wm2.nominal) * 1e-8;
    expect(rel(r.bounds.nohd_m.conservative, (Math.sqrt((4 * 1.2e-3) / (Math.PI * H)) - 0.001) / 0.001)).toBeLessThan(1e-6);
    expect(rel(r.bounds.odRequired.conservative, Number(r.bounds.odRequired.nominal) + Math.log10(1.2))).toBeLessThan(1e-9);
    expect(r.bounds.dominantInput).toBe('energy');
  });
  it('pulse duration ±10 % on one 10 ns pulse at 532 nm: the limit is flat there (2e-3 C_E J/m² from 1 ns to 5 us; ICNIRP 2013, from memory), nothing moves, no dominant input', () => {
    const b = evaluateBeam(green({ pulseDuration: 0.1 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 })).bounds;
    expect(b.nohd_m.conservative).toBe(b.nohd_m.nominal);
    expect(b.odRequired.conservative).toBe(b.odRequired.nominal);
    expect(b.dominantInput).toBeNull();
  });
  it('power ±10 % on a pulsed beam: does not apply (energy is the input), bound = nominal', () => {
    const b = evaluateBeam(green({ power: 0.1 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 })).bounds;
    expect(b.nohd_m.conservative).toBe(b.nohd_m.nominal);
    expect(b.dominantInput).toBeNull();
  });
});
