/**
 * Attacks on signed records by someone who can write the database file, the files beside it or an
 * export file — each must fail `verify` with a finding an officer can read. Real SQLite files and
 * real Ed25519 keys; the attacker uses raw SQL (another SQLite tool), as an insider would.
 * Source for every case: derived — what a person with write access to the user-data folder can do
 * without the signer's passphrase (threat model of SAFETY.md, "What a signature proves").
 */
import Database from 'better-sqlite3';
import { generateKeyPairSync, sign, type KeyObject } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { decodeResults, statementFor, type AssessmentRow, type RevisionRow, type SignatureRow } from '../../../electron/backend/records/assessments.js';
import { canonicalJson } from '../../../electron/backend/records/canonical.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';
import { fingerprintOf, keyIdOf, linkOf } from '../../../electron/backend/records/signing.js';
import { makeEndorsedEntry, type TrustEntry } from '../../../electron/backend/records/trust-list.js';
import { TRUST_ANCHOR_FILE } from '../../../electron/backend/records/trust-anchor-setting.js';
import type { AssessmentContent, RecordStore, VerifyReport } from '../../../electron/backend/records/index.js';
import type { RoomResult } from '../../../core/model/results.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';

interface Env {
  dir: string;
  dbPath: string;
  keyDir: string;
  store: RecordStore;
  officer: Awaited<ReturnType<typeof makeSigner>>;
  assessmentId: string;
  roomId: string;
}

const cleanups: Array<() => void> = [];
afterEach(() => {
  while (cleanups.length) cleanups.pop()?.();
});

/** An officer's installation with one assessment signed twice (revision 1 superseded, 2 signed). */
async function installation(): Promise<Env> {
  const t = tempDir('bw-attack-');
  const store = await openTemp(t.dir);
  cleanups.push(() => t.cleanup());
  const { room } = await registerRoom(store);
  const officer = await makeSigner(store);
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  await store.signAssessment(a.id, officer.signOff());
  await store.saveAssessment(a.id, { ...(await store.getAssessment(a.id)).current.content, notes: 'annual review' });
  await store.signAssessment(a.id, officer.signOff());
  return { dir: t.dir, dbPath: join(t.dir, 'records.sqlite'), keyDir: join(t.dir, 'keys'), store, officer, assessmentId: a.id, roomId: room.id };
}

/** The first beam's power set to 0.9 mW (it was 80 mW): the kind of change a forger wants on the door. */
function weakened(content: AssessmentContent): AssessmentContent {
  const [first, ...rest] = content.input.lasers;
  if (!first) throw new Error('no laser');
  const beams = first.beams.map((b, i) => (i === 0 && b.emission.kind === 'cw' ? { ...b, emission: { ...b.emission, power_W: 0.0009 } } : b));
  return { ...content, input: { ...content.input, lasers: [{ ...first, beams }, ...rest] } };
}

function attackerKey(): { privateKey: KeyObject; pem: string; keyId: string } {
  const { privateKey, publicKey } = generateKeyPairSync('ed25519');
  const pem = publicKey.export({ type: 'spki', format: 'pem' }).toString();
  return { privateKey, pem, keyId: keyIdOf(pem) };
}

