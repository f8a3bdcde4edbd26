/**
 * A direct-beam strip cut at the walls, curtains and barriers beside the beam or at its end: the beam
 * cannot reach behind an opaque surface it does not pass, so the 50 mm drawing margin (and the
 * over-limit width) stop 1 mm beyond such a surface instead of running into the next room at an inside
 * corner of the outline or through the wall the beam ends on.
 *
 * - Along the beam: the strip is what the lines of the band reach, each parallel to the beam, starting
 *   beside the leg's start and stopped (plus the pad) by the first screen it meets. A line passing
 *   the end of a curtain or a corner runs on, so the strip is never cut by a surface the beam, placed
 *   anywhere within it, may miss (derived; ours: the safe side).
 * - The 50 mm past the end of the leg are swept the same way; the 50 mm before its start are what the
 *   start, 1 mm in from it, sees in a straight line (core/plan/visibility.ts), as for a diffuse spot.
 * Screens the leg passes through are openings (a door or window in that wall) and cut nothing.
 */
import { Dec } from '../numeric/decimal.js';
import { add, corridor, dot, normal, rayHitsSegment, scale, sub, unit, type P } from './geometry.js';
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
  /** Start of the leg: where the lines of the band start (beside it). */
  readonly origin: P;
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
  // The margin past the leg's end is swept like the rest: each line of the band runs on to the first screen it meets.
  const t1 = piece.capEnd ? len.add(ext) : len;
  if (t1.lte(t0)) return [corridor(from, to, w, piece.capStart ? ext : new Dec(0), piece.capEnd ? ext : new Dec(0))];
  const at = (t: Dec) => add(from, scale(u, t));
  const out: P[][] = [];
  if (piece.capStart) out.push(endPiece(corridor(from, at(endLen), w, ext, new Dec(0)), at(pad), screens, pad));
  const off = dot(sub(from, piece.origin), u);
  out.push(...besideScreens(piece.origin, u, off.add(t0), off.add(t1), w, screens, pad));
  return out.filter((q) => q.length >= 3);
}

function endPiece(rect: P[], seenFrom: P, screens: readonly ScreenSeg[], pad: Dec): P[] {
  return visibleRegion(seenFrom, rect, screens, pad);
}

/**
 * The slices of the strip t ∈ [t0, t1], |s| ≤ w (t from `o`, the leg's start, along `u`; s to its
 * left): what the lines of the band reach. Each line s starts beside the leg's start (where the line
 * at right angles from the start to it meets no screen) and runs along `u` until the first screen it
 * meets, `pad` beyond it. Between the offsets where a screen ends or two screens cross, one screen is
 * the first met, so the reached region is bounded by straight pieces (derived).
 */
