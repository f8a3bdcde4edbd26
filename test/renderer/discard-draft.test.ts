/**
 * "Discard this draft…" on the Review & sign screen and in the Workspace header, through the real
 * screens on the real handler table and a real SQLite store (no mock). The app's one dialog asks
 * first (DEVELOPERS.md, "Asking before work is lost"): it names what leaves the register (the
 * draft as last saved, the edits not saved yet, for a first draft the assessment itself) and says
 * that signed revisions stay; Keep the draft (the focused, safe choice) changes nothing; only the
 * named action deletes the draft. Signed content is never touched (its fingerprint still verifies).
 * Invented demo room A0.07 (the project's demo scenario).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/svelte';
import type { AssessmentContent, RecordStore } from '../../electron/backend/records/index.js';
import ReviewScreen from '../../renderer/screens/ReviewScreen.svelte';
import WorkspaceScreen from '../../renderer/screens/WorkspaceScreen.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { cancelOpenChoices } from '../../renderer/lib/confirm-choice.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
beforeEach(async () => {
  t = tempDir('bw-discard-draft-');
  store = await openTemp(t.dir);
  installStoreBridge(store);
});
afterEach(async () => {
  cancelOpenChoices();
  await until(() => !session.busy);
  cleanup();
  session.draft = null;
  session.assessment = null;
  session.room = null;
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

const dialog = () => screen.getByRole('alertdialog');
const shown = () => screen.queryByRole('alertdialog') !== null;

/** The title with a word added, as an officer's edit of the draft. */
const retitled = (c: AssessmentContent, title: string): AssessmentContent => ({ ...c, title });

async function openOnReview(roomId: string, assessmentId: string): Promise<void> {
  await session.refreshOverview();
  await session.openRoom(roomId, assessmentId);
  render(ReviewScreen);
}

describe('discarding the draft of an assessment', () => {
  it('a first draft (nothing signed): the dialog says the assessment goes and nothing signed is affected; Keep the draft keeps it; the named action deletes it', async () => {
    const { room } = await registerRoom(store, 'A0.07');
    const c = await store.newAssessmentContent(room.id);
    const a = await store.createAssessment({ roomId: room.id, content: retitled(c, 'Fibre bench, first look') });
    await openOnReview(room.id, a.id);

    const button = screen.getByRole('button', { name: 'Discard this draft…' });
    button.focus();
    await fireEvent.click(button);
    await until(shown);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe('Discard the draft “Fibre bench, first look”?');
    expect(dialog().textContent).toContain('This assessment of room A0.07 has only this draft and was never signed. Discarding deletes it from the register; this cannot be undone.');
    const lost = d.getAllByRole('listitem').map((li) => li.textContent ?? '');
    expect(lost).toEqual([
      expect.stringMatching(/^Draft revision 1 as last saved \(\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC\): its inputs, assumptions, eyewear and control choices and its results$/),
      "The assessment itself: it has no signed revision, so it leaves the room's list",
    ]);
    expect(d.getByTestId('choice-kept').textContent).toBe('Nothing signed is affected. Room A0.07, its lasers (also those added with this draft) and the eyewear shelf stay in the register.');
    expect(document.activeElement).toBe(d.getByRole('button', { name: 'Keep the draft' }));
    await fireEvent.click(d.getByRole('button', { name: 'Keep the draft' }));
    await until(() => !shown());
    expect((await store.listAssessments(room.id)).map((x) => x.id)).toEqual([a.id]);

    await fireEvent.click(screen.getByRole('button', { name: 'Discard this draft…' }));
    await until(shown);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Discard the draft' }));
    await until(() => !shown() && !session.busy);
    expect(await store.listAssessments(room.id)).toEqual([]);
    // The room stays, with its register lasers; a fresh unsaved draft is on screen.
    expect((await store.listInstallations(room.id)).map((i) => i.laser.name)).toEqual(['Erbium fibre amplifier', 'DFB source']);
    expect(session.assessment).toBeNull();
    expect(session.notice?.text).toBe('Draft “Fibre bench, first look” discarded; it had no signed revision, so it is no longer in the register of room A0.07.');
  });

  it('a draft on top of a signed revision, with an unsaved edit: both are named as lost, the signed revision stays, verifies and opens again', async () => {
    const { room } = await registerRoom(store, 'A0.07');
    const made = await store.createAssessment({ roomId: room.id, content: retitled(await store.newAssessmentContent(room.id), 'Fibre bench') });
    const signed = await store.signAssessment(made.id, (await makeSigner(store)).signOff(STATEMENT));
    await store.saveAssessment(made.id, retitled(signed.current.content, 'Fibre bench, new amplifier'));
    await openOnReview(room.id, made.id);
    expect(session.assessment?.current.revisionNo).toBe(2);
    if (session.draft) session.draft.title = 'Fibre bench, new amplifier and splitter';

    await fireEvent.click(screen.getByRole('button', { name: 'Discard this draft…' }));
    await until(shown);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe('Discard draft revision 2 of “Fibre bench, new amplifier”?');
    expect(dialog().textContent).toContain('Revision 2 of this assessment of room A0.07 is a draft made from signed revision 1.');
    const lost = d.getAllByRole('listitem').map((li) => li.textContent ?? '');
    expect(lost).toHaveLength(2);
    expect(lost[0]).toMatch(/^Draft revision 2 as last saved /);
    expect(lost[1]).toMatch(/^Not saved yet: .*Fibre bench, new amplifier and splitter/);
    expect(d.getByTestId('choice-kept').textContent).toBe(
      'Signed revision 1 stays exactly as signed, and revision 1 opens again. Room A0.07, its lasers (also those added with this draft) and the eyewear shelf stay in the register.',
    );
    await fireEvent.keyDown(document.activeElement ?? dialog(), { key: 'Escape' });
    await until(() => !shown());
    expect((await store.listRevisions(made.id)).map((r) => [r.revisionNo, r.status])).toEqual([[1, 'signed'], [2, 'draft']]);
    expect(session.draft?.title).toBe('Fibre bench, new amplifier and splitter');

    await fireEvent.click(screen.getByRole('button', { name: 'Discard this draft…' }));
    await until(shown);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Discard draft revision 2' }));
    await until(() => !shown() && !session.busy);
    expect((await store.listRevisions(made.id)).map((r) => [r.revisionNo, r.status])).toEqual([[1, 'signed']]);
    expect(session.assessment?.current.revisionNo).toBe(1);
    expect(session.draft?.title).toBe('Fibre bench');
    expect(session.dirty).toBe(false);
    const report = await store.verify(made.id);
    expect(report.ok).toBe(true);
    // A signed revision has nothing to discard: the button is gone.
    await until(() => screen.queryByRole('button', { name: 'Discard this draft…' }) === null);
  });

  it('the Workspace header offers the same, with the same question', async () => {
    const { room } = await registerRoom(store, 'A0.07');
    const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
    await session.refreshOverview();
    await session.openRoom(room.id, a.id);
    render(WorkspaceScreen);
    await fireEvent.click(screen.getByRole('button', { name: 'Discard this draft…' }));
    await until(shown);
    expect(within(dialog()).getByRole('button', { name: 'Discard the draft' })).toBeTruthy();
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Keep the draft' }));
    await until(() => !shown());
    expect(await store.listAssessments(room.id)).toHaveLength(1);
  });
});