/** Raw SQL, as another SQLite tool: sign the open draft with the attacker's key in the officer's name. */
function forgeSignature(env: Env, key: ReturnType<typeof attackerKey>, trustAnchor: string): void {
  const raw = new Database(env.dbPath);
  try {
    const a = raw.prepare('SELECT * FROM assessment WHERE id = ?').get(env.assessmentId) as AssessmentRow;
    const draft = raw.prepare("SELECT * FROM revision WHERE assessment_id = ? AND status = 'draft'").get(a.id) as RevisionRow;
    const prev = raw.prepare("SELECT * FROM revision WHERE assessment_id = ? AND status = 'signed'").get(a.id) as RevisionRow;
    const prevSig = raw.prepare('SELECT * FROM signature WHERE revision_id = ?').get(prev.id) as SignatureRow;
    const content = JSON.parse(draft.content_json) as AssessmentContent;
    const fields = {
      person_id: env.officer.person.id,
      name: env.officer.person.name,
      role: env.officer.person.role,
      signed_at: new Date().toISOString(),
      statement: STATEMENT,
      fingerprint: fingerprintOf(content, decodeResults(draft.results_z) as RoomResult, draft.calculated_with),
      statement_version: 2,
      previous_link: linkOf(statementFor(a, prev, prevSig)),
      trust_anchor: trustAnchor,
      key_id: key.keyId,
    };
    const signature = sign(null, Buffer.from(canonicalJson(statementFor(a, draft, fields)), 'utf8'), key.privateKey).toString('base64');
    raw.prepare("INSERT INTO signing_key (key_id, public_key, origin, added_at) VALUES (?, ?, 'this-database', ?)").run(key.keyId, key.pem, fields.signed_at);
    raw
      .prepare(
        `INSERT INTO signature (revision_id, person_id, name, role, signed_at, statement, fingerprint, algorithm, signature, key_id, statement_version, previous_link, trust_anchor)
         VALUES (@revision_id, @person_id, @name, @role, @signed_at, @statement, @fingerprint, 'Ed25519', @signature, @key_id, @statement_version, @previous_link, @trust_anchor)`,
      )
      .run({ ...fields, revision_id: draft.id, signature });
    raw.prepare("UPDATE revision SET status = 'superseded' WHERE id = ?").run(prev.id);
    raw.prepare("UPDATE revision SET status = 'signed' WHERE id = ?").run(draft.id);
  } finally {
    raw.close();
  }
}

/** The CREATE TRIGGER text the migrations define for `name` (the attacker can put a trigger back exactly). */
function triggerSql(name: string): string {
  let found = '';
  for (const m of MIGRATIONS) {
    const match = new RegExp(`CREATE TRIGGER ${name}\\b[\\s\\S]*?\\bEND;`).exec(m.sql);
    if (match) found = match[0];
  }
  if (!found) throw new Error(`no trigger ${name}`);
  return found;
}

/** Run SQL with some triggers dropped; `restore` puts them back afterwards (covering the tracks). */
function withoutTriggers(env: Env, names: readonly string[], sql: (raw: Database.Database) => void, restore: boolean): void {
  const raw = new Database(env.dbPath);
  try {
    for (const n of names) raw.exec(`DROP TRIGGER ${n}`);
    sql(raw);
    if (restore) for (const n of names) raw.exec(triggerSql(n));
  } finally {
    raw.close();
  }
}

function anchorOf(env: Env): string {
  return (JSON.parse(readFileSync(join(env.keyDir, TRUST_ANCHOR_FILE), 'utf8')) as { anchor: string }).anchor;
}

/** Raw SQL, as another SQLite tool: an endorsement row written straight into the register. */
function insertEndorsement(env: Env, e: TrustEntry): void {
  const raw = new Database(env.dbPath);
  try {
    raw
      .prepare('INSERT INTO trust_endorsement (key_id, endorsed_by, public_key, person_id, person_name, admitted_at, endorsement) VALUES (?, ?, ?, ?, ?, ?, ?)')
      .run(e.keyId, e.endorsedBy, e.publicKey, e.personId, e.personName, e.admittedAt, e.endorsement);
  } finally {
    raw.close();
  }
}

interface Attack {
  readonly name: string;
  readonly attack: (env: Env) => void | Promise<void>;
  /** What verify must say (each must appear among the findings). */
  readonly findings: readonly RegExp[];
  readonly failedCheck: VerifyReport['checks'][number]['check'];
}

