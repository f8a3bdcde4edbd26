// @vitest-environment node
/**
 * Batch printing of reports (issue 12, item 5): the current assessment report of every room of a
 * site, one file per room in a folder (npm run report -- --db <file> --site <id>) and all of them in
 * one PDF, from the command line and through the one handler table ('document-render-site', kind
 * 'report'), as Print & export asks for it. Read back with pdftotext: each room's report is there,
 * in the register's room order, page for page the same as its own file, numbered within the room
 * ("page k of N"), with the DRAFT mark exactly on the pages of a draft room. Invented demo site
 * (assets/demo), real SQLite store and real pdfmake.
 */
import { readdirSync, readFileSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main, parseArgs } from '../../../electron/cli/report.js';
import { documentTable } from '../../../electron/api/handlers/documents.js';
import type { ApiContext } from '../../../electron/api/context.js';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import { pageTexts } from './pdf-tools.js';

const dir = mkdtempSync(join(tmpdir(), 'bw-site-reports-'));
const db = join(dir, 'records.sqlite');
const out = join(dir, 'reports');
let store: RecordStore;
let siteId = '';
let siteName = '';
const rooms: Array<{ code: string; draft: boolean }> = [];

beforeAll(async () => {
  const s = await openRecordStore({ path: db, keyDir: join(dir, 'keys') });
  const site = await s.seedDemo();
  siteId = site.id;
  siteName = site.name;
  for (const r of await s.listRooms(site.id)) {
    const a = (await s.listAssessments(r.id))[0];
    if (a !== undefined) rooms.push({ code: r.code, draft: (await s.getAssessment(a.id)).current.status === 'draft' });
  }
  await s.close();
  expect(await main(['--db', db, '--site', siteId, '--out', out])).toBe(0);
  store = await openRecordStore({ path: db, keyDir: join(dir, 'keys') });
}, 300_000);

afterAll(async () => {
  await store?.close();
  rmSync(dir, { recursive: true, force: true });
});

/**
 * The big DRAFT mark across a draft page is drawn slanted in a room's own file and level in the
 * combined one (a mark per room's pages); pdftotext reads it as "DR AF T" or "DRAFT" wherever it
 * falls, and the words around it may come out in another reading order. Compare each page's words
 * without it (the same words are removed from both sides), in sorted order.
 */
const withoutMark = (page: string): string =>
  page
    .replace(/\b(DR|AF|T)\b|\bDRAFT\b(?! —)/g, ' ')
    .split(/\s+/)
    .filter((w) => w !== '')
    .sort()
    .join(' ');

function roomFile(code: string): string {
  const f = readdirSync(out).find((n) => n.startsWith(`${code}-assessment-report-rev`));
  if (f === undefined) throw new Error(`no report file for ${code}`);
  return join(out, f);
}

describe('command line: --site writes every room report and one PDF of all', () => {
  it('the demo site has signed and draft rooms to print', () => {
    expect(rooms.length).toBeGreaterThanOrEqual(3);
    expect(rooms.some((r) => r.draft)).toBe(true);
    expect(rooms.some((r) => !r.draft)).toBe(true);
  });

  it('one file per room, named with room, revision and DRAFT or signed, and the combined file', () => {
    const files = readdirSync(out).sort();
    for (const r of rooms) expect(roomFile(r.code)).toMatch(new RegExp(`-rev\\d+-${r.draft ? 'DRAFT' : 'signed'}\\.pdf$`));
    expect(files.filter((f) => f.includes('-assessment-reports-every-room.pdf'))).toHaveLength(1);
    expect(files).toHaveLength(rooms.length + 1);
  });

  it('the combined PDF holds each room report in order, page for page, numbered within the room, DRAFT only on draft rooms', () => {
    const all = pageTexts(readFileSync(join(out, readdirSync(out).find((f) => f.includes('every-room')) as string)));
    let at = 0;
    for (const r of rooms) {
      const own = pageTexts(readFileSync(roomFile(r.code)));
      const part = all.slice(at, at + own.length);
      expect(part.map(withoutMark), r.code).toEqual(own.map(withoutMark));
      part.forEach((page, k) => {
        expect(page, `${r.code} page ${k + 1}`).toContain(`Room ${r.code}`);
        expect(page, `${r.code} page ${k + 1}`).toContain(`page ${k + 1} of ${own.length}`);
        expect(/\bDRAFT\b/.test(page), `${r.code} page ${k + 1} DRAFT mark`).toBe(r.draft);
      });
      at += own.length;
    }
    expect(all).toHaveLength(at);
  });

  it.each([
    [['--db', 'f', '--site', 's1', '--out', 'x'], { demo: false, db: 'f', site: 's1', out: 'x', paper: 'A4', units: 'SI' }],
  ] as const)('%j is read as %j', (argv, expected) => {
    expect(parseArgs(argv)).toEqual(expected);
  });

  it.each([
    [['--db', 'f', '--site', 's1', '--assessment', 'a1', '--out', 'x'], /either --assessment <id> or --site <id>/],
    [['--db', 'f', '--site', 's1', '--revision', 'r1', '--out', 'x'], /--revision goes with --assessment/],
  ] as const)('%j is refused (%s)', (argv, message) => {
    expect(() => parseArgs(argv)).toThrow(message);
  });
});

describe("handler table: 'document-render-site' with kind 'report'", () => {
  it('answers one PDF of every room report, its page count the sum of the rooms', async () => {
    const ctx: ApiContext = { shell: 'loopback', version: 'test', databasePath: db, store };
    const req = documentTable['document-render-site'].input.parse({ kind: 'report', siteId, paper: 'A4', units: 'SI' });
    const file = await documentTable['document-render-site'].run(req, ctx);
    expect(file.fileName).toBe(`assessment-reports-${siteName.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 40)}-${rooms.length}-rooms.pdf`);
    const pages = pageTexts(Buffer.from(file.base64, 'base64'));
    const perRoom = rooms.map((r) => pageTexts(readFileSync(roomFile(r.code))).length);
    expect(pages).toHaveLength(perRoom.reduce((a, b) => a + b, 0));
    expect(pages[0]).toContain(`Room ${rooms[0]?.code}`);
  }, 300_000);

  it('an eyewear sheet for a whole site is not offered: refused naming the field', () => {
    const r = documentTable['document-render-site'].input.safeParse({ kind: 'eyewear-sheet', siteId, paper: 'A4', units: 'SI' });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['kind']);
  });
});
