/**
 * Migrations and opening checks. test/fixtures/db-v1.sqlite was made at schema version 1 by
 * test/fixtures/make-db-v1.ts; opening it must migrate it forward, write a backup copy first, and
 * keep its signed record verifiable. Practices: numbered forward-only migrations each in one
 * transaction, PRAGMA user_version, refuse a newer database (project style guide, practices 6-7).
 */
import Database from 'better-sqlite3';
import { copyFileSync, existsSync, openSync, writeFileSync, writeSync, closeSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openRecordStore, RecordError, SCHEMA_VERSION } from '../../../electron/backend/records/index.js';
import { tempDir } from './helpers.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';

const fixture = fileURLToPath(new URL('../../fixtures/db-v1.sqlite', import.meta.url));
const SIGNED = '44444444-4444-4444-8444-444444444444';
const DRAFT = '66666666-6666-4666-8666-666666666666';
const ROOM = '33333333-3333-4333-8333-333333333333';

let t: ReturnType<typeof tempDir>;
let dbPath: string;
beforeEach(() => {
  t = tempDir('bw-migrate-');
  dbPath = join(t.dir, 'records.sqlite');
  copyFileSync(fixture, dbPath);
});
afterEach(() => t.cleanup());

async function errorOf(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a RecordError');
}

describe('migrating the version-1 fixture', () => {
  it('opens, migrates to the latest version, and keeps a backup copy made before migrating', async () => {
    expect(SCHEMA_VERSION).toBeGreaterThan(1);
    const store = await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });
    try {
      expect(store.info.schemaVersion).toBe(SCHEMA_VERSION);
      expect(store.info.migrationBackups).toHaveLength(1);
      const backup = store.info.migrationBackups[0] ?? '';
      expect(existsSync(backup)).toBe(true);
      const copy = new Database(backup, { readonly: true });
      expect(copy.pragma('user_version', { simple: true })).toBe(1);
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(copy.prepare('SELECT count(*) AS n FROM revision').get()).toEqual({ n: 2 });
      copy.close();

      // Migration 0002 backfilled the list columns, also on the signed row.
      const list = await store.listAssessments(ROOM);
      expect(list.map((a) => [a.id, a.status, a.reviewBy])).toEqual(
        expect.arrayContaining([
          [SIGNED, 'signed', '2027-03-01'],
          [DRAFT, 'draft', null],
        ]),
      );
      expect(list.find((a) => a.id === SIGNED)?.title).toMatch(/^Laser hazard evaluation, room A0.07/);

      // The signed record made by the version-1 build keeps its fingerprint and signature, but the
      // installation key file that made it was not kept with this fixture: nothing outside the
      // database vouches for the key, so it is reported as not trusted (never "known" from the database alone).
      const report = await store.verify(SIGNED);
      expect(report).toMatchObject({ ok: false, signed: true, fingerprintMatches: true, signatureValid: true, keyTrusted: false, chainIntact: true });
      expect(store.info.warnings.join(' ')).toMatch(/1 signature\(s\) were made before personal keys with the installation key, but its key file \(beamwarden-signing-key.pem\) is not in/);
      expect((await store.getAssessment(SIGNED)).current.signature?.keyTrusted).toBe(false);

      // And it can be revised as usual; the new audit log records it.
      const a = await store.getAssessment(SIGNED);
      const revised = await store.saveAssessment(SIGNED, { ...a.current.content, notes: 'after migration' });
      expect(revised.current).toMatchObject({ revisionNo: 2, status: 'draft' });
    } finally {
      await store.close();
    }
    const raw = new Database(dbPath, { readonly: true });
    expect(raw.prepare('SELECT version, name FROM schema_migrations ORDER BY version').all()).toEqual([
      { version: 1, name: 'initial' },
      { version: 2, name: 'list_columns_and_audit_log' },
      { version: 3, name: 'personal_keys_and_chain' },
      { version: 4, name: 'revision_version' },
      { version: 5, name: 'eyewear_upkeep' },
      { version: 7, name: 'co_signatures' },
      { version: 8, name: 'limit_row_checks' },
      { version: 9, name: 'trust_endorsements' },
      { version: 10, name: 'write_record_lookup' },
      { version: 11, name: 'one_anchor_and_sealed_keys' },
    ]);
    // no checks of the limit tables yet (schema 8 adds the empty table)
    expect(raw.prepare('SELECT count(*) AS n FROM limit_row_checks').get()).toEqual({ n: 0 });
    // a version-1 signed record has no co-signatures (schema 7 adds the empty table)
    expect(raw.prepare('SELECT count(*) AS n FROM co_signature').get()).toEqual({ n: 0 });
    // eyewear of the version-1 fixture: upkeep columns added, nothing recorded yet
    const ew = raw.prepare('SELECT condition, inspected_on, next_inspection FROM eyewear').all() as Array<Record<string, unknown>>;
    for (const e of ew) expect(e).toEqual({ condition: 'not recorded', inspected_on: null, next_inspection: null });
    expect(raw.prepare("SELECT action FROM audit_event WHERE action = 'revised'").all()).toHaveLength(1);
    raw.close();
  });

  it('the rebuilt trigger still refuses changes to the signed row, including the new columns', async () => {
    await (await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') })).close();
    const raw = new Database(dbPath);
    try {
      expect(() => raw.prepare("UPDATE revision SET review_by = '2099-01-01' WHERE assessment_id = ?").run(SIGNED)).toThrow(/beamwarden: /);
    } finally {
      raw.close();
    }
  });

  it('a second open does not migrate or copy again', async () => {
    await (await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') })).close();
    const again = await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });
    expect(again.info.migrationBackups).toEqual([]);
    await again.close();
  });

  it('a failing migration is rolled back whole and names the backup', async () => {
    // Sabotage: a table that migration 0002 wants to create already exists.
    const raw = new Database(dbPath);
    raw.exec('CREATE TABLE audit_event (x INTEGER)');
    raw.close();
    const err = await errorOf(() => openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') }));
    expect(err.code).toBe('migration-failed');
    expect(err.message).toMatch(/Migration 2 \(list_columns_and_audit_log\) .* failed and was rolled back: .*audit_event already exists.*before-migration-v1/);
    const after = new Database(dbPath, { readonly: true });
    expect(after.pragma('user_version', { simple: true })).toBe(1);
    const cols = (after.prepare('PRAGMA table_info(revision)').all() as Array<{ name: string }>).map((c) => c.name);
    expect(cols).not.toContain('title');
    after.close();
  });
});

