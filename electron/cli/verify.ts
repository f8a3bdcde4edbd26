/**
 * Headless check for auditors: every signed revision of one assessment, or of all, verified against
 * the trust anchor configured on this desk (outside the database) through the register's endorsements,
 * recomputed with this core, and checked for
 * a whole revision chain and intact database protections.
 *
 *   npm run verify -- --db <file> [--assessment <id> | --all] [--json] [--key-dir <folder>] [--anchor <fingerprint>] [--workers <n>]
 *
 * --anchor: judge the signatures by this trust anchor (64 hex digits as on paper) instead of the
 * desk's setting, e.g. an auditor checking an institution register from their own machine.
 *
 * One line per assessment ("ok", "draft" or "FAILED" with the finding); exit status 1 if any fails,
 * 2 on a usage or open error. A progress bar goes to stderr on a terminal. --all runs on worker
 * threads (one per core, at most 8): recomputing is the costly part. The database is opened read-only.
 */
import type { RowCheckRecord } from '../backend/records/limit-row-checks.js';
import type { VerifyRun } from '../backend/records/assessments.js';
import { availableParallelism } from 'node:os';
import { dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { z } from 'zod';
import { defaultDatabasePath, describeAddress, isServerAddress, openRecordStore } from '../backend/records/index.js';
import { readTypedFingerprint } from '../backend/records/trust-anchor-setting.js';
import { verifyOneAssessment, type AssessmentVerdict } from './verify-assessment.js';
import { parseCommandArgs } from './command-args.js';

const USAGE = 'Usage: npm run verify -- --db <file> [--assessment <id> | --all] [--json] [--key-dir <folder>] [--anchor <fingerprint>] [--workers <n>]';

const ArgsSchema = z
  .strictObject({
    db: z.string({ error: '--db <file> is required' }).min(1, '--db <file> is required'),
    assessment: z.string().min(1).optional(),
    all: z.boolean().optional(),
    json: z.boolean().optional(),
    'key-dir': z.string().min(1).optional(),
    // The trust anchor's 64 hex digits as on paper (groups allowed), instead of the desk's setting.
    anchor: z
      .string()
      .optional()
      .transform((text, c) => {
        if (text === undefined) return undefined;
        const r = readTypedFingerprint(text);
        if (r.ok) return r.anchor;
        c.addIssue({ code: 'custom', message: `--anchor ${r.problem}` });
        return z.NEVER;
      }),
    workers: z.coerce.number().int().min(1).max(64).optional(),
  })
  .refine((a) => !(a.all === true && a.assessment !== undefined), { message: 'give either --assessment <id> or --all, not both', path: ['all'] });
export type VerifyArgs = z.infer<typeof ArgsSchema>;

export function parseVerifyArgs(argv: readonly string[]): VerifyArgs {
  return parseCommandArgs(ArgsSchema, argv, USAGE, ['all', 'json']);
}

function progress(done: number, total: number): void {
  if (!process.stderr.isTTY || total < 2) return;
  const width = 30;
  const filled = Math.round((done / total) * width);
  process.stderr.write(`\r[${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total} assessments`);
  if (done === total) process.stderr.write('\n');
}

async function inWorkers(db: string, keyDir: string, anchor: string | undefined, items: Array<{ id: string; title: string }>, workers: number, keepReports: boolean): Promise<AssessmentVerdict[]> {
  const here = dirname(fileURLToPath(import.meta.url));
  const boot = pathToFileURL(resolve(here, 'ts-worker.mjs'));
  const module = pathToFileURL(resolve(here, 'verify-worker.ts')).href;
  const byId = new Map<string, AssessmentVerdict>();
  // Interleaved shares: neighbouring assessments (often similar rooms) spread over the workers.
  const shares = Array.from({ length: workers }, (_, w) => items.filter((_x, i) => i % workers === w));
  await Promise.all(
    shares.map(
      (share) =>
        new Promise<void>((done, fail) => {
          if (share.length === 0) return done();
          const worker = new Worker(boot, { workerData: { module, db, keyDir, ...(anchor !== undefined ? { anchor } : {}), items: share, keepReports } });
          worker.on('message', (v: AssessmentVerdict) => {
            byId.set(v.assessmentId, v);
            progress(byId.size, items.length);
          });
          worker.on('error', fail);
          worker.on('exit', (code) => (code === 0 ? done() : fail(new Error(`a verification worker stopped with code ${code}`))));
        }),
    ),
  );
  return items.map((x) => byId.get(x.id) ?? { assessmentId: x.id, title: x.title, outcome: 'failed', line: `FAILED  ${x.id}  ${x.title}: not checked`, reports: [] });
}

export async function runVerify(argv: readonly string[], out: (line: string) => void = (l) => process.stdout.write(`${l}\n`)): Promise<number> {
  let args: VerifyArgs;
  try {
    args = parseVerifyArgs(argv);
  } catch (e) {
    process.stderr.write(`${(e as Error).message}\n`);
    return 2;
  }
  // A postgres:// address is the institution register (never taken for a file); the trust anchor is
  // this desk's setting, in the user-data folder unless --key-dir names another.
  const server = isServerAddress(args.db);
  const db = server ? args.db : resolve(args.db);
  const keyDir = resolve(args['key-dir'] ?? dirname(server ? defaultDatabasePath() : db));
  const shown = server ? describeAddress(db) : db;
  let store;
  try {
    store = await openRecordStore({ path: db, keyDir, readonly: true, ...(args.anchor !== undefined ? { trustAnchor: args.anchor } : {}) });
  } catch (e) {
    process.stderr.write(`Cannot open ${shown}: ${(e as Error).message}\n`);
    return 2;
  }
  let verdicts: AssessmentVerdict[];
  let header: string[];
  let checks: RowCheckRecord[] = [];
  try {
    // The register's signed checks of the limit tables (issue 12): each signature and key checked here.
    checks = await store.listRowChecks();
    const trust = await store.trustList();
    header = [
      `Database ${shown}`,
      `Trust anchor of this desk (${trust.path}): ${trust.anchorFingerprint ?? 'none'}${trust.problems.length ? ` — ${trust.problems.join(' ')}` : ''}`,
      ...store.info.warnings.map((w) => `Warning: ${w}`),
    ];
    const all = await store.listAllAssessments();
    const items = (args.assessment !== undefined ? all.filter((a) => a.id === args.assessment) : all).map((a) => ({ id: a.id, title: a.title }));
    if (args.assessment !== undefined && items.length === 0) {
      process.stderr.write(`No assessment with id ${args.assessment} in ${shown}\n`);
      return 2;
    }
    const workers = Math.min(args.workers ?? Math.min(availableParallelism(), 8), items.length);
    // Small jobs are quicker in one thread than with workers starting up, unless asked for.
    if (workers > 1 && (items.length >= 20 || args.workers !== undefined)) {
      await store.close();
      verdicts = await inWorkers(db, keyDir, args.anchor, items, workers, args.json === true);
    } else {
      verdicts = [];
      const run: VerifyRun = {};
      for (const x of items) {
        verdicts.push(await verifyOneAssessment(store, x.id, x.title, run));
        progress(verdicts.length, items.length);
      }
    }
  } finally {
    await store.close(); // a no-op when already closed for the workers
  }
  const failed = verdicts.filter((v) => v.outcome === 'failed').length;
  // A check whose signature fails or whose key is not trusted here is never used, and is a failure.
  const badChecks = checks.filter((c) => !c.signatureValid || !c.keyTrusted);
  const limitTableChecks = checks.map((c) => ({ id: c.id, ruleSet: c.ruleSet, entry: c.entryWords, verdict: c.verdict, checkedBy: c.name, signedAt: c.signedAt, used: c.ok, signatureValid: c.signatureValid, keyTrusted: c.keyTrusted, finding: c.finding }));
  if (args.json) {
    out(JSON.stringify({ database: shown, header, failed: failed + badChecks.length, assessments: verdicts, limitTableChecks }, null, 2));
  } else {
    for (const h of header) out(h);
    for (const v of verdicts) out(v.line);
    out(`${verdicts.length} assessment(s): ${verdicts.filter((v) => v.outcome === 'ok').length} ok, ${verdicts.filter((v) => v.outcome === 'draft').length} not signed yet, ${failed} failed.`);
    for (const c of checks) out(`${c.ok ? 'ok    ' : badChecks.includes(c) ? 'FAILED' : 'unused'}  ${c.finding}`);
    if (checks.length > 0) out(`${checks.length} limit-table check(s): ${checks.filter((c) => c.ok).length} in use, ${badChecks.length} failed.`);
  }
  return failed + badChecks.length > 0 ? 1 : 0;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  process.exitCode = await runVerify(process.argv.slice(2));
}
