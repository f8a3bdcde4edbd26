/**
 * The exposure limit (MPE / ELV) for eye or skin at one wavelength, duration and source size,
 * evaluated from the rule-set tables (limit specification, section 3):
 *  1. factors at (lambda, t, alpha);
 *  2. every row whose band and duration contain the query and whose 'when' holds; at an exact
 *     boundary the rows on both sides (the lower governs: EU Table 2.2 note a);
 *  3. 'ref' rows resolved into the other tissue's rows (one level; skin -> eye uses non-retinal rows);
 *  4. E rows converted to H = E * t; conservative alternatives applied;
 *  5. the minimum over all candidates governs (dual limits), and the result names it.
 */
import { Dec, recordString } from '../numeric/decimal.js';
import { limitReported } from '../numeric/safe-rounding.js';
import { quantityText } from '../units/display.js';
import { intervalPosition } from './intervals.js';
import { InputError, requireInRange } from '../errors.js';
import type { LimitSettings, RowCheck, RuleSetId, Tissue } from '../model/inputs.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import { condition, evaluate, substitute, variablesOf } from './expression.js';
import { checkOf, conservativeOn, documentExprOf, entryWords, evaluateDocumentValue, evaluateFactors, FACTOR_ORDER, hasFactorDocumentValues, onFactorEdge, type FactorSet, type FactorValue } from './factors.js';
import { DEFAULT_RULE_SET, DURATION_RANGE_S, RULE_SET_IDS, RULE_SET_NAME, ruleSetTable, WAVELENGTH_RANGE_NM } from './rule-sets.js';
import type { EffectClass, Interval, LimitRow, RuleSetTable } from './table-types.js';
import { limitingAperture, type ApertureResult } from './apertures.js';

export interface ExposureLimitQuery {
  readonly ruleSet?: RuleSetId;
  readonly tissue: Tissue;
  readonly wavelength_nm: number;
  readonly duration_s: number;
  /** Angular subtense of the apparent source, radians (eye only); default: point source. */
  readonly sourceAngle_rad?: number;
  readonly settings?: LimitSettings;
}

export interface LimitCandidate {
  readonly rowId: string;
  readonly tissueTable: Tissue;
  readonly effect: string;
  /** The row's typed effect class (what the pulse-train scope and the hazard groups read). */
  readonly effectClass: EffectClass;
  readonly quantity: 'H' | 'E';
  readonly expr: string;
  readonly substituted: string;
  /** The limit as radiant exposure over the duration, J/m² (decimal string). */
  readonly H_Jm2: string;
  readonly source: string;
  readonly confidence: string;
  readonly conservativeApplied: boolean;
  /** The remembered value the conservative alternative replaced (J/m²), if any. */
  readonly rememberedH_Jm2?: string;
  /** Factor applied for a photochemical limit when the source is larger than gamma_p. */
  readonly fieldOfViewFactor?: string;
  /** Aperture over which exposure is averaged for this candidate. */
  readonly aperture: ApertureResult;
  /** An uncertain row's less strict reading: used once the row is verified with it, else kept aside (stricter value used). */
  readonly relaxed?: { readonly used: boolean; readonly H_Jm2: string; readonly expr: string; readonly source: string; readonly keptH_Jm2: string };
  /** Set when the point is on a factor edge and the factors of the piece ending there gave this (lower) value. */
  readonly factorsFromBelow?: true;
  /** Set when the row's "not to exceed" irradiance cap lowered the value (W/m², source). */
  readonly cap?: { readonly E_Wm2: string; readonly uncappedH_Jm2: string; readonly source: string; readonly confidence: string; readonly conservative: boolean };
  /**
   * The officer's signed check of this row against the published document. For 'differs',
   * documentH_Jm2 is the document's value here and documentUsed says whether it was the lower one.
   */
  readonly check?: { readonly check: RowCheck; readonly documentH_Jm2?: string; readonly documentUsed: boolean };
  /** Set where a factor's 'differs' check (the document's factor value) gave this lower value. */
  readonly factorFromDocument?: readonly RowCheck[];
}

