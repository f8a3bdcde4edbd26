/**
 * The room plan as SVG for the printed documents, to a stated scale (1:20, 1:25, 1:50, 1:100 ...
 * on paper printed at 100 %), with the core's hazard zones, the room, the beam paths and the
 * accepted laser controlled area. Zones and paths are cut to the drawn area here for display only;
 * the findings say where a zone runs beyond it.
 */
import type { PlanPointResult, PlanResult, RoomPlan } from '../../../../core/plan/plan-model.js';
import { labelSide, onwardStop, pathPoints, planMiddle, spillLine } from '../../../../core/plan/plan-layout.js';

const PT_PER_MM = 72 / 25.4;
const RATIOS = [10, 20, 25, 50, 75, 100, 200, 250, 500, 1000, 2000, 5000];

export const PLAN_INK = {
  direct: '#D0342C',
  diffuse: '#E8900C',
  enclosed: '#8A939E',
  path: '#A1140C',
  wall: '#222222',
  door: '#7A4A16',
  window: '#3D8FD1',
  barrier: '#5B2A86',
  work: '#1C7A4A',
  controlled: '#1F6FB2',
} as const;

export interface PlanSvgOptions {
  /** Largest width and height the drawing may take, pt. */
  readonly maxWidth: number;
  readonly maxHeight: number;
  /** Small version (door notice): fewer labels, no legend inside. */
  readonly compact?: boolean;
  /** Letter size of the compact drawing's words (scale bar, "You are here"), pt; 5.5 unless given. */
  readonly fontSize?: number;
  /** Door marked as "this entrance" (door notice). */
  readonly entranceId?: string;
  readonly laserNames: ReadonlyMap<string, string>;
}

export interface PlanSvg {
  readonly svg: string;
  readonly width: number;
  readonly height: number;
  /** e.g. 50 for 1:50; 0 for the small plan (drawn to fit, with a scale bar). */
  readonly ratio: number;
}

type Pt = readonly [number, number];

const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const n = (v: number): string => (Math.round(v * 100) / 100).toString();

/** Sutherland–Hodgman against an axis-aligned rectangle (display clipping only). */
function clipRect(poly: readonly Pt[], x0: number, y0: number, x1: number, y1: number): Pt[] {
  const sides: Array<[(p: Pt) => boolean, (a: Pt, b: Pt) => Pt]> = [
    [(p) => p[0] >= x0, (a, b) => [x0, a[1] + ((b[1] - a[1]) * (x0 - a[0])) / (b[0] - a[0])]],
    [(p) => p[0] <= x1, (a, b) => [x1, a[1] + ((b[1] - a[1]) * (x1 - a[0])) / (b[0] - a[0])]],
    [(p) => p[1] >= y0, (a, b) => [a[0] + ((b[0] - a[0]) * (y0 - a[1])) / (b[1] - a[1]), y0]],
    [(p) => p[1] <= y1, (a, b) => [a[0] + ((b[0] - a[0]) * (y1 - a[1])) / (b[1] - a[1]), y1]],
  ];
  let out: Pt[] = [...poly];
  for (const [inside, cut] of sides) {
    const input = out;
    out = [];
    let s = input[input.length - 1];
    for (const e of input) {
      if (!s) break;
      if (inside(e)) {
        if (!inside(s)) out.push(cut(s, e));
        out.push(e);
      } else if (inside(s)) out.push(cut(s, e));
      s = e;
    }
  }
  return out;
}

/** Liang–Barsky: the part of segment a–b inside the rectangle, or null. */
function clipSegment(a: Pt, b: Pt, x0: number, y0: number, x1: number, y1: number): [Pt, Pt] | null {
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  for (const [p, q] of [
    [-dx, a[0] - x0],
    [dx, x1 - a[0]],
    [-dy, a[1] - y0],
    [dy, y1 - a[1]],
  ] as const) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const r = q / p;
    if (p < 0) t0 = Math.max(t0, r);
    else t1 = Math.min(t1, r);
    if (t0 > t1) return null;
  }
  return [
    [a[0] + t0 * dx, a[1] + t0 * dy],
    [a[0] + t1 * dx, a[1] + t1 * dy],
  ];
}

