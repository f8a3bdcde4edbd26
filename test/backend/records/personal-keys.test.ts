/**
 * Personal signing keys: the passphrase opens the key and nothing stores it; a wrong passphrase
 * refuses and changes nothing; a retired key cannot sign; the signer is the key's owner and the time
 * is the back end's clock, whatever the client sends. Real SQLite files, real Ed25519 keys.
 * Source for every case: derived — a signature must identify its signer and be made only by the
 * holder of the passphrase (SAFETY.md, "What a signature proves"); common practice for passphrase-
 * protected signing keys.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { dispatch } from '../../../electron/api/dispatch.js';
import { handlerTable } from '../../../electron/api/table.js';
import { RecordError, type RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, PASSPHRASE, registerRoom, snapshot, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let dbPath: string;
let assessmentId: string;
beforeEach(async () => {
  t = tempDir('bw-keys-');
  store = await openTemp(t.dir);
  dbPath = join(t.dir, 'records.sqlite');
  const { room } = await registerRoom(store);
  assessmentId = (await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) })).id;
});
afterEach(async () => {
  await store.close();
  t.cleanup();
});

/** Database rows plus the files outside it (trust list, signing log). */
function everything(): string {
  const keyDir = join(t.dir, 'keys');
  const files = existsSync(keyDir) ? readdirSync(keyDir).sort().map((f) => `${f}:${readFileSync(join(keyDir, f), 'utf8')}`) : [];
  return snapshot(dbPath) + files.join('\n');
}

async function refusal(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a refusal');
}

