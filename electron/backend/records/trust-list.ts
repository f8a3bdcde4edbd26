/**
 * The installation's trust list: the public keys allowed to sign, kept OUTSIDE the SQLite file
 * (in the user-data folder, beside the database), so that writing the database alone cannot make
 * a key trusted. A key that appears only in the database is never trusted.
 *
 * Each entry is admitted by an endorsement: an Ed25519 signature, by an already trusted key, over
 * the entry (key, owner, date). The first key — the trust anchor — endorses itself when the list is
 * set up; its fingerprint is shown to the officer to write down and printed on every signed
 * document, so a replaced list shows a different anchor on paper and on screen.
 */
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { storageError } from './storage-errors.js';
import { join } from 'node:path';
import { createPublicKey, sign, verify, type KeyObject } from 'node:crypto';
import { z } from 'zod';
import { canonicalJson } from './canonical.js';
import { keyIdOf } from './signing.js';

export const TRUST_LIST_FILE = 'beamwarden-trust-list.json';
/** Holder named for the schema-2 installation key when it becomes the anchor (legacy-signatures.ts). */
export const INSTALLATION_KEY_HOLDER = 'Installation key (signatures made before personal keys)';

const hex64 = z.string().regex(/^[0-9a-f]{64}$/);
const TrustEntrySchema = z.strictObject({
  keyId: hex64,
  publicKey: z.string().min(1),
  personId: z.string().nullable(),
  personName: z.string(),
  admittedAt: z.string(),
  endorsedBy: hex64,
  endorsement: z.string(),
  retiredAt: z.string().nullable().optional(),
  retiredReason: z.string().optional(),
});
const TrustListSchema = z.strictObject({
  format: z.literal('beamwarden-trust-list'),
  version: z.literal(1),
  anchor: hex64,
  entries: z.array(TrustEntrySchema),
});
export type TrustEntry = z.infer<typeof TrustEntrySchema>;
export type TrustList = z.infer<typeof TrustListSchema>;

export interface TrustListRead {
  readonly path: string;
  /** null when there is no file yet, or it cannot be read (see `problem`). */
  readonly list: TrustList | null;
  readonly problem: string | null;
}

/** Fingerprint as an officer reads and writes it down: the first 20 hex digits in groups of four. */
export function shortKeyFingerprint(keyId: string): string {
  return (keyId.slice(0, 20).match(/.{4}/g) ?? []).join(' ');
}

function endorsementPayload(e: Omit<TrustEntry, 'endorsement' | 'retiredAt' | 'retiredReason'>): Buffer {
  return Buffer.from(
    canonicalJson({
      format: 'beamwarden-key-endorsement',
      version: 1,
      keyId: e.keyId,
      publicKey: e.publicKey,
      personId: e.personId,
      personName: e.personName,
      admittedAt: e.admittedAt,
      endorsedBy: e.endorsedBy,
    }),
    'utf8',
  );
}

export function makeEndorsedEntry(
  entry: Omit<TrustEntry, 'endorsement' | 'retiredAt' | 'retiredReason'>,
  endorserKey: KeyObject,
): TrustEntry {
  return { ...entry, endorsement: sign(null, endorsementPayload(entry), endorserKey).toString('base64') };
}

const cache = new Map<string, { mtimeMs: number; size: number; read: TrustListRead }>();

export function trustListPath(dir: string): string {
  return join(dir, TRUST_LIST_FILE);
}

export function readTrustList(dir: string): TrustListRead {
  const path = trustListPath(dir);
  if (!existsSync(path)) return { path, list: null, problem: null };
  const st = statSync(path);
  const hit = cache.get(path);
  if (hit && hit.mtimeMs === st.mtimeMs && hit.size === st.size) return hit.read;
  let read: TrustListRead;
  try {
    const r = TrustListSchema.safeParse(JSON.parse(readFileSync(path, 'utf8')));
    read = r.success
      ? { path, list: r.data, problem: null }
      : { path, list: null, problem: `The trust list ${path} is not in the expected form: it was damaged or edited by hand.` };
  } catch {
    read = { path, list: null, problem: `The trust list ${path} cannot be read (not valid JSON): it was damaged or edited by hand.` };
  }
  cache.set(path, { mtimeMs: st.mtimeMs, size: st.size, read });
  return read;
}

