/**
 * Assessments and their revisions: draft -> signed -> superseded.
 *
 * An assessment is a series of revisions. Saving writes into the open draft; saving when the newest
 * revision is signed starts a new draft revision based on it (the signed one is never touched, and
 * the database triggers would refuse it anyway). Signing turns the draft into the signed revision
 * and marks the previously signed one superseded, all in one transaction.
 */
import { checksUsedFindings, contentWithChecks, inputWithChecks } from './limit-row-checks.js';
import { brotliCompressSync, brotliDecompressSync, constants as zlibConstants } from 'node:zlib';
import type { RoomInput } from '../../../core/model/inputs.js';
import type { InputError } from '../../../core/errors.js';
import { officerWords, placeInRoom } from '../../../core/model/input-words.js';
import type { RoomResult } from '../../../core/model/results.js';
import { AssessmentContentSchema, SignOffSchema } from '../schemas/records.js';
import { RoomResultSchema } from '../schemas/results.js';
import { canonicalJson } from './canonical.js';
import { inTransaction, lockRow, notFound, parseOrThrow, type StoreContext } from './context.js';
import { named } from './named-params.js';
import { diffValues } from './diff.js';
import { assumedDefaults } from './older-content.js';
import { getInstallation, getPerson, getRoom, roomInputFromRegister } from './register.js';
import { fingerprintOf, keyIdOf, linkOf, sha256Hex, verifyStatement, type SignedStatement } from './signing.js';
import { signAsPerson, type Signer } from './personal-keys.js';
import { shortKeyFingerprint, trustOf, type TrustList } from './trust-list.js';
import { loadTrust, type TrustRead } from './trust-store.js';
import { trustProblems } from './personal-keys.js';
import { appendSigningLog, signingLogFor } from './signing-log.js';
import { checkCoSignatures } from './co-signature-checks.js';
import {
  NON_BEAM_HAZARD_KINDS,
  RecordError,
  type Assessment,
  type AssessmentContent,
  type AssessmentSummary,
  type CalendarDate,
  type FieldDifference,
  type Id,
  type Revision,
  type RevisionStatus,
  type RevisionSummary,
  type SaveBase,
  type Signature,
  type SignOff,
  type VerifyCheck,
  type VerifyReport,
} from './types.js';

// ---------------------------------------------------------------- rows

export interface AssessmentRow {
  id: string;
  room_id: string;
  installation_id: string | null;
  created_at: string;
}
export interface RevisionRow {
  id: string;
  assessment_id: string;
  revision_no: number;
  status: RevisionStatus;
  content_json: string;
  /** Brotli-compressed JSON of the RoomResult (see migration 0001). */
  results_z: Buffer;
  calculated_with: string;
  based_on: string | null;
  created_at: string;
  updated_at: string;
  title: string;
  review_by: string | null;
  /** Save counter of the revision (migration 0004): optimistic concurrency. */
  version: number;
}
export interface SignatureRow {
  revision_id: string;
  person_id: string | null;
  name: string;
  role: string;
  signed_at: string;
  statement: string;
  fingerprint: string;
  algorithm: string;
  signature: string;
  key_id: string;
  statement_version: number;
  previous_link: string | null;
  trust_anchor: string | null;
  /** Joined from signing_key (null if the key row is missing, e.g. after tampering). */
  public_key: string | null;
}

const SIGNATURE_SELECT_ALL = 'SELECT s.*, k.public_key FROM signature s LEFT JOIN signing_key k ON k.key_id = s.key_id';
const SIGNATURE_SELECT = `${SIGNATURE_SELECT_ALL} WHERE s.revision_id = ?`;

function signatureFromRow(r: SignatureRow, trust: TrustList | null): Signature {
  const v2 = r.statement_version === 2;
  return {
    revisionId: r.revision_id,
    personId: r.person_id,
    name: r.name,
    role: r.role,
    signedAt: r.signed_at,
    statement: r.statement,
    fingerprint: r.fingerprint,
    algorithm: 'Ed25519',
    signature: r.signature,
    keyId: r.key_id,
    publicKey: r.public_key ?? '',
    ...(v2 ? { statementVersion: 2 as const, previousLink: r.previous_link, ...(r.trust_anchor ? { trustAnchor: r.trust_anchor } : {}) } : {}),
    keyTrusted: trustOf(trust, r.key_id).trusted,
  };
}

async function getSignatureRow(ctx: StoreContext, revisionId: Id): Promise<SignatureRow | undefined> {
  return await ctx.q.get(SIGNATURE_SELECT, revisionId) as SignatureRow | undefined;
}

/** What a revision and its history-list summary share: the row's fields and its signature. */
async function revisionHeaderFromRow(ctx: StoreContext, r: RevisionRow): Promise<Omit<Revision, 'content' | 'results'>> {
  const sig = await getSignatureRow(ctx, r.id);
  return {
    id: r.id,
    assessmentId: r.assessment_id,
    revisionNo: r.revision_no,
    status: r.status,
    calculatedWith: r.calculated_with,
    basedOn: r.based_on,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    signature: sig ? signatureFromRow(sig, (await loadTrust(ctx)).list) : null,
  };
}

async function revisionFromRow(ctx: StoreContext, r: RevisionRow): Promise<Revision> {
  const content = parseOrThrow(AssessmentContentSchema, JSON.parse(r.content_json), `Stored content of revision ${r.revision_no}`);
  const results = storedResults(r.results_z);
  return { ...await revisionHeaderFromRow(ctx, r), content, results };
}

async function getAssessmentRow(ctx: StoreContext, id: Id): Promise<AssessmentRow> {
  const row = await ctx.q.get('SELECT * FROM assessment WHERE id = ?', id) as AssessmentRow | undefined;
  if (!row) throw notFound('assessment', id);
  return row;
}

async function newestRevisionRow(ctx: StoreContext, assessmentId: Id): Promise<RevisionRow> {
  const r = await ctx.q.get('SELECT * FROM revision WHERE assessment_id = ? ORDER BY revision_no DESC LIMIT 1', assessmentId) as
    | RevisionRow
    | undefined;
  if (!r) throw new RecordError('corrupt-database', `Assessment ${assessmentId} has no revision`);
  return r;
}

/** The columns of a revision that the version checks read (not its content and results, which are large). */
type RevisionHead = Pick<RevisionRow, 'id' | 'assessment_id' | 'revision_no' | 'status' | 'version' | 'title' | 'updated_at'>;

/** The newest revision's head: what a version check needs, without reading the stored content and results. */
async function newestRevisionHead(ctx: StoreContext, assessmentId: Id): Promise<RevisionHead> {
  const r = await ctx.q.get('SELECT id, assessment_id, revision_no, status, version, title, updated_at FROM revision WHERE assessment_id = ? ORDER BY revision_no DESC LIMIT 1', assessmentId) as
    | RevisionHead
    | undefined;
  if (!r) throw new RecordError('corrupt-database', `Assessment ${assessmentId} has no revision`);
  return r;
}

async function getRevisionRow(ctx: StoreContext, revisionId: Id): Promise<RevisionRow> {
  const r = await ctx.q.get('SELECT * FROM revision WHERE id = ?', revisionId) as RevisionRow | undefined;
  if (!r) throw notFound('revision', revisionId);
  return r;
}

