/**
 * A refusal of the core (InputError, which names the field by its path, e.g.
 * 'lasers[1].beams[0].emission.pulseEnergy_J') said in an officer's words: which laser, beam or
 * eyewear, which quantity by its label, and what it must be. Screens and paper show this, never
 * the path.
 */
import { InputError } from '../errors.js';
import { INPUT_RULES, TEXT_RULES, type RuleName } from './input-rules.js';
import type { InputTolerances } from './inputs.js';
import { formatSI } from '../units/quantities.js';
import { factorWords } from './factor-words.js';

/** Path endings (after lasers[i].beams[j]. or eyewear[k].) and the label they stand for. */
const LABEL_OF_PATH: ReadonlyArray<readonly [RegExp, string]> = [
  [/^viewing\.diffuse\.reflectance$/, INPUT_RULES.diffuseReflectance.label],
  [/^viewing\.specular\.reflectance$/, INPUT_RULES.specularReflectance.label],
  [/^viewing\.fiber\.kind$/, 'Fibre kind'],
  [/^tolerances\.(\w+)$/, 'Tolerance'],
  [/^emission\.kind$/, 'Emission (CW or pulsed)'],
  [/^beam\.definition$/, 'Diameter measured at'],
  [/^ruleSet$/, 'Rule set'],
  [/^(?:lasers\[\d+\]\.)?name$/, TEXT_RULES.laserName.label],
  [/^(?:lasers\[\d+\]\.)?id$/, TEXT_RULES.laserId.label],
  [/^label$/, TEXT_RULES.eyewearLabel.label],
  [/^od\[\d+\]\.od$/, INPUT_RULES.opticalDensity.label],
  [/^od\[\d+\]\.(from|to)_nm$/, 'Wavelength band of an OD marking'],
  [/^en207\[\d+\]\.scale$/, 'EN 207 scale number'],
  [/^en207\[\d+\]\.modes$/, 'EN 207 test conditions (D, I, R, M)'],
  [/^en207\[\d+\]\.(from|to)_nm$/, 'Wavelength band of an EN 207 marking'],
  [/^en208\[\d+\]\.scale$/, 'EN 208 scale number'],
  [/^en208\[\d+\]\.(from|to)_nm$/, 'Wavelength band of an EN 208 marking'],
  [/^visibleTransmission$/, INPUT_RULES.visibleTransmission.label],
  // Limit settings (core/model/validate-settings.ts): the register's signed checks of table entries.
  [/^settings\.rowChecks\[\d+\]\.key$/, 'Limit table check: the table entry checked'],
  [/^settings\.rowChecks\[\d+\]\.verdict$/, 'Limit table check: the result (matches or differs)'],
  [/^settings\.rowChecks\[\d+\]\.documentExpr$/, 'Limit table check: the value the published document gives'],
  [/^settings\.rowChecks\[\d+\]\.checkId$/, 'Limit table check: its record in the register'],
  [/^settings\.rowChecks\[\d+\]\.reference$/, 'Limit table check: the published document and table'],
  [/^settings\.rowChecks\[\d+\]\.checkedBy$/, 'Limit table check: the person who checked'],
  [/^settings\.rowChecks\[\d+\]\.checkedOn$/, 'Limit table check: the date of the check'],
  [/^settings\.rowChecks(\[\d+\])?(\.\w+)?$/, 'Limit table checks'],
  [/^settings\.verifiedRows(\[\d+\])?$/, 'Table entries checked against the published document'],
  [/^settings\.conservative$/, 'Conservative mode'],
  [/^settings(\.\w+)?$/, 'Limit settings'],
];

function labelOf(at: WhereInRoom): string {
  const rest = at.rest;
  if (at.beam !== undefined && rest === 'id') return TEXT_RULES.beamId.label;
  if (at.beam !== undefined && rest === 'label') return TEXT_RULES.beamLabel.label;
  if (at.eyewear !== undefined && rest === 'id') return TEXT_RULES.eyewearTag.label;
  for (const [re, label] of LABEL_OF_PATH) if (re.test(rest)) return label;
  const last = rest.split('.').pop() ?? rest;
  const rule = (INPUT_RULES as Readonly<Record<string, { label: string } | undefined>>)[last as RuleName];
  if (rule) return rule.label;
  return 'A value';
}

export interface WhereInRoom {
  /** Index of the laser and beam (from 'lasers[i].beams[j]'), or of the eyewear ('eyewear[k]'). */
  readonly laser?: number;
  readonly beam?: number;
  readonly eyewear?: number;
  /** The field path inside that laser, beam or eyewear ('emission.power_W'). */
  readonly rest: string;
}

