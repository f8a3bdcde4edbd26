/**
 * Migrations of the institution register on a real PostgreSQL server: one list of versions with
 * SQLite (migrations/index.ts), each version with its own PostgreSQL SQL. Practices: numbered
 * forward-only migrations each in one transaction, refuse a history from another build (project
 * style guide, practices 6-7); "derived: the two engines hold the same schema" for the comparison.
 */
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore, RecordError, SCHEMA_VERSION } from '../../../electron/backend/records/index.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';
import { openPgEngine } from '../../../electron/backend/records/pg-engine.js';
import { adminQuery, PG_ADDRESS, PG_SKIP_REASON, pgAddress } from './engines.js';
import { tempDir } from './helpers.js';

const skip = PG_ADDRESS === '';
/** Schemas this file made: dropped after the file (locally nothing else removes them; .ci/run drops its whole database). */
const madeSchemas: string[] = [];
const freshSchema = (what: string): string => {
  const schema = `t_${what}_${randomBytes(4).toString('hex')}`;
  madeSchemas.push(schema);
  return schema;
};

async function errorOf(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a RecordError');
}

/** Parts of the PostgreSQL schema that SQLite has no counterpart for (several officers on one server). */
const SERVER_ONLY_TABLES = new Set(['officer_site', 'write_record']);
const SERVER_ONLY_COLUMNS = new Set(['laser_installation.insert_seq', 'audit_event.db_role']);

