/**
 * Register edits and deletions that name the version the officer opened (register-versions.ts):
 * the check and the write happen in one write transaction (inTransaction: joined when the caller
 * already holds one), so no other writer can slip between.
 * Without `expected` (the store's own callers: demo, tests) they behave as before.
 */
import { inTransaction, lockRow, type StoreContext } from './context.js';
import * as R from './register.js';
import { assertEntryCurrent, entryIsStale, type StoredEntry } from './register-versions.js';
import { deletePersonIfUnsigned, deleteRoomWithDrafts, deleteSiteWithDrafts } from './register-deletion.js';
import {
  RecordError,
  type Eyewear,
  type EyewearDraft,
  type Id,
  type LaserInstallation,
  type LaserInstallationDraft,
  type Person,
  type PersonDraft,
  type RegisterBase,
  type Room,
  type RoomDraft,
  type Site,
  type SiteDraft,
} from './types.js';

/** The entry, or null when it is not in the register (any more). */
async function orGone<T>(get: () => Promise<T>): Promise<T | null> {
  try {
    return await get();
  } catch (e) {
    if (e instanceof RecordError && e.code === 'not-found') return null;
    throw e;
  }
}

/** The version check of register-versions.ts, naming the account that last wrote the entry on an institution register. */
async function assertCurrent(
  tx: StoreContext,
  table: 'site' | 'room' | 'laser_installation' | 'eyewear' | 'person',
  id: Id,
  title: string,
  action: 'edit' | 'delete',
  now: StoredEntry | null,
  expected: RegisterBase<object> | undefined,
): Promise<void> {
  const by = entryIsStale(now, expected) ? await tx.engine.lastWriter(tx.q, table, id) : null;
  assertEntryCurrent(title, action, now, expected, by);
}

type SiteSeen = Partial<SiteDraft>;
type RoomSeen = Partial<Omit<RoomDraft, 'siteId'>>;
type InstallationSeen = Partial<Omit<LaserInstallationDraft, 'roomId'>>;
type EyewearSeen = Partial<Omit<EyewearDraft, 'siteId'>>;
type PersonSeen = Partial<PersonDraft>;

const siteTitle = (s: Site | null, seen?: SiteSeen) => `Site "${s?.name ?? seen?.name ?? 'unnamed'}"`;
const roomTitle = (r: Room | null, seen?: RoomSeen) => `Room ${r?.code ?? seen?.code ?? ''}`.trim();
const laserTitle = (i: LaserInstallation | null, seen?: InstallationSeen) => `Laser "${i?.laser.name ?? seen?.laser?.name ?? 'unnamed'}"`;
const eyewearTitle = (e: Eyewear | null, seen?: EyewearSeen) => `Eyewear ${e?.spec.id ?? seen?.spec?.id ?? ''}`.trim();
const personTitle = (p: Person | null, seen?: PersonSeen) => p?.name ?? seen?.name ?? 'This person';

export function updateSite(ctx: StoreContext, id: Id, patch: SiteSeen, expected?: RegisterBase<SiteSeen>): Promise<Site> {
  return inTransaction(ctx, 'Site', async (tx) => {
    await lockRow(tx, 'site', id);
    const now = await orGone(() => R.getSite(tx, id));
    await assertCurrent(tx, 'site', id, siteTitle(now, expected?.seen), 'edit', now, expected);
    return await R.updateSite(tx, id, patch);
  });
}
export function deleteSite(ctx: StoreContext, id: Id, expected?: RegisterBase<SiteSeen>): Promise<void> {
  return inTransaction(ctx, 'Site', async (tx) => {
    await lockRow(tx, 'site', id);
    const now = await orGone(() => R.getSite(tx, id));
    await assertCurrent(tx, 'site', id, siteTitle(now, expected?.seen), 'delete', now, expected);
    await deleteSiteWithDrafts(tx, id);
  });
}

