/**
 * Deleting a site, a room or a person from the register, and what the confirmation says first.
 *
 * Signed records are kept: anything a signed (or superseded) revision, a signature or a
 * co-signature refers to is never deleted, and the refusal says so in the officer's words, naming
 * the records. Everything else goes with it in one transaction: a room's lasers and its draft-only
 * assessments (drafts are work in progress that nobody signed); a site's rooms (each as above) and
 * its eyewear shelf. The confirmation (`deletionImpact`) names what is deleted and what goes with
 * it before anything is touched; the deletion checks again inside its transaction.
 */
import type { StoreContext } from './context.js';
import { getPerson, getRoom, getSite } from './register.js';
import { RecordError, type DeletionImpact, type DeletionKind, type Id, type Room } from './types.js';

const MAX_LISTED = 5;

/** `2 lasers: "A", "B"` / `1 laser: "A"`, at most five names. */
function counted(one: string, many: string, names: readonly string[]): string[] {
  if (names.length === 0) return [];
  const shown = names.slice(0, MAX_LISTED).join(', ');
  const more = names.length > MAX_LISTED ? ` and ${names.length - MAX_LISTED} more` : '';
  return [`${names.length} ${names.length === 1 ? one : many}: ${shown}${more}`];
}

const q = (s: string) => `"${s}"`;

interface RoomParts {
  readonly room: Room;
  readonly lasers: readonly string[];
  readonly drafts: readonly string[];
  readonly signed: readonly string[];
  /** Assessments of other rooms that name one of this room's lasers. */
  readonly usedElsewhere: readonly string[];
}

async function roomParts(ctx: StoreContext, room: Room): Promise<RoomParts> {
  const lasers = (await ctx.q.all<{ laser_json: string }>('SELECT laser_json FROM laser_installation WHERE room_id = ? ORDER BY created_at, id', room.id)).map(
    (r) => q((JSON.parse(r.laser_json) as { name: string }).name),
  );
  const assessments = await ctx.q.all<{ t: string; signed: number }>(
    `SELECT (SELECT title FROM revision WHERE assessment_id = a.id ORDER BY revision_no DESC LIMIT 1) AS t,
            EXISTS (SELECT 1 FROM revision WHERE assessment_id = a.id AND status <> 'draft') AS signed
       FROM assessment a WHERE a.room_id = ? ORDER BY a.created_at, a.id`,
    room.id,
  );
  const usedElsewhere = await ctx.q.all<{ t: string; code: string }>(
    `SELECT (SELECT title FROM revision WHERE assessment_id = a.id ORDER BY revision_no DESC LIMIT 1) AS t, r.code AS code
       FROM assessment a JOIN room r ON r.id = a.room_id
      WHERE a.room_id <> ? AND a.installation_id IN (SELECT id FROM laser_installation WHERE room_id = ?) ORDER BY a.created_at, a.id`,
    room.id,
    room.id,
  );
  return {
    room,
    lasers,
    drafts: assessments.filter((a) => !a.signed).map((a) => q(a.t ?? 'untitled')),
    signed: assessments.filter((a) => a.signed).map((a) => q(a.t ?? 'untitled')),
    usedElsewhere: usedElsewhere.map((a) => `${q(a.t ?? 'untitled')} (room ${a.code})`),
  };
}

const roomName = (r: Room) => `Room ${r.code}${r.name ? ` (${r.name})` : ''}`;

function roomRefusal(p: RoomParts): string | null {
  if (p.signed.length > 0) {
    return `Room ${p.room.code} cannot be deleted: it has ${counted('signed assessment', 'signed assessments', p.signed)[0] ?? ''}. Signed records are kept, so the room stays in the register.`;
  }
  if (p.usedElsewhere.length > 0) {
    return `Room ${p.room.code} cannot be deleted: its lasers are named by ${counted('assessment', 'assessments', p.usedElsewhere)[0] ?? ''} of other rooms. Move those lasers or delete those drafts first.`;
  }
  return null;
}

async function roomImpact(ctx: StoreContext, id: Id): Promise<DeletionImpact> {
  const p = await roomParts(ctx, await getRoom(ctx, id));
  return {
    what: roomName(p.room),
    alsoDeleted: [...counted('laser', 'lasers', p.lasers), ...counted('draft assessment (never signed)', 'draft assessments (never signed)', p.drafts)],
    refusal: roomRefusal(p),
  };
}

async function siteParts(ctx: StoreContext, id: Id) {
  const site = await getSite(ctx, id);
  const rooms: RoomParts[] = [];
  for (const r of await ctx.q.all<{ id: string }>('SELECT id FROM room WHERE site_id = ? ORDER BY code, id', id)) rooms.push(await roomParts(ctx, await getRoom(ctx, r.id)));
  const eyewear = (await ctx.q.all<{ tag: string }>('SELECT tag FROM eyewear WHERE site_id = ? ORDER BY tag', id)).map((e) => e.tag);
  return { site, rooms, eyewear };
}

