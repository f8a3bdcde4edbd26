/**
 * Personal signing keys: each signer holds an Ed25519 key pair whose private key is sealed with the
 * signer's passphrase (key-encryption.ts). Creating a key, changing its passphrase, retiring it,
 * admitting it to the trust list (endorsement by an already trusted key), and — for every kind of
 * signed record — `signAsPerson`, which checks the passphrase and trust, takes the time from this
 * back end's clock and the identity from the key's owner, and signs a canonical payload.
 */
import { createPublicKey, generateKeyPairSync, sign, type KeyObject } from 'node:crypto';
import { z } from 'zod';
import { canonicalJson } from './canonical.js';
import { inTransaction, parseOrThrow, type StoreContext } from './context.js';
import { openSealedKey, sealPrivateKey, SealedKeySchema } from './key-encryption.js';
import { getPerson } from './register.js';
import { keyIdOf, PRIVATE_KEY_FILE, readInstallationKey, verifyEd25519Memo } from './signing.js';
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { fullKeyFingerprint, writeAnchorSetting } from './trust-anchor-setting.js';
import { INSTALLATION_KEY_HOLDER, makeEndorsedEntry, shortKeyFingerprint, trustOf, type TrustEntry } from './trust-list.js';
import { addEndorsement, addRetirement, deskAnchor, loadTrust, registerAnchors } from './trust-store.js';
import { RecordError, type Id, type Person, type PersonKey, type TrustListInfo } from './types.js';

const passphrase = z
  .string()
  .min(10, 'must be at least 10 characters')
  .max(1000, 'must be at most 1000 characters');
const IdText = z.string().min(1, 'must not be empty').max(200);

export const CreateKeySchema = z.strictObject({
  personId: IdText,
  passphrase,
  passphraseAgain: z.string(),
  endorserPersonId: IdText.optional(),
  endorserPassphrase: z.string().max(1000).optional(),
});
export const EndorseKeySchema = z.strictObject({ keyId: z.string().regex(/^[0-9a-f]{64}$/, 'must be a key fingerprint'), endorserPersonId: IdText, endorserPassphrase: z.string().max(1000) });
export const ChangePassphraseSchema = z.strictObject({ personId: IdText, passphrase: z.string().max(1000), newPassphrase: passphrase, newPassphraseAgain: z.string() });
export const ImportAdmissionSchema = z.strictObject({
  keyIds: z.array(z.string().regex(/^[0-9a-f]{64}$/, 'must be a key fingerprint')).max(100),
  endorserPersonId: IdText,
  endorserPassphrase: z.string().max(1000),
});
export const RetireKeySchema = z.strictObject({ personId: IdText, reason: z.string().trim().min(1, 'must say why the key is retired').max(500) });

interface PersonKeyRow {
  key_id: string;
  person_id: string;
  created_at: string;
  retired_at: string | null;
  retired_reason: string;
  public_key: string;
}
/**
 * Everything about a key but its sealed private key: on an institution register readers may not
 * read `sealed_private_key` (column privileges, migration 11), and only unlocking needs it.
 */
const KEY_SELECT =
  'SELECT pk.key_id, pk.person_id, pk.created_at, pk.retired_at, pk.retired_reason, k.public_key FROM person_key pk JOIN signing_key k ON k.key_id = pk.key_id';

/** The sealed private key, for unlocking only; an account that may not read it is told so in words. */
async function sealedKeyOf(ctx: StoreContext, keyId: string, personName: string): Promise<string> {
  try {
    const row = await ctx.q.get<{ sealed_private_key: string }>('SELECT sealed_private_key FROM person_key WHERE key_id = ?', keyId);
    if (!row) throw new RecordError('signing-key', `${personName}'s signing key is no longer in the register.`);
    return row.sealed_private_key;
  } catch (e) {
    const code = typeof e === 'object' && e !== null && 'code' in e ? String((e as { code: unknown }).code) : '';
    if (code === '42501' || (e instanceof RecordError && e.code === 'not-permitted')) {
      throw new RecordError(
        'not-permitted',
        `Your account may read the institution register but not use its signing keys: signing needs an officer's account. Nothing was signed or changed.`,
      );
    }
    throw e;
  }
}

async function activeKeyRow(ctx: StoreContext, personId: Id): Promise<PersonKeyRow | undefined> {
  return await ctx.q.get(`${KEY_SELECT} WHERE pk.person_id = ? AND pk.retired_at IS NULL`, personId) as PersonKeyRow | undefined;
}


