/**
 * Reading the rendered PDFs back the way a person or an auditor's tool would: text with poppler's
 * pdftotext (pages split at form feeds), page images with pdftoppm, QR codes decoded from the page
 * image with jsQR. No mocks: the real pdfmake output is inspected.
 */
import { execFileSync } from 'node:child_process';
import { requireTool } from '../../support/required-tool.js';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import jsQR from 'jsqr';
import { PNG } from 'pngjs';
import { formulaRuns } from '../../../core/units/formula-text.js';

function withFile<T>(pdf: Buffer, f: (file: string, dir: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), 'bw-pdf-test-'));
  try {
    const file = join(dir, 'doc.pdf');
    writeFileSync(file, pdf);
    return f(file, dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Text of each page (reading order, not layout), whitespace collapsed so wrapped lines still match. */
export function pageTexts(pdf: Buffer): string[] {
  const raw = withFile(pdf, (file) => execFileSync(requireTool('pdftotext', 'poppler-utils', 'to read the PDF text back'), ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }));
  const pages = raw.split('\f');
  if (pages.length > 1 && pages[pages.length - 1]?.trim() === '') pages.pop();
  return pages.map(collapse);
}

export function collapse(s: string): string {
  return s.replace(/\s+/g, ' ').trim();
}

export interface PdfInfo {
  readonly pages: number;
  /** Page size in points, e.g. [595.28, 841.89]. */
  readonly size: readonly [number, number];
}

export function pdfInfo(pdf: Buffer): PdfInfo {
  const out = withFile(pdf, (file) => execFileSync('pdfinfo', [file], { encoding: 'utf8' }));
  const pages = Number(/Pages:\s+(\d+)/.exec(out)?.[1]);
  const m = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(out);
  return { pages, size: [Number(m?.[1]), Number(m?.[2])] };
}

/** Decode the QR code on one page (1-based) from a 150 dpi rendering; null when none is found. */
export function decodeQr(pdf: Buffer, page: number): string | null {
  return withFile(pdf, (file, dir) => {
    const base = join(dir, 'page');
    execFileSync(requireTool('pdftoppm', 'poppler-utils', 'to render the PDF pages'), ['-png', '-r', '150', '-f', String(page), '-l', String(page), '-singlefile', file, base]);
    const png = PNG.sync.read(readFileSync(`${base}.png`));
    const code = jsQR(new Uint8ClampedArray(png.data), png.width, png.height);
    return code === null ? null : code.data;
  });
}

/** SI value of a printed quantity such as "70 km", "4.8 m", "8.32e-6 J/m²", "25.4 mW/cm²". */
export function siValue(number: string, unit: string): number {
  const prefix: Record<string, number> = { '': 1, k: 1e3, m: 1e-3, 'µ': 1e-6, n: 1e-9 };
  const m = /^(k|m|µ|n)?(m|W\/m²|J\/m²|W\/cm²|J\/cm²)$/.exec(unit);
  if (!m) throw new Error(`unknown unit ${unit}`);
  const base = m[2] as string;
  const p = prefix[m[1] ?? ''] as number;
  const area = base.endsWith('/cm²') ? 1e4 : 1;
  return Number(number) * p * area;
}

/** Text of the whole document in poppler's layout mode (columns kept side by side, reading order by position). */
export function layoutText(pdf: Buffer): string {
  return withFile(pdf, (file) => execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }));
}

/**
 * A string as pdftotext reads it back from the page: the core's formula formatter raises exponents
 * and lowers subscripts (pdfmake `sup` / `sub`), which pdftotext returns inline ("C_P" -> "CP",
 * "t^0.75" -> "t0.75"); "*" reads "×", "lambda" reads "λ".
 */
export function readBack(text: string): string {
  return formulaRuns(text).map((r) => r.text).join('');
}
