/**
 * The officer's checks of the limit tables on paper (issue 12): every document that uses a checked
 * row or factor cites the check in words — "checked against IEC 60825-1:2014 Table A.1 by <name> on
 * <date>" — taken from the checks the revision used (its settings), so a reprint of a signed
 * revision says exactly what it said when signed.
 */
import { allSteps, factorPieceKey, ruleSetTable, type RowCheck, type RuleSetId } from '../../../core/index.js';
import type { TraceStep } from '../../../core/trace/trace.js';
import type { DocumentInput } from './document-input.js';

/** Every check the revision's results used, by entry key (room settings and each beam's own). */
export function checksOf(doc: Pick<DocumentInput, 'content'>): Map<string, RowCheck> {
  const out = new Map<string, RowCheck>();
  const input = doc.content.input;
  for (const c of input.settings?.rowChecks ?? []) out.set(c.key, c);
  for (const l of input.lasers) for (const b of l.beams) for (const c of b.settings?.rowChecks ?? []) out.set(c.key, c);
  return out;
}

/** "checked against IEC 60825-1:2014 Table A.1 by Dr. A on 2026-12-02" (and what differs). */
export function checkedWords(c: RowCheck): string {
  const by = `checked against ${c.reference} by ${c.checkedBy} on ${c.checkedOn}`;
  return c.verdict === 'matches' ? by : `${by}; the published text differs (${c.documentExpr ?? ''}): the lower of the two values is used`;
}

const ROW_LABEL = /^Row (\S+)/;

/**
 * The check behind a trace step, if any: a table row ("Row H-E-VIS-2 (...)") by its id, a factor
 * step by the piece whose expression (or stricter alternative) the step names.
 */
export function checkForStep(checks: ReadonlyMap<string, RowCheck>, ruleSet: RuleSetId, s: TraceStep): RowCheck | undefined {
  if (checks.size === 0) return undefined;
  const row = ROW_LABEL.exec(s.label)?.[1];
  if (row !== undefined) return checks.get(row);
  if (s.kind !== 'factor' && s.kind !== 'conservative') return undefined;
  const def = ruleSetTable(ruleSet).factors[s.label];
  if (!def) return undefined;
  if (!def.pieces) return checks.get(factorPieceKey(s.label));
  const piece = def.pieces.find((p) => s.detail === p.expr || s.detail.startsWith(`${p.expr} `) || (p.conservative_alt !== undefined && s.detail.startsWith(`${p.conservative_alt} `)));
  return piece ? checks.get(factorPieceKey(s.label, piece)) : undefined;
}

/** The checks of the rows and factors the results actually use, in the order the traces name them. */
export function checksUsed(doc: Pick<DocumentInput, 'content' | 'results'>): RowCheck[] {
  const checks = checksOf(doc);
  if (checks.size === 0) return [];
  const out = new Map<string, RowCheck>();
  for (const t of [...doc.results.beams.map((b) => b.trace), doc.results.trace]) {
    for (const s of allSteps(t)) {
      const c = checkForStep(checks, doc.results.ruleSet, s);
      if (c) out.set(c.key, c);
    }
  }
  return [...out.values()];
}

/**
 * One sentence for the notice and the eyewear sheet (inside the caution block): the checked rows
 * their figures rest on, each cited in words; more than two are summed up and left to the report.
 */
export function checksSentence(doc: Pick<DocumentInput, 'content' | 'results'>): string | null {
  const used = checksUsed(doc);
  if (used.length === 0) return null;
  const what = (c: RowCheck): string => `${/^factor:/.test(c.key) ? 'the factor' : 'row'} ${c.key.startsWith('factor:') ? c.key.replace(/^factor:([^[]+)(?:\[(.*)\])?$/, (_m, n: string, span?: string) => (span ? `${n} (${span})` : n)) : c.key} ${checkedWords(c)}`;
  if (used.length <= 2) return `Limit-table entries checked by the officer: ${used.map(what).join('; ')}.`;
  const names = [...new Set(used.map((c) => c.checkedBy))].join(', ');
  const differs = used.filter((c) => c.verdict === 'differs').length;
  return `${used.length} limit-table entries used here were checked against the published text by ${names}${differs ? ` (${differs} differ from the tables: the lower value is used)` : ''}; the report lists each.`;
}
