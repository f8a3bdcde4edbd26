/**
 * Reading what older versions of Beamwarden stored or exported. Inputs added later are optional,
 * so older content still reads; where such an input is absent the calculation uses its documented
 * default, and the officer is told which defaults were assumed (an absent value in content saved
 * by this version is the officer's own choice of the default, and is not reported).
 *
 * The inputs added after the first release, with the calculation version that brought them:
 * - 0.2.0: irradiated skin area (large-area skin limit, limit specification 4.3), the deliberate
 *   viewing duration of a diffuse spot and the viewing case that sets the diffuse hazard distance.
 * - database schema 5: eyewear upkeep (last inspection, condition, next inspection).
 */
import type { AssessmentContent, Eyewear } from './types.js';

type Version = readonly [number, number, number];

/** "beamwarden-core 0.1.0" -> [0, 1, 0]; null for a calculation this reader does not know. */
export function coreVersionOf(calculatedWith: string): Version | null {
  const m = /^beamwarden-core (\d+)\.(\d+)\.(\d+)/.exec(calculatedWith);
  return m ? [Number(m[1]), Number(m[2]), Number(m[3])] : null;
}

function before(v: Version, than: Version): boolean {
  for (let i = 0; i < 3; i++) if ((v[i] ?? 0) !== (than[i] ?? 0)) return (v[i] ?? 0) < (than[i] ?? 0);
  return false;
}

type Beam = AssessmentContent['input']['lasers'][number]['beams'][number];

interface NewerInput {
  readonly since: Version;
  /** The field in officer words. */
  readonly label: string;
  /** The default the calculation uses when it is absent, and where it is documented. */
  readonly assumed: string;
  /** Does this beam lack the input (where it would apply)? */
  readonly absentIn: (b: Beam) => boolean;
}

const NEWER_BEAM_INPUTS: readonly NewerInput[] = [
  {
    since: [0, 2, 0],
    label: 'Irradiated skin area',
    assumed: 'not given, so the large-area skin limit (IEC 60825-1 / ANSI Z136.1, more than 10 s over more than 0.01 m²) is not applied',
    absentIn: (b) => b.skinArea_m2 === undefined,
  },
  {
    since: [0, 2, 0],
    label: 'Deliberate viewing duration',
    assumed: '600 s (the customary value for looking at a diffuse spot on purpose; not yet checked against the published text)',
    absentIn: (b) => b.viewing?.diffuse !== undefined && b.viewing.diffuse.deliberateDuration_s === undefined,
  },
  {
    since: [0, 2, 0],
    label: 'Case that sets the diffuse hazard distance',
    assumed: 'the larger of the accidental and the deliberate viewing distances',
    absentIn: (b) => b.viewing?.diffuse !== undefined && b.viewing.diffuse.governs === undefined,
  },
];

const MAX_PLACES = 4;

/**
 * The defaults assumed for content saved by an older calculation (`calculatedWith`): one sentence
 * per input, naming the lasers and beams it concerns. Empty for content of this version.
 */
export function assumedDefaults(content: AssessmentContent, calculatedWith: string): string[] {
  const v = coreVersionOf(calculatedWith);
  if (v === null) return [];
  const out: string[] = [];
  for (const input of NEWER_BEAM_INPUTS) {
    if (!before(v, input.since)) continue;
    const places: string[] = [];
    for (const l of content.input.lasers) {
      l.beams.forEach((b, i) => {
        if (input.absentIn(b)) places.push(`${l.name}, ${b.label ?? `beam ${i + 1}`}`);
      });
    }
    if (places.length === 0) continue;
    const where = places.length > MAX_PLACES ? `${places.slice(0, MAX_PLACES).join('; ')} and ${places.length - MAX_PLACES} more` : places.join('; ');
    out.push(`${input.label}: ${input.assumed} — saved by version ${v.join('.')} of the Beamwarden calculation, before this input existed (${where}).`);
  }
  return out;
}

/**
 * Eyewear read from an export written before eyewear upkeep existed: the upkeep fields were absent
 * and are taken as "not recorded". `raw` is the item as it was in the file.
 */
export function eyewearDefaultsAssumed(raw: unknown, e: Eyewear): string | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const r = raw as Record<string, unknown>;
  const missing = ['inspectedOn', 'condition', 'nextInspection'].filter((k) => !(k in r));
  if (missing.length === 0) return null;
  return `Eyewear ${e.spec.id}: the file has no inspection record (written before eyewear upkeep existed); condition "not recorded" and no inspection dates assumed.`;
}
