/**
 * Export and import: a whole site, one room or one assessment as one JSON document of our own
 * design, `{ format: 'beamwarden-export', version: 2, ... }` (see types.ts ExportDocument). Version 2
 * adds the co-signatures (co-signature-exchange.ts); files of version 1 still import.
 *
 * Import policy (all or nothing, one transaction):
 * - The document is validated against ExportDocumentSchema (strict: unknown fields are errors),
 *   then cross-checked (every reference resolves, ids are unique, every signed revision's
 *   fingerprint and Ed25519 signature match its content). Any problem: nothing is written, and
 *   the error lists each path and problem.
 * - Records are matched by id. A record not present is added. A register entry (site, room,
 *   installation, eyewear, person) already present is replaced in place only if the imported copy
 *   is newer (updatedAt, compared as instants). A signed revision already present must be
 *   identical, otherwise the import is refused: two different signed records with one id mean one
 *   was altered.
 * - No draft is ever discarded: where the file and this database hold different versions of a
 *   draft, the one that does not stay in the assessment is kept as an assessment of its own in the
 *   same room (import-conflicts.ts) and listed in the summary.
 */
import { z } from 'zod';
import { ExportDocumentSchema } from '../schemas/records.js';
import { formatZodIssues } from '../schemas/issues.js';
import { canonicalJson } from './canonical.js';
import type { StoreContext } from './context.js';
import { named } from './named-params.js';
import { encodeResults, INSERT_SIGNATURE, insertRevisionRow, registerKey, statementFor, type RevisionRow, type StatementFields } from './assessments.js';
import { inOrder, parseOrThrow } from './context.js';
import { admitKeys, ImportAdmissionSchema, unlockPersonalKey } from './personal-keys.js';
import { appendSigningLog, type SigningLogLine } from './signing-log.js';
import { shortKeyFingerprint, trustOf, type TrustList } from './trust-list.js';
import { loadTrust } from './trust-store.js';
import { getAssessment, getRevision, listRevisions } from './assessments.js';
import {
  getInstallation,
  getRoom,
  getSite,
  insertEyewear,
  insertInstallation,
  insertPerson,
  insertRoom,
  insertSite,
  listEyewear,
  listInstallations,
  listPeople,
  listRooms,
} from './register.js';
import { getEyewear, getPerson, replaceEyewear, replaceInstallation } from './register.js';
import { assumedDefaults, eyewearDefaultsAssumed } from './older-content.js';
import { keepDraftAsCopy } from './import-conflicts.js';
import { coSignatureIssues, coSignatureRefusal, coSignaturesOf, coSignerKeys, coSignerNames, importCoSignatures } from './co-signature-exchange.js';
import { fingerprintOf, keyIdOf, linkOf, verifyStatement } from './signing.js';
import { insertRowCheck, statementOf, type RowCheckRow } from './limit-row-checks.js';
import { createPublicKey, verify as verifyEd25519 } from 'node:crypto';
import {
  EXPORT_FORMAT,
  EXPORT_VERSION,
  READABLE_EXPORT_VERSIONS,
  RecordError,
  type ExportDocument,
  type ExportedAssessment,
  type ExportedCoSignature,
  type ExportedRowCheck,
  type Id,
  type ImportAdmission,
  type ImportIssue,
  type ImportSummary,
  type KeptDraft,
  type Person,
  type Revision,
  type Room,
  type Signature,
  type Site,
} from './types.js';

// ---------------------------------------------------------------- export

async function assessmentIdsOfRooms(ctx: StoreContext, roomIds: readonly Id[]): Promise<Id[]> {
  const out: Id[] = [];
  for (const rid of roomIds) {
    for (const r of await ctx.q.all<{ id: string }>('SELECT id FROM assessment WHERE room_id = ? ORDER BY created_at, id', rid)) out.push(r.id);
  }
  return out;
}

/** Whether a key is trusted is this installation's judgement: never written to a file, nor compared. */
function withoutTrust(r: Revision): Revision {
  if (!r.signature) return r;
  const { keyTrusted: _drop, ...signature } = r.signature;
  return { ...r, signature };
}

async function exportedAssessment(ctx: StoreContext, id: Id): Promise<ExportedAssessment> {
  const a = await getAssessment(ctx, id);
  const revisions = await inOrder(await listRevisions(ctx, id), async (s) => withoutTrust(await getRevision(ctx, s.id)));
  return { id: a.id, roomId: a.roomId, installationId: a.installationId, createdAt: a.createdAt, revisions };
}

