/**
 * The institution register on a real PostgreSQL server (BEAMWARDEN_TEST_PG, set by .ci/run): what
 * only a server register has. Two stores on one database stand for two hosts (two officers' desks)
 * pointed at one register; each store has its own connection pool.
 * - The database itself refuses changes to signed content (PL/pgSQL triggers of the PostgreSQL
 *   migrations), and a switched-off trigger is reported at open.
 * - Simultaneous saves and sign-offs: one goes through, the other is refused, nothing is lost
 *   ("derived: optimistic concurrency with a row lock", PostgreSQL 15 documentation 13.3.2
 *   "Row-Level Locks", SELECT ... FOR UPDATE).
 * - Access: a reader account is refused by the database's privileges, an officer outside their
 *   sites by row-level security (PostgreSQL 15 documentation 5.8 "Row Security Policies"), and every
 *   write names the account that made it.
 * - Start-up: unreachable server, wrong password, missing database, newer schema, register not set
 *   up and no right to set it up: each a plain sentence, never a local file instead.
 */
import { randomBytes } from 'node:crypto';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore, RecordError, type Assessment, type RecordStore, type RegisterChanges } from '../../../electron/backend/records/index.js';
import { adminClient, adminQuery, PG_ADDRESS, PG_SKIP_REASON, pgAddress, pgSnapshot, schemaFor } from './engines.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';
import { createLoginRole, ensureGroupRoles, type RoleQuery } from './pg-roles.js';
import { startTestHost } from './http-host.js';
import { runVerify } from '../../../electron/cli/verify.js';

const skip = PG_ADDRESS === '';
/**
 * Schemas and login roles this file makes, dropped in its afterAll: CI drops the whole throw-away
 * database, but a developer's test database is kept between runs (the group roles stay: the
 * README's set-up makes them once per cluster).
 */
const madeSchemas = new Set<string>();
const madeRoles = new Set<string>();
const base = (x: Assessment) => ({ revisionId: x.current.id, version: x.version });

async function errorOf(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a RecordError');
}

/** The address of `schema` as the login `user` with `password`. */
async function addressAs(schema: string, user: string, password: string): Promise<string> {
  const u = new URL(await pgAddress(schema));
  u.username = user;
  u.password = password;
  return u.toString();
}

it('a register file has no changes to hear: only this program writes it', async () => {
  const t = tempDir('bw-file-changes-');
  const s = await openTemp(t.dir);
  try {
    await registerRoom(s);
    expect(await s.registerChanges(0)).toEqual({ live: false, seq: 0, changes: [] });
  } finally {
    await s.close();
    t.cleanup();
  }
});

