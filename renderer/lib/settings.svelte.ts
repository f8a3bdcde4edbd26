/** The officer's display preferences, kept in this browser profile / app window (not in records). */
import type { UnitHabit } from '../../core/index.js';

const KEY = 'beamwarden.settings.v1';

interface Stored {
  units: UnitHabit;
  paper: 'A4' | 'Letter';
  /** Remind when the last backup is older than this many days (1-365). */
  backupReminderDays: number;
}

export const DEFAULT_BACKUP_REMINDER_DAYS = 7;

function reminderDays(v: unknown): number {
  return typeof v === 'number' && Number.isInteger(v) && v >= 1 && v <= 365 ? v : DEFAULT_BACKUP_REMINDER_DAYS;
}

function load(): Stored {
  try {
    const raw: unknown = JSON.parse(localStorage.getItem(KEY) ?? '{}');
    const o = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
    return { units: o['units'] === 'ANSI' ? 'ANSI' : 'SI', paper: o['paper'] === 'Letter' ? 'Letter' : 'A4', backupReminderDays: reminderDays(o['backupReminderDays']) };
  } catch {
    return { units: 'SI', paper: 'A4', backupReminderDays: DEFAULT_BACKUP_REMINDER_DAYS };
  }
}

class Settings {
  units = $state<UnitHabit>('SI');
  paper = $state<'A4' | 'Letter'>('A4');
  backupReminderDays = $state(DEFAULT_BACKUP_REMINDER_DAYS);
  constructor() {
    const s = load();
    this.units = s.units;
    this.paper = s.paper;
    this.backupReminderDays = s.backupReminderDays;
  }
  save(): void {
    this.backupReminderDays = reminderDays(this.backupReminderDays);
    try {
      localStorage.setItem(KEY, JSON.stringify({ units: this.units, paper: this.paper, backupReminderDays: this.backupReminderDays }));
    } catch {
      // storage may be unavailable (private window); the choice still holds for this session
    }
  }
}

export const settings = new Settings();
