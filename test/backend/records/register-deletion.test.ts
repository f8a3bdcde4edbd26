/**
 * Deleting a site, a room or a person from the register, through the real handler table
 * ('register-delete-impact', 'site-delete', 'room-delete', 'person-delete', zod-validated) on a
 * real SQLite file: what has only drafts goes cleanly with its lasers, draft assessments and
 * eyewear; anything a signed record refers to is refused in the officer's words and nothing
 * changes (signed records are kept: the record-keeping policy of this tool, SAFETY.md "What a
 * signature proves"). Invented demo rooms A0.07 and B2.14 (the project's demo scenario).
 */
import Database from 'better-sqlite3';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { dispatch } from '../../../electron/api/dispatch.js';
import { handlerTable } from '../../../electron/api/table.js';
import type { ApiContext } from '../../../electron/api/context.js';
import type { Reply } from '../../../electron/api/reply.js';
import type { DeletionImpact, Person, RecordStore, Room, Site } from '../../../electron/backend/records/index.js';
import { personBase, roomBase, siteBase } from '../../../renderer/lib/register-base.js';
import { makeSigner, openTemp, registerRoom, snapshot, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let dbPath: string;
let call: (name: string, args: unknown) => Promise<Reply<unknown>>;
beforeEach(async () => {
  t = tempDir('bw-register-deletion-');
  dbPath = join(t.dir, 'records.sqlite');
  store = await openTemp(t.dir);
  const ctx: ApiContext = { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store };
  call = async (name, args) => (await dispatch(handlerTable, ctx, name as never, args as never)) as Reply<unknown>;
});
afterEach(async () => {
  await store.close();
  t.cleanup();
});

function value<T>(r: Reply<unknown>): T {
  if (!r.ok) throw new Error(`refused: ${r.error.message}`);
  return r.value as T;
}

/** Rows left in each register table (raw SQL on the file). */
function counts(): Record<string, number> {
  const db = new Database(dbPath, { readonly: true });
  try {
    const n = (table: string) => (db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
    return { site: n('site'), room: n('room'), laser: n('laser_installation'), eyewear: n('eyewear'), assessment: n('assessment'), revision: n('revision'), person: n('person') };
  } finally {
    db.close();
  }
}

/** Site with room A0.07 (two lasers, the site's eyewear) and a draft assessment of it. */
async function draftOnly(): Promise<{ site: Site; room: Room; title: string }> {
  const { site, room } = await registerRoom(store, 'A0.07');
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  return { site, room, title: a.current.content.title };
}

describe('what has only drafts is deleted cleanly, after a confirmation that names what goes with it', () => {
  it('a room: its lasers and its draft assessment go with it', async () => {
    const { room, title } = await draftOnly();
    const lasers = (await store.listInstallations(room.id)).map((l) => `"${l.laser.name}"`);
    const impact = value<DeletionImpact>(await call('register-delete-impact', { kind: 'room', id: room.id }));
    expect(impact).toEqual({
      what: `Room A0.07 (${room.name})`,
      alsoDeleted: [`2 lasers: ${lasers.join(', ')}`, `1 draft assessment (never signed): "${title}"`],
      refusal: null,
    });
    const before = counts();
    value(await call('room-delete', { id: room.id, expected: roomBase(room) }));
    expect(counts()).toEqual({ ...before, room: 0, laser: 0, assessment: 0, revision: 0 });
  });

  it('a site: its rooms, their lasers and drafts, and its eyewear shelf go with it', async () => {
    const { site } = await draftOnly();
    const shelf = (await store.listEyewear(site.id)).length;
    const impact = value<DeletionImpact>(await call('register-delete-impact', { kind: 'site', id: site.id }));
    expect(impact.what).toBe(`Site "${site.name}"`);
    expect(impact.refusal).toBeNull();
    expect(impact.alsoDeleted.map((l) => l.replace(/:.*/, ''))).toEqual(['1 room', '2 lasers', '1 draft assessment (never signed)', `${shelf} eyewear on the shelf`]);
    value(await call('site-delete', { id: site.id, expected: siteBase(site) }));
    expect(counts()).toMatchObject({ site: 0, room: 0, laser: 0, eyewear: 0, assessment: 0, revision: 0 });
  });

  it('a person who never signed and holds no key', async () => {
    const p = await store.createPerson({ name: 'Mr. Ulric Fenwhistle', role: 'Technician' });
    expect(value<DeletionImpact>(await call('register-delete-impact', { kind: 'person', id: p.id }))).toEqual({ what: 'Mr. Ulric Fenwhistle (Technician)', alsoDeleted: [], refusal: null });
    value(await call('person-delete', { id: p.id, expected: personBase(p) }));
    expect(await store.listPeople()).toEqual([]);
  });
});

interface Refused {
  readonly what: string;
  readonly set: () => Promise<{ op: string; args: unknown; kind: 'site' | 'room' | 'person'; id: string }>;
  readonly said: RegExp;
}

async function signedRoom() {
  const { site, room, title } = await draftOnly();
  const officer = await makeSigner(store, 'Dr. Imre Calloway-Senn');
  const a = (await store.listAssessments(room.id))[0];
  if (!a) throw new Error('no assessment');
  await store.signAssessment(a.id, officer.signOff(STATEMENT));
  return { site, room, title, officer, assessmentId: a.id };
}

// [what is deleted, how it is set up, the refusal the officer reads]
const REFUSALS: readonly Refused[] = [
  {
    what: 'a room with a signed assessment',
    set: async () => {
      const x = await signedRoom();
      return { op: 'room-delete', args: { id: x.room.id, expected: roomBase(x.room) }, kind: 'room', id: x.room.id };
    },
    said: /^Room A0\.07 cannot be deleted: it has 1 signed assessment: ".+"\. Signed records are kept, so the room stays in the register\.$/,
  },
  {
    what: 'a site with a room that has a signed assessment (and a second room with drafts only)',
    set: async () => {
      const x = await signedRoom();
      await store.createRoom({ siteId: x.site.id, code: 'B2.14', name: 'Ultrafast laboratory (invented)' });
      return { op: 'site-delete', args: { id: x.site.id, expected: siteBase(x.site) }, kind: 'site', id: x.site.id };
    },
    said: /^Site ".+" cannot be deleted: room A0\.07 has signed assessments\. Signed records are kept, so the site stays in the register\.$/,
  },
  {
    what: 'a person who signed',
    set: async () => {
      const x = await signedRoom();
      return { op: 'person-delete', args: { id: x.officer.person.id, expected: personBase(x.officer.person as Person) }, kind: 'person', id: x.officer.person.id };
    },
    said: /^Dr\. Imre Calloway-Senn cannot be removed from the register: they signed 1 assessment: ".+" \(revision 1\)\. Signed records are kept with their signers/,
  },
  {
    what: 'a person who only countersigned',
    set: async () => {
      const x = await signedRoom();
      const head = await makeSigner(store, 'Prof. Oona Brightwater-Hale');
      const revisionId = (await store.getAssessment(x.assessmentId)).current.id;
      await store.countersign({ revisionId, personId: head.person.id, passphrase: head.passphrase, statement: 'Read and accepted as head of the laboratory.' });
      return { op: 'person-delete', args: { id: head.person.id, expected: personBase(head.person as Person) }, kind: 'person', id: head.person.id };
    },
    said: /^Prof\. Oona Brightwater-Hale cannot be removed from the register: they countersigned 1 assessment: ".+" \(revision 1\)/,
  },
  {
    what: 'a person who holds a signing key but never signed',
    set: async () => {
      const p = await makeSigner(store, 'Ms. Petra Quillfeather');
      return { op: 'person-delete', args: { id: p.person.id, expected: personBase(p.person as Person) }, kind: 'person', id: p.person.id };
    },
    said: /^Ms\. Petra Quillfeather cannot be removed from the register: they hold a signing key.*retire the key under Signing keys\.$/,
  },
];

describe('anything a signed record refers to is kept: the delete is refused in plain words, nothing changes', () => {
  it.each(REFUSALS)('$what', async ({ set, said }) => {
    const x = await set();
    const impact = value<DeletionImpact>(await call('register-delete-impact', { kind: x.kind, id: x.id }));
    expect(impact.refusal).toMatch(said);
    const before = snapshot(dbPath);
    const r = await call(x.op, x.args);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('conflict');
      expect(r.error.message).toMatch(said);
      expect(r.error.message).not.toMatch(/FOREIGN KEY|constraint|SQLITE|beamwarden:/);
    }
    expect(snapshot(dbPath)).toBe(before);
  });
});

describe('the confirmation request is validated', () => {
  it.each([
    ['a kind the register cannot delete this way', { kind: 'laser', id: 'x' }, /Kind: must be site, room or person/],
    ['no id', { kind: 'room' }, /id/],
  ])('%s', async (_name, args, said) => {
    const r = await call('register-delete-impact', args);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('invalid_input');
      expect(r.error.message).toMatch(said);
    }
  });

  it('an entry that is not in the register', async () => {
    const r = await call('register-delete-impact', { kind: 'room', id: 'no-such-room' });
    expect(r.ok ? '' : r.error.code).toBe('not_found');
  });
});
