/**
 * Read and parse each font file once per process and hand the same parsed font to every document.
 *
 * pdfkit (under pdfmake) reads the font file and turns it into a font object with fontkit for every
 * new document, and fontkit decodes the large glyph-substitution and positioning tables again on
 * the first text laid out: 50-100 ms per document for the four Roboto styles, none of it
 * document-specific (the per-document part, the embedded subset, is still made per document).
 *
 * How, with the libraries as they are (pdfmake 0.3.11, pdfkit 0.19, fontkit 2):
 *  - fontkit picks a parser by probing the bytes against its registered formats and returns
 *    `new format(stream)`. One more format (fontkit's public `registerFormat`) recognises a short
 *    tag and returns the font parsed earlier.
 *  - pdfkit's `registerFont(name, src)` makes `font(name)` open `src` instead of the file `name`.
 *    Each new pdfmake document registers every font path with its tag before its first font is
 *    opened, so pdfmake's text and the text inside SVG drawings (which asks pdfkit for the path
 *    directly) both get the shared font, cached per document under the same path as before.
 * If any of this is missing or does not answer as expected (a changed library), nothing is
 * registered and pdfkit reads the files as before: slower, same output.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { TFontDictionary } from 'pdfmake/interfaces';

interface Fontkit {
  create(buffer: Uint8Array, postscriptName?: string): unknown;
  registerFormat(format: unknown): void;
}

interface PdfmakeDocumentProto {
  provideFont(this: PdfkitDocument, family: string, bold: boolean, italics: boolean): unknown;
  font(this: PdfkitDocument, ...args: unknown[]): unknown;
}

/** The part of pdfkit's embedded-font object read here: the parsed font and its per-document word cache. */
interface PdfkitFont {
  font?: unknown;
  layoutCache?: Record<string, unknown>;
}

interface PdfkitDocument {
  registerFont(name: string, src: Uint8Array): unknown;
  _font?: PdfkitFont;
}

const requireHere = createRequire(import.meta.url);

/** pdfmake's and pdfkit's modules exactly as pdfmake loads them, so fontkit's registry is the one pdfkit uses. */
function libraries(): { fontkit: Fontkit; documentProto: PdfmakeDocumentProto } | null {
  try {
    const fromPdfmake = createRequire(requireHere.resolve('pdfmake/package.json'));
    const fromPdfkit = createRequire(fromPdfmake.resolve('pdfkit'));
    const fk = fromPdfkit('fontkit') as Partial<Fontkit>;
    const docModule = fromPdfmake('./js/PDFDocument.js') as { default?: { prototype?: Partial<PdfmakeDocumentProto> } };
    const proto = docModule.default?.prototype;
    if (typeof fk.create !== 'function' || typeof fk.registerFormat !== 'function') return null;
    if (proto === undefined || typeof proto.provideFont !== 'function') return null;
    return { fontkit: fk as Fontkit, documentProto: proto as PdfmakeDocumentProto };
  } catch {
    return null;
  }
}

/**
 * Tag bytes: 'BWFK', then 0xFFFFFFFF (so fontkit's DFont probe, which follows a pointer stored
 * here, fails cleanly instead of matching), then the font's index. No font file starts with 'BWFK'.
 */
const MAGIC = [0x42, 0x57, 0x46, 0x4b, 0xff, 0xff, 0xff, 0xff];

function tagIndex(buffer: Uint8Array): number | null {
  if (buffer.length !== MAGIC.length + 1) return null;
  for (let i = 0; i < MAGIC.length; i++) if (buffer[i] !== MAGIC[i]) return null;
  return buffer[MAGIC.length] ?? null;
}

const parsed: unknown[] = [];
/** Font file path -> tag standing for its parsed font. */
const tags = new Map<string, Uint8Array>();
let done = false;

/** Parse every file of `fonts` once and make every later pdfmake document reuse them. Idempotent. */
export function shareParsedFonts(fonts: TFontDictionary): void {
  if (done) return;
  done = true;
  const libs = libraries();
  if (libs === null) return;
  const { fontkit, documentProto } = libs;
  // fontkit.create calls `new format(stream)`; a constructor that returns an object yields that object.
  function SharedFont(stream: { buffer: Uint8Array }): unknown {
    const i = tagIndex(stream.buffer);
    const font = i === null ? undefined : parsed[i];
    if (font === undefined) throw new Error('unknown shared font tag');
    return font;
  }
  SharedFont.probe = (buffer: Uint8Array): boolean => tagIndex(buffer) !== null;
  fontkit.registerFormat(SharedFont);
  for (const styles of Object.values(fonts)) {
    for (const file of Object.values(styles)) {
      if (typeof file !== 'string' || tags.has(file)) continue;
      try {
        const index = parsed.length;
        parsed.push(fontkit.create(readFileSync(file)));
        const tag = Uint8Array.from([...MAGIC, index]);
        if (fontkit.create(tag) === parsed[index]) tags.set(file, tag); // only if pdfkit's fontkit answers the tag
      } catch {
        // unreadable or unparsable here: pdfkit opens the file itself and reports the error
      }
    }
  }
  if (tags.size === 0) return;
  shareWordLayouts(documentProto);
  const provideFont = documentProto.provideFont;
  const registeredDocs = new WeakSet<object>();
  documentProto.provideFont = function (this: PdfkitDocument, family: string, bold: boolean, italics: boolean): unknown {
    if (!registeredDocs.has(this)) {
      registeredDocs.add(this);
      for (const [file, tag] of tags) this.registerFont(file, tag);
    }
    return provideFont.call(this, family, bold, italics);
  };
}

/**
 * Word shapes shared across documents. pdfkit keeps, per document and font, a cache from each word
 * to its shaped glyph run (fontkit's substitution and positioning, the bulk of measuring text); a
 * new document starts it empty, so every report shaped its whole vocabulary again. The run depends
 * only on the parsed font and the word (pdfkit calls it without features and scales it to its fixed
 * 1000-unit em, and never changes a cached run), so documents using the same parsed font can share
 * one cache. Bounded: past WORD_CACHE_LIMIT words a fresh cache is started for later documents.
 */
const WORD_CACHE_LIMIT = 50_000;
const wordCaches = new Map<unknown, Record<string, unknown>>();

/** The shared word cache of one parsed font; counted (once per document and font) and started afresh past the bound. */
function sharedWordCache(parsedFont: unknown): Record<string, unknown> {
  let words = wordCaches.get(parsedFont);
  if (words === undefined || Object.keys(words).length > WORD_CACHE_LIMIT) {
    words = Object.create(null) as Record<string, unknown>;
    wordCaches.set(parsedFont, words);
  }
  return words;
}

/** Forget the shared word shapes (the benchmark shows a first print without them). */
export function clearSharedWordLayouts(): void {
  wordCaches.clear();
}

let sharingWords = true;

/**
 * Off: documents started from now on keep pdfkit's own per-document word cache, as without this
 * module (a test compares the two; nothing else turns it off).
 */
export function setWordShapeSharing(on: boolean): void {
  sharingWords = on;
}

function shareWordLayouts(documentProto: PdfmakeDocumentProto): void {
  const font = documentProto.font;
  const shared = new Set(parsed);
  documentProto.font = function (this: PdfkitDocument, ...args: unknown[]): unknown {
    const out = font.apply(this, args);
    const current = this._font;
    if (sharingWords && current !== undefined && shared.has(current.font) && current.layoutCache !== undefined && !wordCacheOwners.has(current)) {
      wordCacheOwners.add(current);
      current.layoutCache = sharedWordCache(current.font);
    }
    return out;
  };
}

const wordCacheOwners = new WeakSet<object>();
