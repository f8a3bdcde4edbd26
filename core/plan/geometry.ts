/**
 * Plane geometry for the room plan, in decimal arithmetic (core/numeric/decimal.ts) so that a
 * stored plan recomputes to the same zone coordinates on any machine.
 * Boundaries count as inside everywhere (a door touching a zone is in the zone: the safe side).
 */
import { Dec, PI } from '../numeric/decimal.js';

/**
 * A 20-digit decimal for the slow functions of the plan geometry (ln, cos, sin): deterministic like
 * the 40-digit one, and far more precise than the millimetre the zones are drawn to.
 */
export const DecGeo = Dec.clone({ precision: 20 });

export interface P {
  readonly x: Dec;
  readonly y: Dec;
}

export const pt = (x: Dec | number | string, y: Dec | number | string): P => ({ x: new Dec(x), y: new Dec(y) });
export const add = (a: P, b: P): P => ({ x: a.x.add(b.x), y: a.y.add(b.y) });
export const sub = (a: P, b: P): P => ({ x: a.x.sub(b.x), y: a.y.sub(b.y) });
export const scale = (a: P, k: Dec): P => ({ x: a.x.mul(k), y: a.y.mul(k) });
export const dot = (a: P, b: P): Dec => a.x.mul(b.x).add(a.y.mul(b.y));
export const cross = (a: P, b: P): Dec => a.x.mul(b.y).sub(a.y.mul(b.x));
export const length = (a: P): Dec => dot(a, a).sqrt();
export const distance = (a: P, b: P): Dec => length(sub(a, b));

/** Unit vector from a to b (a and b distinct). */
export function unit(a: P, b: P): P {
  const d = sub(b, a);
  return scale(d, new Dec(1).div(length(d)));
}

/** Unit vector at `deg` degrees counter-clockwise from +x. */
export function unitFromDegrees(deg: number): P {
  const r = new Dec(deg).mul(PI).div(180);
  return { x: Dec.cos(r), y: Dec.sin(r) };
}

/** Left-hand normal of a unit vector. */
export const normal = (u: P): P => ({ x: u.y.neg(), y: u.x });

/**
 * Where the ray p + t·u (u a unit vector, t >= 0) crosses the segment q–q2: the distance t along the
 * ray, or null when they do not meet (parallel lines are taken as not crossing).
 */
export function rayHitsSegment(p: P, u: P, q: P, q2: P): Dec | null {
  const s = sub(q2, q);
  const den = cross(u, s);
  if (den.isZero()) return null;
  const qp = sub(q, p);
  const t = cross(qp, s).div(den);
  const w = cross(qp, u).div(den);
  if (t.lt(0) || w.lt(0) || w.gt(1)) return null;
  return t;
}

/** Do the closed segments a–a2 and b–b2 meet (touching counts)? */
export function segmentsMeet(a: P, a2: P, b: P, b2: P): boolean {
  const d1 = cross(sub(b2, b), sub(a, b));
  const d2 = cross(sub(b2, b), sub(a2, b));
  const d3 = cross(sub(a2, a), sub(b, a));
  const d4 = cross(sub(a2, a), sub(b2, a));
  if (((d1.gt(0) && d2.lt(0)) || (d1.lt(0) && d2.gt(0))) && ((d3.gt(0) && d4.lt(0)) || (d3.lt(0) && d4.gt(0)))) return true;
  return (
    (d1.isZero() && onSegment(b, b2, a)) ||
    (d2.isZero() && onSegment(b, b2, a2)) ||
    (d3.isZero() && onSegment(a, a2, b)) ||
    (d4.isZero() && onSegment(a, a2, b2))
  );
}

function onSegment(a: P, b: P, p: P): boolean {
  return Dec.min(a.x, b.x).lte(p.x) && p.x.lte(Dec.max(a.x, b.x)) && Dec.min(a.y, b.y).lte(p.y) && p.y.lte(Dec.max(a.y, b.y));
}

/** Squared distance from p to the closed segment a–b (no square root: comparisons use it squared). */
export function distanceSqToSegment(p: P, a: P, b: P): Dec {
  const ab = sub(b, a);
  const L2 = dot(ab, ab);
  const ap = sub(p, a);
  if (L2.isZero()) return dot(ap, ap);
  const t = Dec.min(1, Dec.max(0, dot(ap, ab).div(L2)));
  const d = sub(p, add(a, scale(ab, t)));
  return dot(d, d);
}

