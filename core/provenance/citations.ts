/**
 * Provenance in the words of the profession. Every limit-table row, factor and formula keeps its
 * machine-readable source key (the `source` and `confidence` fields of the tables and the trace);
 * documents and screens print instead the readable citation below (document, edition, table or
 * clause) and one plain status.
 *
 * Edition rule: the citation names the edition of the rule set in use. Where a table or clause
 * number was not read in the published text (confidence "from memory"), the citation names the
 * clause topic instead of a number that may be wrong.
 *
 * Every source key that a table row, factor or core formula uses has an entry here; a test walks
 * the tables and the traces of many beams and fails on any key without one.
 */
import { RULE_SETS } from '../limits/rule-sets.js';
import { entryWords } from '../model/input-words.js';
import { factorTitle, factorWords, isFactorName } from '../model/factor-words.js';
import type { TraceStep } from '../trace/trace.js';

/** How far a value was checked against the published text. */
export type CheckStatus =
  | 'checked'
  /** Not checked, and a stricter alternative was used in its place. */
  | 'unchecked-stricter'
  /** Not checked; no stricter alternative exists (the value is used as recalled). */
  | 'unchecked'
  | 'derived'
  | 'common-practice'
  | 'own-choice';

export const STATUS_TEXT: Readonly<Record<CheckStatus, string>> = {
  checked: 'checked against the published text',
  'unchecked-stricter': 'not yet checked against the published text — the stricter value is used',
  unchecked: 'not yet checked against the published text',
  derived: 'derived from the cited method',
  'common-practice': 'common practice',
  'own-choice': 'Beamwarden’s own choice, on the safe side',
};

const DIR = 'Directive 2006/25/EC, Annex II';
const ICNIRP = 'ICNIRP 2013 guidelines';
const IEC_MPE = 'IEC 60825-1:2014, MPE annex';
const ANSI_MPE_EYE = 'ANSI Z136.1-2014, MPE for the eye';
const ANSI_MPE_SKIN = 'ANSI Z136.1-2014, MPE for the skin';
const ANSI_FACTORS = 'ANSI Z136.1-2014, correction factors';
const IEC_PULSES = 'IEC 60825-1:2014, clause on repetitively pulsed exposure';
const ANSI_EVAL = 'ANSI Z136.1-2014, appendix on hazard evaluation';
const TR14 = 'IEC TR 60825-14 (user’s guide)';

