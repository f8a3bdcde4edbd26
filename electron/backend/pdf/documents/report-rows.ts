/**
 * Report: every limit-table row the results rest on, with its band, duration range and formula, the
 * readable citation and whether it was checked against the published text. The machine key of the
 * row (its id in the rule set) is printed as the row's name so the officer can find it in the
 * verification screen; the source key behind the citation never is.
 */
import type { Content, TableCell } from 'pdfmake/interfaces';
import { allSteps, ruleSetTable, type Trace } from '../../../../core/index.js';
import type { LimitRow } from '../../../../core/limits/table-types.js';
import { citationLine, citationOf, STATUS_TEXT, type CheckStatus } from '../../../../core/provenance/citations.js';
import type { DocumentInput } from '../document-input.js';
import { heading, paragraph } from '../blocks.js';
import { COLOR } from '../page.js';
import type { RowCheck } from '../../../../core/model/inputs.js';
import { checkedWords, checksOf } from '../row-checks.js';
import { traceText } from '../../../../core/units/trace-numbers.js';

export interface RowUsed {
  readonly row: LimitRow;
  readonly tissue: 'eye' | 'skin';
  readonly citation: string;
  readonly status: CheckStatus;
  /** The officer's check of the row the results used (issue 12), if any. */
  readonly check?: RowCheck;
}

const ROW_LABEL = /^Row (\S+)/;

/** Rows named by the traces of the results, in the order they first appear, with their citation and status. */
export function rowsUsed(doc: DocumentInput): RowUsed[] {
  const table = ruleSetTable(doc.results.ruleSet);
  const byId = new Map<string, { row: LimitRow; tissue: 'eye' | 'skin' }>();
  for (const row of table.eye) byId.set(row.id, { row, tissue: 'eye' });
  for (const row of table.skin) byId.set(row.id, { row, tissue: 'skin' });
  const order: string[] = [];
  const stricter = new Set<string>();
  const traces: Trace[] = [...doc.results.beams.map((b) => b.trace), doc.results.trace];
  for (const t of traces) {
    for (const s of allSteps(t)) {
      const id = ROW_LABEL.exec(s.label)?.[1];
      if (id === undefined || !byId.has(id)) continue;
      if (!order.includes(id)) order.push(id);
      if (s.kind === 'conservative') stricter.add(id);
    }
  }
  const checks = checksOf(doc);
  return order.map((id) => {
    const { row, tissue } = byId.get(id) as { row: LimitRow; tissue: 'eye' | 'skin' };
    const check = checks.get(id);
    const c = citationOf(row.source, check ? 'read' : row.confidence, !check && stricter.has(id));
    return { row, tissue, citation: c.text, status: c.status, ...(check ? { check } : {}) };
  });
}

/**
 * A band or a duration range in engineering notation (the owner's rule; ISO 80000-1): durations with
 * an SI prefix ("100 fs–10 ps", "10 s–30 ks"); a band reaching 10 µm or beyond in micrometres
 * ("2.6–1000 µm"), as the trade writes the far infrared; shorter bands in nanometres.
 */
export function range(lo: number, hi: number, unit: 's' | 'nm'): string {
  if (unit === 's') return traceText(`${lo}–${hi} s`);
  if (hi >= 1e4) return `${plainNumber(lo / 1000)}–${plainNumber(hi / 1000)} µm`;
  return `${plainNumber(lo)}–${plainNumber(hi)} nm`;
}

function plainNumber(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** Rows grouped under their citation and status, so each citation is printed once. */
export function rowsUsedSection(doc: DocumentInput): Content[] {
  const rows = rowsUsed(doc);
  if (rows.length === 0) return [];
  const groups = new Map<string, RowUsed[]>();
  for (const r of rows) {
    const key = r.check ? `${r.citation} — ${checkedWords(r.check)}` : citationLine({ text: r.citation, status: r.status });
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  const out: Content[] = [
    heading('Limit-table rows used', 2),
    paragraph(
      `Every row of the exposure-limit tables (${doc.results.ruleSetName}) that a result above rests on, under the published document it comes from and whether it was checked against the published text. ` +
        'Where a row was not yet checked and a stricter alternative exists, the stricter value is used. A row checked by an officer names the document, the person and the date of the check.',
      { fontSize: 8, color: COLOR.muted },
    ),
  ];
  for (const [line, members] of groups) {
    const first = members[0] as RowUsed;
    const body: TableCell[][] = members.map((r) => [
      { text: r.row.id, bold: true, noWrap: true },
      r.row.effect,
      range(r.row.band_nm[0], r.row.band_nm[1], 'nm'),
      range(r.row.t_s[0], r.row.t_s[1], 's'),
      `${r.row.quantity === 'E' ? 'E' : 'H'} = ${r.row.expr} ${r.row.unit.replace('^2', '²')}${r.check?.verdict === 'differs' ? `; published: ${r.check.documentExpr ?? ''}` : ''}`,
    ]);
    out.push({
      unbreakable: members.length <= 8,
      stack: [
        {
          text: [
            { text: first.citation === '' ? '' : `${first.citation} — ` },
            first.check
              ? { text: checkedWords(first.check), bold: true, color: first.check.verdict === 'matches' ? COLOR.good : COLOR.bad }
              : { text: STATUS_TEXT[first.status], bold: true, color: first.status === 'checked' ? COLOR.good : COLOR.ink },
          ],
          fontSize: 7.6,
          margin: [0, 4, 0, 1],
        },
        { table: { widths: [70, 90, 70, 70, '*'], body }, layout: 'noBorders', fontSize: 7, margin: [8, 0, 0, 0] },
      ],
    });
    void line;
  }
  return out;
}