/** Results are stored Brotli-compressed (RFC 7932; migration 0001 explains why). */
export function encodeResults(results: RoomResult): Buffer {
  const json = Buffer.from(JSON.stringify(results), 'utf8');
  // Quality 5: about half the size of DEFLATE on traces at a few ms per room (bench notes).
  return brotliCompressSync(json, { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 5, [zlibConstants.BROTLI_PARAM_SIZE_HINT]: json.length } });
}
export function decodeResults(z: Buffer): unknown {
  return JSON.parse(brotliDecompressSync(z).toString('utf8'));
}

/**
 * Stored results, decoded once and kept (keyed by the SHA-256 of the stored bytes, so a changed row
 * is never served from the cache). Results written by this store came from the core; they are not
 * re-validated on every read — `verify` is the check for rows edited outside the app, and imports
 * are validated in full.
 */
const resultsCache = new Map<string, RoomResult>();
function deepFreeze<T>(x: T): T {
  if (typeof x === 'object' && x !== null && !Object.isFrozen(x)) {
    for (const v of Object.values(x)) deepFreeze(v);
    Object.freeze(x);
  }
  return x;
}
const RESULTS_CACHE_SIZE = 64;
function storedResults(z: Buffer): RoomResult {
  const key = sha256Hex(z);
  const hit = resultsCache.get(key);
  if (hit) {
    resultsCache.delete(key);
    resultsCache.set(key, hit);
    return hit;
  }
  // Frozen: the same object is handed to every caller.
  const results = deepFreeze(decodeResults(z)) as RoomResult;
  resultsCache.set(key, results);
  if (resultsCache.size > RESULTS_CACHE_SIZE) resultsCache.delete(resultsCache.keys().next().value ?? '');
  return results;
}

// ---------------------------------------------------------------- content

/** HH:MM on this machine's clock, for messages ("changed by someone else at 14:05"). */
export function clockTime(isoTimestamp: string): string {
  const d = new Date(isoTimestamp);
  if (Number.isNaN(d.getTime())) return isoTimestamp;
  const pad = (n: number) => String(n).padStart(2, '0');
  const today = new Date().toDateString() === d.toDateString();
  return `${pad(d.getHours())}:${pad(d.getMinutes())}${today ? '' : ` on ${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`}`;
}

function addOneYear(isoTimestamp: string): CalendarDate {
  const d = new Date(isoTimestamp);
  d.setUTCFullYear(d.getUTCFullYear() + 1);
  return d.toISOString().slice(0, 10);
}

/**
 * A fresh content skeleton: the register snapshot, every non-beam hazard listed as "not present"
 * for the officer to go through (domain reference section 7), and a review date one year ahead
 * (institutional practice is annual review plus review on any change — domain reference 6.3).
 */
export async function newAssessmentContent(ctx: StoreContext, roomId: Id, installationId: Id | null = null): Promise<AssessmentContent> {
  const room = await getRoom(ctx, roomId);
  const registerInput = await roomInputFromRegister(ctx, roomId);
  let input: RoomInput = registerInput;
  let title = `Laser hazard evaluation, room ${room.code}${room.name ? ` (${room.name})` : ''}`;
  if (installationId !== null) {
    const inst = await getInstallation(ctx, installationId);
    if (inst.roomId !== roomId) throw new RecordError('invalid', `Installation ${installationId} is not in room ${room.code}`);
    input = { ...registerInput, lasers: [inst.laser] };
    title = `Laser hazard evaluation, ${inst.laser.name}, room ${room.code}`;
  }
  // The officer's decisions carry over: the room's last signed assessment (else its newest) gives
  // the control decisions, non-beam hazards and operating states; the officer reviews them again.
  const previous = await previousContentOfRoom(ctx, roomId, installationId);
  return {
    title,
    // The register's signed checks of the limit tables (issue 12) are in force for a new assessment.
    input: await inputWithChecks(ctx, input),
    operatingStates: previous?.operatingStates ? [...previous.operatingStates] : ['normal', 'alignment', 'maintenance'],
    assumptions: { exposureDurations: [], personsPresent: previous?.assumptions.personsPresent ?? 'Authorised laser users only', opticalAidsPossible: previous?.assumptions.opticalAidsPossible ?? false, other: [] },
    controls: previous ? previous.controls.map((c) => ({ ...c })) : [],
    nonBeamHazards: NON_BEAM_HAZARD_KINDS.map((kind) => previous?.nonBeamHazards.find((h) => h.kind === kind) ?? { kind, present: false, note: '', controls: [] }),
    eyewearChosen: [],
    notes: '',
    reviewBy: addOneYear(ctx.now()),
  };
}

/** Content of the room's last signed revision (or newest revision) of the same scope, if any. */
async function previousContentOfRoom(ctx: StoreContext, roomId: Id, installationId: Id | null): Promise<AssessmentContent | null> {
  // `IS ?` with a bound NULL is not common SQL: the scope test is written out for each case.
  const scope = installationId === null ? 'a.installation_id IS NULL' : 'a.installation_id = ?';
  const row = await ctx.q.get<{ content_json: string }>(
    `SELECT r.content_json FROM revision r JOIN assessment a ON a.id = r.assessment_id
        WHERE a.room_id = ? AND ${scope}
        ORDER BY (CASE WHEN r.status = 'signed' THEN 1 ELSE 0 END) DESC, r.updated_at DESC, r.revision_no DESC LIMIT 1`,
    ...(installationId === null ? [roomId] : [roomId, installationId]),
  );
  if (!row) return null;
  const parsed = AssessmentContentSchema.safeParse(JSON.parse(row.content_json));
  return parsed.success ? parsed.data : null;
}

/** Validate content and cross-check references; write chosen exposure durations into the input. */
function normaliseContent(raw: unknown): AssessmentContent {
  const content = parseOrThrow(AssessmentContentSchema, raw, 'Assessment content');
  const beamIds = new Set<string>();
  content.input.lasers.forEach((l) => l.beams.forEach((b) => b.id !== undefined && beamIds.add(b.id)));
  const tags = new Set((content.input.eyewear ?? []).map((e) => e.id));
  const issues: Array<{ path: string; problem: string }> = [];
  content.assumptions.exposureDurations.forEach((c, i) => {
    if (!beamIds.has(c.beamId)) issues.push({ path: `assumptions.exposureDurations[${i}].beamId`, problem: `no beam with id "${c.beamId}" in the input` });
  });
  content.eyewearChosen.forEach((c, i) => {
    if (!tags.has(c.eyewearTag)) issues.push({ path: `eyewearChosen[${i}].eyewearTag`, problem: `no eyewear "${c.eyewearTag}" in the input's eyewear` });
    c.beamIds.forEach((b, j) => {
      if (!beamIds.has(b)) issues.push({ path: `eyewearChosen[${i}].beamIds[${j}]`, problem: `no beam with id "${b}" in the input` });
    });
  });
  if (issues.length) {
    throw new RecordError('invalid', `Assessment content is not valid: ${issues.map((i) => `${i.path}: ${i.problem}`).join('; ')}`, issues);
  }
  // The durations the officer chose (with their reasons) are the ones evaluated: one source of truth.
  const chosen = new Map(content.assumptions.exposureDurations.map((c) => [c.beamId, c.duration_s]));
  if (chosen.size === 0) return content;
  return {
    ...content,
    input: {
      ...content.input,
      lasers: content.input.lasers.map((l) => ({
        ...l,
        beams: l.beams.map((b) => (b.id !== undefined && chosen.has(b.id) ? { ...b, exposureDuration_s: chosen.get(b.id) } : b)),
      })),
    },
  };
}

/** Run the core; its input errors become RecordError('invalid') naming the field under `input`. */
function evaluate(ctx: StoreContext, input: RoomInput): RoomResult {
  try {
    return ctx.evaluate(input);
  } catch (e) {
    // By name: the core may be loaded as another module instance (worker or bundle).
    if (e instanceof Error && e.name === 'InputError') {
      const ie = e as InputError;
      // In officer words: which laser, beam or eyewear, which quantity, what it must be (never the path).
      const problem = `${placeInRoom(input, ie.field)}: ${officerWords(ie)}`;
      throw new RecordError('invalid', `The calculation refused the input. ${problem}`, [{ path: `input.${ie.field}`, problem }]);
    }
    throw e;
  }
}

// ---------------------------------------------------------------- queries

export async function getRevision(ctx: StoreContext, revisionId: Id): Promise<Revision> {
  return await revisionFromRow(ctx, await getRevisionRow(ctx, revisionId));
}

export async function getAssessment(ctx: StoreContext, id: Id): Promise<Assessment> {
  const a = await getAssessmentRow(ctx, id);
  const cur = await currentWithVersion(ctx, id);
  return {
    id: a.id,
    roomId: a.room_id,
    installationId: a.installation_id,
    createdAt: a.created_at,
    ...cur,
    assumedDefaults: assumedDefaults(cur.current.content, cur.current.calculatedWith),
  };
}

async function currentWithVersion(ctx: StoreContext, id: Id): Promise<{ current: Revision; version: number }> {
  const row = await newestRevisionRow(ctx, id);
  return { current: await revisionFromRow(ctx, row), version: row.version };
}

const SUMMARY_SELECT = `
  SELECT a.id, a.room_id, a.installation_id, r.title, r.revision_no, r.status, r.review_by, r.updated_at,
    (SELECT s.signed_at FROM revision r3 JOIN signature s ON s.revision_id = r3.id
      WHERE r3.assessment_id = a.id AND r3.status = 'signed') AS signed_at,
    (SELECT s.key_id FROM revision r3 JOIN signature s ON s.revision_id = r3.id
      WHERE r3.assessment_id = a.id AND r3.status = 'signed') AS signed_key,
    (SELECT r4.revision_no FROM revision r4 WHERE r4.assessment_id = a.id AND r4.status = 'signed') AS in_force_no,
    (SELECT r5.review_by FROM revision r5 WHERE r5.assessment_id = a.id AND r5.status = 'signed') AS in_force_review_by
  FROM assessment a
  JOIN revision r ON r.assessment_id = a.id
   AND r.revision_no = (SELECT max(r2.revision_no) FROM revision r2 WHERE r2.assessment_id = a.id)`;

interface SummaryRow {
  id: string;
  room_id: string;
  installation_id: string | null;
  title: string;
  revision_no: number;
  status: RevisionStatus;
  review_by: string | null;
  updated_at: string;
  signed_at: string | null;
  signed_key: string | null;
  in_force_no: number | null;
  in_force_review_by: string | null;
}
const summaryFromRow = (trust: TrustList | null, r: SummaryRow): AssessmentSummary => ({
  id: r.id,
  roomId: r.room_id,
  installationId: r.installation_id,
  title: r.title,
  revisionNo: r.revision_no,
  status: r.status,
  reviewBy: r.review_by,
  signedAt: r.signed_at,
  signatureUnverified: r.signed_key !== null && !trustOf(trust, r.signed_key).trusted,
  updatedAt: r.updated_at,
  inForce: r.in_force_no === null ? null : { revisionNo: r.in_force_no, signedAt: r.signed_at ?? '', reviewBy: r.in_force_review_by },
});

export async function listAssessments(ctx: StoreContext, roomId: Id): Promise<AssessmentSummary[]> {
  const trust = (await loadTrust(ctx)).list;
  const rows = await ctx.q.all(`${SUMMARY_SELECT} WHERE a.room_id = ? ORDER BY r.updated_at DESC, a.id`, roomId) as SummaryRow[];
  // A room with assessments exists; only an empty list asks whether the room is there at all
  // (a round trip less on a server for the list an officer opens most).
  if (rows.length === 0) await getRoom(ctx, roomId);
  return rows.map((row) => summaryFromRow(trust, row));
}

/** Every assessment of the database (oldest first), for a whole-database check. */
export async function listAllAssessments(ctx: StoreContext): Promise<AssessmentSummary[]> {
  const trust = (await loadTrust(ctx)).list;
  return (await ctx.q.all(`${SUMMARY_SELECT} ORDER BY a.created_at, a.id`) as SummaryRow[]).map((row) => summaryFromRow(trust, row));
}

export async function listDueForReview(ctx: StoreContext, date: CalendarDate): Promise<AssessmentSummary[]> {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date)) throw new RecordError('invalid', `date: must be a calendar date YYYY-MM-DD (got "${date}")`);
  const trust = (await loadTrust(ctx)).list;
  return (
    await ctx.q.all(`${SUMMARY_SELECT} WHERE r.review_by IS NOT NULL AND r.review_by <= ? ORDER BY r.review_by, a.id`, date) as SummaryRow[]
  ).map((row) => summaryFromRow(trust, row));
}

