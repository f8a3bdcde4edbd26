/**
 * Where to put the labels of a plot so that none covers a curve, a reference line (limit, NOHD) or
 * another label: one placer for the printed report and the screen, so both read the same way.
 *
 * Each label names a few candidate boxes near what it labels (around a point, along a line, in a
 * corner of the frame), in the order the reader expects them. Labels are placed one after another
 * (in the order given: the most important first); each takes the candidate with the lowest cost:
 *   - the length of every curve or line segment that runs through the box (padded by `pad`),
 *   - the area shared with labels already placed,
 *   - the area outside the frame,
 * each heavily weighted, plus a small cost for being further down its own list of candidates. A
 * label whose every candidate is covered takes the least covered one (never dropped: an officer
 * must be able to read the limit and the NOHD).
 *
 * Drawing units, y pointing down (SVG and PDF page coordinates alike). Plain numbers: positions on
 * a drawing are not results and never enter a record.
 */

export interface PlotPoint {
  readonly x: number;
  readonly y: number;
}

/** Axis-aligned box: left, top, width, height. */
export interface LabelBox {
  readonly x: number;
  readonly y: number;
  readonly w: number;
  readonly h: number;
}

export interface LabelRequest {
  readonly id: string;
  readonly width: number;
  readonly height: number;
  /** Candidate top-left corners, in order of preference. */
  readonly candidates: readonly PlotPoint[];
  /**
   * The point a leader is drawn from when the label stands further than `leaderBeyond` from it:
   * the leader must not cross a label already placed either.
   */
  readonly leaderFrom?: PlotPoint;
  readonly leaderBeyond?: number;
}

export interface PlacedLabel {
  readonly id: string;
  readonly box: LabelBox;
  /** Curve and line length (drawing units) inside the padded box, and area shared with other labels: 0 and 0 when clear. */
  readonly crossing: number;
  readonly overlap: number;
}

export interface PlotObstacles {
  /** Curves and reference lines as polylines (at least two points each). */
  readonly lines: ReadonlyArray<readonly PlotPoint[]>;
  /** Boxes already taken (markers, a legend drawn elsewhere). */
  readonly boxes?: readonly LabelBox[];
}

export interface PlacementOptions {
  /** The frame labels must stay inside. */
  readonly frame: LabelBox;
  /** Clearance kept around each label (drawing units). */
  readonly pad?: number;
}

const LINE_WEIGHT = 1000;
const AREA_WEIGHT = 100;
const OUTSIDE_WEIGHT = 1000;
const RANK_WEIGHT = 1;

function inflate(b: LabelBox, d: number): LabelBox {
  return { x: b.x - d, y: b.y - d, w: b.w + 2 * d, h: b.h + 2 * d };
}

export function boxesOverlapArea(a: LabelBox, b: LabelBox): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

/** Length of the segment p-q inside box b (Liang-Barsky clipping); a point segment counts as 0. */
export function segmentLengthInBox(p: PlotPoint, q: PlotPoint, b: LabelBox): number {
  const dx = q.x - p.x;
  const dy = q.y - p.y;
  let t0 = 0;
  let t1 = 1;
  const edges: ReadonlyArray<readonly [number, number]> = [
    [-dx, p.x - b.x],
    [dx, b.x + b.w - p.x],
    [-dy, p.y - b.y],
    [dy, b.y + b.h - p.y],
  ];
  for (const [pe, qe] of edges) {
    if (pe === 0) {
      if (qe < 0) return 0; // parallel to this edge and outside it
      continue;
    }
    const r = qe / pe;
    if (pe < 0) {
      if (r > t1) return 0;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return 0;
      if (r < t1) t1 = r;
    }
  }
  return t1 > t0 ? (t1 - t0) * Math.hypot(dx, dy) : 0;
}

/** Total length of every polyline inside box b. */
export function linesLengthInBox(lines: ReadonlyArray<readonly PlotPoint[]>, b: LabelBox): number {
  let sum = 0;
  for (const line of lines) {
    for (let i = 1; i < line.length; i++) {
      const p = line[i - 1];
      const q = line[i];
      if (p === undefined || q === undefined) continue;
      // Quick reject: the segment's own bounding box misses the label box.
      if (Math.max(p.x, q.x) < b.x || Math.min(p.x, q.x) > b.x + b.w || Math.max(p.y, q.y) < b.y || Math.min(p.y, q.y) > b.y + b.h) continue;
      sum += segmentLengthInBox(p, q, b);
    }
  }
  return sum;
}

function outsideArea(b: LabelBox, frame: LabelBox): number {
  return b.w * b.h - boxesOverlapArea(b, frame);
}

/** Place every label in turn (see the file comment); the result is in the order of `labels`. */
export function placeLabels(labels: readonly LabelRequest[], obstacles: PlotObstacles, opts: PlacementOptions): PlacedLabel[] {
  const pad = opts.pad ?? 1.5;
  // Every label keeps `pad` clear around itself, so two labels stand at least 2 x pad apart.
  const taken: LabelBox[] = (obstacles.boxes ?? []).map((b) => inflate(b, pad));
  const out: PlacedLabel[] = [];
  for (const label of labels) {
    let best: PlacedLabel | null = null;
    let bestCost = Infinity;
    label.candidates.forEach((c, rank) => {
      const box: LabelBox = { x: c.x, y: c.y, w: label.width, h: label.height };
      const padded = inflate(box, pad);
      const crossing = linesLengthInBox(obstacles.lines, padded);
      let overlap = 0;
      for (const t of taken) overlap += boxesOverlapArea(padded, t);
      const from = label.leaderFrom;
      if (from !== undefined) {
        const to = nearestPointOfBox(from, box);
        if (Math.hypot(to.x - from.x, to.y - from.y) > (label.leaderBeyond ?? 0)) {
          for (const t of taken) overlap += segmentLengthInBox(from, to, t) * (LINE_WEIGHT / AREA_WEIGHT);
        }
      }
      const cost = crossing * LINE_WEIGHT + overlap * AREA_WEIGHT + outsideArea(box, opts.frame) * OUTSIDE_WEIGHT + rank * RANK_WEIGHT;
      if (cost < bestCost) {
        bestCost = cost;
        best = { id: label.id, box, crossing, overlap };
      }
    });
    if (best === null) throw new Error(`label ${label.id}: no candidate position given`);
    const chosen: PlacedLabel = best;
    taken.push(inflate(chosen.box, pad));
    out.push(chosen);
  }
  return out;
}

