/**
 * Register edits and deletions that name the version the officer opened (register-versions.ts):
 * the check and the write happen in one write transaction, so no other writer can slip between.
 * Without `expected` (the store's own callers: demo, tests) they behave as before.
 */
import { translateSqliteError, type StoreContext } from './context.js';
import * as R from './register.js';
import { assertEntryCurrent } from './register-versions.js';
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

function inWrite<T>(ctx: StoreContext, what: string, fn: () => T): T {
  try {
    return ctx.db.transaction(fn).immediate();
  } catch (e) {
    throw translateSqliteError(e, what, ctx.db.name);
  }
}

/** The entry, or null when it is not in the register (any more). */
function orGone<T>(get: () => T): T | null {
  try {
    return get();
  } catch (e) {
    if (e instanceof RecordError && e.code === 'not-found') return null;
    throw e;
  }
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

export function updateSite(ctx: StoreContext, id: Id, patch: SiteSeen, expected?: RegisterBase<SiteSeen>): Site {
  return inWrite(ctx, 'Site', () => {
    const now = orGone(() => R.getSite(ctx, id));
    assertEntryCurrent(siteTitle(now, expected?.seen), 'edit', now, expected);
    return R.updateSite(ctx, id, patch);
  });
}
export function deleteSite(ctx: StoreContext, id: Id, expected?: RegisterBase<SiteSeen>): void {
  inWrite(ctx, 'Site', () => {
    const now = orGone(() => R.getSite(ctx, id));
    assertEntryCurrent(siteTitle(now, expected?.seen), 'delete', now, expected);
    R.deleteSite(ctx, id);
  });
}

export function updateRoom(ctx: StoreContext, id: Id, patch: RoomSeen, expected?: RegisterBase<RoomSeen>): Room {
  return inWrite(ctx, 'Room', () => {
    const now = orGone(() => R.getRoom(ctx, id));
    assertEntryCurrent(roomTitle(now, expected?.seen), 'edit', now, expected);
    return R.updateRoom(ctx, id, patch);
  });
}
export function deleteRoom(ctx: StoreContext, id: Id, expected?: RegisterBase<RoomSeen>): void {
  inWrite(ctx, 'Room', () => {
    const now = orGone(() => R.getRoom(ctx, id));
    assertEntryCurrent(roomTitle(now, expected?.seen), 'delete', now, expected);
    R.deleteRoom(ctx, id);
  });
}

export function updateInstallation(ctx: StoreContext, id: Id, patch: InstallationSeen, expected?: RegisterBase<InstallationSeen>): LaserInstallation {
  return inWrite(ctx, 'Laser installation', () => {
    const now = orGone(() => R.getInstallation(ctx, id));
    assertEntryCurrent(laserTitle(now, expected?.seen), 'edit', now, expected);
    return R.updateInstallation(ctx, id, patch);
  });
}
export function deleteInstallation(ctx: StoreContext, id: Id, expected?: RegisterBase<InstallationSeen>): void {
  inWrite(ctx, 'Laser installation', () => {
    const now = orGone(() => R.getInstallation(ctx, id));
    assertEntryCurrent(laserTitle(now, expected?.seen), 'delete', now, expected);
    R.deleteInstallation(ctx, id);
  });
}

export function updateEyewear(ctx: StoreContext, id: Id, patch: EyewearSeen, expected?: RegisterBase<EyewearSeen>): Eyewear {
  return inWrite(ctx, 'Eyewear', () => {
    const now = orGone(() => R.getEyewear(ctx, id));
    assertEntryCurrent(eyewearTitle(now, expected?.seen), 'edit', now, expected);
    return R.updateEyewear(ctx, id, patch);
  });
}
export function deleteEyewear(ctx: StoreContext, id: Id, expected?: RegisterBase<EyewearSeen>): void {
  inWrite(ctx, 'Eyewear', () => {
    const now = orGone(() => R.getEyewear(ctx, id));
    assertEntryCurrent(eyewearTitle(now, expected?.seen), 'delete', now, expected);
    R.deleteEyewear(ctx, id);
  });
}

export function updatePerson(ctx: StoreContext, id: Id, patch: PersonSeen, expected?: RegisterBase<PersonSeen>): Person {
  return inWrite(ctx, 'Person', () => {
    const now = orGone(() => R.getPerson(ctx, id));
    assertEntryCurrent(personTitle(now, expected?.seen), 'edit', now, expected);
    return R.updatePerson(ctx, id, patch);
  });
}
export function deletePerson(ctx: StoreContext, id: Id, expected?: RegisterBase<PersonSeen>): void {
  inWrite(ctx, 'Person', () => {
    const now = orGone(() => R.getPerson(ctx, id));
    assertEntryCurrent(personTitle(now, expected?.seen), 'delete', now, expected);
    R.deletePerson(ctx, id);
  });
}
