/**
 * `npm run backup -- [--db <file>] [--out <folder>]`: a checked backup of the records, also while
 * Beamwarden is running (SQLite's online backup reads a consistent state). Defaults: the database
 * in the user-data folder, and the `backups` folder beside it. The backup is recorded in the
 * database, so the app's reminder knows about it.
 */
import { backupDatabaseFile, defaultBackupFolder, defaultDatabasePath } from '../backend/records/index.js';
import { isServerAddress } from '../backend/records/address.js';
import { NO_SERVER_BACKUP } from '../backend/records/pg-engine.js';
import { BackupArgsSchema } from './safekeeping-args.js';
import { parseCommandArgs } from './command-args.js';

const USAGE = 'usage: npm run backup -- [--db <database file>] [--out <folder>]';

async function main(): Promise<void> {
  const args = parseCommandArgs(BackupArgsSchema, process.argv.slice(2), USAGE);
  const db = args.db ?? defaultDatabasePath();
  // The institution register's backups are the server's (README "Institution register").
  if (isServerAddress(db)) throw new Error(NO_SERVER_BACKUP);
  const report = await backupDatabaseFile({ db, out: args.out ?? defaultBackupFolder(db) });
  process.stdout.write(`Backed up ${db}\n      to ${report.path} (${(report.bytes / 1e6).toFixed(1)} MB; integrity checked)\n`);
}

main().catch((e: unknown) => {
  process.stderr.write(`beamwarden backup: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});
