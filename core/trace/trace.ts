/**
 * The derivation trace: structured data that the report and the UI render, with a plain-text form.
 * Every number an officer sees can be followed back to a table row, its source and its confidence.
 */
import { formulaText } from '../units/formula-text.js';

export type TraceKind =
  | 'input'
  | 'assumption'
  | 'row'
  | 'factor'
  | 'formula'
  | 'result'
  | 'rounding'
  | 'conservative'
  | 'warning'
  | 'note';

export interface TraceStep {
  readonly kind: TraceKind;
  /** Short label, e.g. "C_A" or "Row H-E-VIS-4". */
  readonly label: string;
  /** What was done, with the numbers substituted where it is a formula. */
  readonly detail: string;
  /** Decimal string of the value, if the step yields one. */
  readonly value?: string;
  readonly unit?: string;
  /** Source key(s) or citation. */
  readonly source?: string;
  /** read / derived / from memory / from memory, uncertain / ours / common practice. */
  readonly confidence?: string;
}

export interface Trace {
  readonly title: string;
  readonly steps: TraceStep[];
  readonly children: Trace[];
}

export function newTrace(title: string): Trace {
  return { title, steps: [], children: [] };
}

export function addStep(trace: Trace, step: TraceStep): void {
  trace.steps.push(step);
}

/**
 * Plain-text rendering, indented by depth; titles and formulas in the standards' notation through
 * the one formula formatter (core/units/formula-text.ts), as on paper and on screen.
 */
export function traceToText(trace: Trace, depth = 0): string {
  const pad = '  '.repeat(depth);
  const lines = [`${pad}${formulaText(trace.title)}`];
  for (const s of trace.steps) {
    let line = `${pad}  [${s.kind}] ${formulaText(s.label)}: ${formulaText(s.detail)}`;
    if (s.value !== undefined) line += ` = ${s.value}${s.unit ? ' ' + s.unit : ''}`;
    const tags = [s.source, s.confidence].filter((x): x is string => Boolean(x));
    if (tags.length) line += `  {${tags.join('; ')}}`;
    lines.push(line);
  }
  for (const c of trace.children) lines.push(traceToText(c, depth + 1));
  return lines.join('\n');
}

/** All steps of a trace tree, depth first (for searches such as "was a conservative value used?"). */
export function allSteps(trace: Trace): TraceStep[] {
  return [...trace.steps, ...trace.children.flatMap(allSteps)];
}
