/**
 * Undo and redo of room plan edits. Pure: every step keeps a plain copy of the plan before it and
 * what the step did, in the officer's words ("move Room corner 2"). Steps that move the same point
 * one after another (a drag, a run of arrow keys) are one step, so one undo puts the point back.
 */
import type { RoomPlan } from '../../core/index.js';

/** At most this many steps are kept (ours: enough for an editing session, small in memory). */
export const HISTORY_LIMIT = 100;

export interface PlanStep {
  readonly plan: RoomPlan | null;
  readonly what: string;
}

export interface PlanHistory {
  readonly past: readonly PlanStep[];
  readonly future: readonly PlanStep[];
  /** The point key of the last step when it was a move (moves of the same point join). */
  readonly lastMove: string | null;
}

export const emptyHistory = (): PlanHistory => ({ past: [], future: [], lastMove: null });

const plain = (p: RoomPlan | null | undefined): RoomPlan | null => (p ? (JSON.parse(JSON.stringify(p)) as RoomPlan) : null);

/** The history after an edit from `before`; `moveKey` names the point when the edit moved one. */
export function recordEdit(h: PlanHistory, before: RoomPlan | null | undefined, what: string, moveKey: string | null = null): PlanHistory {
  if (moveKey !== null && moveKey === h.lastMove && h.future.length === 0) return h;
  const past = [...h.past, { plan: plain(before), what }].slice(-HISTORY_LIMIT);
  return { past, future: [], lastMove: moveKey };
}

/** Undo the last step: the plan to show and the history after it, or null when there is nothing to undo. */
export function undoEdit(h: PlanHistory, current: RoomPlan | null | undefined): { plan: RoomPlan | null; history: PlanHistory } | null {
  const step = h.past[h.past.length - 1];
  if (!step) return null;
  return { plan: plain(step.plan), history: { past: h.past.slice(0, -1), future: [...h.future, { plan: plain(current), what: step.what }], lastMove: null } };
}

export function redoEdit(h: PlanHistory, current: RoomPlan | null | undefined): { plan: RoomPlan | null; history: PlanHistory } | null {
  const step = h.future[h.future.length - 1];
  if (!step) return null;
  return { plan: plain(step.plan), history: { past: [...h.past, { plan: plain(current), what: step.what }], future: h.future.slice(0, -1), lastMove: null } };
}
