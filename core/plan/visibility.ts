/**
 * What a diffuse reflection point can see: the part of its zone polygon (a polygon around the NHZ
 * circle, convex about the point) that a straight line of sight from the point reaches without
 * passing a wall, curtain or barrier. Scattered light travels in straight lines, so a place behind an
 * opaque surface, seen from the spot, is not reached by it (common practice: walls, curtains and
 * barriers are opaque to scattered light of a beam they are rated for).
 *
 * Exact sweep in decimal arithmetic: the directions from the point to every corner of the zone
 * polygon, every end of a screen and every crossing of two of them split the full turn into sectors
 * (each under 180°, as the 24-gon's corners are 15° apart). Inside one sector no screen ends and no
 * two cross, so one segment is the nearest throughout it; the visible region is the fan of those
 * nearest pieces. The result is star-shaped about the point, a simple polygon even in an L-shaped or
 * any other non-convex room.
 */
import { Dec } from '../numeric/decimal.js';
import { DecGeo, add, boxOf, boxesApart, cross, distanceSqToSegment, dot, scale, sub, type Box, type P } from './geometry.js';

/** A screen closer than this to the point is the surface the point lies on; it hides nothing (ours: the safe side). */
const ON_SURFACE_M2 = new Dec('1e-12');
/** Two screens whose ends are this close are joined (a corner of a wall, a curtain against a wall); ours. */
const JOINED_M = 1e-6;

type Seg = readonly [P, P];

/** An opaque segment ready for the sweep: its free ends already taken in (see `screensOf`), with its box. */
export interface ScreenSeg {
  readonly a: P;
  readonly b: P;
  readonly box: Box;
  /** The ends in ordinary numbers, for the quick tests (never deciding alone). */
  readonly f: Floats;
}

interface Floats {
  readonly ax: number;
  readonly ay: number;
  readonly bx: number;
  readonly by: number;
  readonly box: Box;
}

interface Screen {
  readonly a: P;
  readonly b: P;
  /** Zone polygon edges bound the region; screen hits are moved `pad` beyond the surface. */
  readonly screen: boolean;
  readonly f: Floats;
}

function floatsOf(a: P, b: P): Floats {
  const ax = a.x.toNumber();
  const ay = a.y.toNumber();
  const bx = b.x.toNumber();
  const by = b.y.toNumber();
  return { ax, ay, bx, by, box: { x0: Math.min(ax, bx), y0: Math.min(ay, by), x1: Math.max(ax, bx), y1: Math.max(ay, by) } };
}

/**
 * Opaque segments for `visibleRegion`: the free end of a segment (one not joined to another) is
 * taken `pad` shorter, so its shadow is never drawn too wide; a segment no longer than that is dropped.
 */
export function screensOf(segs: readonly Seg[], pad: Dec): ScreenSeg[] {
  const out: ScreenSeg[] = [];
  for (const s of segs) {
    const t = trimFreeEnds(s, segs, pad);
    if (t) {
      const f = floatsOf(t[0], t[1]);
      out.push({ a: t[0], b: t[1], box: f.box, f });
    }
  }
  return out;
}

/**
 * The region of `zone` (a polygon convex about `c` with corners under 180° apart as seen from `c`)
 * seen from `c` past the opaque `screens`. Where the line of sight meets a screen, the region is
 * carried `pad` further along it, so a door or window in that wall is reached and rounding the
 * drawn corners cannot pull the region back inside the visible part.
 */