export interface ExposureLimitResult {
  readonly ruleSet: RuleSetId;
  readonly ruleSetName: string;
  readonly tissue: Tissue;
  readonly wavelength_nm: number;
  readonly duration_s: number;
  readonly sourceAngle_rad: number;
  /** Governing limit as radiant exposure over the duration, J/m² (full precision, decimal string). */
  readonly H_Jm2: string;
  /** Governing limit as mean irradiance over the duration, W/m² (= H / t). */
  readonly E_Wm2: string;
  /** Rounded DOWN to 3 significant figures (a smaller limit is the safe side). */
  readonly H_Jm2_reported: string;
  readonly E_Wm2_reported: string;
  readonly governing: LimitCandidate;
  readonly candidates: readonly LimitCandidate[];
  readonly factors: Readonly<Record<string, string>>;
  /** Limiting aperture of the governing candidate. */
  readonly aperture: ApertureResult;
  /** Ids of rows/factors where conservative mode used the stricter alternative. */
  readonly conservativeReplacements: readonly string[];
  /** Ids of rows used whose values are from memory (not read in a published source). */
  readonly fromMemoryRows: readonly string[];
  readonly trace: Trace;
}

/**
 * Quick reject in plain numbers before the exact decimal test: a value more than 1e-6 (relative)
 * outside [lo, hi] can never be inside or on an edge (the exact test's tolerance is 1e-9). This only
 * skips work; every row that may apply still gets the exact decimal test (speed, see npm run bench).
 */
function clearlyOutside(x: number, iv: Interval): boolean {
  // Stryker disable next-line LogicalOperator: equivalent, a quick reject only skips work (a value below lo and above hi at once never exists, so the rows all go to the exact test)
  return x < iv[0] * (1 - 1e-6) || x > iv[1] * (1 + 1e-6);
}

function rowApplies(row: LimitRow, lambda: Dec, t: Dec, lambdaN: number, tN: number): boolean {
  // Stryker disable next-line LogicalOperator: equivalent, the quick reject only skips work: every row it lets through still gets the exact decimal test on the next lines
  if (clearlyOutside(lambdaN, row.band_nm) || clearlyOutside(tN, row.t_s)) return false;
  // A row applies inside its band and duration and on both edges ('inside' or 'edge'); whether the
  // top edge counts as inside (closed at 1 mm and 30 000 s) does not matter here.
  const pl = intervalPosition(lambda, row.band_nm);
  const pt = intervalPosition(t, row.t_s);
  return pl !== 'outside' && pt !== 'outside';
}

/** Does any piece of this factor carry a conservative alternative (only those can be replaced)? */
function hasConservativePiece(table: RuleSetTable, name: string): boolean {
  // Stryker disable next-line EqualityOperator: equivalent, every factor with a conservative piece also has a piece without one, so '=== undefined' keeps the same factors (a factor without one never has conservativeApplied)
  return (table.factors[name]?.pieces ?? []).some((p) => p.conservative_alt !== undefined);
}

function isRetinal(row: LimitRow): boolean {
  return row.effectClass === 'retina-thermal' || row.effectClass === 'retina-photochemical';
}

function fmt(d: Dec): string {
  return d.toSignificantDigits(6).toString();
}

/** Validate a query and return normalised decimals. Throws InputError naming the field. */
export function validateLimitQuery(q: ExposureLimitQuery): { ruleSet: RuleSetId; lambda: Dec; t: Dec; alphaMrad: Dec } {
  const ruleSet = q.ruleSet ?? DEFAULT_RULE_SET;
  if (!RULE_SET_IDS.includes(ruleSet)) throw new InputError('invalid_choice', 'ruleSet', q.ruleSet, RULE_SET_IDS.join(' | '));
  if (q.tissue !== 'eye' && q.tissue !== 'skin') throw new InputError('invalid_choice', 'tissue', q.tissue, "'eye' | 'skin'");
  requireInRange('wavelength_nm', q.wavelength_nm, WAVELENGTH_RANGE_NM[0], WAVELENGTH_RANGE_NM[1], 'nm (180 nm to 1 mm)');
  requireInRange('duration_s', q.duration_s, DURATION_RANGE_S[0], DURATION_RANGE_S[1], 's');
  let alphaMrad = new Dec(0);
  if (q.sourceAngle_rad !== undefined) {
    requireInRange('sourceAngle_rad', q.sourceAngle_rad, 0, Math.PI, 'rad');
    alphaMrad = new Dec(q.sourceAngle_rad).mul(1000);
  }
  return { ruleSet, lambda: new Dec(q.wavelength_nm), t: new Dec(q.duration_s), alphaMrad };
}

