// scores.json: the committed mutation score of every engine file, folded from Stryker's JSON reports.
// Each entry keeps the counts, the sha-256 of the source Stryker mutated (the report carries it), the
// date of the run and the group, so `npm run test:mutation:score` can tell a file whose source changed
// since its measurement (STALE) from one never measured (MISSING).
// Score = (killed + timed out) / valid, valid = killed + timed out + survived + not covered (Stryker's
// own definition: mutants the type checker rejects and mutants disabled in the source are not valid).
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { isAbsolute, join, relative } from 'node:path';
import { z } from 'zod';
import { ROOT, MUTATION_DIR, expandPatterns, groupOf, type MutationGroups } from './engine-files.js';
import type { ListedLines } from './equivalents.js';

export const SCORES_PATH = join(MUTATION_DIR, 'scores.json');
/** The issue's target for the engine total (issue 13). */
export const TARGET_PERCENT = 90;

const statusSchema = z.enum(['Killed', 'Survived', 'NoCoverage', 'Timeout', 'CompileError', 'RuntimeError', 'Ignored', 'Pending']);
const mutantSchema = z.object({
  id: z.string(),
  mutatorName: z.string(),
  status: statusSchema,
  location: z.object({ start: z.object({ line: z.number().int(), column: z.number().int() }) }),
});
export const strykerReportSchema = z.object({
  files: z.record(z.string(), z.object({ source: z.string(), mutants: z.array(mutantSchema) })),
  testFiles: z.record(z.string(), z.unknown()).optional(),
  config: z.object({ mutate: z.array(z.string()) }).optional(),
});
export type StrykerReport = z.infer<typeof strykerReportSchema>;

const entrySchema = z.object({
  group: z.string(),
  measured: z.string(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  valid: z.number().int().nonnegative(),
  killed: z.number().int().nonnegative(),
  timeout: z.number().int().nonnegative(),
  survived: z.number().int().nonnegative(),
  noCoverage: z.number().int().nonnegative(),
  ignored: z.number().int().nonnegative(),
  listedEquivalent: z.number().int().nonnegative(),
  score: z.number().nullable(),
  tests: z.array(z.string()),
});
export type ScoreEntry = z.infer<typeof entrySchema>;
const scoresSchema = z.object({ about: z.string(), files: z.record(z.string(), entrySchema) });
export type Scores = z.infer<typeof scoresSchema>;

const ABOUT =
  'Mutation score per engine file of core/, written by `npm run test:mutation` and `npm run test:mutation:record`; ' +
  'read by `npm run test:mutation:score`. score = (killed + timeout) / valid in per cent, rounded down to 0.1; ' +
  'listedEquivalent = surviving mutants on lines test/mutation/EQUIVALENT.md lists as equivalent.';

export function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** Per cent rounded down to 0.1, so that a score just below the target is never shown as reaching it. */
export function percentDown(num: number, den: number): number | null {
  if (den === 0) return null;
  return Math.floor((num * 1000) / den) / 10;
}

export function loadScores(path: string = SCORES_PATH): Scores {
  if (!existsSync(path)) return { about: ABOUT, files: {} };
  const parsed = scoresSchema.safeParse(JSON.parse(readFileSync(path, 'utf8')));
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new Error(`scores.json: ${issue.path.join('.')}: ${issue.message}`);
  }
  return parsed.data;
}

export function saveScores(scores: Scores, path: string = SCORES_PATH): void {
  const files = Object.fromEntries(Object.entries(scores.files).sort(([a], [b]) => a.localeCompare(b)));
  writeFileSync(path, `${JSON.stringify({ about: ABOUT, files }, null, 2)}\n`);
}

export function parseReport(raw: unknown, name: string): StrykerReport {
  const parsed = strykerReportSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new Error(`${name} is not a Stryker JSON report: ${issue.path.join('.')}: ${issue.message}`);
  }
  return parsed.data;
}

