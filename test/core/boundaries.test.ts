// One boundary convention for every table in core/limits (core/limits/intervals.ts): intervals are
// half-open [lo, hi) as the limit specification writes them (convention 'boundary_values'), and a
// value within 1e-9 (relative) of an edge is ON that edge. On an edge the lower limit applies (EU
// 2006/25/EC Annex II Table 2.2 note a, read), for the rows and for the correction factors alike;
// the EU T_min bands are written lo < lambda <= hi (Table 2.6, read; limit specification errata).
// Each case is checked exactly on the edge, 1e-10 beside it on both sides (the same result: on the
// edge), and 1e-6 beside it (the ordinary side), through the numbers the officer sees.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../core/index.js';

const rel = (got: string | number, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' };

interface EdgeCase {
  readonly name: string;
  readonly source: string;
  /** The input with the boundary quantity set to x. */
  readonly input: (x: number) => BeamInput;
  readonly edge: number;
  /** The eye limit (governing per-pulse H, J/m²) on the edge, just below it and just above it. */
  readonly onEdge: number;
  readonly below: number;
  readonly above: number;
}

const CASES: EdgeCase[] = [
  {
    name: 'factor edge in wavelength: C_C at 1200 nm (10^0.9 = 7.943 below, 8 above), 1 ms pulse',
    source: 'ICNIRP 2013 / IEC 60825-1:2014 C_C (from memory; = EU Table 2.5 C_C, read); EU Table 2.2 note a (read); 90 t^0.75 C_C J/m²',
    input: (x) => ({ ruleSet: 'icnirp2013', wavelength_nm: x, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3 }, beam }),
    edge: 1200,
    onEdge: 90 * 1e-3 ** 0.75 * 10 ** 0.9,
    below: 90 * 1e-3 ** 0.75 * 10 ** (0.018 * (1200 * (1 - 1e-6) - 1150)),
    above: 90 * 1e-3 ** 0.75 * 8,
  },
  {
    name: 'row edge in duration: EU 1064 nm at 50 µs (5e-2 J/m² below, 90 t^0.75 above)',
    source: 'EU Table 2.2, 1050-1400 nm rows, and note a: the lower value on a boundary (read)',
    input: (x) => ({ ruleSet: 'eu2006', wavelength_nm: 1064, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: x }, beam }),
    edge: 5e-5,
    onEdge: 5e-2,
    below: 5e-2,
    above: 90 * (5e-5 * (1 + 1e-6)) ** 0.75,
  },
  {
    name: 'grouping-time edge side: EU 1050 nm, 10 ns at 40 kHz over 0.25 s (T_min 18 µs on the edge and below, 50 µs above)',
    source: 'EU Table 2.6 T_min bands lo < lambda <= hi (read; limit specification errata); Table 2.2 5e-3 C_A, 5e-2 C_C; Table 2.5 C_A (read)',
    input: (x) => ({ ruleSet: 'eu2006', wavelength_nm: x, exposureDuration_s: 0.25, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-8, repetitionRate_Hz: 4e4 }, beam }),
    edge: 1050,
    // on the edge: 18 µs, no grouping, N = 10 000 on the lower row 5e-3 C_A (C_A = 5 from the piece starting at 1050)
    onEdge: 5e-3 * 5 * 1e4 ** -0.25,
    below: 5e-3 * 10 ** (0.002 * (1050 * (1 - 1e-6) - 700)) * 1e4 ** -0.25,
    // above: T_min 50 µs, two pulses one 50 µs pulse, 5000 groups; 5e-2 C_C / 2 per pulse
    above: (5e-2 / 2) * 5000 ** -0.25,
  },
];

describe('a value within 1e-9 of a table edge is on the edge (core/limits/intervals.ts)', () => {
  it.each(CASES.map((c) => [`${c.name} [${c.source}]`, c] as const))('%s', (_n, c) => {
    const H = (x: number): string => evaluateBeam(c.input(x)).mpe.H_Jm2;
    expect(rel(H(c.edge), c.onEdge)).toBeLessThan(1e-9);
    expect(rel(H(c.edge * (1 + 1e-10)), c.onEdge)).toBeLessThan(1e-8);
    expect(rel(H(c.edge * (1 - 1e-10)), c.onEdge)).toBeLessThan(1e-8);
    expect(rel(H(c.edge * (1 - 1e-6)), c.below)).toBeLessThan(1e-5);
    expect(rel(H(c.edge * (1 + 1e-6)), c.above)).toBeLessThan(1e-5);
  });

  it('counting window at 1400 nm (EU, 100 mrad source: T2 = 100 s below, 10 s from 1400 nm): 1e-10 below the edge counts like the edge (derived: one convention)', () => {
    // BGI 832 (read): N counted up to T2 at 400-1400 nm, up to 10 s above; EU Table 2.5 T2 = 100 s for alpha > 100 mrad (read)
    const train = (x: number): BeamInput => ({ ruleSet: 'eu2006', wavelength_nm: x, sourceAngle_rad: 0.1, exposureDuration_s: 100, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-8, repetitionRate_Hz: 10 }, beam });
    const detail = (x: number): string => evaluateBeam(train(x)).mpe.rules.find((r) => r.rule === 'pulse-train')?.detail ?? '';
    expect(detail(1400)).toMatch(/N counted within 10 s/);
    expect(detail(1400 * (1 - 1e-10))).toMatch(/N counted within 10 s/);
    expect(detail(1400 * (1 - 1e-6))).toMatch(/N counted within T = 100 s \(not longer than T2 = 100 s\)/);
  });
});
