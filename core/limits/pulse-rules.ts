/**
 * Exposure limits for pulsed and repetitively pulsed lasers: the three rules of the rule set
 * (limit specification sections 3 step 7, 4.6 and 5.6), all evaluated and shown, the lowest
 * per-pulse limit governing.
 *
 *  1. Single pulse: every pulse <= the limit for its own duration.
 *  2. Average power: the train over the exposure duration T <= the limit for T; per pulse H_T / N_T.
 *  3. Pulse train: every pulse <= single-pulse limit * C_P.
 *     - icnirp2013: retinal thermal limits only (400-1400 nm, eye), scope confirmed by ILSC2019
 *       (read); pulses < 0.25 s; N counted within min(T, T2). C_P = N^(-0.25) in conservative mode
 *       (the remembered alpha-dependent form with caps is uncertain, spec 4.6); the key 'rule:CP'
 *       in settings.verifiedRows switches to that piecewise form once someone has checked it.
 *     - eu2006: C_P = N^(-0.25) for all THERMAL limits (retina, cornea, skin; not photochemical),
 *       EU Directive 2006/25/EC Annex II Table 2.6 (read). N counted over T, at most T2 for
 *       400-1400 nm and 10 s above (BGI 832 practice, read); pulses < 0.25 s (BGI 832, read).
 *  Grouping: pulses closer together than T_i (icnirp2013) / T_min (eu2006) count as one pulse, and
 *  their summed energy is compared with the limit for that time. The summed check is also rule 2
 *  applied to the sub-group inside T_i ("any group of pulses", Table 2.6 rule 2), so it is made
 *  whenever pulses arrive that close; counting them as ONE pulse for C_P additionally requires, in
 *  eu2006, pulses longer than 1 ns (BGI 832, read).
 *
 * Every difference between the rule sets (C_P and its scope, the grouping time and its edge side,
 * the counting windows, the citations) is data in the table's `repetitivePulses` block
 * (table-types.ts, RepetitivePulseRules): this file never asks which rule set it is evaluating.
 */
import { Dec, recordString } from '../numeric/decimal.js';
import { fmt } from '../beam/format.js'; // the one trace formatter (six significant figures)
import { InputError, requireInRange, requirePositive } from '../errors.js';
import type { LimitSettings, RowCheck, RuleSetId, Tissue } from '../model/inputs.js';
import type { CountingWindow, CpRuleData, PulseRuleText, RepetitivePulseRules, RuleSetTable } from './table-types.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import { condition, evaluate } from './expression.js';
import { conservativeOn, entryWords, evaluateFactors, hasFactorDocumentValues, type EdgeSide, type FactorSet } from './factors.js';
import { exposureLimit, type ExposureLimitResult, type LimitCandidate } from './exposure-limit.js';
import { DEFAULT_RULE_SET, DURATION_RANGE_S, RULE_SET_NAME, ruleSetTable } from './rule-sets.js';
import { groupsAmong, groupWithin, pulsesIn, type Grouping } from './pulse-counting.js';
import { intervalPosition } from './intervals.js';

export interface PulsedLimitQuery {
  readonly ruleSet?: RuleSetId;
  readonly tissue: Tissue;
  readonly wavelength_nm: number;
  readonly pulseDuration_s: number;
  /** Pulses per second; missing = a single pulse. */
  readonly repetitionRate_Hz?: number;
  /** Exposure duration T over which the train is assessed (rule 2, and the window for N). */
  readonly exposureDuration_s: number;
  readonly sourceAngle_rad?: number;
  readonly settings?: LimitSettings;
}

export type GoverningPulseRule = 'single-pulse' | 'average-power' | 'pulse-train';

