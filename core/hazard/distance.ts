/**
 * One hazard distance = the range equation solved for every limit criterion (each row and pulse
 * rule, each with its own aperture); the largest governs and is named (domain notes 1.2.3).
 */
import { Dec } from '../numeric/decimal.js';
import type { DistanceKind, DistanceResult, PulseRule } from '../model/results.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import { exposureAt, type Spread } from '../beam/beam-model.js';
import type { Criterion, LimitCriteria } from '../beam/tissue-limits.js';
import { distanceReported, fmt, rec } from '../beam/format.js';
import { solveRange, type RangeResult } from './range.js';

const ZERO = new Dec(0);

export interface RangeSetup {
  readonly S: Dec;
  readonly cap: Dec;
  readonly spread: Spread;
  readonly mu?: Dec;
}

export interface DistanceSpec {
  readonly kind: DistanceKind;
  readonly label: string;
  readonly measuredFrom: string;
  /** The formula in words and symbols, for the trace. */
  readonly formula: string;
  readonly source: string;
  readonly confidence: string;
  readonly setup: (c: Criterion) => RangeSetup;
  /** Extra trace lines (inputs of this geometry). */
  readonly notes?: ReadonlyArray<{ label: string; detail: string }>;
}

export interface DistanceOutcome {
  readonly result: DistanceResult;
  readonly r: Dec;
  readonly governing: Criterion;
  readonly range: RangeResult;
}

