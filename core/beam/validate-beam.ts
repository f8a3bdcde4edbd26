/**
 * Validation of a BeamInput. Every problem is an InputError naming the field by its full path
 * (e.g. 'emission.power_W', 'lasers[2].beams[0].wavelength_nm'), so the UI, the IPC boundary and
 * the CLI can all point at what to fix. Nothing is guessed: the beam-diameter definition is
 * required (domain notes 1.1, rule 1).
 */
import { InputError, requireInRange, requireNonNegative, requirePositive } from '../errors.js';
import type { BeamInput, RuleSetId } from '../model/inputs.js';
import { DURATION_RANGE_S, RULE_SET_IDS, WAVELENGTH_RANGE_NM } from '../limits/rule-sets.js';

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

function fraction(field: string, x: unknown, lowInclusive: boolean): number {
  const v = requireInRange(field, x, 0, 1, '(fraction)');
  if (!lowInclusive && v === 0) throw new InputError('not_positive', field, x, 'more than 0, at most 1');
  return v;
}

/** Longest pulse accepted; the shortest is any positive value (below 1e-13 s a warning follows). */
const MAX_PULSE_S = DURATION_RANGE_S[1];

/**
 * Check a beam input; throws InputError with `prefix` + field path. Returns the rule set to use.
 * `roomRuleSet` (from a room) wins over a missing beam rule set; a conflicting one is an error.
 */
export function validateBeamInput(input: unknown, prefix = '', roomRuleSet?: RuleSetId): RuleSetId {
  const p = (f: string): string => `${prefix}${f}`;
  const b = requireObject(prefix ? prefix.replace(/\.$/, '') : '(beam input)', input);
  let ruleSet: RuleSetId = roomRuleSet ?? 'icnirp2013';
  if (b['ruleSet'] !== undefined) {
    ruleSet = choice(p('ruleSet'), b['ruleSet'], RULE_SET_IDS);
    if (roomRuleSet && ruleSet !== roomRuleSet) {
      throw new InputError('invalid_choice', p('ruleSet'), b['ruleSet'], `the room's rule set '${roomRuleSet}' (one rule set per room)`);
    }
  }
  requireInRange(p('wavelength_nm'), b['wavelength_nm'], WAVELENGTH_RANGE_NM[0], WAVELENGTH_RANGE_NM[1], 'nm (180 nm to 1 mm)');

  const e = requireObject(p('emission'), b['emission']);
  const kind = choice(p('emission.kind'), e['kind'], ['cw', 'pulsed'] as const);
  if (kind === 'cw') {
    requirePositive(p('emission.power_W'), e['power_W'], 'W');
  } else {
    requirePositive(p('emission.pulseEnergy_J'), e['pulseEnergy_J'], 'J');
    const tp = requirePositive(p('emission.pulseDuration_s'), e['pulseDuration_s'], 's');
    if (tp > MAX_PULSE_S) throw new InputError('out_of_range', p('emission.pulseDuration_s'), tp, `more than 0, at most ${MAX_PULSE_S} s`);
    if (e['repetitionRate_Hz'] !== undefined) {
      const f = requirePositive(p('emission.repetitionRate_Hz'), e['repetitionRate_Hz'], 'Hz');
      if (f * tp > 1) throw new InputError('out_of_range', p('emission.repetitionRate_Hz'), f, `at most 1 / pulse duration = ${1 / tp} Hz (pulses would overlap)`);
    }
  }

  const g = requireObject(p('beam'), b['beam']);
  requireNonNegative(p('beam.diameter_m'), g['diameter_m'], 'm');
  requireInRange(p('beam.diameter_m'), g['diameter_m'], 0, 100, 'm');
  requirePositive(p('beam.divergence_rad'), g['divergence_rad'], 'rad');
  requireInRange(p('beam.divergence_rad'), g['divergence_rad'], 0, Math.PI, 'rad (full angle)');
  choice(p('beam.definition'), g['definition'], ['1/e', '1/e2', 'd63'] as const);
  if (g['profile'] !== undefined) choice(p('beam.profile'), g['profile'], ['gaussian', 'tophat'] as const);
  if (g['diameterY_m'] !== undefined) requireInRange(p('beam.diameterY_m'), g['diameterY_m'], 0, 100, 'm');
  if (g['divergenceY_rad'] !== undefined) {
    requirePositive(p('beam.divergenceY_rad'), g['divergenceY_rad'], 'rad');
    requireInRange(p('beam.divergenceY_rad'), g['divergenceY_rad'], 0, Math.PI, 'rad (full angle)');
  }

  if (b['exposureDuration_s'] !== undefined) {
    const T = requireInRange(p('exposureDuration_s'), b['exposureDuration_s'], DURATION_RANGE_S[0], DURATION_RANGE_S[1], 's');
    if (kind === 'pulsed' && T < (e['pulseDuration_s'] as number)) {
      throw new InputError('out_of_range', p('exposureDuration_s'), T, `at least the pulse duration (${String(e['pulseDuration_s'])} s)`);
    }
  }
  if (b['sourceAngle_rad'] !== undefined) requireInRange(p('sourceAngle_rad'), b['sourceAngle_rad'], 0, Math.PI, 'rad');
  if (b['skinArea_m2'] !== undefined) requireInRange(p('skinArea_m2'), b['skinArea_m2'], 0, 10, 'm² (irradiated skin area)');

  if (b['viewing'] !== undefined) validateViewing(requireObject(p('viewing'), b['viewing']), p('viewing.'));
  if (b['tolerances'] !== undefined) {
    const t = requireObject(p('tolerances'), b['tolerances']);
    for (const k of ['power', 'energy', 'divergence', 'diameter', 'pulseDuration', 'repetitionRate'] as const) {
      if (t[k] !== undefined) {
        const v = requireInRange(p(`tolerances.${k}`), t[k], 0, 0.99, '(relative, 0.1 = ±10 %)');
        void v;
      }
    }
  }
  if (b['settings'] !== undefined) requireObject(p('settings'), b['settings']);
  return ruleSet;
}