export interface PulsedLimitResult {
  /**
   * Rule 1: limit for one pulse of its own duration (J/m² per pulse). Where pulses are grouped
   * inside T_i / T_min, the group is a pulse too: its per-pulse value is in `grouping`, and when it
   * is the lowest the governing rule is still named 'single-pulse'.
   */
  readonly singlePulse: { readonly H_Jm2: string; readonly limit: ExposureLimitResult };
  /** Rule 2: the train over T against the limit for T (null for a single pulse). */
  readonly averagePower: {
    /** Per pulse: H_T / N_T. */
    readonly H_Jm2: string;
    readonly E_Wm2: string;
    readonly N: string;
    readonly limit: ExposureLimitResult;
  } | null;
  /** Rule 3: single-pulse limit times C_P (null for a single pulse). */
  readonly pulseTrain: {
    /** Per pulse. */
    readonly H_Jm2: string;
    readonly CP: string;
    readonly N: string;
    readonly applies: boolean;
    readonly why: string;
  } | null;
  /** Pulses inside T_i / T_min counted as one (null when none arrive that close). */
  readonly grouping: {
    /** The rule set's name for the grouping time (T_i in icnirp2013, T_min in eu2006). */
    readonly time: 'T_i' | 'T_min';
    readonly groupedPulses: string;
    readonly groupDuration_s: string;
    readonly why: string;
    /** Per pulse: limit for the group duration divided by the pulses in the group. */
    readonly perPulse_H_Jm2: string;
    readonly limit: ExposureLimitResult;
  } | null;
  readonly governingRule: GoverningPulseRule;
  /** Governing per-pulse limit (the lowest of the rules that apply), J/m², full precision. */
  readonly perPulse_H_Jm2: string;
  /** perPulse_H * repetition rate (single pulse: H / pulse duration), W/m². */
  readonly average_E_Wm2: string;
  readonly conservativeReplacements: string[];
  readonly trace: Trace;
}



function validatePulsed(q: PulsedLimitQuery): { tp: Dec; T: Dec; f: Dec | null } {
  const range = `${DURATION_RANGE_S[0]} to ${DURATION_RANGE_S[1]} s`;
  requirePositive('pulseDuration_s', q.pulseDuration_s, 's');
  requireInRange('pulseDuration_s', q.pulseDuration_s, DURATION_RANGE_S[0], DURATION_RANGE_S[1], 's');
  requirePositive('exposureDuration_s', q.exposureDuration_s, 's');
  requireInRange('exposureDuration_s', q.exposureDuration_s, DURATION_RANGE_S[0], DURATION_RANGE_S[1], 's');
  if (q.exposureDuration_s < q.pulseDuration_s) {
    throw new InputError('out_of_range', 'exposureDuration_s', q.exposureDuration_s, `at least the pulse duration (${q.pulseDuration_s} s) and at most ${range}`);
  }
  let f: Dec | null = null;
  if (q.repetitionRate_Hz !== undefined) {
    requirePositive('repetitionRate_Hz', q.repetitionRate_Hz, 'Hz');
    f = new Dec(q.repetitionRate_Hz);
    // Pulses cannot overlap: duty cycle f * t_p <= 1.
    if (f.mul(q.pulseDuration_s).gt(1)) {
      throw new InputError('out_of_range', 'repetitionRate_Hz', q.repetitionRate_Hz, `at most 1 / pulseDuration_s = ${fmt(new Dec(1).div(q.pulseDuration_s))} Hz (pulses would overlap)`);
    }
  }
  return { tp: new Dec(q.pulseDuration_s), T: new Dec(q.exposureDuration_s), f };
}

/** Is this candidate one that rule 3 reduces? (the rule set's C_P scope, by effect class) */
function reducedByCp(cp: CpRuleData, c: LimitCandidate): boolean {
  return cp.appliesTo.includes(c.effectClass);
}

/** Rule n as the rule set states it; rules 1 and 2 must carry the citation the trace prints. */
function ruleText(rp: RepetitivePulseRules, n: 1 | 2): PulseRuleText & { readonly cite: string } {
  // Stryker disable next-line EqualityOperator: picks which rule's citation the trace prints beside rules 1 and 2; no number (test/mutation/EQUIVALENT.md)
  const r = rp.rules.find((x) => x.n === n);
  if (!r?.cite) throw new Error(`limit table: repetitive-pulse rule ${n} has no citation`);
  return { ...r, cite: r.cite };
}