describe('a register as released at schema 7 (history 1-5, 7)', () => {
  it('opens and migrates to the latest schema: the checks of the limit tables come as migration 8, after the released 7', async () => {
    // Built the way the runner writes a register, with the migrations released up to 0.2.2 only.
    const path = join(t.dir, 'released-7.sqlite');
    const raw = new Database(path);
    for (const m of MIGRATIONS.filter((x) => x.version <= 7)) {
      raw.exec(m.sql);
      raw.prepare('INSERT INTO schema_migrations (version, name, applied_at) VALUES (?, ?, ?)').run(m.version, m.name, '2026-11-30T12:00:00.000Z');
      raw.pragma(`user_version = ${m.version}`);
    }
    raw.close();
    await (await openRecordStore({ path, keyDir: join(t.dir, 'keys') })).close();
    const after = new Database(path, { readonly: true });
    try {
      expect((after.prepare('SELECT version FROM schema_migrations ORDER BY version').all() as Array<{ version: number }>).map((r) => r.version)).toEqual([1, 2, 3, 4, 5, 7, 8, 9, 10, 11]);
      expect(after.prepare('SELECT count(*) AS n FROM limit_row_checks').get()).toEqual({ n: 0 });
    } finally {
      after.close();
    }
  });
});

describe('opening refuses what it must not touch', () => {
  it('a database newer than this build', async () => {
    await (await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') })).close();
    const raw = new Database(dbPath);
    raw.pragma(`user_version = ${SCHEMA_VERSION + 1}`);
    raw.close();
    const err = await errorOf(() => openRecordStore({ path: dbPath }));
    expect(err.code).toBe('newer-database');
    expect(err.message).toMatch(new RegExp(`schema version ${SCHEMA_VERSION + 1}, newer than this Beamwarden build understands \\(${SCHEMA_VERSION}\\)`));
  });

  it('a migration history that is not a prefix of ours', async () => {
    const raw = new Database(dbPath);
    raw.prepare("UPDATE schema_migrations SET name = 'something_else' WHERE version = 1").run();
    raw.close();
    expect((await errorOf(() => openRecordStore({ path: dbPath }))).message).toMatch(/does not match this build's/);
  });

  it('a file that is not a database', async () => {
    const p = join(t.dir, 'notes.sqlite');
    writeFileSync(p, 'these are not the records you are looking for'.repeat(200));
    const err = await errorOf(() => openRecordStore({ path: p }));
    expect(err.code).toBe('corrupt-database');
    expect(err.message).toMatch(/is not a database file .*restore it from a backup/);
  });

  it('an SQLite database of another program', async () => {
    const p = join(t.dir, 'other.sqlite');
    const raw = new Database(p);
    raw.exec('CREATE TABLE things (id INTEGER)');
    raw.close();
    expect((await errorOf(() => openRecordStore({ path: p }))).message).toMatch(/not a Beamwarden one/);
  });

  it('a damaged database fails the integrity check at open with a clear error', async () => {
    // Overwrite one page in the middle of the file (page size 4096) with garbage.
    const fd = openSync(dbPath, 'r+');
    writeSync(fd, Buffer.alloc(4096, 0x5a), 0, 4096, 4096 * 8);
    closeSync(fd);
    const err = await errorOf(() => openRecordStore({ path: dbPath }));
    expect(err.code).toBe('corrupt-database');
    expect(err.message).toMatch(/failed its integrity check|is damaged/);
    expect(err.message).toMatch(/backup/);
  });

  it('read-only open of an old database does not migrate it', async () => {
    const err = await errorOf(() => openRecordStore({ path: dbPath, readonly: true }));
    expect(err.code).toBe('migration-failed');
    const raw = new Database(dbPath, { readonly: true });
    expect(raw.pragma('user_version', { simple: true })).toBe(1);
    raw.close();
  });
});