export function planSvg(plan: RoomPlan, result: PlanResult | undefined, o: PlanSvgOptions): PlanSvg {
  const pts = [...plan.outline, ...(plan.controlledArea?.outline ?? [])];
  const xs = pts.map((p) => p.x_m);
  const ys = pts.map((p) => p.y_m);
  const margin = o.compact ? 0.35 : 0.6;
  const fs = o.compact ? (o.fontSize ?? 5.5) : 7;
  // The door notice marks its entrance outside the room: the side of the drawing beyond that door is
  // made wide enough for the dot and "You are here" (set along the wall), so the words never lie over the room.
  const entrance = plan.doors.find((d) => d.id === o.entranceId);
  const out_ = entrance ? labelSide(entrance.a, entrance.b, planMiddle(plan.outline)) : null;
  const roomFit = (m: { l: number; r: number; b: number; t: number }) =>
    Math.min(o.maxWidth / (Math.max(...xs) - Math.min(...xs) + m.l + m.r), (o.maxHeight - (o.compact ? fs * 2.2 : 56)) / (Math.max(...ys) - Math.min(...ys) + m.b + m.t));
  const side = { l: margin, r: margin, b: margin, t: margin };
  if (out_) {
    // A wider margin makes the drawing smaller, so the margin in metres is worked out again a few
    // times (the margin is small beside the room: it settles at once); 5 % to spare.
    const key = out_.vertical ? (out_.toward > 0 ? 'l' : 'r') : out_.toward > 0 ? 'b' : 't';
    for (let i = 0; i < 4; i++) side[key] = Math.max(margin, ((fs * 1.7) / roomFit(side)) * 1.05);
  }
  const x0 = Math.min(...xs) - side.l;
  const x1 = Math.max(...xs) + side.r;
  const y0 = Math.min(...ys) - side.b;
  const y1 = Math.max(...ys) + side.t;
  const legendRows = (cols: number) => Math.ceil(9 / cols);
  // Largest drawing at a standard ratio that fits.
  const fit = roomFit(side); // pt per metre
  // The report uses a standard ratio; the small plan on the notice takes all the room it has.
  const ratio = o.compact ? 0 : (RATIOS.find((r) => (1000 / r) * PT_PER_MM <= fit) ?? RATIOS[RATIOS.length - 1] ?? 5000);
  const s = o.compact ? fit : (1000 / ratio) * PT_PER_MM;
  const W = (x1 - x0) * s;
  const Hd = (y1 - y0) * s;
  const legendCols = W >= 420 ? 3 : 2;
  // The small plan has its scale bar in a band below the drawing instead of a legend.
  const legendH = o.compact ? fs * 2.2 : legendRows(legendCols) * 10 + 6;
  const X = (x: number) => (x - x0) * s;
  const Y = (y: number) => (y1 - y) * s;
  const P = (p: { x_m: number | string; y_m: number | string }): Pt => [Number(p.x_m), Number(p.y_m)];
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${n(W)}" height="${n(Hd + legendH)}" viewBox="0 0 ${n(W)} ${n(Hd + legendH)}">`);
  out.push(`<rect x="0" y="0" width="${n(W)}" height="${n(Hd)}" fill="#FFFFFF" stroke="#999999" stroke-width="0.5"/>`);
  // 1 m grid
  const grid: string[] = [];
  for (let gx = Math.ceil(x0); gx <= x1; gx++) grid.push(`M${n(X(gx))} 0V${n(Hd)}`);
  for (let gy = Math.ceil(y0); gy <= y1; gy++) grid.push(`M0 ${n(Y(gy))}H${n(W)}`);
  if (!o.compact) out.push(`<path d="${grid.join('')}" stroke="#E4E4E4" stroke-width="0.4" fill="none"/>`);
  const poly = (ps: readonly PlanPointResult[], attrs: string) => {
    const c = clipRect(ps.map(P), x0, y0, x1, y1);
    if (c.length >= 3) out.push(`<polygon points="${c.map((q) => `${n(X(q[0]))},${n(Y(q[1]))}`).join(' ')}" ${attrs}/>`);
  };
  const seg = (a: Pt, b: Pt, attrs: string) => {
    const c = clipSegment(a, b, x0, y0, x1, y1);
    if (c) out.push(`<line x1="${n(X(c[0][0]))}" y1="${n(Y(c[0][1]))}" x2="${n(X(c[1][0]))}" y2="${n(Y(c[1][1]))}" ${attrs}/>`);
  };
  // Labels stay inside the drawing: a label that would run past an edge is turned to start or end there
  // (width estimated at 0.55 em per character, Roboto).
  const text = (x: number, y: number, t: string, anchor = 'start', colour = '#000000', bold = false) => {
    const w = t.length * fs * 0.55;
    let a = anchor;
    let xx = x;
    const left = a === 'start' ? x : a === 'end' ? x - w : x - w / 2;
    if (left < 2) {
      a = 'start';
      xx = 2;
    } else if (left + w > W - 2) {
      a = 'end';
      xx = W - 2;
    }
    out.push(`<text x="${n(xx)}" y="${n(y)}" font-size="${fs}" text-anchor="${a}" fill="${colour}"${bold ? ' font-weight="bold"' : ''}>${esc(t)}</text>`);
  };
  const zones = result?.zones ?? [];
  for (const z of zones.filter((q) => q.enclosed)) poly(z.polygon, `fill="${PLAN_INK.enclosed}" fill-opacity="0.3" stroke="none"`);
  for (const z of zones.filter((q) => !q.enclosed && q.kind === 'diffuse')) poly(z.polygon, `fill="${PLAN_INK.diffuse}" fill-opacity="0.22" stroke="${PLAN_INK.diffuse}" stroke-width="0.4"`);
  for (const z of zones.filter((q) => !q.enclosed && q.kind === 'direct')) poly(z.polygon, `fill="${PLAN_INK.direct}" fill-opacity="0.4" stroke="none"`);
  // room
  out.push(`<polygon points="${plan.outline.map((q) => `${n(X(q.x_m))},${n(Y(q.y_m))}`).join(' ')}" fill="none" stroke="${PLAN_INK.wall}" stroke-width="${o.compact ? 1.6 : 2.2}"/>`);
  for (const w of plan.walls) seg(P(w.a), P(w.b), `stroke="${PLAN_INK.wall}" stroke-width="${o.compact ? 1.6 : 2.2}"`);
  const middle = planMiddle(plan.outline);
  const midX = middle.x;
  const pp = (q: Pt) => ({ x_m: q[0], y_m: q[1] });
  // Beside the piece's middle, on the room side (the same rule as on screen: core/plan/plan-layout.ts).
  const inwardLabel = (a: Pt, b: Pt, t: string, colour: string, bold: boolean) => {
    const { at, vertical, toward } = labelSide(pp(a), pp(b), middle);
    if (vertical) text(X(at.x_m) + toward * fs * 0.6, Y(at.y_m) + fs * 0.35, t, toward > 0 ? 'start' : 'end', colour, bold);
    else text(X(at.x_m), Y(at.y_m) + (toward < 0 ? fs * 1.4 : -fs * 0.6), t, 'middle', colour, bold);
  };
  // The reader of a door notice stands outside the door: a black dot there, on the side away from the
  // middle of the room, and "You are here" beside the dot along the wall (turned upright beside a wall
  // that runs north–south), in the margin kept for it outside the room: never over the room, and never
  // over the doorway where a beam leaving the room is drawn.
  const youAreHere = (a: Pt, b: Pt) => {
    const { at, vertical, toward } = labelSide(pp(a), pp(b), middle);
    // Outside: away from the middle of the room.
    const [ox, oy]: Pt = vertical ? [-toward, 0] : [0, -toward];
    const off = fs * 0.7;
    const r = fs * 0.45;
    const cx = X(at.x_m) + ox * off;
    const cy = Y(at.y_m) - oy * off;
    out.push(`<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r)}" fill="#000000"/>`);
    const words = 'You are here';
    const w = words.length * fs * 0.6; // bold Roboto, generous
    const h = fs * 1.1;
    const gap = r + fs * 0.4;
    // Centre of the words along the wall: past the dot on the side where they fit.
    const along = (c: number, max: number) => (c + gap + w <= max - 2 ? c + gap + w / 2 : c - gap - w / 2);
    const label = (x: number, y: number, upright: boolean) => {
      out.push(`<g transform="translate(${n(x)} ${n(y)})${upright ? ' rotate(-90)' : ''}">`);
      out.push(`<rect x="${n(-w / 2 - 1)}" y="${n(-h / 2)}" width="${n(w + 2)}" height="${n(h)}" fill="#FFFFFF" fill-opacity="0.85"/>`);
      out.push(`<text x="0" y="${n(fs * 0.35)}" font-size="${fs}" text-anchor="middle" fill="#000000" font-weight="bold">${esc(words)}</text>`);
      out.push('</g>');
    };
    if (vertical) label(cx, along(cy, Hd), true);
    else label(along(cx, W), cy, false);
  };
  for (const w of plan.windows) {
    seg(P(w.a), P(w.b), `stroke="#FFFFFF" stroke-width="${o.compact ? 2.4 : 3.2}"`);
    seg(P(w.a), P(w.b), `stroke="${PLAN_INK.window}" stroke-width="${o.compact ? 1.6 : 2.2}" stroke-dasharray="4 1.5"`);
    if (!o.compact) inwardLabel(P(w.a), P(w.b), w.label, PLAN_INK.window, false);
  }
  const flagged = new Set((result?.findings ?? []).filter((f) => f.severity === 'hazard').map((f) => f.subjectId));
  for (const d of plan.doors) {
    const here = o.entranceId === d.id;
    seg(P(d.a), P(d.b), `stroke="#FFFFFF" stroke-width="${o.compact ? 2.4 : 3.2}"`);
    seg(P(d.a), P(d.b), `stroke="${here ? '#000000' : PLAN_INK.door}" stroke-width="${here ? 3 : o.compact ? 1.6 : 2.2}" stroke-dasharray="${here ? '0' : '1.5 1.5'}"`);
    if (here) {
      youAreHere(P(d.a), P(d.b));
      continue;
    }
    if (o.compact) continue;
    inwardLabel(P(d.a), P(d.b), `${d.label}${d.interlocked ? ' (interlocked)' : ''}`, flagged.has(d.id) ? '#B3261E' : PLAN_INK.door, flagged.has(d.id));
  }
  for (const b of plan.barriers) {
    seg(P(b.a), P(b.b), `stroke="${PLAN_INK.barrier}" stroke-width="1.6" stroke-dasharray="3 2"`);
    if (!o.compact) text(X(b.a.x_m) + 2, Y(b.a.y_m) - 3, b.label, 'start', PLAN_INK.barrier);
  }
  for (const e of plan.enclosures) {
    out.push(`<rect x="${n(X(e.min.x_m))}" y="${n(Y(e.max.y_m))}" width="${n((e.max.x_m - e.min.x_m) * s)}" height="${n((e.max.y_m - e.min.y_m) * s)}" fill="none" stroke="#555555" stroke-width="1"/>`);
    if (!o.compact) text(X(e.min.x_m) + 2, Y(e.max.y_m) - 2.5, e.label, 'start', '#444444');
  }
  if (plan.controlledArea) {
    out.push(`<polygon points="${plan.controlledArea.outline.map((q) => `${n(X(q.x_m))},${n(Y(q.y_m))}`).join(' ')}" fill="none" stroke="${PLAN_INK.controlled}" stroke-width="${o.compact ? 1.4 : 1.2}" stroke-dasharray="6 2 1.5 2"/>`);
  }
  // beam paths
  for (const path of plan.paths) {
    const chain: Pt[] = pathPoints(path).map(P);
    for (let i = 0; i + 1 < chain.length; i++) seg(chain[i] as Pt, chain[i + 1] as Pt, `stroke="${PLAN_INK.path}" stroke-width="1"`);
    const arrow = onwardStop(plan, path, 4 * Math.max(x1 - x0, y1 - y0));
    if (arrow) seg(P(arrow.from), P(arrow.to), `stroke="${PLAN_INK.path}" stroke-width="1" stroke-dasharray="3 2"`);
    const spill = spillLine(path, result?.runs);
    if (spill) seg(P(spill.from), P(spill.to), `stroke="${PLAN_INK.path}" stroke-width="1" stroke-dasharray="3 2"`);
    const [ex, ey] = P(path.exit);
    out.push(`<rect x="${n(X(ex) - 3)}" y="${n(Y(ey) - 2.5)}" width="4" height="5" fill="#222222"/>`);
    for (const e of path.elements) {
      const [x, y] = P(e.at);
      if (e.kind === 'mirror') out.push(`<rect x="${n(X(x) - 1.8)}" y="${n(Y(y) - 1.8)}" width="3.6" height="3.6" fill="#FFFFFF" stroke="#222222" stroke-width="0.6" transform="rotate(45 ${n(X(x))} ${n(Y(y))})"/>`);
      else if (e.kind === 'dump') out.push(`<rect x="${n(X(x) - 2.2)}" y="${n(Y(y) - 2.2)}" width="4.4" height="4.4" fill="#222222"/>`);
      else out.push(`<circle cx="${n(X(x))}" cy="${n(Y(y))}" r="2.2" fill="#FFFFFF" stroke="#222222" stroke-width="0.8"/>`);
    }
    if (!o.compact) text(X(ex) - 3, Y(ey) - 4.5, `${o.laserNames.get(path.laserId) ?? path.laserId}${path.height_m !== undefined ? ` · beam at ${path.height_m} m` : ''}`, 'start', '#222222');
  }
  for (const r of plan.reflectionPoints) {
    const [x, y] = P(r.at);
    out.push(`<path d="M${n(X(x) - 2)} ${n(Y(y) - 2)}l4 4m0 -4l-4 4" stroke="${PLAN_INK.diffuse}" stroke-width="1"/>`);
    if (!o.compact) text(X(x) + 3, Y(y) + 2.5, r.label, 'start', '#222222');
  }
  for (const w of plan.workPositions) {
    const [x, y] = P(w.at);
    const rr = Math.max(2.5, (w.reach_m ?? 0) * s);
    out.push(`<circle cx="${n(X(x))}" cy="${n(Y(y))}" r="${n(rr)}" fill="${PLAN_INK.work}" fill-opacity="0.2" stroke="${flagged.has(w.id) ? '#B3261E' : PLAN_INK.work}" stroke-width="0.8"/>`);
    if (!o.compact) {
      const right = x <= midX;
      text(X(x) + (right ? rr + 2 : -rr - 2), Y(y) + 2.5, w.label, right ? 'start' : 'end', flagged.has(w.id) ? '#B3261E' : '#222222', flagged.has(w.id));
    }
  }
  // scale bar (1 m or more) and north arrow
  const barM = [0.5, 1, 2, 5, 10, 20, 50].find((m) => m * s >= W / 8) ?? 1;
  const bx = 6;
  // On the small plan the bar and its words grow with the letter size (the words above the bar).
  const barH = o.compact ? Math.max(3, fs * 0.45) : 3;
  const by = o.compact ? Hd + fs * 1.8 : Hd - 7;
  out.push(`<rect x="${bx}" y="${n(by - barH)}" width="${n((barM * s) / 2)}" height="${n(barH)}" fill="#222222"/>`);
  out.push(`<rect x="${n(bx + (barM * s) / 2)}" y="${n(by - barH)}" width="${n((barM * s) / 2)}" height="${n(barH)}" fill="#FFFFFF" stroke="#222222" stroke-width="0.5"/>`);
  text(bx, by - barH - 2, '0');
  text(bx + barM * s, by - barH - 2, `${barM} m`, 'middle');
  if (ratio > 0) text(bx + barM * s + 14, by, `scale 1:${ratio}`, 'start', '#444444');
  if (!o.compact) {
    out.push(`<path d="M${n(W - 10)} 5l3 8h-6z" fill="#222222"/>`);
    text(W - 10, 21, 'N', 'middle');
  }
  if (!o.compact) {
    const items: Array<[string, string]> = [
      ['zone-direct', 'Direct-beam zone (to the NOHD)'],
      ['zone-diffuse', 'Diffuse-reflection zone'],
      ['zone-enclosed', 'Zone inside an enclosure'],
      ['path', 'Beam path (dashed: open)'],
      ['lca', 'Laser controlled area'],
      ['door', 'Door'],
      ['window', 'Window'],
      ['barrier', 'Curtain / barrier'],
      ['work', 'Work position'],
    ];
    const colW = W / legendCols;
    items.forEach(([k, label], i) => {
      const lx = (i % legendCols) * colW + 4;
      const ly = Hd + 10 + Math.floor(i / legendCols) * 10;
      if (k.startsWith('zone')) {
        const c = k === 'zone-direct' ? PLAN_INK.direct : k === 'zone-diffuse' ? PLAN_INK.diffuse : PLAN_INK.enclosed;
        out.push(`<rect x="${n(lx)}" y="${n(ly - 6)}" width="14" height="7" fill="${c}" fill-opacity="${k === 'zone-direct' ? 0.4 : 0.3}" stroke="${c}" stroke-width="0.4"/>`);
      } else if (k === 'work') out.push(`<circle cx="${n(lx + 7)}" cy="${n(ly - 2.5)}" r="3" fill="${PLAN_INK.work}" fill-opacity="0.2" stroke="${PLAN_INK.work}" stroke-width="0.8"/>`);
      else {
        const c = k === 'path' ? PLAN_INK.path : k === 'lca' ? PLAN_INK.controlled : k === 'door' ? PLAN_INK.door : k === 'window' ? PLAN_INK.window : PLAN_INK.barrier;
        const dash = k === 'lca' ? ' stroke-dasharray="6 2 1.5 2"' : k === 'door' ? ' stroke-dasharray="1.5 1.5"' : k === 'barrier' ? ' stroke-dasharray="3 2"' : '';
        out.push(`<line x1="${n(lx)}" y1="${n(ly - 2.5)}" x2="${n(lx + 14)}" y2="${n(ly - 2.5)}" stroke="${c}" stroke-width="${k === 'path' ? 1 : 2}"${dash}/>`);
      }
      text(lx + 18, ly, label);
    });
  }
  out.push('</svg>');
  return { svg: out.join(''), width: W, height: Hd + legendH, ratio };
}