function minH(cands: readonly LimitCandidate[]): { H: Dec; row: LimitCandidate } | null {
  let best: { H: Dec; row: LimitCandidate } | null = null;
  for (const c of cands) {
    const h = new Dec(c.H_Jm2);
    if (!best || h.lt(best.H)) best = { H: h, row: c };
  }
  return best;
}

interface GroupingTime {
  readonly T_g: Dec;
  readonly name: 'T_i' | 'T_min';
  readonly source: string;
  readonly confidence: string;
}

/**
 * Factors the pulse rules need (T_i / T_min, T2, alpha_max), evaluated on their own at the pulse
 * duration: reading ExposureLimitResult.factors would evaluate all twelve factors.
 */
// Stryker disable next-line BooleanLiteral: every caller passes useDocument (test/mutation/EQUIVALENT.md)
function pulseFactors(q: PulsedLimitQuery, ruleSet: RuleSetId, tp: Dec, side: EdgeSide = 'upper', useDocument = false): FactorSet {
  const alpha = q.tissue === 'eye' ? new Dec(q.sourceAngle_rad ?? 0).mul(1000) : new Dec(0);
  return evaluateFactors(ruleSetTable(ruleSet), new Dec(q.wavelength_nm), tp, alpha, q.settings, side, useDocument);
}

/**
 * The officer's 'differs' checks whose published value changes a factor the pulse rules read here:
 * the grouping time (T_i / T_min, on either side of an exact band edge), the factor that caps the
 * counting window (T2) and alpha_max (C_P's source-size break). Empty when there is none.
 */
function pulseTimingChecks(q: PulsedLimitQuery, ruleSet: RuleSetId, tp: Dec): RowCheck[] {
  // Stryker disable next-line ConditionalExpression: without a 'differs' check with a value no factor has a document value: the loop finds none, the same empty list (test/mutation/EQUIVALENT.md)
  if (!hasFactorDocumentValues(q.settings)) return [];
  const rp = ruleSetTable(ruleSet).repetitivePulses;
  const names = new Set<string>([rp.grouping.factor, 'alpha_max']);
  for (const w of rp.countingWindows) if (w.cap && 'factor' in w.cap) names.add(w.cap.factor);
  const out: RowCheck[] = [];
  for (const side of new Set<EdgeSide>(['upper', rp.grouping.edgeSide])) {
    const doc = pulseFactors(q, ruleSet, tp, side, true);
    for (const n of names) {
      const c = doc.get(n)?.fromDocument;
      // Stryker disable next-line ArrowFunction: the grouping side set holds one side where a timing factor can be open, so no check is met twice (test/mutation/EQUIVALENT.md)
      if (c !== undefined && !out.some((x) => x.key === c.key)) out.push(c);
    }
  }
  return out;
}

/**
 * The grouping time at this wavelength: the rule set's factor (T_i or T_min), or its stated value
 * below the factor's table (eu2006 below 315 nm); null where the rule set groups nothing (icnirp2013
 * gives no T_i below 400 nm: UV doses simply add, rule 2).
 */
function groupingTime(table: RuleSetTable, pf: FactorSet, lambda: number): GroupingTime | null {
  const rule = table.repetitivePulses.grouping;
  const name = rule.factor;
  const def = table.factors[name];
  const v = pf.get(name);
  if (v !== undefined) return { T_g: v.value, name, source: def?.source ?? '', confidence: def?.confidence ?? '' };
  const below = rule.belowTable;
  // Stryker disable next-line ConditionalExpression: data-equivalent: reached only where the grouping factor is undefined, below the factor's table already (test/mutation/EQUIVALENT.md)
  if (below && lambda < below.below_nm) return { T_g: new Dec(below.value_s), name, source: below.source, confidence: below.confidence };
  return null;
}

/** The counting-window row whose band holds the wavelength: [lo, hi), the top of the last band included. */
function windowAt(windows: readonly CountingWindow[], lambda: number): CountingWindow | undefined {
  const x = new Dec(lambda);
  const last = windows[windows.length - 1];
  return windows.find((w) => intervalPosition(x, w.band_nm, w === last) === 'inside');
}

