/**
 * The embedded engine: one SQLite file through better-sqlite3. What only SQLite has stays here and
 * in the modules it calls: the write-lock file (write-lock.ts), opening with pragmas, integrity check
 * and migrations (database.ts), online backup (backup.ts, safekeeping.ts), the trigger check
 * (protections.ts) and SQLite's error codes. Raw use of the connection goes through the port's
 * lock (`exclusive`), so it never lands inside another request's transaction.
 */
import { backupTo } from './backup.js';
import type { EngineSeam } from './context.js';
import { openDatabase } from './database.js';
import type { RecordEngine } from './engine.js';
import { missingProtections } from './protections.js';
import { backupInto, backupStatus } from './safekeeping.js';
import { SqliteSqlPort } from './sqlite-port.js';
import { storageError } from './storage-errors.js';
import { RecordError } from './types.js';
import { acquireWriteLock } from './write-lock.js';

/** Map SQLite constraint errors (raised by our triggers and keys) to RecordError with plain words. */
export function translateSqliteError(e: unknown, what: string, dbPath?: string): unknown {
  if (!(e instanceof Error) || !('code' in e)) return e;
  const code = String((e as { code: unknown }).code);
  const storage = dbPath !== undefined ? storageError(e, dbPath, what) : null;
  if (storage) return storage;
  if (e.message.startsWith('beamwarden: ')) return new RecordError('immutable', e.message.slice('beamwarden: '.length));
  if (code === 'SQLITE_CONSTRAINT_FOREIGNKEY') {
    return new RecordError('conflict', `${what} cannot be saved as it is: it refers to a record that is not in the register, or other records still refer to it. Nothing was changed.`);
  }
  if (code === 'SQLITE_CONSTRAINT_UNIQUE' || code === 'SQLITE_CONSTRAINT_PRIMARYKEY') return new RecordError('conflict', `${what}: ${e.message.replace(/^UNIQUE constraint failed: /, 'already exists: ')}`);
  return e;
}

/** What the records logic needs from SQLite besides the port (context.ts EngineSeam). */
export function sqliteSeam(port: SqliteSqlPort, path: string): EngineSeam {
  return {
    location: path,
    insertionOrder: 'rowid',
    rowLock: '',
    translateError: (e, what, storage) => translateSqliteError(e, what, storage ? path : undefined),
    missingProtections: () => port.exclusive((db) => missingProtections(db)),
    lastWriter: () => Promise.resolve(null),
  };
}

export interface SqliteEngineOptions {
  readonly nativeBinding?: string;
  readonly readonly?: boolean;
}

/** Open (creating and migrating) the SQLite file at `path`, holding its write lock unless read-only. */
export function openSqliteEngine(path: string, options: SqliteEngineOptions = {}): RecordEngine & { readonly port: SqliteSqlPort } {
  const readonly = options.readonly === true;
  const nativeBinding = options.nativeBinding;
  const releaseLock = readonly ? () => {} : acquireWriteLock(path);
  let opened: ReturnType<typeof openDatabase>;
  try {
    opened = openDatabase(path, { ...(nativeBinding !== undefined ? { nativeBinding } : {}), readonly });
  } catch (e) {
    releaseLock();
    throw e;
  }
  const port = new SqliteSqlPort(opened.db);
  let closing: Promise<void> | null = null;
  const seam = sqliteSeam(port, path);
  return {
    port,
    seam,
    schemaVersion: opened.schemaVersion,
    migrationBackups: opened.migrationBackups,
    // The copy is taken with the connection to itself: a transaction held open across awaits must
    // not be half in the copy (the online backup reads through this same connection).
    backup: (dest) => port.exclusive((db) => backupTo(db, dest, nativeBinding)),
    backupInto: (folder) => port.exclusive((db) => backupInto(db, folder, nativeBinding)),
    backupStatus: (folder) => port.exclusive((db) => backupStatus(db, folder)),
    // Closing twice is a no-op (the verify command closes before handing the file to its workers).
    close: () =>
      (closing ??= port.close().finally(() => {
        releaseLock();
      })),
  };
}
