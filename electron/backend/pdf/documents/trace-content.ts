/**
 * The core's derivation trace rendered for reading on paper: each step on its own line with the
 * table row or formula, the substituted numbers, the result, and the source with its confidence
 * mark (read / derived / from memory / common practice), indented by depth.
 *
 * Made readable (and short enough to print quickly) in four ways, all stated on the page:
 *  - a sub-derivation identical to one printed earlier in the report is printed once and
 *    referred to by its number afterwards;
 *  - a step identical to one already printed anywhere in the report (the rule-set note, a factor
 *    such as C_A) is printed once and referred to by the number where it stands ("as in D1.2");
 *  - sources are numbered for the whole report ([1], [2] ...) and listed once, each as a readable
 *    citation with its check status, instead of repeating the same long citation on every line;
 *  - the rule-set name, stated at the head of the appendix, is left out of the sub-titles.
 * Each sub-derivation is one text block (not one block per line): pdfmake lays out far fewer nodes.
 * Within the block, text is handed to pdfmake in short unbreakable pieces of a few words
 * (../text-pieces.ts): pdfmake measures every inline separately and would otherwise make one inline
 * per word; lines still break between the pieces, so nothing runs past the margin.
 */
import type { Content } from 'pdfmake/interfaces';
import type { Trace, TraceKind, TraceStep } from '../../../../core/trace/trace.js';
import { citationLine, citationOf, readableText, stepLabelText } from '../../../../core/provenance/citations.js';
import { COLOR } from '../page.js';
import type { RowCheck } from '../../../../core/model/inputs.js';
import { checkedWords } from '../row-checks.js';
import { traceStepValue, traceText } from '../../../../core/units/trace-numbers.js';
import { formulaLinear } from '../../../../core/units/formula-text.js';
import { pieces } from '../text-pieces.js';

const KIND_STYLE: Readonly<Record<TraceKind, { tag: string; color: string; bold?: boolean }>> = {
  input: { tag: 'input', color: COLOR.muted },
  assumption: { tag: 'assumed', color: '#6A4C93' },
  row: { tag: 'table', color: '#0B5394' },
  // 'parameter': the step names the factor itself ("Correction factor C_A", "Break-point time T_2")
  factor: { tag: 'parameter', color: '#0B5394' },
  formula: { tag: 'formula', color: '#134F5C' },
  result: { tag: 'result', color: COLOR.ink, bold: true },
  rounding: { tag: 'rounded', color: COLOR.muted },
  conservative: { tag: 'conservative', color: '#B45F06', bold: true },
  warning: { tag: 'WARNING', color: COLOR.bad, bold: true },
  note: { tag: 'note', color: COLOR.muted },
};

type Run = { text: string; bold?: boolean; color?: string; fontSize?: number; noWrap?: boolean };

function stepRuns(s: TraceStep, ref: string | null): Run[] {
  const k = KIND_STYLE[s.kind];
  // numbers with a unit in engineering notation, all figures kept (core/units/trace-numbers.ts);
  // a parameter whose table expression is its bare value ("1.5") reads with its unit ("1.5 mrad")
  // the formula's words in the standards' notation and each number held to its unit before the text
  // is cut into pieces (core/units/formula-text.ts; ISO 80000-1 clause 7); exponents and subscripts
  // are set by the last pass (readable.ts)
  const valueText = formulaLinear(traceStepValue(s));
  const detail = formulaLinear(s.value !== undefined && s.detail === s.value ? traceStepValue(s) : traceText(readableText(s.detail)));
  const runs: Run[] = [
    { text: `${k.tag}  `, color: k.color, bold: true, fontSize: 6.3, noWrap: true },
    ...pieces(`${stepLabelText(s)}: `, { bold: true }),
    ...pieces(detail, { ...(k.bold ? { bold: true } : {}), ...(s.kind === 'warning' ? { color: COLOR.bad } : {}) }),
  ];
  // "Wavelength: 800 nm = 800 nm": the value is not repeated when the detail already says it.
  if (valueText !== '' && !detail.endsWith(valueText)) runs.push(...pieces(` = ${valueText}`, { bold: true }));
  if (ref !== null) runs.push({ text: `  ${ref}`, color: COLOR.muted, fontSize: 6.6, noWrap: true });
  return runs;
}

