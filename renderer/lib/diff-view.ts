/**
 * Makes a revision comparison readable: changes to what the officer entered first, then the
 * headline results that moved (limits, distances, OD, scale numbers, class), and the rest (the
 * derivation steps that follow from them) only counted. Each change is named with the label the
 * form uses ("Power", "Beam diameter"), its laser and beam by name, and values in engineering
 * notation with their unit; no stored path or full-precision twin reaches the screen.
 */
import { entryWords } from '../../core/index.js';
import { quantityText, type DisplayUnit, type RoomResult, type UnitHabit } from '../../core/index.js';
import type { AssessmentContent, FieldDifference } from '../../electron/api/contracts/records.js';

const HEADLINE = /\.(nohd_m_reported|odRequired|H_Jm2_reported|E_Wm2_reported|distance_m_reported|skinHazardDistance_m|nhzDiffuse_m|estimate|scale|largestHazardDistance_m|highestClass|eyewearCoveringAll|purchaseAdvice|adequate)(\[\d+\])?$/;

export interface DiffView {
  readonly content: readonly FieldDifference[];
  readonly headline: readonly FieldDifference[];
  /** Other result values (derivation steps, full-precision twins) that changed with them. */
  readonly otherResults: number;
}

export function diffView(diff: readonly FieldDifference[]): DiffView {
  const content = diff.filter((d) => !d.path.startsWith('results'));
  const results = diff.filter((d) => d.path.startsWith('results'));
  const headline = results.filter((d) => !/\.trace\b/.test(d.path) && HEADLINE.test(d.path));
  return { content, headline, otherResults: results.length - headline.length };
}

/** How a stored value is shown: a quantity with its unit, a percentage, a choice or plain text. */
type Shown =
  | { readonly unit: DisplayUnit; readonly round?: 'up' | 'down' }
  | { readonly percent: true }
  | { readonly degrees: true }
  | { readonly cm2: true }
  | { readonly choices: Readonly<Record<string, string>> }
  | { readonly text: true };

interface FieldInfo {
  readonly label: string;
  readonly shown: Shown;
  /** What an empty (absent) value means on the form. */
  readonly empty?: string;
}

const T: Shown = { text: true };
const q = (unit: DisplayUnit, round?: 'up' | 'down'): Shown => (round ? { unit, round } : { unit });
const PCT: Shown = { percent: true };

