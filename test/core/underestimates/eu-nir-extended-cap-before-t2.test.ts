// EU Directive 2006/25/EC Annex II Table 2.3 note for 700-1400 nm ("not to exceed 1000 W/m²"; from
// memory, limit specification rows EU-E-NIR1-6x / EU-E-NIR2-6x and section 5.4, which gives the note
// for the band's extended-source entries): the cap holds for every long exposure (t >= 10 s) of an
// extended source, i.e. also on the 10 s - T2 rows EU-E-NIR1-5x / EU-E-NIR2-5x, where the limit is
// written as H = 18*C_A*C_C*C_E*t^0.75 J/m² and its mean irradiance H/t can exceed 1000 W/m².
// Set (a) applies the same cap in conservative mode (unverified there; the stricter EU value).
// Beam: CW 1 W, 1/e 1 mm, 1 mrad; NOHD = (sqrt(4P/(pi*E)) - a)/phi (range equation, derived).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type RuleSetId } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const input = (ruleSet: RuleSetId, wavelength_nm: number, alpha_rad: number, T: number, conservative = true): BeamInput => ({
  ruleSet,
  wavelength_nm,
  emission: { kind: 'cw', power_W: 1 },
  beam,
  exposureDuration_s: T,
  sourceAngle_rad: alpha_rad,
  settings: { conservative },
});

// [name, input, expected limit E (W/m²), governing row, capped?, derivation]
const CASES: ReadonlyArray<readonly [string, BeamInput, number, string, boolean, string]> = [
  ['EU 1064 nm, 100 mrad, 50 s: 1000 (was 2256)', input('eu2006', 1064, 0.1, 50), 1000, 'EU-E-NIR2-5x', true, 'EU Table 2.3 note: T2 = 100 s, C_E = 66.67, 90*50^0.75*66.67/50 = 2256 W/m² > 1000, capped'],
  ['EU 1300 nm, 100 mrad, 50 s: 1000 (was 18 049)', input('eu2006', 1300, 0.1, 50), 1000, 'EU-E-NIR2-5x', true, 'EU Table 2.3 note: C_C = 8, 90*8*66.67*50^-0.25 = 18 049 W/m² > 1000, capped'],
  ['EU 1000 nm, 100 mrad, 50 s: 1000 (was 1797)', input('eu2006', 1000, 0.1, 50), 1000, 'EU-E-NIR1-5x', true, 'EU Table 2.3 note: C_A = 10^0.6 = 3.981, 18*3.981*66.67*50^-0.25 = 1797 W/m² > 1000, capped'],
  ['EU 1064 nm, 50 mrad, exactly 10 s: 1000 (was 1687)', input('eu2006', 1064, 0.05, 10), 1000, 'EU-E-NIR2-5x', true, 'EU Table 2.3 note at the 10 s edge: 90*33.33*10^-0.25 = 1687 W/m² on both rows; the capped Table 2.3 row is lower and governs (Table 2.2 note a)'],
  ['EU 800 nm, 100 mrad, 50 s: 715.3 (below the cap, unchanged)', input('eu2006', 800, 0.1, 50), 715.25, 'EU-E-NIR1-5x', false, 'derived: C_A = 10^0.2 = 1.5849, 18*1.5849*66.67*50^-0.25 = 715.25 W/m² < 1000'],
  ['EU 1064 nm, 10 mrad, 11 s: 329.5 (below the cap, unchanged)', input('eu2006', 1064, 0.01, 11), 329.46, 'EU-E-NIR2-5x', false, 'derived: T2 = 10*10^(8.5/98.5) = 12.20 s > 11 s, C_E = 6.667, 90*6.667*11^-0.25 = 329.46 W/m² < 1000'],
  ['EU 1064 nm, 100 mrad, 9.9 s: 3383 (Table 2.2, read: no cap below 10 s)', input('eu2006', 1064, 0.1, 9.9), 3382.6, 'EU-E-NIR2-4', false, 'EU Table 2.2 (read) has no cap: 90*66.67*9.9^-0.25 = 3382.6 W/m²; the limit steps down at 10 s'],
  ['set (a), conservative, 1064 nm, 100 mrad, 50 s: 1000 (EU cap used while unverified)', input('icnirp2013', 1064, 0.1, 50), 1000, 'H-E-NIR2-5x', true, 'limit specification errata: conservative mode applies the EU cap'],
  ['set (a), conservative mode off, 1064 nm, 100 mrad, 50 s: remembered 2256', input('icnirp2013', 1064, 0.1, 50, false), 2256.36, 'H-E-NIR2-5x', false, 'ICNIRP 2013 row H-E-NIR2-5x as remembered (no cap)'],
];

describe('EU Table 2.3 cap of 1000 W/m² on the 10 s - T2 rows of 700-1400 nm extended sources (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, limit, row, capped, _derivation) => {
    const r = evaluateBeam(x);
    expect(Math.abs(Number(r.mpe.E_Wm2) / limit - 1)).toBeLessThan(1e-4);
    expect(r.mpe.governingRow).toBe(row);
    const expectedNohd = (Math.sqrt((4 * 1) / (Math.PI * limit)) - 0.001) / 0.001; // derived, range equation
    expect(Math.abs(Number(r.nohd_m) / expectedNohd - 1)).toBeLessThan(1e-4);
    const text = JSON.stringify(r.trace);
    expect(text.includes(`Cap on row ${row}`)).toBe(capped);
  });

  it('the trace shows the uncapped value, the cap and its source on the 10 s - T2 row', () => {
    const r = evaluateBeam(CASES[0]?.[1] as BeamInput);
    const text = JSON.stringify(r.trace);
    expect(text).toMatch(/not to exceed 1000 W\/m²: 2256\.\d* W\/m² capped to 1000 W\/m²/);
    expect(text).toMatch(/Cap on row EU-E-NIR2-5x","detail":"the limit is not to exceed 1000 W\/m² \(Table 2\.3 note\)","source":"EU 2006\/25\/EC Annex II Table 2\.3 note/);
  });
});
