/**
 * Draw each laid-out line with one PDF text operation per run of equal style, not one per word.
 *
 * pdfmake lays text out as inlines (a word, or a piece we hand it) and draws every inline with its
 * own pdfkit `text` call: colour, font and size set again, a text object opened and closed, the
 * string encoded. A report line of 20 words in one style costs 20 of those (pdfmake's own renderer
 * notes the same: "lines without differently styled inlines should be written to pdf as one stream").
 * Here, just before a line is drawn, neighbouring inlines that look the same and touch are joined:
 *  - same parsed font, size, colour, opacity and character spacing, and no link, decoration,
 *    background, superscript, subscript or page reference on either;
 *  - the second starts exactly where the first ends (a justified line, whose words are spread
 *    apart, keeps its inlines);
 *  - the first ends with a space or tab: pdfkit shapes text word by word, each word with its
 *    trailing space, so the joined string is shaped into the very same glyphs at the very same
 *    positions (no kerning pair is formed across the join).
 * The layout (line breaks, page breaks) is pdfmake's and is not touched; the page shows the same
 * glyphs at the same places, in fewer text objects.
 *
 * Installed on pdfmake's renderer once per process (pdfmake 0.3.11). If the renderer is not found
 * as expected (a changed library), nothing is installed and pdfmake draws as before.
 */
import { createRequire } from 'node:module';

/** The part of a pdfmake inline read here (pdfmake/js/TextInlines.js, measure). */
interface Inline {
  text: string;
  x: number;
  width: number;
  font: unknown;
  fontSize: number;
  color?: unknown;
  opacity?: unknown;
  characterSpacing?: number;
  fontFeatures?: unknown;
  link?: unknown;
  linkToPage?: unknown;
  linkToDestination?: unknown;
  decoration?: unknown;
  background?: unknown;
  sup?: boolean;
  sub?: boolean;
  _pageNodeRef?: unknown;
  lineEnd?: boolean;
}

interface Line {
  inlines: Inline[];
}

interface RendererProto {
  renderLine(this: unknown, line: Line, x: number, y: number): unknown;
}

/** Nothing on the inline that the renderer draws beyond its glyphs. */
function plain(i: Inline): boolean {
  return !i.link && !i.linkToPage && !i.linkToDestination && !i.decoration && !i.background && !i.sup && !i.sub && !i._pageNodeRef && !i.fontFeatures;
}

function joinable(a: Inline, b: Inline): boolean {
  return (
    a.font === b.font &&
    a.fontSize === b.fontSize &&
    a.color === b.color &&
    a.opacity === b.opacity &&
    (a.characterSpacing ?? 0) === 0 &&
    (b.characterSpacing ?? 0) === 0 &&
    (a.text.endsWith(' ') || a.text.endsWith('\t')) &&
    Math.abs(a.x + a.width - b.x) < 1e-9 &&
    plain(a) &&
    plain(b)
  );
}

/** The line's inlines with touching inlines of equal style joined (the input is not changed). */
export function joinedInlines(inlines: readonly Inline[]): Inline[] {
  const out: Inline[] = [];
  for (const inline of inlines) {
    const last = out[out.length - 1];
    if (last !== undefined && joinable(last, inline)) {
      out[out.length - 1] = { ...last, text: last.text + inline.text, width: inline.x + inline.width - last.x, ...(inline.lineEnd ? { lineEnd: true } : {}) };
    } else {
      out.push(inline);
    }
  }
  return out;
}

let installed = false;
let joining = true;

/** Off: lines are drawn inline by inline, as pdfmake does (a test compares the two; nothing else turns it off). */
export function setJoinedRuns(on: boolean): void {
  joining = on;
}

/** Make pdfmake draw joined runs (idempotent). */
export function drawJoinedRuns(): void {
  if (installed) return;
  installed = true;
  let proto: Partial<RendererProto> | undefined;
  try {
    const fromPdfmake = createRequire(createRequire(import.meta.url).resolve('pdfmake/package.json'));
    proto = (fromPdfmake('./js/Renderer.js') as { default?: { prototype?: Partial<RendererProto> } }).default?.prototype;
  } catch {
    return;
  }
  const renderLine = proto?.renderLine;
  if (proto === undefined || typeof renderLine !== 'function') return;
  proto.renderLine = function (this: unknown, line: Line, x: number, y: number): unknown {
    const own = line.inlines;
    if (!joining || !Array.isArray(own) || own.length < 2) return renderLine.call(this, line, x, y);
    line.inlines = joinedInlines(own);
    try {
      return renderLine.call(this, line, x, y);
    } finally {
      line.inlines = own;
    }
  };
}
