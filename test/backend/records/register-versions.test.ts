/**
 * No silent loss on the Register (issue 11, item 4): an edit or deletion of a site, room, laser,
 * eyewear item or person names the version the officer opened; when someone else changed or
 * deleted the entry meanwhile, it is refused (code 'stale') with what they changed, and nothing is
 * overwritten. Signing names the revision shown in the confirm step. Two "windows" are two record
 * stores on one real SQLite file, each called through the real handler table (dispatch), as the
 * Electron window and the loopback host call it. Invented demo site (assets/demo).
 * Source for every case: derived: optimistic concurrency (a write names the version it read).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { dispatch } from '../../../electron/api/dispatch.js';
import { handlerTable } from '../../../electron/api/table.js';
import type { ApiContext } from '../../../electron/api/context.js';
import type { Reply } from '../../../electron/api/reply.js';
import type { Assessment, Eyewear, LaserInstallation, Person, RecordStore, Room, Site } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, snapshotOn, STATEMENT, tempDir } from './helpers.js';
import { forEachEngine, PG_ADDRESS } from './engines.js';

/** On the server a refusal names the account that saved (write_record); a file has one writer. */
const account = (engine: { name: string }): string | null => (engine.name === 'postgresql' ? decodeURIComponent(new URL(PG_ADDRESS).username) : null);

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let a: RecordStore;
  let b: RecordStore;
  beforeEach(async () => {
    t = tempDir('bw-register-versions-');
    a = await openTemp(t.dir, undefined, engine);
    b = await openTemp(t.dir, undefined, engine); // a second window on the same file
  });
  afterEach(async () => {
    await a.close();
    await b.close();
    t.cleanup();
  });

  /** One window: the handler table over its own store, answering as the window sees it. */
  function windowOn(store: RecordStore) {
    const ctx: ApiContext = { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store };
    return async (name: string, args: unknown): Promise<Reply<unknown>> => (await dispatch(handlerTable, ctx, name as never, args as never)) as Reply<unknown>;
  }

  interface Case {
    readonly kind: string;
    /** The entry as window A opened it, with the fields its form shows. */
    readonly open: (s: RecordStore, ids: Ids) => Promise<{ id: string; updatedAt: string; seen: Record<string, unknown> }>;
    /** Window B's change through the store (another officer). */
    readonly otherChange: (s: RecordStore, ids: Ids) => Promise<unknown>;
    /** Window A's edit. */
    readonly patch: Record<string, unknown>;
    readonly update: string;
    readonly remove: string;
    /** What the refusal must name (in the register's words). */
    readonly named: RegExp;
  }
  interface Ids {
    site: Site;
    room: Room;
    laser: LaserInstallation;
    eyewear: Eyewear;
    person: Person;
  }

  async function setUp(s: RecordStore): Promise<Ids> {
    const { site, room } = await registerRoom(s);
    const laser = (await s.listInstallations(room.id))[0];
    const eyewear = (await s.listEyewear(site.id))[0];
    if (!laser || !eyewear) throw new Error('demo room has lasers and eyewear');
    const person = await s.createPerson({ name: 'Ada Quillfeather', role: 'Deputy LSO', phone: '1234' });
    return { site, room, laser, eyewear, person };
  }

  const CASES: readonly Case[] = [
    {
      kind: 'site',
      open: async (s, x) => {
        const e = await s.getSite(x.site.id);
        return { id: e.id, updatedAt: e.updatedAt, seen: { name: e.name, building: e.building, address: e.address, notes: e.notes } };
      },
      otherChange: (s, x) => s.updateSite(x.site.id, { name: 'Calloway Optics Wing' }),
      patch: { building: 'Block C' },
      update: 'site-update',
      remove: 'site-delete',
      named: /name ".+" → "Calloway Optics Wing"/,
    },
    {
      kind: 'room',
      open: async (s, x) => {
        const e = await s.getRoom(x.room.id);
        return { id: e.id, updatedAt: e.updatedAt, seen: { code: e.code, name: e.name, responsiblePerson: e.responsiblePerson, contact: e.contact, notes: e.notes } };
      },
      otherChange: (s, x) => s.updateRoom(x.room.id, { contact: 'ext. 4471' }),
      patch: { name: 'Telecom bench (renamed)' },
      update: 'room-update',
      remove: 'room-delete',
      named: /contact empty → "ext\. 4471"/,
    },
    {
      kind: 'laser',
      open: async (s, x) => {
        const e = await s.getInstallation(x.laser.id);
        return { id: e.id, updatedAt: e.updatedAt, seen: { laser: e.laser, maker: e.maker, serialNumber: e.serialNumber, status: e.status, notes: e.notes } };
      },
      otherChange: async (s, x) => {
        const l = (await s.getInstallation(x.laser.id)).laser;
        const b0 = l.beams[0];
        if (!b0) throw new Error('beam');
        await s.updateInstallation(x.laser.id, { serialNumber: 'SN-7', laser: { ...l, beams: [{ ...b0, wavelength_nm: b0.wavelength_nm + 1 }, ...l.beams.slice(1)] } });
      },
      patch: { notes: 'serviced' },
      update: 'installation-update',
      remove: 'installation-delete',
      // derived: the demo laser's first beam is 1550 nm; one more nanometre reads 1551 nm
      named: /^(?=.*serial number empty → "SN-7")(?=.*laser: beam 1, wavelength 1550 nm → 1551 nm)/,
    },
    {
      kind: 'eyewear',
      open: async (s, x) => {
        const e = await s.getEyewear(x.eyewear.id);
        return { id: e.id, updatedAt: e.updatedAt, seen: { spec: e.spec, location: e.location, quantity: e.quantity, notes: e.notes, condition: e.condition } };
      },
      otherChange: (s, x) => s.updateEyewear(x.eyewear.id, { quantity: 7, condition: 'damaged' }),
      patch: { location: 'Cabinet 2' },
      update: 'eyewear-update',
      remove: 'eyewear-delete',
      named: /quantity "1" → "7"; condition "not recorded" → "damaged"/,
    },
    {
      kind: 'person',
      open: async (s, x) => {
        const e = await s.getPerson(x.person.id);
        return { id: e.id, updatedAt: e.updatedAt, seen: { name: e.name, role: e.role, email: e.email, phone: e.phone } };
      },
      otherChange: (s, x) => s.updatePerson(x.person.id, { role: 'Laser safety officer' }),
      patch: { email: 'ada@example.org' },
      update: 'person-update',
      remove: 'person-delete',
      named: /role "Deputy LSO" → "Laser safety officer"/,
    },
  ];

  describe('a register edit from an older version is refused with what changed; nothing is overwritten', () => {
    it.each(CASES)('$kind: edit', async (c) => {
      const ids = await setUp(a);
      const inA = windowOn(a);
      const opened = await c.open(a, ids);
      await c.otherChange(b, ids);
      const before = await snapshotOn(engine, t.dir);
      const reply = await inA(c.update, { id: opened.id, patch: c.patch, expected: { updatedAt: opened.updatedAt, seen: opened.seen } });
      expect(reply.ok).toBe(false);
      if (reply.ok) return;
      expect(reply.error.code).toBe('stale');
      expect(reply.error.message).toMatch(/was changed by someone else since you opened it: /);
      expect(reply.error.message).toMatch(c.named);
      const by = account(engine);
      expect(reply.error.message).toMatch(new RegExp(`saved ${by !== null ? `by ${by} ` : ''}at \\d\\d:\\d\\d.*Your changes were not saved; nothing was overwritten`));
      expect(reply.error.message).not.toMatch(/\[\d\]|_nm|_W\b|beams\./);
      expect(await snapshotOn(engine, t.dir)).toBe(before);
      // Reloaded, the same edit goes through on top of the other officer's change.
      const again = await c.open(a, ids);
      const ok = await inA(c.update, { id: again.id, patch: c.patch, expected: { updatedAt: again.updatedAt, seen: again.seen } });
      expect(ok.ok).toBe(true);
    });

    it.each(CASES)('$kind: delete', async (c) => {
      const ids = await setUp(a);
      const opened = await c.open(a, ids);
      await c.otherChange(b, ids);
      const before = await snapshotOn(engine, t.dir);
      const reply = await windowOn(a)(c.remove, { id: opened.id, expected: { updatedAt: opened.updatedAt, seen: opened.seen } });
      expect(reply.ok).toBe(false);
      if (reply.ok) return;
      expect(reply.error.code).toBe('stale');
      expect(reply.error.message).toMatch(/changed by someone else since you opened it: .*It was not deleted/);
      expect(await snapshotOn(engine, t.dir)).toBe(before);
    });

    it.each(CASES)('$kind: an edit without the version it started from is refused at the door', async (c) => {
      const ids = await setUp(a);
      const opened = await c.open(a, ids);
      const reply = await windowOn(a)(c.update, { id: opened.id, patch: c.patch });
      expect(reply.ok).toBe(false);
      if (!reply.ok) expect(reply.error.code).toBe('invalid_input');
    });
  });

  describe('an entry deleted by someone else', () => {
    it('an edit of a person another window removed says so, in words', async () => {
      const ids = await setUp(a);
      const seen = { name: ids.person.name, role: ids.person.role };
      await b.deletePerson(ids.person.id);
      const reply = await windowOn(a)('person-update', { id: ids.person.id, patch: { phone: '99' }, expected: { updatedAt: ids.person.updatedAt, seen } });
      expect(reply.ok).toBe(false);
      if (!reply.ok) {
        expect(reply.error.code).toBe('stale');
        const by = account(engine);
        expect(reply.error.message).toBe(`Ada Quillfeather was deleted by someone else${by !== null ? ` (${by})` : ''} since you opened it. Your changes were not saved. Reload the register.`);
      }
    });
  });

  describe('versions never repeat', () => {
    it('two saves in the same millisecond leave two different versions (a stopped clock)', async () => {
      const frozen = '2026-05-01T09:30:00.000Z';
      const s = await openTemp(t.dir, 'frozen.sqlite', engine, { now: () => frozen });
      try {
        const site = await s.createSite({ name: 'Frozen clock site' });
        const v1 = await s.updateSite(site.id, { building: 'A' }, { updatedAt: site.updatedAt });
        const v2 = await s.updateSite(site.id, { building: 'B' }, { updatedAt: v1.updatedAt });
        expect([site.updatedAt, v1.updatedAt, v2.updatedAt]).toEqual([frozen, '2026-05-01T09:30:00.001Z', '2026-05-01T09:30:00.002Z']);
        // the first version is now out of date although the clock has not moved
        await expect(s.updateSite(site.id, { building: 'C' }, { updatedAt: v1.updatedAt })).rejects.toThrow(/changed by someone else/);
      } finally {
        await s.close();
      }
    });
  });

  describe('signing checks the revision the officer reviewed', () => {
    const base = (x: Assessment) => ({ revisionId: x.current.id, version: x.version });

    it('a draft saved by someone else after the confirm step is not signed', async () => {
      const { room } = await registerRoom(a);
      const signer = await makeSigner(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const reviewedInA = await a.getAssessment(made.id);
      const inB = await b.getAssessment(made.id);
      await b.saveAssessment(made.id, { ...inB.current.content, notes: 'B changed the controls after A reviewed' }, base(inB));
      const before = await snapshotOn(engine, t.dir);
      const reply = await windowOn(a)('assessment-sign', { id: made.id, signOff: signer.signOff(STATEMENT), reviewed: base(reviewedInA) });
      expect(reply.ok).toBe(false);
      if (!reply.ok) {
        expect(reply.error.code).toBe('stale');
        expect(reply.error.message).toMatch(/changed by someone else since you opened it: saved as revision 1 (?:by \S+ )?at \d\d:\d\d\. Nothing was signed — reload, review the revision again, then sign\./);
      }
      expect(await snapshotOn(engine, t.dir)).toBe(before);
      // reviewed again, it signs
      const reviewedAgain = await a.getAssessment(made.id);
      const ok = await windowOn(a)('assessment-sign', { id: made.id, signOff: signer.signOff(STATEMENT), reviewed: base(reviewedAgain) });
      expect(ok.ok).toBe(true);
      expect((await a.getAssessment(made.id)).current.status).toBe('signed');
    });

    it('signing without naming the reviewed revision is refused at the door', async () => {
      const { room } = await registerRoom(a);
      const signer = await makeSigner(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const reply = await windowOn(a)('assessment-sign', { id: made.id, signOff: signer.signOff(STATEMENT) });
      expect(reply.ok).toBe(false);
      if (!reply.ok) expect(reply.error.code).toBe('invalid_input');
      expect((await a.getAssessment(made.id)).current.status).toBe('draft');
    });
  });
});
