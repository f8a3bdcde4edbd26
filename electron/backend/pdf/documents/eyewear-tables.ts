/**
 * Eyewear tables shared by the report and the eyewear sheet: what the room needs per wavelength,
 * and which eyewear on the shelf covers which beam (from the core's coverage verdicts; nothing is
 * re-judged here).
 */
import type { Content, TableCell } from 'pdfmake/interfaces';
import type { EyewearSpec } from '../../../../core/model/inputs.js';
import { en207MarkingText, en208MarkingText } from '../../../../core/eyewear/marking-text.js';
import type { EyewearVerdict } from '../../../../core/model/results.js';
import { Dec, dec } from '../../../../core/numeric/decimal.js';
import { plain } from '../../../../core/units/quantities.js';
import type { DocumentInput } from '../document-input.js';
import { gridTable, verdictCell } from '../blocks.js';
import * as fmt from '../format.js';
import { COLOR } from '../page.js';
import type { RoomView } from '../room-view.js';

export function requiredEyewearTable(doc: DocumentInput, fontSize: number, widths: Array<number | string> = [90, 130, '*']): Content {
  const rows: TableCell[][] = doc.results.requiredEyewear.map((r) => [
    { text: fmt.wavelength(r.wavelength_nm), bold: true },
    { text: fmt.od(r.odRequired), bold: true },
    fmt.scaleNumbers(r.scaleNumbers),
  ]);
  return gridTable(['Wavelength', 'Required OD', 'EN 207 / EN 208 scale numbers'], rows, widths, fontSize);
}

/** One line per band the eyewear is marked for, e.g. "OD 7 at 740–1100 nm; D LB5 at 740–1100 nm". */
export function eyewearMarkings(e: EyewearSpec): string {
  const parts: string[] = [];
  for (const b of e.od ?? []) parts.push(`OD ${b.od} at ${band(b.from_nm, b.to_nm)}`);
  // EN 207 / EN 208 markings in the form on the frame ("D 740–1100 LB5"), one formatter everywhere
  for (const b of e.en207 ?? []) parts.push(en207MarkingText(b));
  for (const b of e.en208 ?? []) parts.push(en208MarkingText(b));
  if (e.visibleTransmission !== undefined) parts.push(`visible light transmission ${fmt.percent(e.visibleTransmission).replace(' %', '\u00a0%')}`); // a no-break space: the number keeps its unit (ISO 80000-1, clause 7)
  return parts.join('; ');
}

/** A marked band in one unit for both ends: "740–1100 nm", "9–11 µm" (never "9000–11 µm"). */
function band(from: number, to: number): string {
  if (from === to) return fmt.wavelength(from);
  const um = fmt.wavelength(to).endsWith('µm');
  return `${plain(um ? dec(from).div(1000) : dec(from))}–${fmt.wavelength(to)}`;
}

export function verdictOf(doc: DocumentInput, beamId: string, eyewearId: string): EyewearVerdict | null {
  return doc.results.coverage.find((v) => v.beamId === beamId && v.eyewearId === eyewearId) ?? null;
}

/** OD margin (provided minus required), rounded towards minus infinity: the safe side. */
function marginText(v: EyewearVerdict): string {
  if (v.odMargin === null) return '';
  const shown = dec(v.odMargin).toDecimalPlaces(1, Dec.ROUND_FLOOR);
  return `${shown.gte(0) ? '+' : ''}${plain(shown)}`;
}

/** A few words for a matrix cell: why the eyewear is or is not adequate for the beam. */
export function shortReason(v: EyewearVerdict, wavelength_nm: number): string {
  if (v.adequate) {
    if (v.odMargin === null) return 'no filter needed';
    const low = v.scaleChecks.find((c) => c.includes('not marked'));
    return `OD margin ${marginText(v)}${low ? '; LB not marked' : ''}`;
  }
  if (v.odMargin === null) return `no OD at ${fmt.wavelength(wavelength_nm)}`;
  if (dec(v.odMargin).lt(0)) return `OD short by ${plain(dec(v.odMargin).neg().toDecimalPlaces(1, Dec.ROUND_UP))}`;
  const failing = v.scaleChecks.find((c) => /TOO LOW|too low|not marked/.test(c));
  return failing === undefined ? 'see the report' : scaleCheckWords(failing);
}

