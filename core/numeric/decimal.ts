/**
 * The one Decimal constructor of Beamwarden. Every value that goes into a record is computed with it,
 * so a signed record recomputes to the same digits on any machine (ECMAScript leaves Math.pow/exp
 * implementation-approximated; decimal.js is deterministic). Never call the global Decimal.set:
 * a private clone keeps the configuration from leaking between modules.
 */
import DecimalBase from 'decimal.js';

export const Dec = DecimalBase.clone({
  precision: 40,
  rounding: DecimalBase.ROUND_HALF_EVEN,
  toExpNeg: -30,
  toExpPos: 30,
});
export type Dec = InstanceType<typeof Dec>;
export type DecInput = Dec | number | string;

export const ZERO = new Dec(0);
export const ONE = new Dec(1);
export const PI = Dec.acos(-1);

export function dec(x: DecInput): Dec {
  return x instanceof Dec ? x : new Dec(x);
}

/** x^y with exact handling of integer and negative exponents via decimal.js. */
export function pow(x: DecInput, y: DecInput): Dec {
  return dec(x).pow(dec(y));
}

export function log10(x: DecInput): Dec {
  return dec(x).log(10);
}

/**
 * Round to `sig` significant figures in the safe direction.
 * 'down' for limits (a smaller limit is stricter); 'up' for hazard distances and optical densities.
 */
export function roundSig(x: DecInput, sig: number, direction: 'up' | 'down'): Dec {
  const v = dec(x);
  return v.toSignificantDigits(sig, direction === 'up' ? Dec.ROUND_UP : Dec.ROUND_DOWN);
}

/** Round to a fixed number of decimal places in the safe direction. */
export function roundPlaces(x: DecInput, places: number, direction: 'up' | 'down'): Dec {
  return dec(x).toDecimalPlaces(places, direction === 'up' ? Dec.ROUND_UP : Dec.ROUND_DOWN);
}

/** Full-precision decimal string for records (20 significant digits, plain notation where short). */
export function recordString(x: Dec): string {
  return x.toSignificantDigits(20).toString();
}
