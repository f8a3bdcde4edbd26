/**
 * The institution register: the record store on a PostgreSQL server through node-postgres (`pg`).
 * What only the server engine has stays here: the pool, the first connection with its plain
 * refusals (pg-errors.ts), numbered migrations with their own PostgreSQL SQL (one list of versions
 * with SQLite: migrations/index.ts), the protections check (pg-protections.ts) and the row lock
 * used by the records logic before a check-then-write (context.ts lockRow).
 *
 * Never a fallback: when the server cannot be reached or refuses, opening fails with the reason; no
 * local file is opened instead. Backups are the server's business (pg_dump or the IT department's
 * backup): the store's backup operations answer so.
 */
import pg from 'pg';
import { describeAddress } from './address.js';
import type { EngineSeam } from './context.js';
import type { RecordEngine } from './engine.js';
import { LATEST_VERSION, MIGRATIONS } from './migrations/index.js';
import { connectionError, translatePgError } from './pg-errors.js';
import { PgSqlPort, registerTypes } from './pg-port.js';
import { missingPgProtections } from './pg-protections.js';
import { RecordError } from './types.js';

export interface PgEngineOptions {
  /** Do not migrate (verify, copy checks): the register must already be at this build's version. */
  readonly readonly?: boolean;
  /** Stop at this schema version (test fixtures only); default the latest. */
  readonly targetVersion?: number;
  /** Connections kept by this desk (default 4). */
  readonly poolSize?: number;
}

export const NO_SERVER_BACKUP =
  'Backup and restore from Beamwarden are not available on an institution register: the register lives on your PostgreSQL server, so use your server\'s backup (pg_dump, or your IT department\'s backup of the database).';

/** Same lock key for every desk: two hosts opening a new register do not migrate it twice at once. */
const MIGRATION_LOCK = "SELECT pg_advisory_xact_lock(hashtext(current_schema() || ':beamwarden-migrations'))";

async function appliedHistory(client: pg.PoolClient, where: string): Promise<number> {
  const schema = await client.query<{ s: string | null }>('SELECT current_schema() AS s');
  if ((schema.rows[0]?.s ?? null) === null) {
    // pg_namespace is readable by every account: a register that is there but not usable is a
    // matter of rights (the account is in neither group role of the README's set-up).
    const there = await client.query<{ who: string; present: boolean }>(
      "SELECT session_user AS who, EXISTS (SELECT 1 FROM pg_namespace WHERE nspname = ANY (current_schemas(false)::text[] || string_to_array(replace(current_setting('search_path'), ' ', ''), ','))) AS present",
    );
    const row = there.rows[0];
    if (row?.present) {
      throw new RecordError(
        'not-permitted',
        `The institution register at ${where} is there, but your account ${row.who} has no rights on it: it is in neither group role of the register (beamwarden_officer to write, beamwarden_reader to read). ` +
          'Ask the register\'s administrator to add your account to one of them (README: "Institution register"). Beamwarden did not open a local file instead.',
      );
    }
    throw new RecordError('server', `The institution register at ${where} has no schema to work in: the schema named in the address (search_path) does not exist. Check the address, or ask the register's administrator. Beamwarden did not open a local file instead.`);
  }
  // One statement, one snapshot: another desk may be committing the first migration meanwhile.
  const tables = await client.query<{ history: number; n: number }>(
    "SELECT count(*) FILTER (WHERE tablename = 'schema_migrations')::int AS history, count(*)::int AS n FROM pg_tables WHERE schemaname = current_schema()",
  );
  if ((tables.rows[0]?.history ?? 0) === 0) {
    if ((tables.rows[0]?.n ?? 0) > 0) {
      throw new RecordError('corrupt-database', `The database at ${where} holds other tables but no Beamwarden register. Point Beamwarden at an empty database (or schema) made for the register.`);
    }
    return 0;
  }
  const applied = (await client.query<{ version: number; name: string }>('SELECT version, name FROM schema_migrations ORDER BY version')).rows;
  const version = applied[applied.length - 1]?.version ?? 0;
  if (version > LATEST_VERSION) {
    throw new RecordError(
      'newer-database',
      `The institution register at ${where} has schema version ${version}, newer than this Beamwarden build understands (${LATEST_VERSION}). Install the Beamwarden version your institution uses; this build will not change the register.`,
    );
  }
  const isPrefix = applied.every((row, i) => row.version === MIGRATIONS[i]?.version && row.name === MIGRATIONS[i]?.name);
  if (!isPrefix) {
    throw new RecordError('corrupt-database', `The migration history of the institution register at ${where} (${applied.map((r) => `${r.version}:${r.name}`).join(', ')}) does not match this build's; it was written by another build.`);
  }
  return version;
}