/** Beam fields by their stored path below the beam, with the form's labels (renderer/lib/fields.ts). */
const BEAM_FIELDS: Readonly<Record<string, FieldInfo>> = {
  label: { label: 'Beam label', shown: T },
  wavelength_nm: { label: 'Wavelength', shown: q('nm') },
  'emission.kind': { label: 'Emission', shown: { choices: { cw: 'continuous (CW)', pulsed: 'pulsed' } } },
  'emission.power_W': { label: 'Power', shown: q('W') },
  'emission.pulseEnergy_J': { label: 'Energy per pulse', shown: q('J') },
  'emission.pulseDuration_s': { label: 'Pulse duration', shown: q('s') },
  'emission.repetitionRate_Hz': { label: 'Repetition rate', shown: q('Hz'), empty: 'single pulse' },
  'beam.diameter_m': { label: 'Beam diameter', shown: q('m') },
  'beam.divergence_rad': { label: 'Divergence (full angle)', shown: q('rad') },
  'beam.definition': { label: 'Diameter measured at', shown: { choices: { '1/e': '1/e', '1/e2': '1/e² (data sheets)', d63: 'D63' } } },
  'beam.profile': { label: 'Beam profile', shown: { choices: { gaussian: 'Gaussian', tophat: 'top-hat' } }, empty: 'Gaussian' },
  'beam.diameterY_m': { label: 'Diameter, second axis', shown: q('m'), empty: 'round beam' },
  'beam.divergenceY_rad': { label: 'Divergence, second axis', shown: q('rad'), empty: 'same' },
  exposureDuration_s: { label: 'Exposure duration', shown: q('s'), empty: 'default' },
  sourceAngle_rad: { label: 'Apparent source (angular subtense)', shown: q('rad'), empty: 'point source' },
  ruleSet: { label: 'Rule set (this beam)', shown: T, empty: 'as the room' },
  'viewing.closestApproach_m': { label: 'Closest approach to the aperture', shown: q('m'), empty: '0 m' },
  'viewing.attenuation_per_m': { label: 'Atmospheric attenuation (1/m)', shown: T, empty: 'none' },
  'viewing.diffuse': { label: 'Diffuse reflection', shown: T, empty: 'not assessed' },
  'viewing.diffuse.reflectance': { label: 'Diffuse reflectance', shown: PCT },
  'viewing.diffuse.viewingAngle_rad': { label: 'Viewing angle from the normal', shown: { degrees: true }, empty: '0 (worst case)' },
  'viewing.diffuse.targetDistance_m': { label: 'Laser to surface', shown: q('m'), empty: 'at the aperture' },
  'viewing.diffuse.viewerDistance_m': { label: 'Surface to viewer', shown: q('m'), empty: 'none' },
  'viewing.diffuse.deliberateDuration_s': { label: 'Deliberate viewing duration', shown: q('s'), empty: '600 s (customary)' },
  'viewing.diffuse.governs': {
    label: 'Case that sets the hazard distance',
    shown: { choices: { accidental: 'accidental viewing', deliberate: 'deliberate viewing of the spot' } },
    empty: 'the larger distance',
  },
  skinArea_m2: { label: 'Irradiated skin area', shown: { cm2: true }, empty: 'not applied' },
  'viewing.specular': { label: 'Specular reflection', shown: T, empty: 'not assessed' },
  'viewing.specular.reflectance': { label: 'Specular reflectance', shown: PCT },
  'viewing.specular.pathToSurface_m': { label: 'Laser to mirror', shown: q('m'), empty: '0 m' },
  'viewing.lens': { label: 'Focusing lens', shown: T, empty: 'not assessed' },
  'viewing.lens.focalLength_m': { label: 'Focal length', shown: q('m') },
  'viewing.lens.beamDiameterAtLens_m': { label: 'Beam diameter at the lens', shown: q('m'), empty: 'as at exit' },
  'viewing.fiber': { label: 'Fibre end', shown: T, empty: 'not assessed' },
  'viewing.fiber.kind': { label: 'Fibre kind', shown: T },
  'viewing.fiber.numericalAperture': { label: 'Numerical aperture', shown: T },
  'viewing.fiber.modeFieldDiameter_m': { label: 'Mode-field / core diameter', shown: q('m') },
  'viewing.aided': { label: 'Optical aid', shown: T, empty: 'not assessed' },
  'viewing.aided.magnification': { label: 'Magnification', shown: T },
  'viewing.aided.objectiveDiameter_m': { label: 'Objective diameter', shown: q('m') },
  'viewing.aided.transmission': { label: 'Optics transmission', shown: PCT, empty: '100 %' },
  'tolerances.power': { label: 'Power / energy tolerance', shown: PCT, empty: '±0 %' },
  'tolerances.energy': { label: 'Energy tolerance', shown: PCT, empty: '±0 %' },
  'tolerances.diameter': { label: 'Diameter tolerance', shown: PCT, empty: '±0 %' },
  'tolerances.divergence': { label: 'Divergence tolerance', shown: PCT, empty: '±0 %' },
  'tolerances.pulseDuration': { label: 'Pulse duration tolerance', shown: PCT, empty: '±0 %' },
  'tolerances.repetitionRate': { label: 'Repetition rate tolerance', shown: PCT, empty: '±0 %' },
};

const LASER_FIELDS: Readonly<Record<string, FieldInfo>> = {
  name: { label: 'Laser name', shown: T },
  classAsLabelled: { label: 'Class as labelled', shown: T, empty: 'not labelled' },
};

