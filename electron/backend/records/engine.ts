/**
 * The engine seam: what the store needs from a database engine besides the SQL port. SQLite
 * (sqlite-engine.ts) opens a file with its pragmas, integrity check, migrations and write-lock file;
 * a server engine supplies its own opening, migrations and backups behind the same shape. The
 * records logic sees only the port and the seam (context.ts), never the engine's own objects.
 */
import type { EngineSeam } from './context.js';
import type { SqlPort } from './sql-port.js';
import type { BackupReport, BackupStatus } from './types.js';

export interface RecordEngine {
  readonly port: SqlPort;
  readonly seam: EngineSeam;
  readonly schemaVersion: number;
  /** Copies written before migrations during this open. */
  readonly migrationBackups: readonly string[];
  /** Online backup to `path` (a consistent copy while the store stays open). */
  backup(path: string): Promise<void>;
  /** A dated, checked copy in `folder`, recorded in the audit log. */
  backupInto(folder: string): Promise<BackupReport>;
  /** The last recorded backup and the backups in `folder`. */
  backupStatus(folder: string): Promise<BackupStatus>;
  /**
   * Calls `listener` for every change committed to the register by anyone (a server register:
   * LISTEN/NOTIFY on a connection of its own); absent where only this program writes (SQLite).
   * Resolves with the function that stops listening.
   */
  readonly watch?: (listener: (change: { table: string; id: string; operation: string; by: string }) => void) => Promise<() => Promise<void>>;
  /** Ends the connection (after running work) and releases what the engine holds (lock file, pool). */
  close(): Promise<void>;
}
