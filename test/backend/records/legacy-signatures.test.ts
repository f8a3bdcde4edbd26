/**
 * Signed records from schema version 2 (one installation key beside the database) are migrated:
 * each signature is re-checked against the installation key file, which becomes the first trusted
 * key (the trust anchor); it endorses the first personal key and is then retired, its file removed.
 * A replaced key file is not admitted. Fixture: test/fixtures/db-v2.sqlite with its key folder
 * test/fixtures/db-v2-keys (made by make-db-v2.ts). Source: derived — a migration must not turn an
 * unchecked key into a trusted one.
 */
import Database from 'better-sqlite3';
import { copyFileSync, cpSync, existsSync, readFileSync, writeFileSync } from 'node:fs';
import { generateKeyPairSync } from 'node:crypto';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openRecordStore, SCHEMA_VERSION, type RecordStore } from '../../../electron/backend/records/index.js';
import { PRIVATE_KEY_FILE } from '../../../electron/backend/records/signing.js';
import { PASSPHRASE, tempDir } from './helpers.js';

const fixture = fileURLToPath(new URL('../../fixtures/db-v2.sqlite', import.meta.url));
const fixtureKeys = fileURLToPath(new URL('../../fixtures/db-v2-keys', import.meta.url));
const SIGNED = '44444444-4444-4444-8444-444444444444';
const REV1 = '55555555-5555-4555-8555-555555555555';
const OFFICER = '22222222-2222-4222-8222-222222222222';

let t: ReturnType<typeof tempDir>;
let dbPath: string;
let keyDir: string;
beforeEach(() => {
  t = tempDir('bw-legacy-');
  dbPath = join(t.dir, 'beamwarden.sqlite');
  keyDir = t.dir; // the schema-2 layout: key files beside the database
  copyFileSync(fixture, dbPath);
  cpSync(fixtureKeys, keyDir, { recursive: true });
});
afterEach(() => t.cleanup());

/**
 * The fixture's results were computed by the core of its time (0.1.0, before the corrections of
 * the hazard under-estimates). Verify must then say that a different calculation made them, never
 * that the stored results were changed; every signature check still passes.
 */
function expectOnlyRecomputeDiffers(report: Awaited<ReturnType<RecordStore['verify']>>): void {
  const failing = report.checks.filter((c) => !c.ok);
  expect(failing.map((c) => c.check)).toEqual(['results']);
  expect(failing[0]?.finding).not.toMatch(/were changed/);
  expect(failing[0]?.finding).toMatch(/0\.1\.0/);
}

describe('migrating signed records of schema version 2', () => {
  it('re-checks every signature against the installation key, which becomes the trust anchor', async () => {
    const store = await openRecordStore({ path: dbPath, keyDir });
    try {
      expect(store.info.schemaVersion).toBe(SCHEMA_VERSION);
      const trust = await store.trustList();
      expect(trust.anchorFingerprint).toMatch(/^[0-9a-f]{4}( [0-9a-f]{4}){4}$/);
      expect(store.info.warnings.join(' ')).toContain(
        `2 signature(s) made before personal keys re-checked against the installation key; it is now the trust anchor, fingerprint ${trust.anchorFingerprint}.`,
      );
      const newest = await store.verify(SIGNED);
      expect(newest).toMatchObject({ revisionNo: 2, keyTrusted: true, signatureValid: true, chainIntact: true, fingerprintMatches: true });
      expect(newest.trustChain.join(' ')).toMatch(/Installation key .* is the trust anchor/);
      expectOnlyRecomputeDiffers(newest);
      const first = await store.verify(SIGNED, REV1);
      expect(first).toMatchObject({ status: 'superseded', signatureValid: true, keyTrusted: true });
      expectOnlyRecomputeDiffers(first);
    } finally {
      await store.close();
    }
  });

  it('the installation key endorses the first personal key, then is retired and its file removed', async () => {
    const store = await openRecordStore({ path: dbPath, keyDir });
    try {
      const key = await store.createPersonKey({ personId: OFFICER, passphrase: PASSPHRASE, passphraseAgain: PASSPHRASE });
      expect(key).toMatchObject({ trusted: true, isAnchor: false });
      expect(key.trustChain.join(' ')).toMatch(/endorsed by key .* of Installation key/);
      expect(existsSync(join(keyDir, PRIVATE_KEY_FILE))).toBe(false);
      // The old signatures still verify; new ones are made with the personal key and chain on.
      const a = await store.getAssessment(SIGNED);
      await store.saveAssessment(SIGNED, { ...a.current.content, notes: 'first revision with a personal key' });
      await store.signAssessment(SIGNED, { personId: OFFICER, passphrase: PASSPHRASE, statement: 'Approved again.' });
      expect(await store.verify(SIGNED)).toMatchObject({ ok: true, revisionNo: 3, chainIntact: true });
      expectOnlyRecomputeDiffers(await store.verify(SIGNED, REV1));
      // A second person's key now needs a trusted endorser: the retired installation key cannot.
      const other = await store.createPerson({ name: 'Prof. Lena Vossberg', role: 'Head of laboratory' });
      expect((await store.createPersonKey({ personId: other.id, passphrase: 'another passphrase', passphraseAgain: 'another passphrase' })).trusted).toBe(false);
    } finally {
      await store.close();
    }
  });

  it('a replaced installation key file is not admitted, and the old signatures stay unverified', async () => {
    const { privateKey } = generateKeyPairSync('ed25519');
    writeFileSync(join(keyDir, PRIVATE_KEY_FILE), privateKey.export({ type: 'pkcs8', format: 'pem' }).toString());
    const store = await openRecordStore({ path: dbPath, keyDir });
    try {
      expect(store.info.warnings.join(' ')).toMatch(/The installation key file in .* \(key [0-9a-f ]+\) did not sign any of the existing records: it was replaced\. It is not admitted to the trust list\./);
      expect((await store.trustList()).anchor).toBeNull();
      const report = await store.verify(SIGNED);
      expect(report).toMatchObject({ ok: false, keyTrusted: false });
      expect(report.findings.join(' ')).toMatch(/This desk has no trust anchor configured, so no key is trusted/);
    } finally {
      await store.close();
    }
  });

  it('opening again does not re-adopt or write a second anchor', async () => {
    await (await openRecordStore({ path: dbPath, keyDir })).close();
    const setting = readFileSync(join(keyDir, 'beamwarden-trust-anchor.json'), 'utf8');
    const rows = () => {
      const raw = new Database(dbPath, { readonly: true });
      try {
        return raw.prepare('SELECT (SELECT count(*) FROM trust_endorsement) AS e, (SELECT count(*) FROM trust_anchor_pin) AS p').get();
      } finally {
        raw.close();
      }
    };
    const before = rows();
    expect(before).toEqual({ e: 1, p: 1 });
    const again = await openRecordStore({ path: dbPath, keyDir });
    await again.close();
    expect(readFileSync(join(keyDir, 'beamwarden-trust-anchor.json'), 'utf8')).toBe(setting);
    expect(rows()).toEqual(before);
  });
});