export function updateRoom(ctx: StoreContext, id: Id, patch: RoomSeen, expected?: RegisterBase<RoomSeen>): Promise<Room> {
  return inTransaction(ctx, 'Room', async (tx) => {
    await lockRow(tx, 'room', id);
    const now = await orGone(() => R.getRoom(tx, id));
    await assertCurrent(tx, 'room', id, roomTitle(now, expected?.seen), 'edit', now, expected);
    return await R.updateRoom(tx, id, patch);
  });
}
export function deleteRoom(ctx: StoreContext, id: Id, expected?: RegisterBase<RoomSeen>): Promise<void> {
  return inTransaction(ctx, 'Room', async (tx) => {
    await lockRow(tx, 'room', id);
    const now = await orGone(() => R.getRoom(tx, id));
    await assertCurrent(tx, 'room', id, roomTitle(now, expected?.seen), 'delete', now, expected);
    await deleteRoomWithDrafts(tx, id);
  });
}

export function updateInstallation(ctx: StoreContext, id: Id, patch: InstallationSeen, expected?: RegisterBase<InstallationSeen>): Promise<LaserInstallation> {
  return inTransaction(ctx, 'Laser installation', async (tx) => {
    await lockRow(tx, 'laser_installation', id);
    const now = await orGone(() => R.getInstallation(tx, id));
    await assertCurrent(tx, 'laser_installation', id, laserTitle(now, expected?.seen), 'edit', now, expected);
    return await R.updateInstallation(tx, id, patch);
  });
}
export function deleteInstallation(ctx: StoreContext, id: Id, expected?: RegisterBase<InstallationSeen>): Promise<void> {
  return inTransaction(ctx, 'Laser installation', async (tx) => {
    await lockRow(tx, 'laser_installation', id);
    const now = await orGone(() => R.getInstallation(tx, id));
    await assertCurrent(tx, 'laser_installation', id, laserTitle(now, expected?.seen), 'delete', now, expected);
    await R.deleteInstallation(tx, id);
  });
}

export function updateEyewear(ctx: StoreContext, id: Id, patch: EyewearSeen, expected?: RegisterBase<EyewearSeen>): Promise<Eyewear> {
  return inTransaction(ctx, 'Eyewear', async (tx) => {
    await lockRow(tx, 'eyewear', id);
    const now = await orGone(() => R.getEyewear(tx, id));
    await assertCurrent(tx, 'eyewear', id, eyewearTitle(now, expected?.seen), 'edit', now, expected);
    return await R.updateEyewear(tx, id, patch);
  });
}
export function deleteEyewear(ctx: StoreContext, id: Id, expected?: RegisterBase<EyewearSeen>): Promise<void> {
  return inTransaction(ctx, 'Eyewear', async (tx) => {
    await lockRow(tx, 'eyewear', id);
    const now = await orGone(() => R.getEyewear(tx, id));
    await assertCurrent(tx, 'eyewear', id, eyewearTitle(now, expected?.seen), 'delete', now, expected);
    await R.deleteEyewear(tx, id);
  });
}

export function updatePerson(ctx: StoreContext, id: Id, patch: PersonSeen, expected?: RegisterBase<PersonSeen>): Promise<Person> {
  return inTransaction(ctx, 'Person', async (tx) => {
    await lockRow(tx, 'person', id);
    const now = await orGone(() => R.getPerson(tx, id));
    await assertCurrent(tx, 'person', id, personTitle(now, expected?.seen), 'edit', now, expected);
    return await R.updatePerson(tx, id, patch);
  });
}
export function deletePerson(ctx: StoreContext, id: Id, expected?: RegisterBase<PersonSeen>): Promise<void> {
  return inTransaction(ctx, 'Person', async (tx) => {
    await lockRow(tx, 'person', id);
    const now = await orGone(() => R.getPerson(tx, id));
    await assertCurrent(tx, 'person', id, personTitle(now, expected?.seen), 'delete', now, expected);
    await deletePersonIfUnsigned(tx, id);
  });
}