export async function listRevisions(ctx: StoreContext, assessmentId: Id): Promise<RevisionSummary[]> {
  await getAssessmentRow(ctx, assessmentId);
  const rows = await ctx.q.all('SELECT * FROM revision WHERE assessment_id = ? ORDER BY revision_no', assessmentId) as RevisionRow[];
  // Content and results stay encoded: a history list needs neither.
  const out: RevisionSummary[] = [];
  for (const r of rows) out.push({ ...(await revisionHeaderFromRow(ctx, r)), title: r.title, reviewBy: r.review_by });
  return out;
}

export async function compareRevisions(ctx: StoreContext, fromId: Id, toId: Id): Promise<FieldDifference[]> {
  const a = await getRevision(ctx, fromId);
  const b = await getRevision(ctx, toId);
  // Revisions of one assessment, or of assessments of one room (a draft kept as a copy at import or
  // after a refused save is an assessment of its own in the same room).
  if (a.assessmentId !== b.assessmentId && (await getAssessmentRow(ctx, a.assessmentId)).room_id !== (await getAssessmentRow(ctx, b.assessmentId)).room_id) {
    throw new RecordError('invalid', 'Only revisions of assessments of the same room can be compared');
  }
  return diffValues(
    { content: a.content, results: a.results, calculatedWith: a.calculatedWith },
    { content: b.content, results: b.results, calculatedWith: b.calculatedWith },
  );
}

/** The stored content's differences from `seen`, each path under `content.` as in compareRevisions. */
export async function changesSince(ctx: StoreContext, id: Id, seen: AssessmentContent): Promise<FieldDifference[]> {
  const now = await getAssessment(ctx, id);
  return diffValues({ content: seen }, { content: now.current.content });
}

// ---------------------------------------------------------------- writes

const INSERT_REVISION = `INSERT INTO revision (id, assessment_id, revision_no, status, content_json, results_z, calculated_with, based_on,
  created_at, updated_at, title, review_by, version)
  VALUES (@id, @assessment_id, @revision_no, @status, @content_json, @results_z, @calculated_with, @based_on,
  @created_at, @updated_at, @title, @review_by, @version)`;

export async function insertRevisionRow(ctx: StoreContext, row: RevisionRow): Promise<void> {
  await ctx.q.run(...named(INSERT_REVISION, row));
}

