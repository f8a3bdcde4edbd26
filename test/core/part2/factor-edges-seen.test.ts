// Exposure durations exactly on the first or last edge of a factor's duration pieces, as the limit
// the officer sees shows them (through evaluateBeam). The pieces are [lo, hi); at an exact edge the
// limit engine also evaluates the piece ending there and keeps the lower limit (EU Table 2.2 note a,
// applied to the factors). At the first edge of the first piece (gamma_p at 10 s) there is no piece
// ending there and at the last edge of the last piece (gamma_p and alpha_max at 3e4 s) no piece
// starting there: the factor is still defined, the piece touching the edge is used (the tables'
// boundary convention, core/limits/intervals.ts). Sources:
//  - Photochemical limit 400-600 nm (EU Directive 2006/25/EC Table 2.3, read): 100 C_B J/m² for
//    10-100 s, 1 C_B W/m² for 100 s - 3e4 s, measured within gamma_p = 11 mrad (10-100 s), 1.1 t^0.5
//    mrad (100-1e4 s), 110 mrad (1e4-3e4 s) (EU Table 2.5, read); C_B = 1 below 450 nm. For a source
//    larger than gamma_p the limit rises by (alpha/gamma_p)^2 (derived, exposure-limits.md: only the
//    part of the source inside gamma_p counts). The icnirp2013 rows are the same (from memory).
//  - Retina 700-1050 nm, t > T2, extended source (EU Table 2.3, read): E = 18 C_A C_E T2^-0.25
//    W/m², C_A = 10^(0.002 (lambda - 700)), C_E = alpha/alpha_min for alpha_min < alpha <= alpha_max,
//    T2 = 10 * 10^((alpha - 1.5)/98.5) s (EU Table 2.5, read); alpha_max = 100 mrad at 3e4 s in both
//    sets (ICNIRP 2013: alpha_max = 100 mrad from 0.25 s, from memory).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const rel = (got: string | number | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' };
const cw = (ruleSet: 'eu2006' | 'icnirp2013', wavelength_nm: number, exposureDuration_s: number, sourceAngle_rad: number): BeamInput => ({
  ruleSet,
  wavelength_nm,
  exposureDuration_s,
  sourceAngle_rad,
  emission: { kind: 'cw', power_W: 1 },
  beam,
});
const T2 = (alpha_mrad: number): number => 10 * 10 ** ((alpha_mrad - 1.5) / 98.5);

describe.each(['eu2006', 'icnirp2013'] as const)('%s: gamma_p and alpha_max on the first and last duration edge', (ruleSet) => {
  it('440 nm, 10 s, 50 mrad source: photochemical H = 100 (50/11)^2 = 2066 J/m² (gamma_p = 11 mrad, also from below)', () => {
    const r = evaluateBeam(cw(ruleSet, 440, 10, 0.05));
    expect(rel(r.mpe.H_Jm2, 100 * (50 / 11) ** 2)).toBeLessThan(1e-12);
    expect(r.mpe.governingRow).toMatch(/-PC-1$/);
  });
  it('440 nm, 3e4 s, 200 mrad source: photochemical E = 1 (200/110)^2 = 3.31 W/m² (gamma_p = 110 mrad at the top edge)', () => {
    const r = evaluateBeam(cw(ruleSet, 440, 30000, 0.2));
    expect(rel(r.mpe.E_Wm2, (200 / 110) ** 2)).toBeLessThan(1e-12);
    expect(r.mpe.governingRow).toMatch(/-PC-2$/);
  });
  it('800 nm, 3e4 s, 50 mrad source: thermal E = 18 C_A (50/1.5) T2^-0.25 = 403 W/m² (alpha_max = 100 mrad at the top edge)', () => {
    const r = evaluateBeam(cw(ruleSet, 800, 30000, 0.05));
    expect(rel(r.mpe.E_Wm2, 18 * 10 ** (0.002 * 100) * (50 / 1.5) * T2(50) ** -0.25)).toBeLessThan(1e-9);
  });
});

// The edge tolerance (core/limits/intervals.ts: within 1e-9 relative a value is ON the edge). C_C at
// 1200 nm: 10^(0.018 (lambda - 1150)) = 10^0.9 = 7.94 from below, 8 from above (EU Table 2.5, read;
// the same in icnirp2013, from memory); on the edge the lower is kept (EU Table 2.2 note a applied to
// the factors). Retina 1050-1400 nm, t >= T2 = 10 s: E = 10 C_A C_C W/m², C_A = 5 (EU Table 2.3, read).
describe.each(['eu2006', 'icnirp2013'] as const)('%s: C_C near its 1200 nm edge, 10 s', (ruleSet) => {
  it.each([
    ['exactly 1200 nm: on the edge, C_C = 10^0.9', 1200, 50 * 10 ** 0.9],
    ['1200 nm + 5e-10 relative: on the edge, C_C = 10^(0.018 (lambda - 1150))', 1200.0000006, 50 * 10 ** (0.018 * (1200.0000006 - 1150))],
    ['1200 nm + 1.7e-9 relative: past the edge, C_C = 8', 1200.000002, 400],
    ['1200.0001 nm (8e-8 relative): past the edge, C_C = 8', 1200.0001, 400],
    ['1199.9999 nm: below, C_C = 10^(0.018 (lambda - 1150))', 1199.9999, 50 * 10 ** (0.018 * (1199.9999 - 1150))],
  ])('%s', (_n, wavelength_nm, E) => {
    const r = evaluateBeam({ ruleSet, wavelength_nm, exposureDuration_s: 10, emission: { kind: 'cw', power_W: 1 }, beam });
    expect(rel(r.mpe.E_Wm2, E)).toBeLessThan(1e-12);
  });
});
