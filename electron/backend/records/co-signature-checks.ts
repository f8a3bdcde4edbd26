/**
 * Co-signatures as stored and as checked (schema 7; countersigning itself is co-signatures.ts): the
 * payload a co-signer's key signs, and the check verify runs on each co-signature of a revision —
 * its own Ed25519 signature, its key on this installation's trust list, and that it covers the
 * revision's main signature (link) and record fingerprint.
 */
import type { StoreContext } from './context.js';
import { checkPersonSignature } from './personal-keys.js';
import { shortKeyFingerprint, trustOf } from './trust-list.js';
import { loadTrust } from './trust-store.js';
import type { AssessmentRow, RevisionRow } from './assessments.js';
import type { Id } from './types.js';

/** What the co-signer's key signs (canonical JSON of this object). */
export interface CoSignedStatement {
  readonly format: 'beamwarden-co-signature';
  readonly version: 1;
  readonly assessmentId: Id;
  readonly revisionId: Id;
  readonly revisionNo: number;
  /** Record fingerprint of the revision (as signed by the main signer). */
  readonly fingerprint: string;
  /** Link (SHA-256 of the canonical main signed statement) of the signature countersigned. */
  readonly signedLink: string;
  readonly personId: Id;
  readonly name: string;
  readonly role: string;
  readonly signedAt: string;
  readonly statement: string;
  readonly keyId: string;
  readonly trustAnchor: string;
}

export interface CoSignature {
  readonly revisionId: Id;
  readonly personId: Id;
  readonly name: string;
  readonly role: string;
  readonly signedAt: string;
  readonly statement: string;
  readonly keyId: string;
  readonly keyFingerprint: string;
  /** The co-signer's key is on this installation's trust list (otherwise shown as an unverified co-signature). */
  readonly keyTrusted: boolean;
}

/** One co-signature as verify sees it. */
export interface CoSignatureCheck extends CoSignature {
  readonly ok: boolean;
  readonly signatureValid: boolean;
  readonly keyTrusted: boolean;
  readonly coversThisSignature: boolean;
  readonly finding: string;
}

export interface CoSignatureRow {
  revision_id: string;
  person_id: string;
  name: string;
  role: string;
  signed_at: string;
  statement: string;
  signed_link: string;
  fingerprint: string;
  key_id: string;
  trust_anchor: string;
  signature: string;
}

export function rowToCoSignature(x: CoSignatureRow, keyTrusted: boolean): CoSignature {
  return { keyTrusted, revisionId: x.revision_id, personId: x.person_id, name: x.name, role: x.role, signedAt: x.signed_at, statement: x.statement, keyId: x.key_id, keyFingerprint: shortKeyFingerprint(x.key_id) };
}

export function payloadOf(row: CoSignatureRow, a: AssessmentRow, r: Pick<RevisionRow, 'id' | 'revision_no'>): CoSignedStatement {
  return {
    format: 'beamwarden-co-signature',
    version: 1,
    assessmentId: a.id,
    revisionId: r.id,
    revisionNo: r.revision_no,
    fingerprint: row.fingerprint,
    signedLink: row.signed_link,
    personId: row.person_id,
    name: row.name,
    role: row.role,
    signedAt: row.signed_at,
    statement: row.statement,
    keyId: row.key_id,
    trustAnchor: row.trust_anchor,
  };
}

export async function listCoSignatures(ctx: StoreContext, revisionId: Id): Promise<CoSignature[]> {
  const trust = (await loadTrust(ctx)).list;
  return (await ctx.q.all<CoSignatureRow>('SELECT * FROM co_signature WHERE revision_id = ? ORDER BY signed_at, person_id', revisionId)).map((x) => rowToCoSignature(x, trustOf(trust, x.key_id).trusted));
}

/** The main signature as verify computed it: its link and fingerprint (null when the revision has none). */
export interface MainSignature {
  readonly link: string;
  readonly fingerprint: string;
}

/** Every co-signature of a revision checked: its own signature, its key's trust, and that it covers this revision's main signature. */
export async function checkCoSignatures(ctx: StoreContext, a: AssessmentRow, r: RevisionRow, main: MainSignature | null): Promise<CoSignatureCheck[]> {
  const rows = await ctx.q.all<CoSignatureRow>('SELECT * FROM co_signature WHERE revision_id = ? ORDER BY signed_at, person_id', r.id);
  const out: CoSignatureCheck[] = [];
  for (const row of rows) {
    const c = await checkPersonSignature(ctx, payloadOf(row, a, r), row.signature, row.key_id);
    const owner = c.ownerPersonId === null || c.ownerPersonId === row.person_id;
    const signatureValid = c.valid && owner;
    const covers = main !== null && row.signed_link === main.link && main.fingerprint === row.fingerprint;
    const ok = signatureValid && c.trusted && covers;
    const who = `${row.name} (${row.role}) on ${row.signed_at.slice(0, 10)}, key ${shortKeyFingerprint(row.key_id)}`;
    const finding = ok
      ? `Co-signature by ${who}: valid; it covers this revision's main signature and record fingerprint; key trusted: ${c.trustChain.join(' ')}`
      : !signatureValid
        ? `Co-signature by ${who} is not valid for what it records${owner ? '' : ` (the key belongs to ${c.ownerName ?? 'someone else'})`}: it was changed after countersigning.`
        : !c.trusted
          ? `Co-signature by ${who}: the key is NOT on this installation's trust list. ${c.trustChain.join(' ')}`
          : `Co-signature by ${who} countersigned a different main signature or fingerprint: the main sign-off was changed or replaced after it.`;
    out.push({ ...rowToCoSignature(row, c.trusted), ok, signatureValid, coversThisSignature: covers, finding });
  }
  return out;
}

