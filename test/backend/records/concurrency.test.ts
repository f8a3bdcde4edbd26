/**
 * No silent loss between two windows, two hosts or two officers on one database (issue 11, item 4):
 * every save names the revision and save counter it started from; a stale save is refused with the
 * time of the other change and nothing is overwritten. The workspace's save (new and edited
 * register lasers plus the assessment) is one operation in one transaction.
 * Real SQLite files and a real PostgreSQL register (two pools: two hosts on one server), the real loopback host over HTTP; "derived: optimistic concurrency" for all cases.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { RecordError, type Assessment, type RecordStore, type WorkSaved } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, snapshotOn, STATEMENT, tempDir } from './helpers.js';
import { forEachEngine, PG_ADDRESS } from './engines.js';

/** On the server a refusal names the account that saved (write_record), as a pattern; a file has one writer. */
const byAccount = (engine: { name: string }): string => (engine.name === 'postgresql' ? ` \\(${decodeURIComponent(new URL(PG_ADDRESS).username)}\\)` : '');
import { startTestHost } from './http-host.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let a: RecordStore;
  let b: RecordStore;
  beforeEach(async () => {
    t = tempDir('bw-concurrency-');
    a = await openTemp(t.dir, undefined, engine);
    b = await openTemp(t.dir, undefined, engine); // a second store on the same file: another window or host of this process
  });
  afterEach(async () => {
    await a.close();
    await b.close();
    t.cleanup();
  });

  async function errorOf(fn: () => unknown): Promise<RecordError> {
    try {
      await fn();
    } catch (e) {
      if (e instanceof RecordError) return e;
      throw e;
    }
    throw new Error('expected a RecordError');
  }

  const base = (x: Assessment) => ({ revisionId: x.current.id, version: x.version });

  describe('a stale save is refused and nothing is overwritten (two stores on one file)', () => {
    it.each([
      ['the other officer saved the draft', async (s: RecordStore, id: string) => void (await s.saveAssessment(id, { ...(await s.getAssessment(id)).current.content, notes: 'saved by A' }, base(await s.getAssessment(id))))],
      ['the other officer signed the draft', async (s: RecordStore, id: string) => void (await s.signAssessment(id, (await makeSigner(s)).signOff(STATEMENT)))],
    ])('%s', async (_case, otherChange) => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const openedInB = await b.getAssessment(made.id);
      await otherChange(a, made.id);
      const before = await snapshotOn(engine, t.dir);
      const err = await errorOf(() => b.saveAssessment(made.id, { ...openedInB.current.content, notes: 'saved by B' }, base(openedInB)));
      expect(err.code).toBe('stale');
      expect(err.message).toMatch(/was changed by someone else at \d\d:\d\d.* — reload and compare/);
      expect(err.message).toMatch(/Nothing was overwritten/);
      expect(await snapshotOn(engine, t.dir)).toBe(before);
      // After reloading, B's save goes through on top of A's.
      const reloaded = await b.getAssessment(made.id);
      const saved = await b.saveAssessment(made.id, { ...reloaded.current.content, notes: 'saved by B' }, base(reloaded));
      expect(saved.current.content.notes).toBe('saved by B');
      expect(saved.version).toBeGreaterThanOrEqual(1);
    });

    it('each save of a draft counts up its version', async () => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      expect(made.version).toBe(1);
      const s1 = await a.saveAssessment(made.id, { ...made.current.content, notes: 'one' }, base(made));
      const s2 = await a.saveAssessment(made.id, { ...s1.current.content, notes: 'two' }, base(s1));
      expect([s1.version, s2.version]).toEqual([2, 3]);
    });
  });

  describe('saving the workspace is one transaction', () => {
    it('a new laser and the assessment that uses it are written together', async () => {
      const { room } = await registerRoom(a);
      const content = await a.newAssessmentContent(room.id);
      const first = content.input.lasers[0];
      if (!first) throw new Error('demo room has lasers');
      const draftLaser = {
        ...first,
        id: 'laser-draft-1',
        name: 'Bench diode (added in the workspace)',
        beams: first.beams.map((bm, i) => ({ ...bm, id: `draft-beam-${i}` })),
      };
      const saved = await a.saveWork({
        roomId: room.id,
        assessmentId: null,
        expected: null,
        content: { ...content, input: { ...content.input, lasers: [...content.input.lasers, draftLaser] } },
        newLasers: [{ draftId: 'laser-draft-1', laser: draftLaser }],
        changedLasers: [],
      });
      const newId = saved.laserIds['laser-draft-1'];
      expect(newId).toBeDefined();
      expect(saved.installations.map((i) => i.id)).toContain(newId);
      expect(saved.assessment.current.content.input.lasers.map((l) => l.id)).toContain(newId);
    });

    it('when the assessment part is refused, the new laser is not left in the register', async () => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const openedInB = await b.getAssessment(made.id);
      await a.saveAssessment(made.id, { ...made.current.content, notes: 'A was first' }, base(made));
      const before = await snapshotOn(engine, t.dir);
      const first = openedInB.current.content.input.lasers[0];
      if (!first) throw new Error('demo room has lasers');
      const err = await errorOf(() =>
        b.saveWork({
          roomId: room.id,
          assessmentId: made.id,
          expected: base(openedInB),
          content: openedInB.current.content,
          newLasers: [{ draftId: 'laser-draft-2', laser: { ...first, id: 'laser-draft-2', name: 'Second bench diode', beams: first.beams.map((bm, i) => ({ ...bm, id: `d2-${i}` })) } }],
          changedLasers: [],
        }),
      );
      expect(err.code).toBe('stale');
      expect(await snapshotOn(engine, t.dir)).toBe(before);
    });

    it('a register laser edited by someone else meanwhile refuses the whole save', async () => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const inst = (await b.listInstallations(room.id))[0];
      if (!inst) throw new Error('demo room has lasers');
      await a.updateInstallation(inst.id, { notes: 'serviced' });
      const before = await snapshotOn(engine, t.dir);
      const err = await errorOf(() =>
        b.saveWork({
          roomId: room.id,
          assessmentId: made.id,
          expected: base(made),
          content: { ...made.current.content, notes: 'B edits' },
          newLasers: [],
          changedLasers: [{ id: inst.id, laser: { ...inst.laser, name: `${inst.laser.name} (renamed by B)` }, expectedUpdatedAt: inst.updatedAt }],
        }),
      );
      expect(err.code).toBe('stale');
      expect(err.message).toMatch(new RegExp(`Laser "${inst.laser.name.replace(/[()]/g, '.')}" in the register was changed by someone else${byAccount(engine)} at \\d\\d:\\d\\d`));
      expect(await snapshotOn(engine, t.dir)).toBe(before);
    });
  });

  describe('what the other officer changed is named', () => {
    it('a register laser whose power someone else changed: the refusal says from what to what', async () => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const inst = (await b.listInstallations(room.id))[0];
      const b0 = inst?.laser.beams[0];
      if (!inst || !b0 || b0.emission.kind !== 'cw') throw new Error('demo room starts with a CW laser');
      await a.updateInstallation(inst.id, { laser: { ...inst.laser, beams: [{ ...b0, emission: { kind: 'cw', power_W: 0.09 } }, ...inst.laser.beams.slice(1)] } });
      const before = await snapshotOn(engine, t.dir);
      const err = await errorOf(() =>
        b.saveWork({
          roomId: room.id,
          assessmentId: made.id,
          expected: base(made),
          content: made.current.content,
          newLasers: [],
          changedLasers: [{ id: inst.id, laser: { ...inst.laser, name: `${inst.laser.name} (renamed by B)` }, expectedUpdatedAt: inst.updatedAt, seenLaser: inst.laser }],
        }),
      );
      expect(err.code).toBe('stale');
      // derived: 0.08 W and 0.09 W in engineering notation (BIPM SI brochure Table 7: m = 1e-3)
      expect(err.message).toMatch(new RegExp(`was changed by someone else${byAccount(engine)} at \\d\\d:\\d\\d \\(laser: beam 1, power 80 mW → 90 mW\\) — reload and compare`));
      expect(await snapshotOn(engine, t.dir)).toBe(before);
    });
  });

  describe('two loopback hosts on one database file, over HTTP', () => {
    it('the second officer is told to reload and compare; the first one keeps their save', async () => {
      const { room } = await registerRoom(a);
      const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
      const hostA = await startTestHost(a);
      const hostB = await startTestHost(b);
      try {
        const inA = await hostA.ok<Assessment>('assessment-get', { id: made.id });
        const inB = await hostB.ok<Assessment>('assessment-get', { id: made.id });
        const save = (x: Assessment, notes: string) => ({
          roomId: room.id,
          assessmentId: x.id,
          expected: base(x),
          content: { ...x.current.content, notes },
          newLasers: [],
          changedLasers: [],
        });
        const first = await hostA.ok<WorkSaved>('work-save', save(inA, 'Officer A: beam stops checked'));
        expect(first.assessment.current.content.notes).toBe('Officer A: beam stops checked');
        const second = await hostB.call('work-save', save(inB, 'Officer B: curtain replaced'));
        expect(second.status).toBe(409);
        expect(second.reply.ok).toBe(false);
        if (!second.reply.ok) {
          expect(second.reply.error.code).toBe('stale');
          expect(second.reply.error.message).toMatch(/changed by someone else at \d\d:\d\d .*— reload and compare/);
        }
        expect((await a.getAssessment(made.id)).current.content.notes).toBe('Officer A: beam stops checked');
        // The plain save operation carries the version too.
        const plain = await hostB.call('assessment-save', { id: made.id, content: { ...inB.current.content, notes: 'x' }, expected: base(inB) });
        expect(plain.status).toBe(409);
      } finally {
        await hostA.close();
        await hostB.close();
      }
    });
  });
});
