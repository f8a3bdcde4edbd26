/**
 * Opening the SQLite file: checks, pragmas and migrations.
 *
 * - `integrity_check` at every open, with a clear error naming the file and what to do.
 * - WAL journal (readers never block the writer; a crash leaves only whole transactions) with
 *   synchronous=FULL, so a signed record survives a power cut once `sign` has returned
 *   (SQLite documentation, "Write-Ahead Logging" and "PRAGMA synchronous").
 * - foreign_keys ON (SQLite leaves it off by default, per connection).
 * - 16 KiB pages for new files (see below).
 * - Migrations forward-only, each in one IMMEDIATE transaction together with its `user_version`
 *   and `schema_migrations` entry; a copy of the file is written (VACUUM INTO) before the first.
 * - A database newer than this code, or with a migration history that is not a prefix of ours,
 *   is refused: an old build must never write to a newer schema.
 */
import Database from 'better-sqlite3';
import { existsSync, statSync } from 'node:fs';
import { LATEST_VERSION, MIGRATIONS } from './migrations/index.js';
import { checkWritableAtStart, storageError } from './storage-errors.js';
import { RecordError } from './types.js';

/** SQLite says the file itself is damaged or not a database; anything else is not damage. */
function isDamage(e: unknown): boolean {
  const code = e instanceof Error && 'code' in e ? String((e as { code: unknown }).code) : '';
  return code === 'SQLITE_NOTADB' || code.startsWith('SQLITE_CORRUPT');
}

export type Db = Database.Database;

const PAGE_SIZE = 16_384;

export interface OpenDatabaseOptions {
  readonly nativeBinding?: string;
  readonly readonly?: boolean;
  /** Stop at this schema version (test fixtures only); default the latest. */
  readonly targetVersion?: number;
}

export interface OpenedDatabase {
  readonly db: Db;
  readonly schemaVersion: number;
  readonly migrationBackups: string[];
}

