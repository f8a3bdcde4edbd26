/**
 * The one table of input rules: the range each number of a beam, laser and eyewear may take, the
 * length of each name, and the plausibility questions asked at a field. The core validators
 * (core/beam/validate-beam.ts, core/room/validate-room.ts), the zod schemas at every boundary
 * (electron/backend/schemas/inputs.ts), the CSV import and the form fields (renderer/lib/fields.ts,
 * renderer/lib/eyewear-text.ts) are all built from it, so the register, the imports and the
 * calculation accept and refuse the same things and nothing stored can later break an assessment.
 *
 * Values are in the units the core stores (SI, except wavelengths in nm).
 */

export interface NumberRule {
  /** Officer words for the quantity, used in every message about it. */
  readonly label: string;
  /** Unit of the stored value ('' for plain ratios). */
  readonly unit: string;
  readonly min: number;
  /** false: the value must be greater than `min` (0 excluded). */
  readonly minInclusive: boolean;
  /** Inclusive upper bound (undefined: none). */
  readonly max?: number;
  /** Why the bounds are what they are (shown in a refusal after the range). */
  readonly why?: string;
  /**
   * Values outside [below, above] are accepted but unusual: the form asks "is this right?" at the
   * field (issue: a bare 200 in an energy field once meant 200 J per pulse unseen).
   */
  readonly plausible?: { readonly above?: number; readonly below?: number; readonly note: string };
}

const r = (x: NumberRule): NumberRule => x;

