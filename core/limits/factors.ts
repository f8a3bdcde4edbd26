/**
 * Correction factors and parameters (C_A, C_B, C_C, C_E, T1, T2, alpha_max, gamma_p, C1, C2, T_i /
 * T_min), defined ONCE per rule set in the tables and evaluated here at (lambda, t, alpha).
 * Pieces are half-open [lo, hi); at the top edge of the last piece the piece ending there is used
 * (the one boundary convention, core/limits/intervals.ts).
 */
import { Dec } from '../numeric/decimal.js';
import { condition, evaluate, type Vars } from './expression.js';
import { atTop, inInterval } from './intervals.js';
import type { FactorDef, FactorPiece, RuleSetTable } from './table-types.js';
import type { LimitSettings } from '../model/inputs.js';

export interface FactorValue {
  readonly name: string;
  readonly value: Dec;
  readonly expr: string;
  readonly source: string;
  readonly confidence: string;
  /** True where conservative mode replaced a remembered value by its stricter alternative. */
  readonly conservativeApplied: boolean;
  readonly remembered?: Dec;
}

function pickPiece(def: FactorDef, vars: Vars): FactorPiece | undefined {
  const pieces = def.pieces ?? [];
  const lambda = vars['lambda'] as Dec;
  const t = vars['t'] as Dec;
  const ok = (p: FactorPiece, edge: boolean): boolean => {
    if (p.band_nm && !(inInterval(lambda, p.band_nm) || (edge && atTop(lambda, p.band_nm)))) return false;
    if (p.t_s && !(inInterval(t, p.t_s) || (edge && atTop(t, p.t_s)))) return false;
    if (p.alpha_mrad && !condition(p.alpha_mrad, vars)) return false;
    if (p.when && !condition(p.when, vars)) return false;
    return true;
  };
  return pieces.find((p) => ok(p, false)) ?? pieces.find((p) => ok(p, true));
}

export function conservativeOn(settings: LimitSettings | undefined, key: string): boolean {
  if (settings?.conservative === false) return false;
  return !(settings?.verifiedRows ?? []).includes(key);
}

/** Evaluate one factor; undefined where the factor is not defined at this wavelength/time. */
export function evalFactor(
  table: RuleSetTable,
  name: string,
  vars: Vars,
  settings: LimitSettings | undefined,
): FactorValue | undefined {
  const def = table.factors[name];
  if (!def) return undefined;
  const source = def.source ?? '';
  if (def.value !== undefined) {
    return { name, value: new Dec(def.value), expr: String(def.value), source, confidence: def.confidence ?? '', conservativeApplied: false };
  }
  if (def.pieces) {
    const p = pickPiece(def, vars);
    if (!p) return undefined;
    const v = evaluate(p.expr, vars);
    if (p.conservative_alt && conservativeOn(settings, `factor:${name}`)) {
      const alt = evaluate(p.conservative_alt, vars);
      if (alt.lt(v)) {
        return { name, value: alt, expr: p.conservative_alt, source: p.source ?? source, confidence: p.confidence ?? def.confidence ?? '', conservativeApplied: true, remembered: v };
      }
    }
    return { name, value: v, expr: p.expr, source: p.source ?? source, confidence: p.confidence ?? def.confidence ?? '', conservativeApplied: false };
  }
  if (def.expr) {
    const lambda = vars['lambda'] as Dec;
    if (def.band_nm && !(inInterval(lambda, def.band_nm) || atTop(lambda, def.band_nm))) return undefined;
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
): FactorSet {
  const vars: Record<string, Dec | undefined> = { lambda, t, alpha };
  const cache = new Map<string, FactorValue | null>();
  const get = (name: string): FactorValue | undefined => {
    let f = cache.get(name);
    if (f === undefined) {
      f = evalFactor(table, name, vars, settings) ?? null;
      cache.set(name, f);
    }
    return f ?? undefined;
  };
  for (const name of FACTOR_ORDER) {
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
