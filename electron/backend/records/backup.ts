/**
 * Backup and restore through SQLite's online backup API (better-sqlite3 `db.backup`): the copy is
 * consistent even while the store is open and being written, including what is still in the WAL.
 * Every copy is checked (integrity_check, schema version) before it is reported as good.
 */
import Database from 'better-sqlite3';
import { existsSync, renameSync } from 'node:fs';
import { resolve } from 'node:path';
import { openDatabase, type Db } from './database.js';
import { LATEST_VERSION } from './migrations/index.js';
import { RecordError, type RestoreReport } from './types.js';
import { acquireWriteLock, inUseMessage, lockHolder } from './write-lock.js';

function checkCopy(path: string, nativeBinding: string | undefined): number {
  let db: Db;
  try {
    db = new Database(path, { readonly: true, fileMustExist: true, ...(nativeBinding !== undefined ? { nativeBinding } : {}) });
  } catch (e) {
    throw new RecordError('corrupt-database', `Cannot open the backup ${path}: ${(e as Error).message}`);
  }
  try {
    let result: Array<{ integrity_check: string }>;
    try {
      result = db.pragma('integrity_check') as Array<{ integrity_check: string }>;
    } catch (e) {
      const code = e instanceof Error && 'code' in e ? String((e as { code: unknown }).code) : '';
      throw new RecordError('corrupt-database', `${path} ${code === 'SQLITE_NOTADB' ? 'is not a database file' : 'is damaged'} (SQLite: ${(e as Error).message})`);
    }
    if (result.length !== 1 || result[0]?.integrity_check !== 'ok') {
      throw new RecordError('corrupt-database', `The backup ${path} failed its integrity check: ${result.slice(0, 3).map((r) => r.integrity_check).join('; ')}`);
    }
    const version = db.pragma('user_version', { simple: true });
    if (typeof version !== 'number' || version < 1) throw new RecordError('corrupt-database', `${path} is not a Beamwarden database (no schema version)`);
    if (version > LATEST_VERSION) {
      throw new RecordError('newer-database', `The backup ${path} has schema version ${version}, newer than this Beamwarden build understands (${LATEST_VERSION})`);
    }
    return version;
  } finally {
    db.close();
  }
}

/** Online backup of an open database to `dest`, then a check of the copy. */
export async function backupTo(db: Db, dest: string, nativeBinding?: string): Promise<void> {
  const target = resolve(dest);
  if (target === resolve(db.name)) throw new RecordError('invalid', 'The backup must not overwrite the database itself');
  await db.backup(target);
  checkCopy(target, nativeBinding);
}

/**
 * Replace the database at `to` with the backup `from`. The store on `to` must be closed. The
 * replaced file (and its -wal/-shm) is kept beside it as `<to>.replaced-<time>.sqlite`; an older
 * backup is migrated to the current schema on the way (with its own pre-migration copy).
 */
export async function restoreBackup(args: { from: string; to: string; nativeBinding?: string }): Promise<RestoreReport> {
  const from = resolve(args.from);
  const to = resolve(args.to);
  if (from === to) throw new RecordError('invalid', 'Restore needs a backup file other than the database itself');
  checkCopy(from, args.nativeBinding);
  // Never under a running Beamwarden: it would go on writing into the replaced file, and work it
  // had already confirmed to the officer would be lost.
  const holder = lockHolder(to);
  if (holder !== null) {
    throw new RecordError(
      'in-use',
      `Not restored: ${inUseMessage(to, holder)} Or use "Restore from backup" inside that Beamwarden, which closes the database first. Nothing was changed.`,
    );
  }
  const release = acquireWriteLock(to);
  try {
    return await replaceWith(from, to, args.nativeBinding);
  } finally {
    release();
  }
}

async function replaceWith(from: string, to: string, nativeBinding: string | undefined): Promise<RestoreReport> {
  const args = { nativeBinding };
  let previousCopy: string | null = null;
  if (existsSync(to)) {
    previousCopy = `${to}.replaced-${new Date().toISOString().replace(/[:.]/g, '-')}.sqlite`;
    renameSync(to, previousCopy);
    for (const suffix of ['-wal', '-shm']) if (existsSync(to + suffix)) renameSync(to + suffix, previousCopy + suffix);
  }
  const src = new Database(from, { readonly: true, fileMustExist: true, ...(args.nativeBinding !== undefined ? { nativeBinding: args.nativeBinding } : {}) });
  try {
    await src.backup(to);
  } finally {
    src.close();
  }
  const opened = openDatabase(to, args.nativeBinding !== undefined ? { nativeBinding: args.nativeBinding } : {});
  const schemaVersion = opened.schemaVersion;
  opened.db.prepare('INSERT INTO audit_event (at, action, entity, entity_id, detail) VALUES (?, ?, ?, ?, ?)').run(
    new Date().toISOString(),
    'restored',
    'database',
    to,
    `from ${from}`,
  );
  opened.db.close();
  return { restoredFrom: from, path: to, previousCopy, schemaVersion };
}
