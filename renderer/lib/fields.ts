/**
 * Unit-aware input fields: what the officer types ("5 mW", "1064 nm", "10 ns", "15 %") is read with
 * the core's parseQuantity into SI, and SI values from a record are written back in the unit an
 * officer would type. A field that does not parse keeps its last good value (the evaluation does
 * not change) and shows the error beside the field.
 */
import { InputError, SI_UNIT, angleText, formatSI, parseQuantity, type Dimension } from '../../core/index.js';

export interface FieldSpec {
  /** Field name used in error messages (and matched against core InputError fields). */
  readonly key: string;
  readonly label: string;
  readonly dimension: Dimension;
  /** Unit assumed for a bare number ("1064" in a wavelength field means nm). */
  readonly defaultUnit?: string;
  /** Unit used when writing a value back: 'nm', 'mm', 'mrad', '%' or an SI base for prefixes. */
  readonly display: 'nm' | 'mm' | 'm' | 'mrad' | 'deg' | '%' | 'x' | 'prefix';
  /** Empty text is allowed (the value is then undefined: a default applies or the option is off). */
  readonly optional?: boolean;
  /** Plausible range in SI (checked here so the error appears at the field, not in the results). */
  readonly min?: number;
  readonly minInclusive?: boolean;
  readonly max?: number;
  /** Shown under the field. */
  readonly hint?: string;
  readonly placeholder?: string;
}

export interface FieldState {
  text: string;
  /** Last good value in SI; undefined when empty (or never valid). */
  value: number | undefined;
  error: string | null;
}

export interface ParseOutcome {
  readonly value: number | undefined;
  readonly error: string | null;
}

function rangeText(spec: FieldSpec): string {
  // bounds read like the officer would say them: "up to π rad", not "0 mrad to 3141.59265359 mrad"
  const f = (v: number): string => (spec.dimension === 'angle' ? angleText(v) : formatField(spec, v));
  if (spec.min === 0 && spec.minInclusive && spec.max !== undefined) return `up to ${f(spec.max)}`;
  if (spec.min !== undefined && spec.max !== undefined) return `${f(spec.min)} to ${f(spec.max)}`;
  if (spec.min !== undefined) return `${spec.minInclusive ? 'at least' : 'more than'} ${f(spec.min)}`;
  if (spec.max !== undefined) return `at most ${f(spec.max)}`;
  return '';
}

/** Read a field's text. Never throws: errors come back as a sentence naming what is expected. */
export function parseField(spec: FieldSpec, text: string): ParseOutcome {
  const t = text.trim();
  if (t === '') return spec.optional ? { value: undefined, error: null } : { value: undefined, error: `${spec.label} is required` };
  let v: number;
  try {
    v = parseQuantity(spec.key, t, spec.dimension, spec.defaultUnit).value.toNumber();
  } catch (e) {
    if (e instanceof InputError) {
      if (e.code === 'unknown_unit') return { value: undefined, error: `${spec.label}: "${t}" is not ${e.validRange}` };
      return { value: undefined, error: `${spec.label}: cannot read "${t}"; type ${e.validRange}` };
    }
    return { value: undefined, error: `${spec.label}: cannot read "${t}"` };
  }
  const lowOk = spec.min === undefined || (spec.minInclusive ? v >= spec.min : v > spec.min);
  const highOk = spec.max === undefined || v <= spec.max;
  if (!Number.isFinite(v) || !lowOk || !highOk) return { value: undefined, error: `${spec.label} must be ${rangeText(spec)}` };
  return { value: v, error: null };
}

/** Update a field from typed text: a bad text keeps the last good value. */
export function applyText(spec: FieldSpec, field: FieldState, text: string): void {
  field.text = text;
  const r = parseField(spec, text);
  field.error = r.error;
  if (r.error === null) field.value = r.value;
}

/** Round-trip-safe number text (no rounding of inputs: they are the officer's own numbers). */
function num(v: number): string {
  const s = String(Number(v.toPrecision(12)));
  return s.includes('e') ? s.replace('e+', 'e') : s;
}

