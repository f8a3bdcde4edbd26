/**
 * Typed input error: names the field, the value received and the valid range, so the UI, the IPC
 * boundary and the CLI can all show the officer exactly what to fix.
 */
export type InputErrorCode =
  | 'out_of_range'
  | 'not_positive'
  | 'not_finite'
  | 'unknown_unit'
  | 'unparseable'
  | 'missing'
  | 'invalid_choice'
  | 'not_covered';

export class InputError extends Error {
  override readonly name = 'InputError';
  constructor(
    readonly code: InputErrorCode,
    readonly field: string,
    readonly value: unknown,
    readonly validRange: string,
    detail?: string,
  ) {
    super(
      `${field}: ${detail ?? describe(code)} (got ${formatValue(value)}; valid: ${validRange})`,
    );
  }
}

function describe(code: InputErrorCode): string {
  switch (code) {
    case 'out_of_range':
      return 'value outside the range the rule set covers';
    case 'not_positive':
      return 'must be greater than zero';
    case 'not_finite':
      return 'must be a finite number';
    case 'unknown_unit':
      return 'unknown unit';
    case 'unparseable':
      return 'cannot read this value';
    case 'missing':
      return 'required';
    case 'invalid_choice':
      return 'not one of the allowed choices';
    case 'not_covered':
      return 'no limit row covers this case';
  }
}

function formatValue(v: unknown): string {
  if (typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'number') return Number.isNaN(v) ? 'NaN' : String(v);
  if (v === undefined) return 'nothing';
  try {
    return JSON.stringify(v);
  } catch {
    return String(v);
  }
}

/** Throw unless x is a finite number within [lo, hi] (inclusive); returns x for chaining. */
export function requireInRange(field: string, x: unknown, lo: number, hi: number, unit: string): number {
  if (typeof x !== 'number' || x === undefined) throw new InputError('missing', field, x, `${lo} to ${hi} ${unit}`);
  if (!Number.isFinite(x)) throw new InputError('not_finite', field, x, `${lo} to ${hi} ${unit}`);
  if (x < lo || x > hi) throw new InputError('out_of_range', field, x, `${lo} to ${hi} ${unit}`);
  return x;
}

/** Throw unless x is a finite number > 0. */
export function requirePositive(field: string, x: unknown, unit: string): number {
  if (typeof x !== 'number') throw new InputError('missing', field, x, `a number > 0 ${unit}`);
  if (!Number.isFinite(x)) throw new InputError('not_finite', field, x, `a number > 0 ${unit}`);
  if (x <= 0) throw new InputError('not_positive', field, x, `a number > 0 ${unit}`);
  return x;
}

/** Throw unless x is a finite number >= 0. */
export function requireNonNegative(field: string, x: unknown, unit: string): number {
  if (typeof x !== 'number') throw new InputError('missing', field, x, `a number >= 0 ${unit}`);
  if (!Number.isFinite(x)) throw new InputError('not_finite', field, x, `a number >= 0 ${unit}`);
  if (x < 0) throw new InputError('out_of_range', field, x, `a number >= 0 ${unit}`);
  return x;
}
