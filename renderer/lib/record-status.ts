/**
 * What is in force and what is open for an assessment, in the officer's words: "signed rev 1 in
 * force (2026-12-02)", "draft rev 2 open", and the review date with whether it is due.
 */
import type { AssessmentSummary } from '../../electron/api/contracts/records.js';

export interface StatusParts {
  /** "signed rev 1 in force (2026-12-02)", or null when nothing has been signed. */
  readonly inForce: string | null;
  /** "draft rev 2 open", or null when the newest revision is the signed one. */
  readonly open: string | null;
  /** The review date that governs: the signed revision's, else the draft's. */
  readonly reviewBy: string | null;
  readonly reviewState: 'overdue' | 'due' | 'ok' | 'none';
}

export function statusParts(a: AssessmentSummary, today: string, dueBy: string): StatusParts {
  const inForce = a.inForce ? `signed rev ${a.inForce.revisionNo} in force (${a.inForce.signedAt.slice(0, 10)})` : null;
  const open = a.status === 'draft' ? `draft rev ${a.revisionNo}${a.inForce ? ' open' : ', not signed'}` : null;
  const reviewBy = a.inForce?.reviewBy ?? a.reviewBy ?? null;
  const reviewState = reviewBy === null ? 'none' : reviewBy < today ? 'overdue' : reviewBy <= dueBy ? 'due' : 'ok';
  return { inForce, open, reviewBy, reviewState };
}

/** One line, e.g. "signed rev 1 in force (2026-12-02) · draft rev 2 open · review by 2027-06-30". */
export function statusLine(a: AssessmentSummary, today: string, dueBy: string): string {
  const p = statusParts(a, today, dueBy);
  const review = p.reviewBy ? `review by ${p.reviewBy}${p.reviewState === 'overdue' ? ' (overdue)' : p.reviewState === 'due' ? ' (due soon)' : ''}` : 'no review date';
  return [p.inForce, p.open, review].filter((x): x is string => x !== null).join(' · ');
}