/** Write an SI value in the unit an officer would type for this field. */
export function formatField(spec: FieldSpec, v: number): string {
  switch (spec.display) {
    case 'nm':
      return v >= 1e-5 ? `${num(v * 1e6)} µm` : `${num(v * 1e9)} nm`;
    case 'mm':
      return `${num(v * 1e3)} mm`;
    case 'm':
      return `${num(v)} m`;
    case 'mrad':
      return `${num(v * 1e3)} mrad`;
    case 'deg':
      return `${num((v * 180) / Math.PI)} deg`;
    case '%':
      return `${num(v * 100)} %`;
    case 'x':
      return num(v);
    case 'prefix':
      // formatSI with 12 significant digits only picks the prefix; it does not round an input.
      return formatSI(String(v), SI_UNIT[spec.dimension], 12, 'up', false);
  }
}

export function fieldFrom(spec: FieldSpec, v: number | undefined): FieldState {
  return { text: v === undefined ? '' : formatField(spec, v), value: v, error: null };
}

/** Wavelengths are stored in nm by the core, but typed like any length ("1.064 µm" works too). */
export function wavelengthNm(field: FieldState): number | undefined {
  return field.value === undefined ? undefined : Number((field.value * 1e9).toPrecision(12));
}

// ------------------------------------------------------------------ the fields of a beam

const s = (x: FieldSpec): FieldSpec => x;

