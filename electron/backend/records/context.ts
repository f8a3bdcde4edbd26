/** What every part of the store shares: the connection, the clock, ids, the core and the key folder (trust list, signing log). */
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { formatZodIssues } from '../schemas/issues.js';
import { officerPath } from '../../../core/model/input-words.js';
import type { Evaluate } from './core-link.js';
import type { SqlPort } from './sql-port.js';
import { RecordError } from './types.js';

/**
 * What a database engine supplies beyond the SQL port: its own way of naming a database error in
 * plain words, and its own check of the protections (triggers) against changing signed records.
 */
export interface EngineSeam {
  /** Where the register is: the file path (SQLite) or the server address without password (PostgreSQL). */
  readonly location: string;
  /** A database error as RecordError in plain words (or `e` unchanged). `storage`: also say what the disk or server refused. */
  translateError(e: unknown, what: string, storage: boolean): unknown;
  /**
   * A column that orders a table's rows as they were inserted, for rows that share a timestamp (a CSV
   * import writes its lasers within one millisecond; the register lists them as registered).
   * SQLite: its `rowid`; a server engine: a sequence column of its own schema.
   */
  readonly insertionOrder: string;
  /**
   * Appended to a SELECT inside a write transaction to lock the rows it reads until the commit
   * (lockRow). SQLite: '' (BEGIN IMMEDIATE already holds the only write lock); PostgreSQL:
   * ' FOR UPDATE', so two officers' saves or sign-offs of one record take turns and the second one
   * sees the first one's commit in its version check.
   */
  readonly rowLock: string;
  /** Names of protections that are missing or altered; empty when all are in place. */
  missingProtections(): Promise<string[]>;
  /**
   * The account that last wrote the row `id` of `table`, where the engine records it (an
   * institution register: several officers), else null (a file: one desk).
   */
  lastWriter(q: SqlPort, table: string, id: string): Promise<string | null>;
}

export interface StoreContext {
  /** The SQL port: the store's connection, or the transaction's own port inside `inTransaction`. */
  readonly q: SqlPort;
  readonly engine: EngineSeam;
  /** The user-data folder beside the database: trust anchor setting and signing log (outside the database). */
  readonly keyDir: string;
  /** A trust anchor given for this open only (an auditor's check), instead of the desk's setting. */
  readonly trustAnchor?: string;
  readonly evaluate: Evaluate;
  readonly calculatedWith: string;
  now(): string;
  newId(): string;
  audit(action: string, entity: string, entityId: string, detail?: string): Promise<void>;
  /** The same context speaking through another port (a transaction's). */
  withPort(q: SqlPort): StoreContext;
}

export interface ContextParts {
  readonly q: SqlPort;
  readonly engine: EngineSeam;
  readonly keyDir: string;
  readonly trustAnchor?: string;
  readonly evaluate: Evaluate;
  readonly calculatedWith: string;
  readonly now?: () => string;
}

export function makeContext(parts: ContextParts): StoreContext {
  const { q } = parts;
  return {
    q,
    engine: parts.engine,
    keyDir: parts.keyDir,
    ...(parts.trustAnchor !== undefined ? { trustAnchor: parts.trustAnchor } : {}),
    evaluate: parts.evaluate,
    calculatedWith: parts.calculatedWith,
    now: parts.now ?? (() => new Date().toISOString()),
    newId: () => randomUUID(),
    async audit(action, entity, entityId, detail = '') {
      await q.run('INSERT INTO audit_event (at, action, entity, entity_id, detail) VALUES (?, ?, ?, ?, ?)', new Date().toISOString(), action, entity, entityId, detail);
    },
    withPort: (other) => makeContext({ ...parts, q: other }),
  };
}

/** `fn` in one write transaction (joining the caller's), with the transaction's context; errors left as they are. */
export function transact<T>(ctx: StoreContext, fn: (ctx: StoreContext) => Promise<T>): Promise<T> {
  return ctx.q.transaction((tx) => fn(ctx.withPort(tx)));
}

/**
 * Run `fn` in one write transaction (joining the caller's when there is one): `fn` gets the context
 * of the transaction, and every statement of it must go through that context. A database error
 * leaves as RecordError in plain words naming `what`.
 */
export async function inTransaction<T>(ctx: StoreContext, what: string, fn: (ctx: StoreContext) => Promise<T>, storage = true): Promise<T> {
  try {
    return await transact(ctx, fn);
  } catch (e) {
    throw ctx.engine.translateError(e, what, storage);
  }
}

/** The tables whose rows a check-then-write locks first (names are code, never input). */
export type LockedTable = 'assessment' | 'site' | 'room' | 'laser_installation' | 'eyewear' | 'person';

/**
 * Lock one row for the rest of the transaction before checking and changing it (a no-op on SQLite,
 * `SELECT ... FOR UPDATE` on PostgreSQL). Call it first inside `inTransaction`, with its ctx.
 */
export async function lockRow(ctx: StoreContext, table: LockedTable, id: string): Promise<void> {
  if (ctx.engine.rowLock === '') return;
  await ctx.q.get(`SELECT id FROM ${table} WHERE id = ?${ctx.engine.rowLock}`, id);
}

/** Validate with a zod schema or throw RecordError('invalid') naming every path and problem. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, what: string): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issues = formatZodIssues(r.error);
  // Shown in officer words ("Laser 1, beam 1, wavelength"); the paths stay in `issues` for tools.
  const shown = issues.slice(0, 10).map((i) => `${officerPath(i.path)}: ${i.problem}`).join('; ');
  throw new RecordError('invalid', `${what} is not valid: ${shown}${issues.length > 10 ? ` (and ${issues.length - 10} more)` : ''}`, issues);
}

export function notFound(kind: string, id: string): RecordError {
  return new RecordError('not-found', `No ${kind} with id ${id}`);
}

/** `f` applied to each item one after the other (not all at once: one connection, one statement at a time). */
export async function inOrder<T, U>(items: readonly T[], f: (item: T) => Promise<U>): Promise<U[]> {
  const out: U[] = [];
  for (const item of items) out.push(await f(item));
  return out;
}