/** One write transaction; `fn` gets the transaction's context and speaks only through it. */
function write<T>(ctx: StoreContext, what: string, fn: (ctx: StoreContext) => Promise<T>): Promise<T> {
  return inTransaction(ctx, what, fn);
}

export async function createAssessment(
  ctx: StoreContext,
  args: { roomId: Id; installationId?: Id | null; content: AssessmentContent },
): Promise<Assessment> {
  const content = await contentWithChecks(ctx, normaliseContent(args.content));
  const room = await getRoom(ctx, args.roomId);
  const installationId = args.installationId ?? null;
  if (installationId !== null && (await getInstallation(ctx, installationId)).roomId !== room.id) {
    throw new RecordError('invalid', `installationId: installation ${installationId} is not in room ${room.code}`);
  }
  const results = evaluate(ctx, content.input);
  const now = ctx.now();
  const id = ctx.newId();
  await write(ctx, 'Assessment', async (ctx) => {
    await ctx.q.run('INSERT INTO assessment (id, room_id, installation_id, created_at) VALUES (?, ?, ?, ?)', id, room.id, installationId, now);
    await insertRevisionRow(ctx, {
      id: ctx.newId(),
      assessment_id: id,
      revision_no: 1,
      status: 'draft',
      content_json: JSON.stringify(content),
      results_z: encodeResults(results),
      calculated_with: ctx.calculatedWith,
      based_on: null,
      created_at: now,
      updated_at: now,
      title: content.title,
      review_by: content.reviewBy,
      version: 1,
    });
    await ctx.audit('created', 'assessment', id, content.title);
  });
  return await getAssessment(ctx, id);
}

/**
 * Results for `content`: reused from `previous` when its input is identical and it was computed by
 * this core (saving notes, controls or sign-off text does not recompute), otherwise recomputed.
 */
function resultsFor(ctx: StoreContext, content: AssessmentContent, previous: RevisionRow | null): Buffer {
  if (previous !== null && previous.calculated_with === ctx.calculatedWith) {
    const prevInput: unknown = (JSON.parse(previous.content_json) as { input?: unknown }).input;
    if (canonicalJson(prevInput) === canonicalJson(content.input)) return previous.results_z;
  }
  return encodeResults(evaluate(ctx, content.input));
}

/**
 * Refuse a save that started from an older state than the newest revision (another window, host
 * or officer saved or signed meanwhile): nothing is overwritten, and the officer is told when.
 */
export async function assertNotStale(ctx: StoreContext, id: Id, expected: SaveBase | undefined, doing: 'save' | 'sign' = 'save'): Promise<void> {
  if (expected === undefined) return;
  await refuseIfStale(ctx, await newestRevisionHead(ctx, id), expected, doing);
}

/**
 * The version check on a newest revision already read (a round trip less on a server than reading
 * it again): nothing when it is the one the officer opened, else the refusal naming who and when.
 */
async function refuseIfStale(ctx: StoreContext, current: RevisionHead, expected: SaveBase, doing: 'save' | 'sign' = 'save'): Promise<void> {
  if (current.id === expected.revisionId && current.version === expected.version) return;
  const signed = current.status !== 'draft' ? await getSignatureRow(ctx, current.id) : undefined;
  const at = signed?.signed_at ?? current.updated_at;
  // On an institution register the account that saved is named too (several officers share it).
  const by = signed ? null : await ctx.engine.lastWriter(ctx.q, 'revision', current.id);
  const what = signed ? `signed by ${signed.name}` : `saved as revision ${current.revision_no}${by !== null ? ` by ${by}` : ''}`;
  if (doing === 'sign') {
    throw new RecordError(
      'stale',
      `"${current.title}" was changed by someone else since you opened it: ${what} at ${clockTime(at)}. Nothing was signed — reload, review the revision again, then sign.`,
    );
  }
  throw new RecordError(
    'stale',
    `"${current.title}" was changed by someone else at ${clockTime(at)} (${what}) — reload and compare before saving again. Nothing was overwritten.`,
  );
}

export async function saveAssessment(ctx: StoreContext, id: Id, rawContent: AssessmentContent, expected?: SaveBase): Promise<Assessment> {
  // A saved draft or a new revision is evaluated with the register's checks in force now (issue 12);
  // a signed revision keeps the checks it was signed with in its content.
  const content = await contentWithChecks(ctx, normaliseContent(rawContent));
  // One read of the newest revision serves the early version check and the reuse of its results
  // (on a server each statement is a round trip); a missing one is told apart afterwards.
  const newest = await ctx.q.get('SELECT * FROM revision WHERE assessment_id = ? ORDER BY revision_no DESC LIMIT 1', id) as RevisionRow | undefined;
  if (newest === undefined) {
    await getAssessmentRow(ctx, id); // "No assessment …" when it is gone
    throw new RecordError('corrupt-database', `Assessment ${id} has no revision`);
  }
  const before = newest;
  if (expected !== undefined) await refuseIfStale(ctx, before, expected);
  const resultsZ = resultsFor(ctx, content, before);
  // Same bytes as stored in the draft: leave the column alone rather than rewrite the blob.
  const draftResults = before.status === 'draft' && resultsZ === before.results_z ? null : resultsZ;
  const now = ctx.now();
  await write(ctx, 'Assessment', async (ctx) => {
    // On a server, another officer's save or sign-off of this assessment waits here until ours commits.
    await lockRow(ctx, 'assessment', id);
    // The head (not the stored content) is all the check and the write below need.
    const current = await newestRevisionHead(ctx, id);
    await refuseIfStale(ctx, current, expected ?? { revisionId: before.id, version: before.version });
    if (current.status === 'draft') {
      await ctx.q.run(`UPDATE revision SET content_json = ?, results_z = coalesce(?, results_z), calculated_with = ?, updated_at = ?, title = ?, review_by = ?,
           version = version + 1 WHERE id = ? AND status = 'draft'`, JSON.stringify(content), draftResults, ctx.calculatedWith, now, content.title, content.reviewBy, current.id);
      await ctx.audit('saved', 'revision', current.id, `revision ${current.revision_no}`);
    } else {
      const revId = ctx.newId();
      await insertRevisionRow(ctx, {
        id: revId,
        assessment_id: id,
        revision_no: current.revision_no + 1,
        status: 'draft',
        content_json: JSON.stringify(content),
        results_z: resultsZ,
        calculated_with: ctx.calculatedWith,
        based_on: current.id,
        created_at: now,
        updated_at: now,
        title: content.title,
        review_by: content.reviewBy,
        version: 1,
      });
      await ctx.audit('revised', 'revision', revId, `revision ${current.revision_no + 1} based on ${current.revision_no}`);
    }
  });
  return await getAssessment(ctx, id);
}

export async function discardDraft(ctx: StoreContext, id: Id): Promise<void> {
  await getAssessmentRow(ctx, id);
  await write(ctx, 'Draft', async (ctx) => {
    const current = await newestRevisionRow(ctx, id);
    if (current.status !== 'draft') throw new RecordError('conflict', `Assessment ${id} has no open draft (revision ${current.revision_no} is ${current.status})`);
    await ctx.q.run("DELETE FROM revision WHERE id = ? AND status = 'draft'", current.id);
    if (current.revision_no === 1) await ctx.q.run('DELETE FROM assessment WHERE id = ?', id);
    await ctx.audit('discarded', 'revision', current.id, `revision ${current.revision_no}`);
  });
}

