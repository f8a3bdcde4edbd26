/**
 * The sign-off in its three phases, timed apart on one register (records.bench.ts for the file,
 * records-pg.bench.ts for the institution register): the passphrase unlock (scrypt, deliberately
 * slow: key-encryption.ts), the preparation (the room re-evaluated by the core, fingerprint, chain
 * link) and the signing transaction itself (row lock, draft and chain checked again, signature row,
 * supersede, audit, signing log), which the 30 ms target of the institution register issue is for.
 * The store is closed while this runs: the phases are reached through a context on the engine, as
 * the store builds it.
 */
import { sign } from 'node:crypto';
import { canonicalJson } from '../../electron/backend/records/canonical.js';
import { commitSignOff, prepareSignOff, statementBuilder, type PreparedSignOff } from '../../electron/backend/records/assessments.js';
import { makeContext, type StoreContext } from '../../electron/backend/records/context.js';
import { CALCULATED_WITH, evaluateRoom } from '../../electron/backend/records/core-link.js';
import { isServerAddress } from '../../electron/backend/records/address.js';
import type { RecordEngine } from '../../electron/backend/records/engine.js';
import { openPgEngine } from '../../electron/backend/records/pg-engine.js';
import { openSqliteEngine } from '../../electron/backend/records/sqlite-engine.js';
import { unlockPersonalKey, type Signer } from '../../electron/backend/records/personal-keys.js';
import { deskAnchor } from '../../electron/backend/records/trust-store.js';
import { median, type BenchEntry } from './registry.js';

/** A store context on the register at `address` (the store itself must be closed: one writer on a file). */
export async function contextOn(address: string, keyDir: string): Promise<{ ctx: StoreContext; engine: RecordEngine }> {
  const engine = isServerAddress(address) ? await openPgEngine(address) : openSqliteEngine(address);
  return { ctx: makeContext({ q: engine.port, engine: engine.seam, keyDir, evaluate: evaluateRoom, calculatedWith: CALCULATED_WITH }), engine };
}

/**
 * Signs each of `draftIds` (drafts of `personId`'s register) once, timing each phase. `label`
 * prefixes the names as in measureRegister; `target` is the signing transaction's target.
 */
export async function measureSignPhases(
  label: string,
  where: { readonly address: string; readonly keyDir: string },
  signer: { readonly personId: string; readonly passphrase: string },
  draftIds: readonly string[],
  target: number,
): Promise<BenchEntry[]> {
  const { ctx, engine } = await contextOn(where.address, where.keyDir);
  const unlockMs: number[] = [];
  const prepareMs: number[] = [];
  const commitMs: number[] = [];
  try {
    for (const id of draftIds) {
      let t0 = performance.now();
      const key = await unlockPersonalKey(ctx, signer.personId, signer.passphrase);
      unlockMs.push(performance.now() - t0);

      t0 = performance.now();
      const prepared: PreparedSignOff = await prepareSignOff(ctx, id);
      prepareMs.push(performance.now() - t0);

      // Ed25519 over the statement, as signAsPerson does after the unlock (untimed: well under 1 ms).
      const who: Signer = {
        personId: key.person.id,
        name: key.person.name,
        role: key.person.role,
        keyId: key.keyId,
        publicKey: key.publicKeyPem,
        signedAt: ctx.now(),
        trustAnchor: deskAnchor(ctx).anchor ?? '',
      };
      const payload = statementBuilder(prepared, 'Benchmark sign-off.')(who);
      const signature = sign(null, Buffer.from(canonicalJson(payload), 'utf8'), key.privateKey).toString('base64');

      t0 = performance.now();
      await commitSignOff(ctx, prepared, { signer: who, payload, signature });
      commitMs.push(performance.now() - t0);
    }
  } finally {
    await engine.close();
  }
  const runs = draftIds.length;
  return [
    { name: `${label}: sign, phase 1: passphrase unlock (scrypt N=2^15, deliberately slow; trust list checked)`, median_ms: median(unlockMs), runs },
    { name: `${label}: sign, phase 2: prepare (room re-evaluated by the core, fingerprint, chain link)`, median_ms: median(prepareMs), runs },
    { name: `${label}: sign, phase 3: signing transaction (row lock, draft and chain re-checked, signature, supersede, audit, signing log)`, median_ms: median(commitMs), runs, target_ms: target },
  ];
}