/** Window in which N is counted for rule 3: min(T, cap) of the rule set's window for this band. */
function countingWindow(windows: readonly CountingWindow[], lambda: number, T: Dec, pf: FactorSet): { span: Dec; why: string } {
  const w = windowAt(windows, lambda);
  const cap = w?.cap;
  if (cap && 'factor' in cap) {
    const T2 = pf.get(cap.factor)?.value;
    if (T2) {
      return T.gt(T2)
        ? { span: T2, why: `N counted within ${cap.factor} = ${fmt(T2)} s (shorter than T)` }
        : { span: T, why: `N counted within T = ${fmt(T)} s (not longer than ${cap.factor} = ${fmt(T2)} s)` };
    }
  } else if (cap) {
    const s = new Dec(cap.seconds);
    return T.gt(s) ? { span: s, why: `N counted within ${fmt(s)} s (${cap.label})` } : { span: T, why: `N counted within T = ${fmt(T)} s` };
  }
  return {
    span: T,
    why: w?.uncappedNote ? `N counted over the whole exposure T = ${fmt(T)} s (${w.uncappedNote})` : `N counted within T = ${fmt(T)} s`,
  };
}

/**
 * The exposure limit for a pulse or a train of pulses: all three rules, the governing one named.
 * Throws InputError naming the field for bad input.
 */
export function pulsedExposureLimit(q: PulsedLimitQuery): PulsedLimitResult {
  const asTable = pulsedWith(q, false);
  const { tp } = validatePulsed(q);
  const checks = pulseTimingChecks(q, q.ruleSet ?? DEFAULT_RULE_SET, tp);
  // Stryker disable next-line LogicalOperator: the short cut only skips work: without a timing check, or for a single pulse, the document pass equals the table pass (test/mutation/EQUIVALENT.md)
  if (checks.length === 0 || asTable.averagePower === null) return asTable;
  // The officer recorded that the published grouping time, counting-window cap or alpha_max
  // differs from the table (SAFETY.md, "Checks of the limit tables"): the pulse rules are
  // evaluated with the table's and with the published value, and the lower per-pulse limit is
  // kept, as for a factor in a limit row. A check never raises a limit.
  const asDocument = pulsedWith(q, true);
  const documentLower = new Dec(asDocument.perPulse_H_Jm2).lt(asTable.perPulse_H_Jm2);
  const kept = documentLower ? asDocument : asTable;
  for (const c of checks) {
    addStep(kept.trace, {
      kind: 'warning',
      label: `Checked factor differs (pulse rules)`,
      detail:
        `${entryWords(c.key)} was checked against ${c.reference} by ${c.checkedBy} on ${c.checkedOn}, and the published text differs: it gives ${c.documentExpr ?? ''}. ` +
        `The pulse rules for the ${q.tissue} (grouping of pulses, the window in which pulses are counted, C_P) were evaluated with the table's value and with the published one; ` +
        `${documentLower ? 'the published value gives the lower limit and is used' : 'the value as written gives the lower (or the same) limit and is kept'} ` +
        `(per pulse: as written ${fmt(new Dec(asTable.perPulse_H_Jm2))} J/m², with the published value ${fmt(new Dec(asDocument.perPulse_H_Jm2))} J/m²)`,
    });
  }
  return kept;
}

