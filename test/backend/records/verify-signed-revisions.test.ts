/**
 * `verifySignedRevisions` (used by `npm run verify -- --all`) reads the revision chain and the
 * database protections once per assessment instead of once per signed revision; its reports must
 * be exactly those of verifying each signed revision on its own — for an intact assessment reviewed
 * three times, and after a trigger was dropped and a list column rewritten outside Beamwarden (the
 * attack of issue 10's test list). Real SQLite file and real keys; invented demo room A0.07.
 */
import Database from 'better-sqlite3';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir> | null = null;
let store: RecordStore | null = null;
afterEach(async () => {
  await store?.close();
  t?.cleanup();
  store = t = null;
});

async function reviewedThreeTimes() {
  t = tempDir('bw-verify-signed-');
  const s = await openTemp(t.dir);
  store = s;
  const { room } = await registerRoom(s);
  const officer = await makeSigner(s);
  const a = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
  for (const note of ['first review', 'second review', 'third review']) {
    const current = (await s.getAssessment(a.id)).current;
    if (current.status !== 'draft') await s.saveAssessment(a.id, { ...current.content, notes: note });
    await s.signAssessment(a.id, officer.signOff(STATEMENT));
  }
  return { s, assessmentId: a.id, dbPath: join(t.dir, 'records.sqlite') };
}

async function oneByOne(s: RecordStore, assessmentId: string) {
  const out = [];
  for (const r of await s.listRevisions(assessmentId)) if (r.status !== 'draft' || r.signature !== null) out.push(await s.verify(assessmentId, r.id));
  return out;
}

describe('verifying every signed revision with the chain read once gives the same reports', () => {
  it('an intact assessment reviewed three times', async () => {
    const { s, assessmentId } = await reviewedThreeTimes();
    const together = await s.verifySignedRevisions(assessmentId);
    expect(together.map((r) => [r.revisionNo, r.status, r.ok])).toEqual([[1, 'superseded', true], [2, 'superseded', true], [3, 'signed', true]]);
    expect(together).toEqual(await oneByOne(s, assessmentId));
  });

  it('a dropped trigger and a rewritten review date are reported on every revision, as before', async () => {
    const { s, assessmentId, dbPath } = await reviewedThreeTimes();
    const raw = new Database(dbPath);
    raw.exec('DROP TRIGGER revision_signed_immutable');
    raw.prepare("UPDATE revision SET review_by = '2099-01-01' WHERE assessment_id = ? AND revision_no = 2").run(assessmentId);
    raw.close();
    const together = await s.verifySignedRevisions(assessmentId);
    expect(together.map((r) => r.ok)).toEqual([false, false, false]);
    expect(together.every((r) => r.findings.some((f) => /list column was changed outside Beamwarden/.test(f)))).toBe(true);
    expect(together.every((r) => r.checks.some((c) => c.check === 'protections' && !c.ok))).toBe(true);
    expect(together).toEqual(await oneByOne(s, assessmentId));
  });
});
