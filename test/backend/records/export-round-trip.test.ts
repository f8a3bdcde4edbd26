/**
 * Exports that always import back (issue 11, item 5). Before, a room reviewed 30 times exported
 * to 35.6 M characters: over the import limit (30 M) and the loopback host's request limit
 * (32 MiB). The file is now the same JSON document gzip-compressed (RFC 1952) and written one
 * revision at a time. A room with 20 lasers and 50 signed reviews goes out through the real host
 * over HTTP, into a fresh database through a second host, and out again byte for byte the same.
 * Lasers are invented (demo scenario); "derived: export then import is the identity".
 */
import { gunzipSync } from 'node:zlib';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ExportFile } from '../../../electron/api/contracts/exchange.js';
import { openRecordStore, type ImportSummary, type RecordStore, type Room } from '../../../electron/backend/records/index.js';
import { exportFileBytes } from '../../../electron/backend/records/export-file.js';
import { MAX_BODY_BYTES } from '../../../electron/host/server.js';
import { makeSigner, openTemp, scenario, STATEMENT, tempDir } from './helpers.js';
import { ENGINES } from './engines.js';
import { startTestHost } from './http-host.js';

const LASERS = 20;
const REVIEWS = 50;
const CLOCK = '2026-11-30T09:00:00.000Z';

let t: ReturnType<typeof tempDir>;
let source: RecordStore;
let room: Room;
beforeAll(async () => {
  t = tempDir('bw-export-');
  // One fixed clock for both databases, so that the export stamp is the same on both sides.
  source = await openRecordStore({ path: join(t.dir, 'source.sqlite'), keyDir: join(t.dir, 'keys'), now: () => CLOCK });
  const site = await source.createSite({ name: scenario.site.name });
  room = await source.createRoom({ siteId: site.id, code: 'B2.14', name: 'Ultrafast laboratory (invented)' });
  const pool = scenario.rooms.flatMap((r) => r.input.lasers);
  for (let i = 0; i < LASERS; i++) {
    const base = pool[i % pool.length];
    if (!base) throw new Error('demo lasers missing');
    const laser = { ...base, id: `l${i}`, name: `${base.name} #${i + 1}`, beams: base.beams.map((b, j) => ({ ...b, id: `l${i}-b${j}` })) };
    await source.createInstallation({ roomId: room.id, laser, serialNumber: `INV-${1000 + i}` });
  }
  const a = await source.createAssessment({ roomId: room.id, content: await source.newAssessmentContent(room.id) });
  const officer = await makeSigner(source);
  for (let n = 1; n <= REVIEWS; n++) {
    if (n > 1) {
      const cur = await source.getAssessment(a.id);
      await source.saveAssessment(a.id, { ...cur.current.content, notes: `Annual review ${n}: interlocks tested, eyewear inspected.` }, { revisionId: cur.current.id, version: cur.version });
    }
    await source.signAssessment(a.id, officer.signOff(STATEMENT)); // signed at CLOCK: the store's clock
  }
}, 600_000);
afterAll(async () => {
  await source.close();
  t.cleanup();
});

describe(`a room with ${LASERS} lasers and ${REVIEWS} signed reviews`, () => {
  it('the streamed file holds exactly the JSON document (compact), gzip-compressed', async () => {
    const doc = await source.exportRoom(room.id);
    const { gz, jsonBytes } = await exportFileBytes(doc);
    const json = gunzipSync(gz).toString('utf8');
    expect(json).toBe(JSON.stringify(doc));
    expect(jsonBytes).toBe(Buffer.byteLength(json));
    // The plain JSON is far beyond the old 30 M character import limit; the file is not.
    expect(json.length).toBeGreaterThan(30_000_000);
    expect(gz.length * 4 / 3).toBeLessThan(MAX_BODY_BYTES);
  }, 300_000);

  // The fresh database on either engine: the same file goes into the institution register.
  for (const engine of ENGINES)
  it.skipIf(engine.skip)(`exports through the host, imports into a fresh database (${engine.label}) through another host, and re-exports byte-identical`, async () => {
    const target = await openTemp(t.dir, `fresh-${engine.name}.sqlite`, engine, { keyDir: join(t.dir, `keys-2-${engine.name}`), now: () => CLOCK });
    const hostA = await startTestHost(source);
    const hostB = await startTestHost(target);
    try {
      const out = await hostA.ok<ExportFile>('export-json', { kind: 'room', id: room.id });
      expect(out.fileName).toMatch(/^beamwarden-room-B2\.14-2026-11-30\.json\.gz$/);
      const summary = await hostB.ok<ImportSummary>('import-json', { base64: out.base64 });
      expect(summary).toMatchObject({ rooms: 1, installations: LASERS, assessments: 1, revisions: REVIEWS, keptDrafts: [] });
      const again = await hostB.ok<ExportFile>('export-json', { kind: 'room', id: room.id });
      expect(Buffer.from(again.base64, 'base64').equals(Buffer.from(out.base64, 'base64'))).toBe(true);
      const a = (await target.listAssessments(room.id))[0];
      // Intact on arrival; the exporting site's key is not on this fresh installation's trust list,
      // so the signature stays unverified until an officer admits that key.
      expect(await target.verify(a?.id ?? '')).toMatchObject({ signatureValid: true, fingerprintMatches: true, resultsMatchCore: true, chainIntact: true, keyTrusted: false });
      expect(summary).toMatchObject({ unverified: REVIEWS });
    } finally {
      await hostA.close();
      await hostB.close();
      await target.close();
    }
  }, 300_000);
});
