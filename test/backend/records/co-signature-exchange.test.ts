/**
 * Co-signatures in the JSON export and import (export format version 2), through the real handler
 * table ('export-json', 'import-json', dispatch with its zod schemas) on real SQLite files with real
 * keys: a round trip keeps each co-signature and it verifies at the receiving installation once its
 * keys are admitted; a crafted file with a forged or moved co-signature is refused in an officer's
 * sentence with nothing written; one signed with a key not trusted here is imported and reported as
 * unverified; a file of format version 1 (before co-signatures) still imports. Invented people and
 * the invented demo room A0.07 (the project's demo scenario).
 */
import { generateKeyPairSync, sign } from 'node:crypto';
import { join } from 'node:path';
import { gunzipSync } from 'node:zlib';
import { afterEach, describe, expect, it } from 'vitest';
import { dispatch } from '../../../electron/api/dispatch.js';
import { handlerTable } from '../../../electron/api/table.js';
import type { ApiContext } from '../../../electron/api/context.js';
import type { Reply } from '../../../electron/api/reply.js';
import { canonicalJson } from '../../../electron/backend/records/canonical.js';
import { payloadOf } from '../../../electron/backend/records/co-signature-checks.js';
import type { ExportDocument, ExportedCoSignature, ImportSummary, RecordStore } from '../../../electron/backend/records/index.js';
import { keyIdOf } from '../../../electron/backend/records/signing.js';
import { makeSigner, openTemp, registerRoom, snapshot, STATEMENT, tempDir } from './helpers.js';

const CO_STATEMENT = 'As head of the laboratory I have read this assessment and accept the controls listed.';

const dirs: Array<ReturnType<typeof tempDir>> = [];
const stores: RecordStore[] = [];
afterEach(async () => {
  for (const s of stores.splice(0)) await s.close();
  for (const d of dirs.splice(0)) d.cleanup();
});

async function installation(): Promise<{ store: RecordStore; dbPath: string; call: (name: string, args: unknown) => Promise<Reply<unknown>> }> {
  const t = tempDir('bw-co-exchange-');
  dirs.push(t);
  const store = await openTemp(t.dir);
  stores.push(store);
  const ctx: ApiContext = { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store };
  const call = async (name: string, args: unknown) => (await dispatch(handlerTable, ctx, name as never, args as never)) as Reply<unknown>;
  return { store, dbPath: join(t.dir, 'records.sqlite'), call };
}

function value<T>(r: Reply<unknown>): T {
  if (!r.ok) throw new Error(`refused: ${r.error.message}`);
  return r.value as T;
}

/** Site A: A0.07 signed by the officer, countersigned by the lab head; exported as a room through the API. */
async function exportedFromSiteA() {
  const a = await installation();
  const { room } = await registerRoom(a.store);
  const officer = await makeSigner(a.store, 'Dr. Imre Calloway-Senn');
  const head = await makeSigner(a.store, 'Prof. Oona Brightwater-Hale');
  const assessment = await a.store.createAssessment({ roomId: room.id, content: await a.store.newAssessmentContent(room.id) });
  await a.store.signAssessment(assessment.id, officer.signOff(STATEMENT));
  const revisionId = (await a.store.getAssessment(assessment.id)).current.id;
  await a.store.countersign({ revisionId, personId: head.person.id, passphrase: head.passphrase, statement: CO_STATEMENT });
  const file = value<{ base64: string }>(await a.call('export-json', { kind: 'room', id: room.id }));
  const doc = JSON.parse(gunzipSync(Buffer.from(file.base64, 'base64')).toString('utf8')) as ExportDocument;
  return { a, room, officer, head, assessmentId: assessment.id, revisionId, file, doc };
}

/** Site B: a fresh installation with its own officer (its trust anchor). */
async function siteB() {
  const b = await installation();
  const lso = await makeSigner(b.store, 'Ms. Petra Quillfeather');
  return { ...b, lso };
}

const asText = (doc: unknown) => ({ text: JSON.stringify(doc) });

