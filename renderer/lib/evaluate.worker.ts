/**
 * Evaluates the workspace draft off the UI thread: a room with many beams takes longer than a
 * frame in decimal arithmetic, and typing must never wait for it.
 */
import type { RoomInput } from '../../core/index.js';
import { evaluateDraftInput } from './evaluate.js';

interface Request {
  readonly seq: number;
  readonly input: RoomInput;
}

self.onmessage = (e: MessageEvent<Request>) => {
  const { seq, input } = e.data;
  self.postMessage({ seq, evaluation: evaluateDraftInput(input) });
};
