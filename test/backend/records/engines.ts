/**
 * The records tests run on both engines: the embedded SQLite file and the institution register on
 * a real PostgreSQL server (no imitation). `.ci/run` starts the machine's PostgreSQL, makes a
 * throw-away role and database, and sets BEAMWARDEN_TEST_PG to its address; without it the
 * PostgreSQL cases are listed as skipped with the reason in their name.
 *
 * Each test database is its own schema in that database (the address names it in search_path), so
 * "a fresh database" is as cheap on the server as a fresh temporary file.
 */
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, describe } from 'vitest';

export const PG_ADDRESS = process.env['BEAMWARDEN_TEST_PG'] ?? '';
export const PG_SKIP_REASON = 'skipped: BEAMWARDEN_TEST_PG is not set (.ci/run sets it to a throw-away PostgreSQL database)';

export type EngineName = 'sqlite' | 'postgresql';
export interface TestEngine {
  readonly name: EngineName;
  /** Shown in the test name; carries the reason when the engine is skipped. */
  readonly label: string;
  readonly skip: boolean;
}

export const ENGINES: readonly TestEngine[] = [
  { name: 'sqlite', label: 'SQLite file', skip: false },
  { name: 'postgresql', label: PG_ADDRESS ? 'PostgreSQL server' : `PostgreSQL server (${PG_SKIP_REASON})`, skip: PG_ADDRESS === '' },
];

/**
 * The engine of suites that name none (openTemp without an engine): SQLite, or the server with
 * BEAMWARDEN_TEST_ENGINE=postgresql, to try a whole suite on the server by hand (suites that read the
 * SQLite file with raw SQL then fail by design).
 */
export const DEFAULT_ENGINE: TestEngine | undefined = process.env['BEAMWARDEN_TEST_ENGINE'] === 'postgresql' && PG_ADDRESS !== '' ? ENGINES[1] : undefined;

let admin: pg.Pool | null = null;
function adminPool(): pg.Pool {
  admin ??= new pg.Pool({ connectionString: PG_ADDRESS, max: 2 });
  return admin;
}
afterAll(async () => {
  const a = admin;
  admin = null;
  await a?.end();
});

/** The schema standing for the database file `dir/name`: the same name opens the same schema. */
export function schemaFor(dir: string, name: string): string {
  return `t_${createHash('sha256').update(join(dir, name)).digest('hex').slice(0, 20)}`;
}

/** The address of the test register `schema` (made on first use) in the throw-away database. */
export async function pgAddress(schema: string): Promise<string> {
  await adminPool().query(`CREATE SCHEMA IF NOT EXISTS ${schema}`);
  const u = new URL(PG_ADDRESS);
  u.searchParams.set('options', `-c search_path=${schema}`);
  return u.toString();
}

/** A SQL statement as the test's administrator (the register's owner) in `schema`. */
export async function adminQuery<T extends pg.QueryResultRow>(schema: string, sql: string, params: unknown[] = []): Promise<T[]> {
  const client = await adminPool().connect();
  try {
    await client.query(`SET search_path = ${schema}`);
    return (await client.query<T>(sql, params)).rows;
  } finally {
    await client.query('RESET search_path').catch(() => undefined);
    client.release();
  }
}

/** Every row of every register table of `schema`, for "nothing changed" checks (raw SQL). */
export async function pgSnapshot(schema: string): Promise<string> {
  const tables = (await adminQuery<{ t: string }>(schema, "SELECT tablename AS t FROM pg_tables WHERE schemaname = $1 AND tablename <> 'write_record' ORDER BY tablename", [schema])).map((r) => r.t);
  const out: Record<string, unknown[]> = {};
  for (const t of tables) {
    // Table names come from pg_tables itself; they cannot be bound as parameters.
    const rows = await adminQuery<Record<string, unknown>>(schema, `SELECT * FROM "${t.replace(/"/g, '""')}" ORDER BY 1`);
    out[t] = rows.map((row) => Object.fromEntries(Object.entries(row).map(([k, v]) => [k, Buffer.isBuffer(v) ? v.toString('base64') : v])));
  }
  return JSON.stringify(out);
}

/** `fn`'s tests once per engine, each group named after its engine (and the reason when skipped). */
export function forEachEngine(fn: (engine: TestEngine) => void): void {
  for (const engine of ENGINES) describe.skipIf(engine.skip)(engine.label, () => fn(engine));
}

/** A connection of the register's owner in `schema`, for holding a lock across a test step; release it after. */
export async function adminClient(schema: string): Promise<pg.PoolClient> {
  const client = await adminPool().connect();
  await client.query(`SET search_path = ${schema}`);
  return client;
}