describe('personal signing keys', () => {
  it('the first key becomes the trust anchor; its fingerprint is what the app shows', async () => {
    const officer = await makeSigner(store);
    expect(officer.key).toMatchObject({ trusted: true, isAnchor: true, retiredAt: null });
    expect(officer.key.fingerprint).toMatch(/^[0-9a-f]{4}( [0-9a-f]{4}){4}$/);
    expect(await store.trustList()).toMatchObject({ anchorFingerprint: officer.key.fingerprint, keys: 1, problems: [] });
  });

  it('nothing stores the passphrase: not the database, its journal, nor the files beside it', async () => {
    await makeSigner(store);
    await store.close();
    const bytes = [dbPath, `${dbPath}-wal`].filter(existsSync).map((p) => readFileSync(p));
    const keyDir = join(t.dir, 'keys');
    bytes.push(...readdirSync(keyDir).map((f) => readFileSync(join(keyDir, f))));
    for (const b of bytes) expect(b.includes(Buffer.from(PASSPHRASE, 'utf8'))).toBe(false);
    store = await openTemp(t.dir);
  });

  it('a wrong passphrase refuses to sign and changes nothing', async () => {
    const officer = await makeSigner(store);
    const before = everything();
    const err = await refusal(() => store.signAssessment(assessmentId, { ...officer.signOff(), passphrase: 'not the passphrase' }));
    expect(err.message).toBe("The passphrase is not correct for Dr. Imre Calloway-Senn's signing key. Nothing was signed or changed.");
    expect(everything()).toBe(before);
    expect((await store.getAssessment(assessmentId)).current.status).toBe('draft');
  });

  it('the signer shown is the key\'s owner; one person cannot sign with another\'s passphrase', async () => {
    const officer = await makeSigner(store);
    const head = await makeSigner(store, 'Prof. Lena Vossberg');
    expect(head.key).toMatchObject({ trusted: true, isAnchor: false });
    expect((await refusal(() => store.signAssessment(assessmentId, { personId: head.person.id, passphrase: 'wrong for the lab head', statement: STATEMENT }))).message).toMatch(
      /not correct for Prof\. Lena Vossberg's signing key/,
    );
    const signed = await store.signAssessment(assessmentId, head.signOff());
    expect(signed.current.signature).toMatchObject({ personId: head.person.id, name: 'Prof. Lena Vossberg', keyId: head.key.keyId, keyTrusted: true });
    const report = await store.verify(assessmentId);
    expect(report).toMatchObject({ ok: true, signer: { name: 'Prof. Lena Vossberg', keyFingerprint: head.key.fingerprint } });
    expect(report.trustChain.join(' ')).toMatch(new RegExp(`endorsed by key ${officer.key.fingerprint} of Dr\\. Imre Calloway-Senn`));
  });

  it('a later key without an endorsement is not trusted and cannot sign until a trusted signer endorses it', async () => {
    const officer = await makeSigner(store);
    const newcomer = await store.createPerson({ name: 'Tomas Reyl', role: 'Deputy laser safety officer' });
    const key = await store.createPersonKey({ personId: newcomer.id, passphrase: 'newcomer passphrase', passphraseAgain: 'newcomer passphrase' });
    expect(key.trusted).toBe(false);
    expect((await refusal(() => store.signAssessment(assessmentId, { personId: newcomer.id, passphrase: 'newcomer passphrase', statement: STATEMENT }))).message).toMatch(
      /Tomas Reyl's key [0-9a-f ]+ is not admitted to this installation's trust list .*A person whose key is trusted must endorse it first/,
    );
    expect((await refusal(() => store.endorseKey({ keyId: key.keyId, endorserPersonId: officer.person.id, endorserPassphrase: 'wrong' }))).message).toMatch(/passphrase is not correct/);
    expect(await store.endorseKey({ keyId: key.keyId, endorserPersonId: officer.person.id, endorserPassphrase: PASSPHRASE })).toMatchObject({ trusted: true });
    expect((await store.signAssessment(assessmentId, { personId: newcomer.id, passphrase: 'newcomer passphrase', statement: STATEMENT })).current.signature?.name).toBe('Tomas Reyl');
  });

  it('the passphrase twice must agree; a short one is refused with the field named', async () => {
    const p = await store.createPerson({ name: 'Ada Quillfeather', role: 'Laser safety officer' });
    expect((await refusal(() => store.createPersonKey({ personId: p.id, passphrase: 'long enough one', passphraseAgain: 'long enough two' }))).message).toMatch(/The two passphrases are not the same/);
    expect((await refusal(() => store.createPersonKey({ personId: p.id, passphrase: 'short', passphraseAgain: 'short' }))).message).toMatch(/[Pp]assphrase: must be at least 10 characters/);
    expect(await store.listPersonKeys()).toEqual([]);
  });

  it('a changed passphrase: the old one no longer opens the key, the new one does', async () => {
    const officer = await makeSigner(store);
    const next = 'a new passphrase for the key';
    await store.changeKeyPassphrase({ personId: officer.person.id, passphrase: PASSPHRASE, newPassphrase: next, newPassphraseAgain: next });
    expect((await refusal(() => store.signAssessment(assessmentId, officer.signOff()))).message).toMatch(/passphrase is not correct/);
    expect((await store.signAssessment(assessmentId, { ...officer.signOff(), passphrase: next })).current.status).toBe('signed');
  });

  it('a retired key cannot sign; what it signed before still verifies; the reason is kept', async () => {
    const officer = await makeSigner(store);
    await store.signAssessment(assessmentId, officer.signOff());
    const retired = await store.retirePersonKey({ personId: officer.person.id, reason: 'Passphrase may have been seen by a visitor' });
    expect(retired).toMatchObject({ retiredReason: 'Passphrase may have been seen by a visitor' });
    expect(retired.retiredAt).not.toBeNull();
    await store.saveAssessment(assessmentId, { ...(await store.getAssessment(assessmentId)).current.content, notes: 'after retirement' });
    expect((await refusal(() => store.signAssessment(assessmentId, officer.signOff()))).message).toBe(
      "Dr. Imre Calloway-Senn's signing key is retired; a retired key cannot sign. Create a new key in the register (People).",
    );
    expect(await store.verify(assessmentId)).toMatchObject({ ok: true, revisionNo: 1 });
  });
});