const RANGE = /^(.+?):(\d+)(?::(\d+))?-(\d+)(?::(\d+))?$/;

/**
 * The files a report measured in full. A `--mutate "file:10-20"` run measured part of a file only,
 * and its score would stand for the whole file: refused unless the range covers every line.
 */
export function wholeFilesOf(report: StrykerReport, name: string, currentSource: (file: string) => string | undefined): string[] {
  if (!report.config) throw new Error(`${name}: the report does not say what it mutated (no config.mutate); run Stryker 9 with the json reporter`);
  const plain: string[] = [];
  for (const pattern of report.config.mutate) {
    const m = RANGE.exec(pattern);
    if (!m) {
      plain.push(pattern);
      continue;
    }
    const file = m[1]!;
    const source = report.files[file]?.source ?? currentSource(file);
    const lines = source === undefined ? Infinity : source.replace(/\n$/, '').split('\n').length;
    const startLine = Number(m[2]);
    const startCol = m[3] === undefined ? 0 : Number(m[3]);
    const endLine = Number(m[4]);
    const endCol = m[5] === undefined ? Infinity : Number(m[5]);
    const lastLineLength = source === undefined ? Infinity : (source.replace(/\n$/, '').split('\n').at(-1)?.length ?? 0);
    const whole = startLine <= 1 && startCol <= 1 && (endLine > lines || (endLine === lines && endCol >= lastLineLength));
    if (!whole) {
      throw new Error(
        `${name}: mutated "${pattern}", lines ${startLine}-${endLine} of ${lines === Infinity ? '?' : lines} only. ` +
          `A score stands for a whole file: re-run with --mutate "${file}" (or the file's group: npm run test:mutation -- <group>).`,
      );
    }
    plain.push(file);
  }
  return expandPatterns(plain);
}

function relativeTestFile(f: string): string {
  return (isAbsolute(f) ? relative(ROOT, f) : f).split('\\').join('/');
}

export interface FoldContext {
  engineFiles: readonly string[];
  groups: MutationGroups;
  listed: ListedLines;
  /** The date of the run, ISO 8601 (UTC, to the minute). */
  measured: string;
  /** The source of a file as it is now (for files the report mutated but found no mutant in). */
  currentSource: (file: string) => string | undefined;
}

/** Folds one report into the scores; returns the files it recorded and remarks for the console. */
export function foldReport(scores: Scores, report: StrykerReport, name: string, ctx: FoldContext): { recorded: string[]; remarks: string[] } {
  const covered = wholeFilesOf(report, name, ctx.currentSource);
  const remarks: string[] = [];
  const recorded: string[] = [];
  const tests = Object.keys(report.testFiles ?? {}).map(relativeTestFile).filter((f) => f !== '').sort();
  for (const file of covered) {
    if (!ctx.engineFiles.includes(file)) {
      remarks.push(`${file}: not an engine file of stryker.config.mjs, not recorded`);
      continue;
    }
    const group = groupOf(ctx.groups, file);
    if (group === undefined) throw new Error(`${file} is in no group of test/mutation/groups.json`);
    const fileResult = report.files[file];
    const source = fileResult?.source ?? ctx.currentSource(file);
    if (source === undefined) throw new Error(`${name}: ${file} has no source in the report and is not in the working tree`);
    const count = (s: z.infer<typeof statusSchema>): number => fileResult?.mutants.filter((m) => m.status === s).length ?? 0;
    const killed = count('Killed');
    const timeout = count('Timeout');
    const survived = count('Survived');
    const noCoverage = count('NoCoverage');
    const pending = count('Pending');
    if (pending > 0) throw new Error(`${name}: ${file} has ${pending} mutants not yet run (an interrupted run?)`);
    const lines = ctx.listed.get(file);
    const listedEquivalent =
      fileResult?.mutants.filter((m) => (m.status === 'Survived' || m.status === 'NoCoverage') && (lines?.has(m.location.start.line) ?? false)).length ?? 0;
    const valid = killed + timeout + survived + noCoverage;
    const current = ctx.currentSource(file);
    if (current !== undefined && sha256(current) !== sha256(source)) {
      // Recorded, it would be STALE at once: the score belongs to the other version of the file.
      remarks.push(`${file}: not recorded, the report was made on another version of the source (re-run its group here)`);
      continue;
    }
    if (!fileResult) remarks.push(`${file}: no mutant in the report (nothing Stryker can mutate there), recorded as 0 valid`);
    scores.files[file] = {
      group,
      measured: ctx.measured,
      sha256: sha256(source),
      valid,
      killed,
      timeout,
      survived,
      noCoverage,
      ignored: count('Ignored'),
      listedEquivalent,
      score: percentDown(killed + timeout, valid),
      tests,
    };
    recorded.push(file);
  }
  return { recorded, remarks };
}