/** The fields of a signature row that its statement covers. */
export type StatementFields = Pick<
  SignatureRow,
  'person_id' | 'name' | 'role' | 'signed_at' | 'statement' | 'fingerprint' | 'statement_version' | 'previous_link' | 'trust_anchor' | 'key_id'
>;

export function statementFor(a: AssessmentRow, r: Pick<RevisionRow, 'id' | 'revision_no'>, s: StatementFields): SignedStatement {
  const common = {
    format: 'beamwarden-signed-statement' as const,
    assessmentId: a.id,
    roomId: a.room_id,
    installationId: a.installation_id,
    revisionId: r.id,
    revisionNo: r.revision_no,
    fingerprint: s.fingerprint,
    personId: s.person_id,
    name: s.name,
    role: s.role,
    signedAt: s.signed_at,
    statement: s.statement,
  };
  if (s.statement_version !== 2) return { ...common, version: 1 };
  return { ...common, version: 2, keyId: s.key_id, previousLink: s.previous_link, trustAnchor: s.trust_anchor ?? '' };
}

export async function registerKey(ctx: StoreContext, keyId: string, publicKey: string, origin: 'this-database' | 'imported'): Promise<void> {
  await ctx.q.run('INSERT INTO signing_key (key_id, public_key, origin, added_at) VALUES (?, ?, ?, ?) ON CONFLICT(key_id) DO NOTHING', keyId, publicKey, origin, ctx.now());
}

/** Chain link of the newest signed (not superseded) revision of an assessment, or null. */
async function newestSignedLink(ctx: StoreContext, a: AssessmentRow): Promise<string | null> {
  return (await newestSigned(ctx, a)).link;
}

/** The newest signed revision: whether there is one, and its chain link (null without a signature). */
async function newestSigned(ctx: StoreContext, a: AssessmentRow): Promise<{ present: boolean; link: string | null }> {
  // One query (a round trip less on a server): the newest signed revision's number and its
  // signature, if it has one (LEFT JOIN: a signed revision without its signature gives null, as
  // before, never an older revision's link). Its content and results are not read here.
  const row = await ctx.q.get(
    `SELECT r.id AS signed_revision_id, r.revision_no AS signed_revision_no, s.* FROM revision r LEFT JOIN signature s ON s.revision_id = r.id
     WHERE r.assessment_id = ? AND r.status = 'signed' ORDER BY r.revision_no DESC LIMIT 1`,
    a.id,
  ) as (SignatureRow & { signed_revision_id: string; signed_revision_no: number; revision_id: string | null }) | undefined;
  if (!row) return { present: false, link: null };
  if (row.revision_id === null) return { present: true, link: null };
  return { present: true, link: linkOf(statementFor(a, { id: row.signed_revision_id, revision_no: row.signed_revision_no }, row)) };
}

export const INSERT_SIGNATURE = `INSERT INTO signature (revision_id, person_id, name, role, signed_at, statement, fingerprint, algorithm, signature, key_id,
  statement_version, previous_link, trust_anchor)
  VALUES (@revision_id, @person_id, @name, @role, @signed_at, @statement, @fingerprint, 'Ed25519', @signature, @key_id,
  @statement_version, @previous_link, @trust_anchor)`;

/**
 * Sign the current draft with the signer's personal key. The passphrase opens the key (wrong: refused,
 * nothing changes); the signer's name and role are those of the key's owner and the time is this
 * back end's clock. The statement covers the fingerprint, the previous signed revision's link and the
 * trust anchor, and is recorded in the signing log outside the database.
 */
export async function signAssessment(ctx: StoreContext, id: Id, rawSignOff: SignOff, reviewed?: SaveBase): Promise<Assessment> {
  const signOff = parseOrThrow(SignOffSchema, rawSignOff, 'Sign-off');
  // What the officer reviewed in the confirm step must still be the draft that is signed.
  await assertNotStale(ctx, id, reviewed, 'sign');
  const person = await getPerson(ctx, signOff.personId);
  if (!person.role.trim()) throw new RecordError('invalid', `Enter ${person.name}'s role in the register (People) before signing: the signature records it.`, [{ path: 'personId', problem: 'the person has no role' }]);
  return await signDraftWith(ctx, id, signOff.statement, (build) => signAsPerson(ctx, signOff.personId, signOff.passphrase, build), reviewed);
}

/** Produces the signature: identity and time decided by the signer function (signAsPerson in the app). */
export type DraftSigner = (build: (signer: Signer) => SignedStatement) => Promise<{ signer: Signer; payload: SignedStatement; signature: string }>;

/** Sign the current draft with `signWith` (the app passes signAsPerson; the demo and benchmark an unlocked key). */
export async function signDraftWith(ctx: StoreContext, id: Id, statementText: string, signWith: DraftSigner, reviewed?: SaveBase): Promise<Assessment> {
  const prepared = await prepareSignOff(ctx, id);
  const signed = await signWith(statementBuilder(prepared, statementText));
  await commitSignOff(ctx, prepared, signed, reviewed);
  return await getAssessment(ctx, id);
}

/** What a sign-off covers, computed before the passphrase is asked for and before the write transaction. */
export interface PreparedSignOff {
  readonly assessment: AssessmentRow;
  readonly draft: RevisionRow;
  readonly results: RoomResult;
  readonly fingerprint: string;
  readonly previousLink: string | null;
  /** The results as stored (compressed here, so the write transaction does not hold the lock for it). */
  readonly resultsZ: Buffer;
}

/**
 * The first phase of a sign-off, outside any transaction: the draft, its results as this core
 * computes them now (so the signed results are never stale), their fingerprint and the link of the
 * signed revision it follows. `commitSignOff` checks all of it again under the row lock.
 */
export async function prepareSignOff(ctx: StoreContext, id: Id): Promise<PreparedSignOff> {
  const a = await getAssessmentRow(ctx, id);
  const draft = await newestRevisionRow(ctx, id);
  if (draft.status !== 'draft') throw new RecordError('conflict', `Nothing to sign: revision ${draft.revision_no} is already ${draft.status}`);
  const content = parseOrThrow(AssessmentContentSchema, JSON.parse(draft.content_json), 'Draft content');
  const results = evaluate(ctx, content.input);
  const fingerprint = fingerprintOf(content, results, ctx.calculatedWith);
  const previousLink = await newestSignedLink(ctx, a);
  return { assessment: a, draft, results, fingerprint, previousLink, resultsZ: encodeResults(results) };
}

/** The statement the signer signs for a prepared sign-off (identity and time come from the signer). */
export function statementBuilder(p: PreparedSignOff, statementText: string): (signer: Signer) => SignedStatement {
  return (signer) =>
    statementFor(p.assessment, p.draft, {
      person_id: signer.personId,
      name: signer.name,
      role: signer.role,
      signed_at: signer.signedAt,
      statement: statementText,
      fingerprint: p.fingerprint,
      statement_version: 2,
      previous_link: p.previousLink,
      trust_anchor: signer.trustAnchor,
      key_id: signer.keyId,
    });
}

/**
 * The signing transaction: row lock, the draft and the chain checked again (a save or sign-off that
 * landed meanwhile refuses this one), the signature row, the previous signed revision superseded,
 * the audit event and, last before the commit, the signing log outside the database.
 */
