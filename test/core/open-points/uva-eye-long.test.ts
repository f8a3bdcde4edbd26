// UV-A eye, 315-400 nm, above 1000 s (set (a)): the table keeps H = 1e4 J/m² up to 30 000 s; older
// editions give E = 10 W/m² from 1000 s (limit specification errata, both from memory). The stricter
// 1e4 J/m² is kept while unverified; the row is marked uncertain and carries the older reading, which
// a named person can switch on by verifying the row (settings.verifiedRows). EU Table 2.3: 1e4 J/m²
// (from memory), unchanged.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type LimitSettings, type RuleSetId } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const at = (ruleSet: RuleSetId, T: number, settings?: LimitSettings): BeamInput => ({ ruleSet, wavelength_nm: 355, emission: { kind: 'cw', power_W: 1e-3 }, beam, exposureDuration_s: T, ...(settings ? { settings } : {}) });

// [name, input, expected H J/m², derivation]
const CASES: ReadonlyArray<readonly [string, BeamInput, number, string]> = [
  ['set (a), 30 000 s, unverified: 1e4 J/m² (stricter kept)', at('icnirp2013', 30000), 1e4, 'H-E-UVA-long as in the limit specification'],
  ['set (a), 30 000 s, verified with the older reading: 10 W/m² * 30 000 s = 3e5 J/m²', at('icnirp2013', 30000, { verifiedRows: ['H-E-UVA-long'] }), 3e5, 'older editions: E = 10 W/m² from 1000 s (from memory)'],
  ['set (a), 500 s, verified: 1e4 J/m² (the older reading starts at 1000 s)', at('icnirp2013', 500, { verifiedRows: ['H-E-UVA-long'] }), 1e4, 'below 1000 s both readings give 1e4 J/m²'],
  ['set (a), conservative mode off: 1e4 J/m² (the remembered table value)', at('icnirp2013', 30000, { conservative: false }), 1e4, 'limit specification section 9 vector, as remembered'],
  ['EU, 30 000 s: 1e4 J/m²', at('eu2006', 30000), 1e4, 'EU Table 2.3 (from memory), row EU-E-UVA-long'],
];

describe('UV-A eye above 1000 s (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, H, _derivation) => {
    expect(Math.abs(Number(evaluateBeam(x).mpe.H_Jm2) / H - 1)).toBeLessThan(1e-9);
  });
  it('the trace marks the row uncertain and names the alternative reading', () => {
    const text = JSON.stringify(evaluateBeam(CASES[0]?.[1] as BeamInput).trace);
    expect(text).toMatch(/from memory, uncertain/);
    expect(text).toMatch(/older editions/);
    expect(text).toMatch(/10 W\/m²/);
  });
});
