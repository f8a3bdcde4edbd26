/**
 * The desk's trust anchor: the fingerprint (SHA-256 of the public key, 64 hex digits) of the key
 * that roots the trust list, kept OUTSIDE the database in the desk's own folder (issue 15, item 4;
 * issue 10, "a trust anchor outside the database"). The endorsements are in the register and every
 * desk reads the same ones, but each desk believes only those that lead to the anchor configured
 * here, so someone who can write the register cannot make a key trusted by writing rows.
 *
 * On a desk's own register file the first signing key sets it; on an institution register the
 * officer types or pastes the fingerprint they were given on paper (Settings & about).
 */
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';
import { storageError } from './storage-errors.js';

export const TRUST_ANCHOR_FILE = 'beamwarden-trust-anchor.json';

const SettingSchema = z.strictObject({
  format: z.literal('beamwarden-trust-anchor'),
  version: z.literal(1),
  anchor: z.string().regex(/^[0-9a-f]{64}$/),
  setAt: z.string(),
});
export type AnchorSettingFile = z.infer<typeof SettingSchema>;

export interface AnchorSettingRead {
  readonly path: string;
  /** The configured anchor (64 hex digits); null when none is configured or the file is damaged. */
  readonly anchor: string | null;
  readonly setAt: string | null;
  readonly problem: string | null;
}

export function anchorSettingPath(dir: string): string {
  return join(dir, TRUST_ANCHOR_FILE);
}

const cache = new Map<string, { mtimeMs: number; size: number; read: AnchorSettingRead }>();

/** The desk's setting; a damaged file is a problem to report, never "no anchor". */
export function readAnchorSetting(dir: string): AnchorSettingRead {
  const path = anchorSettingPath(dir);
  if (!existsSync(path)) return { path, anchor: null, setAt: null, problem: null };
  const st = statSync(path);
  const hit = cache.get(path);
  if (hit && hit.mtimeMs === st.mtimeMs && hit.size === st.size) return hit.read;
  let read: AnchorSettingRead;
  try {
    const r = SettingSchema.safeParse(JSON.parse(readFileSync(path, 'utf8')));
    read = r.success
      ? { path, anchor: r.data.anchor, setAt: r.data.setAt, problem: null }
      : { path, anchor: null, setAt: null, problem: `This desk's trust anchor setting ${path} is not in the expected form: it was damaged or edited by hand. Enter the anchor's fingerprint again in Settings & about.` };
  } catch {
    read = { path, anchor: null, setAt: null, problem: `This desk's trust anchor setting ${path} cannot be read: it was damaged or edited by hand. Enter the anchor's fingerprint again in Settings & about.` };
  }
  cache.set(path, { mtimeMs: st.mtimeMs, size: st.size, read });
  return read;
}

/** Written under a temporary name and renamed into place (a crash leaves the old or the new setting). */
export function writeAnchorSetting(dir: string, anchor: string, setAt: string): void {
  mkdirSync(dir, { recursive: true });
  const path = anchorSettingPath(dir);
  const tmp = `${path}.${process.pid}.tmp`;
  try {
    writeFileSync(tmp, `${JSON.stringify(SettingSchema.parse({ format: 'beamwarden-trust-anchor', version: 1, anchor, setAt }), null, 2)}\n`, { mode: 0o644 });
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw storageError(e, path, "This desk's trust anchor setting") ?? e;
  }
  cache.delete(path);
}

export function clearAnchorSetting(dir: string): void {
  const path = anchorSettingPath(dir);
  rmSync(path, { force: true });
  cache.delete(path);
}

/**
 * A fingerprint as the officer types or pastes it from paper: the 64 hex digits, in any case, with
 * spaces, colons or dashes between groups. Returns the 64 lower-case digits, or what is wrong.
 */
export function readTypedFingerprint(text: string): { ok: true; anchor: string } | { ok: false; problem: string } {
  const digits = text.replace(/[\s:-]/g, '').toLowerCase();
  if (digits === '') return { ok: false, problem: 'must be the 64 hexadecimal digits of the anchor key\'s fingerprint' };
  if (!/^[0-9a-f]*$/.test(digits)) return { ok: false, problem: 'may hold only the digits 0-9 and the letters a-f (spaces between groups are fine)' };
  if (digits.length !== 64) return { ok: false, problem: `must be 64 hexadecimal digits; ${digits.length} were given` };
  return { ok: true, anchor: digits };
}

/** The full fingerprint as printed for the officer to compare with paper: 16 groups of four. */
export function fullKeyFingerprint(keyId: string): string {
  return (keyId.match(/.{4}/g) ?? []).join(' ');
}
