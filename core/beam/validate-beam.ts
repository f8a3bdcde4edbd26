/**
 * Validation of a BeamInput. Every problem is an InputError naming the field by its full path
 * (e.g. 'emission.power_W', 'lasers[2].beams[0].wavelength_nm'), so the UI, the IPC boundary and
 * the CLI can all point at what to fix. Nothing is guessed: the beam-diameter definition is
 * required (domain notes 1.1, rule 1).
 */
import { InputError } from '../errors.js';
import type { RuleSetId } from '../model/inputs.js';
import { INPUT_RULES, TEXT_RULES, inRange, rangeWords, textProblem, type NumberRule, type TextRule } from '../model/input-rules.js';
import { DEFAULT_RULE_SET, RULE_SET_IDS } from '../limits/rule-sets.js';
import { validateSettings } from '../model/validate-settings.js';

function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function requireObject(field: string, x: unknown): Record<string, unknown> {
  if (!isObject(x)) throw new InputError('missing', field, x, 'an object');
  return x;
}

function optional(obj: Record<string, unknown>, key: string): unknown {
  return obj[key];
}

function choice<T extends string>(field: string, x: unknown, allowed: readonly T[]): T {
  if (typeof x !== 'string' || !allowed.includes(x as T)) {
    throw new InputError(x === undefined ? 'missing' : 'invalid_choice', field, x, allowed.map((a) => `'${a}'`).join(' | '));
  }
  return x as T;
}

const R = INPUT_RULES;

/** Throw unless x satisfies its rule in the one table (core/model/input-rules.ts). */
export function requireRule(field: string, x: unknown, rule: NumberRule): number {
  const range = `${rangeWords(rule)}${rule.why ? ` (${rule.why})` : ''}`;
  if (typeof x !== 'number') throw new InputError('missing', field, x, range);
  if (!Number.isFinite(x)) throw new InputError('not_finite', field, x, range);
  if (!inRange(rule, x)) throw new InputError(!rule.minInclusive && x <= rule.min ? 'not_positive' : 'out_of_range', field, x, range);
  return x;
}

/** Pulses that would overlap (f × t > 1) are not a pulse train; null when consistent. */
export function pulseTrainProblem(e: { readonly pulseDuration_s: number; readonly repetitionRate_Hz?: number | undefined }): string | null {
  const f = e.repetitionRate_Hz;
  if (f === undefined || !(f > 0) || !(e.pulseDuration_s > 0)) return null;
  return f * e.pulseDuration_s > 1 ? `must be at most 1 / pulse duration = ${1 / e.pulseDuration_s} Hz (pulses would overlap)` : null;
}

/** A pulsed beam's exposure lasts at least one pulse; null when consistent. */
export function exposureVsPulseProblem(b: { readonly emission: { readonly kind: string; readonly pulseDuration_s?: number }; readonly exposureDuration_s?: number | undefined }): string | null {
  const T = b.exposureDuration_s;
  const tp = b.emission.kind === 'pulsed' ? b.emission.pulseDuration_s : undefined;
  if (T === undefined || tp === undefined) return null;
  return T < tp ? `must be at least the pulse duration (${tp} s)` : null;
}

/**
 * The nominal NA overstates a single-mode fibre's spread (a shorter, unsafe distance): the
 * mode-field diameter is required (domain notes 1.6).
 */
export const SINGLE_MODE_NEEDS_MFD = 'the mode-field diameter is needed for a single-mode fibre (e.g. 10.4 µm for a standard fibre at 1550 nm); the nominal NA is not used';

/**
 * Check a beam input; throws InputError with `prefix` + field path. Returns the rule set to use.
 * `roomRuleSet` (from a room) wins over a missing beam rule set; a conflicting one is an error.
 */
