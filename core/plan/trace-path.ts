/**
 * Follows one laser's drawn beam path through the room: straight legs from the exit to each
 * mirror, ending at a beam dump, a target, the first wall or barrier in the way, or (for an open
 * path) far beyond the plan. Doors and windows do not stop the beam: a door can be opened and
 * glass passes most laser wavelengths (common practice: take openings as open).
 *
 * The beam is a band, not a line: as wide as where it exceeds the limit plus the drawing allowance
 * on each side (the same half-width as its zone, core/plan/plan-zones.ts). A wall, curtain or
 * barrier stops the beam only when no line of the band passes it: a line that misses the surface
 * (past its end, a corner of the room or the edge of a door in it) and runs on beyond it means part
 * of the beam may go on, so the path is followed through that surface (ours: never stopped by a
 * surface it may miss, the safe side). The band lines start beside the leg's start, where a line
 * at right angles from it meets no surface.
 */
import { Dec } from '../numeric/decimal.js';
import { add, cross, distance, distanceSqToSegment, dot, edges, normal, pt, rayHitsSegment, scale, sub, unit, unitFromDegrees, type P } from './geometry.js';
import type { PlanBeamPath, PlanPoint, RoomPlan } from './plan-model.js';

/** A wall crossing this close to a door or window crossing is the opening itself (ours: drawing tolerance). */
export const OPENING_TOLERANCE_M = 0.05;
/** Hits closer than this to the start of a leg are the surface the mirror or exit sits on (ours). */
const START_TOLERANCE_M = new Dec('1e-6');

export type LegEnd = 'mirror' | 'dump' | 'target' | 'wall' | 'barrier' | 'open';

export interface Opening {
  readonly kind: 'door' | 'window';
  readonly id: string;
  /** Distance along the whole path, m. */
  readonly at: Dec;
}

/** A wall or barrier the beam meets near its end (or a door's edge, a corner): part of the beam may pass it. */
export interface Grazed {
  readonly kind: 'wall' | 'barrier';
  /** Id of the wall or barrier ('outline' for the room outline). */
  readonly id: string;
  /** Distance along the whole path where the drawn beam meets it, m. */
  readonly at: Dec;
  /** Where the drawn beam meets it. */
  readonly point: P;
  /** Half-width of the band taken for the beam there, m. */
  readonly band: Dec;
  /** The door or window a passing part of the beam goes through at this surface, if any. */
  readonly through: { readonly kind: 'door' | 'window'; readonly id: string } | null;
  /** True when what the beam may pass is a corner of the surface (joined to another), false for a free end. */
  readonly corner: boolean;
}

export interface Leg {
  readonly from: P;
  readonly to: P;
  /** Distances along the whole path at `from` and `to`, m. */
  readonly start: Dec;
  readonly end: Dec;
  readonly endsWith: LegEnd;
  /** Id of the wall or barrier that stops the beam, or the element's label. */
  readonly endId: string;
  readonly openings: readonly Opening[];
  /** Walls and barriers the beam meets on this leg that part of it may pass (in path order). */
  readonly grazed: readonly Grazed[];
  /**
   * When the leg ends where the last passing part of the band is stopped (not on the drawn line):
   * the point of the stopping surface it meets. Null when the drawn line itself ends the leg.
   */
  readonly endSpot: P | null;
  /**
   * A beam dump or target with its aperture stated, which the beam of at least one of the laser's
   * beams is as wide as or wider than: the path goes on past it in the same direction (the next leg).
   */
  readonly passedAperture: Dec | null;
}

/** Does the beam met `z` metres along the path pass (in part) an element of this aperture? */
export type PassesAperture = (z: Dec, aperture: Dec) => boolean;

export const toP = (p: PlanPoint): P => pt(p.x_m, p.y_m);

type SurfaceKind = 'wall' | 'barrier' | 'door' | 'window';

/** One drawn surface the beam can meet. */
interface Surface {
  readonly a: P;
  readonly b: P;
  readonly kind: SurfaceKind;
  readonly id: string;
}

interface Hit {
  readonly t: Dec;
  readonly kind: SurfaceKind;
  readonly id: string;
  readonly surface: Surface;
}

