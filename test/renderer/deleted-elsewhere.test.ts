/**
 * The room or the whole site deleted by another officer (or in another window of the same host)
 * while this desk has the room open: on both engines, through the renderer's session over the real
 * handler table and a real store (no mock). A save is refused in officer words (never "No room
 * with id …"), the banner (DeletedElsewhereBanner) says what went and that what is on screen is
 * stored nowhere now, the edits stay on screen, and "Keep my version" stores them as an assessment
 * of its own, registering the room (and the site, with its lasers and eyewear) again where they
 * went. On the server the banner also comes without a save, from the changes the server announces.
 * Invented demo room A0.07 (the project's demo scenario). Source for every case: derived: no
 * officer's work is lost silently (issue 11, "No silent loss").
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../electron/backend/records/index.js';
import { invoke } from '../../renderer/lib/api.js';
import { session } from '../../renderer/lib/session.svelte.js';
import { forEachEngine, type TestEngine } from '../backend/records/engines.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

forEachEngine((engine: TestEngine) => {
  let t: ReturnType<typeof tempDir>;
  let mine: RecordStore;
  /** The other officer: a second connection to the same register on the server; on a file, the same host (another window). */
  let other: RecordStore;
  beforeEach(async () => {
    t = tempDir('bw-deleted-elsewhere-');
    mine = await openTemp(t.dir, 'records.sqlite', engine);
    other = engine.name === 'postgresql' ? await openTemp(t.dir, 'records.sqlite', engine) : mine;
    installStoreBridge(mine);
    session.info = await invoke('app-info', {}); // which register this desk is on (file or server)
  });
  afterEach(async () => {
    await until(() => !session.busy);
    session.draft = null;
    session.assessment = null;
    session.room = null;
    session.site = null;
    session.deletedElsewhere = null;
    delete window.beamwarden;
    if (other !== mine) await other.close();
    await mine.close();
    t.cleanup();
  });

  /** The register as the screens read it (the handler table's overview). */
  async function overview(): Promise<NonNullable<typeof session.overview>> {
    await session.refreshOverview();
    if (!session.overview) throw new Error('the register is read');
    return session.overview;
  }

  // A save refused before this desk heard of the deletion names the account only once it is listening (the live case below).
  const who = engine.name === 'postgresql' ? /by (another officer|[a-z0-9_]+)/ : /in another window/;

  /** Room A0.07 registered, its draft saved and open here with an unsaved edit of the notes. */
  async function openWithEdit(saved: boolean): Promise<{ siteId: string; roomId: string }> {
    const { site, room } = await registerRoom(mine, 'A0.07');
    if (saved) await mine.createAssessment({ roomId: room.id, content: { ...(await mine.newAssessmentContent(room.id)), title: 'Telecom bench, annual check' } });
    await session.refreshOverview();
    await session.openRoom(room.id);
    const d = session.draft;
    if (!d) throw new Error('the room is open');
    d.title = 'Telecom bench, annual check';
    d.notes = 'Officer A: splice enclosure lid checked';
    return { siteId: site.id, roomId: room.id };
  }

  describe('the room deleted elsewhere', () => {
    it('with its saved draft open: the save is refused in officer words, the edit stays, and keeping it registers the room again with its lasers', async () => {
      const { siteId, roomId } = await openWithEdit(true);
      const opened = session.assessment;
      if (!opened) throw new Error('the draft is open');
      await other.deleteRoom(roomId);
      // The refusal itself, as any client of the handler table gets it: no internal id, who on a server.
      const again = { roomId, assessmentId: opened.id, expected: { revisionId: opened.current.id, version: opened.version }, content: opened.current.content, newLasers: [], changedLasers: [] };
      await expect(invoke('work-save', again)).rejects.toThrow(
        engine.name === 'postgresql'
          ? /^Not saved\. The room of “Telecom bench, annual check” is no longer in the register: it was deleted by [a-z0-9_]+ after it was opened here\. Nothing was written; keep your version as an assessment of its own\.$/
          : /^Not saved\. The room of “Telecom bench, annual check” is no longer in the register: it was deleted after it was opened here\. Nothing was written; keep your version as an assessment of its own\.$/,
      );
      expect(await session.save()).toBe(false);
      expect(session.notice?.text ?? '').not.toMatch(/id |No room with/);
      expect(session.deletedElsewhere).toMatch(engine.name === 'postgresql' ? /^Room A0\.07 was deleted from the institution register / : /^Room A0\.07 was deleted from the register /);
      expect(session.deletedElsewhere).toMatch(who);
      expect(session.deletedElsewhere).toContain('with “Telecom bench, annual check”.');
      expect(session.deletedElsewhere).toMatch(/Your unsaved edits stay on screen, but what is on screen is stored nowhere now\.$/);
      expect(session.draft?.notes).toBe('Officer A: splice enclosure lid checked');

      await session.keepDeletedAsCopy();
      expect(session.deletedElsewhere).toBeNull();
      const rooms = (await overview()).sites.flatMap((s) => s.rooms.map((r) => ({ site: s.site.id, code: r.room.code, id: r.room.id })));
      expect(rooms.map((r) => [r.site, r.code])).toEqual([[siteId, 'A0.07']]);
      const newRoom = rooms[0]?.id ?? '';
      expect(newRoom).not.toBe(roomId);
      expect((await mine.listInstallations(newRoom)).map((i) => i.laser.name)).toEqual(['Erbium fibre amplifier', 'DFB source']);
      const kept = await mine.listAssessments(newRoom);
      expect(kept.map((a) => a.title)).toEqual(['Telecom bench, annual check — your version, kept after it was deleted elsewhere']);
      expect((await mine.getAssessment(kept[0]?.id ?? '')).current.content.notes).toBe('Officer A: splice enclosure lid checked');
    });

    it('with a new draft never saved: the same refusal and banner, and the room comes back with the draft', async () => {
      const { roomId } = await openWithEdit(false);
      expect(session.assessment).toBeNull();
      await other.deleteRoom(roomId);
      expect(await session.save()).toBe(false);
      expect(session.notice?.text ?? '').not.toMatch(/No room with/);
      expect(session.deletedElsewhere).toMatch(/^Room A0\.07 was deleted from the (institution )?register .*, with its assessments\. /);
      await session.keepDeletedAsCopy();
      expect(session.deletedElsewhere).toBeNull();
      expect((await overview()).sites.flatMap((s) => s.rooms.map((r) => r.assessments.map((a) => a.title)))).toEqual([['Telecom bench, annual check — your version, kept after it was deleted elsewhere']]);
    });
  });

  describe('the draft discarded elsewhere', () => {
    it('the room stays: the banner says the draft was discarded, and the work is kept beside in the same room', async () => {
      const { roomId } = await openWithEdit(true);
      await other.discardDraft(session.assessment?.id ?? '');
      expect(await session.save()).toBe(false);
      expect(session.deletedElsewhere).toMatch(/^“Telecom bench, annual check” of room A0\.07 was deleted from the (institution )?register .+ \(its draft was discarded\)\. Your unsaved edits stay on screen/);
      await session.keepDeletedAsCopy();
      expect(session.deletedElsewhere).toBeNull();
      expect((await mine.listAssessments(roomId)).map((a) => a.title)).toEqual(['Telecom bench, annual check — your version, kept after it was deleted elsewhere']);
    });
  });

  describe('the site deleted elsewhere', () => {
    it('with a room of it open: the banner names the site, and keeping the work registers the site, its room, lasers and eyewear again', async () => {
      const { siteId } = await openWithEdit(true);
      const shelf = (await mine.listEyewear(siteId)).map((e) => e.spec.id).sort();
      await other.deleteSite(siteId);
      expect(await session.save()).toBe(false);
      expect(session.deletedElsewhere).toMatch(/^Site Harwick Vale Photonics Centre was deleted from the (institution )?register .*, with room A0\.07 and “Telecom bench, annual check”\. /);
      await session.keepDeletedAsCopy();
      expect(session.notice?.kind).toBe('ok');
      expect(session.deletedElsewhere).toBeNull();
      const sites = (await overview()).sites;
      expect(sites.map((s) => [s.site.name, s.site.building, s.rooms.map((r) => r.room.code)])).toEqual([['Harwick Vale Photonics Centre', expect.any(String), ['A0.07']]]);
      const site = sites[0]?.site.id ?? '';
      expect(site).not.toBe(siteId);
      expect((await mine.listEyewear(site)).map((e) => e.spec.id).sort()).toEqual(shelf);
      expect(session.notice?.text).toMatch(/registered again/);
    });
  });

  if (engine.name === 'postgresql') {
    describe('said at once on the server', () => {
      it('the other officer deletes the room: the banner appears without a save', async () => {
        await session.init(); // listening first; the room it remembers from the cases above is gone
        const { roomId } = await openWithEdit(true);
        await new Promise((r) => setTimeout(r, 500)); // the desk has started listening
        await other.deleteRoom(roomId);
        await until(() => session.deletedElsewhere !== null, 15_000);
        expect(session.deletedElsewhere).toMatch(/^Room A0\.07 was deleted from the institution register by [a-z0-9_]+, with “Telecom bench, annual check”\. /);
      }, 30_000);
    });
  }
});
