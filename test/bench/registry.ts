/**
 * The benchmark registry: `npm run bench` (test/bench/run.ts) runs every suite and prints the
 * median time of each entry; `npm run bench -- --json` adds one JSON object name -> median ms on
 * the last line, so figures can be compared across versions. Speed targets live here, never in
 * timed tests (DEVELOPERS.md).
 *
 * HOW TO ADD YOUR FIGURES (other parts of the project):
 *  1. Create test/bench/<topic>.bench.ts (any name ending in .bench.ts).
 *  2. Either export a function named run<Something>Bench(): BenchEntry[] | Promise<BenchEntry[]>
 *     (run.ts finds every *.bench.ts in this folder and calls each such export), or call
 *     registerBench({ name, run }) at module top level.
 *  3. Give each entry a unique, self-explaining name (it is the JSON key) and, where there is
 *     one, target_ms: run.ts marks "met" / "NOT met".
 * Use median() / timeMedian() below so every suite measures the same way. Keep setup out of the
 * timed function. `npm run bench -- --only=<text>` runs only the suites whose name contains it.
 */

export interface BenchEntry {
  /** Unique, self-explaining name; the key in the --json object. */
  readonly name: string;
  readonly median_ms: number;
  /** How many timed runs the median is taken over. */
  readonly runs: number;
  readonly target_ms?: number;
}

export interface BenchSuite {
  readonly name: string;
  run(): BenchEntry[] | Promise<BenchEntry[]>;
}

const suites: BenchSuite[] = [];

export function registerBench(suite: BenchSuite): void {
  if (!suites.some((s) => s.name === suite.name)) suites.push(suite);
}

export function registeredBenches(): readonly BenchSuite[] {
  return suites;
}

export function median(xs: readonly number[]): number {
  if (xs.length === 0) return Number.NaN;
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

/** Median wall time (ms) of f over `runs` calls; `prepare` runs before each call, untimed. */
export function timeMedian(runs: number, f: (i: number) => unknown, prepare?: (i: number) => void): number {
  const xs: number[] = [];
  for (let i = 0; i < runs; i++) {
    prepare?.(i);
    const t0 = performance.now();
    f(i);
    xs.push(performance.now() - t0);
  }
  return median(xs);
}

/**
 * Median processor time (user + system) of this process per run, ms: what the work itself costs,
 * without the time spent waiting for a processor on a loaded machine (wall time then grows with the
 * load, processor time hardly). Synchronous work only.
 */
export function cpuMedian(runs: number, f: (i: number) => unknown): number {
  const xs: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.cpuUsage();
    f(i);
    const d = process.cpuUsage(t0);
    xs.push((d.user + d.system) / 1000);
  }
  return median(xs);
}

/** timeMedian for an asynchronous operation (the record store): each run is awaited before the next. */
export async function timeMedianAsync(runs: number, f: (i: number) => Promise<unknown>, prepare?: (i: number) => void | Promise<void>): Promise<number> {
  const xs: number[] = [];
  for (let i = 0; i < runs; i++) {
    await prepare?.(i);
    const t0 = performance.now();
    await f(i);
    xs.push(performance.now() - t0);
  }
  return median(xs);
}

/** A small deterministic generator (LCG), so every run times the same "random" queries. */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}
