/**
 * The confirmation dialog where work can be lost, through the real Workspace screen on the real
 * handler table and a real SQLite store (no mock): removing a laser from the assessment, and
 * discarding unsaved changes when another assessment is started. The dialog names what goes
 * (the laser's beams; each unsaved change) and what stays (the register, the stored revision), the
 * safe choice has the focus, Escape and Keep editing change nothing, and only the named action
 * does what it says. Invented demo room A0.07 (the project's demo scenario: an erbium fibre
 * amplifier and a DFB source; its site's eyewear shelf). Also removing eyewear from the shelf and
 * the room plan from the assessment.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/svelte';
import type { RecordStore } from '../../electron/backend/records/index.js';
import WorkspaceScreen from '../../renderer/screens/WorkspaceScreen.svelte';
import RegisterScreen from '../../renderer/screens/RegisterScreen.svelte';
import PlanHarness from './PlanHarness.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { cancelOpenChoices } from '../../renderer/lib/confirm-choice.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
beforeEach(async () => {
  t = tempDir('bw-choice-screens-');
  store = await openTemp(t.dir);
  installStoreBridge(store);
});
afterEach(async () => {
  cancelOpenChoices();
  await until(() => !session.busy); // a register read still under way finishes before the store closes
  cleanup();
  session.draft = null;
  session.assessment = null;
  session.room = null;
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

/** Room A0.07 with its saved draft assessment, open in the workspace. */
async function openSavedRoom(): Promise<{ roomId: string; title: string; revisionNo: number }> {
  const { room } = await registerRoom(store, 'A0.07');
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  await session.refreshOverview();
  await session.openRoom(room.id, a.id);
  render(WorkspaceScreen);
  return { roomId: room.id, title: a.current.content.title, revisionNo: a.current.revisionNo };
}

const dialog = () => screen.getByRole('alertdialog');
const shown = () => screen.queryByRole('alertdialog') !== null;
const laserNames = () => (session.draft?.lasers ?? []).map((l) => l.name);

describe('removing a laser from the assessment', () => {
  it('names the laser, its beam and that the register keeps it; Escape keeps it, the named action removes it from the draft only', async () => {
    await openSavedRoom();
    const before = laserNames();
    expect(before).toEqual(['Erbium fibre amplifier', 'DFB source']);
    const removeButton = screen.getByRole('button', { name: 'Remove Erbium fibre amplifier' });
    removeButton.focus(); // as from the keyboard (a click in happy-dom does not move the focus)
    await fireEvent.click(removeButton);
    await until(shown);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe('Remove “Erbium fibre amplifier” from this assessment?');
    const lost = d.getAllByRole('listitem').map((li) => li.textContent ?? '');
    expect(lost).toHaveLength(1);
    expect(lost[0]).toMatch(/^Its beam \(.*1550 nm.*\) and their results in this assessment$/);
    expect(d.getByTestId('choice-kept').textContent).toBe(
      'The laser stays in the register of room A0.07 until you retire it there, and signed revisions keep their own copy. The removal is stored only when you save.',
    );
    expect(document.activeElement).toBe(d.getByRole('button', { name: 'Cancel' }));
    await fireEvent.keyDown(document.activeElement ?? dialog(), { key: 'Escape' });
    await until(() => !shown());
    expect(laserNames()).toEqual(before);
    expect(document.activeElement).toBe(removeButton);

    await fireEvent.click(screen.getByRole('button', { name: 'Remove Erbium fibre amplifier' }));
    await until(shown);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Remove Erbium fibre amplifier from the assessment' }));
    await until(() => laserNames().length === 1);
    expect(laserNames()).toEqual(['DFB source']);
    expect(session.dirty).toBe(true);
    // the register is not touched until the officer saves
    expect((await store.listInstallations(session.room?.id ?? '')).map((i) => i.laser.name).sort()).toEqual(['DFB source', 'Erbium fibre amplifier']);
  });
});

describe('discarding unsaved changes', () => {
  it('lists each unsaved change and the stored revision that stays; Keep editing keeps them, Discard changes starts the new assessment', async () => {
    const { revisionNo } = await openSavedRoom();
    const title = screen.getByLabelText('Assessment title') as HTMLInputElement;
    await fireEvent.input(title, { target: { value: 'Telecom bench, after the new amplifier' } });
    await fireEvent.click(screen.getByRole('button', { name: '+ CW laser' }));
    await until(() => laserNames().length === 3);
    expect(session.dirty).toBe(true);

    await fireEvent.click(screen.getByRole('button', { name: 'New assessment' }));
    await until(shown);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe('Discard the unsaved changes?');
    expect(dialog().textContent).toContain('These 2 unsaved changes are lost:');
    expect(d.getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      expect.stringMatching(/^Title “.+” changed to “Telecom bench, after the new amplifier”$/),
      'New laser “New CW laser” (not yet in the register)',
    ]);
    expect(d.getByTestId('choice-kept').textContent).toMatch(
      new RegExp(`^The stored revision ${revisionNo} \\(draft, saved \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2} UTC\\) and the register stay as they are\\. To keep your changes, choose Keep editing and save first\\.$`),
    );
    const keep = d.getByRole('button', { name: 'Keep editing' });
    expect(document.activeElement).toBe(keep);
    await fireEvent.click(keep);
    await until(() => !shown());
    expect(session.draft?.title).toBe('Telecom bench, after the new amplifier');
    expect(laserNames()).toContain('New CW laser');

    await fireEvent.click(screen.getByRole('button', { name: 'New assessment' }));
    await until(shown);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Discard changes' }));
    await until(() => session.assessment === null && !laserNames().includes('New CW laser'));
    expect(session.draft?.title).not.toBe('Telecom bench, after the new amplifier');
    // nothing of the discarded draft reached the records
    expect((await store.listInstallations(session.room?.id ?? '')).map((i) => i.laser.name)).not.toContain('New CW laser');
  });
});