export const F = {
  wavelength: s({ key: 'wavelength_nm', label: 'Wavelength', dimension: 'wavelength', defaultUnit: 'nm', display: 'nm', min: 180e-9, max: 1e-3, minInclusive: true, placeholder: '1064 nm' }),
  power: s({ key: 'power_W', label: 'Power', dimension: 'power', defaultUnit: 'W', display: 'prefix', min: 0, placeholder: '5 mW' }),
  energy: s({ key: 'pulseEnergy_J', label: 'Energy per pulse', dimension: 'energy', defaultUnit: 'J', display: 'prefix', min: 0, placeholder: '2 mJ' }),
  pulseDuration: s({ key: 'pulseDuration_s', label: 'Pulse duration', dimension: 'time', defaultUnit: 's', display: 'prefix', min: 0, placeholder: '10 ns' }),
  repetitionRate: s({ key: 'repetitionRate_Hz', label: 'Repetition rate', dimension: 'frequency', defaultUnit: 'Hz', display: 'prefix', min: 0, optional: true, placeholder: 'single pulse', hint: 'empty = a single pulse' }),
  diameter: s({ key: 'diameter_m', label: 'Beam diameter', dimension: 'length', defaultUnit: 'mm', display: 'mm', min: 0, placeholder: '2 mm' }),
  divergence: s({ key: 'divergence_rad', label: 'Divergence (full angle)', dimension: 'angle', defaultUnit: 'mrad', display: 'mrad', min: 0, minInclusive: true, max: Math.PI, placeholder: '1 mrad' }),
  diameterY: s({ key: 'diameterY_m', label: 'Diameter, second axis', dimension: 'length', defaultUnit: 'mm', display: 'mm', min: 0, optional: true, placeholder: 'round beam' }),
  divergenceY: s({ key: 'divergenceY_rad', label: 'Divergence, second axis', dimension: 'angle', defaultUnit: 'mrad', display: 'mrad', min: 0, minInclusive: true, max: Math.PI, optional: true, placeholder: 'same' }),
  exposureDuration: s({ key: 'exposureDuration_s', label: 'Exposure duration', dimension: 'time', defaultUnit: 's', display: 'prefix', min: 1e-13, max: 3e4, minInclusive: true, optional: true, placeholder: 'default' }),
  sourceAngle: s({ key: 'sourceAngle_rad', label: 'Apparent source (angular subtense)', dimension: 'angle', defaultUnit: 'mrad', display: 'mrad', min: 0, minInclusive: true, optional: true, placeholder: 'point source', hint: 'empty = point source (the safe assumption)' }),
  closestApproach: s({ key: 'closestApproach_m', label: 'Closest approach to the aperture', dimension: 'length', defaultUnit: 'm', display: 'm', min: 0, minInclusive: true, optional: true, placeholder: '0 m' }),
  attenuation: s({ key: 'attenuation_per_m', label: 'Atmospheric attenuation (1/m)', dimension: 'ratio', display: 'x', min: 0, minInclusive: true, optional: true, placeholder: 'none', hint: 'long outdoor paths only' }),
  // viewing conditions
  diffuseReflectance: s({ key: 'reflectance', label: 'Diffuse reflectance', dimension: 'ratio', display: '%', min: 0, max: 1, placeholder: '15 %' }),
  diffuseAngle: s({ key: 'viewingAngle_rad', label: 'Viewing angle from the normal', dimension: 'angle', defaultUnit: 'deg', display: 'deg', min: 0, minInclusive: true, max: Math.PI / 2, optional: true, placeholder: '0 (worst case)' }),
  diffuseTarget: s({ key: 'targetDistance_m', label: 'Laser to surface', dimension: 'length', defaultUnit: 'm', display: 'm', min: 0, minInclusive: true, optional: true, placeholder: 'at the aperture' }),
  diffuseViewer: s({ key: 'viewerDistance_m', label: 'Surface to viewer', dimension: 'length', defaultUnit: 'm', display: 'm', min: 0, minInclusive: true, optional: true, placeholder: 'none' }),
  specularReflectance: s({ key: 'reflectance', label: 'Specular reflectance', dimension: 'ratio', display: '%', min: 0, max: 1, placeholder: '100 %' }),
  specularPath: s({ key: 'pathToSurface_m', label: 'Laser to mirror', dimension: 'length', defaultUnit: 'm', display: 'm', min: 0, minInclusive: true, optional: true, placeholder: '0 m' }),
  lensFocal: s({ key: 'focalLength_m', label: 'Focal length', dimension: 'length', defaultUnit: 'mm', display: 'mm', min: 0, placeholder: '300 mm' }),
  lensBeam: s({ key: 'beamDiameterAtLens_m', label: 'Beam diameter at the lens', dimension: 'length', defaultUnit: 'mm', display: 'mm', min: 0, optional: true, placeholder: 'as at exit' }),
  fiberNa: s({ key: 'numericalAperture', label: 'Numerical aperture', dimension: 'ratio', display: 'x', min: 0, max: 1, placeholder: '0.14' }),
  fiberMfd: s({ key: 'modeFieldDiameter_m', label: 'Mode-field / core diameter', dimension: 'length', defaultUnit: 'µm', display: 'mm', min: 0, optional: true, placeholder: '10 µm' }),
  aidedMagnification: s({ key: 'magnification', label: 'Magnification', dimension: 'ratio', display: 'x', min: 1, minInclusive: true, placeholder: '7' }),
  aidedObjective: s({ key: 'objectiveDiameter_m', label: 'Objective diameter', dimension: 'length', defaultUnit: 'mm', display: 'mm', min: 0, placeholder: '50 mm' }),
  aidedTransmission: s({ key: 'transmission', label: 'Optics transmission', dimension: 'ratio', display: '%', min: 0, max: 1, optional: true, placeholder: '100 %' }),
  // tolerances (relative, 0.1 = ±10 %)
  tolPower: s({ key: 'tolerances.power', label: 'Power / energy tolerance', dimension: 'ratio', display: '%', min: 0, minInclusive: true, max: 0.99, optional: true, placeholder: '±0 %' }),
  tolDiameter: s({ key: 'tolerances.diameter', label: 'Diameter tolerance', dimension: 'ratio', display: '%', min: 0, minInclusive: true, max: 0.99, optional: true, placeholder: '±0 %' }),
  tolDivergence: s({ key: 'tolerances.divergence', label: 'Divergence tolerance', dimension: 'ratio', display: '%', min: 0, minInclusive: true, max: 0.99, optional: true, placeholder: '±0 %' }),
  tolPulseDuration: s({ key: 'tolerances.pulseDuration', label: 'Pulse duration tolerance', dimension: 'ratio', display: '%', min: 0, minInclusive: true, max: 0.99, optional: true, placeholder: '±0 %' }),
  tolRepetitionRate: s({ key: 'tolerances.repetitionRate', label: 'Repetition rate tolerance', dimension: 'ratio', display: '%', min: 0, minInclusive: true, max: 0.99, optional: true, placeholder: '±0 %' }),
} as const;

export type FieldKey = keyof typeof F;
