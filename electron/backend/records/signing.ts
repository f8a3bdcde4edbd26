/**
 * Tamper evidence for signed assessments.
 *
 * - Fingerprint: SHA-256 (hex) of the canonical serialisation of { content, results, calculatedWith }.
 *   Any change to what was assessed or to what the core computed changes it.
 * - Signature: Ed25519 (RFC 8032, node:crypto) over the canonical serialisation of the signed
 *   statement, which binds the fingerprint to the assessment, the revision, the signer and the time.
 * - Keys: personal keys (personal-keys.ts), trusted only through the trust list outside the
 *   database (trust-list.ts). Schema 2 had one installation key pair per database in PEM files
 *   beside it; `loadOrCreateSigningKey` remains for test fixtures of that schema, and
 *   `readInstallationKey` for migrating its signatures (legacy-signatures.ts).
 */
import { createHash, createPrivateKey, createPublicKey, generateKeyPairSync, sign, verify, type KeyObject } from 'node:crypto';
import { existsSync, linkSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { storageError } from './storage-errors.js';
import { join } from 'node:path';
import { canonicalJson } from './canonical.js';
import { RecordError, type AssessmentContent, type Id } from './types.js';
import type { RoomResult } from '../../../core/model/results.js';

export const PRIVATE_KEY_FILE = 'beamwarden-signing-key.pem';
export const PUBLIC_KEY_FILE = 'beamwarden-signing-key.pub.pem';

export function sha256Hex(text: string | Buffer): string {
  return createHash('sha256').update(text).digest('hex');
}

export function fingerprintOf(content: AssessmentContent, results: RoomResult, calculatedWith: string): string {
  return sha256Hex(canonicalJson({ content, results, calculatedWith }));
}

/** What the signer's key signs (canonical JSON of this object). */
export interface SignedStatement {
  readonly format: 'beamwarden-signed-statement';
  /** 1: installation key (before personal keys); 2: personal key, chained, with the trust anchor. */
  readonly version: 1 | 2;
  readonly assessmentId: Id;
  readonly roomId: Id;
  readonly installationId: Id | null;
  readonly revisionId: Id;
  readonly revisionNo: number;
  readonly fingerprint: string;
  readonly personId: Id | null;
  readonly name: string;
  readonly role: string;
  readonly signedAt: string;
  readonly statement: string;
  /** Version 2 only (absent fields are left out of the canonical form, so version 1 bytes are unchanged). */
  readonly keyId?: string;
  readonly previousLink?: string | null;
  readonly trustAnchor?: string;
}

/** A signed revision's chain link: SHA-256 of its canonical signed statement. */
export function linkOf(statement: SignedStatement): string {
  return sha256Hex(canonicalJson(statement));
}

/** The installation key file of schema 2 (one key per database), read for migration only; null if absent. */
export function readInstallationKey(keyDir: string): SigningKey | null {
  const privPath = join(keyDir, PRIVATE_KEY_FILE);
  if (!existsSync(privPath)) return null;
  let privateKey: KeyObject;
  try {
    privateKey = createPrivateKey(readFileSync(privPath, 'utf8'));
  } catch {
    return null;
  }
  if (privateKey.asymmetricKeyType !== 'ed25519') return null;
  const publicKeyPem = createPublicKey(privateKey).export({ type: 'spki', format: 'pem' }).toString();
  return { privateKey, publicKeyPem, keyId: keyIdOf(publicKeyPem) };
}

/** Key id: SHA-256 (hex) of the raw 32-byte Ed25519 public key. */
export function keyIdOf(publicKeyPem: string): string {
  let id = keyIds.get(publicKeyPem);
  if (id === undefined) {
    const der = publicKeyObject(publicKeyPem).export({ type: 'spki', format: 'der' });
    // SPKI for Ed25519 is a 12-byte header followed by the 32-byte key (RFC 8410).
    id = sha256Hex(der.subarray(der.length - 32));
    remember(keyIds, publicKeyPem, id);
  }
  return id;
}

// A verification run meets the same few keys thousands of times: each public key text is parsed
// (and its id computed) once per process, not once per record (npm run bench, verify). The text is
// the key, so a different key never finds another's entry; bounded so a hostile file cannot grow it.
const KEY_CACHE_MAX = 256;
const keyObjects = new Map<string, KeyObject>();
const keyIds = new Map<string, string>();
function remember<V>(m: Map<string, V>, k: string, v: V): void {
  if (m.size >= KEY_CACHE_MAX) m.clear();
  m.set(k, v);
}
function publicKeyObject(pem: string): KeyObject {
  let k = keyObjects.get(pem);
  if (k === undefined) {
    k = createPublicKey(pem);
    remember(keyObjects, pem, k);
  }
  return k;
}

/**
 * Ed25519 verification of a signed payload (its canonical JSON) against a public key text, with the
 * outcome kept per exact (key, signature, payload): verification is a pure function of those, so a
 * repeated question (every save re-reads the register's signed checks of the limit tables) gets the
 * same answer without the curve arithmetic. The memo is keyed by the key text, the signature and
 * the payload's full JSON text, so any changed byte (a key swapped, a statement edited) is verified
 * afresh; two payloads with the same JSON text have the same canonical JSON. Bounded.
 */
const VERDICT_CACHE_MAX = 5_000;
const verdicts = new Map<string, boolean>();
export function verifyEd25519Memo(publicKeyPem: string, payload: unknown, signatureB64: string): boolean {
  const key = `${publicKeyPem}\u0000${signatureB64}\u0000${JSON.stringify(payload)}`;
  const hit = verdicts.get(key);
  if (hit !== undefined) return hit;
  let ok: boolean;
  try {
    ok = verify(null, Buffer.from(canonicalJson(payload), 'utf8'), publicKeyObject(publicKeyPem), Buffer.from(signatureB64, 'base64'));
  } catch {
    ok = false;
  }
  if (verdicts.size >= VERDICT_CACHE_MAX) verdicts.clear();
  verdicts.set(key, ok);
  return ok;
}

export interface SigningKey {
  readonly privateKey: KeyObject;
  readonly publicKeyPem: string;
  readonly keyId: string;
}

/** Load the key pair from `keyDir`, creating it (and the folder) on first use. */
export function loadOrCreateSigningKey(keyDir: string): SigningKey {
  const privPath = join(keyDir, PRIVATE_KEY_FILE);
  const pubPath = join(keyDir, PUBLIC_KEY_FILE);
  if (!existsSync(privPath)) {
    mkdirSync(keyDir, { recursive: true });
    const { privateKey, publicKey } = generateKeyPairSync('ed25519');
    const privPem = privateKey.export({ type: 'pkcs8', format: 'pem' }).toString();
    const pubPem = publicKey.export({ type: 'spki', format: 'pem' }).toString();
    // Write under a temporary name, then hard-link into place: a crash never leaves half a key
    // file, and if another process created the key meanwhile, link fails (EEXIST) and theirs is kept.
    const tmp = `${privPath}.${process.pid}.tmp`;
    try {
      // Inside the try: a disk that fills up while writing must not leave the temporary file behind.
      writeFileSync(tmp, privPem, { mode: 0o600 });
      linkSync(tmp, privPath);
      writeFileSync(pubPath, pubPem, { mode: 0o644 });
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw storageError(e, privPath, 'Creating the signing key') ?? e;
    } finally {
      rmSync(tmp, { force: true });
    }
  }
  let privateKey: KeyObject;
  try {
    privateKey = createPrivateKey(readFileSync(privPath, 'utf8'));
  } catch (e) {
    throw new RecordError('signing-key', `The signing key ${privPath} cannot be read: ${(e as Error).message}`);
  }
  if (privateKey.asymmetricKeyType !== 'ed25519') {
    throw new RecordError('signing-key', `The signing key ${privPath} is not an Ed25519 key`);
  }
  const publicKeyPem = createPublicKey(privateKey).export({ type: 'spki', format: 'pem' }).toString();
  if (!existsSync(pubPath)) writeFileSync(pubPath, publicKeyPem, { mode: 0o644 });
  return { privateKey, publicKeyPem, keyId: keyIdOf(publicKeyPem) };
}

export function signStatement(key: SigningKey, statement: SignedStatement): string {
  return sign(null, Buffer.from(canonicalJson(statement), 'utf8'), key.privateKey).toString('base64');
}

export function verifyStatement(publicKeyPem: string, statement: SignedStatement, signatureB64: string): boolean {
  return verifyPayload(publicKeyPem, statement, signatureB64);
}

/** An Ed25519 signature over the canonical JSON of any signed payload (a statement, a co-signature). */
export function verifyPayload(publicKeyPem: string, payload: unknown, signatureB64: string): boolean {
  try {
    return verify(null, Buffer.from(canonicalJson(payload), 'utf8'), publicKeyObject(publicKeyPem), Buffer.from(signatureB64, 'base64'));
  } catch {
    return false;
  }
}
