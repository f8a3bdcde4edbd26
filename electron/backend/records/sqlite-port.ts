/**
 * The SQL port (sql-port.ts) over one better-sqlite3 connection: the embedded engine.
 *
 * better-sqlite3 runs each statement synchronously, but the records logic is asynchronous (the
 * same logic runs on PostgreSQL), so between two awaited statements of one request another
 * request of the same host could run its own statements on the same connection. Inside a
 * transaction that would be fatal: the other request's writes would join (and commit or roll back
 * with) a transaction that is not theirs. Every use of the connection therefore goes through one
 * FIFO lock: a transaction holds it from BEGIN IMMEDIATE to COMMIT/ROLLBACK, and a statement
 * outside a transaction waits its turn behind a running transaction.
 *
 * Inside `transaction(fn)` the statements go through the `tx` port handed to `fn` (it runs without
 * taking the lock, which the transaction holds). Using the outer port from inside the transaction
 * would wait for the transaction to end, forever; it is refused with a plain developer error
 * instead, which also catches the bug that would be silent on PostgreSQL (a statement of the
 * transaction sent on another pooled connection).
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import type { Database, Statement } from 'better-sqlite3';
import type { SqlPort, SqlRunResult, SqlValue } from './sql-port.js';

/** First come, first served: each job starts when every job queued before it has ended. */
export class FifoLock {
  private tail: Promise<unknown> = Promise.resolve();
  run<T>(job: () => T | Promise<T>): Promise<T> {
    const result = this.tail.then(job);
    this.tail = result.then(
      () => undefined,
      () => undefined,
    );
    return result;
  }
}

/** better-sqlite3 binds blobs from Buffer only. */
function bindable(params: readonly SqlValue[]): unknown[] {
  return params.map((p) => (p instanceof Uint8Array && !Buffer.isBuffer(p) ? Buffer.from(p.buffer, p.byteOffset, p.byteLength) : p));
}

class Transaction implements SqlPort {
  readonly engine = 'sqlite' as const;
  ended = false;
  constructor(private readonly owner: SqliteSqlPort) {}
  private use(): SqliteSqlPort {
    if (this.ended) throw new Error('SQL port: this transaction has already ended; its port cannot be used any more.');
    return this.owner;
  }
  get<T extends object>(sql: string, ...params: SqlValue[]): Promise<T | undefined> {
    return Promise.resolve().then(() => this.use().getNow<T>(sql, params));
  }
  all<T extends object>(sql: string, ...params: SqlValue[]): Promise<T[]> {
    return Promise.resolve().then(() => this.use().allNow<T>(sql, params));
  }
  run(sql: string, ...params: SqlValue[]): Promise<SqlRunResult> {
    return Promise.resolve().then(() => this.use().runNow(sql, params));
  }
  /** Joins this transaction: no nested BEGIN, one COMMIT at the end of the outer one. */
  transaction<T>(fn: (tx: SqlPort) => Promise<T>): Promise<T> {
    this.use();
    return fn(this);
  }
  close(): Promise<void> {
    return Promise.reject(new Error('SQL port: close the store, not a transaction.'));
  }
}

export class SqliteSqlPort implements SqlPort {
  readonly engine = 'sqlite' as const;
  private readonly statements = new Map<string, Statement>();
  private readonly lock = new FifoLock();
  private readonly inside = new AsyncLocalStorage<Transaction>();
  private closed = false;

  constructor(readonly db: Database) {}

  /** A prepared statement for `sql`, prepared once per connection and reused. */
  private prepared(sql: string): Statement {
    let st = this.statements.get(sql);
    if (!st) {
      st = this.db.prepare(sql);
      this.statements.set(sql, st);
    }
    return st;
  }
  getNow<T>(sql: string, params: readonly SqlValue[]): T | undefined {
    return this.prepared(sql).get(...bindable(params)) as T | undefined;
  }
  allNow<T>(sql: string, params: readonly SqlValue[]): T[] {
    return this.prepared(sql).all(...bindable(params)) as T[];
  }
  runNow(sql: string, params: readonly SqlValue[]): SqlRunResult {
    return { changes: this.prepared(sql).run(...bindable(params)).changes };
  }

  /** Runs `job` with the connection to itself (engine modules: pragmas, backup), in turn with every other use. */
  exclusive<T>(job: (db: Database) => T | Promise<T>): Promise<T> {
    if (this.inside.getStore() !== undefined) {
      return Promise.reject(new Error('SQL port: the outer port was used inside one of its transactions; use the transaction\'s own port (tx).'));
    }
    return this.lock.run(() => {
      if (this.closed) throw new Error('SQL port: the database is closed.');
      return job(this.db);
    });
  }

  get<T extends object>(sql: string, ...params: SqlValue[]): Promise<T | undefined> {
    return this.exclusive(() => this.getNow<T>(sql, params));
  }
  all<T extends object>(sql: string, ...params: SqlValue[]): Promise<T[]> {
    return this.exclusive(() => this.allNow<T>(sql, params));
  }
  run(sql: string, ...params: SqlValue[]): Promise<SqlRunResult> {
    return this.exclusive(() => this.runNow(sql, params));
  }

  /** BEGIN IMMEDIATE (the write lock at the start, so the transaction never fails half-way on a busy file) ... COMMIT, or ROLLBACK when `fn` rejects. */
  transaction<T>(fn: (tx: SqlPort) => Promise<T>): Promise<T> {
    return this.exclusive(async (db) => {
      db.exec('BEGIN IMMEDIATE');
      const tx = new Transaction(this);
      try {
        const result = await this.inside.run(tx, () => fn(tx));
        db.exec('COMMIT');
        return result;
      } catch (e) {
        // SQLite may already have rolled back on its own (some errors end the transaction).
        if (db.inTransaction) db.exec('ROLLBACK');
        throw e;
      } finally {
        tx.ended = true;
      }
    });
  }

  /** Waits for running and queued work, then closes the connection. */
  async close(): Promise<void> {
    await this.lock.run(() => {
      if (this.closed) return;
      this.closed = true;
      if (this.db.open) this.db.close();
    });
  }
}