const ROOM_FIELDS: Readonly<Record<string, FieldInfo>> = {
  title: { label: 'Assessment title', shown: T },
  notes: { label: 'Notes', shown: T, empty: 'none' },
  reviewBy: { label: 'Review by', shown: T, empty: 'not set' },
  'input.ruleSet': { label: 'Rule set', shown: { choices: { icnirp2013: 'ICNIRP 2013 guidelines', eu2006: 'EU Directive 2006/25/EC' } } },
  'input.settings.conservative': { label: 'Conservative mode', shown: { choices: { true: 'on', false: 'off' } }, empty: 'on' },
};

/** Result fields by their path below a beam result; limits round down, distances and OD up. */
const RESULT_FIELDS: ReadonlyArray<readonly [RegExp, (m: RegExpExecArray, r: RoomResult | undefined, beam: number) => FieldInfo]> = [
  [/^nohd_m_reported$/, () => ({ label: 'NOHD, direct beam', shown: q('m', 'up') })],
  [/^odRequired$/, () => ({ label: 'Required optical density', shown: { text: true } })],
  [/^mpe\.H_Jm2_reported$/, () => ({ label: 'Eye limit (radiant exposure)', shown: q('J/m²', 'down') })],
  [/^mpe\.E_Wm2_reported$/, () => ({ label: 'Eye limit (irradiance)', shown: q('W/m²', 'down') })],
  [/^skinMpe\.H_Jm2_reported$/, () => ({ label: 'Skin limit (radiant exposure)', shown: q('J/m²', 'down') })],
  [/^skinMpe\.E_Wm2_reported$/, () => ({ label: 'Skin limit (irradiance)', shown: q('W/m²', 'down') })],
  [/^skinHazardDistance_m$/, () => ({ label: 'Skin hazard distance', shown: q('m', 'up') })],
  [/^nhzDiffuse_m$/, () => ({ label: 'Diffuse reflection hazard distance', shown: q('m', 'up'), empty: 'not assessed' })],
  [/^classEstimate\.estimate$/, () => ({ label: 'Class estimate', shown: T })],
  [
    /^distances\[(\d+)\]\.distance_m_reported$/,
    (m, r, beam) => ({ label: `Hazard distance, ${r?.beams[beam]?.distances[Number(m[1])]?.label ?? 'viewing condition'}`, shown: q('m', 'up') }),
  ],
  [
    /^scaleNumbers\[(\d+)\]\.scale$/,
    (m, r, beam) => {
      const mode = r?.beams[beam]?.scaleNumbers[Number(m[1])]?.mode;
      return { label: mode === 'RB' ? 'EN 208 alignment scale number (RB)' : `EN 207 scale number (mode ${mode ?? '?'}, LB)`, shown: T };
    },
  ],
];

const ROOM_RESULT_FIELDS: ReadonlyArray<readonly [RegExp, (m: RegExpExecArray) => FieldInfo]> = [
  [/^largestHazardDistance_m$/, () => ({ label: 'Largest hazard distance', shown: q('m', 'up') })],
  [/^highestClass$/, () => ({ label: 'Highest class', shown: T })],
  [/^eyewearCoveringAll(\[\d+\])?$/, () => ({ label: 'Eyewear covering every beam', shown: T, empty: 'none' })],
  [/^requiredEyewear\[(\d+)\]\.odRequired$/, () => ({ label: 'Eyewear needed: optical density', shown: T })],
  [/^requiredEyewear\[(\d+)\]\.(\w+)$/, (m) => ({ label: `Eyewear needed: ${m[2] ?? ''}`, shown: T })],
  [/^purchaseAdvice(\[\d+\])?$/, () => ({ label: 'Eyewear purchase advice', shown: T })],
  [/^coverage\[(\d+)\]\.adequate$/, () => ({ label: 'Eyewear adequate', shown: { choices: { true: 'yes', false: 'no' } } })],
];