export async function commitSignOff(
  ctx: StoreContext,
  p: PreparedSignOff,
  signed: { signer: Signer; payload: SignedStatement; signature: string },
  reviewed?: SaveBase,
): Promise<void> {
  const { assessment: a, draft, fingerprint, previousLink, resultsZ } = p;
  const id = a.id;
  const st = signed.payload;
  // Key rows are never changed or deleted (signing_key_no_update / _no_delete): a key already
  // registered before the transaction is still there inside it, so the insert is needed only for a
  // new key (a round trip less on a server).
  const keyKnown = (await ctx.q.get('SELECT 1 AS known FROM signing_key WHERE key_id = ?', signed.signer.keyId)) !== undefined;
  await write(ctx, 'Sign-off', async (ctx) => {
    // The row lock of the sign-off: a concurrent save or sign-off of this assessment waits for it.
    await lockRow(ctx, 'assessment', id);
    const again = await newestRevisionHead(ctx, id);
    // What the officer reviewed must still be the newest (read once with the check below; the
    // refusal itself names who changed it).
    if (reviewed !== undefined && (again.id !== reviewed.revisionId || again.version !== reviewed.version)) await assertNotStale(ctx, id, reviewed, 'sign');
    // The save counter too: a save that landed between reading the draft and this transaction
    // changed the content the signature covers (requests of one host now interleave at awaits).
    if (again.id !== draft.id || again.status !== 'draft' || again.version !== draft.version) throw new RecordError('conflict', 'The assessment changed while signing; try again');
    const before = await newestSigned(ctx, a);
    if (before.link !== previousLink) throw new RecordError('conflict', 'Another revision was signed meanwhile; try again');
    if (!resultsZ.equals(draft.results_z) || draft.calculated_with !== ctx.calculatedWith) {
      await ctx.q.run("UPDATE revision SET results_z = ?, calculated_with = ? WHERE id = ? AND status = 'draft'", resultsZ, ctx.calculatedWith, draft.id);
    }
    if (!keyKnown) await registerKey(ctx, signed.signer.keyId, signed.signer.publicKey, 'this-database');
    await ctx.q.run(...named(INSERT_SIGNATURE, {
      revision_id: draft.id,
      person_id: st.personId,
      name: st.name,
      role: st.role,
      signed_at: st.signedAt,
      statement: st.statement,
      fingerprint,
      signature: signed.signature,
      key_id: signed.signer.keyId,
      statement_version: 2,
      previous_link: previousLink,
      trust_anchor: signed.signer.trustAnchor,
    }));
    // Read under the lock just above: with no signed revision there is nothing to supersede.
    if (before.present) await ctx.q.run("UPDATE revision SET status = 'superseded' WHERE assessment_id = ? AND status = 'signed'", id);
    // The save counter moves on: a save started before the sign-off is stale.
    await ctx.q.run("UPDATE revision SET status = 'signed', version = version + 1 WHERE id = ?", draft.id);
    await ctx.audit('signed', 'revision', draft.id, `revision ${draft.revision_no} by ${st.name} (${st.role}), key ${shortKeyFingerprint(signed.signer.keyId)}`);
    // Last step before the commit: if the witness outside the database cannot be written, nothing is signed.
    appendSigningLog(ctx.keyDir, {
      assessmentId: a.id,
      revisionId: draft.id,
      revisionNo: draft.revision_no,
      link: linkOf(st),
      signedAt: st.signedAt,
      keyId: signed.signer.keyId,
    });
  });
}

// ---------------------------------------------------------------- verify

const MAX_DIFFERENCES = 200;

/**
 * The revision chain of one assessment: numbering without gaps, each signed statement naming the
 * link of the signed revision stored before it, statuses consistent with the order of signing,
 * list columns equal to the signed content, and every signature the signing log (outside the
 * database) remembers still present and unchanged. One plain sentence per problem.
 */
export async function chainFindings(ctx: StoreContext, a: AssessmentRow, read?: AssessmentRows): Promise<string[]> {
  const out: string[] = [];
  const rows = read?.rows ?? (await ctx.q.all('SELECT * FROM revision WHERE assessment_id = ? ORDER BY revision_no', a.id) as RevisionRow[]);
  rows.forEach((r, i) => {
    const prevNo = i === 0 ? 0 : (rows[i - 1]?.revision_no ?? 0);
    if (r.revision_no !== prevNo + 1) {
      out.push(
        r.revision_no > prevNo + 1
          ? `Revision ${prevNo + 1}${r.revision_no > prevNo + 2 ? `–${r.revision_no - 1}` : ''} is missing (the numbers jump from ${prevNo} to ${r.revision_no}): a revision was deleted outside Beamwarden.`
          : `Revision numbers are out of order at ${r.revision_no}: revisions were renumbered outside Beamwarden.`,
      );
    }
  });
  const links = new Map<string, string>();
  const signedRows = rows.filter((r) => r.status !== 'draft');
  let prevLink: string | null = null;
  let prevNo: number | null = null;
  for (const r of signedRows) {
    const sig = read ? read.signatures.get(r.id) : await getSignatureRow(ctx, r.id);
    if (!sig) continue;
    const link = linkOf(statementFor(a, r, sig));
    links.set(r.id, link);
    if (sig.statement_version === 2 && (sig.previous_link ?? null) !== prevLink) {
      out.push(
        prevLink === null
          ? `Revision ${r.revision_no} was signed as following an earlier signed revision, but none is stored before it: a signed revision was deleted outside Beamwarden.`
          : sig.previous_link === null
            ? `Revision ${r.revision_no} was signed as the first signed revision, but revision ${prevNo} is stored before it as signed: revisions were inserted or reordered outside Beamwarden.`
            : `Revision ${r.revision_no} was signed following a different revision than revision ${prevNo} stored before it: a revision was removed, reordered or replaced outside Beamwarden.`,
      );
    }
    prevLink = link;
    prevNo = r.revision_no;
  }
  const last = signedRows.at(-1);
  for (const r of signedRows) {
    if (r === last && r.status !== 'signed') {
      out.push(`Revision ${r.revision_no} is marked ${r.status}, but no later signed revision replaces it: its status was changed from signed to ${r.status} outside Beamwarden.`);
    }
    if (r !== last && r.status === 'signed') {
      out.push(`Revision ${r.revision_no} is still marked signed although revision ${last?.revision_no ?? ''} was signed after it: its status was changed outside Beamwarden.`);
    }
  }
  for (const r of rows) {
    let c: { title?: unknown; reviewBy?: unknown } = {};
    try {
      c = JSON.parse(r.content_json) as { title?: unknown; reviewBy?: unknown };
    } catch {
      continue; // reported with the content
    }
    if (typeof c.title === 'string' && r.title !== c.title) {
      out.push(`The register lists revision ${r.revision_no} with the title "${r.title}", but its recorded content says "${c.title}": the list column was changed outside Beamwarden.`);
    }
    if ((c.reviewBy ?? null) !== (r.review_by ?? null)) {
      out.push(
        `The register lists revision ${r.revision_no} for review by ${r.review_by ?? '(no date)'}, but its recorded content says ${String(c.reviewBy ?? '(no date)')}: the list column was changed outside Beamwarden.`,
      );
    }
  }
  for (const entry of signingLogFor(ctx.keyDir, a.id)) {
    const row = rows.find((r) => r.id === entry.revisionId);
    if (!row || row.status === 'draft') {
      out.push(
        `The signing log outside the database records revision ${entry.revisionNo}, signed on ${entry.signedAt.slice(0, 10)} with key ${shortKeyFingerprint(entry.keyId)}, ` +
          'but this database does not have it as signed: it was deleted outside Beamwarden (or the database was restored from an older copy).',
      );
    } else if (links.get(row.id) !== entry.link) {
      out.push(`Revision ${row.revision_no} is not the one the signing log recorded when it was signed: its signature record was replaced outside Beamwarden.`);
    }
  }
  return out;
}

