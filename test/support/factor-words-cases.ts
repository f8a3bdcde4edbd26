/**
 * Beams whose results name correction factors, and the words the officer must read for them on the
 * result card, in the derivation window and in the printed report alike (one source:
 * core/model/factor-words.ts). Names of the factors: C_A, C_B, C_C and C_E are the "correction
 * factors" of ICNIRP 2013, IEC 60825-1:2014 (MPE annex) and Directive 2006/25/EC, Annex II,
 * Table 2.5 (from memory); C_P is the pulse correction factor of the repetitive-pulse rules
 * (IEC 60825-1:2014, clause on repetitively pulsed exposure, rule 3; from memory).
 * Beams: invented, set in the demo scenario's laboratory (assets/demo).
 */
import type { RoomInput } from '../../core/model/inputs.js';

export interface FactorWordsCase {
  readonly what: string;
  readonly room: RoomInput;
  /** Phrases the card's warnings and the report's text both contain. */
  readonly warningWords: readonly string[];
  /** Labels of factor steps in the derivation (window and report appendix). */
  readonly stepWords: readonly string[];
}

/** The older spellings of the same factors, which must appear nowhere the officer reads. */
export const OLD_FACTOR_WORDS = /\bfactor (?:CA|CB|CC|CE|CP)\b|\bcorrection factor (?:CA|CB|CC|CE)\b/;

export const FACTOR_WORDS_CASES: readonly FactorWordsCase[] = [
  {
    what: '1300 nm CW diode, 1 s, conservative mode: the C_C piece for 1200-1400 nm is replaced by its stricter value',
    room: {
      ruleSet: 'icnirp2013',
      lasers: [{ id: 'L1', name: 'Telecom test diode', beams: [{ id: 'b1', label: 'diode 1300', wavelength_nm: 1300, exposureDuration_s: 1, emission: { kind: 'cw', power_W: 1e-3 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
      eyewear: [],
    },
    warningWords: ['correction factor C_C'],
    // C_C is printed as its stricter replacement (a 'conservative' step), C_A and C_E as factor steps
    stepWords: ['Correction factor C_C', 'Correction factor C_A', 'Correction factor C_E'],
  },
  {
    what: '1064 nm, 10 ns pulses at 1 kHz, conservative mode: the pulse correction factor C_P is replaced by its stricter value',
    room: {
      ruleSet: 'icnirp2013',
      lasers: [{ id: 'L1', name: 'Marking laser', beams: [{ id: 'b1', label: 'marker 1064', wavelength_nm: 1064, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
      eyewear: [],
    },
    warningWords: ['the pulse correction factor C_P'],
    stepWords: ['Correction factor C_C', 'Correction factor C_A'],
  },
];
