/**
 * `npm run verify -- --all` over a register of several signed assessments, where the check reads
 * the database protections and the trust list once per run and parses a stored results text only
 * when it differs from the recomputed results' JSON text: a record changed outside Beamwarden
 * among intact ones is still caught, on its own line, in one thread and on worker threads; an
 * intact one beside it still passes. Issue 10's attack list (a dropped trigger and a rewritten
 * row, put back afterwards) applied to one assessment of the batch; a key whose trust the run
 * judges once fails on every assessment it signed when its endorsement is not a valid signature.
 * Real SQLite file, real keys; invented demo room A0.07 and invented people.
 */
import Database from 'better-sqlite3';
import { join } from 'node:path';
import { brotliCompressSync } from 'node:zlib';
import { afterEach, describe, expect, it } from 'vitest';
import { decodeResults, encodeResults } from '../../../electron/backend/records/assessments.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';
import type { RoomResult } from '../../../core/model/results.js';
import { runVerify } from '../../../electron/cli/verify.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir> | null = null;
afterEach(() => {
  t?.cleanup();
  t = null;
});

/** The CREATE TRIGGER text the migrations define for `name` (the tampering puts it back exactly). */
function triggerSql(name: string): string {
  let found = '';
  for (const m of MIGRATIONS) {
    const match = new RegExp(`CREATE TRIGGER ${name}\\b[\\s\\S]*?\\bEND;`).exec(m.sql);
    if (match) found = match[0];
  }
  if (!found) throw new Error(`no trigger ${name}`);
  return found;
}

/** Raw SQL as another SQLite tool would run it, with `triggers` dropped and put back afterwards. */
function tamper(dbPath: string, triggers: readonly string[], sql: (raw: Database.Database) => void): void {
  const raw = new Database(dbPath);
  try {
    for (const n of triggers) raw.exec(`DROP TRIGGER ${n}`);
    sql(raw);
    for (const n of triggers) raw.exec(triggerSql(n));
  } finally {
    raw.close();
  }
}

interface Batch {
  readonly dbPath: string;
  readonly keyDir: string;
  /** Assessment ids in order of creation: 0–3 signed by the officer (anchor key), 4–5 by a colleague whose key the officer endorsed. */
  readonly ids: readonly string[];
}

async function signedBatch(): Promise<Batch> {
  t = tempDir('bw-verify-batch-');
  const s = await openTemp(t.dir);
  const { room } = await registerRoom(s);
  const officer = await makeSigner(s);
  const colleague = await makeSigner(s, 'Dr. Petra Vangelis-Moor', officer);
  const ids: string[] = [];
  for (let i = 0; i < 6; i++) {
    const a = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
    await s.signAssessment(a.id, (i < 4 ? officer : colleague).signOff(STATEMENT));
    ids.push(a.id);
  }
  await s.close();
  return { dbPath: join(t.dir, 'records.sqlite'), keyDir: join(t.dir, 'keys'), ids };
}

interface Tampering {
  readonly name: string;
  readonly source: string;
  readonly act: (b: Batch) => void;
  /** Expected outcome per assessment of the batch (index as in Batch.ids) and the finding of each failure. */
  readonly failed: ReadonlyMap<number, RegExp>;
}

const RESULTS_CHANGED = /revision 1: Recomputing the stored inputs gives different results \(\d+ values\) with the same core version: the stored results were changed\./;
const NOT_TRUSTED = /revision 1: Key [0-9a-f ]+ is NOT trusted here/;

