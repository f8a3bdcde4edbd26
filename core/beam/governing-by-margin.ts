/**
 * The row a limit summary names is the GOVERNING one: the criterion with the lowest margin (the
 * highest exposure/limit ratio at the worst reachable position, as for the required OD). Rows that
 * apply together are each compared over their own limiting aperture (EU Directive 2006/25/EC
 * Annex II Table 2.2 notes a and b), so the lowest limit value is not always the one that governs:
 * at exactly 1400 nm the 400 W/m² retinal row over 7 mm gives a lower exposure ratio than the
 * 1000 W/m² cornea row over 3.5 mm. The summary's limit, row, rule and aperture then all belong to
 * the governing criterion.
 */
import type { Dec } from '../numeric/decimal.js';
import { limitReported } from '../numeric/safe-rounding.js';
import type { Emission } from '../model/inputs.js';
import type { LimitSummary } from '../model/results.js';
import type { OdOutcome } from '../eyewear/od.js';
import type { TissueLimits } from './tissue-limits.js';
import { fmt, rec } from './format.js';
import type { TraceStep } from '../trace/trace.js';

export interface GoverningSummary {
  readonly summary: LimitSummary;
  /** A trace step when the governing row is not the one with the lowest limit value. */
  readonly step: TraceStep | null;
}

/** The summary of `tl` naming the criterion with the highest ratio in `od` (same criteria, same order). */
export function summaryByMargin(tl: TissueLimits, od: Pick<OdOutcome, 'ratios' | 'governing' | 'ratio'>, emission: Emission): GoverningSummary {
  const crit = tl.criteria;
  // Stryker disable next-line ConditionalExpression,LogicalOperator: with one criterion the lowest-limit ratio is the OD ratio itself, so the next test returns the same summary (test/mutation/EQUIVALENT.md).
  if (crit.length < 2 || od.ratios.length !== crit.length) return { summary: tl.summary, step: null };
  const minL = crit.reduce((m, c) => (c.L.lt(m) ? c.L : m), crit[0]?.L as Dec);
  // the ratio of the lowest-limit criteria (the ones the summary was built from)
  let lowestRatio: Dec | null = null;
  crit.forEach((c, i) => {
    const r = od.ratios[i] as Dec;
    if (c.L.eq(minL) && (!lowestRatio || r.gt(lowestRatio))) lowestRatio = r;
  });
  if (!lowestRatio || !od.ratio.gt(lowestRatio)) return { summary: tl.summary, step: null };
  const g = od.governing;
  const lowest = crit.find((c) => c.L.eq(minL)) as (typeof crit)[number];
  const s = tl.summary;
  let H: Dec;
  let E: Dec;
  if (tl.quantity === 'E') {
    E = g.L;
    H = g.L.mul(s.exposureDuration_s);
  } else {
    H = g.L;
    E = emission.kind === 'pulsed' && emission.repetitionRate_Hz !== undefined ? g.L.mul(emission.repetitionRate_Hz) : g.L.div(emission.kind === 'pulsed' ? emission.pulseDuration_s : s.exposureDuration_s);
  }
  const unit = tl.quantity === 'E' ? 'W/m²' : 'J/m² per pulse';
  const apertureMm = fmt(g.aperture_m.mul(1000));
  const summary: LimitSummary = {
    ...s,
    H_Jm2: rec(H),
    H_Jm2_reported: limitReported(H),
    E_Wm2: rec(E),
    E_Wm2_reported: limitReported(E),
    governingRule: g.rule,
    governingRow: g.rowId,
    governingEffect: g.effect,
    aperture_m: rec(g.aperture_m),
  };
  const step: TraceStep = {
    kind: 'note',
    label: 'Governing row',
    detail:
      `${g.rowId} (${g.effect}) over ${apertureMm} mm: highest exposure/limit ratio at the worst reachable position (${fmt(od.ratio)}), limit ${fmt(g.L)} ${unit}; ` +
      `the lowest limit value is row ${lowest.rowId} (${lowest.effect}, ${fmt(minL)} ${unit}) over ${fmt(lowest.aperture_m.mul(1000))} mm, ratio ${fmt(lowestRatio)}: each row is compared over its own limiting aperture and the lowest margin governs`,
    source: 'EU Directive 2006/25/EC Annex II Table 2.2 notes a and b',
    confidence: 'read',
  };
  return { summary, step };
}
