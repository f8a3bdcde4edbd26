/**
 * The list of unsaved changes the discard and restore confirmations show, as the session builds it
 * from the open draft and the content as last saved: one line per part, in the workspace's words,
 * and nothing when nothing changed. Real handler table over a real SQLite store; invented demo room
 * A0.07 (an erbium fibre amplifier and a DFB source, the project's demo scenario).
 */
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../electron/backend/records/index.js';
import { session } from '../../renderer/lib/session.svelte.js';
import { applyText, F } from '../../renderer/lib/fields.js';
import { newPlan } from '../../renderer/lib/plan-edit.js';
import type { Draft } from '../../renderer/lib/draft.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';
let assessmentId = '';

beforeAll(async () => {
  t = tempDir('bw-unsaved-');
  store = await openTemp(t.dir);
  installStoreBridge(store);
  roomId = (await registerRoom(store, 'A0.07')).room.id;
  assessmentId = (await store.createAssessment({ roomId, content: await store.newAssessmentContent(roomId) })).id;
  await session.refreshOverview();
});
beforeEach(async () => {
  // a fresh copy of the stored assessment each case (the earlier case's edits are thrown away unasked)
  session.draft = null;
  await session.openRoom(roomId, assessmentId);
});
afterAll(async () => {
  session.draft = null;
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

const CASES: ReadonlyArray<readonly [string, (d: Draft) => void, readonly string[]]> = [
  ['nothing changed', () => undefined, []],
  ['a beam power typed', (d) => void applyText(F.power, d.lasers[1]!.beams[0]!.f.power, '20 mW'), ['Changes to laser “DFB source”']],
  ['a laser removed', (d) => void (d.lasers = d.lasers.filter((l) => l.name !== 'DFB source')), ['Removal of laser “DFB source” from the assessment']],
  ['a plan started', (d) => void (d.plan = newPlan(d.lasers.map((l) => ({ id: l.id, name: l.name })))), ['The new room plan']],
  ['notes and the review date', (d) => { d.notes = 'Fibre ends capped when not in use.'; d.reviewBy = '2027-06-30'; }, ['Notes', 'Review-by date']],
  ['the order of the lasers', (d) => void d.lasers.reverse(), ['Other changes to the assessment']],
  ['the title', (d) => void (d.title = 'Telecom bench, second amplifier'), [expect.stringMatching(/^Title “.+” changed to “Telecom bench, second amplifier”$/) as unknown as string]],
];

describe('unsaved changes, as the confirmation lists them', () => {
  it.each(CASES)('%s', (_name, edit, lines) => {
    const d = session.draft;
    if (!d) throw new Error('no draft');
    edit(d);
    expect(session.unsavedChanges()).toEqual(lines);
    expect(session.dirty).toBe(lines.length > 0);
  });
});
