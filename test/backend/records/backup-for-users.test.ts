/**
 * Backup and restore for users (issue 11, item 6): before, they existed only as library calls.
 * Now `npm run backup` / `npm run restore` (real child processes), and "Back up now" / "Restore
 * from backup" in the app over the real loopback host; each copy is checked (integrity_check),
 * recorded for the reminder, and restore inside the app closes the database first.
 * Cases "derived: a backup is a checked copy; restore brings back exactly that copy".
 */
import Database from 'better-sqlite3';
import { execFile } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RestoreReport } from '../../../electron/backend/records/index.js';
import { openRecordStore, type BackupReport, type BackupStatus, type RecordStore } from '../../../electron/backend/records/index.js';
import { backupDue } from '../../../renderer/lib/backup-reminder.js';
import { registerRoom, tempDir } from './helpers.js';
import { startTestHost } from './http-host.js';

const run = promisify(execFile);
const REPO = fileURLToPath(new URL('../../..', import.meta.url));
const cli = (name: string, args: string[]) =>
  run(process.execPath, ['--import', 'tsx', join(REPO, 'electron', 'cli', `${name}.ts`), ...args], { cwd: REPO }).then(
    (r) => ({ code: 0, stdout: r.stdout, stderr: r.stderr }),
    (e: { code: number; stdout: string; stderr: string }) => ({ code: e.code, stdout: e.stdout, stderr: e.stderr }),
  );

let t: ReturnType<typeof tempDir>;
let dbPath: string;
beforeEach(() => {
  t = tempDir('bw-users-backup-');
  dbPath = join(t.dir, 'records.sqlite');
});
afterEach(() => t.cleanup());

const open = (): Promise<RecordStore> => openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });

describe('npm run backup and npm run restore', () => {
  it('backs up while Beamwarden has the database open, and restores once it is closed', async () => {
    const store = await open();
    await registerRoom(store);
    const out = join(t.dir, 'usb', 'backups');
    const b = await cli('backup', ['--db', dbPath, '--out', out]);
    expect(b.stderr).toBe('');
    expect(b.code).toBe(0);
    const made = /to (\S+\.sqlite) \([\d.]+ MB; integrity checked\)/.exec(b.stdout)?.[1] ?? '';
    expect(existsSync(made)).toBe(true);
    const copy = new Database(made, { readonly: true });
    expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
    copy.close();
    // The running app learns of it (reminder).
    expect((await store.backupStatus()).lastBackupPath).toBe(made);

    await store.createSite({ name: 'Made after the backup' });
    const refused = await cli('restore', ['--db', dbPath, '--from', made]);
    expect(refused.code).toBe(1);
    expect(refused.stderr).toMatch(/^beamwarden restore: Not restored: The database .* is already open for writing in another Beamwarden/);
    await store.close();

    const restored = await cli('restore', ['--db', dbPath, '--from', made]);
    expect(restored.stderr).toBe('');
    expect(restored.stdout).toMatch(/Restored .*records\.sqlite\n +from .* \(schema version \d+\)\nThe replaced database is kept as .*\.replaced-/);
    const after = await open();
    expect((await after.listSites()).map((s) => s.name)).not.toContain('Made after the backup');
    await after.close();
  });

  it.each([
    [['--db'], /--db needs a value/],
    [['--nonsense', 'x'], /unknown option --nonsense/],
    [['stray'], /unexpected argument "stray"/],
  ])('refuses bad options %j with the usage', async (args, message) => {
    const r = await cli('backup', args);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(message);
    expect(r.stderr).toMatch(/usage: npm run backup/);
  });

  it('restore without --from lists the backups beside the database', async () => {
    const store = await open();
    await store.backupInto();
    await store.close();
    const r = await cli('restore', ['--db', dbPath]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/name the backup with --from\. Backups beside .*records\.sqlite, newest first:\n +\S+beamwarden-backup-\d{4}-\d\d-\d\dT\d\d-\d\d-\d\dZ\.sqlite/);
  });

  it('a damaged backup is refused and nothing is replaced', async () => {
    const store = await open();
    await registerRoom(store);
    await store.close();
    const junk = join(t.dir, 'not-a-backup.sqlite');
    writeFileSync(junk, 'SQLite format 3\0'.padEnd(8192, 'x'));
    const r = await cli('restore', ['--db', dbPath, '--from', junk]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/not-a-backup\.sqlite (is not a database file|is damaged)/);
    const after = await open();
    expect(await after.listSites()).toHaveLength(1);
    await after.close();
  });
});

describe('Back up now and Restore from backup in the app, over the loopback host', () => {
  it('backs up, lists the backup, restores it with the database closed first, and keeps working', async () => {
    const store = await open();
    await registerRoom(store);
    const host = await startTestHost(store, { openStore: open });
    try {
      const before = await host.ok<BackupStatus>('backup-status', {});
      expect(before.lastBackupAt).toBeNull();
      const made = await host.ok<BackupReport>('backup-now', {});
      expect(made.path.startsWith(join(t.dir, 'backups'))).toBe(true);
      const status = await host.ok<BackupStatus>('backup-status', {});
      expect(status.lastBackupAt).toBe(made.at);
      expect(status.backups.map((b) => b.path)).toEqual([made.path]);

      await host.ok('site-create', { name: 'Made after the backup' });
      const r = await host.ok<RestoreReport>('restore-backup', { path: made.path });
      expect(r.previousCopy).toMatch(/\.replaced-/);
      const sites = await host.ok<Array<{ name: string }>>('register-overview', { dueBy: '2030-01-01' }).then((o) => (o as unknown as { sites: Array<{ site: { name: string } }> }).sites.map((s) => s.site.name));
      expect(sites).not.toContain('Made after the backup');
      // The app goes on with the restored records.
      await host.ok('site-create', { name: 'Made after the restore' });
    } finally {
      await host.close();
      await host.ctx.store.close();
    }
  });

  it('a backup folder that cannot be made is said plainly', async () => {
    const store = await open();
    const host = await startTestHost(store);
    try {
      writeFileSync(join(t.dir, 'a-file'), '');
      const { reply } = await host.call('backup-now', { folder: join(t.dir, 'a-file', 'backups') });
      expect(reply.ok).toBe(false);
      if (!reply.ok) {
        expect(reply.error.code).toBe('storage');
        expect(reply.error.message).toMatch(/^Making the backup folder: The folder .* does not exist/);
      }
    } finally {
      await host.close();
      await store.close();
    }
  });
});

describe('the reminder', () => {
  const now = new Date('2026-12-02T09:00:00Z');
  it.each([
    [null, 7, true],
    ['2026-11-26T09:00:00Z', 7, false], // six days
    ['2026-11-25T08:59:00Z', 7, true], // just over seven days
    ['2026-11-25T08:59:00Z', 14, false],
    ['2026-12-02T08:00:00-05:00', 1, false], // 13:00Z, in the future of 09:00Z: not due
  ] as const)('last backup %s, remind after %i days: due %s', (last, days, due) => {
    expect(backupDue(last, days, now)).toBe(due);
  });
});
