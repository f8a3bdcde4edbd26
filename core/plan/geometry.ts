/**
 * Plane geometry for the room plan, in decimal arithmetic (core/numeric/decimal.ts) so that a
 * stored plan recomputes to the same zone coordinates on any machine.
 * Boundaries count as inside everywhere (a door touching a zone is in the zone: the safe side).
 */
import { Dec, PI } from '../numeric/decimal.js';

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

/** Distance from p to the closed segment a–b. */
export function distanceToSegment(p: P, a: P, b: P): Dec {
  const ab = sub(b, a);
  const L2 = dot(ab, ab);
  if (L2.isZero()) return distance(p, a);
  const t = Dec.min(1, Dec.max(0, dot(sub(p, a), ab).div(L2)));
  return distance(p, add(a, scale(ab, t)));
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
    if (distanceToSegment(p, a, b).isZero()) return true;
    if (a.y.gt(p.y) !== b.y.gt(p.y)) {
      const xCross = b.x.sub(a.x).mul(p.y.sub(a.y)).div(b.y.sub(a.y)).add(a.x);
      if (p.x.lt(xCross)) inside = !inside;
    }
  }
  return inside;
}

/** Distance from p to the polygon's area: 0 inside or on the boundary. */
export function distanceToPolygon(p: P, poly: readonly P[]): Dec {
  if (pointInPolygon(p, poly)) return new Dec(0);
  let best: Dec | null = null;
  for (const [a, b] of edges(poly)) {
    const d = distanceToSegment(p, a, b);
    if (best === null || d.lt(best)) best = d;
  }
  return best ?? new Dec(0);
}

/** Does the closed segment a–b touch the polygon's area? */
export function segmentTouchesPolygon(a: P, b: P, poly: readonly P[]): boolean {
  if (pointInPolygon(a, poly) || pointInPolygon(b, poly)) return true;
  for (const [c, d] of edges(poly)) {
    if (segmentsMeet(a, b, c, d)) return true;
  }
  return false;
}

/** Is every point of polygon `inner` inside polygon `outer` (vertices inside, no edges crossing)? */
export function polygonInside(inner: readonly P[], outer: readonly P[]): boolean {
  if (!inner.every((v) => pointInPolygon(v, outer))) return false;
  const outerEdges = edges(outer);
  for (const [a, b] of edges(inner)) {
    for (const [c, d] of outerEdges) {
      if (properCross(a, b, c, d)) return false;
    }
  }
  return true;
}

function properCross(a: P, a2: P, b: P, b2: P): boolean {
  const d1 = cross(sub(b2, b), sub(a, b));
  const d2 = cross(sub(b2, b), sub(a2, b));
  const d3 = cross(sub(a2, a), sub(b, a));
  const d4 = cross(sub(a2, a), sub(b2, a));
  return ((d1.gt(0) && d2.lt(0)) || (d1.lt(0) && d2.gt(0))) && ((d3.gt(0) && d4.lt(0)) || (d3.lt(0) && d4.gt(0)));
}

/**
 * A polygon around the circle (centre c, radius r) with n corners: the corners sit at r / cos(π/n)
 * so every side touches the circle from outside (derived: the apothem of a regular n-gon is
 * R·cos(π/n)); the polygon is never smaller than the circle.
 */
export function circleOutside(c: P, r: Dec, n: number): P[] {
  const R = r.div(Dec.cos(PI.div(n)));
  const out: P[] = [];
  for (let k = 0; k < n; k++) {
    const a = PI.mul(2 * k).div(n);
    out.push({ x: c.x.add(R.mul(Dec.cos(a))), y: c.y.add(R.mul(Dec.sin(a))) });
  }
  return out;
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

/** Is every corner and side midpoint of `inner` within `tol` of the polygon `outer`? */
export function insideWithin(inner: readonly P[], outer: readonly P[], tol: Dec): boolean {
  const probes = [...inner, ...edges(inner).map(([a, b]) => scale(add(a, b), new Dec('0.5')))];
  return probes.every((v) => distanceToPolygon(v, outer).lte(tol));
}
