/**
 * `npm run bench`: runs every benchmark suite of test/bench and prints the median time of each
 * entry; with `-- --json` the last line is one JSON object { name: median_ms }. With
 * `-- --only=<text>` only suites whose name contains <text> run. How to add a suite: see
 * ./registry.ts. Suites are found two ways: modules that call registerBench(), and every
 * *.bench.ts in this folder that exports a function named run<Something>Bench().
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { registerBench, registeredBenches, type BenchEntry } from './registry.js';

const args = process.argv.slice(2);
const json = args.includes('--json');
const only = args.find((a) => a.startsWith('--only='))?.slice('--only='.length);

async function discover(): Promise<void> {
  const dir = dirname(fileURLToPath(import.meta.url));
  for (const file of readdirSync(dir).filter((f) => f.endsWith('.bench.ts')).sort()) {
    const mod: Record<string, unknown> = await import(pathToFileURL(join(dir, file)).href);
    for (const [key, value] of Object.entries(mod)) {
      if (/^run\w*Bench$/.test(key) && typeof value === 'function') {
        const suiteName = file.replace(/\.bench\.ts$/, '');
        const already = registeredBenches().some((s) => s.name === suiteName);
        if (!already) registerBench({ name: suiteName, run: value as () => BenchEntry[] | Promise<BenchEntry[]> });
      }
    }
  }
}

function fmt(ms: number): string {
  return ms < 1 ? ms.toFixed(4) : ms.toFixed(2);
}

async function main(): Promise<void> {
  await discover();
  const figures: Record<string, number> = {};
  const lines: string[] = [];
  let missed = 0;
  for (const suite of registeredBenches()) {
    if (only !== undefined && !suite.name.includes(only)) continue;
    const entries = await suite.run();
    for (const e of entries) {
      const key = figures[e.name] === undefined ? e.name : `${suite.name}: ${e.name}`;
      figures[key] = Number(e.median_ms.toPrecision(4));
      let target = '';
      if (e.target_ms !== undefined) {
        const met = e.median_ms < e.target_ms;
        if (!met) missed++;
        target = `  (target < ${e.target_ms} ms: ${met ? 'met' : 'NOT met'})`;
      }
      lines.push(`[${suite.name}] ${key}: median ${fmt(e.median_ms)} ms over ${e.runs} runs${target}`);
    }
  }
  console.log(lines.join('\n'));
  if (missed) console.log(`${missed} target(s) not met on this machine (load and CPU matter; compare figures on the same machine).`);
  if (json) console.log(JSON.stringify(figures));
}

await main();
