/**
 * The desktop app's start-up error box for an institution register that cannot be opened, read
 * from the function main.ts shows it with (Electron's binary is not needed), against the real
 * PostgreSQL server (BEAMWARDEN_TEST_PG, set by .ci/run): each failure in the officer's words,
 * never the password, never a developer message, and never a local file opened instead.
 * SQLSTATE codes: PostgreSQL 15 documentation, Appendix A; the refused connection is the
 * operating system's ECONNREFUSED (nothing listens on port 1).
 */
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore, REGISTER_SETTING_FILE, saveRegisterSetting } from '../../electron/backend/records/index.js';
import { openAtStart, START_ERROR_TITLE } from '../../electron/main/open-at-start.js';
import { adminQuery, PG_ADDRESS, PG_SKIP_REASON, pgAddress } from '../backend/records/engines.js';

const skip = PG_ADDRESS === '';
const PASSWORD = skip ? '' : decodeURIComponent(new URL(PG_ADDRESS).password);

describe.skipIf(skip)(`start-up error box for an institution register${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  const owner = skip ? '' : decodeURIComponent(new URL(PG_ADDRESS).username);
  const suffix = randomBytes(4).toString('hex');
  const setUp = `t_start_ok_${suffix}`;
  const empty = `t_start_empty_${suffix}`;
  const stranger = `${owner}_stranger_${suffix}`;
  const strangerPassword = randomBytes(12).toString('hex');
  let dir: string;

  /** `schema`'s address as `user` with `password`. */
  async function as(schema: string, user: string, password: string): Promise<string> {
    const u = new URL(await pgAddress(schema));
    u.username = user;
    u.password = password;
    return u.toString();
  }

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'bw-start-box-'));
    // A register set up by its owner, and an account that may log in but holds neither group role.
    const s = await openRecordStore({ path: await pgAddress(setUp), keyDir: dir });
    await s.close();
    await adminQuery(setUp, `CREATE ROLE ${stranger} LOGIN PASSWORD '${strangerPassword}'`);
    await pgAddress(empty);
    await adminQuery(empty, `GRANT USAGE ON SCHEMA ${empty} TO ${stranger}`);
  });
  afterAll(async () => {
    for (const schema of [setUp, empty]) await adminQuery(schema, `DROP SCHEMA IF EXISTS ${schema} CASCADE`);
    await adminQuery(setUp, `DROP ROLE IF EXISTS ${stranger}`);
    rmSync(dir, { recursive: true, force: true });
  });

  const wrong = (change: (u: URL) => void) => async (): Promise<string> => {
    const u = new URL(await pgAddress(setUp));
    change(u);
    return u.toString();
  };
  const cases: Array<[string, () => Promise<string>, RegExp]> = [
    ['connection refused (nothing listens on the port)', wrong((u) => (u.port = '1')), /^Cannot reach the institution register at postgresql:\/\/\S+@127\.0\.0\.1:1\/\S+: the server refused the connection \(is PostgreSQL running and listening on that port\?\)\./],
    ['wrong password', wrong((u) => (u.password = 'not-the-password')), /^The institution register at \S+ refused the login: wrong user name or password/],
    ['no such database', wrong((u) => (u.pathname = '/bw_no_such_register')), /^The institution register at \S+ does not exist on that server \(no such database\)/],
    ['missing rights (an account in neither group role)', () => as(setUp, stranger, strangerPassword), /^The institution register at \S+ is there, but your account \S+ has no rights on it: it is in neither group role of the register \(beamwarden_officer to write, beamwarden_reader to read\)\. Ask the register's administrator to add your account to one of them/],
    ['unmigrated database (not set up, and the account may not set it up)', () => as(empty, stranger, strangerPassword), /is not set up for this Beamwarden build \(schema version 0, this build needs \d+\), and your account \S+ may not change its tables/],
  ];

  it.each(cases)('--db: %s', async (_name, address, said) => {
    const desk = mkdtempSync(join(dir, 'desk-'));
    const started = await openAtStart({ argv: ['electron', '.', '--db', await address()], env: undefined, settingsDir: desk, keyDir: desk });
    expect(started.ok).toBe(false);
    if (started.ok) return;
    expect(started.title).toBe(START_ERROR_TITLE);
    expect(started.message).toMatch(said);
    expect(started.message).toMatch(/Beamwarden did not open a local file instead\.|may not change its tables/);
    expect(started.message).not.toContain('not-the-password');
    // The address is shown without its password (here the password may equal the account name).
    expect(started.message).not.toContain(`:${PASSWORD}@`);
    expect(started.message).not.toContain(strangerPassword);
    expect(started.message).not.toMatch(/\bat (?:async )?\w+ \(|ECONNREFUSED|SQLSTATE|pg_|relation "/);
    expect(readdirSync(desk)).toEqual([]);
  });

  it('the saved setting and BEAMWARDEN_DB take the same words (the refused connection)', async () => {
    const address = await wrong((u) => (u.port = '1'))();
    const desk = mkdtempSync(join(dir, 'desk-'));
    const fromEnv = await openAtStart({ argv: ['electron', '.'], env: address, settingsDir: desk, keyDir: desk });
    expect(fromEnv.ok ? '' : fromEnv.message).toMatch(/refused the connection/);
    const u = new URL(address);
    u.password = '';
    saveRegisterSetting(desk, u.toString());
    const fromSetting = await openAtStart({ argv: ['electron', '.'], env: undefined, settingsDir: desk, keyDir: desk });
    expect(fromSetting.ok ? '' : fromSetting.message).toMatch(/refused the connection/);
    expect(readdirSync(desk)).toEqual([REGISTER_SETTING_FILE]);
  });

  it('the register itself opens (the same function, the owner\'s address)', async () => {
    const started = await openAtStart({ argv: ['electron', '.', `--db=${await pgAddress(setUp)}`], env: undefined, settingsDir: dir, keyDir: dir });
    expect(started.ok).toBe(true);
    if (started.ok) {
      expect(started.source).toBe('option');
      await started.store.close();
    }
  });
});
