/**
 * Round trip: register -> assessment -> revision -> sign-off -> verify -> export -> import into an
 * empty database -> verify again. Invented demo data (assets/demo/demo-scenario.json).
 * Sign-off model: SHA-256 (FIPS 180-4) fingerprint of the canonical serialisation, Ed25519
 * (RFC 8032) signature; record contents per the domain reference section 6.2 (common practice).
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, PASSPHRASE, registerRoom, tempDir } from './helpers.js';
import { forEachEngine } from './engines.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let store: RecordStore;
  beforeEach(async () => {
    t = tempDir();
    store = await openTemp(t.dir, undefined, engine);
  });
  afterEach(async () => {
    await store.close();
    t.cleanup();
  });

  describe('record round trip', () => {
    it('register, assess, revise, sign, verify, export, import elsewhere, verify again', async () => {
      const { site, room } = await registerRoom(store, 'A0.07');
      const signer = await makeSigner(store);
      const officer = signer.person;

      // Assessment with the register snapshot; results come from the core.
      const content = await store.newAssessmentContent(room.id);
      expect(content.input.lasers).toHaveLength(2);
      expect(content.nonBeamHazards.map((h) => h.kind)).toContain('electrical');
      const a = await store.createAssessment({ roomId: room.id, content: { ...content, notes: 'first draft' } });
      expect(a.current.revisionNo).toBe(1);
      expect(a.current.status).toBe('draft');
      expect(a.current.results.beams.length).toBe(2);

      // Unsigned drafts are not "ok" when verified: nothing is signed yet.
      const draftReport = await store.verify(a.id);
      expect(draftReport).toMatchObject({ ok: false, signed: false, resultsMatchCore: true });

      // Sign revision 1.
      const signed1 = await store.signAssessment(a.id, signer.signOff());
      expect(signed1.current.status).toBe('signed');
      expect(signed1.current.signature?.fingerprint).toMatch(/^[0-9a-f]{64}$/);
      expect(signed1.current.signature).toMatchObject({ personId: officer.id, name: officer.name, keyId: signer.key.keyId, keyTrusted: true });
      // The trust anchor is this desk's setting, outside the database; no installation key file any more.
      expect(existsSync(join(t.dir, 'keys', 'beamwarden-trust-anchor.json'))).toBe(true);
      expect(existsSync(join(t.dir, 'keys', 'beamwarden-signing-key.pem'))).toBe(false);

      // Editing a signed assessment makes revision 2 as a draft; revision 1 stays signed.
      const edited = {
        ...signed1.current.content,
        notes: 'second revision: loupe use banned',
        assumptions: { ...signed1.current.content.assumptions, opticalAidsPossible: true },
      };
      const a2 = await store.saveAssessment(a.id, edited);
      expect(a2.current).toMatchObject({ revisionNo: 2, status: 'draft', basedOn: signed1.current.id });
      expect((await store.listRevisions(a.id)).map((r) => [r.revisionNo, r.status])).toEqual([
        [1, 'signed'],
        [2, 'draft'],
      ]);
      // Saving again writes into the same draft.
      const a2b = await store.saveAssessment(a.id, { ...edited, reviewBy: '2027-01-31' });
      expect(a2b.current.id).toBe(a2.current.id);
      expect((await store.listAssessments(room.id))[0]).toMatchObject({ revisionNo: 2, status: 'draft', reviewBy: '2027-01-31' });

      // Field-by-field comparison.
      const diff = await store.compareRevisions(signed1.current.id, a2b.current.id);
      expect(diff).toEqual(
        expect.arrayContaining([
          { path: 'content.notes', old: 'first draft', new: 'second revision: loupe use banned' },
          { path: 'content.assumptions.opticalAidsPossible', old: false, new: true },
          { path: 'content.reviewBy', old: content.reviewBy, new: '2027-01-31' },
        ]),
      );
      expect(diff).toHaveLength(3);

      // Sign revision 2: revision 1 becomes superseded; both still verify.
      await store.signAssessment(a.id, signer.signOff());
      expect((await store.listRevisions(a.id)).map((r) => r.status)).toEqual(['superseded', 'signed']);
      const report = await store.verify(a.id);
      expect(report).toMatchObject({ ok: true, revisionNo: 2, fingerprintMatches: true, signatureValid: true, keyTrusted: true, chainIntact: true, resultsMatchCore: true });
      expect(report.differences).toEqual([]);
      expect(await store.verify(a.id, signed1.current.id)).toMatchObject({ ok: true, status: 'superseded' });

      // Export the site and import it into an empty database with its own key.
      const doc = await store.exportSite(site.id);
      expect(doc).toMatchObject({ format: 'beamwarden-export', version: 2, scope: { kind: 'site', id: site.id } });
      const other = await openTemp(t.dir, 'other.sqlite', engine);
      try {
        // Another installation does not trust this one's key: imported, but shown as unverified.
        const summary = await other.importDocument(JSON.stringify(doc));
        expect(summary).toMatchObject({ sites: 1, rooms: 1, installations: 2, eyewear: 5, people: 1, assessments: 1, revisions: 2, unchanged: 0, unverified: 2 });
        expect(summary.untrustedKeys).toEqual([{ keyId: signer.key.keyId, fingerprint: signer.key.fingerprint, claimedSigner: officer.name }]);
        expect((await other.getAssessment(a.id)).current.signature?.keyTrusted).toBe(false);
        expect(await other.verify(a.id)).toMatchObject({ ok: false, fingerprintMatches: true, signatureValid: true, keyTrusted: false, resultsMatchCore: true });
        // Its officer admits the exporting key explicitly, with their own passphrase, after seeing the fingerprint.
        const there = await makeSigner(other, 'Ona Brightwater');
        expect((await other.untrustedKeysIn(doc)).map((k) => k.fingerprint)).toEqual([signer.key.fingerprint]);
        await other.importDocument(doc, { keyIds: [signer.key.keyId], endorserPersonId: there.person.id, endorserPassphrase: PASSPHRASE });
        const again = await other.verify(a.id);
        expect(again).toMatchObject({ ok: true, fingerprintMatches: true, signatureValid: true, keyTrusted: true, resultsMatchCore: true });
        expect(again.trustChain.join(' ')).toMatch(/endorsed by key .* of Ona Brightwater/);
        expect((await other.verify(a.id, signed1.current.id)).ok).toBe(true);
        // The imported record is the same record.
        // (The save counter is this database's own concurrency token, not part of the record.)
        expect({ ...await other.getAssessment(a.id), version: 0 }).toEqual({ ...await store.getAssessment(a.id), version: 0 });
        // Importing the same document again changes nothing.
        const second = await other.importDocument(doc);
        expect(second).toMatchObject({ sites: 0, rooms: 0, revisions: 0, assessments: 0 });
        // Export of one assessment and of one room are accepted by the importing side too.
        expect((await other.importDocument(await store.exportAssessment(a.id))).revisions).toBe(0);
        expect((await other.importDocument(await store.exportRoom(room.id))).rooms).toBe(0);
      } finally {
        await other.close();
      }
    });

    it('a draft can be discarded; a signed revision cannot', async () => {
      const { room } = await registerRoom(store);
      const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
      await store.signAssessment(a.id, (await makeSigner(store, 'A. Officer')).signOff());
      await expect(store.discardDraft(a.id)).rejects.toThrow(/no open draft/);
      await store.saveAssessment(a.id, { ...(await store.getAssessment(a.id)).current.content, notes: 'x' });
      await store.discardDraft(a.id);
      expect((await store.listRevisions(a.id)).map((r) => r.status)).toEqual(['signed']);
      expect((await store.verify(a.id)).ok).toBe(true);
    });

    it('lists assessments due for review', async () => {
      const { room } = await registerRoom(store);
      const c = await store.newAssessmentContent(room.id);
      const early = await store.createAssessment({ roomId: room.id, content: { ...c, reviewBy: '2026-01-15' } });
      await store.createAssessment({ roomId: room.id, content: { ...c, reviewBy: '2028-01-15' } });
      expect((await store.listDueForReview('2026-12-31')).map((s) => s.id)).toEqual([early.id]);
    });

    it('chosen exposure durations are written into the evaluated input', async () => {
      const { room } = await registerRoom(store);
      const c = await store.newAssessmentContent(room.id);
      const beamId = c.input.lasers[0]?.beams[0]?.id ?? '';
      const a = await store.createAssessment({
        roomId: room.id,
        content: { ...c, assumptions: { ...c.assumptions, exposureDurations: [{ beamId, duration_s: 100, why: 'task-specific viewing' }] } },
      });
      expect(a.current.content.input.lasers[0]?.beams[0]?.exposureDuration_s).toBe(100);
      expect(a.current.results.beams[0]?.mpe.exposureDuration_s).toBe(100);
    });
  });
});
