/**
 * Number formatting shared by the part-2 modules: full-precision record strings, 6-figure trace
 * text, and the safe-direction rounding of reported values (distances, optical densities and scale
 * numbers UP; limits DOWN), as the result contract (core/model/results.ts) requires.
 */
import { Dec, recordString, roundSig } from '../numeric/decimal.js';

/** Six significant figures for the trace; e-notation for very small or large magnitudes. */
export function fmt(d: Dec): string {
  const r = d.toSignificantDigits(6);
  const a = r.abs();
  return !a.isZero() && (a.lt('1e-3') || a.gte('1e7')) ? r.toExponential().replace('e+', 'e') : r.toString();
}

/** Full-precision decimal string (20 significant digits) for records. */
export function rec(d: Dec): string {
  return recordString(d);
}

/** A distance rounded UP to 3 significant figures; "0" stays "0". */
export function distanceReported(d: Dec): string {
  if (d.isZero()) return '0';
  return roundSig(d, 3, 'up').toString();
}

/** An optical density rounded UP to one decimal place, never below 0. */
export function odReported(od: Dec): string {
  if (od.lte(0)) return '0';
  return od.toDecimalPlaces(1, Dec.ROUND_UP).toString();
}

/** Largest of a non-empty list. */
export function maxOf(xs: readonly Dec[]): Dec {
  return xs.reduce((m, x) => (x.gt(m) ? x : m));
}