/** Source key (exactly as in the tables and the core) -> readable citation. */
export const SOURCE_CITATIONS: Readonly<Record<string, string>> = {
  // Directive 2006/25/EC, read in the official transpositions (same numbers as the Directive).
  'EU 2006/25/EC Annex II Table 2.6 rule 1 (read)': `${DIR}, Table 2.6 (repetitive pulses), rule 1`,
  'EU 2006/25/EC Annex II Table 2.6 rule 2 (read)': `${DIR}, Table 2.6 (repetitive pulses), rule 2`,
  'EU-2.3-MEM': `${DIR}, limits for the eye at exposure durations of 10 s and longer`,
  'EU-FR Tableau 2.2 (Table 2.3: memory)': `${DIR}, Table 2.2 (and the limits for the eye at 10 s and longer)`,
  "EU-FR Tableau 2.2 (column 'Diaphragme' for UV rows)": `${DIR}, Table 2.2 (aperture column)`,
  'EU-FR Tableau 2.2 note b': `${DIR}, Table 2.2, note b`,
  'EU-FR Tableau 2.2; BGI832 Tab. 6a': `${DIR}, Table 2.2`,
  'EU-FR Tableau 2.2': `${DIR}, Table 2.2`,
  'EU-FR Tableau 2.4 (3.5 mm printed for every row, including 1e5-1e6 nm)': `${DIR}, Table 2.4 (aperture)`,
  'EU-FR Tableau 2.4': `${DIR}, Table 2.4`,
  'EU-FR Tableau 2.5 (in the CE row)': `${DIR}, Table 2.5 (correction factors)`,
  'EU-FR Tableau 2.5; EU-NO Table 4.5': `${DIR}, Table 2.5 (correction factors)`,
  'EU-FR Tableau 2.5': `${DIR}, Table 2.5 (correction factors)`,
  'EU-FR Tableau 2.6; EU-CONS Table 2.6': `${DIR}, Table 2.6 (repetitive pulses)`,
  'EU-FR Tableau 2.6; EU-CONS': `${DIR}, Table 2.6 (repetitive pulses)`,
  'limit specification 5.6: gap in the Directive, 315-400 nm value used': `${DIR}: no value given for this case; the 315–400 nm value is used`,
  'EU Directive 2006/25/EC Annex II Table 2.2 notes a and b': `${DIR}, Table 2.2, notes a and b (each limit over its own limiting aperture; the more restrictive governs)`,
  'limit specification convention 2 and 3; EU Table 2.2 note a': `${DIR}, Table 2.2, note a (where two limits apply, the lower governs)`,
  // ICNIRP 2013 / IEC 60825-1:2014 / ANSI Z136.1-2014 (harmonised limits).
  'ICNIRP2013; IEC2014 (C7); ANSI2014 Tab. 6 (from memory)': `${ICNIRP}; IEC 60825-1:2014, correction factor C7; ${ANSI_FACTORS}`,
  'ICNIRP2013; IEC2014 (from memory). 400-1400 nm values coincide with the new retinal breakpoints 5e-6 s and 1.3e-5 s; values above 1400 nm equal the EU Tmin (read).':
    `${ICNIRP}; ${IEC_PULSES} (pulse-grouping time T_i; above 1400 nm equal to ${DIR}, Table 2.6)`,
  'ICNIRP2013; IEC2014 (from memory); direction of change confirmed by ILSC2007 (read)': `${ICNIRP}; ${IEC_MPE} (angular subtense α_max)`,
  'ICNIRP2013; IEC2014 (from memory); same as EU Tab. 2.5 (read)': `${ICNIRP}; ${IEC_MPE}; same value as ${DIR}, Table 2.5`,
  'ICNIRP2013; IEC2014 4.3 f) rule 1 (from memory)': `${ICNIRP}; ${IEC_PULSES}, rule 1 (single pulse)`,
  'ICNIRP2013; IEC2014 4.3 f) rule 2 (from memory)': `${ICNIRP}; ${IEC_PULSES}, rule 2 (average power)`,
  'ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)':
    `${ICNIRP}; ${IEC_MPE} (skin); ${ANSI_MPE_SKIN}; same value as ${DIR}, Tables 2.2 and 2.4`,
  'ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory)': `${ICNIRP}; ${IEC_MPE} (skin); ${ANSI_MPE_SKIN}`,
  'ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)': `${ICNIRP}; ${IEC_MPE} (eye); ${ANSI_MPE_EYE}`,
  'ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)':
    `${ICNIRP}; ${IEC_MPE} (eye); ${ANSI_MPE_EYE}; same value as ${DIR}, Tables 2.2 and 2.4`,
  'ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)': `${ICNIRP}; ${IEC_MPE} (eye); ${ANSI_MPE_EYE}`,
  'ICNIRP2013; IEC2014 correction-factor table (from memory); same as EU Tab. 2.5 (read)': `${ICNIRP}; ${IEC_MPE}, correction factors; same value as ${DIR}, Table 2.5`,
  'ICNIRP2013; IEC2014; ANSI2014 (from memory); same as EU Tab. 2.5 (read)': `${ICNIRP}; ${IEC_MPE}; ${ANSI_FACTORS}; same value as ${DIR}, Table 2.5`,
  'ICNIRP2013; IEC2014; ANSI2014 Tab. 6 (from memory)': `${ICNIRP}; ${IEC_MPE}; ${ANSI_FACTORS}`,
  'IEC2014 4.3 f) 3) C5; ICNIRP2013 CP (from memory)': `${IEC_PULSES}, rule 3 (pulse-train factor); ${ICNIRP}`,
  'IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read)': `${IEC_MPE}, limiting apertures; same value in BGV B2 ‘Laserstrahlung’, Table 5`,
  'IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read, older IEC edition)': `${IEC_MPE}, limiting apertures; same value in BGV B2 ‘Laserstrahlung’, Table 5 (earlier edition)`,
  'IEC2014 Annex A aperture table (from memory)': `${IEC_MPE}, limiting apertures`,
  'IEC2014; ICNIRP2013; ANSI2014 (from memory); same as EU Tab. 2.2 (read)': `${IEC_MPE}; ${ICNIRP}; ANSI Z136.1-2014; same value as ${DIR}, Table 2.2`,
  'ICNIRP2013; IEC2014 (from memory); agrees with the EU tabulated crossover times (EU-FR Tab. 2.2, read) within 6.2 %, except 304 nm (-18 %, because the EU prints 60 instead of 63 J/m^2)':
    `${ICNIRP}; ${IEC_MPE} (ultraviolet crossover times); close to ${DIR}, Table 2.2`,
  'ICNIRP2013; IEC2014 (from memory); equals the EU 315-400 nm expression (EU-FR Tab. 2.2, read)': `${ICNIRP}; ${IEC_MPE}; same expression as ${DIR}, Table 2.2 (315–400 nm)`,
  'ICNIRP2013; IEC2014 (from memory); agrees with the EU tabulated 303-314 nm values (EU-FR Tab. 2.2, read) within 1 %, except 304 nm (-4.9 %)':
    `${ICNIRP}; ${IEC_MPE} (ultraviolet 302.5–315 nm); close to ${DIR}, Table 2.2`,
  'CORNEA2024 (read); ICNIRP2013': `Schulmeister and Stuck, corneal injury thresholds 1200–1500 nm, J. Laser Appl. 36(3), 2024; ${ICNIRP}`,
  'ICNIRP2013; IEC2014 4.3 f); ANSI2014 (from memory)': `${ICNIRP}; ${IEC_PULSES}; ANSI Z136.1-2014, clause on repetitive pulses`,
  'ICNIRP2013; IEC2014; ANSI2014 (from memory)': `${ICNIRP}; IEC 60825-1:2014; ANSI Z136.1-2014`,
  // Pulse-rule data of the tables (grouping time, counting windows).
  'ICNIRP2013; IEC2014 4.3 f) (from memory): pulses inside T_i are summed and counted as one; no T_i below 400 nm (UV doses simply add, rule 2)':
    `${ICNIRP}; ${IEC_PULSES} (pulse-grouping time T_i; none below 400 nm)`,
  'ICNIRP2013; IEC2014 4.3 f) (from memory): no T2 below 400 nm': `${ICNIRP}; ${IEC_PULSES} (pulses counted over the whole exposure below 400 nm)`,
  'ICNIRP2013; IEC2014 4.3 f) (from memory): N within min(T, T2)': `${ICNIRP}; ${IEC_PULSES} (pulses counted within T2, 400–1400 nm)`,
  'ICNIRP2013; IEC2014 4.3 f) (from memory): beyond 1400 nm 10 s': `${ICNIRP}; ${IEC_PULSES} (pulses counted within 10 s above 1400 nm)`,
  'ANSI2014 (from memory)': 'ANSI Z136.1-2014, clause on repetitive pulses',
  "EU-FR Tableau 2.6 (T_min bands written lo < lambda <= hi: on an exact band edge the lower band's T_min applies, limit specification errata); BGI832 (read): pulses inside T_min count as one only if every pulse is longer than 1 ns; Table 2.2 note d sums UV pulses inside T_min but Table 2.6 lists no T_min below 315 nm":
    `${DIR}, Table 2.6 (grouping time T_min; on a band edge the lower band’s value) and Table 2.2, note d; BGI 832 (German statutory accident insurance guidance on operating lasers): pulses counted as one only when each is longer than 1 ns`,
  'BGI832 (read) gives caps only from 400 nm; ours below':
    'BGI 832 (German statutory accident insurance guidance on operating lasers) from 400 nm; below 400 nm Beamwarden’s own choice, on the safe side',
  'ILSC2019 (read) for the scope; factor values memory': `ILSC 2019 proceedings, paper P106 (scope of the pulse-train factor); ${ICNIRP}`,
  'EU-FR Tableau 2.5 (symbol gamma); EU-NO Table 4.5; BGVB2': `${DIR}, Table 2.5 (limiting cone angle γ)`,
  'EU-FR Tableau 2.5 (named T1 there); EU-NO Table 4.5': `${DIR}, Table 2.5 (break time T1)`,
  "EU-FR Tableau 2.2 (read); formula identity 'derived'": `${DIR}, Table 2.2 (the formula rearranged)`,
  'BGI832 (read; reflects IEC 60825-1:2001 practice, the Directive itself is silent)': 'BGI 832 (German statutory accident insurance guidance on operating lasers), after IEC 60825-1:2001; the Directive gives no value',
  'older editions (from memory): E = 10 W/m² from 1000 s to 30 000 s (limit specification errata); used only once the row is verified with that reading':
    `earlier editions of the ICNIRP and IEC limits (E = 10 W/m² from 1000 s to 30 000 s); used only once the row is checked with that reading`,
  'EU Directive 2006/25/EC Annex II Table 2.3 note (from memory), applied to set (a) while unverified (limit specification errata)':
    `${DIR}, note to the limits for the eye at 10 s and longer, applied while the row is not yet checked`,
  'EU Directive 2006/25/EC Annex II Table 2.3, note beside the 700-1400 nm entry: not to exceed 1000 W/m^2 (from memory; limit specification errata)':
    `${DIR}, note to the limits for the eye at 10 s and longer (700–1400 nm): not to exceed 1000 W/m²`,
  'limit specification errata (apertures at an exact edge)': 'Beamwarden’s rule for a duration or wavelength exactly at a table edge (limiting apertures)',
  // Hazard distances, eyewear and classes (formulas of the core).
  'ANSI Z136.1 App. B (domain notes 1.3)': `${ANSI_EVAL} (beam behind a lens)`,
  'ANSI Z136.1 App. B; ANSI Z136.2 (domain notes 1.6)': `${ANSI_EVAL}; ANSI Z136.2 (optical fibre systems)`,
  'ANSI Z136.1 App. B; IEC TR 60825-14 (domain notes 1.4)': `${ANSI_EVAL} (diffuse reflection); ${TR14}`,
  'ANSI Z136.1 section 4.6.2 (from memory); EN 207 supplier explainer (read); domain notes 2.1': 'ANSI Z136.1-2014, clause on protective eyewear (optical density)',
  'ANSI Z136.1-2014 App. B; IEC TR 60825-14 (domain notes 1.2.1, 1.2.2)': `${ANSI_EVAL} (nominal ocular hazard distance); ${TR14}`,
  'ANSI Z136.1-2014 Table 8 skin aperture; AURPO guidance (domain notes 1.9)': 'ANSI Z136.1-2014, limiting apertures (skin)',
  'EN 207:2017 via [WIKI-EN207] (secondary); EN 208:2009 Table B.1 via [SUP-EN208] (read, RB1)':
    'EN 207:2017 (filters against laser radiation), scale-number table; EN 208:2009 (alignment eyewear), Table B.1',
  'IEC 60825-1:2014 4.3 and Table 10 (from memory; domain notes section 10 item 7); relation checked against 0.39 mW and 10 mW (domain notes 3.2)':
    'IEC 60825-1:2014, clauses on classification, accessible emission limits and measurement conditions',
  'lasersafe.de; Seibersdorf Laboratories (published)': 'IEC 60825-1:2014, accessible emission limits of Class 2 and 3R (as published by Seibersdorf Laboratories, accredited laser test house, on its page on laser classes)',
  'domain notes 1.1 (derived)': 'Gaussian beam optics: beam diameter and divergence converted from the 1/e² to the 1/e points',
  'domain notes 1.5 (derived); specular reflections treated as intrabeam in ANSI Z136.1 section 3': `${ANSI_EVAL}: a specular reflection is treated as the direct beam`,
  'domain notes 1.6 (derived from Gaussian optics)': 'Gaussian beam optics: far field of a single-mode fibre from its mode-field diameter',
  'domain notes 1.7 (derived from first-order optics; IEC TR 60825-14 and ANSI Z136.6 approach)': `first-order optics for viewing aids, after the approach of ${TR14} and ANSI Z136.6`,
  'domain notes 1.7 (derived from first-order optics; gain K as in IEC TR 60825-14 and ANSI Z136.6, from memory)': `first-order optics for viewing aids; gain as in ${TR14} and ANSI Z136.6`,
  'ours, pending the additivity table of IEC 60825-1 (limit specification sections 3 and 10)':
    'exposures acting on the same tissue and effect are added (fractions of the limit), pending the additivity table of IEC 60825-1:2014',
  // Issue 9: edge rules, caps and alternative readings.
  'EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory)': `${DIR}, note to the limits for the eye at 10 s and longer, 700–1400 nm extended sources: not to exceed 1000 W/m²`,
  'EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory), applied while unverified':
    `${DIR}, note to the limits for the eye at 10 s and longer (not to exceed 1000 W/m²), applied to the ${ICNIRP} until checked`,
  'older ICNIRP / IEC 60825-1 editions: E = 10 W/m^2 from 1000 s (from memory)': 'earlier editions of the ICNIRP guidelines and IEC 60825-1: 10 W/m² for the eye at 315–400 nm from 1000 s',
  'IEC 60825-1 and ANSI Z136.1 large-area skin note (from memory; limit specification 4.3)': `${IEC_MPE} (skin) and ${ANSI_MPE_SKIN}: reduced limit for large irradiated areas`,
  ours: 'Beamwarden’s rule',
};

