/**
 * Number formatting shared by the part-2 modules: full-precision record strings, 6-figure trace
 * text, and the safe-direction rounding of reported values (distances, optical densities and scale
 * numbers UP; limits DOWN), as the result contract (core/model/results.ts) requires.
 */
import { Dec, recordString } from '../numeric/decimal.js';

export { distanceReported, odReported } from '../numeric/safe-rounding.js';

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

/** Largest of a non-empty list. */
export function maxOf(xs: readonly Dec[]): Dec {
  return xs.reduce((m, x) => (x.gt(m) ? x : m));
}

/**
 * log10(x) for DISPLAY-ONLY figures (an unrounded scale number printed in a note; never a
 * recorded number or a decision). Deterministic and cheap: the decimal exponent gives the integer
 * part; 30 binary digits of the fraction come from repeated squaring of the mantissa in IEEE
 * doubles (each squaring doubles the log; a value >= 10 is a one-bit). Only +, *, / of doubles are
 * used, which IEEE 754 rounds identically on every machine (Math.log10 is not so specified).
 * Truncated; accurate to about 1e-8, far below the 6 digits shown.
 */
export function displayLog10(x: Dec): Dec {
  if (!x.gt(0)) throw new Error('internal: log10 of a non-positive value');
  const e = x.e; // x = m * 10^e with 1 <= m < 10
  let m = x.div(tenTo(e)).toNumber();
  let frac = 0;
  let bit = 0.5;
  for (let i = 0; i < 30; i++) {
    m = m * m;
    if (m >= 10) {
      frac += bit;
      m = m / 10;
    }
    bit /= 2;
  }
  return new Dec(e).plus(new Dec(frac)).toSignificantDigits(12, Dec.ROUND_DOWN);
}

/** 10^k for an integer k, exactly (parsed, not multiplied). */
export function tenTo(k: number): Dec {
  return new Dec(`1e${k}`);
}

/** x^(1/4) as two square roots (exact-rounded, cheaper than a general power). */
export function fourthRoot(x: Dec): Dec {
  return x.sqrt().sqrt();
}

/**
 * log10 of a ratio for a RECORDED optical density: computed in a 26-digit context (recorded with
 * 20 significant digits), deterministic like every decimal operation, and cheaper than the 40-digit
 * default for the logarithm, the costliest step of an evaluation.
 */
// Stryker disable next-line ObjectLiteral: without the options the logarithm runs at the 40-digit default: slower, and the same 20 recorded digits except where digits 21-26 sit on a rounding tie (test/mutation/EQUIVALENT.md)
const Dec26 = Dec.clone({ precision: 26, rounding: Dec.ROUND_HALF_EVEN });
export function log10Record(x: Dec): Dec {
  return new Dec(new Dec26(x.toString()).log(10).toString());
}