/**
 * What stands between this desk and trusting the register's signatures, in plain words: no anchor
 * configured here, a damaged setting, or an anchor the register was not set up with (issue 15,
 * item 4: "a database whose anchor differs from the desk's configured one is reported plainly").
 */
export async function trustProblems(
  ctx: StoreContext,
  read: { list: { anchor: string } | null; problem: string | null },
  known?: readonly string[],
): Promise<string[]> {
  const pins = known ?? (await registerAnchors(ctx));
  const problems: string[] = [];
  if (read.problem) problems.push(read.problem);
  const pinned = pins.map(shortKeyFingerprint).join(', ');
  if (read.list === null && !read.problem && pins.length > 0) {
    problems.push(
      `This desk has no trust anchor configured, so no signature in this register is trusted here. ` +
        `Enter the fingerprint of the register's trust anchor (${pinned}…), as you were given it on paper, in Settings & about.`,
    );
  }
  if (read.list !== null && pins.length > 0 && !pins.includes(read.list.anchor)) {
    problems.push(
      `This register's signatures are endorsed by a key this desk does not recognise: the register was set up with the trust anchor ${pinned}, ` +
        `but this desk is configured with ${shortKeyFingerprint(read.list.anchor)}. No signature is trusted here until they agree: ` +
        'compare the fingerprint in Settings & about with the one you were given on paper, and check that this is the right register.',
    );
  }
  if (read.list !== null && pins.length === 0) {
    problems.push(
      `This register has no trust anchor yet, but this desk is configured with ${shortKeyFingerprint(read.list.anchor)} (from another register). ` +
        'Clear the desk\'s trust anchor in Settings & about before creating the register\'s first signing key, or connect to the register that anchor belongs to.',
    );
  }
  return problems;
}

export async function trustListInfo(ctx: StoreContext): Promise<TrustListInfo> {
  const read = await loadTrust(ctx);
  const setting = deskAnchor(ctx);
  const list = read.list;
  const trustedKeys = list ? new Set(list.entries.filter((e) => trustOf(list, e.keyId).trusted).map((e) => e.keyId)).size : 0;
  const pins = await registerAnchors(ctx);
  return {
    path: read.path,
    anchor: list?.anchor ?? null,
    anchorFingerprint: list ? shortKeyFingerprint(list.anchor) : null,
    anchorFull: list ? fullKeyFingerprint(list.anchor) : null,
    anchorSetAt: setting.setAt,
    registerAnchors: pins.map(fullKeyFingerprint),
    keys: trustedKeys,
    problems: await trustProblems(ctx, read, pins),
  };
}

export async function listPersonKeys(ctx: StoreContext): Promise<PersonKey[]> {
  const list = (await loadTrust(ctx)).list;
  const rows = await ctx.q.all(`${KEY_SELECT} ORDER BY pk.created_at, pk.key_id`) as PersonKeyRow[];
  return rows.map((r) => {
    const t = trustOf(list, r.key_id);
    return {
      keyId: r.key_id,
      fingerprint: shortKeyFingerprint(r.key_id),
      personId: r.person_id,
      createdAt: r.created_at,
      retiredAt: r.retired_at,
      retiredReason: r.retired_reason,
      trusted: t.trusted,
      isAnchor: list?.anchor === r.key_id,
      trustChain: t.chain,
    };
  });
}

