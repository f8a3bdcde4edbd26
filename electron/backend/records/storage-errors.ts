/**
 * What the disk or folder refused, said plainly: read-only location, unchangeable (immutable)
 * file, full disk, missing folder, no permission, another program's lock. Each has its own
 * message, at start (openDatabase probes before SQLite opens, because SQLite silently falls back
 * to read-only on a file it cannot write and the first save would fail instead) or at the action
 * that failed. None of them says the database is damaged: it is not.
 */
import { closeSync, existsSync, mkdirSync, openSync, unlinkSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { RecordError } from './types.js';

const NOT_DAMAGED = 'The records themselves are not damaged.';

/** Error codes of Node (errno) and SQLite (extended result codes, as better-sqlite3 names them). */
function codeOf(e: unknown): string {
  return typeof e === 'object' && e !== null && 'code' in e ? String((e as { code: unknown }).code) : '';
}

export function isStorageCode(code: string): boolean {
  return (
    /^(ENOSPC|EDQUOT|EROFS|EACCES|EPERM|ENOENT|ENOTDIR|EIO)$/.test(code) ||
    /^SQLITE_(FULL|READONLY|IOERR|CANTOPEN|PERM|BUSY|LOCKED)/.test(code)
  );
}

/** Why `dbPath` (or its folder) cannot be written, found by trying; null when it can. */
export function diagnoseWritable(dbPath: string): { code: string; message: string } | null {
  const folder = dirname(dbPath);
  if (!existsSync(folder)) return { code: 'ENOENT', message: missingFolder(folder) };
  const probe = join(folder, `.${basename(dbPath)}.write-check-${process.pid}`);
  try {
    writeFileSync(probe, '');
    unlinkSync(probe);
  } catch (e) {
    try {
      unlinkSync(probe);
    } catch {
      /* never created */
    }
    return { code: codeOf(e), message: folderMessage(codeOf(e), folder) };
  }
  if (existsSync(dbPath)) {
    try {
      closeSync(openSync(dbPath, 'r+'));
    } catch (e) {
      return { code: codeOf(e), message: fileMessage(codeOf(e), dbPath) };
    }
  }
  return null;
}

function missingFolder(folder: string): string {
  return `The folder ${folder} does not exist (is the drive or network share connected?). Connect it, or choose another folder for the database (BEAMWARDEN_DATA_DIR or --db).`;
}

function folderMessage(code: string, folder: string): string {
  switch (code) {
    case 'EROFS':
      return `The folder ${folder} is on a read-only disk or share: Beamwarden can read there but not save. Make it writable, or move the database to a writable folder (BEAMWARDEN_DATA_DIR or --db). ${NOT_DAMAGED}`;
    case 'ENOSPC':
    case 'EDQUOT':
      return fullMessage(folder, 'Opening the database');
    case 'EPERM':
      return `The folder ${folder} is marked unchangeable (immutable): nothing can be saved there. Remove the mark (on Linux: chattr -i) or move the database. ${NOT_DAMAGED}`;
    default:
      return `You may not write in the folder ${folder} (${code}): Beamwarden cannot save there. Ask for write permission, or move the database to a folder of your own. ${NOT_DAMAGED}`;
  }
}

function fileMessage(code: string, path: string): string {
  switch (code) {
    case 'EROFS':
      return folderMessage(code, dirname(path));
    case 'EPERM':
      return `The database file ${path} is marked unchangeable (immutable, or locked by the system): Beamwarden can read it but cannot save into it. Remove the mark (on Linux: chattr -i ${path}) or copy the file to another folder and open the copy. ${NOT_DAMAGED}`;
    default:
      return `You may not write the database file ${path} (${code}): Beamwarden can read it but cannot save into it. Ask for write permission, or copy it to a folder of your own. ${NOT_DAMAGED}`;
  }
}

function fullMessage(where: string, action: string): string {
  return `The disk holding ${where} is full: ${action} could not be saved, and nothing of it was written. Free some space on that disk (or move the database to another one), then try again.`;
}

/**
 * The storage error behind `e`, as a RecordError ('storage', or 'in-use' for another program's
 * lock), or null when `e` is not one. `action` names what failed ("Saving the assessment").
 */
export function storageError(e: unknown, dbPath: string, action: string): RecordError | null {
  if (e instanceof RecordError) return null;
  const code = codeOf(e);
  if (!isStorageCode(code)) return null;
  if (code === 'ENOSPC' || code === 'EDQUOT' || code === 'SQLITE_FULL') {
    return new RecordError('storage', fullMessage(dirname(dbPath), action));
  }
  if (code.startsWith('SQLITE_BUSY') || code.startsWith('SQLITE_LOCKED')) {
    return new RecordError('in-use', `${action}: the database ${dbPath} is busy, locked by another program for longer than 5 seconds. Close other programs that use it and try again. Nothing was changed.`);
  }
  if (code === 'ENOENT' || code === 'ENOTDIR') return new RecordError('storage', `${action}: ${missingFolder(dirname(dbPath))}`);
  const found = diagnoseWritable(dbPath);
  if (found) return new RecordError('storage', `${action} failed. ${found.message}`);
  if (code.startsWith('SQLITE_READONLY') || code === 'EROFS' || code === 'EACCES' || code === 'EPERM' || code === 'SQLITE_PERM') {
    return new RecordError('storage', `${action} failed: ${dbPath} cannot be written just now (${code}). ${NOT_DAMAGED}`);
  }
  return new RecordError(
    'storage',
    `${action} failed: the disk or share holding ${dbPath} reported an error (${code}). The last saved state is kept; check the disk or network connection, then try again.`,
  );
}

/** Before opening for writing: the folder (created when only its last level is missing) and the file. */
export function checkWritableAtStart(dbPath: string): void {
  const folder = dirname(dbPath);
  if (!existsSync(folder) && existsSync(dirname(folder))) {
    try {
      mkdirSync(folder);
    } catch (e) {
      throw storageError(e, dbPath, 'Creating the database folder') ?? e;
    }
  }
  const found = diagnoseWritable(dbPath);
  if (found) throw new RecordError('storage', found.message);
}
