/**
 * Deleting from the Register screens, on the real handler table and a real SQLite store (the
 * desktop bridge is the in-process dispatch, no mock): the confirmation names what is deleted and
 * what goes with it before anything is touched; confirming deletes a draft-only room or site with
 * its lasers, drafts and eyewear; a room with a signed assessment and a person who signed are
 * refused in the officer's words, without a delete button, and nothing changes. Invented demo
 * rooms (assets/demo, the project's demo scenario).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/svelte';
import type { RecordStore } from '../../electron/backend/records/index.js';
import RoomDetail from '../../renderer/components/register/RoomDetail.svelte';
import SiteDetail from '../../renderer/components/register/SiteDetail.svelte';
import PeoplePanel from '../../renderer/components/register/PeoplePanel.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { cancelOpenChoices } from '../../renderer/lib/confirm-choice.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
beforeEach(async () => {
  t = tempDir('bw-register-delete-');
  store = await openTemp(t.dir);
  installStoreBridge(store);
});
afterEach(async () => {
  cleanup();
  // the app's dialog lives on document.body, outside the rendered component: close any left open
  cancelOpenChoices();
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

async function draftOnlyRoom() {
  const { site, room } = await registerRoom(store, 'A0.07');
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  await session.refreshOverview();
  return { site, room, title: a.current.content.title };
}

const dialog = () => screen.getByRole('alertdialog');

describe('deleting a room', () => {
  it('names the lasers and the draft assessment that go with it; Cancel keeps everything', async () => {
    const { room, title } = await draftOnlyRoom();
    const overview = session.roomOverview(room.id);
    if (!overview) throw new Error('no room');
    render(RoomDetail, { props: { overview } });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete room…' }));
    await until(() => screen.queryByRole('alertdialog') !== null);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe(`Delete Room A0.07 (${room.name})?`);
    const lines = d.getAllByRole('listitem').map((li) => li.textContent);
    expect(lines).toEqual([`2 lasers: ${overview.installations.map((l) => `"${l.laser.name}"`).join(', ')}`, `1 draft assessment (never signed): "${title}"`]);
    await fireEvent.click(d.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(await store.listRooms(room.siteId)).toHaveLength(1);
  });

  it('confirming deletes the room, its lasers and its draft', async () => {
    const { room } = await draftOnlyRoom();
    const overview = session.roomOverview(room.id);
    if (!overview) throw new Error('no room');
    let deletedFrom = '';
    render(RoomDetail, { props: { overview, ondeleted: (siteId: string) => (deletedFrom = siteId) } });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete room…' }));
    await until(() => screen.queryByRole('alertdialog') !== null);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Delete room' }));
    await until(() => deletedFrom !== '');
    expect(deletedFrom).toBe(room.siteId);
    expect(await store.listRooms(room.siteId)).toEqual([]);
    expect(await store.listAllAssessments()).toEqual([]);
    expect(session.notice?.text).toBe('Room A0.07 deleted.');
  });

  it('a room with a signed assessment: the refusal says why, with no delete button, and nothing changes', async () => {
    const { room } = await draftOnlyRoom();
    const a = (await store.listAssessments(room.id))[0];
    if (!a) throw new Error('no assessment');
    await store.signAssessment(a.id, (await makeSigner(store)).signOff(STATEMENT));
    await session.refreshOverview();
    const overview = session.roomOverview(room.id);
    if (!overview) throw new Error('no room');
    render(RoomDetail, { props: { overview } });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete room…' }));
    await until(() => screen.queryByRole('alertdialog') !== null);
    const d = within(dialog());
    expect(d.getByRole('heading').textContent).toBe(`Delete Room A0.07 (${room.name})?`);
    expect(dialog().textContent).toMatch(/it has 1 signed assessment: ".+"\. Signed records are kept, so the room stays in the register\./);
    expect(d.queryByRole('button', { name: 'Delete room' })).toBeNull();
    expect(await store.listRooms(room.siteId)).toHaveLength(1);
  });
});

describe('deleting a site', () => {
  it('names its rooms, lasers, drafts and eyewear, and deletes them on confirmation', async () => {
    const { site } = await draftOnlyRoom();
    const overview = session.overview?.sites.find((s) => s.site.id === site.id);
    if (!overview) throw new Error('no site');
    let deleted = false;
    render(SiteDetail, { props: { overview, onroomcreated: () => undefined, ondeleted: () => (deleted = true) } });
    await fireEvent.click(screen.getByRole('button', { name: 'Delete site…' }));
    await until(() => screen.queryByRole('alertdialog') !== null);
    const lines = within(dialog()).getAllByRole('listitem').map((li) => (li.textContent ?? '').replace(/:.*/, ''));
    expect(lines).toEqual(['1 room', '2 lasers', '1 draft assessment (never signed)', `${overview.eyewear.length} eyewear on the shelf`]);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Delete site' }));
    await until(() => deleted);
    expect(await store.listSites()).toEqual([]);
    expect(session.notice?.text).toBe(`Site "${site.name}" deleted.`);
  });
});

describe('removing a person', () => {
  it('someone who never signed is removed; someone who signed is kept with the reason', async () => {
    const signer = await makeSigner(store, 'Dr. Imre Calloway-Senn');
    const { room } = await draftOnlyRoom();
    const a = (await store.listAssessments(room.id))[0];
    if (!a) throw new Error('no assessment');
    await store.signAssessment(a.id, signer.signOff(STATEMENT));
    await store.createPerson({ name: 'Mr. Ulric Fenwhistle', role: 'Technician' });
    await session.refreshOverview();
    render(PeoplePanel, { props: { people: session.overview?.people ?? [], query: '' } });

    await fireEvent.click(screen.getByRole('button', { name: 'Edit Dr. Imre Calloway-Senn' }));
    await fireEvent.click(screen.getByRole('button', { name: 'Remove from the register…' }));
    await until(() => screen.queryByRole('alertdialog') !== null);
    expect(within(dialog()).getByRole('heading').textContent).toBe('Remove Dr. Imre Calloway-Senn (Laser safety officer) from the register?');
    expect(dialog().textContent).toMatch(/they signed 1 assessment: ".+" \(revision 1\)\. Signed records are kept with their signers/);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Close' }));
    await fireEvent.click(screen.getByRole('button', { name: 'Edit Dr. Imre Calloway-Senn' }));

    await fireEvent.click(screen.getByRole('button', { name: 'Edit Mr. Ulric Fenwhistle' }));
    await fireEvent.click(screen.getByRole('button', { name: 'Remove from the register…' }));
    await until(() => screen.queryByRole('alertdialog') !== null);
    expect(within(dialog()).getByRole('heading').textContent).toBe('Remove Mr. Ulric Fenwhistle (Technician) from the register?');
    expect(dialog().textContent).toContain('Nothing else in the register refers to it.');
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Remove from the register' }));
    await until(() => session.notice?.text === 'Mr. Ulric Fenwhistle removed from the register.');
    expect((await store.listPeople()).map((p) => p.name)).toEqual(['Dr. Imre Calloway-Senn']);
  });
});