describe('choosing another assessment of the room with unsaved changes', () => {
  it('Keep editing leaves the list on the open assessment and the edits on screen', async () => {
    const { roomId } = await openSavedRoom();
    const other = await store.createAssessment({ roomId, content: { ...(await store.newAssessmentContent(roomId)), title: 'Second assessment of A0.07 (invented)' } });
    await session.refreshOverview();
    const openId = session.assessment?.id ?? '';
    const list = (await screen.findByLabelText('Assessment')) as HTMLSelectElement;
    await fireEvent.input(screen.getByLabelText('Assessment title'), { target: { value: 'Edited, not saved' } });
    list.value = other.id;
    await fireEvent.change(list);
    await until(shown);
    expect(within(dialog()).getAllByRole('listitem').map((li) => li.textContent)).toEqual([expect.stringMatching(/^Title “.+” changed to “Edited, not saved”$/)]);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Keep editing' }));
    await until(() => !shown() && list.value === openId);
    expect(session.assessment?.id).toBe(openId);
    expect(session.draft?.title).toBe('Edited, not saved');
  });
});

describe('removing eyewear from the shelf', () => {
  it('names the item, its place and markings, and that saved assessments keep their copy; only the named action deletes it', async () => {
    const { site } = await registerRoom(store, 'A0.07');
    await session.refreshOverview();
    const shelf = await store.listEyewear(site.id);
    const item = shelf.at(-1);
    if (!item) throw new Error('no eyewear');
    render(RegisterScreen);
    await fireEvent.click(screen.getByRole('tab', { name: 'Eyewear shelf' }));
    await fireEvent.click(screen.getByRole('button', { name: `Remove ${item.spec.id}` }));
    await until(shown);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe(`Remove ${item.spec.id} from the shelf of ${site.name}?`);
    expect(dialog().textContent).toContain(`${item.quantity} kept at`);
    expect(dialog().textContent).toMatch(/Markings: .*OD \d/);
    expect(d.getByTestId('choice-kept').textContent).toBe('Assessments already saved, signed or not, keep their own copy of it. Only restoring a backup brings the shelf entry back.');
    await fireEvent.click(d.getByRole('button', { name: 'Cancel' }));
    await until(() => !shown());
    expect(await store.listEyewear(site.id)).toHaveLength(shelf.length);

    await fireEvent.click(screen.getByRole('button', { name: `Remove ${item.spec.id}` }));
    await until(shown);
    await fireEvent.click(within(dialog()).getByRole('button', { name: `Remove ${item.spec.id} from the shelf` }));
    await until(async () => (await store.listEyewear(site.id)).length === shelf.length - 1);
    expect((await store.listEyewear(site.id)).map((e) => e.spec.id)).not.toContain(item.spec.id);
  });
});

describe('removing the room plan', () => {
  it('counts what the drawing holds; Remove the plan takes it out and Undo brings it back', async () => {
    // invented green laser (as in the plan editor test): 5 W CW at 532 nm
    render(PlanHarness, { lasers: [{ id: 'L1', name: 'Green laser', beams: [{ id: 'g', label: 'green 532 nm', wavelength_nm: 532, emission: { kind: 'cw', power_W: 5 }, beam: { diameter_m: 0.0023, divergence_rad: 0.0004, definition: '1/e2' } }] }] });
    await fireEvent.click(screen.getByRole('button', { name: 'Start a room plan' }));
    await fireEvent.click(screen.getByRole('button', { name: 'Remove the plan' }));
    await until(shown);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe('Remove the room plan from this assessment?');
    const lost = d.getAllByRole('listitem').map((li) => li.textContent ?? '');
    expect(lost[0]).toMatch(/^The drawing: the outline \(4 corners\), 1 door, .*1 beam path/);
    expect(lost[1]).toBe('The hazard zones and findings drawn from it');
    await fireEvent.click(d.getByRole('button', { name: 'Remove the plan' }));
    await until(() => screen.getByTestId('plan-json').textContent === 'null');
    await fireEvent.click(screen.getByRole('button', { name: 'Undo: remove the plan' }));
    expect(screen.getByTestId('plan-json').textContent).not.toBe('null');
  });
});
