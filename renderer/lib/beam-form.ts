/**
 * The editing form of one beam and one laser: text fields (FieldState) that map to the core's
 * BeamInput / LaserInput. A form with a missing required value yields no BeamInput (the beam is
 * listed as incomplete) instead of an evaluation with an invented number.
 */
import type { BeamDefinition, BeamInput, LaserInput } from '../../core/index.js';
import { F, fieldFrom, wavelengthNm, type FieldState } from './fields.js';

export type LaserClassLabel = NonNullable<LaserInput['classAsLabelled']>;
export const LASER_CLASSES: readonly LaserClassLabel[] = ['1', '1M', '2', '2M', '3R', '3B', '4'];

export interface BeamForm {
  id: string;
  label: string;
  emissionKind: 'cw' | 'pulsed';
  definition: BeamDefinition;
  elliptical: boolean;
  f: Record<BeamFieldName, FieldState>;
  /** Why the officer chose this exposure duration (recorded as an assumption). */
  durationWhy: string;
  diffuseOn: boolean;
  /** Which diffuse viewing case governs; '' = the one with the larger distance (the core's default). */
  diffuseGoverns: '' | 'accidental' | 'deliberate';
  specularOn: boolean;
  lensOn: boolean;
  fiberOn: boolean;
  fiberKind: 'multimode' | 'singlemode';
  aidedOn: boolean;
  showTolerances: boolean;
  /** Fields kept from the stored input that the form does not edit (rule set, settings). */
  keep: Pick<BeamInput, 'ruleSet' | 'settings'> & { profile?: 'gaussian' | 'tophat' };
}

export const BEAM_FIELDS = [
  'wavelength',
  'power',
  'energy',
  'pulseDuration',
  'repetitionRate',
  'diameter',
  'divergence',
  'diameterY',
  'divergenceY',
  'exposureDuration',
  'sourceAngle',
  'closestApproach',
  'skinArea',
  'attenuation',
  'diffuseReflectance',
  'diffuseAngle',
  'diffuseTarget',
  'diffuseViewer',
  'diffuseDeliberate',
  'specularReflectance',
  'specularPath',
  'lensFocal',
  'lensBeam',
  'fiberNa',
  'fiberMfd',
  'aidedMagnification',
  'aidedObjective',
  'aidedTransmission',
  'tolPower',
  'tolDiameter',
  'tolDivergence',
  'tolPulseDuration',
  'tolRepetitionRate',
] as const satisfies ReadonlyArray<keyof typeof F>;
export type BeamFieldName = (typeof BEAM_FIELDS)[number];

export interface LaserForm {
  id: string;
  name: string;
  classAsLabelled: LaserClassLabel | '';
  beams: BeamForm[];
  /** Not yet in the register: created there when the assessment is saved. */
  isNew: boolean;
}

export function newId(prefix: string): string {
  const r = crypto.getRandomValues(new Uint32Array(2));
  return `${prefix}-${(r[0] ?? 0).toString(36)}${(r[1] ?? 0).toString(36)}`;
}