/** The rule sets' own notes, as printed (the table files keep their working notes). */
export const RULE_SET_PROVENANCE: Readonly<Record<string, string>> = {
  icnirp2013:
    'limits of ICNIRP 2013, IEC 60825-1:2014 and ANSI Z136.1-2014 (harmonised). Each row names its citation and whether it was checked against the published text; where a row was not yet checked and a stricter alternative exists, the stricter value is used.',
  eu2006:
    'limits of Directive 2006/25/EC, Annex II. Tables 2.1, 2.2, 2.4, 2.5 and 2.6 were checked against the published text; the limits for the eye at 10 s and longer were not yet checked.',
};

/** The status of a source/confidence pair; `stricterUsed` when the step replaced the value by its stricter alternative. */
export function statusOf(confidence: string | undefined, stricterUsed = false): CheckStatus {
  const c = (confidence ?? '').toLowerCase();
  const unchecked = c.includes('memory') || c.includes('secondary');
  if (stricterUsed && (unchecked || c === '')) return 'unchecked-stricter';
  if (stricterUsed && c.startsWith('ours')) return 'own-choice';
  if (unchecked) return 'unchecked';
  if (c.startsWith('read')) return 'checked';
  if (c.includes('common practice')) return 'common-practice';
  if (c.startsWith('derived')) return 'derived';
  if (c.startsWith('ours')) return 'own-choice';
  return c === '' ? 'derived' : 'unchecked';
}

