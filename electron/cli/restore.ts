/**
 * `npm run restore -- --from <backup> [--db <file>]`: replace the records with a backup. Refused
 * while any Beamwarden has the database open (close it first, or use "Restore from backup" in the
 * app). The backup is checked first; the replaced database is kept beside it. Without --from, lists
 * the backups found beside the database.
 */
import { defaultBackupFolder, defaultDatabasePath, listBackups, restoreBackup } from '../backend/records/index.js';
import { isServerAddress } from '../backend/records/address.js';
import { NO_SERVER_BACKUP } from '../backend/records/pg-engine.js';
import { RestoreArgsSchema } from './safekeeping-args.js';
import { parseCommandArgs } from './command-args.js';

const USAGE = 'usage: npm run restore -- --from <backup file> [--db <database file>]';

async function main(): Promise<void> {
  const args = parseCommandArgs(RestoreArgsSchema, process.argv.slice(2), USAGE);
  const db = args.db ?? defaultDatabasePath();
  // The institution register's backups are the server's (README "Institution register").
  if (isServerAddress(db)) throw new Error(NO_SERVER_BACKUP);
  if (args.from === undefined) {
    const found = listBackups(defaultBackupFolder(db));
    const list = found.length ? found.map((b) => `  ${b.path}  (${(b.bytes / 1e6).toFixed(1)} MB)`).join('\n') : '  (none)';
    throw new Error(`name the backup with --from. Backups beside ${db}, newest first:\n${list}\n${USAGE}`);
  }
  const r = await restoreBackup({ from: args.from, to: db });
  process.stdout.write(
    `Restored ${r.path}\n    from ${r.restoredFrom} (schema version ${r.schemaVersion})\n` +
      (r.previousCopy ? `The replaced database is kept as ${r.previousCopy}\n` : ''),
  );
}

main().catch((e: unknown) => {
  process.stderr.write(`beamwarden restore: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});
