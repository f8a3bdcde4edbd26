/**
 * The institution register on a real PostgreSQL server (BEAMWARDEN_TEST_PG), with accounts of the
 * two group roles the README sets up:
 * - a reader's account cannot read the sealed private keys (`person_key.sealed_private_key`,
 *   column privileges of migration 11: PostgreSQL 15 documentation 5.7 "Privileges", GRANT
 *   SELECT (columns)); it still lists the keys, and an officer still signs and countersigns;
 * - no officer's account can remove a signed revision: the delete is refused by the triggers, and
 *   TRUNCATE, switching a trigger off or dropping it need rights that only the register's owner
 *   has (PostgreSQL 15 documentation: TRUNCATE privilege; ALTER TABLE and DROP TRIGGER "must own
 *   the table"). What this leaves to the desk's signing log is written in SAFETY.md.
 */
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore, RecordError, type RecordStore } from '../../../electron/backend/records/index.js';
import { adminQuery, ENGINES, PG_ADDRESS, PG_SKIP_REASON, pgAddress, pgSnapshot, schemaFor } from './engines.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';
import { createLoginRole, ensureGroupRoles, type RoleQuery } from './pg-roles.js';

const skip = PG_ADDRESS === '';
const pgEngine = ENGINES[1];

async function addressAs(schema: string, user: string, password: string): Promise<string> {
  const u = new URL(await pgAddress(schema));
  u.username = user;
  u.password = password;
  return u.toString();
}

async function errorOf(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a RecordError');
}

