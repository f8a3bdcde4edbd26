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
import { DecGeo, add, boxOf, boxesApart, cross, distanceSqToSegment, dot, scale, sub, type P } from './geometry.js';

/** A screen closer than this to the point is the surface the point lies on; it hides nothing (ours: the safe side). */
const ON_SURFACE_M2 = new Dec('1e-12');
/** Two screens whose ends are this close are joined (a corner of a wall, a curtain against a wall); ours. */
const JOINED_M = 1e-6;

type Seg = readonly [P, P];

interface Screen {
  readonly a: P;
  readonly b: P;
  /** Zone polygon edges bound the region; screen hits are moved `pad` beyond the surface. */
  readonly screen: boolean;
}

/**
 * The region of `zone` (a polygon convex about `c` with corners under 180° apart as seen from `c`)
 * seen from `c` past the opaque `screens`. Where the line of sight meets a screen, the region is
 * carried `pad` further along it, so a door or window in that wall is reached and rounding the
 * drawn corners cannot pull the region back inside the visible part. The free end of a screen
 * (one not joined to another screen) is taken `pad` shorter, so its shadow is never drawn too wide.
 */
export function visibleRegion(c: P, zone: readonly P[], screens: readonly Seg[], pad: Dec): P[] {
  const zoneBox = boxOf(zone);
  const near = screens.filter(([a, b]) => !boxesApart(boxOf([a, b]), zoneBox, 0) && distanceSqToSegment(c, a, b).gt(ON_SURFACE_M2));
  if (near.length === 0) return [...zone];
  const trimmed = near.map((s) => trimFreeEnds(s, near, pad)).filter((s): s is Seg => s !== null);
  if (trimmed.length === 0) return [...zone];

  const all: Screen[] = [...zoneEdges(zone).map(([a, b]) => ({ a, b, screen: false })), ...trimmed.map(([a, b]) => ({ a, b, screen: true }))];
  const floats = all.map((s) => ({ ax: s.a.x.toNumber(), ay: s.a.y.toNumber(), bx: s.b.x.toNumber(), by: s.b.y.toNumber(), box: boxOf([s.a, s.b]) }));

  // Directions that start or end a sector.
  const marks: P[] = [...zone];
  for (const s of trimmed) for (const q of s) if (!boxesApart(boxOf([q]), zoneBox, 0)) marks.push(q);
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

  // Hit of every segment on every direction, where the sight line meets it.
  const cx = c.x.toNumber();
  const cy = c.y.toNumber();
  const hitsOn = dirs.map((d) => {
    const dx = d.x.toNumber();
    const dy = d.y.toNumber();
    const out = new Map<number, Dec>();
    all.forEach((s, k) => {
      const f = floats[k];
      if (!f || !mayHit(cx, cy, dx, dy, f.ax, f.ay, f.bx, f.by)) return;
      const t = rayParam(c, d, s.a, s.b);
      if (t !== null) out.set(k, t);
    });
    return out;
  });

  const polygon: P[] = [];
  for (let i = 0; i < dirs.length; i++) {
    const j = (i + 1) % dirs.length;
    const d1 = dirs[i] as P;
    const d2 = dirs[j] as P;
    const h1 = hitsOn[i] as Map<number, Dec>;
    const h2 = hitsOn[j] as Map<number, Dec>;
    let best = -1;
    let bestSum: Dec | null = null;
    for (const [k, t1] of h1) {
      const t2 = h2.get(k);
      if (t2 === undefined) continue;
      // Segments spanning the sector do not cross inside it: the nearest at both edges is nearest throughout.
      const sum = t1.add(t2);
      if (bestSum === null || sum.lt(bestSum)) {
        best = k;
        bestSum = sum;
      }
    }
    const seg = all[best];
    if (!seg) return [...zone]; // cannot happen for a zone polygon around c; the whole zone is the safe answer
    const t1 = h1.get(best) as Dec;
    const t2 = h2.get(best) as Dec;
    polygon.push(beyond(c, d1, t1, seg.screen ? pad : null), beyond(c, d2, t2, seg.screen ? pad : null));
  }
  return tidy(polygon);
}

function zoneEdges(zone: readonly P[]): Seg[] {
  return zone.map((q, i) => [q, zone[(i + 1) % zone.length] as P] as const);
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

/** Quick test in ordinary numbers: can the ray c + t·d (t > 0) meet the segment? Never decides "yes" alone. */
function mayHit(cx: number, cy: number, dx: number, dy: number, ax: number, ay: number, bx: number, by: number): boolean {
  const sx = bx - ax;
  const sy = by - ay;
  const den = dx * sy - dy * sx;
  const scaleN = Math.hypot(dx, dy) * Math.hypot(sx, sy);
  if (Math.abs(den) <= 1e-12 * scaleN) return false;
  const qx = ax - cx;
  const qy = ay - cy;
  const t = (qx * sy - qy * sx) / den;
  const w = (qx * dy - qy * dx) / den;
  return t > -1e-9 && w > -1e-6 && w < 1 + 1e-6;
}

/** The ray c + t·d (t > 0) against the closed segment a–b: t, or null (parallel lines do not meet). */
function rayParam(c: P, d: P, a: P, b: P): Dec | null {
  const s = sub(b, a);
  const den = cross(d, s);
  if (den.isZero()) return null;
  const q = sub(a, c);
  const t = cross(q, s).div(den);
  const w = cross(q, d).div(den);
  if (t.lte(0) || w.lt(0) || w.gt(1)) return null;
  return t;
}

/** c + t·d, carried `pad` further along d when given. */
function beyond(c: P, d: P, t: Dec, pad: Dec | null): P {
  if (pad === null) return add(c, scale(d, t));
  const len = new Dec(new DecGeo(dot(d, d)).sqrt());
  return add(c, scale(d, t.add(pad.div(len))));
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