export function visibleRegion(c: P, zone: readonly P[], screens: readonly ScreenSeg[], pad: Dec): P[] {
  const zoneBox = boxOf(zone);
  const near = screens.filter((s) => !boxesApart(s.box, zoneBox, 0) && distanceSqToSegment(c, s.a, s.b).gt(ON_SURFACE_M2));
  if (near.length === 0) return [...zone];

  const zf = zone.map((q) => [q.x.toNumber(), q.y.toNumber()] as const);
  const zoneSides: Screen[] = zone.map((a, i) => {
    const k = (i + 1) % zone.length;
    const b = zone[k] as P;
    const [ax, ay] = zf[i] as readonly [number, number];
    const [bx, by] = zf[k] as readonly [number, number];
    return { a, b, screen: false, f: { ax, ay, bx, by, box: { x0: Math.min(ax, bx), y0: Math.min(ay, by), x1: Math.max(ax, bx), y1: Math.max(ay, by) } } };
  });
  const all: Screen[] = [...zoneSides, ...near.map((s) => ({ a: s.a, b: s.b, screen: true, f: s.f }))];
  const floats = all.map((s) => s.f);

  // Directions that start or end a sector.
  const marks: P[] = [...zone];
  for (const s of near) {
    if (!boxesApart({ x0: s.f.ax, y0: s.f.ay, x1: s.f.ax, y1: s.f.ay }, zoneBox, 0)) marks.push(s.a);
    if (!boxesApart({ x0: s.f.bx, y0: s.f.by, x1: s.f.bx, y1: s.f.by }, zoneBox, 0)) marks.push(s.b);
  }
  for (let i = 0; i < all.length; i++) {
    for (let j = Math.max(i + 1, zone.length); j < all.length; j++) {
      const fi = floats[i];
      const fj = floats[j];
      if (!fi || !fj || boxesApart(fi.box, fj.box, 0) || boxesApart(fj.box, zoneBox, 0)) continue;
      const x = lineCrossing(all[i] as Screen, all[j] as Screen);
      if (x) marks.push(x);
    }
  }
  const dirs = sortedDirections(c, marks);
  const lengths = new Map<number, Dec>();
  const padAlong = (i: number): Dec => {
    let k = lengths.get(i);
    if (!k) {
      const d = dirs[i] as P;
      k = pad.div(new Dec(new DecGeo(dot(d, d)).sqrt()));
      lengths.set(i, k);
    }
    return k;
  };

  // Where each sight line may meet each segment, first in ordinary numbers; exact decimals are
  // worked out only for the segments that can be the nearest in a sector.
  const cx = c.x.toNumber();
  const cy = c.y.toNumber();
  const roughHits = dirs.map((d) => {
    const dx = d.x.toNumber();
    const dy = d.y.toNumber();
    const out = new Map<number, number>();
    floats.forEach((f, k) => {
      const t = roughHit(cx, cy, dx, dy, f.ax, f.ay, f.bx, f.by);
      if (t !== null) out.set(k, t);
    });
    return out;
  });
  const exact = dirs.map(() => new Map<number, Dec | null>());
  const exactT = (i: number, k: number): Dec | null => {
    const m = exact[i] as Map<number, Dec | null>;
    if (m.has(k)) return m.get(k) ?? null;
    const s = all[k] as Screen;
    const t = rayParam(c, dirs[i] as P, s.a, s.b);
    m.set(k, t);
    return t;
  };

  const polygon: P[] = [];
  for (let i = 0; i < dirs.length; i++) {
    const j = (i + 1) % dirs.length;
    const d1 = dirs[i] as P;
    const d2 = dirs[j] as P;
    const h1 = roughHits[i] as Map<number, number>;
    const h2 = roughHits[j] as Map<number, number>;
    const candidates: Array<{ k: number; s: number }> = [];
    for (const [k, t1] of h1) {
      const t2 = h2.get(k);
      if (t2 !== undefined) candidates.push({ k, s: t1 + t2 });
    }
    candidates.sort((x, y) => x.s - y.s);
    // Segments spanning the sector do not cross inside it: the nearest at both edges is nearest
    // throughout. Exact sums decide among those the ordinary numbers cannot tell apart.
    let best = -1;
    let bestSum: Dec | null = null;
    let bestRough = 0;
    for (const cand of candidates) {
      if (bestSum !== null && cand.s > bestRough * (1 + 1e-9) + 1e-12) break;
      const t1 = exactT(i, cand.k);
      const t2 = exactT(j, cand.k);
      if (t1 === null || t2 === null) continue;
      const sum = t1.add(t2);
      if (bestSum === null || sum.lt(bestSum)) {
        best = cand.k;
        bestSum = sum;
        bestRough = cand.s;
      }
    }
    const seg = all[best];
    if (!seg) return [...zone]; // cannot happen for a zone polygon around c; the whole zone is the safe answer
    const t1 = exactT(i, best) as Dec;
    const t2 = exactT(j, best) as Dec;
    polygon.push(add(c, scale(d1, seg.screen ? t1.add(padAlong(i)) : t1)), add(c, scale(d2, seg.screen ? t2.add(padAlong(j)) : t2)));
  }
  return tidy(polygon);
}