/** Brings the register to `target`, each migration in one transaction under the migration lock. */
async function migrate(pool: pg.Pool, where: string, target: number, readonly: boolean): Promise<number> {
  const client = await pool.connect();
  try {
    let version = await appliedHistory(client, where);
    if (version >= target) return version;
    const user = (await client.query<{ u: string }>('SELECT session_user AS u')).rows[0]?.u ?? '';
    if (readonly) {
      throw new RecordError('migration-failed', `The institution register at ${where} has schema version ${version} and needs setting up to ${target}; it was opened read-only. Open it once with the register owner's account.`);
    }
    for (const m of MIGRATIONS) {
      if (m.version > target) break;
      try {
        await client.query('BEGIN');
        await client.query(MIGRATION_LOCK);
        // Re-read under the lock: another desk may have migrated meanwhile.
        const now = await appliedHistory(client, where);
        if (now < m.version) {
          await client.query(m.postgresql);
          await client.query('INSERT INTO schema_migrations (version, name, applied_at) VALUES ($1, $2, $3)', [m.version, m.name, new Date().toISOString()]);
        }
        await client.query('COMMIT');
        version = Math.max(now, m.version);
      } catch (e) {
        await client.query('ROLLBACK').catch(() => undefined);
        if (e instanceof RecordError) throw e;
        if (field(e, 'code') === '42501') {
          throw new RecordError(
            'migration-failed',
            `The institution register at ${where} is not set up for this Beamwarden build (schema version ${version}, this build needs ${target}), and your account ${user} may not change its tables. Ask the register's administrator to open it once with the owner's account (README: "Institution register").`,
          );
        }
        throw new RecordError('migration-failed', `Migration ${m.version} (${m.name}) of the institution register at ${where} failed and was rolled back: ${e instanceof Error ? e.message : String(e)}`);
      }
    }
    // Rights for the group roles the administrator made (README), new tables included; under the
    // migration lock, since two desks granting at once collide in the catalog.
    try {
      await client.query('BEGIN');
      await client.query(MIGRATION_LOCK);
      await client.query('SELECT bw_grant_access()');
      await client.query('COMMIT');
    } catch (e) {
      await client.query('ROLLBACK').catch(() => undefined);
      throw e;
    }
    return version;
  } finally {
    client.release();
  }
}

function field(e: unknown, name: string): string {
  return typeof e === 'object' && e !== null && name in e ? String((e as Record<string, unknown>)[name]) : '';
}

/** What the records logic needs from PostgreSQL besides the port (context.ts EngineSeam). */
export function pgSeam(port: PgSqlPort, where: string, schemaVersion: number): EngineSeam {
  return {
    location: where,
    insertionOrder: 'insert_seq',
    rowLock: ' FOR UPDATE',
    translateError: (e, what) => translatePgError(e, what, where),
    missingProtections: () => missingPgProtections(port, schemaVersion),
    lastWriter: async (q, table, id) => (await q.get<{ by: string | null }>('SELECT bw_last_writer(?, ?) AS by', table, id))?.by ?? null,
  };
}

/** Connect to the register at `address`, check it and migrate it (when allowed); never falls back to a file. */
export async function openPgEngine(address: string, options: PgEngineOptions = {}): Promise<RecordEngine & { readonly port: PgSqlPort }> {
  const where = describeAddress(address);
  const target = options.targetVersion ?? LATEST_VERSION;
  if (!MIGRATIONS.some((m) => m.version === target)) throw new RangeError(`targetVersion must be one of ${MIGRATIONS.map((m) => m.version).join(', ')}`);
  const pool = new pg.Pool({
    connectionString: address.trim(),
    max: options.poolSize ?? 4,
    types: registerTypes,
    connectionTimeoutMillis: 10_000,
    application_name: 'beamwarden',
  });
  // An idle connection dropped by the server must not end the process; the next statement reconnects.
  pool.on('error', () => undefined);
  let schemaVersion: number;
  try {
    schemaVersion = await migrate(pool, where, target, options.readonly === true);
  } catch (e) {
    await pool.end().catch(() => undefined);
    if (e instanceof RecordError) throw e;
    throw connectionError(e, where) ?? translatePgError(e, 'Opening the institution register', where);
  }
  const port = new PgSqlPort(pool);
  const channel = (await pool.query<{ c: string }>("SELECT 'bw_changes_' || current_schema() AS c")).rows[0]?.c ?? 'bw_changes_public';
  const refused = (): Promise<never> => Promise.reject(new RecordError('storage', NO_SERVER_BACKUP));
  return {
    port,
    seam: pgSeam(port, where, schemaVersion),
    schemaVersion,
    migrationBackups: [],
    backup: refused,
    backupInto: refused,
    backupStatus: () => Promise.resolve({ databasePath: where, folder: '', lastBackupAt: null, lastBackupPath: null, backups: [] }),
    watch: async (listener) => {
      // A connection of its own: a pooled one would be handed to other work between notifications.
      const client = new pg.Client({ connectionString: address.trim(), application_name: 'beamwarden-changes' });
      client.on('error', () => undefined);
      client.on('notification', (n) => {
        if (n.channel !== channel || n.payload === undefined) return;
        try {
          const c = JSON.parse(n.payload) as { table?: unknown; key?: unknown; operation?: unknown; by?: unknown };
          listener({ table: String(c.table ?? ''), id: String(c.key ?? ''), operation: String(c.operation ?? ''), by: String(c.by ?? '') });
        } catch {
          // Not ours: ignored.
        }
      });
      await client.connect();
      await client.query(`LISTEN "${channel.replace(/"/g, '""')}"`);
      return () => client.end();
    },
    close: () => port.close(),
  };
}
