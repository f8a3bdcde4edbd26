/**
 * The signing log: one JSON line per signature made (or accepted by import) on this installation,
 * appended to a file beside the trust list — outside the database. The revision chain inside the
 * database detects a removed or reordered middle revision; only a witness outside it can tell that
 * the NEWEST signed revision was deleted (and the one before it put back to "signed").
 */
import { appendFileSync, existsSync, mkdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';
import { storageError } from './storage-errors.js';

export const SIGNING_LOG_FILE = 'beamwarden-signing-log.jsonl';

const LogLineSchema = z.strictObject({
  assessmentId: z.string(),
  revisionId: z.string(),
  revisionNo: z.number().int(),
  /** SHA-256 of the canonical signed statement (the revision's chain link). */
  link: z.string(),
  signedAt: z.string(),
  keyId: z.string(),
});
export type SigningLogLine = z.infer<typeof LogLineSchema>;

const cache = new Map<string, { size: number; mtimeMs: number; byAssessment: Map<string, SigningLogLine[]> }>();

export function appendSigningLog(dir: string, line: SigningLogLine): void {
  const path = join(dir, SIGNING_LOG_FILE);
  try {
    mkdirSync(dir, { recursive: true });
    appendFileSync(path, `${JSON.stringify(LogLineSchema.parse(line))}\n`, { mode: 0o644 });
  } catch (e) {
    throw storageError(e, path, 'The signing log') ?? e;
  }
}

/** Entries for one assessment (lines that are not readable are skipped: the log is a witness, not a store). */
export function signingLogFor(dir: string, assessmentId: string): readonly SigningLogLine[] {
  const path = join(dir, SIGNING_LOG_FILE);
  if (!existsSync(path)) return [];
  const st = statSync(path);
  let hit = cache.get(path);
  if (!hit || hit.size !== st.size || hit.mtimeMs !== st.mtimeMs) {
    const byAssessment = new Map<string, SigningLogLine[]>();
    for (const text of readFileSync(path, 'utf8').split('\n')) {
      if (!text.trim()) continue;
      let parsed: unknown;
      try {
        parsed = JSON.parse(text);
      } catch {
        continue;
      }
      const r = LogLineSchema.safeParse(parsed);
      if (!r.success) continue;
      const list = byAssessment.get(r.data.assessmentId) ?? [];
      if (!list.some((x) => x.revisionId === r.data.revisionId && x.link === r.data.link)) list.push(r.data);
      byAssessment.set(r.data.assessmentId, list);
    }
    hit = { size: st.size, mtimeMs: st.mtimeMs, byAssessment };
    cache.set(path, hit);
  }
  return hit.byAssessment.get(assessmentId) ?? [];
}
