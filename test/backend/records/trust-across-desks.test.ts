/**
 * Trust across desks: several desks (each its own user-data folder) work on one register. The
 * endorsements of the trust list are rows of the register, which every desk reads; each desk
 * believes them only through a chain of valid endorsements to the trust anchor configured on THAT
 * desk, outside the database. Design and the cases below: issue 15 ("An institution-wide register",
 * item 4, trust across desks) and issue 10 ("Signatures that mean something": a key that appears
 * only in the database is never trusted; keys are admitted only by an endorsement signed by an
 * already trusted key; a retired key cannot sign, what it signed stays valid). This is a security
 * property of the records, not a physics result: the cases cite the design, not a standard.
 * Real register on both engines (SQLite file, PostgreSQL server), real Ed25519 keys, no mocks.
 */
import Database from 'better-sqlite3';
import { generateKeyPairSync } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, expect, it } from 'vitest';
import { openRecordStore, RecordError, type RecordStore } from '../../../electron/backend/records/index.js';
import { openSealedKey, SealedKeySchema } from '../../../electron/backend/records/key-encryption.js';
import { keyIdOf } from '../../../electron/backend/records/signing.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';
import { TRUST_ANCHOR_FILE } from '../../../electron/backend/records/trust-anchor-setting.js';
import { makeEndorsedEntry, TRUST_LIST_FILE, type TrustEntry } from '../../../electron/backend/records/trust-list.js';
import { adminQuery, forEachEngine, pgAddress, schemaFor, type TestEngine } from './engines.js';
import { makeSigner, PASSPHRASE, registerRoom, STATEMENT, tempDir } from './helpers.js';

async function refusal(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a refusal');
}

function newKey() {
  const { privateKey, publicKey } = generateKeyPairSync('ed25519');
  const pem = publicKey.export({ type: 'spki', format: 'pem' }).toString();
  return { privateKey, pem, keyId: keyIdOf(pem) };
}