/** Write the whole list under a temporary name, then rename into place (a crash leaves the old or the new list). */
export function writeTrustList(dir: string, list: TrustList): void {
  mkdirSync(dir, { recursive: true });
  const path = trustListPath(dir);
  const tmp = `${path}.${process.pid}.tmp`;
  try {
    writeFileSync(tmp, `${JSON.stringify(TrustListSchema.parse(list), null, 2)}\n`, { mode: 0o644 });
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw storageError(e, path, 'The trust list') ?? e;
  }
  cache.delete(path);
}

export interface TrustVerdict {
  readonly trusted: boolean;
  /** The endorsement chain from this key to the anchor, one plain sentence per link; or why it fails. */
  readonly chain: readonly string[];
  readonly entry: TrustEntry | null;
}

function who(e: TrustEntry): string {
  return `key ${shortKeyFingerprint(e.keyId)} of ${e.personName || 'an unnamed holder'}`;
}

const verdicts = new WeakMap<TrustList, Map<string, TrustVerdict>>();

/** Is `keyId` trusted by `list`: on it, endorsed by a trusted key, back to the self-endorsed anchor? */
export function trustOf(list: TrustList | null, keyId: string): TrustVerdict {
  if (list === null) return judge(null, keyId);
  // A read list is never changed in place (writes make a new object), so its verdicts can be kept.
  let known = verdicts.get(list);
  if (!known) verdicts.set(list, (known = new Map()));
  let v = known.get(keyId);
  if (!v) known.set(keyId, (v = judge(list, keyId)));
  return v;
}

function judge(list: TrustList | null, keyId: string): TrustVerdict {
  if (list === null) return { trusted: false, chain: ['This installation has no trust list yet, so no key is trusted.'], entry: null };
  const byId = new Map(list.entries.map((e) => [e.keyId, e]));
  const chain: string[] = [];
  const seen = new Set<string>();
  const first = byId.get(keyId) ?? null;
  let current = first;
  if (current === null) {
    return { trusted: false, chain: [`Key ${shortKeyFingerprint(keyId)} is not on this installation's trust list.`], entry: null };
  }
  while (current !== null) {
    const e: TrustEntry = current;
    if (seen.has(e.keyId)) return { trusted: false, chain: [...chain, 'The endorsements run in a circle: the trust list was edited by hand.'], entry: first };
    seen.add(e.keyId);
    let idOk = false;
    try {
      idOk = keyIdOf(e.publicKey) === e.keyId;
    } catch {
      idOk = false;
    }
    if (!idOk) return { trusted: false, chain: [...chain, `The entry for ${who(e)} does not match its public key: the trust list was edited by hand.`], entry: first };
    const endorser = e.endorsedBy === e.keyId ? e : byId.get(e.endorsedBy);
    if (endorser === undefined) {
      return { trusted: false, chain: [...chain, `${who(e)} names an endorsing key that is not on the trust list.`], entry: first };
    }
    let valid = false;
    try {
      valid = verify(null, endorsementPayload(e), createPublicKey(endorser.publicKey), Buffer.from(e.endorsement, 'base64'));
    } catch {
      valid = false;
    }
    if (!valid) {
      return { trusted: false, chain: [...chain, `The endorsement of ${who(e)} is not a valid signature by ${who(endorser)}: it was forged or edited.`], entry: first };
    }
    if (endorser === e) {
      if (e.keyId !== list.anchor) {
        return { trusted: false, chain: [...chain, `${who(e)} endorses itself but is not the trust anchor.`], entry: first };
      }
      chain.push(`${who(e)} is the trust anchor (first key, admitted at set-up on ${e.admittedAt.slice(0, 10)}).`);
      return { trusted: true, chain, entry: first };
    }
    if (endorser.retiredAt && endorser.retiredAt < e.admittedAt) {
      return { trusted: false, chain: [...chain, `${who(e)} was endorsed by ${who(endorser)} after that key was retired.`], entry: first };
    }
    chain.push(`${who(e)} was endorsed by ${who(endorser)} on ${e.admittedAt.slice(0, 10)}.`);
    current = endorser;
  }
  return { trusted: false, chain, entry: first };
}