function beamName(content: AssessmentContent | undefined, l: number, b?: number): string {
  const laser = content?.input.lasers[l];
  const lname = laser?.name ?? `Laser ${l + 1}`;
  if (b === undefined) return lname;
  const beam = laser?.beams[b];
  return `${lname} · ${beam ? (beam.label ?? `${beam.wavelength_nm} nm`) : `beam ${b + 1}`}`;
}

function resultBeamName(content: AssessmentContent | undefined, results: RoomResult | undefined, i: number): string {
  const r = results?.beams[i];
  if (r) {
    const laser = content?.input.lasers.find((l) => l.id === r.laserId || l.beams.some((b) => b.id === r.beamId));
    return laser ? `${laser.name} · ${r.label}` : r.label;
  }
  const all = content?.input.lasers.flatMap((l) => l.beams.map((b) => `${l.name} · ${b.label ?? `${b.wavelength_nm} nm`}`)) ?? [];
  return all[i] ?? `Beam ${i + 1}`;
}

/** A stored value as the officer reads it. */
export function showValue(v: unknown, info: FieldInfo | undefined, habit: UnitHabit = 'SI'): string {
  if (v === undefined || v === null || v === '') return info?.empty ?? '—';
  const s = info?.shown;
  if (s && 'choices' in s) return s.choices[String(v)] ?? String(v);
  if ((typeof v === 'number' || (typeof v === 'string' && /^-?[\d.]+(e[-+]?\d+)?$/i.test(v))) && s) {
    if ('unit' in s) return quantityText(String(v), s.unit, { sig: s.round ? 3 : 6, round: s.round ?? 'nearest', habit });
    if ('percent' in s) return `${Number((Number(v) * 100).toPrecision(6))} %`;
    if ('degrees' in s) return `${Number(((Number(v) * 180) / Math.PI).toPrecision(4))}°`;
    if ('cm2' in s) return `${Number((Number(v) * 1e4).toPrecision(6))} cm²`;
  }
  if (typeof v === 'object') {
    // a whole group added or removed (e.g. the diffuse viewing condition)
    return Array.isArray(v) ? `${v.length} item${v.length === 1 ? '' : 's'}` : 'set';
  }
  return String(v);
}

export interface ChangeRow {
  /** Laser and beam by name, or "Room" / "Assessment". */
  readonly where: string;
  /** The label the form uses. */
  readonly what: string;
  readonly old: string;
  readonly new: string;
  readonly result: boolean;
}

function humanise(p: string): string {
  return p
    .replace(/\[(\d+)\]/g, (_, n: string) => ` ${Number(n) + 1}`)
    .replace(/_[A-Za-z0-9]+$/, '')
    .replace(/\./g, ' · ')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .replace(/^./, (c) => c.toUpperCase());
}

const hasConservative = (v: unknown): boolean => typeof v === 'object' && v !== null && 'conservative' in v;

/** Checks of the limit tables as the officer reads them: "row H-E-VIS-2: differs (IEC …, Dr. A, 2026-12-02)". */
function checksText(v: unknown): string {
  const one = (c: unknown): string => {
    if (typeof c !== 'object' || c === null) return c === undefined || c === null ? 'none' : String(c);
    const x = c as { key?: unknown; verdict?: unknown; reference?: unknown; checkedBy?: unknown; checkedOn?: unknown };
    return typeof x.key === 'string' ? `${entryWords(x.key)}: ${String(x.verdict ?? '')} (${String(x.reference ?? '')}, ${String(x.checkedBy ?? '')}, ${String(x.checkedOn ?? '')})` : 'a check';
  };
  if (Array.isArray(v)) return v.length === 0 ? 'none' : v.map(one).join('; ');
  return one(v);
}

