/**
 * Live evaluation in the renderer with the same core the records use. Errors from the core
 * (InputError naming the field, value and valid range) are returned, not thrown, so the panel can
 * show them beside the last good results.
 */
import { InputError, evaluateRoom, type RoomInput } from '../../core/index.js';
import type { RoomResult } from '../../core/model/results.js';

export type Evaluation =
  | { readonly ok: true; readonly result: RoomResult; readonly ms: number }
  | { readonly ok: false; readonly message: string; readonly field: string | null; readonly ms: number };

export function evaluateDraftInput(input: RoomInput): Evaluation {
  const t0 = performance.now();
  try {
    const result = evaluateRoom(input);
    return { ok: true, result, ms: performance.now() - t0 };
  } catch (e) {
    const ms = performance.now() - t0;
    if (e instanceof InputError) return { ok: false, message: e.message, field: e.field, ms };
    return { ok: false, message: e instanceof Error ? e.message : String(e), field: null, ms };
  }
}
