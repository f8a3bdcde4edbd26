/**
 * A register has one trust anchor, even when two desks create its first signing key at the same
 * moment (migration 11: the one-row `trust_anchor_setup`, written in the set-up transaction).
 * Two real clients on one register: two connections on one SQLite file, two connection pools on
 * one PostgreSQL register. "derived: a unique key decides between concurrent inserts" (SQLite: BEGIN
 * IMMEDIATE serialises writers, sqlite.org/lang_transaction.html; PostgreSQL 15 documentation 11.6
 * "Unique Indexes" and 13.2.1: a second insert of the same key waits for the first transaction and
 * fails once it commits).
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, beforeEach, expect, it } from 'vitest';
import { RecordError, type RecordStore } from '../../../electron/backend/records/index.js';
import { anchorSettingPath } from '../../../electron/backend/records/trust-anchor-setting.js';
import { adminClient, adminQuery, forEachEngine, schemaFor } from './engines.js';
import { openTemp, PASSPHRASE, tempDir } from './helpers.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let a: RecordStore;
  let b: RecordStore;
  const deskA = () => join(t.dir, 'desk-a');
  const deskB = () => join(t.dir, 'desk-b');
  beforeEach(async () => {
    t = tempDir('bw-one-anchor-');
    // Two desks (each its own key folder and anchor setting) on one register.
    a = await openTemp(t.dir, undefined, engine, { keyDir: deskA() });
    b = await openTemp(t.dir, undefined, engine, { keyDir: deskB() });
  });
  afterEach(async () => {
    await a.close();
    await b.close();
    t.cleanup();
  });

  async function count(table: string): Promise<number> {
    if (engine.name === 'postgresql') {
      return Number((await adminQuery<{ n: string }>(schemaFor(t.dir, 'records.sqlite'), `SELECT count(*) AS n FROM ${table}`))[0]?.n);
    }
    const raw = new Database(join(t.dir, 'records.sqlite'), { readonly: true });
    try {
      return (raw.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
    } finally {
      raw.close();
    }
  }

  // Through the store only on the server: a register FILE is written by one program at a time
  // (write-lock.ts), and two stores of one process on one file would wait on each other's lock.
  it.skipIf(engine.name === 'sqlite')('two desks create the first key at the same moment: one becomes the anchor, the other is refused and leaves nothing', async () => {
    const pa = await a.createPerson({ name: 'Dr. Imre Calloway-Senn', role: 'Laser safety officer' });
    const pb = await b.createPerson({ name: 'Ada Oyelaran-Brandt', role: 'Deputy laser safety officer' });
    const results = await Promise.allSettled([
      a.createPersonKey({ personId: pa.id, passphrase: PASSPHRASE, passphraseAgain: PASSPHRASE }),
      b.createPersonKey({ personId: pb.id, passphrase: PASSPHRASE, passphraseAgain: PASSPHRASE }),
    ]);
    const made = results.filter((r) => r.status === 'fulfilled');
    const refused = results.flatMap((r) => (r.status === 'rejected' ? [r.reason as unknown] : []));
    expect(made).toHaveLength(1);
    expect(refused).toHaveLength(1);
    if (!(refused[0] instanceof RecordError)) throw refused[0];
    expect((refused[0] as RecordError).code).toBe('conflict');
    expect((refused[0] as RecordError).message).toMatch(/Another desk has just created this register's first signing key.*Nothing was created here/);
    // One anchor in the register, one self-endorsement, one key; the refused desk has no anchor setting.
    expect(await count('trust_anchor_setup')).toBe(1);
    expect(await count('trust_anchor_pin')).toBe(1);
    expect(await count('trust_endorsement')).toBe(1);
    expect(await count('person_key')).toBe(1);
    const winnerDesk = results[0]?.status === 'fulfilled' ? deskA() : deskB();
    const loserDesk = winnerDesk === deskA() ? deskB() : deskA();
    expect(existsSync(anchorSettingPath(winnerDesk))).toBe(true);
    expect(existsSync(anchorSettingPath(loserDesk))).toBe(false);
    // Both desks then agree on the register's one anchor once the loser enters it.
    const winner = winnerDesk === deskA() ? a : b;
    const loser = winner === a ? b : a;
    const anchor = (await winner.trustList()).anchorFull ?? '';
    expect((await loser.setTrustAnchor({ fingerprint: anchor })).problems).toEqual([]);
    expect((await loser.trustList()).registerAnchors).toEqual([anchor]);
  });

  it('two connections set up an anchor at once: the second waits for the first and is refused once it commits', async () => {
    const setUp = (anchor: string) => `INSERT INTO trust_anchor_setup (only_row, anchor, set_up_at) VALUES (1, '${anchor}', '2026-12-02T09:00:00.000Z')`;
    if (engine.name === 'postgresql') {
      const schema = schemaFor(t.dir, 'records.sqlite');
      const first = await adminClient(schema);
      const second = await adminClient(schema);
      try {
        await first.query('BEGIN');
        await second.query('BEGIN');
        await first.query(setUp('a'.repeat(64)));
        let settled = false;
        const waiting = second.query(setUp('b'.repeat(64))).finally(() => { settled = true; });
        waiting.catch(() => undefined);
        await new Promise((r) => setTimeout(r, 300));
        expect(settled).toBe(false); // the second insert waits for the first transaction
        await first.query('COMMIT');
        await expect(waiting).rejects.toThrow(/duplicate key value violates unique constraint "trust_anchor_setup_pkey"/);
        await second.query('ROLLBACK');
      } finally {
        first.release();
        second.release();
      }
    } else {
      const path = join(t.dir, 'records.sqlite');
      const first = new Database(path);
      const second = new Database(path, { timeout: 0 });
      try {
        first.exec('BEGIN IMMEDIATE');
        first.exec(setUp('a'.repeat(64)));
        expect(() => second.exec('BEGIN IMMEDIATE')).toThrow(/database is locked/); // one writer at a time
        first.exec('COMMIT');
        second.exec('BEGIN IMMEDIATE');
        expect(() => second.exec(setUp('b'.repeat(64)))).toThrow(/UNIQUE constraint failed: trust_anchor_setup.only_row/);
        second.exec('ROLLBACK');
      } finally {
        first.close();
        second.close();
      }
    }
    expect(await count('trust_anchor_setup')).toBe(1);
  });

  it('the database refuses a second anchor written directly, and the first one cannot be removed', async () => {
    const pa = await a.createPerson({ name: 'Dr. Imre Calloway-Senn', role: 'Laser safety officer' });
    await a.createPersonKey({ personId: pa.id, passphrase: PASSPHRASE, passphraseAgain: PASSPHRASE });
    const attempts = [
      "INSERT INTO trust_anchor_setup (only_row, anchor, set_up_at) VALUES (1, 'ffff', '2026-01-01T00:00:00Z')",
      "INSERT INTO trust_anchor_setup (only_row, anchor, set_up_at) VALUES (2, 'ffff', '2026-01-01T00:00:00Z')",
      "UPDATE trust_anchor_setup SET anchor = 'ffff'",
      'DELETE FROM trust_anchor_setup',
    ];
    for (const sql of attempts) {
      if (engine.name === 'postgresql') await expect(adminQuery(schemaFor(t.dir, 'records.sqlite'), sql)).rejects.toThrow(/duplicate key|violates check constraint|set up once/);
      else {
        const raw = new Database(join(t.dir, 'records.sqlite'));
        try {
          expect(() => raw.prepare(sql).run()).toThrow(/UNIQUE|CHECK|set up once/);
        } finally {
          raw.close();
        }
      }
    }
    expect(await count('trust_anchor_setup')).toBe(1);
  });
});