/**
 * The record fingerprint of the stored content and results. `results` is the recomputed object when
 * its JSON text is the stored text byte for byte (`sameText`); should that object hold anything the
 * canonical form refuses, the stored text itself is parsed and fingerprinted, so the fingerprint is
 * always that of the stored values.
 */
function fingerprintOfStored(content: AssessmentContent, results: RoomResult, sameText: boolean, storedText: string, calculatedWith: string): string {
  if (!sameText) return fingerprintOf(content, results, calculatedWith);
  try {
    return fingerprintOf(content, results, calculatedWith);
  } catch {
    return fingerprintOf(content, JSON.parse(storedText) as RoomResult, calculatedWith);
  }
}

/** An assessment's revision rows (oldest first) and their signature rows, read once for a verify. */
interface AssessmentRows {
  readonly rows: readonly RevisionRow[];
  readonly signatures: ReadonlyMap<Id, SignatureRow>;
}

/** The checks that belong to the whole assessment and the database, not to one revision. */
interface SharedChecks {
  readonly chain: readonly string[];
  readonly missing: readonly string[];
  /** Rows already read for the chain: the same rows are checked, not read again. */
  readonly assessment?: AssessmentRow;
  readonly row?: RevisionRow;
  readonly signature?: SignatureRow | undefined;
  readonly trust?: RunTrust;
}

/** The trust list this desk believes and what stands in its way, read once for a verify run. */
interface RunTrust {
  readonly read: TrustRead;
  readonly problems: readonly string[];
}

/**
 * What a verify run over many assessments (`npm run verify -- --all`, one per worker thread) reads
 * once instead of once per assessment: the database protections (a property of the database, not
 * of an assessment) and the trust list under this desk's anchor with its problems. Every signature
 * is still judged against that list (`trustOf`, chain of endorsements to the anchor, per key); the
 * list is that of the run's start, as if the run were quicker. Start a new object for each run.
 */
export interface VerifyRun {
  protections?: readonly string[];
  trust?: RunTrust;
}

/**
 * Every signed (and superseded) revision of an assessment verified, oldest first: each revision's
 * own checks as `verifyAssessment` runs them, with the revision chain and the database protections
 * (the same for every revision of the assessment) read once instead of once per revision.
 */
export async function verifySignedRevisions(ctx: StoreContext, assessmentId: Id, run: VerifyRun = {}): Promise<VerifyReport[]> {
  const a = await getAssessmentRow(ctx, assessmentId);
  // One read of the revisions and one of their signatures serve the chain and every revision's checks.
  const rows = await ctx.q.all('SELECT * FROM revision WHERE assessment_id = ? ORDER BY revision_no', a.id) as RevisionRow[];
  const signatures = new Map<Id, SignatureRow>();
  for (const sig of await ctx.q.all<SignatureRow>(`${SIGNATURE_SELECT_ALL} WHERE s.revision_id IN (SELECT id FROM revision WHERE assessment_id = ?)`, a.id)) signatures.set(sig.revision_id, sig);
  const read: AssessmentRows = { rows, signatures };
  run.protections ??= await ctx.engine.missingProtections();
  if (run.trust === undefined) {
    const trust = await loadTrust(ctx);
    run.trust = { read: trust, problems: await trustProblems(ctx, trust) };
  }
  const chain = await chainFindings(ctx, a, read);
  const out: VerifyReport[] = [];
  for (const r of rows) {
    // Signed and superseded revisions, and a draft that has a signature (its status was changed).
    if (r.status === 'draft' && !signatures.has(r.id)) continue;
    out.push(await verifyAssessment(ctx, assessmentId, r.id, { chain, missing: run.protections, assessment: a, row: r, signature: signatures.get(r.id), trust: run.trust }));
  }
  return out;
}

