/**
 * `npm run test:mutation:score`: the mutation score of every engine file from scores.json and the
 * engine total, (killed + timed out) / valid, and the same with the mutants on lines EQUIVALENT.md
 * lists counted out. A file whose source changed since its measurement is STALE, one never measured
 * MISSING. Exits 1 if the total is below the target (Stryker's score, not the one with listed
 * mutants counted out) or any file is stale or missing.
 */
import { engineFiles, loadGroups } from './engine-files.js';
import { TARGET_PERCENT, loadScores, summarise, workingTreeSource } from './scores.js';

const summary = summarise(loadScores(), await engineFiles(), loadGroups(), workingTreeSource);
const pct = (x: number | null): string => (x === null ? '-' : `${x.toFixed(1)} %`);
const header = ['File', 'Group', 'Valid', 'Killed', 'Timeout', 'Survived', 'No cov.', 'Listed eq.', 'Score', 'Without listed', 'Measured', 'State'];
const lines: string[][] = summary.rows.map(({ file, group, state, entry: e }) =>
  e
    ? [file, group, `${e.valid}`, `${e.killed}`, `${e.timeout}`, `${e.survived}`, `${e.noCoverage}`, `${e.listedEquivalent}`, pct(e.score),
       pct(e.valid - e.listedEquivalent === 0 ? null : Math.floor(((e.killed + e.timeout) * 1000) / (e.valid - e.listedEquivalent)) / 10), e.measured, state]
    : [file, group, '', '', '', '', '', '', '', '', '', state],
);
const widths = header.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i]!.length)));
const row = (cells: readonly string[]): string => cells.map((c, i) => (i < 2 || i >= 10 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
console.log(row(header));
for (const l of lines) console.log(row(l));
console.log('');
console.log(`Engine total: ${pct(summary.score)} (${summary.detected} of ${summary.valid} valid mutants killed or timed out); ` +
  `${pct(summary.scoreWithoutListed)} with the ${summary.listedEquivalent} on listed-equivalent lines counted out.`);
console.log(`${summary.rows.length - summary.missing} of ${summary.rows.length} engine files measured; ${summary.stale} STALE, ${summary.missing} MISSING. Target ${TARGET_PERCENT} %.`);
const belowTarget = summary.fraction === null || summary.fraction * 100 < TARGET_PERCENT;
if (belowTarget) console.log(`FAIL: the engine total is below ${TARGET_PERCENT} %.`);
if (summary.stale + summary.missing > 0) console.log('FAIL: re-run the groups of the STALE and MISSING files (npm run test:mutation -- <group>...).');
process.exit(belowTarget || summary.stale + summary.missing > 0 ? 1 : 0);
