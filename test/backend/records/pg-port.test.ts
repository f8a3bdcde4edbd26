// The PostgreSQL engine of the SQL port (electron/backend/records/pg-port.ts) on a real server: the
// same contract as the SQLite port (sqlite-port.test.ts), with PostgreSQL's transaction semantics
// (PostgreSQL 15 documentation, "Transactions" 3.4 and 13.2.1 Read Committed: a transaction's rows
// are seen by other sessions only after COMMIT; ROLLBACK undoes every change since BEGIN).
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { numberPlaceholders, PgSqlPort, registerTypes } from '../../../electron/backend/records/pg-port.js';
import type { SqlPort } from '../../../electron/backend/records/sql-port.js';
import { RecordError } from '../../../electron/backend/records/index.js';
import { adminQuery, PG_ADDRESS, PG_SKIP_REASON, pgAddress } from './engines.js';

describe('? placeholders are numbered for PostgreSQL outside quoted text (derived: sql-port.ts contract)', () => {
  it.each([
    ['SELECT * FROM t WHERE a = ? AND b = ?', 'SELECT * FROM t WHERE a = $1 AND b = $2'],
    ["SELECT '?' AS q, a FROM t WHERE a = ?", "SELECT '?' AS q, a FROM t WHERE a = $1"],
    ["SELECT 'it''s ?' FROM t WHERE a = ?", "SELECT 'it''s ?' FROM t WHERE a = $1"],
    ['SELECT "odd?name" FROM t WHERE a = ?', 'SELECT "odd?name" FROM t WHERE a = $1'],
    ['SELECT a -- why?\nFROM t WHERE a = ?', 'SELECT a -- why?\nFROM t WHERE a = $1'],
    ['INSERT INTO t (a, b) VALUES (?, ?) ON CONFLICT (a) DO NOTHING', 'INSERT INTO t (a, b) VALUES ($1, $2) ON CONFLICT (a) DO NOTHING'],
  ])('%j', (sql, expected) => {
    expect(numberPlaceholders(sql)).toBe(expected);
  });
});

