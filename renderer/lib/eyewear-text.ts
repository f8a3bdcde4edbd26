/**
 * Eyewear markings typed as the officer reads them off the frame or the filter data sheet:
 *   OD bands:  "740-1100 nm OD 7; 1100-1400 nm OD 5"
 *   EN 207:    "740-1100 nm D LB5; 740-1100 nm IR LB7"   (single wavelength: "1064 nm D LB5")
 *   EN 208:    "633 nm RB2"
 * Each entry is separated by ';' or a new line. Errors name the entry that could not be read.
 */
import { EN207_MODES, INPUT_RULES, SCALE_NUMBERS, inRange, type EyewearSpec } from '../../core/index.js';

type Od = NonNullable<EyewearSpec['od']>[number];
type En207 = NonNullable<EyewearSpec['en207']>[number];
type En208 = NonNullable<EyewearSpec['en208']>[number];

export type Parsed<T> = { readonly ok: true; readonly value: T[] } | { readonly ok: false; readonly error: string };

const BAND = String.raw`(\d+(?:[.,]\d+)?)\s*(?:(?:-|–|to)\s*(\d+(?:[.,]\d+)?))?\s*nm`;

function entries(text: string): string[] {
  return text
    .split(/[;\n]/)
    .map((s) => s.trim())
    .filter((s) => s.length > 0);
}

function band(m: RegExpExecArray): { from_nm: number; to_nm: number } {
  const from = Number((m[1] ?? '').replace(',', '.'));
  const to = m[2] !== undefined ? Number(m[2].replace(',', '.')) : from;
  return { from_nm: from, to_nm: to };
}

// Ranges, scale numbers and test letters come from the one table of input rules (core/model/input-rules.ts).
function checkBand(b: { from_nm: number; to_nm: number }, entry: string): string | null {
  if (!inRange(INPUT_RULES.wavelength_nm, b.from_nm) || !inRange(INPUT_RULES.wavelength_nm, b.to_nm)) return `"${entry}": wavelengths must lie between 180 nm and 1 mm`;
  if (b.from_nm > b.to_nm) return `"${entry}": the band must go from the shorter to the longer wavelength`;
  return null;
}

export function parseOdBands(text: string): Parsed<Od> {
  const out: Od[] = [];
  const re = new RegExp(`^${BAND}\\s*OD\\s*(\\d+(?:[.,]\\d+)?)\\+?$`, 'i');
  for (const e of entries(text)) {
    const m = re.exec(e);
    if (!m) return { ok: false, error: `"${e}": write e.g. "740-1100 nm OD 7"` };
    const b = band(m);
    const err = checkBand(b, e);
    if (err) return { ok: false, error: err };
    const od = Number((m[3] ?? '').replace(',', '.'));
    if (!inRange(INPUT_RULES.opticalDensity, od)) return { ok: false, error: `"${e}": an optical density runs from 0 to ${INPUT_RULES.opticalDensity.max}` };
    out.push({ ...b, od });
  }
  return { ok: true, value: out };
}

export function parseEn207(text: string): Parsed<En207> {
  const out: En207[] = [];
  const re = new RegExp(`^${BAND}\\s*([DIRM]+)\\s*LB\\s*(\\d+)$`, 'i');
  for (const e of entries(text)) {
    const m = re.exec(e);
    if (!m) return { ok: false, error: `"${e}": write e.g. "740-1100 nm D LB5" or "1064 nm IR LB7"` };
    const b = band(m);
    const err = checkBand(b, e);
    if (err) return { ok: false, error: err };
    const scale = Number(m[4]);
    const s7 = SCALE_NUMBERS.en207;
    if (scale < s7.min || scale > s7.max) return { ok: false, error: `"${e}": ${s7.standard} scale numbers run from LB${s7.min} to LB${s7.max}` };
    const modes = (m[3] ?? '').toUpperCase();
    if (!EN207_MODES.test(modes)) return { ok: false, error: `"${e}": test conditions are letters from D, I, R, M` };
    out.push({ ...b, modes, scale });
  }
  return { ok: true, value: out };
}

export function parseEn208(text: string): Parsed<En208> {
  const out: En208[] = [];
  const re = new RegExp(`^${BAND}\\s*RB\\s*(\\d+)$`, 'i');
  for (const e of entries(text)) {
    const m = re.exec(e);
    if (!m) return { ok: false, error: `"${e}": write e.g. "633 nm RB2"` };
    const b = band(m);
    const err = checkBand(b, e);
    if (err) return { ok: false, error: err };
    const scale = Number(m[3]);
    const s8 = SCALE_NUMBERS.en208;
    if (scale < s8.min || scale > s8.max) return { ok: false, error: `"${e}": ${s8.standard} scale numbers run from RB${s8.min} to RB${s8.max}` };
    out.push({ ...b, scale });
  }
  return { ok: true, value: out };
}

const bandText = (b: { from_nm: number; to_nm: number }): string => (b.from_nm === b.to_nm ? `${b.from_nm} nm` : `${b.from_nm}-${b.to_nm} nm`);

export function odText(spec: EyewearSpec): string {
  return (spec.od ?? []).map((o) => `${bandText(o)} OD ${o.od}`).join('; ');
}
export function en207Text(spec: EyewearSpec): string {
  return (spec.en207 ?? []).map((o) => `${bandText(o)} ${o.modes} LB${o.scale}`).join('; ');
}
export function en208Text(spec: EyewearSpec): string {
  return (spec.en208 ?? []).map((o) => `${bandText(o)} RB${o.scale}`).join('; ');
}