describe.skipIf(skip)(`institution register migrations on PostgreSQL${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  let t: ReturnType<typeof tempDir>;
  beforeAll(() => {
    t = tempDir('bw-pg-migrate-');
  });
  afterAll(async () => {
    t.cleanup();
    for (const schema of madeSchemas.splice(0)) await adminQuery('public', `DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  });

  it.each(MIGRATIONS.slice(0, -1).map((m) => [m.version]))('a register at version %i is migrated to the latest, with its history', async (from) => {
    const schema = freshSchema(`v${from}`);
    const address = await pgAddress(schema);
    const old = await openPgEngine(address, { targetVersion: from });
    expect(old.schemaVersion).toBe(from);
    await old.close();
    const store = await openRecordStore({ path: address, keyDir: t.dir });
    await store.close();
    expect(store.info.schemaVersion).toBe(SCHEMA_VERSION);
    expect(store.info.warnings).toEqual([]);
    const history = await adminQuery<{ version: number; name: string }>(schema, 'SELECT version, name FROM schema_migrations ORDER BY version');
    expect(history).toEqual(MIGRATIONS.map((m) => ({ version: m.version, name: m.name })));
  });

  it('migration 2 fills the list columns of revisions written at version 1 (signed ones included)', async () => {
    const schema = freshSchema('backfill');
    const address = await pgAddress(schema);
    await (await openPgEngine(address, { targetVersion: 1 })).close();
    const now = '2026-01-05T10:00:00.000Z';
    await adminQuery(schema, `INSERT INTO site (id, name, created_at, updated_at) VALUES ('s', 'Invented site', $1, $1)`, [now]);
    await adminQuery(schema, `INSERT INTO room (id, site_id, code, created_at, updated_at) VALUES ('r', 's', 'A0.07', $1, $1)`, [now]);
    await adminQuery(schema, `INSERT INTO assessment (id, room_id, created_at) VALUES ('a', 'r', $1)`, [now]);
    await adminQuery(schema, `INSERT INTO revision (id, assessment_id, revision_no, status, content_json, results_z, calculated_with, created_at, updated_at)
      VALUES ('v', 'a', 1, 'draft', '{"title":"Bench check","reviewBy":"2027-01-05"}', '\\x01'::bytea, 'test', $1, $1)`, [now]);
    const store = await openRecordStore({ path: address, keyDir: t.dir });
    await store.close();
    expect(await adminQuery(schema, 'SELECT title, review_by FROM revision')).toEqual([{ title: 'Bench check', review_by: '2027-01-05' }]);
  });

  it('holds the same tables, columns, nullability and protections as a new SQLite file', async () => {
    const schema = freshSchema('same');
    const store = await openRecordStore({ path: await pgAddress(schema), keyDir: t.dir });
    await store.close();
    const file = await openRecordStore({ path: join(t.dir, 'same.sqlite'), keyDir: t.dir });
    await file.close();
    const lite = new Database(join(t.dir, 'same.sqlite'), { readonly: true });
    const liteColumns: string[] = [];
    let liteTriggers: string[];
    try {
      const tables = (lite.prepare("SELECT name FROM sqlite_schema WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name").all() as Array<{ name: string }>).map((r) => r.name);
      for (const table of tables) {
        for (const c of lite.prepare('SELECT name, "notnull" AS nn, pk FROM pragma_table_info(?)').all(table) as Array<{ name: string; nn: number; pk: number }>) {
          // A primary key column is NOT NULL on PostgreSQL whether or not SQLite says so.
          liteColumns.push(`${table}.${c.name} ${c.nn || c.pk ? 'not null' : 'null'}`);
        }
      }
      liteTriggers = (lite.prepare("SELECT name FROM sqlite_schema WHERE type = 'trigger' ORDER BY name").all() as Array<{ name: string }>).map((r) => r.name);
    } finally {
      lite.close();
    }
    const pgColumns = (
      await adminQuery<{ t: string; c: string; nullable: string }>(schema, `SELECT table_name AS t, column_name AS c, is_nullable AS nullable FROM information_schema.columns WHERE table_schema = $1`, [schema])
    )
      .filter((r) => !SERVER_ONLY_TABLES.has(r.t) && !SERVER_ONLY_COLUMNS.has(`${r.t}.${r.c}`))
      .map((r) => `${r.t}.${r.c} ${r.nullable === 'YES' ? 'null' : 'not null'}`);
    expect(pgColumns.sort()).toEqual(liteColumns.sort());
    const pgTriggers = (await adminQuery<{ name: string }>(schema, `SELECT DISTINCT t.tgname AS name FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid WHERE c.relnamespace = $1::regnamespace AND NOT t.tgisinternal AND t.tgname NOT LIKE '%_recorded' AND t.tgname <> 'write_record_append_only'`, [schema])).map((r) => r.name);
    expect(pgTriggers.sort()).toEqual(liteTriggers.sort());
  });

  it('a trigger rewritten, dropped or switched off, or row-level security turned off, is reported at open', async () => {
    const schema = freshSchema('tamper');
    const address = await pgAddress(schema);
    await (await openPgEngine(address)).close();
    await adminQuery(schema, 'CREATE OR REPLACE FUNCTION bw_signature_no_update() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RETURN NEW; END $$');
    await adminQuery(schema, 'DROP TRIGGER revision_recorded ON revision');
    await adminQuery(schema, 'ALTER TABLE audit_event DISABLE TRIGGER audit_event_no_delete');
    await adminQuery(schema, 'ALTER TABLE room DISABLE ROW LEVEL SECURITY');
    const store = await openRecordStore({ path: address, keyDir: t.dir });
    await store.close();
    const said = store.info.warnings.join(' ');
    for (const finding of ['trigger signature_no_update was altered', 'trigger revision_recorded is missing', 'trigger audit_event_no_delete is switched off', 'row-level security on room is off']) {
      expect(said).toContain(finding);
    }
    expect(said).toMatch(/^The database's protections against changing signed records were removed/);
  });

  it('a history written by another build is refused, and nothing is changed', async () => {
    const schema = freshSchema('other');
    const address = await pgAddress(schema);
    await (await openPgEngine(address)).close();
    await adminQuery(schema, "UPDATE schema_migrations SET name = 'someone_elses' WHERE version = 3");
    const err = await errorOf(() => openRecordStore({ path: address, keyDir: t.dir }));
    expect(err.code).toBe('corrupt-database');
    expect(err.message).toMatch(/migration history of the institution register .* \(1:initial, 2:list_columns_and_audit_log, 3:someone_elses, .*\) does not match this build's/);
  });

  it('a database holding other tables is not taken over', async () => {
    const schema = freshSchema('foreign');
    const address = await pgAddress(schema);
    await adminQuery(schema, 'CREATE TABLE inventory (id integer)');
    const err = await errorOf(() => openRecordStore({ path: address, keyDir: t.dir }));
    expect(err.message).toMatch(/holds other tables but no Beamwarden register/);
  });

  it('two desks opening a new register at the same moment set it up once', async () => {
    const schema = freshSchema('race');
    const address = await pgAddress(schema);
    const [one, two] = await Promise.all([openRecordStore({ path: address, keyDir: t.dir }), openRecordStore({ path: address, keyDir: t.dir })]);
    await one.close();
    await two.close();
    expect([one.info.schemaVersion, two.info.schemaVersion]).toEqual([SCHEMA_VERSION, SCHEMA_VERSION]);
    expect(await adminQuery(schema, 'SELECT count(*)::int AS n FROM schema_migrations')).toEqual([{ n: MIGRATIONS.length }]);
  });
});
