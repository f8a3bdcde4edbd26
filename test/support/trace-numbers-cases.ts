/**
 * Beams whose derivations hold numbers far from 1, and how the officer must read them in the
 * derivation window and the report's appendix alike: engineering notation with SI prefixes (BIPM SI
 * brochure, 9th edition (2019), Table 7: f = 1e-15, n = 1e-9, µ = 1e-6, m = 1e-3, k = 1e3, G = 1e9),
 * every figure the core wrote kept (the derivation is where full precision belongs), never the raw
 * decimal. Beams: invented, set in the demo scenario's laboratory (assets/demo).
 *
 * The numbers themselves (read, not computed here):
 * - 800 nm, 100 fs single pulse, ICNIRP 2013 rule set in conservative mode: retina thermal limit
 *   H = 1.5e-4 · C_A J/m² (the stricter value the table uses for its unchecked 1e-13 s row), with
 *   C_A = 10^(0.002(λ − 700)) = 10^0.2 = 1.58489 at 800 nm (ICNIRP 2013, Table 3; from memory), so
 *   H = 2.37734e-4 J/m² and E = H / t = 2.37734e-4 / 1e-13 = 2.37734e9 W/m² -> "2.37734 GW/m²".
 * - α_min = 1.5 mrad (ICNIRP 2013 and Directive 2006/25/EC, Annex II, Table 2.5: "α_min = 1.5 mrad");
 *   α_max = 5 mrad for t < 625 µs (ICNIRP 2013; from memory).
 * - the same pulses at 1 kHz over 10 s (infrared: no aversion response, 10 s, common practice): the
 *   three pulse rules (IEC 60825-1:2014, repetitively pulsed exposure; from memory) give rule 1
 *   2.37734e-4 J/m²; rule 2 E = 10 · C_A W/m² (ICNIRP 2013, 700–1050 nm, 10 s and longer; from
 *   memory) × 10 s / 10 000 pulses = 0.0158489 J/m²; rule 3 C_P = N^-0.25 = 10 000^-0.25 = 0.1, so
 *   2.37734e-5 J/m². The unit is written once after the list: each item must carry it.
 * - 1064 nm, 10 ns pulses at 1 kHz: the pulse 1e-8 s -> "10 ns", the rate 1000 Hz -> "1 kHz".
 */
import type { RoomInput } from '../../core/model/inputs.js';

export interface TraceNumbersCase {
  readonly what: string;
  readonly room: RoomInput;
  /** Forms the officer must read somewhere in the derivation. */
  readonly readable: readonly string[];
  /** Raw forms that must appear nowhere in it. */
  readonly raw: readonly string[];
}

export const TRACE_NUMBERS_CASES: readonly TraceNumbersCase[] = [
  {
    what: '800 nm, 100 fs single pulse (ICNIRP 2013, conservative mode): 100 fs, 2.37734 GW/m², α_min 1.5 mrad',
    room: {
      ruleSet: 'icnirp2013',
      lasers: [{ id: 'L1', name: 'Femtosecond oscillator', beams: [{ id: 'b1', label: 'fs 800', wavelength_nm: 800, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-13 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
      eyewear: [],
    },
    // the reported limits (3 figures, rounded down) read in the same notation: 237 µJ/m²; 2.37 GW/m²
    readable: ['Exposure limit, eye, 800 nm, 100 fs', '2.37734 GW/m²', '237.734 µJ/m²', '237 µJ/m²; 2.37 GW/m²', '1.5 mrad', '5 mrad', '1.58489'],
    raw: ['0.0000000000001', '2377340000', '2370000000', '0.000237734'],
  },
  {
    what: '800 nm, 100 fs pulses at 1 kHz: the three pulse rules each with their unit',
    room: {
      ruleSet: 'icnirp2013',
      lasers: [{ id: 'L1', name: 'Femtosecond amplifier', beams: [{ id: 'b1', label: 'fs 800 1k', wavelength_nm: 800, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-13, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
      eyewear: [],
    },
    readable: ['(rule 1 237.734 µJ/m², rule 2 15.8489 mJ/m², rule 3 23.7734 µJ/m²)', 'pulses of 100 fs at 1 kHz over 10 s'],
    raw: ['rule 1 2.37734e-4', 'rule 2 0.0158489', '0.0000000000001'],
  },
  {
    what: '1064 nm, 10 ns pulses at 1 kHz: 10 ns and 1 kHz in the titles',
    room: {
      ruleSet: 'icnirp2013',
      lasers: [{ id: 'L1', name: 'Marking laser', beams: [{ id: 'b1', label: 'marker 1064', wavelength_nm: 1064, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
      eyewear: [],
    },
    readable: ['Exposure limit, eye, 1064 nm, 10 ns', 'pulses of 10 ns at 1 kHz'],
    raw: ['0.00000001 s', '1e-8 s', '1000 Hz'],
  },
];
