/**
 * Countersigning on the Review screen's signature block (issue 10 item 7), on the real handler
 * table over a real SQLite store in a temporary folder (the desktop bridge is the in-process
 * dispatch, no database mock): the lab head chooses themself, gives their passphrase and
 * countersigns; the co-signature is listed with name, role and key. The revision's signer is not
 * offered. Invented people; demo room A0.07.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import type { RecordStore } from '../../electron/backend/records/index.js';
import CoSignatures from '../../renderer/components/review/CoSignatures.svelte';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let revisionId = '';
let officer: Awaited<ReturnType<typeof makeSigner>>;
let head: Awaited<ReturnType<typeof makeSigner>>;


beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  const { room } = await registerRoom(store);
  officer = await makeSigner(store, 'Dr. Imre Calloway-Senn');
  head = await makeSigner(store, 'Prof. Oona Brightwater-Hale');
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  await store.signAssessment(a.id, officer.signOff(STATEMENT));
  revisionId = (await store.getAssessment(a.id)).current.id;
  installStoreBridge(store);
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

describe('countersigning on the Review screen', () => {
  it('offers only other people with a trusted key, countersigns and lists the co-signature', async () => {
    render(CoSignatures, { props: { revisionId, mainSignerId: officer.person.id, people: await store.listPeople(), keys: await store.listPersonKeys() } });
    await until(() => screen.queryByTestId('no-co-signatures') !== null, 10000);
    const select = screen.getByLabelText('Co-signer') as HTMLSelectElement;
    const offered = [...select.options].map((o) => o.textContent ?? '');
    expect(offered.some((o) => o.includes('Brightwater-Hale'))).toBe(true);
    expect(offered.some((o) => o.includes('Calloway-Senn'))).toBe(false);
    await fireEvent.change(select, { target: { value: head.person.id } });
    await fireEvent.input(screen.getByLabelText("Passphrase of the co-signer's key"), { target: { value: head.passphrase } });
    await fireEvent.click(screen.getByRole('button', { name: 'Countersign' }));
    await until(() => screen.queryByTestId('co-signatures') !== null, 10000);
    const item = within(screen.getByTestId('co-signatures')).getByText('Prof. Oona Brightwater-Hale');
    expect(item.closest('li')?.textContent).toMatch(/Laser safety officer/);
    expect((await store.verify((await store.getRevision(revisionId)).assessmentId)).coSignatures.map((c) => c.ok)).toEqual([true]);
  });
});
