/**
 * Limiting apertures by tissue, band and duration (limit specification sections 4.5 and 5.5).
 * Exposure is averaged over this aperture, not over the beam: a beam smaller than the aperture is
 * averaged over the aperture. Rows marked uncertain use their stricter alternative (a smaller
 * aperture gives a higher averaged exposure) in conservative mode.
 */
import { Dec } from '../numeric/decimal.js';
import type { LimitSettings, RuleSetId, Tissue } from '../model/inputs.js';
import { evaluate } from './expression.js';
import { conservativeOn } from './factors.js';
import { ruleSetTable } from './rule-sets.js';
import { atTop, inInterval } from './intervals.js';
import type { ApertureRow } from './table-types.js';

export interface ApertureResult {
  /** Diameter in metres (decimal string). */
  readonly diameter_m: string;
  readonly diameter_mm: string;
  readonly expr: string;
  readonly source: string;
  readonly confidence: string;
  readonly conservativeApplied: boolean;
  readonly key: string;
}

export function apertureKey(tissue: Tissue, row: ApertureRow): string {
  return `aperture:${tissue}:${row.band_nm[0]}-${row.band_nm[1]}:${row.t_s[0]}-${row.t_s[1]}`;
}

/** The limiting aperture for tissue at wavelength (nm) and duration (s). */
export function limitingAperture(
  ruleSet: RuleSetId,
  tissue: Tissue,
  wavelength_nm: number | Dec,
  duration_s: number | Dec,
  settings?: LimitSettings,
): ApertureResult {
  const table = ruleSetTable(ruleSet);
  const rows = table.apertures[tissue];
  const lambda = new Dec(wavelength_nm);
  const t = new Dec(duration_s);
  // The one boundary convention (core/limits/intervals.ts): [lo, hi), the top edge of the last row.
  const inside = (r: ApertureRow, edge: boolean): boolean =>
    (inInterval(lambda, r.band_nm) || (edge && atTop(lambda, r.band_nm))) && (inInterval(t, r.t_s) || (edge && atTop(t, r.t_s)));
  const row = rows.find((r) => inside(r, false)) ?? rows.find((r) => inside(r, true));
  if (!row) throw new Error(`no aperture row for ${tissue} at ${lambda.toString()} nm, ${t.toString()} s`);
  const key = apertureKey(tissue, row);
  let mm = evaluate(row.diameter_mm, { t });
  let expr = row.diameter_mm;
  let conservativeApplied = false;
  if (row.conservative_alt && conservativeOn(settings, key)) {
    const alt = evaluate(row.conservative_alt, { t });
    if (!alt.eq(mm)) {
      // A smaller aperture never lowers the averaged exposure: stricter for the officer.
      conservativeApplied = alt.lt(mm);
      if (alt.lt(mm)) {
        mm = alt;
        expr = row.conservative_alt;
      }
    }
  }
  return {
    diameter_m: mm.div(1000).toString(),
    diameter_mm: mm.toSignificantDigits(6).toString(),
    expr,
    source: row.source,
    confidence: row.confidence,
    conservativeApplied,
    key,
  };
}
