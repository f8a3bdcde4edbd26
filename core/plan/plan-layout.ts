/**
 * Layout helpers shared by the drawings of the room plan (the editor on screen and the plan in the
 * printed documents), in ordinary numbers: they place labels and arrows, never a zone. Zones and
 * findings come from evaluatePlan only.
 */
import { Dec } from '../numeric/decimal.js';
import type { PlanBeamPath, PlanBeamRun, PlanPoint, RoomPlan } from './plan-model.js';
import { tracePath } from './trace-path.js';

export interface Middle {
  readonly x: number;
  readonly y: number;
}

/** The middle of the outline's bounding box: labels are put on the side toward it, so they stay in view. */
export function planMiddle(outline: readonly PlanPoint[]): Middle {
  const xs = outline.map((q) => q.x_m);
  const ys = outline.map((q) => q.y_m);
  return { x: (Math.min(...xs) + Math.max(...xs)) / 2, y: (Math.min(...ys) + Math.max(...ys)) / 2 };
}

/**
 * Where the label of a door, window or wall piece a–b goes: beside its middle, on the side toward
 * the middle of the room. `vertical`: the piece runs more north–south than east–west, so the label
 * goes east or west of it (`toward` +1 east, −1 west); otherwise north or south (`toward` +1 north).
 */
export function labelSide(a: PlanPoint, b: PlanPoint, middle: Middle): { at: PlanPoint; vertical: boolean; toward: 1 | -1 } {
  const at = { x_m: (a.x_m + b.x_m) / 2, y_m: (a.y_m + b.y_m) / 2 };
  const vertical = Math.abs(a.x_m - b.x_m) < Math.abs(a.y_m - b.y_m);
  const toward = vertical ? (at.x_m > middle.x ? -1 : 1) : at.y_m > middle.y ? -1 : 1;
  return { at, vertical, toward };
}

/** The drawn points of a beam path: the exit, then each mirror, dump or target. */
export function pathPoints(path: PlanBeamPath): PlanPoint[] {
  return [path.exit, ...path.elements.map((e) => e.at)];
}

/** The far end of the arrow of an open path, `length` metres from its last point; null when the path ends. */
export function onwardEnd(path: PlanBeamPath, length: number): { from: PlanPoint; to: PlanPoint } | null {
  if (path.onward_deg === undefined) return null;
  const from = path.elements.length ? (path.elements[path.elements.length - 1]?.at ?? path.exit) : path.exit;
  const r = (path.onward_deg * Math.PI) / 180;
  return { from, to: { x_m: from.x_m + length * Math.cos(r), y_m: from.y_m + length * Math.sin(r) } };
}

/**
 * The arrow of an open path as drawn: up to the first wall, curtain or barrier the beam meets (it
 * passes open doors and windows, as the zones take it; core/plan/trace-path.ts), else `length`
 * metres long. An arrow through a wall would tell the reader the beam reaches the next room.
 */
export function onwardStop(plan: RoomPlan, path: PlanBeamPath, length: number): { from: PlanPoint; to: PlanPoint } | null {
  const arrow = onwardEnd(path, length);
  if (!arrow) return null;
  try {
    const legs = tracePath(plan, path, new Dec(length));
    const last = legs[legs.length - 1];
    // Only when the trace reached the open leg (a wall before the last mirror ends the path earlier).
    if (last && legs.length === path.elements.length + 1 && (last.endsWith === 'wall' || last.endsWith === 'barrier')) {
      return { from: arrow.from, to: { x_m: last.to.x.toNumber(), y_m: last.to.y.toNumber() } };
    }
  } catch {
    // A plan being edited can be momentarily degenerate (two points on one spot): draw the plain arrow.
  }
  return arrow;
}

/**
 * Past a beam dump or target the beam is wider than: the line of the part that passes, from the
 * element to where the farthest run of the laser's beams ends (the core's runs, evaluatePlan), drawn
 * dashed like an open beam. Null when nothing passes.
 */
export function spillLine(path: PlanBeamPath, runs: readonly PlanBeamRun[] | undefined): { from: PlanPoint; to: PlanPoint } | null {
  const last = path.elements[path.elements.length - 1];
  if (!last || last.kind === 'mirror' || last.aperture_m === undefined || !runs) return null;
  const drawn = path.elements.length + 1;
  let to: PlanPoint | null = null;
  let far = 0;
  for (const r of runs) {
    const q = r.points[r.points.length - 1];
    if (r.laserId !== path.laserId || r.points.length <= drawn || !q) continue;
    const p = { x_m: Number(q.x_m), y_m: Number(q.y_m) };
    const d = Math.hypot(p.x_m - last.at.x_m, p.y_m - last.at.y_m);
    if (d > far) {
      far = d;
      to = p;
    }
  }
  return to ? { from: last.at, to } : null;
}
