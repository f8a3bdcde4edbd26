/**
 * A direct-beam strip cut at the walls, curtains and barriers beside the beam or at its end: the beam
 * cannot reach behind an opaque surface it does not pass, so the 50 mm drawing margin (and the
 * over-limit width) stop 1 mm beyond such a surface instead of running into the next room at an inside
 * corner of the outline or through the wall the beam ends on.
 *
 * - Along the beam: a point of the strip is kept when the line at right angles from the beam to it
 *   meets no screen. The strip is cut across at every screen end that lies inside it; in each slice
 *   a screen that enters it runs from edge to edge, so keeping the beam's side of its line (plus the
 *   pad) is exact (derived).
 * - At each end of the leg (the 50 mm before the start and after the end): what the end of the beam,
 *   1 mm back from it, sees in a straight line (core/plan/visibility.ts), as for a diffuse spot.
 * Screens the leg passes through are openings (a door or window in that wall) and cut nothing.
 */
import { Dec } from '../numeric/decimal.js';
import { add, corridor, cross, dot, normal, rayHitsSegment, scale, sub, unit, type P } from './geometry.js';
import { visibleRegion, type ScreenSeg } from './visibility.js';

/** A point in the strip's own frame: t along the beam from its start, s to the left of it. */
interface Local {
  readonly t: Dec;
  readonly s: Dec;
}

/** Screens the leg from `from` to `to` passes through (strictly between its ends): its openings. */
export function passedScreens(from: P, to: P, screens: readonly ScreenSeg[]): Set<ScreenSeg> {
  const u = unit(from, to);
  const len = dot(sub(to, from), u);
  const eps = new Dec('1e-6');
  const out = new Set<ScreenSeg>();
  for (const s of screens) {
    const t = rayHitsSegment(from, u, s.a, s.b);
    if (t !== null && t.gt(eps) && t.lt(len.sub(eps))) out.add(s);
  }
  return out;
}

export interface StripPiece {
  /** Start and end of the beam piece the strip follows. */
  readonly from: P;
  readonly to: P;
  /** Half-width of the strip, m. */
  readonly w: Dec;
  /** Does the strip run `ext` before `from` (the leg's start) and after `to` (the leg's end)? */
  readonly capStart: boolean;
  readonly capEnd: boolean;
  readonly ext: Dec;
}

/**
 * The strip along one beam piece as polygons (one or more slices, each convex, plus an end piece at
 * each end of the leg), cut `pad` beyond the screens. A piece too short to hold its end pieces is
 * drawn whole, uncut (the safe side).
 */
export function cutStrip(piece: StripPiece, screens: readonly ScreenSeg[], pad: Dec): P[][] {
  const { from, to, w, ext } = piece;
  const u = unit(from, to);
  const len = dot(sub(to, from), u);
  const endLen = pad.mul(2);
  const t0 = piece.capStart ? endLen : new Dec(0);
  const t1 = piece.capEnd ? len.sub(endLen) : len;
  if (t1.lte(t0)) return [corridor(from, to, w, piece.capStart ? ext : new Dec(0), piece.capEnd ? ext : new Dec(0))];
  const at = (t: Dec) => add(from, scale(u, t));
  const out: P[][] = [];
  if (piece.capStart) out.push(endPiece(corridor(from, at(endLen), w, ext, new Dec(0)), at(pad), screens, pad));
  out.push(...besideScreens(from, u, t0, t1, w, screens, pad));
  if (piece.capEnd) out.push(endPiece(corridor(at(t1), to, w, new Dec(0), ext), at(len.sub(pad)), screens, pad));
  return out.filter((q) => q.length >= 3);
}

function endPiece(rect: P[], seenFrom: P, screens: readonly ScreenSeg[], pad: Dec): P[] {
  return visibleRegion(seenFrom, rect, screens, pad);
}

