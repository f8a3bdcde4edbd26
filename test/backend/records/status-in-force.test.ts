/**
 * The Register says what is in force and what is open: after signing revision 1 and editing, the
 * room reads "signed rev 1 in force (date) · draft rev 2 open", not just "draft" (common practice:
 * the signed assessment stays valid until the new one is signed). Real database, invented demo room.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { statusLine } from '../../../renderer/lib/record-status.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';
let assessmentId = '';
const TODAY = '2026-12-02';
const DUE_BY = '2027-01-01';

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  const { room } = await registerRoom(store);
  roomId = room.id;
  const content = { ...await store.newAssessmentContent(room.id), reviewBy: '2027-06-30' };
  assessmentId = (await store.createAssessment({ roomId, content })).id;
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

describe('status line of an assessment on the Register', () => {
  it('a draft never signed', async () => {
    const a = (await store.listAssessments(roomId))[0];
    if (!a) throw new Error('no assessment');
    expect(statusLine(a, TODAY, DUE_BY)).toBe('draft rev 1, not signed · review by 2027-06-30');
  });

  it('signed, then edited: the signed revision stays in force and the draft is open', async () => {
    const signed = await store.signAssessment(assessmentId, (await makeSigner(store)).signOff(STATEMENT));
    const date = signed.current.signature?.signedAt.slice(0, 10) ?? '';
    const s1 = (await store.listAssessments(roomId))[0];
    if (!s1) throw new Error('no assessment');
    expect(statusLine(s1, TODAY, DUE_BY)).toBe(`signed rev 1 in force (${date}) · review by 2027-06-30`);
    await store.saveAssessment(assessmentId, { ...signed.current.content, notes: 'bench moved', reviewBy: '2026-12-20' });
    const s2 = (await store.listAssessments(roomId))[0];
    if (!s2) throw new Error('no assessment');
    // the review date of the revision in force governs until the draft is signed
    expect(statusLine(s2, TODAY, DUE_BY)).toBe(`signed rev 1 in force (${date}) · draft rev 2 open · review by 2027-06-30`);
  });
});