/** The closing edges of a polygon, each as [start, end]. */
export function edges(poly: readonly P[]): Array<readonly [P, P]> {
  const out: Array<readonly [P, P]> = [];
  let prev = poly[poly.length - 1];
  for (const q of poly) {
    if (prev) out.push([prev, q]);
    prev = q;
  }
  return out;
}

/** Point in polygon (even-odd rule); a point on the boundary counts as inside. */
export function pointInPolygon(p: P, poly: readonly P[]): boolean {
  let inside = false;
  for (const [b, a] of edges(poly)) {
    if (cross(sub(b, a), sub(p, a)).isZero() && onSegment(a, b, p)) return true;
    if (a.y.gt(p.y) !== b.y.gt(p.y)) {
      const xCross = b.x.sub(a.x).mul(p.y.sub(a.y)).div(b.y.sub(a.y)).add(a.x);
      if (p.x.lt(xCross)) inside = !inside;
    }
  }
  return inside;
}

/** Is p within distance r of the polygon's area (inside, on the boundary, or at most r away)? */
export function withinOfPolygon(p: P, poly: readonly P[], r: Dec): boolean {
  if (pointInPolygon(p, poly)) return true;
  const r2 = r.mul(r);
  for (const [a, b] of edges(poly)) if (distanceSqToSegment(p, a, b).lte(r2)) return true;
  return false;
}

/** Does the closed segment a–b touch the polygon's area? */
export function segmentTouchesPolygon(a: P, b: P, poly: readonly P[]): boolean {
  if (pointInPolygon(a, poly) || pointInPolygon(b, poly)) return true;
  for (const [c, d] of edges(poly)) {
    if (segmentsMeet(a, b, c, d)) return true;
  }
  return false;
}

/**
 * A polygon around the circle (centre c, radius r) with n corners: the corners sit at r / cos(π/n)
 * so every side touches the circle from outside (derived: the apothem of a regular n-gon is
 * R·cos(π/n)); the polygon is never smaller than the circle.
 */
export function circleOutside(c: P, r: Dec, n: number): P[] {
  const t = ringOf(n);
  const R = r.div(t.apothem);
  return t.corners.map((q) => ({ x: c.x.add(R.mul(q.x)), y: c.y.add(R.mul(q.y)) }));
}

/** Unit-circle corners and cos(π/n) of an n-gon, computed once per n (decimal trigonometry is slow). */
const rings = new Map<number, { corners: P[]; apothem: Dec }>();
function ringOf(n: number): { corners: P[]; apothem: Dec } {
  const hit = rings.get(n);
  if (hit) return hit;
  const corners: P[] = [];
  // 20 significant digits are plenty for corners rounded to the millimetre and are much faster;
  // the apothem is rounded down so the polygon can only grow (derived).
  for (let k = 0; k < n; k++) {
    const a = new DecGeo(PI.mul(2 * k).div(n));
    corners.push({ x: new Dec(DecGeo.cos(a)), y: new Dec(DecGeo.sin(a)) });
  }
  const ring = { corners, apothem: new Dec(DecGeo.cos(new DecGeo(PI.div(n)))).toSignificantDigits(18, Dec.ROUND_DOWN) };
  rings.set(n, ring);
  return ring;
}

/** The rectangle around the segment a–b: half-width w to each side, extended by eA before a and eB past b. */
export function corridor(a: P, b: P, w: Dec, eA: Dec, eB: Dec = eA): P[] {
  const u = unit(a, b);
  const n = scale(normal(u), w);
  const a0 = sub(a, scale(u, eA));
  const b0 = add(b, scale(u, eB));
  return [add(a0, n), add(b0, n), sub(b0, n), sub(a0, n)];
}

/** Axis-aligned box as a polygon (counter-clockwise). */
export function box(min: P, max: P): P[] {
  return [min, { x: max.x, y: min.y }, max, { x: min.x, y: max.y }];
}

/** Twice the signed area (positive when the corners run counter-clockwise). */
function signedArea2(poly: readonly P[]): Dec {
  let s = new Dec(0);
  for (const [a, b] of edges(poly)) s = s.add(cross(a, b));
  return s;
}

