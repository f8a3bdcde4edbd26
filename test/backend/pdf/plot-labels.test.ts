/**
 * Report plots (issue 12, item 7): no label or legend covers a curve, a reference line (limit,
 * NOHD) or another label. Read from the report's document definition: every plot is a stack whose
 * curves and lines are a canvas styled PLOT_DATA and whose labels are text styled PLOT_LABEL; each
 * label's box is its baseline position, its font size and the text width estimate, which a test in
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
import { PLOT_DATA, PLOT_LABEL } from '../../../electron/backend/pdf/plots/log-plot.js';
import { benchDocument, tenLaserRoom } from './ten-laser-room.js';

/** Every plot of the definition: a stack holding a canvas styled PLOT_DATA (its curves and lines). */
function plotsOf(node: unknown, out: unknown[][] = []): unknown[][] {
  if (Array.isArray(node)) for (const c of node) plotsOf(c, out);
  else if (node !== null && typeof node === 'object') {
    const stack = (node as { stack?: unknown }).stack;
    if (Array.isArray(stack) && stack.some((c) => styleOf(c) === PLOT_DATA)) out.push(stack);
    else for (const v of Object.values(node)) if (typeof v === 'object') plotsOf(v, out);
  }
  return out;
}

function styleOf(node: unknown): unknown {
  return node !== null && typeof node === 'object' ? (node as { style?: unknown }).style : undefined;
}

interface Drawn {
  readonly lines: PlotPoint[][];
  readonly labels: Array<{ text: string; box: LabelBox }>;
}

interface Vector {
  type: string;
  x1?: number;
  y1?: number;
  x2?: number;
  y2?: number;
  points?: PlotPoint[];
}

interface PlacedText {
  text: string;
  fontSize: number;
  lineHeight?: number;
  relativePosition: { x: number; y: number };
}

function drawnOf(plot: readonly unknown[]): Drawn {
  const lines: PlotPoint[][] = [];
  const labels: Array<{ text: string; box: LabelBox }> = [];
  for (const node of plot) {
    if (styleOf(node) === PLOT_DATA) {
      for (const v of (node as { canvas: Vector[] }).canvas) {
        if (v.type === 'line') lines.push([{ x: Number(v.x1), y: Number(v.y1) }, { x: Number(v.x2), y: Number(v.y2) }]);
        else if (v.type === 'polyline') lines.push(v.points ?? []);
      }
    } else if (styleOf(node) === PLOT_LABEL) {
      const t = node as PlacedText;
      // pdfmake sets a line's baseline Roboto's ascent (1900/2048 em) below its top (lineHeight 1);
      // Roboto: ascent about 0.93 em above the baseline, descent about 0.24 em below it.
      expect(t.lineHeight).toBe(1);
      const baseline = t.relativePosition.y + (1900 / 2048) * t.fontSize;
      labels.push({ text: t.text, box: { x: t.relativePosition.x, y: baseline - 0.95 * t.fontSize, w: textWidthEm(t.text) * t.fontSize, h: 1.2 * t.fontSize } });
    }
  }
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
  const plots = plotsOf(reportDefinition(doc, opts).content as Content);
  expect(plots.length).toBeGreaterThanOrEqual(atLeastPlots);
  for (const plot of plots) {
    const { lines, labels } = drawnOf(plot);
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
