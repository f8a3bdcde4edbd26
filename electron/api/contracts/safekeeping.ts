/** Contract of the 'safekeeping' area: backups and restore, from the app. */
import type { BackupReport, BackupStatus, RestoreReport } from '../../backend/records/types.js';

export type SafekeepingHandlers = {
  'backup-status': (args: Record<string, never>) => Promise<BackupStatus>;
  /** A dated, checked copy in `folder` (default: the backups folder beside the database). */
  'backup-now': (args: { readonly folder?: string }) => Promise<BackupReport>;
  /**
   * Replace the database with the backup at `path`: the app closes its database first, restores
   * (the replaced file is kept beside it) and opens the restored one.
   */
  'restore-backup': (args: { readonly path: string }) => Promise<RestoreReport>;
};
