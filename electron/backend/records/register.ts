/**
 * The register: sites, rooms, laser installations, eyewear and people. Row types sit beside their
 * queries; every value is bound with `?` or a named parameter.
 */
import type { EyewearSpec, LaserInput, RoomInput } from '../../../core/model/inputs.js';
import {
  EyewearDraftSchema,
  EyewearPatchSchema,
  LaserInstallationDraftSchema,
  LaserInstallationPatchSchema,
  PersonDraftSchema,
  PersonPatchSchema,
  RoomDraftSchema,
  RoomPatchSchema,
  SiteDraftSchema,
  SitePatchSchema,
} from '../schemas/records.js';
import { EyewearSpecSchema, StoredEyewearSpecSchema, StoredLaserInputSchema } from '../schemas/inputs.js';
import { notFound, parseOrThrow, translateSqliteError, type StoreContext } from './context.js';
import { referencesToInstallation, referencesToPerson, referencesToRoom, referencesToSite, refuseIfReferenced } from './references.js';
import type {
  Eyewear,
  EyewearCondition,
  EyewearDraft,
  Id,
  LaserInstallation,
  LaserInstallationDraft,
  Person,
  PersonDraft,
  Room,
  RoomDraft,
  Site,
  SiteDraft,
} from './types.js';
import { RecordError } from './types.js';

function guard<T>(ctx: StoreContext, what: string, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    throw translateSqliteError(e, what, ctx.db.name);
  }
}

// ---------------------------------------------------------------- sites

interface SiteRow {
  id: string;
  name: string;
  building: string;
  address: string;
  notes: string;
  created_at: string;
  updated_at: string;
}
const siteFromRow = (r: SiteRow): Site => ({
  id: r.id,
  name: r.name,
  building: r.building,
  address: r.address,
  notes: r.notes,
  createdAt: r.created_at,
  updatedAt: r.updated_at,
});

export function listSites(ctx: StoreContext): Site[] {
  return (ctx.sql('SELECT * FROM site ORDER BY name, id').all() as SiteRow[]).map(siteFromRow);
}
export function getSite(ctx: StoreContext, id: Id): Site {
  const r = ctx.sql('SELECT * FROM site WHERE id = ?').get(id) as SiteRow | undefined;
  if (!r) throw notFound('site', id);
  return siteFromRow(r);
}
export function insertSite(ctx: StoreContext, s: Site): void {
  ctx
    .sql('INSERT INTO site (id, name, building, address, notes, created_at, updated_at) VALUES (@id, @name, @building, @address, @notes, @createdAt, @updatedAt)')
    .run(s);
}
export function createSite(ctx: StoreContext, draft: SiteDraft): Site {
  const d = parseOrThrow(SiteDraftSchema, draft, 'Site');
  const now = ctx.now();
  const site: Site = { id: ctx.newId(), name: d.name, building: d.building ?? '', address: d.address ?? '', notes: d.notes ?? '', createdAt: now, updatedAt: now };
  guard(ctx, `Site "${d.name}"`, () => insertSite(ctx, site));
  return site;
}
export function updateSite(ctx: StoreContext, id: Id, patch: Partial<SiteDraft>): Site {
  const p = parseOrThrow(SitePatchSchema, patch, 'Site changes');
  const next: Site = { ...getSite(ctx, id), ...stripUndefined(p), updatedAt: ctx.now() };
  guard(ctx, 'Site', () =>
    ctx.sql('UPDATE site SET name=@name, building=@building, address=@address, notes=@notes, updated_at=@updatedAt WHERE id=@id').run(next),
  );
  return next;
}
export function deleteSite(ctx: StoreContext, id: Id): void {
  const site = getSite(ctx, id);
  refuseIfReferenced(`Site "${site.name}" cannot be deleted`, referencesToSite(ctx, id), 'Move or delete them first.');
  guard(ctx, `Site "${site.name}"`, () => ctx.sql('DELETE FROM site WHERE id = ?').run(id));
}

// ---------------------------------------------------------------- rooms

interface RoomRow {
  id: string;
  site_id: string;
  code: string;
  name: string;
  responsible_person: string;
  contact: string;
  notes: string;
  created_at: string;
  updated_at: string;
}
const roomFromRow = (r: RoomRow): Room => ({
  id: r.id,
  siteId: r.site_id,
  code: r.code,
  name: r.name,
  responsiblePerson: r.responsible_person,
  contact: r.contact,
  notes: r.notes,
  createdAt: r.created_at,
  updatedAt: r.updated_at,
});

