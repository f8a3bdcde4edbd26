/**
 * One hazard distance = the range equation solved for every limit criterion (each row and pulse
 * rule, each with its own aperture); the largest governs and is named (domain notes 1.2.3).
 */
import { Dec } from '../numeric/decimal.js';
import type { DistanceKind, DistanceResult, PulseRule } from '../model/results.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import type { Spread } from '../beam/beam-model.js';
import type { Criterion, LimitCriteria } from '../beam/tissue-limits.js';
import { distanceReported, fmt, rec } from '../beam/format.js';
import { solveRange, type RangeResult } from './range.js';

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
  readonly notes?: ReadonlyArray<{ label: string; detail: string; source?: string; confidence?: string }>;
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
  for (const n of spec.notes ?? []) addStep(trace, { kind: 'input', label: n.label, detail: n.detail, ...(n.source ? { source: n.source } : {}), ...(n.confidence ? { confidence: n.confidence } : {}) });
  let best: { r: Dec; c: Criterion; range: RangeResult; setup: RangeSetup } | null = null;
  const unit = tl.quantity === 'E' ? 'W/m²' : 'J/m²';
  for (const c of tl.criteria) {
    const setup = spec.setup(c);
    const range = solveRange({ S: setup.S, L: c.L, cap: setup.cap, spread: setup.spread, ...(setup.mu ? { mu: setup.mu } : {}) });
    addStep(trace, {
      kind: 'formula',
      label: `${c.rule}`,
      detail: range.zero
        ? `${c.label}: exposure at the start ${fmt(range.X0)} ${unit} <= limit ${fmt(c.L)} ${unit}: not exceeded at any distance`
        : `${c.label}: S = ${fmt(setup.S)} ${tl.quantity === 'E' ? 'W' : 'J'}, limit ${fmt(c.L)} ${unit}, sqrt(4S/(pi*L)) = ${fmt(range.dLimit.mul(1000))} mm, ` +
          `a = ${fmt(setup.spread.a.mul(1000))} mm, phi = ${fmt(setup.spread.phi.mul(1000))} mrad` +
          (setup.spread.a.eq(setup.spread.ay) && setup.spread.phi.eq(setup.spread.phiy) ? '' : ` (second axis ${fmt(setup.spread.ay.mul(1000))} mm, ${fmt(setup.spread.phiy.mul(1000))} mrad)`) +
          (setup.mu && setup.mu.gt(0) ? `, attenuation mu = ${fmt(setup.mu)} 1/m` : '') +
          ` -> r = ${fmt(range.r)} m (${range.method})`,
      value: fmt(range.r),
      unit: 'm',
    });
    if (!best || range.r.gt(best.r)) best = { r: range.r, c, range, setup };
  }
  if (!best) throw new Error('internal: no limit criterion');
  const zero = best.r.isZero();
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
