/**
 * The workspace draft: an AssessmentContent opened for editing (beams as text fields) and turned
 * back into content for saving. Pure functions over plain objects; the Svelte state wraps them.
 */
import {
  DEFAULT_RULE_SET,
  type ExposurePlace,
  type EyewearSpec,
  type LimitSettings,
  type RoomInput,
  type RoomPlan,
  type RuleSetId,
} from '../../core/index.js';
import { planForLasers } from './plan-edit.js';
import type {
  AssessmentContent,
  ControlChoice,
  EyewearChoice,
  NonBeamHazard,
  OperatingState,
} from '../../electron/api/contracts/records.js';
import { laserFormFrom, laserInputFrom, beamErrors, missingValues, sectionGaps, type BeamForm, type LaserForm } from './beam-form.js';
import { wavelengthNm } from './fields.js';

export interface Draft {
  title: string;
  ruleSet: RuleSetId;
  settings: LimitSettings;
  lasers: LaserForm[];
  eyewear: EyewearSpec[];
  /** Places the officer named where several beams can meet (the additive rule sums within a place). */
  exposurePlaces: Array<{ place: string; beamIds: string[] }>;
  operatingStates: OperatingState[];
  personsPresent: string;
  opticalAidsPossible: boolean;
  /** One assumption per line. */
  otherAssumptions: string;
  controls: ControlChoice[];
  nonBeamHazards: NonBeamHazard[];
  eyewearChosen: EyewearChoice[];
  notes: string;
  /** '' = no review date. */
  reviewBy: string;
  /** The room plan (replaced whole on every edit, see plan-edit.ts); null = no plan drawn. */
  plan?: RoomPlan | null;
}

/** Deep, mutable copy of plain JSON data (records arrive frozen-shaped as readonly types). */
export function plainCopy<T>(x: T): T {
  return JSON.parse(JSON.stringify(x)) as T;
}

export function draftFrom(content: AssessmentContent, registeredLaserIds: ReadonlySet<string>): Draft {
  const why = new Map(content.assumptions.exposureDurations.map((d) => [d.beamId, d.why]));
  return {
    title: content.title,
    ruleSet: content.input.ruleSet ?? DEFAULT_RULE_SET,
    settings: plainCopy(content.input.settings ?? {}),
    lasers: content.input.lasers.map((l) => laserFormFrom(l, !registeredLaserIds.has(l.id), why)),
    eyewear: plainCopy([...(content.input.eyewear ?? [])]),
    exposurePlaces: plainCopy([...(content.input.exposurePlaces ?? [])]) as Array<{ place: string; beamIds: string[] }>,
    operatingStates: [...content.operatingStates],
    personsPresent: content.assumptions.personsPresent,
    opticalAidsPossible: content.assumptions.opticalAidsPossible,
    otherAssumptions: content.assumptions.other.join('\n'),
    controls: plainCopy([...content.controls]),
    nonBeamHazards: plainCopy([...content.nonBeamHazards]),
    eyewearChosen: plainCopy([...content.eyewearChosen]),
    notes: content.notes,
    reviewBy: content.reviewBy ?? '',
    plan: content.input.plan ? plainCopy(content.input.plan) : null,
  };
}

export interface DraftInput {
  /** The core input from every complete beam (what the live results show). */
  readonly input: RoomInput;
  /** Beams left out because a required value is missing or a field shows an error. */
  readonly incomplete: ReadonlyArray<{ readonly laser: LaserForm; readonly beam: BeamForm; readonly problems: readonly string[] }>;
  /** Beams evaluated without a ticked viewing condition whose values are not all given yet. */
  readonly partial: ReadonlyArray<{ readonly laser: LaserForm; readonly beam: BeamForm; readonly problems: readonly string[] }>;
}

