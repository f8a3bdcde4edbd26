/**
 * Migration 10 (write_record_lookup) on both engines: a register at schema 9 holding an assessment
 * opens at the latest version with its history and its records unchanged; on the institution
 * register the "who last wrote this row" lookup (bw_last_writer, migration 1) is answered from the
 * new index instead of a scan of the whole append-only write_record table, and a stale save is
 * still refused naming the account. Sources: PostgreSQL 15 documentation, 11.3 "Multicolumn
 * Indexes" and 11.4 "Indexes and ORDER BY" (an index on (a, b, c DESC) serves WHERE a = ? AND b = ?
 * ORDER BY c DESC LIMIT 1); SQLite has no write_record (one writer), so its migration is empty.
 */
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../../electron/backend/records/database.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';
import { openPgEngine } from '../../../electron/backend/records/pg-engine.js';
import { RecordError, SCHEMA_VERSION } from '../../../electron/backend/records/index.js';
import { adminClient, adminQuery, forEachEngine, pgAddress, schemaFor, type TestEngine } from './engines.js';
import { openTemp, registerRoom, tempDir } from './helpers.js';
import Database from 'better-sqlite3';

const PG_DB_USER = (() => {
  try {
    return decodeURIComponent(new URL(process.env['BEAMWARDEN_TEST_PG'] ?? '').username);
  } catch {
    return '';
  }
})();

/** The plan PostgreSQL chooses for bw_last_writer's query, with sequential scans priced out (so a usable index is taken). */
async function lookupPlan(schema: string): Promise<string> {
  const c = await adminClient(schema);
  try {
    await c.query('BEGIN');
    await c.query('SET LOCAL enable_seqscan = off');
    const rows = (await c.query<{ 'QUERY PLAN': string }>("EXPLAIN SELECT db_role FROM write_record WHERE table_name = 'revision' AND row_key = 'x' ORDER BY seq DESC LIMIT 1")).rows;
    await c.query('ROLLBACK');
    return rows.map((r) => r['QUERY PLAN']).join('\n');
  } finally {
    c.release();
  }
}

/** Schema history of the register `name` in `dir`, read on its own engine. */
async function history(engine: TestEngine, dir: string, name: string): Promise<Array<{ version: number; name: string }>> {
  if (engine.name === 'postgresql') return adminQuery(schemaFor(dir, name), 'SELECT version, name FROM schema_migrations ORDER BY version');
  const db = new Database(join(dir, name), { readonly: true });
  try {
    return db.prepare('SELECT version, name FROM schema_migrations ORDER BY version').all() as Array<{ version: number; name: string }>;
  } finally {
    db.close();
  }
}

forEachEngine((engine) => {
  describe('migration 10, the index of who last wrote a row', () => {
    let t: ReturnType<typeof tempDir>;
    let assessmentId = '';
    beforeAll(() => {
      t = tempDir('bw-m10-');
    });
    afterAll(async () => {
      if (engine.name === 'postgresql') await adminQuery(schemaFor(t.dir, 'v9.sqlite'), `DROP SCHEMA IF EXISTS ${schemaFor(t.dir, 'v9.sqlite')} CASCADE`);
      t.cleanup();
    });

    it('a register at schema 9 with an assessment opens at the latest schema (10 and on), its history and records kept', async () => {
      expect(SCHEMA_VERSION).toBe(11);
      const name = 'v9.sqlite';
      // Set up at schema 9 (the trust endorsements), as a register of the previous release.
      if (engine.name === 'postgresql') {
        const old = await openPgEngine(await pgAddress(schemaFor(t.dir, name)), { targetVersion: 9 });
        expect(old.schemaVersion).toBe(9);
        await old.close();
        expect(await lookupPlan(schemaFor(t.dir, name))).not.toMatch(/write_record_row_newest/);
      } else {
        const old = openDatabase(join(t.dir, name), { targetVersion: 9 });
        expect(old.schemaVersion).toBe(9);
        old.db.close();
      }
      expect((await history(engine, t.dir, name)).at(-1)).toEqual({ version: 9, name: 'trust_endorsements' });

      const store = await openTemp(t.dir, name, engine);
      try {
        expect(store.info.schemaVersion).toBe(SCHEMA_VERSION);
        const { room } = await registerRoom(store);
        const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
        assessmentId = a.id;
        await store.saveAssessment(a.id, { ...a.current.content, notes: 'after migration 10' });
      } finally {
        await store.close();
      }
      expect(await history(engine, t.dir, name)).toEqual(MIGRATIONS.map((m) => ({ version: m.version, name: m.name })));
      const again = await openTemp(t.dir, name, engine);
      try {
        expect(again.info.migrationBackups).toEqual([]);
        expect((await again.getAssessment(assessmentId)).current.content.notes).toBe('after migration 10');
      } finally {
        await again.close();
      }
    });

    it.skipIf(engine.name !== 'postgresql')('on the server the lookup reads the index, and a stale save still names the account', async () => {
      expect(assessmentId).not.toBe('');
      const schema = schemaFor(t.dir, 'v9.sqlite');
      const idx = await adminQuery<{ indexdef: string }>(schema, "SELECT indexdef FROM pg_indexes WHERE schemaname = $1 AND indexname = 'write_record_row_newest'", [schema]);
      expect(idx.map((r) => r.indexdef)).toEqual([`CREATE INDEX write_record_row_newest ON ${schema}.write_record USING btree (table_name, row_key, seq DESC)`]);
      expect(await lookupPlan(schema)).toMatch(/Index (Only )?Scan using write_record_row_newest on write_record/);

      const store = await openTemp(t.dir, 'v9.sqlite', engine);
      try {
        const opened = await store.getAssessment(assessmentId);
        await store.saveAssessment(opened.id, { ...opened.current.content, notes: 'first save' }, { revisionId: opened.current.id, version: opened.version });
        const refused = await store.saveAssessment(opened.id, { ...opened.current.content, notes: 'second, stale' }, { revisionId: opened.current.id, version: opened.version }).then(
          () => null,
          (e: unknown) => e,
        );
        expect(refused).toBeInstanceOf(RecordError);
        expect((refused as RecordError).message).toContain(`by ${PG_DB_USER}`);
      } finally {
        await store.close();
      }
    });
  });
});