export interface Citation {
  /** Readable citation; empty when the step has no source (the status alone is printed). */
  readonly text: string;
  readonly status: CheckStatus;
}

/** Readable citation and status for a table row, factor or trace step. Unknown keys are made readable, never printed raw. */
export function citationOf(source: string | undefined, confidence: string | undefined, stricterUsed = false): Citation {
  const key = (source ?? '').trim();
  const text = key === '' ? '' : (SOURCE_CITATIONS[key] ?? readableText(key));
  return { text, status: statusOf(confidence, stricterUsed) };
}

/** "ICNIRP 2013 …, Table 2.2 — checked against the published text". */
export function citationLine(c: Citation): string {
  return c.text === '' ? STATUS_TEXT[c.status] : `${c.text} — ${STATUS_TEXT[c.status]}`;
}

/** Internal keys of the limit tables, spelled out where they appear inside a sentence. */
const KEY_WORDS: ReadonlyArray<readonly [RegExp, string | ((key: string) => string)]> = [
  // Results saved before the core said these in words (core/model/input-words.ts, the one place).
  [/\brule:CP\b/g, entryWords],
  [/\bfactor:([A-Za-z_0-9]+)\b/g, (key) => factorWords(key.slice('factor:'.length))],
  [/\baperture:(?:eye|skin):[0-9.e+-]+:[0-9.e+-]+/g, entryWords],
  [/\bpulse-shorter-than-tables\b/g, 'pulse shorter than the tables'],
  [/;?\s*ILSC2019 \(read\)/g, ' (ILSC 2019, paper P106)'],
  [/\(published: lasersafe\.de; Seibersdorf Laboratories\)/g, '(as published by Seibersdorf Laboratories, accredited laser test house)'],
  [/read \(EN 208:2009 Table B\.1 via a supplier explainer\)/g, 'EN 208:2009, Table B.1 (seen in a secondary copy; not yet checked against the published text)'],
  [/\bunverified remembered\b/g, 'unchecked'],
  [/\bremembered\b/g, 'unchecked'],
  [/\(([^()]*?),? from memory\)/g, '($1; not yet checked against the published text)'],
  [/\bfrom memory, uncertain\b/g, 'not yet checked against the published text'],
  [/\bfrom memory\b/g, 'not yet checked against the published text'],
  [/\bours\b/g, 'Beamwarden’s choice'],
  [/\s*\(?domain (?:notes|reference)[^);]*\)?/g, ''],
  [/\s*\[[A-Z][A-Z0-9-]*\]/g, ''],
];

