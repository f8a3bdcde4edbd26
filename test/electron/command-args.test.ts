// One command-line reader for every command (report, verify, backup, restore, serve): the same
// forms are accepted and the same mistakes refused in the same words, ending with the usage.
// Common practice for command-line tools (--name value, --name=value, switches without a value).
import { describe, expect, it } from 'vitest';
import { parseArgs as parseReportArgs } from '../../electron/cli/report.js';
import { parseVerifyArgs } from '../../electron/cli/verify.js';
import { BackupArgsSchema, RestoreArgsSchema } from '../../electron/cli/safekeeping-args.js';
import { parseCommandArgs } from '../../electron/cli/command-args.js';
import { parseHostArgs } from '../../electron/host/args.js';

const backup = (argv: string[]) => parseCommandArgs(BackupArgsSchema, argv, 'usage: npm run backup');
const restore = (argv: string[]) => parseCommandArgs(RestoreArgsSchema, argv, 'usage: npm run restore');

describe('accepted forms', () => {
  // [command, argv, expected]
  const CASES: ReadonlyArray<readonly [string, () => unknown, unknown]> = [
    ['verify', () => parseVerifyArgs(['--db', 'a.sqlite', '--all', '--json']), { db: 'a.sqlite', all: true, json: true }],
    ['verify', () => parseVerifyArgs(['--db=a.sqlite', '--assessment', 'x', '--workers', '2']), { db: 'a.sqlite', assessment: 'x', workers: 2 }],
    ['report', () => parseReportArgs(['--demo', '--out', 'p', '--paper=Letter']), { demo: true, out: 'p', paper: 'Letter', units: 'SI' }],
    ['backup', () => backup(['--db', 'a.sqlite', '--out=b']), { db: 'a.sqlite', out: 'b' }],
    ['restore', () => restore(['--from', 'b.sqlite']), { from: 'b.sqlite' }],
    ['serve', () => parseHostArgs(['--demo', '--port', '8080']), { port: 8080, db: undefined, demo: true }],
  ];
  it.each(CASES)('%s %j', (_cmd, run, expected) => {
    expect(run()).toEqual(expected);
  });
});

describe('refusals name the problem and end with the usage', () => {
  // [command, run, message, usage]
  const CASES: ReadonlyArray<readonly [string, () => unknown, RegExp, RegExp]> = [
    ['verify stray word', () => parseVerifyArgs(['all']), /^unexpected argument "all"/, /Usage: npm run verify/],
    ['verify value missing', () => parseVerifyArgs(['--db']), /^--db needs a value/, /Usage: npm run verify/],
    ['verify switch with a value', () => parseVerifyArgs(['--db', 'a', '--all=yes']), /^--all takes no value/, /Usage: npm run verify/],
    ['verify unknown option', () => parseVerifyArgs(['--db', 'a', '--colour', 'red']), /^unknown option --colour/, /Usage: npm run verify/],
    ['report missing --out', () => parseReportArgs(['--demo']), /^--out <folder> is required/, /Usage:\n {2}npm run report/],
    ['report value flag followed by a flag', () => parseReportArgs(['--out', '--demo']), /^--out needs a value/, /npm run report/],
    ['backup unknown option', () => backup(['--nonsense', 'x']), /^unknown option --nonsense/, /usage: npm run backup/],
    ['restore stray word', () => restore(['stray']), /^unexpected argument "stray"/, /usage: npm run restore/],
    ['serve port out of range', () => parseHostArgs(['--port', '70000']), /^--port: /, /usage: npm run serve/],
    ['serve value missing', () => parseHostArgs(['--db']), /^--db needs a value/, /usage: npm run serve/],
  ];
  it.each(CASES)('%s', (_name, run, message, usage) => {
    let text = '';
    try {
      run();
    } catch (e) {
      text = (e as Error).message;
    }
    expect(text).toMatch(message);
    expect(text).toMatch(usage);
  });
});
