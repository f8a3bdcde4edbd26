/**
 * The invented demo site (assets/demo/demo-scenario.json) in a real SQLite register of its own, for
 * the document tests that read the demo rooms' printed pages: opened before the file's tests, closed
 * and removed after them. Real record store, no mocks.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import { documentInputFromAssessment } from '../../../electron/backend/pdf/index.js';

export interface DemoRegister {
  /** The open store (set once the file's set-up has run). */
  readonly store: RecordStore;
  /** The document input of a demo room's first assessment, by the room's code ("B2.16"). */
  documentOf(code: string): ReturnType<typeof documentInputFromAssessment>;
}

/** Seeds the demo site before the calling file's tests and removes it after them. */
export function useDemoRegister(tempPrefix: string): DemoRegister {
  let dir = '';
  let store: RecordStore | undefined;
  const assessmentOf = new Map<string, string>();

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), tempPrefix));
    store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
    const site = await store.seedDemo();
    for (const room of await store.listRooms(site.id)) {
      const id = (await store.listAssessments(room.id))[0]?.id;
      if (id !== undefined) assessmentOf.set(room.code, id);
    }
  }, 120_000);

  afterAll(async () => {
    await store?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  return {
    get store(): RecordStore {
      if (store === undefined) throw new Error('the demo register is opened by the file set-up (beforeAll)');
      return store;
    },
    documentOf(code: string) {
      const id = assessmentOf.get(code);
      if (id === undefined) throw new Error(`demo room ${code} missing`);
      return documentInputFromAssessment(this.store, id);
    },
  };
}
