/**
 * Diffuse (Lambertian) reflection: the surface returns radiant intensity rho*S*cos(theta)/pi, so the
 * exposure at distance r is rho*S*cos(theta)/(pi r^2) and
 *   r_NHZ = sqrt(rho*S*cos(theta)/(pi*L))   [ANSI Z136.1 App. B; IEC TR 60825-14]
 * FROM MEMORY (domain notes 1.4; section 10 item 2). The point-source limit is used (no
 * extended-source relaxation C_E), the conservative choice.
 * Zero rule (derived): no point near a Lambertian spot receives more than the spot's exitance
 * M = rho*4S/(pi*d_x*d_y); if M <= L the limit is not exceeded anywhere.
 */
import { Dec, PI } from '../numeric/decimal.js';
import type { DistanceResult } from '../model/results.js';
import { addStep, newTrace } from '../trace/trace.js';
import type { BeamModel } from '../beam/beam-model.js';
import type { LimitCriteria } from '../beam/tissue-limits.js';
import { distanceReported, fmt, odReported, rec } from '../beam/format.js';

export interface DiffuseQuery {
  readonly reflectance: number;
  readonly viewingAngle_rad?: number;
  readonly targetDistance_m?: number;
  readonly viewerDistance_m?: number;
}

/** Exposure at a stated viewer distance (not part of the result contract; reported in the trace and warnings). */
export interface DiffuseViewer {
  readonly distance_m: Dec;
  readonly exposure: Dec;
  readonly limit: Dec;
  readonly ratio: Dec;
  readonly od: Dec;
}