/** A form from a stored beam (or a blank CW beam when `b` is undefined). */
export function beamFormFrom(b: BeamInput | undefined, why = ''): BeamForm {
  const e = b?.emission;
  const v = b?.viewing;
  const t = b?.tolerances;
  const get = (k: BeamFieldName): number | undefined => {
    switch (k) {
      case 'wavelength':
        return b ? b.wavelength_nm * 1e-9 : undefined;
      case 'power':
        return e?.kind === 'cw' ? e.power_W : undefined;
      case 'energy':
        return e?.kind === 'pulsed' ? e.pulseEnergy_J : undefined;
      case 'pulseDuration':
        return e?.kind === 'pulsed' ? e.pulseDuration_s : undefined;
      case 'repetitionRate':
        return e?.kind === 'pulsed' ? e.repetitionRate_Hz : undefined;
      case 'diameter':
        return b?.beam.diameter_m;
      case 'divergence':
        return b?.beam.divergence_rad;
      case 'diameterY':
        return b?.beam.diameterY_m;
      case 'divergenceY':
        return b?.beam.divergenceY_rad;
      case 'exposureDuration':
        return b?.exposureDuration_s;
      case 'sourceAngle':
        return b?.sourceAngle_rad;
      case 'closestApproach':
        return v?.closestApproach_m;
      case 'skinArea':
        return b?.skinArea_m2;
      case 'attenuation':
        return v?.attenuation_per_m;
      case 'diffuseReflectance':
        return v?.diffuse?.reflectance;
      case 'diffuseAngle':
        return v?.diffuse?.viewingAngle_rad;
      case 'diffuseTarget':
        return v?.diffuse?.targetDistance_m;
      case 'diffuseViewer':
        return v?.diffuse?.viewerDistance_m;
      case 'diffuseDeliberate':
        return v?.diffuse?.deliberateDuration_s;
      case 'specularReflectance':
        return v?.specular?.reflectance;
      case 'specularPath':
        return v?.specular?.pathToSurface_m;
      case 'lensFocal':
        return v?.lens?.focalLength_m;
      case 'lensBeam':
        return v?.lens?.beamDiameterAtLens_m;
      case 'fiberNa':
        return v?.fiber?.numericalAperture;
      case 'fiberMfd':
        return v?.fiber?.modeFieldDiameter_m;
      case 'aidedMagnification':
        return v?.aided?.magnification;
      case 'aidedObjective':
        return v?.aided?.objectiveDiameter_m;
      case 'aidedTransmission':
        return v?.aided?.transmission;
      case 'tolPower':
        return t?.power ?? t?.energy;
      case 'tolDiameter':
        return t?.diameter;
      case 'tolDivergence':
        return t?.divergence;
      case 'tolPulseDuration':
        return t?.pulseDuration;
      case 'tolRepetitionRate':
        return t?.repetitionRate;
    }
  };
  const f = Object.fromEntries(BEAM_FIELDS.map((k) => [k, fieldFrom(F[k], get(k))])) as Record<BeamFieldName, FieldState>;
  if (!b) {
    // A blank beam that already evaluates: a visible CW beam an officer then edits.
    Object.assign(f, {
      wavelength: fieldFrom(F.wavelength, 532e-9),
      power: fieldFrom(F.power, 0.005),
      diameter: fieldFrom(F.diameter, 0.002),
      divergence: fieldFrom(F.divergence, 0.001),
    });
  }
  const keep: BeamForm['keep'] = {
    ...(b?.ruleSet !== undefined ? { ruleSet: b.ruleSet } : {}),
    ...(b?.settings !== undefined ? { settings: b.settings } : {}),
    ...(b?.beam.profile !== undefined ? { profile: b.beam.profile } : {}),
  };
  return {
    id: b?.id ?? newId('beam'),
    label: b?.label ?? '',
    emissionKind: e?.kind ?? 'cw',
    definition: b?.beam.definition ?? '1/e2',
    elliptical: b?.beam.diameterY_m !== undefined || b?.beam.divergenceY_rad !== undefined,
    f,
    durationWhy: why,
    diffuseOn: v?.diffuse !== undefined,
    diffuseGoverns: v?.diffuse?.governs ?? '',
    specularOn: v?.specular !== undefined,
    lensOn: v?.lens !== undefined,
    fiberOn: v?.fiber !== undefined,
    fiberKind: v?.fiber?.kind ?? 'singlemode',
    aidedOn: v?.aided !== undefined,
    showTolerances: t !== undefined && Object.keys(t).length > 0,
    keep,
  };
}

/** Does any field of the beam show an error (shown ones only: hidden sections are ignored)? */
export function beamErrors(form: BeamForm): string[] {
  const out: string[] = [];
  for (const k of activeFields(form)) {
    const err = form.f[k].error;
    if (err) out.push(err);
  }
  return out;
}

/** The fields that take part in the input, given the toggles. */
export function activeFields(form: BeamForm): BeamFieldName[] {
  const on: BeamFieldName[] = ['wavelength', 'diameter', 'divergence', 'exposureDuration', 'sourceAngle', 'closestApproach', 'skinArea', 'attenuation'];
  on.push(...(form.emissionKind === 'cw' ? (['power'] as const) : (['energy', 'pulseDuration', 'repetitionRate'] as const)));
  if (form.elliptical) on.push('diameterY', 'divergenceY');
  if (form.diffuseOn) on.push('diffuseReflectance', 'diffuseAngle', 'diffuseTarget', 'diffuseViewer', 'diffuseDeliberate');
  if (form.specularOn) on.push('specularReflectance', 'specularPath');
  if (form.lensOn) on.push('lensFocal', 'lensBeam');
  if (form.fiberOn) on.push('fiberNa', 'fiberMfd');
  if (form.aidedOn) on.push('aidedMagnification', 'aidedObjective', 'aidedTransmission');
  if (form.showTolerances) on.push('tolPower', 'tolDiameter', 'tolDivergence', 'tolPulseDuration', 'tolRepetitionRate');
  return on;
}

