/**
 * The last pass before layout: every printed string goes through the core's `readableText`, so no
 * internal source key, working note or "from memory" wording reaches paper, whichever section or
 * core message it came from; then through the core's one formula formatter
 * (`core/units/formula-text.ts`): programmer notation becomes the standards' notation (×, λ,
 * exponents raised, subscripts lowered with pdfmake's `sup` / `sub`) and a number keeps its unit on
 * its line (no-break space, ISO 80000-1 clause 7). SVG drawings (room plans, signs) and QR payloads are left as they are
 * (no sentences in them).
 */
import type { TDocumentDefinitions } from 'pdfmake/interfaces';
import { readableText } from '../../../core/provenance/citations.js';
import { formulaRunsNoBreak } from '../../../core/units/formula-text.js';

// Layouts, plots, QR payloads and images hold no sentences; layout callbacks run per cell and stay unwrapped.
const SKIP = new Set(['svg', 'qr', 'image', 'watermark', 'layout', 'color', 'style', 'widths', 'fillColor', 'alignment']);

type Inline = Record<string, unknown> & { text: string };

/** The printed string as pdfmake inlines carrying `props` (pdfmake does not pass a parent's style to nested inlines), or the string itself. */
function inlines(text: string, props: Record<string, unknown>): string | Inline[] {
  // U+202F (the narrow no-break space of digit groups, "30 000") is not in Roboto: a full no-break space keeps the group joined and visible
  const runs = formulaRunsNoBreak(readableText(text).replace(/\u202F/g, '\u00A0'));
  const only = runs.length === 1 ? runs[0] : undefined;
  if (only !== undefined && only.script === undefined) return only.text;
  return runs.map((r) => ({ ...props, text: r.text, ...(r.script === 'sup' ? { sup: true } : r.script === 'sub' ? { sub: true } : {}) }));
}

/** The elements of an inline array (the value of a `text` key): a formula's pieces take the place of their string. */
function walkInlines(items: readonly unknown[]): unknown[] {
  return items.flatMap((item): unknown[] => {
    if (typeof item === 'string') return [inlines(item, {})].flat();
    if (item !== null && typeof item === 'object' && !Array.isArray(item) && typeof (item as { text?: unknown }).text === 'string') {
      const { text, ...props } = item as Inline;
      const walked = walk(props) as Record<string, unknown>;
      const out = inlines(text, walked);
      return typeof out === 'string' ? [{ ...walked, text: out }] : out;
    }
    return [walk(item)];
  });
}

function walk(node: unknown): unknown {
  if (typeof node === 'string') {
    const out = inlines(node, {});
    return typeof out === 'string' ? out : { text: out };
  }
  if (Array.isArray(node)) return node.map(walk);
  if (node !== null && typeof node === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(node)) {
      if (SKIP.has(k) || typeof v === 'function') out[k] = v;
      else if (k === 'text' && typeof v === 'string') out[k] = inlines(v, {});
      else if (k === 'text' && Array.isArray(v)) out[k] = walkInlines(v);
      else if (typeof v === 'string') out[k] = k === 'text' ? v : readableText(v);
      else out[k] = walk(v);
    }
    return out;
  }
  return node;
}

export function readableDefinition(dd: TDocumentDefinitions): TDocumentDefinitions {
  const { content, header, footer, background, ...rest } = dd;
  return {
    ...rest,
    content: walk(content) as TDocumentDefinitions['content'],
    ...(header === undefined ? {} : { header: typeof header === 'function' ? (...a: Parameters<typeof header>) => walk(header(...a)) as ReturnType<typeof header> : (walk(header) as typeof header) }),
    ...(footer === undefined ? {} : { footer: typeof footer === 'function' ? (...a: Parameters<typeof footer>) => walk(footer(...a)) as ReturnType<typeof footer> : (walk(footer) as typeof footer) }),
    ...(background === undefined ? {} : { background }),
  };
}
