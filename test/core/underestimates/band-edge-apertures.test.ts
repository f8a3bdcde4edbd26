// Under-estimate 3: at an exact band edge every candidate row is averaged over ITS OWN limiting
// aperture (limit specification errata: "each candidate row is averaged over its own aperture"; EU
// Directive Table 2.2 note a: on a boundary the lower value applies). The hazard is then never
// below the hazard just beside the edge.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, type BeamInput, type RuleSetId } from '../../../core/index.js';

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

// The same pattern in the correction factors: a factor whose pieces meet at an exact edge with
// different values is evaluated on both sides and the lower limit is kept (EU Table 2.2 note a).
// C_C (set (a), from memory): 10^(0.018*(lambda - 1150)) up to 1200 nm = 7.943 at 1200, then 8.
describe('correction factors at an exact edge (through evaluateBeam)', () => {
  it('set (a) 1200 nm, 1 ms: H = 90*t^0.75*C_C with C_C = 10^0.9 = 7.943 from below, 4.0202 J/m² (not 4.0489 with 8)', () => {
    const r = evaluateBeam(at('icnirp2013', 1200, 1e-3, 1));
    // derived: 90 * (1e-3)^0.75 * 10^0.9 = 90 * 5.6234e-3 * 7.9433
    expect(Math.abs(Number(r.mpe.H_Jm2) / 4.020178 - 1)).toBeLessThan(1e-5);
    expect(JSON.stringify(r.trace)).toMatch(/piece ending at this exact edge/);
  });
});

describe('EU T_min bands at an exact edge (through evaluateBeam)', () => {
  it('EU 1050 nm, 10 ns pulses at 100 kHz: the lower band T_min = 18 us applies (Table 2.6 bands are lo < lambda <= hi; limit specification errata)', () => {
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 1050, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e5 }, beam, exposureDuration_s: 10 });
    const text = JSON.stringify(r.mpe.rules);
    expect(text).toMatch(/pulse groups inside T_min counted as one pulse/); // the Directive names it T_min
    expect(JSON.stringify(r.trace)).toMatch(/T_min = 1\.8e-5 s/);
  });
});

// The class estimate had the same pattern: exactly at 400 nm only the visible class bands were used,
// although the ultraviolet rows apply there too (limit rows H-E-UVA-long and H-E-VIS-*).
describe('class estimate at an exact band edge (through evaluateBeam)', () => {
  const blue = (wavelength_nm: number): BeamInput => ({ wavelength_nm, emission: { kind: 'cw', power_W: 8e-4 }, beam: { diameter_m: 0.006, divergence_rad: 5e-4, definition: '1/e' } });
  it('400 nm, 0.8 mW: 3B as just below the edge (was 2)', () => {
    // derived: below 400 nm the Class 1 AEL is the 30 000 s UV-A limit 1e4/3e4 W/m² over the 1 mm
    // aperture (conservative mode) = 0.26 uW; 0.8 mW is far above 5x that (Class 3R), hence 3B
    expect(evaluateBeam(blue(400 * (1 - 1e-8))).classEstimate.estimate).toBe('3B');
    expect(evaluateBeam(blue(400)).classEstimate.estimate).toBe('3B');
  });
  it('the class at every band edge is at least the class just beside it (both rule sets, 1 mW to 1 W)', () => {
    const rank = ['1', '1M', '2', '2M', '3R', '3B', '4'];
    for (const ruleSet of ['icnirp2013', 'eu2006'] as const) {
      for (const edge of [302.5, 315, 400, 700, 1050, 1400, 1500, 1800, 2600]) {
        for (const P of [1e-3, 3e-2, 1]) {
          const x = (l: number): number => rank.indexOf(evaluateBeam({ ...blue(l), ruleSet, emission: { kind: 'cw', power_W: P } }).classEstimate.estimate);
          expect(x(edge), `${ruleSet} ${edge} nm ${P} W`).toBeGreaterThanOrEqual(Math.max(x(edge * (1 - 1e-8)), x(edge * (1 + 1e-8))));
        }
      }
    }
  });
});

// The additive rule had the same pattern: each beam's exposure was averaged over the governing
// row's aperture (7 mm at exactly 1400 nm), also for the cornea group whose row (1400-1500 nm) is
// averaged over 3.5 mm.
describe('additive rule at an exact band edge (through evaluateRoom)', () => {
  it('two 12 mW beams at exactly 1400 nm, 30 000 s: cornea group 2.4945 (was 0.624), retina group 1.559', () => {
    const b = (id: string): BeamInput => ({ id, ...at('icnirp2013', 1400, 30000, 0.012) });
    // Two beams of one laser share its path, so the additive rule sums them at one place (the
    // default place grouping; beams of different lasers are summed only where the officer says so).
    const room = evaluateRoom({ lasers: [{ id: 'A', name: 'A', beams: [b('a'), b('b')] }] });
    const sum = (effect: string): number => Number(room.additive.find((g) => g.effect === effect)?.sumOfFractions);
    // derived: 2 * (4*0.012 W/(pi*(3.5 mm)^2)) / 1000 W/m² (row H-E-IR1400-long over 3.5 mm)
    expect(sum('eye, cornea and lens') / ((2 * (4 * 0.012)) / (Math.PI * 0.0035 ** 2) / 1000)).toBeCloseTo(1, 9);
    // derived: 2 * (4*0.012 W/(pi*(7 mm)^2)) / 400 W/m² (row H-E-NIR2-5p, 10*C_A*C_C = 400 W/m², over 7 mm)
    expect(sum('eye, retina, thermal') / ((2 * (4 * 0.012)) / (Math.PI * 0.007 ** 2) / 400)).toBeCloseTo(1, 9);
  });
});
