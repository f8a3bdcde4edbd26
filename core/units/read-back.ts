/**
 * How a typed quantity was read, written back in full for the officer to see beside the field or
 * CSV cell ("= 200 J per pulse"): the unit a bare number took becomes visible, and nothing is
 * rounded (these are the officer's own numbers, not results).
 */
import { SI_UNIT, formatSI, type Dimension } from './quantities.js';

/** The unit a value is written back in: a fixed one, or an SI prefix picked for the value. */
export type ReadBackStyle = 'nm' | 'mm' | 'm' | 'mrad' | 'deg' | '%' | 'x' | 'cm2' | 'prefix';

/** Round-trip-safe number text (12 significant digits drop binary noise such as 1064.0000000001). */
function num(v: number): string {
  const s = String(Number(v.toPrecision(12)));
  return s.includes('e') ? s.replace('e+', 'e') : s;
}

/** Write an SI value in the unit an officer would type (wavelengths arrive in metres). */
export function readBack(si: number, dimension: Dimension, style: ReadBackStyle): string {
  switch (style) {
    case 'nm':
      return si >= 1e-5 ? `${num(si * 1e6)} µm` : `${num(si * 1e9)} nm`;
    case 'mm':
      return `${num(si * 1e3)} mm`;
    case 'm':
      return `${num(si)} m`;
    case 'mrad':
      return `${num(si * 1e3)} mrad`;
    case 'deg':
      return `${num((si * 180) / Math.PI)} deg`;
    case '%':
      return `${num(si * 100)} %`;
    case 'x':
      return num(si);
    case 'cm2':
      // skin areas: square centimetres, the size an officer pictures (1 cm² = 1e-4 m²)
      return `${num(si * 1e4)} cm²`;
    case 'prefix':
      // 12 significant digits only pick the prefix; they do not round an input.
      return formatSI(String(si), SI_UNIT[dimension], 12, 'up');
  }
}