/** Unlock `personId`'s active key with the passphrase; refuses (and changes nothing) otherwise. */
export async function unlockPersonalKey(ctx: StoreContext, personId: Id, pass: string, opts: { requireTrusted?: boolean } = {}): Promise<{
  person: Person;
  keyId: string;
  privateKey: KeyObject;
  publicKeyPem: string;
}> {
  const person = await getPerson(ctx, personId);
  const row = await activeKeyRow(ctx, personId);
  if (!row) {
    const retired = await ctx.q.get('SELECT 1 FROM person_key WHERE person_id = ?', personId) !== undefined;
    throw new RecordError(
      'signing-key',
      retired
        ? `${person.name}'s signing key is retired; a retired key cannot sign. Create a new key in the register (People).`
        : `${person.name} has no signing key yet. Create one in the register (People).`,
    );
  }
  const sealed = SealedKeySchema.safeParse(JSON.parse(await sealedKeyOf(ctx, row.key_id, person.name)));
  if (!sealed.success) throw new RecordError('signing-key', `${person.name}'s sealed signing key is damaged; retire it and create a new one.`);
  const privateKey = openSealedKey(sealed.data, row.key_id, pass);
  if (privateKey === null) throw new RecordError('signing-key', `The passphrase is not correct for ${person.name}'s signing key. Nothing was signed or changed.`);
  const publicKeyPem = createPublicKey(privateKey).export({ type: 'spki', format: 'pem' }).toString();
  if (keyIdOf(publicKeyPem) !== row.key_id || keyIdOf(row.public_key) !== row.key_id) {
    throw new RecordError('signing-key', `${person.name}'s stored signing key does not match its public key: the key was replaced. Retire it and create a new one.`);
  }
  if (opts.requireTrusted !== false) {
    const read = await loadTrust(ctx);
    const t = trustOf(read.list, row.key_id);
    if (!t.trusted) {
      throw new RecordError(
        'signing-key',
        `${person.name}'s key ${shortKeyFingerprint(row.key_id)} is not admitted to this installation's trust list (${t.chain.at(-1) ?? ''}). ` +
          'A person whose key is trusted must endorse it first (register, People).',
      );
    }
    const entry = t.entry;
    if (entry?.retiredAt) throw new RecordError('signing-key', `${person.name}'s key is retired on the trust list; a retired key cannot sign.`);
    const problems = await trustProblems(ctx, read);
    if (problems.length) throw new RecordError('signing-key', `Signing is refused: ${problems.join(' ')}`);
  }
  return { person, keyId: row.key_id, privateKey, publicKeyPem };
}

/** Who signed and when, decided here — never by the caller. */
export interface Signer {
  readonly personId: Id;
  readonly name: string;
  readonly role: string;
  readonly keyId: string;
  readonly publicKey: string;
  /** This back end's clock. */
  readonly signedAt: string;
  /** Anchor of the trust list the key is trusted under. */
  readonly trustAnchor: string;
}

/**
 * Sign a payload as `personId` after checking the passphrase and that the key is trusted. `build`
 * receives the signer (identity from the key's owner, time from this clock) and returns the object
 * whose canonical JSON is signed. Reusable for any signed record (assessments, checked table rows).
 */
export async function signAsPerson<P>(ctx: StoreContext, personId: Id, pass: string, build: (signer: Signer) => P): Promise<{ signer: Signer; payload: P; signature: string }> {
  const key = await unlockPersonalKey(ctx, personId, pass);
  const anchor = deskAnchor(ctx).anchor ?? '';
  const signer: Signer = {
    personId: key.person.id,
    name: key.person.name,
    role: key.person.role,
    keyId: key.keyId,
    publicKey: key.publicKeyPem,
    signedAt: ctx.now(),
    trustAnchor: anchor,
  };
  const payload = build(signer);
  const signature = sign(null, Buffer.from(canonicalJson(payload), 'utf8'), key.privateKey).toString('base64');
  return { signer, payload, signature };
}

/**
 * A signer from a key already in hand, for the invented demo record (a throwaway key that is on no
 * trust list, so the demo shows as an unverified signature) and for benchmark set-up. The app's
 * sign-off always goes through `signAsPerson`.
 */
export function signerFromKey(ctx: StoreContext, person: Person, privateKey: KeyObject) {
  const publicKey = createPublicKey(privateKey).export({ type: 'spki', format: 'pem' }).toString();
  const anchor = deskAnchor(ctx).anchor ?? '';
  return async <P>(build: (signer: Signer) => P): Promise<{ signer: Signer; payload: P; signature: string }> => {
    const signer: Signer = { personId: person.id, name: person.name, role: person.role, keyId: keyIdOf(publicKey), publicKey, signedAt: ctx.now(), trustAnchor: anchor };
    const payload = build(signer);
    return { signer, payload, signature: sign(null, Buffer.from(canonicalJson(payload), 'utf8'), privateKey).toString('base64') };
  };
}

