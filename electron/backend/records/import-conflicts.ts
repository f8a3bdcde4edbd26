/**
 * Import never discards an officer's work. When an imported file brings another version of a
 * draft this database also has (edited on two machines, or signed elsewhere while edited here),
 * both are kept: the version that does not stay in the assessment is kept as a draft of its own,
 * a new assessment of the same room titled so that the officer sees it in the room's list and can
 * compare and merge by hand. Nothing is decided silently by whichever copy is "newer".
 */
import { clockTime, insertRevisionRow, type RevisionRow } from './assessments.js';
import type { StoreContext } from './context.js';
import type { Id, KeptDraft } from './types.js';

const TITLE_MAX = 300;

function copyTitle(original: string, whose: 'yours' | 'imported', at: string): string {
  const suffix = whose === 'yours' ? ` — your draft, kept at import ${clockTime(at)}` : ` — imported draft, kept at import ${clockTime(at)}`;
  return original.slice(0, TITLE_MAX - suffix.length) + suffix;
}

/**
 * Keep the draft `row` (content and results as they are) as revision 1 of a new assessment in the
 * same room. Returns null when an identical copy is already kept (importing one file twice keeps
 * one copy, not two).
 */
export async function keepDraftAsCopy(
  ctx: StoreContext,
  row: Pick<RevisionRow, 'content_json' | 'results_z' | 'calculated_with' | 'updated_at'>,
  of: { readonly assessmentId: Id; readonly roomId: Id; readonly installationId: Id | null },
  whose: 'yours' | 'imported',
  reason: string,
): Promise<KeptDraft | null> {
  const content = JSON.parse(row.content_json) as { title: string; reviewBy: string | null };
  const marker = `${whose === 'yours' ? 'local' : 'imported'} draft of assessment ${of.assessmentId}, last saved ${row.updated_at}`;
  const already = await ctx.q.get("SELECT a.id FROM audit_event e JOIN assessment a ON a.id = e.entity_id WHERE e.action = 'kept-draft' AND e.detail = ?", marker) as { id: string } | undefined;
  if (already) return null;
  const now = ctx.now();
  const title = copyTitle(content.title, whose, now);
  const copyContent = { ...content, title };
  const id = ctx.newId();
  await ctx.q.run('INSERT INTO assessment (id, room_id, installation_id, created_at) VALUES (?, ?, ?, ?)', id, of.roomId, of.installationId, now);
  await insertRevisionRow(ctx, {
    id: ctx.newId(),
    assessment_id: id,
    revision_no: 1,
    status: 'draft',
    content_json: JSON.stringify(copyContent),
    results_z: row.results_z,
    calculated_with: row.calculated_with,
    based_on: null,
    created_at: now,
    updated_at: row.updated_at,
    title,
    review_by: content.reviewBy,
    version: 1,
  });
  await ctx.audit('kept-draft', 'assessment', id, marker);
  return { assessmentId: of.assessmentId, keptAs: id, title, whose, reason };
}
