/**
 * The one place where the correction factors and parameters of the limit tables get their names in
 * words. Every screen and document takes them from here: the result cards' warnings (through
 * `entryWords`), the derivation window and the report's appendix (factor steps), the report's
 * readable text for results saved with internal keys, and the limit-table checks screen. The symbol
 * keeps the subscript the standards print (C_A is written C with subscript A in ICNIRP 2013,
 * IEC 60825-1:2014 and Directive 2006/25/EC, Annex II, Table 2.5), written with an underscore as
 * everywhere else on paper (C_P).
 */

/** Factor or parameter name of a rule set's table -> its name in a sentence (lower case). */
const FACTOR_WORDS: Readonly<Record<string, string>> = {
  CA: 'correction factor C_A',
  CB: 'correction factor C_B',
  CC: 'correction factor C_C',
  CE: 'correction factor C_E',
  CP: 'pulse correction factor C_P',
  C_P: 'pulse correction factor C_P',
  T1: 'break-point time T_1',
  T1_vis: 'break-point time T_1 (visible)',
  T2: 'break-point time T_2',
  alpha_min: 'smallest source angle α_min',
  alpha_max: 'largest source angle α_max',
  gamma_p: 'photochemical field of view γ_p',
  T_i: 'pulse grouping time T_i',
  T_min: 'pulse grouping time T_min',
  C1: 'ultraviolet factor C_1',
  C2: 'ultraviolet factor C_2',
  UV_302_315: 'ultraviolet values for 302.5–315 nm',
};

/** Is this a factor or parameter name of the tables (as a trace step of kind 'factor' labels it)? */
export function isFactorName(name: string): boolean {
  return Object.hasOwn(FACTOR_WORDS, name);
}

/** "correction factor C_C": the factor's name inside a sentence; an unknown name is said as "factor X". */
export function factorWords(name: string): string {
  return FACTOR_WORDS[name] ?? `factor ${name}`;
}

/** "Correction factor C_C": the factor's name as a heading or a line's label. */
export function factorTitle(name: string): string {
  const w = factorWords(name);
  return w.charAt(0).toUpperCase() + w.slice(1);
}
