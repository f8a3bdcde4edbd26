// The officer's checks of a correction factor against the published document, as the limit the
// officer sees shows them (through evaluateBeam). SAFETY.md "Checks of the limit tables": an entry
// remembered but not read is replaced by its stricter alternative in conservative mode until the
// officer checks it; a check ('matches' or 'differs') or a verified entry ends the replacement; a
// 'differs' check evaluates the document's value too and the LOWER limit is kept, never the higher.
// Sources:
//  - 1050-1400 nm retina, t >= T2 (10 s for a point source): E = 10 C_A C_C W/m², C_A = 5 (EU
//    Directive 2006/25/EC Table 2.3 and Table 2.5, read; the icnirp2013 rows the same, from memory).
//  - C_C over 1200-1400 nm: 8 in the EU Table 2.5 (read); 8 + 10^(0.04 (lambda - 1250)) in ICNIRP
//    2013 / IEC 60825-1:2014 C7 (from memory, uncertain; exposure-limits.md "C_C above 1250 nm"). At
//    1250 nm the remembered value is 8 + 10^0 = 9: E = 10 * 5 * 9 = 450 W/m², against 400 W/m² with 8.
//  - 302.5-315 nm, t > T1: H = C2 = 10^(0.2 (lambda - 295)) J/m² (ICNIRP 2013 / IEC 60825-1:2014,
//    from memory, the icnirp2013 table): 1000 J/m² at 310 nm (T1 = 10^(0.8*15) 1e-15 s = 1 ms).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const rel = (got: string | number | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' };
type Settings = NonNullable<BeamInput['settings']>;
const check = (key: string, verdict: 'matches' | 'differs', documentExpr?: string): Settings => ({
  rowChecks: [
    { key, verdict, ...(documentExpr !== undefined ? { documentExpr } : {}), checkId: 'c7', reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-11-30' },
  ],
});
const cw = (wavelength_nm: number, exposureDuration_s: number, settings?: Settings): BeamInput => ({
  wavelength_nm,
  exposureDuration_s,
  emission: { kind: 'cw', power_W: 1 },
  beam,
  ...(settings ? { settings } : {}),
});

describe('C_C at 1250 nm (ICNIRP 2013 set): the remembered value is replaced by 8 until the officer checks it', () => {
  it.each([
    ['no check: C_C = 8 (conservative mode), E = 400 W/m², the replacement listed', undefined, 400, true],
    ['the piece checked as matching (factor:CC[1200-1400 nm]): C_C = 9, E = 450 W/m²', check('factor:CC[1200-1400 nm]', 'matches'), 450, false],
    ['the whole factor checked as matching (factor:CC): C_C = 9, E = 450 W/m²', check('factor:CC', 'matches'), 450, false],
    ['the factor marked verified: C_C = 9, E = 450 W/m²', { verifiedRows: ['factor:CC'] }, 450, false],
    ['conservative mode off: C_C = 9, E = 450 W/m²', { conservative: false }, 450, false],
    ['another factor verified (C_A): C_C stays 8', { verifiedRows: ['factor:CA'] }, 400, true],
    ['a check of another entry (C_A piece): C_C stays 8', check('factor:CA[1050-1400 nm]', 'matches'), 400, true],
  ] as const)('%s', (_n, settings, E, listed) => {
    const r = evaluateBeam(cw(1250, 10, settings));
    expect(rel(r.mpe.E_Wm2, E)).toBeLessThan(1e-12);
    expect(r.mpe.E_Wm2_reported).toBe(String(E));
    expect(r.mpe.conservativeReplacements.includes('factor:CC')).toBe(listed);
  });
  it('a "differs" check of the piece giving 8.5: evaluated with both, the lower (8.5, E = 425 W/m²) is kept', () => {
    const r = evaluateBeam(cw(1250, 10, check('factor:CC[1200-1400 nm]', 'differs', '8.5')));
    expect(rel(r.mpe.E_Wm2, 425)).toBeLessThan(1e-12);
  });
  it('a "differs" check of the piece giving 20: the value as written (9) is lower and is kept, E = 450 W/m²', () => {
    const r = evaluateBeam(cw(1250, 10, check('factor:CC[1200-1400 nm]', 'differs', '20')));
    expect(rel(r.mpe.E_Wm2, 450)).toBeLessThan(1e-12);
  });
});

describe('C2 at 310 nm over 100 s (a factor with one formula and its own band, 302.5-315 nm)', () => {
  it.each([
    ['no check: H = C2 = 1000 J/m²', undefined, 1000],
    ['checked as differing, the document gives 500: the lower 500 J/m² is used', check('factor:C2', 'differs', '500'), 500],
    ['checked as differing, the document gives 2000: the value as written (1000 J/m²) is lower and is kept', check('factor:C2', 'differs', '2000'), 1000],
    ['checked as matching: H = 1000 J/m²', check('factor:C2', 'matches'), 1000],
  ] as const)('%s', (_n, settings, H) => {
    const r = evaluateBeam(cw(310, 100, settings));
    expect(rel(r.mpe.H_Jm2, H)).toBeLessThan(1e-12);
  });
});

// A factor that changes a limit without appearing in the row's expression: gamma_p (the field of view
// of the photochemical rows, (alpha/gamma_p)^2), alpha_max (through C_E = alpha^2/(alpha_min
// alpha_max) above alpha_max) and T2 (which row applies: 18 C_E t^0.75 up to T2, 18 C_E T2^-0.25 W/m²
// after). Sources as in factor-edges-seen.test.ts (EU Directive 2006/25/EC Tables 2.3 and 2.5, read;
// the icnirp2013 rows the same, from memory). Before this session a 'differs' check of these factors
// was ignored: the limit as written was shown even where the document's value gives a lower one.
describe('a "differs" check of gamma_p, alpha_max or T2 (ICNIRP 2013 set): the lower limit is kept and the check named', () => {
  const ext = (wavelength_nm: number, exposureDuration_s: number, sourceAngle_rad: number, settings?: Settings): BeamInput => ({
    ...cw(wavelength_nm, exposureDuration_s, settings),
    sourceAngle_rad,
  });
  const CA800 = 10 ** (0.002 * 100);
  it.each([
    ['gamma_p 10-100 s given as 22 mrad: 440 nm, 10 s, 50 mrad, H = 100 (50/22)^2 = 517 J/m² (11 mrad as written: 2066 J/m²)', ext(440, 10, 0.05, check('factor:gamma_p[10-100 s]', 'differs', '22')), 'H', 100 * (50 / 22) ** 2],
    ['alpha_max given as 200 mrad: 800 nm, 3e4 s, 150 mrad, C_E = 150/1.5 = 100, T2 = 100 s: E = 18 C_A 100 * 100^-0.25 = 902 W/m²', ext(800, 30000, 0.15, check('factor:alpha_max[0.25-30000 s]', 'differs', '200')), 'E', 18 * CA800 * 100 * 100 ** -0.25],
    ['T2 given as 100 s: 800 nm, 100 s, 50 mrad, E = 18 C_A (50/1.5) 100^-0.25 = 301 W/m² (T2 = 31 s as written: 403 W/m²)', ext(800, 100, 0.05, check('factor:T2[1.5 <= alpha <= 100]', 'differs', '100')), 'E', 18 * CA800 * (50 / 1.5) * 100 ** -0.25],
  ] as const)('%s', (_n, x, q, want) => {
    const r = evaluateBeam(x);
    expect(rel(q === 'H' ? r.mpe.H_Jm2 : r.mpe.E_Wm2, want)).toBeLessThan(1e-12);
    expect(r.warnings.some((w) => w.startsWith('Limit-table ') && w.includes('the lower limit is kept'))).toBe(true);
  });
  it('gamma_p given as 5 mrad (higher limit): the value as written (11 mrad, 2066 J/m²) is kept', () => {
    const r = evaluateBeam(ext(440, 10, 0.05, check('factor:gamma_p[10-100 s]', 'differs', '5')));
    expect(rel(r.mpe.H_Jm2, 100 * (50 / 11) ** 2)).toBeLessThan(1e-12);
  });
});
