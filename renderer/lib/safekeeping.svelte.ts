/**
 * Backups from the app: the status shown on Print & export and in the reminder, "Back up now" and
 * "Restore from backup". The reminder appears when the last backup is older than the officer's
 * setting (default 7 days) or there is none.
 */
import type { BackupFile, BackupStatus } from '../../electron/api/contracts/records.js';
import { invoke } from './api.js';
import { confirmChoice } from './confirm-choice.js';
import { localMinute } from './format.js';
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

  /** Replace the records with a backup, after one confirmation that names the backup's date and what goes. */
  async restore(backup: BackupFile): Promise<void> {
    const path = backup.path;
    const made = localMinute(backup.at);
    const unsaved = session.unsavedChanges();
    const title = session.draft?.title.trim() || 'Laser hazard assessment';
    const ok = await confirmChoice({
      title: 'Replace the records with an earlier backup?',
      body: `The backup was made ${made}: ${backup.name} (${(backup.bytes / 1e6).toFixed(1)} MB).`,
      consequencesIntro: 'The open records then no longer show:',
      consequences: [
        `Everything entered, saved, signed or checked after ${made}: sites, rooms, lasers, eyewear, assessments and signatures`,
        ...(unsaved.length > 0 ? [`The ${unsaved.length === 1 ? 'unsaved change' : `${unsaved.length} unsaved changes`} of the open assessment “${title}”: ${unsaved.join('; ')}`] : []),
      ],
      kept:
        `The backup is checked first, and the current database is kept beside it as a “…replaced-<time>.sqlite” file, so work saved after ${made} can be taken back from it.` +
        (unsaved.length > 0 ? ' Unsaved changes are not in that file: to keep them, cancel and save first.' : ''),
      confirmLabel: 'Replace the records',
      danger: true,
    });
    if (!ok) return;
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
