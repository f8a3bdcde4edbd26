/**
 * The SQL port (sql-port.ts) over a node-postgres pool: the institution register on PostgreSQL.
 *
 * - `?` placeholders of the shared SQL are numbered `$1, $2, ...` here (outside quoted text), so the
 *   records logic keeps one form for both engines.
 * - A statement outside a transaction runs on any pooled connection; `transaction(fn)` checks out
 *   ONE client, sends BEGIN, hands `fn` a port bound to that client, and COMMITs or ROLLs BACK.
 *   Isolation is PostgreSQL's READ COMMITTED: every statement sees what was committed before it
 *   started, and the records logic locks the rows it checks before writing (`SELECT ... FOR UPDATE`,
 *   context.ts lockRow), so a save's version check and a sign-off see the newest committed state.
 * - Using the outer port inside one of its own transactions would run on another connection and
 *   could wait for a lock the transaction holds; it is refused with a developer error, as on SQLite.
 * - 64-bit integers (count(*), sequences) come back as JavaScript numbers when exact (they are
 *   counts and row numbers, far below 2^53), otherwise as bigint; binary columns as Buffer.
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import pg from 'pg';
import type { SqlPort, SqlRunResult, SqlValue } from './sql-port.js';

/** `?` -> `$n` outside '...' literals, "..." identifiers and -- comments; cached per statement. */
const numbered = new Map<string, string>();
export function numberPlaceholders(sql: string): string {
  const hit = numbered.get(sql);
  if (hit !== undefined) return hit;
  let out = '';
  let n = 0;
  let i = 0;
  while (i < sql.length) {
    const c = sql[i] ?? '';
    if (c === "'" || c === '"') {
      const end = sql.indexOf(c, i + 1);
      const stop = end < 0 ? sql.length : end + 1;
      out += sql.slice(i, stop);
      i = stop;
    } else if (c === '-' && sql[i + 1] === '-') {
      const end = sql.indexOf('\n', i);
      const stop = end < 0 ? sql.length : end;
      out += sql.slice(i, stop);
      i = stop;
    } else if (c === '?') {
      n += 1;
      out += `$${n}`;
      i += 1;
    } else {
      out += c;
      i += 1;
    }
  }
  numbered.set(sql, out);
  return out;
}

/** node-postgres takes Buffer for bytea; a plain Uint8Array view is wrapped without copying. */
function bindable(params: readonly SqlValue[]): unknown[] {
  return params.map((p) => (p instanceof Uint8Array && !Buffer.isBuffer(p) ? Buffer.from(p.buffer, p.byteOffset, p.byteLength) : typeof p === 'bigint' ? p.toString() : p));
}

const INT8_OID = 20;
/** Type parsers of the register's pool: int8 as number when exact (see the header). */
export const registerTypes: pg.CustomTypesConfig = {
  getTypeParser: ((oid: number, format?: string) => {
    if (oid === INT8_OID) {
      return (text: string) => {
        const n = Number(text);
        return Number.isSafeInteger(n) ? n : BigInt(text);
      };
    }
    return format === undefined ? pg.types.getTypeParser(oid) : pg.types.getTypeParser(oid, format as 'text');
  }) as pg.CustomTypesConfig['getTypeParser'],
};

type Queryable = Pick<pg.Pool | pg.PoolClient, 'query'>;

async function query<T>(on: Queryable, sql: string, params: readonly SqlValue[]): Promise<pg.QueryResult<T & pg.QueryResultRow>> {
  return on.query<T & pg.QueryResultRow>(numberPlaceholders(sql), bindable(params));
}

class PgTransaction implements SqlPort {
  readonly engine = 'postgresql' as const;
  ended = false;
  constructor(private readonly client: pg.PoolClient) {}
  private use(): pg.PoolClient {
    if (this.ended) throw new Error('SQL port: this transaction has already ended; its port cannot be used any more.');
    return this.client;
  }
  async get<T extends object>(sql: string, ...params: SqlValue[]): Promise<T | undefined> {
    return (await query<T>(this.use(), sql, params)).rows[0];
  }
  async all<T extends object>(sql: string, ...params: SqlValue[]): Promise<T[]> {
    return (await query<T>(this.use(), sql, params)).rows;
  }
  async run(sql: string, ...params: SqlValue[]): Promise<SqlRunResult> {
    return { changes: (await query(this.use(), sql, params)).rowCount ?? 0 };
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

export class PgSqlPort implements SqlPort {
  readonly engine = 'postgresql' as const;
  private readonly inside = new AsyncLocalStorage<PgTransaction>();
  private closing: Promise<void> | null = null;

  constructor(readonly pool: pg.Pool) {}

  private outer(): pg.Pool {
    if (this.inside.getStore() !== undefined) {
      throw new Error("SQL port: the outer port was used inside one of its transactions; use the transaction's own port (tx).");
    }
    if (this.closing) throw new Error('SQL port: the register connection is closed.');
    return this.pool;
  }
  async get<T extends object>(sql: string, ...params: SqlValue[]): Promise<T | undefined> {
    return (await query<T>(this.outer(), sql, params)).rows[0];
  }
  async all<T extends object>(sql: string, ...params: SqlValue[]): Promise<T[]> {
    return (await query<T>(this.outer(), sql, params)).rows;
  }
  async run(sql: string, ...params: SqlValue[]): Promise<SqlRunResult> {
    return { changes: (await query(this.outer(), sql, params)).rowCount ?? 0 };
  }

  /** BEGIN ... COMMIT on one checked-out client, ROLLBACK when `fn` rejects. */
  async transaction<T>(fn: (tx: SqlPort) => Promise<T>): Promise<T> {
    const client = await this.outer().connect();
    const tx = new PgTransaction(client);
    let broken: Error | undefined;
    try {
      await client.query('BEGIN');
      const result = await this.inside.run(tx, () => fn(tx));
      await client.query('COMMIT');
      return result;
    } catch (e) {
      try {
        await client.query('ROLLBACK');
      } catch (rollbackError) {
        // The connection itself failed: do not hand it back to the pool.
        broken = rollbackError instanceof Error ? rollbackError : new Error(String(rollbackError));
      }
      throw e;
    } finally {
      tx.ended = true;
      client.release(broken);
    }
  }

  /** Ends the pool after running statements have finished; closing twice is a no-op. */
  close(): Promise<void> {
    return (this.closing ??= this.pool.end());
  }
}