/** The check that goes with `signAsPerson`, for any signed payload: valid signature, trusted key, and its owner. */
export async function checkPersonSignature(
  ctx: StoreContext,
  payload: unknown,
  signatureB64: string,
  keyId: string,
  /** The trust list's problems (trustListInfo), when the caller checks many signatures at once. */
  knownProblems?: readonly string[],
): Promise<{ readonly valid: boolean; readonly trusted: boolean; readonly trustChain: readonly string[]; readonly ownerPersonId: string | null; readonly ownerName: string | null }> {
  const read = await loadTrust(ctx);
  const verdict = trustOf(read.list, keyId);
  const publicKey = verdict.entry?.publicKey ?? (await ctx.q.get('SELECT public_key FROM signing_key WHERE key_id = ?', keyId) as { public_key: string } | undefined)?.public_key;
  let valid = false;
  try {
    valid = publicKey !== undefined && keyIdOf(publicKey) === keyId && verifyEd25519Memo(publicKey, payload, signatureB64);
  } catch {
    valid = false;
  }
  const problems = knownProblems ?? (await trustProblems(ctx, read));
  return {
    valid,
    trusted: verdict.trusted && problems.length === 0,
    trustChain: [...verdict.chain, ...problems],
    ownerPersonId: verdict.entry?.personId ?? null,
    ownerName: verdict.entry?.personName ?? null,
  };
}

/** An endorsement of `entry` by `endorser`, dated by this back end's clock, stored in the register. */
async function admit(
  ctx: StoreContext,
  entry: { keyId: string; publicKey: string; personId: string | null; personName: string },
  endorser: { keyId: string; privateKey: KeyObject },
): Promise<TrustEntry> {
  const e = makeEndorsedEntry({ ...entry, admittedAt: ctx.now(), endorsedBy: endorser.keyId }, endorser.privateKey);
  await addEndorsement(ctx, e);
  return e;
}

/** Admit several keys on one endorser's authority (import: the exporting site's keys, after confirmation). */
export async function admitKeys(
  ctx: StoreContext,
  keys: ReadonlyArray<{ keyId: string; publicKey: string; personId: string | null; personName: string }>,
  endorser: { keyId: string; privateKey: KeyObject; person: Person },
): Promise<void> {
  if ((await loadTrust(ctx)).list === null) throw new RecordError('signing-key', 'This desk has no trust anchor yet.');
  await guardTx(ctx, 'Endorsement', async (ctx) => {
    for (const k of keys) {
      await admit(ctx, k, endorser);
      await ctx.audit('key-endorsed', 'signing_key', k.keyId, `by ${endorser.person.name} (${k.personName})`);
    }
  });
}

/**
 * Start the trust list with `key` as its anchor: its self-endorsement goes into the register, the
 * anchor is pinned there (append-only) and becomes this desk's setting. The setting is written last,
 * after the rows, inside the caller's transaction scope: a failure before it rolls the rows back.
 */
export async function setUpTrustList(ctx: StoreContext, key: { keyId: string; publicKey: string; personId: string | null; personName: string; privateKey: KeyObject }): Promise<void> {
  const admittedAt = ctx.now();
  await claimRegisterAnchor(ctx, key.keyId, admittedAt);
  const entry = makeEndorsedEntry(
    { keyId: key.keyId, publicKey: key.publicKey, personId: key.personId, personName: key.personName, admittedAt, endorsedBy: key.keyId },
    key.privateKey,
  );
  await addEndorsement(ctx, entry);
  await ctx.q.run('INSERT INTO trust_anchor_pin (anchor, pinned_at) VALUES (?, ?) ON CONFLICT(anchor) DO NOTHING', key.keyId, admittedAt);
  await ctx.audit('trust-anchor-set', 'signing_key', key.keyId, `${key.personName}; fingerprint ${shortKeyFingerprint(key.keyId)}`);
  writeAnchorSetting(ctx.keyDir, key.keyId, admittedAt);
}

/**
 * The register's one anchor (migration 11, `trust_anchor_setup`, a one-row table): written first in
 * the set-up transaction, so when another desk set the register up at the same moment this
 * transaction fails here and nothing of it (key, endorsement, pin, the desk's setting) stays.
 */
async function claimRegisterAnchor(ctx: StoreContext, anchor: string, at: string): Promise<void> {
  const taken = (): RecordError =>
    new RecordError(
      'conflict',
      'Another desk has just created this register\'s first signing key, which is now the register\'s trust anchor. Nothing was created here. ' +
        'Enter the register\'s trust anchor fingerprint in Settings & about (as its owner gives it to you on paper), then create your key again with an endorsement by a trusted signer.',
    );
  const existing = await ctx.q.get<{ anchor: string }>('SELECT anchor FROM trust_anchor_setup WHERE only_row = 1');
  if (existing) throw taken();
  try {
    await ctx.q.run('INSERT INTO trust_anchor_setup (only_row, anchor, set_up_at) VALUES (1, ?, ?)', anchor, at);
  } catch (e) {
    // SQLite: SQLITE_CONSTRAINT_PRIMARYKEY; PostgreSQL: 23505 unique_violation (after waiting for the other desk's commit).
    const code = typeof e === 'object' && e !== null && 'code' in e ? String((e as { code: unknown }).code) : '';
    if (code === '23505' || code.startsWith('SQLITE_CONSTRAINT') || (e instanceof RecordError && e.code === 'conflict')) throw taken();
    throw e;
  }
}

