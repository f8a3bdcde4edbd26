/**
 * What the limit-table checks screen shows beside each open row or factor piece (issue 12): the
 * value it gives at a few sample points, computed here by the core, so the officer holding the
 * published document can compare numbers as well as formulas. And the test a 'differs' value must
 * pass before it is signed: it is read by the tables' own expression grammar, uses only the
 * variables the tables define, and gives a positive finite value at every sample point.
 *
 * The entries themselves come from openPoints() (one enumerator of the open entries).
 */
import { Dec } from '../numeric/decimal.js';
import { InputError } from '../errors.js';
import { numberText, quantityText } from '../units/display.js';
import { openPoints, type CheckableEntry } from './open-points.js';
import { ruleSetTable, type RULE_SET_IDS } from './rule-sets.js';
import { condition, evaluate, variablesOf, type Vars } from './expression.js';
import { evaluateFactors, FACTOR_ORDER } from './factors.js';
import type { RuleSetId } from '../model/inputs.js';
import type { Interval } from './table-types.js';

export type { CheckableEntry } from './open-points.js';

/** Every row and factor piece of a rule set not read in a published source, in table order. */
export function checkableEntries(ruleSet: (typeof RULE_SET_IDS)[number]): CheckableEntry[] {
  return openPoints(ruleSet).flatMap((p) => (p.entry ? [p.entry] : []));
}

export interface SamplePoint {
  readonly wavelength_nm: string;
  readonly duration_s: string;
  /** Source angle, mrad (only where the entry depends on it). */
  readonly alpha_mrad?: string;
  /** The entry as written in the table, in its own quantity and unit (decimal string). */
  readonly asWritten: string;
  /** The stricter alternative used until the entry is checked, where there is one. */
  readonly stricter?: string;
  /** The published value typed by the officer ('differs'), where given. */
  readonly typed?: string;
}

const ALPHAS = ['1', '3', '10', '50', '200'] as const;
const mid = (iv: Interval): Dec => new Dec(iv[0]).plus(iv[1]).div(2);
const geoMid = (iv: Interval): Dec => (iv[0] > 0 ? new Dec(iv[0]).mul(iv[1]).sqrt() : new Dec(iv[1]).div(2));

/**
 * Three points: the start of the entry's band at its shortest duration, the middle of the band at
 * the middle duration (geometric; half the end for a range from 0 s), the middle of the band at the
 * longest duration. Without a band: 550 nm; without durations: 1 ms, 1 s and 100 s.
 */
function points(e: CheckableEntry): Array<{ lambda: Dec; t: Dec }> {
  const b = e.band_nm;
  const ts = e.t_s;
  const lam = (i: number): Dec => (b ? (i === 0 ? new Dec(Math.max(b[0], 180)) : mid([Math.max(b[0], 180), Math.min(b[1], 1e6)])) : new Dec(550));
  const tt = (i: number): Dec => (ts ? (i === 0 ? new Dec(ts[0]) : i === 1 ? geoMid(ts) : new Dec(ts[1])) : new Dec([1e-3, 1, 100][i] as number));
  return [0, 1, 2].map((i) => ({ lambda: lam(i), t: tt(i) }));
}

/** Variables at a point with the factors as written (no stricter replacement: the entry is shown as the table gives it). */
function varsAt(ruleSet: RuleSetId, lambda: Dec, t: Dec, alpha: Dec): Readonly<Record<string, Dec | undefined>> {
  return evaluateFactors(ruleSetTable(ruleSet), lambda, t, alpha, { conservative: false }).vars;
}

function alphaFor(ruleSet: RuleSetId, e: CheckableEntry, lambda: Dec, t: Dec): Dec | undefined {
  const uses = e.condition !== undefined || variablesOf(e.expr).some((v) => v === 'CE' || v === 'alpha' || v === 'T2');
  if (!uses) return undefined;
  for (const a of ALPHAS) {
    const vars = varsAt(ruleSet, lambda, t, new Dec(a));
    if (e.condition === undefined || condition(e.condition, vars)) return new Dec(a);
  }
  return new Dec(ALPHAS[0]);
}

