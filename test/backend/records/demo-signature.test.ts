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
import { forEachEngine } from './engines.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir> | null = null;
  let store: RecordStore | null = null;
  afterEach(async () => {
    await store?.close();
    t?.cleanup();
    store = null;
    t = null;
  });

  async function fresh(): Promise<RecordStore> {
    t = tempDir();
    const s = await openTemp(t.dir, undefined, engine);
    store = s;
    return s;
  }

  async function signedDemo(s: RecordStore) {
    const site = (await s.listSites()).find((x) => x.name === 'Harwick Vale Photonics Centre');
    if (!site) throw new Error('demo site missing');
    const room = (await s.listRooms(site.id)).find((r) => r.code === 'B2.14');
    if (!room) throw new Error('demo room B2.14 missing');
    const a = (await s.listAssessments(room.id))[0];
    if (!a) throw new Error('demo assessment missing');
    return a;
  }

  describe('the demo seed signs with a real personal key', () => {
    it('fresh database: B2.14 is signed by the demo officer, verifies intact and trusted', async () => {
      const s = await fresh();
      await s.seedDemo();
      const report = await s.verify((await signedDemo(s)).id);
      expect(report.signed).toBe(true);
      expect(report.keyTrusted).toBe(true);
      expect(report.signatureValid).toBe(true);
      expect(report.ok).toBe(true);
      expect(report.signer?.name).toBe('Dr. Imre Calloway-Senn');
      // the demo officer's key is the anchor of this demo installation's trust list
      const keys = await s.listPersonKeys();
      expect(keys).toHaveLength(1);
      expect(keys[0]?.isAnchor).toBe(true);
      expect((await s.trustList()).anchorFingerprint).toBe(keys[0]?.fingerprint);
    });

    it('the published demo passphrase signs another demo room; a wrong one is refused', async () => {
      const s = await fresh();
      const site = await s.seedDemo();
      const officer = (await s.listPeople()).find((p) => p.role === 'Laser safety officer');
      const other = (await s.listRooms(site.id)).find((r) => r.code === 'C1.03');
      const a = other ? (await s.listAssessments(other.id))[0] : undefined;
      if (!officer || !a) throw new Error('demo data missing');
      await expect(s.signAssessment(a.id, { personId: officer.id, passphrase: 'not the demo passphrase', statement: 'Demo.' })).rejects.toThrow(/passphrase is not correct/);
      await s.signAssessment(a.id, { personId: officer.id, passphrase: DEMO_PASSPHRASE, statement: 'Demo.' });
      expect((await s.verify(a.id)).ok).toBe(true);
    });

    it('the README documents the demo passphrase', () => {
      const readme = readFileSync(join(import.meta.dirname, '../../../README.md'), 'utf8');
      expect(readme).toContain(DEMO_PASSPHRASE);
    });

    it('a database with a trust list: the demo admits no key, its record shows as an unverified signature', async () => {
      const s = await fresh();
      const lso = await s.createPerson({ name: 'Ada Quillfeather', role: 'Laser safety officer' });
      await s.createPersonKey({ personId: lso.id, passphrase: 'a private passphrase', passphraseAgain: 'a private passphrase' });
      const before = readFileSync((await s.trustList()).path, 'utf8');
      await s.seedDemo();
      const report = await s.verify((await signedDemo(s)).id);
      expect(report.signed).toBe(true);
      expect(report.keyTrusted).toBe(false);
      expect(report.ok).toBe(false);
      expect(readFileSync((await s.trustList()).path, 'utf8')).toBe(before);
      expect((await s.listPersonKeys()).map((k) => k.personId)).toEqual([lso.id]);
    });
  });
});
