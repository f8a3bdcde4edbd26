/** The two rule sets and their citations. */
import type { RuleSetId } from '../model/inputs.js';
import type { RuleSetTable } from './table-types.js';
import { Dec } from '../numeric/decimal.js';
import { onAnyEdge } from './intervals.js';
import { ICNIRP2013_TABLE } from './tables/icnirp2013.js';
import { EU2006_TABLE } from './tables/eu2006.js';

export const RULE_SETS: Readonly<Record<RuleSetId, RuleSetTable>> = {
  icnirp2013: ICNIRP2013_TABLE,
  eu2006: EU2006_TABLE,
};

export const RULE_SET_IDS: readonly RuleSetId[] = ['icnirp2013', 'eu2006'];
export const DEFAULT_RULE_SET: RuleSetId = 'icnirp2013';

/** Human name with edition, printed on every result and document. */
export const RULE_SET_NAME: Readonly<Record<RuleSetId, string>> = {
  icnirp2013: 'ICNIRP 2013 guidelines (followed by IEC 60825-1:2014 and ANSI Z136.1-2014)',
  eu2006: 'EU Directive 2006/25/EC, Annex II (exposure limit values)',
};

export function ruleSetTable(id: RuleSetId): RuleSetTable {
  return RULE_SETS[id];
}

/** Coverage of both rule sets (limit specification, section 0). */
export const WAVELENGTH_RANGE_NM = [180, 1e6] as const;
export const DURATION_RANGE_S = [1e-13, 3e4] as const;

const bandEdgeCache = new Map<RuleSetId, Set<number>>();

/** Is the wavelength on an inner edge between limit-table bands of the rule set (either tissue; within 1e-9 relative, ./intervals.ts)? */
export function onBandEdge(ruleSet: RuleSetId, wavelength_nm: number): boolean {
  let edges = bandEdgeCache.get(ruleSet);
  // Stryker disable next-line ConditionalExpression: a memo of the table's fixed band edges; rebuilt each time it is the same set (test/mutation/EQUIVALENT.md)
  if (!edges) {
    edges = new Set<number>();
    const t = ruleSetTable(ruleSet);
    for (const row of [...t.eye, ...t.skin]) for (const e of row.band_nm) edges.add(e);
    for (const e of WAVELENGTH_RANGE_NM) edges.delete(e);
    bandEdgeCache.set(ruleSet, edges);
  }
  return onAnyEdge(new Dec(wavelength_nm), edges);
}