/** The fields every beam needs, whatever is ticked: without them there is no result at all. */
function coreFields(form: BeamForm): BeamFieldName[] {
  return ['wavelength', 'diameter', 'divergence', ...(form.emissionKind === 'cw' ? (['power'] as const) : (['energy', 'pulseDuration'] as const))];
}

/** Names of required values that are still missing, e.g. ["Power"] (the beam cannot be evaluated). */
export function missingValues(form: BeamForm): string[] {
  return coreFields(form)
    .filter((k) => form.f[k].value === undefined)
    .map((k) => F[k].label);
}

/** A ticked viewing condition that cannot be assessed yet; the rest of the beam still is. */
export interface SectionGap {
  readonly section: string;
  readonly problem: string;
}

const SECTIONS: ReadonlyArray<{ on: (f: BeamForm) => boolean; section: string; required: BeamFieldName[] }> = [
  { on: (f) => f.diffuseOn, section: 'Diffuse reflection', required: ['diffuseReflectance'] },
  { on: (f) => f.specularOn, section: 'Specular reflection', required: ['specularReflectance'] },
  { on: (f) => f.lensOn, section: 'Focusing optics', required: ['lensFocal'] },
  { on: (f) => f.fiberOn, section: 'Fibre output', required: ['fiberNa'] },
  { on: (f) => f.aidedOn, section: 'Magnifying optics', required: ['aidedMagnification', 'aidedObjective'] },
];

/** Ticked sections with a required value missing: each is left out of the evaluation, and named. */
export function sectionGaps(form: BeamForm): SectionGap[] {
  const out: SectionGap[] = [];
  for (const s of SECTIONS) {
    if (!s.on(form)) continue;
    const missing = s.required.filter((k) => form.f[k].value === undefined).map((k) => F[k].label);
    if (s.section === 'Fibre output' && form.fiberKind === 'singlemode' && form.f.fiberMfd.value === undefined) missing.push(`${F.fiberMfd.label} (for a single-mode fibre)`);
    if (missing.length > 0) out.push({ section: s.section, problem: `${s.section} not assessed until ${missing.join(' and ')} ${missing.length === 1 ? 'is' : 'are'} given` });
  }
  return out;
}

function opt<K extends string, V>(key: K, v: V | undefined): { [P in K]?: V } {
  return (v === undefined ? {} : { [key]: v }) as { [P in K]?: V };
}

