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