export function validateBeamInput(input: unknown, prefix = '', roomRuleSet?: RuleSetId): RuleSetId {
  const p = (f: string): string => `${prefix}${f}`;
  // Stryker disable next-line Regex: a prefix comes only from evaluateRoom, which refuses a beam that is not an object first, so requireObject never throws with it (test/mutation/EQUIVALENT.md).
  const b = requireObject(prefix ? prefix.replace(/\.$/, '') : '(beam input)', input);
  let ruleSet: RuleSetId = roomRuleSet ?? DEFAULT_RULE_SET;
  if (b['ruleSet'] !== undefined) {
    ruleSet = choice(p('ruleSet'), b['ruleSet'], RULE_SET_IDS);
    if (roomRuleSet && ruleSet !== roomRuleSet) {
      throw new InputError('invalid_choice', p('ruleSet'), b['ruleSet'], `the room's rule set '${roomRuleSet}' (one rule set per room)`);
    }
  }
  if (b['id'] !== undefined) requireText(p('id'), b['id'], TEXT_RULES.beamId);
  if (b['label'] !== undefined) requireText(p('label'), b['label'], TEXT_RULES.beamLabel);
  requireRule(p('wavelength_nm'), b['wavelength_nm'], R.wavelength_nm);

  const e = requireObject(p('emission'), b['emission']);
  const kind = choice(p('emission.kind'), e['kind'], ['cw', 'pulsed'] as const);
  let tp: number | undefined;
  if (kind === 'cw') {
    requireRule(p('emission.power_W'), e['power_W'], R.power_W);
  } else {
    requireRule(p('emission.pulseEnergy_J'), e['pulseEnergy_J'], R.pulseEnergy_J);
    tp = requireRule(p('emission.pulseDuration_s'), e['pulseDuration_s'], R.pulseDuration_s);
    if (e['repetitionRate_Hz'] !== undefined) {
      const f = requireRule(p('emission.repetitionRate_Hz'), e['repetitionRate_Hz'], R.repetitionRate_Hz);
      const problem = pulseTrainProblem({ pulseDuration_s: tp, repetitionRate_Hz: f });
      // Stryker disable next-line Regex: the overlap message contains "must be " once, at its start (test/mutation/EQUIVALENT.md).
      if (problem) throw new InputError('out_of_range', p('emission.repetitionRate_Hz'), f, problem.replace(/^must be /, ''));
    }
  }

  const g = requireObject(p('beam'), b['beam']);
  requireRule(p('beam.diameter_m'), g['diameter_m'], R.diameter_m);
  requireRule(p('beam.divergence_rad'), g['divergence_rad'], R.divergence_rad);
  choice(p('beam.definition'), g['definition'], ['1/e', '1/e2', 'd63'] as const);
  if (g['profile'] !== undefined) choice(p('beam.profile'), g['profile'], ['gaussian', 'tophat'] as const);
  if (g['diameterY_m'] !== undefined) requireRule(p('beam.diameterY_m'), g['diameterY_m'], R.diameterY_m);
  if (g['divergenceY_rad'] !== undefined) requireRule(p('beam.divergenceY_rad'), g['divergenceY_rad'], R.divergenceY_rad);

  if (b['exposureDuration_s'] !== undefined) {
    const T = requireRule(p('exposureDuration_s'), b['exposureDuration_s'], R.exposureDuration_s);
    // the same rule as the form's schema (electron/backend/schemas/inputs.ts): one function states it
    const problem = exposureVsPulseProblem({ emission: { kind, ...(tp !== undefined ? { pulseDuration_s: tp } : {}) }, exposureDuration_s: T });
    // Stryker disable next-line Regex: the exposure message contains "must be " once, at its start (test/mutation/EQUIVALENT.md).
    if (problem) throw new InputError('out_of_range', p('exposureDuration_s'), T, problem.replace(/^must be /, ''));
  }
  if (b['sourceAngle_rad'] !== undefined) requireRule(p('sourceAngle_rad'), b['sourceAngle_rad'], R.sourceAngle_rad);
  if (b['skinArea_m2'] !== undefined) requireRule(p('skinArea_m2'), b['skinArea_m2'], R.skinArea_m2);

  if (b['viewing'] !== undefined) validateViewing(requireObject(p('viewing'), b['viewing']), p('viewing.'));
  if (b['tolerances'] !== undefined) {
    const t = requireObject(p('tolerances'), b['tolerances']);
    for (const k of ['power', 'energy', 'divergence', 'diameter', 'pulseDuration', 'repetitionRate'] as const) {
      if (t[k] !== undefined) requireRule(p(`tolerances.${k}`), t[k], R.tolerance);
    }
  }
  validateSettings(p('settings'), b['settings']);
  return ruleSet;
}

