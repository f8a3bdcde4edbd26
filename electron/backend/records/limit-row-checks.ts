/**
 * The officer's checks of the limit tables against the published documents (issue 12, schema 8).
 *
 * An officer who holds the published document checks one open row or correction-factor piece of a
 * rule set (core openPoints / checkableEntries) and records the result, signed with their personal
 * key (personal-keys.ts: passphrase, trust list, time and identity from this back end):
 * - 'matches': the entry is used as written instead of its stricter alternative;
 * - 'differs': the officer types what the document gives; the core keeps the lower of the two and
 *   flags every result that uses the entry (core/limits/exposure-limit.ts). A check never raises a
 *   limit above the value as written.
 * Only checks whose signature is valid, whose key is on this installation's trust list and whose
 * entry still reads as when it was checked are used. A new assessment or revision takes the
 * register's checks into its settings (settings.rowChecks), so the revision records which checks it
 * used and recomputes identically later; verify checks each of them again.
 */
import { z } from 'zod';
import { checkableEntries, documentValueProblem, entryWords, type CheckableEntry, type RowCheck, type RuleSetId } from '../../../core/index.js';
import type { RoomInput } from '../../../core/model/inputs.js';
import { inTransaction, parseOrThrow, type StoreContext } from './context.js';
import { checkPersonSignature, signAsPerson, trustListInfo } from './personal-keys.js';
import { shortKeyFingerprint } from './trust-list.js';
import { RecordError, type AssessmentContent, type RowCheckStatement } from './types.js';

export const RuleSetIdArg = z.enum(['icnirp2013', 'eu2006'], { error: 'must be icnirp2013 or eu2006' });

export const RecordRowCheckSchema = z
  .strictObject({
    ruleSet: RuleSetIdArg,
    entryKey: z.string().trim().min(1, 'must name the table entry checked').max(200),
    verdict: z.enum(['matches', 'differs'], { error: 'must be "matches" or "differs"' }),
    documentExpr: z.string().trim().max(200, 'is too long (200 characters at most)').optional(),
    reference: z.string().trim().min(3, 'must name the published document and table, for example "IEC 60825-1:2014 Table A.1"').max(300),
    note: z.string().trim().max(1000).default(''),
    personId: z.string().min(1, 'must name who checked').max(200),
    passphrase: z.string().max(1000),
  })
  .superRefine((x, ctx) => {
    if (x.verdict === 'differs' && (x.documentExpr === undefined || x.documentExpr === '')) {
      ctx.addIssue({ code: 'custom', path: ['documentExpr'], message: 'must give what the published document says when it differs' });
    }
    if (x.verdict === 'matches' && x.documentExpr !== undefined && x.documentExpr !== '') {
      ctx.addIssue({ code: 'custom', path: ['documentExpr'], message: 'is only given when the published document differs' });
    }
  });

export const ListRowChecksSchema = z.strictObject({ ruleSet: RuleSetIdArg.optional() });

/**
 * A signed statement as the register holds it. The rule set stays the stored text: a check of a rule
 * set this version does not know (made by a newer desk) still verifies its signature and is then
 * refused by its entry (checkRow), never reported as altered.
 */
export interface StoredRowCheckStatement extends Omit<RowCheckStatement, 'ruleSet'> {
  readonly ruleSet: string;
}

export interface RowCheckRow {
  id: string;
  rule_set: string;
  entry_key: string;
  entry_expr: string;
  verdict: string;
  document_expr: string | null;
  reference: string;
  note: string;
  person_id: string;
  name: string;
  role: string;
  signed_at: string;
  key_id: string;
  trust_anchor: string;
  signature: string;
}

/** One signed check as the register shows it (the signed statement's fields), with this installation's verdict on it. */
export interface RowCheckRecord extends Omit<RowCheckStatement, 'format' | 'version'> {
  /** "row H-E-VIS-2", "factor CC (1200-1400 nm)". */
  readonly entryWords: string;
  readonly keyFingerprint: string;
  readonly signature: string;
  readonly signatureValid: boolean;
  readonly keyTrusted: boolean;
  /** Signature valid, key trusted here, entry unchanged since: only such checks are used. */
  readonly ok: boolean;
  readonly finding: string;
}

