/**
 * Tamper evidence for signed assessments.
 *
 * - Fingerprint: SHA-256 (hex) of the canonical serialisation of { content, results, calculatedWith }.
 *   Any change to what was assessed or to what the core computed changes it.
 * - Signature: Ed25519 (RFC 8032, node:crypto) over the canonical serialisation of the signed
 *   statement, which binds the fingerprint to the assessment, the revision, the signer and the time.
 * - Keys: one Ed25519 key pair per database, kept as PEM files beside it and created on first use.
 *   The private key file is written with mode 0600. Its public key (and every imported one) is also
 *   stored in the database, so a signature can be checked even if the key files are lost.
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
  readonly version: 1;
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
}

/** Key id: SHA-256 (hex) of the raw 32-byte Ed25519 public key. */
export function keyIdOf(publicKeyPem: string): string {
  const key = createPublicKey(publicKeyPem);
  const der = key.export({ type: 'spki', format: 'der' });
  // SPKI for Ed25519 is a 12-byte header followed by the 32-byte key (RFC 8410).
  return sha256Hex(der.subarray(der.length - 32));
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
  try {
    return verify(null, Buffer.from(canonicalJson(statement), 'utf8'), createPublicKey(publicKeyPem), Buffer.from(signatureB64, 'base64'));
  } catch {
    return false;
  }
}
