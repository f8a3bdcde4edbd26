/**
 * Co-signatures in the JSON export and import (export format version 2). Kept apart from
 * exchange.ts so that the co-signature part of the file is read, checked and written in one place.
 *
 * Export: every co-signature of every signed revision in the document, with the co-signer in
 * `people` and the co-signer's public key in `signingKeys`.
 *
 * Import: each co-signature is checked before anything is written, as verify checks it
 * (co-signature-checks.ts): its Ed25519 signature is valid for what it records, it covers the main
 * signature and record fingerprint of the revision it names, and the co-signer is not the main
 * signer. One that fails is a forged or altered co-signature, and the whole import is refused with
 * a sentence naming the co-signer and the revision. A valid co-signature whose key is not on this
 * installation's trust list is imported and shown as unverified (like a main signature), and its
 * key is offered for admission with the others.
 */
import { canonicalJson } from './canonical.js';
import { payloadOf, type CoSignatureRow } from './co-signature-checks.js';
import type { StoreContext } from './context.js';
import { statementFor, type AssessmentRow, type StatementFields } from './assessments.js';
import { keyIdOf, linkOf, verifyPayload } from './signing.js';
import { shortKeyFingerprint, trustOf, type TrustList } from './trust-list.js';
import { RecordError, type ExportDocument, type ExportedAssessment, type ExportedCoSignature, type Id, type ImportIssue, type Revision } from './types.js';

// ---------------------------------------------------------------- export

/** Every co-signature of the signed revisions of these assessments, in document order. */
export async function coSignaturesOf(ctx: StoreContext, assessments: readonly ExportedAssessment[]): Promise<ExportedCoSignature[]> {
  const out: ExportedCoSignature[] = [];
  for (const a of assessments) {
    for (const r of a.revisions) {
      if (r.signature === null) continue;
      const rows = await ctx.q.all<CoSignatureRow>('SELECT * FROM co_signature WHERE revision_id = ? ORDER BY signed_at, person_id', r.id);
      for (const x of rows) {
        out.push({
          revisionId: x.revision_id,
          personId: x.person_id,
          name: x.name,
          role: x.role,
          signedAt: x.signed_at,
          statement: x.statement,
          signedLink: x.signed_link,
          fingerprint: x.fingerprint,
          keyId: x.key_id,
          trustAnchor: x.trust_anchor,
          signature: x.signature,
        });
      }
    }
  }
  return out;
}

/** The co-signers' public keys (from this database's key table), to join the document's signingKeys. */
export async function coSignerKeys(ctx: StoreContext, coSignatures: readonly ExportedCoSignature[]): Promise<Array<{ keyId: string; publicKey: string }>> {
  const out: Array<{ keyId: string; publicKey: string }> = [];
  for (const keyId of new Set(coSignatures.map((c) => c.keyId))) {
    const k = await ctx.q.get<{ public_key: string }>('SELECT public_key FROM signing_key WHERE key_id = ?', keyId);
    if (k) out.push({ keyId, publicKey: k.public_key });
  }
  return out;
}

// ---------------------------------------------------------------- import: checks

interface Located {
  readonly a: ExportedAssessment;
  readonly r: Revision;
}

function revisionsById(doc: ExportDocument): Map<Id, Located> {
  const out = new Map<Id, Located>();
  for (const a of doc.assessments) for (const r of a.revisions) out.set(r.id, { a, r });
  return out;
}

const assessmentRow = (a: ExportedAssessment): AssessmentRow => ({ id: a.id, room_id: a.roomId, installation_id: a.installationId, created_at: a.createdAt });

function rowOf(c: ExportedCoSignature): CoSignatureRow {
  return {
    revision_id: c.revisionId,
    person_id: c.personId,
    name: c.name,
    role: c.role,
    signed_at: c.signedAt,
    statement: c.statement,
    signed_link: c.signedLink,
    fingerprint: c.fingerprint,
    key_id: c.keyId,
    trust_anchor: c.trustAnchor,
    signature: c.signature,
  };
}

/** The revision's main signature in the form its chain link is computed from. */
export type MainSignatureFields = (r: Revision) => StatementFields;

/**
 * Every problem with the file's co-signatures, each in a sentence an officer can read (who, which
 * revision, what is wrong). `knownPeople`: people in the file or in this database; `trust`: this
 * installation's trust list (a trusted key must belong to the person the co-signature names).
 */