function surfacesOf(plan: RoomPlan): Surface[] {
  const out: Surface[] = [];
  for (const [a, b] of edges(plan.outline.map(toP))) out.push({ a, b, kind: 'wall', id: 'outline' });
  for (const w of plan.walls) out.push({ a: toP(w.a), b: toP(w.b), kind: 'wall', id: w.id });
  for (const b of plan.barriers) out.push({ a: toP(b.a), b: toP(b.b), kind: 'barrier', id: b.id });
  for (const d of plan.doors) out.push({ a: toP(d.a), b: toP(d.b), kind: 'door', id: d.id });
  for (const w of plan.windows) out.push({ a: toP(w.a), b: toP(w.b), kind: 'window', id: w.id });
  return out;
}

function hits(surfaces: readonly Surface[], p: P, u: P, maxT: Dec): Hit[] {
  const out: Hit[] = [];
  for (const s of surfaces) {
    const t = rayHitsSegment(p, u, s.a, s.b);
    if (t !== null && t.gt(START_TOLERANCE_M) && t.lte(maxT)) out.push({ t, kind: s.kind, id: s.id, surface: s });
  }
  return out;
}

const TOL = new Dec(OPENING_TOLERANCE_M);

/** The hits that stop a line: barriers, and walls not crossed at a door or window in them; nearest first. */
function blockingOf(all: readonly Hit[]): Hit[] {
  const openings = all.filter((h) => h.kind === 'door' || h.kind === 'window');
  return all.filter((h) => h.kind === 'barrier' || (h.kind === 'wall' && !openings.some((o) => o.t.sub(h.t).abs().lte(TOL)))).sort((a, b) => a.t.cmp(b.t));
}

/** Half-width of the beam band between two distances along the path, m (from the zone computation). */
export type BandWidth = (z1: Dec, z2: Dec) => Dec;

/** Offset of a band line just past a surface end, m (ours: far below the millimetre zones are drawn to). */
const PAST_END_M = new Dec('1e-5');
/** Two surfaces whose ends are this close are joined (a corner); ours, as in core/plan/visibility.ts. */
const JOINED_M = new Dec('1e-6');

interface Passing {
  /** Where the line is stopped after passing, or null when it runs on to the leg's length. */
  readonly stop: Hit | null;
  readonly origin: P;
  readonly through: Grazed['through'];
}

/**
 * The lines of the band (half-width T about the line from `pos` along `u`) that pass the surface the
 * drawn line meets at `c`: lines at both edges of the band and just either side of every surface end
 * inside it (between those, which surface a line meets first does not change).
 */
function passingLines(surfaces: readonly Surface[], pos: P, u: P, len: Dec, c: Hit, T: Dec): Passing[] {
  const n = normal(u);
  const offsets: Dec[] = [T.neg(), T];
  for (const s of surfaces) {
    for (const e of [s.a, s.b]) {
      const off = dot(sub(e, pos), n);
      // An end on the band's edge counts as inside it: the line just past it still passes (the safe side).
      if (off.abs().lte(T)) for (const k of [off.sub(PAST_END_M), off.add(PAST_END_M)]) if (k.abs().lte(T.add(PAST_END_M))) offsets.push(k);
    }
  }
  const S = c.surface;
  const sDir = sub(S.b, S.a);
  const out: Passing[] = [];
  for (const off of offsets) {
    if (off.isZero()) continue;
    // The line starts beside the leg's start only where nothing lies between them.
    const side = off.gt(0) ? n : scale(n, new Dec(-1));
    if (blockingOf(hits(surfaces, pos, side, off.abs())).length > 0) continue;
    const o = add(pos, scale(n, off));
    const all = hits(surfaces, o, u, len);
    const blocking = blockingOf(all);
    if (blocking.some((h) => h.surface === S)) continue; // this line meets the surface too (not at a door or window in it)
    // Where the line crosses the surface's own line (beyond its end); a line already beyond it counts from where the drawn line meets it.
    const den = cross(u, sDir);
    const tx = den.isZero() ? null : cross(sub(S.a, o), sDir).div(den);
    const ref = tx !== null && tx.gt(0) ? tx : c.t;
    const stop = blocking[0] ?? null;
    if (stop !== null && stop.t.lte(ref.add(START_TOLERANCE_M))) continue; // stopped before it gets past
    const door = all.find((h) => (h.kind === 'door' || h.kind === 'window') && h.t.sub(ref).abs().lte(TOL));
    out.push({ stop, origin: o, through: door ? { kind: door.kind as 'door' | 'window', id: door.id } : null });
  }
  return out;
}

