/**
 * The limit a beam's exposure is compared with, for one tissue, as a list of CRITERIA: one per
 * limit row that applies and per pulse rule (single pulse, average power, pulse train), each with
 * its own limiting aperture. The hazard distance and the optical density are the largest over all
 * criteria (domain notes 1.2.3, 2.1 item 4), and the result names the criterion that governs.
 */
import { Dec } from '../numeric/decimal.js';
import type { Emission, LimitSettings, RuleSetId, Tissue } from '../model/inputs.js';
import type { LimitSummary, PulseRule } from '../model/results.js';
import type { ExposureLimitResult } from '../limits/exposure-limit.js';
import { governingPulseRule, type PulsedLimitResult } from '../limits/pulse-rules.js';
import { DURATION_RANGE_S } from '../limits/rule-sets.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import { cachedExposureLimit, cachedPulsedLimit } from './limit-cache.js';
import { fmt, rec } from './format.js';
import { numberText, quantityText } from '../units/display.js';
import { limitReported } from '../numeric/safe-rounding.js';

export interface Criterion {
  readonly rule: PulseRule;
  /** Limit per pulse (J/m²) for pulsed beams, or irradiance limit (W/m²) for CW. */
  readonly L: Dec;
  readonly aperture_m: Dec;
  readonly rowId: string;
  readonly effect: string;
  readonly label: string;
}

/** What the distance and OD code reads: the source and the criteria. */
export interface LimitCriteria {
  readonly quantity: 'H' | 'E';
  /** Power (W, CW) or energy per pulse (J) the criteria are compared with. */
  readonly S: Dec;
  readonly criteria: readonly Criterion[];
}

export interface TissueLimits extends LimitCriteria {
  readonly tissue: Tissue;
  readonly quantity: 'H' | 'E';
  /** Power (W, CW) or energy per pulse (J) the criteria are compared with. */
  readonly S: Dec;
  readonly criteria: readonly Criterion[];
  readonly summary: LimitSummary;
  readonly trace: Trace;
  readonly warnings: readonly string[];
  /** The exposure-limit result of the governing rule (for apertures and factors). */
  readonly governingLimit: ExposureLimitResult;
  /** The pulse-rule result behind a pulsed beam's criteria (null for CW). */
  readonly pulsed: PulsedLimitResult | null;
  /** Factor applied to the table's single-pulse limits for pulses shorter than the tables (1 otherwise). */
  readonly shortPulseFactor: Dec;
}

export interface TissueQuery {
  readonly ruleSet: RuleSetId;
  readonly tissue: Tissue;
  readonly wavelength_nm: number;
  readonly emission: Emission;
  readonly exposureDuration_s: number;
  readonly durationWhy: string;
  readonly sourceAngle_rad?: number;
  readonly settings?: LimitSettings;
}

const SHORTEST = new Dec(DURATION_RANGE_S[0]);

function candidateCriteria(lim: ExposureLimitResult, rule: PulseRule, toL: (H: Dec) => Dec, what: string): Criterion[] {
  return lim.candidates.map((c) => ({
    rule,
    L: toL(new Dec(c.H_Jm2)),
    aperture_m: new Dec(c.aperture.diameter_m),
    rowId: c.rowId,
    effect: c.effect,
    label: `${what}, row ${c.rowId} (${c.effect}), aperture ${c.aperture.diameter_mm} mm`,
  }));
}

const CACHE_MAX = 1000;
const cache = new Map<string, TissueLimits>();

/**
 * The criteria depend on everything but the power or pulse energy, so they are memoised on the
 * query without it (an officer editing a power reuses them); S is attached afresh.
 */
export function tissueLimits(q: TissueQuery): TissueLimits {
  const e = q.emission;
  const S = new Dec(e.kind === 'cw' ? e.power_W : e.pulseEnergy_J);
  const shape = e.kind === 'cw' ? { kind: 'cw' } : { kind: 'pulsed', t: e.pulseDuration_s, f: e.repetitionRate_Hz ?? null };
  const key = JSON.stringify([q.ruleSet, q.tissue, q.wavelength_nm, shape, q.exposureDuration_s, q.durationWhy, q.sourceAngle_rad ?? null, q.settings ?? null]);
  let hit = cache.get(key);
  // Stryker disable next-line ConditionalExpression: the criteria memo changes only speed and memory; its key holds every input but the power (test/mutation/EQUIVALENT.md).
  if (!hit) {
    hit = computeTissueLimits(q);
    // Stryker disable next-line ConditionalExpression,EqualityOperator: the criteria memo changes only speed and memory; its key holds every input but the power (test/mutation/EQUIVALENT.md).
    if (cache.size >= CACHE_MAX) cache.clear();
    cache.set(key, hit);
  }
  return { ...hit, S };
}

