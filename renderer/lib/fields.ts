/**
 * Unit-aware input fields: what the officer types ("5 mW", "1064 nm", "10 ns", "15 %") is read with
 * the core's parseQuantity into SI, and SI values from a record are written back in the unit an
 * officer would type. A field that does not parse keeps its last good value (the evaluation does
 * not change) and shows the error beside the field.
 */
import {
  angleRangeWords,
  DIMENSION_WORDS,
  INPUT_RULES,
  InputError,
  inRange,
  parseQuantity,
  plausibilityQuestion,
  readBack,
  type Dimension,
  type NumberRule,
  type ReadBackStyle,
  type RuleName,
} from '../../core/index.js';

export interface FieldSpec {
  /** Field name used in error messages (and matched against core InputError fields). */
  readonly key: string;
  /** The quantity in officer words ("Energy per pulse"), used in every message about it. */
  readonly label: string;
  /**
   * The unit a bare number is read in ("1064" in a wavelength field means nm). Only a field whose
   * label states this unit has one (`unitNote`): elsewhere a bare number is refused, because an
   * unseen default once turned "200" in an energy field into 200 J per pulse.
   */
  readonly defaultUnit?: string;
  /** Shown in the label after the quantity, stating what a bare number means: "(nm)". */
  readonly unitNote?: string;
  readonly dimension: Dimension;
  /** Unit used when writing a value back: 'nm', 'mm', 'mrad', '%' or an SI base for prefixes. */
  readonly display: ReadBackStyle;
  /** Empty text is allowed (the value is then undefined: a default applies or the option is off). */
  readonly optional?: boolean;
  /** Range and plausibility, from the one table of input rules (core/model/input-rules.ts). */
  readonly rule: NumberRule;
  /** The core stores this field as SI × storedPerSI (wavelengths in nm). */
  readonly storedPerSI?: number;
  /** Words after the read-back value: "= 200 J per pulse". */
  readonly phrase?: string;
  /** Shown under the field. */
  readonly hint?: string;
  /** Words, never a number that could be taken for a value ("e.g. 15 %", "single pulse"). */
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

/** The full label as shown: quantity and, where a bare number is read in a unit, that unit. */
export function fieldLabel(spec: FieldSpec): string {
  return spec.unitNote ? `${spec.label} (${spec.unitNote})` : spec.label;
}

function rangeText(spec: FieldSpec): string {
  const rule = spec.rule;
  // angles: the half or full turn bound in degrees, small angles as typed (officer words, never "π rad")
  if (rule.unit === 'rad') return angleRangeWords(rule);
  const per = spec.storedPerSI ?? 1;
  const f = (v: number): string => formatField(spec, v / per);
  if (rule.max !== undefined) {
    return rule.minInclusive ? `${f(rule.min)} to ${f(rule.max)}` : `more than ${f(rule.min)}, at most ${f(rule.max)}`;
  }
  return rule.minInclusive ? `at least ${f(rule.min)}` : `more than ${f(rule.min)}`;
}

/** Read a field's text. Never throws: errors come back as a sentence naming what is expected. */
export function parseField(spec: FieldSpec, text: string): ParseOutcome {
  const t = text.trim();
  if (t === '') return spec.optional ? { value: undefined, error: null } : { value: undefined, error: `${spec.label} is required` };
  let v: number;
  try {
    v = parseQuantity(spec.key, t, spec.dimension, spec.defaultUnit, 'guard').value.toNumber();
  } catch (e) {
    if (e instanceof InputError) {
      const what = DIMENSION_WORDS[spec.dimension];
      if (e.code === 'unknown_unit' && /^\s*[+-]?[\d.,]+(?:[eE][+-]?\d+)?\s*$/.test(t)) {
        return { value: undefined, error: `${spec.label}: type the unit, e.g. ${spec.placeholder?.replace(/^e\.g\. /, '') ?? e.validRange}` };
      }
      if (e.code === 'unknown_unit') return { value: undefined, error: `${spec.label}: "${t}" is not ${what} unit` };
      if (e.code === 'unparseable' && t.includes(',')) return { value: undefined, error: `${spec.label}: ${e.message.slice(e.message.indexOf(': ') + 2).replace(/ \(got .*$/, '')}` };
      return { value: undefined, error: `${spec.label}: cannot read "${t}"; type ${e.validRange}` };
    }
    return { value: undefined, error: `${spec.label}: cannot read "${t}"` };
  }
  const per = spec.storedPerSI ?? 1;
  if (!Number.isFinite(v) || !inRange(spec.rule, Number((v * per).toPrecision(15)))) {
    const why = spec.rule.why ? ` (${spec.rule.why})` : '';
    return { value: undefined, error: `${spec.label} must be ${rangeText(spec)}${why}` };
  }
  return { value: v, error: null };
}

/** How a good value was read, in full: "= 200 J per pulse". */
export function fieldEcho(spec: FieldSpec, v: number): string {
  return `= ${formatField(spec, v)}${spec.phrase ? ` ${spec.phrase}` : ''}`;
}

/** "Is this right? …" for an allowed but unusual value; null otherwise. */
export function fieldQuestion(spec: FieldSpec, v: number): string | null {
  return plausibilityQuestion(spec.rule, v * (spec.storedPerSI ?? 1));
}

/** Update a field from typed text: a bad text keeps the last good value. */
export function applyText(spec: FieldSpec, field: FieldState, text: string): void {
  field.text = text;
  const r = parseField(spec, text);
  field.error = r.error;
  if (r.error === null) field.value = r.value;
}

/** Write an SI value in the unit an officer would type for this field. */
export function formatField(spec: FieldSpec, v: number): string {
  return readBack(v, spec.dimension, spec.display);
}

export function fieldFrom(spec: FieldSpec, v: number | undefined): FieldState {
  return { text: v === undefined ? '' : formatField(spec, v), value: v, error: null };
}

/** Wavelengths are stored in nm by the core, but typed like any length ("1.064 µm" works too). */
export function wavelengthNm(field: FieldState): number | undefined {
  return field.value === undefined ? undefined : Number((field.value * 1e9).toPrecision(12));
}

// ------------------------------------------------------------------ the fields of a beam

const R = INPUT_RULES;
const s = (rule: RuleName, x: Omit<FieldSpec, 'rule' | 'label'> & { label?: string }): FieldSpec => ({ ...x, label: x.label ?? R[rule].label, rule: R[rule] });

// Placeholders are words or "e.g. …": an empty field must never look as if it held a value.
export const F = {
  wavelength: s('wavelength_nm', { key: 'wavelength_nm', dimension: 'wavelength', defaultUnit: 'nm', unitNote: 'nm', display: 'nm', storedPerSI: 1e9, placeholder: 'e.g. 1064 nm' }),
  power: s('power_W', { key: 'power_W', dimension: 'power', display: 'prefix', phrase: 'output power', placeholder: 'e.g. 5 mW' }),
  energy: s('pulseEnergy_J', { key: 'pulseEnergy_J', dimension: 'energy', display: 'prefix', phrase: 'per pulse', placeholder: 'e.g. 2 mJ' }),
  pulseDuration: s('pulseDuration_s', { key: 'pulseDuration_s', dimension: 'time', display: 'prefix', phrase: 'per pulse', placeholder: 'e.g. 10 ns' }),
  repetitionRate: s('repetitionRate_Hz', { key: 'repetitionRate_Hz', dimension: 'frequency', defaultUnit: 'Hz', unitNote: 'Hz', display: 'prefix', phrase: 'pulses per second', optional: true, placeholder: 'single pulse', hint: 'empty = a single pulse' }),
  diameter: s('diameter_m', { key: 'diameter_m', dimension: 'length', defaultUnit: 'mm', unitNote: 'mm', display: 'mm', phrase: 'at the exit', placeholder: 'e.g. 2 mm' }),
  divergence: s('divergence_rad', { key: 'divergence_rad', label: 'Divergence, full angle', dimension: 'angle', defaultUnit: 'mrad', unitNote: 'mrad', display: 'mrad', phrase: 'full angle', placeholder: 'e.g. 1 mrad' }),
  diameterY: s('diameterY_m', { key: 'diameterY_m', dimension: 'length', defaultUnit: 'mm', unitNote: 'mm', display: 'mm', optional: true, placeholder: 'round beam' }),
  divergenceY: s('divergenceY_rad', { key: 'divergenceY_rad', dimension: 'angle', defaultUnit: 'mrad', unitNote: 'mrad', display: 'mrad', phrase: 'full angle', optional: true, placeholder: 'same as the first axis' }),
  exposureDuration: s('exposureDuration_s', { key: 'exposureDuration_s', dimension: 'time', defaultUnit: 's', unitNote: 's', display: 'prefix', optional: true, placeholder: 'default for the band' }),
  sourceAngle: s('sourceAngle_rad', { key: 'sourceAngle_rad', dimension: 'angle', defaultUnit: 'mrad', unitNote: 'mrad', display: 'mrad', optional: true, placeholder: 'point source', hint: 'empty = point source (the safe assumption)' }),
  closestApproach: s('closestApproach_m', { key: 'closestApproach_m', dimension: 'length', defaultUnit: 'm', unitNote: 'm', display: 'm', optional: true, placeholder: 'at the aperture' }),
  skinArea: s('skinArea_m2', {
    key: 'skinArea_m2',
    dimension: 'area',
    defaultUnit: 'cm²',
    unitNote: 'cm²',
    display: 'cm2',
    phrase: 'of skin in the beam',
    optional: true,
    placeholder: 'not applied',
    hint: 'for the large-area skin limit: applies above 100 cm² (0.01 m²), beyond 10 s, 1400 nm to 1 mm',
  }),
  attenuation: s('attenuation_per_m', { key: 'attenuation_per_m', label: 'Atmospheric attenuation', unitNote: 'per metre', dimension: 'ratio', display: 'x', optional: true, placeholder: 'none', hint: 'long outdoor paths only' }),
  // viewing conditions
  diffuseReflectance: s('diffuseReflectance', { key: 'reflectance', unitNote: '% or fraction', dimension: 'ratio', display: '%', placeholder: 'e.g. 15 %' }),
  diffuseAngle: s('viewingAngle_rad', { key: 'viewingAngle_rad', dimension: 'angle', defaultUnit: 'deg', unitNote: 'deg', display: 'deg', optional: true, placeholder: 'worst case' }),
  diffuseTarget: s('targetDistance_m', { key: 'targetDistance_m', dimension: 'length', defaultUnit: 'm', unitNote: 'm', display: 'm', optional: true, placeholder: 'at aperture' }),
  diffuseDeliberate: s('deliberateDuration_s', {
    key: 'deliberateDuration_s',
    dimension: 'time',
    defaultUnit: 's',
    unitNote: 's',
    display: 'prefix',
    phrase: 'looking at the spot',
    optional: true,
    placeholder: 'customary default',
    hint: 'looking at the spot on purpose (alignment on a card or screen); empty = 600 s, customary (from memory)',
  }),
  diffuseViewer: s('viewerDistance_m', { key: 'viewerDistance_m', dimension: 'length', defaultUnit: 'm', unitNote: 'm', display: 'm', optional: true, placeholder: 'none' }),
  specularReflectance: s('specularReflectance', { key: 'reflectance', unitNote: '% or fraction', dimension: 'ratio', display: '%', placeholder: 'e.g. 100 %' }),
  specularPath: s('pathToSurface_m', { key: 'pathToSurface_m', dimension: 'length', defaultUnit: 'm', unitNote: 'm', display: 'm', optional: true, placeholder: 'at the aperture' }),
  lensFocal: s('focalLength_m', { key: 'focalLength_m', dimension: 'length', defaultUnit: 'mm', unitNote: 'mm', display: 'mm', placeholder: 'e.g. 300 mm' }),
  lensBeam: s('beamDiameterAtLens_m', { key: 'beamDiameterAtLens_m', dimension: 'length', defaultUnit: 'mm', unitNote: 'mm', display: 'mm', optional: true, placeholder: 'as at the exit' }),
  fiberNa: s('numericalAperture', { key: 'numericalAperture', dimension: 'ratio', display: 'x', placeholder: 'e.g. 0.14' }),
  fiberMfd: s('modeFieldDiameter_m', { key: 'modeFieldDiameter_m', dimension: 'length', defaultUnit: 'µm', unitNote: 'µm', display: 'mm', optional: true, placeholder: 'e.g. 10 µm' }),
  aidedMagnification: s('magnification', { key: 'magnification', unitNote: '×', dimension: 'ratio', display: 'x', placeholder: 'e.g. 7' }),
  aidedObjective: s('objectiveDiameter_m', { key: 'objectiveDiameter_m', dimension: 'length', defaultUnit: 'mm', unitNote: 'mm', display: 'mm', placeholder: 'e.g. 50 mm' }),
  // room plan
  planAperture: s('planAperture_m', { key: 'aperture_m', label: 'Aperture', dimension: 'length', defaultUnit: 'mm', unitNote: 'mm', display: 'mm', phrase: 'wide', optional: true, placeholder: 'not stated' }),
  aidedTransmission: s('transmission', { key: 'transmission', unitNote: '% or fraction', dimension: 'ratio', display: '%', optional: true, placeholder: 'full (100 %)' }),
  // tolerances (relative, 0.1 = ±10 %)
  tolPower: s('tolerance', { key: 'tolerances.power', label: 'Power / energy tolerance', unitNote: '±%', dimension: 'ratio', display: '%', optional: true, placeholder: 'none' }),
  tolDiameter: s('tolerance', { key: 'tolerances.diameter', label: 'Diameter tolerance', unitNote: '±%', dimension: 'ratio', display: '%', optional: true, placeholder: 'none' }),
  tolDivergence: s('tolerance', { key: 'tolerances.divergence', label: 'Divergence tolerance', unitNote: '±%', dimension: 'ratio', display: '%', optional: true, placeholder: 'none' }),
  tolPulseDuration: s('tolerance', { key: 'tolerances.pulseDuration', label: 'Pulse duration tolerance', unitNote: '±%', dimension: 'ratio', display: '%', optional: true, placeholder: 'none' }),
  tolRepetitionRate: s('tolerance', { key: 'tolerances.repetitionRate', label: 'Repetition rate tolerance', unitNote: '±%', dimension: 'ratio', display: '%', optional: true, placeholder: 'none' }),
} as const;

