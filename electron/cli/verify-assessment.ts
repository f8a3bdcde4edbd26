/**
 * One assessment checked for an auditor: every signed (and superseded) revision verified — signature,
 * key trust, fingerprint, recomputed results, chain, database protections — summed up in one line.
 */
import type { VerifyRun } from '../backend/records/assessments.js';
import type { Id, RecordStore, VerifyReport } from '../backend/records/types.js';

export interface AssessmentVerdict {
  readonly assessmentId: Id;
  readonly title: string;
  /** ok: every signed revision verified; draft: nothing signed yet (not a failure); failed: anything else. */
  readonly outcome: 'ok' | 'draft' | 'failed';
  readonly line: string;
  readonly reports: readonly VerifyReport[];
}

/** `run`: kept over the whole check of many assessments (the database protections and trust list read once). */
export async function verifyOneAssessment(store: RecordStore, assessmentId: Id, title: string, run?: VerifyRun): Promise<AssessmentVerdict> {
  try {
    return await check(store, assessmentId, title, run);
  } catch (e) {
    // A record so damaged that it cannot even be read is a failed check, not a crash of the audit.
    return { assessmentId, title, outcome: 'failed', line: `FAILED  ${assessmentId}  ${title}: cannot be read: ${(e as Error).message}`, reports: [] };
  }
}

async function check(store: RecordStore, assessmentId: Id, title: string, run?: VerifyRun): Promise<AssessmentVerdict> {
  // Chain and protections are read once for all the signed revisions of the assessment.
  const reports = await store.verifySignedRevisions(assessmentId, run);
  if (reports.length === 0) {
    const report = await store.verify(assessmentId);
    const clean = report.chainIntact && report.checks.every((c) => c.check !== 'protections' || c.ok);
    return {
      assessmentId,
      title,
      outcome: clean ? 'draft' : 'failed',
      line: clean ? `draft   ${assessmentId}  ${title}: nothing signed yet` : `FAILED  ${assessmentId}  ${title}: ${report.findings.find((f) => !/is a draft/.test(f)) ?? report.findings[0] ?? ''}`,
      reports: [report],
    };
  }
  const bad = reports.find((r) => !r.ok);
  const newest = reports.at(-1);
  if (bad) {
    const finding = bad.checks.find((c) => !c.ok)?.finding ?? bad.findings[0] ?? 'verification failed';
    return { assessmentId, title, outcome: 'failed', line: `FAILED  ${assessmentId}  ${title}: revision ${bad.revisionNo}: ${finding}`, reports };
  }
  const who = newest?.signer ? `, signed by ${newest.signer.name} on ${newest.signer.signedAt.slice(0, 10)}, key ${newest.signer.keyFingerprint}` : '';
  const co = (newest?.coSignatures ?? []).map((c) => `${c.name} on ${c.signedAt.slice(0, 10)}, key ${c.keyFingerprint}`);
  const coText = co.length ? `; co-signed by ${co.join('; ')}` : '';
  return {
    assessmentId,
    title,
    outcome: 'ok',
    line: `ok      ${assessmentId}  ${title}: revision ${newest?.revisionNo ?? ''}${who}${coText}${reports.length > 1 ? ` (${reports.length} signed revisions checked)` : ''}`,
    reports,
  };
}