async function siteImpact(ctx: StoreContext, id: Id): Promise<DeletionImpact> {
  const { site, rooms, eyewear } = await siteParts(ctx, id);
  const withSigned = rooms.filter((r) => r.signed.length > 0);
  const firstRefusal = rooms.map(roomRefusal).find((x) => x !== null) ?? null;
  return {
    what: `Site "${site.name}"`,
    alsoDeleted: [
      ...counted('room', 'rooms', rooms.map((r) => r.room.code)),
      ...counted('laser', 'lasers', rooms.flatMap((r) => r.lasers)),
      ...counted('draft assessment (never signed)', 'draft assessments (never signed)', rooms.flatMap((r) => r.drafts)),
      ...counted('eyewear on the shelf', 'eyewear on the shelf', eyewear),
    ],
    refusal:
      withSigned.length > 0
        ? `Site "${site.name}" cannot be deleted: ${withSigned.length === 1 ? 'room' : 'rooms'} ${withSigned.map((r) => r.room.code).join(', ')} ${withSigned.length === 1 ? 'has' : 'have'} signed assessments. Signed records are kept, so the site stays in the register.`
        : firstRefusal,
  };
}

async function personImpact(ctx: StoreContext, id: Id): Promise<DeletionImpact> {
  const person = await getPerson(ctx, id);
  const signed = await ctx.q.all<{ t: string; n: number }>(
    'SELECT r.title AS t, r.revision_no AS n FROM signature s JOIN revision r ON r.id = s.revision_id WHERE s.person_id = ? ORDER BY s.signed_at',
    id,
  );
  const coSigned = await ctx.q.all<{ t: string; n: number }>(
    'SELECT r.title AS t, r.revision_no AS n FROM co_signature c JOIN revision r ON r.id = c.revision_id WHERE c.person_id = ? ORDER BY c.signed_at',
    id,
  );
  const keys = await ctx.q.get<{ n: number }>('SELECT count(*) AS n FROM person_key WHERE person_id = ?', id);
  const records = [...signed, ...coSigned].map((r) => `"${r.t}" (revision ${r.n})`);
  const what = `${person.name}${person.role ? ` (${person.role})` : ''}`;
  let refusal: string | null = null;
  if (records.length > 0) {
    refusal = `${person.name} cannot be removed from the register: they ${signed.length > 0 ? 'signed' : 'countersigned'} ${counted('assessment', 'assessments', records)[0] ?? ''}. Signed records are kept with their signers, so ${person.name} stays in the register.`;
  } else if ((keys?.n ?? 0) > 0) {
    refusal = `${person.name} cannot be removed from the register: they hold a signing key, and a key holder stays in the register so that what the key signs can be checked. If they leave, retire the key under Signing keys.`;
  }
  return { what, alsoDeleted: [], refusal };
}

/** What deleting this entry would delete with it, or why it cannot be deleted. */
export async function deletionImpact(ctx: StoreContext, kind: DeletionKind, id: Id): Promise<DeletionImpact> {
  return kind === 'site' ? await siteImpact(ctx, id) : kind === 'room' ? await roomImpact(ctx, id) : await personImpact(ctx, id);
}

function refuse(impact: DeletionImpact): void {
  if (impact.refusal !== null) throw new RecordError('conflict', impact.refusal);
}

/** A room's drafts, then its draft-only assessments, its lasers and the room (inside the caller's transaction). */
async function deleteRoomRows(ctx: StoreContext, id: Id): Promise<void> {
  // The database's triggers refuse to delete a signed revision or an assessment with one: the last guard.
  await ctx.q.run("DELETE FROM revision WHERE status = 'draft' AND assessment_id IN (SELECT id FROM assessment WHERE room_id = ?)", id);
  await ctx.q.run('DELETE FROM assessment WHERE room_id = ?', id);
  await ctx.q.run('DELETE FROM laser_installation WHERE room_id = ?', id);
  await ctx.q.run('DELETE FROM room WHERE id = ?', id);
}

/** Delete a room with its lasers and draft-only assessments; refused when a signed record refers to it. Call inside a transaction. */
export async function deleteRoomWithDrafts(ctx: StoreContext, id: Id): Promise<void> {
  const impact = await roomImpact(ctx, id);
  refuse(impact);
  await deleteRoomRows(ctx, id);
  await ctx.audit('deleted', 'room', id, [impact.what, ...impact.alsoDeleted].join('; '));
}

/** Delete a site with its rooms (as above) and its eyewear; refused when a signed record refers to any of it. Call inside a transaction. */
export async function deleteSiteWithDrafts(ctx: StoreContext, id: Id): Promise<void> {
  const impact = await siteImpact(ctx, id);
  refuse(impact);
  for (const r of await ctx.q.all<{ id: string }>('SELECT id FROM room WHERE site_id = ?', id)) await deleteRoomRows(ctx, r.id);
  await ctx.q.run('DELETE FROM eyewear WHERE site_id = ?', id);
  await ctx.q.run('DELETE FROM site WHERE id = ?', id);
  await ctx.audit('deleted', 'site', id, [impact.what, ...impact.alsoDeleted].join('; '));
}

/** Delete a person who never signed, countersigned or held a signing key. Call inside a transaction. */
export async function deletePersonIfUnsigned(ctx: StoreContext, id: Id): Promise<void> {
  const impact = await personImpact(ctx, id);
  refuse(impact);
  await ctx.q.run('DELETE FROM person WHERE id = ?', id);
  await ctx.audit('deleted', 'person', id, impact.what);
}