interface Ctx {
  readonly table: RuleSetTable;
  readonly ruleSet: RuleSetId;
  readonly lambda: Dec;
  readonly t: Dec;
  readonly f: FactorSet;
  readonly settings: LimitSettings | undefined;
  readonly tissue: Tissue;
  /** lambda and t as plain numbers, for the quick reject in rowApplies only. */
  readonly lambdaN: number;
  readonly tN: number;
  readonly apertures: Map<string, ApertureResult>;
}

function candidatesFor(ctx: Ctx, tableTissue: Tissue, followRefs: boolean, onlyNonRetinal: boolean, apertureTissue: Tissue): LimitCandidate[] {
  const out: LimitCandidate[] = [];
  const rows = ctx.table[tableTissue];
  for (const row of rows) {
    if (!rowApplies(row, ctx.lambda, ctx.t, ctx.lambdaN, ctx.tN)) continue;
    if (row.when && !condition(row.when, ctx.f.vars)) continue;
    if (row.quantity === 'ref') {
      if (!followRefs) continue; // spec convention 'ref_rows': one level only
      // Stryker disable next-line MethodExpression: equivalent on the data, the 'ref' rows of both tables write their target as exactly "eye" or "skin", without spaces
      const other: Tissue = row.expr.trim() === 'skin' ? 'skin' : 'eye';
      // skin 'ref eye' uses only non-retinal rows; the eye's corneal check uses the skin aperture (ours)
      out.push(...candidatesFor(ctx, other, false, tableTissue === 'skin', 'skin'));
      continue;
    }
    if (onlyNonRetinal && isRetinal(row)) continue;
    out.push(evaluateRow(ctx, row, tableTissue, apertureTissue));
  }
  return out;
}