export function diffuseDistance(tl: LimitCriteria, m: BeamModel, q: DiffuseQuery): { result: DistanceResult; r: Dec; viewer: DiffuseViewer | null } {
  const rho = new Dec(q.reflectance);
  const theta = new Dec(q.viewingAngle_rad ?? 0);
  const cos = theta.cos();
  const trace = newTrace(`Diffuse reflection (reflectance ${fmt(rho)})`);
  addStep(trace, {
    kind: 'formula',
    label: 'Method',
    detail: 'r_NHZ = sqrt(rho*S*cos(theta)/(pi*L)) (Lambertian surface, viewer far compared with the spot; point-source limit, the conservative choice)',
    source: 'ANSI Z136.1 App. B; IEC TR 60825-14 (domain notes 1.4)',
    confidence: 'from memory (not re-read; domain notes section 10 item 2)',
  });
  addStep(trace, { kind: 'input', label: 'Surface', detail: `rho = ${fmt(rho)}, viewing angle ${fmt(theta)} rad (cos = ${fmt(cos)})` });
  // Spot on the surface (for the exitance bound): beam at the target distance, default the exit.
  const td = new Dec(q.targetDistance_m ?? 0);
  const dx = m.a.plus(m.phi.mul(td));
  const dy = m.ay.plus(m.phiy.mul(td));
  // Stryker disable next-line LogicalOperator: with one spot axis zero the exitance 4ρS/(π d_x d_y) is infinite, so the zero rule never fires and the viewer cap min(X, ∞) = X, as for an unknown spot (test/mutation/EQUIVALENT.md).
  const spotKnown = dx.gt(0) && dy.gt(0);
  // Stryker disable next-line ConditionalExpression,EqualityOperator: the unit is trace text only (test/mutation/EQUIVALENT.md).
  const unit = tl.quantity === 'E' ? 'W/m²' : 'J/m²';
  let best: { r: Dec; rule: DistanceResult['governingRule']; label: string } | null = null;
  // Stryker disable next-line BooleanLiteral: allZero only decides the near-field note (trace) (test/mutation/EQUIVALENT.md).
  let allZero = true;
  for (const c of tl.criteria) {
    const I = rho.mul(tl.S).mul(cos).div(PI); // radiant intensity per unit ... (W/sr or J/sr)
    let r = I.div(c.L).sqrt();
    // Stryker disable next-line BooleanLiteral: the zero flag's start value only chooses trace steps (test/mutation/EQUIVALENT.md).
    let zero = false;
    if (spotKnown) {
      const M = rho.mul(tl.S).mul(4).div(PI.mul(dx).mul(dy));
      if (M.lte(c.L)) {
        // Stryker disable next-line BooleanLiteral: the zero flag only chooses which trace step is written; r is set to 0 on the next line (test/mutation/EQUIVALENT.md).
        zero = true;
        r = new Dec(0);
        addStep(trace, { kind: 'formula', label: c.rule, detail: `${c.label}: spot exitance rho*4S/(pi*d_x*d_y) = ${fmt(M)} ${unit} <= limit ${fmt(c.L)} ${unit}: not exceeded anywhere (derived)`, value: '0', unit: 'm' });
      }
    }
    // Stryker disable next-line BooleanLiteral,ConditionalExpression,BlockStatement: the zero flag only chooses which trace step is written; r is set to 0 by the zero rule itself (test/mutation/EQUIVALENT.md).
    if (!zero) {
      // Stryker disable next-line BooleanLiteral: allZero only decides the near-field note (trace) (test/mutation/EQUIVALENT.md).
      allZero = false;
      addStep(trace, { kind: 'formula', label: c.rule, detail: `${c.label}: sqrt(${fmt(rho)} * ${fmt(tl.S)} * ${fmt(cos)} / (pi * ${fmt(c.L)}))`, value: fmt(r), unit: 'm' });
    }
    if (!best || r.gt(best.r)) best = { r, rule: c.rule, label: c.label };
  }
  if (!best) throw new Error('internal: no limit criterion');
  // Stryker disable next-line ConditionalExpression,LogicalOperator,BooleanLiteral,MethodExpression,BlockStatement: the near-field note is a trace note; no reported number depends on whether it is written (test/mutation/EQUIVALENT.md).
  if (spotKnown && !allZero && best.r.lt(Dec.max(dx, dy).mul(5))) {
    // Stryker disable next-line MethodExpression: the spot size in the near-field note is trace wording; no number depends on it (test/mutation/EQUIVALENT.md).
    addStep(trace, { kind: 'note', label: 'Near field', detail: `the distance is less than about five spot diameters (${fmt(Dec.max(dx, dy).mul(1000))} mm): the far-field formula overstates the exposure there, which errs on the safe side` });
  }
  let viewer: DiffuseViewer | null = null;
  if (q.viewerDistance_m !== undefined) {
    const rv = new Dec(q.viewerDistance_m);
    let worst: { X: Dec; L: Dec; ratio: Dec } | null = null;
    for (const c of tl.criteria) {
      let X = rho.mul(tl.S).mul(cos).div(PI.mul(rv).mul(rv));
      if (spotKnown) X = Dec.min(X, rho.mul(tl.S).mul(4).div(PI.mul(dx).mul(dy)));
      const ratio = X.div(c.L);
      if (!worst || ratio.gt(worst.ratio)) worst = { X, L: c.L, ratio };
    }
    if (worst) {
      const od = worst.ratio.log(10);
      viewer = { distance_m: rv, exposure: worst.X, limit: worst.L, ratio: worst.ratio, od };
      addStep(trace, {
        kind: worst.ratio.gt(1) ? 'warning' : 'result',
        label: 'At the viewer',
        detail: `at ${fmt(rv)} m from the surface: exposure ${fmt(worst.X)} ${unit} = ${fmt(worst.ratio)} x the limit ${fmt(worst.L)} ${unit}; OD for diffuse viewing there log10(ratio) = ${fmt(od)} (rounded up ${odReported(od)})`,
        value: fmt(worst.ratio),
      });
    }
  }
  addStep(trace, { kind: 'result', label: best.r.isZero() ? 'Zero distance' : 'Diffuse hazard distance', detail: `largest over ${tl.criteria.length} criteria: ${best.rule}; measured from the reflecting surface`, value: fmt(best.r), unit: 'm' });
  const reported = distanceReported(best.r);
  addStep(trace, { kind: 'rounding', label: 'Reported', detail: 'distances are rounded UP to 3 significant figures', value: reported, unit: 'm' });
  return {
    result: {
      kind: 'diffuse',
      label: `Diffuse reflection (reflectance ${fmt(rho)})`,
      distance_m: rec(best.r),
      distance_m_reported: reported,
      zero: best.r.isZero(),
      governingRule: best.rule,
      measuredFrom: 'the reflecting surface',
      trace,
    },
    r: best.r,
    viewer,
  };
}