export function whereInRoom(field: string): WhereInRoom {
  const b = /^lasers\[(\d+)\]\.beams\[(\d+)\]\.?(.*)$/.exec(field);
  if (b) return { laser: Number(b[1]), beam: Number(b[2]), rest: b[3] ?? '' };
  const l = /^lasers\[(\d+)\]\.?(.*)$/.exec(field);
  if (l) return { laser: Number(l[1]), rest: l[2] ?? '' };
  const e = /^eyewear\[(\d+)\]\.?(.*)$/.exec(field);
  if (e) return { eyewear: Number(e[1]), rest: e[2] ?? '' };
  return { rest: field };
}

/** "Divergence (full angle) must be more than 0 mrad, at most 180° (got 0)". */
export function officerWords(e: InputError): string {
  const label = labelOf(whereInRoom(e.field));
  const got = typeof e.value === 'number' || typeof e.value === 'string' ? ` (got ${typeof e.value === 'string' ? `"${e.value}"` : e.value})` : '';
  switch (e.code) {
    case 'missing':
      return `${label} is needed: ${e.validRange}`;
    case 'invalid_choice':
      return `${label} must be ${/^an? /.test(e.validRange) ? e.validRange : `one of ${e.validRange.replace(/'/g, '"')}`}${got}`;
    case 'unknown_unit':
    case 'unparseable':
      return `${label}: ${e.validRange}${got}`;
    case 'not_covered':
      return `${label}: no limit of the rule set covers this case${got}`;
    default:
      return `${label} must be ${e.validRange}${got}`;
  }
}

export { InputError };

// ---------------------------------------------------------------- record paths in officer words

const NUMBERED: Readonly<Record<string, string>> = {
  installations: 'laser',
  lasers: 'laser',
  beams: 'beam',
  eyewear: 'eyewear',
  people: 'person',
  sites: 'site',
  rooms: 'room',
  assessments: 'assessment',
  revisions: 'revision',
  od: 'OD marking',
  en207: 'EN 207 marking',
  en208: 'EN 208 marking',
  controls: 'control',
  nonBeamHazards: 'non-beam hazard',
  eyewearChosen: 'eyewear choice',
  operatingStates: 'operating state',
};
/** Containers that add nothing for the officer ("laser.beams[0].beam.diameter_m" is beam 1's diameter). */
const SILENT = new Set(['laser', 'spec', 'input', 'content', 'emission', 'beam', 'viewing', 'document', 'current', 'assumptions']);
const WORDS: Readonly<Record<string, string>> = {
  reflectance: 'reflectance',
  diffuse: 'diffuse reflection',
  specular: 'specular reflection',
  lens: 'focusing optics',
  fiber: 'fibre output',
  aided: 'magnifying optics',
  tolerances: 'tolerance',
  scale: 'scale number',
  from_nm: 'band start (nm)',
  to_nm: 'band end (nm)',
  od: 'optical density',
  label: 'description',
  modes: 'test conditions',
  classAsLabelled: 'class as labelled',
  definition: 'diameter measured at',
};

function humanise(key: string): string {
  const rule = (INPUT_RULES as Readonly<Record<string, { label: string } | undefined>>)[key];
  if (rule) return rule.label.toLowerCase();
  const w = WORDS[key];
  if (w) return w;
  return key
    .replace(/_(W|J|s|m|rad|nm|Hz|per_m)$/, '')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase();
}

/**
 * A record path such as 'installations[0].laser.beams[1].emission.power_W' in officer words:
 * "Laser 1, beam 2, power". The path itself stays in the issue list for tools; screens show this.
 */
export function officerPath(path: string): string {
  const parts: string[] = [];
  for (const seg of path.split('.')) {
    const m = /^(\w*)((?:\[\d+\])*)$/.exec(seg);
    if (!m) {
      parts.push(seg);
      continue;
    }
    const name = m[1] ?? '';
    const idx = [...(m[2] ?? '').matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]) + 1);
    if (name === '(document)' || name === '') {
      if (idx.length) parts.push(`entry ${idx.join('.')}`);
      continue;
    }
    const numbered = NUMBERED[name];
    if (numbered && idx.length) parts.push(`${numbered} ${idx.join('.')}`);
    else if (SILENT.has(name) && idx.length === 0) continue;
    else parts.push(humanise(name) + (idx.length ? ` ${idx.join('.')}` : ''));
  }
  const out = parts.join(', ') || 'the document';
  return out.charAt(0).toUpperCase() + out.slice(1);
}

