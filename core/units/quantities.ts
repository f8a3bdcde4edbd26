/**
 * Parsing what officers type ("5 mW", "1064 nm", "10.6 µm", "10 ns", "1.5 mrad", "0.5 J/cm²") into
 * SI decimal values, and formatting values back in the unit habit the officer chose: W/m² (IEC,
 * ICNIRP, EU habit) or W/cm² (ANSI habit). 1 W/cm² = 1e4 W/m² (limit specification, section 1).
 */
import { Dec, dec, type Dec as DecT, roundSig } from '../numeric/decimal.js';
import { InputError } from '../errors.js';
import { quantityText, type DisplayUnit, type UnitHabit } from './display.js';

export type Dimension =
  | 'power'
  | 'energy'
  | 'length'
  | 'wavelength'
  | 'time'
  | 'frequency'
  | 'angle'
  | 'irradiance'
  | 'radiantExposure'
  | 'area'
  | 'ratio';

/** SI base unit of each dimension. */
export const SI_UNIT: Readonly<Record<Dimension, string>> = {
  power: 'W',
  energy: 'J',
  length: 'm',
  wavelength: 'm',
  time: 's',
  frequency: 'Hz',
  angle: 'rad',
  irradiance: 'W/m²',
  radiantExposure: 'J/m²',
  area: 'm²',
  ratio: '',
};

const PREFIX: Readonly<Record<string, string>> = {
  f: '1e-15',
  p: '1e-12',
  n: '1e-9',
  u: '1e-6',
  'µ': '1e-6',
  'μ': '1e-6',
  m: '1e-3',
  c: '1e-2',
  '': '1',
  k: '1e3',
  M: '1e6',
  G: '1e9',
};

interface UnitDef {
  readonly dim: Dimension;
  readonly factor: string;
}

/** Base symbols and, for area units, their own factor. Prefixes combine with the base. */
const BASES: ReadonlyArray<{ sym: string; dim: Dimension; factor: string; prefixed: boolean }> = [
  { sym: 'W/m2', dim: 'irradiance', factor: '1', prefixed: true },
  { sym: 'W/cm2', dim: 'irradiance', factor: '1e4', prefixed: true },
  { sym: 'W/mm2', dim: 'irradiance', factor: '1e6', prefixed: true },
  { sym: 'J/m2', dim: 'radiantExposure', factor: '1', prefixed: true },
  { sym: 'J/cm2', dim: 'radiantExposure', factor: '1e4', prefixed: true },
  { sym: 'J/mm2', dim: 'radiantExposure', factor: '1e6', prefixed: true },
  { sym: 'rad', dim: 'angle', factor: '1', prefixed: true },
  { sym: 'deg', dim: 'angle', factor: String(Math.PI / 180), prefixed: false },
  { sym: 'Hz', dim: 'frequency', factor: '1', prefixed: true },
  { sym: 'W', dim: 'power', factor: '1', prefixed: true },
  { sym: 'J', dim: 'energy', factor: '1', prefixed: true },
  { sym: 'm', dim: 'length', factor: '1', prefixed: true },
  { sym: 's', dim: 'time', factor: '1', prefixed: true },
  { sym: 'min', dim: 'time', factor: '60', prefixed: false },
  { sym: 'h', dim: 'time', factor: '3600', prefixed: false },
  { sym: '%', dim: 'ratio', factor: '0.01', prefixed: false },
  // Areas take their own factor: a prefix applies to the metre before squaring (1 cm² = 1e-4 m²,
  // BIPM SI brochure 9th ed. 3: "cm²" means (0.01 m)²), so they are listed, never prefixed.
  { sym: 'm2', dim: 'area', factor: '1', prefixed: false },
  { sym: 'dm2', dim: 'area', factor: '1e-2', prefixed: false },
  { sym: 'cm2', dim: 'area', factor: '1e-4', prefixed: false },
  { sym: 'mm2', dim: 'area', factor: '1e-6', prefixed: false },
];

function normaliseUnit(u: string): string {
  return u
    .replace(/\s+/g, '')
    .replace(/²/g, '2')
    .replace(/\^2/g, '2')
    .replace(/·/g, '')
    .replace(/μ/g, 'µ')
    .replace(/^(°|degrees?)$/, 'deg')
    .replace(/^um$/, 'µm');
}