async function signersOf(ctx: StoreContext, assessments: readonly ExportedAssessment[], coSigned: readonly ExportedCoSignature[]): Promise<Person[]> {
  const ids = new Set<string>();
  for (const a of assessments) for (const r of a.revisions) if (r.signature?.personId) ids.add(r.signature.personId);
  for (const c of coSigned) ids.add(c.personId);
  return inOrder([...ids].sort(), (id) => getPerson(ctx, id));
}

function keysOf(assessments: readonly ExportedAssessment[], coSignerKeys: ReadonlyArray<{ keyId: string; publicKey: string }>): ExportDocument['signingKeys'] {
  const keys = new Map<string, string>();
  for (const a of assessments) for (const r of a.revisions) if (r.signature) keys.set(r.signature.keyId, r.signature.publicKey);
  for (const k of coSignerKeys) keys.set(k.keyId, k.publicKey);
  return [...keys].sort(([a], [b]) => (a < b ? -1 : 1)).map(([keyId, publicKey]) => ({ keyId, publicKey }));
}

/** Every signed check of the limit tables in this register, as exported (issue 12). */
async function exportedChecks(ctx: StoreContext): Promise<ExportedRowCheck[]> {
  const rows = await ctx.q.all<RowCheckRow>('SELECT * FROM limit_row_checks ORDER BY signed_at, id');
  return rows.map((x) => {
    const st = statementOf(x);
    return {
      id: st.id, ruleSet: st.ruleSet === 'eu2006' ? 'eu2006' : 'icnirp2013', entryKey: st.entryKey, entryExpr: st.entryExpr, verdict: st.verdict, documentExpr: st.documentExpr,
      reference: st.reference, note: st.note, personId: st.personId, name: st.name, role: st.role, signedAt: st.signedAt, keyId: st.keyId, trustAnchor: st.trustAnchor, signature: x.signature,
    };
  });
}

/** The check's stored row from its exported form. */
function checkRowOf(c: ExportedRowCheck): RowCheckRow {
  return {
    id: c.id, rule_set: c.ruleSet, entry_key: c.entryKey, entry_expr: c.entryExpr, verdict: c.verdict, document_expr: c.documentExpr, reference: c.reference, note: c.note,
    person_id: c.personId, name: c.name, role: c.role, signed_at: c.signedAt, key_id: c.keyId, trust_anchor: c.trustAnchor, signature: c.signature,
  };
}

async function document(
  ctx: StoreContext,
  scope: ExportDocument['scope'],
  parts: Pick<ExportDocument, 'sites' | 'rooms' | 'installations' | 'eyewear' | 'assessments'> & { people?: Person[] },
): Promise<ExportDocument> {
  const coSignatures = await coSignaturesOf(ctx, parts.assessments);
  const limitRowChecks = await exportedChecks(ctx);
  const checkKeys: Array<{ keyId: string; publicKey: string }> = [];
  for (const keyId of new Set(limitRowChecks.map((c) => c.keyId))) {
    const k = await ctx.q.get<{ public_key: string }>('SELECT public_key FROM signing_key WHERE key_id = ?', keyId);
    if (k) checkKeys.push({ keyId, publicKey: k.public_key });
  }
  return {
    format: EXPORT_FORMAT,
    version: EXPORT_VERSION,
    exportedAt: ctx.now(),
    scope,
    sites: parts.sites,
    rooms: parts.rooms,
    installations: parts.installations,
    eyewear: parts.eyewear,
    people: parts.people ?? await signersOf(ctx, parts.assessments, coSignatures),
    assessments: parts.assessments,
    signingKeys: keysOf(parts.assessments, [...(await coSignerKeys(ctx, coSignatures)), ...checkKeys]),
    coSignatures,
    ...(limitRowChecks.length > 0 ? { limitRowChecks } : {}),
  };
}

/** Everything about a site: its rooms, lasers, eyewear, assessments, and every person in the register. */
export async function exportSite(ctx: StoreContext, siteId: Id): Promise<ExportDocument> {
  const site = await getSite(ctx, siteId);
  const rooms = await listRooms(ctx, siteId);
  const assessments = await inOrder(await assessmentIdsOfRooms(ctx, rooms.map((r) => r.id)), (id) => exportedAssessment(ctx, id));
  return await document(ctx, { kind: 'site', id: siteId }, {
    sites: [site],
    rooms,
    installations: (await inOrder(rooms, (r) => listInstallations(ctx, r.id))).flat(),
    eyewear: await listEyewear(ctx, siteId),
    people: await listPeople(ctx),
    assessments,
  });
}

/** One room with its site entry, lasers, the site's eyewear, its assessments and their signers. */
export async function exportRoom(ctx: StoreContext, roomId: Id): Promise<ExportDocument> {
  const room = await getRoom(ctx, roomId);
  const assessments = await inOrder(await assessmentIdsOfRooms(ctx, [roomId]), (id) => exportedAssessment(ctx, id));
  return await document(ctx, { kind: 'room', id: roomId }, {
    sites: [await getSite(ctx, room.siteId)],
    rooms: [room],
    installations: await listInstallations(ctx, roomId),
    eyewear: await listEyewear(ctx, room.siteId),
    assessments,
  });
}

