/**
 * What every handler may use. Built once per process by the Electron main process or the loopback
 * host; handlers never reach for globals, so the same table runs in both shells and in tests.
 */
import type { RecordStore } from '../backend/records/types.js';
import type { RegisterSource } from '../backend/records/register-setting.js';

export type ShellKind = 'electron' | 'loopback';

export interface ApiContext {
  readonly shell: ShellKind;
  readonly version: string;
  /** Absolute path of the SQLite database in use. */
  readonly databasePath: string;
  /** The open record store. Replaced (closed and opened again) by "Restore from backup". */
  store: RecordStore;
  /** Opens this shell's database again; without it the app cannot restore a backup itself. */
  readonly openStore?: () => Promise<RecordStore>;
  /** better-sqlite3 build for this runtime (Electron), when not the default. */
  readonly nativeBinding?: string;
  /** Where the register in force was named at start-up (--db, BEAMWARDEN_DB, the saved setting, the default file). */
  readonly registerSource?: RegisterSource;
  /** Folder of the institution register setting file (default: the user-data folder). */
  readonly settingsDir?: string;
}