/** One change as the officer reads it: where (laser · beam), the form's label, and both values with units. */
export function describeChange(d: FieldDifference, content: AssessmentContent | undefined, results?: RoomResult, habit: UnitHabit = 'SI'): ChangeRow {
  const p = d.path.replace(/^content\./, '');
  const row = (where: string, what: string, info: FieldInfo | undefined, result = false): ChangeRow => ({
    where,
    what,
    old: showValue(d.old, info, habit),
    new: showValue(d.new, info, habit),
    result,
  });
  let m = /^input\.lasers\[(\d+)\]\.beams\[(\d+)\]\.?(.*)$/.exec(p);
  if (m) {
    const key = m[3] ?? '';
    const info = BEAM_FIELDS[key];
    return row(beamName(content, Number(m[1]), Number(m[2])), key === '' ? 'Beam' : (info?.label ?? humanise(key)), key === '' ? { label: 'Beam', shown: T, empty: 'not present' } : info);
  }
  m = /^input\.lasers\[(\d+)\]\.?(.*)$/.exec(p);
  if (m) {
    const key = m[2] ?? '';
    const info = LASER_FIELDS[key];
    return row(beamName(content, Number(m[1])), key === '' ? 'Laser' : (info?.label ?? humanise(key)), key === '' ? { label: 'Laser', shown: T, empty: 'not present' } : info);
  }
  m = /^results\.beams\[(\d+)\]\.(.*)$/.exec(p);
  if (m) {
    const i = Number(m[1]);
    const key = m[2] ?? '';
    for (const [re, f] of RESULT_FIELDS) {
      const k = re.exec(key);
      if (k) {
        const info = f(k, results, i);
        return row(resultBeamName(content, results, i), info.label, info, true);
      }
    }
    return row(resultBeamName(content, results, i), humanise(key), undefined, true);
  }
  m = /^results\.(.*)$/.exec(p);
  if (m) {
    const key = m[1] ?? '';
    for (const [re, f] of ROOM_RESULT_FIELDS) {
      const k = re.exec(key);
      if (k) {
        const info = f(k);
        return row('Room', info.label, info, true);
      }
    }
    return row('Room', humanise(key), undefined, true);
  }
  if (/^input\.settings\.rowChecks\b/.test(p) || (p === 'input.settings' && !hasConservative(d.old) && !hasConservative(d.new))) {
    // The register's checks of the limit tables the revision uses (issue 12), in words.
    const of = (v: unknown): unknown => (p === 'input.settings' && typeof v === 'object' && v !== null ? (v as { rowChecks?: unknown }).rowChecks : v);
    return { where: 'Assessment', what: 'Limit-table checks used', old: checksText(of(d.old)), new: checksText(of(d.new)), result: false };
  }
  const info = ROOM_FIELDS[p];
  if (info) return row('Assessment', info.label, info);
  m = /^controls\[(\d+)\]\.?(.*)$/.exec(p);
  if (m) {
    const c = content?.controls[Number(m[1])];
    const what = { decision: 'Decision', reason: 'Reason', implementation: 'In place or to do', owner: 'Owner', due: 'Due', measure: 'Measure' }[m[2] ?? ''] ?? 'Control';
    return row(`Control: ${c?.measure ?? Number(m[1]) + 1}`, what, { label: what, shown: T, empty: 'none' });
  }
  m = /^eyewearChosen\[(\d+)\]\.?(.*)$/.exec(p);
  if (m) return row('Eyewear chosen', humanise(m[2] || 'entry'), { label: '', shown: T, empty: 'none' });
  m = /^nonBeamHazards\[(\d+)\]\.?(.*)$/.exec(p);
  if (m) return row('Other hazards', humanise(m[2] || 'entry'), { label: '', shown: T, empty: 'none' });
  m = /^(operatingStates|assumptions)(.*)$/.exec(p);
  if (m) return row(m[1] === 'assumptions' ? 'Assumptions' : 'Operating states', humanise(m[2]?.replace(/^[.[]/, '') || 'entry'), { label: '', shown: T, empty: 'none' });
  return row('Assessment', humanise(p), undefined);
}