describe.skipIf(skip)(`sealed keys and signed rows on the institution register${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  const t = tempDir('bw-server-keys-');
  let schema: string;
  let owner: RecordStore;
  let officer: RecordStore;
  let reader: RecordStore;
  let officerSql: pg.Client;
  let readerSql: pg.Client;
  let roomA: string;
  let signer: Awaited<ReturnType<typeof makeSigner>>;
  let cosigner: Awaited<ReturnType<typeof makeSigner>>;

  beforeAll(async () => {
    schema = schemaFor(t.dir, 'records.sqlite');
    owner = await openTemp(t.dir, undefined, pgEngine);
    const ownerRole = new URL(PG_ADDRESS).username;
    const q: RoleQuery = (sql, params) => adminQuery(schema, sql, params);
    await ensureGroupRoles(q);
    // Login roles of this run, named after the run's own role so that .ci/run drops them.
    const suffix = randomBytes(4).toString('hex');
    const password = randomBytes(12).toString('hex');
    const officerRole = `${ownerRole}_officer_${suffix}`;
    const readerRole = `${ownerRole}_reader_${suffix}`;
    await createLoginRole(q, officerRole, password, ['beamwarden_officer']);
    await createLoginRole(q, readerRole, password, ['beamwarden_reader']);
    await adminQuery(schema, 'SELECT bw_grant_access()');
    signer = await makeSigner(owner, 'Dr. Imre Calloway-Senn');
    cosigner = await makeSigner(owner, 'Prof. Nadia Ferreira-Holm');
    const { site, room } = await registerRoom(owner, 'A0.07');
    roomA = room.id;
    await adminQuery(schema, 'INSERT INTO officer_site (db_role, site_id) VALUES ($1, $2)', [officerRole, site.id]);
    // The same desk folder: the anchor the owner's first key set up.
    officer = await openRecordStore({ path: await addressAs(schema, officerRole, password), keyDir: join(t.dir, 'keys') });
    reader = await openRecordStore({ path: await addressAs(schema, readerRole, password), keyDir: join(t.dir, 'keys') });
    officerSql = new pg.Client({ connectionString: await addressAs(schema, officerRole, password) });
    readerSql = new pg.Client({ connectionString: await addressAs(schema, readerRole, password) });
    await officerSql.connect();
    await readerSql.connect();
  });
  afterAll(async () => {
    await officerSql?.end();
    await readerSql?.end();
    await officer?.close();
    await reader?.close();
    await owner?.close();
    t.cleanup();
  });

  it.each([
    ['the sealed private keys', 'SELECT sealed_private_key FROM person_key'],
    ['every column of person_key', 'SELECT * FROM person_key'],
    ['the sealed keys through a join', 'SELECT k.public_key, pk.sealed_private_key FROM person_key pk JOIN signing_key k USING (key_id)'],
  ])('the database refuses a reader: %s', async (_what, sql) => {
    await expect(readerSql.query(sql)).rejects.toThrow(/permission denied for table person_key/);
  });

  it('a reader still lists the keys (who holds one, since when, trusted or not)', async () => {
    const rows = await readerSql.query('SELECT key_id, person_id, created_at, retired_at, retired_reason FROM person_key');
    expect(rows.rowCount).toBe(2);
    const keys = await reader.listPersonKeys();
    expect(keys.map((k) => [k.personId, k.trusted])).toEqual(expect.arrayContaining([[signer.person.id, true], [cosigner.person.id, true]]));
  });

  it('an officer reads the sealed keys, signs and a second person countersigns at the officer\'s desk', async () => {
    expect((await officerSql.query('SELECT sealed_private_key FROM person_key')).rowCount).toBe(2);
    const made = await officer.createAssessment({ roomId: roomA, content: await officer.newAssessmentContent(roomA) });
    const signed = await officer.signAssessment(made.id, signer.signOff(STATEMENT));
    expect(signed.current.status).toBe('signed');
    const co = await officer.countersign({ revisionId: signed.current.id, personId: cosigner.person.id, passphrase: cosigner.passphrase, statement: 'Reviewed as head of the laboratory.' });
    expect(co.name).toBe('Prof. Nadia Ferreira-Holm');
    expect((await officer.verify(made.id)).ok).toBe(true);
  });

  it('a reader who tries to sign is told in words, and nothing changes', async () => {
    const made = await officer.createAssessment({ roomId: roomA, content: await officer.newAssessmentContent(roomA) });
    const before = await pgSnapshot(schema);
    const err = await errorOf(() => reader.signAssessment(made.id, signer.signOff(STATEMENT)));
    expect(err.code).toBe('not-permitted');
    expect(err.message).toMatch(/may read the institution register but not use its signing keys: signing needs an officer's account\. Nothing was signed or changed\./);
    expect(await pgSnapshot(schema)).toBe(before);
  });

  describe('no officer can remove a signed revision (the signing log is needed only against the register\'s owner)', () => {
    it.each([
      ['delete the signed revision', 'DELETE FROM revision WHERE id = $1', /a signed revision cannot be deleted|cannot be deleted/],
      ['delete its assessment', 'DELETE FROM assessment WHERE id = (SELECT assessment_id FROM revision WHERE id = $1)', /cannot be deleted/],
      // No delete policy on signature: row-level security lets the officer's DELETE see no row at all.
      ['delete its signature', 'DELETE FROM signature WHERE revision_id = $1', 'no row'],
      ['mark it a draft', "UPDATE revision SET status = 'draft' WHERE id = $1", /cannot be changed|signed/],
      ['empty the revisions (TRUNCATE)', 'TRUNCATE revision CASCADE', /permission denied for table/],
      ['switch the protection off', 'ALTER TABLE revision DISABLE TRIGGER revision_signed_no_delete', /must be owner of table revision/],
      ['drop the protection', 'DROP TRIGGER revision_signed_no_delete ON revision', /must be owner of (table|relation) revision/],
      ['empty the record of writes', 'DELETE FROM write_record', /permission denied for table write_record/],
    ])('the database refuses: %s', async (_what, sql, refusal) => {
      const made = await officer.createAssessment({ roomId: roomA, content: await officer.newAssessmentContent(roomA) });
      const signed = await officer.signAssessment(made.id, signer.signOff(STATEMENT));
      const before = await pgSnapshot(schema);
      const attempt = officerSql.query(sql, sql.includes('$1') ? [signed.current.id] : []);
      if (refusal === 'no row') expect((await attempt).rowCount).toBe(0);
      else await expect(attempt).rejects.toThrow(refusal);
      expect(await pgSnapshot(schema)).toBe(before);
    });
  });
});
