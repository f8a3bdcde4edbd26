/**
 * The trust list: the public keys allowed to sign, each admitted by an endorsement (an Ed25519
 * signature, by an already trusted key, over the entry: key, owner, date), back to the trust anchor
 * that endorses itself. Since schema 9 the endorsements are rows of the register (trust-store.ts),
 * shared by every desk, and the anchor is each desk's own setting outside the database
 * (trust-anchor-setting.ts): `trustOf` believes an entry only when its chain of valid endorsements
 * ends at that anchor, so a key that appears only in the database, or a row written without a
 * trusted key's signature, is never trusted (issue 10; issue 15, item 4).
 *
 * Before schema 9 the list was a file beside the database (TRUST_LIST_FILE); it is read only to
 * carry its entries into the register once (trust-store.ts, adoptTrustListFile).
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
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

export function readTrustListFile(dir: string): TrustListRead {
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
  if (list === null) {
    return { trusted: false, chain: ['This desk has no trust anchor configured, so no key is trusted (Settings & about: enter the anchor\'s fingerprint you were given).'], entry: null };
  }
  const byId = new Map<string, TrustEntry[]>();
  for (const e of list.entries) byId.set(e.keyId, [...(byId.get(e.keyId) ?? []), e]);
  const candidates = byId.get(keyId) ?? [];
  if (candidates.length === 0) {
    return { trusted: false, chain: [`Key ${shortKeyFingerprint(keyId)} is not on this installation's trust list.`], entry: null };
  }
  // Any one endorsement that leads to the anchor admits the key; otherwise the first one's failure is told.
  let failed: { chain: string[]; entry: TrustEntry } | null = null;
  for (const e of candidates) {
    const r = chainFrom(list, byId, e, new Set());
    if (r.ok) return { trusted: true, chain: r.chain, entry: e };
    failed ??= { chain: r.chain, entry: e };
  }
  return { trusted: false, chain: failed?.chain ?? [], entry: failed?.entry ?? null };
}

function publicKeyMatches(e: TrustEntry): boolean {
  try {
    return keyIdOf(e.publicKey) === e.keyId;
  } catch {
    return false;
  }
}

function endorsementValid(e: TrustEntry, endorser: TrustEntry): boolean {
  try {
    return verify(null, endorsementPayload(e), createPublicKey(endorser.publicKey), Buffer.from(e.endorsement, 'base64'));
  } catch {
    return false;
  }
}

/** One entry's chain to the anchor, trying each endorsement its endorser holds (depth first, no key twice). */
function chainFrom(list: TrustList, byId: ReadonlyMap<string, readonly TrustEntry[]>, e: TrustEntry, seen: ReadonlySet<string>): { ok: boolean; chain: string[] } {
  if (seen.has(e.keyId)) return { ok: false, chain: ['The endorsements run in a circle: they were written by hand.'] };
  if (!publicKeyMatches(e)) return { ok: false, chain: [`The entry for ${who(e)} does not match its public key: it was written by hand.`] };
  if (e.endorsedBy === e.keyId) {
    if (!endorsementValid(e, e)) return { ok: false, chain: [`The endorsement of ${who(e)} is not a valid signature by ${who(e)}: it was forged or edited.`] };
    if (e.keyId !== list.anchor) {
      return { ok: false, chain: [`${who(e)} endorses itself but is not this desk's trust anchor (${shortKeyFingerprint(list.anchor)}).`] };
    }
    return { ok: true, chain: [`${who(e)} is the trust anchor (first key, admitted at set-up on ${e.admittedAt.slice(0, 10)}).`] };
  }
  const endorsers = (byId.get(e.endorsedBy) ?? []).filter(publicKeyMatches);
  const endorserKey = endorsers[0];
  if (endorserKey === undefined) return { ok: false, chain: [`${who(e)} names an endorsing key that is not on this installation's trust list.`] };
  if (!endorsementValid(e, endorserKey)) {
    return { ok: false, chain: [`The endorsement of ${who(e)} is not a valid signature by ${who(endorserKey)}: it was forged or edited.`] };
  }
  // A retirement belongs to the key, so every entry of the endorser carries the same one.
  const retiredAt = endorsers.find((x) => x.retiredAt)?.retiredAt;
  if (retiredAt && retiredAt < e.admittedAt) {
    return { ok: false, chain: [`${who(e)} was endorsed by ${who(endorserKey)} after that key was retired.`] };
  }
  const link = `${who(e)} was endorsed by ${who(endorserKey)} on ${e.admittedAt.slice(0, 10)}.`;
  let failed: string[] | null = null;
  const next = new Set(seen).add(e.keyId);
  for (const up of endorsers) {
    const r = chainFrom(list, byId, up, next);
    if (r.ok) return { ok: true, chain: [link, ...r.chain] };
    failed ??= r.chain;
  }
  return { ok: false, chain: [link, ...(failed ?? [])] };
}
