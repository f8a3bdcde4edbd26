/**
 * Controls: "accept all suggested" records every undecided suggested measure as accepted with one
 * reason (refused without one); the exceptions are then changed one by one; the decisions of the
 * room's signed assessment are carried into its next new assessment. Real handler table and store,
 * invented demo room A0.07 (class 3B lasers: the suggestions come from the controls catalogue).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import { installStoreBridge } from './store-bridge.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import ControlsScreen from '../../renderer/screens/ControlsScreen.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { contentFrom } from '../../renderer/lib/draft.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from '../backend/records/helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  roomId = (await registerRoom(store)).room.id;
  installStoreBridge(store);
  await session.refreshOverview();
  await session.openRoom(roomId);
});
afterAll(async () => {
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

describe('accept all suggested, then exceptions', () => {
  it('needs the one reason, then accepts every undecided suggestion with it', async () => {
    render(ControlsScreen);
    const form = screen.getByTestId('accept-all');
    await fireEvent.submit(form);
    expect(screen.getByRole('alert').textContent).toMatch(/one reason/);
    expect(session.draft?.controls ?? []).toHaveLength(0);
    await fireEvent.input(screen.getByLabelText(/^Accept all \d+ undecided suggested measures/), { target: { value: 'required for this class; seen on site' } });
    await fireEvent.submit(form);
    const controls = session.draft?.controls ?? [];
    expect(controls.length).toBeGreaterThan(3);
    for (const c of controls) expect(c).toMatchObject({ decision: 'accepted', reason: 'required for this class; seen on site' });
    expect(screen.queryByTestId('accept-all')).toBeNull(); // nothing left undecided
  });

  it('carries the decisions into the next assessment of the room', async () => {
    const d = session.draft;
    if (!d) throw new Error('no draft');
    d.controls[0] = { ...d.controls[0]!, decision: 'not-applicable', reason: 'no such door in this room' };
    const created = await store.createAssessment({ roomId, content: contentFrom(d) });
    await store.signAssessment(created.id, (await makeSigner(store)).signOff(STATEMENT));
    const next = await store.newAssessmentContent(roomId);
    expect(next.controls).toEqual(created.current.content.controls);
    expect(next.controls[0]).toMatchObject({ decision: 'not-applicable', reason: 'no such door in this room' });
  });
});
