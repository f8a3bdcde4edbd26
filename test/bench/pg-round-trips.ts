/**
 * Round trips of one list and one save on the institution register (not part of `npm test` or the
 * bench; a profile to read): every statement the store sends to the server is counted and printed
 * in order, for `listAssessments` of a room with 20 assessments and a notes-only `saveAssessment`.
 *   BEAMWARDEN_TEST_PG=postgres://… tsx test/bench/pg-round-trips.ts
 * Works in a schema of its own and drops it afterwards.
 */
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { openRecordStore } from '../../electron/backend/records/index.js';
import demo from '../../assets/demo/demo-scenario.json' with { type: 'json' };
import { DemoScenarioSchema } from '../../electron/backend/records/demo.js';

const address = process.env['BEAMWARDEN_TEST_PG'] ?? '';
if (address === '') throw new Error('set BEAMWARDEN_TEST_PG');

const sent: string[] = [];
let counting = false;
const original = pg.Client.prototype.query;
// Every statement through any client of the pool (the store's port and its transactions).
pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
  if (counting) {
    const first = args[0];
    const text = typeof first === 'string' ? first : typeof first === 'object' && first !== null && 'text' in first ? String((first as { text: unknown }).text) : '?';
    sent.push(text.replace(/\s+/g, ' ').slice(0, 140));
  }
  return (original as (...a: unknown[]) => unknown).apply(this, args);
} as typeof pg.Client.prototype.query;

async function profile(what: string, fn: () => Promise<unknown>): Promise<void> {
  for (let i = 0; i < 3; i++) await fn(); // warm: prepared plans, caches
  sent.length = 0;
  counting = true;
  const t0 = performance.now();
  await fn();
  const ms = performance.now() - t0;
  counting = false;
  console.log(`\n${what}: ${sent.length} statements, ${ms.toFixed(1)} ms`);
  for (const s of sent) console.log(`  ${s}`);
}

const dir = mkdtempSync(join(tmpdir(), 'bw-pg-round-trips-'));
const schema = `bw_prof_${randomBytes(4).toString('hex')}`;
const admin = new pg.Client({ connectionString: address });
await admin.connect();
try {
  await admin.query(`CREATE SCHEMA ${schema}`);
  const u = new URL(address);
  u.searchParams.set('options', `-c search_path=${schema}`);
  const store = await openRecordStore({ path: u.toString(), keyDir: join(dir, 'keys') });
  try {
    // Invented demo room A0.07 (the project's demo scenario), as the records tests register it.
    const scenario = DemoScenarioSchema.parse(demo);
    const r = scenario.rooms.find((x) => x.code === 'A0.07');
    if (!r) throw new Error('no demo room A0.07');
    const site = await store.createSite({ name: scenario.site.name, building: scenario.site.building });
    const room = await store.createRoom({ siteId: site.id, code: r.code, name: r.name, responsiblePerson: r.responsible });
    for (const laser of r.input.lasers) await store.createInstallation({ roomId: room.id, laser, laserType: laser.name });
    const content = await store.newAssessmentContent(room.id);
    let last = await store.createAssessment({ roomId: room.id, content });
    for (let i = 1; i < 20; i++) last = await store.createAssessment({ roomId: room.id, content: { ...content, title: `${content.title} ${i}` } });
    await profile('list a room\'s assessments (20 rows)', () => store.listAssessments(room.id));
    let a = last;
    let n = 0;
    await profile('save one assessment (notes edited, version checked)', async () => {
      a = await store.saveAssessment(a.id, { ...a.current.content, notes: `edited ${n++}` }, { revisionId: a.current.id, version: a.version });
    });
  } finally {
    await store.close();
  }
} finally {
  await admin.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  await admin.end();
  rmSync(dir, { recursive: true, force: true });
}