export async function verifyAssessment(ctx: StoreContext, assessmentId: Id, revisionId?: Id, shared?: SharedChecks): Promise<VerifyReport> {
  const a = shared?.assessment ?? await getAssessmentRow(ctx, assessmentId);
  let r: RevisionRow;
  if (revisionId !== undefined) {
    r = shared?.row?.id === revisionId ? shared.row : await getRevisionRow(ctx, revisionId);
    if (r.assessment_id !== assessmentId) throw new RecordError('invalid', `Revision ${revisionId} does not belong to assessment ${assessmentId}`);
  } else {
    r =
      (await ctx.q.get("SELECT * FROM revision WHERE assessment_id = ? AND status <> 'draft' ORDER BY revision_no DESC LIMIT 1", assessmentId) as RevisionRow | undefined) ?? await newestRevisionRow(ctx, assessmentId);
  }
  const findings: string[] = [];
  const checks: VerifyCheck[] = [];
  const sig = shared?.row === r ? shared.signature : await getSignatureRow(ctx, r.id);

  // 1. Stored content and results readable? 2. Recompute with this core.
  // The inputs are recomputed first: when the core's JSON text of the recomputed results is byte
  // for byte the stored text, the stored results are those values (JSON.parse of a text that
  // JSON.stringify wrote gives back the same JSON values), so the stored text is not parsed again
  // (a room's results are ~80 kB of JSON: parsing them was a tenth of verify's time, npm run bench).
  // Any other stored text is parsed and compared in canonical form, as before.
  let content: AssessmentContent | null = null;
  let storedResults: unknown = null;
  let storedText = '';
  let recomputed: RoomResult | null = null;
  let recomputeError: Error | null = null;
  let sameText = false;
  try {
    storedText = brotliDecompressSync(r.results_z).toString('utf8');
    const c = AssessmentContentSchema.safeParse(JSON.parse(r.content_json));
    if (c.success) {
      try {
        recomputed = ctx.evaluate(c.data.input);
        sameText = JSON.stringify(recomputed) === storedText;
      } catch (e) {
        recomputeError = e as Error;
      }
    }
    storedResults = sameText ? recomputed : JSON.parse(storedText);
    if (c.success) content = c.data;
    else findings.push(`The stored content is not a valid assessment (${c.error.issues[0]?.message ?? 'schema'}): it was changed outside Beamwarden.`);
  } catch {
    findings.push('The stored content or results cannot be read (not valid JSON or not valid compressed data): the record was changed outside Beamwarden.');
  }

  let differences: FieldDifference[] = [];
  let resultsMatchCore = false;
  if (content !== null) {
    try {
      if (recomputeError !== null || recomputed === null) throw recomputeError ?? new Error('no results');
      // Byte-equal JSON means equal values (the quick test); otherwise compare canonical forms.
      resultsMatchCore = sameText || canonicalJson(recomputed) === canonicalJson(storedResults);
      if (!resultsMatchCore) {
        differences = diffValues(storedResults, recomputed, 'results');
        findings.push(
          r.calculated_with === ctx.calculatedWith
            ? `Recomputing the stored inputs gives different results (${differences.length} values) with the same core version: the stored results were changed.`
            : `Recomputing with ${ctx.calculatedWith} gives different results (${differences.length} values) from those stored by ${r.calculated_with}.`,
        );
      }
    } catch (e) {
      findings.push(`The stored inputs cannot be recomputed with ${ctx.calculatedWith}: ${(e as Error).message}`);
    }
  }
  checks.push({ check: 'results', ok: resultsMatchCore, finding: resultsMatchCore ? `The results recompute identically with ${ctx.calculatedWith}.` : (findings.at(-1) ?? 'The results could not be recomputed.') });
  if (differences.length > MAX_DIFFERENCES) {
    findings.push(`Only the first ${MAX_DIFFERENCES} of ${differences.length} differences are listed.`);
    differences = differences.slice(0, MAX_DIFFERENCES);
  }

  // 3. Fingerprint, signature and the key's trust (the register's endorsements under this desk's anchor).
  let fingerprintMatches = false;
  let signatureValid = false;
  let keyTrusted = false;
  let trustChain: readonly string[] = [];
  const trust = shared?.trust?.read ?? await loadTrust(ctx);
  if (!sig) {
    findings.push(
      r.status === 'draft'
        ? `Revision ${r.revision_no} is a draft: it has not been signed, so there is nothing to check it against.`
        : `Revision ${r.revision_no} is marked ${r.status} but its signature is missing: the record was changed outside Beamwarden.`,
    );
  } else {
    // Stored results equal to this core's recomputation are a room result by construction: the
    // schema is asked only about results that differ (a large room's results take ~1 ms to parse).
    if (content !== null && (resultsMatchCore || RoomResultSchema.safeParse(storedResults).success)) {
      fingerprintMatches = fingerprintOfStored(content, storedResults as RoomResult, sameText, storedText, r.calculated_with) === sig.fingerprint;
    }
    const fpText = fingerprintMatches
      ? `The fingerprint ${sig.fingerprint.slice(0, 16)}… matches the stored content and results.`
      : 'The fingerprint does not match the stored content and results: they were changed after signing.';
    if (!fingerprintMatches) findings.push(fpText);
    checks.push({ check: 'fingerprint', ok: fingerprintMatches, finding: fpText });

    const verdict = trustOf(trust.list, sig.key_id);
    trustChain = verdict.chain;
    // The public key comes from the trust list when the key is on it: the database copy is not relied on.
    const publicKey = verdict.entry?.publicKey ?? sig.public_key;
    let keyMatches = false;
    try {
      keyMatches = publicKey !== null && keyIdOf(publicKey) === sig.key_id;
    } catch {
      keyMatches = false;
    }
    signatureValid = keyMatches && publicKey !== null && verifyStatement(publicKey, statementFor(a, r, sig), sig.signature);
    let sigText = signatureValid
      ? `The Ed25519 signature by ${sig.name} (${sig.role}) of ${sig.signed_at.slice(0, 10)} is valid for the statement, fingerprint and chain recorded.`
      : 'The signature is not valid for the signer, date, statement and fingerprint recorded: the sign-off was changed.';
    if (signatureValid && verdict.entry?.personId && sig.person_id !== verdict.entry.personId) {
      signatureValid = false;
      sigText = `The signature names ${sig.name} as the signer, but key ${shortKeyFingerprint(sig.key_id)} belongs to ${verdict.entry.personName}: the sign-off was made in someone else's name.`;
    }
    if (signatureValid && verdict.entry?.retiredAt && sig.signed_at > verdict.entry.retiredAt) {
      signatureValid = false;
      sigText = `The signature is dated ${sig.signed_at.slice(0, 10)}, after key ${shortKeyFingerprint(sig.key_id)} was retired on ${verdict.entry.retiredAt.slice(0, 10)}.`;
    }
    if (!signatureValid) findings.push(sigText);
    checks.push({ check: 'signature', ok: signatureValid, finding: sigText });

    keyTrusted = verdict.trusted && trust.problem === null;
    let trustText = keyTrusted
      ? `Key ${shortKeyFingerprint(sig.key_id)} is trusted on this desk: ${verdict.chain.join(' ')}`
      : `Key ${shortKeyFingerprint(sig.key_id)} is NOT trusted here — a key that only the database lists proves nothing. ${verdict.chain.join(' ')}`;
    const listProblems = shared?.trust?.problems ?? await trustProblems(ctx, trust);
    if (listProblems.length) {
      keyTrusted = false;
      trustText = `${trustText} ${listProblems.join(' ')}`;
    }
    if (keyTrusted && sig.statement_version === 2 && sig.trust_anchor !== trust.list?.anchor) {
      // Signed at another installation (an import whose key was admitted here): worth saying, not a failure.
      trustText += ` It was signed at another installation (trust anchor ${shortKeyFingerprint(sig.trust_anchor ?? '')}).`;
    }
    if (sig.statement_version !== 2) trustText += ' (Signed with the installation key, before personal keys.)';
    if (!keyTrusted) findings.push(trustText);
    checks.push({ check: 'key-trusted', ok: keyTrusted, finding: trustText });
    if (r.status === 'draft') findings.push('A signature exists but the revision is marked as a draft: the status was changed outside Beamwarden.');
  }
  // 3b. Co-signatures (schema 7): each with its own signature, trust and cover of the main signature.
  const coSignatures = await checkCoSignatures(ctx, a, r, sig ? { link: linkOf(statementFor(a, r, sig)), fingerprint: sig.fingerprint } : null);
  for (const c of coSignatures) {
    checks.push({ check: 'co-signature', ok: c.ok, finding: c.finding });
    if (!c.ok) findings.push(c.finding);
  }

  // 3c. The checks of the limit tables the results used (issue 12): each signed, trusted, as recorded.
  if (content !== null) {
    for (const c of await checksUsedFindings(ctx, content.input)) {
      checks.push({ check: 'limit-table-check', ok: c.ok, finding: c.finding });
      if (!c.ok) findings.push(c.finding);
    }
  }

  // 4. The revision chain and 5. the database's own protections.
  const chain = shared?.chain ?? await chainFindings(ctx, a);
  const chainIntact = chain.length === 0;
  findings.push(...chain);
  checks.push({ check: 'chain', ok: chainIntact, finding: chainIntact ? 'The revision chain is whole: no signed revision removed, reordered or re-marked, and the list matches the content.' : chain.join(' ') });
  const missing = shared?.missing ?? await ctx.engine.missingProtections();
  const protectionsOk = missing.length === 0;
  const protText = protectionsOk
    ? 'The database protections against changing signed records are in place.'
    : `The database protections against changing signed records were removed (${missing.join(', ')}): someone changed the database with another tool.`;
  if (!protectionsOk) findings.push(protText);
  checks.push({ check: 'protections', ok: protectionsOk, finding: protText });

  const signed = sig !== undefined && r.status !== 'draft';
  const ok = signed && fingerprintMatches && signatureValid && keyTrusted && resultsMatchCore && chainIntact && protectionsOk && coSignatures.every((c) => c.ok) && checks.every((c) => c.check !== 'limit-table-check' || c.ok);
  if (ok) findings.push(`Revision ${r.revision_no} is intact: signature valid, key trusted, fingerprint matches, results recompute, chain whole.`);
  return {
    ok,
    assessmentId,
    revisionId: r.id,
    revisionNo: r.revision_no,
    status: r.status,
    signed,
    fingerprintMatches,
    signatureValid,
    keyTrusted,
    trustChain,
    chainIntact,
    signer: sig ? { name: sig.name, role: sig.role, signedAt: sig.signed_at, keyFingerprint: shortKeyFingerprint(sig.key_id) } : null,
    checks,
    resultsMatchCore,
    calculatedWith: r.calculated_with,
    verifiedWith: ctx.calculatedWith,
    differences,
    findings,
    coSignatures,
  };
}