export function coSignatureIssues(
  doc: ExportDocument,
  mainFields: MainSignatureFields,
  knownPeople: (id: Id) => boolean,
  trust: TrustList | null,
): ImportIssue[] {
  const issues: ImportIssue[] = [];
  const list = doc.coSignatures ?? [];
  if (doc.version === 1 && doc.coSignatures !== undefined) {
    return [{ path: 'coSignatures', problem: 'An export file of format version 1 has no co-signatures; this one was edited by hand.' }];
  }
  const revisions = revisionsById(doc);
  const keys = new Map(doc.signingKeys.map((k) => [k.keyId, k.publicKey]));
  const seen = new Set<string>();
  list.forEach((c, i) => {
    const path = `coSignatures[${i}]`;
    const found = revisions.get(c.revisionId);
    const who = `The co-signature by ${c.name} (${c.role}) of ${c.signedAt.slice(0, 10)}`;
    if (!found) {
      issues.push({ path: `${path}.revisionId`, problem: `${who} names a revision that is not in this file.` });
      return;
    }
    const { a, r } = found;
    const what = `revision ${r.revisionNo} of "${r.content.title}"`;
    if (seen.has(`${c.revisionId}|${c.personId}`)) issues.push({ path, problem: `${who} appears twice for ${what}.` });
    seen.add(`${c.revisionId}|${c.personId}`);
    if (r.signature === null) {
      issues.push({ path: `${path}.revisionId`, problem: `${who} countersigns ${what}, which is not signed: only a signed revision can be countersigned.` });
      return;
    }
    if (r.signature.personId !== null && r.signature.personId === c.personId) {
      issues.push({ path: `${path}.personId`, problem: `${who} is by the person who signed ${what}: a co-signature must come from another person.` });
    }
    if (!knownPeople(c.personId)) issues.push({ path: `${path}.personId`, problem: `${who} names a person who is neither in the file nor in this register.` });
    const mainLink = linkOf(statementFor(assessmentRow(a), { id: r.id, revision_no: r.revisionNo }, mainFields(r)));
    if (c.signedLink !== mainLink || c.fingerprint !== r.signature.fingerprint) {
      issues.push({
        path: `${path}.signedLink`,
        problem: `${who} does not countersign the sign-off of ${what} in this file: it belongs to another signature or record, or the file was changed after countersigning.`,
      });
    }
    const publicKey = keys.get(c.keyId);
    let valid = false;
    try {
      valid =
        publicKey !== undefined &&
        keyIdOf(publicKey) === c.keyId &&
        verifyPayload(publicKey, payloadOf(rowOf(c), assessmentRow(a), { id: r.id, revision_no: r.revisionNo }), c.signature);
    } catch {
      valid = false;
    }
    if (!valid) {
      issues.push({
        path: `${path}.signature`,
        problem:
          publicKey === undefined
            ? `${who} of ${what} has no public key in the file, so it cannot be checked.`
            : `${who} of ${what} is not valid for what it records (name, role, date, statement or revision): the file was changed after countersigning.`,
      });
    }
    const owner = trustOf(trust, c.keyId);
    if (valid && owner.trusted && owner.entry?.personId && owner.entry.personId !== c.personId) {
      issues.push({
        path: `${path}.personId`,
        problem: `${who} of ${what} was made with key ${shortKeyFingerprint(c.keyId)}, which belongs to ${owner.entry.personName}: it was made in someone else's name.`,
      });
    }
  });
  return issues;
}

/** Refusal of an import whose co-signatures fail their checks, in the officers' sentences. */
export function coSignatureRefusal(issues: readonly ImportIssue[]): RecordError {
  const shown = issues.slice(0, 5).map((i) => i.problem).join(' ');
  return new RecordError('invalid', `The file cannot be imported, nothing was changed. ${shown}${issues.length > 5 ? ` (and ${issues.length - 5} more problems with co-signatures)` : ''}`, [...issues]);
}

// ---------------------------------------------------------------- import: writing

/**
 * Store the file's co-signatures (inside the import's transaction, after its revisions); gives the
 * key id of each one added (its trust is judged after any admission of keys). A
 * co-signature already here must be identical: co-signatures are never changed, so two different
 * ones by one person for one revision mean one was altered, and the import is refused.
 */
export async function importCoSignatures(ctx: StoreContext, doc: ExportDocument): Promise<{ added: string[]; unchanged: number }> {
  const count = { added: [] as string[], unchanged: 0 };
  const revisions = revisionsById(doc);
  for (const c of doc.coSignatures ?? []) {
    const row = rowOf(c);
    const local = await ctx.q.get<CoSignatureRow>('SELECT * FROM co_signature WHERE revision_id = ? AND person_id = ?', c.revisionId, c.personId);
    if (local !== undefined) {
      if (canonicalJson(local) === canonicalJson(row)) {
        count.unchanged++;
        continue;
      }
      const r = revisions.get(c.revisionId)?.r;
      throw new RecordError(
        'invalid',
        `The file cannot be imported, nothing was changed: this register already has a different co-signature by ${c.name} for revision ${r?.revisionNo ?? ''} of "${r?.content.title ?? ''}". Co-signatures are never changed, so one of the two copies was altered.`,
        [{ path: 'coSignatures', problem: `a different co-signature by ${c.name} is already recorded` }],
      );
    }
    await ctx.q.run(
      'INSERT INTO co_signature (revision_id, person_id, name, role, signed_at, statement, signed_link, fingerprint, key_id, trust_anchor, signature) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
      row.revision_id, row.person_id, row.name, row.role, row.signed_at, row.statement, row.signed_link, row.fingerprint, row.key_id, row.trust_anchor, row.signature,
    );
    count.added.push(c.keyId);
  }
  return count;
}

/** Key id -> co-signer's name, for keys of the file that may be offered for admission. */
export function coSignerNames(doc: ExportDocument): Map<string, string> {
  return new Map((doc.coSignatures ?? []).map((c) => [c.keyId, c.name]));
}
