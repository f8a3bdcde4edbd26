/**
 * Round trip: register -> assessment -> revision -> sign-off -> verify -> export -> import into an
 * empty database -> verify again. Invented demo data (assets/demo/demo-scenario.json).
 * Sign-off model: SHA-256 (FIPS 180-4) fingerprint of the canonical serialisation, Ed25519
 * (RFC 8032) signature; record contents per the domain reference section 6.2 (common practice).
 */
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
beforeEach(() => {
  t = tempDir();
  store = openTemp(t.dir);
});
afterEach(() => {
  store.close();
  t.cleanup();
});

describe('record round trip', () => {
  it('register, assess, revise, sign, verify, export, import elsewhere, verify again', () => {
    const { site, room } = registerRoom(store, 'A0.07');
    const officer = store.createPerson({ name: 'Dr. Imre Calloway-Senn', role: 'Laser safety officer' });

    // Assessment with the register snapshot; results come from the core.
    const content = store.newAssessmentContent(room.id);
    expect(content.input.lasers).toHaveLength(2);
    expect(content.nonBeamHazards.map((h) => h.kind)).toContain('electrical');
    const a = store.createAssessment({ roomId: room.id, content: { ...content, notes: 'first draft' } });
    expect(a.current.revisionNo).toBe(1);
    expect(a.current.status).toBe('draft');
    expect(a.current.results.beams.length).toBe(2);

    // Unsigned drafts are not "ok" when verified: nothing is signed yet.
    const draftReport = store.verify(a.id);
    expect(draftReport).toMatchObject({ ok: false, signed: false, resultsMatchCore: true });

    // Sign revision 1.
    const signed1 = store.signAssessment(a.id, { personId: officer.id, name: officer.name, role: officer.role, statement: STATEMENT });
    expect(signed1.current.status).toBe('signed');
    expect(signed1.current.signature?.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(existsSync(join(t.dir, 'keys', 'beamwarden-signing-key.pem'))).toBe(true);
    if (process.platform !== 'win32') expect(statSync(join(t.dir, 'keys', 'beamwarden-signing-key.pem')).mode & 0o777).toBe(0o600);

    // Editing a signed assessment makes revision 2 as a draft; revision 1 stays signed.
    const edited = {
      ...signed1.current.content,
      notes: 'second revision: loupe use banned',
      assumptions: { ...signed1.current.content.assumptions, opticalAidsPossible: true },
    };
    const a2 = store.saveAssessment(a.id, edited);
    expect(a2.current).toMatchObject({ revisionNo: 2, status: 'draft', basedOn: signed1.current.id });
    expect(store.listRevisions(a.id).map((r) => [r.revisionNo, r.status])).toEqual([
      [1, 'signed'],
      [2, 'draft'],
    ]);
    // Saving again writes into the same draft.
    const a2b = store.saveAssessment(a.id, { ...edited, reviewBy: '2027-01-31' });
    expect(a2b.current.id).toBe(a2.current.id);
    expect(store.listAssessments(room.id)[0]).toMatchObject({ revisionNo: 2, status: 'draft', reviewBy: '2027-01-31' });

    // Field-by-field comparison.
    const diff = store.compareRevisions(signed1.current.id, a2b.current.id);
    expect(diff).toEqual(
      expect.arrayContaining([
        { path: 'content.notes', old: 'first draft', new: 'second revision: loupe use banned' },
        { path: 'content.assumptions.opticalAidsPossible', old: false, new: true },
        { path: 'content.reviewBy', old: content.reviewBy, new: '2027-01-31' },
      ]),
    );
    expect(diff).toHaveLength(3);

    // Sign revision 2: revision 1 becomes superseded; both still verify.
    store.signAssessment(a.id, { personId: officer.id, name: officer.name, role: officer.role, statement: STATEMENT });
    expect(store.listRevisions(a.id).map((r) => r.status)).toEqual(['superseded', 'signed']);
    const report = store.verify(a.id);
    expect(report).toMatchObject({ ok: true, revisionNo: 2, fingerprintMatches: true, signatureValid: true, keyKnown: true, resultsMatchCore: true });
    expect(report.differences).toEqual([]);
    expect(store.verify(a.id, signed1.current.id)).toMatchObject({ ok: true, status: 'superseded' });

    // Export the site and import it into an empty database with its own key.
    const doc = store.exportSite(site.id);
    expect(doc).toMatchObject({ format: 'beamwarden-export', version: 1, scope: { kind: 'site', id: site.id } });
    const other = openTemp(t.dir, 'other.sqlite');
    try {
      const summary = other.importDocument(JSON.stringify(doc));
      expect(summary).toMatchObject({ sites: 1, rooms: 1, installations: 2, eyewear: 5, people: 1, assessments: 1, revisions: 2, unchanged: 0 });
      const again = other.verify(a.id);
      expect(again).toMatchObject({ ok: true, fingerprintMatches: true, signatureValid: true, resultsMatchCore: true });
      expect(other.verify(a.id, signed1.current.id).ok).toBe(true);
      // The imported record is the same record.
      // (The save counter is this database's own concurrency token, not part of the record.)
      expect({ ...other.getAssessment(a.id), version: 0 }).toEqual({ ...store.getAssessment(a.id), version: 0 });
      // Importing the same document again changes nothing.
      const second = other.importDocument(doc);
      expect(second).toMatchObject({ sites: 0, rooms: 0, revisions: 0, assessments: 0 });
      // Export of one assessment and of one room are accepted by the importing side too.
      expect(other.importDocument(store.exportAssessment(a.id)).revisions).toBe(0);
      expect(other.importDocument(store.exportRoom(room.id)).rooms).toBe(0);
    } finally {
      other.close();
    }
  });

  it('a draft can be discarded; a signed revision cannot', () => {
    const { room } = registerRoom(store);
    const a = store.createAssessment({ roomId: room.id, content: store.newAssessmentContent(room.id) });
    store.signAssessment(a.id, { name: 'A. Officer', role: 'LSO', statement: STATEMENT });
    expect(() => store.discardDraft(a.id)).toThrow(/no open draft/);
    store.saveAssessment(a.id, { ...store.getAssessment(a.id).current.content, notes: 'x' });
    store.discardDraft(a.id);
    expect(store.listRevisions(a.id).map((r) => r.status)).toEqual(['signed']);
    expect(store.verify(a.id).ok).toBe(true);
  });

  it('lists assessments due for review', () => {
    const { room } = registerRoom(store);
    const c = store.newAssessmentContent(room.id);
    const early = store.createAssessment({ roomId: room.id, content: { ...c, reviewBy: '2026-01-15' } });
    store.createAssessment({ roomId: room.id, content: { ...c, reviewBy: '2028-01-15' } });
    expect(store.listDueForReview('2026-12-31').map((s) => s.id)).toEqual([early.id]);
  });

  it('chosen exposure durations are written into the evaluated input', () => {
    const { room } = registerRoom(store);
    const c = store.newAssessmentContent(room.id);
    const beamId = c.input.lasers[0]?.beams[0]?.id ?? '';
    const a = store.createAssessment({
      roomId: room.id,
      content: { ...c, assumptions: { ...c.assumptions, exposureDurations: [{ beamId, duration_s: 100, why: 'task-specific viewing' }] } },
    });
    expect(a.current.content.input.lasers[0]?.beams[0]?.exposureDuration_s).toBe(100);
    expect(a.current.results.beams[0]?.mpe.exposureDuration_s).toBe(100);
  });
});
