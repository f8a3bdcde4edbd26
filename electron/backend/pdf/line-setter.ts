/**
 * Lines of small print set here, with the embedded font's own metrics, and handed to pdfmake as
 * one unbreakable piece per line and style (and a line end), instead of word by word.
 *
 * pdfmake measures, places and draws every inline on its own; the report's derivation appendix is
 * thousands of short steps, and word by word (or in short pieces) it is most of the report's
 * printing time. Here each word is measured exactly as pdfkit measures it when pdfmake asks (the
 * parsed Roboto file, shaped by fontkit word by word, each word with its trailing space: pdfkit's
 * EmbeddedFont.widthOfString), the words are set greedily into lines no wider than the column
 * (less HALF_POINT, so a rounding difference can never push a piece past the margin), and every
 * line goes to pdfmake as a few noWrap pieces and a line end. pdfmake then finds every line already
 * made: the words on paper are where word-by-word setting would put them, give or take the last
 * word of a line that would just have fitted in the half point.
 * If the font cannot be read here, `setLines` returns null and the caller falls back to pieces.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { FONTS } from './runtime.js';
import { shareParsedFonts, sharedParsedFont } from './shared-fonts.js';

export interface StyledRun {
  text: string;
  bold?: boolean;
  italics?: boolean;
  color?: string;
  fontSize?: number;
  noWrap?: boolean;
}

interface ShapedFont {
  unitsPerEm: number;
  layout(text: string): { advanceWidth: number };
}

/** Room left at the right end of every line, pt. */
const HALF_POINT = 0.5;
const requireHere = createRequire(import.meta.url);

interface Metrics {
  font: ShapedFont;
  /** Word (with its trailing space) -> advance in font units; shared by every document of the process. */
  words: Map<string, number>;
}

const metrics = new Map<string, Metrics | null>();

function metricsFor(bold: boolean, italics: boolean): Metrics | null {
  const roboto = FONTS['Roboto'];
  const file = roboto === undefined ? undefined : bold ? (italics ? roboto.bolditalics : roboto.bold) : italics ? roboto.italics : roboto.normal;
  if (typeof file !== 'string') return null;
  let m = metrics.get(file);
  if (m === undefined) {
    shareParsedFonts(FONTS); // idempotent: the definition may be made before the first render
    try {
      const fromPdfkit = createRequire(createRequire(requireHere.resolve('pdfmake/package.json')).resolve('pdfkit'));
      const fontkit = fromPdfkit('fontkit') as { create(b: Uint8Array): unknown };
      // the process's parsed font when shared-fonts.ts has it (its word shapes are then parsed once)
      const font = (sharedParsedFont(file) ?? fontkit.create(readFileSync(file))) as Partial<ShapedFont>;
      m = typeof font.layout === 'function' && typeof font.unitsPerEm === 'number' ? { font: font as ShapedFont, words: new Map() } : null;
    } catch {
      m = null;
    }
    metrics.set(file, m);
  }
  return m;
}

/** Width in pt of `text` as pdfkit measures it: word by word, each word with its one trailing space or tab. */
function widthOf(m: Metrics, text: string, size: number): number {
  let units = 0;
  let last = 0;
  for (let i = 0; i <= text.length; i++) {
    if (i === text.length ? last < i : text[i] === ' ' || text[i] === '\t') {
      const word = text.slice(last, i + 1);
      let w = m.words.get(word);
      if (w === undefined) {
        w = m.font.layout(word).advanceWidth;
        if (m.words.size < 50_000) m.words.set(word, w);
      }
      units += w;
      last = i + 1;
    }
  }
  return (units * size) / m.font.unitsPerEm;
}

/**
 * `runs` (one paragraph, styles in the runs, `baseSize` for runs without a size) set into lines no
 * wider than `width` pt; a '\n' in a run ends its line. Returns pdfmake text runs: per line, one
 * noWrap piece per style, then a line-end run. Null when the font metrics are not available.
 */
export function setLines(runs: readonly StyledRun[], width: number, baseSize: number): StyledRun[] | null {
  const limit = width - HALF_POINT;
  const out: StyledRun[] = [];
  let x = 0; // width of the line so far, with the trailing spaces of its last word
  let lineEmpty = true;
  const endLine = (): void => {
    out.push({ text: '\n' });
    x = 0;
    lineEmpty = true;
  };
  for (const run of runs) {
    const { text, ...style } = run;
    const m = metricsFor(style.bold === true, style.italics === true);
    if (m === null) return null;
    const size = style.fontSize ?? baseSize;
    let piece = '';
    const flush = (): void => {
      if (piece !== '') out.push({ ...style, text: piece, noWrap: true });
      piece = '';
    };
    for (const w of text.match(/[^ \n]*(?: +|\n|$)/g) ?? []) {
      if (w === '') continue;
      const newline = w.endsWith('\n');
      const word = newline ? w.slice(0, -1) : w;
      const ink = word.trimEnd();
      const wInk = widthOf(m, ink, size);
      const wAll = ink === word ? wInk : widthOf(m, word, size);
      if (!lineEmpty && x + wInk > limit && ink !== '') {
        flush();
        endLine();
      }
      if (lineEmpty && wInk > limit) {
        // longer than a whole line (a formula without spaces): pdfmake breaks it where it can
        flush();
        out.push({ ...style, text: word });
        endLine();
        continue;
      }
      piece += word;
      x += wAll;
      lineEmpty = lineEmpty && ink === '';
      if (newline) {
        flush();
        endLine();
      }
    }
    flush();
  }
  return out;
}