function besideScreens(o: P, u: P, t0: Dec, t1: Dec, w: Dec, screens: readonly ScreenSeg[], pad: Dec): P[][] {
  const n = normal(u);
  const local = (q: P): Local => ({ t: dot(sub(q, o), u), s: dot(sub(q, o), n) });
  const plan = (q: Local): P => add(o, add(scale(u, q.t), scale(n, q.s)));
  const eps = new Dec('1e-9');
  // Lines the start reaches: up to the nearest screen crossing the start's own cross line, each side.
  let sLo = w.neg();
  let sHi = w;
  const lines: Array<{ s0: Dec; s1: Dec; at: (s: Dec) => Dec }> = [];
  for (const sc of screens) {
    const a = local(sc.a);
    const b = local(sc.b);
    if (!a.t.sub(b.t).isZero() && a.t.mul(b.t).lte(0)) {
      const s0 = a.s.add(b.s.sub(a.s).mul(a.t.neg().div(b.t.sub(a.t))));
      if (s0.gt(eps) && s0.lt(sHi)) sHi = s0;
      if (s0.lt(eps.neg()) && s0.gt(sLo)) sLo = s0;
    }
    if (a.s.eq(b.s)) continue; // along the lines: meets none of them
    const [p, q] = a.s.lt(b.s) ? [a, b] : [b, a];
    const k = q.t.sub(p.t).div(q.s.sub(p.s));
    lines.push({ s0: p.s, s1: q.s, at: (s: Dec) => p.t.add(k.mul(s.sub(p.s))) });
  }
  if (sHi.lte(sLo)) return [];
  // A surface beside the start bounds the band: the region is carried `pad` beyond it sideways
  // (the lines themselves stop at it, so nothing runs on along the far side of that surface).
  const widen = (q: Local): Local => (q.s.eq(sHi) && sHi.lt(w) ? { t: q.t, s: Dec.min(w, sHi.add(pad)) } : q.s.eq(sLo) && sLo.gt(w.neg()) ? { t: q.t, s: Dec.max(w.neg(), sLo.sub(pad)) } : q);
  // Offsets where the first screen met can change: ends, crossings of two screens, and where a screen passes the start.
  const marks: Dec[] = [sLo, sHi];
  const within = (s: Dec) => s.gt(sLo) && s.lt(sHi);
  for (const l of lines) {
    for (const s of [l.s0, l.s1]) if (within(s)) marks.push(s);
    const d = l.at(l.s1).sub(l.at(l.s0));
    if (!d.isZero()) {
      const s = l.s0.sub(l.at(l.s0).mul(l.s1.sub(l.s0)).div(d)); // where it is at t = 0
      if (within(s)) marks.push(s);
    }
  }
  for (let i = 0; i < lines.length; i++) {
    for (let j = i + 1; j < lines.length; j++) {
      const A = lines[i] as (typeof lines)[number];
      const B = lines[j] as (typeof lines)[number];
      const lo = Dec.max(A.s0, B.s0);
      const hi = Dec.min(A.s1, B.s1);
      if (lo.gte(hi)) continue;
      const dLo = A.at(lo).sub(B.at(lo));
      const dHi = A.at(hi).sub(B.at(hi));
      if (dLo.mul(dHi).lt(0)) {
        const s = lo.add(hi.sub(lo).mul(dLo.div(dLo.sub(dHi))));
        if (within(s)) marks.push(s);
      }
    }
  }
  marks.sort((x, y) => x.cmp(y));
  const cuts = marks.filter((m, k) => k === 0 || !m.eq(marks[k - 1] as Dec));
  // The far edge of the reached region in each interval, clipped to the slice [t0, t1].
  type Pt = Local;
  const runs: Pt[][] = [];
  let run: Pt[] = [];
  const close = () => {
    if (run.length >= 2) runs.push(run);
    run = [];
  };
  const clip = (t: Dec) => Dec.min(t1, Dec.max(t0, t));
  for (let i = 0; i + 1 < cuts.length; i++) {
    const sa = cuts[i] as Dec;
    const sb = cuts[i + 1] as Dec;
    const mid = sa.add(sb).div(2);
    let first: ((s: Dec) => Dec) | null = null;
    let best: Dec | null = null;
    for (const l of lines) {
      if (mid.lt(l.s0) || mid.gt(l.s1)) continue;
      const t = l.at(mid);
      if (t.lte(eps)) continue; // behind the start
      if (best === null || t.lt(best)) {
        best = t;
        first = l.at;
      }
    }
    const far = (s: Dec) => (first ? first(s).add(pad) : t1);
    // Split where the far edge crosses t0 or t1, so each piece is straight after clipping.
    const pts = [sa, sb];
    const fa = far(sa);
    const fb = far(sb);
    for (const edge of [t0, t1]) {
      const da = fa.sub(edge);
      const db = fb.sub(edge);
      if (da.mul(db).lt(0)) pts.splice(pts.length - 1, 0, sa.add(sb.sub(sa).mul(da.div(da.sub(db)))));
    }
    pts.sort((x, y) => x.cmp(y));
    for (let k = 0; k + 1 < pts.length; k++) {
      const s0 = pts[k] as Dec;
      const s1 = pts[k + 1] as Dec;
      const m = far(s0.add(s1).div(2));
      if (m.lte(t0)) {
        close();
        continue;
      }
      run.push({ t: clip(far(s0)), s: s0 }, { t: clip(far(s1)), s: s1 });
    }
  }
  close();
  return runs.map((r) => {
    const first = r[0] as Pt;
    const last = r[r.length - 1] as Pt;
    return [{ t: t0, s: first.s }, ...r, { t: t0, s: last.s }].map(widen).map(plan);
  });
}

