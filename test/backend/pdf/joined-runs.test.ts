// @vitest-environment node
/**
 * A line's touching words of one style are drawn as one text run (electron/backend/pdf/merged-runs.ts)
 * to print faster. That must not move a single word: read back with poppler's `pdftotext -bbox`,
 * every word of the report, the door notice and the eyewear sheet has the same text and the same box
 * (to 0.01 pt) as when pdfmake draws inline by inline; every page looks the same (rendered at 50 dpi
 * by pdftoppm, no more than 1 pixel in 2000 differs by more than an eighth of the scale in any
 * colour: the edge smoothing of a glyph may differ by a fraction of a pixel, a wrong colour, font or
 * size would not pass); and the pages hold far fewer text objects (counted in the inflated page
 * streams). Self-consistency check of the printing machinery; no published source.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { requireTool } from '../../support/required-tool.js';
import { renderDoorNotice, renderEyewearSheet, renderReport, type DocumentInput, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { setJoinedRuns } from '../../../electron/backend/pdf/merged-runs.js';
import { benchDocument, tenLaserRoom } from './ten-laser-room.js';

/** Every word with its page and box, from `pdftotext -bbox` (poppler). */
function wordBoxes(pdf: Buffer): string[] {
  const dir = mkdtempSync(join(tmpdir(), 'bw-pdf-joined-'));
  try {
    const file = join(dir, 'doc.pdf');
    writeFileSync(file, pdf);
    const html = execFileSync(requireTool('pdftotext', 'poppler-utils', 'to read word boxes from the PDF'), ['-bbox', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
    const out: string[] = [];
    let page = 0;
    for (const m of html.matchAll(/<page width|<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)) {
      if (m[1] === undefined) page++;
      else out.push(`${page} ${[m[1], m[2], m[3], m[4]].map((v) => Number(v).toFixed(2)).join(' ')} ${m[5] ?? ''}`);
    }
    return out;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Each page rendered at 50 dpi (pdftoppm, binary PPM): width, height and RGB bytes. */
function pageImages(pdf: Buffer): Array<{ width: number; height: number; rgb: Buffer }> {
  const dir = mkdtempSync(join(tmpdir(), 'bw-pdf-joined-'));
  try {
    const file = join(dir, 'doc.pdf');
    writeFileSync(file, pdf);
    execFileSync(requireTool('pdftoppm', 'poppler-utils', 'to render the PDF pages'), ['-r', '50', file, join(dir, 'p')]);
    return readdirSync(dir)
      .filter((f) => f.endsWith('.ppm'))
      .sort()
      .map((f) => {
        const bytes = readFileSync(join(dir, f));
        const head = /^P6\s+(\d+)\s+(\d+)\s+255\s/.exec(bytes.subarray(0, 40).toString('latin1'));
        if (head === null) throw new Error(`${f}: not a binary PPM`);
        return { width: Number(head[1]), height: Number(head[2]), rgb: bytes.subarray(head[0].length) };
      });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Per page, the share of pixels where any colour differs by more than 32 of 255. */
function pixelsChanged(a: Buffer, b: Buffer): number[] {
  const pa = pageImages(a);
  const pb = pageImages(b);
  expect(pb.length).toBe(pa.length);
  return pa.map((p, i) => {
    const q = pb[i];
    if (q === undefined || q.width !== p.width || q.height !== p.height) return 1;
    let n = 0;
    for (let k = 0; k < p.rgb.length; k += 3) {
      for (let c = 0; c < 3; c++) {
        if (Math.abs((p.rgb[k + c] ?? 0) - (q.rgb[k + c] ?? 0)) > 32) {
          n++;
          break;
        }
      }
    }
    return n / (p.width * p.height);
  });
}

/** Text objects (BT ... ET) in every compressed stream of the file. */
function textObjects(pdf: Buffer): number {
  let n = 0;
  const s = pdf.toString('latin1');
  for (const m of s.matchAll(/\/FlateDecode[^]*?stream\r?\n/g)) {
    const start = (m.index ?? 0) + m[0].length;
    const end = s.indexOf('endstream', start);
    let body: string;
    try {
      body = inflateSync(pdf.subarray(start, end)).toString('latin1');
    } catch {
      continue; // not a page stream (font programs are inflated too, and say nothing here)
    }
    n += body.match(/\bBT\b/g)?.length ?? 0;
  }
  return n;
}

const doc: DocumentInput = benchDocument(tenLaserRoom());

const cases: ReadonlyArray<{ what: string; opts: RenderOptions; render: (d: DocumentInput, o: RenderOptions) => Promise<Buffer>; fewer: number }> = [
  // `fewer`: the joined file has at most this share of the inline-by-inline file's text objects
  { what: 'report, A4, SI', opts: { paper: 'A4', units: 'SI' }, render: renderReport, fewer: 0.6 },
  { what: 'door notice, Letter', opts: { paper: 'Letter', units: 'ANSI' }, render: renderDoorNotice, fewer: 0.5 },
  { what: 'eyewear sheet, Letter', opts: { paper: 'Letter', units: 'SI' }, render: renderEyewearSheet, fewer: 0.5 },
];

describe('joined text runs leave every word where it was', () => {
  it.each(cases)('$what: same words in the same boxes, same page images, fewer text objects', async ({ opts, render, fewer }) => {
    setJoinedRuns(false);
    let apart: Buffer;
    try {
      apart = await render(doc, opts);
    } finally {
      setJoinedRuns(true);
    }
    const joined = await render(doc, opts);
    const before = wordBoxes(apart);
    expect(before.length).toBeGreaterThan(100);
    expect(wordBoxes(joined)).toEqual(before);
    for (const share of pixelsChanged(apart, joined)) expect(share).toBeLessThanOrEqual(1 / 2000);
    expect(textObjects(joined)).toBeLessThanOrEqual(textObjects(apart) * fewer);
  }, 120_000);
});
