/**
 * Import never discards an officer's work (issue 11, item 4), each case a defect seen before:
 * - a signed copy of a revision replaced a draft edited here after it was copied;
 * - a newer imported draft replaced ours (and an older one was dropped) without a trace;
 * - a newer copy of a laser that an assessment refers to failed with "FOREIGN KEY constraint failed";
 * - timestamps with an offset (-05:00) were compared as text, so a newer room counted as "unchanged";
 * - importing the same CSV twice doubled every laser.
 * Real SQLite files; cases "derived: no silent loss" unless a standard is named. Timestamps per
 * ISO 8601 / RFC 3339 section 5.6 (a time with an offset names one instant).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { RecordError, type RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, snapshotOn, STATEMENT, tempDir } from './helpers.js';
import { forEachEngine } from './engines.js';
import { startTestHost } from './http-host.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let here: RecordStore;
  let there: RecordStore;
  beforeEach(async () => {
    t = tempDir('bw-import-work-');
    here = await openTemp(t.dir, 'here.sqlite', engine);
    there = await openTemp(t.dir, 'there.sqlite', engine);
  });
  afterEach(async () => {
    await here.close();
    await there.close();
    t.cleanup();
  });

  const signers = new WeakMap<RecordStore, Awaited<ReturnType<typeof makeSigner>>>();
  const sign = async (s: RecordStore, id: string) => {
    let signer = signers.get(s);
    if (!signer) signers.set(s, (signer = await makeSigner(s)));
    return s.signAssessment(id, signer.signOff(STATEMENT));
  };
  const base = async (s: RecordStore, id: string) => {
    const a = await s.getAssessment(id);
    return { revisionId: a.current.id, version: a.version };
  };
  const edit = async (s: RecordStore, id: string, notes: string) => s.saveAssessment(id, { ...(await s.getAssessment(id)).current.content, notes }, await base(s, id));

  describe('drafts that differ are both kept', () => {
    it('a signed copy of our draft arrives after we edited the draft: our edits are kept beside it', async () => {
      const { site, room } = await registerRoom(there);
      const made = await there.createAssessment({ roomId: room.id, content: await there.newAssessmentContent(room.id) });
      await here.importDocument(await there.exportSite(site.id));
      await edit(here, made.id, 'Edited here after the copy: interlock on the east door tested.');
      await sign(there, made.id);
      const summary = await here.importDocument(await there.exportAssessment(made.id));
      expect((await here.getAssessment(made.id)).current.status).toBe('signed');
      expect(summary.keptDrafts).toHaveLength(1);
      const kept = summary.keptDrafts[0];
      expect(kept).toMatchObject({ assessmentId: made.id, whose: 'yours' });
      const copy = await here.getAssessment(kept?.keptAs ?? '');
      expect(copy.current.content.notes).toBe('Edited here after the copy: interlock on the east door tested.');
      expect(copy.current.content.title).toMatch(/your draft, kept at import \d\d:\d\d/);
      expect((await here.listAssessments(room.id)).map((a) => a.id)).toEqual(expect.arrayContaining([made.id, copy.id]));
    });

    it('both sides edited the same draft: the newer stays in place, the other is kept beside it; a second import adds nothing', async () => {
      const { site, room } = await registerRoom(there);
      const made = await there.createAssessment({ roomId: room.id, content: await there.newAssessmentContent(room.id) });
      await here.importDocument(await there.exportSite(site.id));
      await edit(here, made.id, 'here');
      await edit(there, made.id, 'there (saved later)');
      const doc = await there.exportSite(site.id);
      const first = await here.importDocument(doc);
      expect((await here.getAssessment(made.id)).current.content.notes).toBe('there (saved later)');
      expect(await Promise.all(first.keptDrafts.map(async (k) => [k.whose, (await here.getAssessment(k.keptAs)).current.content.notes]))).toEqual([['yours', 'here']]);
      const before = (await here.listAssessments(room.id)).length;
      const second = await here.importDocument(doc);
      expect(second.keptDrafts).toEqual([]);
      expect(await here.listAssessments(room.id)).toHaveLength(before);
    });

    it('our draft is newer: it stays, and the older imported draft is kept beside it (once)', async () => {
      const { site, room } = await registerRoom(there);
      const made = await there.createAssessment({ roomId: room.id, content: await there.newAssessmentContent(room.id) });
      await here.importDocument(await there.exportSite(site.id));
      await edit(there, made.id, 'there');
      const doc = await there.exportSite(site.id);
      await edit(here, made.id, 'here (saved later)');
      const first = await here.importDocument(doc);
      expect((await here.getAssessment(made.id)).current.content.notes).toBe('here (saved later)');
      expect(await Promise.all(first.keptDrafts.map(async (k) => [k.whose, (await here.getAssessment(k.keptAs)).current.content.notes]))).toEqual([['imported', 'there']]);
      expect((await here.importDocument(doc)).keptDrafts).toEqual([]);
      expect(await here.listAssessments(room.id)).toHaveLength(2);
    });

    it('both sides started the next revision of a signed assessment: ours is kept, theirs (signed) comes in', async () => {
      const { site, room } = await registerRoom(there);
      const made = await there.createAssessment({ roomId: room.id, content: await there.newAssessmentContent(room.id) });
      await sign(there, made.id);
      await here.importDocument(await there.exportSite(site.id));
      await edit(there, made.id, 'revised there');
      await edit(here, made.id, 'revised here');
      await sign(there, made.id);
      const summary = await here.importDocument(await there.exportAssessment(made.id));
      expect((await here.getAssessment(made.id)).current).toMatchObject({ revisionNo: 2, status: 'signed' });
      // Arrives intact; "there" is another installation whose key "here" has not admitted: unverified, not signed.
      expect(await here.verify(made.id)).toMatchObject({ signatureValid: true, fingerprintMatches: true, resultsMatchCore: true, chainIntact: true, keyTrusted: false });
      expect(await Promise.all(summary.keptDrafts.map(async (k) => (await here.getAssessment(k.keptAs)).current.content.notes))).toEqual(['revised here']);
      expect(room.id).toBeTruthy();
    });
  });

  describe('register entries', () => {
    it('a newer copy of a laser that an assessment refers to replaces it (no FOREIGN KEY failure)', async () => {
      const { site, room } = await registerRoom(there);
      const inst = (await there.listInstallations(room.id))[0];
      if (!inst) throw new Error('demo room has lasers');
      await there.createAssessment({ roomId: room.id, installationId: inst.id, content: await there.newAssessmentContent(room.id, inst.id) });
      await here.importDocument(await there.exportSite(site.id));
      await there.updateInstallation(inst.id, { notes: 'Serviced; output checked.' });
      const summary = await here.importDocument(await there.exportSite(site.id));
      expect(summary.installations).toBe(1);
      expect((await here.getInstallation(inst.id)).notes).toBe('Serviced; output checked.');
    });

    it.each([
      // [local updatedAt, imported updatedAt, imported is newer?]
      ['2026-05-01T14:00:00.000Z', '2026-05-01T10:00:00.000-05:00', true], // 15:00Z: one hour later, though "1" < "4" as text
      ['2026-05-01T14:00:00.000Z', '2026-05-01T08:00:00.000-05:00', false], // 13:00Z
      ['2026-05-01T14:00:00.000+02:00', '2026-05-01T13:00:00.000Z', true], // 12:00Z local
    ])('timestamps compared as instants: here %s, file %s -> file newer: %s', async (localAt, fileAt, newer) => {
      const { site, room } = await registerRoom(there);
      const doc = await there.exportSite(site.id);
      const withTime = (at: string, name: string) => ({ ...doc, rooms: doc.rooms.map((r) => (r.id === room.id ? { ...r, name, updatedAt: at } : r)) });
      await here.importDocument(withTime(localAt, 'Name here'));
      const summary = await here.importDocument(withTime(fileAt, 'Name in the file'));
      expect((await here.getRoom(room.id)).name).toBe(newer ? 'Name in the file' : 'Name here');
      expect(summary.rooms).toBe(newer ? 1 : 0);
    });
  });

  describe('deleting what others refer to is refused in officer words, naming the records', () => {
    it('a laser an assessment covers', async () => {
      const { room } = await registerRoom(here);
      const inst = (await here.listInstallations(room.id))[0];
      if (!inst) throw new Error('demo room has lasers');
      const a = await here.createAssessment({ roomId: room.id, installationId: inst.id, content: await here.newAssessmentContent(room.id, inst.id) });
      const host = await startTestHost(here);
      try {
        const { reply } = await host.call('installation-delete', { id: inst.id, expected: { updatedAt: inst.updatedAt } });
        expect(reply.ok).toBe(false);
        if (!reply.ok) {
          expect(reply.error.code).toBe('conflict');
          expect(reply.error.message).toContain(`Laser "${inst.laser.name}"`);
          expect(reply.error.message).toContain(`"${a.current.content.title}"`);
          expect(reply.error.message).toMatch(/retire it instead/i);
          expect(reply.error.message).not.toMatch(/FOREIGN KEY|constraint|SQLITE/);
        }
      } finally {
        await host.close();
      }
    });

    it('a room with lasers, a site with rooms, a person who signed', async () => {
      const { site, room } = await registerRoom(here);
      const signer = await makeSigner(here);
      const person = signer.person;
      const a = await here.createAssessment({ roomId: room.id, content: await here.newAssessmentContent(room.id) });
      await here.signAssessment(a.id, signer.signOff(STATEMENT));
      const msg = async (fn: () => Promise<unknown>) => {
        try {
          await fn();
        } catch (e) {
          if (e instanceof RecordError) return e.message;
          throw e;
        }
        return '';
      };
      expect(await msg(() => here.deleteRoom(room.id))).toMatch(new RegExp(`^Room ${room.code.replace('.', '\\.')} cannot be deleted: it has 1 signed assessment`));
      expect(await msg(() => here.deleteSite(site.id))).toMatch(/^Site ".*" cannot be deleted: .*room A0\.07/);
      expect(await msg(() => here.deletePerson(person.id))).toMatch(/^Dr\. Imre Calloway-Senn cannot be removed from the register: .*signed/);
    });
  });

  describe('CSV re-import offers to skip lasers the room already has', () => {
    const CSV = [
      'laser,maker,serial_number,wavelength,emission,power,beam_diameter,divergence,beam_definition',
      'Alignment diode,Invented Optics,SN-0001,635 nm,cw,1 mW,2 mm,1 mrad,1/e2',
      'Raman pump,Invented Optics,SN-0002,785 nm,cw,300 mW,2 mm,1 mrad,1/e2',
    ].join('\n');

    it('the second import of the same file asks, then skips or adds on request', async () => {
      const site = await here.createSite({ name: 'Invented Annex' });
      const room = await here.createRoom({ siteId: site.id, code: 'C1.01' });
      expect(await here.importLaserCsv(room.id, CSV)).toMatchObject({ imported: 2, errors: [] });
      const before = await snapshotOn(engine, t.dir, 'here.sqlite');
      const asked = await here.importLaserCsv(room.id, CSV);
      expect(asked).toMatchObject({ imported: 0, decisionNeeded: true });
      expect(asked.alreadyInRoom?.map((x) => [x.row, x.name, x.serialNumber])).toEqual([
        [2, 'Alignment diode', 'SN-0001'],
        [3, 'Raman pump', 'SN-0002'],
      ]);
      expect(await snapshotOn(engine, t.dir, 'here.sqlite')).toBe(before);
      const grown = CSV + '\nFibre laser,Invented Optics,SN-0003,1550 nm,cw,50 mW,1 mm,1 mrad,1/e2';
      expect(await here.importLaserCsv(room.id, grown, 'skip')).toMatchObject({ imported: 1, skipped: 2 });
      expect(await here.listInstallations(room.id)).toHaveLength(3);
      expect(await here.importLaserCsv(room.id, CSV, 'add')).toMatchObject({ imported: 2 });
      expect(await here.listInstallations(room.id)).toHaveLength(5);
    });
  });
});