function evaluateRow(ctx: Ctx, row: LimitRow, tableTissue: Tissue, apertureTissue: Tissue): LimitCandidate {
  const vars = ctx.f.vars;
  const toH = (v: Dec): Dec => (row.quantity === 'E' ? v.mul(ctx.t) : v);
  let H = toH(evaluate(row.expr, vars));
  let expr = row.expr;
  let conservativeApplied = false;
  let remembered: Dec | undefined;
  if (row.conservative_alt && conservativeOn(ctx.settings, row.id)) {
    const alt = toH(evaluate(row.conservative_alt, vars));
    if (alt.lt(H)) {
      remembered = H;
      H = alt;
      expr = row.conservative_alt;
      conservativeApplied = true;
    }
  }
  // The officer's check against the published document (issue 12): either verdict ended the stricter
  // replacement above (conservativeOn); 'differs' evaluates the document's value and keeps the lower,
  // so a check never raises the limit above the value as written (SAFETY.md).
  const rowCheck = checkOf(ctx.settings, row.id);
  let checked: LimitCandidate['check'];
  if (rowCheck) {
    const doc = documentExprOf(ctx.settings, row.id);
    if (doc) {
      const D = toH(evaluateDocumentValue(ctx.settings, row.id, doc.expr, vars));
      const documentUsed = D.lt(H);
      checked = { check: rowCheck, documentH_Jm2: recordString(D), documentUsed };
      if (documentUsed) {
        H = D;
        expr = doc.expr;
      }
    } else {
      // Stryker disable next-line BooleanLiteral: equivalent, only a 'matches' check reaches here (validation refuses 'differs' without the published value), and its note is written from the verdict, not from documentUsed
      checked = { check: rowCheck, documentUsed: false };
    }
  }
  // A less strict reading of an uncertain row: kept aside until the row is verified with it. A row
  // that also carries a check is not switched to it: the check states what the published text gives
  // ('matches': the row as written; 'differs': the lower of the two), and a limit above that is not
  // used, whatever the verified list says (SAFETY.md "Checks of the limit tables").
  let relaxed: LimitCandidate['relaxed'];
  if (row.relaxed_alt && condition(row.relaxed_alt.when, vars)) {
    const alt = toH(evaluate(row.relaxed_alt.expr, vars));
    // Stryker disable next-line ConditionalExpression: equivalent on the data, the only alternative reading (icnirp2013 H-E-UVA-long, 10 t for t > 1000 s) is above the row wherever its condition holds
    if (alt.gt(H)) {
      // Stryker disable next-line ArrayDeclaration: equivalent, a list holding one placeholder entry includes no row id either
      const used = rowCheck === undefined && (ctx.settings?.verifiedRows ?? []).includes(row.id);
      relaxed = { used, H_Jm2: recordString(alt), expr: row.relaxed_alt.expr, source: row.relaxed_alt.source, keptH_Jm2: recordString(H) };
      if (used) {
        H = alt;
        expr = row.relaxed_alt.expr;
      }
    }
  }
  // Photochemical limits are measured within the field of view gamma_p: for a uniform source larger
  // than gamma_p only the fraction (gamma_p/alpha)^2 of its irradiance counts, which is the same as
  // raising the limit by (alpha/gamma_p)^2 (derived; limit specification sections 4.2 and 8).
  let fov: Dec | undefined;
  if (row.effectClass === 'retina-photochemical') {
    const gamma = vars['gamma_p'];
    const alpha = vars['alpha'] as Dec;
    if (gamma && alpha.gt(gamma)) {
      fov = alpha.div(gamma).pow(2);
      H = H.mul(fov);
    }
  }
  // "Not to exceed" cap on the mean irradiance (EU Table 2.3 note for 700-1400 nm extended sources).
  let cap: LimitCandidate['cap'];
  if (row.max_E && (!row.max_E.conservativeOnly || conservativeOn(ctx.settings, row.id))) {
    const capH = evaluate(row.max_E.value, vars).mul(ctx.t);
    if (capH.lt(H)) {
      cap = { E_Wm2: row.max_E.value, uncappedH_Jm2: recordString(H), source: row.max_E.source, confidence: row.max_E.confidence, conservative: row.max_E.conservativeOnly === true };
      H = capH;
    }
  }
  // Each candidate row over its own limiting aperture: at an exact band or duration edge the rows on
  // either side can have different apertures (limit specification errata), and the hazard code takes
  // the largest hazard over all candidates. Looked up once per tissue and row stretch.
  const apKey = `${apertureTissue}:${row.band_nm.join('-')}:${row.t_s.join('-')}`;
  let aperture = ctx.apertures.get(apKey);
  // Stryker disable next-line ConditionalExpression: equivalent, the aperture looked up again for each row of the stretch is the same (speed only)
  if (!aperture) {
    aperture = limitingAperture(ctx.ruleSet, apertureTissue, ctx.lambda, ctx.t, ctx.settings, { band_nm: row.band_nm, t_s: row.t_s });
    ctx.apertures.set(apKey, aperture);
  }
  const c: LimitCandidate = {
    rowId: row.id,
    tissueTable: tableTissue,
    effect: row.effect,
    effectClass: row.effectClass,
    quantity: row.quantity === 'E' ? 'E' : 'H',
    expr,
    substituted: substitute(expr, vars, fmt),
    H_Jm2: recordString(H),
    source: row.source,
    confidence: row.confidence,
    conservativeApplied,
    aperture,
    ...(remembered ? { rememberedH_Jm2: recordString(remembered) } : {}),
    ...(fov ? { fieldOfViewFactor: recordString(fov) } : {}),
    ...(cap ? { cap } : {}),
    ...(relaxed ? { relaxed } : {}),
    ...(checked ? { check: checked } : {}),
  };
  return c;
}