function sqliteMessage(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export function openDatabase(path: string, opts: OpenDatabaseOptions = {}): OpenedDatabase {
  const readonly = opts.readonly === true;
  const target = opts.targetVersion ?? LATEST_VERSION;
  if (!MIGRATIONS.some((m) => m.version === target)) {
    throw new RangeError(`targetVersion must be one of ${MIGRATIONS.map((m) => m.version).join(', ')}`);
  }
  if (!readonly) checkWritableAtStart(path);
  const existedBefore = existsSync(path) && statSync(path).size > 0;

  let db: Db;
  try {
    db = new Database(path, {
      readonly,
      fileMustExist: readonly,
      ...(opts.nativeBinding !== undefined ? { nativeBinding: opts.nativeBinding } : {}),
    });
  } catch (e) {
    if (!isDamage(e)) throw storageError(e, path, 'Opening the database') ?? new RecordError('storage', `Cannot open the database ${path}: ${sqliteMessage(e)}`);
    throw new RecordError('corrupt-database', `Cannot open the database ${path}: ${sqliteMessage(e)}`);
  }
  try {
    db.pragma('busy_timeout = 5000');
    checkIntegrity(db, path);
    if (!readonly && !existedBefore) {
      // New file: 16 KiB pages (before WAL fixes the size). Records carry results of tens of kB;
      // larger pages mean fewer overflow pages and about half the time for integrity_check at
      // open (measured in test/bench/records.bench.ts).
      db.pragma(`page_size = ${PAGE_SIZE}`);
    }
    if (!readonly) {
      const mode = db.pragma('journal_mode = WAL', { simple: true });
      if (mode !== 'wal') throw new RecordError('corrupt-database', `The database ${path} cannot use WAL journaling (got ${String(mode)})`);
      db.pragma('synchronous = FULL');
    }
    db.pragma('foreign_keys = ON');
    const migrationBackups = migrate(db, path, target, readonly, existedBefore);
    const schemaVersion = userVersion(db);
    return { db, schemaVersion, migrationBackups };
  } catch (e) {
    db.close();
    if (e instanceof RecordError) throw e;
    throw storageError(e, path, 'Opening the database') ?? e;
  }
}

function checkIntegrity(db: Db, path: string): void {
  let rows: string[];
  try {
    const result = db.pragma('integrity_check') as Array<{ integrity_check: string }>;
    rows = result.map((r) => r.integrity_check);
  } catch (e) {
    // A healthy file on a read-only disk, locked by another program or on a share that went away
    // is not damaged: say what it is instead.
    if (!isDamage(e)) throw storageError(e, path, 'Checking the database') ?? e;
    const code = e instanceof Error && 'code' in e ? String((e as { code: unknown }).code) : '';
    const what = code === 'SQLITE_NOTADB' ? 'is not a database file' : code.startsWith('SQLITE_CORRUPT') ? 'is damaged' : 'cannot be checked';
    throw new RecordError(
      'corrupt-database',
      `${path} ${what} (SQLite: ${sqliteMessage(e)}). Do not keep working in it: restore it from a backup (README: "Backup and restore").`,
    );
  }
  if (rows.length !== 1 || rows[0] !== 'ok') {
    throw new RecordError(
      'corrupt-database',
      `The database ${path} failed its integrity check: ${rows.slice(0, 5).join('; ')}${rows.length > 5 ? ` (and ${rows.length - 5} more)` : ''}. ` +
        'Do not keep working in it: restore it from a backup (README: "Backup and restore").',
    );
  }
}

function userVersion(db: Db): number {
  const v = db.pragma('user_version', { simple: true });
  if (typeof v !== 'number') throw new RecordError('corrupt-database', 'PRAGMA user_version is not a number');
  return v;
}

function hasTable(db: Db, name: string): boolean {
  return db.prepare("SELECT 1 FROM sqlite_schema WHERE type = 'table' AND name = ?").get(name) !== undefined;
}

function checkHistory(db: Db, path: string, version: number): void {
  if (version > LATEST_VERSION) {
    throw new RecordError(
      'newer-database',
      `The database ${path} has schema version ${version}, newer than this Beamwarden build understands (${LATEST_VERSION}). ` +
        'Open it with the newer Beamwarden that wrote it; this build will not change it.',
    );
  }
  if (version === 0) {
    const tables = db.prepare("SELECT count(*) AS n FROM sqlite_schema WHERE type = 'table'").get() as { n: number };
    if (tables.n > 0) {
      throw new RecordError('corrupt-database', `${path} is an SQLite database but not a Beamwarden one (it has tables but no Beamwarden schema version).`);
    }
    return;
  }
  if (!hasTable(db, 'schema_migrations')) {
    throw new RecordError('corrupt-database', `${path} has schema version ${version} but no migration history: not a Beamwarden database.`);
  }
  const applied = db.prepare('SELECT version, name FROM schema_migrations ORDER BY version').all() as Array<{ version: number; name: string }>;
  const isPrefix =
    applied.length > 0 &&
    applied[applied.length - 1]?.version === version &&
    applied.every((row, i) => row.version === MIGRATIONS[i]?.version && row.name === MIGRATIONS[i]?.name);
  if (!isPrefix) {
    throw new RecordError(
      'corrupt-database',
      `The migration history of ${path} (${applied.map((r) => `${r.version}:${r.name}`).join(', ')}) does not match this build's; it was written by another build.`,
    );
  }
}

function backupName(path: string, fromVersion: number): string {
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  return `${path}.before-migration-v${fromVersion}-${stamp}.sqlite`;
}

function migrate(db: Db, path: string, target: number, readonly: boolean, existedBefore: boolean): string[] {
  const backups: string[] = [];
  let version = userVersion(db);
  checkHistory(db, path, version);
  if (version >= target) return backups;
  if (readonly) {
    throw new RecordError('migration-failed', `The database ${path} has schema version ${version} and needs migrating to ${target}; open it read-write once.`);
  }
  if (existedBefore && version > 0) {
    // A consistent copy of the whole database (including what is still in the WAL) before any change.
    const copy = backupName(path, version);
    db.prepare('VACUUM INTO ?').run(copy);
    backups.push(copy);
  }
  let previous = 0;
  for (const m of MIGRATIONS) {
    if (m.version > target) break;
    const from = previous;
    previous = m.version;
    const apply = db.transaction(() => {
      // Re-read inside the write lock: another process may have migrated meanwhile.
      const now = userVersion(db);
      if (now >= m.version) return;
      if (now !== from) throw new RecordError('migration-failed', `Cannot apply migration ${m.version} to schema version ${now}`);
      db.exec(m.sql);
      db.prepare('INSERT INTO schema_migrations (version, name, applied_at) VALUES (?, ?, ?)').run(m.version, m.name, new Date().toISOString());
      if (!Number.isInteger(m.version)) throw new Error('migration version must be an integer');
      // PRAGMA takes no bound parameters; m.version is an integer from our own list.
      db.pragma(`user_version = ${m.version}`);
    });
    try {
      apply.immediate();
    } catch (e) {
      if (e instanceof RecordError) throw e;
      throw new RecordError(
        'migration-failed',
        `Migration ${m.version} (${m.name}) of ${path} failed and was rolled back: ${sqliteMessage(e)}` +
          (backups.length ? `. The copy made before migrating is ${backups[0]}` : ''),
      );
    }
    version = m.version;
  }
  return backups;
}
