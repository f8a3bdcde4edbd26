/**
 * Benchmarks of the limit table checks (issue 12):
 *  - the sample values of the checks screen for every open entry of set (a) (79 entries, three
 *    points each), which the screen computes a few entries at a time: the whole list, target
 *    < 2000 ms (the values appear within two seconds; the screen itself never waits for them);
 *  - one cold evaluateBeam of a 532 nm pulse train with every open entry of set (a) checked
 *    ('matches'), against the same without checks: checks must not make evaluation slower.
 * Run alone: npx tsx test/bench/limit-checks.bench.ts
 */
import { checkableEntries, clearCoreCaches, entrySamples, evaluateBeam, type BeamInput, type RowCheck } from '../../core/index.js';
import { registerBench, timeMedian, type BenchEntry } from './registry.js';

const BEAM: BeamInput = { wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-10, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } };

export function runLimitChecksBench(): BenchEntry[] {
  const entries = checkableEntries('icnirp2013');
  const all: RowCheck[] = entries.map((e, i) => ({ key: e.key, verdict: 'matches', checkId: `c${i}`, reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-12-02' }));
  for (const e of entries) entrySamples('icnirp2013', e); // warm-up
  const samples = timeMedian(3, () => {
    for (const e of entries) entrySamples('icnirp2013', e);
  });
  const plain = timeMedian(5, () => evaluateBeam(BEAM), () => clearCoreCaches());
  const checked = timeMedian(5, () => evaluateBeam({ ...BEAM, settings: { rowChecks: all } }), () => clearCoreCaches());
  return [
    { name: `checks screen: sample values of all ${entries.length} open entries of ICNIRP 2013`, median_ms: samples, runs: 3, target_ms: 2000 },
    { name: 'evaluateBeam cold, 532 nm pulse train, no checks', median_ms: plain, runs: 5 },
    { name: `evaluateBeam cold, 532 nm pulse train, ${entries.length} entries checked`, median_ms: checked, runs: 5 },
  ];
}

registerBench({ name: 'limit-checks', run: runLimitChecksBench });

if (process.argv[1] !== undefined && /limit-checks\.bench\.ts$/.test(process.argv[1])) {
  for (const e of runLimitChecksBench()) console.log(`${e.name}: median ${e.median_ms.toFixed(1)} ms over ${e.runs}`);
}
