// Under-estimate 2: EU Directive 2006/25/EC Annex II Table 2.3, 700-1400 nm, extended sources,
// t > T2: the limit E = 18*C_A*C_C*C_E*T2^-0.25 W/m² must not exceed 1000 W/m² (the note beside the
// entry; from memory, limit specification errata and rows EU-E-NIR1-6x / EU-E-NIR2-6x). Set (a)
// applies the same cap in conservative mode (unverified there; the stricter EU value).
// Beam: CW 1 W, 1/e 1 mm, 1 mrad; NOHD = (sqrt(4P/(pi*E)) - a)/phi.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type RuleSetId } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const input = (ruleSet: RuleSetId, wavelength_nm: number, alpha_rad: number, conservative = true): BeamInput => ({
  ruleSet,
  wavelength_nm,
  emission: { kind: 'cw', power_W: 1 },
  beam,
  exposureDuration_s: 1000,
  sourceAngle_rad: alpha_rad,
  settings: { conservative },
});

// [name, input, expected limit W/m², expected NOHD m, derivation]
const CASES: ReadonlyArray<readonly [string, BeamInput, number, number, string]> = [
  ['EU 1064 nm, 100 mrad, 1000 s: 1000 (was 1897)', input('eu2006', 1064, 0.1), 1000, 34.6825, 'EU Table 2.3 note: 18*5*1*66.67*100^-0.25 = 1897 > 1000, capped'],
  ['EU 1300 nm, 100 mrad, 1000 s: 1000 (was 15 179)', input('eu2006', 1300, 0.1), 1000, 34.6825, 'EU Table 2.3 note: C_C = 8, 18*5*8*66.67*100^-0.25 = 15 179 > 1000, capped'],
  ['EU 1000 nm, 100 mrad, 1000 s: 1000 (was 1511)', input('eu2006', 1000, 0.1), 1000, 34.6825, 'EU Table 2.3 note: C_A = 10^0.6 = 3.981, 18*3.981*66.67*0.3162 = 1511 > 1000, capped'],
  ['EU 800 nm, 100 mrad, 1000 s: 601.4 (below the cap, unchanged)', input('eu2006', 800, 0.1), 601.4247, 45.0, 'derived: C_A = 10^0.2 = 1.5849, 18*1.5849*66.667*100^-0.25 = 601.42 < 1000'],
  ['EU 1064 nm, 10 mrad, 1000 s: 321 (below the cap, unchanged)', input('eu2006', 1064, 0.01), 321.0537, 62.0, 'derived: T2 = 10*10^(8.5/98.5) = 12.198 s, C_E = 6.667, 18*5*6.667*12.198^-0.25 = 321.05 < 1000'],
  ['set (a), conservative, 1064 nm, 100 mrad: 1000 (EU cap used while unverified)', input('icnirp2013', 1064, 0.1), 1000, 34.6825, 'limit specification errata: conservative mode applies the EU cap'],
  ['set (a), conservative mode off, 1064 nm, 100 mrad: remembered 1897', input('icnirp2013', 1064, 0.1, false), 1897.37, 24.9, 'ICNIRP 2013 row H-E-NIR2-6x as remembered (no cap)'],
];

describe('EU Table 2.3 cap of 1000 W/m² for 700-1400 nm extended sources (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, limit, nohd, _derivation) => {
    const r = evaluateBeam(x);
    expect(Math.abs(Number(r.mpe.E_Wm2) / limit - 1)).toBeLessThan(1e-4);
    const expectedNohd = (Math.sqrt((4 * 1) / (Math.PI * limit)) - 0.001) / 0.001; // derived, range equation
    expect(Math.abs(Number(r.nohd_m) / expectedNohd - 1)).toBeLessThan(1e-4);
    expect(Math.abs(expectedNohd / nohd - 1)).toBeLessThan(0.01);
  });

  it('the trace shows the cap with its source', () => {
    const r = evaluateBeam(CASES[0]?.[1] as BeamInput);
    const text = JSON.stringify(r.trace);
    expect(text).toMatch(/not to exceed 1000 W\/m²/);
    expect(text).toMatch(/Table 2\.3/);
  });
});
