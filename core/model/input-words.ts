/**
 * A refusal of the core (InputError, which names the field by its path, e.g.
 * 'lasers[1].beams[0].emission.pulseEnergy_J') said in an officer's words: which laser, beam or
 * eyewear, which quantity by its label, and what it must be. Screens and paper show this, never
 * the path.
 */
import { InputError } from '../errors.js';
import { INPUT_RULES, TEXT_RULES, type RuleName } from './input-rules.js';

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
];

function labelOf(rest: string): string {
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

/** "Divergence (full angle) must be more than 0 rad, at most π rad (got 0)". */
export function officerWords(e: InputError): string {
  const label = labelOf(whereInRoom(e.field).rest);
  const got = typeof e.value === 'number' || typeof e.value === 'string' ? ` (got ${typeof e.value === 'string' ? `"${e.value}"` : e.value})` : '';
  switch (e.code) {
    case 'missing':
      return `${label} is needed: ${e.validRange}`;
    case 'invalid_choice':
      return `${label} must be ${e.validRange.replace(/'/g, '"')}${got}`;
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