/** Is the end of `s` nearest to `q` joined to another wall or barrier (a corner) rather than free? */
function cornerNear(surfaces: readonly Surface[], s: Surface, q: P): boolean {
  const e = distance(q, s.a).lte(distance(q, s.b)) ? s.a : s.b;
  return surfaces.some((o) => o !== s && (o.kind === 'wall' || o.kind === 'barrier') && distanceSqToSegment(e, o.a, o.b).lte(JOINED_M.mul(JOINED_M)));
}

/**
 * The legs of one path; `farLength_m` is how far an open path is followed, `band` the half-width of
 * the beam band (without it, the 50 mm drawing tolerance).
 */
export function tracePath(plan: RoomPlan, path: PlanBeamPath, farLength_m: Dec, band: BandWidth = () => TOL, passes: PassesAperture = () => false): Leg[] {
  const surfaces = surfacesOf(plan);
  const legs: Leg[] = [];
  let pos = toP(path.exit);
  let along = new Dec(0);
  const steps: Array<{ kind: LegEnd; at: P | null; label: string; aperture: Dec | null; dir?: P }> = path.elements.map((e, i) => ({ kind: e.kind, at: toP(e.at), label: e.label ?? `${e.kind} ${i + 1}`, aperture: e.aperture_m === undefined ? null : new Dec(e.aperture_m) }));
  if (path.onward_deg !== undefined) steps.push({ kind: 'open', at: null, label: 'open', aperture: null });
  for (let i = 0; i < steps.length; i++) {
    const step = steps[i] as (typeof steps)[number];
    const u = step.dir ?? (step.at ? unit(pos, step.at) : unitFromDegrees(path.onward_deg ?? 0));
    const len = step.at ? distance(pos, step.at) : farLength_m;
    const all = hits(surfaces, pos, u, len);
    const openings = all.filter((h) => h.kind === 'door' || h.kind === 'window');
    const grazed: Grazed[] = [];
    let stop: Hit | undefined;
    let passing: Passing[] = [];
    for (const c of blockingOf(all)) {
      const T = band(along, along.add(c.t));
      const lines = passingLines(surfaces, pos, u, len, c, T);
      if (lines.length === 0) {
        stop = c;
        break;
      }
      const point = add(pos, scale(u, c.t));
      grazed.push({ kind: c.kind as 'wall' | 'barrier', id: c.id, at: along.add(c.t), point, band: T, through: lines.find((l) => l.through)?.through ?? null, corner: cornerNear(surfaces, c.surface, point) });
      passing = lines;
    }
    // The drawn line passes every surface it met, but every passing part of the band is stopped
    // before the leg's end: the leg ends where the last of them is stopped.
    let endSpot: P | null = null;
    if (!stop && grazed.length > 0 && passing.every((l) => l.stop !== null)) {
      const last = passing.reduce((m, l) => ((l.stop as Hit).t.gt((m.stop as Hit).t) ? l : m));
      stop = last.stop as Hit;
      endSpot = add(last.origin, scale(u, stop.t));
    }
    const legLen = stop ? stop.t : len;
    const to = stop ? add(pos, scale(u, stop.t)) : (step.at ?? add(pos, scale(u, len)));
    // A dump or target narrower than the beam: the part that spills past goes on the same way.
    const passed = !stop && step.aperture !== null && passes(along.add(legLen), step.aperture) ? step.aperture : null;
    if (passed) steps.push({ kind: 'open', at: null, label: 'open', aperture: null, dir: u });
    legs.push({
      from: pos,
      to,
      start: along,
      end: along.add(legLen),
      endsWith: stop ? (stop.kind as 'wall' | 'barrier') : step.kind,
      endId: stop ? stop.id : step.label,
      openings: openings.filter((o) => o.t.lte(legLen)).map((o) => ({ kind: o.kind as 'door' | 'window', id: o.id, at: along.add(o.t) })),
      grazed,
      endSpot,
      passedAperture: passed,
    });
    if (stop || (step.kind !== 'mirror' && !passed)) break;
    along = along.add(legLen);
    pos = to;
  }
  return legs;
}