/** One assessment with every revision, plus the site, room and installation it refers to. */
export async function exportAssessment(ctx: StoreContext, assessmentId: Id): Promise<ExportDocument> {
  const a = await exportedAssessment(ctx, assessmentId);
  const room = await getRoom(ctx, a.roomId);
  return await document(ctx, { kind: 'assessment', id: assessmentId }, {
    sites: [await getSite(ctx, room.siteId)],
    rooms: [room],
    installations: a.installationId ? [await getInstallation(ctx, a.installationId)] : [],
    eyewear: [],
    assessments: [a],
  });
}

// ---------------------------------------------------------------- import: validation

/** An Ed25519 signature over the canonical JSON of a payload (a check of the limit tables). */
function verifySigned(publicKeyPem: string, payload: unknown, signatureB64: string): boolean {
  try {
    return verifyEd25519(null, Buffer.from(canonicalJson(payload), 'utf8'), createPublicKey(publicKeyPem), Buffer.from(signatureB64, 'base64'));
  } catch {
    return false;
  }
}

function invalid(issues: ImportIssue[]): RecordError {
  const shown = issues.slice(0, 10).map((i) => `${i.path}: ${i.problem}`).join('; ');
  return new RecordError('invalid', `The file cannot be imported, nothing was changed: ${shown}${issues.length > 10 ? ` (and ${issues.length - 10} more)` : ''}`, issues);
}

/**
 * An export format version this Beamwarden does not read, in plain words naming it. Format version 1
 * is the first; files of it written before later optional fields existed import with their
 * documented defaults (older-content.ts), so a different number is a newer format or not ours.
 */
function versionProblem(version: unknown): string {
  const reads = `this Beamwarden reads export format versions ${READABLE_EXPORT_VERSIONS.join(' and ')}`;
  if (version === undefined) return `The export file does not say which format version it is; ${reads}.`;
  if (typeof version === 'number' && Number.isInteger(version) && version > EXPORT_VERSION) {
    return `The export file is format version ${version}, written by a newer Beamwarden; ${reads}. Update Beamwarden to import it.`;
  }
  if (typeof version === 'number' && Number.isInteger(version) && version >= 0) {
    return `The export file is format version ${version}, older than any Beamwarden release wrote; ${reads}.`;
  }
  const shown = typeof version === 'string' ? `"${version.slice(0, 40)}"` : JSON.stringify(version)?.slice(0, 40) ?? String(version);
  return `The export file gives its format version as ${shown}, which is not a version number Beamwarden writes; ${reads}.`;
}

/** Parse JSON text (or take an object), check the format header first for a precise message. */
export function parseExportDocument(input: unknown): ExportDocument {
  let value: unknown = input;
  if (typeof input === 'string') {
    try {
      value = JSON.parse(input);
    } catch (e) {
      throw invalid([{ path: '(document)', problem: `not valid JSON: ${(e as Error).message}` }]);
    }
  }
  const header = z.object({ format: z.unknown(), version: z.unknown().optional() }).safeParse(value);
  if (!header.success) throw invalid([{ path: '(document)', problem: 'must be a JSON object with "format": "beamwarden-export"' }]);
  if (header.data.format !== EXPORT_FORMAT) {
    throw invalid([{ path: 'format', problem: `must be "${EXPORT_FORMAT}" (this is not a Beamwarden export file)` }]);
  }
  if (!(READABLE_EXPORT_VERSIONS as readonly unknown[]).includes(header.data.version)) {
    const problem = versionProblem(header.data.version);
    throw new RecordError('invalid', `${problem} Nothing was changed.`, [{ path: 'version', problem }]);
  }
  const r = ExportDocumentSchema.safeParse(value);
  if (!r.success) throw invalid(formatZodIssues(r.error));
  rawOf.set(r.data, value);
  return r.data;
}

/** The document as it was in the file (before the schema rebuilt its objects), by parsed document. */
const rawOf = new WeakMap<object, unknown>();

/**
 * The results of revision `ri` of assessment `ai` as written in the file, when they are the same
 * values as the checked ones: stored so, a re-export gives the file's bytes back (the schema's
 * parse rebuilds objects in its own key order).
 */
