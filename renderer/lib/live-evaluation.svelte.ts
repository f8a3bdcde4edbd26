/**
 * The live results of the draft: each change of the draft's input is sent to a worker running the
 * core; while it computes, further changes are coalesced so only the newest input is evaluated
 * next. Where workers are unavailable (tests), the core runs on this thread.
 */
import type { RoomInput } from '../../core/index.js';
import { evaluateDraftInput, type Evaluation } from './evaluate.js';

interface Reply {
  readonly seq: number;
  readonly evaluation: Evaluation;
}

class LiveEvaluation {
  evaluation = $state<Evaluation | null>(null);
  /** The input the shown evaluation belongs to (JSON), and the newest one requested. */
  shownFor = $state('');
  wantedFor = $state('');
  readonly updating = $derived(this.wantedFor !== this.shownFor);

  private worker: Worker | null = null;
  private failed = false;
  private seq = 0;
  private inFlight: { seq: number; key: string } | null = null;
  private queued: { input: RoomInput; key: string } | null = null;

  private ensureWorker(): Worker | null {
    if (this.worker) return this.worker;
    if (this.failed || typeof Worker === 'undefined') return null;
    try {
      this.worker = new Worker(new URL('./evaluate.worker.ts', import.meta.url), { type: 'module', name: 'beamwarden-evaluation' });
      this.worker.onmessage = (e: MessageEvent<Reply>) => this.receive(e.data);
      this.worker.onerror = (ev) => {
        // A worker that cannot start (unusual shell) falls back to the UI thread for good.
        ev.preventDefault();
        this.worker?.terminate();
        this.worker = null;
        this.failed = true;
        this.inFlight = null;
        this.queued = null;
        const key = this.wantedFor;
        if (key) {
          this.evaluation = evaluateDraftInput(JSON.parse(key) as RoomInput);
          this.shownFor = key;
        }
      };
    } catch {
      this.worker = null;
    }
    return this.worker;
  }

  request(input: RoomInput): void {
    // A plain copy: Svelte state proxies cannot be posted to a worker.
    const json = JSON.stringify(input);
    if (json === this.wantedFor) return;
    this.wantedFor = json;
    const plain = JSON.parse(json) as RoomInput;
    const w = this.ensureWorker();
    if (!w) {
      this.evaluation = evaluateDraftInput(plain);
      this.shownFor = json;
      return;
    }
    if (this.inFlight) {
      this.queued = { input: plain, key: json };
      return;
    }
    this.send(w, plain, json);
  }

  private send(w: Worker, input: RoomInput, key: string): void {
    const seq = ++this.seq;
    this.inFlight = { seq, key };
    w.postMessage({ seq, input });
  }

  private receive(r: Reply): void {
    const done = this.inFlight;
    this.inFlight = null;
    if (done && done.seq === r.seq) {
      this.evaluation = r.evaluation;
      this.shownFor = done.key;
    }
    const next = this.queued;
    this.queued = null;
    if (next && this.worker) this.send(this.worker, next.input, next.key);
  }

  reset(): void {
    this.evaluation = null;
    this.shownFor = '';
    this.wantedFor = '';
  }
}

export const live = new LiveEvaluation();