/** Empty the criteria cache (benchmarks of a cold evaluation). */
// Stryker disable next-line BlockStatement: the criteria memo changes only speed and memory; its key holds every input but the power (test/mutation/EQUIVALENT.md).
export function clearTissueLimitCache(): void {
  cache.clear();
}

function computeTissueLimits(q: TissueQuery): TissueLimits {
  const base = {
    ruleSet: q.ruleSet,
    tissue: q.tissue,
    wavelength_nm: q.wavelength_nm,
    ...(q.sourceAngle_rad !== undefined ? { sourceAngle_rad: q.sourceAngle_rad } : {}),
    ...(q.settings !== undefined ? { settings: q.settings } : {}),
  };
  const trace = newTrace(`Limit criteria, ${q.tissue}`);
  const warnings: string[] = [];
  const T = new Dec(q.exposureDuration_s);
  addStep(trace, { kind: 'assumption', label: 'Exposure duration', detail: `${fmt(T)} s: ${q.durationWhy}`, value: fmt(T), unit: 's' });

  if (q.emission.kind === 'cw') {
    const lim = cachedExposureLimit({ ...base, duration_s: q.exposureDuration_s });
    trace.children.push(lim.trace);
    const criteria = candidateCriteria(lim, 'cw', (H) => H.div(T), 'CW limit E = H/T');
    for (const c of criteria) addStep(trace, { kind: 'row', label: 'Criterion', detail: c.label, value: fmt(c.L), unit: 'W/m²' });
    const summary: LimitSummary = {
      tissue: q.tissue,
      exposureDuration_s: q.exposureDuration_s,
      durationWhy: q.durationWhy,
      H_Jm2: lim.H_Jm2,
      H_Jm2_reported: lim.H_Jm2_reported,
      E_Wm2: lim.E_Wm2,
      E_Wm2_reported: lim.E_Wm2_reported,
      governingRule: 'cw',
      governingRow: lim.governing.rowId,
      governingEffect: lim.governing.effect,
      rules: [{ rule: 'cw', H_Jm2: lim.H_Jm2, applies: true, detail: `limit over ${fmt(T)} s, row ${lim.governing.rowId}` }],
      aperture_m: lim.aperture.diameter_m,
      conservativeReplacements: lim.conservativeReplacements,
    };
    return { tissue: q.tissue, quantity: 'E', S: new Dec(q.emission.power_W), criteria, summary, trace, warnings, governingLimit: lim, pulsed: null, shortPulseFactor: new Dec(1) };
  }

  // Pulsed. Pulses shorter than the tables (1e-13 s) are looked up at 1e-13 s; in conservative
  // mode the per-pulse limit is then scaled by t/1e-13, i.e. the 100 fs limit is read as a peak
  // irradiance held constant (the strictest reading; the standards give no shorter row) - ours.
  const e = q.emission;
  const tp = new Dec(e.pulseDuration_s);
  let k = new Dec(1);
  let tLook = e.pulseDuration_s;
  if (tp.lt(SHORTEST)) {
    tLook = DURATION_RANGE_S[0];
    const conservative = q.settings?.conservative !== false;
    k = conservative ? tp.div(SHORTEST) : new Dec(1);
    const msg =
      `Pulse duration ${quantityText(tp, 's')} is shorter than the limit tables (${quantityText(DURATION_RANGE_S[0], 's')}). The ${quantityText(DURATION_RANGE_S[0], 's')} limit was used` +
      (conservative ? `, scaled by t/(100 fs) = ${numberText(k)} (conservative: the 100 fs limit read as a peak irradiance).` : ' unchanged (conservative mode off).') +
      ' Verify with the standard for ultrashort pulses.';
    warnings.push(msg);
    addStep(trace, { kind: 'conservative', label: 'Pulse shorter than the tables', detail: msg, confidence: 'ours' });
  }
  const Tq = Math.max(q.exposureDuration_s, tLook);
  if (Tq !== q.exposureDuration_s) {
    addStep(trace, { kind: 'note', label: 'Exposure duration', detail: `raised to the pulse duration ${tLook} s (an exposure cannot be shorter than one pulse)` });
  }
  const pl = cachedPulsedLimit({
    ...base,
    pulseDuration_s: tLook,
    ...(e.repetitionRate_Hz !== undefined ? { repetitionRate_Hz: e.repetitionRate_Hz } : {}),
    exposureDuration_s: Tq,
  });
  trace.children.push(pl.trace);
  const criteria: Criterion[] = [];
  criteria.push(...candidateCriteria(pl.singlePulse.limit, 'single-pulse', (H) => H.mul(k), 'rule 1 single pulse'));
  let group: Dec | null = null;
  if (pl.grouping) {
    const g = pl.grouping;
    group = new Dec(g.perPulse_H_Jm2);
    criteria.push({ rule: 'single-pulse', L: group, aperture_m: new Dec(g.limit.aperture.diameter_m), rowId: g.limit.governing.rowId, effect: g.limit.governing.effect, label: `rule 1, pulse group: ${g.why}` });
  }
  let rule2: Dec | null = null;
  if (pl.averagePower) {
    const N = new Dec(pl.averagePower.N);
    criteria.push(...candidateCriteria(pl.averagePower.limit, 'average-power', (H) => H.div(N), `rule 2 average power (H_T / N, N = ${N.toString()})`));
    rule2 = new Dec(pl.averagePower.H_Jm2);
  }
  let rule3: Dec | null = null;
  if (pl.pulseTrain && pl.pulseTrain.applies) {
    rule3 = new Dec(pl.pulseTrain.H_Jm2).mul(k);
    criteria.push({
      rule: 'pulse-train',
      L: rule3,
      aperture_m: new Dec(pl.singlePulse.limit.aperture.diameter_m),
      rowId: pl.singlePulse.limit.governing.rowId,
      effect: pl.singlePulse.limit.governing.effect,
      label: `rule 3 pulse train: single-pulse thermal limit * C_P (C_P = ${fmt(new Dec(pl.pulseTrain.CP))}, N = ${pl.pulseTrain.N})`,
    });
  }
  for (const c of criteria) addStep(trace, { kind: 'row', label: 'Criterion', detail: c.label, value: fmt(c.L), unit: 'J/m² per pulse' });

  // The same choice as the pulse rules make, on the values scaled for pulses shorter than the tables.
  const { rule1, governing: governingRule, perPulse: H } = governingPulseRule({ singlePulse: new Dec(pl.singlePulse.H_Jm2).mul(k), group, averagePower: rule2, pulseTrain: rule3 });
  const govLimit = governingRule === 'average-power' && pl.averagePower ? pl.averagePower.limit : pl.singlePulse.limit;
  const f = e.repetitionRate_Hz !== undefined ? new Dec(e.repetitionRate_Hz) : null;
  const E = f ? H.mul(f) : H.div(tp);
  const rules: Array<LimitSummary['rules'][number]> = [
    { rule: 'single-pulse', H_Jm2: rec(rule1), applies: true, detail: `rule 1: every pulse against the limit for its own duration (row ${pl.singlePulse.limit.governing.rowId})${pl.grouping ? `; pulse groups inside ${pl.grouping.time} counted as one pulse` : ''}` },
  ];
  if (pl.averagePower) rules.push({ rule: 'average-power', H_Jm2: pl.averagePower.H_Jm2, applies: true, detail: `rule 2: the train over ${fmt(new Dec(Tq))} s, per pulse H_T / N with N = ${pl.averagePower.N}` });
  if (pl.pulseTrain) rules.push({ rule: 'pulse-train', H_Jm2: rec(new Dec(pl.pulseTrain.H_Jm2).mul(k)), applies: pl.pulseTrain.applies, detail: `rule 3: ${pl.pulseTrain.why}` });
  const summary: LimitSummary = {
    tissue: q.tissue,
    exposureDuration_s: Tq,
    durationWhy: q.durationWhy,
    H_Jm2: rec(H),
    H_Jm2_reported: limitReported(H),
    E_Wm2: rec(E),
    E_Wm2_reported: limitReported(E),
    governingRule,
    governingRow: govLimit.governing.rowId,
    governingEffect: govLimit.governing.effect,
    rules,
    aperture_m: govLimit.aperture.diameter_m,
    conservativeReplacements: [...pl.conservativeReplacements, ...(k.lt(1) ? ['pulse-shorter-than-tables'] : [])],
  };
  addStep(trace, { kind: 'result', label: 'Governing pulse rule', detail: `${governingRule} (lowest per-pulse limit)`, value: fmt(H), unit: 'J/m² per pulse' });
  return { tissue: q.tissue, quantity: 'H', S: new Dec(e.pulseEnergy_J), criteria, summary, trace, warnings, governingLimit: govLimit, pulsed: pl, shortPulseFactor: k };
}
