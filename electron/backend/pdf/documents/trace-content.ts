/**
 * The core's derivation trace rendered for reading on paper: each step on its own line with the
 * table row or formula, the substituted numbers, the result, and the source with its confidence
 * mark (read / derived / from memory / common practice), indented by depth.
 *
 * Made readable (and short enough to print quickly) in two ways, both stated on the page:
 *  - a sub-derivation identical to one printed earlier in the report is printed once and
 *    referred to by its number afterwards;
 *  - a step identical to one already printed for the same beam (the rule-set note, a factor
 *    such as C_A, a repeated source line) is printed once, and the count of such repeats is given.
 * Each sub-derivation is one text block (not one block per line): pdfmake lays out far fewer nodes.
 */
import type { Content } from 'pdfmake/interfaces';
import type { Trace, TraceKind, TraceStep } from '../../../../core/trace/trace.js';
import { COLOR } from '../page.js';

const KIND_STYLE: Readonly<Record<TraceKind, { tag: string; color: string; bold?: boolean }>> = {
  input: { tag: 'input', color: COLOR.muted },
  assumption: { tag: 'assumed', color: '#6A4C93' },
  row: { tag: 'table', color: '#0B5394' },
  factor: { tag: 'factor', color: '#0B5394' },
  formula: { tag: 'formula', color: '#134F5C' },
  result: { tag: 'result', color: COLOR.ink, bold: true },
  rounding: { tag: 'rounded', color: COLOR.muted },
  conservative: { tag: 'conservative', color: '#B45F06', bold: true },
  warning: { tag: 'WARNING', color: COLOR.bad, bold: true },
  note: { tag: 'note', color: COLOR.muted },
};

type Run = { text: string; bold?: boolean; color?: string; fontSize?: number };

function stepRuns(s: TraceStep): Run[] {
  const k = KIND_STYLE[s.kind];
  const tags = [s.source, s.confidence].filter((x): x is string => x !== undefined && x !== '');
  const runs: Run[] = [
    { text: `${k.tag}  `, color: k.color, bold: true, fontSize: 6.3 },
    { text: `${s.label}: `, bold: true },
    { text: s.detail, ...(k.bold ? { bold: true } : {}), ...(s.kind === 'warning' ? { color: COLOR.bad } : {}) },
  ];
  if (s.value !== undefined) runs.push({ text: ` = ${s.value}${s.unit ? ' ' + s.unit : ''}`, bold: true });
  if (tags.length > 0) runs.push({ text: `   [${tags.join('; ')}]`, color: COLOR.muted, fontSize: 6.6 });
  return runs;
}

function stepKey(s: TraceStep): string {
  return `${s.kind}\u0000${s.label}\u0000${s.detail}\u0000${s.value ?? ''}\u0000${s.unit ?? ''}\u0000${s.source ?? ''}`;
}

/** Shared state across the whole report: which sub-derivations were printed, under which number. */
export class TracePrinter {
  private readonly printed = new Map<string, string>();

  /** Lines for one beam's (or the room's) trace, numbered `prefix`. */
  render(trace: Trace, prefix: string): Content[] {
    const seenSteps = new Set<string>();
    const out: Content[] = [];
    this.walk(trace, prefix, 0, seenSteps, out);
    return out;
  }

  private walk(trace: Trace, number: string, depth: number, seen: Set<string>, out: Content[]): void {
    const indent = depth * 9;
    const key = JSON.stringify(trace);
    const earlier = this.printed.get(key);
    if (earlier !== undefined) {
      out.push({
        text: [{ text: `${number}  ${trace.title}`, bold: true }, { text: ` — identical to ${earlier} above`, italics: true, color: COLOR.muted }],
        fontSize: 7.6,
        margin: [indent, 2, 0, 1],
      });
      return;
    }
    this.printed.set(key, number);
    out.push({ text: `${number}  ${trace.title}`, bold: true, fontSize: depth === 0 ? 8.8 : 8, margin: [indent, depth === 0 ? 4 : 3, 0, 1] });
    const runs: Run[] = [];
    let repeated = 0;
    for (const s of trace.steps) {
      const k = stepKey(s);
      if (seen.has(k)) {
        repeated++;
        continue;
      }
      seen.add(k);
      if (runs.length > 0) runs.push({ text: '\n' });
      runs.push(...stepRuns(s));
    }
    if (repeated > 0) {
      if (runs.length > 0) runs.push({ text: '\n' });
      runs.push({ text: `(${repeated} step${repeated === 1 ? '' : 's'} identical to ones printed above for this beam, not repeated)`, color: COLOR.muted, fontSize: 6.6 });
    }
    if (runs.length > 0) out.push({ text: runs, fontSize: 7.2, margin: [indent + 4, 0, 0, 1] });
    trace.children.forEach((c, i) => this.walk(c, `${number}.${i + 1}`, depth + 1, seen, out));
  }
}