/** The slices of the strip t ∈ [t0, t1], |s| ≤ w, each kept on the beam's side of the screens that cross it. */
function besideScreens(o: P, u: P, t0: Dec, t1: Dec, w: Dec, screens: readonly ScreenSeg[], pad: Dec): P[][] {
  const n = normal(u);
  const local = (q: P): Local => ({ t: dot(sub(q, o), u), s: dot(sub(q, o), n) });
  const plan = (q: Local): P => add(o, add(scale(u, q.t), scale(n, q.s)));
  const wNeg = w.neg();
  const segs = screens
    .map((sc) => [local(sc.a), local(sc.b)] as const)
    .filter(([a, b]) => chord(a, b, t0, t1, wNeg, w) !== null);
  // Cut across at every screen end inside the strip, so that in each slice every screen runs edge to edge.
  const cuts = [t0, t1];
  for (const [a, b] of segs) for (const q of [a, b]) if (q.t.gt(t0) && q.t.lt(t1) && q.s.gt(wNeg) && q.s.lt(w)) cuts.push(q.t);
  cuts.sort((x, y) => x.cmp(y));
  const out: P[][] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const a = cuts[i] as Dec;
    const b = cuts[i + 1] as Dec;
    if (b.sub(a).lte(0)) continue;
    let poly: Local[] = [
      { t: a, s: wNeg },
      { t: b, s: wNeg },
      { t: b, s: w },
      { t: a, s: w },
    ];
    const axis: Local = { t: a.add(b).div(2), s: new Dec(0) };
    for (const [p, q] of segs) {
      const c = chord(p, q, a, b, wNeg, w);
      if (!c || !strictlyInside(mid(c[0], c[1]), a, b, wNeg, w)) continue; // touching an edge cuts nothing
      poly = keepSide(poly, p, q, axis, pad);
      if (poly.length < 3) break;
    }
    if (poly.length >= 3) out.push(poly.map(plan));
  }
  return out;
}

const mid = (p: Local, q: Local): Local => ({ t: p.t.add(q.t).div(2), s: p.s.add(q.s).div(2) });

function strictlyInside(q: Local, t0: Dec, t1: Dec, s0: Dec, s1: Dec): boolean {
  return q.t.gt(t0) && q.t.lt(t1) && q.s.gt(s0) && q.s.lt(s1);
}

/** Liang–Barsky: the part of segment p–q inside the box [t0, t1] × [s0, s1] (edges included), or null. */
function chord(p: Local, q: Local, t0: Dec, t1: Dec, s0: Dec, s1: Dec): [Local, Local] | null {
  let lo = new Dec(0);
  let hi = new Dec(1);
  const dt = q.t.sub(p.t);
  const ds = q.s.sub(p.s);
  for (const [num, den] of [
    [p.t.sub(t0), dt],
    [t1.sub(p.t), dt.neg()],
    [p.s.sub(s0), ds],
    [s1.sub(p.s), ds.neg()],
  ] as const) {
    // Inside this side where num + den·k ≥ 0.
    if (den.isZero()) {
      if (num.lt(0)) return null;
      continue;
    }
    const k = num.neg().div(den);
    if (den.gt(0)) lo = Dec.max(lo, k);
    else hi = Dec.min(hi, k);
    if (lo.gt(hi)) return null;
  }
  const at = (k: Dec): Local => ({ t: p.t.add(dt.mul(k)), s: p.s.add(ds.mul(k)) });
  return [at(lo), at(hi)];
}

/** The part of the convex polygon on `ref`'s side of the line p–q, widened `pad` beyond the line. */
function keepSide(poly: readonly Local[], p: Local, q: Local, ref: Local, pad: Dec): Local[] {
  const d = { t: q.t.sub(p.t), s: q.s.sub(p.s) };
  const len = d.t.mul(d.t).add(d.s.mul(d.s)).sqrt();
  if (len.isZero()) return [...poly];
  const side = (x: Local) => crossL(d, { t: x.t.sub(p.t), s: x.s.sub(p.s) }).div(len); // signed distance to the line
  const refSide = side(ref);
  if (refSide.isZero()) return [...poly]; // the beam runs along the screen: nothing is cut (the safe side)
  const sign = refSide.gt(0) ? 1 : -1;
  const f = (x: Local) => side(x).mul(-sign).sub(pad); // ≤ 0: kept
  const out: Local[] = [];
  let prev = poly[poly.length - 1];
  for (const e of poly) {
    const a = prev;
    if (!a) break;
    const fs = f(a);
    const fe = f(e);
    const cut = () => {
      const k = fs.div(fs.sub(fe));
      out.push({ t: a.t.add(e.t.sub(a.t).mul(k)), s: a.s.add(e.s.sub(a.s).mul(k)) });
    };
    if (fe.lte(0)) {
      if (fs.gt(0)) cut();
      out.push(e);
    } else if (fs.lte(0)) cut();
    prev = e;
  }
  return out;
}

const crossL = (a: Local, b: Local): Dec => cross({ x: a.t, y: a.s }, { x: b.t, y: b.s });
