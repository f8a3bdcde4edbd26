/**
 * Where the handles of the plan editor are drawn, so that no handle covers another: a door end on
 * the middle of a wall would otherwise hide the + that adds a corner there, and a controlled area
 * accepted as the room puts each of its corners on a room corner.
 * - A point handle is drawn on its point; when an earlier handle is drawn there already, it is drawn
 *   beside it (toward the middle of the room first), and the drawing joins it to its point with a thin line.
 * - The + of a side is drawn at the middle of the side, else slid along the side, else set off it.
 * Plan metres throughout; shapes are compared by the circles around them (a square by its corners' circle).
 */
import type { PlanPoint } from '../../core/index.js';

export interface HandleSpot {
  readonly key: string;
  readonly point: PlanPoint;
}

export interface SideSpot {
  readonly key: string;
  readonly a: PlanPoint;
  readonly b: PlanPoint;
}

export interface Drawn {
  readonly x: number;
  readonly y: number;
}

export interface HandleLayout {
  /** Where each point handle is drawn (its own point unless it had to move). */
  readonly handles: ReadonlyMap<string, Drawn>;
  /** Where each side's + is drawn. */
  readonly marks: ReadonlyMap<string, Drawn>;
}

interface Placed {
  readonly x: number;
  readonly y: number;
  readonly r: number;
}

/**
 * @param r radius of a point handle; @param half half the side of a + square; @param middle the
 * middle of the room (handles that must move go toward it first, into the drawing).
 */
export function layoutHandles(points: readonly HandleSpot[], sides: readonly SideSpot[], r: number, half: number, middle: Drawn): HandleLayout {
  const gap = r * 0.25;
  const placed: Placed[] = [];
  const free = (x: number, y: number, rr: number) => placed.every((q) => Math.hypot(q.x - x, q.y - y) >= q.r + rr + gap - 1e-12);
  const handles = new Map<string, Drawn>();
  for (const h of points) {
    const at = spotNear(h.point.x_m, h.point.y_m, r, middle, free);
    placed.push({ ...at, r });
    handles.set(h.key, at);
  }
  const rm = half * Math.SQRT2;
  const marks = new Map<string, Drawn>();
  for (const s of sides) {
    const at = spotOnSide(s, rm, middle, free);
    placed.push({ ...at, r: rm });
    marks.set(s.key, at);
  }
  return { handles, marks };
}

/** The point itself when free, else the nearest free spot in rings around it (toward the middle first). */
function spotNear(x: number, y: number, rr: number, middle: Drawn, free: (x: number, y: number, rr: number) => boolean): Drawn {
  if (free(x, y, rr)) return { x, y };
  const toward = Math.atan2(middle.y - y, middle.x - x);
  for (let ring = 1; ring <= 6; ring++) {
    const d = ring * rr * 2.3;
    for (const k of [0, 1, -1, 2, -2, 3, -3, 4]) {
      const a = toward + (k * Math.PI) / 4;
      const c = { x: x + d * Math.cos(a), y: y + d * Math.sin(a) };
      if (free(c.x, c.y, rr)) return c;
    }
  }
  return { x, y };
}

/** The middle of the side when free, else a free spot along the side, else one set off it toward the middle. */
function spotOnSide(s: SideSpot, rm: number, middle: Drawn, free: (x: number, y: number, rr: number) => boolean): Drawn {
  const ax = s.a.x_m;
  const ay = s.a.y_m;
  const dx = s.b.x_m - ax;
  const dy = s.b.y_m - ay;
  for (const f of [0.5, 0.4, 0.6, 0.3, 0.7, 0.2, 0.8]) {
    const c = { x: ax + dx * f, y: ay + dy * f };
    if (free(c.x, c.y, rm)) return c;
  }
  return spotNear(ax + dx / 2, ay + dy / 2, rm, middle, free);
}
