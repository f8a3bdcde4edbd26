/**
 * `npm run test:mutation:record -- <report.json>...`: folds Stryker JSON reports into
 * test/mutation/scores.json, e.g. a report made with `--mutate core/eyewear/od.ts` and the json
 * reporter. Exits 1 if any report was refused (the others are recorded). Without a report it only
 * rewrites the README's score line from scores.json (after a merge changed which files are stale).
 */
import { recordReports } from './record-reports.js';

const paths = process.argv.slice(2);
const outcome = await recordReports(paths);
process.exit(outcome.refused.length > 0 ? 1 : 0);
