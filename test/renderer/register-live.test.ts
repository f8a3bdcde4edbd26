/**
 * Two officers on one institution register (PostgreSQL, BEAMWARDEN_TEST_PG set by .ci/run): an
 * assessment open on this desk is saved by the other officer; without a reload this desk shows the
 * other officer's revision, and with unsaved edits the officer is told instead of losing them.
 * Real handler table over a real store on the server (test/renderer/store-bridge.ts); invented
 * demo room A0.07. Source for every case: derived: changes announced by the server (LISTEN/NOTIFY,
 * PostgreSQL 15 documentation, NOTIFY).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../electron/backend/records/index.js';
import { session } from '../../renderer/lib/session.svelte.js';
import { ENGINES, PG_ADDRESS, PG_SKIP_REASON } from '../backend/records/engines.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

const server = ENGINES[1];
const skip = PG_ADDRESS === '' || server === undefined;

describe.skipIf(skip)(`an open assessment changed by another officer${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  let t: ReturnType<typeof tempDir>;
  let mine: RecordStore;
  let other: RecordStore;
  let assessmentId = '';
  beforeAll(async () => {
    t = tempDir();
    mine = await openTemp(t.dir, 'records.sqlite', server);
    other = await openTemp(t.dir, 'records.sqlite', server); // the other officer's desk, same register
    const { room } = await registerRoom(mine);
    assessmentId = (await mine.createAssessment({ roomId: room.id, content: await mine.newAssessmentContent(room.id) })).id;
    installStoreBridge(mine);
    await session.init();
    await session.openRoom(room.id, assessmentId);
  });
  afterAll(async () => {
    delete window.beamwarden;
    await mine.close();
    await other.close();
    t.cleanup();
  });

  it('without unsaved edits: the other officer\'s save appears on this desk', async () => {
    expect(session.assessment?.version).toBe(1);
    await new Promise((r) => setTimeout(r, 500)); // the desk has started listening
    const theirs = await other.getAssessment(assessmentId);
    await other.saveAssessment(assessmentId, { ...theirs.current.content, notes: 'Officer B: beam stops checked' }, { revisionId: theirs.current.id, version: theirs.version });
    await until(() => session.assessment?.version === 2, 15_000);
    expect(session.assessment?.current.content.notes).toBe('Officer B: beam stops checked');
    expect(session.dirty).toBe(false);
  }, 30_000);

  it('with unsaved edits: the officer is told, and the edits stay on screen', async () => {
    const draft = session.draft;
    if (!draft) throw new Error('the assessment is open');
    session.draft = { ...draft, notes: 'Officer A: still typing' };
    expect(session.dirty).toBe(true);
    const theirs = await other.getAssessment(assessmentId);
    await other.saveAssessment(assessmentId, { ...theirs.current.content, notes: 'Officer B: curtain replaced' }, { revisionId: theirs.current.id, version: theirs.version });
    await until(() => session.notice?.kind === 'info' && /changed in the institution register/.test(session.notice.text), 15_000);
    expect(session.notice?.text).toMatch(/Your unsaved edits stay on screen; saving will show you what changed\./);
    expect(session.draft?.notes).toBe('Officer A: still typing');
  }, 30_000);
});
