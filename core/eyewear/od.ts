/**
 * Required optical density: OD = log10(exposure at the eye / limit)  [ANSI Z136.1 section 4.6.2]
 * (from memory; the same method in an EN 207 supplier's explainer, read, and in the published
 * examples of test/fixtures/worked-examples.json). The exposure is taken through the limiting
 * aperture at the worst reachable position: the exit by default, or the stated closest approach;
 * a beam smaller than the aperture is spread over the aperture, and a focused spot never raises the
 * exposure above S/A_f (domain notes 2.1). Pulsed beams: the largest OD over all pulse criteria.
 * Reported OD is rounded UP to one decimal place.
 */
import { Dec, PI } from '../numeric/decimal.js';
import type { OdRequirement } from '../model/results.js';
import { addStep, newTrace } from '../trace/trace.js';
import { exposureAt, spreadOf, type BeamModel } from '../beam/beam-model.js';
import type { Criterion, LimitCriteria } from '../beam/tissue-limits.js';
import { fmt, log10Record, odReported, rec } from '../beam/format.js';

/** OD from an exposure and a limit in the same units (may be <= 0: no filter needed). */
export function opticalDensity(exposure: Dec | number | string, limit: Dec | number | string): Dec {
  return log10Record(new Dec(exposure).div(limit));
}

export interface OdOutcome {
  readonly requirement: OdRequirement;
  readonly od: Dec;
  /** Largest exposure/limit ratio (10^od). */
  readonly ratio: Dec;
  readonly governing: Criterion;
  /** exposure/limit ratio of every criterion, in the order of the criteria. */
  readonly ratios: readonly Dec[];
}

export function requiredOd(tl: LimitCriteria, m: BeamModel, wavelength_nm: number, closestApproach_m: number, lensPresent: boolean): OdOutcome {
  const r0 = new Dec(closestApproach_m);
  const trace = newTrace('Required optical density');
  addStep(trace, {
    kind: 'formula',
    label: 'Method',
    detail: 'OD = log10(exposure at the eye / limit), exposure through the limiting aperture at the worst reachable position; largest over all limit criteria',
    source: 'ANSI Z136.1 section 4.6.2 (from memory); EN 207 supplier explainer (read); domain notes 2.1',
    confidence: 'from memory',
  });
  addStep(trace, { kind: 'assumption', label: 'Position', detail: r0.isZero() ? 'at the exit aperture (worst case; no closest approach given)' : `closest approach ${fmt(r0)} m from the exit`, value: fmt(r0), unit: 'm' });
  const unit = tl.quantity === 'E' ? 'W/m²' : 'J/m²';
  let best: { X: Dec; c: Criterion; ratio: Dec } | null = null;
  const ratios: Dec[] = [];
  for (const c of tl.criteria) {
    let X = exposureAt(tl.S, spreadOf(m), c.aperture_m, r0);
    let how = `4*S/(pi*max(d,D_f)^2) at ${fmt(r0)} m`;
    if (lensPresent) {
      // A lens can bring the whole beam inside the aperture: S/A_f (domain notes 2.1 item 2).
      const focus = tl.S.mul(4).div(PI.mul(c.aperture_m).mul(c.aperture_m));
      if (focus.gt(X)) {
        X = focus;
        how = 'whole beam inside the aperture near the lens focus, S/A_f';
      }
    }
    const ratio = X.div(c.L);
    ratios.push(ratio);
    addStep(trace, { kind: 'formula', label: c.rule, detail: `${c.label}: exposure ${how} = ${fmt(X)} ${unit}; / limit ${fmt(c.L)} ${unit}`, value: fmt(ratio) });
    if (!best || ratio.gt(best.ratio)) best = { X, c, ratio };
  }
  if (!best) throw new Error('internal: no limit criterion');
  const od = log10Record(best.ratio);
  const reported = odReported(od);
  addStep(trace, { kind: 'result', label: 'OD', detail: `log10(${fmt(best.X)} / ${fmt(best.c.L)}), governing ${best.c.rule}`, value: fmt(od) });
  addStep(trace, {
    kind: 'rounding',
    label: 'Required OD',
    detail: od.lte(0) ? 'exposure below the limit: no filter needed (OD 0)' : 'rounded UP to one decimal place (many programmes then take the next whole number, common practice)',
    value: reported,
  });
  return {
    requirement: {
      wavelength_nm,
      exposure: rec(best.X),
      limit: rec(best.c.L),
      quantity: tl.quantity,
      position_m: rec(r0),
      od: rec(od),
      odRequired_reported: reported,
      trace,
    },
    od,
    ratio: best.ratio,
    governing: best.c,
    ratios,
  };
}
