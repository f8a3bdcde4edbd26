/**
 * Runs one operation of the handler table on an untrusted payload. Never throws: every failure
 * becomes a Reply with a message naming the field, so neither the main process nor the host crashes
 * on bad input (issue 'The desktop app': "bad input returns a clear error, never a crash").
 */
import type { z } from 'zod';
import { InputError, officerPath, officerWords, placeInRoom } from '../../core/index.js';
import { formatZodIssues } from '../backend/schemas/index.js';
import { RecordError } from '../backend/records/types.js';
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

/** Map anything thrown by a handler to a reply body. Known errors keep their field. */
export function errorBody(e: unknown): ApiErrorBody {
  if (e instanceof ApiFailure) return e.field === undefined ? { code: e.code, message: e.message } : { code: e.code, message: e.message, field: e.field };
  if (e instanceof InputError) return { code: 'input_error', message: `${placeInRoom({}, e.field)}: ${officerWords(e)}`, field: e.field };
  if (e instanceof RecordError) {
    const issues = e.issues.map((i) => ({ path: i.path, message: i.problem }));
    const code = RECORD_CODE[e.code];
    return issues.length > 0 ? { code, message: e.message, issues } : { code, message: e.message };
  }
  if (e instanceof Error) {
    // Errors from the records store and the PDF module carry their own clear messages and, where
    // they name a field, a `field` or `path` property; keep them, classify by the `code` they carry.
    const rec = e as Error & { code?: unknown; field?: unknown; path?: unknown };
    const field = typeof rec.field === 'string' ? rec.field : typeof rec.path === 'string' ? rec.path : undefined;
    const code = classify(rec.code, e.name);
    return field === undefined ? { code, message: e.message } : { code, message: e.message, field };
  }
  return { code: 'internal', message: String(e) };
}

function classify(code: unknown, name: string): ApiErrorBody['code'] {
  const c = typeof code === 'string' ? code.toLowerCase() : '';
  if (c.includes('not_found') || c.includes('notfound') || name === 'NotFoundError') return 'not_found';
  if (c.includes('signed') || c.includes('immutable') || c.includes('conflict') || c.includes('constraint')) return 'conflict';
  if (c.includes('invalid') || c.includes('schema') || c.includes('validation') || name === 'ValidationError') return 'invalid_input';
  return 'internal';
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
  'signing-key': 'internal',
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
    return { ok: false, error: { code: 'invalid_input', message: `${name}: ${describeIssues(issues)}`, issues } };
  }
  try {
    const value = await op.run(parsed.data, ctx);
    return { ok: true, value };
  } catch (e) {
    return { ok: false, error: errorBody(e) };
  }
}