/** The candidate rows of one query and the one that governs (shared by exposureLimit and exposureLimitH). */
function governingLimit(q: ExposureLimitQuery): GoverningLimit {
  const { ruleSet, lambda, t, alphaMrad } = validateLimitQuery(q);
  const table = ruleSetTable(ruleSet);
  const settings = q.settings;
  // Source size only matters for the retina; skin limits are for a point of skin (alpha unused).
  const alphaForFactors = q.tissue === 'eye' ? alphaMrad : new Dec(0);
  const f = evaluateFactors(table, lambda, t, alphaForFactors, settings);
  const ctx: Ctx = { table, ruleSet, lambda, t, f, settings, tissue: q.tissue, lambdaN: lambda.toNumber(), tN: t.toNumber(), apertures: new Map() };
  const candidates = candidatesFor(ctx, q.tissue, true, false, q.tissue);
  // Stryker disable next-line ConditionalExpression: equivalent, off a factor edge the pieces ending there are the pieces starting there, so the second pass finds the same values (speed only)
  if (onFactorEdge(table, lambda, t)) {
    // Exactly on an edge between factor pieces (C_C at 1200 nm, T_min bands ...): the factors of the
    // piece ending here are evaluated too, and for each row the lower value is kept (EU Table 2.2
    // note a applied to the factors; limit specification errata on the T_min bands).
    const fBelow = evaluateFactors(table, lambda, t, alphaForFactors, settings, 'lower');
    const below = candidatesFor({ ...ctx, f: fBelow }, q.tissue, true, false, q.tissue);
    for (const b of below) {
      const i = candidates.findIndex((c) => c.rowId === b.rowId);
      const c = candidates[i];
      if (!c) candidates.push({ ...b, factorsFromBelow: true });
      else if (new Dec(b.H_Jm2).lt(c.H_Jm2)) candidates[i] = { ...b, factorsFromBelow: true };
    }
  }
  // Stryker disable next-line ConditionalExpression: equivalent, without a factor document value the second factor set equals the first, so no row changes and none is named
  if (hasFactorDocumentValues(settings)) {
    // A factor checked as 'differs': the rows are evaluated again with the document's factor value
    // and each keeps the lower limit (a check never raises a limit, SAFETY.md).
    const fDoc = evaluateFactors(table, lambda, t, alphaForFactors, settings, 'upper', true);
    const docFactors = FACTOR_ORDER.map((n) => fDoc.get(n)).filter((v): v is FactorValue => v?.fromDocument !== undefined);
    // Stryker disable next-line ConditionalExpression: equivalent, with no document factor every row comes out equal and nothing is named (see the line above)
    if (docFactors.length > 0) {
      const withDoc = candidatesFor({ ...ctx, f: fDoc }, q.tissue, true, false, q.tissue);
      for (const b of withDoc) {
        const i = candidates.findIndex((c) => c.rowId === b.rowId);
        const c = candidates[i];
        // A factor can change a row without appearing in its expression: gamma_p through the field
        // of view, alpha_max through C_E, T2 through a row's condition. Where the document's factors
        // changed the row (or made another row apply), every checked factor is named with it.
        const direct = docFactors.filter((v) => variablesOf(b.expr).includes(v.name));
        const changed = c === undefined || !new Dec(b.H_Jm2).eq(c.H_Jm2);
        const used = (direct.length > 0 ? direct : changed ? docFactors : []).map((v) => v.fromDocument as RowCheck);
        if (!c) candidates.push({ ...b, factorFromDocument: used });
        else
          // Stryker disable next-line ConditionalExpression: equivalent, an empty list writes no step and no warning, and the row kept is the same
          if (used.length > 0) candidates[i] = new Dec(b.H_Jm2).lt(c.H_Jm2) ? { ...b, factorFromDocument: used } : { ...c, factorFromDocument: used };
      }
    }
  }
  // Stryker disable next-line ConditionalExpression,BlockStatement: equivalent, unreachable: validation keeps the query within 180 nm-1 mm and 1e-13-3e4 s, and the rows of every table cover that whole span for both tissues (enumerated 2026-12-03: 89 760 queries at every table edge and between them, both rule sets and tissues, none refused)
  if (candidates.length === 0) {
    throw new InputError('not_covered', 'wavelength_nm', q.wavelength_nm, `a band of rule set ${ruleSet} at ${t.toString()} s`);
  }
  let governing = candidates[0] as LimitCandidate;
  // On a tie the later row wins: it is the one that starts at the boundary (the row 'inside').
  for (const c of candidates) if (new Dec(c.H_Jm2).lte(governing.H_Jm2)) governing = c;
  const H = new Dec(governing.H_Jm2);
  // Stryker disable next-line ConditionalExpression,LogicalOperator: equivalent, an internal guard: every row, factor and document value is positive and finite where it applies, so it never throws
  if (!H.isFinite() || H.lte(0)) throw new Error(`internal: limit not positive for ${JSON.stringify(q)}`);
  return { ruleSet, lambda, t, alphaMrad, table, settings, f, candidates, governing, H };
}