function stepKey(s: TraceStep): string {
  return `${s.kind}\u0000${s.label}\u0000${s.detail}\u0000${s.value ?? ''}\u0000${s.unit ?? ''}\u0000${s.source ?? ''}`;
}

/** Shared state across the whole report: which sub-derivations and steps were printed, under which number. */
export class TracePrinter {
  private readonly printed = new Map<string, string>();

  /** Step key -> number of the sub-derivation where it was first printed. */
  private readonly printedSteps = new Map<string, string>();

  /** Readable citation line -> its number, for the whole report (listed once, at the end). */
  private readonly sources = new Map<string, string>();

  /**
   * `checkFor`: the officer's check behind a step (issue 12), cited in its source line instead of
   * the table's own status ("checked against … by … on …").
   */
  constructor(
    private readonly ruleSetName: string,
    private readonly checkFor: (s: TraceStep) => RowCheck | undefined = () => undefined,
  ) {}

  /** Lines for one beam's (or the room's) trace, numbered `prefix`. */
  render(trace: Trace, prefix: string): Content[] {
    const out: Content[] = [];
    this.walk(trace, prefix, 0, out);
    return out;
  }

  /** The numbered list of every citation used above, each with its check status. */
  sourceList(): Content[] {
    if (this.sources.size === 0) return [];
    const runs: Run[] = [];
    for (const [line, ref] of this.sources) {
      if (runs.length > 0) runs.push({ text: '\n' });
      runs.push({ text: `${ref} `, bold: true, noWrap: true }, ...pieces(line, {}));
    }
    return [{ text: runs, fontSize: 7, color: COLOR.ink, margin: [0, 2, 0, 2] }];
  }

  private refFor(s: TraceStep): string | null {
    if ((s.source ?? '') === '' && (s.confidence ?? '') === '') return null;
    const check = this.checkFor(s);
    const c = citationOf(s.source, s.confidence, s.kind === 'conservative');
    const line = check ? `${c.text === '' ? '' : `${c.text} — `}${checkedWords(check)}` : citationLine(c);
    let ref = this.sources.get(line);
    if (ref === undefined) {
      ref = `[${this.sources.size + 1}]`;
      this.sources.set(line, ref);
    }
    return ref;
  }

  private title(t: Trace): string {
    // words in the standards' notation before the title is cut into pieces (core/units/formula-text.ts)
    return formulaLinear(traceText(t.title.replace(` (${this.ruleSetName})`, '')));
  }

  private walk(trace: Trace, number: string, depth: number, out: Content[]): void {
    const indent = depth * 9;
    const key = JSON.stringify(trace);
    const earlier = this.printed.get(key);
    if (earlier !== undefined) {
      out.push({
        text: [...pieces(`${number}  ${this.title(trace)}`, { bold: true }), ...pieces(` — as in ${earlier}`, { italics: true, color: COLOR.muted })],
        fontSize: 7.6,
        margin: [indent, 2, 0, 1],
      });
      return;
    }
    this.printed.set(key, number);
    out.push({ text: pieces(`${number}  ${this.title(trace)}`, {}), bold: true, fontSize: depth === 0 ? 8.8 : 8, margin: [indent, depth === 0 ? 4 : 3, 0, 1] });
    const runs: Run[] = [];
    const asIn = new Map<string, number>();
    for (const s of trace.steps) {
      const k = stepKey(s);
      const where = this.printedSteps.get(k);
      if (where !== undefined) {
        asIn.set(where, (asIn.get(where) ?? 0) + 1);
        continue;
      }
      this.printedSteps.set(k, number);
      if (runs.length > 0) runs.push({ text: '\n' });
      runs.push(...stepRuns(s, this.refFor(s)));
    }
    if (asIn.size > 0) {
      const n = [...asIn.values()].reduce((a, b) => a + b, 0);
      if (runs.length > 0) runs.push({ text: '\n' });
      runs.push(...pieces(`(${n} further step${n === 1 ? '' : 's'} as in ${[...asIn.keys()].join(', ')})`, { color: COLOR.muted, fontSize: 6.6 }));
    }
    if (runs.length > 0) out.push({ text: runs, fontSize: 7.2, margin: [indent + 4, 0, 0, 1] });
    trace.children.forEach((c, i) => this.walk(c, `${number}.${i + 1}`, depth + 1, out));
  }
}