function requireText(field: string, x: unknown, rule: TextRule): string {
  const problem = textProblem(rule, x);
  if (problem) throw new InputError('missing', field, typeof x === 'string' && x.length > 60 ? `${x.slice(0, 60)}…` : x, `text of at most ${rule.max} characters${rule.required ? ', not empty' : ''}`);
  return x as string;
}
export { requireText };

function validateViewing(v: Record<string, unknown>, prefix: string): void {
  const p = (f: string): string => `${prefix}${f}`;
  if (optional(v, 'diffuse') !== undefined) {
    const d = requireObject(p('diffuse'), v['diffuse']);
    requireRule(p('diffuse.reflectance'), d['reflectance'], R.diffuseReflectance);
    if (d['viewingAngle_rad'] !== undefined) requireRule(p('diffuse.viewingAngle_rad'), d['viewingAngle_rad'], R.viewingAngle_rad);
    if (d['targetDistance_m'] !== undefined) requireRule(p('diffuse.targetDistance_m'), d['targetDistance_m'], R.targetDistance_m);
    if (d['viewerDistance_m'] !== undefined) requireRule(p('diffuse.viewerDistance_m'), d['viewerDistance_m'], R.viewerDistance_m);
    if (d['deliberateDuration_s'] !== undefined) requireRule(p('diffuse.deliberateDuration_s'), d['deliberateDuration_s'], R.deliberateDuration_s);
    if (d['governs'] !== undefined && d['governs'] !== 'accidental' && d['governs'] !== 'deliberate') throw new InputError('invalid_choice', p('diffuse.governs'), d['governs'], "'accidental' | 'deliberate'");
  }
  if (v['specular'] !== undefined) {
    const s = requireObject(p('specular'), v['specular']);
    requireRule(p('specular.reflectance'), s['reflectance'], R.specularReflectance);
    if (s['pathToSurface_m'] !== undefined) requireRule(p('specular.pathToSurface_m'), s['pathToSurface_m'], R.pathToSurface_m);
  }
  if (v['lens'] !== undefined) {
    const l = requireObject(p('lens'), v['lens']);
    requireRule(p('lens.focalLength_m'), l['focalLength_m'], R.focalLength_m);
    if (l['beamDiameterAtLens_m'] !== undefined) requireRule(p('lens.beamDiameterAtLens_m'), l['beamDiameterAtLens_m'], R.beamDiameterAtLens_m);
  }
  if (v['fiber'] !== undefined) {
    const f = requireObject(p('fiber'), v['fiber']);
    const kind = choice(p('fiber.kind'), f['kind'], ['multimode', 'singlemode'] as const);
    requireRule(p('fiber.numericalAperture'), f['numericalAperture'], R.numericalAperture);
    if (kind === 'singlemode' && f['modeFieldDiameter_m'] === undefined) throw new InputError('missing', p('fiber.modeFieldDiameter_m'), undefined, SINGLE_MODE_NEEDS_MFD);
    if (f['modeFieldDiameter_m'] !== undefined) requireRule(p('fiber.modeFieldDiameter_m'), f['modeFieldDiameter_m'], R.modeFieldDiameter_m);
  }
  if (v['aided'] !== undefined) {
    const a = requireObject(p('aided'), v['aided']);
    requireRule(p('aided.magnification'), a['magnification'], R.magnification);
    requireRule(p('aided.objectiveDiameter_m'), a['objectiveDiameter_m'], R.objectiveDiameter_m);
    if (a['transmission'] !== undefined) requireRule(p('aided.transmission'), a['transmission'], R.transmission);
  }
  if (v['attenuation_per_m'] !== undefined) requireRule(p('attenuation_per_m'), v['attenuation_per_m'], R.attenuation_per_m);
  if (v['closestApproach_m'] !== undefined) requireRule(p('closestApproach_m'), v['closestApproach_m'], R.closestApproach_m);
}
