// Folds Stryker JSON reports into test/mutation/scores.json (used by record.ts and run.ts). A report
// of part of a file (`--mutate "file:10-20"`) is refused: a score stands for a whole file. The date
// recorded is the report file's modification time (the end of the run).
import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, engineFiles, loadGroups, type MutationGroups } from './engine-files.js';
import { loadListedLines } from './equivalents.js';
import { foldReport, loadScores, parseReport, readmeScoreLine, saveScores, summarise, workingTreeSource, type Scores } from './scores.js';

export interface RecordOutcome {
  recorded: string[];
  refused: string[];
}

/** Folds each report into scores.json; a refused report is named with the reason and changes nothing. */
export async function recordReports(paths: readonly string[], measuredAt?: (path: string) => Date): Promise<RecordOutcome> {
  const files = await engineFiles();
  const groups = loadGroups();
  const listed = loadListedLines();
  const scores: Scores = loadScores();
  const outcome: RecordOutcome = { recorded: [], refused: [] };
  for (const path of paths) {
    try {
      const report = parseReport(JSON.parse(readFileSync(path, 'utf8')), path);
      const when = measuredAt ? measuredAt(path) : statSync(path).mtime;
      const copy: Scores = structuredClone(scores);
      const { recorded, remarks } = foldReport(copy, report, path, {
        engineFiles: files,
        groups,
        listed,
        measured: `${when.toISOString().slice(0, 16)}Z`,
        currentSource: workingTreeSource,
      });
      scores.files = copy.files;
      for (const r of remarks) console.log(`  ${r}`);
      for (const f of recorded) {
        const e = scores.files[f]!;
        console.log(`  ${f}: ${e.score === null ? '-' : `${e.score.toFixed(1)} %`} (${e.killed + e.timeout} of ${e.valid}; ${e.survived} survived, ${e.noCoverage} not covered, ${e.listedEquivalent} of them on listed-equivalent lines)`);
      }
      outcome.recorded.push(...recorded);
    } catch (err) {
      console.error(`Refused: ${err instanceof Error ? err.message : String(err)}`);
      outcome.refused.push(path);
    }
  }
  saveScores(scores);
  writeReadmeScoreLine(scores, files, groups);
  return outcome;
}

const README_LINE = /^Engine mutation score \(test\/mutation\/scores\.json\):.*$|^SCORE_LINE$/m;

/** Puts the engine score of scores.json into the README's quality section (its one score line). */
export function writeReadmeScoreLine(scores: Scores, files: readonly string[], groups: MutationGroups): void {
  const path = join(ROOT, 'README.md');
  const readme = readFileSync(path, 'utf8');
  if (!README_LINE.test(readme)) throw new Error('README.md has no line starting "Engine mutation score (test/mutation/scores.json):" to update');
  writeFileSync(path, readme.replace(README_LINE, readmeScoreLine(summarise(scores, files, groups, workingTreeSource))));
}

