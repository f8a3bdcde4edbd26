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
beforeEach(() => {
  t = tempDir('bw-backup-');
  store = openTemp(t.dir);
});
afterEach(() => {
  store.close();
  t.cleanup();
});

describe('backup and restore', () => {
  it('backs up while open, restores over later changes, and the signed record still verifies', async () => {
    const { room } = registerRoom(store);
    const a = store.createAssessment({ roomId: room.id, content: store.newAssessmentContent(room.id) });
    store.signAssessment(a.id, makeSigner(store).signOff());
    const backupPath = join(t.dir, 'backups', 'records-backup.sqlite');
    mkdirSync(join(t.dir, 'backups'));
    await store.backup(backupPath);

    // The copy is a sound, complete database.
    const copy = new Database(backupPath, { readonly: true });
    expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
    expect(copy.prepare('SELECT count(*) AS n FROM revision').get()).toEqual({ n: 1 });
    copy.close();

    // Work continues after the backup ...
    const later = store.createAssessment({ roomId: room.id, content: store.newAssessmentContent(room.id) });
    expect(store.listAssessments(room.id)).toHaveLength(2);
    store.close();

    // ... and restoring brings back the state of the backup.
    const dbPath = join(t.dir, 'records.sqlite');
    const report = await restoreBackup({ from: backupPath, to: dbPath });
    expect(report.path).toBe(dbPath);
    expect(report.previousCopy).not.toBeNull();
    expect(existsSync(report.previousCopy ?? '')).toBe(true);
    store = openTemp(t.dir);
    expect(store.listAssessments(room.id).map((x) => x.id)).toEqual([a.id]);
    expect(store.verify(a.id).ok).toBe(true);
    // The replaced database is kept and still holds the later assessment.
    const prev = openRecordStore({ path: report.previousCopy ?? '', keyDir: join(t.dir, 'keys') });
    expect(prev.listAssessments(room.id).map((x) => x.id)).toContain(later.id);
    prev.close();
  });

  it('refuses to restore from a file that is not a sound database, and changes nothing', async () => {
    registerRoom(store);
    store.close();
    const junk = join(t.dir, 'junk.sqlite');
    writeFileSync(junk, 'x'.repeat(10_000));
    await expect(restoreBackup({ from: junk, to: join(t.dir, 'records.sqlite') })).rejects.toThrow(/is not a database file/);
    store = openTemp(t.dir);
    expect(store.listSites()).toHaveLength(1);
  });

  it('refuses to back up onto the database itself', async () => {
    await expect(store.backup(join(t.dir, 'records.sqlite'))).rejects.toThrow(/must not overwrite the database itself/);
  });
});
