/**
 * Text handed to pdfmake in short unbreakable pieces of a few words instead of word by word.
 *
 * pdfmake splits ordinary text into one inline per word and measures and lays out each inline on
 * its own (a style look-up of some twenty properties, a width, a place on the line). A piece of
 * about PIECE_CHARS characters cut at spaces and marked noWrap is one inline; lines still break
 * between pieces, so text still wraps, only a little earlier than word by word. About 40 characters
 * at the sizes used for small print (6-8.5 pt, at most about 190 pt in bold) is well under half of
 * the narrowest column such text stands in, so a line never has to break inside a piece.
 */
import type { ContentText } from 'pdfmake/interfaces';

const PIECE_CHARS = 40;
/** A single word longer than this (a long formula without spaces) is left to pdfmake to break. */
const LONG_WORD = 60;

/** `text` cut at spaces into pieces of about PIECE_CHARS characters, each kept whole on its line. */
export function pieces<S extends object>(text: string, style: S): Array<S & { text: string; noWrap?: boolean }> {
  const words = text.match(/[^ \n]*(?: +|\n|$)/g) ?? [text];
  const out: Array<S & { text: string; noWrap?: boolean }> = [];
  let cur = '';
  const flush = (): void => {
    if (cur !== '') out.push({ ...style, text: cur, ...(cur.length <= LONG_WORD && !cur.includes('\n') ? { noWrap: true } : {}) });
    cur = '';
  };
  for (const w of words) {
    if (w === '') continue;
    if (w.includes('\n') || w.length > LONG_WORD) {
      flush();
      cur = w;
      flush();
      continue;
    }
    if (cur.length + w.length > PIECE_CHARS) flush();
    cur += w;
  }
  flush();
  return out;
}

/**
 * A text node with its plain runs cut into pieces (same words, same styles). Runs that are not a
 * plain string or a styled string (nested text, page references) are kept as they are.
 */
export function inPieces(node: ContentText): ContentText {
  const runs = Array.isArray(node.text) ? node.text : [node.text];
  const out: ContentText['text'][] = [];
  for (const r of runs) {
    if (typeof r === 'string') out.push(...pieces(r, {}));
    else if (typeof r === 'object' && r !== null && 'text' in r && typeof r.text === 'string' && !('pageReference' in r) && !('textReference' in r)) {
      const { text, ...style } = r;
      out.push(...pieces(text, style));
    } else out.push(r);
  }
  return { ...node, text: out as ContentText['text'] };
}
