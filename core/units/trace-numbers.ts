/**
 * The numbers of a derivation as the officer reads them (derivation window and report appendix
 * alike): every number with a unit in engineering notation with an SI prefix, through the one
 * display formatter (`quantityText`), and with ALL the figures the core wrote (the derivation is
 * where full precision belongs; screens and paper elsewhere show 3 figures rounded in the safe
 * direction). "1e-13 s" reads "100 fs", "2377340000 W/m²" reads "2.37734 GW/m²". Numbers without a
 * unit (factors such as C_A = 1.58489, counts) stay as written; a bare decimal below 0.001 in a
 * substituted formula is written with its power of ten, as the limit tables write their
 * expressions ("1.5e-4"), never as a run of zeros.
 *
 * Presentation only: the trace stored with a result is not changed, so results saved earlier read
 * the same way.
 */
import { dec } from '../numeric/decimal.js';
import { RULE_SETS } from '../limits/rule-sets.js';
import { quantityText, type DisplayUnit } from './display.js';

/** Units written in the core's traces -> the display family and the factor to SI base units. */
const UNIT_FAMILY: Readonly<Record<string, readonly [DisplayUnit, string]>> = {
  'W/m²': ['W/m²', '1'],
  'J/m²': ['J/m²', '1'],
  'W/m^2': ['W/m²', '1'],
  'J/m^2': ['J/m²', '1'],
  W: ['W', '1'],
  mW: ['W', '1e-3'],
  J: ['J', '1'],
  mJ: ['J', '1e-3'],
  s: ['s', '1'],
  ms: ['s', '1e-3'],
  µs: ['s', '1e-6'],
  ns: ['s', '1e-9'],
  ps: ['s', '1e-12'],
  fs: ['s', '1e-15'],
  Hz: ['Hz', '1'],
  kHz: ['Hz', '1e3'],
  MHz: ['Hz', '1e6'],
  m: ['m', '1'],
  mm: ['m', '1e-3'],
  µm: ['m', '1e-6'],
  rad: ['rad', '1'],
  mrad: ['rad', '1e-3'],
};

const NUMBER = String.raw`-?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?`;
// longest units first so "mrad" is not read as "m"; a unit ends where no letter, digit, "²" or "/" follows
const UNITS = Object.keys(UNIT_FAMILY)
  .sort((a, b) => b.length - a.length)
  .map((u) => u.replace(/[/^]/g, (c) => `\\${c}`))
  .join('|');
// a number stands alone: not part of a name ("NIR1-4"), an expression ("1e-4*CA", "(10)^0.75") or a ratio
const ALONE = String.raw`(?<![\w.^*/\-])`;
const UNIT_END = String.raw`(?![\w²/^])`;
const VALUE_OR_NA = String.raw`(?:${NUMBER}|n/a)`;
/**
 * One pass (a value once written with a prefix and digit groups is never read again), three shapes:
 * a list sharing the unit written after its last item ("rule 1 2.37734e-4, rule 2 0.0158489, rule 3
 * 2.37734e-5 J/m²": each item takes the unit, or the last item's prefix would be read for all), a
 * range ("1e-13–1e-9 s", "10 to 600 s": both ends take the unit), and a single value with its unit.
 */
const QUANTITY = new RegExp(
  [
    String.raw`((?:rule \d+ ${VALUE_OR_NA}, )+rule \d+ ${VALUE_OR_NA}) (${UNITS})${UNIT_END}`,
    String.raw`${ALONE}(${NUMBER})(–| to )(${NUMBER}) (${UNITS})${UNIT_END}`,
    String.raw`${ALONE}(${NUMBER}) (${UNITS})${UNIT_END}`,
  ].join('|'),
  'g',
);
const TINY_DECIMAL = new RegExp(String.raw`(?<![\w.^*/\-])(-?0\.000\d*)(?![\d.e])`, 'g');

/** Significant figures written in a decimal text ("0.000237734" -> 6, "2377340000" -> 6, "1e-13" -> 1). */
function writtenFigures(text: string): number {
  const mantissa = text.replace(/^-/, '').replace(/e.*$/i, '').replace('.', '').replace(/^0+/, '');
  const figures = text.includes('.') || /e/i.test(text) ? mantissa : mantissa.replace(/0+$/, '');
  return Math.max(1, figures.length);
}

/** One value with its unit in engineering notation, all written figures kept; unknown units as given. */
export function traceQuantityText(value: string, unit: string): string {
  const perPulse = / per pulse$/.exec(unit);
  const base = perPulse ? unit.slice(0, perPulse.index) : unit;
  const family = UNIT_FAMILY[base];
  // a value that is itself a list with units ("0.02 J/m²; 3330000 W/m²", the reported limits) reads as a sentence
  if (!new RegExp(`^${NUMBER}$`).test(value)) return traceText(unit === '' ? value : `${value} ${unit}`);
  if (family === undefined) return unit === '' ? value : `${value} ${unit}`;
  const v = dec(value);
  // zero keeps the unit it was written in ("alpha = 0 mrad"), never a bare family unit
  if (v.isZero()) return `0 ${unit}`;
  const text = quantityText(v.mul(family[1]), family[0], { sig: writtenFigures(value), round: 'nearest' });
  return perPulse ? `${text} per pulse` : text;
}

/** A sentence or title of a derivation with its numbers made readable (see the file comment). */
export function traceText(text: string): string {
  return text
    .replace(QUANTITY, (...g: (string | undefined)[]) => {
      const [, list, listUnit, from, dash, to, rangeUnit, n, u] = g;
      if (list !== undefined && listUnit !== undefined) return list.replace(new RegExp(`(rule \\d+ )(${NUMBER})`, 'g'), (_m, r: string, v: string) => `${r}${traceQuantityText(v, listUnit)}`);
      if (from !== undefined && dash !== undefined && to !== undefined && rangeUnit !== undefined) return `${traceQuantityText(from, rangeUnit)}${dash}${traceQuantityText(to, rangeUnit)}`;
      return n !== undefined && u !== undefined ? traceQuantityText(n, u) : String(g[0]);
    })
    .replace(TINY_DECIMAL, (n: string) => dec(n).toExponential());
}

/** The unit of a parameter of the limit tables (α_min in mrad, T_2 in s), as the tables state it. */
const FACTOR_UNIT: ReadonlyMap<string, string> = new Map(
  Object.values(RULE_SETS).flatMap((t) => Object.entries(t.factors).flatMap(([name, def]) => (def.unit ? [[name, def.unit] as const] : []))),
);

/**
 * The value of a derivation step as shown: with its unit in engineering notation; a parameter step
 * (kind 'factor', labelled with the table's name) takes the unit its table gives, since the core
 * states only the number. Empty when the step yields no value.
 */
export function traceStepValue(step: { readonly kind: string; readonly label: string; readonly value?: string; readonly unit?: string }): string {
  if (step.value === undefined || step.value === '') return '';
  const unit = step.unit ?? ((step.kind === 'factor' || step.kind === 'conservative') ? (FACTOR_UNIT.get(step.label) ?? '') : '');
  return traceQuantityText(step.value, unit);
}