function fileResults(doc: ExportDocument, ai: number, ri: number): unknown {
  const raw = rawOf.get(doc) as { assessments?: Array<{ revisions?: Array<{ results?: unknown }> }> } | undefined;
  const results = raw?.assessments?.[ai]?.revisions?.[ri]?.results;
  const checked = doc.assessments[ai]?.revisions[ri]?.results;
  return results !== undefined && canonicalJson(results) === canonicalJson(checked) ? results : checked;
}

async function crossCheck(ctx: StoreContext, doc: ExportDocument): Promise<ImportIssue[]> {
  const issues: ImportIssue[] = [];
  // Which referenced ids this database has, looked up once before the (synchronous) checks below.
  type Table = 'site' | 'room' | 'laser_installation' | 'person';
  const asked: Array<[Table, string]> = [
    ...doc.rooms.map((r): [Table, string] => ['site', r.siteId]),
    ...doc.installations.map((x): [Table, string] => ['room', x.roomId]),
    ...doc.eyewear.map((x): [Table, string] => ['site', x.siteId]),
    ...doc.assessments.flatMap((a): Array<[Table, string]> => [
      ['room', a.roomId],
      ...(a.installationId !== null ? [['laser_installation', a.installationId] as [Table, string]] : []),
      ...a.revisions.flatMap((r): Array<[Table, string]> => (r.signature?.personId ? [['person', r.signature.personId]] : [])),
    ]),
  ];
  const present = new Set<string>();
  for (const [table, id] of asked) {
    if (!present.has(`${table}:${id}`) && (await ctx.q.get(`SELECT 1 AS one FROM ${table} WHERE id = ?`, id)) !== undefined) present.add(`${table}:${id}`);
  }
  const exists = (table: Table, id: string) => present.has(`${table}:${id}`);
  const unique = (list: ReadonlyArray<{ id: string }>, name: string) => {
    const seen = new Set<string>();
    list.forEach((x, i) => {
      if (seen.has(x.id)) issues.push({ path: `${name}[${i}].id`, problem: `id ${x.id} appears twice` });
      seen.add(x.id);
    });
    return seen;
  };
  const siteIds = unique(doc.sites, 'sites');
  const roomIds = unique(doc.rooms, 'rooms');
  const instIds = unique(doc.installations, 'installations');
  unique(doc.eyewear, 'eyewear');
  const personIds = unique(doc.people, 'people');
  unique(doc.assessments, 'assessments');
  doc.rooms.forEach((r, i) => {
    if (!siteIds.has(r.siteId) && !exists('site', r.siteId)) issues.push({ path: `rooms[${i}].siteId`, problem: `site ${r.siteId} is neither in the file nor in this database` });
  });
  doc.installations.forEach((x, i) => {
    if (!roomIds.has(x.roomId) && !exists('room', x.roomId)) issues.push({ path: `installations[${i}].roomId`, problem: `room ${x.roomId} is neither in the file nor in this database` });
    if (x.laser.id !== x.id) issues.push({ path: `installations[${i}].laser.id`, problem: 'must equal the installation id' });
    if ((x.laser.classAsLabelled ?? null) !== x.classAsLabelled) issues.push({ path: `installations[${i}].classAsLabelled`, problem: 'must equal laser.classAsLabelled' });
  });
  doc.eyewear.forEach((x, i) => {
    if (!siteIds.has(x.siteId) && !exists('site', x.siteId)) issues.push({ path: `eyewear[${i}].siteId`, problem: `site ${x.siteId} is neither in the file nor in this database` });
  });
  const keys = new Map(doc.signingKeys.map((k) => [k.keyId, k.publicKey]));
  doc.signingKeys.forEach((k, i) => {
    let actual = '';
    try {
      actual = keyIdOf(k.publicKey);
    } catch {
      /* reported below */
    }
    if (actual !== k.keyId) issues.push({ path: `signingKeys[${i}].keyId`, problem: 'does not match the public key (not an Ed25519 key, or altered)' });
  });
  // Each check of the limit tables must carry a valid signature by a key in the file (issue 12).
  (doc.limitRowChecks ?? []).forEach((c, i) => {
    const pk = keys.get(c.keyId);
    const row = checkRowOf(c);
    if (pk === undefined) issues.push({ path: `limitRowChecks[${i}].keyId`, problem: 'no public key for this check in signingKeys' });
    else if (!verifySigned(pk, statementOf(row), c.signature)) issues.push({ path: `limitRowChecks[${i}].signature`, problem: `the signature of the check of ${c.entryKey} by ${c.name} is not valid for what it records (altered)` });
  });
  doc.assessments.forEach((a, ai) => {
    const base = `assessments[${ai}]`;
    if (!roomIds.has(a.roomId) && !exists('room', a.roomId)) issues.push({ path: `${base}.roomId`, problem: `room ${a.roomId} is neither in the file nor in this database` });
    if (a.installationId !== null && !instIds.has(a.installationId) && !exists('laser_installation', a.installationId)) {
      issues.push({ path: `${base}.installationId`, problem: `installation ${a.installationId} is neither in the file nor in this database` });
    }
    const revIds = new Set(a.revisions.map((r) => r.id));
    let drafts = 0;
    let signedNow = 0;
    a.revisions.forEach((r, ri) => {
      const p = `${base}.revisions[${ri}]`;
      if (r.assessmentId !== a.id) issues.push({ path: `${p}.assessmentId`, problem: 'must equal the assessment id' });
      if (r.revisionNo !== ri + 1) issues.push({ path: `${p}.revisionNo`, problem: `must be ${ri + 1} (revisions listed in order, numbered from 1)` });
      if (r.basedOn !== null && !revIds.has(r.basedOn)) issues.push({ path: `${p}.basedOn`, problem: `revision ${r.basedOn} is not in this assessment` });
      if (r.status === 'draft') drafts++;
      if (r.status === 'signed') signedNow++;
      if (r.status === 'draft' && ri !== a.revisions.length - 1) issues.push({ path: `${p}.status`, problem: 'only the newest revision can be a draft' });
      const s = r.signature;
      if (!s) return;
      if (s.personId !== null && !personIds.has(s.personId) && !exists('person', s.personId)) {
        issues.push({ path: `${p}.signature.personId`, problem: `person ${s.personId} is neither in the file nor in this database` });
      }
      const publicKey = keys.get(s.keyId);
      if (publicKey === undefined || publicKey !== s.publicKey) {
        issues.push({ path: `${p}.signature.keyId`, problem: 'its public key is not listed in signingKeys' });
        return;
      }
      if (fingerprintOf(r.content, r.results, r.calculatedWith) !== s.fingerprint) {
        issues.push({ path: `${p}.signature.fingerprint`, problem: 'does not match the content and results: the file was changed after signing' });
      }
      const row = { id: a.id, room_id: a.roomId, installation_id: a.installationId, created_at: a.createdAt };
      const rev = { id: r.id, revision_no: r.revisionNo };
      const stmt = statementFor(row, rev, signatureFields(s));
      if (!verifyStatement(publicKey, stmt, s.signature)) {
        issues.push({ path: `${p}.signature.signature`, problem: 'the Ed25519 signature is not valid for this sign-off: the file was changed after signing' });
      }
    });
    if (drafts > 1) issues.push({ path: `${base}.revisions`, problem: 'more than one draft revision' });
    if (signedNow > 1) issues.push({ path: `${base}.revisions`, problem: 'more than one revision marked signed (older ones are superseded)' });
  });
  return issues;
}

