// The register lists a room's lasers in the order they were registered, even when several share a
// timestamp (a CSV import or the demo seeding writes them within one millisecond). An officer
// comparing the screen, the report and the door notice must see the same order every time.
import { afterEach, describe, expect, it } from 'vitest';
import { openTemp, registerRoom, scenario, tempDir } from './helpers.js';

const cleanups: Array<() => void> = [];
afterEach(() => cleanups.splice(0).forEach((c) => c()));

describe('register order (ours: registration order)', () => {
  it.each(scenario.rooms.map((r) => [r.code, r.input.lasers.map((l) => l.name)] as const))(
    'room %s lists its lasers as registered',
    async (code, names) => {
      const { dir, cleanup } = tempDir();
      cleanups.push(cleanup);
      const store = await openTemp(dir);
      try {
        const { room } = await registerRoom(store, code);
        for (let i = 0; i < 5; i++) expect((await store.listInstallations(room.id)).map((l) => l.laser.name)).toEqual(names);
      } finally {
        await store.close();
      }
    },
  );
});
