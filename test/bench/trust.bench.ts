/**
 * Trust across desks: what a desk pays to read the register's endorsements and judge a key against
 * its own anchor (trust-store.ts, trust-list.ts), on a register file and, with
 * BEAMWARDEN_BENCH_PG set, on the institution register. A chain of ten keys (the anchor and nine
 * endorsed in turn, the longest an office is likely to have); the second desk reads it.
 * `npm run bench -- --only=trust`.
 */
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { openRecordStore, type RecordStore } from '../../electron/backend/records/index.js';
import { timeMedianAsync, type BenchEntry } from './registry.js';

const KEYS = 10;
const PASS = 'an invented passphrase for the bench';

async function chainOfKeys(store: RecordStore): Promise<string> {
  let endorser: string | null = null;
  let last = '';
  for (let i = 0; i < KEYS; i++) {
    const person = await store.createPerson({ name: `Invented officer ${i + 1}`, role: 'Laser safety officer' });
    const key = await store.createPersonKey({ personId: person.id, passphrase: PASS, passphraseAgain: PASS, ...(endorser ? { endorserPersonId: endorser, endorserPassphrase: PASS } : {}) });
    endorser = person.id;
    last = key.keyId;
  }
  return last;
}

async function measure(engine: string, path: string, dir: string): Promise<BenchEntry[]> {
  const a = await openRecordStore({ path, keyDir: join(dir, 'desk-A') });
  const b = await openRecordStore({ path, keyDir: join(dir, 'desk-B') });
  try {
    await chainOfKeys(a);
    await b.setTrustAnchor({ fingerprint: (await a.trustList()).anchor ?? '' });
    const info = await b.trustList();
    if (info.keys !== KEYS || info.problems.length) throw new Error(`desk B trusts ${info.keys} keys: ${info.problems.join(' ')}`);
    return [
      { name: `trust (${engine}): desk reads the register's endorsements and judges ${KEYS} keys in a chain (trust-list-info)`, median_ms: await timeMedianAsync(100, () => b.trustList()), runs: 100 },
      { name: `trust (${engine}): signing keys listed with their chains on another desk (${KEYS} keys)`, median_ms: await timeMedianAsync(100, () => b.listPersonKeys()), runs: 100 },
    ];
  } finally {
    await a.close();
    await b.close();
  }
}

export async function runTrustBench(): Promise<BenchEntry[]> {
  const dir = mkdtempSync(join(tmpdir(), 'bw-bench-trust-'));
  try {
    const out = await measure('SQLite', join(dir, 'register.sqlite'), dir);
    const address = process.env['BEAMWARDEN_BENCH_PG'] ?? '';
    if (address === '') {
      console.log('trust (PostgreSQL): not measured; set BEAMWARDEN_BENCH_PG=postgres://… to measure the institution register.');
      return out;
    }
    const schema = `bw_bench_${randomBytes(4).toString('hex')}`;
    const admin = new pg.Pool({ connectionString: address, max: 1 });
    try {
      await admin.query(`CREATE SCHEMA ${schema}`);
      const u = new URL(address);
      u.searchParams.set('options', `-c search_path=${schema}`);
      out.push(...(await measure('PostgreSQL', u.toString(), join(dir, 'pg'))));
    } finally {
      await admin.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`).catch(() => undefined);
      await admin.end();
    }
    return out;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
