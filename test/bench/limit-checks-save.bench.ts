/**
 * Saving an assessment on a register that holds a signed check of every open entry of ICNIRP 2013
 * (79 checks, issue 12): every save takes the checks in force into the assessment's inputs, and
 * each check is only used when its signature is valid, its key trusted on this installation's trust
 * list and its entry unchanged (limit-row-checks.ts). Timed: a notes-only save (inputs unchanged,
 * checks re-read and re-checked) and the checks in force on their own.
 *
 * Setup (untimed): a file register with one officer's personal key (the trust anchor), one demo
 * room, and 79 checks signed with that key as the checks screen records them (the key is unsealed
 * once with the passphrase instead of 79 times).
 * Run with the others: npm run bench (or -- --only=limit-checks-save); alone: npx tsx test/bench/limit-checks-save.bench.ts
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import demo from '../../assets/demo/demo-scenario.json' with { type: 'json' };
import { checkableEntries } from '../../core/index.js';
import { inTransaction } from '../../electron/backend/records/context.js';
import { DemoScenarioSchema } from '../../electron/backend/records/demo.js';
import { openRecordStore, type SaveBase } from '../../electron/backend/records/index.js';
import { checksInForce, insertRowCheck, type RowCheckRow } from '../../electron/backend/records/limit-row-checks.js';
import type { RowCheckStatement } from '../../electron/api/contracts/records.js';
import { signerFromKey, unlockPersonalKey } from '../../electron/backend/records/personal-keys.js';
import { timeMedianAsync, type BenchEntry } from './registry.js';
import { contextOn } from './sign-phases.js';

const PASSPHRASE = 'bench passphrase (invented)';

export async function runLimitChecksSaveBench(): Promise<BenchEntry[]> {
  const dir = mkdtempSync(join(tmpdir(), 'bw-bench-checks-save-'));
  const path = join(dir, 'checks.sqlite');
  const keyDir = join(dir, 'keys');
  try {
    const scenario = DemoScenarioSchema.parse(demo);
    const r = scenario.rooms.find((x) => x.code === 'A0.07');
    if (!r) throw new Error('demo room A0.07 missing');
    let store = await openRecordStore({ path, keyDir });
    const site = await store.createSite({ name: scenario.site.name });
    const room = await store.createRoom({ siteId: site.id, code: r.code, name: r.name });
    for (const laser of r.input.lasers) await store.createInstallation({ roomId: room.id, laser });
    const officer = await store.createPerson({ name: 'Bench Officer (invented)', role: 'Laser safety officer' });
    await store.createPersonKey({ personId: officer.id, passphrase: PASSPHRASE, passphraseAgain: PASSPHRASE });
    const assessment = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
    await store.close();

    // 79 checks signed as the checks screen records them.
    const entries = checkableEntries('icnirp2013');
    {
      const { ctx, engine } = await contextOn(path, keyDir);
      try {
        const key = await unlockPersonalKey(ctx, officer.id, PASSPHRASE);
        const signWith = signerFromKey(ctx, key.person, key.privateKey);
        for (const [i, e] of entries.entries()) {
          const id = ctx.newId();
          const s = await signWith((w): RowCheckStatement => ({
            format: 'beamwarden-limit-row-check', version: 1, id, ruleSet: 'icnirp2013', entryKey: e.key, entryExpr: e.expr, verdict: 'matches', documentExpr: null,
            reference: 'IEC 60825-1:2014 Table A.1 (invented check)', note: `bench check ${i}`, personId: w.personId, name: w.name, role: w.role, signedAt: w.signedAt, keyId: w.keyId, trustAnchor: w.trustAnchor,
          }));
          const p = s.payload;
          const row: RowCheckRow = {
            id, rule_set: p.ruleSet, entry_key: p.entryKey, entry_expr: p.entryExpr, verdict: p.verdict, document_expr: p.documentExpr, reference: p.reference, note: p.note,
            person_id: p.personId, name: p.name, role: p.role, signed_at: p.signedAt, key_id: p.keyId, trust_anchor: p.trustAnchor, signature: s.signature,
          };
          await inTransaction(ctx, 'bench check', async (tx) => insertRowCheck(tx, row));
        }
        const inForce = await checksInForce(ctx, 'icnirp2013');
        if (inForce.length !== entries.length) throw new Error(`only ${inForce.length} of ${entries.length} checks are in force`);
      } finally {
        await engine.close();
      }
    }

    store = await openRecordStore({ path, keyDir });
    const out: BenchEntry[] = [];
    try {
      const runs = 20;
      let base: SaveBase = { revisionId: '', version: 0 };
      let content = assessment.current.content;
      out.push({
        name: `limit checks: save one assessment (notes edited) with ${entries.length} signed checks in force, each re-checked`,
        median_ms: await timeMedianAsync(
          runs,
          async (i) => {
            await store.saveAssessment(assessment.id, { ...content, notes: `edited ${i}` }, base);
          },
          async () => {
            const a = await store.getAssessment(assessment.id);
            content = a.current.content;
            base = { revisionId: a.current.id, version: a.version };
            if ((content.input.settings?.rowChecks?.length ?? 0) !== entries.length && base.version > 1) throw new Error('the save did not take the checks in');
          },
        ),
        runs,
      });
      out.push({
        name: `limit checks: list the ${entries.length} checks with their verdicts (checks screen, verify)`,
        median_ms: await timeMedianAsync(runs, async () => store.listRowChecks('icnirp2013')),
        runs,
      });
    } finally {
      await store.close();
    }
    return out;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] !== undefined && /limit-checks-save\.bench\.ts$/.test(process.argv[1])) {
  for (const e of await runLimitChecksSaveBench()) console.log(`${e.name}: median ${e.median_ms.toFixed(1)} ms over ${e.runs}${e.target_ms === undefined ? '' : ` (target < ${e.target_ms} ms)`}`);
}