/** Cheap first look: most printed strings (numbers, names) contain none of the patterns below. */
const MAY_NEED_WORK = /memory|rule:|factor:|aperture:|pulse-shorter|ILSC|lasersafe|remembered|ours\b|domain|\[[A-Z]|EN 208:2009 Table|typed from|Tables 2\.1/;

/** A sentence of the core or a note made readable: no internal keys, no working notes. */
export function readableText(text: string): string {
  if (!MAY_NEED_WORK.test(text)) return text;
  let out = text;
  for (const [status, ids] of Object.entries(RULE_SET_STATUS_NOTES)) if (out.includes(status)) out = out.split(status).join(ids);
  for (const [re, by] of KEY_WORDS) out = typeof by === 'string' ? out.replace(re, by) : out.replace(re, (m) => by(m));
  return out;
}

/**
 * The label of a derivation step as the officer reads it (derivation window and report alike): a
 * step labelled by the core with a factor's table name ("CC": the factor's value, or its stricter
 * replacement) is named in words ("Correction factor C_C", core/model/factor-words.ts); any other
 * label is made readable.
 */
export function stepLabelText(step: Pick<TraceStep, 'label'>): string {
  if (isFactorName(step.label)) return factorTitle(step.label);
  return readableText(step.label);
}

/** The working notes stored with each rule set (table `status`), replaced on paper by RULE_SET_PROVENANCE. */
const RULE_SET_STATUS_NOTES: Readonly<Record<string, string>> = Object.fromEntries(
  Object.entries(RULE_SETS).map(([id, table]) => [table.status, RULE_SET_PROVENANCE[id] ?? '']),
);
