/**
 * Register editing in place, on the real handler table and a real SQLite store in a temporary
 * folder (the desktop bridge is the in-process dispatch, no database mock): a laser's power is
 * changed on the Register with the workspace's own unit-aware fields and checks; the register and
 * the room's signed assessment (as a new draft revision) take the new value; a value that does not
 * read is refused beside the field and nothing is saved. A person's name is edited in place.
 * Invented demo room A0.07 (assets/demo); the physics is checked elsewhere (test/core).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { dispatch } from '../../electron/api/dispatch.js';
import { handlerTable } from '../../electron/api/table.js';
import type { ApiContext } from '../../electron/api/context.js';
import type { DesktopApi } from '../../electron/api/desktop-api.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import RoomDetail from '../../renderer/components/register/RoomDetail.svelte';
import PeoplePanel from '../../renderer/components/register/PeoplePanel.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from '../backend/records/helpers.js';
import { tick, until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';
let assessmentId = '';


beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  const { room } = await registerRoom(store);
  roomId = room.id;
  const a = await store.createAssessment({ roomId, content: await store.newAssessmentContent(roomId) });
  assessmentId = a.id;
  await store.signAssessment(a.id, (await makeSigner(store)).signOff(STATEMENT));
  await store.createPerson({ name: 'Ada Quillfeather', role: 'Deputy LSO' });
  const ctx: ApiContext = { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store };
  const bridge: DesktopApi = {
    invoke: (name, args) => dispatch(handlerTable, ctx, name, args) as never,
    saveFile: async () => ({ saved: false }),
    openForPrint: async () => undefined,
    printScreen: async () => undefined,
    openDataFolder: async () => undefined,
    onMenuCommand: () => () => undefined,
  };
  window.beamwarden = bridge;
  await session.refreshOverview();
});
afterAll(async () => {
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

describe('editing a laser on the Register', () => {
  it('refuses a value that does not read, beside the field, and saves nothing', async () => {
    const overview = session.roomOverview(roomId);
    if (!overview) throw new Error('no room');
    const before = JSON.stringify(await store.listInstallations(roomId));
    render(RoomDetail, { props: { overview } });
    const first = overview.installations[0];
    if (!first) throw new Error('no laser');
    await fireEvent.click(screen.getByRole('button', { name: `Edit ${first.laser.name}` }));
    const editor = screen.getByTestId('laser-editor');
    await fireEvent.click(within(editor).getAllByRole('button', { name: /^Beam 1/ })[0]!);
    const wl = within(editor).getByLabelText(/^Wavelength/);
    await fireEvent.input(wl, { target: { value: '1550 parsecs' } });
    await fireEvent.click(within(editor).getByRole('button', { name: 'Save laser' }));
    await tick(50);
    const alerts = within(editor).getAllByRole('alert').map((a) => a.textContent ?? '');
    // the field's own error, and the summary above the buttons
    expect(alerts.some((a) => /Wavelength/.test(a) && /parsecs/.test(a))).toBe(true);
    expect(alerts.some((a) => a.includes('Not saved') && a.includes('Beam 1'))).toBe(true);
    expect(JSON.stringify(await store.listInstallations(roomId))).toBe(before);
  });

  it('saves the new divergence, typed in degrees, into the register and the signed assessment as a new draft', async () => {
    const overview = session.roomOverview(roomId);
    if (!overview) throw new Error('no room');
    render(RoomDetail, { props: { overview } });
    const first = overview.installations[0];
    if (!first) throw new Error('no laser');
    const edits = screen.getAllByRole('button', { name: `Edit ${first.laser.name}` });
    await fireEvent.click(edits[edits.length - 1]!);
    const editor = screen.getAllByTestId('laser-editor').at(-1)!;
    await fireEvent.click(within(editor).getAllByRole('button', { name: /^Beam 1/ })[0]!);
    await fireEvent.input(within(editor).getByLabelText(/^Divergence, full angle/), { target: { value: '0.1°' } });
    await fireEvent.input(within(editor).getByLabelText('Serial number'), { target: { value: 'SN-0042' } });
    await fireEvent.click(within(editor).getByRole('button', { name: 'Save laser' }));
    await until(async () => (await store.listInstallations(roomId))[0]?.serialNumber === 'SN-0042');
    const saved = (await store.listInstallations(roomId))[0];
    // derived: 0.1° = 0.1 × π/180 rad = 1.745 mrad (degree, BIPM SI brochure Table 8)
    expect(saved?.laser.beams[0]?.beam.divergence_rad).toBeCloseTo((0.1 * Math.PI) / 180, 12);
    await until(async () => (await store.getAssessment(assessmentId)).current.revisionNo === 2);
    const a = await store.getAssessment(assessmentId);
    expect(a.current.status).toBe('draft');
    expect(a.current.content.input.lasers[0]?.beams[0]?.beam.divergence_rad).toBeCloseTo((0.1 * Math.PI) / 180, 12);
    const history = await store.laserHistory(first.id);
    expect(history.map((h) => `${h.revisionNo} ${h.status}`)).toEqual(['2 draft', '1 signed']);
  });
});

describe('editing a person on the Register', () => {
  it('renames in place; an empty name is refused', async () => {
    render(PeoplePanel, { props: { people: session.overview?.people ?? [], query: '' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Edit Ada Quillfeather' }));
    const nameBox = screen.getAllByLabelText('Name *').at(0)!;
    await fireEvent.input(nameBox, { target: { value: '   ' } });
    await fireEvent.submit(nameBox.closest('form')!);
    expect(screen.getByRole('alert').textContent).toBe('Name is required');
    await fireEvent.input(nameBox, { target: { value: 'Ada Quillfeather-Ross' } });
    await fireEvent.submit(nameBox.closest('form')!);
    await until(async () => (await store.listPeople()).some((p) => p.name === 'Ada Quillfeather-Ross'));
    expect((await store.listPeople()).map((p) => p.role)).toContain('Deputy LSO');
  });
});
