/**
 * A small log-log line plot for pdfmake, drawn with its own vectors and text (sharp at any size).
 * Only what the two report plots need: decade axes, line series, point markers, vertical and
 * horizontal reference lines with labels. Labels are placed where they cover no
 * curve, line or other label (core/plot/label-placement.ts, shared with the screen's plots); the
 * curves and lines sit in a canvas styled PLOT_DATA and the labels are text styled PLOT_LABEL, so a
 * test can check that from the document definition.
 */
import {
  candidatesAlongHorizontal,
  candidatesAlongVertical,
  candidatesAroundPoint,
  candidatesInCorners,
  candidatesInFrame,
  nearestPointOfBox,
  placeLabels,
  textBoxSize,
  type LabelBox,
  type LabelRequest,
  type PlotPoint,
} from '../../../../core/plot/label-placement.js';
import type { CanvasElement, Content, ContentStack, ContentText } from 'pdfmake/interfaces';

/** Style names that mark, in the document definition, the plot's data vectors and its placed labels (no style is defined under them). */
export const PLOT_DATA = 'plot-data';
export const PLOT_LABEL = 'plot-label';

/** Label text size (pt), marker radius, legend row geometry (above the frame), and where the baseline sits in a text box (Roboto's ascent). */
const LABEL_PT = 7.5;
const MARKER_R = 3.2;
const LEGEND_SWATCH = 20;
const LEGEND_ROW = 10;
const BASELINE = 0.95;
/** A marker's label further than this from it gets a thin leader line to it. */
const LEADER_BEYOND = MARKER_R + 2 + 2.5 * LABEL_PT * 1.2;

export interface Series {
  readonly label: string;
  readonly points: ReadonlyArray<readonly [number, number]>;
  readonly color: string;
  readonly dashed?: boolean;
}

export interface Marker {
  readonly x: number;
  readonly y: number;
  readonly label: string;
  readonly color: string;
}

export interface RefLine {
  readonly at: number;
  readonly label: string;
  readonly color: string;
}

export interface LogPlot {
  readonly width: number;
  readonly height: number;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly series: readonly Series[];
  readonly markers?: readonly Marker[];
  readonly vLines?: readonly RefLine[];
  readonly hLines?: readonly RefLine[];
  /** One line of text printed inside the frame, bottom left. */
  readonly note?: string;
}

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
};

export function decadeLabel(exp: number): string {
  if (exp === 0) return '1';
  if (exp === 1) return '10';
  return '10' + String(exp).split('').map((c) => SUPERSCRIPT[c] ?? c).join('');
}

/** Rounded to 0.1 pt: positions in the definition stay short and a test reads them as drawn. */
function r1(v: number): number {
  return Math.round(v * 10) / 10;
}

/** Decade range covering every finite positive value given. */
function decades(values: readonly number[]): [number, number] {
  const ok = values.filter((v) => Number.isFinite(v) && v > 0);
  if (ok.length === 0) return [0, 1];
  const lo = Math.floor(Math.log10(Math.min(...ok)));
  let hi = Math.ceil(Math.log10(Math.max(...ok)));
  if (hi <= lo) hi = lo + 1;
  return [lo, hi];
}

/** Roboto's ascent (hhea ascender 1900 of 2048 units): pdfmake puts a text line's top this far above its baseline. */
const ROBOTO_ASCENT = 1900 / 2048;

type Text = { text: string; fontSize: number; color: string; bold?: boolean };

/** One line of text whose baseline starts at (x, baseline) of the plot, left-aligned. */
function textAt(t: Text, x: number, baseline: number, style?: string): ContentText {
  return { ...t, ...(style === undefined ? {} : { style }), noWrap: true, lineHeight: 1, relativePosition: { x: r1(x), y: r1(baseline - ROBOTO_ASCENT * t.fontSize) } };
}

/**
 * One line of text centred on x (or ending at x) within the plot of width `plotWidth`: pdfmake aligns
 * a line within the width available to it, which inside the plot's column is the plot's width.
 */
function alignedAt(t: Text, x: number, baseline: number, plotWidth: number, alignment: 'center' | 'right'): ContentText {
  const left = alignment === 'center' ? x - plotWidth / 2 : x - plotWidth;
  return { ...t, alignment, noWrap: true, lineHeight: 1, relativePosition: { x: r1(left), y: r1(baseline - ROBOTO_ASCENT * t.fontSize) } };
}

/** pdfmake's dash for the SVG-style "on off" pattern. */
function dash(on: number, off: number): { length: number; space: number } {
  return { length: on, space: off };
}

