/**
 * Numbers as printed, in the officer's unit habit and rounded in the safe direction
 * (SAFETY.md, conservative policy): limits DOWN; exposures, outputs, distances, optical densities
 * and scale numbers UP. Values that the core already reports rounded are printed as reported.
 */
import { dec, roundSig } from '../../../core/numeric/decimal.js';
import { formatDensity, formatSI, plain, type UnitHabit } from '../../../core/units/quantities.js';
import { quantityText } from '../../../core/units/display.js';
import type { Emission } from '../../../core/model/inputs.js';
import type { LaserClass, ScaleNumberRequirement } from '../../../core/model/results.js';

/** Exposure limit as irradiance, rounded DOWN (a smaller limit is the safe side). */
export function limitE(E_Wm2: string, units: UnitHabit): string {
  return formatDensity(E_Wm2, 'irradiance', units, 'down').text;
}

/** Exposure limit as radiant exposure, rounded DOWN. */
export function limitH(H_Jm2: string, units: UnitHabit): string {
  return formatDensity(H_Jm2, 'radiantExposure', units, 'down').text;
}

/** An exposure (what reaches the eye), rounded UP. */
export function exposure(value: string, quantity: 'H' | 'E', units: UnitHabit): string {
  return formatDensity(value, quantity === 'E' ? 'irradiance' : 'radiantExposure', units, 'up').text;
}

/** A hazard distance in mm, m or km: the core's reported value is already rounded up. */
export function distance(reported_m: string | null): string {
  if (reported_m === null) return 'not assessed';
  const v = dec(reported_m);
  if (v.isZero()) return '0 m';
  if (v.gte(1000)) return `${plain(roundSig(v.div(1000), 3, 'up'))} km`;
  // engineering notation (the owner's rule): "5.36 mm", not "0.00536 m" (same digits, exact)
  if (v.lt(1)) return `${plain(v.mul(1000))} mm`;
  return `${plain(v)} m`;
}

/** A full-precision distance the core gives without a reported twin: 3 significant figures, up. */
export function distanceFull(value_m: string | null): string {
  if (value_m === null) return 'not assessed';
  return distance(roundSig(value_m, 3, 'up').toString());
}

/** A wavelength: the core's one wavelength formatter (nm below 10 µm, µm from 10 µm, e.g. "10.6 µm"). */
export function wavelength(nm: number): string {
  return quantityText(nm, 'nm');
}

/** A duration: seconds from 1 s up (e.g. "30 000 s"), SI prefixes below. */
export function duration(s: number | string): string {
  const v = dec(s);
  if (v.gte(1)) return `${groupThousands(plain(v))} s`;
  if (v.gte('0.01')) return `${plain(v)} s`;
  return formatSI(v, 's', 3, 'up');
}

function groupThousands(text: string): string {
  const [int, frac] = text.split('.');
  if (int === undefined || int.length < 5) return text;
  const grouped = int.replace(/\B(?=(\d{3})+(?!\d))/g, '\u202f');
  return frac === undefined ? grouped : `${grouped}.${frac}`;
}

/** Output as printed on the door: maximum power or energy rounded UP, pulse duration and rate. */
export function emission(e: Emission): { output: string; pulse: string } {
  if (e.kind === 'cw') return { output: formatSI(String(e.power_W), 'W', 3, 'up'), pulse: 'CW' };
  const rate = e.repetitionRate_Hz === undefined ? 'single pulse' : formatSI(String(e.repetitionRate_Hz), 'Hz', 3, 'up');
  return {
    output: `${formatSI(String(e.pulseEnergy_J), 'J', 3, 'up')} per pulse`,
    pulse: `${formatSI(String(e.pulseDuration_s), 's', 3, 'up')}, ${rate}`,
  };
}

/** Required optical density (already rounded up to one decimal by the core). */
export function od(reported: string): string {
  const v = dec(reported);
  return v.lte(0) ? 'none needed' : `OD ${plain(v)}`;
}

/** EN 207 / EN 208 scale numbers that apply, e.g. "D LB5, I LB6, R LB6"; "none" when none apply. */
export function scaleNumbers(reqs: readonly ScaleNumberRequirement[]): string {
  const parts = reqs
    .filter((r) => r.applies && r.scale > 0)
    .map((r) => (r.mode === 'RB' ? `RB${r.scale}` : `${r.mode} LB${r.scale}`));
  return parts.length === 0 ? 'none' : parts.join(', ');
}

export const CLASS_ORDER: readonly LaserClass[] = ['1', '1M', '2', '2M', '3R', '3B', '4'];

export function classRank(c: LaserClass): number {
  return CLASS_ORDER.indexOf(c);
}

export function higherClass(a: LaserClass, b: LaserClass): LaserClass {
  return classRank(a) >= classRank(b) ? a : b;
}

/** Calendar date as printed: ISO form (unambiguous across A4 and Letter countries). */
export function calendarDate(iso: string | null | undefined): string {
  if (iso === null || iso === undefined || iso === '') return 'not set';
  return iso.slice(0, 10);
}

/** Short form of a SHA-256 fingerprint: first 16 hex digits in groups of four. */
export function shortFingerprint(hex: string): string {
  return (hex.slice(0, 16).match(/.{1,4}/g) ?? []).join(' ');
}

const SUPERSCRIPT: Readonly<Record<string, string>> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * A dimensionless ratio (a sum of exposure/limit fractions), 3 significant figures rounded UP (the
 * exposure side); from 10 000 on and below 0.001 in engineering notation, "5.27 × 10⁶", never a
 * string of zeros or a programmer's "5.27e6" (ISO 80000-1:2009, clause 7: the multiplication sign
 * and a power of ten).
 */
export function ratio(value: string | number): string {
  const v = roundSig(value, 3, 'up');
  const a = v.abs();
  if (a.isZero() || (a.lt(10000) && a.gte('0.001'))) return v.toString();
  const exp = Math.floor(Number(a.toExponential().split('e')[1]) / 3) * 3;
  const mantissa = v.div(dec(10).pow(exp)).toString();
  return `${mantissa} × 10${String(exp).split('').map((c) => SUPERSCRIPT[c] ?? c).join('')}`;
}

export function percent(ratio: number | undefined): string {
  return ratio === undefined ? '–' : `${plain(roundSig(ratio * 100, 3, 'down'))} %`;
}