/** The three pulse rules with the factors as the table gives them, or (useDocument) with the officer's published values. */
function pulsedWith(q: PulsedLimitQuery, useDocument: boolean): PulsedLimitResult {
  const { tp, T, f } = validatePulsed(q);
  const ruleSet = q.ruleSet ?? DEFAULT_RULE_SET;
  const base = {
    ruleSet,
    tissue: q.tissue,
    wavelength_nm: q.wavelength_nm,
    ...(q.sourceAngle_rad !== undefined ? { sourceAngle_rad: q.sourceAngle_rad } : {}),
    ...(q.settings !== undefined ? { settings: q.settings } : {}),
  };
  const table = ruleSetTable(ruleSet);
  const rp = table.repetitivePulses;
  const single = exposureLimit({ ...base, duration_s: q.pulseDuration_s });
  const H1 = new Dec(single.H_Jm2);
  const trace = newTrace(
    `Pulsed exposure limit, ${q.tissue}, ${q.wavelength_nm} nm, pulses of ${fmt(tp)} s` +
      (f ? ` at ${fmt(f)} Hz over ${fmt(T)} s` : ' (single pulse)') +
      ` (${RULE_SET_NAME[ruleSet]})`,
  );
  trace.children.push(single.trace);
  addStep(trace, {
    kind: 'row',
    label: 'Rule 1: single pulse',
    detail: `limit for one pulse of ${fmt(tp)} s, governing row ${single.governing.rowId} (${single.governing.effect})`,
    value: fmt(H1),
    unit: 'J/m² per pulse',
    source: ruleText(rp, 1).cite,
    confidence: ruleText(rp, 1).confidence,
  });
  const replacements = new Set<string>(single.conservativeReplacements);

  if (f === null) {
    addStep(trace, { kind: 'note', label: 'Single pulse', detail: 'no repetition rate given: rules 2 and 3 do not arise' });
    addStep(trace, { kind: 'result', label: 'Governing', detail: 'single-pulse limit', value: fmt(H1), unit: 'J/m²' });
    return finish({ single, H1, avg: null, train: null, grouping: null, governing: 'single-pulse', perPulse: H1, averageE: H1.div(tp), replacements, trace });
  }

  // Rule 2: the whole train over T against the limit for T.
  const NT = pulsesIn(f, T);
  const avg = exposureLimit({ ...base, duration_s: q.exposureDuration_s });
  avg.conservativeReplacements.forEach((r) => replacements.add(r));
  trace.children.push(avg.trace);
  const H2 = new Dec(avg.H_Jm2).div(NT);
  addStep(trace, {
    kind: 'row',
    label: 'Rule 2: average power',
    detail: `N_T = ceil(f * T) = ceil(${fmt(f)} * ${fmt(T)}) = ${NT.toString()} pulses; per pulse H_T / N_T = ${fmt(new Dec(avg.H_Jm2))} / ${NT.toString()} (row ${avg.governing.rowId}; mean irradiance limit ${fmt(new Dec(avg.E_Wm2))} W/m²)`,
    value: fmt(H2),
    unit: 'J/m² per pulse',
    source: ruleText(rp, 2).cite,
    confidence: ruleText(rp, 2).confidence,
  });

  // Grouping inside T_i / T_min: the summed energy against the limit for the group duration.
  const pf = pulseFactors(q, ruleSet, tp, 'upper', useDocument);
  // A table written lo < lambda <= hi (EU Table 2.6 T_min) gives the lower band's value on an exact
  // band edge (1050, 1400, 1500, 1800, 2600 nm; limit specification errata): grouping.edgeSide.
  const edgeSide = rp.grouping.edgeSide;
  const gt = groupingTime(table, edgeSide === 'upper' ? pf : pulseFactors(q, ruleSet, tp, edgeSide, useDocument), q.wavelength_nm);
  const g: Grouping | null = gt ? groupWithin(f, gt.T_g, T, NT) : null;
  let grouping: PulsedLimitResult['grouping'] = null;
  let groupLimit: ExposureLimitResult | null = null;
  let groupPerPulse: Dec | null = null;
  if (g && gt) {
    groupLimit = exposureLimit({ ...base, duration_s: g.groupDuration_s.toNumber() });
    // Stryker disable next-line ArrowFunction: data-equivalent: at the grouping time no row, aperture or factor piece carries a stricter alternative not listed already; test/core/grouping-replacements.test.ts fails once one does (test/mutation/EQUIVALENT.md)
    groupLimit.conservativeReplacements.forEach((r) => replacements.add(r));
    trace.children.push(groupLimit.trace);
    const perPulse = new Dec(groupLimit.H_Jm2).div(g.groupedPulses);
    const why =
      `pulse period ${fmt(new Dec(1).div(f))} s is shorter than ${gt.name} = ${fmt(gt.T_g)} s: ` +
      `${g.groupedPulses.toString()} pulses inside ${fmt(g.groupDuration_s)} s are one pulse; their summed energy is compared with the limit for ${fmt(g.groupDuration_s)} s`;
    grouping = { time: gt.name, groupedPulses: g.groupedPulses.toString(), groupDuration_s: recordString(g.groupDuration_s), why, perPulse_H_Jm2: recordString(perPulse), limit: groupLimit };
    addStep(trace, { kind: 'row', label: `Grouping inside ${gt.name}`, detail: `${why}: ${fmt(new Dec(groupLimit.H_Jm2))} / ${g.groupedPulses.toString()}`, value: fmt(perPulse), unit: 'J/m² per pulse', source: gt.source, confidence: gt.confidence });
    groupPerPulse = perPulse;
  } else
    // Stryker disable next-line BlockStatement: writes the trace note "every pulse counts on its own" only (test/mutation/EQUIVALENT.md)
    if (gt) {
    addStep(trace, { kind: 'note', label: `Grouping inside ${gt.name}`, detail: `pulse period ${fmt(new Dec(1).div(f))} s is not shorter than ${gt.name} = ${fmt(gt.T_g)} s: every pulse counts on its own`, source: gt.source, confidence: gt.confidence });
  }

  // Rule 3: C_P on the thermal (icnirp2013: retinal thermal) part of the single-pulse limit.
  const train = pulseTrainRule({ q, rp, single, pf, groupLimit, g, tp, T, f, NT, replacements });
  addStep(trace, {
    kind: train.cpReplaced ? 'conservative' : 'row',
    label: 'Rule 3: pulse train',
    detail: train.applies ? `${train.detail}` : `does not apply: ${train.why}`,
    value: fmt(train.H),
    unit: 'J/m² per pulse',
    source: train.source,
    confidence: train.confidence,
  });

  const { rule1, governing, perPulse } = governingPulseRule({ singlePulse: H1, group: groupPerPulse, averagePower: H2, pulseTrain: train.applies ? train.H : null });
  addStep(trace, {
    kind: 'result',
    label: 'Governing',
    detail: `lowest per-pulse limit: ${governing} (rule 1 ${fmt(rule1)}, rule 2 ${fmt(H2)}, rule 3 ${train.applies ? fmt(train.H) : 'n/a'} J/m²)`,
    value: fmt(perPulse),
    unit: 'J/m² per pulse',
  });
  addStep(trace, { kind: 'result', label: 'Mean irradiance limit', detail: `per-pulse limit * f = ${fmt(perPulse)} * ${fmt(f)}`, value: fmt(perPulse.mul(f)), unit: 'W/m²' });

  return finish({
    single,
    H1,
    avg: { H_Jm2: recordString(H2), E_Wm2: avg.E_Wm2, N: NT.toString(), limit: avg },
    train: { H_Jm2: recordString(train.H), CP: recordString(train.CP), N: train.N.toString(), applies: train.applies, why: train.why },
    grouping,
    governing,
    perPulse,
    averageE: perPulse.mul(f),
    replacements,
    trace,
  });
}

