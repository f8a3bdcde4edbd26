/** Shared view helpers of the plan drawing: the visible extent, scale-bar length and colours. */
import type { PlanResult, RoomPlan } from '../../../core/index.js';

export interface Extent {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** The room with a margin (the zones are clipped to it: a zone running out of the room is said in the findings). */
export function extentOf(plan: RoomPlan): Extent {
  const pts = [...plan.outline, ...(plan.controlledArea?.outline ?? [])];
  const xs = pts.map((p) => p.x_m);
  const ys = pts.map((p) => p.y_m);
  const w = Math.max(...xs) - Math.min(...xs);
  const h = Math.max(...ys) - Math.min(...ys);
  const m = Math.max(0.6, 0.08 * Math.max(w, h));
  return { minX: Math.min(...xs) - m, minY: Math.min(...ys) - m * 1.8, maxX: Math.max(...xs) + m, maxY: Math.max(...ys) + m };
}

/** A round scale-bar length: about a fifth of the width, 0.5, 1, 2 or 5 × 10^n m. */
export function scaleBarLength(width_m: number): number {
  const target = width_m / 5;
  const pow = 10 ** Math.floor(Math.log10(target));
  for (const k of [5, 2, 1, 0.5]) if (k * pow <= target) return k * pow;
  return pow / 2;
}

export const PLAN_COLOURS = {
  direct: '#d0342c',
  diffuse: '#e8900c',
  enclosed: '#8a939e',
  path: '#a1140c',
  wall: '#2b3440',
  door: '#7a4a16',
  window: '#3d8fd1',
  barrier: '#5b2a86',
  enclosure: '#56606b',
  work: '#1c7a4a',
  controlled: '#1f6fb2',
} as const;

export function zonesByKind(result: PlanResult | undefined): { direct: PlanResult['zones']; diffuse: PlanResult['zones']; enclosed: PlanResult['zones'] } {
  const zs = result?.zones ?? [];
  return { direct: zs.filter((z) => !z.enclosed && z.kind === 'direct'), diffuse: zs.filter((z) => !z.enclosed && z.kind === 'diffuse'), enclosed: zs.filter((z) => z.enclosed) };
}
