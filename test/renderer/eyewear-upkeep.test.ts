/**
 * Eyewear upkeep on the Register (schema version 5): inspection date, condition and next inspection
 * are stored and shown; an inspection that is overdue or due within 30 days is reminded on the
 * Register; damaged or withdrawn eyewear is never offered as protection to a new assessment (EN 207
 * requires damaged filters to be taken out of use; the 30-day window matches assessment reviews,
 * common practice). Real handler table and SQLite store; invented demo room A0.07.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { installStoreBridge } from './store-bridge.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import RegisterScreen from '../../renderer/screens/RegisterScreen.svelte';
import { addDays, today } from '../../renderer/lib/dates.js';
import { session } from '../../renderer/lib/session.svelte.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  const { room, site } = await registerRoom(store);
  roomId = room.id;
  const [a, b, c] = await store.listEyewear(site.id);
  if (!a || !b || !c) throw new Error('demo eyewear missing');
  await store.updateEyewear(a.id, { inspectedOn: addDays(today(), -400), condition: 'good', nextInspection: addDays(today(), -35) });
  await store.updateEyewear(b.id, { inspectedOn: addDays(today(), -350), condition: 'worn', nextInspection: addDays(today(), 10) });
  await store.updateEyewear(c.id, { inspectedOn: today(), condition: 'damaged', nextInspection: null });
  installStoreBridge(store);
  await session.refreshOverview();
});
afterAll(async () => {
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

describe('eyewear upkeep', () => {
  it('reminds on the Register and lists overdue, due and damaged items under Due for review', async () => {
    const [a, b, c] = await store.listEyewear((await store.listSites())[0]!.id);
    render(RegisterScreen);
    const reminder = screen.getByTestId('eyewear-reminder').textContent ?? '';
    expect(reminder).toContain(`${c!.spec.id} (damaged)`);
    expect(reminder).toContain(`${a!.spec.id} (inspection overdue ${addDays(today(), -35)})`);
    expect(reminder).toContain(`${b!.spec.id} (inspection due ${addDays(today(), 10)})`);
    await fireEvent.click(screen.getByRole('tab', { name: /^Due for review/ }));
    const rows = within(screen.getByTestId('eyewear-due')).getAllByRole('row').slice(1).map((r) => r.textContent ?? '');
    expect(rows[0]).toMatch(/damaged.*replace/);
    expect(rows[1]).toMatch(/overdue/);
    expect(rows[2]).toMatch(/due soon/);
  });

  it('the shelf shows condition and inspection dates, and "Inspected today" fills them', async () => {
    render(RegisterScreen);
    await fireEvent.click(screen.getAllByRole('tab', { name: 'Eyewear shelf' }).at(-1)!);
    const cells = screen.getAllByTestId('upkeep').map((c) => c.textContent ?? '');
    expect(cells.some((x) => /worn.*inspection due/.test(x))).toBe(true);
    await fireEvent.click(screen.getAllByRole('button', { name: /^Edit EW-/ })[0]!);
    await fireEvent.click(screen.getByRole('button', { name: 'Inspected today, in order' }));
    expect((screen.getByLabelText('Last inspected') as HTMLInputElement).value).toBe(today());
    expect((screen.getByLabelText('Next inspection due') as HTMLInputElement).value).toBe(addDays(today(), 365));
  });

  it('damaged eyewear is not offered to a new assessment', async () => {
    const offered = (await store.roomInputFromRegister(roomId)).eyewear?.map((e) => e.id) ?? [];
    const damaged = (await store.listEyewear((await store.listSites())[0]!.id)).filter((e) => e.condition === 'damaged').map((e) => e.spec.id);
    expect(damaged).toHaveLength(1);
    for (const d of damaged) expect(offered).not.toContain(d);
  });
});
