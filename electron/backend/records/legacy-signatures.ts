/**
 * Signatures from before personal keys (schema 2 and earlier) were made with one installation key
 * kept in a PEM file beside the database. On the first open after migrating, each of them is
 * re-checked against that key file; if the file's key is the one that signed them, it becomes the
 * first trusted key (the trust anchor) and the re-checked signatures are entered in the signing log.
 * Signatures that do not re-check — or a key file that does not match, because it was replaced —
 * stay unverified and are reported. The installation key endorses the first personal key and is
 * then retired and its file removed (personal-keys.ts), so it cannot sign or endorse again.
 */
import { statementFor, type AssessmentRow, type RevisionRow, type SignatureRow } from './assessments.js';
import { transact, type StoreContext } from './context.js';
import { setUpTrustList } from './personal-keys.js';
import { appendSigningLog } from './signing-log.js';
import { linkOf, readInstallationKey, PRIVATE_KEY_FILE, verifyStatement } from './signing.js';
import { INSTALLATION_KEY_HOLDER, shortKeyFingerprint } from './trust-list.js';
import { loadTrust, registerAnchors } from './trust-store.js';


/** Run at open (read-write only). Returns warnings for the officer; empty when there is nothing to do. */
export async function adoptInstallationKey(ctx: StoreContext): Promise<string[]> {
  const legacy = await ctx.q.all(`SELECT s.*, k.public_key, r.revision_no, r.assessment_id, a.room_id, a.installation_id, a.created_at AS a_created
       FROM signature s JOIN revision r ON r.id = s.revision_id JOIN assessment a ON a.id = r.assessment_id
       LEFT JOIN signing_key k ON k.key_id = s.key_id
       WHERE s.statement_version = 1 ORDER BY r.assessment_id, r.revision_no`) as Array<SignatureRow & Pick<RevisionRow, 'revision_no' | 'assessment_id'> & { room_id: string; installation_id: string | null; a_created: string }>;
  if (legacy.length === 0) return [];
  const read = await loadTrust(ctx);
  // Already set up (here or in the register), or reported as a trust problem.
  if (read.list !== null || read.problem !== null || (await registerAnchors(ctx)).length > 0) return [];
  const key = readInstallationKey(ctx.keyDir);
  if (key === null) {
    return [
      `${legacy.length} signature(s) were made before personal keys with the installation key, but its key file (${PRIVATE_KEY_FILE}) is not in ${ctx.keyDir}. ` +
        'They are shown as unverified until that file is put back and Beamwarden is opened again.',
    ];
  }
  const warnings: string[] = [];
  const good: typeof legacy = [];
  for (const s of legacy) {
    const a: AssessmentRow = { id: s.assessment_id, room_id: s.room_id, installation_id: s.installation_id, created_at: s.a_created };
    const ok = s.key_id === key.keyId && verifyStatement(key.publicKeyPem, statementFor(a, { id: s.revision_id, revision_no: s.revision_no }, s), s.signature);
    if (ok) good.push(s);
    else {
      warnings.push(
        `Revision ${s.revision_no} of assessment ${s.assessment_id} does not re-check against the installation key ${shortKeyFingerprint(key.keyId)}` +
          `${s.key_id !== key.keyId ? ` (it was signed with key ${shortKeyFingerprint(s.key_id)})` : ''}; it is shown as unverified.`,
      );
    }
  }
  if (good.length === 0) {
    warnings.unshift(
      `The installation key file in ${ctx.keyDir} (key ${shortKeyFingerprint(key.keyId)}) did not sign any of the existing records: it was replaced. ` +
        'It is not admitted to the trust list.',
    );
    return warnings;
  }
  await transact(ctx, async (ctx) => {
    await setUpTrustList(ctx, { keyId: key.keyId, publicKey: key.publicKeyPem, personId: null, personName: INSTALLATION_KEY_HOLDER, privateKey: key.privateKey });
    await ctx.audit('installation-key-adopted', 'signing_key', key.keyId, `${good.length} signature(s) re-checked`);
  });
  for (const s of good) {
    const a: AssessmentRow = { id: s.assessment_id, room_id: s.room_id, installation_id: s.installation_id, created_at: s.a_created };
    appendSigningLog(ctx.keyDir, {
      assessmentId: s.assessment_id,
      revisionId: s.revision_id,
      revisionNo: s.revision_no,
      link: linkOf(statementFor(a, { id: s.revision_id, revision_no: s.revision_no }, s)),
      signedAt: s.signed_at,
      keyId: s.key_id,
    });
  }
  warnings.unshift(
    `${good.length} signature(s) made before personal keys re-checked against the installation key; it is now the trust anchor, fingerprint ` +
      `${shortKeyFingerprint(key.keyId)}. Write this fingerprint down. The first personal key created is endorsed by it, and then it is retired.`,
  );
  return warnings;
}
