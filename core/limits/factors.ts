/**
 * Correction factors and parameters (C_A, C_B, C_C, C_E, T1, T2, alpha_max, gamma_p, C1, C2, T_i /
 * T_min), defined ONCE per rule set in the tables and evaluated here at (lambda, t, alpha).
 * Pieces are half-open [lo, hi); at the top edge of the last piece the piece ending there is used
 * (the one boundary convention of the tables, ./intervals.ts).
 */
import { Dec } from '../numeric/decimal.js';
import { condition, evaluate, variablesOf, type Vars } from './expression.js';
import { InputError } from '../errors.js';
import type { FactorDef, FactorPiece, RuleSetTable } from './table-types.js';
import { atTop, inInterval, inIntervalFromBelow, onAnyEdge } from './intervals.js';
import type { LimitSettings, RowCheck } from '../model/inputs.js';

export interface FactorValue {
  readonly name: string;
  readonly value: Dec;
  readonly expr: string;
  readonly source: string;
  readonly confidence: string;
  /** True where conservative mode replaced a remembered value by its stricter alternative. */
  readonly conservativeApplied: boolean;
  readonly remembered?: Dec;
  /** Set where the officer's 'differs' check replaced the value as written by the document's (see evaluateFactors' useDocument). */
  readonly fromDocument?: RowCheck;
}


/**
 * Which piece to use where the point sits exactly on the edge between two pieces: 'upper' (the
 * piece starting there, the tables' closed-open convention) or 'lower' (the piece ending there).
 * The limit engine evaluates both at an exact edge and keeps the lower limit (EU Table 2.2 note a).
 */
export type EdgeSide = 'upper' | 'lower';

function pickPiece(def: FactorDef, vars: Vars, side: EdgeSide = 'upper'): FactorPiece | undefined {
  const pieces = def.pieces ?? [];
  const lambda = vars['lambda'] as Dec;
  const t = vars['t'] as Dec;
  const within = side === 'upper' ? inInterval : inIntervalFromBelow;
  const ok = (p: FactorPiece, edge: boolean): boolean => {
    if (p.band_nm && !(within(lambda, p.band_nm) || (edge && (inInterval(lambda, p.band_nm) || atTop(lambda, p.band_nm))))) return false;
    if (p.t_s && !(within(t, p.t_s) || (edge && (inInterval(t, p.t_s) || atTop(t, p.t_s))))) return false;
    if (p.alpha_mrad && !condition(p.alpha_mrad, vars)) return false;
    // Stryker disable next-line BooleanLiteral: equivalent on the data, no factor piece of either table carries a 'when' condition (the conditions sit on the limit rows); see EQUIVALENT.md
    if (p.when && !condition(p.when, vars)) return false;
    return true;
  };
  return pieces.find((p) => ok(p, false)) ?? pieces.find((p) => ok(p, true));
}

export function conservativeOn(settings: LimitSettings | undefined, key: string, pieceKey?: string): boolean {
  if (settings?.conservative === false) return false;
  if (checkOf(settings, key) !== undefined || (pieceKey !== undefined && checkOf(settings, pieceKey) !== undefined)) return false;
  // Stryker disable next-line ArrayDeclaration: equivalent, a list holding one placeholder entry includes no table key either
  return !(settings?.verifiedRows ?? []).includes(key);
}

/** The officer's signed check of an entry (row id or factor key), if the settings carry one. */
export function checkOf(settings: LimitSettings | undefined, key: string): RowCheck | undefined {
  return settings?.rowChecks?.find((c) => c.key === key);
}

/**
 * The document's value of a 'differs' check, evaluated here. A symbol the value uses that has no value
 * at this wavelength and duration (C2 or T1 outside 302.5-315 nm, C_C below 700 nm) is refused, naming
 * the check's field, as validation refuses a value it cannot read: a limit is never computed without
 * the officer's published value (SAFETY.md "Checks of the limit tables").
 */
export function evaluateDocumentValue(settings: LimitSettings | undefined, key: string, expr: string, vars: Vars): Dec {
  const missing = variablesOf(expr).filter((v) => vars[v] === undefined);
  if (missing.length > 0) {
    const i = (settings?.rowChecks ?? []).findIndex((c) => c.key === key);
    const at = `${String(vars['lambda'])} nm, ${String(vars['t'])} s`;
    throw new InputError('unparseable', `settings.rowChecks[${i}].documentExpr`, expr, `a value written with the symbols defined here: ${missing.join(', ')} has no value at ${at}`);
  }
  return evaluate(expr, vars);
}

