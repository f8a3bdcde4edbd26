/**
 * Report plots (issue 12, item 7): no label or legend covers a curve, a reference line (limit,
 * NOHD) or another label. Read from the report's document definition: every plot is an SVG whose
 * curves and lines carry data-role="line" and whose labels carry data-role="label"; each label's
 * box is its baseline position, its font size and the text width estimate, which a test in
 * test/core/plot/label-placement.test.ts shows is never narrower than the printed Roboto text.
 * Rooms: the ten-laser room (20 plots) and the demo rooms, A4 in SI units and Letter in ANSI units.
 * (Self-consistency check of the drawing; no published source.)
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { openRecordStore } from '../../../electron/backend/records/index.js';
import type { Content } from 'pdfmake/interfaces';
import { reportDefinition } from '../../../electron/backend/pdf/documents/report.js';
import { documentInputFromAssessment, type DocumentInput, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { boxesOverlapArea, linesLengthInBox, textWidthEm, type LabelBox, type PlotPoint } from '../../../core/plot/label-placement.js';
import { benchDocument, tenLaserRoom } from './ten-laser-room.js';

function svgsOf(node: unknown, out: string[] = []): string[] {
  if (Array.isArray(node)) for (const c of node) svgsOf(c, out);
  else if (node !== null && typeof node === 'object') {
    for (const [k, v] of Object.entries(node)) {
      if (k === 'svg' && typeof v === 'string') out.push(v);
      else if (typeof v === 'object') svgsOf(v, out);
    }
  }
  return out;
}

const attr = (el: string, name: string): string => new RegExp(`\\b${name}="([^"]*)"`).exec(el)?.[1] ?? '';

function unescape(s: string): string {
  return s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&');
}

interface Drawn {
  readonly lines: PlotPoint[][];
  readonly labels: Array<{ text: string; box: LabelBox }>;
}

function drawnOf(svg: string): Drawn {
  const lines: PlotPoint[][] = [];
  for (const el of svg.match(/<(line|path) data-role="line"[^>]*>/g) ?? []) {
    if (el.startsWith('<line')) {
      lines.push([
        { x: Number(attr(el, 'x1')), y: Number(attr(el, 'y1')) },
        { x: Number(attr(el, 'x2')), y: Number(attr(el, 'y2')) },
      ]);
    } else {
      const pts = [...attr(el, 'd').matchAll(/[ML]([-\d.]+) ([-\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) }));
      lines.push(pts);
    }
  }
  const labels = [...svg.matchAll(/<text data-role="label"([^>]*)>([^<]*)<\/text>/g)].map((m) => {
    const el = m[1] ?? '';
    const text = unescape(m[2] ?? '');
    const size = Number(attr(el, 'font-size'));
    const x = Number(attr(el, 'x'));
    const baseline = Number(attr(el, 'y'));
    // Roboto: ascent about 0.93 em above the baseline, descent about 0.24 em below it.
    return { text, box: { x, y: baseline - 0.95 * size, w: textWidthEm(text) * size, h: 1.2 * size } };
  });
  return { lines, labels };
}

/** The current revision of every room of the invented demo site, from a real record store. */
async function demoDocuments(): Promise<DocumentInput[]> {
  const dir = mkdtempSync(join(tmpdir(), 'bw-plot-labels-'));
  const store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
  try {
    const site = await store.seedDemo();
    const docs: DocumentInput[] = [];
    for (const room of await store.listRooms(site.id)) {
      const a = (await store.listAssessments(room.id))[0];
      if (a !== undefined) docs.push(await documentInputFromAssessment(store, a.id));
    }
    return docs;
  } finally {
    await store.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

const OPTIONS: readonly RenderOptions[] = [
  { paper: 'A4', units: 'SI' },
  { paper: 'Letter', units: 'ANSI' },
];

describe('report plots: labels cover no curve, line or other label', () => {
  it.each(OPTIONS)('ten-laser room, $paper, $units units', (opts) => {
    check(benchDocument(tenLaserRoom()), opts, 20);
  });

  it('demo rooms, A4, SI units', async () => {
    const docs = await demoDocuments();
    expect(docs.length).toBeGreaterThanOrEqual(3);
    for (const doc of docs) check(doc, { paper: 'A4', units: 'SI' }, 2);
  }, 120_000);
});

// @vitest-environment node is the default here (test/vitest.config.ts); the store is real SQLite.
function check(doc: DocumentInput, opts: RenderOptions, atLeastPlots: number): void {
  const svgs = svgsOf(reportDefinition(doc, opts).content as Content).filter((s) => s.includes('data-role="label"'));
  expect(svgs.length).toBeGreaterThanOrEqual(atLeastPlots);
  for (const svg of svgs) {
    const { lines, labels } = drawnOf(svg);
    expect(lines.length).toBeGreaterThan(0);
    expect(labels.length).toBeGreaterThan(0);
    for (const l of labels) {
      expect({ label: l.text, crossing: linesLengthInBox(lines, l.box) }).toEqual({ label: l.text, crossing: 0 });
    }
    for (let i = 0; i < labels.length; i++) {
      for (let j = i + 1; j < labels.length; j++) {
        const a = labels[i];
        const b = labels[j];
        if (a === undefined || b === undefined) continue;
        expect({ labels: [a.text, b.text], shared: boxesOverlapArea(a.box, b.box) }).toEqual({ labels: [a.text, b.text], shared: 0 });
      }
    }
  }
}