/** Limit tables of both rule sets span 180 nm to 1 mm and 1e-13 s to 3e4 s (limit specification, section 0). */
export const INPUT_RULES = {
  wavelength_nm: r({ label: 'Wavelength', unit: 'nm', min: 180, minInclusive: true, max: 1e6, why: 'the limit tables cover 180 nm to 1 mm' }),
  power_W: r({
    label: 'Power',
    unit: 'W',
    min: 0,
    minInclusive: false,
    plausible: { above: 1e5, note: 'more than 100 kW of continuous power is rare outside large industrial systems' },
  }),
  pulseEnergy_J: r({
    label: 'Energy per pulse',
    unit: 'J',
    min: 0,
    minInclusive: false,
    plausible: { above: 10, note: 'more than 10 J per pulse is rare outside large research lasers; check mJ against J' },
  }),
  pulseDuration_s: r({
    label: 'Pulse duration',
    unit: 's',
    min: 0,
    minInclusive: false,
    max: 3e4,
    why: 'the limit tables end at 30 000 s',
    plausible: { above: 1, note: 'a pulse longer than 1 s is usually assessed as continuous (CW); check ns, µs and ms' },
  }),
  repetitionRate_Hz: r({
    label: 'Repetition rate',
    unit: 'Hz',
    min: 0,
    minInclusive: false,
    plausible: { above: 1e10, note: 'more than 10 GHz is beyond mode-locked lasers in common use' },
  }),
  // An exit diameter of 0 is a point-like source: published NOHD examples use it.
  diameter_m: r({
    label: 'Beam diameter',
    unit: 'm',
    min: 0,
    minInclusive: true,
    max: 100,
    plausible: { above: 0.5, note: 'a beam wider than 0.5 m at the exit is unusual; check mm against m' },
  }),
  // A real beam always spreads; 0 would make every hazard distance infinite.
  divergence_rad: r({
    label: 'Divergence (full angle)',
    unit: 'rad',
    min: 0,
    minInclusive: false,
    max: Math.PI,
    why: 'a beam always spreads a little: use the data sheet value',
    plausible: { above: 0.1, note: 'more than 100 mrad is a bare diode or fibre output; check mrad against rad and degrees' },
  }),
  diameterY_m: r({ label: 'Diameter, second axis', unit: 'm', min: 0, minInclusive: true, max: 100, plausible: { above: 0.5, note: 'a beam wider than 0.5 m at the exit is unusual; check mm against m' } }),
  divergenceY_rad: r({
    label: 'Divergence, second axis',
    unit: 'rad',
    min: 0,
    minInclusive: false,
    max: Math.PI,
    why: 'a beam always spreads a little: use the data sheet value',
    plausible: { above: 0.1, note: 'more than 100 mrad is a bare diode or fibre output; check mrad against rad and degrees' },
  }),
  exposureDuration_s: r({ label: 'Exposure duration', unit: 's', min: 1e-13, minInclusive: true, max: 3e4, why: 'the limit tables cover 1e-13 s to 30 000 s' }),
  /** Irradiated skin area for the large-area skin limit (limit specification 4.3); 0 = not applied. */
  skinArea_m2: r({ label: 'Irradiated skin area', unit: 'm²', min: 0, minInclusive: true, max: 10 }),
  sourceAngle_rad: r({ label: 'Apparent source (angular subtense)', unit: 'rad', min: 0, minInclusive: true, max: Math.PI }),
  closestApproach_m: r({ label: 'Closest approach to the aperture', unit: 'm', min: 0, minInclusive: true }),
  attenuation_per_m: r({ label: 'Atmospheric attenuation', unit: '1/m', min: 0, minInclusive: true, max: 1 }),
  diffuseReflectance: r({ label: 'Diffuse reflectance', unit: '', min: 0, minInclusive: true, max: 1 }),
  viewingAngle_rad: r({ label: 'Viewing angle from the normal', unit: 'rad', min: 0, minInclusive: true, max: Math.PI / 2 }),
  targetDistance_m: r({ label: 'Laser to surface', unit: 'm', min: 0, minInclusive: true }),
  /** Deliberate viewing of a diffuse spot: up to a working day (30 000 s, where the limit tables end). */
  deliberateDuration_s: r({ label: 'Deliberate viewing duration', unit: 's', min: 1e-3, minInclusive: true, max: 3e4 }),
  viewerDistance_m: r({ label: 'Surface to viewer', unit: 'm', min: 0, minInclusive: false }),
  specularReflectance: r({ label: 'Specular reflectance', unit: '', min: 0, minInclusive: true, max: 1 }),
  pathToSurface_m: r({ label: 'Laser to mirror', unit: 'm', min: 0, minInclusive: true }),
  focalLength_m: r({ label: 'Focal length', unit: 'm', min: 0, minInclusive: false }),
  beamDiameterAtLens_m: r({ label: 'Beam diameter at the lens', unit: 'm', min: 0, minInclusive: false }),
  numericalAperture: r({ label: 'Numerical aperture', unit: '', min: 0, minInclusive: false, max: 1 }),
  modeFieldDiameter_m: r({ label: 'Mode-field / core diameter', unit: 'm', min: 1e-7, minInclusive: true, max: 1e-3 }),
  magnification: r({ label: 'Magnification', unit: '', min: 1, minInclusive: true, max: 1000 }),
  objectiveDiameter_m: r({ label: 'Objective diameter', unit: 'm', min: 0, minInclusive: false, max: 2 }),
  /** Room plan: the width of the opening of a beam dump or the face of a target (ours: 2 m, as an objective; a plan's elements are bench optics). */
  planAperture_m: r({
    label: 'Aperture',
    unit: 'm',
    min: 0,
    minInclusive: false,
    max: 2,
    why: 'the opening of a beam dump or the face of a target',
    plausible: { above: 0.3, below: 0.001, note: 'beam dumps and targets on a bench are usually a few millimetres to a few centimetres wide; check mm against m' },
  }),
  transmission: r({ label: 'Optics transmission', unit: '', min: 0, minInclusive: false, max: 1 }),
  /** Relative tolerances (0.1 = ±10 %): below 1 so the lower bound of a quantity stays positive. */
  tolerance: r({ label: 'Tolerance', unit: '', min: 0, minInclusive: true, max: 0.99 }),
  opticalDensity: r({ label: 'Optical density', unit: '', min: 0, minInclusive: true, max: 20 }),
  visibleTransmission: r({ label: 'Visible transmission', unit: '', min: 0, minInclusive: true, max: 1 }),
} as const satisfies Record<string, NumberRule>;

export type RuleName = keyof typeof INPUT_RULES;

/** Does a finite number satisfy the rule's range? */
export function inRange(rule: NumberRule, x: number): boolean {
  if (!Number.isFinite(x)) return false;
  if (rule.minInclusive ? x < rule.min : x <= rule.min) return false;
  return rule.max === undefined || x <= rule.max;
}

