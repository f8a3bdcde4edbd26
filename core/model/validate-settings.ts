/**
 * Validation of the limit settings of a room or a beam (conservative mode, verified rows and the
 * register's signed checks of limit-table entries, `settings.rowChecks`). Every problem is an
 * InputError naming the field by its path ('settings.rowChecks[2].documentExpr'), as for the other
 * inputs; the zod schema at the boundary (electron/backend/schemas/inputs.ts, LimitSettingsSchema)
 * accepts exactly the same settings (test/backend/records/schema-core-agreement.test.ts).
 *
 * Why the core checks the checks too: a check ends the stricter replacement of its entry
 * (SAFETY.md, "Checks of the limit tables"), so a malformed one reaching the core from a file or an
 * older record must be refused with the field named, never read half-way. In particular a
 * 'differs' check without the published value would end the replacement with nothing to compare
 * the table's value with; it is refused (the register never records one: limit-row-checks.ts).
 */
import { InputError } from '../errors.js';
import { DOCUMENT_VARIABLES } from '../limits/check-samples.js';
import { variablesOf } from '../limits/expression.js';

/** Lengths as the register stores a check (limit-row-checks.ts) and the schema accepts them. */
export const ROW_CHECK_TEXT = { key: 200, documentExpr: 200, checkId: 200, reference: 300, checkedBy: 300 } as const;
export const MAX_ROW_CHECKS = 1000;
const SETTINGS_KEYS = ['conservative', 'verifiedRows', 'rowChecks'] as const;
const ROW_CHECK_KEYS = ['key', 'verdict', 'documentExpr', 'checkId', 'reference', 'checkedBy', 'checkedOn'] as const;

function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function onlyKnown(field: string, x: Record<string, unknown>, known: readonly string[]): void {
  for (const k of Object.keys(x)) {
    if (!known.includes(k)) throw new InputError('invalid_choice', `${field}.${k}`, x[k], 'a setting this version knows; the one given is not');
  }
}

function text(field: string, x: unknown, max: number): string {
  if (typeof x !== 'string' || x.length < 1 || x.length > max) {
    throw new InputError('missing', field, typeof x === 'string' && x.length > 60 ? `${x.slice(0, 60)}…` : x, `text of at most ${max} characters, not empty`);
  }
  return x;
}

/** A typed published value the core can read: the tables' grammar and symbols only. */
export function readableDocumentValue(expr: string): boolean {
  try {
    return variablesOf(expr).every((v) => DOCUMENT_VARIABLES.includes(v));
  } catch {
    return false;
  }
}

function validateRowCheck(field: string, c: unknown): void {
  if (!isObject(c)) throw new InputError('missing', field, c, 'a limit table check {key, verdict, checkId, reference, checkedBy, checkedOn}');
  onlyKnown(field, c, ROW_CHECK_KEYS);
  text(`${field}.key`, c['key'], ROW_CHECK_TEXT.key);
  const verdict = c['verdict'];
  if (verdict !== 'matches' && verdict !== 'differs') throw new InputError(verdict === undefined ? 'missing' : 'invalid_choice', `${field}.verdict`, verdict, "'matches' | 'differs'");
  const doc = c['documentExpr'];
  if (doc !== undefined) {
    text(`${field}.documentExpr`, doc, ROW_CHECK_TEXT.documentExpr);
    if (!readableDocumentValue(doc as string)) {
      throw new InputError('unparseable', `${field}.documentExpr`, doc, 'written as in the tables (numbers, + - * / ^, parentheses and the tables’ symbols)');
    }
  }
  if (verdict === 'differs' && doc === undefined) throw new InputError('missing', `${field}.documentExpr`, doc, 'what the published document gives, when it differs');
  if (verdict === 'matches' && doc !== undefined) throw new InputError('invalid_choice', `${field}.documentExpr`, doc, 'no value: a published value is given only when the document differs');
  text(`${field}.checkId`, c['checkId'], ROW_CHECK_TEXT.checkId);
  text(`${field}.reference`, c['reference'], ROW_CHECK_TEXT.reference);
  text(`${field}.checkedBy`, c['checkedBy'], ROW_CHECK_TEXT.checkedBy);
  const on = c['checkedOn'];
  if (typeof on !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(on)) throw new InputError(on === undefined ? 'missing' : 'unparseable', `${field}.checkedOn`, on, 'a date YYYY-MM-DD');
}

/** Check `settings` (absent is fine); throws InputError naming the field (`field` is its path). */
export function validateSettings(field: string, x: unknown): void {
  if (x === undefined) return;
  if (!isObject(x)) throw new InputError('missing', field, x, 'an object');
  onlyKnown(field, x, SETTINGS_KEYS);
  const conservative = x['conservative'];
  if (conservative !== undefined && typeof conservative !== 'boolean') throw new InputError('invalid_choice', `${field}.conservative`, conservative, 'true | false');
  const verified = x['verifiedRows'];
  if (verified !== undefined) {
    if (!Array.isArray(verified)) throw new InputError('missing', `${field}.verifiedRows`, verified, 'a list of table entries');
    verified.forEach((v, i) => {
      if (typeof v !== 'string' || v.length < 1) throw new InputError('missing', `${field}.verifiedRows[${i}]`, v, 'a table entry, not empty');
    });
  }
  const checks = x['rowChecks'];
  if (checks !== undefined) {
    if (!Array.isArray(checks)) throw new InputError('missing', `${field}.rowChecks`, checks, 'a list of limit table checks');
    if (checks.length > MAX_ROW_CHECKS) throw new InputError('out_of_range', `${field}.rowChecks`, checks.length, `at most ${MAX_ROW_CHECKS} checks`);
    checks.forEach((c, i) => validateRowCheck(`${field}.rowChecks[${i}]`, c));
  }
}
