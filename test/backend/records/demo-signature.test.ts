/**
 * The invented demo site's signed assessment (room B2.14) verifies as trusted: on a fresh database
 * the demo seed gives the demo officer a real personal key (sealed with the passphrase published in
 * the README's demo section), which becomes that demo installation's trust anchor, and signs through
 * the app's own sign-off path. On a database that already has a trust list the demo never admits a
 * key with a published passphrase: its record stays an unverified signature and the trust list is
 * unchanged. Real SQLite files and real keys in temporary folders (no mocks).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { DEMO_PASSPHRASE } from '../../../electron/backend/records/demo.js';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { openTemp, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir> | null = null;
let store: RecordStore | null = null;
afterEach(() => {
  store?.close();
  t?.cleanup();
  store = null;
  t = null;
});

function signedDemo(s: RecordStore) {
  const site = s.listSites().find((x) => x.name === 'Harwick Vale Photonics Centre');
  if (!site) throw new Error('demo site missing');
  const room = s.listRooms(site.id).find((r) => r.code === 'B2.14');
  if (!room) throw new Error('demo room B2.14 missing');
  const a = s.listAssessments(room.id)[0];
  if (!a) throw new Error('demo assessment missing');
  return a;
}

describe('the demo seed signs with a real personal key', () => {
  it('fresh database: B2.14 is signed by the demo officer, verifies intact and trusted', () => {
    t = tempDir();
    store = openTemp(t.dir);
    store.seedDemo();
    const report = store.verify(signedDemo(store).id);
    expect(report.signed).toBe(true);
    expect(report.keyTrusted).toBe(true);
    expect(report.signatureValid).toBe(true);
    expect(report.ok).toBe(true);
    expect(report.signer?.name).toBe('Dr. Imre Calloway-Senn');
    // the demo officer's key is the anchor of this demo installation's trust list
    const keys = store.listPersonKeys();
    expect(keys).toHaveLength(1);
    expect(keys[0]?.isAnchor).toBe(true);
    expect(store.trustList().anchorFingerprint).toBe(keys[0]?.fingerprint);
  });

  it('the published demo passphrase signs another demo room; a wrong one is refused', () => {
    t = tempDir();
    store = openTemp(t.dir);
    const site = store.seedDemo();
    const officer = store.listPeople().find((p) => p.role === 'Laser safety officer');
    const other = store.listRooms(site.id).find((r) => r.code === 'C1.03');
    const a = other ? store.listAssessments(other.id)[0] : undefined;
    if (!officer || !a) throw new Error('demo data missing');
    expect(() => store?.signAssessment(a.id, { personId: officer.id, passphrase: 'not the demo passphrase', statement: 'Demo.' })).toThrow(/passphrase is not correct/);
    store.signAssessment(a.id, { personId: officer.id, passphrase: DEMO_PASSPHRASE, statement: 'Demo.' });
    expect(store.verify(a.id).ok).toBe(true);
  });

  it('the README documents the demo passphrase', () => {
    const readme = readFileSync(join(import.meta.dirname, '../../../README.md'), 'utf8');
    expect(readme).toContain(DEMO_PASSPHRASE);
  });

  it('a database with a trust list: the demo admits no key, its record shows as an unverified signature', () => {
    t = tempDir();
    store = openTemp(t.dir);
    const lso = store.createPerson({ name: 'Ada Quillfeather', role: 'Laser safety officer' });
    store.createPersonKey({ personId: lso.id, passphrase: 'a private passphrase', passphraseAgain: 'a private passphrase' });
    const before = readFileSync(store.trustList().path, 'utf8');
    store.seedDemo();
    const report = store.verify(signedDemo(store).id);
    expect(report.signed).toBe(true);
    expect(report.keyTrusted).toBe(false);
    expect(report.ok).toBe(false);
    expect(readFileSync(store.trustList().path, 'utf8')).toBe(before);
    expect(store.listPersonKeys().map((k) => k.personId)).toEqual([lso.id]);
  });
});
