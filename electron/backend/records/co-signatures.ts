/**
 * Co-signature: a second person (a lab head, a deputy officer) countersigns a signed revision with
 * their own personal key (personal-keys.ts: passphrase, trust list, time and identity from this back
 * end). The countersigned payload covers the revision's record fingerprint and the link of the main
 * signed statement, so a co-signature never outlives a changed or replaced main signature. Verify
 * reports each co-signature with its own checks; printed documents name every signer.
 */
import { z } from 'zod';
import { inTransaction, parseOrThrow, type StoreContext } from './context.js';
import { signAsPerson } from './personal-keys.js';
import { getPerson } from './register.js';
import { linkOf } from './signing.js';
import { shortKeyFingerprint } from './trust-list.js';
import { statementFor, type AssessmentRow, type RevisionRow, type SignatureRow } from './assessments.js';
import { RecordError, type Id } from './types.js';
import { payloadOf, rowToCoSignature, type CoSignature, type CoSignatureRow } from './co-signature-checks.js';

export type { CoSignature, CoSignatureCheck } from './co-signature-checks.js';
export { listCoSignatures } from './co-signature-checks.js';

export const CountersignSchema = z.strictObject({
  revisionId: z.string().min(1, 'must name the signed revision').max(200),
  personId: z.string().min(1, 'must name who countersigns').max(200),
  passphrase: z.string().max(1000),
  statement: z.string().trim().min(1, 'must say what the co-signer confirms').max(2000),
});

interface Signed {
  readonly a: AssessmentRow;
  readonly r: RevisionRow;
  readonly s: SignatureRow;
}

async function signedRevision(ctx: StoreContext, revisionId: Id): Promise<Signed> {
  const r = await ctx.q.get<RevisionRow>('SELECT * FROM revision WHERE id = ?', revisionId);
  if (!r) throw new RecordError('not-found', `No revision ${revisionId}`);
  const s = await ctx.q.get<SignatureRow>('SELECT *, NULL AS public_key FROM signature WHERE revision_id = ?', revisionId);
  if (!s || r.status === 'draft') throw new RecordError('conflict', `Revision ${r.revision_no} is not signed: only a signed revision can be countersigned.`);
  const a = (await ctx.q.get<AssessmentRow>('SELECT * FROM assessment WHERE id = ?', r.assessment_id)) as AssessmentRow;
  return { a, r, s };
}

/** Countersign a signed revision as `personId` (passphrase checked; time and identity from this back end). */
export async function countersign(ctx: StoreContext, raw: z.input<typeof CountersignSchema>): Promise<CoSignature> {
  const args = parseOrThrow(CountersignSchema, raw, 'Co-signature');
  const { a, r, s } = await signedRevision(ctx, args.revisionId);
  const person = await getPerson(ctx, args.personId);
  if (!person.role.trim()) throw new RecordError('invalid', `Enter ${person.name}'s role in the register (People) before countersigning: the co-signature records it.`, [{ path: 'personId', problem: 'the person has no role' }]);
  if (s.person_id === person.id) throw new RecordError('conflict', `${person.name} signed revision ${r.revision_no}; a co-signature must come from another person.`);
  if ((await ctx.q.get('SELECT 1 AS one FROM co_signature WHERE revision_id = ? AND person_id = ?', r.id, person.id)) !== undefined) {
    throw new RecordError('conflict', `${person.name} has already countersigned revision ${r.revision_no}.`);
  }
  const signedLink = linkOf(statementFor(a, r, s));
  const signed = await signAsPerson(ctx, person.id, args.passphrase, (signer) =>
    payloadOf(
      { revision_id: r.id, person_id: signer.personId, name: signer.name, role: signer.role, signed_at: signer.signedAt, statement: args.statement, signed_link: signedLink, fingerprint: s.fingerprint, key_id: signer.keyId, trust_anchor: signer.trustAnchor, signature: '' },
      a,
      r,
    ),
  );
  const p = signed.payload;
  const row: CoSignatureRow = { revision_id: r.id, person_id: p.personId, name: p.name, role: p.role, signed_at: p.signedAt, statement: p.statement, signed_link: p.signedLink, fingerprint: p.fingerprint, key_id: p.keyId, trust_anchor: p.trustAnchor, signature: signed.signature };
  await inTransaction(ctx, 'Co-signature', async (tx) => {
    await tx.q.run(
      'INSERT INTO co_signature (revision_id, person_id, name, role, signed_at, statement, signed_link, fingerprint, key_id, trust_anchor, signature) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
      row.revision_id, row.person_id, row.name, row.role, row.signed_at, row.statement, row.signed_link, row.fingerprint, row.key_id, row.trust_anchor, row.signature,
    );
    await tx.audit('countersigned', 'revision', r.id, `revision ${r.revision_no} by ${p.name}, key ${shortKeyFingerprint(p.keyId)}`);
  });
  return rowToCoSignature(row, true); // signAsPerson refused an untrusted key
}

