/**
 * Backup and restore through SQLite's online backup API (sqlite3_backup_*, via better-sqlite3
 * `db.backup`): the copy is consistent while the store stays open, and restoring brings back
 * exactly the records of the backup, still verifiable, keeping the replaced file beside it.
 */
import Database from 'better-sqlite3';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openRecordStore, restoreBackup, type RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
beforeEach(async () => {
  t = tempDir('bw-backup-');
  store = await openTemp(t.dir);
});
afterEach(async () => {
  await store.close();
  t.cleanup();
});

describe('backup and restore', () => {
  it('backs up while open, restores over later changes, and the signed record still verifies', async () => {
    const { room } = await registerRoom(store);
    const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
    await store.signAssessment(a.id, (await makeSigner(store)).signOff());
    const backupPath = join(t.dir, 'backups', 'records-backup.sqlite');
    mkdirSync(join(t.dir, 'backups'));
    await store.backup(backupPath);

    // The copy is a sound, complete database.
    const copy = new Database(backupPath, { readonly: true });
    expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
    expect(copy.prepare('SELECT count(*) AS n FROM revision').get()).toEqual({ n: 1 });
    copy.close();

    // Work continues after the backup ...
    const later = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
    expect(await store.listAssessments(room.id)).toHaveLength(2);
    await store.close();

    // ... and restoring brings back the state of the backup.
    const dbPath = join(t.dir, 'records.sqlite');
    const report = await restoreBackup({ from: backupPath, to: dbPath });
    expect(report.path).toBe(dbPath);
    expect(report.previousCopy).not.toBeNull();
    expect(existsSync(report.previousCopy ?? '')).toBe(true);
    store = await openTemp(t.dir);
    expect((await store.listAssessments(room.id)).map((x) => x.id)).toEqual([a.id]);
    expect((await store.verify(a.id)).ok).toBe(true);
    // The replaced database is kept and still holds the later assessment.
    const prev = await openRecordStore({ path: report.previousCopy ?? '', keyDir: join(t.dir, 'keys') });
    expect((await prev.listAssessments(room.id)).map((x) => x.id)).toContain(later.id);
    await prev.close();
  });

  it('refuses to restore from a file that is not a sound database, and changes nothing', async () => {
    await registerRoom(store);
    await store.close();
    const junk = join(t.dir, 'junk.sqlite');
    writeFileSync(junk, 'x'.repeat(10_000));
    await expect(restoreBackup({ from: junk, to: join(t.dir, 'records.sqlite') })).rejects.toThrow(/is not a database file/);
    store = await openTemp(t.dir);
    expect(await store.listSites()).toHaveLength(1);
  });

  it('refuses to back up onto the database itself', async () => {
    await expect(store.backup(join(t.dir, 'records.sqlite'))).rejects.toThrow(/must not overwrite the database itself/);
  });
});
