/** What every part of the store shares: the connection, the clock, ids, the core and the signing key. */
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { formatZodIssues } from '../schemas/issues.js';
import { officerPath } from '../../../core/model/input-words.js';
import type { Evaluate } from './core-link.js';
import type { Statement } from 'better-sqlite3';
import type { Db } from './database.js';
import { loadOrCreateSigningKey, type SigningKey } from './signing.js';
import { storageError } from './storage-errors.js';
import { RecordError } from './types.js';

export interface StoreContext {
  readonly db: Db;
  readonly keyDir: string;
  readonly evaluate: Evaluate;
  readonly calculatedWith: string;
  /** A prepared statement for `sql`, prepared once per connection and reused. */
  sql(sql: string): Statement;
  now(): string;
  newId(): string;
  /** Loaded (or created) on first use: a database that never signs needs no key. */
  signingKey(): SigningKey;
  audit(action: string, entity: string, entityId: string, detail?: string): void;
}

export function makeContext(
  db: Db,
  keyDir: string,
  evaluate: Evaluate,
  calculatedWith: string,
  now: () => string = () => new Date().toISOString(),
): StoreContext {
  let key: SigningKey | undefined;
  const statements = new Map<string, Statement>();
  const sql = (text: string): Statement => {
    let st = statements.get(text);
    if (!st) {
      st = db.prepare(text);
      statements.set(text, st);
    }
    return st;
  };
  return {
    db,
    sql,
    keyDir,
    evaluate,
    calculatedWith,
    now,
    newId: () => randomUUID(),
    signingKey() {
      key ??= loadOrCreateSigningKey(keyDir);
      return key;
    },
    audit(action, entity, entityId, detail = '') {
      sql('INSERT INTO audit_event (at, action, entity, entity_id, detail) VALUES (?, ?, ?, ?, ?)').run(new Date().toISOString(), action, entity, entityId, detail);
    },
  };
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

/** Map SQLite constraint errors (raised by our triggers and keys) to RecordError with plain words. */
export function translateSqliteError(e: unknown, what: string, dbPath?: string): unknown {
  if (!(e instanceof Error) || !('code' in e)) return e;
  const code = String((e as { code: unknown }).code);
  const storage = dbPath !== undefined ? storageError(e, dbPath, what) : null;
  if (storage) return storage;
  if (e.message.startsWith('beamwarden: ')) return new RecordError('immutable', e.message.slice('beamwarden: '.length));
  if (code === 'SQLITE_CONSTRAINT_FOREIGNKEY') {
    return new RecordError('conflict', `${what} cannot be saved as it is: it refers to a record that is not in the register, or other records still refer to it. Nothing was changed.`);
  }
  if (code === 'SQLITE_CONSTRAINT_UNIQUE' || code === 'SQLITE_CONSTRAINT_PRIMARYKEY') return new RecordError('conflict', `${what}: ${e.message.replace(/^UNIQUE constraint failed: /, 'already exists: ')}`);
  return e;
}