export function statementOf(x: RowCheckRow): StoredRowCheckStatement {
  return {
    format: 'beamwarden-limit-row-check',
    version: 1,
    id: x.id,
    ruleSet: x.rule_set,
    entryKey: x.entry_key,
    entryExpr: x.entry_expr,
    verdict: x.verdict === 'differs' ? 'differs' : 'matches',
    documentExpr: x.document_expr,
    reference: x.reference,
    note: x.note,
    personId: x.person_id,
    name: x.name,
    role: x.role,
    signedAt: x.signed_at,
    keyId: x.key_id,
    trustAnchor: x.trust_anchor,
  };
}

/** The open entries of each rule set by key: the tables are fixed data, so the list is made once per process. */
const entriesByKey = new Map<RuleSetId, ReadonlyMap<string, CheckableEntry>>();
function entryOf(ruleSet: RuleSetId, key: string): CheckableEntry | undefined {
  let byKey = entriesByKey.get(ruleSet);
  if (byKey === undefined) entriesByKey.set(ruleSet, (byKey = new Map(checkableEntries(ruleSet).map((e) => [e.key, e]))));
  return byKey.get(key);
}

function isRuleSet(x: string): x is RuleSetId {
  return x === 'icnirp2013' || x === 'eu2006';
}

/** Check one stored row: its signature, its key's trust, and that the entry still reads as checked. */
export async function checkRow(ctx: StoreContext, x: RowCheckRow, trustProblems?: readonly string[]): Promise<RowCheckRecord> {
  const ruleSet: RuleSetId = isRuleSet(x.rule_set) ? x.rule_set : 'icnirp2013';
  const words = entryWords(x.entry_key);
  const statement = statementOf(x);
  const c = await checkPersonSignature(ctx, statement, x.signature, x.key_id, trustProblems);
  const owner = c.ownerPersonId === null || c.ownerPersonId === x.person_id;
  const entry = isRuleSet(x.rule_set) ? entryOf(ruleSet, x.entry_key) : undefined;
  const who = `${x.name} on ${x.signed_at.slice(0, 10)}, key ${shortKeyFingerprint(x.key_id)}`;
  let ok = false;
  let finding: string;
  if (!c.valid || !owner) finding = `The check of ${words} by ${who} is not valid for what it records${owner ? '' : ` (the key belongs to ${c.ownerName ?? 'someone else'})`}: it was changed after signing. It is not used.`;
  else if (!c.trusted) finding = `The check of ${words} by ${who} was signed with a key that is NOT on this installation's trust list. It is not used. ${c.trustChain.join(' ')}`;
  else if (!entry) finding = `The check of ${words} by ${who} names an entry that is no longer open in ${x.rule_set} (it was read in a published source since, or the table changed). It is not used.`;
  else if (entry.expr !== x.entry_expr) finding = `The check of ${words} by ${who} was made when the entry read ${x.entry_expr}; it now reads ${entry.expr}. Check it again; until then it is not used.`;
  else {
    ok = true;
    finding = `The check of ${words} by ${who} (${x.verdict === 'matches' ? 'matches the published text' : `the published text differs: ${x.document_expr ?? ''}`}) is valid; key trusted: ${c.trustChain.join(' ')}`;
  }
  // The record is the signed statement's fields (one reading of the row) plus this installation's verdict.
  const { format: _format, version: _version, ...fields } = statement;
  void _format;
  void _version;
  return {
    ...fields,
    ruleSet,
    entryWords: words,
    keyFingerprint: shortKeyFingerprint(x.key_id),
    signature: x.signature,
    signatureValid: c.valid && owner,
    keyTrusted: c.trusted,
    ok,
    finding,
  };
}

