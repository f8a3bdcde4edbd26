/**
 * Closing the window with unsaved changes. In a browser (loopback host) a prevented unload brings
 * the browser's own leave-page question; the desktop shell shows none and keeps the window open
 * without a word (Electron documents that a prevented unload cancels the close silently unless the
 * main process handles 'will-prevent-unload'; from memory), so there the app asks in its own
 * dialog, lists the changes, and closes the window only on "Discard changes and close". Real
 * handler table over a real SQLite store; invented demo room A0.07.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, screen, within } from '@testing-library/svelte';
import type { RecordStore } from '../../electron/backend/records/index.js';
import { session } from '../../renderer/lib/session.svelte.js';
import { guardUnload } from '../../renderer/lib/closing.js';
import { cancelOpenChoices } from '../../renderer/lib/confirm-choice.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;

beforeAll(async () => {
  t = tempDir('bw-closing-');
  store = await openTemp(t.dir);
  installStoreBridge(store);
  const { room } = await registerRoom(store, 'A0.07');
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  await session.refreshOverview();
  await session.openRoom(room.id, a.id);
});
afterAll(async () => {
  cancelOpenChoices();
  session.draft = null;
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

const unload = () => new Event('beforeunload', { cancelable: true });
const shown = () => screen.queryByRole('alertdialog') !== null;

describe('closing the window', () => {
  it('with nothing unsaved: closes without a question', () => {
    const e = unload();
    guardUnload(e, 'electron', () => undefined);
    expect(e.defaultPrevented).toBe(false);
    expect(shown()).toBe(false);
  });

  it('in a browser with unsaved changes: the unload is held for the browser\'s own question, and the app adds none', async () => {
    if (session.draft) session.draft.notes = 'Fibre ends capped when not in use.';
    const e = unload();
    guardUnload(e, 'loopback', () => undefined);
    expect(e.defaultPrevented).toBe(true);
    await new Promise((r) => setTimeout(r, 50));
    expect(shown()).toBe(false);
  });

  it('in the desktop shell with unsaved changes: the app asks, Keep editing keeps the window, the named action closes it', async () => {
    let closed = 0;
    const e = unload();
    guardUnload(e, 'electron', () => closed++);
    expect(e.defaultPrevented).toBe(true);
    await until(shown);
    const d = within(screen.getByRole('alertdialog'));
    expect(d.getByRole('heading').textContent).toBe('Close Beamwarden and discard the unsaved changes?');
    expect(d.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['Notes']);
    await fireEvent.click(d.getByRole('button', { name: 'Keep editing' }));
    await until(() => !shown());
    expect(closed).toBe(0);

    guardUnload(unload(), 'electron', () => closed++);
    await until(shown);
    await fireEvent.click(within(screen.getByRole('alertdialog')).getByRole('button', { name: 'Discard changes and close' }));
    await until(() => closed === 1);
    // the close that follows is let through
    const again = unload();
    guardUnload(again, 'electron', () => closed++);
    expect(again.defaultPrevented).toBe(false);
  });
});