/** What every limit look-up computes: the validated query, the factors, every candidate row and the one that governs. */
interface GoverningLimit {
  readonly ruleSet: RuleSetId;
  readonly lambda: Dec;
  readonly t: Dec;
  readonly alphaMrad: Dec;
  readonly table: RuleSetTable;
  readonly settings: LimitSettings | undefined;
  readonly f: FactorSet;
  readonly candidates: LimitCandidate[];
  readonly governing: LimitCandidate;
  readonly H: Dec;
}

/**
 * The limit as radiant exposure H (J/m², decimal string), the same value as `exposureLimit(q).H_Jm2`
 * from the same code, without the derivation trace and the reported roundings: for curves that
 * sample the limit at many durations (the plots), where the trace would be thrown away.
 */
export function exposureLimitH(q: ExposureLimitQuery): string {
  return recordString(governingLimit(q).H);
}

/**
 * The exposure limit for one query. Throws InputError for bad input; never returns NaN,
 * Infinity or a non-positive limit.
 */
export function exposureLimit(q: ExposureLimitQuery): ExposureLimitResult {
  const { ruleSet, lambda, t, alphaMrad, table, settings, f, candidates, governing, H } = governingLimit(q);
  const E = H.div(t);

  // Every factor defined here, in FACTOR_ORDER; built on first read (factors are lazy, see factors.ts).
  let factorsCache: Record<string, string> | undefined;
  const allFactors = (): Record<string, string> => {
    // Stryker disable next-line ConditionalExpression: equivalent, the factor map built again holds the same values (speed only)
    if (!factorsCache) {
      factorsCache = {};
      for (const [k, v] of f.used) factorsCache[k] = recordString(v.value);
    }
    return factorsCache;
  };

  const conservativeReplacements = [
    ...candidates.filter((c) => c.conservativeApplied || c.cap?.conservative === true || (c.relaxed !== undefined && !c.relaxed.used && conservativeOn(settings, c.rowId))).map((c) => c.rowId),
    ...FACTOR_ORDER.filter((n) => hasConservativePiece(table, n))
      .map((n) => f.get(n))
      .filter((v): v is FactorValue => v !== undefined && v.conservativeApplied)
      .map((v) => `factor:${v.name}`),
    ...(governing.aperture.conservativeApplied ? [governing.aperture.key] : []),
  ];
  const fromMemoryRows = candidates.filter((c) => c.confidence.startsWith('from memory')).map((c) => c.rowId);

  const trace = newTrace(`Exposure limit, ${q.tissue}, ${lambda.toString()} nm, ${t.toString()} s (${RULE_SET_NAME[ruleSet]})`);
  addStep(trace, { kind: 'input', label: 'Rule set', detail: `${RULE_SET_NAME[ruleSet]}: ${table.status}` });
  addStep(trace, {
    kind: 'input',
    label: 'Source',
    detail: alphaMrad.lte(1.5) ? `point source (alpha = ${fmt(alphaMrad)} mrad <= alpha_min = 1.5 mrad)` : `extended source, alpha = ${fmt(alphaMrad)} mrad`,
  });
  const shown = new Set<string>();
  for (const c of candidates) for (const n of variablesOf(c.expr)) shown.add(n);
  for (const row of [...table.eye, ...table.skin]) if (candidates.some((c) => c.rowId === row.id) && row.when) for (const n of ['alpha', 'T1', 'T2']) if (row.when.includes(n)) shown.add(n);
  if (shown.has('CE')) ['alpha_min', 'alpha_max'].forEach((n) => shown.add(n));
  if (candidates.some((c) => c.fieldOfViewFactor)) shown.add('gamma_p');
  for (const name of FACTOR_ORDER) {
    if (!shown.has(name)) continue;
    const v = f.get(name);
    if (!v) continue;
    addStep(trace, {
      kind: v.conservativeApplied ? 'conservative' : 'factor',
      label: v.name,
      detail: v.conservativeApplied
        ? `${v.expr} (unverified remembered value ${fmt(v.remembered as Dec)} replaced by the stricter value)`
        : v.expr,
      value: fmt(v.value),
      source: v.source,
      confidence: v.confidence,
    });
  }
  for (const c of candidates) {
    addStep(trace, {
      kind: c.conservativeApplied || c.cap?.conservative === true ? 'conservative' : 'row',
      label: `Row ${c.rowId} (${c.effect})`,
      detail:
        `${c.quantity === 'E' ? 'E = ' : 'H = '}${c.expr} = ${c.substituted}` +
        (c.quantity === 'E' ? ', H = E * t' : '') +
        (c.fieldOfViewFactor ? `, times (alpha/gamma_p)^2 = ${fmt(new Dec(c.fieldOfViewFactor))} for a source larger than gamma_p (derived)` : '') +
        (c.conservativeApplied
          ? `; unverified entry: remembered value H = ${fmt(new Dec(c.rememberedH_Jm2 as string))} J/m² replaced by the stricter value (conservative mode)`
          : '') +
        (c.relaxed
          ? c.relaxed.used
            ? `; checked with the alternative reading ${c.relaxed.expr}: H = ${fmt(new Dec(c.relaxed.H_Jm2))} J/m² used instead of ${fmt(new Dec(c.relaxed.keptH_Jm2))} J/m²`
            : c.check
              ? `; alternative reading ${c.relaxed.expr} = ${fmt(new Dec(c.relaxed.H_Jm2))} J/m² not used: the row's check against the published document governs`
              : `; unchecked entry: alternative reading ${c.relaxed.expr} = ${fmt(new Dec(c.relaxed.H_Jm2))} J/m² not used, the stricter ${fmt(new Dec(c.relaxed.keptH_Jm2))} J/m² is kept until the row is checked`
          : '') +
        (c.factorsFromBelow ? '; factors taken from the piece ending at this exact edge, which gives the lower value (EU Table 2.2 note a)' : '') +
        (c.cap
          ? `; not to exceed ${c.cap.E_Wm2} W/m²: ${fmt(new Dec(c.cap.uncappedH_Jm2).div(t))} W/m² capped to ${c.cap.E_Wm2} W/m² (H = ${fmt(new Dec(c.H_Jm2))} J/m²)${c.cap.conservative ? ' (conservative mode)' : ''}`
          : ''),
      value: fmt(new Dec(c.H_Jm2)),
      unit: 'J/m²',
      source: c.source,
      confidence: c.confidence,
    });
  }
  for (const c of candidates) {
    const k = c.check;
    if (k) {
      const by = `checked against ${k.check.reference} by ${k.check.checkedBy} on ${k.check.checkedOn}`;
      if (k.check.verdict === 'matches') addStep(trace, { kind: 'note', label: `Checked row ${c.rowId}`, detail: `${by}: matches the published text; the row is used as written` });
      else addStep(trace, { kind: 'warning', label: `Checked row ${c.rowId} differs`, detail: `row ${c.rowId} was ${by}, and the published text differs: it gives ${k.check.documentExpr ?? ''} (H = ${quantityText(k.documentH_Jm2 ?? c.H_Jm2, 'J/m²', { round: 'down' })} here); ${k.documentUsed ? 'that is lower and is used' : 'the value as written is lower and is kept'}` });
    }
    for (const f of c.factorFromDocument ?? []) {
      addStep(trace, { kind: 'warning', label: `Checked factor differs (row ${c.rowId})`, detail: `${entryWords(f.key)} was checked against ${f.reference} by ${f.checkedBy} on ${f.checkedOn}, and the published text differs: it gives ${f.documentExpr ?? ''}; row ${c.rowId} is evaluated with both and the lower limit is kept` });
    }
    if (c.cap) addStep(trace, { kind: c.cap.conservative ? 'conservative' : 'row', label: `Cap on row ${c.rowId}`, detail: `the limit is not to exceed ${c.cap.E_Wm2} W/m² (Table 2.3 note)`, source: c.cap.source, confidence: c.cap.confidence });
    if (c.relaxed) addStep(trace, { kind: 'note', label: `Alternative reading of row ${c.rowId}`, detail: `older editions give ${c.relaxed.expr} J/m² here (10 W/m²); ${c.relaxed.used ? 'used: the row was checked with that reading' : c.check ? "not used: the row's check against the published document governs" : 'not used until the row is checked with that reading'}`, source: c.relaxed.source, confidence: 'from memory, uncertain' });
  }
  if (candidates.length > 1) {
    addStep(trace, {
      kind: 'note',
      label: 'Lowest applies',
      detail: `${candidates.length} rows apply (dual limits or an exact boundary); the lowest governs: ${governing.rowId} (${governing.effect})`,
      source: 'limit specification convention 2 and 3; EU Table 2.2 note a',
      confidence: 'read',
    });
  }
  addStep(trace, { kind: 'result', label: 'Limit H', detail: `governing row ${governing.rowId}`, value: fmt(H), unit: 'J/m²' });
  addStep(trace, { kind: 'result', label: 'Limit E', detail: `H / t = ${fmt(H)} / ${t.toString()}`, value: fmt(E), unit: 'W/m²' });
  addStep(trace, {
    kind: 'input',
    label: 'Limiting aperture',
    detail: `${governing.aperture.diameter_mm} mm (${governing.aperture.expr})${governing.aperture.conservativeApplied ? '; unverified aperture replaced by the stricter (smaller) one' : ''}`,
    source: governing.aperture.source,
    confidence: governing.aperture.confidence,
  });
  const apertureSizes = new Set(candidates.map((c) => c.aperture.diameter_mm));
  if (apertureSizes.size > 1) {
    addStep(trace, {
      kind: 'note',
      label: 'Apertures per row',
      detail: `the rows apply over different limiting apertures (${candidates.map((c) => `${c.rowId}: ${c.aperture.diameter_mm} mm`).join('; ')}); each row is compared with the exposure over its own aperture and the hazard distance and optical density take the largest result`,
      source: 'limit specification errata (apertures at an exact edge)',
      confidence: 'read',
    });
  }
  const Hr = limitReported(H);
  const Er = limitReported(E);
  addStep(trace, { kind: 'rounding', label: 'Reported', detail: 'limits are rounded DOWN to 3 significant figures (the safe direction)', value: `${Hr} J/m²; ${Er} W/m²` });
  if (conservativeReplacements.length) {
    addStep(trace, {
      kind: 'warning',
      label: 'Conservative mode',
      detail: `unverified entries replaced by the stricter value: ${conservativeReplacements.map(entryWords).join('; ')}`,
    });
  }

  return {
    ruleSet,
    ruleSetName: RULE_SET_NAME[ruleSet],
    tissue: q.tissue,
    wavelength_nm: q.wavelength_nm,
    duration_s: q.duration_s,
    sourceAngle_rad: q.sourceAngle_rad ?? 0,
    H_Jm2: recordString(H),
    E_Wm2: recordString(E),
    H_Jm2_reported: Hr,
    E_Wm2_reported: Er,
    governing,
    candidates,
    get factors(): Record<string, string> {
      return allFactors();
    },
    aperture: governing.aperture,
    conservativeReplacements,
    fromMemoryRows,
    trace,
  };
}