/** Every stored check (of one rule set, or all), oldest first, each checked. */
export async function listRowChecks(ctx: StoreContext, ruleSet?: RuleSetId): Promise<RowCheckRecord[]> {
  const rows =
    ruleSet === undefined
      ? await ctx.q.all<RowCheckRow>('SELECT * FROM limit_row_checks ORDER BY signed_at, id')
      : await ctx.q.all<RowCheckRow>('SELECT * FROM limit_row_checks WHERE rule_set = ? ORDER BY signed_at, id', ruleSet);
  // The trust list's own problems (file damaged or replaced) are read once for the whole list;
  // every check is still verified (signature, key trust, entry unchanged) on each call.
  const problems = rows.length > 0 ? (await trustListInfo(ctx)).problems : [];
  const out: RowCheckRecord[] = [];
  for (const r of rows) out.push(await checkRow(ctx, r, problems));
  return out;
}

/** The check as evaluation and documents use it. */
export function rowCheckOf(r: RowCheckRecord): RowCheck {
  return {
    key: r.entryKey,
    verdict: r.verdict,
    ...(r.verdict === 'differs' && r.documentExpr !== null ? { documentExpr: r.documentExpr } : {}),
    checkId: r.id,
    reference: r.reference,
    checkedBy: r.name,
    checkedOn: r.signedAt.slice(0, 10),
  };
}

/** The checks in force for a rule set: the newest valid check of each entry, in table order. */
export async function checksInForce(ctx: StoreContext, ruleSet: RuleSetId): Promise<RowCheck[]> {
  const newest = new Map<string, RowCheckRecord>();
  for (const r of await listRowChecks(ctx, ruleSet)) if (r.ok) newest.set(r.entryKey, r);
  const order = checkableEntries(ruleSet).map((e) => e.key);
  return [...newest.values()].sort((a, b) => order.indexOf(a.entryKey) - order.indexOf(b.entryKey)).map(rowCheckOf);
}

/**
 * The input with the register's checks in its settings (and in each beam's own settings, which
 * replace the room's in the core). An input without checks keeps no empty field.
 */
export async function inputWithChecks(ctx: StoreContext, input: RoomInput): Promise<RoomInput> {
  const checks = await checksInForce(ctx, input.ruleSet ?? 'icnirp2013');
  const withChecks = <S extends { rowChecks?: readonly RowCheck[] }>(s: S): S => {
    const { rowChecks: _old, ...rest } = s;
    return (checks.length > 0 ? { ...rest, rowChecks: checks } : rest) as S;
  };
  const settings = withChecks(input.settings ?? {});
  return {
    ...input,
    ...(Object.keys(settings).length > 0 ? { settings } : {}),
    lasers: input.lasers.map((l) => ({ ...l, beams: l.beams.map((b) => (b.settings ? { ...b, settings: withChecks(b.settings) } : b)) })),
  } as RoomInput;
}

/** Content with the register's checks in force (a new assessment, a saved draft, a new revision). */
export async function contentWithChecks(ctx: StoreContext, content: AssessmentContent): Promise<AssessmentContent> {
  return { ...content, input: await inputWithChecks(ctx, content.input) };
}

