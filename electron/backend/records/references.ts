/**
 * What still refers to a laser, in the officer's words ("assessment "Laser hazard evaluation, room
 * B2.14""), so that a refused delete names the records instead of SQLite's "FOREIGN KEY constraint
 * failed". The database's foreign keys stay the last guard. Sites, rooms and people:
 * register-deletion.ts.
 */
import type { StoreContext } from './context.js';
import { RecordError, type Id } from './types.js';

const MAX_LISTED = 5;

function listed(kind: string, plural: string, names: readonly string[]): string[] {
  if (names.length === 0) return [];
  const shown = names.slice(0, MAX_LISTED).join(', ');
  const more = names.length > MAX_LISTED ? ` and ${names.length - MAX_LISTED} more` : '';
  return [`${names.length === 1 ? kind : `${names.length} ${plural}`} ${shown}${more}`];
}

const quoted = (rows: ReadonlyArray<{ t: string }>) => rows.map((r) => `"${r.t}"`);

async function assessmentsWhere(ctx: StoreContext, where: string, id: Id): Promise<string[]> {
  const rows = await ctx.q.all(`SELECT r.title AS t FROM assessment a JOIN revision r ON r.assessment_id = a.id
        AND r.revision_no = (SELECT max(revision_no) FROM revision WHERE assessment_id = a.id) WHERE ${where} ORDER BY a.created_at`, id) as Array<{ t: string }>;
  return listed('assessment', 'assessments', quoted(rows));
}

export async function referencesToInstallation(ctx: StoreContext, id: Id): Promise<string[]> {
  return await assessmentsWhere(ctx, 'a.installation_id = ?', id);
}

/** Throws RecordError('conflict') "<what>: <refs> refer to it. <advice>" when anything refers to it. */
export function refuseIfReferenced(what: string, refs: readonly string[], advice: string): void {
  if (refs.length === 0) return;
  const signedOnly = refs.length === 1 && refs[0]?.startsWith('signed ');
  const tail = signedOnly ? `: they ${refs[0] ?? ''}.` : `: ${refs.join('; ')} ${refs.length === 1 && !/^\d/.test(refs[0] ?? '') ? 'refers' : 'refer'} to it.`;
  throw new RecordError('conflict', `${what}${tail} ${advice}`);
}
