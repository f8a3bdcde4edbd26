/**
 * An assessment saved by an older version of Beamwarden names, above the workspace and review
 * screens, the defaults its calculation assumed for inputs added since; saving it with this
 * version confirms them and the note goes. Real handler table over a real SQLite store written as an
 * older build writes (calculatedWith beamwarden-core 0.1.0); invented demo room A0.07.
 * Default: no skin area = large-area skin limit not applied (limit specification 4.3).
 */
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { render, within } from '@testing-library/svelte';
import { installStoreBridge } from './store-bridge.js';
import AssumedDefaults from '../../renderer/components/safekeeping/AssumedDefaults.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import { openRecordStore } from '../../electron/backend/records/store.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import { registerRoom, tempDir } from '../backend/records/helpers.js';

let t: ReturnType<typeof tempDir>;
let older: RecordStore;
let current: RecordStore;
let roomId = '';

beforeAll(async () => {
  t = tempDir();
  const path = join(t.dir, 'records.sqlite');
  older = await openRecordStore({ path, keyDir: join(t.dir, 'keys'), calculatedWith: 'beamwarden-core 0.1.0' });
  roomId = (await registerRoom(older)).room.id;
  await older.createAssessment({ roomId, content: await older.newAssessmentContent(roomId) });
  await older.close();
  current = await openRecordStore({ path, keyDir: join(t.dir, 'keys') });
  installStoreBridge(current);
  await session.refreshOverview();
});
afterAll(async () => {
  delete window.beamwarden;
  await current.close();
  t.cleanup();
});

describe('defaults assumed for content from an older version', () => {
  it('are named above the screen until the officer saves with this version', async () => {
    await session.openRoom(roomId);
    const view = within(render(AssumedDefaults).container);
    const note = view.getByTestId('assumed-defaults').textContent ?? '';
    expect(note).toContain('Saved by an older version of Beamwarden.');
    expect(note).toMatch(/Irradiated skin area: not given, so the large-area skin limit .* is not applied .*saved by version 0\.1\.0 of the Beamwarden calculation/);
    expect(note).not.toMatch(/skinArea_m2|\[\d\]/);
    // a change and a save with this version: the defaults become the officer's own choice
    if (session.draft) session.draft.notes = 'checked after the update';
    expect(await session.save()).toBe(true);
    expect(view.queryByTestId('assumed-defaults')).toBeNull();
  });
});