const CASES: readonly Tampering[] = [
  { name: 'nothing changed', source: 'control case', act: () => undefined, failed: new Map() },
  {
    name: "one assessment's stored results changed (a warning added to the first beam), fingerprint left",
    source: 'issue 10: a dropped trigger and a rewritten row',
    act: (b) =>
      tamper(b.dbPath, ['revision_signed_immutable'], (raw) => {
        const row = raw.prepare('SELECT id, results_z FROM revision WHERE assessment_id = ?').get(b.ids[1]) as { id: string; results_z: Buffer };
        const results = decodeResults(row.results_z) as RoomResult;
        const beam = results.beams[0];
        if (!beam) throw new Error('no beam');
        const changed = { ...results, beams: [{ ...beam, warnings: [...beam.warnings, 'No hazard in this room.'] }, ...results.beams.slice(1)] };
        raw.prepare('UPDATE revision SET results_z = ? WHERE id = ?').run(encodeResults(changed as RoomResult), row.id);
      }),
    failed: new Map([[1, RESULTS_CHANGED]]),
  },
  {
    name: "one assessment's inputs changed (first beam's power to 0.9 mW), results and fingerprint left",
    source: 'issue 10: a dropped trigger and a rewritten row (power 0.4 W to 0.9 mW)',
    act: (b) =>
      tamper(b.dbPath, ['revision_signed_immutable'], (raw) => {
        raw.prepare("UPDATE revision SET content_json = json_set(content_json, '$.input.lasers[0].beams[0].emission.power_W', 0.0009) WHERE assessment_id = ?").run(b.ids[2]);
      }),
    failed: new Map([[2, RESULTS_CHANGED]]),
  },
  {
    name: "one assessment's stored results rewritten with other key order and spacing, same values",
    source: 'canonical form (RFC 8785 ideas): the same values fingerprint alike; not a change of the record',
    act: (b) =>
      tamper(b.dbPath, ['revision_signed_immutable'], (raw) => {
        const row = raw.prepare('SELECT id, results_z FROM revision WHERE assessment_id = ?').get(b.ids[3]) as { id: string; results_z: Buffer };
        const results = decodeResults(row.results_z) as Record<string, unknown>;
        const reordered = Object.fromEntries(Object.entries(results).reverse());
        raw.prepare('UPDATE revision SET results_z = ? WHERE id = ?').run(brotliCompressSync(Buffer.from(JSON.stringify(reordered, null, 1), 'utf8')), row.id);
      }),
    failed: new Map(),
  },
  {
    name: "the colleague's endorsement no longer a valid signature: both of the colleague's assessments fail, the officer's pass",
    source: 'issue 10: keys admitted only by an endorsement signed by an already trusted key',
    act: (b) =>
      tamper(b.dbPath, ['trust_endorsement_no_update'], (raw) => {
        const e = raw.prepare("SELECT key_id, endorsement FROM trust_endorsement WHERE person_name = 'Dr. Petra Vangelis-Moor'").get() as { key_id: string; endorsement: string };
        const bytes = Buffer.from(e.endorsement, 'base64');
        bytes[0] = (bytes[0] ?? 0) ^ 1;
        raw.prepare('UPDATE trust_endorsement SET endorsement = ? WHERE key_id = ?').run(bytes.toString('base64'), e.key_id);
      }),
    failed: new Map([
      [4, NOT_TRUSTED],
      [5, NOT_TRUSTED],
    ]),
  },
];

describe('verify --all: a changed record among intact ones is caught on its own line', () => {
  describe.each([
    ['in one thread', '1'],
    ['on two worker threads', '2'],
  ] as const)('%s', (_n, workers) => {
    it.each(CASES.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
      const b = await signedBatch();
      c.act(b);
      const lines: string[] = [];
      const status = await runVerify(['--db', b.dbPath, '--key-dir', b.keyDir, '--all', '--workers', workers], (l) => lines.push(l));
      b.ids.forEach((id, i) => {
        const line = lines.find((l) => l.includes(id)) ?? '';
        const expected = c.failed.get(i);
        if (expected) {
          expect(line.startsWith('FAILED'), `${c.source}: ${line}`).toBe(true);
          expect(line).toMatch(expected);
        } else {
          expect(line.startsWith('ok'), `${c.source}: ${line}`).toBe(true);
        }
      });
      expect(status).toBe(c.failed.size > 0 ? 1 : 0);
      expect(lines.at(-1)).toBe(`6 assessment(s): ${6 - c.failed.size} ok, 0 not signed yet, ${c.failed.size} failed.`);
    });
  });
});
