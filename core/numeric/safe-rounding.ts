/**
 * The one place where the core rounds a number it REPORTS, always in the safe direction (owner's
 * rule; results contract core/model/results.ts): limits DOWN (a smaller limit is stricter); hazard
 * distances, exposure ratios and optical densities UP. Recorded values keep full precision
 * (recordString); display formatting of units is the formatter's job, not this file's.
 */
import { Dec, roundSig } from './decimal.js';

/** Significant figures of every reported limit, distance and ratio. */
export const REPORTED_FIGURES = 3;

/** An exposure limit (H or E) rounded DOWN to 3 significant figures. */
export function limitReported(x: Dec): string {
  return roundSig(x, REPORTED_FIGURES, 'down').toString();
}

/** A distance rounded UP to 3 significant figures; "0" stays "0". */
export function distanceReported(d: Dec): string {
  if (d.isZero()) return '0';
  return roundSig(d, REPORTED_FIGURES, 'up').toString();
}

/** An exposure / limit ratio (or a sum of them) rounded UP to 3 significant figures. */
export function ratioReported(x: Dec): string {
  return roundSig(x, REPORTED_FIGURES, 'up').toString();
}

/** An optical density rounded UP to one decimal place, never below 0. */
export function odReported(od: Dec): string {
  if (od.lte(0)) return '0';
  return od.toDecimalPlaces(1, Dec.ROUND_UP).toString();
}
