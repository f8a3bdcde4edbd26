// @vitest-environment node
/**
 * Reprinting any revision (issue: printed documents an auditor accepts). Through the API's
 * 'document-render' handler on a real record store: a signed revision printed again after a new
 * draft exists gives the same text as its first print, with its fingerprint and no DRAFT mark; the
 * new draft prints DRAFT. derived: a signed record is fixed; its paper must not change.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { documentTable } from '../../../electron/api/handlers/documents.js';
import type { ApiContext } from '../../../electron/api/context.js';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import { pageTexts } from './pdf-tools.js';
import { makeSigner } from '../records/helpers.js';
import { DEMO_PASSPHRASE } from '../../../electron/backend/records/demo.js';

let dir = '';
let store: RecordStore;
let ctx: ApiContext;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'bw-reprint-'));
  store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
  await store.seedDemo();
  ctx = { shell: 'loopback', version: 'test', databasePath: join(dir, 'demo.sqlite'), store };
});

afterAll(async () => {
  await store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

async function print(kind: 'report' | 'door-notice' | 'eyewear-sheet', assessmentId: string, revisionId?: string): Promise<{ fileName: string; pages: string[] }> {
  const req = { kind, assessmentId, ...(revisionId === undefined ? {} : { revisionId }), paper: 'A4' as const, units: 'SI' as const };
  const file = await documentTable['document-render'].run(documentTable['document-render'].input.parse(req), ctx);
  return { fileName: file.fileName, pages: pageTexts(Buffer.from(file.base64, 'base64')) };
}

describe('a signed revision reprints exactly as signed after a new draft exists', () => {
  it('report, door notice and eyewear sheet: same text as the first print; the new draft prints DRAFT', async () => {
    const site = (await store.listSites())[0];
    if (!site) throw new Error('demo site missing');
    const room = (await store.listRooms(site.id)).find((r) => r.code === 'C1.03');
    const id = room ? (await store.listAssessments(room.id))[0]?.id : undefined;
    if (!id) throw new Error('demo assessment C1.03 missing');
    // The signer holds their own key (personal keys, sealed with their passphrase).
    // The demo seed made the demo officer this installation's anchor; the officer endorses the new key.
    const officer = (await store.listPeople()).find((p) => p.role === 'Laser safety officer');
    if (!officer) throw new Error('demo officer missing');
    const signer = await makeSigner(store, 'Dr. Reprint Tester', { person: officer, passphrase: DEMO_PASSPHRASE });
    if ((await store.getAssessment(id)).current.status === 'draft') await store.signAssessment(id, signer.signOff('Approved (reprint test).'));
    const signed = (await store.getAssessment(id)).current;
    expect(signed.status).toBe('signed');
    const fingerprint = signed.signature?.fingerprint ?? '';

    const kinds = ['report', 'door-notice', 'eyewear-sheet'] as const;
    const first = await Promise.all(kinds.map((k) => print(k, id)));

    await store.saveAssessment(id, { ...signed.content, notes: `${signed.content.notes} Changed after signing.` });
    const draft = (await store.getAssessment(id)).current;
    expect(draft.status).toBe('draft');
    expect(draft.id).not.toBe(signed.id);

    const again = await Promise.all(kinds.map((k) => print(k, id, signed.id)));
    kinds.forEach((k, i) => {
      expect(again[i]?.pages, k).toEqual(first[i]?.pages);
      expect(again[i]?.fileName, k).toMatch(/-signed\.pdf$/);
      const text = (again[i]?.pages ?? []).join(' ');
      expect(text, k).not.toMatch(/\bDRAFT\b/);
      expect(text.replace(/\s/g, ''), k).toContain(fingerprint.slice(0, 4));
    });
    const newDraft = await print('door-notice', id);
    expect(newDraft.fileName).toMatch(/-DRAFT\.pdf$/);
    expect(newDraft.pages.join(' ')).toMatch(/\bDRAFT\b/);
  }, 180_000);
});

describe('door notices of every room of a site in one PDF', () => {
  it('one page per room, each room on its own page, DRAFT only where the room is a draft', async () => {
    const site = (await store.listSites())[0];
    if (!site) throw new Error('demo site missing');
    const req = documentTable['document-render-site'].input.parse({ kind: 'door-notice', siteId: site.id, paper: 'Letter', units: 'SI' });
    const file = await documentTable['document-render-site'].run(req, ctx);
    const pages = pageTexts(Buffer.from(file.base64, 'base64'));
    const rooms = [];
    for (const r of await store.listRooms(site.id)) if ((await store.listAssessments(r.id)).length > 0) rooms.push(r);
    expect(pages).toHaveLength(rooms.length);
    for (const [i, r] of rooms.entries()) {
      expect(pages[i], r.code).toContain(`${r.code} —`);
      const a = (await store.listAssessments(r.id))[0];
      const draft = a !== undefined && (await store.getAssessment(a.id)).current.status === 'draft';
      expect(/\bDRAFT\b/.test(pages[i] ?? ''), `${r.code} draft mark`).toBe(draft);
    }
  }, 180_000);
});
