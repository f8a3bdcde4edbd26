/**
 * Two windows on one database (issue 11, item 4): this window's Register form was opened before
 * another window (a second store on the same SQLite file) changed the same entry. Saving is
 * refused in officer words — what the other person changed, that nothing was overwritten — with a
 * way to reload; after reloading the form shows the stored values and the edit goes through.
 * Signing likewise names the revision shown in the confirm step. Real handler table over a real
 * store (test/renderer/store-bridge.ts); invented demo room A0.07.
 * Source for every case: derived: optimistic concurrency (a write names the version it read).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { join } from 'node:path';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import RegisterScreen from '../../renderer/screens/RegisterScreen.svelte';
import ReviewScreen from '../../renderer/screens/ReviewScreen.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { makeSigner, openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';

let t: ReturnType<typeof tempDir>;
let mine: RecordStore;
let other: RecordStore;
let roomId = '';


beforeAll(async () => {
  t = tempDir();
  mine = await openTemp(t.dir);
  other = await openTemp(t.dir); // the other window, same file
  expect(other.info.path).toBe(join(t.dir, 'records.sqlite'));
  const { room } = await registerRoom(mine);
  roomId = room.id;
  await mine.createPerson({ name: 'Ada Quillfeather', role: 'Deputy LSO' });
  installStoreBridge(mine);
  await session.refreshOverview();
});
afterAll(async () => {
  delete window.beamwarden;
  await mine.close();
  await other.close();
  t.cleanup();
});

describe('a Register form opened before someone else saved the same entry', () => {
  it('room: refused with what changed, then reloaded with the stored values and saved', async () => {
    render(RegisterScreen);
    await fireEvent.click(screen.getByRole('button', { name: /A0\.07/ }));
    const contact = screen.getByLabelText('Contact') as HTMLInputElement;
    // the other window changes the room's responsible person meanwhile
    await other.updateRoom(roomId, { responsiblePerson: 'Dr. Imre Calloway-Senn' });
    await fireEvent.input(contact, { target: { value: 'ext. 4471' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Save room' }));
    await until(() => screen.queryByTestId('register-stale') !== null);
    const said = screen.getByTestId('register-stale').textContent ?? '';
    expect(said).toMatch(/Not saved\. Room A0\.07 was changed by someone else since you opened it: responsible person .* → "Dr\. Imre Calloway-Senn"/);
    expect(said).toContain('nothing was overwritten');
    expect(said).not.toMatch(/responsiblePerson|updated_at|\bstale\b/);
    expect((await mine.getRoom(roomId)).contact).toBe('');
    await fireEvent.click(screen.getByRole('button', { name: 'Reload the register' }));
    await until(() => screen.queryByTestId('register-stale') === null);
    expect((screen.getByLabelText('Responsible person') as HTMLInputElement).value).toBe('Dr. Imre Calloway-Senn');
    await fireEvent.input(screen.getByLabelText('Contact'), { target: { value: 'ext. 4471' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Save room' }));
    await until(async () => (await mine.getRoom(roomId)).contact === 'ext. 4471' && !session.busy);
    expect((await mine.getRoom(roomId)).responsiblePerson).toBe('Dr. Imre Calloway-Senn');
    // a second save from the same form names the version its own first save made
    await fireEvent.input(screen.getByLabelText('Contact'), { target: { value: 'ext. 4472' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Save room' }));
    await until(async () => (await mine.getRoom(roomId)).contact === 'ext. 4472');
    expect(screen.queryByTestId('register-stale')).toBeNull();
  });

  it('person: the edit of someone another window renamed is refused, naming the change', async () => {
    const { container } = render(RegisterScreen);
    const view = within(container);
    await fireEvent.click(view.getByRole('tab', { name: 'People' }));
    await fireEvent.click(view.getByRole('button', { name: 'Edit Ada Quillfeather' }));
    const person = (await mine.listPeople()).find((p) => p.name === 'Ada Quillfeather');
    if (!person) throw new Error('person');
    await other.updatePerson(person.id, { role: 'Laser safety officer' });
    const phone = container.querySelector(`#pe-${person.id}-phone`) as HTMLInputElement;
    await fireEvent.input(phone, { target: { value: '0123 4567' } });
    await fireEvent.submit(phone.closest('form')!);
    await until(() => view.queryByTestId('register-stale') !== null);
    expect(view.getByTestId('register-stale').textContent).toMatch(/Ada Quillfeather was changed by someone else since you opened it: role "Deputy LSO" → "Laser safety officer"/);
    expect((await mine.getPerson(person.id)).phone).toBe('');
  });
});

describe('signing what was reviewed', () => {
  it('a draft saved by the other window after the confirm step is not signed; reloading leads back to review', async () => {
    await makeSigner(mine);
    const made = await mine.createAssessment({ roomId, content: await mine.newAssessmentContent(roomId) });
    await session.refreshOverview();
    await session.openRoom(roomId, made.id);
    render(ReviewScreen);
    await until(() => (screen.queryByLabelText('Signer') as HTMLSelectElement | null)?.options.length === 2);
    // the only trusted signer is chosen already
    await until(() => (screen.getByLabelText('Signer') as HTMLSelectElement).selectedIndex === 1);
    await fireEvent.input(screen.getByLabelText('Passphrase of the signing key'), { target: { value: 'correct horse battery staple' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Review what is signed…' }));
    const confirm = screen.getByTestId('sign-confirm');
    // the other officer saves the draft while this one reads the confirm step
    const inOther = await other.getAssessment(made.id);
    await other.saveAssessment(made.id, { ...inOther.current.content, notes: 'curtain replaced' }, { revisionId: inOther.current.id, version: inOther.version });
    await fireEvent.click(within(confirm).getByRole('button', { name: /^Sign revision 1/ }));
    await until(() => screen.queryByTestId('sign-stale') !== null);
    expect(screen.getByTestId('sign-stale').textContent).toMatch(/Not signed\..*changed by someone else since you opened it: saved as revision 1 at \d\d:\d\d\. Nothing was signed/);
    expect((await mine.getAssessment(made.id)).current.status).toBe('draft');
    await fireEvent.click(screen.getByRole('button', { name: 'Reload and review again' }));
    await until(() => session.assessment?.current.content.notes === 'curtain replaced');
    expect(screen.queryByTestId('sign-stale')).toBeNull();
  });
});
