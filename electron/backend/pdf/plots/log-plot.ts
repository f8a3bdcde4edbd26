/**
 * A small log-log line plot drawn as SVG text for pdfmake (vector, so it prints sharp at any size).
 * Only what the two report plots need: decade axes, line series, point markers, vertical and
 * horizontal reference lines with labels.
 */
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
  const m = { left: 46, right: 10, top: 8, bottom: 30 };
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
  for (const l of p.hLines ?? []) {
    const y = Y(l.at);
    out.push(`<line x1="${m.left}" y1="${n(y)}" x2="${m.left + w}" y2="${n(y)}" stroke="${l.color}" stroke-width="1" stroke-dasharray="4 2"/>`);
    out.push(`<text x="${m.left + w - 3}" y="${n(y - 3)}" font-size="7.5" text-anchor="end" fill="${l.color}">${esc(l.label)}</text>`);
  }
  for (const l of p.vLines ?? []) {
    const x = X(l.at);
    out.push(`<line x1="${n(x)}" y1="${m.top}" x2="${n(x)}" y2="${m.top + h}" stroke="${l.color}" stroke-width="1.2"/>`);
    const anchorEnd = x > m.left + w * 0.7;
    // Label at the foot of the line: the legend sits at the top left.
    out.push(`<text x="${n(anchorEnd ? x - 3 : x + 3)}" y="${m.top + h - 4}" font-size="7.5" text-anchor="${anchorEnd ? 'end' : 'start'}" fill="${l.color}" font-weight="bold">${esc(l.label)}</text>`);
  }
  for (const s of p.series) {
    const pts = s.points.filter(([a, b]) => a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b));
    if (pts.length < 2) continue;
    const d = pts.map(([a, b], i) => `${i === 0 ? 'M' : 'L'}${n(X(a))} ${n(Y(b))}`).join(' ');
    out.push(`<path d="${d}" fill="none" stroke="${s.color}" stroke-width="1.4"${s.dashed ? ' stroke-dasharray="3 2"' : ''}/>`);
  }
  for (const k of p.markers ?? []) {
    const x = X(k.x);
    const y = Y(k.y);
    out.push(`<circle cx="${n(x)}" cy="${n(y)}" r="3.2" fill="${k.color}" stroke="#000000" stroke-width="0.6"/>`);
    const anchorEnd = x > m.left + w * 0.6;
    out.push(`<text x="${n(anchorEnd ? x - 6 : x + 6)}" y="${n(y - 5)}" font-size="7.5" text-anchor="${anchorEnd ? 'end' : 'start'}" fill="#000000">${esc(k.label)}</text>`);
  }
  // legend, top left inside the frame
  let ly = m.top + 10;
  for (const s of p.series) {
    out.push(`<line x1="${m.left + 6}" y1="${ly - 2.5}" x2="${m.left + 20}" y2="${ly - 2.5}" stroke="${s.color}" stroke-width="1.4"${s.dashed ? ' stroke-dasharray="3 2"' : ''}/>`);
    out.push(`<text x="${m.left + 24}" y="${ly}" font-size="7.5" fill="#000000">${esc(s.label)}</text>`);
    ly += 10;
  }
  if (p.note !== undefined) out.push(`<text x="${m.left + 6}" y="${m.top + h - 6}" font-size="7.5" fill="#1B6E2E" font-weight="bold">${esc(p.note)}</text>`);
  out.push('</svg>');
  return out.join('');
}