/** The document's value of a 'differs' check, where one was typed. */
export function documentExprOf(settings: LimitSettings | undefined, key: string): { check: RowCheck; expr: string } | undefined {
  const c = checkOf(settings, key);
  return c?.verdict === 'differs' && c.documentExpr !== undefined ? { check: c, expr: c.documentExpr } : undefined;
}

const span = (iv: readonly [number, number], unit: string): string => `${iv[0]}-${iv[1]} ${unit}`;

/**
 * The key a check of one factor piece is recorded under: the factor's name and the piece's own
 * conditions (band, duration, source size, condition), so it names the same piece in any build of
 * the same table. A factor without pieces is 'factor:<name>'.
 */
export function factorPieceKey(name: string, p?: FactorPiece): string {
  if (!p) return `factor:${name}`;
  const parts = [p.band_nm && span(p.band_nm, 'nm'), p.t_s && span(p.t_s, 's'), p.alpha_mrad, p.when].filter((x): x is string => typeof x === 'string' && x !== '');
  return `factor:${name}[${parts.join('; ')}]`;
}

/** A check key in words: defined once with the other keys in words (core/model/input-words.ts). */
export { entryWords } from '../model/input-words.js';

/** True where the settings carry a 'differs' check with a document value for any factor. */
export function hasFactorDocumentValues(settings: LimitSettings | undefined): boolean {
  // Stryker disable next-line LogicalOperator: equivalent, a wider test only runs the document pass more often, and that pass finds a document value only through documentExprOf (a 'differs' check with a value under a factor key), so nothing changes
  return (settings?.rowChecks ?? []).some((c) => c.key.startsWith('factor:') && c.verdict === 'differs' && c.documentExpr !== undefined);
}

/** Evaluate one factor; undefined where the factor is not defined at this wavelength/time. */
export function evalFactor(
  table: RuleSetTable,
  name: string,
  vars: Vars,
  settings: LimitSettings | undefined,
  side: EdgeSide = 'upper',
  // Stryker disable next-line BooleanLiteral: equivalent, evaluateFactors always passes it, and the one other caller (core/classes/aels.ts) passes no settings, so there is no check to read
  useDocument = false,
): FactorValue | undefined {
  const def = table.factors[name];
  if (!def) return undefined;
  const source = def.source ?? '';
  // The document's value of a 'differs' check: evaluated in a second factor set only; the limit
  // engine keeps, row by row, the lower of the two limits (exposure-limit.ts), never the higher.
  const fromDocument = (key: string, base: Omit<FactorValue, 'value' | 'expr' | 'conservativeApplied'>): FactorValue | undefined => {
    const d = useDocument ? documentExprOf(settings, key) : undefined;
    // Stryker disable next-line BooleanLiteral: equivalent, a document value is read only for its value, name and check (exposure-limit.ts, pulse-rules.ts pulseTimingChecks); the replaced-entry list and the trace read the flag of the table's own factor set
    return d ? { ...base, value: evaluateDocumentValue(settings, key, d.expr, vars), expr: d.expr, conservativeApplied: false, fromDocument: d.check } : undefined;
  };
  if (def.value !== undefined) {
    const base = { name, source, confidence: def.confidence ?? '' };
    return fromDocument(factorPieceKey(name), base) ?? { ...base, value: new Dec(def.value), expr: String(def.value), conservativeApplied: false };
  }
  if (def.pieces) {
    const p = pickPiece(def, vars, side);
    if (!p) return undefined;
    const pieceKey = factorPieceKey(name, p);
    const doc = fromDocument(pieceKey, { name, source: p.source ?? source, confidence: p.confidence ?? def.confidence ?? '' });
    if (doc) return doc;
    const v = evaluate(p.expr, vars);
    if (p.conservative_alt && conservativeOn(settings, `factor:${name}`, pieceKey)) {
      const alt = evaluate(p.conservative_alt, vars);
      // Stryker disable next-line ConditionalExpression: equivalent on the data, the only factor piece with a conservative alternative (icnirp2013 C_C over 1200-1400 nm: 8 against 8 + 10^(0.04 (lambda - 1250))) is always lower
      if (alt.lt(v)) {
        return { name, value: alt, expr: p.conservative_alt, source: p.source ?? source, confidence: p.confidence ?? def.confidence ?? '', conservativeApplied: true, remembered: v };
      }
    }
    return { name, value: v, expr: p.expr, source: p.source ?? source, confidence: p.confidence ?? def.confidence ?? '', conservativeApplied: false };
  }
  if (def.expr) {
    const lambda = vars['lambda'] as Dec;
    if (def.band_nm && !(inInterval(lambda, def.band_nm) || atTop(lambda, def.band_nm))) return undefined;
    const doc = fromDocument(factorPieceKey(name), { name, source, confidence: def.confidence ?? '' });
    if (doc) return doc;
    return { name, value: evaluate(def.expr, vars), expr: def.expr, source, confidence: def.confidence ?? '', conservativeApplied: false };
  }
  return undefined;
}

