/**
 * One Beamwarden writes one database file at a time. SQLite's own locks keep single transactions
 * whole, but two programs that each read a record, let an officer edit it and write it back would
 * still overwrite each other's work; a second program opening the file for writing is therefore
 * refused and told plainly which program has it.
 *
 * The mark is a lock file beside the database (`<database>.lock`: process id, machine, since when),
 * created exclusively (O_EXCL). Within one process several stores may share it (windows of one
 * app; tests). A lock left by a program that ended without closing (crash, power cut) is taken
 * over when its process no longer runs on this machine. Opening read-only (reports, backups)
 * needs no lock.
 */
import { readFileSync, unlinkSync, writeFileSync } from 'node:fs';
import { hostname } from 'node:os';
import { clockTime } from './assessments.js';
import { storageError } from './storage-errors.js';
import { RecordError } from './types.js';

interface LockInfo {
  readonly pid: number;
  readonly host: string;
  readonly since: string;
}

const held = new Map<string, number>();

export function lockFileOf(dbPath: string): string {
  return `${dbPath}.lock`;
}

function readLock(file: string): LockInfo | null {
  try {
    const v: unknown = JSON.parse(readFileSync(file, 'utf8'));
    if (typeof v === 'object' && v !== null && 'pid' in v && 'host' in v && 'since' in v) {
      const { pid, host, since } = v as Record<string, unknown>;
      if (typeof pid === 'number' && typeof host === 'string' && typeof since === 'string') return { pid, host, since };
    }
    return null;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
    return { pid: -1, host: '?', since: '' };
  }
}

function processRuns(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** The program holding the lock, or null when none (or only a stale lock) exists. */
export function lockHolder(dbPath: string): LockInfo | null {
  if ((held.get(dbPath) ?? 0) > 0) return { pid: process.pid, host: hostname(), since: '' };
  const info = readLock(lockFileOf(dbPath));
  if (info === null) return null;
  if (info.host === hostname() && (info.pid === process.pid || !processRuns(info.pid))) return null;
  return info;
}

export function inUseMessage(dbPath: string, info: LockInfo): string {
  const who = info.pid === process.pid ? 'this Beamwarden' : `another Beamwarden (process ${info.pid} on ${info.host}${info.since ? `, since ${clockTime(info.since)}` : ''})`;
  return (
    `The database ${dbPath} is already open for writing in ${who}. Close Beamwarden there first: two programs saving into one file would overwrite each other's work. ` +
    `(If no Beamwarden runs there any more, delete ${lockFileOf(dbPath)}.)`
  );
}

/** Take the write lock of `dbPath` (or share this process's); returns the release function. */
export function acquireWriteLock(dbPath: string): () => void {
  const file = lockFileOf(dbPath);
  const mine = held.get(dbPath) ?? 0;
  if (mine === 0) {
    const info: LockInfo = { pid: process.pid, host: hostname(), since: new Date().toISOString() };
    for (let attempt = 0; ; attempt++) {
      try {
        writeFileSync(file, JSON.stringify(info), { flag: 'wx', mode: 0o644 });
        break;
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code !== 'EEXIST') {
          throw storageError(e, dbPath, 'Opening the database') ?? e;
        }
        const holder = lockHolder(dbPath);
        if (holder !== null || attempt > 0) throw new RecordError('in-use', inUseMessage(dbPath, holder ?? { pid: -1, host: '?', since: '' }));
        // Stale: its program no longer runs on this machine.
        try {
          unlinkSync(file);
        } catch {
          /* another program may have taken it over meanwhile: the next attempt tells */
        }
      }
    }
  }
  held.set(dbPath, mine + 1);
  let released = false;
  return () => {
    if (released) return;
    released = true;
    const left = (held.get(dbPath) ?? 1) - 1;
    if (left > 0) {
      held.set(dbPath, left);
      return;
    }
    held.delete(dbPath);
    removeOwnLock(dbPath);
  };
}

function removeOwnLock(dbPath: string): void {
  const file = lockFileOf(dbPath);
  const info = readLock(file);
  if (info !== null && info.pid === process.pid && info.host === hostname()) {
    try {
      unlinkSync(file);
    } catch {
      /* already gone */
    }
  }
}

// A process that exits without closing its stores still leaves no lock behind.
process.on('exit', () => {
  for (const path of held.keys()) removeOwnLock(path);
});