const skip = PG_ADDRESS === '';
describe.skipIf(skip)(`PostgreSQL SQL port on a real server${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  let schema: string;
  let address: string;
  let port: PgSqlPort;
  beforeAll(async () => {
    schema = `t_port_${randomBytes(4).toString('hex')}`;
    address = await pgAddress(schema);
  });
  beforeEach(async () => {
    await adminQuery(schema, 'DROP TABLE IF EXISTS item; CREATE TABLE item (n bigserial PRIMARY KEY, v text NOT NULL UNIQUE)');
    port = new PgSqlPort(new pg.Pool({ connectionString: address, max: 3, types: registerTypes }));
  });
  afterEach(async () => {
    await port.close();
  });
  afterAll(async () => {
    await adminQuery(schema, `DROP SCHEMA ${schema} CASCADE`);
  });

  const rows = async (q: SqlPort = port): Promise<string[]> => (await q.all<{ v: string }>('SELECT v FROM item ORDER BY n')).map((r) => r.v);
  /** What another session sees: only committed rows. */
  const committed = async (): Promise<string[]> => (await adminQuery<{ v: string }>(schema, 'SELECT v FROM item ORDER BY n')).map((r) => r.v);

  it.each([
    ['get: the first row, or undefined when there is none', async () => {
      await port.run('INSERT INTO item (v) VALUES (?), (?)', 'a', 'b');
      expect(await port.get<{ v: string }>('SELECT v FROM item WHERE v = ?', 'b')).toEqual({ v: 'b' });
      expect(await port.get('SELECT v FROM item WHERE v = ?', 'zzz')).toBeUndefined();
    }],
    ['run: the number of rows changed', async () => {
      await port.run('INSERT INTO item (v) VALUES (?), (?), (?)', 'a', 'b', 'c');
      expect(await port.run('DELETE FROM item WHERE v <> ?', 'b')).toEqual({ changes: 2 });
    }],
    ['blobs bound from a plain Uint8Array come back as the same bytes', async () => {
      await port.run('CREATE TABLE IF NOT EXISTS blob_item (b bytea NOT NULL)');
      await port.run('DELETE FROM blob_item');
      await port.run('INSERT INTO blob_item (b) VALUES (?)', new Uint8Array([1, 2, 250]));
      const r = await port.get<{ b: Buffer }>('SELECT b FROM blob_item');
      expect([...(r?.b ?? [])]).toEqual([1, 2, 250]);
    }],
    ['counts and sequence numbers (64-bit) come back as numbers, as from SQLite', async () => {
      await port.run('INSERT INTO item (v) VALUES (?), (?)', 'a', 'b');
      expect(await port.get('SELECT count(*) AS n, max(n) AS last FROM item')).toEqual({ n: 2, last: 2 });
    }],
  ])('%s (derived: the port contract, sql-port.ts)', async (_name, body) => {
    await body();
  });

  it('commits when the function resolves; another session then sees the rows, and not before', async () => {
    const out = await port.transaction(async (tx) => {
      await tx.run('INSERT INTO item (v) VALUES (?)', 'one');
      expect(await committed()).toEqual([]);
      await tx.run('INSERT INTO item (v) VALUES (?)', 'two');
      return 'done';
    });
    expect(out).toBe('done');
    expect(await committed()).toEqual(['one', 'two']);
  });

  it('rolls back every change when the function rejects, and the rejection reaches the caller unchanged', async () => {
    await port.run('INSERT INTO item (v) VALUES (?)', 'before');
    const refusal = new RecordError('stale', 'changed by someone else');
    await expect(
      port.transaction(async (tx) => {
        await tx.run('INSERT INTO item (v) VALUES (?)', 'half');
        throw refusal;
      }),
    ).rejects.toBe(refusal);
    expect(await rows()).toEqual(['before']);
  });

  it('rolls back when a statement fails (a constraint), and the port stays usable', async () => {
    await expect(
      port.transaction(async (tx) => {
        await tx.run('INSERT INTO item (v) VALUES (?)', 'x');
        await tx.run('INSERT INTO item (v) VALUES (?)', 'x');
      }),
    ).rejects.toMatchObject({ code: '23505' });
    expect(await rows()).toEqual([]);
    await port.run('INSERT INTO item (v) VALUES (?)', 'after');
    expect(await committed()).toEqual(['after']);
  });

  it('a transaction started on the transaction port joins the outer one: one rollback undoes both', async () => {
    await expect(
      port.transaction(async (tx) => {
        await tx.run('INSERT INTO item (v) VALUES (?)', 'outer');
        const inner = await tx.transaction(async (tx2) => {
          await tx2.run('INSERT INTO item (v) VALUES (?)', 'inner');
          return rows(tx2);
        });
        expect(inner).toEqual(['outer', 'inner']);
        throw new Error('outer fails after the inner part');
      }),
    ).rejects.toThrow('outer fails after the inner part');
    expect(await committed()).toEqual([]);
  });

  it('the outer port used inside its own transaction is refused (it would be another connection)', async () => {
    await port.transaction(async () => {
      await expect(port.get('SELECT 1 AS one')).rejects.toThrow(/use the transaction's own port/);
    });
  });

  it('a transaction port cannot be used after its transaction ended', async () => {
    let kept: SqlPort | null = null;
    await port.transaction(async (tx) => {
      kept = tx;
    });
    await expect((kept as unknown as SqlPort).run('INSERT INTO item (v) VALUES (?)', 'late')).rejects.toThrow(/has already ended/);
    expect(await committed()).toEqual([]);
  });

  it('two transactions at once run on two connections; a rollback of one never takes the other one\'s rows with it', async () => {
    let release: () => void = () => undefined;
    const held = new Promise<void>((r) => (release = r));
    const first = port.transaction(async (tx) => {
      await tx.run('INSERT INTO item (v) VALUES (?)', 'first');
      await held;
      throw new Error('first gives up');
    });
    await port.transaction(async (tx) => {
      await tx.run('INSERT INTO item (v) VALUES (?)', 'second');
    });
    release();
    await expect(first).rejects.toThrow('first gives up');
    expect(await committed()).toEqual(['second']);
  });
});