/** Record a check, signed as `personId` (passphrase checked; time and identity from this back end). */
export async function recordRowCheck(ctx: StoreContext, raw: z.input<typeof RecordRowCheckSchema>): Promise<RowCheckRecord> {
  const args = parseOrThrow(RecordRowCheckSchema, raw, 'Check of a limit-table entry');
  const entry = entryOf(args.ruleSet, args.entryKey);
  if (!entry) throw new RecordError('invalid', `entryKey: ${entryWords(args.entryKey)} is not an open entry of ${args.ruleSet}.`, [{ path: 'entryKey', problem: 'not an open entry of this rule set' }]);
  const documentExpr = args.verdict === 'differs' ? (args.documentExpr ?? '') : null;
  if (documentExpr !== null) {
    const problem = documentValueProblem(args.ruleSet, entry, documentExpr);
    if (problem) throw new RecordError('invalid', `What the published document gives ${problem}.`, [{ path: 'documentExpr', problem }]);
  }
  const id = ctx.newId();
  const signed = await signAsPerson(ctx, args.personId, args.passphrase, (s): RowCheckStatement => ({
    format: 'beamwarden-limit-row-check',
    version: 1,
    id,
    ruleSet: args.ruleSet,
    entryKey: entry.key,
    entryExpr: entry.expr,
    verdict: args.verdict,
    documentExpr,
    reference: args.reference,
    note: args.note,
    personId: s.personId,
    name: s.name,
    role: s.role,
    signedAt: s.signedAt,
    keyId: s.keyId,
    trustAnchor: s.trustAnchor,
  }));
  const p = signed.payload;
  const row: RowCheckRow = {
    id, rule_set: p.ruleSet, entry_key: p.entryKey, entry_expr: p.entryExpr, verdict: p.verdict, document_expr: p.documentExpr, reference: p.reference, note: p.note,
    person_id: p.personId, name: p.name, role: p.role, signed_at: p.signedAt, key_id: p.keyId, trust_anchor: p.trustAnchor, signature: signed.signature,
  };
  await inTransaction(ctx, 'Check of a limit-table entry', async (tx) => {
    await insertRowCheck(tx, row);
    await tx.audit('checked', 'limit-table entry', id, `${entryWords(p.entryKey)} of ${p.ruleSet}: ${p.verdict} (${p.reference}) by ${p.name}, key ${shortKeyFingerprint(p.keyId)}`);
  });
  return await checkRow(ctx, row);
}

export async function insertRowCheck(ctx: StoreContext, row: RowCheckRow): Promise<void> {
  await ctx.q.run(
    `INSERT INTO limit_row_checks (id, rule_set, entry_key, entry_expr, verdict, document_expr, reference, note, person_id, name, role, signed_at, key_id, trust_anchor, signature)
     VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (id) DO NOTHING`,
    row.id, row.rule_set, row.entry_key, row.entry_expr, row.verdict, row.document_expr, row.reference, row.note, row.person_id, row.name, row.role, row.signed_at, row.key_id, row.trust_anchor, row.signature,
  );
}

/**
 * The checks a revision used (its settings), each compared with the register's signed record:
 * present, valid, trusted, and the same verdict, value, document, person and date.
 */
export async function checksUsedFindings(ctx: StoreContext, input: RoomInput): Promise<Array<{ ok: boolean; finding: string }>> {
  const used = new Map<string, RowCheck>();
  for (const c of input.settings?.rowChecks ?? []) used.set(c.checkId, c);
  for (const l of input.lasers) for (const b of l.beams) for (const c of b.settings?.rowChecks ?? []) used.set(c.checkId, c);
  const out: Array<{ ok: boolean; finding: string }> = [];
  for (const c of used.values()) {
    const row = await ctx.q.get<RowCheckRow>('SELECT * FROM limit_row_checks WHERE id = ?', c.checkId);
    if (!row) {
      out.push({ ok: false, finding: `The results use a check of ${entryWords(c.key)} (${c.reference}, ${c.checkedBy}, ${c.checkedOn}) that this register does not hold: it was removed, or the record came from elsewhere without it.` });
      continue;
    }
    const r = await checkRow(ctx, row);
    const same = rowCheckOf({ ...r, ok: true });
    const agrees = same.key === c.key && same.verdict === c.verdict && (same.documentExpr ?? null) === (c.documentExpr ?? null) && same.reference === c.reference && same.checkedBy === c.checkedBy && same.checkedOn === c.checkedOn;
    // The entry may have been read in a published source since: the check stays valid for the record.
    const ok = agrees && r.signatureValid && r.keyTrusted;
    out.push({ ok, finding: agrees ? r.finding : `The results use a check of ${entryWords(c.key)} that differs from the signed check in the register: the record was changed after it was made.` });
  }
  return out;
}