export async function createPersonalKey(ctx: StoreContext, raw: z.input<typeof CreateKeySchema>): Promise<PersonKey> {
  const args = parseOrThrow(CreateKeySchema, raw, 'New signing key');
  if (args.passphrase !== args.passphraseAgain) throw new RecordError('invalid', 'The two passphrases are not the same; nothing was created.', [{ path: 'passphraseAgain', problem: 'must repeat the passphrase exactly' }]);
  const person = await getPerson(ctx, args.personId);
  if (await activeKeyRow(ctx, person.id)) throw new RecordError('conflict', `${person.name} already has an active signing key; retire it before creating a new one.`);
  const read = await loadTrust(ctx);
  if (read.problem) throw new RecordError('signing-key', read.problem);
  const problems = await trustProblems(ctx, read);
  if (problems.length) throw new RecordError('signing-key', problems.join(' '));
  // The endorser's passphrase is checked before anything is written.
  let endorser: { keyId: string; privateKey: KeyObject; name: string } | null = null;
  let installationKeyToRetire: string | null = null;
  if (read.list !== null && args.endorserPersonId !== undefined) {
    const k = await unlockPersonalKey(ctx, args.endorserPersonId, args.endorserPassphrase ?? '');
    endorser = { keyId: k.keyId, privateKey: k.privateKey, name: k.person.name };
  } else if (read.list !== null) {
    // After migrating from schema 2 the installation key is the anchor: it endorses the first personal key, once.
    const anchor = read.list.entries.find((e) => e.keyId === read.list?.anchor);
    const inst = readInstallationKey(ctx.keyDir);
    if (anchor && anchor.personName === INSTALLATION_KEY_HOLDER && !anchor.retiredAt && inst?.keyId === anchor.keyId) {
      endorser = { keyId: inst.keyId, privateKey: inst.privateKey, name: INSTALLATION_KEY_HOLDER };
      installationKeyToRetire = inst.keyId;
    }
  }
  const { privateKey, publicKey } = generateKeyPairSync('ed25519');
  const publicKeyPem = publicKey.export({ type: 'spki', format: 'pem' }).toString();
  const keyId = keyIdOf(publicKeyPem);
  const sealed = sealPrivateKey(privateKey, keyId, args.passphrase);
  const now = ctx.now();
  await guardTx(ctx, 'Signing key', async (ctx) => {
    await ctx.q.run("INSERT INTO signing_key (key_id, public_key, origin, added_at) VALUES (?, ?, 'this-database', ?)", keyId, publicKeyPem, now);
    await ctx.q.run('INSERT INTO person_key (key_id, person_id, sealed_private_key, created_at) VALUES (?, ?, ?, ?)', keyId, person.id, JSON.stringify(sealed), now);
    await ctx.audit('key-created', 'person', person.id, `key ${shortKeyFingerprint(keyId)}`);
    // The endorsement is written in the same transaction as the key: both or neither.
    const entry = { keyId, publicKey: publicKeyPem, personId: person.id, personName: person.name };
    if (read.list === null) await setUpTrustList(ctx, { ...entry, privateKey });
    else if (endorser !== null) {
      await admit(ctx, entry, endorser);
      await ctx.audit('key-endorsed', 'signing_key', keyId, `by ${endorser.name}`);
      if (installationKeyToRetire !== null) {
        await addRetirement(ctx, installationKeyToRetire, ctx.now(), 'Replaced by personal keys');
        await ctx.audit('key-retired', 'signing_key', installationKeyToRetire, 'installation key replaced by personal keys; key file removed');
      }
    }
  });
  // The installation key file is removed once it has endorsed: a copy of it could otherwise endorse again.
  if (installationKeyToRetire !== null) rmSync(join(ctx.keyDir, PRIVATE_KEY_FILE), { force: true });
  const made = (await listPersonKeys(ctx)).find((k) => k.keyId === keyId);
  if (!made) throw new Error('key not stored');
  return made;
}