// ---- Candidate positions -------------------------------------------------------------------

/**
 * Around a point marker of radius r: right-above, left-above, right-below, left-below, right,
 * left, above, below; then the same again further out.
 */
export function candidatesAroundPoint(at: PlotPoint, width: number, height: number, r: number): PlotPoint[] {
  const out: PlotPoint[] = [];
  for (const g of [r + 2, r + 2 + height, r + 2 + 2.5 * height, r + 2 + 4 * height, r + 2 + 6 * height]) {
    out.push(
      { x: at.x + g, y: at.y - g - height },
      { x: at.x - g - width, y: at.y - g - height },
      { x: at.x + g, y: at.y + g },
      { x: at.x - g - width, y: at.y + g },
      { x: at.x + g, y: at.y - height / 2 },
      { x: at.x - g - width, y: at.y - height / 2 },
      { x: at.x - width / 2, y: at.y - g - height },
      { x: at.x - width / 2, y: at.y + g },
    );
  }
  return out;
}

/** Along a horizontal line at y from x0 to x1: above it then below it, from the right end to the left end. */
export function candidatesAlongHorizontal(y: number, x0: number, x1: number, width: number, height: number, gap: number, steps = 8): PlotPoint[] {
  const out: PlotPoint[] = [];
  for (let i = 0; i <= steps; i++) {
    const right = x1 - gap - (i / steps) * (x1 - x0 - width - 2 * gap);
    out.push({ x: right - width, y: y - gap - height }, { x: right - width, y: y + gap });
  }
  return out;
}

/** Along a vertical line at x from y0 (top) to y1 (bottom): right of it then left of it, from the foot up. */
export function candidatesAlongVertical(x: number, y0: number, y1: number, width: number, height: number, gap: number, steps = 8): PlotPoint[] {
  const out: PlotPoint[] = [];
  for (let i = 0; i <= steps; i++) {
    const bottom = y1 - gap - (i / steps) * (y1 - y0 - height - 2 * gap);
    out.push({ x: x + gap, y: bottom - height }, { x: x - gap - width, y: bottom - height });
  }
  return out;
}

/** The four inside corners of the frame, top left first (for a legend). */
export function candidatesInCorners(frame: LabelBox, width: number, height: number, gap: number): PlotPoint[] {
  const left = frame.x + gap;
  const right = frame.x + frame.w - gap - width;
  const top = frame.y + gap;
  const bottom = frame.y + frame.h - gap - height;
  return [
    { x: left, y: top },
    { x: right, y: top },
    { x: left, y: bottom },
    { x: right, y: bottom },
  ];
}

/**
 * A grid of positions inside the frame, `cols` by `rows`, row by row from the top left: the last
 * resort for a label whose nearby candidates are all covered (drawn with a leader to its point).
 */
export function candidatesInFrame(frame: LabelBox, width: number, height: number, gap: number, cols = 8, rows = 8): PlotPoint[] {
  const x0 = frame.x + gap;
  const x1 = frame.x + frame.w - gap - width;
  const y0 = frame.y + gap;
  const y1 = frame.y + frame.h - gap - height;
  const out: PlotPoint[] = [];
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < cols; i++) out.push({ x: x0 + (cols === 1 ? 0 : (i / (cols - 1)) * (x1 - x0)), y: y0 + (rows === 1 ? 0 : (j / (rows - 1)) * (y1 - y0)) });
  }
  return out;
}

/** The point of box b nearest to p (p itself when inside). */
export function nearestPointOfBox(p: PlotPoint, b: LabelBox): PlotPoint {
  return { x: Math.min(Math.max(p.x, b.x), b.x + b.w), y: Math.min(Math.max(p.y, b.y), b.y + b.h) };
}

// ---- Text size -----------------------------------------------------------------------------

/**
 * Width of a line of text in a sans-serif face (Roboto and the screen's system sans), in units of
 * the font size, rounded up per character class so the box is never narrower than the text: the
 * placer then keeps clear of the real glyphs. Checked against Roboto's advance widths in the test.
 */
const NARROW = new Set([...' .,:;!|()[]\'il1tfjrI/·']);
const WIDE = new Set([...'mwMW%@—']);

export function textWidthEm(text: string): number {
  let em = 0;
  for (const ch of text) {
    if (NARROW.has(ch)) em += 0.36;
    else if (WIDE.has(ch)) em += 0.92;
    else if (ch >= 'A' && ch <= 'Z') em += 0.7;
    else em += 0.6;
  }
  return em;
}

/** Box size of one line of text at `fontSize`: width from textWidthEm, height one em and a fifth. */
export function textBoxSize(text: string, fontSize: number): { readonly width: number; readonly height: number } {
  return { width: textWidthEm(text) * fontSize, height: fontSize * 1.2 };
}
