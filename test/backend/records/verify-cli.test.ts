/**
 * `npm run verify`: one line per assessment, exit status 1 when any fails, JSON on request, and the
 * same verdicts from worker threads as from one thread. Real database, real keys; the command is
 * run as an auditor would run it (a child process). Source: derived — the headless check must
 * report the same findings as the app.
 */
import Database from 'better-sqlite3';
import { spawnSync } from 'node:child_process';
import { mkdirSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeSigner, openTemp, registerRoom, tempDir } from './helpers.js';

const root = fileURLToPath(new URL('../../../', import.meta.url));
let t: ReturnType<typeof tempDir>;
let db: string;
const ids: string[] = [];
let draftId = '';

function verify(...args: string[]): { status: number | null; lines: string[]; stdout: string } {
  const r = spawnSync(process.execPath, ['--import', 'tsx', join(root, 'electron/cli/verify.ts'), ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 });
  return { status: r.status, stdout: r.stdout, lines: r.stdout.trim().split('\n') };
}

beforeAll(async () => {
  t = tempDir('bw-verify-cli-');
  db = join(t.dir, 'records.sqlite');
  const store = await openTemp(t.dir);
  const { room } = await registerRoom(store);
  const officer = await makeSigner(store);
  for (let i = 0; i < 3; i++) {
    const a = await store.createAssessment({ roomId: room.id, content: { ...await store.newAssessmentContent(room.id), notes: `bench ${i}` } });
    await store.signAssessment(a.id, officer.signOff());
    ids.push(a.id);
  }
  draftId = (await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) })).id;
  await store.close();
}, 120_000);
afterAll(() => t.cleanup());

describe('npm run verify', () => {
  it('all intact: one line per assessment, exit 0', () => {
    const r = verify('--db', db, '--key-dir', join(t.dir, 'keys'));
    expect(r.status).toBe(0);
    for (const id of ids) expect(r.lines.find((l) => l.includes(id))).toMatch(/^ok {6}\S+ {2}Laser hazard evaluation, room A0\.07.*: revision 1, signed by Dr\. Imre Calloway-Senn on \d{4}-\d{2}-\d{2}, key [0-9a-f ]+$/);
    expect(r.lines.find((l) => l.includes(draftId))).toMatch(/^draft .*nothing signed yet$/);
    expect(r.lines.at(-1)).toBe('4 assessment(s): 3 ok, 1 not signed yet, 0 failed.');
  });

  // Issue 15 item 4 (trust across desks): an auditor's machine has no anchor of its own; the
  // fingerprint from paper is given for the one check and nothing is saved.
  it('an auditor without the desk\'s setting: nothing trusted, then --anchor from paper; a mistyped or foreign anchor is said plainly', () => {
    const auditor = join(t.dir, 'auditor');
    mkdirSync(auditor, { recursive: true });
    const anchor = (JSON.parse(readFileSync(join(t.dir, 'keys', 'beamwarden-trust-anchor.json'), 'utf8')) as { anchor: string }).anchor;
    const bare = verify('--db', db, '--key-dir', auditor, '--assessment', ids[0] ?? '');
    expect(bare.status).toBe(1);
    expect(bare.stdout).toMatch(/This desk has no trust anchor configured/);
    const typed = (anchor.toUpperCase().match(/.{4}/g) ?? []).join(' ');
    const given = verify('--db', db, '--key-dir', auditor, '--assessment', ids[0] ?? '', '--anchor', typed);
    expect(given.status).toBe(0);
    expect(given.lines[1]).toBe(`Trust anchor of this desk (the fingerprint given on the command line): ${(anchor.slice(0, 20).match(/.{4}/g) ?? []).join(' ')}`);
    expect(readdirSync(auditor)).toEqual([]);
    const mistyped = spawnSync(process.execPath, ['--import', 'tsx', join(root, 'electron/cli/verify.ts'), '--db', db, '--anchor', 'ab12 cd34'], { cwd: root, encoding: 'utf8' });
    expect(mistyped.status).toBe(2);
    expect(mistyped.stderr).toMatch(/--anchor must be 64 hexadecimal digits; 8 were given/);
    const foreign = verify('--db', db, '--key-dir', auditor, '--assessment', ids[0] ?? '', '--anchor', '0'.repeat(64));
    expect(foreign.status).toBe(1);
    expect(foreign.stdout).toMatch(/This register's signatures are endorsed by a key this desk does not recognise/);
  });

  it('a flipped status fails with its finding and exit 1; workers give the same lines; --json carries the checks', () => {
    const raw = new Database(db);
    raw.prepare("UPDATE revision SET status = 'superseded' WHERE assessment_id = ?").run(ids[1]);
    raw.close();
    const one = verify('--db', db, '--key-dir', join(t.dir, 'keys'), '--all');
    expect(one.status).toBe(1);
    expect(one.lines.find((l) => l.includes(ids[1] ?? '?'))).toMatch(
      /^FAILED .*revision 1: Revision 1 is marked superseded, but no later signed revision replaces it: its status was changed from signed to superseded outside Beamwarden\.$/,
    );
    const workers = verify('--db', db, '--key-dir', join(t.dir, 'keys'), '--all', '--workers', '2');
    expect(workers.status).toBe(1);
    expect(workers.lines).toEqual(one.lines);
    const json = verify('--db', db, '--key-dir', join(t.dir, 'keys'), '--assessment', ids[1] ?? '', '--json');
    expect(json.status).toBe(1);
    const doc = JSON.parse(json.stdout) as { failed: number; assessments: Array<{ outcome: string; reports: Array<{ checks: Array<{ check: string; ok: boolean }> }> }> };
    expect(doc.failed).toBe(1);
    expect(doc.assessments[0]?.reports[0]?.checks.find((c) => c.check === 'chain')?.ok).toBe(false);
  });

  it('usage errors exit 2 and say what is missing', () => {
    const r = spawnSync(process.execPath, ['--import', 'tsx', join(root, 'electron/cli/verify.ts'), '--all'], { cwd: root, encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--db <file> is required/);
  });
});