/** Each co-signature of the file checked (co-signature-exchange.ts); any that fails refuses the import. */
async function refuseForgedCoSignatures(ctx: StoreContext, doc: ExportDocument, trust: TrustList | null): Promise<void> {
  if (doc.coSignatures === undefined) return;
  const inFile = new Set(doc.people.map((p) => p.id));
  const known = new Set<string>();
  for (const c of doc.coSignatures) {
    if (inFile.has(c.personId) || (await ctx.q.get('SELECT 1 AS one FROM person WHERE id = ?', c.personId)) !== undefined) known.add(c.personId);
  }
  // A revision a co-signature names is signed (checked there), so its signature is present.
  const issues = coSignatureIssues(doc, (r) => signatureFields(r.signature as Signature), (id) => known.has(id), trust);
  if (issues.length) throw coSignatureRefusal(issues);
}

/** Key id -> the name of who signed or countersigned with it in the file (for the admission of keys). */
function signerNames(doc: ExportDocument): Map<string, string> {
  const out = coSignerNames(doc);
  for (const a of doc.assessments) for (const r of a.revisions) if (r.signature) out.set(r.signature.keyId, r.signature.name);
  for (const c of doc.limitRowChecks ?? []) if (!out.has(c.keyId)) out.set(c.keyId, c.name);
  return out;
}

// ---------------------------------------------------------------- import: writing

function signatureFields(s: Signature): StatementFields & { signature: string } {
  return {
    person_id: s.personId,
    name: s.name,
    role: s.role,
    signed_at: s.signedAt,
    statement: s.statement,
    fingerprint: s.fingerprint,
    statement_version: s.statementVersion ?? 1,
    previous_link: s.previousLink ?? null,
    trust_anchor: s.trustAnchor ?? null,
    key_id: s.keyId,
    signature: s.signature,
  };
}

const same = (a: unknown, b: unknown) => canonicalJson(a) === canonicalJson(b);

