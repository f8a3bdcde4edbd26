// The mutation runner's bookkeeping (run by `npm test`): every engine file Stryker mutates is in
// exactly one group of groups.json with test files that exist; scores.json names only engine files
// of their own group; a report of part of a file is refused; and the README states the engine
// score that scores.json gives. (Project rule, not a published source: a score stands for a whole
// file, and the number in the README is the number on record.)
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, engineFiles, expandPatterns, groupOf, loadGroups } from './engine-files.js';
import { parseListedLines } from './equivalents.js';
import { foldReport, loadScores, readmeScoreLine, sha256, summarise, workingTreeSource, type Scores, type StrykerReport } from './scores.js';

const groups = loadGroups();

describe('mutation groups', () => {
  it('the configuration mutates the engine folders of core/ and not the limit tables', async () => {
    const files = await engineFiles();
    expect(files.length).toBeGreaterThan(30);
    expect(files).toContain('core/eyewear/od.ts');
    expect(files).toContain('core/limits/exposure-limit.ts');
    expect(files.filter((f) => f.startsWith('core/limits/tables/'))).toEqual([]);
    expect(files.filter((f) => !/^core\/(beam|hazard|eyewear|classes|room|limits)\//.test(f))).toEqual([]);
  });

  it('every engine file is in exactly one group, and every grouped file is an engine file', async () => {
    const files = await engineFiles();
    const counts = new Map<string, number>();
    for (const g of Object.values(groups)) for (const f of g.mutate) counts.set(f, (counts.get(f) ?? 0) + 1);
    expect(files.filter((f) => counts.get(f) !== 1)).toEqual([]);
    expect([...counts.keys()].filter((f) => !files.includes(f))).toEqual([]);
  });

  it('every group runs test files that exist, none of them twice', () => {
    for (const [name, g] of Object.entries(groups)) {
      expect(g.tests.filter((t) => !existsSync(join(ROOT, t))), name).toEqual([]);
      expect(new Set(g.tests).size, name).toBe(g.tests.length);
    }
  });

  it('has between 15 and 25 groups', () => {
    const n = Object.keys(groups).length;
    expect(n).toBeGreaterThanOrEqual(15);
    expect(n).toBeLessThanOrEqual(25);
  });
});

describe('scores.json', () => {
  it('holds only engine files, each under the group that now mutates it', async () => {
    const files = await engineFiles();
    for (const [file, e] of Object.entries(loadScores().files)) {
      expect(files, file).toContain(file);
      expect(e.group, file).toBe(groupOf(groups, file));
      expect(e.valid, file).toBe(e.killed + e.timeout + e.survived + e.noCoverage);
      expect(e.listedEquivalent, file).toBeLessThanOrEqual(e.survived + e.noCoverage);
    }
  });

  it('the README states the engine score that scores.json gives', async () => {
    const summary = summarise(loadScores(), await engineFiles(), groups, workingTreeSource);
    const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
    expect(readme).toContain(readmeScoreLine(summary));
  });
});

describe('recording a report', () => {
  const file = 'core/eyewear/od.ts';
  const source = readFileSync(join(ROOT, file), 'utf8');
  const lastLine = source.replace(/\n$/, '').split('\n').length;
  const mutant = (id: string, status: 'Killed' | 'Survived' | 'Timeout' | 'NoCoverage' | 'Ignored' | 'CompileError', line: number) => ({
    id,
    mutatorName: 'ConditionalExpression',
    status,
    location: { start: { line, column: 1 } },
  });
  const report = (mutate: string[]): StrykerReport => ({
    config: { mutate },
    files: {
      [file]: {
        source,
        mutants: [mutant('1', 'Killed', 10), mutant('2', 'Timeout', 11), mutant('3', 'Survived', 52), mutant('4', 'Survived', 20), mutant('5', 'NoCoverage', 30), mutant('6', 'Ignored', 40), mutant('7', 'CompileError', 41)],
      },
    },
  });
  const ctx = { engineFiles: [file], groups, listed: parseListedLines('| core/eyewear/od.ts:52 (was 49) | x | y |\n'), measured: '2026-12-03T08:00Z', currentSource: workingTreeSource };

  // Cases: the mutate option as Stryker's --mutate takes it; refused unless the whole file was mutated.
  const cases: { mutate: string; refused: boolean }[] = [
    { mutate: file, refused: false },
    { mutate: 'core/eyewear/*.ts', refused: false },
    { mutate: `${file}:1-${lastLine}`, refused: false },
    { mutate: `${file}:1-${lastLine + 5}`, refused: false },
    { mutate: `${file}:10-20`, refused: true },
    { mutate: `${file}:2-${lastLine}`, refused: true },
    { mutate: `${file}:1-${lastLine - 1}`, refused: true },
    { mutate: `${file}:1:1-${lastLine - 1}:3`, refused: true },
  ];
  it.each(cases)('--mutate "$mutate": refused $refused', ({ mutate, refused }) => {
    const scores: Scores = { about: '', files: {} };
    const fold = (): unknown => foldReport(scores, report([mutate]), 'report.json', ctx);
    if (refused) {
      expect(fold).toThrow(/only\. A score stands for a whole file: re-run with --mutate "core\/eyewear\/od\.ts"/);
      expect(scores.files).toEqual({});
    } else {
      fold();
      expect(scores.files[file]).toEqual({
        group: groupOf(groups, file),
        measured: '2026-12-03T08:00Z',
        sha256: sha256(source),
        valid: 5,
        killed: 1,
        timeout: 1,
        survived: 2,
        noCoverage: 1,
        ignored: 1,
        listedEquivalent: 1,
        score: 40,
        tests: [],
      });
    }
  });

  it('a report made on another version of the source records nothing for that file', () => {
    const scores: Scores = { about: '', files: {} };
    const other = report([file]);
    other.files[file]!.source = `${source}// another version\n`;
    const { recorded, remarks } = foldReport(scores, other, 'report.json', ctx);
    expect(recorded).toEqual([]);
    expect(remarks).toEqual([`${file}: not recorded, the report was made on another version of the source (re-run its group here)`]);
    expect(scores.files).toEqual({});
  });

  it('a report that does not say what it mutated is refused', () => {
    const scores: Scores = { about: '', files: {} };
    expect(() => foldReport(scores, { files: report([file]).files }, 'old.json', ctx)).toThrow(/does not say what it mutated/);
  });

  it('a file changed since its measurement is STALE, one never measured MISSING', () => {
    const scores: Scores = { about: '', files: {} };
    foldReport(scores, report([file]), 'report.json', ctx);
    const other = 'core/eyewear/en207.ts';
    const now = summarise(scores, [file, other], groups, workingTreeSource);
    expect(now.rows.map((r) => r.state)).toEqual(['ok', 'MISSING']);
    const changed = summarise(scores, [file, other], groups, (f) => (f === file ? `${source}// changed\n` : workingTreeSource(f)));
    expect(changed.rows.map((r) => r.state)).toEqual(['STALE', 'MISSING']);
    expect(changed.stale).toBe(1);
    // Total over the measured file: (1 killed + 1 timed out) / 5 valid; 2 / 4 with the listed one out.
    expect([now.score, now.scoreWithoutListed]).toEqual([40, 50]);
  });

  it('refuses a mutate pattern it cannot expand', () => {
    expect(() => expandPatterns(['core/{beam,room}/*.ts'])).toThrow(/only dir\/\*\*\/\*\.ext/);
  });
});

describe('lines EQUIVALENT.md lists', () => {
  // Cases: first cells as EQUIVALENT.md writes them (project convention, not a published source).
  const cases: { row: string; lines: number[] }[] = [
    { row: '| core/hazard/range.ts:49, 65 | m | why |', lines: [49, 65] },
    { row: '| core/hazard/diffuse.ts:81-83 (disabled) | m | why |', lines: [81, 82, 83] },
    { row: '| core/beam/validate-beam.ts:94 (and 110 since the fourth session) | m | why |', lines: [94, 110] },
    { row: '| core/beam/validate-beam.ts:112 (110 in the measured run) | m | why |', lines: [112] },
    { row: '| core/hazard/diffuse.ts:51 (`\\|\\|` disabled; 7 stays) | m | why |', lines: [51] },
    { row: '| File:line | Mutant | Why |', lines: [] },
  ];
  it.each(cases)('$row', ({ row, lines }) => {
    const listed = parseListedLines(`${row}\n`);
    expect([...(listed.values().next().value ?? [])]).toEqual(lines);
  });
});
