/**
 * The core's derivation trace rendered for reading on paper: one line per step, indented by depth,
 * with the table row or formula, the substituted numbers, the result, and the source and its
 * confidence mark (read / derived / from memory / common practice).
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

function stepLine(s: TraceStep, depth: number): Content {
  const k = KIND_STYLE[s.kind];
  const tags = [s.source, s.confidence].filter((x): x is string => x !== undefined && x !== '');
  return {
    text: [
      { text: `${k.tag}  `, color: k.color, bold: true, fontSize: 6.5 },
      { text: `${s.label}: `, bold: true },
      { text: s.detail, ...(k.bold ? { bold: true } : {}), ...(s.kind === 'warning' ? { color: COLOR.bad } : {}) },
      ...(s.value !== undefined ? [{ text: ` = ${s.value}${s.unit ? ' ' + s.unit : ''}`, bold: true }] : []),
      ...(tags.length > 0 ? [{ text: `   [${tags.join('; ')}]`, color: COLOR.muted, fontSize: 6.8 }] : []),
    ],
    margin: [depth * 10 + 4, 0.5, 0, 0.5],
  };
}

/** Flattens a trace tree into indented lines (one pdfmake node per line keeps layout fast). */
export function traceContent(trace: Trace, depth = 0, out: Content[] = []): Content[] {
  out.push({ text: trace.title, bold: true, fontSize: depth === 0 ? 9 : 8.2, margin: [depth * 10, depth === 0 ? 4 : 3, 0, 1] });
  for (const s of trace.steps) out.push(stepLine(s, depth));
  for (const c of trace.children) traceContent(c, depth + 1, out);
  return out;
}
