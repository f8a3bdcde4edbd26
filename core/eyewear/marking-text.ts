/**
 * The one formatter for eyewear markings as they stand on the frame or filter, used by every
 * document and screen that names them (eyewear sheet, report, door notice).
 *
 * EN 207:2017 clause 7: test condition letters, wavelength or band in nanometres, scale number,
 * e.g. "D 1064 LB7", "IR 315–532 LB6" (the band written in nm on the frame also in the far infrared:
 * "D 10600 LB6"). EN 208:2009 clause 7 marks alignment eyewear with its power and energy, the
 * wavelength in nm and the scale number; the shelf records only the wavelength and the scale
 * number, so that part is printed: "633 RB2". An OD band (a filter data sheet, not a frame
 * marking): "OD 7 at 740–1100 nm".
 */
import type { EyewearSpec } from '../model/inputs.js';

type Band = { readonly from_nm: number; readonly to_nm: number };

/** The wavelength or band in nm as on the frame: "1064", "740–1100". */
function frameBand(b: Band): string {
  return b.from_nm === b.to_nm ? `${b.from_nm}` : `${b.from_nm}–${b.to_nm}`;
}

/** One EN 207 marking: "D 740–1100 LB5". */
export function en207MarkingText(m: NonNullable<EyewearSpec['en207']>[number]): string {
  return `${m.modes} ${frameBand(m)} LB${m.scale}`;
}

/** One EN 208 marking (wavelength and scale number): "633 RB2". */
export function en208MarkingText(m: NonNullable<EyewearSpec['en208']>[number]): string {
  return `${frameBand(m)} RB${m.scale}`;
}

/** Every EN 207 and EN 208 marking of an eyewear item, as on the frame, joined with " + " as the frames join them. */
export function frameMarkingText(e: Pick<EyewearSpec, 'en207' | 'en208'>): string {
  return [...(e.en207 ?? []).map(en207MarkingText), ...(e.en208 ?? []).map(en208MarkingText)].join(' + ');
}