/** A screen end not joined to another screen is moved `pad` towards the other end (none left: dropped). */
function trimFreeEnds(s: Seg, all: readonly Seg[], pad: Dec): Seg | null {
  const [a, b] = s;
  const joined = (q: P) => all.some((o) => o !== s && distanceSqToSegment(q, o[0], o[1]).lte(JOINED_M * JOINED_M));
  const len = new Dec(new DecGeo(dot(sub(b, a), sub(b, a))).sqrt());
  const ja = joined(a);
  const jb = joined(b);
  const cut = pad.mul((ja ? 0 : 1) + (jb ? 0 : 1));
  if (cut.isZero()) return s;
  if (len.lte(cut)) return null;
  const u = scale(sub(b, a), pad.div(len));
  return [ja ? a : add(a, u), jb ? b : sub(b, u)];
}

/** Where the lines through two segments cross, or null when they are parallel. */
function lineCrossing(p: Screen, q: Screen): P | null {
  const r = sub(p.b, p.a);
  const s = sub(q.b, q.a);
  const den = cross(r, s);
  if (den.isZero()) return null;
  const t = cross(sub(q.a, p.a), s).div(den);
  if (t.lt(0) || t.gt(1)) return null;
  return add(p.a, scale(r, t));
}

/** Distinct directions from c to the marks, sorted by angle (exact: half-plane, then cross product). */
function sortedDirections(c: P, marks: readonly P[]): P[] {
  const ds = marks.map((m) => sub(m, c)).filter((d) => !(d.x.isZero() && d.y.isZero()));
  const half = (d: P) => (d.y.gt(0) || (d.y.isZero() && d.x.gt(0)) ? 0 : 1);
  ds.sort((u, v) => {
    const hu = half(u);
    const hv = half(v);
    if (hu !== hv) return hu - hv;
    const k = cross(u, v);
    return k.gt(0) ? -1 : k.lt(0) ? 1 : 0;
  });
  const out: P[] = [];
  for (const d of ds) {
    const last = out[out.length - 1];
    if (last && half(last) === half(d) && cross(last, d).isZero() && dot(last, d).gt(0)) continue;
    out.push(d);
  }
  return out;
}

/**
 * Quick test in ordinary numbers: where the ray c + t·d may meet the segment (t), or null when it
 * clearly cannot. Generous at the segment's ends; the exact test decides.
 */
function roughHit(cx: number, cy: number, dx: number, dy: number, ax: number, ay: number, bx: number, by: number): number | null {
  const sx = bx - ax;
  const sy = by - ay;
  const den = dx * sy - dy * sx;
  const scaleN = Math.hypot(dx, dy) * Math.hypot(sx, sy);
  if (Math.abs(den) <= 1e-12 * scaleN) return null;
  const qx = ax - cx;
  const qy = ay - cy;
  const t = (qx * sy - qy * sx) / den;
  const w = (qx * dy - qy * dx) / den;
  return t > -1e-9 && w > -1e-6 && w < 1 + 1e-6 ? t : null;
}

/**
 * A sight line aimed at a corner of the zone polygon meets the side there at w = 0 or 1 exactly, but
 * the corner's own digits can put the computed w a few units of the 40th digit outside: such a line
 * still meets the side (without this a small zone could find no side in a sector and be left uncut).
 */
const W_ROUNDING = new Dec('1e-25');

/** The ray c + t·d (t > 0) against the closed segment a–b: t, or null (parallel lines do not meet). */
function rayParam(c: P, d: P, a: P, b: P): Dec | null {
  const s = sub(b, a);
  const den = cross(d, s);
  if (den.isZero()) return null;
  const q = sub(a, c);
  const t = cross(q, s).div(den);
  const w = cross(q, d).div(den);
  if (t.lte(0) || w.lt(W_ROUNDING.neg()) || w.gt(W_ROUNDING.add(1))) return null;
  return t;
}

/** Drops repeated corners (closer than 1 nm) and corners on a straight line between their neighbours. */
function tidy(poly: readonly P[]): P[] {
  const same = (p: P, q: P) => Math.abs(p.x.toNumber() - q.x.toNumber()) < 1e-9 && Math.abs(p.y.toNumber() - q.y.toNumber()) < 1e-9;
  const out: P[] = [];
  for (const p of poly) {
    const last = out[out.length - 1];
    if (!last || !same(last, p)) out.push(p);
  }
  while (out.length > 1 && same(out[0] as P, out[out.length - 1] as P)) out.pop();
  const straight: P[] = [];
  for (let i = 0; i < out.length; i++) {
    const a = out[(i + out.length - 1) % out.length] as P;
    const p = out[i] as P;
    const b = out[(i + 1) % out.length] as P;
    if (!cross(sub(p, a), sub(b, p)).isZero()) straight.push(p);
  }
  return straight.length >= 3 ? straight : out;
}
