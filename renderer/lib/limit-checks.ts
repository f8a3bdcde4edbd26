/**
 * Words and numbers of the limit-table checks screen (issue 12): an open table entry's band,
 * durations, formula and its values at the sample points the core computes, in engineering notation
 * with units, limits rounded down (SAFETY.md, displayed figures).
 */
import { factorTitle } from '../../core/model/factor-words.js';
import { entrySamples, numberText, quantityText, type CheckableEntry, type RuleSetId, type SamplePoint } from '../../core/index.js';

export const RULE_SET_TITLE: Readonly<Record<RuleSetId, string>> = {
  icnirp2013: 'ICNIRP 2013 guidelines (IEC 60825-1:2014, ANSI Z136.1-2014)',
  eu2006: 'EU Directive 2006/25/EC, Annex II',
};

/** "Eye, retinal thermal · table row H-E-VIS-2" or "Correction factor C_C": what the limit is for first, the row as the derivations cite it last. */
export function entryTitle(e: CheckableEntry): string {
  if (e.kind === 'factor') return factorTitle(e.name);
  return `${e.tissue === 'skin' ? 'Skin' : 'Eye'}, ${e.effect ?? ''} · table row ${e.name}`;
}

/** The unit as the officer reads it: "J/m²", "W/m²", "s", "mrad" or nothing. */
export function unitText(e: CheckableEntry): string {
  return e.unit.replace('^2', '²');
}

/** Band and durations: "400 nm – 700 nm · 10 ps – 1 ns". */
export function spanText(e: CheckableEntry): string {
  const band = e.band_nm ? `${quantityText(String(e.band_nm[0]), 'nm')} – ${quantityText(String(e.band_nm[1]), 'nm')}` : 'every wavelength';
  const t = e.t_s ? `${quantityText(String(e.t_s[0]), 's')} – ${quantityText(String(e.t_s[1]), 's')}` : 'every duration';
  return `${band} · ${t}${e.condition ? ` · where ${e.condition}` : ''}`;
}

/**
 * "H = 2e-3*CE J/m²" as the tables write it; the screen sets it in the standards' notation with the
 * core's one formula formatter (renderer/components/FormulaText.svelte, core/units/formula-text.ts):
 * "H = 2 × 10⁻³ × C_E J/m²" with the exponent raised and the subscript lowered.
 */
export function entryFormula(e: CheckableEntry, expr = e.expr): string {
  const lhs = e.kind === 'factor' ? e.name : e.quantity;
  const unit = unitText(e);
  return `${lhs} = ${expr.replace(/\s+/g, '')}${unit ? ` ${unit}` : ''}`;
}

/** A value of the entry as the officer reads it: limits rounded down, 3 significant figures. */
export function valueText(e: CheckableEntry, v: string | undefined): string {
  if (v === undefined) return '—';
  const unit = unitText(e);
  if (unit === 'J/m²' || unit === 'W/m²' || unit === 's') return quantityText(v, unit, { round: e.kind === 'row' ? 'down' : 'nearest' });
  return `${numberText(v)}${unit ? ` ${unit}` : ''}`;
}

/** "532 nm, 100 ps" (and the source angle where the entry depends on it). */
export function pointText(p: SamplePoint): string {
  return `${quantityText(p.wavelength_nm, 'nm')}, ${quantityText(p.duration_s, 's')}${p.alpha_mrad !== undefined ? `, α = ${numberText(p.alpha_mrad)} mrad` : ''}`;
}

/** The samples, or null where the core cannot evaluate the entry at its sample points. */
export function samplesOf(ruleSet: RuleSetId, e: CheckableEntry, typed?: string): SamplePoint[] | null {
  try {
    return entrySamples(ruleSet, e, typed);
  } catch {
    return null;
  }
}
