/**
 * A small log-log line plot drawn as SVG text for pdfmake (vector, so it prints sharp at any size).
 * Only what the two report plots need: decade axes, line series, point markers, vertical and
 * horizontal reference lines with labels. Labels are placed where they cover no
 * curve, line or other label (core/plot/label-placement.ts, shared with the screen's plots); the
 * curves and lines carry data-role="line" and the labels data-role="label" so a test can check
 * that from the document definition.
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

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

function n(v: number): string {
  return v.toFixed(1);
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

export function logPlotSvg(p: LogPlot): string {
  // The legend stands in a band above the frame (a short line and the series name per row), so it
  // can never cover a curve: inside a crowded frame there is not always room for it.
  const m = { left: 46, right: 10, top: 8 + p.series.length * LEGEND_ROW, bottom: 30 };
  const w = p.width - m.left - m.right;
  const h = p.height - m.top - m.bottom;
  const xs = [...p.series.flatMap((s) => s.points.map((pt) => pt[0])), ...(p.markers ?? []).map((k) => k.x), ...(p.vLines ?? []).map((l) => l.at)];
  const ys = [...p.series.flatMap((s) => s.points.map((pt) => pt[1])), ...(p.markers ?? []).map((k) => k.y), ...(p.hLines ?? []).map((l) => l.at)];
  const [x0, x1] = decades(xs);
  const [y0, y1] = decades(ys);
  const X = (v: number): number => m.left + ((Math.log10(v) - x0) / (x1 - x0)) * w;
  const Y = (v: number): number => m.top + h - ((Math.log10(v) - y0) / (y1 - y0)) * h;
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${p.width}" height="${p.height}" viewBox="0 0 ${p.width} ${p.height}">`);
  out.push(`<rect x="${m.left}" y="${m.top}" width="${w}" height="${h}" fill="#ffffff"/>`);
  // Grid lines as one path each way (fewer SVG elements keep the PDF conversion fast).
  const grid: string[] = [];
  const xStep = Math.max(1, Math.ceil((x1 - x0) / 9));
  for (let e = x0; e <= x1; e++) {
    const x = X(10 ** e);
    grid.push(`M${n(x)} ${m.top}V${m.top + h}`);
    if ((e - x0) % xStep === 0) {
      out.push(`<text x="${n(x)}" y="${m.top + h + 11}" font-size="7.5" text-anchor="middle" fill="#222222">${decadeLabel(e)}</text>`);
    }
  }
  const yStep = Math.max(1, Math.ceil((y1 - y0) / 7));
  for (let e = y0; e <= y1; e++) {
    const y = Y(10 ** e);
    grid.push(`M${m.left} ${n(y)}H${m.left + w}`);
    if ((e - y0) % yStep === 0) {
      out.push(`<text x="${m.left - 4}" y="${n(y + 2.5)}" font-size="7.5" text-anchor="end" fill="#222222">${decadeLabel(e)}</text>`);
    }
  }
  out.push(`<path d="${grid.join('')}" stroke="#dddddd" stroke-width="0.5" fill="none"/>`);
  // The frame after the grid, so the outermost grid lines do not paint over it.
  out.push(`<rect x="${m.left}" y="${m.top}" width="${w}" height="${h}" fill="none" stroke="#444444" stroke-width="0.8"/>`);
  out.push(`<text x="${n(m.left + w / 2)}" y="${p.height - 4}" font-size="8" text-anchor="middle" fill="#000000">${esc(p.xLabel)}</text>`);
  out.push(`<text x="10" y="${n(m.top + h / 2)}" font-size="8" text-anchor="middle" fill="#000000" transform="rotate(-90 10 ${n(m.top + h / 2)})">${esc(p.yLabel)}</text>`);
  const frame: LabelBox = { x: m.left, y: m.top, w, h };
  const lines: PlotPoint[][] = [];
  const lineOut: string[] = [];
  for (const l of p.hLines ?? []) {
    const y = Y(l.at);
    lines.push([{ x: m.left, y }, { x: m.left + w, y }]);
    lineOut.push(`<line data-role="line" x1="${m.left}" y1="${n(y)}" x2="${m.left + w}" y2="${n(y)}" stroke="${l.color}" stroke-width="1" stroke-dasharray="4 2"/>`);
  }
  for (const l of p.vLines ?? []) {
    const x = X(l.at);
    lines.push([{ x, y: m.top }, { x, y: m.top + h }]);
    lineOut.push(`<line data-role="line" x1="${n(x)}" y1="${m.top}" x2="${n(x)}" y2="${m.top + h}" stroke="${l.color}" stroke-width="1.2"/>`);
  }
  for (const s of p.series) {
    const pts = s.points.filter(([a, b]) => a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b));
    if (pts.length < 2) continue;
    lines.push(pts.map(([a, b]) => ({ x: X(a), y: Y(b) })));
    const d = pts.map(([a, b], i) => `${i === 0 ? 'M' : 'L'}${n(X(a))} ${n(Y(b))}`).join(' ');
    lineOut.push(`<path data-role="line" d="${d}" fill="none" stroke="${s.color}" stroke-width="1.4"${s.dashed ? ' stroke-dasharray="3 2"' : ''}/>`);
  }
  out.push(...lineOut);
  const markerBoxes: LabelBox[] = [];
  for (const k of p.markers ?? []) {
    const x = X(k.x);
    const y = Y(k.y);
    markerBoxes.push({ x: x - MARKER_R, y: y - MARKER_R, w: 2 * MARKER_R, h: 2 * MARKER_R });
    out.push(`<circle cx="${n(x)}" cy="${n(y)}" r="${MARKER_R}" fill="${k.color}" stroke="#000000" stroke-width="0.6"/>`);
  }
  // Labels: placed where they cover no curve, line, marker or other label (core/plot/label-placement.ts).
  const requests: LabelRequest[] = [];
  const texts: Array<{ id: string; draw: (b: LabelBox) => string }> = [];
  const textLabel = (id: string, text: string, size: number, attrs: string, candidates: (wd: number, ht: number) => PlotPoint[], leaderFrom?: PlotPoint): void => {
    const { width, height } = textBoxSize(text, size);
    requests.push({ id, width, height, candidates: candidates(width, height), ...(leaderFrom === undefined ? {} : { leaderFrom, leaderBeyond: LEADER_BEYOND }) });
    texts.push({ id, draw: (b) => `<text data-role="label" x="${n(b.x)}" y="${n(b.y + size * BASELINE)}" font-size="${size}" ${attrs}>${esc(text)}</text>` });
  };
  (p.vLines ?? []).forEach((l, i) => {
    const x = X(l.at);
    textLabel(`v${i}`, l.label, LABEL_PT, `fill="${l.color}" font-weight="bold"`, (wd, ht) => candidatesAlongVertical(x, m.top, m.top + h, wd, ht, 3));
  });
  (p.hLines ?? []).forEach((l, i) => {
    const y = Y(l.at);
    textLabel(`h${i}`, l.label, LABEL_PT, `fill="${l.color}"`, (wd, ht) => candidatesAlongHorizontal(y, m.left, m.left + w, wd, ht, 2.5));
  });
  const markerAt = new Map<string, PlotPoint>();
  (p.markers ?? []).forEach((k, i) => {
    const at = { x: X(k.x), y: Y(k.y) };
    markerAt.set(`m${i}`, at);
    // Near the point first; anywhere in the frame as a last resort (then with a leader to the point).
    textLabel(`m${i}`, k.label, LABEL_PT, 'fill="#000000"', (wd, ht) => [...candidatesAroundPoint(at, wd, ht, MARKER_R), ...candidatesInFrame(frame, wd, ht, 3)], at);
  });
  if (p.note !== undefined) {
    textLabel('note', p.note, LABEL_PT, 'fill="#1B6E2E" font-weight="bold"', (wd, ht) => {
      const c = candidatesInCorners(frame, wd, ht, 5);
      return [c[2], c[0], c[3], c[1]].filter((q): q is PlotPoint => q !== undefined);
    });
  }
  p.series.forEach((s, i) => {
    const top = 4 + i * LEGEND_ROW;
    const mid = top + LEGEND_ROW / 2;
    out.push(`<line x1="${m.left + 2}" y1="${n(mid)}" x2="${m.left + 16}" y2="${n(mid)}" stroke="${s.color}" stroke-width="1.4"${s.dashed ? ' stroke-dasharray="3 2"' : ''}/>`);
    out.push(`<text x="${m.left + LEGEND_SWATCH}" y="${n(top + (LEGEND_ROW - LABEL_PT * 1.2) / 2 + LABEL_PT * BASELINE)}" font-size="${LABEL_PT}" fill="#000000">${esc(s.label)}</text>`);
  });
  const placed = placeLabels(requests, { lines, boxes: markerBoxes }, { frame, pad: 2 });
  for (const pl of placed) {
    const at = markerAt.get(pl.id);
    if (at !== undefined) {
      const q = nearestPointOfBox(at, pl.box);
      if (Math.hypot(q.x - at.x, q.y - at.y) > LEADER_BEYOND) {
        out.push(`<line x1="${n(at.x)}" y1="${n(at.y)}" x2="${n(q.x)}" y2="${n(q.y)}" stroke="#666666" stroke-width="0.5"/>`);
      }
    }
    const t = texts.find((x) => x.id === pl.id);
    if (t !== undefined) out.push(t.draw(pl.box));
  }
  out.push('</svg>');
  return out.join('');
}