/** Per-pulse values of the three rules, as the caller holds them (J/m² per pulse). */
export interface PulseRuleValues {
  /** Rule 1 for one pulse of its own duration. */
  readonly singlePulse: Dec;
  /** Rule 1 for a group of pulses inside T_i / T_min, per pulse (null when none are grouped). */
  readonly group: Dec | null;
  /** Rule 2, H_T / N_T (null for a single pulse). */
  readonly averagePower: Dec | null;
  /** Rule 3, single-pulse thermal limit * C_P (null for a single pulse or where rule 3 does not apply). */
  readonly pulseTrain: Dec | null;
}

export interface GoverningPerPulse {
  /** Rule 1: the lower of the single-pulse and the group value. */
  readonly rule1: Dec;
  readonly governing: GoverningPulseRule;
  /** The lowest per-pulse limit of the rules that apply. */
  readonly perPulse: Dec;
}

/**
 * Which pulse rule governs: the lowest per-pulse limit of the rules that apply (all three rules are
 * evaluated and the most restrictive governs: limit specification sections 3 step 7, 4.6, 5.6). The
 * merged pulse of a group is a pulse for rule 1, so the lower of the single-pulse and the group
 * value is rule 1. On a tie the earlier rule is named. The one place this choice is made: the beam's
 * limit criteria (core/beam/tissue-limits.ts) call it with their own (short-pulse scaled) values.
 */
