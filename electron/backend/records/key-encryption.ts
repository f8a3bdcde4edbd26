/**
 * A personal Ed25519 private key sealed with its owner's passphrase: scrypt (RFC 7914) derives a
 * 256-bit key from the passphrase and a random salt; AES-256-GCM (NIST SP 800-38D) encrypts the
 * PKCS#8 DER of the private key, with the key id as additional authenticated data so a sealed blob
 * cannot be moved to another key row. The passphrase itself is never stored anywhere.
 *
 * scrypt cost N = 2^15, r = 8, p = 1: one step above the N = 2^14 that the scrypt paper (Percival,
 * 2009) suggests for interactive logins (from memory); about 0.1 s and 32 MiB per try here — slow
 * enough to make guessing expensive, fast enough for a sign dialog.
 */
import { createCipheriv, createDecipheriv, randomBytes, scryptSync, type KeyObject, createPrivateKey } from 'node:crypto';
import { z } from 'zod';

const SCRYPT = { N: 32_768, r: 8, p: 1 } as const;
const MAXMEM = 64 * 1024 * 1024;

export const SealedKeySchema = z.strictObject({
  kdf: z.literal('scrypt'),
  N: z.number().int().min(16_384).max(1_048_576),
  r: z.number().int().min(1).max(32),
  p: z.number().int().min(1).max(16),
  salt: z.string().min(16),
  cipher: z.literal('aes-256-gcm'),
  iv: z.string().min(16),
  tag: z.string().min(16),
  data: z.string().min(16),
});
export type SealedKey = z.infer<typeof SealedKeySchema>;

function derive(passphrase: string, salt: Buffer, p: { N: number; r: number; p: number }): Buffer {
  return scryptSync(passphrase.normalize('NFC'), salt, 32, { N: p.N, r: p.r, p: p.p, maxmem: MAXMEM });
}

export function sealPrivateKey(privateKey: KeyObject, keyId: string, passphrase: string): SealedKey {
  const salt = randomBytes(16);
  const iv = randomBytes(12);
  const key = derive(passphrase, salt, SCRYPT);
  const cipher = createCipheriv('aes-256-gcm', key, iv);
  cipher.setAAD(Buffer.from(keyId, 'utf8'));
  const der = privateKey.export({ type: 'pkcs8', format: 'der' });
  const data = Buffer.concat([cipher.update(der), cipher.final()]);
  return {
    kdf: 'scrypt',
    ...SCRYPT,
    salt: salt.toString('base64'),
    cipher: 'aes-256-gcm',
    iv: iv.toString('base64'),
    tag: cipher.getAuthTag().toString('base64'),
    data: data.toString('base64'),
  };
}

/** The private key, or null when the passphrase is wrong (or the blob was altered: GCM cannot tell which). */
export function openSealedKey(sealed: SealedKey, keyId: string, passphrase: string): KeyObject | null {
  const key = derive(passphrase, Buffer.from(sealed.salt, 'base64'), sealed);
  const decipher = createDecipheriv('aes-256-gcm', key, Buffer.from(sealed.iv, 'base64'));
  decipher.setAAD(Buffer.from(keyId, 'utf8'));
  decipher.setAuthTag(Buffer.from(sealed.tag, 'base64'));
  try {
    const der = Buffer.concat([decipher.update(Buffer.from(sealed.data, 'base64')), decipher.final()]);
    return createPrivateKey({ key: der, format: 'der', type: 'pkcs8' });
  } catch {
    return null;
  }
}