function revisionRow(r: Revision, results: unknown = r.results): RevisionRow {
  return {
    id: r.id,
    assessment_id: r.assessmentId,
    revision_no: r.revisionNo,
    status: 'draft',
    content_json: JSON.stringify(r.content),
    results_z: encodeResults(results as Revision['results']),
    calculated_with: r.calculatedWith,
    based_on: r.basedOn,
    created_at: r.createdAt,
    updated_at: r.updatedAt,
    title: r.content.title,
    review_by: r.content.reviewBy,
    version: 1,
  };
}

/** Timestamps compared as instants: "2026-05-01T10:00:00-05:00" is later than "2026-05-01T14:00:00Z". */
export function isNotOlder(local: string, imported: string): boolean {
  return Date.parse(local) >= Date.parse(imported);
}

/**
 * Signed revisions are accepted as signed only when their key is on this installation's trust
 * list, or when the officer explicitly admits the exporting site's key (`admit`: key ids shown with
 * their fingerprints, endorsed with a trusted signer's passphrase). Otherwise they are imported and
 * shown as unverified signatures everywhere — never as signed.
 */
export async function importDocument(ctx: StoreContext, input: unknown, rawAdmit?: ImportAdmission): Promise<ImportSummary> {
  const doc = parseExportDocument(input);
  const issues = await crossCheck(ctx, doc);
  if (issues.length) throw invalid(issues);
  const list = (await loadTrust(ctx)).list;
  await refuseForgedCoSignatures(ctx, doc, list);
  const signerOf = signerNames(doc);
  const untrusted = doc.signingKeys.filter((k) => signerOf.has(k.keyId) && !trustOf(list, k.keyId).trusted);
  let endorser: Awaited<ReturnType<typeof unlockPersonalKey>> | null = null;
  const admit = rawAdmit ? parseOrThrow(ImportAdmissionSchema, rawAdmit, 'Key admission') : null;
  if (admit && admit.keyIds.length > 0) {
    const unknown = admit.keyIds.filter((id) => !untrusted.some((k) => k.keyId === id));
    if (unknown.length) throw new RecordError('invalid', `Key ${shortKeyFingerprint(unknown[0] ?? '')} is not an untrusted signing key of this file; nothing was imported.`);
    // The passphrase is checked before anything is written.
    endorser = await unlockPersonalKey(ctx, admit.endorserPersonId, admit.endorserPassphrase);
  }
  const count = { sites: 0, rooms: 0, installations: 0, eyewear: 0, people: 0, assessments: 0, revisions: 0, unchanged: 0, unverified: 0 };
  let coSigned: string[] = [];
  const keptDrafts: KeptDraft[] = [];
  const logLines: SigningLogLine[] = [];

  const run = async (ctx: StoreContext): Promise<void> => {
    const upsert = async <T extends { id: string; updatedAt: string }>(
      list: readonly T[],
      key: keyof typeof count,
      read: (id: string) => Promise<T | null>,
      insert: (x: T) => Promise<unknown>,
      replace: (x: T) => Promise<unknown>,
    ): Promise<void> => {
      for (const x of list) {
        const local = await read(x.id);
        if (local === null) {
          await insert(x);
          count[key]++;
        } else if (same(local, x) || isNotOlder(local.updatedAt, x.updatedAt)) {
          count.unchanged++;
        } else {
          await replace(x);
          count[key]++;
        }
      }
    };
    const tryGet = async <T>(fn: () => Promise<T>): Promise<T | null> => {
      try {
        return await fn();
      } catch (e) {
        if (e instanceof RecordError && e.code === 'not-found') return null;
        throw e;
      }
    };
    await upsert(doc.sites, 'sites', (id) => tryGet(() => getSite(ctx, id)), (x) => insertSite(ctx, x), (x: Site) =>
      ctx.q.run(...named('UPDATE site SET name=@name, building=@building, address=@address, notes=@notes, updated_at=@updatedAt WHERE id=@id', x)),
    );
    await upsert(doc.people, 'people', (id) => tryGet(() => getPerson(ctx, id)), (x) => insertPerson(ctx, x), (x) =>
      ctx.q.run(...named('UPDATE person SET name=@name, role=@role, email=@email, phone=@phone, updated_at=@updatedAt WHERE id=@id', x)),
    );
    await upsert(doc.rooms, 'rooms', (id) => tryGet(() => getRoom(ctx, id)), (x) => insertRoom(ctx, x), (x: Room) =>
      ctx.q.run(...named('UPDATE room SET code=@code, name=@name, responsible_person=@responsiblePerson, contact=@contact, notes=@notes, updated_at=@updatedAt WHERE id=@id', x)),
    );
    // Replaced in place (UPDATE), never deleted and re-inserted: assessments refer to a laser by
    // its id, and the database refuses to delete a laser an assessment refers to.
    await upsert(doc.installations, 'installations', (id) => tryGet(() => getInstallation(ctx, id)), (x) => insertInstallation(ctx, x), (x) =>
      replaceInstallation(ctx, x),
    );
    await upsert(doc.eyewear, 'eyewear', (id) => tryGet(() => getEyewear(ctx, id)), (x) => insertEyewear(ctx, x), (x) => replaceEyewear(ctx, x));
    for (const k of doc.signingKeys) await registerKey(ctx, k.keyId, k.publicKey, 'imported');
    // Signed checks are added when new (never changed); whether one is used is judged here, on read.
    for (const c of doc.limitRowChecks ?? []) {
      const local = await ctx.q.get<RowCheckRow>('SELECT * FROM limit_row_checks WHERE id = ?', c.id);
      if (!local) await insertRowCheck(ctx, checkRowOf(c));
      else if (local.signature !== c.signature) throw invalid([{ path: `limitRowChecks`, problem: `the check ${c.id} exists here with a different signature: one of the two was altered` }]);
    }

    for (const [ai, a] of doc.assessments.entries()) {
      const localA = await ctx.q.get('SELECT room_id, installation_id FROM assessment WHERE id = ?', a.id) as
        | { room_id: string; installation_id: string | null }
        | undefined;
      if (!localA) {
        await ctx.q.run('INSERT INTO assessment (id, room_id, installation_id, created_at) VALUES (?, ?, ?, ?)', a.id, a.roomId, a.installationId, a.createdAt);
        count.assessments++;
      } else if (localA.room_id !== a.roomId || localA.installation_id !== a.installationId) {
        throw invalid([{ path: `assessments[${ai}].roomId`, problem: 'this assessment exists here for a different room or installation' }]);
      }
      const of = { assessmentId: a.id, roomId: a.roomId, installationId: a.installationId };
      const keep = async (row: RevisionRow, whose: 'yours' | 'imported', reason: string): Promise<void> => {
        const kept = await keepDraftAsCopy(ctx, row, of, whose, reason);
        if (kept) keptDrafts.push(kept);
      };
      for (const [ri, r] of a.revisions.entries()) {
        const path = `assessments[${ai}].revisions[${ri}]`;
        const local = await ctx.q.get('SELECT * FROM revision WHERE id = ?', r.id) as RevisionRow | undefined;
        if (local) {
          const mine = withoutTrust(await getRevision(ctx, r.id));
          if (same(mine, r)) {
            count.unchanged++;
            continue;
          }
          if (local.status === 'draft' && r.status === 'draft') {
            if (same(mine.content, r.content)) {
              count.unchanged++;
              continue;
            }
            if (isNotOlder(mine.updatedAt, r.updatedAt)) {
              // Ours stays in the assessment; theirs is kept beside it.
              await keep(revisionRow(r), 'imported', `the file has another version of draft revision ${r.revisionNo}, saved ${r.updatedAt}`);
              count.unchanged++;
              continue;
            }
            await keep(local, 'yours', `the file has a newer version of draft revision ${r.revisionNo}, saved ${r.updatedAt}`);
            await ctx.q.run("DELETE FROM revision WHERE id = ? AND status = 'draft'", r.id);
          } else if (local.status === 'draft' && r.status !== 'draft') {
            // Our draft was signed elsewhere: the signed copy takes its place; edits made here
            // after it was copied are kept as a draft of their own.
            if (!same(mine.content, r.content)) await keep(local, 'yours', `revision ${r.revisionNo} was signed elsewhere with other content`);
            await ctx.q.run("DELETE FROM revision WHERE id = ? AND status = 'draft'", r.id);
          } else if (local.status === 'signed' && r.status === 'superseded' && same({ ...mine, status: 'superseded' }, r)) {
            await ctx.q.run("UPDATE revision SET status = 'superseded' WHERE id = ?", r.id);
            count.revisions++;
            continue;
          } else if (local.status !== 'draft' && r.status === 'signed' && mine.status === 'superseded' && same({ ...mine, status: 'signed' }, r)) {
            count.unchanged++; // we already know a newer signed revision
            continue;
          } else if (r.status === 'draft') {
            count.unchanged++; // the file's draft was signed here meanwhile
            if (!same(mine.content, r.content)) await keep(revisionRow(r), 'imported', `revision ${r.revisionNo} is signed here; the file has a draft of it with other content`);
            continue;
          } else {
            throw invalid([{ path, problem: `revision ${r.revisionNo} is signed here with different content: one of the two copies was altered` }]);
          }
        }
        const clash = await ctx.q.get('SELECT * FROM revision WHERE assessment_id = ? AND revision_no = ? AND id <> ?', a.id, r.revisionNo, r.id) as
          | RevisionRow
          | undefined;
        if (clash !== undefined && clash.status === 'draft') {
          // Both sides started this revision on their own: ours is kept as a draft of its own.
          await keep(clash, 'yours', `revision ${r.revisionNo} was also started elsewhere`);
          await ctx.q.run("DELETE FROM revision WHERE id = ? AND status = 'draft'", clash.id);
        } else if (clash !== undefined) {
          throw invalid([{ path, problem: `this database already has a different revision ${r.revisionNo} of this assessment (both copies were revised separately; export the newer one and import it elsewhere)` }]);
        }
        await insertRevisionRow(ctx, revisionRow(r, fileResults(doc, ai, ri)));
        const s = r.signature;
        if (s) {
          await ctx.q.run(...named(INSERT_SIGNATURE, { revision_id: r.id, ...signatureFields(s) }));
          const aRow = { id: a.id, room_id: a.roomId, installation_id: a.installationId, created_at: a.createdAt };
          logLines.push({ assessmentId: a.id, revisionId: r.id, revisionNo: r.revisionNo, link: linkOf(statementFor(aRow, { id: r.id, revision_no: r.revisionNo }, signatureFields(s))), signedAt: s.signedAt, keyId: s.keyId });
          if (r.status === 'signed') await ctx.q.run("UPDATE revision SET status = 'superseded' WHERE assessment_id = ? AND status = 'signed'", a.id);
          await ctx.q.run('UPDATE revision SET status = ? WHERE id = ?', r.status, r.id);
        }
        count.revisions++;
      }
    }
    const co = await importCoSignatures(ctx, doc);
    coSigned = co.added;
    count.unchanged += co.unchanged;
    await ctx.audit('imported', doc.scope.kind, doc.scope.id, `export of ${doc.exportedAt}`);
  };
  try {
    await ctx.q.transaction((tx) => run(ctx.withPort(tx)));
  } catch (e) {
    if (e instanceof RecordError) throw e;
    const t = ctx.engine.translateError(e, 'Import (nothing was changed)', true);
    throw t instanceof RecordError ? new RecordError(t.code, t.message, [{ path: '(document)', problem: t.message }]) : t;
  }
  if (endorser !== null && admit !== null) {
    await admitKeys(ctx, untrusted.filter((k) => admit.keyIds.includes(k.keyId)).map((k) => ({ ...k, personId: null, personName: `${signerOf.get(k.keyId) ?? ''} (exporting site)` })), endorser);
  }
  const after = (await loadTrust(ctx)).list;
  // Only signatures this installation trusts enter its signing log; the others stay unverified.
  for (const line of logLines) {
    if (trustOf(after, line.keyId).trusted) appendSigningLog(ctx.keyDir, line);
    else count.unverified++;
  }
  const stillUntrusted = untrusted.filter((k) => !trustOf(after, k.keyId).trusted);
  return {
    ...count,
    coSignatures: coSigned.length,
    unverifiedCoSignatures: coSigned.filter((keyId) => !trustOf(after, keyId).trusted).length,
    keptDrafts,
    assumedDefaults: defaultsAssumedIn(doc),
    untrustedKeys: stillUntrusted.map((k) => ({ keyId: k.keyId, fingerprint: shortKeyFingerprint(k.keyId), claimedSigner: signerOf.get(k.keyId) ?? '' })),
  };
}