export function governingPulseRule(v: PulseRuleValues): GoverningPerPulse {
  const rule1 = v.group !== null && v.group.lt(v.singlePulse) ? v.group : v.singlePulse;
  let governing: GoverningPulseRule = 'single-pulse';
  let perPulse = rule1;
  if (v.averagePower !== null && v.averagePower.lt(perPulse)) {
    governing = 'average-power';
    perPulse = v.averagePower;
  }
  if (v.pulseTrain !== null && v.pulseTrain.lt(perPulse)) {
    governing = 'pulse-train';
    perPulse = v.pulseTrain;
  }
  return { rule1, governing, perPulse };
}

interface TrainInput {
  readonly q: PulsedLimitQuery;
  readonly rp: RepetitivePulseRules;
  readonly single: ExposureLimitResult;
  readonly pf: FactorSet;
  readonly groupLimit: ExposureLimitResult | null;
  readonly g: Grouping | null;
  readonly tp: Dec;
  readonly T: Dec;
  readonly f: Dec;
  readonly NT: Dec;
  readonly replacements: Set<string>;
}

interface TrainOutcome {
  readonly H: Dec;
  readonly CP: Dec;
  readonly N: Dec;
  readonly applies: boolean;
  readonly why: string;
  readonly detail: string;
  readonly source: string;
  readonly confidence: string;
  readonly cpReplaced: boolean;
}

