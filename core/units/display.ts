/**
 * The ONE display formatter for numbers an officer reads: engineering notation with SI prefixes in
 * the chosen unit family ("8 ns", "125 GW/m²", "8.32 µJ/m²"), a fixed number of significant figures
 * (3 on screens and paper), rounded in the stated direction BEFORE the prefix is chosen, so a limit
 * rounded down or a distance rounded up never loses that direction to the prefix step.
 *
 * Family rules (common practice in laser-safety paperwork):
 * - seconds take prefixes only below 1 s; above, plain seconds ("1000 s", "30 000 s", never "ks");
 * - metres: mm / µm below 10 cm, plain metres up to 10 km, km beyond;
 * - radians: mrad / µrad below 1 rad, plain radians above;
 * - irradiance and radiant exposure: prefix on the numerator, per m² (IEC / ICNIRP / EU habit) or
 *   per cm² (ANSI habit; 1 W/cm² = 1e4 W/m², limit specification section 1).
 * SI prefixes: BIPM SI brochure, 9th edition (2019), Table 7.
 */
import { Dec, dec, type Dec as DecT } from '../numeric/decimal.js';

export type Rounding = 'up' | 'down' | 'nearest';
/** The officer's unit habit for irradiance and radiant exposure. */
export type UnitHabit = 'SI' | 'ANSI';
export type DisplayUnit = 'W' | 'J' | 's' | 'Hz' | 'm' | 'rad' | 'W/m²' | 'J/m²' | 'nm';

export interface DisplayOptions {
  /** Significant figures; 3 on screens and paper, more only in the derivation. */
  readonly sig?: number;
  /** Limits 'down', exposures, distances and optical densities 'up'; inputs 'nearest'. */
  readonly round?: Rounding;
  /** Per m² ('SI', default) or per cm² ('ANSI') for irradiance and radiant exposure. */
  readonly habit?: UnitHabit;
  /** Thin-space digit groups from 10 000 up (default); off where the text is read back as input. */
  readonly group?: boolean;
}

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [15, 'P'],
  [12, 'T'],
  [9, 'G'],
  [6, 'M'],
  [3, 'k'],
  [0, ''],
  [-3, 'm'],
  [-6, 'µ'],
  [-9, 'n'],
  [-12, 'p'],
  [-15, 'f'],
];

function roundTo(v: DecT, sig: number, round: Rounding): DecT {
  const mode = round === 'up' ? Dec.ROUND_UP : round === 'down' ? Dec.ROUND_DOWN : Dec.ROUND_HALF_UP;
  return v.toSignificantDigits(sig, mode);
}

/** Decimal text without exponent; digits grouped by thin spaces from 10 000 up ("30 000"). */
export function plainDigits(v: DecT, group = true): string {
  const text = v.toFixed();
  if (!group) return text;
  const [int, frac] = text.split('.');
  if (int === undefined) return text;
  const digits = int.replace('-', '');
  if (digits.length < 5) return text;
  const grouped = int.replace(/\B(?=(\d{3})+(?!\d))/g, '\u202f');
  return frac === undefined ? grouped : `${grouped}.${frac}`;
}

/** Exponent (multiple of 3) of the engineering prefix for an already rounded value. */
function engExponent(a: DecT): number {
  const e = a.e; // a = m * 10^e, 1 <= m < 10
  const k = Math.floor(e / 3) * 3;
  return Math.max(-15, Math.min(15, k));
}

function withPrefix(v: DecT, k: number, unit: string, group: boolean): string {
  const sym = PREFIXES.find(([e]) => e === k)?.[1] ?? '';
  return `${plainDigits(v.div(new Dec(`1e${k}`)), group)} ${sym}${unit}`;
}

/**
 * A value in SI base units as the officer reads it, e.g. quantityText('8e-9', 's') -> "8 ns",
 * quantityText('1.25e11', 'W/m²') -> "125 GW/m²", quantityText('1000', 's') -> "1000 s".
 */
export function quantityText(value: DecT | string | number, unit: DisplayUnit, opts: DisplayOptions = {}): string {
  const sig = opts.sig ?? 3;
  const round = opts.round ?? 'nearest';
  const g = opts.group ?? true;
  let v = dec(typeof value === 'number' ? String(value) : value);
  let shownUnit: string = unit;
  if (unit === 'nm') {
    // wavelengths are the officer's own numbers: nm below 10 µm, µm above (far infrared)
    if (!v.isFinite()) return '∞ nm';
    const r = roundTo(v, Math.max(sig, 6), round);
    return r.gte(10000) ? `${plainDigits(r.div(1000), g)} µm` : `${plainDigits(r, g)} nm`;
  }
  if ((unit === 'W/m²' || unit === 'J/m²') && opts.habit === 'ANSI') {
    v = v.div(1e4);
    shownUnit = unit.replace('m²', 'cm²');
  }
  if (v.isZero()) return `0 ${shownUnit}`;
  // a value beyond any prefix (e.g. "1e400" read from a file) is shown as it is, never thrown on
  if (!v.isFinite()) return `${v.isNegative() ? '−' : ''}∞ ${shownUnit}`;
  const r = roundTo(v, sig, round);
  const a = r.abs();
  switch (unit) {
    case 's':
      return a.gte(1) ? `${plainDigits(r, g)} s` : withPrefix(r, engExponent(a), 's', g);
    case 'm':
      if (a.gte(10000)) return withPrefix(r, 3, 'm', g);
      if (a.gte('0.1')) return `${plainDigits(r, g)} m`;
      return withPrefix(r, engExponent(a), 'm', g);
    case 'rad':
      return a.gte(1) ? `${plainDigits(r, g)} rad` : withPrefix(r, engExponent(a), 'rad', g);
    default:
      return withPrefix(r, engExponent(a), shownUnit, g);
  }
}

/** A plain count or ratio to `sig` significant figures ("91.8"), grouped from 10 000. */
export function numberText(value: DecT | string | number, opts: { sig?: number; round?: Rounding } = {}): string {
  const v = dec(typeof value === 'number' ? String(value) : value);
  if (v.isZero()) return '0';
  return plainDigits(roundTo(v, opts.sig ?? 3, opts.round ?? 'nearest'));
}

/** An optical density rounded UP to one decimal ("OD 2.0" for 1.9629), never below 0. */
export function odText(value: DecT | string | number): string {
  const v = dec(typeof value === 'number' ? String(value) : value);
  if (v.lte(0)) return '0.0';
  return v.toDecimalPlaces(1, Dec.ROUND_UP).toFixed(1);
}

/** An angle range bound: π and its simple fractions by name ("π rad", "π/2 rad"), otherwise as quantityText. */
export function angleText(rad: number, opts: DisplayOptions = {}): string {
  for (const [den, name] of [
    [1, 'π'],
    [2, 'π/2'],
    [4, 'π/4'],
  ] as const) {
    if (Math.abs(rad - Math.PI / den) < 1e-12) return `${name} rad`;
  }
  return quantityText(String(rad), 'rad', opts);
}
