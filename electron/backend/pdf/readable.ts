/**
 * The last pass before layout: every printed string goes through the core's `readableText`, so no
 * internal source key, working note or "from memory" wording reaches paper, whichever section or
 * core message it came from. Plot SVGs and QR payloads are left as they are (no sentences in them).
 */
import type { TDocumentDefinitions } from 'pdfmake/interfaces';
import { readableText } from '../../../core/provenance/citations.js';

// Layouts, plots, QR payloads and images hold no sentences; layout callbacks run per cell and stay unwrapped.
const SKIP = new Set(['svg', 'qr', 'image', 'watermark', 'layout', 'color', 'style', 'widths', 'fillColor', 'alignment']);

function walk(node: unknown): unknown {
  if (typeof node === 'string') return readableText(node);
  if (Array.isArray(node)) return node.map(walk);
  if (node !== null && typeof node === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(node)) out[k] = SKIP.has(k) || typeof v === 'function' ? v : walk(v);
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