const UNIT_TABLE: ReadonlyMap<string, UnitDef> = (() => {
  const m = new Map<string, UnitDef>();
  for (const b of BASES) {
    if (!b.prefixed) {
      m.set(b.sym, { dim: b.dim, factor: b.factor });
      continue;
    }
    for (const [p, pf] of Object.entries(PREFIX)) {
      const sym = p + b.sym;
      if (m.has(sym)) continue; // e.g. "min" is minutes, not milli-inches
      m.set(sym, { dim: b.dim, factor: new Dec(pf).mul(b.factor).toString() });
    }
  }
  // u for µ on every prefixed unit
  for (const [sym, def] of [...m]) if (sym.startsWith('µ')) m.set('u' + sym.slice(1), def);
  return m;
})();

export interface ParsedQuantity {
  readonly value: DecT;
  readonly dimension: Dimension;
}

const NUMBER = /^\s*([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$/;

/**
 * What a comma inside a number means.
 * - 'decimal': a decimal mark ("632,8 nm"), as in semicolon-separated files of decimal-comma locales.
 * - 'refuse': never part of a number (comma-separated files, where "1,500 mW" is a thousands
 *   separator that a reader would otherwise take as 1.5 mW, a 1000-fold under-estimate).
 * - 'guard' (typed fields): a decimal mark, except where it looks like a thousands group
 *   ("1,500": exactly three digits after it), which is refused as ambiguous.
 */
export type CommaRule = 'decimal' | 'refuse' | 'guard';

/** Officer words for each dimension ("is not an energy unit"). */
export const DIMENSION_WORDS: Readonly<Record<Dimension, string>> = {
  power: 'a power',
  energy: 'an energy',
  length: 'a length',
  wavelength: 'a wavelength',
  time: 'a time',
  frequency: 'a frequency',
  angle: 'an angle',
  irradiance: 'an irradiance',
  radiantExposure: 'a radiant exposure',
  area: 'an area',
  ratio: 'a ratio',
};

/**
 * Parse "5 mW" into { value: 0.005, dimension: 'power' }. When `expect` is given, the unit must
 * be of that dimension (a wavelength may be typed in nm or µm; a bare number takes `defaultUnit`,
 * and without one a bare number is refused: the unit must be typed).
 */
export function parseQuantity(
  field: string,
  text: string,
  expect: Dimension,
  defaultUnit?: string,
  comma: CommaRule = 'guard',
): ParsedQuantity {
  const m = NUMBER.exec(text);
  if (!m || m[1] === undefined) throw new InputError('unparseable', field, text, `a number with a unit, e.g. ${example(expect)}`);
  const numText = m[1];
  const ci = numText.indexOf(',');
  if (ci >= 0 && comma !== 'decimal') {
    const thousands = /^[+-]?\d{1,3},\d{3}(?:[eE][+-]?\d+)?$/.test(numText);
    if (comma === 'refuse' || thousands) {
      const unitTyped = (m[2] ?? '').trim();
      const asThousands = new Dec(numText.replace(',', ''));
      const hint = thousandsHint(asThousands, unitTyped || defaultUnit || '', expect);
      throw new InputError(
        'unparseable',
        field,
        text,
        `a number without a comma, e.g. ${hint}`,
        comma === 'refuse' ? `a comma inside a number is not read in a comma-separated file: write ${hint}` : `"${numText}" could be read two ways: write ${hint}`,
      );
    }
  }
  const num = new Dec(numText.replace(',', '.'));
  let unitText = m[2] ?? '';
  if (unitText === '' && defaultUnit === undefined && expect !== 'ratio') {
    throw new InputError('unknown_unit', field, text, `a number with ${DIMENSION_WORDS[expect]} unit, e.g. ${example(expect)}`, `type the unit, e.g. ${example(expect)}`);
  }
  if (unitText === '' && defaultUnit !== undefined) unitText = defaultUnit;
  const unit = normaliseUnit(unitText);
  const want = expect === 'wavelength' ? 'length' : expect;
  const def = unit === '' && want === 'ratio' ? { dim: 'ratio' as const, factor: '1' } : UNIT_TABLE.get(unit);
  if (!def) throw new InputError('unknown_unit', field, text, `${DIMENSION_WORDS[expect]} unit, e.g. ${example(expect)}`, `'${unitText}' is not ${DIMENSION_WORDS[expect]} unit`);
  if (def.dim !== want) throw new InputError('unknown_unit', field, text, `${DIMENSION_WORDS[expect]} unit, e.g. ${example(expect)}`, `'${unitText}' is not ${DIMENSION_WORDS[expect]} unit`);
  const value = num.mul(def.factor);
  if (!value.isFinite()) throw new InputError('not_finite', field, text, 'a finite number');
  return { value, dimension: expect };
}

/** "1500 mW or 1.5 W": the thousands reading, typed plainly and with a prefix. */
function thousandsHint(n: DecT, unitTyped: string, expect: Dimension): string {
  const plainText = `${n.toString()}${unitTyped ? ` ${unitTyped}` : ''}`;
  const def = UNIT_TABLE.get(normaliseUnit(unitTyped));
  const want = expect === 'wavelength' ? 'length' : expect;
  if (!def || def.dim !== want || expect === 'ratio' || def.dim === 'angle' || def.dim === 'irradiance' || def.dim === 'radiantExposure' || def.dim === 'area') return plainText;
  const si = n.mul(def.factor);
  const pretty = formatSI(si, SI_UNIT[expect], 12);
  return pretty.replace(/\s+/g, ' ') === plainText ? plainText : `${plainText} or ${pretty}`;
}

function example(d: Dimension): string {
  switch (d) {
    case 'power':
      return '5 mW';
    case 'energy':
      return '2 mJ';
    case 'length':
      return '3 mm';
    case 'wavelength':
      return '1064 nm';
    case 'time':
      return '10 ns';
    case 'frequency':
      return '10 kHz';
    case 'angle':
      return '1.5 mrad';
    case 'irradiance':
      return '25 W/m²';
    case 'radiantExposure':
      return '0.5 J/cm²';
    case 'area':
      return '200 cm²';
    case 'ratio':
      return '0.15 or 15 %';
  }
}

export type { UnitHabit } from './display.js';

export interface FormattedQuantity {
  readonly text: string;
  readonly value: string;
  readonly unit: string;
}

/**
 * Format an irradiance (W/m²) or radiant exposure (J/m²) in the chosen habit, rounded to `sig`
 * significant figures in the stated direction (limits: 'down'; exposures and distances: 'up').
 * Engineering notation with the prefix on the numerator ("125 GW/m²", "636 µJ/cm²").
 */
export function formatDensity(
  valueSI: DecT | string,
  kind: 'irradiance' | 'radiantExposure',
  habit: UnitHabit,
  direction: 'up' | 'down',
  sig = 3,
): FormattedQuantity {
  const text = quantityText(valueSI, kind === 'irradiance' ? 'W/m²' : 'J/m²', { habit, round: direction, sig });
  const cut = text.lastIndexOf(' ');
  return { text, value: text.slice(0, cut), unit: text.slice(cut + 1) };
}

/** Plain decimal text without exponent for moderate magnitudes, engineering exponent otherwise. */
export function plain(v: DecT): string {
  const a = v.abs();
  if (!a.isZero() && (a.gte('1e7') || a.lt('1e-4'))) return v.toExponential().replace('e+', 'e');
  return v.toString();
}

const DISPLAY_UNITS: ReadonlySet<string> = new Set<DisplayUnit>(['W', 'J', 's', 'Hz', 'm', 'rad', 'W/m²', 'J/m²']);

/**
 * Format a value with an SI prefix, e.g. 0.005 W -> "5 mW", through the one display formatter
 * (quantityText). `group: false` where the text goes back into an input field.
 */
export function formatSI(valueSI: DecT | string, unit: string, sig = 3, direction: 'up' | 'down' = 'up', group = false): string {
  if (DISPLAY_UNITS.has(unit)) return quantityText(valueSI, unit as DisplayUnit, { sig, round: direction, group });
  return `${plain(roundSig(dec(valueSI), sig, direction))} ${unit}`.trim();
}