/** What a file from an older Beamwarden lacks and the defaults taken for it (older-content.ts). */
function defaultsAssumedIn(doc: ExportDocument): string[] {
  const raw = rawOf.get(doc) as { eyewear?: unknown[] } | undefined;
  const out: string[] = [];
  doc.eyewear.forEach((e, i) => {
    const said = eyewearDefaultsAssumed(raw?.eyewear?.[i], e);
    if (said !== null) out.push(said);
  });
  for (const a of doc.assessments) {
    const newest = a.revisions.at(-1);
    if (newest) for (const s of assumedDefaults(newest.content, newest.calculatedWith)) out.push(`"${newest.content.title}", revision ${newest.revisionNo}: ${s}`);
  }
  return out;
}

/** Which keys of a file this installation does not trust (for the confirmation before admitting them). */
export async function untrustedKeysOf(ctx: StoreContext, input: unknown): Promise<ImportSummary['untrustedKeys']> {
  const doc = parseExportDocument(input);
  const list = (await loadTrust(ctx)).list;
  const signerOf = signerNames(doc);
  return doc.signingKeys
    .filter((k) => signerOf.has(k.keyId) && !trustOf(list, k.keyId).trusted)
    .map((k) => ({ keyId: k.keyId, fingerprint: shortKeyFingerprint(k.keyId), claimedSigner: signerOf.get(k.keyId) ?? '' }));
}