export function roomInputFrom(d: Draft): DraftInput {
  const lasers: RoomInput['lasers'][number][] = [];
  const incomplete: Array<{ laser: LaserForm; beam: BeamForm; problems: string[] }> = [];
  for (const lf of d.lasers) {
    const { laser, incomplete: inc } = laserInputFrom(lf);
    if (laser) lasers.push(laser);
    for (const b of inc) incomplete.push({ laser: lf, beam: b, problems: missingValues(b).map((m) => `${m} is required`) });
  }
  for (const lf of d.lasers) {
    for (const b of lf.beams) {
      const errs = beamErrors(b);
      if (errs.length > 0) {
        const existing = incomplete.find((x) => x.beam === b);
        if (existing) existing.problems.push(...errs);
        else incomplete.push({ laser: lf, beam: b, problems: errs });
      }
    }
  }
  const partial: Array<{ laser: LaserForm; beam: BeamForm; problems: string[] }> = [];
  for (const lf of d.lasers) {
    for (const b of lf.beams) {
      if (incomplete.some((x) => x.beam === b)) continue;
      const gaps = sectionGaps(b);
      if (gaps.length > 0) partial.push({ laser: lf, beam: b, problems: gaps.map((g) => g.problem) });
    }
  }
  const settings = Object.keys(d.settings).length > 0 ? { settings: d.settings } : {};
  // places name only beams still evaluated; an emptied place is dropped (its beams go back to their laser's path)
  const ids = new Set(lasers.flatMap((l) => l.beams.map((b) => b.id ?? '')));
  const places: ExposurePlace[] = (d.exposurePlaces ?? [])
    .map((p) => ({ place: p.place.trim() || 'unnamed place', beamIds: p.beamIds.filter((id) => ids.has(id)) }))
    .filter((p) => p.beamIds.length > 0);
  const plan = d.plan ? { plan: planForLasers(d.plan, lasers) } : {};
  return { input: { ruleSet: d.ruleSet, ...settings, lasers, eyewear: d.eyewear, ...(places.length > 0 ? { exposurePlaces: places } : {}), ...plan }, incomplete, partial };
}

/**
 * The exposure durations the officer chose, with the reason (recorded assumptions). Beams left at
 * the default are not listed: the results state the default and why for every beam, and a record
 * does not change merely because it was opened and saved again.
 */
export function durationChoices(d: Draft): AssessmentContent['assumptions']['exposureDurations'] {
  const out: Array<AssessmentContent['assumptions']['exposureDurations'][number]> = [];
  for (const l of d.lasers) {
    for (const b of l.beams) {
      const typed = b.f.exposureDuration.value;
      if (typed === undefined || wavelengthNm(b.f.wavelength) === undefined) continue;
      out.push({ beamId: b.id, duration_s: typed, why: b.durationWhy.trim() || 'chosen by the laser safety officer' });
    }
  }
  return out;
}

export function contentFrom(d: Draft): AssessmentContent {
  const { input } = roomInputFrom(d);
  // Choices may only name beams and eyewear that are still in the assessment (a removed beam or a
  // shelf refresh must not leave a dangling reference, which the record store would refuse).
  const beamIds = new Set(input.lasers.flatMap((l) => l.beams.map((b) => b.id ?? '')));
  const tags = new Set((input.eyewear ?? []).map((e) => e.id));
  const eyewearChosen = d.eyewearChosen
    .filter((c) => tags.has(c.eyewearTag))
    .map((c) => ({ ...c, beamIds: c.beamIds.filter((id) => beamIds.has(id)) }));
  return {
    title: d.title.trim() || 'Laser hazard assessment',
    input,
    operatingStates: d.operatingStates,
    assumptions: {
      exposureDurations: durationChoices(d).filter((x) => beamIds.has(x.beamId)),
      personsPresent: d.personsPresent,
      opticalAidsPossible: d.opticalAidsPossible,
      other: d.otherAssumptions
        .split('\n')
        .map((s) => s.trim())
        .filter((s) => s.length > 0),
    },
    controls: d.controls,
    nonBeamHazards: d.nonBeamHazards,
    eyewearChosen,
    notes: d.notes,
    reviewBy: d.reviewBy.trim() === '' ? null : d.reviewBy.trim(),
  };
}

/** Why the draft cannot be saved yet (empty = it can). */
export function saveBlockers(d: Draft): string[] {
  const { incomplete, partial } = roomInputFrom(d);
  // A ticked viewing condition left incomplete would be saved without it: say so before saving.
  const out = [...incomplete, ...partial].map((x) => `${x.laser.name || 'Unnamed laser'} / ${x.beam.label || 'beam'}: ${x.problems.join('; ')}`);
  for (const c of d.controls) {
    if (c.decision !== 'accepted' && !(c.reason ?? '').trim()) out.push(`Control "${c.measure}": give the reason it is ${c.decision === 'rejected' ? 'rejected' : 'not applicable'}`);
  }
  if (d.reviewBy.trim() !== '' && !/^\d{4}-\d{2}-\d{2}$/.test(d.reviewBy.trim())) out.push('Review-by date must be YYYY-MM-DD');
  return out;
}
