// @vitest-environment node
/**
 * The headless command `npm run report` (issue: Printed output, headless command): argument
 * checking with a clear message naming the option, and a stored assessment rendered from a real
 * database file into the three PDFs.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main, parseArgs } from '../../../electron/cli/report.js';
import { openRecordStore } from '../../../electron/backend/records/index.js';
import { pdfInfo } from './pdf-tools.js';

const dir = mkdtempSync(join(tmpdir(), 'bw-report-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('arguments', () => {
  const good: ReadonlyArray<[string[], Record<string, unknown>]> = [
    [['--demo', '--out', 'x'], { demo: true, out: 'x', paper: 'A4', units: 'SI' }],
    [['--db', 'f.sqlite', '--assessment', 'a1', '--out=x', '--paper', 'Letter', '--units', 'ANSI'], { demo: false, db: 'f.sqlite', assessment: 'a1', out: 'x', paper: 'Letter', units: 'ANSI' }],
  ];
  it.each(good)('%j is read as %j', (argv, expected) => {
    expect(parseArgs(argv)).toEqual(expected);
  });

  const bad: ReadonlyArray<[string[], RegExp]> = [
    [['--demo'], /--out/],
    [['--out', 'x'], /either --demo or --db/],
    [['--demo', '--db', 'f', '--assessment', 'a', '--out', 'x'], /either --demo or --db/],
    [['--db', 'f', '--out', 'x'], /--assessment/],
    [['--demo', '--out', 'x', '--paper', 'A3'], /--paper/],
    [['--demo', '--out', 'x', '--units', 'imperial'], /--units/],
    [['--demo', '--out', 'x', '--colour', 'red'], /colour/],
    [['demo'], /unexpected argument "demo"/],
  ];
  it.each(bad)('%j is refused naming the problem (%s)', (argv, message) => {
    expect(() => parseArgs(argv)).toThrow(message);
  });

  it('a refused argument exits with code 2 and writes nothing', async () => {
    expect(await main(['--demo'])).toBe(2);
  });
});

describe('a stored assessment from a database file', () => {
  it('writes the three PDFs of the demo room B2.16 (a draft; --db, --assessment, Letter)', async () => {
    const db = join(dir, 'records.sqlite');
    const store = await openRecordStore({ path: db, keyDir: join(dir, 'keys') });
    const site = await store.seedDemo();
    const room = (await store.listRooms(site.id)).find((r) => r.code === 'B2.16');
    const id = room ? (await store.listAssessments(room.id))[0]?.id : undefined;
    await store.close();
    if (id === undefined) throw new Error('demo room B2.16 missing');
    const out = join(dir, 'out');
    expect(await main(['--db', db, '--assessment', id, '--out', out, '--paper', 'Letter'])).toBe(0);
    for (const name of ['assessment-report', 'door-notice', 'eyewear-sheet']) {
      const file = join(out, `B2.16-${name}.pdf`);
      expect(existsSync(file), file).toBe(true);
      const info = pdfInfo(readFileSync(file));
      expect(info.pages).toBeGreaterThan(0);
      expect([Math.min(...info.size), Math.max(...info.size)]).toEqual([612, 792]); // US Letter (landscape for the sheet)
    }
  }, 120_000);
});