export type FileState = 'ok' | 'STALE' | 'MISSING';

export interface ScoreRow {
  file: string;
  group: string;
  state: FileState;
  entry?: ScoreEntry;
}

export interface ScoreSummary {
  rows: ScoreRow[];
  valid: number;
  detected: number;
  listedEquivalent: number;
  /** (killed + timed out) / valid over the measured files, per cent rounded down to 0.1. */
  score: number | null;
  /** The same with the listed-equivalent mutants counted out of the valid ones. */
  scoreWithoutListed: number | null;
  /** The unrounded fraction, for the gate. */
  fraction: number | null;
  stale: number;
  missing: number;
}

export function summarise(scores: Scores, engineFiles: readonly string[], groups: MutationGroups, currentSource: (file: string) => string | undefined): ScoreSummary {
  const rows: ScoreRow[] = [];
  let valid = 0;
  let detected = 0;
  let listedEquivalent = 0;
  for (const file of engineFiles) {
    const entry = scores.files[file];
    const group = groupOf(groups, file) ?? '(none)';
    if (!entry) {
      rows.push({ file, group, state: 'MISSING' });
      continue;
    }
    const source = currentSource(file);
    const state: FileState = source !== undefined && sha256(source) === entry.sha256 ? 'ok' : 'STALE';
    rows.push({ file, group, state, entry });
    valid += entry.valid;
    detected += entry.killed + entry.timeout;
    listedEquivalent += entry.listedEquivalent;
  }
  return {
    rows,
    valid,
    detected,
    listedEquivalent,
    score: percentDown(detected, valid),
    scoreWithoutListed: percentDown(detected, valid - listedEquivalent),
    fraction: valid === 0 ? null : detected / valid,
    stale: rows.filter((r) => r.state === 'STALE').length,
    missing: rows.filter((r) => r.state === 'MISSING').length,
  };
}

/** The source of a file of the working tree, or undefined if there is none. */
export function workingTreeSource(file: string): string | undefined {
  const full = join(ROOT, file);
  return existsSync(full) ? readFileSync(full, 'utf8') : undefined;
}

/**
 * The one README line that states the engine score; kept equal to scores.json by a test. It reads
 * scores.json only (not whether a source changed since), so editing a core file does not fail the
 * unit suite; `npm run test:mutation:score` is the check for stale files.
 */
export function readmeScoreLine(s: ScoreSummary): string {
  const pct = (x: number | null): string => (x === null ? 'not measured' : `${x.toFixed(1)} %`);
  const files = s.rows.length - s.missing;
  return (
    `Engine mutation score (test/mutation/scores.json): ${pct(s.score)} (${s.detected} of ${s.valid} valid mutants killed or timed out, ` +
    `${files} of ${s.rows.length} engine files measured); ` +
    `${pct(s.scoreWithoutListed)} with the ${s.listedEquivalent} surviving mutants on lines listed in EQUIVALENT.md counted out.`
  );
}
