/**
 * The three headline numbers of a beam (direct NOHD, required OD, eye limit) without the rest of
 * the evaluation: used to propagate input tolerances (bounds.ts).
 */
import { Dec } from '../numeric/decimal.js';
import type { BeamInput, LimitSettings, RuleSetId } from '../model/inputs.js';
import { defaultExposureDuration } from '../limits/durations.js';
import { beamModel } from './beam-model.js';
import { tissueLimits, type TissueLimits } from './tissue-limits.js';
import { distanceOver } from '../hazard/distance.js';
import { directSpec } from '../hazard/geometries.js';
import { requiredOd } from '../eyewear/od.js';

export interface CoreNumbers {
  readonly nohd: Dec;
  readonly od: Dec;
  readonly limitE: Dec;
}

export function eyeLimitsOf(input: BeamInput, ruleSet: RuleSetId, settings: LimitSettings | undefined): TissueLimits {
  const dd = defaultExposureDuration(input.wavelength_nm);
  const T = input.exposureDuration_s ?? dd.duration_s;
  return tissueLimits({
    ruleSet,
    tissue: 'eye',
    wavelength_nm: input.wavelength_nm,
    emission: input.emission,
    exposureDuration_s: T,
    // Stryker disable next-line ConditionalExpression,EqualityOperator: trace wording only; the curves and the tolerance bounds read the criteria and the numbers, never this trace (test/mutation/EQUIVALENT.md)
    durationWhy: input.exposureDuration_s !== undefined ? 'given by the caller' : `${dd.why} (${dd.basis})`,
    ...(input.sourceAngle_rad !== undefined ? { sourceAngle_rad: input.sourceAngle_rad } : {}),
    ...(settings !== undefined ? { settings } : {}),
  });
}

export function coreNumbers(input: BeamInput, ruleSet: RuleSetId, settings: LimitSettings | undefined): CoreNumbers {
  const eye = eyeLimitsOf(input, ruleSet, settings);
  const m = beamModel(input.beam);
  const mu = input.viewing?.attenuation_per_m ? new Dec(input.viewing.attenuation_per_m) : undefined;
  const d = distanceOver(eye, directSpec(m, eye.S, mu));
  const od = requiredOd(eye, m, input.wavelength_nm, input.viewing?.closestApproach_m ?? 0, input.viewing?.lens !== undefined);
  return { nohd: d.r, od: od.od, limitE: new Dec(eye.summary.E_Wm2) };
}
