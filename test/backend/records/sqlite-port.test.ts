// The SQLite engine of the SQL port (electron/backend/records/sqlite-port.ts) on a real database
// file: one connection shared by asynchronous requests of one host. Each case names what it holds
// us to; the transaction semantics are SQLite's ("Transactions": BEGIN IMMEDIATE takes the write
// lock at once; ROLLBACK undoes every change since BEGIN), the interleaving guarantee is ours
// (derived: one connection carries one transaction, so a second request must wait for it).
import Database from 'better-sqlite3';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { SqliteSqlPort } from '../../../electron/backend/records/sqlite-port.js';
import type { SqlPort } from '../../../electron/backend/records/sql-port.js';
import { makeSigner, openTemp, registerRoom, tempDir } from './helpers.js';
import { RecordError, type RecordStore } from '../../../electron/backend/records/index.js';

let t: ReturnType<typeof tempDir>;
let port: SqliteSqlPort;
let file = '';

/** Lets the event loop run, so a request waiting on the other side of an await gets its chance. */
const yieldTurn = (ms = 5): Promise<void> => new Promise((r) => setTimeout(r, ms));

const rows = async (q: SqlPort = port): Promise<string[]> => (await q.all<{ v: string }>('SELECT v FROM item ORDER BY n')).map((r) => r.v);

/** What another connection (another program) sees in the file: only committed rows. */
function committed(): string[] {
  const db = new Database(file, { readonly: true });
  try {
    return (db.prepare('SELECT v FROM item ORDER BY n').all() as Array<{ v: string }>).map((r) => r.v);
  } finally {
    db.close();
  }
}

beforeEach(() => {
  t = tempDir('bw-port-');
  file = join(t.dir, 'port.sqlite');
  const db = new Database(file);
  db.pragma('journal_mode = WAL');
  db.exec('CREATE TABLE item (n INTEGER PRIMARY KEY, v TEXT NOT NULL UNIQUE)');
  port = new SqliteSqlPort(db);
});
afterEach(async () => {
  await port.close();
  t.cleanup();
});

describe('SQLite SQL port: statements', () => {
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
      await port.run('CREATE TABLE blob_item (b BLOB NOT NULL)');
      await port.run('INSERT INTO blob_item (b) VALUES (?)', new Uint8Array([1, 2, 250]));
      const r = await port.get<{ b: Buffer }>('SELECT b FROM blob_item');
      expect([...(r?.b ?? [])]).toEqual([1, 2, 250]);
    }],
  ])('%s (derived: the port contract, sql-port.ts)', async (_name, body) => {
    await body();
  });
});