function validateViewing(v: Record<string, unknown>, prefix: string): void {
  const p = (f: string): string => `${prefix}${f}`;
  if (optional(v, 'diffuse') !== undefined) {
    const d = requireObject(p('diffuse'), v['diffuse']);
    fraction(p('diffuse.reflectance'), d['reflectance'], true);
    if (d['viewingAngle_rad'] !== undefined) requireInRange(p('diffuse.viewingAngle_rad'), d['viewingAngle_rad'], 0, Math.PI / 2, 'rad (0 = along the normal)');
    if (d['targetDistance_m'] !== undefined) requireNonNegative(p('diffuse.targetDistance_m'), d['targetDistance_m'], 'm');
    if (d['viewerDistance_m'] !== undefined) requirePositive(p('diffuse.viewerDistance_m'), d['viewerDistance_m'], 'm');
    if (d['deliberateDuration_s'] !== undefined) requireInRange(p('diffuse.deliberateDuration_s'), d['deliberateDuration_s'], 1e-3, 30000, 's (deliberate viewing of the diffuse spot)');
    if (d['governs'] !== undefined && d['governs'] !== 'accidental' && d['governs'] !== 'deliberate') throw new InputError('invalid_choice', p('diffuse.governs'), d['governs'], "'accidental' | 'deliberate'");
  }
  if (v['specular'] !== undefined) {
    const s = requireObject(p('specular'), v['specular']);
    fraction(p('specular.reflectance'), s['reflectance'], true);
    if (s['pathToSurface_m'] !== undefined) requireNonNegative(p('specular.pathToSurface_m'), s['pathToSurface_m'], 'm');
  }
  if (v['lens'] !== undefined) {
    const l = requireObject(p('lens'), v['lens']);
    requirePositive(p('lens.focalLength_m'), l['focalLength_m'], 'm');
    if (l['beamDiameterAtLens_m'] !== undefined) requirePositive(p('lens.beamDiameterAtLens_m'), l['beamDiameterAtLens_m'], 'm');
  }
  if (v['fiber'] !== undefined) {
    const f = requireObject(p('fiber'), v['fiber']);
    const kind = choice(p('fiber.kind'), f['kind'], ['multimode', 'singlemode'] as const);
    requireInRange(p('fiber.numericalAperture'), f['numericalAperture'], 0, 1, '');
    if (f['numericalAperture'] === 0) throw new InputError('not_positive', p('fiber.numericalAperture'), 0, 'more than 0, at most 1');
    if (kind === 'singlemode') {
      // The nominal NA overstates a single-mode fibre's spread (a shorter, unsafe distance): the
      // mode-field diameter is required (domain notes 1.6).
      if (f['modeFieldDiameter_m'] === undefined) throw new InputError('missing', p('fiber.modeFieldDiameter_m'), undefined, 'the mode-field diameter in m (e.g. 10.4e-6 for a standard fibre at 1550 nm); the nominal NA is not used for single-mode fibres');
    }
    if (f['modeFieldDiameter_m'] !== undefined) requireInRange(p('fiber.modeFieldDiameter_m'), f['modeFieldDiameter_m'], 1e-7, 1e-3, 'm');
  }
  if (v['aided'] !== undefined) {
    const a = requireObject(p('aided'), v['aided']);
    requireInRange(p('aided.magnification'), a['magnification'], 1, 1000, '');
    requirePositive(p('aided.objectiveDiameter_m'), a['objectiveDiameter_m'], 'm');
    requireInRange(p('aided.objectiveDiameter_m'), a['objectiveDiameter_m'], 0, 2, 'm');
    if (a['transmission'] !== undefined) fraction(p('aided.transmission'), a['transmission'], false);
  }
  if (v['attenuation_per_m'] !== undefined) requireInRange(p('attenuation_per_m'), v['attenuation_per_m'], 0, 1, '1/m');
  if (v['closestApproach_m'] !== undefined) requireNonNegative(p('closestApproach_m'), v['closestApproach_m'], 'm');
}

/** Narrowing helper for callers that validated first. */
export function asBeamInput(x: unknown): BeamInput {
  return x as BeamInput;
}