describe.skipIf(skip)(`institution register on PostgreSQL${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  let t: ReturnType<typeof tempDir>;
  let schema: string;
  let a: RecordStore;
  let b: RecordStore;
  beforeAll(async () => {
    t = tempDir('bw-server-');
    schema = schemaFor(t.dir, 'records.sqlite');
    const address = await pgAddress(schema);
    a = await openRecordStore({ path: address, keyDir: join(t.dir, 'keys') });
    b = await openRecordStore({ path: address, keyDir: join(t.dir, 'keys') });
  });
  afterAll(async () => {
    await a?.close();
    await b?.close();
    t?.cleanup();
    // Schemas first: a role that still holds rights on one of them cannot be dropped.
    if (schema) madeSchemas.add(schema);
    for (const s of madeSchemas) await adminQuery(s, `DROP SCHEMA IF EXISTS ${s} CASCADE`);
    for (const r of madeRoles) await adminQuery('public', `DROP ROLE IF EXISTS ${r}`);
  });

  it('opens with the address shown without its password, and keeps no local database file', () => {
    expect(a.info.path).toMatch(/^postgresql:\/\/[^:@]+@127\.0\.0\.1:\d+\/\w+$/);
    expect(a.info.path).not.toContain(`:${new URL(PG_ADDRESS).password}@`);
    expect(readdirSync(t.dir).filter((f) => f.endsWith('.sqlite'))).toEqual([]);
    expect(a.info.warnings).toEqual([]);
  });

  describe('two officers at once (two stores, one register)', () => {
    it('simultaneous saves of one draft: one is saved, the other refused as stale, nothing lost', async () => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const inA = await a.getAssessment(made.id);
      const inB = await b.getAssessment(made.id);
      // A third connection holds the draft's row, so both saves reach the database at the same
      // moment (without it one save could finish before the other starts).
      const holder = await adminClient(schema);
      let results: PromiseSettledResult<Assessment>[];
      try {
        await holder.query('BEGIN');
        await holder.query('SELECT id FROM revision WHERE id = $1 FOR UPDATE', [made.current.id]);
        const both = Promise.allSettled([
          a.saveAssessment(made.id, { ...inA.current.content, notes: 'Officer A: interlock tested' }, base(inA)),
          b.saveAssessment(made.id, { ...inB.current.content, notes: 'Officer B: curtain replaced' }, base(inB)),
        ]);
        await new Promise((r) => setTimeout(r, 500));
        await holder.query('COMMIT');
        results = await both;
      } finally {
        holder.release();
      }
      const saved = results.filter((r) => r.status === 'fulfilled');
      const refused = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected');
      expect(saved).toHaveLength(1);
      expect(refused).toHaveLength(1);
      expect((refused[0]?.reason as RecordError).code).toBe('stale');
      expect((refused[0]?.reason as RecordError).message).toMatch(/changed by someone else at \d\d:\d\d .*Nothing was overwritten/);
      // Who changed it: the other officer's account, as the register recorded it.
      expect((refused[0]?.reason as RecordError).message).toContain(`(saved as revision 1 by ${new URL(PG_ADDRESS).username})`);
      const now = await b.getAssessment(made.id);
      expect(now.version).toBe(2);
      const winner = saved[0]?.status === 'fulfilled' ? saved[0].value.current.content.notes : '';
      expect(now.current.content.notes).toBe(winner);
    });

    it('simultaneous sign-offs of one draft: exactly one signature, which verifies', async () => {
      const { room } = await registerRoom(a, 'A0.07');
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const signerA = await makeSigner(a, 'Dr. Imre Calloway-Senn');
      const signerB = await makeSigner(a, 'Mx. Oda Venkataraman-Holt', signerA);
      const reviewed = base(await a.getAssessment(made.id));
      const holder = await adminClient(schema);
      let results: PromiseSettledResult<Assessment>[];
      try {
        await holder.query('BEGIN');
        await holder.query('SELECT id FROM revision WHERE id = $1 FOR UPDATE', [made.current.id]);
        const both = Promise.allSettled([
          a.signAssessment(made.id, signerA.signOff(STATEMENT), reviewed),
          b.signAssessment(made.id, signerB.signOff(STATEMENT), reviewed),
        ]);
        await new Promise((r) => setTimeout(r, 1500));
        await holder.query('COMMIT');
        results = await both;
      } finally {
        holder.release();
      }
      expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
      const refused = results.find((r): r is PromiseRejectedResult => r.status === 'rejected');
      expect(['stale', 'conflict']).toContain((refused?.reason as RecordError).code);
      const sigs = await adminQuery<{ n: number }>(schema, 'SELECT count(*)::int AS n FROM signature s JOIN revision r ON r.id = s.revision_id WHERE r.assessment_id = $1', [made.id]);
      expect(sigs[0]?.n).toBe(1);
      expect((await b.verify(made.id)).ok).toBe(true);
    });
  });

  it('a change by another officer reaches an open screen without a reload (LISTEN/NOTIFY, over the host too)', async () => {
    const { room } = await registerRoom(b, 'A0.07');
    const host = await startTestHost(a);
    try {
      const start = await host.ok<RegisterChanges>('register-changes', { since: 0 });
      expect(start.live).toBe(true);
      await b.updateRoom(room.id, { name: 'Telecom test bench (renamed by officer B)' });
      let heard: RegisterChanges = start;
      for (let i = 0; i < 100 && !heard.changes.some((c) => c.table === 'room' && c.id === room.id); i++) {
        await new Promise((r) => setTimeout(r, 50));
        heard = await host.ok<RegisterChanges>('register-changes', { since: start.seq });
      }
      expect(heard.changes).toContainEqual(expect.objectContaining({ table: 'room', id: room.id, operation: 'UPDATE', by: new URL(PG_ADDRESS).username }));
      expect(heard.seq).toBeGreaterThan(start.seq);
      expect((await a.getRoom(room.id)).name).toBe('Telecom test bench (renamed by officer B)');
    } finally {
      await host.close();
    }
  });

  describe('a stale register edit names the account that saved it (write_record)', () => {
    const who = () => new URL(PG_ADDRESS).username;
    it('a room renamed on one desk, then edited from the older version on the other', async () => {
      const { room } = await registerRoom(a, 'A0.07');
      const seen = await b.getRoom(room.id);
      await a.updateRoom(room.id, { name: 'Telecom test bench, bench 1' });
      const err = await errorOf(() => b.updateRoom(room.id, { notes: 'curtain replaced' }, { updatedAt: seen.updatedAt, seen: { name: seen.name, notes: seen.notes } }));
      expect(err.code).toBe('stale');
      expect(err.message).toMatch(new RegExp(`^Room A0\\.07 was changed by someone else since you opened it: name "[^"]*" → "Telecom test bench, bench 1" \\(saved by ${who()} at \\d\\d:\\d\\d\\)\\. Your changes were not saved; nothing was overwritten\\.`));
    });

    it('a room deleted on one desk, then edited on the other', async () => {
      const { room } = await registerRoom(a, 'A0.07');
      const seen = await b.getRoom(room.id);
      await a.deleteRoom(room.id);
      const err = await errorOf(() => b.updateRoom(room.id, { notes: 'too late' }, { updatedAt: seen.updatedAt, seen: { code: seen.code, notes: seen.notes } }));
      expect(err.message).toBe(`Room A0.07 was deleted by someone else (${who()}) since you opened it. Your changes were not saved. Reload the register.`);
    });

    it('a laser changed on one desk, then saved with the workspace on the other', async () => {
      const { room } = await registerRoom(a, 'A0.07');
      const [laser] = await b.listInstallations(room.id);
      if (!laser) throw new Error('demo room without a laser');
      await a.updateInstallation(laser.id, { laser: { ...laser.laser, name: `${laser.laser.name} (serviced)` } });
      const content = await b.newAssessmentContent(room.id);
      const err = await errorOf(() =>
        b.saveWork({ roomId: room.id, assessmentId: null, expected: null, content, newLasers: [], changedLasers: [{ id: laser.id, laser: { ...laser.laser, name: 'renamed on desk B' }, expectedUpdatedAt: laser.updatedAt, seenLaser: laser.laser }] }),
      );
      expect(err.code).toBe('stale');
      expect(err.message).toMatch(new RegExp(`^Laser "[^"]+ \\(serviced\\)" in the register was changed by someone else \\(${who()}\\) at \\d\\d:\\d\\d \\(laser name "[^"]+" → "[^"]+ \\(serviced\\)"\\)`));
    });
  });

  it('a screen waiting for changes (long poll) is answered when another officer commits, not at its next question', async () => {
    const { room } = await registerRoom(b, 'A0.07');
    const host = await startTestHost(a);
    try {
      const start = await host.ok<RegisterChanges>('register-changes', { since: 0 });
      const asked = Date.now();
      const waiting = host.ok<RegisterChanges>('register-changes', { since: start.seq, waitMs: 20_000 });
      await new Promise((r) => setTimeout(r, 300));
      const committed = Date.now();
      await b.updateRoom(room.id, { name: 'Telecom test bench (heard at once)' });
      const heard = await waiting;
      const answered = Date.now();
      expect(heard.changes).toContainEqual(expect.objectContaining({ table: 'room', id: room.id, operation: 'UPDATE' }));
      // Answered by the change, long before the wait ran out (the figure goes to the report, not a pass mark).
      expect(answered - asked).toBeLessThan(20_000);
      process.stderr.write(`long poll: answered ${answered - committed} ms after the other store's update was sent\n`);
      // Nothing new: the wait runs out and the answer says so.
      const quiet = await host.ok<RegisterChanges>('register-changes', { since: heard.seq, waitMs: 200 });
      expect(quiet).toMatchObject({ live: true, seq: heard.seq, changes: [] });
      // A wait beyond the limit is refused naming the field.
      const tooLong = await host.call('register-changes', { since: 0, waitMs: 60_000 });
      expect(tooLong.reply.ok).toBe(false);
      if (!tooLong.reply.ok) expect(tooLong.reply.error.message).toMatch(/must be at most 30000/);
    } finally {
      await host.close();
    }
  });

  describe('the database refuses changes to signed content (raw SQL as the register owner)', () => {
    let signed: Assessment;
    beforeAll(async () => {
      const { room } = await registerRoom(a, 'A0.07');
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      signed = await a.signAssessment(made.id, (await makeSigner(a, 'Dr. Petra Lindqvist-Obi')).signOff(STATEMENT));
    });
    // The same refusals as the SQLite triggers (immutability.test.ts), in PostgreSQL's SQL.
    const cases: Array<[string, string, (x: Assessment) => unknown[]]> = [
      ['change the content of a signed revision', `UPDATE revision SET content_json = (content_json::jsonb || '{"notes":"edited"}')::text WHERE id = $1`, (x) => [x.current.id]],
      ['change the compressed results', `UPDATE revision SET results_z = '\\x00'::bytea WHERE id = $1`, (x) => [x.current.id]],
      ['set a signed revision back to draft', "UPDATE revision SET status = 'draft' WHERE id = $1", (x) => [x.current.id]],
      ['change the save counter of a signed revision', 'UPDATE revision SET version = version + 1 WHERE id = $1', (x) => [x.current.id]],
      ['delete a signed revision', 'DELETE FROM revision WHERE id = $1', (x) => [x.current.id]],
      ['change the signer name', "UPDATE signature SET name = 'Someone Else' WHERE revision_id = $1", (x) => [x.current.id]],
      ['delete a signature', 'DELETE FROM signature WHERE revision_id = $1', (x) => [x.current.id]],
      ['move the assessment to another room', "UPDATE assessment SET room_id = room_id || '' WHERE id = $1", (x) => [x.id]],
      ['delete the assessment', 'DELETE FROM assessment WHERE id = $1', (x) => [x.id]],
      ['replace the public key', "UPDATE signing_key SET public_key = 'x' WHERE key_id = $1", (x) => [x.current.signature?.keyId]],
      ['delete the record of changes', 'DELETE FROM write_record', () => []],
      ['delete the audit log', 'DELETE FROM audit_event', () => []],
    ];
    it.each(cases)('refuses: %s', async (_name, sql, params) => {
      const before = await pgSnapshot(schema);
      await expect(adminQuery(schema, sql, params(signed))).rejects.toThrow(/beamwarden: /);
      expect(await pgSnapshot(schema)).toBe(before);
      expect((await a.verify(signed.id)).ok).toBe(true);
    });

    it('a switched-off trigger is reported when the register is opened', async () => {
      await adminQuery(schema, 'ALTER TABLE signature DISABLE TRIGGER signature_no_update');
      try {
        const again = await openRecordStore({ path: await pgAddress(schema), keyDir: join(t.dir, 'keys') });
        await again.close();
        expect(again.info.warnings.join(' ')).toMatch(/protections against changing signed records were removed \(trigger signature_no_update is switched off\)/);
      } finally {
        await adminQuery(schema, 'ALTER TABLE signature ENABLE TRIGGER signature_no_update');
      }
    });
  });

  describe('roles: officers write within their sites, readers only read (enforced by the database)', () => {
    let owner: string;
    let officer: RecordStore;
    let reader: RecordStore;
    let officerRole: string;
    let siteA: string;
    let roomA: string;
    let roomB: string;
    beforeAll(async () => {
      owner = new URL(PG_ADDRESS).username;
      // Group roles as the README's set-up makes them (cluster-wide; kept between runs).
      const q: RoleQuery = (sql, params) => adminQuery(schema, sql, params);
      await ensureGroupRoles(q);
      // Login roles of this run, named after the run's own role so that .ci/run drops them.
      const suffix = randomBytes(4).toString('hex');
      const password = randomBytes(12).toString('hex');
      officerRole = `${owner}_officer_${suffix}`;
      const readerRole = `${owner}_reader_${suffix}`;
      madeRoles.add(officerRole).add(readerRole);
      await createLoginRole(q, officerRole, password, ['beamwarden_officer', 'beamwarden_reader']);
      await createLoginRole(q, readerRole, password, ['beamwarden_reader']);
      await adminQuery(schema, 'SELECT bw_grant_access()');
      const { site, room } = await registerRoom(a, 'A0.07');
      siteA = site.id;
      roomA = room.id;
      roomB = (await registerRoom(a, 'A0.07')).room.id;
      await adminQuery(schema, 'INSERT INTO officer_site (db_role, site_id) VALUES ($1, $2)', [officerRole, siteA]);
      officer = await openRecordStore({ path: await addressAs(schema, officerRole, password), keyDir: join(t.dir, 'keys') });
      reader = await openRecordStore({ path: await addressAs(schema, readerRole, password), keyDir: join(t.dir, 'keys') });
    });
    afterAll(async () => {
      await officer?.close();
      await reader?.close();
    });

    it('the officer writes in their own site, and the register records who wrote', async () => {
      const made = await officer.createAssessment({ roomId: roomA, content: await officer.newAssessmentContent(roomA) });
      const saved = await officer.saveAssessment(made.id, { ...made.current.content, notes: 'checked by the site officer' }, base(made));
      expect(saved.current.content.notes).toBe('checked by the site officer');
      const written = await adminQuery<{ db_role: string; operation: string }>(schema, "SELECT db_role, operation FROM write_record WHERE table_name = 'revision' AND row_key = $1 ORDER BY seq", [made.current.id]);
      expect(written.map((w) => `${w.db_role} ${w.operation}`)).toEqual([`${officerRole} INSERT`, `${officerRole} UPDATE`]);
      const audit = await adminQuery<{ db_role: string }>(schema, "SELECT db_role FROM audit_event WHERE entity = 'revision' AND entity_id = $1", [made.current.id]);
      expect(new Set(audit.map((x) => x.db_role))).toEqual(new Set([officerRole]));
    });

    it.each([
      ['create an assessment in a room of another site', (s: RecordStore) => s.newAssessmentContent(roomB).then((content) => s.createAssessment({ roomId: roomB, content }))],
      ['rename a room of another site', (s: RecordStore) => s.updateRoom(roomB, { name: 'renamed elsewhere' })],
      ['register a site of their own', (s: RecordStore) => s.createSite({ name: 'Annex' })],
    ])('row-level security refuses the officer: %s (nothing changed)', async (_name, attempt) => {
      const before = await pgSnapshot(schema);
      const err = await errorOf(() => attempt(officer));
      expect(err.code).toBe('not-permitted');
      expect(err.message).toMatch(/only of the sites assigned to you/);
      expect(await pgSnapshot(schema)).toBe(before);
    });

    it.each([
      ['add a person', (s: RecordStore) => s.createPerson({ name: 'Nobody', role: 'Technician' })],
      ['rename a room', (s: RecordStore) => s.updateRoom(roomA, { name: 'renamed by a reader' })],
      ['create an assessment', (s: RecordStore) => s.newAssessmentContent(roomA).then((content) => s.createAssessment({ roomId: roomA, content }))],
    ])('the database refuses a reader: %s (nothing changed)', async (_name, attempt) => {
      expect((await reader.listRooms(siteA)).map((r) => r.id)).toContain(roomA);
      const before = await pgSnapshot(schema);
      const err = await errorOf(() => attempt(reader));
      expect(err.code).toBe('not-permitted');
      expect(err.message).toMatch(/may read the institution register but not change it/);
      expect(await pgSnapshot(schema)).toBe(before);
    });
  });

  describe('start-up: each problem in plain words, never a local file instead', () => {
    const wrong = (change: (u: URL) => void) => {
      const u = new URL(PG_ADDRESS);
      change(u);
      return u.toString();
    };
    it.each([
      ['nothing listens on the port', () => wrong((u) => (u.port = '1')), /Cannot reach the institution register at .*refused the connection/],
      ['wrong password', () => wrong((u) => (u.password = 'not-the-password')), /refused the login: wrong user name or password/],
      ['no such database', () => wrong((u) => (u.pathname = '/bw_no_such_register')), /does not exist on that server \(no such database\)/],
    ])('%s', async (_name, address, message) => {
      const t2 = tempDir('bw-server-start-');
      try {
        const err = await errorOf(() => openRecordStore({ path: address(), keyDir: t2.dir }));
        expect(err.code).toBe('server');
        expect(err.message).toMatch(message);
        expect(err.message).toMatch(/did not open a local file instead/);
        expect(err.message).not.toContain('not-the-password');
        expect(existsSync(join(t2.dir, 'beamwarden.sqlite'))).toBe(false);
      } finally {
        t2.cleanup();
      }
    });

    it('the password may be kept out of the address (PGPASSWORD, PostgreSQL 15 documentation 34.15 "Environment Variables")', async () => {
      const u = new URL(await pgAddress(schema));
      const password = decodeURIComponent(u.password);
      u.password = '';
      const before = process.env['PGPASSWORD'];
      process.env['PGPASSWORD'] = password;
      try {
        const s = await openRecordStore({ path: u.toString(), keyDir: join(t.dir, 'keys') });
        await s.close();
        expect(s.info.schemaVersion).toBeGreaterThan(0);
      } finally {
        if (before === undefined) delete process.env['PGPASSWORD'];
        else process.env['PGPASSWORD'] = before;
      }
    });

    it('a register not set up, opened by an account that may not set it up', async () => {
      const empty = `t_empty_${randomBytes(4).toString('hex')}`;
      madeSchemas.add(empty);
      await pgAddress(empty);
      const owner = new URL(PG_ADDRESS).username;
      const role = `${owner}_late_${randomBytes(4).toString('hex')}`;
      const password = randomBytes(12).toString('hex');
      madeRoles.add(role);
      await adminQuery(empty, `CREATE ROLE ${role} LOGIN PASSWORD '${password}'`);
      await adminQuery(empty, `GRANT USAGE ON SCHEMA ${empty} TO ${role}`);
      const address = await addressAs(empty, role, password);
      const err = await errorOf(() => openRecordStore({ path: address, keyDir: t.dir }));
      expect(err.code).toBe('migration-failed');
      expect(err.message).toMatch(/is not set up for this Beamwarden build \(schema version 0, this build needs \d+\), and your account \S+ may not change its tables/);
    });

    it('a register with a newer schema version is refused and left unchanged', async () => {
      const newer = `t_newer_${randomBytes(4).toString('hex')}`;
      madeSchemas.add(newer);
      const address = await pgAddress(newer);
      const s = await openRecordStore({ path: address, keyDir: t.dir });
      await s.close();
      await adminQuery(newer, "INSERT INTO schema_migrations (version, name, applied_at) VALUES (99, 'from_a_later_build', '2030-01-01T00:00:00Z')");
      const err = await errorOf(() => openRecordStore({ path: address, keyDir: t.dir }));
      expect(err.code).toBe('newer-database');
      expect(err.message).toMatch(/schema version 99, newer than this Beamwarden build understands/);
    });
  });

  it('npm run verify checks the register on the server, showing its address without the password', async () => {
    const lines: string[] = [];
    const status = await runVerify(['--db', await pgAddress(schema), '--key-dir', join(t.dir, 'keys'), '--all'], (l) => lines.push(l));
    const said = lines.join('\n');
    expect(said).toMatch(/^Database postgresql:\/\/\w+@127\.0\.0\.1:\d+\/\w+$/m);
    expect(said).not.toContain(`:${new URL(PG_ADDRESS).password}@`);
    expect(said).toMatch(/\d+ assessment\(s\): \d+ ok, \d+ not signed yet, 0 failed\./);
    expect(status).toBe(0);
  });

  it('backup and restore from the app answer that the server keeps the backups; nothing is closed or replaced', async () => {
    const err = await errorOf(() => a.backupInto());
    expect(err.message).toMatch(/use your server's backup \(pg_dump/);
    const host = await startTestHost(a, { openStore: () => openRecordStore({ path: PG_ADDRESS }) });
    try {
      const restore = await host.call('restore-backup', { path: join(t.dir, 'some-backup.sqlite') });
      expect(restore.reply.ok).toBe(false);
      if (!restore.reply.ok) expect(restore.reply.error.message).toMatch(/Backup and restore from Beamwarden are not available on an institution register/);
      await expect(a.listSites()).resolves.toBeInstanceOf(Array); // the store is still open
    } finally {
      await host.close();
    }
  });
});