export function distanceOver(tl: LimitCriteria, spec: DistanceSpec): DistanceOutcome {
  const trace: Trace = newTrace(`${spec.label}`);
  addStep(trace, { kind: 'formula', label: 'Method', detail: spec.formula, source: spec.source, confidence: spec.confidence });
  for (const n of spec.notes ?? []) addStep(trace, { kind: 'input', label: n.label, detail: n.detail });
  const unit = tl.quantity === 'E' ? 'W/m²' : 'J/m²';
  const sUnit = tl.quantity === 'E' ? 'W' : 'J';
  const setups = tl.criteria.map((c) => ({ c, setup: spec.setup(c) }));
  const round = (x: RangeSetup): boolean => x.spread.a.eq(x.spread.ay) && x.spread.phi.eq(x.spread.phiy) && !(x.mu && x.mu.gt(0));
  let best: { r: Dec; c: Criterion; range: RangeResult; setup: RangeSetup } | null = null;
  // Stryker disable next-line MethodExpression: every criterion of one geometry has the same spread and attenuation, so `some` equals `every` here (test/mutation/EQUIVALENT.md).
  if (setups.every((x) => round(x.setup))) {
    // Round beam without attenuation: r = (sqrt(4S/(pi L)) - a)/phi grows with S/L, so only the
    // criterion with the largest S/L among those exceeded at the start needs the square root. Every
    // criterion of one geometry has the same spread (the set-up varies only S and the aperture), so
    // equal S/L give the same distance: the first listed is named, as governingPulseRule names rule 1
    // on a tie.
    let pick: { c: Criterion; setup: RangeSetup; q: Dec } | null = null;
    for (const { c, setup } of setups) {
      const X0 = exposureAt(setup.S, setup.spread, setup.cap, ZERO);
      const exceeded = X0.gt(c.L);
      const q = setup.S.div(c.L);
      addStep(trace, {
        kind: 'formula',
        label: c.rule,
        detail: `${c.label}: S = ${fmt(setup.S)} ${sUnit}, exposure at the start ${fmt(X0)} ${unit} ${exceeded ? '>' : '<='} limit ${fmt(c.L)} ${unit}` + (exceeded ? `; S/L = ${fmt(q)} m²` : ': not exceeded at any distance'),
      });
      if (exceeded && (!pick || q.gt(pick.q))) pick = { c, setup, q };
    }
    if (pick) {
      const range = solveRange({ S: pick.setup.S, L: pick.c.L, cap: pick.setup.cap, spread: pick.setup.spread });
      best = { r: range.r, c: pick.c, range, setup: pick.setup };
    } else {
      const first = setups[0];
      if (!first) throw new Error('internal: no limit criterion');
      const range = solveRange({ S: first.setup.S, L: first.c.L, cap: first.setup.cap, spread: first.setup.spread });
      best = { r: range.r, c: first.c, range, setup: first.setup };
    }
  } else {
    // Same spread and attenuation for every criterion: for a given aperture the distance grows with
    // S/L, so per aperture only the criterion with the largest S/L needs solving.
    const perCap = new Map<string, { c: Criterion; setup: RangeSetup; q: Dec }>();
    for (const { c, setup } of setups) {
      const q = setup.S.div(c.L);
      const k = setup.cap.toString();
      const prev = perCap.get(k);
      if (!prev || q.gt(prev.q)) perCap.set(k, { c, setup, q });
    }
    for (const { c, setup } of setups) {
      if (perCap.get(setup.cap.toString())?.c !== c) {
        addStep(trace, { kind: 'formula', label: c.rule, detail: `${c.label}: S/L = ${fmt(setup.S.div(c.L))} m², not above the largest S/L for the same aperture: a shorter distance` });
      }
    }
    for (const { c, setup } of perCap.values()) {
      const range = solveRange({ S: setup.S, L: c.L, cap: setup.cap, spread: setup.spread, ...(setup.mu ? { mu: setup.mu } : {}) });
      addStep(trace, {
        kind: 'formula',
        label: c.rule,
        detail: range.zero
          ? `${c.label}: exposure at the start ${fmt(range.X0)} ${unit} <= limit ${fmt(c.L)} ${unit}: not exceeded at any distance`
          : `${c.label}: S = ${fmt(setup.S)} ${sUnit}, limit ${fmt(c.L)} ${unit} -> r = ${fmt(range.r)} m (${range.method})`,
        value: fmt(range.r),
        unit: 'm',
      });
      if (!best || range.r.gt(best.r)) best = { r: range.r, c, range, setup };
    }
  }
  if (!best) throw new Error('internal: no limit criterion');
  const zero = best.r.isZero();
  const sp = best.setup.spread;
  if (!zero) {
    addStep(trace, {
      kind: 'formula',
      label: 'Range equation',
      detail:
        `governing ${best.c.rule}: S = ${fmt(best.setup.S)} ${sUnit}, L = ${fmt(best.c.L)} ${unit}, sqrt(4S/(pi*L)) = ${fmt(best.range.dLimit.mul(1000))} mm, ` +
        `a = ${fmt(sp.a.mul(1000))} mm, phi = ${fmt(sp.phi.mul(1000))} mrad` +
        (sp.a.eq(sp.ay) && sp.phi.eq(sp.phiy) ? '' : ` (second axis ${fmt(sp.ay.mul(1000))} mm, ${fmt(sp.phiy.mul(1000))} mrad)`) +
        (best.setup.mu && best.setup.mu.gt(0) ? `, attenuation mu = ${fmt(best.setup.mu)} 1/m` : '') +
        ` -> r = ${fmt(best.r)} m (${best.range.method})`,
      value: fmt(best.r),
      unit: 'm',
    });
  }
  addStep(trace, {
    kind: 'result',
    label: zero ? 'Zero distance' : 'Hazard distance',
    detail: zero
      ? 'the exposure at the start is below the limit for every criterion, and the beam only grows: the limit is not exceeded at any distance'
      : `largest over ${tl.criteria.length} criteria: ${best.c.rule} (${best.c.label}); measured from ${spec.measuredFrom}`,
    value: fmt(best.r),
    unit: 'm',
  });
  const reported = distanceReported(best.r);
  addStep(trace, { kind: 'rounding', label: 'Reported', detail: 'distances are rounded UP to 3 significant figures', value: reported, unit: 'm' });
  const governingRule: PulseRule = best.c.rule;
  return {
    result: {
      kind: spec.kind,
      label: spec.label,
      distance_m: rec(best.r),
      distance_m_reported: reported,
      zero,
      governingRule,
      measuredFrom: spec.measuredFrom,
      trace,
    },
    r: best.r,
    governing: best.c,
    range: best.range,
  };
}
