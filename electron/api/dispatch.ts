/**
 * Runs one operation of the handler table on an untrusted payload. Never throws: every failure
 * becomes a Reply with a message naming the field, so neither the main process nor the host crashes
 * on bad input (issue 'The desktop app': "bad input returns a clear error, never a crash").
 */
import { ZodError, type z } from 'zod';
import { InputError, officerPath, officerWords, placeInRoom } from '../../core/index.js';
import { formatZodIssues } from '../backend/schemas/index.js';
import { RecordError } from '../backend/records/types.js';
import { storageError } from '../backend/records/storage-errors.js';
import type { HandlerTable, OperationName } from './operation.js';
import { ApiFailure, type ApiErrorBody, type ApiIssue, type Reply } from './reply.js';

export function isOperationName<C>(table: HandlerTable<C>, name: string): name is OperationName {
  return Object.prototype.hasOwnProperty.call(table, name);
}

export function issuesOf(error: z.ZodError): ApiIssue[] {
  return formatZodIssues(error).map((i) => ({ path: i.path, message: i.problem }));
}

export function describeIssues(issues: readonly ApiIssue[]): string {
  // Officer words on screen ("Laser 1, beam 1, wavelength"); the paths stay in `issues`.
  return issues.map((i) => `${officerPath(i.path)}: ${i.message}`).join('; ');
}

/**
 * What an officer reads when something went wrong inside the program: no developer message, file
 * path or stack (those go to the log of the process that ran the handler).
 */
export const INTERNAL_MESSAGE = 'The program could not complete this request because of an internal error. Nothing you entered was refused; please report it with the application log.';

/**
 * Map anything thrown by a handler to a reply body, by its class: the caller's errors keep their
 * field and message (ApiFailure, the core's InputError, the records' RecordError, a schema's
 * ZodError); everything else is internal and answered with INTERNAL_MESSAGE only. A disk or lock
 * error that reached here unwrapped (SQLITE_FULL, EROFS, ...) is said plainly with the database it
 * concerns, never as "internal".
 */
export function errorBody(e: unknown, databasePath?: string): ApiErrorBody {
  const storage = databasePath !== undefined ? storageError(e, databasePath, 'The last action') : null;
  if (storage) return errorBody(storage);
  if (e instanceof ApiFailure) return e.field === undefined ? { code: e.code, message: e.message } : { code: e.code, message: e.message, field: e.field };
  if (e instanceof InputError) return { code: 'input_error', message: `${placeInRoom({}, e.field)}: ${officerWords(e)}`, field: e.field };
  if (e instanceof RecordError) {
    const code = RECORD_CODE[e.code];
    if (code === 'internal') return { code, message: e.message };
    const issues = e.issues.map((i) => ({ path: i.path, message: i.problem }));
    return issues.length > 0 ? { code, message: e.message, issues } : { code, message: e.message };
  }
  if (e instanceof ZodError) {
    const issues = issuesOf(e);
    return { code: 'invalid_input', message: describeIssues(issues), issues };
  }
  console.error('internal error in a handler:', e);
  return { code: 'internal', message: INTERNAL_MESSAGE };
}

const RECORD_CODE: Readonly<Record<RecordError['code'], ApiErrorBody['code']>> = {
  'not-found': 'not_found',
  invalid: 'invalid_input',
  immutable: 'conflict',
  conflict: 'conflict',
  stale: 'stale',
  'in-use': 'in-use',
  storage: 'storage',
  'newer-database': 'internal',
  'corrupt-database': 'internal',
  'migration-failed': 'internal',
  'signing-key': 'invalid_input',
  server: 'storage',
  'not-permitted': 'conflict',
};

export async function dispatch<C>(table: HandlerTable<C>, ctx: C, name: string, payload: unknown): Promise<Reply<unknown>> {
  if (!isOperationName(table, name)) {
    return { ok: false, error: { code: 'unknown_operation', message: `unknown operation ${JSON.stringify(name)}` } };
  }
  // The table is indexed by a union key; the entry's input/run pair belong together by construction.
  const op = table[name] as { input: z.ZodType<unknown>; run: (i: unknown, c: C) => unknown };
  const parsed = op.input.safeParse(payload);
  if (!parsed.success) {
    const issues = issuesOf(parsed.error);
    return { ok: false, error: { code: 'invalid_input', message: describeIssues(issues), issues } };
  }
  try {
    const value = await op.run(parsed.data, ctx);
    return { ok: true, value };
  } catch (e) {
    const dbPath = typeof ctx === 'object' && ctx !== null && 'databasePath' in ctx && typeof ctx.databasePath === 'string' ? ctx.databasePath : undefined;
    return { ok: false, error: errorBody(e, dbPath) };
  }
}