describe('time and identity come from the back end', () => {
  const ctx = () => ({ shell: 'loopback' as const, version: 'test', databasePath: dbPath, store });

  it('a client-chosen signing time or signer name is refused by the API, naming the field', async () => {
    const officer = await makeSigner(store);
    for (const extra of [{ signedAt: '2025-01-01T00:00:00.000Z' }, { name: 'Someone Else' }, { role: 'Director' }]) {
      const reply = await dispatch(handlerTable, ctx(), 'assessment-sign', { id: assessmentId, signOff: { ...officer.signOff(), ...extra } });
      expect(reply.ok).toBe(false);
      if (!reply.ok) expect(reply.error.message).toMatch(new RegExp(`Sign ?[oO]ff: .*${Object.keys(extra)[0] ?? ''}`));
    }
    expect((await store.getAssessment(assessmentId)).current.status).toBe('draft');
  });

  it('the recorded signing time is the back end clock at signing', async () => {
    const officer = await makeSigner(store);
    const before = new Date().toISOString();
    const reply = await dispatch(handlerTable, ctx(), 'assessment-sign', { id: assessmentId, signOff: officer.signOff() });
    const after = new Date().toISOString();
    expect(reply.ok).toBe(true);
    const signedAt = (await store.getAssessment(assessmentId)).current.signature?.signedAt ?? '';
    expect(signedAt >= before && signedAt <= after).toBe(true);
  });
});

describe('signing any record with a personal key (reusable beyond assessments)', () => {
  it('signAsPerson signs a canonical payload with the back end time; checkPersonSignature finds it valid and trusted, and a changed payload not', async () => {
    const officer = await makeSigner(store);
    const { makeContext } = await import('../../../electron/backend/records/context.js');
    const { openDatabase } = await import('../../../electron/backend/records/database.js');
    const { SqliteSqlPort } = await import('../../../electron/backend/records/sqlite-port.js');
    const { sqliteSeam } = await import('../../../electron/backend/records/sqlite-engine.js');
    const { evaluateRoom, CALCULATED_WITH } = await import('../../../electron/backend/records/core-link.js');
    const { signAsPerson, checkPersonSignature } = await import('../../../electron/backend/records/personal-keys.js');
    const { db } = openDatabase(dbPath);
    try {
      const q = new SqliteSqlPort(db);
      const ctx = makeContext({ q, engine: sqliteSeam(q, dbPath), keyDir: join(t.dir, 'keys'), evaluate: evaluateRoom, calculatedWith: CALCULATED_WITH });
      // An invented limit-table row check as the payload (the shape is the caller's).
      const row = { table: 'example-table', row: 'R-1', checkedAgainst: 'derived: invented for this test' };
      await expect(signAsPerson(ctx, officer.person.id, 'wrong passphrase', (s) => ({ row, checkedAt: s.signedAt }))).rejects.toThrow(/passphrase is not correct/);
      const before = new Date().toISOString();
      const signed = await signAsPerson(ctx, officer.person.id, PASSPHRASE, (s) => ({ row, by: s.personId, checkedAt: s.signedAt }));
      expect(signed.signer).toMatchObject({ personId: officer.person.id, name: 'Dr. Imre Calloway-Senn', keyId: officer.key.keyId });
      expect(signed.signer.signedAt >= before).toBe(true);
      expect(await checkPersonSignature(ctx, signed.payload, signed.signature, signed.signer.keyId)).toMatchObject({ valid: true, trusted: true, ownerPersonId: officer.person.id });
      expect((await checkPersonSignature(ctx, { ...signed.payload, row: { ...row, row: 'R-2' } }, signed.signature, signed.signer.keyId)).valid).toBe(false);
    } finally {
      db.close();
    }
  });
});
