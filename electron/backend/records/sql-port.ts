/**
 * The one door between the records logic and a database engine (institution register issue, item 1):
 * the store's modules speak SQL through this asynchronous port, and each engine implements it once:
 * better-sqlite3 for the embedded file (the default), node-postgres (`pg`) for an institution's server.
 *
 * SQL written against the port is the common subset of SQLite and PostgreSQL: `?` placeholders in
 * order (the PostgreSQL engine numbers them `$1, $2, ...`), ISO-8601 text for times, integers for
 * flags, `INSERT ... ON CONFLICT`, `RETURNING`. Engine-specific statements (pragmas, triggers, row-level
 * security) live in the engine's own files and migrations, never in the shared logic.
 */

/** A value bound to a placeholder or read from a column. Binary columns are Uint8Array (Buffer). */
export type SqlValue = string | number | bigint | null | Uint8Array;

export type SqlEngine = 'sqlite' | 'postgresql';

export interface SqlRunResult {
  /** Rows inserted, updated or deleted by the statement. */
  readonly changes: number;
}

export interface SqlPort {
  readonly engine: SqlEngine;
  /** The first row of the result, or undefined when there is none. */
  get<T extends object>(sql: string, ...params: SqlValue[]): Promise<T | undefined>;
  /** Every row of the result, in the order the statement gives. */
  all<T extends object>(sql: string, ...params: SqlValue[]): Promise<T[]>;
  /** A statement without a result set (INSERT, UPDATE, DELETE). */
  run(sql: string, ...params: SqlValue[]): Promise<SqlRunResult>;
  /**
   * Runs `fn` in one transaction on one connection and commits when it resolves, rolls back when it
   * rejects. Every statement of the transaction goes through the `tx` port handed to `fn` (on
   * PostgreSQL it is bound to the one pooled client holding the transaction). A write transaction
   * takes the write lock at its start (SQLite: BEGIN IMMEDIATE; PostgreSQL: the rows it changes are
   * locked with SELECT ... FOR UPDATE by the logic that needs it). Calling `transaction` on `tx`
   * joins the outer transaction (no nested BEGIN). On SQLite, other callers wait until it ends, so
   * two requests of one host never interleave inside a transaction.
   */
  transaction<T>(fn: (tx: SqlPort) => Promise<T>): Promise<T>;
  close(): Promise<void>;
}
