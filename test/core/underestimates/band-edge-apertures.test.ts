// Under-estimate 3: at an exact band edge every candidate row is averaged over ITS OWN limiting
// aperture (limit specification errata: "each candidate row is averaged over its own aperture"; EU
// Directive Table 2.2 note a: on a boundary the lower value applies). The hazard is then never
// below the hazard just beside the edge.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type RuleSetId } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const at = (ruleSet: RuleSetId, wavelength_nm: number, exposureDuration_s: number, power_W: number): BeamInput => ({ ruleSet, wavelength_nm, emission: { kind: 'cw', power_W }, beam, exposureDuration_s });

// 1400 nm, 30 000 s, 12 mW: the 1400-1500 nm row (1000 W/m², limit specification rows
// H-E-IR1400-long / EU-E-IR1400-long) is averaged over 3.5 mm (EU Table 2.2 apertures, read).
const CASES: ReadonlyArray<readonly [string, BeamInput, number, string]> = [
  ['set (a) exactly 1400 nm, 30 000 s, 12 mW: 2.91 m (was 0)', at('icnirp2013', 1400, 30000, 0.012), 2.90882, 'derived: (sqrt(4*0.012/(pi*1000)) - 1 mm)/1 mrad'],
  ['EU exactly 1400 nm, 30 000 s, 12 mW: 2.91 m (was 0)', at('eu2006', 1400, 30000, 0.012), 2.90882, 'derived: as above, EU rows'],
  ['set (a) 1400.001 nm, 30 000 s, 12 mW (beside the edge)', at('icnirp2013', 1400.001, 30000, 0.012), 2.90882, 'derived: as above'],
  ['set (a) exactly 1400 nm, 100 s, 12 mW: 2.91 m', at('icnirp2013', 1400, 100, 0.012), 2.90882, 'derived: as above (3.5 mm from 10 s on)'],
];

describe('apertures at an exact band edge (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, expected, _derivation) => {
    expect(Math.abs(Number(evaluateBeam(x).nohd_m) / expected - 1)).toBeLessThan(1e-4);
  });
  it('the criterion of the 1400-1500 nm row names its own 3.5 mm aperture', () => {
    const r = evaluateBeam(CASES[0]?.[1] as BeamInput);
    const dir = r.distances.find((d) => d.kind === 'direct');
    expect(JSON.stringify(dir?.trace)).toMatch(/H-E-IR1400-long \(cornea thermal\), aperture 3\.5 mm/);
  });
});
