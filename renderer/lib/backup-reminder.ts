/** When to remind the officer to back up (pure; the default of 7 days is in settings.svelte.ts). */

/** No backup yet, or the last one older than `days` days. */
export function backupDue(lastBackupAt: string | null, days: number, now: Date = new Date()): boolean {
  if (lastBackupAt === null) return true;
  const last = Date.parse(lastBackupAt);
  return Number.isNaN(last) || now.getTime() - last > days * 86_400_000;
}

/** "today", "yesterday", "9 days ago", "never". */
export function backupAge(lastBackupAt: string | null, now: Date = new Date()): string {
  if (lastBackupAt === null) return 'never';
  const days = Math.floor((now.getTime() - Date.parse(lastBackupAt)) / 86_400_000);
  return days <= 0 ? 'today' : days === 1 ? 'yesterday' : `${days} days ago`;
}