/** The core input of a beam from its last good values; null while a required value is missing. */
export function beamInputFrom(form: BeamForm): BeamInput | null {
  if (missingValues(form).length > 0) return null;
  const val = (k: BeamFieldName): number | undefined => form.f[k].value;
  const need = (k: BeamFieldName): number => {
    const x = val(k);
    if (x === undefined) throw new Error(`internal: ${k} missing after check`);
    return x;
  };
  const wl = wavelengthNm(form.f.wavelength);
  if (wl === undefined) return null;
  const emission: BeamInput['emission'] =
    form.emissionKind === 'cw'
      ? { kind: 'cw', power_W: need('power') }
      : { kind: 'pulsed', pulseEnergy_J: need('energy'), pulseDuration_s: need('pulseDuration'), ...opt('repetitionRate_Hz', val('repetitionRate')) };
  const viewing: Record<string, unknown> = {
    ...opt('closestApproach_m', val('closestApproach')),
    ...opt('attenuation_per_m', val('attenuation')),
  };
  const gaps = new Set(sectionGaps(form).map((g) => g.section));
  if (form.diffuseOn && !gaps.has('Diffuse reflection')) {
    viewing['diffuse'] = {
      reflectance: need('diffuseReflectance'),
      ...opt('viewingAngle_rad', val('diffuseAngle')),
      ...opt('targetDistance_m', val('diffuseTarget')),
      ...opt('viewerDistance_m', val('diffuseViewer')),
      ...opt('deliberateDuration_s', val('diffuseDeliberate')),
      ...(form.diffuseGoverns !== '' ? { governs: form.diffuseGoverns } : {}),
    };
  }
  if (form.specularOn && !gaps.has('Specular reflection')) viewing['specular'] = { reflectance: need('specularReflectance'), ...opt('pathToSurface_m', val('specularPath')) };
  if (form.lensOn && !gaps.has('Focusing optics')) viewing['lens'] = { focalLength_m: need('lensFocal'), ...opt('beamDiameterAtLens_m', val('lensBeam')) };
  if (form.fiberOn && !gaps.has('Fibre output')) viewing['fiber'] = { kind: form.fiberKind, numericalAperture: need('fiberNa'), ...opt('modeFieldDiameter_m', val('fiberMfd')) };
  if (form.aidedOn && !gaps.has('Magnifying optics')) {
    viewing['aided'] = { magnification: need('aidedMagnification'), objectiveDiameter_m: need('aidedObjective'), ...opt('transmission', val('aidedTransmission')) };
  }
  const tol = form.showTolerances
    ? {
        ...opt(form.emissionKind === 'cw' ? 'power' : 'energy', val('tolPower')),
        ...opt('diameter', val('tolDiameter')),
        ...opt('divergence', val('tolDivergence')),
        ...(form.emissionKind === 'pulsed' ? { ...opt('pulseDuration', val('tolPulseDuration')), ...opt('repetitionRate', val('tolRepetitionRate')) } : {}),
      }
    : {};
  return {
    id: form.id,
    ...(form.label.trim() ? { label: form.label.trim() } : {}),
    ...(form.keep.ruleSet !== undefined ? { ruleSet: form.keep.ruleSet } : {}),
    wavelength_nm: wl,
    emission,
    beam: {
      diameter_m: need('diameter'),
      divergence_rad: need('divergence'),
      definition: form.definition,
      ...(form.keep.profile !== undefined ? { profile: form.keep.profile } : {}),
      ...(form.elliptical ? { ...opt('diameterY_m', val('diameterY')), ...opt('divergenceY_rad', val('divergenceY')) } : {}),
    },
    ...opt('exposureDuration_s', val('exposureDuration')),
    ...opt('sourceAngle_rad', val('sourceAngle')),
    ...opt('skinArea_m2', val('skinArea')),
    ...(Object.keys(viewing).length > 0 ? { viewing: viewing as BeamInput['viewing'] } : {}),
    ...(Object.keys(tol).length > 0 ? { tolerances: tol } : {}),
    ...(form.keep.settings !== undefined ? { settings: form.keep.settings } : {}),
  };
}

export function laserFormFrom(l: LaserInput, isNew: boolean, whyByBeam: ReadonlyMap<string, string> = new Map()): LaserForm {
  return {
    id: l.id,
    name: l.name,
    classAsLabelled: l.classAsLabelled ?? '',
    beams: l.beams.map((b) => beamFormFrom(b, b.id !== undefined ? (whyByBeam.get(b.id) ?? '') : '')),
    isNew,
  };
}

/** The laser's core input from complete beams only; `incomplete` lists the others. */
export function laserInputFrom(form: LaserForm): { laser: LaserInput | null; incomplete: BeamForm[] } {
  const beams: BeamInput[] = [];
  const incomplete: BeamForm[] = [];
  for (const bf of form.beams) {
    const bi = beamInputFrom(bf);
    if (bi) beams.push(bi);
    else incomplete.push(bf);
  }
  if (beams.length === 0) return { laser: null, incomplete };
  return {
    laser: { id: form.id, name: form.name.trim() || 'Unnamed laser', ...(form.classAsLabelled ? { classAsLabelled: form.classAsLabelled } : {}), beams },
    incomplete,
  };
}

/** Short description used in lists: "532 nm CW 5 mW". */
export function beamCaption(form: BeamForm): string {
  const wl = form.f.wavelength.text || '? nm';
  const out = form.emissionKind === 'cw' ? `CW ${form.f.power.text || '?'}` : `pulsed ${form.f.energy.text || '?'}, ${form.f.pulseDuration.text || '?'}`;
  return `${wl} ${out}`;
}