/** "Laser "Nd:YAG", beam "SHG"" or "Eyewear EW-5" for a core field path inside a room input. */
export function placeInRoom(
  input: { readonly lasers?: ReadonlyArray<{ readonly name?: string; readonly beams?: ReadonlyArray<{ readonly label?: string; readonly id?: string }> }>; readonly eyewear?: ReadonlyArray<{ readonly id?: string }> },
  field: string,
): string {
  const at = whereInRoom(field);
  const named = (kind: string, name: string | undefined, n: number): string => (name ? `${kind} "${name}"` : `${kind} ${n}`);
  if (at.eyewear !== undefined) return `Eyewear ${input.eyewear?.[at.eyewear]?.id ?? at.eyewear + 1}`;
  if (at.laser !== undefined) {
    const l = input.lasers?.[at.laser];
    const laser = named('Laser', l?.name, at.laser + 1);
    if (at.beam === undefined) return laser;
    const b = l?.beams?.[at.beam];
    return `${laser}, ${named('beam', b?.label || b?.id, at.beam + 1)}`;
  }
  return 'The room';
}

// ---------------------------------------------------------------------------------------------
// Keys in officer words: the ONE place that says an input key or a limit-table entry key the way
// the form and the published tables do. The trace, the warnings, the result card, the limit-table
// checks screen and the PDF use these; none prints the key itself (issue 12).

/** The form field each tolerance key moves (its label comes from the one input table). */
const TOLERANCE_RULE: Readonly<Record<keyof InputTolerances, RuleName>> = {
  power: 'power_W',
  energy: 'pulseEnergy_J',
  pulseDuration: 'pulseDuration_s',
  repetitionRate: 'repetitionRate_Hz',
  divergence: 'divergence_rad',
  diameter: 'diameter_m',
};

/** A toleranced input by the form's label: 'repetitionRate' -> 'repetition rate'. */
export function toleranceWords(key: string): string {
  const rule = (TOLERANCE_RULE as Readonly<Record<string, RuleName | undefined>>)[key];
  if (!rule) return 'an input';
  const label = INPUT_RULES[rule].label;
  return label.charAt(0).toLowerCase() + label.slice(1);
}

/** A table number as the tables print it: 30000 -> '30 000', 0.35 -> '0.35', 1e-13 -> '100 fs'. */
function tableNumber(text: string, unit: string): string {
  const n = Number(text);
  if (!Number.isFinite(n)) return `${text} ${unit}`;
  if (unit === 's' && n > 0 && n < 1e-3) return formatSI(text, 's');
  const [whole = '', frac] = String(n).split('.');
  const grouped = whole.length > 4 ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, ' ') : whole;
  return `${grouped}${frac !== undefined ? `.${frac}` : ''} ${unit}`;
}

const TISSUE_WORDS: Readonly<Record<string, string>> = { eye: 'the eye', skin: 'the skin' };

/**
 * A limit-table entry key in words: a row id ('row H-E-VIS-2'), a factor or factor piece
 * ('correction factor C_C (1200-1400 nm)', from factorPieceKey; names from factor-words.ts), a limiting aperture
 * ('aperture:eye:180-400:10-30000' -> 'the limiting aperture for the eye, 180-400 nm, 10 s-30 000 s')
 * or the pulse correction factor ('rule:CP' -> 'the pulse correction factor C_P').
 */
export function entryWords(key: string): string {
  if (key === 'rule:CP') return `the ${factorWords('C_P')}`;
  const N = String.raw`(\d+(?:\.\d+)?(?:e[+-]?\d+)?)`; // a number as String(number) writes it
  const a = new RegExp(`^aperture:(eye|skin):${N}-${N}:${N}-${N}$`).exec(key);
  if (a) {
    const [, tissue = '', lo = '', hi = '', tlo = '', thi = ''] = a;
    return `the limiting aperture for ${TISSUE_WORDS[tissue] ?? tissue}, ${lo}-${tableNumber(hi, 'nm')}, ${tableNumber(tlo, 's')}-${tableNumber(thi, 's')}`;
  }
  const m = /^factor:([A-Za-z_0-9]+)(?:\[(.*)\])?$/.exec(key);
  if (!m) return `row ${key}`;
  const name = factorWords(m[1] ?? '');
  return m[2] ? `${name} (${m[2]})` : name;
}

/**
 * The sentence the result card and the report say about the tolerances: "the repetition rate
 * tolerance moves the NOHD most", or "... moves the OD most" where the input was chosen by its
 * effect on the OD (no tolerance moved the NOHD). Results saved before the field existed say
 * "the result".
 */
export function dominantToleranceWords(bounds: { readonly dominantInput: string | null; readonly dominantMoves?: 'NOHD' | 'OD' }): string | null {
  if (bounds.dominantInput === null) return null;
  return `the ${toleranceWords(bounds.dominantInput)} tolerance moves the ${bounds.dominantMoves ?? 'result'} most`;
}