/**
 * The plot as pdfmake content of width `p.width`: the frame, grid, curves, reference lines and
 * markers as pdfmake vectors (one canvas), every word as a pdfmake text line placed on the plot.
 * Vectors and text go straight to pdfkit: an SVG would be parsed again at print and its text drawn
 * glyph by glyph. The curves, reference lines and markers are in the canvas styled PLOT_DATA, the
 * placed labels are text styled PLOT_LABEL, so a test reads what was drawn from the definition.
 * Use it as a column (or any container) exactly `p.width` wide: the centred and right-aligned
 * axis texts are aligned within that width.
 */
export function logPlot(p: LogPlot): ContentStack {
  // The y-axis title stands level above the axis, in the first row of a band above the frame, and
  // the legend (a short line and the series name per row) below it, so neither can cover a curve:
  // inside a crowded frame there is not always room. A level title, not one turned along the axis:
  // pdfmake's text cannot turn, and a turned one drawn as SVG cost about 6 % of the report's print.
  const m = { left: 36, right: 10, top: 8 + (p.series.length + 1) * LEGEND_ROW, bottom: 30 };
  const w = p.width - m.left - m.right;
  const h = p.height - m.top - m.bottom;
  const xs = [...p.series.flatMap((s) => s.points.map((pt) => pt[0])), ...(p.markers ?? []).map((k) => k.x), ...(p.vLines ?? []).map((l) => l.at)];
  const ys = [...p.series.flatMap((s) => s.points.map((pt) => pt[1])), ...(p.markers ?? []).map((k) => k.y), ...(p.hLines ?? []).map((l) => l.at)];
  const [x0, x1] = decades(xs);
  const [y0, y1] = decades(ys);
  const X = (v: number): number => m.left + ((Math.log10(v) - x0) / (x1 - x0)) * w;
  const Y = (v: number): number => m.top + h - ((Math.log10(v) - y0) / (y1 - y0)) * h;
  const texts: Content[] = [];
  const grid: CanvasElement[] = [];
  const GRID = { lineColor: '#dddddd', lineWidth: 0.5 } as const;
  const xStep = Math.max(1, Math.ceil((x1 - x0) / 9));
  for (let e = x0; e <= x1; e++) {
    const x = r1(X(10 ** e));
    grid.push({ type: 'line', x1: x, y1: m.top, x2: x, y2: m.top + h, ...GRID });
    if ((e - x0) % xStep === 0) texts.push(alignedAt({ text: decadeLabel(e), fontSize: 7.5, color: '#222222' }, x, m.top + h + 11, p.width, 'center'));
  }
  const yStep = Math.max(1, Math.ceil((y1 - y0) / 7));
  for (let e = y0; e <= y1; e++) {
    const y = r1(Y(10 ** e));
    grid.push({ type: 'line', x1: m.left, y1: y, x2: m.left + w, y2: y, ...GRID });
    if ((e - y0) % yStep === 0) texts.push(alignedAt({ text: decadeLabel(e), fontSize: 7.5, color: '#222222' }, m.left - 4, y + 2.5, p.width, 'right'));
  }
  // The frame after the grid, so the outermost grid lines do not paint over it.
  grid.push({ type: 'rect', x: m.left, y: m.top, w, h, lineColor: '#444444', lineWidth: 0.8 });
  texts.push(alignedAt({ text: p.xLabel, fontSize: 8, color: '#000000' }, m.left + w / 2, p.height - 4, p.width, 'center'));
  const frame: LabelBox = { x: m.left, y: m.top, w, h };
  const lines: PlotPoint[][] = [];
  const data: CanvasElement[] = [];
  for (const l of p.hLines ?? []) {
    const y = r1(Y(l.at));
    lines.push([{ x: m.left, y }, { x: m.left + w, y }]);
    data.push({ type: 'line', x1: m.left, y1: y, x2: m.left + w, y2: y, lineColor: l.color, lineWidth: 1, dash: dash(4, 2) });
  }
  for (const l of p.vLines ?? []) {
    const x = r1(X(l.at));
    lines.push([{ x, y: m.top }, { x, y: m.top + h }]);
    data.push({ type: 'line', x1: x, y1: m.top, x2: x, y2: m.top + h, lineColor: l.color, lineWidth: 1.2 });
  }
  for (const s of p.series) {
    const pts = s.points.filter(([a, b]) => a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b)).map(([a, b]) => ({ x: r1(X(a)), y: r1(Y(b)) }));
    if (pts.length < 2) continue;
    lines.push(pts);
    data.push({ type: 'polyline', points: pts, lineColor: s.color, lineWidth: 1.4, ...(s.dashed === true ? { dash: dash(3, 2) } : {}) });
  }
  const markerBoxes: LabelBox[] = [];
  const marks: CanvasElement[] = [];
  for (const k of p.markers ?? []) {
    const x = r1(X(k.x));
    const y = r1(Y(k.y));
    markerBoxes.push({ x: x - MARKER_R, y: y - MARKER_R, w: 2 * MARKER_R, h: 2 * MARKER_R });
    marks.push({ type: 'ellipse', x, y, r1: MARKER_R, r2: MARKER_R, color: k.color, lineColor: '#000000', lineWidth: 0.6 });
  }
  // Labels: placed where they cover no curve, line, marker or other label (core/plot/label-placement.ts).
  const requests: LabelRequest[] = [];
  const labelOf = new Map<string, Text>();
  const textLabel = (id: string, t: Text, candidates: (wd: number, ht: number) => PlotPoint[], leaderFrom?: PlotPoint): void => {
    const { width, height } = textBoxSize(t.text, t.fontSize);
    requests.push({ id, width, height, candidates: candidates(width, height), ...(leaderFrom === undefined ? {} : { leaderFrom, leaderBeyond: LEADER_BEYOND }) });
    labelOf.set(id, t);
  };
  (p.vLines ?? []).forEach((l, i) => {
    const x = X(l.at);
    textLabel(`v${i}`, { text: l.label, fontSize: LABEL_PT, color: l.color, bold: true }, (wd, ht) => candidatesAlongVertical(x, m.top, m.top + h, wd, ht, 3));
  });
  (p.hLines ?? []).forEach((l, i) => {
    const y = Y(l.at);
    textLabel(`h${i}`, { text: l.label, fontSize: LABEL_PT, color: l.color }, (wd, ht) => candidatesAlongHorizontal(y, m.left, m.left + w, wd, ht, 2.5));
  });
  const markerAt = new Map<string, PlotPoint>();
  (p.markers ?? []).forEach((k, i) => {
    const at = { x: X(k.x), y: Y(k.y) };
    markerAt.set(`m${i}`, at);
    // Near the point first; anywhere in the frame as a last resort (then with a leader to the point).
    textLabel(`m${i}`, { text: k.label, fontSize: LABEL_PT, color: '#000000' }, (wd, ht) => [...candidatesAroundPoint(at, wd, ht, MARKER_R), ...candidatesInFrame(frame, wd, ht, 3)], at);
  });
  if (p.note !== undefined) {
    textLabel('note', { text: p.note, fontSize: LABEL_PT, color: '#1B6E2E', bold: true }, (wd, ht) => {
      const c = candidatesInCorners(frame, wd, ht, 5);
      return [c[2], c[0], c[3], c[1]].filter((q): q is PlotPoint => q !== undefined);
    });
  }
  const legend: CanvasElement[] = [];
  p.series.forEach((s, i) => {
    const top = 4 + (i + 1) * LEGEND_ROW;
    const mid = r1(top + LEGEND_ROW / 2);
    legend.push({ type: 'line', x1: m.left + 2, y1: mid, x2: m.left + 16, y2: mid, lineColor: s.color, lineWidth: 1.4, ...(s.dashed === true ? { dash: dash(3, 2) } : {}) });
    texts.push(textAt({ text: s.label, fontSize: LABEL_PT, color: '#000000' }, m.left + LEGEND_SWATCH, top + (LEGEND_ROW - LABEL_PT * 1.2) / 2 + LABEL_PT * BASELINE));
  });
  const leaders: CanvasElement[] = [];
  for (const pl of placeLabels(requests, { lines, boxes: markerBoxes }, { frame, pad: 2 })) {
    const at = markerAt.get(pl.id);
    if (at !== undefined) {
      const q = nearestPointOfBox(at, pl.box);
      if (Math.hypot(q.x - at.x, q.y - at.y) > LEADER_BEYOND) {
        leaders.push({ type: 'line', x1: r1(at.x), y1: r1(at.y), x2: r1(q.x), y2: r1(q.y), lineColor: '#666666', lineWidth: 0.5 });
      }
    }
    const t = labelOf.get(pl.id);
    if (t !== undefined) texts.push(textAt(t, pl.box.x, pl.box.y + t.fontSize * BASELINE, PLOT_LABEL));
  }
  texts.push(textAt({ text: p.yLabel, fontSize: 8, color: '#000000' }, 0, 4 + (LEGEND_ROW - 8 * 1.2) / 2 + 8 * BASELINE));
  // Everything is placed relative to the plot's top left corner and takes no room of its own, in
  // drawing order (grid and frame, data, text); an empty canvas as tall as the plot (a
  // rectangle of no height at its foot, which paints nothing) gives it its height.
  const at0 = { x: 0, y: 0 };
  return {
    stack: [
      { canvas: grid, relativePosition: at0 },
      { canvas: [...data, ...marks, ...leaders, ...legend], style: PLOT_DATA, relativePosition: at0 },
      ...texts,
      { canvas: [{ type: 'rect', x: 0, y: p.height, w: p.width, h: 0, color: '#ffffff' }] },
    ],
  };
}