/** One write transaction; database errors in plain words (without the storage diagnosis, as before). */
function guardTx(ctx: StoreContext, what: string, fn: (ctx: StoreContext) => Promise<void>): Promise<void> {
  return inTransaction(ctx, what, fn, false);
}

/** Admit a key (a person's new key, or an exporting site's key) on the endorsement of a trusted signer. */
export async function endorseKey(ctx: StoreContext, raw: z.input<typeof EndorseKeySchema>): Promise<PersonKey | null> {
  const args = parseOrThrow(EndorseKeySchema, raw, 'Endorsement');
  const endorser = await unlockPersonalKey(ctx, args.endorserPersonId, args.endorserPassphrase);
  if ((await loadTrust(ctx)).list === null) throw new RecordError('signing-key', 'This desk has no trust anchor yet.');
  const k = await ctx.q.get('SELECT public_key FROM signing_key WHERE key_id = ?', args.keyId) as { public_key: string } | undefined;
  if (!k) throw new RecordError('not-found', `No key ${shortKeyFingerprint(args.keyId)} in this database.`);
  const owner = await ctx.q.get('SELECT person_id FROM person_key WHERE key_id = ?', args.keyId) as { person_id: string } | undefined;
  const personName = owner ? (await getPerson(ctx, owner.person_id)).name : (await ctx.q.get('SELECT name FROM signature WHERE key_id = ? LIMIT 1', args.keyId) as { name: string } | undefined)?.name ?? '';
  await guardTx(ctx, 'Endorsement', async (ctx) => {
    await admit(ctx, { keyId: args.keyId, publicKey: k.public_key, personId: owner?.person_id ?? null, personName }, endorser);
    await ctx.audit('key-endorsed', 'signing_key', args.keyId, `by ${endorser.person.name}`);
  });
  return (await listPersonKeys(ctx)).find((x) => x.keyId === args.keyId) ?? null;
}

export async function changePassphrase(ctx: StoreContext, raw: z.input<typeof ChangePassphraseSchema>): Promise<PersonKey> {
  const args = parseOrThrow(ChangePassphraseSchema, raw, 'Passphrase change');
  if (args.newPassphrase !== args.newPassphraseAgain) throw new RecordError('invalid', 'The two new passphrases are not the same; nothing was changed.', [{ path: 'newPassphraseAgain', problem: 'must repeat the new passphrase exactly' }]);
  const key = await unlockPersonalKey(ctx, args.personId, args.passphrase, { requireTrusted: false });
  const sealed = sealPrivateKey(key.privateKey, key.keyId, args.newPassphrase);
  await guardTx(ctx, 'Passphrase', async (ctx) => {
    await ctx.q.run('UPDATE person_key SET sealed_private_key = ? WHERE key_id = ? AND retired_at IS NULL', JSON.stringify(sealed), key.keyId);
    await ctx.audit('passphrase-changed', 'person', args.personId, `key ${shortKeyFingerprint(key.keyId)}`);
  });
  const k = (await listPersonKeys(ctx)).find((x) => x.keyId === key.keyId);
  if (!k) throw new Error('key vanished');
  return k;
}

/** Retire a person's key (lost passphrase, person leaving): it can no longer sign; what it signed stays valid. */
export async function retireKey(ctx: StoreContext, raw: z.input<typeof RetireKeySchema>): Promise<PersonKey> {
  const args = parseOrThrow(RetireKeySchema, raw, 'Key retirement');
  const person = await getPerson(ctx, args.personId);
  const row = await activeKeyRow(ctx, person.id);
  if (!row) throw new RecordError('not-found', `${person.name} has no active signing key.`);
  const now = ctx.now();
  await guardTx(ctx, 'Key retirement', async (ctx) => {
    await ctx.q.run('UPDATE person_key SET retired_at = ?, retired_reason = ? WHERE key_id = ?', now, args.reason, row.key_id);
    await ctx.audit('key-retired', 'person', person.id, `key ${shortKeyFingerprint(row.key_id)}: ${args.reason}`);
    // In the register, so every desk sees the key retired (a retirement only takes trust away).
    await addRetirement(ctx, row.key_id, now, args.reason);
  });
  const k = (await listPersonKeys(ctx)).find((x) => x.keyId === row.key_id);
  if (!k) throw new Error('key vanished');
  return k;
}
