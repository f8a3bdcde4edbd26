/**
 * Backups from the app: the status shown on Print & export and in the reminder, "Back up now" and
 * "Restore from backup". The reminder appears when the last backup is older than the officer's
 * setting (default 7 days) or there is none.
 */
import type { BackupStatus } from '../../electron/backend/records/types.js';
import { invoke } from './api.js';
import { session } from './session.svelte.js';
import { settings } from './settings.svelte.js';
import { backupDue } from './backup-reminder.js';

export { backupAge, backupDue } from './backup-reminder.js';

class Safekeeping {
  status = $state<BackupStatus | null>(null);
  /** The reminder was put off for this session. */
  snoozed = $state(false);
  readonly due = $derived(this.status !== null && backupDue(this.status.lastBackupAt, settings.backupReminderDays));

  async load(): Promise<void> {
    try {
      this.status = await invoke('backup-status', {});
    } catch {
      // The status is a convenience; the screens work without it.
    }
  }

  async backupNow(folder?: string): Promise<void> {
    await session.run(async () => {
      const r = await invoke('backup-now', folder ? { folder } : {});
      session.say('ok', `Backed up and checked: ${r.path} (${(r.bytes / 1e6).toFixed(1)} MB).`);
      await this.load();
    });
  }

  async restore(path: string): Promise<void> {
    if (session.dirty && !window.confirm('The open assessment has unsaved changes, which the restore will not keep. Restore anyway?')) return;
    if (!window.confirm(`Replace the records with the backup\n${path}?\n\nThe current database is kept beside it as a ".replaced-…" file.`)) return;
    await session.run(async () => {
      const r = await invoke('restore-backup', { path });
      session.say('ok', `Restored from ${r.restoredFrom}. The replaced database is kept as ${r.previousCopy ?? '(none)'}.`);
      await this.load();
      // Start from the restored records: nothing of the previous database stays open on screen.
      session.draft = null;
      session.assessment = null;
      session.room = null;
      await session.init();
    });
  }
}

export const safekeeping = new Safekeeping();