function pulseTrainRule(x: TrainInput): TrainOutcome {
  const { q, rp, single, pf, groupLimit, g, tp, T, f, NT } = x;
  const cp = rp.cp;
  const notApplying = (why: string): TrainOutcome => ({
    H: new Dec(single.H_Jm2),
    CP: new Dec(1),
    N: NT,
    applies: false,
    why,
    detail: why,
    source: cp.source,
    confidence: cp.confidence,
    // Stryker disable next-line BooleanLiteral: cpReplaced chooses the trace step's kind and confidence wording only (test/mutation/EQUIVALENT.md)
    cpReplaced: false,
  });
  const thermal = minH(single.candidates.filter((c) => reducedByCp(cp, c)));
  if (!thermal) return notApplying(cp.scopeNote);
  // Counting as one pulse (for N) may need pulses longer than a minimum (eu2006: 1 ns, BGI 832, read).
  const minPulse = rp.grouping.countAsOneIfPulseLongerThan_s;
  const countAsOne = g !== null && (minPulse === undefined || tp.gt(minPulse));
  const effectiveDuration = countAsOne && g ? g.groupDuration_s : tp;
  const cpMax = new Dec(cp.pulsesShorterThan_s);
  if (effectiveDuration.gte(cpMax)) {
    return notApplying(`C_P applies only to pulses shorter than ${fmt(cpMax)} s (pulse${countAsOne ? ' group' : ''} lasts ${fmt(effectiveDuration)} s)`);
  }
  const win = countingWindow(rp.countingWindows, q.wavelength_nm, T, pf);
  const inWindow = Dec.min(NT, pulsesIn(f, win.span));
  const N = countAsOne && g ? groupsAmong(inWindow, g.groupedPulses) : inWindow;
  const alpha = new Dec(q.sourceAngle_rad ?? 0).mul(1000);
  const vars = { N, alpha, alpha_max: pf.get('alpha_max')?.value };
  let CP = evaluate(cp.expr, vars);
  let cpExpr = cp.expr;
  // Stryker disable next-line BooleanLiteral: cpReplaced chooses the trace step's kind and confidence wording only (test/mutation/EQUIVALENT.md)
  let cpReplaced = false;
  if (cp.pieces) {
    const piece = cp.pieces.find((p) => condition(p.when, vars));
    const remembered = piece ? evaluate(piece.expr, vars) : undefined;
    const useAlt = cp.conservative_alt !== undefined && conservativeOn(x.q.settings, 'rule:CP');
    if (remembered && !useAlt) {
      CP = remembered;
      // Stryker disable next-line LogicalOperator: trace wording of the C_P expression only (test/mutation/EQUIVALENT.md)
      cpExpr = `${piece?.expr ?? ''} (piecewise, verified: ${piece?.when ?? ''})`;
    } else if (cp.conservative_alt !== undefined) {
      CP = evaluate(cp.conservative_alt, vars);
      cpExpr = cp.conservative_alt;
      if (remembered && CP.lt(remembered)) {
        // Stryker disable next-line BooleanLiteral: cpReplaced chooses the trace step's kind and confidence wording only; the replaced entry is added on the next line (test/mutation/EQUIVALENT.md)
        cpReplaced = true;
        x.replacements.add('rule:CP');
        cpExpr += ` (unverified remembered piecewise value ${fmt(remembered)} replaced by the stricter value, conservative mode)`;
      }
    }
  }
  // Base: the thermal single-pulse limit; with grouping also the group's thermal limit per pulse
  // (the lower of the two, ours: never less strict than either reading).
  let baseH = thermal.H;
  let baseWhy = `thermal single-pulse limit ${fmt(thermal.H)} J/m² (row ${thermal.row.rowId})`;
  if (countAsOne && g && groupLimit) {
    const gThermal = minH(groupLimit.candidates.filter((c) => reducedByCp(cp, c)));
    if (gThermal) {
      const perPulse = gThermal.H.div(g.groupedPulses);
      if (perPulse.lt(baseH)) {
        baseH = perPulse;
        baseWhy = `thermal limit of the pulse group ${fmt(gThermal.H)} J/m² (row ${gThermal.row.rowId}) / ${g.groupedPulses.toString()} pulses`;
      }
    }
  }
  const H = baseH.mul(CP);
  const why =
    `${win.why}` +
    // Stryker disable next-line LogicalOperator: trace wording ("groups counted as one") only (test/mutation/EQUIVALENT.md)
    (countAsOne && g ? `; groups of ${g.groupedPulses.toString()} pulses counted as one` : '') +
    `; N = ${N.toString()}, C_P = ${cpExpr} = ${fmt(CP)}`;
  return {
    H,
    CP,
    N,
    applies: true,
    why,
    detail: `${baseWhy} * C_P; ${why}`,
    source: cp.source,
    confidence: cpReplaced ? 'from memory, uncertain' : cp.confidence,
    cpReplaced,
  };
}

interface FinishInput {
  readonly single: ExposureLimitResult;
  readonly H1: Dec;
  readonly avg: PulsedLimitResult['averagePower'];
  readonly train: PulsedLimitResult['pulseTrain'];
  readonly grouping: PulsedLimitResult['grouping'];
  readonly governing: GoverningPulseRule;
  readonly perPulse: Dec;
  readonly averageE: Dec;
  readonly replacements: Set<string>;
  readonly trace: Trace;
}

function finish(x: FinishInput): PulsedLimitResult {
  // Stryker disable next-line LogicalOperator,BlockStatement: unreachable internal guard: every limit row and factor gives a positive finite value (test/mutation/EQUIVALENT.md)
  if (!x.perPulse.isFinite() || x.perPulse.lte(0) || !x.averageE.isFinite() || x.averageE.lte(0)) {
    throw new Error('internal: pulsed limit not positive');
  }
  const conservativeReplacements = [...x.replacements];
  if (conservativeReplacements.length) {
    addStep(x.trace, { kind: 'warning', label: 'Conservative mode', detail: `unverified entries replaced by the stricter value: ${conservativeReplacements.map(entryWords).join('; ')}` });
  }
  return {
    singlePulse: { H_Jm2: recordString(x.H1), limit: x.single },
    averagePower: x.avg,
    pulseTrain: x.train,
    grouping: x.grouping,
    governingRule: x.governing,
    perPulse_H_Jm2: recordString(x.perPulse),
    average_E_Wm2: recordString(x.averageE),
    conservativeReplacements,
    trace: x.trace,
  };
}
