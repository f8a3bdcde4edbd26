/**
 * Curves behind the two plots of a beam (screen and printed report), computed with the same
 * functions as the results so a curve always agrees with the numbers beside it:
 *  - the eye limit against exposure duration (exposureLimit along the duration axis);
 *  - the direct beam's exposure at the eye against distance from the exit (range-equation beam
 *    growth, averaged over the limiting aperture; domain notes 1.2), for the limit criterion that
 *    sets the NOHD.
 * Callers choose the sample points; this module only evaluates them.
 */
import { Dec } from '../numeric/decimal.js';
import type { BeamInput, LimitSettings, RuleSetId } from '../model/inputs.js';
import { exposureLimitH, type ExposureLimitQuery } from '../limits/exposure-limit.js';
import type { PulseRule } from '../model/results.js';
import { beamModel, exposureAt, spreadOf } from './beam-model.js';
import { eyeLimitsOf } from './core-numbers.js';

export interface LimitPoint {
  readonly t_s: number;
  /** Limit as radiant exposure H (J/m², decimal string); null where the rule set has no row. */
  readonly H_Jm2: string | null;
}

/**
 * The limit of `query` at each duration; a duration outside the tables gives H_Jm2 null, never an
 * error. The value is exposureLimit's own (exposureLimitH runs the same look-up without building
 * the derivation trace that a curve would throw away at every point).
 */
export function limitAgainstDuration(query: Omit<ExposureLimitQuery, 'duration_s'>, durations_s: readonly number[]): LimitPoint[] {
  return durations_s.map((t_s) => {
    try {
      return { t_s, H_Jm2: exposureLimitH({ ...query, duration_s: t_s }) };
    } catch {
      return { t_s, H_Jm2: null }; // outside the rule set's range: the curve has no point there
    }
  });
}

export interface BeamCurveQuery {
  readonly input: BeamInput;
  readonly ruleSet: RuleSetId;
  /** The room's settings; the beam's own settings (input.settings) win over them. */
  readonly settings?: LimitSettings | undefined;
  /** The core's unrounded NOHD (BeamResult.nohd_m): the criterion that sets it is drawn. */
  readonly nohd_m: string;
}

export interface ExposureAlongBeam {
  /** H per pulse (pulsed) or irradiance E (CW). */
  readonly quantity: 'H' | 'E';
  /** The governing criterion's limit (J/m² per pulse or W/m², decimal string). */
  readonly limit: string;
  readonly rule: PulseRule;
  /** Limiting aperture the exposure is averaged over, mm (decimal string). */
  readonly aperture_mm: string;
  /** [distance from the exit m, exposure at the eye in the unit of `limit`]. */
  readonly points: ReadonlyArray<readonly [number, number]>;
}

/**
 * Exposure of the direct beam at each distance, for the criterion with the highest
 * exposure-to-limit ratio at the NOHD (the one that sets it). Null when the eye limit cannot be
 * evaluated for this beam.
 */
export function exposureAlongBeam(q: BeamCurveQuery, distances_m: readonly number[]): ExposureAlongBeam | null {
  let eye;
  try {
    eye = eyeLimitsOf(q.input, q.ruleSet, q.input.settings ?? q.settings);
  } catch {
    return null;
  }
  const spread = spreadOf(beamModel(q.input.beam));
  const mu = q.input.viewing?.attenuation_per_m ? new Dec(q.input.viewing.attenuation_per_m) : undefined;
  const nohd = new Dec(q.nohd_m);
  let gov = eye.criteria[0];
  let best = new Dec(-1);
  for (const c of eye.criteria) {
    const ratio = exposureAt(eye.S, spread, c.aperture_m, nohd, mu).div(c.L);
    if (ratio.gt(best)) {
      best = ratio;
      gov = c;
    }
  }
  if (gov === undefined) return null;
  const crit = gov;
  return {
    quantity: eye.quantity,
    limit: crit.L.toString(),
    rule: crit.rule,
    // 3 significant figures, to nearest: a label on a plot, printed as every other figure of the
    // documents and the result card (1.5*t^0.375 apertures have 40 digits; 3.557 mm -> 3.56 mm)
    aperture_mm: crit.aperture_m.mul(1000).toSignificantDigits(3, Dec.ROUND_HALF_UP).toString(),
    points: distances_m.map((r) => [r, exposureAt(eye.S, spread, crit.aperture_m, new Dec(r), mu).toNumber()] as const),
  };
}
