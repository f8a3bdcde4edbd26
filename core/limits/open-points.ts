/**
 * The open-points list: every table entry not read in a published source (confidence 'from memory',
 * 'from memory, uncertain' or 'ours'), generated from the tables' own confidence marks so that the
 * list in OPEN-POINTS.md cannot drift from the data (test/core/open-points.test.ts compares them).
 */
import { RULE_SET_IDS, RULE_SET_NAME, ruleSetTable } from './rule-sets.js';
import type { Interval } from './table-types.js';
import { factorPieceKey } from './factors.js';
import { factorWords } from '../model/factor-words.js';

export interface OpenPoint {
  readonly what: string;
  readonly confidence: string;
  readonly source: string;
  /** Limit rows and factor pieces: the entry as the officer checks it (the limit-table checks screen). */
  readonly entry?: CheckableEntry;
}

/** A limit row or factor piece an officer can check against the published document (issue 12). */
export interface CheckableEntry {
  /** The key a check is recorded under: the row id, or factorPieceKey(name, piece). */
  readonly key: string;
  readonly kind: 'row' | 'factor';
  /** Row id or factor name. */
  readonly name: string;
  readonly tissue?: 'eye' | 'skin';
  readonly effect?: string;
  readonly band_nm?: Interval;
  readonly t_s?: Interval;
  /** Conditions on the source size or others under which the entry applies. */
  readonly condition?: string;
  /** H (radiant exposure), E (irradiance) or a factor. */
  readonly quantity: 'H' | 'E' | 'factor';
  readonly expr: string;
  readonly unit: string;
  readonly stricterAlt?: string;
  readonly source: string;
  readonly confidence: string;
}

const isOpen = (confidence: string | undefined): confidence is string => confidence !== undefined && (confidence.startsWith('from memory') || confidence === 'ours');
const span = (iv: Interval | undefined, unit: string): string => (iv ? `${iv[0]}–${iv[1]} ${unit}` : '');

export function openPoints(ruleSet: (typeof RULE_SET_IDS)[number]): OpenPoint[] {
  const t = ruleSetTable(ruleSet);
  const out: OpenPoint[] = [];
  for (const tissue of ['eye', 'skin'] as const) {
    for (const r of t[tissue]) {
      if (isOpen(r.confidence) && r.quantity !== 'ref') {
        const entry: CheckableEntry = {
          key: r.id, kind: 'row', name: r.id, tissue, effect: r.effect, band_nm: r.band_nm, t_s: r.t_s, quantity: r.quantity, expr: r.expr, unit: r.unit, source: r.source, confidence: r.confidence,
          ...(r.when ? { condition: r.when } : {}),
          ...(r.conservative_alt ? { stricterAlt: r.conservative_alt } : {}),
        };
        out.push({ what: `limit row ${r.id} (${tissue}, ${span(r.band_nm, 'nm')}, ${span(r.t_s, 's')}, ${r.effect})`, confidence: r.confidence, source: r.source, entry });
      } else if (isOpen(r.confidence)) out.push({ what: `limit row ${r.id} (${tissue}, ${span(r.band_nm, 'nm')}, ${span(r.t_s, 's')}, ${r.effect})`, confidence: r.confidence, source: r.source });
    }
    for (const a of t.apertures[tissue]) {
      if (isOpen(a.confidence)) out.push({ what: `${tissue} aperture ${a.diameter_mm} mm (${span(a.band_nm, 'nm')}, ${span(a.t_s, 's')})`, confidence: a.confidence, source: a.source });
    }
  }
  for (const [name, def] of Object.entries(t.factors)) {
    if (def.pieces) {
      for (const p of def.pieces) {
        const c = p.confidence ?? def.confidence;
        if (!isOpen(c)) continue;
        const source = p.source ?? def.source ?? '';
        const cond = [p.alpha_mrad, p.when].filter((x): x is string => x !== undefined && x !== '').join(' and ');
        const entry: CheckableEntry = {
          key: factorPieceKey(name, p), kind: 'factor', name, quantity: 'factor', expr: p.expr, unit: def.unit ?? '', source, confidence: c,
          ...(p.band_nm ? { band_nm: p.band_nm } : {}),
          ...(p.t_s ? { t_s: p.t_s } : {}),
          ...(cond ? { condition: cond } : {}),
          ...(p.conservative_alt ? { stricterAlt: p.conservative_alt } : {}),
        };
        out.push({ what: `${factorWords(name)}${p.band_nm ? `, ${span(p.band_nm, 'nm')}` : ''}${p.t_s ? `, ${span(p.t_s, 's')}` : ''}${p.alpha_mrad ? `, ${p.alpha_mrad}` : ''}: ${p.expr}`, confidence: c, source, entry });
      }
    } else if (isOpen(def.confidence)) {
      const expr = def.expr ?? String(def.value);
      const entry: CheckableEntry = { key: factorPieceKey(name), kind: 'factor', name, quantity: 'factor', expr, unit: def.unit ?? '', source: def.source ?? '', confidence: def.confidence, ...(def.band_nm ? { band_nm: def.band_nm } : {}) };
      out.push({ what: `${factorWords(name)}: ${expr}`, confidence: def.confidence, source: def.source ?? '', entry });
    }
  }
  const rp = t.repetitivePulses;
  for (const r of rp.rules) if (isOpen(r.confidence)) out.push({ what: `repetitive pulses, rule ${r.n}: ${r.text}`, confidence: r.confidence, source: r.source });
  if (isOpen(rp.cp.confidence)) out.push({ what: `${factorWords('C_P')}: ${rp.cp.pieces ? 'piecewise form' : rp.cp.expr} (applies to ${rp.cp.appliesTo.join(', ')})`, confidence: rp.cp.confidence, source: rp.cp.source });
  if (isOpen(rp.grouping.confidence)) out.push({ what: `pulse grouping inside ${rp.grouping.factor}`, confidence: rp.grouping.confidence, source: rp.grouping.source });
  const below = rp.grouping.belowTable;
  if (below && isOpen(below.confidence)) out.push({ what: `pulse grouping below ${below.below_nm} nm: ${below.value_s} s`, confidence: below.confidence, source: below.source });
  for (const w of rp.countingWindows) {
    if (!isOpen(w.confidence)) continue;
    const cap = w.cap === undefined ? 'whole exposure' : 'factor' in w.cap ? `at most ${w.cap.factor}` : `at most ${w.cap.seconds} s`;
    out.push({ what: `pulses counted for C_P, ${span(w.band_nm, 'nm')}: ${cap}`, confidence: w.confidence, source: w.source });
  }
  return out;
}

/** The whole list as Markdown (OPEN-POINTS.md). */
export function openPointsMarkdown(): string {
  const lines = [
    '# Open points: table entries not yet read in a published source',
    '',
    'Generated from the confidence marks of the limit tables (core/limits/tables) by `npm run open-points`;',
    'test/core/open-points.test.ts fails when this file and the tables disagree. Every entry below must be',
    'checked against the published document before it is marked `read` (or listed in settings.verifiedRows).',
    'In conservative mode (the default) entries with a stricter alternative use it until then.',
    '',
  ];
  for (const id of RULE_SET_IDS) {
    const points = openPoints(id);
    lines.push(`## ${RULE_SET_NAME[id]} (\`${id}\`): ${points.length} entries`, '');
    for (const p of points) lines.push(`- ${p.what} — ${p.confidence}; ${p.source}`);
    lines.push('');
  }
  return lines.join('\n');
}
