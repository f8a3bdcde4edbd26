/**
 * Follows one laser's drawn beam path through the room: straight legs from the exit to each
 * mirror, ending at a beam dump, a target, the first wall or barrier in the way, or (for an open
 * path) far beyond the plan. Doors and windows do not stop the beam: a door can be opened and
 * glass passes most laser wavelengths (common practice: take openings as open).
 */
import { Dec } from '../numeric/decimal.js';
import { add, distance, edges, pt, rayHitsSegment, scale, unit, unitFromDegrees, type P } from './geometry.js';
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
}

export const toP = (p: PlanPoint): P => pt(p.x_m, p.y_m);

interface Hit {
  readonly t: Dec;
  readonly kind: 'wall' | 'barrier' | 'door' | 'window';
  readonly id: string;
}

function hits(plan: RoomPlan, p: P, u: P, maxT: Dec): Hit[] {
  const out: Hit[] = [];
  const test = (a: P, b: P, kind: Hit['kind'], id: string) => {
    const t = rayHitsSegment(p, u, a, b);
    if (t !== null && t.gt(START_TOLERANCE_M) && t.lte(maxT)) out.push({ t, kind, id });
  };
  for (const [a, b] of edges(plan.outline.map(toP))) test(a, b, 'wall', 'outline');
  for (const w of plan.walls) test(toP(w.a), toP(w.b), 'wall', w.id);
  for (const b of plan.barriers) test(toP(b.a), toP(b.b), 'barrier', b.id);
  for (const d of plan.doors) test(toP(d.a), toP(d.b), 'door', d.id);
  for (const w of plan.windows) test(toP(w.a), toP(w.b), 'window', w.id);
  return out;
}

/** The legs of one path; `farLength_m` is how far an open path is followed. */
export function tracePath(plan: RoomPlan, path: PlanBeamPath, farLength_m: Dec): Leg[] {
  const legs: Leg[] = [];
  let pos = toP(path.exit);
  let along = new Dec(0);
  const steps: Array<{ kind: LegEnd; at: P | null; label: string }> = path.elements.map((e, i) => ({ kind: e.kind, at: toP(e.at), label: e.label ?? `${e.kind} ${i + 1}` }));
  if (path.onward_deg !== undefined) steps.push({ kind: 'open', at: null, label: 'open' });
  for (const step of steps) {
    const u = step.at ? unit(pos, step.at) : unitFromDegrees(path.onward_deg ?? 0);
    const len = step.at ? distance(pos, step.at) : farLength_m;
    const all = hits(plan, pos, u, len);
    const openings = all.filter((h) => h.kind === 'door' || h.kind === 'window');
    const tol = new Dec(OPENING_TOLERANCE_M);
    const blocking = all
      .filter((h) => h.kind === 'barrier' || (h.kind === 'wall' && !openings.some((o) => o.t.sub(h.t).abs().lte(tol))))
      .sort((a, b) => a.t.cmp(b.t));
    const stop = blocking[0];
    const legLen = stop ? stop.t : len;
    const to = stop ? add(pos, scale(u, stop.t)) : (step.at ?? add(pos, scale(u, len)));
    legs.push({
      from: pos,
      to,
      start: along,
      end: along.add(legLen),
      endsWith: stop ? (stop.kind as 'wall' | 'barrier') : step.kind,
      endId: stop ? stop.id : step.label,
      openings: openings.filter((o) => o.t.lte(legLen)).map((o) => ({ kind: o.kind as 'door' | 'window', id: o.id, at: along.add(o.t) })),
    });
    if (stop || step.kind !== 'mirror') break;
    along = along.add(legLen);
    pos = to;
  }
  return legs;
}