forEachEngine((engine: TestEngine) => {
  let t: ReturnType<typeof tempDir>;
  let address: string;
  const open: RecordStore[] = [];

  beforeEach(async () => {
    t = tempDir('bw-desks-');
    address = engine.name === 'postgresql' ? await pgAddress(schemaFor(t.dir, 'register')) : join(t.dir, 'register.sqlite');
  });
  afterEach(async () => {
    while (open.length) await open.pop()?.close();
    t.cleanup();
  });

  /** One desk: its own user-data folder (anchor setting, signing log), the shared register. */
  async function desk(name: string): Promise<RecordStore> {
    const store = await openRecordStore({ path: address, keyDir: join(t.dir, `desk-${name}`) });
    open.push(store);
    return store;
  }

  /** SQL straight into the register, as someone with write access but no trusted key would. */
  async function rawSql(sql: string, ...params: Array<string | null>): Promise<void> {
    if (engine.name === 'postgresql') {
      let n = 0;
      await adminQuery(schemaFor(t.dir, 'register'), sql.replace(/\?/g, () => `$${++n}`), params);
      return;
    }
    const raw = new Database(address);
    try {
      raw.prepare(sql).run(...params);
    } finally {
      raw.close();
    }
  }

  async function rawRows<T>(sql: string): Promise<T[]> {
    if (engine.name === 'postgresql') return adminQuery(schemaFor(t.dir, 'register'), sql) as Promise<T[]>;
    const raw = new Database(address, { readonly: true });
    try {
      return raw.prepare(sql).all() as T[];
    } finally {
      raw.close();
    }
  }

  const insertEndorsement = (e: TrustEntry) =>
    rawSql(
      'INSERT INTO trust_endorsement (key_id, endorsed_by, public_key, person_id, person_name, admitted_at, endorsement) VALUES (?, ?, ?, ?, ?, ?, ?)',
      e.keyId, e.endorsedBy, e.publicKey, e.personId, e.personName, e.admittedAt, e.endorsement,
    );

  /** Desk A sets the register up: the head of the office's key is the anchor; the deputy's key is endorsed by it; the deputy signs. */
  async function institution() {
    const a = await desk('A');
    const { room } = await registerRoom(a);
    const head = await makeSigner(a, 'Dr. Imre Calloway-Senn');
    const deputy = await makeSigner(a, 'Tomas Reyl', head);
    const assessment = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
    await a.signAssessment(assessment.id, deputy.signOff());
    const anchor = (await a.trustList()).anchor ?? '';
    return { a, room, head, deputy, assessmentId: assessment.id, anchor };
  }

  it('a key endorsed on desk A verifies on desk B once B is configured with the same anchor (typed from paper)', async () => {
    const { deputy, head, assessmentId, anchor } = await institution();
    const b = await desk('B');
    // Issue 15 item 4: the anchor is configured on each desk; until then nothing is trusted there.
    expect((await b.trustList()).problems.join(' ')).toMatch(/This desk has no trust anchor configured, so no signature in this register is trusted here\./);
    expect(await b.verify(assessmentId)).toMatchObject({ ok: false, signatureValid: true, keyTrusted: false });
    // Typed as on paper: upper case, in groups of four.
    const typed = (anchor.toUpperCase().match(/.{4}/g) ?? []).join(' ');
    const info = await b.setTrustAnchor({ fingerprint: typed });
    expect(info).toMatchObject({ anchor, problems: [], keys: 2 });
    expect(info.anchorFull?.replace(/ /g, '')).toBe(anchor);
    const report = await b.verify(assessmentId);
    expect(report).toMatchObject({ ok: true, signatureValid: true, keyTrusted: true, fingerprintMatches: true, resultsMatchCore: true });
    // Issue 10 item 2: "key trusted (and by which endorsement chain)".
    expect(report.trustChain).toEqual([
      expect.stringMatching(new RegExp(`^key ${deputy.key.fingerprint} of Tomas Reyl was endorsed by key ${head.key.fingerprint} of Dr\\. Imre Calloway-Senn on \\d{4}-\\d\\d-\\d\\d\\.$`)),
      expect.stringMatching(new RegExp(`^key ${head.key.fingerprint} of Dr\\. Imre Calloway-Senn is the trust anchor`)),
    ]);
    expect((await b.listPersonKeys()).map((k) => [k.fingerprint, k.trusted, k.isAnchor])).toEqual([
      [head.key.fingerprint, true, true],
      [deputy.key.fingerprint, true, false],
    ]);
    // A key endorsed later on desk A is seen on desk B without reopening it.
    const a = open[0];
    if (!a) throw new Error('desk A');
    const third = await makeSigner(a, 'Wen Okafor-Lind', deputy);
    expect((await b.listPersonKeys()).find((k) => k.keyId === third.key.keyId)).toMatchObject({ trusted: true });
  });

  it.each([
    {
      // Issue 10: "a key that appears only in the database is never known".
      name: 'an endorsement signed with the newcomer\'s own key, claiming the anchor\'s',
      forge: (k: ReturnType<typeof newKey>, target: { keyId: string; pem: string; personId: string }, anchor: string) =>
        makeEndorsedEntry({ keyId: target.keyId, publicKey: target.pem, personId: target.personId, personName: 'Mallory Unlisted', admittedAt: new Date().toISOString(), endorsedBy: anchor }, k.privateKey),
      chain: /The endorsement of key [0-9a-f ]+ of Mallory Unlisted is not a valid signature by key [0-9a-f ]+ of Dr\. Imre Calloway-Senn: it was forged or edited\./,
    },
    {
      // Issue 15 item 4: rows are believed only through a chain to the desk's own anchor.
      name: 'a second, self-endorsed "anchor" written into the register, which endorses the newcomer',
      forge: (k: ReturnType<typeof newKey>, target: { keyId: string; pem: string; personId: string }) =>
        makeEndorsedEntry({ keyId: target.keyId, publicKey: target.pem, personId: target.personId, personName: 'Mallory Unlisted', admittedAt: new Date().toISOString(), endorsedBy: k.keyId }, k.privateKey),
      chain: /endorses itself but is not this desk's trust anchor/,
    },
  ])('a forged endorsement row inserted by SQL is trusted on no desk: $name', async ({ forge, chain }) => {
    const { a, deputy, anchor } = await institution();
    const b = await desk('B');
    await b.setTrustAnchor({ fingerprint: anchor });
    // The newcomer's key is created in the ordinary way (anyone may), but nobody trusted endorses it.
    const mallory = await a.createPerson({ name: 'Mallory Unlisted', role: 'Visiting researcher' });
    const made = await a.createPersonKey({ personId: mallory.id, passphrase: 'mallory passphrase', passphraseAgain: 'mallory passphrase' });
    expect(made.trusted).toBe(false);
    const pem = (await rawRows<{ public_key: string }>(`SELECT public_key FROM signing_key WHERE key_id = '${made.keyId}'`))[0]?.public_key ?? '';
    const rogue = newKey();
    // The rogue "anchor" endorses itself validly; then the forged endorsement of the newcomer.
    await insertEndorsement(makeEndorsedEntry({ keyId: rogue.keyId, publicKey: rogue.pem, personId: null, personName: 'Rogue anchor', admittedAt: new Date().toISOString(), endorsedBy: rogue.keyId }, rogue.privateKey));
    await insertEndorsement(forge(rogue, { keyId: made.keyId, pem, personId: mallory.id }, anchor));
    // A forged row beside a real one changes nothing for the real key.
    await insertEndorsement({ ...makeEndorsedEntry({ keyId: deputy.key.keyId, publicKey: pem, personId: deputy.person.id, personName: 'Tomas Reyl', admittedAt: new Date().toISOString(), endorsedBy: anchor }, rogue.privateKey) });
    for (const d of [a, b]) {
      const keys = await d.listPersonKeys();
      const m = keys.find((k) => k.keyId === made.keyId);
      expect(m?.trusted).toBe(false);
      expect(m?.trustChain.join(' ')).toMatch(chain);
      expect(keys.find((k) => k.keyId === deputy.key.keyId)?.trusted).toBe(true);
    }
    // Nor can the newcomer sign on either desk.
    const { room } = await registerRoom(b, 'B2.14');
    const draft = await b.createAssessment({ roomId: room.id, content: await b.newAssessmentContent(room.id) });
    for (const d of [a, b]) {
      expect((await refusal(() => d.signAssessment(draft.id, { personId: mallory.id, passphrase: 'mallory passphrase', statement: STATEMENT }))).message).toMatch(
        /Mallory Unlisted's key [0-9a-f ]+ is not admitted to this installation's trust list .*A person whose key is trusted must endorse it first/,
      );
    }
  });

  it('a desk configured with a different anchor reports it plainly, trusts nothing and signs nothing', async () => {
    const { deputy, assessmentId, anchor } = await institution();
    const c = await desk('C');
    const other = newKey();
    await c.setTrustAnchor({ fingerprint: other.keyId });
    const info = await c.trustList();
    const short = (id: string) => (id.slice(0, 20).match(/.{4}/g) ?? []).join(' ');
    // Issue 15 item 4: "a database whose anchor differs from the desk's configured one is reported plainly".
    expect(info.problems).toEqual([
      `This register's signatures are endorsed by a key this desk does not recognise: the register was set up with the trust anchor ${short(anchor)}, ` +
        `but this desk is configured with ${short(other.keyId)}. No signature is trusted here until they agree: ` +
        'compare the fingerprint in Settings & about with the one you were given on paper, and check that this is the right register.',
    ]);
    expect(info.registerAnchors.map((x) => x.replace(/ /g, ''))).toEqual([anchor]);
    const report = await c.verify(assessmentId);
    expect(report).toMatchObject({ ok: false, signatureValid: true, keyTrusted: false });
    expect(report.findings.join(' ')).toMatch(/This register's signatures are endorsed by a key this desk does not recognise/);
    await c.saveAssessment(assessmentId, { ...(await c.getAssessment(assessmentId)).current.content, notes: 'second revision' });
    expect((await refusal(() => c.signAssessment(assessmentId, deputy.signOff()))).message).toMatch(
      /Tomas Reyl's key [0-9a-f ]+ is not admitted to this installation's trust list \(key [0-9a-f ]+ of Dr\. Imre Calloway-Senn endorses itself but is not this desk's trust anchor/,
    );
    // Putting the right anchor in ends the report.
    expect((await c.setTrustAnchor({ fingerprint: anchor })).problems).toEqual([]);
    expect((await c.listRevisions(assessmentId)).map((r) => r.status)).toEqual(['signed', 'draft']);
    expect((await c.verifySignedRevisions(assessmentId)).every((r) => r.ok)).toBe(true);
  });

  it.each([
    ['', /must be the 64 hexadecimal digits/],
    ['ab12 cd34', /must be 64 hexadecimal digits; 8 were given/],
    [`${'g'.repeat(64)}`, /may hold only the digits 0-9 and the letters a-f/],
  ])('a mistyped anchor %j is refused with the reason and changes nothing', async (typed, why) => {
    const { anchor } = await institution();
    const b = await desk('B');
    await b.setTrustAnchor({ fingerprint: anchor });
    const err = await refusal(() => b.setTrustAnchor({ fingerprint: typed }));
    expect(err.message).toMatch(why);
    expect(err.message).toMatch(/Nothing was changed\.$/);
    expect((await b.trustList()).anchor).toBe(anchor);
  });

  it('a key retired on desk A is seen retired on desk B: it signs nothing more, what it signed stays valid, and its later endorsements are not believed', async () => {
    const { a, deputy, assessmentId, anchor } = await institution();
    const b = await desk('B');
    await b.setTrustAnchor({ fingerprint: anchor });
    expect((await b.verify(assessmentId)).ok).toBe(true);
    // Issue 10 item 1: retirement with a reason; done on desk A while desk B is open.
    await a.retirePersonKey({ personId: deputy.person.id, reason: 'Passphrase may be known to others' });
    const seen = (await b.listPersonKeys()).find((k) => k.keyId === deputy.key.keyId);
    expect(seen).toMatchObject({ retiredReason: 'Passphrase may be known to others' });
    expect(seen?.retiredAt).not.toBeNull();
    // What it signed before stays valid on both desks.
    for (const d of [a, b]) expect(await d.verify(assessmentId)).toMatchObject({ ok: true, keyTrusted: true });
    // It signs nothing more, on either desk.
    const { room } = await registerRoom(b, 'B2.14');
    const draft = await b.createAssessment({ roomId: room.id, content: await b.newAssessmentContent(room.id) });
    for (const d of [a, b]) {
      expect((await refusal(() => d.signAssessment(draft.id, deputy.signOff()))).message).toMatch(/Tomas Reyl's signing key is retired; a retired key cannot sign\./);
    }
    // Someone who still holds the retired key's passphrase endorses a newcomer by SQL: no desk believes it.
    const sealedRow = (await rawRows<{ sealed_private_key: string }>(`SELECT sealed_private_key FROM person_key WHERE key_id = '${deputy.key.keyId}'`))[0];
    const retiredKey = openSealedKey(SealedKeySchema.parse(JSON.parse(sealedRow?.sealed_private_key ?? '{}')), deputy.key.keyId, PASSPHRASE);
    if (retiredKey === null) throw new Error('the retired key should open with its passphrase');
    const newcomer = newKey();
    await insertEndorsement(
      makeEndorsedEntry({ keyId: newcomer.keyId, publicKey: newcomer.pem, personId: null, personName: 'Late endorsement', admittedAt: new Date(Date.now() + 1000).toISOString(), endorsedBy: deputy.key.keyId }, retiredKey),
    );
    for (const d of [a, b]) {
      const info = await d.trustList();
      expect(info.keys).toBe(2); // the head and the (retired) deputy; not the newcomer
    }
    // The retirement cannot be undone by SQL (append-only, as the key itself).
    await expect(rawSql('DELETE FROM trust_retirement WHERE key_id = ?', deputy.key.keyId)).rejects.toThrow(/a retired signing key cannot be changed or brought back/);
    await expect(rawSql('DELETE FROM trust_endorsement WHERE key_id = ?', deputy.key.keyId)).rejects.toThrow(/an endorsement of a signing key cannot be deleted/);
  });

  /** The register as it was before schema 9 kept endorsements: the rows removed (protection off and on again), as another tool could. */
  async function withoutEndorsementRows(): Promise<void> {
    if (engine.name === 'postgresql') {
      const schema = schemaFor(t.dir, 'register');
      await adminQuery(schema, 'ALTER TABLE trust_endorsement DISABLE TRIGGER trust_endorsement_no_delete');
      await adminQuery(schema, 'DELETE FROM trust_endorsement');
      await adminQuery(schema, 'ALTER TABLE trust_endorsement ENABLE TRIGGER trust_endorsement_no_delete');
      return;
    }
    const trigger = /CREATE TRIGGER trust_endorsement_no_delete[\s\S]*?\bEND;/.exec(MIGRATIONS.find((m) => m.version === 9)?.sql ?? '')?.[0] ?? '';
    const raw = new Database(address);
    try {
      raw.exec('DROP TRIGGER trust_endorsement_no_delete; DELETE FROM trust_endorsement;');
      raw.exec(trigger);
    } finally {
      raw.close();
    }
  }

  it('a desk\'s trust list file from before schema 9 is carried into the register at open: same anchor, same chains', async () => {
    const { assessmentId, anchor } = await institution();
    const rows = await rawRows<{ key_id: string; endorsed_by: string; public_key: string; person_id: string | null; person_name: string; admitted_at: string; endorsement: string }>(
      'SELECT * FROM trust_endorsement ORDER BY admitted_at',
    );
    expect(rows).toHaveLength(2);
    while (open.length) await open.pop()?.close();
    // What schema 8 kept beside the database: the list file (its anchor, every endorsed entry); no anchor setting yet.
    const folder = join(t.dir, 'desk-A');
    const entries = rows.map((r) => ({ keyId: r.key_id, publicKey: r.public_key, personId: r.person_id, personName: r.person_name, admittedAt: r.admitted_at, endorsedBy: r.endorsed_by, endorsement: r.endorsement }));
    writeFileSync(join(folder, TRUST_LIST_FILE), JSON.stringify({ format: 'beamwarden-trust-list', version: 1, anchor, entries }));
    rmSync(join(folder, TRUST_ANCHOR_FILE));
    await withoutEndorsementRows();

    // A desk with another register's list file next to it carries nothing in (its anchor was never this register's).
    const foreign = newKey();
    const foreignEntry = makeEndorsedEntry({ keyId: foreign.keyId, publicKey: foreign.pem, personId: null, personName: 'Another register', admittedAt: new Date().toISOString(), endorsedBy: foreign.keyId }, foreign.privateKey);
    const dFolder = join(t.dir, 'desk-D');
    mkdirSync(dFolder, { recursive: true });
    writeFileSync(join(dFolder, TRUST_LIST_FILE), JSON.stringify({ format: 'beamwarden-trust-list', version: 1, anchor: foreign.keyId, entries: [foreignEntry] }));
    await desk('D');
    expect(await rawRows('SELECT key_id FROM trust_endorsement')).toEqual([]);
    expect(existsSync(join(dFolder, TRUST_ANCHOR_FILE))).toBe(false);

    const a = await desk('A');
    expect(a.info.warnings).toEqual([]);
    expect((await rawRows<{ n: number | string }>('SELECT count(*) AS n FROM trust_endorsement')).map((r) => Number(r.n))).toEqual([2]);
    expect((JSON.parse(readFileSync(join(folder, TRUST_ANCHOR_FILE), 'utf8')) as { anchor: string }).anchor).toBe(anchor);
    expect(await a.verify(assessmentId)).toMatchObject({ ok: true, keyTrusted: true });
    // Another desk configured with the same anchor now sees the carried endorsements too.
    const b = await desk('B');
    await b.setTrustAnchor({ fingerprint: anchor });
    expect(await b.verify(assessmentId)).toMatchObject({ ok: true, keyTrusted: true });
  });

  it('the protections of the endorsements are checked at open: a removed one is reported on every desk', async () => {
    await institution();
    while (open.length) await open.pop()?.close();
    if (engine.name === 'postgresql') {
      await adminQuery(schemaFor(t.dir, 'register'), 'ALTER TABLE trust_retirement DISABLE TRIGGER trust_retirement_no_delete');
    } else {
      const raw = new Database(address);
      try {
        raw.exec('DROP TRIGGER trust_retirement_no_delete');
      } finally {
        raw.close();
      }
    }
    for (const name of ['A', 'B']) {
      const d = await desk(name);
      expect(d.info.warnings.join(' ')).toMatch(
        /The database's protections against changing signed records were removed \(trigger trust_retirement_no_delete is (missing|switched off)\)/,
      );
    }
  });
});
