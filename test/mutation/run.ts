/**
 * `npm run test:mutation [-- <group>... [--stryker <stryker options>...]]`: runs the mutation groups
 * of test/mutation/groups.json one after another (all of them, or the ones named), each as its own
 * Stryker run over the group's engine files with only the group's test files, its own incremental
 * file (test/mutation/incremental/<group>.json) and its own JSON report (reports/mutation/<group>.json),
 * and records each report in test/mutation/scores.json as soon as it is written. Then prints the
 * score table (`npm run test:mutation:score`). One group at a time with one worker: the machine is
 * shared. Options after `--stryker` go to Stryker unchanged (e.g. `--coverageAnalysis all`).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, loadGroups } from './engine-files.js';
import { recordReports } from './record-reports.js';

const args = process.argv.slice(2);
const split = args.indexOf('--stryker');
const names = split === -1 ? args : args.slice(0, split);
const strykerArgs = split === -1 ? [] : args.slice(split + 1);
const groups = loadGroups();
const unknown = names.filter((n) => !(n in groups));
if (unknown.length > 0) {
  console.error(`Unknown group ${unknown.join(', ')}. Groups: ${Object.keys(groups).join(', ')}`);
  process.exit(2);
}
const chosen = names.length > 0 ? names : Object.keys(groups);
const reportDir = join(ROOT, 'reports', 'mutation');
mkdirSync(reportDir, { recursive: true });
mkdirSync(join(ROOT, 'test', 'mutation', 'incremental'), { recursive: true });
const stryker = join(ROOT, 'node_modules', '.bin', 'stryker');

let failed = 0;
for (const name of chosen) {
  const group = groups[name]!;
  const report = `reports/mutation/${name}.json`;
  // A configuration per group, importing the shared one: Stryker has no command-line option for the
  // JSON report's file name. Written next to the reports (ignored by git).
  const configPath = join(reportDir, `${name}.config.mjs`);
  writeFileSync(
    configPath,
    `import base from '../../test/mutation/stryker.config.mjs';\n` +
      `export default { ...base, mutate: ${JSON.stringify(group.mutate)}, ` +
      `incrementalFile: 'test/mutation/incremental/${name}.json', ` +
      `reporters: ['clear-text', 'progress', 'json'], jsonReporter: { fileName: '${report}' } };\n`,
  );
  rmSync(join(ROOT, report), { force: true });
  const started = Date.now();
  console.log(`\n== ${name}: ${group.mutate.join(', ')} (${group.tests.length} test files)`);
  const run = spawnSync(stryker, ['run', configPath, ...strykerArgs], {
    cwd: ROOT,
    stdio: 'inherit',
    env: { ...process.env, BEAMWARDEN_MUTATION_TESTS: group.tests.join(',') },
  });
  const minutes = ((Date.now() - started) / 60_000).toFixed(1);
  if (run.status !== 0 || !existsSync(join(ROOT, report))) {
    console.error(`== ${name}: Stryker ended with ${run.status ?? run.signal} after ${minutes} min; nothing recorded`);
    failed++;
    continue;
  }
  console.log(`== ${name}: ${minutes} min; recording ${report}`);
  const outcome = await recordReports([join(ROOT, report)]);
  if (outcome.refused.length > 0) failed++;
}

const score = spawnSync(join(ROOT, 'node_modules', '.bin', 'tsx'), [join(ROOT, 'test', 'mutation', 'score.ts')], { cwd: ROOT, stdio: 'inherit' });
// The score's verdict (target, STALE, MISSING) decides the exit status of a run of every group; a
// run of some groups fails only if one of them could not be run or recorded.
process.exit(failed > 0 ? 1 : names.length > 0 ? 0 : (score.status ?? 1));
