/**
 * Shared set-up for the record-store tests: real SQLite files in fresh temporary folders (no mocks),
 * and a small register built from the invented demo site (assets/demo/demo-scenario.json). The
 * records tests check storage, signing and exchange — not physics, so invented inputs are fine.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import demo from '../../../assets/demo/demo-scenario.json' with { type: 'json' };
import { DemoScenarioSchema } from '../../../electron/backend/records/demo.js';
import { openRecordStore, type RecordStore, type Room, type Site } from '../../../electron/backend/records/index.js';
import type { InternalOpenOptions } from '../../../electron/backend/records/store.js';
import { DEFAULT_ENGINE, pgAddress, pgSnapshot, schemaFor, type TestEngine } from './engines.js';

export const scenario = DemoScenarioSchema.parse(demo);

export function tempDir(prefix = 'bw-records-'): { dir: string; cleanup: () => void } {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  return { dir, cleanup: () => rmSync(dir, { recursive: true, force: true }) };
}

/**
 * A database in `dir`; each database name is its own installation (own trust list and signing log).
 * On PostgreSQL the "file" `dir/name` is a schema of the test database (engines.ts): opening the
 * same name twice opens the same register, as two hosts would.
 */
export async function openTemp(dir: string, name = 'records.sqlite', engine: TestEngine | undefined = DEFAULT_ENGINE, extra: Omit<InternalOpenOptions, 'path'> = {}): Promise<RecordStore> {
  const keyDir = join(dir, name === 'records.sqlite' ? 'keys' : `keys-${name}`);
  if (engine?.name === 'postgresql') return openRecordStore({ keyDir, ...extra, path: await pgAddress(schemaFor(dir, name)) });
  return openRecordStore({ keyDir, ...extra, path: join(dir, name) });
}

/** `snapshot` of the database `dir/name` on either engine. */
export function snapshotOn(engine: TestEngine, dir: string, name = 'records.sqlite'): Promise<string> {
  return engine.name === 'postgresql' ? pgSnapshot(schemaFor(dir, name)) : Promise.resolve(snapshot(join(dir, name)));
}

/** Demo room by code (invented), e.g. A0.07 telecom bench: two lasers, fast to evaluate. */
export function demoRoom(code: string) {
  const r = scenario.rooms.find((x) => x.code === code);
  if (!r) throw new Error(`no demo room ${code}`);
  return r;
}

/** A site with one room registered from the demo scenario, its lasers and the site eyewear. */
export async function registerRoom(store: RecordStore, code = 'A0.07'): Promise<{ site: Site; room: Room }> {
  const r = demoRoom(code);
  const site = await store.createSite({ name: scenario.site.name, building: scenario.site.building });
  const room = await store.createRoom({ siteId: site.id, code: r.code, name: r.name, responsiblePerson: r.responsible });
  for (const laser of r.input.lasers) await store.createInstallation({ roomId: room.id, laser, laserType: laser.name });
  for (const spec of scenario.eyewear) await store.createEyewear({ siteId: site.id, spec });
  return { site, room };
}

/** Every row of every table of a database file, for "nothing changed" checks (raw SQL, read-only). */
export function snapshot(path: string): string {
  const db = new Database(path, { readonly: true });
  try {
    const tables = (db.prepare("SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name").all() as Array<{ name: string }>).map((t) => t.name);
    const out: Record<string, unknown[]> = {};
    for (const t of tables) {
      // Table names come from sqlite_schema itself; they cannot be bound as parameters.
      out[t] = db.prepare(`SELECT * FROM "${t.replace(/"/g, '""')}" ORDER BY rowid`).all().map((row) =>
        Object.fromEntries(Object.entries(row as Record<string, unknown>).map(([k, v]) => [k, Buffer.isBuffer(v) ? v.toString('base64') : v])),
      );
    }
    return JSON.stringify(out);
  } finally {
    db.close();
  }
}

export const STATEMENT = 'I have evaluated the laser hazards of this area with the inputs and assumptions recorded here and approve the controls listed.';

/** A test passphrase (invented); real keys, sealed with scrypt + AES-256-GCM like the officer's. */
export const PASSPHRASE = 'correct horse battery staple';

/**
 * A person with their own signing key in `store`. The first key of an installation becomes its
 * trust anchor; later ones are endorsed by `endorser` (a signer made before).
 */
const firstSigner = new WeakMap<RecordStore, { person: { id: string }; passphrase: string }>();
export async function makeSigner(
  store: RecordStore,
  name = 'Dr. Imre Calloway-Senn',
  endorserGiven?: { person: { id: string }; passphrase: string },
  passphrase = PASSPHRASE,
) {
  const endorser = endorserGiven ?? firstSigner.get(store);
  const person = await store.createPerson({ name, role: 'Laser safety officer' });
  const key = await store.createPersonKey({
    personId: person.id,
    passphrase,
    passphraseAgain: passphrase,
    ...(endorser ? { endorserPersonId: endorser.person.id, endorserPassphrase: endorser.passphrase } : {}),
  });
  if (!firstSigner.has(store)) firstSigner.set(store, { person, passphrase });
  return { person, key, passphrase, signOff: (statement = STATEMENT) => ({ personId: person.id, passphrase, statement }) };
}