const UNREADABLE = 'cannot be read: write it as in the table, for example 18*t^0.75*CE (numbers, + - * / ^, parentheses and the table’s symbols)';

/**
 * A typed document value that cannot be used, refused as an input error naming the check's field
 * (the record's documentExpr), never with the expression reader's internal message; `words` say why
 * in the officer's terms.
 */
export class DocumentValueError extends InputError {
  constructor(
    readonly words: string,
    expr: string,
  ) {
    super('unparseable', 'documentExpr', expr, 'numbers, + - * / ^, parentheses and the table’s symbols that have a value over the entry’s band and durations', words);
  }
}

function namesIn(documentExpr: string): string[] {
  try {
    return variablesOf(documentExpr);
  } catch {
    throw new DocumentValueError(UNREADABLE, documentExpr);
  }
}

/** The typed value at one point; a symbol without a value there (C_C below 700 nm, C2 outside 302.5-315 nm) is refused. */
function typedAt(documentExpr: string, vars: Vars, lambda: Dec, t: Dec): Dec {
  const missing = namesIn(documentExpr).filter((n) => vars[n] === undefined);
  if (missing.length > 0) {
    throw new DocumentValueError(`uses ${missing.join(', ')}, which ${missing.length > 1 ? 'have' : 'has'} no value at ${quantityText(lambda, 'nm')} and ${quantityText(t, 's')}`, documentExpr);
  }
  return evaluate(documentExpr, vars);
}

/**
 * The entry's value at three sample points: as written, the stricter alternative, and a typed
 * document value (refused with DocumentValueError where it cannot be computed).
 */
export function entrySamples(ruleSet: RuleSetId, e: CheckableEntry, documentExpr?: string): SamplePoint[] {
  return points(e).map(({ lambda, t }) => {
    const alpha = alphaFor(ruleSet, e, lambda, t);
    const vars = varsAt(ruleSet, lambda, t, alpha ?? new Dec(0));
    return {
      wavelength_nm: lambda.toString(),
      duration_s: t.toString(),
      ...(alpha !== undefined ? { alpha_mrad: alpha.toString() } : {}),
      asWritten: evaluate(e.expr, vars).toString(),
      ...(e.stricterAlt !== undefined ? { stricter: evaluate(e.stricterAlt, vars).toString() } : {}),
      ...(documentExpr !== undefined ? { typed: typedAt(documentExpr, vars, lambda, t).toString() } : {}),
    };
  });
}

/** Names an expression typed by the officer may use: the tables' variables and factors. */
export const DOCUMENT_VARIABLES: readonly string[] = ['t', 'lambda', 'alpha', ...FACTOR_ORDER];

/**
 * Why a typed document value cannot be used, in officer words; null when it can. The value is read
 * with the tables' grammar (numbers in e-notation, + - * / ^, parentheses, the tables' variables).
 */
export function documentValueProblem(ruleSet: RuleSetId, e: CheckableEntry, documentExpr: string): string | null {
  try {
    const unknown = namesIn(documentExpr).filter((n) => !DOCUMENT_VARIABLES.includes(n));
    if (unknown.length > 0) return `uses ${unknown.join(', ')}, which the tables do not define (allowed: ${DOCUMENT_VARIABLES.join(', ')})`;
    for (const p of entrySamples(ruleSet, e, documentExpr)) {
      const d = new Dec(p.typed ?? 'NaN');
      if (!d.isFinite() || d.lte(0)) {
        return `gives ${d.isFinite() ? numberText(d) : 'no finite number'} at ${quantityText(p.wavelength_nm, 'nm')} and ${quantityText(p.duration_s, 's')}; a limit or factor must be a positive number`;
      }
    }
  } catch (err) {
    if (err instanceof DocumentValueError) return err.words;
    throw err;
  }
  return null;
}