export function listRooms(ctx: StoreContext, siteId: Id): Room[] {
  return (ctx.sql('SELECT * FROM room WHERE site_id = ? ORDER BY code, id').all(siteId) as RoomRow[]).map(roomFromRow);
}
export function getRoom(ctx: StoreContext, id: Id): Room {
  const r = ctx.sql('SELECT * FROM room WHERE id = ?').get(id) as RoomRow | undefined;
  if (!r) throw notFound('room', id);
  return roomFromRow(r);
}
export function insertRoom(ctx: StoreContext, r: Room): void {
  ctx
    .sql(
      `INSERT INTO room (id, site_id, code, name, responsible_person, contact, notes, created_at, updated_at)
       VALUES (@id, @siteId, @code, @name, @responsiblePerson, @contact, @notes, @createdAt, @updatedAt)`,
    )
    .run(r);
}
export function createRoom(ctx: StoreContext, draft: RoomDraft): Room {
  const d = parseOrThrow(RoomDraftSchema, draft, 'Room');
  getSite(ctx, d.siteId);
  const now = ctx.now();
  const room: Room = {
    id: ctx.newId(),
    siteId: d.siteId,
    code: d.code,
    name: d.name ?? '',
    responsiblePerson: d.responsiblePerson ?? '',
    contact: d.contact ?? '',
    notes: d.notes ?? '',
    createdAt: now,
    updatedAt: now,
  };
  guard(ctx, `Room ${d.code}`, () => insertRoom(ctx, room));
  return room;
}
export function updateRoom(ctx: StoreContext, id: Id, patch: Partial<Omit<RoomDraft, 'siteId'>>): Room {
  const p = parseOrThrow(RoomPatchSchema, patch, 'Room changes');
  const next: Room = { ...getRoom(ctx, id), ...stripUndefined(p), updatedAt: ctx.now() };
  guard(ctx, `Room ${next.code}`, () =>
    ctx
      .sql('UPDATE room SET code=@code, name=@name, responsible_person=@responsiblePerson, contact=@contact, notes=@notes, updated_at=@updatedAt WHERE id=@id')
      .run(next),
  );
  return next;
}
export function deleteRoom(ctx: StoreContext, id: Id): void {
  const room = getRoom(ctx, id);
  refuseIfReferenced(`Room ${room.code} cannot be deleted`, referencesToRoom(ctx, id), 'Its records stay with it.');
  guard(ctx, `Room ${room.code}`, () => ctx.sql('DELETE FROM room WHERE id = ?').run(id));
}

// ---------------------------------------------------------------- laser installations