/** The range in words and the rule's unit, e.g. "more than 0 W", "from 180 nm to 1000000 nm". */
export function rangeWords(rule: NumberRule): string {
  if (rule.unit === 'rad') return angleRangeWords(rule);
  const u = rule.unit ? ` ${rule.unit}` : '';
  if (rule.max !== undefined) {
    return rule.minInclusive ? `from ${rule.min}${u} to ${rule.max}${u}` : `more than ${rule.min}${u}, at most ${rule.max}${u}`;
  }
  return rule.minInclusive ? `${rule.min} or more${u}` : `more than ${rule.min}${u}`;
}

/**
 * An angle as an officer writes a range bound: whole degrees for the half and full turn bounds
 * ("180°", "90°"), small angles in mrad as they are typed ("0 mrad"); never "π rad".
 */
export function angleBoundWords(rad: number, small: 'mrad' | 'deg'): string {
  const deg = (rad * 180) / Math.PI;
  if (small === 'deg' || Math.abs(deg - Math.round(deg)) < 1e-9 && deg >= 1) return `${Number(deg.toPrecision(6))}°`;
  return `${Number((rad * 1000).toPrecision(6))} mrad`;
}

/** An angle rule's range: the viewing angle (up to 90°) in degrees, beam angles from mrad to 180°. */
export function angleRangeWords(rule: NumberRule): string {
  const small = rule.max !== undefined && rule.max <= Math.PI / 2 + 1e-12 ? 'deg' : 'mrad';
  const lo = angleBoundWords(rule.min, small);
  if (rule.max === undefined) return rule.minInclusive ? `${lo} or more` : `more than ${lo}`;
  const hi = angleBoundWords(rule.max, small);
  return rule.minInclusive ? `from ${lo} to ${hi}` : `more than ${lo}, at most ${hi}`;
}

/** The question asked beside a value that is allowed but unusual, or null. */
export function plausibilityQuestion(rule: NumberRule, x: number): string | null {
  const p = rule.plausible;
  if (!p || !Number.isFinite(x)) return null;
  if ((p.above !== undefined && x > p.above) || (p.below !== undefined && x < p.below)) return `Is this right? ${p.note.charAt(0).toUpperCase()}${p.note.slice(1)}.`;
  return null;
}

// ---------------------------------------------------------------- texts and marks

export interface TextRule {
  readonly label: string;
  /** Required: not empty once spaces are trimmed. */
  readonly required: boolean;
  readonly max: number;
}

/** Name lengths are those of the register (electron/backend/schemas/records.ts, text(200)). */
export const TEXT_RULES = {
  laserName: { label: 'Laser name', required: true, max: 200 },
  laserId: { label: 'Laser id', required: true, max: 200 },
  beamId: { label: 'Beam id', required: true, max: 200 },
  beamLabel: { label: 'Beam label', required: false, max: 200 },
  eyewearTag: { label: 'Eyewear tag', required: true, max: 200 },
  eyewearLabel: { label: 'Eyewear description', required: true, max: 200 },
  placeName: { label: 'Name of the place', required: true, max: 200 },
} as const satisfies Record<string, TextRule>;

export function textProblem(rule: TextRule, x: unknown): string | null {
  if (typeof x !== 'string') return `${rule.label} must be text`;
  if (rule.required && x.trim() === '') return `${rule.label} must not be empty`;
  if (x.length > rule.max) return `${rule.label} must be at most ${rule.max} characters (got ${x.length})`;
  return null;
}

/** EN 207:2017 scale numbers LB1 to LB10; EN 208:2009 alignment scale numbers RB1 to RB5. */
export const SCALE_NUMBERS = { en207: { min: 1, max: 10, prefix: 'LB', standard: 'EN 207:2017' }, en208: { min: 1, max: 5, prefix: 'RB', standard: 'EN 208:2009' } } as const;
/** EN 207 test conditions: D (continuous), I (pulsed), R (Q-switched), M (mode-locked); upper case as marked. */
export const EN207_MODES = /^[DIRM]+$/;

export const LASER_CLASS_LABELS = ['1', '1M', '2', '2M', '3R', '3B', '4'] as const;