const ATTACKS: readonly Attack[] = [
  {
    name: 'a key inserted into the database signs revision 3 with the power changed to 0.9 mW, in the officer\'s name',
    attack: async (env) => {
      await env.store.saveAssessment(env.assessmentId, weakened((await env.store.getAssessment(env.assessmentId)).current.content));
      forgeSignature(env, attackerKey(), anchorOf(env));
    },
    findings: [/is NOT trusted here — a key that only the database lists proves nothing\. Key [0-9a-f ]+ is not on this installation's trust list\./],
    failedCheck: 'key-trusted',
  },
  {
    name: 'a trigger dropped and the signed row rewritten (power 0.9 mW)',
    attack: (env) =>
      withoutTriggers(env, ['revision_signed_immutable'], (raw) => {
        raw.prepare("UPDATE revision SET content_json = json_set(content_json, '$.input.lasers[0].beams[0].emission.power_W', 0.0009) WHERE assessment_id = ? AND revision_no = 2").run(env.assessmentId);
      }, false),
    findings: [/The fingerprint does not match the stored content and results: they were changed after signing\./, /protections against changing signed records were removed \(trigger revision_signed_immutable is missing\)/],
    failedCheck: 'fingerprint',
  },
  {
    name: 'the newest signed revision deleted and the one before put back to signed (triggers restored afterwards)',
    attack: (env) =>
      withoutTriggers(env, ['revision_signed_no_delete', 'signature_no_delete', 'revision_signed_immutable'], (raw) => {
        const rev2 = raw.prepare('SELECT id FROM revision WHERE assessment_id = ? AND revision_no = 2').get(env.assessmentId) as { id: string };
        raw.prepare('DELETE FROM signature WHERE revision_id = ?').run(rev2.id);
        raw.prepare('DELETE FROM revision WHERE id = ?').run(rev2.id);
        raw.prepare("UPDATE revision SET status = 'signed' WHERE assessment_id = ? AND revision_no = 1").run(env.assessmentId);
      }, true),
    findings: [/The signing log outside the database records revision 2, signed on \d{4}-\d{2}-\d{2} with key [0-9a-f ]+, but this database does not have it as signed: it was deleted/],
    failedCheck: 'chain',
  },
  {
    name: 'the signed revision flipped to superseded (the trigger allows signed -> superseded)',
    attack: (env) => {
      const raw = new Database(env.dbPath);
      raw.prepare("UPDATE revision SET status = 'superseded' WHERE assessment_id = ? AND revision_no = 2").run(env.assessmentId);
      raw.close();
    },
    findings: [/Revision 2 is marked superseded, but no later signed revision replaces it: its status was changed from signed to superseded outside Beamwarden\./],
    failedCheck: 'chain',
  },
  {
    name: 'the list title of the signed revision changed (trigger restored afterwards)',
    attack: (env) =>
      withoutTriggers(env, ['revision_signed_immutable'], (raw) => {
        raw.prepare("UPDATE revision SET title = 'Room cleared, no laser hazard' WHERE assessment_id = ? AND revision_no = 2").run(env.assessmentId);
      }, true),
    findings: [/The register lists revision 2 with the title "Room cleared, no laser hazard", but its recorded content says "Laser hazard evaluation, room A0\.07.*": the list column was changed outside Beamwarden\./],
    failedCheck: 'chain',
  },
  {
    name: 'the review date in the list pushed out to 2099 (trigger restored afterwards)',
    attack: (env) =>
      withoutTriggers(env, ['revision_signed_immutable'], (raw) => {
        raw.prepare("UPDATE revision SET review_by = '2099-12-31' WHERE assessment_id = ? AND revision_no = 2").run(env.assessmentId);
      }, true),
    findings: [/The register lists revision 2 for review by 2099-12-31, but its recorded content says \d{4}-\d{2}-\d{2}: the list column was changed/],
    failedCheck: 'chain',
  },
  {
    name: 'a revision removed from the middle of the chain (triggers restored afterwards)',
    attack: async (env) => {
      await env.store.saveAssessment(env.assessmentId, { ...(await env.store.getAssessment(env.assessmentId)).current.content, notes: 'third' });
      await env.store.signAssessment(env.assessmentId, env.officer.signOff());
      withoutTriggers(env, ['revision_signed_no_delete', 'signature_no_delete', 'revision_signed_immutable'], (raw) => {
        const rev2 = raw.prepare('SELECT id FROM revision WHERE assessment_id = ? AND revision_no = 2').get(env.assessmentId) as { id: string };
        raw.prepare('DELETE FROM signature WHERE revision_id = ?').run(rev2.id);
        raw.prepare('UPDATE revision SET based_on = NULL WHERE based_on = ?').run(rev2.id);
        raw.prepare('DELETE FROM revision WHERE id = ?').run(rev2.id);
      }, true);
    },
    findings: [/Revision 2 is missing \(the numbers jump from 1 to 3\)/, /Revision 3 was signed following a different revision than revision 1 stored before it/],
    failedCheck: 'chain',
  },
  {
    name: 'the desk\'s anchor setting replaced by the forger\'s key, self-endorsed in the register, which then signs',
    attack: async (env) => {
      const key = attackerKey();
      const entry = makeEndorsedEntry(
        { keyId: key.keyId, publicKey: key.pem, personId: env.officer.person.id, personName: env.officer.person.name, admittedAt: new Date().toISOString(), endorsedBy: key.keyId },
        key.privateKey,
      );
      insertEndorsement(env, entry);
      writeFileSync(join(env.keyDir, TRUST_ANCHOR_FILE), JSON.stringify({ format: 'beamwarden-trust-anchor', version: 1, anchor: key.keyId, setAt: entry.admittedAt }));
      await env.store.saveAssessment(env.assessmentId, weakened((await env.store.getAssessment(env.assessmentId)).current.content));
      forgeSignature(env, key, key.keyId);
    },
    findings: [/This register's signatures are endorsed by a key this desk does not recognise: the register was set up with the trust anchor [0-9a-f ]+, but this desk is configured with [0-9a-f ]+\./],
    failedCheck: 'key-trusted',
  },
  {
    name: 'an endorsement of the forger\'s key written into the register without the officer\'s key',
    attack: async (env) => {
      const key = attackerKey();
      const anchor = anchorOf(env);
      const forged = makeEndorsedEntry(
        { keyId: key.keyId, publicKey: key.pem, personId: env.officer.person.id, personName: env.officer.person.name, admittedAt: new Date().toISOString(), endorsedBy: anchor },
        key.privateKey, // signed with its own key, claiming the anchor's endorsement
      );
      insertEndorsement(env, forged);
      await env.store.saveAssessment(env.assessmentId, weakened((await env.store.getAssessment(env.assessmentId)).current.content));
      forgeSignature(env, key, anchor);
    },
    findings: [/The endorsement of key [0-9a-f ]+ of Dr\. Imre Calloway-Senn is not a valid signature by key [0-9a-f ]+ of Dr\. Imre Calloway-Senn: it was forged or edited\./],
    failedCheck: 'key-trusted',
  },
  {
    name: 'the signing time moved back by a year (signature trigger dropped)',
    attack: (env) =>
      withoutTriggers(env, ['signature_no_update'], (raw) => {
        raw.prepare("UPDATE signature SET signed_at = '2025-01-15T09:00:00.000Z' WHERE revision_id = (SELECT id FROM revision WHERE assessment_id = ? AND revision_no = 2)").run(env.assessmentId);
      }, true),
    findings: [/The signature is not valid for the signer, date, statement and fingerprint recorded: the sign-off was changed\./],
    failedCheck: 'signature',
  },
];

describe('attacks on signed records fail verification with a readable finding', () => {
  it.each(ATTACKS)('$name', async ({ attack, findings, failedCheck }) => {
    const env = await installation();
    expect((await env.store.verify(env.assessmentId)).ok).toBe(true); // intact before the attack
    await attack(env);
    await env.store.close();
    const reopened = await openTemp(env.dir); // a fresh connection, as an auditor's verify would use
    try {
      const report = await reopened.verify(env.assessmentId);
      expect(report.ok).toBe(false);
      for (const f of findings) expect(report.findings.join('\n')).toMatch(f);
      expect(report.checks.find((c) => c.check === failedCheck)?.ok).toBe(false);
    } finally {
      await reopened.close();
    }
  });

  it('a dropped trigger is reported when the database is opened', async () => {
    const env = await installation();
    await env.store.close();
    withoutTriggers(env, ['signature_no_delete'], () => undefined, false);
    const reopened = await openTemp(env.dir);
    try {
      expect(reopened.info.warnings.join(' ')).toMatch(/protections against changing signed records were removed \(trigger signature_no_delete is missing\)/);
    } finally {
      await reopened.close();
    }
  });

  it('a crafted export, signed at the forger\'s own installation in the officer\'s name, is imported as unverified', async () => {
    const env = await installation();
    // The forger's installation: a person with the officer's name and a key trusted there.
    const forgerDir = tempDir('bw-forger-');
    cleanups.push(() => forgerDir.cleanup());
    const forger = await openTemp(forgerDir.dir);
    try {
      await forger.importDocument(await env.store.exportAssessment(env.assessmentId));
      const twin = await makeSigner(forger, env.officer.person.name);
      await forger.saveAssessment(env.assessmentId, weakened((await forger.getAssessment(env.assessmentId)).current.content));
      await forger.signAssessment(env.assessmentId, twin.signOff());
      const crafted = await forger.exportAssessment(env.assessmentId);

      const summary = await env.store.importDocument(crafted);
      expect(summary.unverified).toBe(1);
      expect(summary.untrustedKeys.map((k) => k.fingerprint)).toEqual([twin.key.fingerprint]);
      const shown = (await env.store.getAssessment(env.assessmentId)).current;
      expect(shown.revisionNo).toBe(3);
      expect(shown.signature?.keyTrusted).toBe(false); // shown as an unverified signature, never as signed
      const report = await env.store.verify(env.assessmentId);
      expect(report).toMatchObject({ ok: false, keyTrusted: false, signatureValid: true });
      expect(report.findings.join('\n')).toMatch(/is NOT trusted here — a key that only the database lists proves nothing\. Key [0-9a-f ]+ is not on this installation's trust list\./);
    } finally {
      await forger.close();
      await env.store.close();
    }
  });

  it('a sealed private key replaced in the database cannot sign for the officer', async () => {
    const env = await installation();
    const raw = new Database(env.dbPath);
    // The forger seals their own key under the officer's key id (knowing their own passphrase).
    const sealed = await (async () => {
      const dir = tempDir('bw-sealed-');
      cleanups.push(() => dir.cleanup());
      const s = await openTemp(dir.dir);
      const p = await makeSigner(s, 'Forger', undefined, 'forger passphrase 123');
      await s.close();
      const db = new Database(join(dir.dir, 'records.sqlite'), { readonly: true });
      const row = db.prepare('SELECT sealed_private_key FROM person_key WHERE key_id = ?').get(p.key.keyId) as { sealed_private_key: string };
      db.close();
      return row.sealed_private_key;
    })();
    raw.exec('DROP TRIGGER person_key_owner_fixed');
    raw.prepare('UPDATE person_key SET sealed_private_key = ? WHERE key_id = ?').run(sealed, env.officer.key.keyId);
    raw.close();
    await env.store.saveAssessment(env.assessmentId, weakened((await env.store.getAssessment(env.assessmentId)).current.content));
    // The sealed blob is bound to its own key id (authenticated data): it does not even open.
    await expect(env.store.signAssessment(env.assessmentId, { personId: env.officer.person.id, passphrase: 'forger passphrase 123', statement: STATEMENT })).rejects.toThrow(
      /The passphrase is not correct for Dr\. Imre Calloway-Senn's signing key\. Nothing was signed or changed\./,
    );
    await env.store.close();
  });
});
