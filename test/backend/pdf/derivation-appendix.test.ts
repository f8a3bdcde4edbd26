// @vitest-environment node
/**
 * The derivation appendix of the report for a crowded room (ten lasers of the invented demo site),
 * read back with poppler. The appendix is handed to pdfmake in short unbreakable pieces to keep the
 * report quick to print (electron/backend/pdf/documents/trace-content.ts); these checks make sure
 * that costs nothing on paper:
 *  - every step of every trace (beams and room) is on paper: its label (a factor by its name in words,
 *    core/model/factor-words.ts), and its value with its unit;
 *  - no word runs past the right margin (40 pt) on A4 or US Letter.
 * The reference is the core's own trace (evaluateRoom): the demo is invented, so this checks that
 * paper and core agree, not the physics. Page sizes: ISO 216 (A4, 595.28 x 841.89 pt) and
 * ANSI/ASME Y14.1 (Letter, 612 x 792 pt).
 */
import { execFileSync } from 'node:child_process';
import { requireTool } from '../../support/required-tool.js';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Trace, TraceStep } from '../../../core/trace/trace.js';
import { stepLabelText } from '../../../core/provenance/citations.js';
import { traceStepValue } from '../../../core/units/trace-numbers.js';
import { renderReport, type DocumentInput, type Paper } from '../../../electron/backend/pdf/index.js';
import { pageTexts } from './pdf-tools.js';
import { benchDocument, tenLaserRoom } from './ten-laser-room.js';

/** Side margin of the report (documents/report.ts). */
const SIDE_MARGIN = 40;

interface Word {
  readonly page: number;
  readonly pageWidth: number;
  readonly xMax: number;
  readonly text: string;
}

/** Every word with its box, from `pdftotext -bbox` (poppler). */
function words(pdf: Buffer): Word[] {
  const dir = mkdtempSync(join(tmpdir(), 'bw-pdf-bbox-'));
  try {
    const file = join(dir, 'doc.pdf');
    writeFileSync(file, pdf);
    const html = execFileSync(requireTool('pdftotext', 'poppler-utils', 'to read word boxes from the PDF'), ['-bbox', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
    const out: Word[] = [];
    let page = 0;
    let pageWidth = 0;
    for (const m of html.matchAll(/<page width="([\d.]+)"|<word xMin="[\d.]+" yMin="[\d.]+" xMax="([\d.]+)" yMax="[\d.]+">([^<]*)<\/word>/g)) {
      if (m[1] !== undefined) {
        page++;
        pageWidth = Number(m[1]);
      } else {
        out.push({ page, pageWidth, xMax: Number(m[2]), text: m[3] ?? '' });
      }
    }
    return out;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function allSteps(t: Trace): TraceStep[] {
  return [...t.steps, ...t.children.flatMap(allSteps)];
}

/** Compare ignoring white space and hyphens (pdftotext drops a hyphen where a word was wrapped). */
function squash(s: string): string {
  return s.replace(/[\s\u00ad-]+/g, '');
}

let doc: DocumentInput;
const rendered = new Map<Paper, { pdf: Buffer; text: string }>();

beforeAll(async () => {
  doc = benchDocument(tenLaserRoom());
  for (const paper of ['A4', 'Letter'] as const) {
    const pdf = await renderReport(doc, { paper, units: 'SI' });
    rendered.set(paper, { pdf, text: squash(pageTexts(pdf).join(' ')) });
  }
}, 120_000);

function report(paper: Paper): { pdf: Buffer; text: string } {
  const r = rendered.get(paper);
  if (!r) throw new Error(`report on ${paper} not rendered`);
  return r;
}

describe('every derivation step of the ten-laser room is on paper', () => {
  const cases = [
    { what: 'the beams', traces: (): Trace[] => doc.results.beams.map((b) => b.trace) },
    { what: 'the room', traces: (): Trace[] => [doc.results.trace] },
  ];
  it.each(cases)('$what: label, and value with unit (engineering notation, as the officer reads it), of every step', ({ traces }) => {
    const { text } = report('A4');
    const steps = traces().flatMap(allSteps);
    expect(steps.length).toBeGreaterThan(0);
    const missing = steps.filter((s) => !text.includes(squash(stepLabelText(s))) || (s.value !== undefined && !text.includes(squash(traceStepValue(s)))));
    expect(missing.map((s) => `${s.label} = ${s.value ?? ''} ${s.unit ?? ''}`)).toEqual([]);
  });
});

describe('no word of the report runs past the right margin', () => {
  it.each(['A4', 'Letter'] as const)('%s', (paper) => {
    const all = words(report(paper).pdf);
    expect(all.length).toBeGreaterThan(1000);
    // 1 pt of slack for glyph side bearings.
    const over = all.filter((w) => w.xMax > w.pageWidth - SIDE_MARGIN + 1);
    expect(over.map((w) => `page ${w.page}: "${w.text}" ends at ${w.xMax.toFixed(1)} of ${w.pageWidth}`)).toEqual([]);
  });
});

// A heading must never be the last thing on a page (common practice in any printed record: the
// reader turns the page and finds a section without its title). The report's inputs section has
// short sections whose heading pdfmake's own page-break test missed.
describe('no section heading ends a page of the ten-laser report', () => {
  const headings = ['Lasers (inventory)', 'Rule set and conservative mode', 'Uncertainty bounds (nominal / with input tolerances)', 'Who and what was assumed'];
  it.each(['A4', 'Letter'] as const)('%s', (paper) => {
    const pages = pageTexts(report(paper).pdf);
    for (const [i, page] of pages.entries()) {
      // the page furniture (caution band and footer) follows the body on every page
      const body = page.slice(0, Math.max(0, page.indexOf('These results support, and do not replace')));
      for (const h of headings) expect({ page: i + 1, endsWith: body.trimEnd().endsWith(h) ? h : null }).toEqual({ page: i + 1, endsWith: null });
    }
  });
});
