/**
 * The app setting "Connect to an institution register": the address of the PostgreSQL register,
 * kept in a small JSON file in the user-data folder and read at start-up by the desktop app and the
 * loopback host. The password is never kept here: the officer puts it in ~/.pgpass or PGPASSWORD
 * (libpq's own places, honoured by node-postgres). A damaged file is reported in plain words and
 * never replaced silently by the local file.
 *
 * Which register is in force, first match wins: `--db`, then BEAMWARDEN_DB, then this setting, then
 * the default file in the user-data folder.
 */
import { mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { describeAddress, isServerAddress } from './address.js';
import { openPgEngine } from './pg-engine.js';
import { RecordError } from './types.js';

export const REGISTER_SETTING_FILE = 'institution-register.json';

export type RegisterSource = 'option' | 'environment' | 'setting' | 'default';

/** Why a typed address is refused, in the words shown beside the field; null when it is usable. */
export function addressProblem(address: string): string | null {
  const a = address.trim();
  if (a === '') return 'Enter the address of the institution register.';
  if (!isServerAddress(a)) return 'The address must begin with postgres:// (for example postgres://officer@registers.example.org:5432/lasers).';
  let u: URL;
  try {
    u = new URL(a);
  } catch {
    return 'The address is not readable: write it as postgres://user@host:port/database.';
  }
  if (u.hostname === '') return 'The address names no server: write it as postgres://user@host:port/database.';
  if (u.password !== '') return 'Leave the password out of the address: it would be kept in a settings file. Put it in ~/.pgpass (or PGPASSWORD) instead.';
  if (u.pathname.length <= 1) return 'The address names no database: add /database after the server (postgres://user@host:port/database).';
  return null;
}

const AddressSchema = z.string().superRefine((a, ctx) => {
  const problem = addressProblem(a);
  if (problem !== null) ctx.addIssue({ code: 'custom', message: problem });
});

const SettingFileSchema = z.strictObject({ registerAddress: AddressSchema });

function settingPath(dir: string): string {
  return path.join(dir, REGISTER_SETTING_FILE);
}

/** The saved address, or null when none is saved. A damaged file is an error, never "no setting". */
export function readRegisterSetting(dir: string): string | null {
  const file = settingPath(dir);
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw new RecordError('storage', `The institution register setting (${file}) cannot be read: ${(e as Error).message}. Beamwarden did not open a local file instead.`);
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw new RecordError('storage', `The institution register setting (${file}) is damaged (not readable as a settings file). Delete it, or choose "Use the local file again" after starting with --db. Beamwarden did not open a local file instead.`);
  }
  const parsed = SettingFileSchema.safeParse(raw);
  if (!parsed.success) {
    const why = parsed.error.issues[0]?.message ?? 'unexpected content';
    throw new RecordError('storage', `The institution register setting (${file}) is damaged: ${why} Delete the file to use the local file again. Beamwarden did not open a local file instead.`);
  }
  return parsed.data.registerAddress.trim();
}

/** Saves the address (refused when it holds a password or is not an institution register address). */
export function saveRegisterSetting(dir: string, address: string): void {
  const problem = addressProblem(address);
  if (problem !== null) throw new RecordError('invalid', problem);
  mkdirSync(dir, { recursive: true });
  const file = settingPath(dir);
  // Written beside and renamed: a crash mid-write never leaves a half file that start-up would refuse.
  writeFileSync(`${file}.tmp`, `${JSON.stringify({ registerAddress: address.trim() }, null, 2)}\n`, { mode: 0o600 });
  renameSync(`${file}.tmp`, file);
}

export function clearRegisterSetting(dir: string): void {
  rmSync(settingPath(dir), { force: true });
}

export interface RegisterChoice {
  /** A file path or a postgres:// address; undefined for the default file. */
  readonly location: string | undefined;
  readonly source: RegisterSource;
}

/** `--db`, then BEAMWARDEN_DB, then the saved setting, then the default file. */
export function chooseRegister(opts: { readonly db: string | undefined; readonly env: string | undefined; readonly settingsDir: string }): RegisterChoice {
  if (opts.db !== undefined && opts.db !== '') return { location: opts.db, source: 'option' };
  if (opts.env !== undefined && opts.env !== '') return { location: opts.env, source: 'environment' };
  const saved = readRegisterSetting(opts.settingsDir);
  if (saved !== null) return { location: saved, source: 'setting' };
  return { location: undefined, source: 'default' };
}

/**
 * Connects to the register read-only (nothing is set up or changed) and closes again; the refusal
 * is the engine's own plain message (server not reachable, login refused, no rights, not set up).
 */
export async function testRegisterAddress(address: string): Promise<string> {
  const problem = addressProblem(address);
  if (problem !== null) throw new RecordError('invalid', problem);
  const engine = await openPgEngine(address.trim(), { readonly: true, poolSize: 1 });
  await engine.close();
  return `Connected to the institution register at ${describeAddress(address)} (schema version ${engine.schemaVersion}).`;
}