describe('co-signatures travel with the JSON export (format version 2)', () => {
  it('a round trip keeps the co-signature, and it verifies at the other site once both keys are admitted', async () => {
    const x = await exportedFromSiteA();
    expect(x.doc.version).toBe(2);
    expect(x.doc.coSignatures?.map((c) => [c.name, c.role, c.revisionId, c.statement])).toEqual([['Prof. Oona Brightwater-Hale', 'Laser safety officer', x.revisionId, CO_STATEMENT]]);
    expect(x.doc.people.map((p) => p.name).sort()).toEqual(['Dr. Imre Calloway-Senn', 'Prof. Oona Brightwater-Hale']);
    expect(x.doc.signingKeys.map((k) => k.keyId).sort()).toEqual([x.officer.key.keyId, x.head.key.keyId].sort());

    const b = await siteB();
    const admit = { keyIds: [x.officer.key.keyId, x.head.key.keyId], endorserPersonId: b.lso.person.id, endorserPassphrase: b.lso.passphrase };
    const summary = value<ImportSummary>(await b.call('import-json', { base64: x.file.base64, admit }));
    expect(summary).toMatchObject({ revisions: 1, coSignatures: 1, unverifiedCoSignatures: 0, unverified: 0 });
    const report = await b.store.verify(x.assessmentId);
    expect(report.ok).toBe(true);
    expect(report.coSignatures.map((c) => [c.name, c.ok, c.signatureValid, c.keyTrusted, c.coversThisSignature])).toEqual([['Prof. Oona Brightwater-Hale', true, true, true, true]]);

    // The co-signature leaves site B as it came in, and a second import of the same file adds nothing.
    const again = value<{ base64: string }>(await b.call('export-json', { kind: 'room', id: x.room.id }));
    const docB = JSON.parse(gunzipSync(Buffer.from(again.base64, 'base64')).toString('utf8')) as ExportDocument;
    expect(docB.coSignatures).toEqual(x.doc.coSignatures);
    expect(value<ImportSummary>(await b.call('import-json', { base64: x.file.base64 }))).toMatchObject({ revisions: 0, coSignatures: 0 });
  });

  it('without admitting the keys, the co-signature is imported and reported as unverified, never as trusted', async () => {
    const x = await exportedFromSiteA();
    const b = await siteB();
    const summary = value<ImportSummary>(await b.call('import-json', { base64: x.file.base64 }));
    expect(summary).toMatchObject({ coSignatures: 1, unverifiedCoSignatures: 1, unverified: 1 });
    // The co-signer's key is offered for admission with its fingerprint, under the co-signer's name.
    expect(summary.untrustedKeys.map((k) => k.claimedSigner).sort()).toEqual(['Dr. Imre Calloway-Senn', 'Prof. Oona Brightwater-Hale']);
    const [co] = (await b.store.verify(x.assessmentId)).coSignatures;
    expect([co?.keyTrusted, co?.ok]).toEqual([false, false]);
    expect(co?.finding).toMatch(/NOT on this installation's trust list/);
  });
});

/** An attacker's own Ed25519 key, signing a co-signature in the lab head's name. */
function forgedWithOwnKey(doc: ExportDocument): ExportDocument {
  const { privateKey, publicKey } = generateKeyPairSync('ed25519');
  const pem = publicKey.export({ type: 'spki', format: 'pem' }).toString();
  const keyId = keyIdOf(pem);
  const c = doc.coSignatures?.[0] as ExportedCoSignature;
  const a = doc.assessments[0];
  const r = a?.revisions[0];
  if (!a || !r) throw new Error('fixture has no revision');
  const row = { revision_id: c.revisionId, person_id: c.personId, name: c.name, role: c.role, signed_at: c.signedAt, statement: 'Countersigned (forged).', signed_link: c.signedLink, fingerprint: c.fingerprint, key_id: keyId, trust_anchor: c.trustAnchor, signature: '' };
  const payload = payloadOf(row, { id: a.id, room_id: a.roomId, installation_id: a.installationId, created_at: a.createdAt }, { id: r.id, revision_no: r.revisionNo });
  const signature = sign(null, Buffer.from(canonicalJson(payload), 'utf8'), privateKey).toString('base64');
  return {
    ...doc,
    signingKeys: [...doc.signingKeys, { keyId, publicKey: pem }],
    coSignatures: [{ ...c, keyId, statement: 'Countersigned (forged).', signature }],
  };
}

// [case, how the file is altered, what the refusal says (officer words, naming the co-signer)]
const FORGERIES: ReadonlyArray<readonly [string, (d: ExportDocument) => ExportDocument, RegExp]> = [
  [
    'the co-signer\'s statement changed after countersigning',
    (d) => ({ ...d, coSignatures: d.coSignatures?.map((c) => ({ ...c, statement: 'I accept everything.' })) }),
    /co-signature by Prof\. Oona Brightwater-Hale \(Laser safety officer\) of \d{4}-\d\d-\d\d of revision 1 of ".+" is not valid for what it records .*changed after countersigning/,
  ],
  [
    'the co-signature claims another record fingerprint',
    (d) => ({ ...d, coSignatures: d.coSignatures?.map((c) => ({ ...c, fingerprint: 'f'.repeat(64) })) }),
    /does not countersign the sign-off of revision 1 of ".+" in this file/,
  ],
  [
    'the co-signature is moved onto a draft revision',
    (d) => {
      const a = d.assessments[0];
      const r = a?.revisions[0];
      if (!a || !r) return d;
      const draft = { ...r, id: 'draft-revision-crafted', revisionNo: 2, status: 'draft' as const, signature: null, basedOn: r.id };
      return { ...d, assessments: [{ ...a, revisions: [r, draft] }], coSignatures: d.coSignatures?.map((c) => ({ ...c, revisionId: draft.id })) };
    },
    /countersigns revision 2 of ".+", which is not signed/,
  ],
  [
    'a format version 1 file carrying co-signatures',
    (d) => ({ ...d, version: 1 }),
    /format version 1 has no co-signatures/,
  ],
];

describe('a crafted export with a forged co-signature is refused, nothing written', () => {
  it.each(FORGERIES)('%s', async (_name, alter, said) => {
    const x = await exportedFromSiteA();
    const b = await siteB();
    const before = snapshot(b.dbPath);
    const r = await b.call('import-json', asText(alter(x.doc)));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.message).toMatch(/nothing was changed/);
    expect(r.error.message).toMatch(said);
    expect(snapshot(b.dbPath)).toBe(before);
  });

  it('a co-signature in the lab head\'s name made with someone else\'s key is imported only as unverified, and verify says so', async () => {
    const x = await exportedFromSiteA();
    const b = await siteB();
    const summary = value<ImportSummary>(await b.call('import-json', asText(forgedWithOwnKey(x.doc))));
    expect(summary).toMatchObject({ coSignatures: 1, unverifiedCoSignatures: 1 });
    const report = await b.store.verify(x.assessmentId);
    expect(report.ok).toBe(false);
    expect(report.coSignatures.map((c) => [c.name, c.keyTrusted, c.ok])).toEqual([['Prof. Oona Brightwater-Hale', false, false]]);
  });

  it('a co-signature made with a key this installation trusts for another person is refused as made in someone else\'s name', async () => {
    const x = await exportedFromSiteA();
    const b = await siteB();
    // Site B trusts the officer's key (admitted with a first import without co-signatures).
    const plain = { ...x.doc, coSignatures: [] };
    value(await b.call('import-json', { ...asText(plain), admit: { keyIds: [x.officer.key.keyId], endorserPersonId: b.lso.person.id, endorserPassphrase: b.lso.passphrase } }));
    // The officer's own key would sign the lab head's co-signature: signature valid, key trusted, owner wrong.
    const c = x.doc.coSignatures?.[0] as ExportedCoSignature;
    const crafted = { ...x.doc, coSignatures: [{ ...c, keyId: x.officer.key.keyId }] };
    const r = await b.call('import-json', asText(crafted));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/Prof\. Oona Brightwater-Hale .* (is not valid for what it records|belongs to)/);
  });
});

describe('older export files still import', () => {
  it('a format version 1 file (no co-signatures) imports, with its signed revision', async () => {
    const x = await exportedFromSiteA();
    const { coSignatures: _none, ...rest } = x.doc;
    const v1 = { ...rest, version: 1, signingKeys: rest.signingKeys.filter((k) => k.keyId === x.officer.key.keyId), people: rest.people.filter((p) => p.id === x.officer.person.id) };
    const b = await siteB();
    const summary = value<ImportSummary>(await b.call('import-json', asText(v1)));
    expect(summary).toMatchObject({ assessments: 1, revisions: 1, coSignatures: 0, unverified: 1 });
    expect(await b.store.listCoSignatures(x.revisionId)).toEqual([]);
  });

  it('a format version 3 file is refused as written by a newer Beamwarden', async () => {
    const x = await exportedFromSiteA();
    const b = await siteB();
    const r = await b.call('import-json', asText({ ...x.doc, version: 3 }));
    expect(r.ok ? '' : r.error.message).toMatch(/format version 3, written by a newer Beamwarden; this Beamwarden reads export format versions 1 and 2/);
  });
});
