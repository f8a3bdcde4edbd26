/**
 * The last pass before layout: every printed string goes through the core's `readableText`, so no
 * internal source key, working note or "from memory" wording reaches paper, whichever section or
 * core message it came from. Plot SVGs and QR payloads are left as they are (no sentences in them).
 */
import type { TDocumentDefinitions } from 'pdfmake/interfaces';
import { readableText } from '../../../core/provenance/citations.js';

const SKIP = new Set(['svg', 'qr', 'image', 'watermark']);

function walk(node: unknown): unknown {
  if (typeof node === 'string') return readableText(node);
  if (Array.isArray(node)) return node.map(walk);
  if (typeof node === 'function') {
    const f = node as (...a: unknown[]) => unknown;
    return (...a: unknown[]) => walk(f(...a));
  }
  if (node !== null && typeof node === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(node)) out[k] = SKIP.has(k) || k === 'color' || k === 'style' ? v : walk(v);
    return out;
  }
  return node;
}

export function readableDefinition(dd: TDocumentDefinitions): TDocumentDefinitions {
  const { content, header, footer, background, ...rest } = dd;
  return {
    ...rest,
    content: walk(content) as TDocumentDefinitions['content'],
    ...(header === undefined ? {} : { header: walk(header) as TDocumentDefinitions['header'] }),
    ...(footer === undefined ? {} : { footer: walk(footer) as TDocumentDefinitions['footer'] }),
    ...(background === undefined ? {} : { background }),
  };
}