/**
 * Is the outline a simple polygon: no two sides cross or touch, except neighbours at their shared
 * corner? (Zones, sight lines and the inside test all assume one; a bow-tie outline is refused.)
 */
export function isSimpleOutline(poly: readonly P[]): boolean {
  const es = edges(poly);
  const n = es.length;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = es[i];
      const b = es[j];
      if (!a || !b) continue;
      const neighbours = j === i + 1 || (i === 0 && j === n - 1);
      if (neighbours) {
        // Neighbours share one corner; they must not fold back over each other.
        const shared = j === i + 1 ? a[1] : a[0];
        const other = j === i + 1 ? b[1] : b[0];
        const own = j === i + 1 ? a[0] : a[1];
        if (cross(sub(own, shared), sub(other, shared)).isZero() && dot(sub(own, shared), sub(other, shared)).gt(0)) return false;
        continue;
      }
      if (segmentsMeet(a[0], a[1], b[0], b[1])) return false;
    }
  }
  return true;
}

/** Is the polygon convex (no turn against the others)? */
export function isConvex(poly: readonly P[]): boolean {
  let sign = 0;
  const es = edges(poly);
  for (let i = 0; i < es.length; i++) {
    const e1 = es[i];
    const e2 = es[(i + 1) % es.length];
    if (!e1 || !e2) continue;
    const c = cross(sub(e1[1], e1[0]), sub(e2[1], e2[0]));
    if (c.isZero()) continue;
    const s = c.gt(0) ? 1 : -1;
    if (sign !== 0 && s !== sign) return false;
    sign = s;
  }
  return true;
}

/**
 * The part of `subject` inside the convex polygon `clip` widened by `pad` on every side
 * (Sutherland–Hodgman clipping against each side's half-plane). Empty when nothing is inside.
 */
export function clipToConvex(subject: readonly P[], clip: readonly P[], pad: Dec): P[] {
  const ccw = signedArea2(clip).gte(0) ? [...clip] : [...clip].reverse();
  let out: P[] = [...subject];
  for (const [a, b] of edges(ccw)) {
    if (out.length === 0) break;
    const d = sub(b, a);
    const len = length(d);
    if (len.isZero()) continue;
    const n = { x: d.y.div(len), y: d.x.neg().div(len) }; // outward normal of a counter-clockwise side
    const f = (p: P) => dot(n, sub(p, a)).sub(pad); // <= 0 inside
    const input = out;
    // Quick pass in ordinary numbers: a side that no point comes within 1 µm of cannot cut.
    const nx = n.x.toNumber();
    const ny = n.y.toNumber();
    const ax = a.x.toNumber();
    const ay = a.y.toNumber();
    const padN = pad.toNumber();
    if (input.every((p) => nx * (p.x.toNumber() - ax) + ny * (p.y.toNumber() - ay) - padN < -1e-6)) continue;
    out = [];
    let s = input[input.length - 1];
    for (const e of input) {
      if (!s) break;
      const fs = f(s);
      const fe = f(e);
      if (fe.lte(0)) {
        if (fs.gt(0)) out.push(add(s, scale(sub(e, s), fs.div(fs.sub(fe)))));
        out.push(e);
      } else if (fs.lte(0)) {
        out.push(add(s, scale(sub(e, s), fs.div(fs.sub(fe)))));
      }
      s = e;
    }
  }
  return out;
}

const HALF = new Dec('0.5');

/**
 * Does polygon `inner` lie inside the simple polygon `outer` widened by `tol` (any shape, L-shaped
 * or with notches)? Every side of `inner` is cut where it meets a side of `outer`; each piece then
 * lies wholly inside or wholly outside. A piece outside passes only when both its ends are within
 * `tol` of one side of `outer` (the distance to a segment is convex along a line, so the whole piece
 * is then within `tol`); otherwise it is halved a few times before it is called outside (the safe side).
 */
