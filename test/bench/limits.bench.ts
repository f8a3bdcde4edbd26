/**
 * Benchmarks of the exposure-limit core (issue "Calculation core, part 1"):
 *  - exposureLimit over a sweep of 10 000 random queries (both rule sets, eye and skin, point and
 *    extended sources, conservative mode as by default): median time per query, target < 0.2 ms;
 *  - one multi-wavelength pulsed evaluation: a Q-switched Nd:YAG with its three harmonics
 *    (1064/532/355 nm, 6 ns, 10 Hz, 10 s), the pulse rules for each line and the additive rule over
 *    the three (pulsedExposureLimit x 3 + additiveFractions);
 *  - one pulsedExposureLimit of a mode-locked 80 MHz train (grouping inside T_i).
 * The queries are drawn from a seeded generator: the same on every run. Wavelengths: half
 * log-uniform over 180 nm-1 mm, half uniform over 180-1400 nm (where most factors apply);
 * durations log-uniform over 1e-13 s-3e4 s.
 * Run alone: npx tsx test/bench/limits.bench.ts
 */
import { additiveFractions, exposureLimit, pulsedExposureLimit, type ExposureLimitQuery } from '../../core/index.js';
import { median, registerBench, seededRandom, timeMedian, type BenchEntry } from './registry.js';

export function randomLimitQueries(n: number, seed = 20260601): ExposureLimitQuery[] {
  const rnd = seededRandom(seed);
  const lg = (lo: number, hi: number): number => 10 ** (Math.log10(lo) + rnd() * (Math.log10(hi) - Math.log10(lo)));
  const out: ExposureLimitQuery[] = [];
  for (let i = 0; i < n; i++) {
    const wavelength_nm = rnd() < 0.5 ? lg(180, 1e6) : 180 + rnd() * 1220;
    out.push({
      ruleSet: rnd() < 0.5 ? 'icnirp2013' : 'eu2006',
      tissue: rnd() < 0.75 ? 'eye' : 'skin',
      wavelength_nm,
      duration_s: Math.min(3e4, lg(1e-13, 3e4)),
      sourceAngle_rad: rnd() < 0.5 ? 0 : rnd() * 0.2,
    });
  }
  return out;
}

function harmonics(): void {
  const lines = [
    { nm: 1064, Q: 0.4 },
    { nm: 532, Q: 0.2 },
    { nm: 355, Q: 0.05 },
  ];
  const items = lines.map((l) => {
    const pulsed = pulsedExposureLimit({ tissue: 'eye', wavelength_nm: l.nm, pulseDuration_s: 6e-9, repetitionRate_Hz: 10, exposureDuration_s: 10 });
    // exposure per pulse through a 7 mm aperture at some distance: only the arithmetic matters here
    return { label: `${l.nm} nm`, H_Jm2: String(l.Q * 1e-6), pulsed };
  });
  additiveFractions(items);
}

export function runLimitsBench(): BenchEntry[] {
  const queries = randomLimitQueries(10_000);
  for (const q of queries.slice(0, 500)) exposureLimit(q); // warm-up (JIT, expression caches)
  const per: number[] = [];
  for (const q of queries) {
    const t0 = performance.now();
    exposureLimit(q);
    per.push(performance.now() - t0);
  }
  for (let i = 0; i < 5; i++) harmonics();
  const trainQuery = { tissue: 'eye' as const, wavelength_nm: 800, pulseDuration_s: 1e-13, repetitionRate_Hz: 8e7, exposureDuration_s: 10 };
  return [
    { name: 'exposureLimit, 10 000 random queries (per query)', median_ms: median(per), runs: per.length, target_ms: 0.2 },
    { name: 'multi-wavelength pulsed evaluation (3 harmonics, pulse rules + additive rule)', median_ms: timeMedian(50, harmonics), runs: 50 },
    { name: 'pulsedExposureLimit, 80 MHz mode-locked train (grouping inside T_i)', median_ms: timeMedian(200, () => pulsedExposureLimit(trainQuery)), runs: 200 },
  ];
}

registerBench({ name: 'limits', run: runLimitsBench });

if (process.argv[1] !== undefined && /limits\.bench\.ts$/.test(process.argv[1])) {
  for (const e of runLimitsBench()) console.log(`${e.name}: median ${e.median_ms.toFixed(4)} ms over ${e.runs}`);
}
