/**
 * The one boundary convention of the tables (limit specification, convention 'boundary_values'):
 * every band and duration interval is half-open [lo, hi), and a value within 1e-9 (relative) of an
 * edge is ON that edge (published breakpoints such as 1.8e-5 s, and durations computed from them,
 * are not exact in binary). What "on an edge" means for each table:
 *  - limit rows: the rows on both sides apply and the lower limit governs (EU 2006/25/EC Table 2.2
 *    note a; core/limits/exposure-limit.ts);
 *  - factors and apertures: the interval that starts there; at the top edge of the last interval,
 *    the interval that ends there;
 *  - factor pieces on an exact edge are ALSO evaluated from below ((lo, hi], inIntervalFromBelow)
 *    and the lower limit kept (the same note a, applied to the factors);
 *  - the pulse rules' counting windows: the window that starts there (the last one holds its top).
 * Every file of core/limits places a value against a table interval through these functions only.
 */
import { Dec } from '../numeric/decimal.js';
import type { Interval } from './table-types.js';

const REL_EDGE = new Dec('1e-9');

/** The interval edges as decimals, built once per table interval (the tables are fixed). */
const edgeCache = new WeakMap<Interval, readonly [Dec, Dec]>();
function edges(iv: Interval): readonly [Dec, Dec] {
  let e = edgeCache.get(iv);
  // Stryker disable next-line ConditionalExpression: equivalent, building the edges again gives the same decimals (speed only)
  if (!e) {
    e = [new Dec(iv[0]), new Dec(iv[1])];
    edgeCache.set(iv, e);
  }
  return e;
}

/** Is x on the edge e (within 1e-9 relative)? */
export function onEdge(x: Dec, e: Dec): boolean {
  return x.minus(e).abs().lte(Dec.max(x.abs(), e.abs()).mul(REL_EDGE));
}

/**
 * Where x lies against [lo, hi): 'inside' (on lo counts as inside), 'edge' (on hi), or 'outside'.
 * topInclusive: hi is the end of the tables' whole range, so a value on it is inside.
 */
export function intervalPosition(x: Dec, iv: Interval, topInclusive = false): 'inside' | 'edge' | 'outside' {
  const [lo, hi] = edges(iv);
  if (onEdge(x, hi)) return topInclusive ? 'inside' : 'edge';
  if (onEdge(x, lo)) return 'inside';
  if (x.gt(lo) && x.lt(hi)) return 'inside';
  return 'outside';
}

/** x in [lo, hi) under the convention. */
export function inInterval(x: Dec, iv: Interval): boolean {
  return intervalPosition(x, iv) === 'inside';
}

/** x on the top edge hi of the interval. */
export function atTop(x: Dec, iv: Interval): boolean {
  return intervalPosition(x, iv) === 'edge';
}

/** x in (lo, hi] under the convention: the interval that ENDS at an edge x sits on (the lower side). */
export function inIntervalFromBelow(x: Dec, iv: Interval): boolean {
  const [lo, hi] = edges(iv);
  // Stryker disable next-line BooleanLiteral: equivalent on the data, pickPiece's second search accepts a piece on its top edge and the piece lists are one-dimensional and ascending (test/mutation/EQUIVALENT.md)
  if (onEdge(x, hi)) return true;
  // Stryker disable next-line ConditionalExpression,BooleanLiteral: equivalent on the data, at a lower edge the piece ending there comes first in the ascending piece list and is found either way (test/mutation/EQUIVALENT.md)
  if (onEdge(x, lo)) return false;
  return x.gt(lo) && x.lt(hi);
}

/** x in the closed [lo, hi] under the convention (inside, or on either edge). */
export function inClosedInterval(x: Dec, iv: Interval): boolean {
  return intervalPosition(x, iv, true) === 'inside';
}

/** Is x on one of the given edges (within 1e-9 relative)? */
export function onAnyEdge(x: Dec, edgeValues: Iterable<number>): boolean {
  const xn = x.toNumber();
  for (const e of edgeValues) {
    // plain-number quick reject first; the decimal test decides (speed, see npm run bench)
    // Stryker disable next-line EqualityOperator,ArithmeticOperator,MethodExpression: equivalent, the quick reject only skips work: any tolerance of it at least 1e-9 relative lets every point on the edge through to the exact decimal test
    if (Math.abs(xn - e) <= Math.max(Math.abs(xn), Math.abs(e)) * 1e-6 && onEdge(x, new Dec(e))) return true;
  }
  return false;
}
