/**
 * Limiting apertures by tissue, band and duration (limit specification sections 4.5 and 5.5).
 * Exposure is averaged over this aperture, not over the beam: a beam smaller than the aperture is
 * averaged over the aperture. Rows marked uncertain use their stricter alternative (a smaller
 * aperture gives a higher averaged exposure) in conservative mode.
 */
import { Dec } from '../numeric/decimal.js';
import type { LimitSettings, RuleSetId, Tissue } from '../model/inputs.js';
import { evaluate } from './expression.js';
import { conservativeOn } from './factors.js';
import { ruleSetTable } from './rule-sets.js';
import { inClosedInterval, inInterval } from './intervals.js';
import type { ApertureRow } from './table-types.js';

export interface ApertureResult {
  /** Diameter in metres (decimal string). */
  readonly diameter_m: string;
  readonly diameter_mm: string;
  readonly expr: string;
  readonly source: string;
  readonly confidence: string;
  readonly conservativeApplied: boolean;
  readonly key: string;
}

export function apertureKey(tissue: Tissue, row: ApertureRow): string {
  return `aperture:${tissue}:${row.band_nm[0]}-${row.band_nm[1]}:${row.t_s[0]}-${row.t_s[1]}`;
}

/** The stretch of a limit row the aperture must belong to (its band and duration range). */
export interface ApertureScope {
  readonly band_nm: readonly [number, number];
  readonly t_s: readonly [number, number];
}

const clamp = (iv: readonly [number, number], x: Dec): Dec => Dec.min(Dec.max(x, new Dec(iv[0])), new Dec(iv[1]));
/** Do the two intervals share a stretch of positive length whose closure holds x? */
function sharesStretchAt(a: readonly [number, number], b: readonly [number, number], x: Dec): boolean {
  const lo = Math.max(a[0], b[0]);
  const hi = Math.min(a[1], b[1]);
  return lo < hi && inClosedInterval(x, [lo, hi]);
}

/**
 * The limiting aperture for tissue at wavelength (nm) and duration (s).
 * With a scope (the band and duration range of the limit row being evaluated), the aperture is the
 * one of that row's side of any edge: at exactly 1400 nm the 1400-1500 nm row is averaged over the
 * 1400 nm-and-above aperture, the 1050-1400 nm row over 7 mm (limit specification errata: each
 * candidate row over its own aperture). Where the point still touches two aperture rows inside the
 * scope (an aperture edge inside the row, e.g. 0.35 s in the ultraviolet), the smaller aperture is
 * used: a smaller aperture never lowers the averaged exposure (ours, the safe side).
 * Without a scope: the row holding the point (closed-open, ./intervals.ts); on the top edge of the
 * tables the smallest of the rows touching the point.
 */
export function limitingAperture(
  ruleSet: RuleSetId,
  tissue: Tissue,
  wavelength_nm: number | Dec,
  duration_s: number | Dec,
  settings?: LimitSettings,
  scope?: ApertureScope,
): ApertureResult {
  const table = ruleSetTable(ruleSet);
  const rows = table.apertures[tissue];
  let lambda = new Dec(wavelength_nm);
  let t = new Dec(duration_s);
  let pool: readonly ApertureRow[];
  if (scope) {
    // the limit row applies within a relative 1e-9 of its edges: take the point inside it
    lambda = clamp(scope.band_nm, lambda);
    t = clamp(scope.t_s, t);
    pool = rows.filter((r) => sharesStretchAt(r.band_nm, scope.band_nm, lambda) && sharesStretchAt(r.t_s, scope.t_s, t));
  } else {
    // Stryker disable next-line ArrowFunction: the no-scope path serves the table tests only; every evaluation passes the limit row's scope (test/mutation/EQUIVALENT.md)
    const inside = rows.find((r) => inInterval(lambda, r.band_nm) && inInterval(t, r.t_s));
    // Stryker disable next-line MethodExpression,ArrowFunction,ConditionalExpression,LogicalOperator: the closed-interval fallback of the no-scope path, which no evaluation reaches (test/mutation/EQUIVALENT.md)
    pool = inside ? [inside] : rows.filter((r) => inClosedInterval(lambda, r.band_nm) && inClosedInterval(t, r.t_s));
  }
  if (pool.length === 0) throw new Error(`no aperture row for ${tissue} at ${lambda.toString()} nm, ${t.toString()} s`);
  const sized = pool.map((r) => apertureOf(r, tissue, t, settings));
  let best = sized[0] as ApertureResult;
  for (const a of sized) if (new Dec(a.diameter_m).lt(best.diameter_m)) best = a;
  return best;
}

function apertureOf(row: ApertureRow, tissue: Tissue, t: Dec, settings: LimitSettings | undefined): ApertureResult {
  const key = apertureKey(tissue, row);
  let mm = evaluate(row.diameter_mm, { t });
  let expr = row.diameter_mm;
  let conservativeApplied = false;
  if (row.conservative_alt && conservativeOn(settings, key)) {
    // Stryker disable next-line ObjectLiteral: data-equivalent: every aperture conservative_alt in both tables is the constant 1 mm (test/mutation/EQUIVALENT.md)
    const alt = evaluate(row.conservative_alt, { t });
    // Stryker disable next-line ConditionalExpression: with alt equal to the row's value the block replaces nothing (test/mutation/EQUIVALENT.md)
    if (!alt.eq(mm)) {
      // A smaller aperture never lowers the averaged exposure: stricter for the officer.
      conservativeApplied = alt.lt(mm);
      // Stryker disable next-line ConditionalExpression: data-equivalent: the 1 mm alternatives are never larger than their rows' values (test/mutation/EQUIVALENT.md)
      if (alt.lt(mm)) {
        mm = alt;
        expr = row.conservative_alt;
      }
    }
  }
  return {
    diameter_m: mm.div(1000).toString(),
    diameter_mm: mm.toSignificantDigits(6).toString(),
    expr,
    source: row.source,
    confidence: row.confidence,
    conservativeApplied,
    key,
  };
}
