/**
 * What still refers to a register entry, in the officer's words ("assessment "Laser hazard
 * evaluation, room B2.14"", "room B2.16"), so that a refused delete names the records instead of
 * SQLite's "FOREIGN KEY constraint failed". The database's foreign keys stay the last guard.
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

export async function referencesToRoom(ctx: StoreContext, id: Id): Promise<string[]> {
  const lasers = (await ctx.q.all('SELECT laser_json FROM laser_installation WHERE room_id = ? ORDER BY created_at', id) as Array<{ laser_json: string }>).map(
    (r) => `"${(JSON.parse(r.laser_json) as { name: string }).name}"`,
  );
  return [...listed('laser', 'lasers', lasers), ...await assessmentsWhere(ctx, 'a.room_id = ?', id)];
}

export async function referencesToSite(ctx: StoreContext, id: Id): Promise<string[]> {
  const rooms = (await ctx.q.all('SELECT code AS t FROM room WHERE site_id = ? ORDER BY code', id) as Array<{ t: string }>).map((r) => r.t);
  const eyewear = (await ctx.q.all('SELECT tag AS t FROM eyewear WHERE site_id = ? ORDER BY tag', id) as Array<{ t: string }>).map((r) => r.t);
  return [...listed('room', 'rooms', rooms), ...listed('eyewear', 'eyewear', eyewear)];
}

export async function referencesToPerson(ctx: StoreContext, id: Id): Promise<string[]> {
  const rows = await ctx.q.all('SELECT r.title AS t, r.revision_no AS n FROM signature s JOIN revision r ON r.id = s.revision_id WHERE s.person_id = ? ORDER BY s.signed_at', id) as Array<{ t: string; n: number }>;
  return rows.length ? [`signed ${listed('assessment', 'assessments', rows.map((r) => `"${r.t}" (revision ${r.n})`))[0] ?? ''}`] : [];
}

/** Throws RecordError('conflict') "<what>: <refs> refer to it. <advice>" when anything refers to it. */
export function refuseIfReferenced(what: string, refs: readonly string[], advice: string): void {
  if (refs.length === 0) return;
  const signedOnly = refs.length === 1 && refs[0]?.startsWith('signed ');
  const tail = signedOnly ? `: they ${refs[0] ?? ''}.` : `: ${refs.join('; ')} ${refs.length === 1 && !/^\d/.test(refs[0] ?? '') ? 'refers' : 'refer'} to it.`;
  throw new RecordError('conflict', `${what}${tail} ${advice}`);
}