/**
 * The core's scale-number check ("D: LB5 < LB6 TOO LOW") in the words of a frame marking
 * (EN 207:2017 clause 7: mode letter and LB number; EN 208:2009: RB number): "D LB5 marked,
 * D LB6 needed". A check in any other shape is printed as it is.
 */
export function scaleCheckWords(check: string): string {
  const low = /^(\w+): (LB|RB)(\d+) < (?:LB|RB)(\d+) (TOO LOW|too low for alignment)$/.exec(check);
  if (low) {
    const [, mode, tag, marked, needed, why] = low;
    const name = (n: string | undefined): string => (tag === 'RB' ? `RB${n ?? ''}` : `${mode ?? ''} ${tag ?? ''}${n ?? ''}`);
    return `${name(marked)} marked, ${name(needed)} needed${why === 'too low for alignment' ? ' for alignment' : ''}`;
  }
  const unmarked = /^(\w+): needs (LB|RB)(\d+); not marked for (\d+(?:\.\d+)?) nm$/.exec(check);
  if (unmarked) {
    const [, mode, tag, needed, nm] = unmarked;
    return `${tag === 'RB' ? '' : `${mode ?? ''} `}${tag ?? ''}${needed ?? ''} needed, not marked at ${fmt.wavelength(Number(nm))}`;
  }
  return check;
}

/** Rows: eyewear; columns: beams. YES (green) / NO (red) with the OD margin. */
export function coverageMatrix(doc: DocumentInput, view: RoomView, fontSize: number, firstColumn?: (e: EyewearSpec) => TableCell, withNeeds = false, firstWidth = 92, reasons = true, tight = false): Content {
  const eyewear = doc.content.input.eyewear ?? [];
  if (eyewear.length === 0) return { text: 'No eyewear is listed for this room.', bold: true, color: COLOR.bad };
  const beamCols = view.beams.map(
    (b, i) => `${i + 1}. ${fmt.wavelength(b.result.wavelength_nm)}${withNeeds ? `\nneeds ${fmt.od(b.result.odRequired)}\n${fmt.scaleNumbers(b.result.scaleNumbers)}` : ''}`,
  );
  const rows: TableCell[][] = eyewear.map((e) => [
    firstColumn ? firstColumn(e) : { text: e.label, bold: true },
    ...view.beams.map((b) => {
      const v = verdictOf(doc, b.result.beamId, e.id);
      return v === null ? ({ text: 'not checked', color: COLOR.muted } as TableCell) : verdictCell(v.adequate, reasons ? shortReason(v, b.result.wavelength_nm) : '', fontSize);
    }),
  ]);
  const table = gridTable(['Eyewear', ...beamCols], rows, [firstColumn ? firstWidth : 80, ...view.beams.map(() => '*')], fontSize);
  // A crowded sheet: rows only as tall as their one line of YES / NO.
  return tight ? { ...table, layout: { ...(table.layout as object), paddingTop: () => 0.5, paddingBottom: () => 0.5 } } : table;
}

/** Per eyewear: the beams it covers and the beams it must not be used for, with a short reason. */
export function eyewearUseLists(doc: DocumentInput, view: RoomView, withReasons = true): Array<{ eyewear: EyewearSpec; covers: string[]; mustNot: string[] }> {
  return (doc.content.input.eyewear ?? []).map((e) => {
    const covers: string[] = [];
    const mustNot: string[] = [];
    view.beams.forEach((b, i) => {
      const v = verdictOf(doc, b.result.beamId, e.id);
      const name = `${i + 1} (${fmt.wavelength(b.result.wavelength_nm)})`;
      if (v === null) mustNot.push(`${name}: not checked`);
      else if (v.adequate) covers.push(name);
      else mustNot.push(withReasons ? `${name}: ${shortReason(v, b.result.wavelength_nm)}` : name);
    });
    return { eyewear: e, covers, mustNot };
  });
}