describe('SQLite SQL port: transactions', () => {
  it('commits when the function resolves; another connection then sees the rows (SQLite "Transactions": COMMIT)', async () => {
    const out = await port.transaction(async (tx) => {
      await tx.run('INSERT INTO item (v) VALUES (?)', 'one');
      await yieldTurn();
      await tx.run('INSERT INTO item (v) VALUES (?)', 'two');
      return 'done';
    });
    expect(out).toBe('done');
    expect(committed()).toEqual(['one', 'two']);
  });

  it('rolls back every change when the function rejects, and the rejection reaches the caller unchanged (SQLite "Transactions": ROLLBACK)', async () => {
    await port.run('INSERT INTO item (v) VALUES (?)', 'before');
    const refusal = new RecordError('stale', 'changed by someone else');
    await expect(
      port.transaction(async (tx) => {
        await tx.run('INSERT INTO item (v) VALUES (?)', 'half');
        await yieldTurn();
        throw refusal;
      }),
    ).rejects.toBe(refusal);
    expect(await rows()).toEqual(['before']);
    expect(committed()).toEqual(['before']);
  });

  it('rolls back when a statement of the transaction fails (a constraint), and the port stays usable (SQLite "Transactions")', async () => {
    await expect(
      port.transaction(async (tx) => {
        await tx.run('INSERT INTO item (v) VALUES (?)', 'x');
        await tx.run('INSERT INTO item (v) VALUES (?)', 'x');
      }),
    ).rejects.toMatchObject({ code: 'SQLITE_CONSTRAINT_UNIQUE' });
    expect(await rows()).toEqual([]);
    await port.run('INSERT INTO item (v) VALUES (?)', 'after');
    expect(committed()).toEqual(['after']);
  });

  it('a transaction started on the transaction port joins the outer one: no nested BEGIN, one rollback undoes both (derived: sql-port.ts contract)', async () => {
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
    expect(committed()).toEqual([]);
  });

  it('the outer port used inside its own transaction is refused at once instead of waiting for ever (derived: one connection, one transaction)', async () => {
    await port.transaction(async () => {
      await expect(port.get('SELECT 1 AS one')).rejects.toThrow(/use the transaction's own port/);
    });
  });

  it('a transaction port cannot be used after its transaction ended (derived: its statements would run outside any transaction)', async () => {
    let kept: SqlPort | null = null;
    await port.transaction(async (tx) => {
      kept = tx;
    });
    await expect((kept as unknown as SqlPort).run('INSERT INTO item (v) VALUES (?)', 'late')).rejects.toThrow(/has already ended/);
    expect(committed()).toEqual([]);
  });
});

describe('SQLite SQL port: two requests of one host on one connection', () => {
  it('two interleaved writers: the second waits for the first transaction; a rollback of the first never takes the second one\'s rows with it', async () => {
    const log: string[] = [];
    const a = port.transaction(async (tx) => {
      log.push('A begins');
      await tx.run('INSERT INTO item (v) VALUES (?)', 'A1');
      await yieldTurn(20); // B is started meanwhile and must not run inside A's transaction
      await tx.run('INSERT INTO item (v) VALUES (?)', 'A2');
      log.push('A fails');
      throw new Error('A refused');
    });
    await yieldTurn(); // A holds the connection now
    const b = port.transaction(async (tx) => {
      log.push('B begins');
      await tx.run('INSERT INTO item (v) VALUES (?)', 'B1');
      await yieldTurn();
      await tx.run('INSERT INTO item (v) VALUES (?)', 'B2');
      log.push('B ends');
    });
    await expect(a).rejects.toThrow('A refused');
    await b;
    expect(log).toEqual(['A begins', 'A fails', 'B begins', 'B ends']);
    expect(committed()).toEqual(['B1', 'B2']);
  });

  it('a statement outside a transaction waits for the running transaction and is not rolled back with it', async () => {
    const log: string[] = [];
    const a = port.transaction(async (tx) => {
      await tx.run('INSERT INTO item (v) VALUES (?)', 'in A');
      await yieldTurn(20);
      log.push('A rolls back');
      throw new Error('A refused');
    });
    await yieldTurn();
    const single = port.run('INSERT INTO item (v) VALUES (?)', 'alone').then((r) => {
      log.push('single statement ran');
      return r;
    });
    await expect(a).rejects.toThrow('A refused');
    expect(await single).toEqual({ changes: 1 });
    expect(log).toEqual(['A rolls back', 'single statement ran']);
    expect(committed()).toEqual(['alone']);
  });

  it('waiting requests are served first come, first served (FIFO)', async () => {
    const order: string[] = [];
    const hold = port.transaction(async () => {
      await yieldTurn(20);
    });
    await yieldTurn();
    const waiting = ['first', 'second', 'third', 'fourth'].map((v, i) =>
      i % 2 === 0
        ? port.run('INSERT INTO item (v) VALUES (?)', v).then(() => void order.push(v))
        : port.transaction(async (tx) => {
            await tx.run('INSERT INTO item (v) VALUES (?)', v);
            await yieldTurn();
            order.push(v);
          }),
    );
    await hold;
    await Promise.all(waiting);
    expect(order).toEqual(['first', 'second', 'third', 'fourth']);
    expect(committed()).toEqual(['first', 'second', 'third', 'fourth']);
  });

  it('close waits for the running transaction to commit', async () => {
    const a = port.transaction(async (tx) => {
      await yieldTurn(20);
      await tx.run('INSERT INTO item (v) VALUES (?)', 'committed before close');
    });
    await yieldTurn();
    await port.close();
    await a;
    expect(committed()).toEqual(['committed before close']);
  });
});

describe('the record store on one connection: simultaneous saves of one host', () => {
  let s: RecordStore;
  beforeEach(async () => {
    s = await openTemp(t.dir, 'store.sqlite');
  });
  afterEach(async () => {
    await s.close();
  });

  it('two saves of the same opened draft sent at once: one is saved, the other refused as stale, nothing lost (ours: optimistic save check)', async () => {
    const { room } = await registerRoom(s);
    const made = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
    const base = { revisionId: made.current.id, version: made.version };
    const results = await Promise.allSettled([
      s.saveAssessment(made.id, { ...made.current.content, notes: 'window 1' }, base),
      s.saveAssessment(made.id, { ...made.current.content, notes: 'window 2' }, base),
    ]);
    const saved = results.filter((r) => r.status === 'fulfilled');
    const refused = results.flatMap((r) => (r.status === 'rejected' ? [r.reason as RecordError] : []));
    expect(saved).toHaveLength(1);
    expect(refused.map((e) => e.code)).toEqual(['stale']);
    const now = await s.getAssessment(made.id);
    expect(now.version).toBe(made.version + 1);
    expect(['window 1', 'window 2']).toContain(now.current.content.notes);
  });

  it('a sign-off and a save sent at once never mix: one goes through, the other is refused, and a signature always covers the stored content (ours)', async () => {
    const { room } = await registerRoom(s);
    const signer = await makeSigner(s);
    const made = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
    const base = { revisionId: made.current.id, version: made.version };
    const [signed, saved] = await Promise.allSettled([
      s.signAssessment(made.id, signer.signOff()),
      s.saveAssessment(made.id, { ...made.current.content, notes: 'edited while signing' }, base),
    ]);
    const outcome = [signed.status === 'fulfilled' ? 'signed' : (signed.reason as RecordError).code, saved.status === 'fulfilled' ? 'saved' : (saved.reason as RecordError).code];
    expect([['signed', 'stale'], ['conflict', 'saved']]).toContainEqual(outcome);
    const now = await s.getAssessment(made.id);
    if (outcome[0] === 'signed') expect((await s.verify(made.id)).ok).toBe(true);
    else expect(now.current).toMatchObject({ status: 'draft', content: { notes: 'edited while signing' } });
  });
});