/** Order matters: later factors use earlier ones (C_E needs alpha_min and alpha_max). */
export const FACTOR_ORDER = ['alpha_min', 'alpha_max', 'CA', 'CB', 'CC', 'CE', 'T2', 'T1', 'C1', 'C2', 'gamma_p', 'T1_vis', 'T_i', 'T_min'] as const;

export interface FactorSet {
  /** Variables for expressions; each factor is evaluated on first use (see evaluateFactors). */
  readonly vars: Record<string, Dec | undefined>;
  /** Every factor defined at this point, in FACTOR_ORDER (evaluates those not yet used). */
  readonly used: Map<string, FactorValue>;
  /** One factor, evaluated on first use; undefined where it is not defined at this point. */
  get(name: string): FactorValue | undefined;
}

/**
 * The factors at (lambda nm, t s, alpha mrad). Returns the variables map for expressions and the
 * factor details for the trace. Factors are evaluated lazily, when an expression, a condition or
 * the caller first asks for them: a non-integer power in 40-digit decimals is slow, and most rows
 * use two or three of the twelve factors (speed, see npm run bench). The values are the same as an
 * eager evaluation in FACTOR_ORDER.
 */
export function evaluateFactors(
  table: RuleSetTable,
  lambda: Dec,
  t: Dec,
  alpha: Dec,
  settings: LimitSettings | undefined,
  side: EdgeSide = 'upper',
  useDocument = false,
): FactorSet {
  const vars: Record<string, Dec | undefined> = { lambda, t, alpha };
  const cache = new Map<string, FactorValue | null>();
  const get = (name: string): FactorValue | undefined => {
    let f = cache.get(name);
    // Stryker disable next-line ConditionalExpression: equivalent, the factor evaluated again on every read has the same value (speed only)
    if (f === undefined) {
      f = evalFactor(table, name, vars, settings, side, useDocument) ?? null;
      cache.set(name, f);
    }
    return f ?? undefined;
  };
  for (const name of FACTOR_ORDER) {
    // Stryker disable next-line BooleanLiteral: equivalent, no reader enumerates the variables map (expressions, conditions and substitute read each name directly)
    Object.defineProperty(vars, name, { enumerable: true, get: () => get(name)?.value });
  }
  return {
    vars,
    get,
    get used(): Map<string, FactorValue> {
      const all = new Map<string, FactorValue>();
      for (const name of FACTOR_ORDER) {
        const f = get(name);
        if (f) all.set(name, f);
      }
      return all;
    },
  };
}

const edgeCache = new WeakMap<RuleSetTable, { lambda: Set<number>; t: Set<number> }>();

/**
 * Is (lambda, t) on an inner edge between factor pieces (within 1e-9 relative, ./intervals.ts) (where the two sides can give
 * different values, e.g. C_C at 1200 nm: 10^0.9 = 7.94 below, 8 above)?
 */
export function onFactorEdge(table: RuleSetTable, lambda: Dec, t: Dec): boolean {
  let e = edgeCache.get(table);
  // Stryker disable next-line ConditionalExpression: equivalent, the edge sets built again are the same (speed only)
  if (!e) {
    e = { lambda: new Set(), t: new Set() };
    for (const def of Object.values(table.factors)) {
      for (const p of def.pieces ?? []) {
        if (p.band_nm) p.band_nm.forEach((x) => e?.lambda.add(x));
        // Stryker disable next-line ArrowFunction: equivalent on the data, the pieces with durations (gamma_p, alpha_max) are continuous at their edges, so the piece ending at a duration edge never gives a lower value
        if (p.t_s) p.t_s.forEach((x) => e?.t.add(x));
      }
    }
    edgeCache.set(table, e);
  }
  return onAnyEdge(lambda, e.lambda) || onAnyEdge(t, e.t);
}
