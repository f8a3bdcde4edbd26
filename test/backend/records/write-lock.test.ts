/**
 * One Beamwarden writes one database file (issue 11, item 4): a second program opening the same
 * file for writing is told plainly which program has it; restore refuses while the database is in
 * use (before, restore replaced the file under a running host and a confirmed save was lost); a
 * lock left by a program that crashed is taken over. Real processes, real SQLite files.
 * Cases "derived: one writer per file".
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openRecordStore, RecordError, restoreBackup } from '../../../electron/backend/records/index.js';
import { tempDir } from './helpers.js';

const holder = fileURLToPath(new URL('./hold-open.ts', import.meta.url));
let t: ReturnType<typeof tempDir>;
let dbPath: string;
let child: ChildProcess | null = null;
beforeEach(() => {
  t = tempDir('bw-lock-');
  dbPath = join(t.dir, 'records.sqlite');
});
afterEach(async () => {
  if (child && child.exitCode === null && child.signalCode === null) {
    const done = new Promise((r) => child?.once('exit', r));
    child.kill('SIGKILL');
    await done;
  }
  child = null;
  t.cleanup();
});

/** Start the other Beamwarden; resolves once it has the database open. */
function startOther(): Promise<{ save: (name: string) => Promise<void> }> {
  const c = spawn(process.execPath, ['--import', 'tsx', holder, dbPath, join(t.dir, 'keys')], { stdio: ['pipe', 'pipe', 'pipe'] });
  child = c;
  let out = '';
  let err = '';
  const waiters: Array<{ line: string; resolve: () => void }> = [];
  c.stderr?.on('data', (d: Buffer) => (err += d.toString()));
  c.stdout?.on('data', (d: Buffer) => {
    out += d.toString();
    for (const w of [...waiters]) if (out.includes(`${w.line}\n`)) w.resolve();
  });
  const waitFor = (line: string) =>
    new Promise<void>((resolve, reject) => {
      if (out.includes(`${line}\n`)) return resolve();
      waiters.push({ line, resolve });
      c.once('exit', (code) => reject(new Error(`the other process ended (${code}): ${err}`)));
    });
  return waitFor('open').then(() => ({
    save: (name: string) => {
      c.stdin?.write(`save ${name}\n`);
      return waitFor(`saved ${name}`);
    },
  }));
}

async function errorOf(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a RecordError');
}

describe('a second program opening the database for writing', () => {
  it('is refused and told which program has it; read-only opening still works', async () => {
    const other = await startOther();
    await other.save('Harwick Vale Photonics Centre');
    const err = await errorOf(() => openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') }));
    expect(err.code).toBe('in-use');
    expect(err.message).toMatch(new RegExp(`already open for writing in another Beamwarden \\(process ${child?.pid ?? 0} on `));
    expect(err.message).toMatch(/Close Beamwarden there first/);
    const reader = await openRecordStore({ path: dbPath, readonly: true });
    expect((await reader.listSites()).map((s) => s.name)).toEqual(['Harwick Vale Photonics Centre']);
    await reader.close();
  });

  it('a lock left by a program that was killed is taken over', async () => {
    await startOther();
    const c = child;
    const ended = new Promise((r) => c?.once('exit', r));
    c?.kill('SIGKILL');
    await ended;
    expect(existsSync(`${dbPath}.lock`)).toBe(true);
    const store = await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });
    await store.createSite({ name: 'After the crash' });
    await store.close();
    expect(existsSync(`${dbPath}.lock`)).toBe(false);
  });
});

describe('restore while the database is in use', () => {
  it('is refused and the running program keeps every confirmed save', async () => {
    // A backup first, taken by this process, which then closes.
    const store = await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });
    await store.createSite({ name: 'In the backup' });
    mkdirSync(join(t.dir, 'backups'));
    const backup = join(t.dir, 'backups', 'copy.sqlite');
    await store.backup(backup);
    await store.close();

    const other = await startOther();
    await other.save('Saved after the backup');
    await expect(restoreBackup({ from: backup, to: dbPath })).rejects.toMatchObject({ code: 'in-use', message: expect.stringMatching(/^Not restored: .*Nothing was changed\.$/) });
    await other.save('Saved after the refused restore');
    const reader = await openRecordStore({ path: dbPath, readonly: true });
    expect((await reader.listSites()).map((s) => s.name).sort()).toEqual(['In the backup', 'Saved after the backup', 'Saved after the refused restore']);
    await reader.close();
  });

  it('in this process too: restore refuses while a store is open on the file', async () => {
    const store = await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });
    const backup = join(t.dir, 'copy.sqlite');
    await store.backup(backup);
    await expect(restoreBackup({ from: backup, to: dbPath })).rejects.toMatchObject({ code: 'in-use' });
    await store.close();
    await expect(restoreBackup({ from: backup, to: dbPath })).resolves.toMatchObject({ path: dbPath });
  });
});