interface InstallationRow {
  id: string;
  room_id: string;
  laser_type: string;
  maker: string;
  model: string;
  serial_number: string;
  registration_number: string;
  laser_json: string;
  class_as_labelled: string | null;
  status: string;
  notes: string;
  created_at: string;
  updated_at: string;
}
function installationFromRow(r: InstallationRow): LaserInstallation {
  const laser = parseOrThrow(StoredLaserInputSchema, JSON.parse(r.laser_json), `Stored laser ${r.id}`) as LaserInput;
  return {
    id: r.id,
    roomId: r.room_id,
    laserType: r.laser_type,
    maker: r.maker,
    model: r.model,
    serialNumber: r.serial_number,
    registrationNumber: r.registration_number,
    laser,
    classAsLabelled: laser.classAsLabelled ?? null,
    status: r.status === 'retired' ? 'retired' : 'in-service',
    notes: r.notes,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}
function installationParams(i: LaserInstallation) {
  return {
    id: i.id,
    roomId: i.roomId,
    laserType: i.laserType,
    maker: i.maker,
    model: i.model,
    serialNumber: i.serialNumber,
    registrationNumber: i.registrationNumber,
    laserJson: JSON.stringify(i.laser),
    classAsLabelled: i.classAsLabelled,
    status: i.status,
    notes: i.notes,
    createdAt: i.createdAt,
    updatedAt: i.updatedAt,
  };
}

export function listInstallations(ctx: StoreContext, roomId: Id): LaserInstallation[] {
  return (ctx.sql('SELECT * FROM laser_installation WHERE room_id = ? ORDER BY created_at, rowid').all(roomId) as InstallationRow[]).map(
    installationFromRow,
  );
}
export function getInstallation(ctx: StoreContext, id: Id): LaserInstallation {
  const r = ctx.sql('SELECT * FROM laser_installation WHERE id = ?').get(id) as InstallationRow | undefined;
  if (!r) throw notFound('laser installation', id);
  return installationFromRow(r);
}
export function insertInstallation(ctx: StoreContext, i: LaserInstallation): void {
  ctx
    .sql(
      `INSERT INTO laser_installation (id, room_id, laser_type, maker, model, serial_number, registration_number, laser_json,
         class_as_labelled, status, notes, created_at, updated_at)
       VALUES (@id, @roomId, @laserType, @maker, @model, @serialNumber, @registrationNumber, @laserJson,
         @classAsLabelled, @status, @notes, @createdAt, @updatedAt)`,
    )
    .run(installationParams(i));
}
/**
 * Assessments refer to beams by id, and the calculation refuses a room where two beams share one:
 * the register refuses it when the laser is stored, not when the next assessment is made.
 */
function refuseBeamIdClash(ctx: StoreContext, roomId: Id, laser: LaserInput, exceptId: Id | null): void {
  const ours = laser.beams.map((b) => b.id).filter((x): x is string => x !== undefined);
  if (ours.length === 0) return;
  const rows = ctx.sql('SELECT id, laser_json FROM laser_installation WHERE room_id = ?').all(roomId) as Array<{ id: string; laser_json: string }>;
  for (const r of rows) {
    if (r.id === exceptId) continue;
    const other = JSON.parse(r.laser_json) as { name?: string; beams?: Array<{ id?: string }> };
    const clash = (other.beams ?? []).find((b) => b.id !== undefined && ours.includes(b.id));
    if (clash?.id !== undefined) {
      const problem = `beam id "${clash.id}" is already used by "${other.name ?? r.id}" in this room; give this beam another id`;
      throw new RecordError('invalid', `Laser ${laser.name}: ${problem}`, [{ path: 'laser.beams', problem }]);
    }
  }
}

/** The laser's id is the installation's id, so that beams in an assessment trace back to the register. */
export function createInstallation(ctx: StoreContext, draft: LaserInstallationDraft): LaserInstallation {
  const d = parseOrThrow(LaserInstallationDraftSchema, draft, 'Laser installation');
  getRoom(ctx, d.roomId);
  const now = ctx.now();
  const id = ctx.newId();
  const laser: LaserInput = { ...d.laser, id };
  refuseBeamIdClash(ctx, d.roomId, laser, null);
  const inst: LaserInstallation = {
    id,
    roomId: d.roomId,
    laserType: d.laserType ?? '',
    maker: d.maker ?? '',
    model: d.model ?? '',
    serialNumber: d.serialNumber ?? '',
    registrationNumber: d.registrationNumber ?? '',
    laser,
    classAsLabelled: laser.classAsLabelled ?? null,
    status: d.status ?? 'in-service',
    notes: d.notes ?? '',
    createdAt: now,
    updatedAt: now,
  };
  guard(ctx, `Laser ${laser.name}`, () => insertInstallation(ctx, inst));
  return inst;
}
export function updateInstallation(
  ctx: StoreContext,
  id: Id,
  patch: Partial<Omit<LaserInstallationDraft, 'roomId'>>,
): LaserInstallation {
  const p = parseOrThrow(LaserInstallationPatchSchema, patch, 'Laser installation changes');
  const prev = getInstallation(ctx, id);
  const merged = { ...prev, ...stripUndefined(p), updatedAt: ctx.now() };
  const laser: LaserInput = { ...merged.laser, id };
  const next: LaserInstallation = { ...merged, laser, classAsLabelled: laser.classAsLabelled ?? null };
  if (p.laser !== undefined) refuseBeamIdClash(ctx, prev.roomId, laser, id);
  guard(ctx, `Laser ${laser.name}`, () =>
    ctx
      .sql(
        `UPDATE laser_installation SET laser_type=@laserType, maker=@maker, model=@model, serial_number=@serialNumber,
           registration_number=@registrationNumber, laser_json=@laserJson, class_as_labelled=@classAsLabelled, status=@status,
           notes=@notes, updated_at=@updatedAt WHERE id=@id`,
      )
      .run(installationParams(next)),
  );
  return next;
}
/** Replace a laser's row in place (import of a newer copy): assessments keep referring to it. */
export function replaceInstallation(ctx: StoreContext, i: LaserInstallation): void {
  ctx
    .sql(
      `UPDATE laser_installation SET room_id=@roomId, laser_type=@laserType, maker=@maker, model=@model, serial_number=@serialNumber,
         registration_number=@registrationNumber, laser_json=@laserJson, class_as_labelled=@classAsLabelled, status=@status,
         notes=@notes, created_at=@createdAt, updated_at=@updatedAt WHERE id=@id`,
    )
    .run(installationParams(i));
}
export function deleteInstallation(ctx: StoreContext, id: Id): void {
  const inst = getInstallation(ctx, id);
  refuseIfReferenced(`Laser "${inst.laser.name}" cannot be deleted`, referencesToInstallation(ctx, id), 'Retire it instead: it then leaves new assessments but stays in the records.');
  guard(ctx, 'Laser installation (retire it instead if an assessment refers to it)', () =>
    ctx.sql('DELETE FROM laser_installation WHERE id = ?').run(id),
  );
}

// ---------------------------------------------------------------- eyewear

interface EyewearRow {
  id: string;
  site_id: string;
  tag: string;
  spec_json: string;
  location: string;
  quantity: number;
  notes: string;
  inspected_on: string | null;
  condition: EyewearCondition;
  next_inspection: string | null;
  created_at: string;
  updated_at: string;
}
function eyewearFromRow(r: EyewearRow): Eyewear {
  return {
    id: r.id,
    siteId: r.site_id,
    spec: parseOrThrow(StoredEyewearSpecSchema, JSON.parse(r.spec_json), `Stored eyewear ${r.tag}`) as EyewearSpec,
    location: r.location,
    quantity: r.quantity,
    notes: r.notes,
    inspectedOn: r.inspected_on,
    condition: r.condition,
    nextInspection: r.next_inspection,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}
const eyewearParams = (e: Eyewear) => ({
  id: e.id,
  siteId: e.siteId,
  tag: e.spec.id,
  specJson: JSON.stringify(e.spec),
  location: e.location,
  quantity: e.quantity,
  notes: e.notes,
  inspectedOn: e.inspectedOn,
  condition: e.condition,
  nextInspection: e.nextInspection,
  createdAt: e.createdAt,
  updatedAt: e.updatedAt,
});

export function listEyewear(ctx: StoreContext, siteId: Id): Eyewear[] {
  return (ctx.sql('SELECT * FROM eyewear WHERE site_id = ? ORDER BY tag, id').all(siteId) as EyewearRow[]).map(eyewearFromRow);
}
export function getEyewear(ctx: StoreContext, id: Id): Eyewear {
  const r = ctx.sql('SELECT * FROM eyewear WHERE id = ?').get(id) as EyewearRow | undefined;
  if (!r) throw notFound('eyewear', id);
  return eyewearFromRow(r);
}
export function insertEyewear(ctx: StoreContext, e: Eyewear): void {
  ctx
    .sql(
      `INSERT INTO eyewear (id, site_id, tag, spec_json, location, quantity, notes, inspected_on, condition, next_inspection, created_at, updated_at)
       VALUES (@id, @siteId, @tag, @specJson, @location, @quantity, @notes, @inspectedOn, @condition, @nextInspection, @createdAt, @updatedAt)`,
    )
    .run(eyewearParams(e));
}
export function createEyewear(ctx: StoreContext, draft: EyewearDraft): Eyewear {
  const d = parseOrThrow(EyewearDraftSchema, draft, 'Eyewear');
  getSite(ctx, d.siteId);
  const now = ctx.now();
  const e: Eyewear = {
    id: ctx.newId(),
    siteId: d.siteId,
    spec: d.spec,
    location: d.location ?? '',
    quantity: d.quantity ?? 1,
    notes: d.notes ?? '',
    inspectedOn: d.inspectedOn ?? null,
    condition: d.condition ?? 'not recorded',
    nextInspection: d.nextInspection ?? null,
    createdAt: now,
    updatedAt: now,
  };
  guard(ctx, `Eyewear ${d.spec.id}`, () => insertEyewear(ctx, e));
  return e;
}
export function updateEyewear(ctx: StoreContext, id: Id, patch: Partial<Omit<EyewearDraft, 'siteId'>>): Eyewear {
  const p = parseOrThrow(EyewearPatchSchema, patch, 'Eyewear changes');
  const next: Eyewear = { ...getEyewear(ctx, id), ...stripUndefined(p), updatedAt: ctx.now() };
  guard(ctx, `Eyewear ${next.spec.id}`, () =>
    ctx
      .sql('UPDATE eyewear SET tag=@tag, spec_json=@specJson, location=@location, quantity=@quantity, notes=@notes, inspected_on=@inspectedOn, condition=@condition, next_inspection=@nextInspection, updated_at=@updatedAt WHERE id=@id')
      .run(eyewearParams(next)),
  );
  return next;
}
export function replaceEyewear(ctx: StoreContext, e: Eyewear): void {
  ctx
    .sql(
      `UPDATE eyewear SET site_id=@siteId, tag=@tag, spec_json=@specJson, location=@location, quantity=@quantity, notes=@notes,
         created_at=@createdAt, updated_at=@updatedAt WHERE id=@id`,
    )
    .run(eyewearParams(e));
}
export function deleteEyewear(ctx: StoreContext, id: Id): void {
  getEyewear(ctx, id);
  guard(ctx, 'Eyewear', () => ctx.sql('DELETE FROM eyewear WHERE id = ?').run(id));
}

// ---------------------------------------------------------------- people

interface PersonRow {
  id: string;
  name: string;
  role: string;
  email: string;
  phone: string;
  created_at: string;
  updated_at: string;
}
const personFromRow = (r: PersonRow): Person => ({
  id: r.id,
  name: r.name,
  role: r.role,
  email: r.email,
  phone: r.phone,
  createdAt: r.created_at,
  updatedAt: r.updated_at,
});

export function listPeople(ctx: StoreContext): Person[] {
  return (ctx.sql('SELECT * FROM person ORDER BY name, id').all() as PersonRow[]).map(personFromRow);
}
export function getPerson(ctx: StoreContext, id: Id): Person {
  const r = ctx.sql('SELECT * FROM person WHERE id = ?').get(id) as PersonRow | undefined;
  if (!r) throw notFound('person', id);
  return personFromRow(r);
}
export function insertPerson(ctx: StoreContext, p: Person): void {
  ctx
    .sql('INSERT INTO person (id, name, role, email, phone, created_at, updated_at) VALUES (@id, @name, @role, @email, @phone, @createdAt, @updatedAt)')
    .run(p);
}
export function createPerson(ctx: StoreContext, draft: PersonDraft): Person {
  const d = parseOrThrow(PersonDraftSchema, draft, 'Person');
  const now = ctx.now();
  const p: Person = { id: ctx.newId(), name: d.name, role: d.role ?? '', email: d.email ?? '', phone: d.phone ?? '', createdAt: now, updatedAt: now };
  guard(ctx, `Person ${d.name}`, () => insertPerson(ctx, p));
  return p;
}
export function updatePerson(ctx: StoreContext, id: Id, patch: Partial<PersonDraft>): Person {
  const p = parseOrThrow(PersonPatchSchema, patch, 'Person changes');
  const next: Person = { ...getPerson(ctx, id), ...stripUndefined(p), updatedAt: ctx.now() };
  guard(ctx, 'Person', () =>
    ctx.sql('UPDATE person SET name=@name, role=@role, email=@email, phone=@phone, updated_at=@updatedAt WHERE id=@id').run(next),
  );
  return next;
}
export function deletePerson(ctx: StoreContext, id: Id): void {
  const person = getPerson(ctx, id);
  refuseIfReferenced(`${person.name} cannot be removed from the register`, referencesToPerson(ctx, id), 'Whoever signed records stays in the register.');
  guard(ctx, 'Person (someone who signed records stays in the register)', () => ctx.sql('DELETE FROM person WHERE id = ?').run(id));
}

// ---------------------------------------------------------------- snapshot for an assessment

/** The room's in-service lasers and its site's eyewear, as the core's RoomInput. */
export function roomInputFromRegister(ctx: StoreContext, roomId: Id): RoomInput {
  const room = getRoom(ctx, roomId);
  const lasers = listInstallations(ctx, roomId)
    .filter((i) => i.status === 'in-service')
    .map((i) => i.laser);
  // Eyewear stored under an older, looser rule (e.g. an RB6 marking; EN 208 ends at RB5) would make
  // the calculation refuse every new assessment of the site: it is left out (no protection is
  // claimed for it) and stays on the shelf for correction. Lasers are all kept: a laser left out
  // silently could hide a hazard; the workspace names what to fix. Damaged or withdrawn eyewear is
  // never offered as protection (EN 207: damaged filters must not be used).
  const eyewear = listEyewear(ctx, room.siteId)
    .filter((e) => e.condition !== 'damaged' && e.condition !== 'withdrawn')
    .map((e) => e.spec)
    .filter((spec) => EyewearSpecSchema.safeParse(spec).success);
  return { lasers, eyewear };
}

function stripUndefined<T extends object>(o: T): { [K in keyof T]: Exclude<T[K], undefined> } {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as { [K in keyof T]: Exclude<T[K], undefined> };
}
