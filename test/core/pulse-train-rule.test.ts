// The pulse-train rule (rule 3, C_P) in the cases a mutation run of core/limits/pulse-rules.ts found
// unchecked (test/mutation/RESULTS.md): which pulses count as one, which pulse duration decides the
// 0.25 s bound, the verified piecewise C_P, and which base C_P multiplies. Each case reads the
// per-pulse values of all three rules as the report prints them (evaluateBeam, eye).
// Expected values are computed here from the published rows, never read back from the core.
// Sources:
//  - EU Directive 2006/25/EC Annex II (read): Table 2.2 rows (1050-1400 nm: 2.7e5 t^0.75 C_C for
//    1e-11 to 1e-9 s, 5e-2 C_C from 1e-9 s; 1500-1800 nm: 1e13 W/m² below 1e-9 s, 1e4 J/m² to 10 s),
//    Table 2.6 (rules 1-3, T_min 50 µs at 1050-1400 nm, 10 s at 1500-1800 nm);
//  - BGI 832 (read): pulses inside T_min count as one only if each is longer than 1 ns; C_P only
//    below 0.25 s; N counted up to 10 s above 1400 nm;
//  - ICNIRP 2013 / IEC 60825-1:2014 4.3 f) (from memory; limit specification 4.6): C_P piecewise
//    (C_P = 1 for alpha <= 5 mrad) once verified, N^-0.25 until then; T_i = 5 µs at 400-1050 nm;
//    400-700 nm rows 1.5e-4 C_E (stricter alternative of the uncertain 1e-13 to 1e-11 s row),
//    2e-3 C_E for 1e-9 to 5e-6 s, 18 t^0.75 C_E above.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../core/index.js';

const rel = (got: string | number | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' };
const train = (pulseEnergy_J: number, pulseDuration_s: number, repetitionRate_Hz: number): BeamInput['emission'] => ({ kind: 'pulsed', pulseEnergy_J, pulseDuration_s, repetitionRate_Hz });

interface Case {
  readonly why: string;
  readonly source: string;
  readonly input: BeamInput;
  /** Per-pulse values of rule 1 (with any pulse group), rule 3, and whether rule 3 applies. */
  readonly rule1: number;
  readonly rule3: number;
  readonly applies: boolean;
}

const CASES: Case[] = [
  {
    why: 'EU 1064 nm, 0.5 ns pulses at 40 kHz over 0.25 s: two pulses inside T_min are summed for rule 1 (0.05/2), but pulses of 1 ns or less still count singly for C_P: N = 10 000 on the 0.5 ns limit',
    source: 'BGI 832 (read): counted as one only for pulses longer than 1 ns; EU Table 2.2 2.7e5 t^0.75 C_C and 5e-2 C_C (read)',
    input: { ruleSet: 'eu2006', wavelength_nm: 1064, exposureDuration_s: 0.25, emission: train(1e-6, 5e-10, 4e4), beam },
    rule1: 5e-2 / 2,
    rule3: 2.7e5 * 5e-10 ** 0.75 * 1e4 ** -0.25,
    applies: true,
  },
  {
    why: 'EU 1550 nm, 0.5 ns pulses at 10 Hz over 100 s: the 10 s pulse group does not stop C_P, because these pulses are not counted as one; the 0.5 ns pulse is below 0.25 s (N = 100 within 10 s)',
    source: 'BGI 832 (read); EU Table 2.2 1e13 W/m² x 0.5 ns and 1e4 J/m² per 100-pulse group (read)',
    input: { ruleSet: 'eu2006', wavelength_nm: 1550, exposureDuration_s: 100, emission: train(1e-6, 5e-10, 10), beam },
    rule1: 1e4 / 100,
    rule3: 1e13 * 5e-10 * 100 ** -0.25,
    applies: true,
  },
  {
    why: 'ICNIRP 532 nm point source, 10 ns at 1 kHz over 0.25 s, C_P verified: the piecewise C_P = 1 for alpha <= 5 mrad, rule 3 equals rule 1',
    source: 'IEC 60825-1:2014 4.3 f) C5 (from memory, uncertain; used only once verified); ICNIRP 2013 2e-3 C_E (from memory)',
    input: { ruleSet: 'icnirp2013', wavelength_nm: 532, exposureDuration_s: 0.25, emission: train(1e-6, 1e-8, 1e3), beam, settings: { verifiedRows: ['rule:CP'] } },
    rule1: 2e-3,
    rule3: 2e-3,
    applies: true,
  },
  {
    why: 'the same beam in conservative mode (C_P not verified): N^-0.25 with N = 250',
    source: 'limit specification 4.6: N^-0.25 until the piecewise form is verified (ours, the stricter value)',
    input: { ruleSet: 'icnirp2013', wavelength_nm: 532, exposureDuration_s: 0.25, emission: train(1e-6, 1e-8, 1e3), beam },
    rule1: 2e-3,
    rule3: 2e-3 * 250 ** -0.25,
    applies: true,
  },
  {
    why: 'ICNIRP 532 nm, 100 fs pulses at 1 MHz over 0.25 s: 5 pulses inside T_i = 5 µs are one pulse (N = 50 000 groups), but their per-pulse group limit 18 (5 µs)^0.75 / 5 is above the 1.5e-4 single-pulse limit, so C_P multiplies the single-pulse limit',
    source: 'ICNIRP 2013 / IEC 60825-1:2014 4.3 f) (from memory): T_i, rule 3; 400-700 nm rows (from memory; 1.5e-4 the stricter alternative)',
    input: { ruleSet: 'icnirp2013', wavelength_nm: 532, exposureDuration_s: 0.25, emission: train(1e-9, 1e-13, 1e6), beam },
    rule1: 1.5e-4,
    rule3: 1.5e-4 * 50000 ** -0.25,
    applies: true,
  },
  {
    why: 'ICNIRP 1300 nm, 500 mrad source, 10 ns at 200 kHz over 0.25 s: 3 pulses inside T_i = 13 µs are one; C_P multiplies the RETINAL thermal group limit 90 (13 µs)^0.75 C_C C_E / 3, not the lower corneal (skin-row) group limit',
    source: 'ILSC2019 (read): C_P for retinal thermal limits only; ICNIRP 2013 90 t^0.75 C_C C_E, C_C = 8 (stricter alternative), C_E = alpha²/(alpha_min alpha_max), skin 200 C_A (from memory; = EU Table 2.4, read)',
    input: { ruleSet: 'icnirp2013', wavelength_nm: 1300, sourceAngle_rad: 0.5, exposureDuration_s: 0.25, emission: train(1e-9, 1e-8, 2e5), beam },
    rule1: 200 * 5,
    rule3: ((90 * 13e-6 ** 0.75 * 8 * (500 ** 2 / (1.5 * 5))) / 3) * 16667 ** -0.25,
    applies: true,
  },
];

describe('rule 3 (C_P) as the report prints it (evaluateBeam, eye)', () => {
  it.each(CASES.map((c) => [`${c.why} [${c.source}]`, c] as const))('%s', (_n, c) => {
    const rules = evaluateBeam(c.input).mpe.rules;
    const r1 = rules.find((r) => r.rule === 'single-pulse');
    const r3 = rules.find((r) => r.rule === 'pulse-train');
    expect(rel(r1?.H_Jm2, c.rule1)).toBeLessThan(1e-9);
    expect(r3?.applies).toBe(c.applies);
    expect(rel(r3?.H_Jm2, c.rule3)).toBeLessThan(1e-9);
  });
});