export function insideOutline(inner: readonly P[], outer: readonly P[], tol: Dec): boolean {
  if (!inner.every((v) => withinOfPolygon(v, outer, tol))) return false;
  const outerEdges = edges(outer).map(([c, d]) => ({ c, d, box: boxOf([c, d]) }));
  const tol2 = tol.mul(tol);
  const t = tol.toNumber();
  const nearOneSide = (p0: P, p1: P): boolean => outerEdges.some(({ c, d }) => distanceSqToSegment(p0, c, d).lte(tol2) && distanceSqToSegment(p1, c, d).lte(tol2));
  const pieceInside = (p0: P, p1: P, depth: number): boolean => {
    const mid = scale(add(p0, p1), HALF);
    if (pointInPolygon(mid, outer) || nearOneSide(p0, p1)) return true;
    return depth < 6 && pieceInside(p0, mid, depth + 1) && pieceInside(mid, p1, depth + 1);
  };
  for (const [a, b] of edges(inner)) {
    const ab = sub(b, a);
    const sideBox = boxOf([a, b]);
    const cuts: Dec[] = [new Dec(0), new Dec(1)];
    for (const { c, d, box: ob } of outerEdges) {
      if (boxesApart(sideBox, ob, t)) continue;
      const cd = sub(d, c);
      const den = cross(ab, cd);
      if (den.isZero()) continue; // parallel: a piece along a side has its middle on the boundary (inside)
      const ac = sub(c, a);
      const u = cross(ac, cd).div(den);
      const w = cross(ac, ab).div(den);
      if (u.gt(0) && u.lt(1) && w.gte(0) && w.lte(1)) cuts.push(u);
    }
    cuts.sort((x, y) => x.cmp(y));
    for (let i = 0; i + 1 < cuts.length; i++) {
      const u0 = cuts[i] as Dec;
      const u1 = cuts[i + 1] as Dec;
      if (u1.sub(u0).isZero()) continue;
      if (!pieceInside(add(a, scale(ab, u0)), add(a, scale(ab, u1)), 0)) return false;
    }
  }
  return true;
}

/** Bounding box in ordinary numbers, for a quick test before the exact one (never decides alone). */
export interface Box {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

export function boxOf(ps: readonly P[]): Box {
  const xs = ps.map((p) => p.x.toNumber());
  const ys = ps.map((p) => p.y.toNumber());
  return { x0: Math.min(...xs), y0: Math.min(...ys), x1: Math.max(...xs), y1: Math.max(...ys) };
}

/**
 * Boxes that are more than `gap` m apart (plus 1 µm for the rounding of ordinary numbers) cannot
 * touch: the exact decimal test is skipped for them. Anything closer goes to the exact test.
 */
export function boxesApart(a: Box, b: Box, gap: number): boolean {
  const g = gap + 1e-6;
  return a.x1 + g < b.x0 || b.x1 + g < a.x0 || a.y1 + g < b.y0 || b.y1 + g < a.y0;
}

/**
 * Is the polygon inside the axis-aligned box widened by `tol`? Decided in ordinary numbers where the
 * answer is clear by more than 1 µm, exactly otherwise (a polygon is inside a box when its corners are).
 */
export function insideBox(poly: readonly P[], min: P, max: P, tol: Dec, polyBox?: Box): boolean {
  const b = polyBox ?? boxOf(poly);
  const t = tol.toNumber();
  const lo = { x: min.x.toNumber() - t, y: min.y.toNumber() - t };
  const hi = { x: max.x.toNumber() + t, y: max.y.toNumber() + t };
  const m = 1e-6;
  if (b.x0 > lo.x + m && b.y0 > lo.y + m && b.x1 < hi.x - m && b.y1 < hi.y - m) return true;
  if (b.x0 < lo.x - m || b.y0 < lo.y - m || b.x1 > hi.x + m || b.y1 > hi.y + m) return false;
  const x0 = min.x.sub(tol);
  const y0 = min.y.sub(tol);
  const x1 = max.x.add(tol);
  const y1 = max.y.add(tol);
  return poly.every((p) => p.x.gte(x0) && p.x.lte(x1) && p.y.gte(y0) && p.y.lte(y1));
}

/** The box of an axis-aligned rectangle given as a polygon, or null when it is not one. */
export function asRectangle(poly: readonly P[]): { min: P; max: P } | null {
  if (poly.length !== 4) return null;
  const b = boxOf(poly);
  const ok = poly.every((p) => (p.x.toNumber() === b.x0 || p.x.toNumber() === b.x1) && (p.y.toNumber() === b.y0 || p.y.toNumber() === b.y1));
  if (!ok) return null;
  const xs = poly.map((p) => p.x);
  const ys = poly.map((p) => p.y);
  return { min: { x: Dec.min(...xs), y: Dec.min(...ys) }, max: { x: Dec.max(...xs), y: Dec.max(...ys) } };
}
