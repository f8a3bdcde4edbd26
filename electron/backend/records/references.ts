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

function assessmentsWhere(ctx: StoreContext, where: string, id: Id): string[] {
  const rows = ctx
    .sql(
      `SELECT r.title AS t FROM assessment a JOIN revision r ON r.assessment_id = a.id
        AND r.revision_no = (SELECT max(revision_no) FROM revision WHERE assessment_id = a.id) WHERE ${where} ORDER BY a.created_at`,
    )
    .all(id) as Array<{ t: string }>;
  return listed('assessment', 'assessments', quoted(rows));
}

export function referencesToInstallation(ctx: StoreContext, id: Id): string[] {
  return assessmentsWhere(ctx, 'a.installation_id = ?', id);
}

export function referencesToRoom(ctx: StoreContext, id: Id): string[] {
  const lasers = (ctx.sql('SELECT laser_json FROM laser_installation WHERE room_id = ? ORDER BY created_at').all(id) as Array<{ laser_json: string }>).map(
    (r) => `"${(JSON.parse(r.laser_json) as { name: string }).name}"`,
  );
  return [...listed('laser', 'lasers', lasers), ...assessmentsWhere(ctx, 'a.room_id = ?', id)];
}

export function referencesToSite(ctx: StoreContext, id: Id): string[] {
  const rooms = (ctx.sql('SELECT code AS t FROM room WHERE site_id = ? ORDER BY code').all(id) as Array<{ t: string }>).map((r) => r.t);
  const eyewear = (ctx.sql('SELECT tag AS t FROM eyewear WHERE site_id = ? ORDER BY tag').all(id) as Array<{ t: string }>).map((r) => r.t);
  return [...listed('room', 'rooms', rooms), ...listed('eyewear', 'eyewear', eyewear)];
}

export function referencesToPerson(ctx: StoreContext, id: Id): string[] {
  const rows = ctx
    .sql('SELECT r.title AS t, r.revision_no AS n FROM signature s JOIN revision r ON r.id = s.revision_id WHERE s.person_id = ? ORDER BY s.signed_at')
    .all(id) as Array<{ t: string; n: number }>;
  return rows.length ? [`signed ${listed('assessment', 'assessments', rows.map((r) => `"${r.t}" (revision ${r.n})`))[0] ?? ''}`] : [];
}

/** Throws RecordError('conflict') "<what>: <refs> refer to it. <advice>" when anything refers to it. */
export function refuseIfReferenced(what: string, refs: readonly string[], advice: string): void {
  if (refs.length === 0) return;
  const signedOnly = refs.length === 1 && refs[0]?.startsWith('signed ');
  const tail = signedOnly ? `: they ${refs[0] ?? ''}.` : `: ${refs.join('; ')} ${refs.length === 1 && !/^\d/.test(refs[0] ?? '') ? 'refers' : 'refer'} to it.`;
  throw new RecordError('conflict', `${what}${tail} ${advice}`);
}
