/**
 * Live evaluation in the renderer with the same core the records use. Incomplete input never
 * blanks the room: an empty room has nothing to evaluate (the panel shows how to start), and a
 * beam or eyewear the core refuses (InputError naming its path) is left out with the reason in the
 * officer's words, while every other beam keeps its results.
 */
import { InputError, evaluateRoom, officerWords, whereInRoom, type RoomInput } from '../../core/index.js';
import type { RoomResult } from '../../core/model/results.js';

/** Something left out of the evaluation, and why, in officer words. */
export interface LeftOut {
  readonly name: string;
  readonly problem: string;
}

export type Evaluation =
  | { readonly ok: true; readonly result: RoomResult; readonly leftOut: readonly LeftOut[]; readonly ms: number }
  | { readonly ok: true; readonly result: null; readonly leftOut: readonly LeftOut[]; readonly ms: number }
  | { readonly ok: false; readonly message: string; readonly field: string | null; readonly ms: number };

type MutableRoom = { -readonly [K in keyof RoomInput]: RoomInput[K] } & { lasers: Array<RoomInput['lasers'][number]>; eyewear?: Array<NonNullable<RoomInput['eyewear']>[number]> };

export function evaluateDraftInput(input: RoomInput): Evaluation {
  const t0 = performance.now();
  // Copied only when something has to be left out (the usual keystroke evaluates the input as is).
  let room = input as MutableRoom;
  let copied = false;
  const leftOut: LeftOut[] = [];
  // Each refusal removes one beam, laser or eyewear, so this ends.
  const attempts = room.lasers.reduce((n, l) => n + l.beams.length + 1, 0) + (room.eyewear?.length ?? 0) + 1;
  for (let i = 0; i < attempts; i++) {
    if (room.lasers.length === 0) return { ok: true, result: null, leftOut, ms: performance.now() - t0 };
    try {
      const result = evaluateRoom(room);
      return { ok: true, result, leftOut, ms: performance.now() - t0 };
    } catch (e) {
      const ms = performance.now() - t0;
      if (!(e instanceof InputError)) return { ok: false, message: e instanceof Error ? e.message : String(e), field: null, ms };
      if (!copied) {
        room = JSON.parse(JSON.stringify(room)) as MutableRoom;
        copied = true;
      }
      const at = whereInRoom(e.field);
      const laser = at.laser !== undefined ? room.lasers[at.laser] : undefined;
      if (laser && at.beam !== undefined && laser.beams[at.beam]) {
        const beam = laser.beams[at.beam];
        leftOut.push({ name: `${laser.name || 'Unnamed laser'} / ${beam?.label || `beam ${at.beam + 1}`}`, problem: officerWords(e) });
        const beams = laser.beams.filter((_, j) => j !== at.beam);
        if (beams.length === 0) room.lasers.splice(at.laser ?? 0, 1);
        else room.lasers[at.laser ?? 0] = { ...laser, beams };
      } else if (laser) {
        leftOut.push({ name: laser.name || 'Unnamed laser', problem: officerWords(e) });
        room.lasers.splice(at.laser ?? 0, 1);
      } else if (at.eyewear !== undefined && room.eyewear?.[at.eyewear]) {
        const ew = room.eyewear[at.eyewear];
        leftOut.push({ name: `Eyewear ${ew?.id ?? at.eyewear + 1}`, problem: `not considered: ${officerWords(e)}` });
        room.eyewear.splice(at.eyewear, 1);
      } else {
        return { ok: false, message: officerWords(e), field: e.field, ms };
      }
    }
  }
  return { ok: false, message: 'These inputs could not be evaluated.', field: null, ms: performance.now() - t0 };
}
