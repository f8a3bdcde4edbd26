/**
 * Backups for the officer: "Back up now" (app menu, Print & export screen, `npm run backup`) makes
 * a dated copy in a backups folder beside the database (or one the officer names) through
 * SQLite's online backup API, checks the copy (integrity_check, schema version) and records the
 * backup in the database's audit log, so the app can remind the officer when the last one is
 * older than they want (default 7 days). The list of backups feeds "Restore from backup".
 */
import Database from 'better-sqlite3';
import { existsSync, mkdirSync, readdirSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { backupTo } from './backup.js';
import type { Db } from './database.js';
import { storageError } from './storage-errors.js';
import { RecordError } from './types.js';

export const BACKUP_FOLDER = 'backups';
const BACKUP_FILE = /^beamwarden-backup-(\d{4}-\d{2}-\d{2}T\d{2}-\d{2}-\d{2})Z\.sqlite$/;

export interface BackupReport {
  readonly path: string;
  /** When the copy was made (UTC). */
  readonly at: string;
  readonly bytes: number;
}

export interface BackupFile {
  readonly path: string;
  readonly name: string;
  readonly at: string;
  readonly bytes: number;
}

export interface BackupStatus {
  readonly databasePath: string;
  /** Where "Back up now" writes unless told otherwise. */
  readonly folder: string;
  /** The newest backup recorded in this database's audit log (any folder), or null. */
  readonly lastBackupAt: string | null;
  readonly lastBackupPath: string | null;
  /** Backups found in `folder`, newest first. */
  readonly backups: readonly BackupFile[];
}

export function defaultBackupFolder(dbPath: string): string {
  return join(dirname(resolve(dbPath)), BACKUP_FOLDER);
}

function fileStamp(at: string): string {
  return at.slice(0, 19).replace(/:/g, '-');
}

/** Online backup of the open database `db` into `folder` (made if missing), checked, and recorded. */
export async function backupInto(db: Db, folder: string, nativeBinding?: string): Promise<BackupReport> {
  const dir = resolve(folder);
  const at = new Date().toISOString();
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    throw storageError(e, join(dir, 'x.sqlite'), 'Making the backup folder') ?? e;
  }
  let path = join(dir, `beamwarden-backup-${fileStamp(at)}Z.sqlite`);
  for (let n = 2; existsSync(path); n++) path = join(dir, `beamwarden-backup-${fileStamp(at)}Z-${n}.sqlite`);
  try {
    await backupTo(db, path, nativeBinding);
  } catch (e) {
    throw storageError(e, path, 'The backup') ?? e;
  }
  const bytes = statSync(path).size;
  db.prepare('INSERT INTO audit_event (at, action, entity, entity_id, detail) VALUES (?, ?, ?, ?, ?)').run(at, 'backed-up', 'database', db.name, path);
  return { path, at, bytes };
}

/** What the app shows: the last backup and the backups in the folder. */
export function backupStatus(db: Db, folder: string): BackupStatus {
  const last = db.prepare("SELECT at, detail FROM audit_event WHERE action = 'backed-up' ORDER BY at DESC, seq DESC LIMIT 1").get() as
    | { at: string; detail: string }
    | undefined;
  return { databasePath: db.name, folder, lastBackupAt: last?.at ?? null, lastBackupPath: last?.detail ?? null, backups: listBackups(folder) };
}

export function listBackups(folder: string): BackupFile[] {
  if (!existsSync(folder)) return [];
  const out: BackupFile[] = [];
  for (const name of readdirSync(folder)) {
    const m = BACKUP_FILE.exec(name.replace(/-\d+\.sqlite$/, '.sqlite'));
    if (!m?.[1]) continue;
    const [d, t] = m[1].split('T') as [string, string];
    const path = join(folder, name);
    out.push({ path, name, at: `${d}T${t.replace(/-/g, ':')}Z`, bytes: statSync(path).size });
  }
  return out.sort((a, b) => (a.name < b.name ? 1 : -1));
}

/**
 * `npm run backup`: a backup of a database file that may be open in a running Beamwarden (the
 * online backup reads a consistent state while it keeps working; no write lock is needed).
 */
export async function backupDatabaseFile(args: { db: string; out: string; nativeBinding?: string }): Promise<BackupReport> {
  const dbPath = resolve(args.db);
  if (!existsSync(dbPath)) throw new RecordError('not-found', `There is no database at ${dbPath}`);
  let db: Db;
  try {
    db = new Database(dbPath, { fileMustExist: true, ...(args.nativeBinding !== undefined ? { nativeBinding: args.nativeBinding } : {}) });
  } catch (e) {
    throw storageError(e, dbPath, 'Opening the database') ?? e;
  }
  try {
    db.pragma('busy_timeout = 5000');
    return await backupInto(db, args.out, args.nativeBinding);
  } finally {
    db.close();
  }
}
