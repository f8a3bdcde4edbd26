/**
 * Settings & about shows where the records are AND when and where they were last backed up
 * (issue 14 item 10), on the real handler table over a real SQLite store in a temporary folder
 * (the desktop bridge is the in-process dispatch, no database mock). Common practice: an officer
 * checks that the records have a recent copy before relying on them.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import type { RecordStore } from '../../electron/backend/records/index.js';
import AboutPanel from '../../renderer/components/AboutPanel.svelte';
import { openTemp, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';
import { ENGINES } from '../backend/records/engines.js';
import { invoke } from '../../renderer/lib/api.js';
import { session } from '../../renderer/lib/session.svelte.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;


beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  installStoreBridge(store);
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

describe('Settings & about: the last backup, when and where', () => {
  it('says "never" before the first backup', async () => {
    const view = render(AboutPanel);
    await view.component.open();
    await until(() => screen.queryByTestId('last-backup') !== null && /never/.test(screen.getByTestId('last-backup').textContent ?? ''));
    expect(screen.getByTestId('last-backup').textContent).toMatch(/Last backup:\s*never/);
    view.unmount();
  });

  it('after "Back up now" it names the day and the backup file', async () => {
    const report = await store.backupInto();
    const view = render(AboutPanel);
    await view.component.open();
    await until(() => /today/.test(screen.queryByTestId('last-backup')?.textContent ?? ''));
    const text = screen.getByTestId('last-backup').textContent ?? '';
    expect(text).toMatch(/Last backup:\s*today \(\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC\)/);
    expect(text).toContain(report.path);
    view.unmount();
  });
});

describe.skipIf(ENGINES[1]?.skip ?? true)(`Settings & about on an institution register (${ENGINES[1]?.label ?? ''})`, () => {
  it('names the register on the server and its backups there, with no file, folder or backup date of this desk', async () => {
    const t2 = tempDir();
    const server = await openTemp(t2.dir, 'about-server.sqlite', ENGINES[1]);
    try {
      installStoreBridge(server);
      session.info = await invoke('app-info', {});
      const view = render(AboutPanel);
      await view.component.open();
      await until(() => screen.queryByTestId('server-backups') !== null);
      expect(screen.getByTestId('data-location').textContent).toMatch(/^postgresql:\/\//);
      expect(screen.getByTestId('data-location').textContent).not.toMatch(/:[^@/]*@/); // no password shown
      expect(screen.getByTestId('server-backups').textContent).toMatch(/server's own backups/);
      expect(screen.queryByTestId('last-backup')).toBeNull();
      expect(screen.queryByRole('button', { name: /Open the folder|Copy the path/ })).toBeNull();
      view.unmount();
    } finally {
      session.info = null;
      installStoreBridge(store);
      await server.close();
      t2.cleanup();
    }
  });
});
