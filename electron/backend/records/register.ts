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
import { notFound, parseOrThrow, type StoreContext } from './context.js';
import { named } from './named-params.js';
import { referencesToInstallation, refuseIfReferenced } from './references.js';
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
import { laterStamp } from './stamps.js';

async function guard<T>(ctx: StoreContext, what: string, fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (e) {
    throw ctx.engine.translateError(e, what, true);
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

export async function listSites(ctx: StoreContext): Promise<Site[]> {
  return (await ctx.q.all('SELECT * FROM site ORDER BY name, id') as SiteRow[]).map(siteFromRow);
}
export async function getSite(ctx: StoreContext, id: Id): Promise<Site> {
  const r = await ctx.q.get('SELECT * FROM site WHERE id = ?', id) as SiteRow | undefined;
  if (!r) throw notFound('site', id);
  return siteFromRow(r);
}
export async function insertSite(ctx: StoreContext, s: Site): Promise<void> {
  await ctx.q.run(...named('INSERT INTO site (id, name, building, address, notes, created_at, updated_at) VALUES (@id, @name, @building, @address, @notes, @createdAt, @updatedAt)', s));
}
export async function createSite(ctx: StoreContext, draft: SiteDraft): Promise<Site> {
  const d = parseOrThrow(SiteDraftSchema, draft, 'Site');
  const now = ctx.now();
  const site: Site = { id: ctx.newId(), name: d.name, building: d.building ?? '', address: d.address ?? '', notes: d.notes ?? '', createdAt: now, updatedAt: now };
  await guard(ctx, `Site "${d.name}"`, async () => await insertSite(ctx, site));
  return site;
}
export async function updateSite(ctx: StoreContext, id: Id, patch: Partial<SiteDraft>): Promise<Site> {
  const p = parseOrThrow(SitePatchSchema, patch, 'Site changes');
  const prev = await getSite(ctx, id);
  const next: Site = { ...prev, ...stripUndefined(p), updatedAt: laterStamp(ctx.now(), prev.updatedAt) };
  await guard(ctx, 'Site', async () =>
    await ctx.q.run(...named('UPDATE site SET name=@name, building=@building, address=@address, notes=@notes, updated_at=@updatedAt WHERE id=@id', next)),
  );
  return next;
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

export async function listRooms(ctx: StoreContext, siteId: Id): Promise<Room[]> {
  return (await ctx.q.all('SELECT * FROM room WHERE site_id = ? ORDER BY code, id', siteId) as RoomRow[]).map(roomFromRow);
}
export async function getRoom(ctx: StoreContext, id: Id): Promise<Room> {
  const r = await ctx.q.get('SELECT * FROM room WHERE id = ?', id) as RoomRow | undefined;
  if (!r) throw notFound('room', id);
  return roomFromRow(r);
}
export async function insertRoom(ctx: StoreContext, r: Room): Promise<void> {
  await ctx.q.run(...named(`INSERT INTO room (id, site_id, code, name, responsible_person, contact, notes, created_at, updated_at)
       VALUES (@id, @siteId, @code, @name, @responsiblePerson, @contact, @notes, @createdAt, @updatedAt)`, r));
}
export async function createRoom(ctx: StoreContext, draft: RoomDraft): Promise<Room> {
  const d = parseOrThrow(RoomDraftSchema, draft, 'Room');
  await getSite(ctx, d.siteId);
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
  await guard(ctx, `Room ${d.code}`, async () => await insertRoom(ctx, room));
  return room;
}
export async function updateRoom(ctx: StoreContext, id: Id, patch: Partial<Omit<RoomDraft, 'siteId'>>): Promise<Room> {
  const p = parseOrThrow(RoomPatchSchema, patch, 'Room changes');
  const prev = await getRoom(ctx, id);
  const next: Room = { ...prev, ...stripUndefined(p), updatedAt: laterStamp(ctx.now(), prev.updatedAt) };
  await guard(ctx, `Room ${next.code}`, async () =>
    await ctx.q.run(...named('UPDATE room SET code=@code, name=@name, responsible_person=@responsiblePerson, contact=@contact, notes=@notes, updated_at=@updatedAt WHERE id=@id', next)),
  );
  return next;
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

export async function listInstallations(ctx: StoreContext, roomId: Id): Promise<LaserInstallation[]> {
  return (await ctx.q.all(`SELECT * FROM laser_installation WHERE room_id = ? ORDER BY created_at, ${ctx.engine.insertionOrder}`, roomId) as InstallationRow[]).map(
    installationFromRow,
  );
}
export async function getInstallation(ctx: StoreContext, id: Id): Promise<LaserInstallation> {
  const r = await ctx.q.get('SELECT * FROM laser_installation WHERE id = ?', id) as InstallationRow | undefined;
  if (!r) throw notFound('laser installation', id);
  return installationFromRow(r);
}
export async function insertInstallation(ctx: StoreContext, i: LaserInstallation): Promise<void> {
  await ctx.q.run(...named(`INSERT INTO laser_installation (id, room_id, laser_type, maker, model, serial_number, registration_number, laser_json,
         class_as_labelled, status, notes, created_at, updated_at)
       VALUES (@id, @roomId, @laserType, @maker, @model, @serialNumber, @registrationNumber, @laserJson,
         @classAsLabelled, @status, @notes, @createdAt, @updatedAt)`, installationParams(i)));
}
/**
 * Assessments refer to beams by id, and the calculation refuses a room where two beams share one:
 * the register refuses it when the laser is stored, not when the next assessment is made.
 */
async function refuseBeamIdClash(ctx: StoreContext, roomId: Id, laser: LaserInput, exceptId: Id | null): Promise<void> {
  const ours = laser.beams.map((b) => b.id).filter((x): x is string => x !== undefined);
  if (ours.length === 0) return;
  const rows = await ctx.q.all('SELECT id, laser_json FROM laser_installation WHERE room_id = ?', roomId) as Array<{ id: string; laser_json: string }>;
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
export async function createInstallation(ctx: StoreContext, draft: LaserInstallationDraft): Promise<LaserInstallation> {
  const d = parseOrThrow(LaserInstallationDraftSchema, draft, 'Laser installation');
  await getRoom(ctx, d.roomId);
  const now = ctx.now();
  const id = ctx.newId();
  const laser: LaserInput = { ...d.laser, id };
  await refuseBeamIdClash(ctx, d.roomId, laser, null);
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
  await guard(ctx, `Laser ${laser.name}`, async () => await insertInstallation(ctx, inst));
  return inst;
}
export async function updateInstallation(
  ctx: StoreContext,
  id: Id,
  patch: Partial<Omit<LaserInstallationDraft, 'roomId'>>,
): Promise<LaserInstallation> {
  const p = parseOrThrow(LaserInstallationPatchSchema, patch, 'Laser installation changes');
  const prev = await getInstallation(ctx, id);
  const merged = { ...prev, ...stripUndefined(p), updatedAt: laterStamp(ctx.now(), prev.updatedAt) };
  const laser: LaserInput = { ...merged.laser, id };
  const next: LaserInstallation = { ...merged, laser, classAsLabelled: laser.classAsLabelled ?? null };
  if (p.laser !== undefined) await refuseBeamIdClash(ctx, prev.roomId, laser, id);
  await guard(ctx, `Laser ${laser.name}`, async () =>
    await ctx.q.run(...named(`UPDATE laser_installation SET laser_type=@laserType, maker=@maker, model=@model, serial_number=@serialNumber,
           registration_number=@registrationNumber, laser_json=@laserJson, class_as_labelled=@classAsLabelled, status=@status,
           notes=@notes, updated_at=@updatedAt WHERE id=@id`, installationParams(next))),
  );
  return next;
}
/** Replace a laser's row in place (import of a newer copy): assessments keep referring to it. */
export async function replaceInstallation(ctx: StoreContext, i: LaserInstallation): Promise<void> {
  await ctx.q.run(...named(`UPDATE laser_installation SET room_id=@roomId, laser_type=@laserType, maker=@maker, model=@model, serial_number=@serialNumber,
         registration_number=@registrationNumber, laser_json=@laserJson, class_as_labelled=@classAsLabelled, status=@status,
         notes=@notes, created_at=@createdAt, updated_at=@updatedAt WHERE id=@id`, installationParams(i)));
}
export async function deleteInstallation(ctx: StoreContext, id: Id): Promise<void> {
  const inst = await getInstallation(ctx, id);
  refuseIfReferenced(`Laser "${inst.laser.name}" cannot be deleted`, await referencesToInstallation(ctx, id), 'Retire it instead: it then leaves new assessments but stays in the records.');
  await guard(ctx, 'Laser installation (retire it instead if an assessment refers to it)', async () =>
    await ctx.q.run('DELETE FROM laser_installation WHERE id = ?', id),
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

export async function listEyewear(ctx: StoreContext, siteId: Id): Promise<Eyewear[]> {
  return (await ctx.q.all('SELECT * FROM eyewear WHERE site_id = ? ORDER BY tag, id', siteId) as EyewearRow[]).map(eyewearFromRow);
}
export async function getEyewear(ctx: StoreContext, id: Id): Promise<Eyewear> {
  const r = await ctx.q.get('SELECT * FROM eyewear WHERE id = ?', id) as EyewearRow | undefined;
  if (!r) throw notFound('eyewear', id);
  return eyewearFromRow(r);
}
export async function insertEyewear(ctx: StoreContext, e: Eyewear): Promise<void> {
  await ctx.q.run(...named(`INSERT INTO eyewear (id, site_id, tag, spec_json, location, quantity, notes, inspected_on, condition, next_inspection, created_at, updated_at)
       VALUES (@id, @siteId, @tag, @specJson, @location, @quantity, @notes, @inspectedOn, @condition, @nextInspection, @createdAt, @updatedAt)`, eyewearParams(e)));
}
export async function createEyewear(ctx: StoreContext, draft: EyewearDraft): Promise<Eyewear> {
  const d = parseOrThrow(EyewearDraftSchema, draft, 'Eyewear');
  await getSite(ctx, d.siteId);
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
  await guard(ctx, `Eyewear ${d.spec.id}`, async () => await insertEyewear(ctx, e));
  return e;
}
export async function updateEyewear(ctx: StoreContext, id: Id, patch: Partial<Omit<EyewearDraft, 'siteId'>>): Promise<Eyewear> {
  const p = parseOrThrow(EyewearPatchSchema, patch, 'Eyewear changes');
  const prev = await getEyewear(ctx, id);
  const next: Eyewear = { ...prev, ...stripUndefined(p), updatedAt: laterStamp(ctx.now(), prev.updatedAt) };
  await guard(ctx, `Eyewear ${next.spec.id}`, async () =>
    await ctx.q.run(...named('UPDATE eyewear SET tag=@tag, spec_json=@specJson, location=@location, quantity=@quantity, notes=@notes, inspected_on=@inspectedOn, condition=@condition, next_inspection=@nextInspection, updated_at=@updatedAt WHERE id=@id', eyewearParams(next))),
  );
  return next;
}
export async function replaceEyewear(ctx: StoreContext, e: Eyewear): Promise<void> {
  await ctx.q.run(...named(`UPDATE eyewear SET site_id=@siteId, tag=@tag, spec_json=@specJson, location=@location, quantity=@quantity, notes=@notes,
         created_at=@createdAt, updated_at=@updatedAt WHERE id=@id`, eyewearParams(e)));
}
export async function deleteEyewear(ctx: StoreContext, id: Id): Promise<void> {
  await getEyewear(ctx, id);
  await guard(ctx, 'Eyewear', async () => await ctx.q.run('DELETE FROM eyewear WHERE id = ?', id));
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

export async function listPeople(ctx: StoreContext): Promise<Person[]> {
  return (await ctx.q.all('SELECT * FROM person ORDER BY name, id') as PersonRow[]).map(personFromRow);
}
export async function getPerson(ctx: StoreContext, id: Id): Promise<Person> {
  const r = await ctx.q.get('SELECT * FROM person WHERE id = ?', id) as PersonRow | undefined;
  if (!r) throw notFound('person', id);
  return personFromRow(r);
}
export async function insertPerson(ctx: StoreContext, p: Person): Promise<void> {
  await ctx.q.run(...named('INSERT INTO person (id, name, role, email, phone, created_at, updated_at) VALUES (@id, @name, @role, @email, @phone, @createdAt, @updatedAt)', p));
}
export async function createPerson(ctx: StoreContext, draft: PersonDraft): Promise<Person> {
  const d = parseOrThrow(PersonDraftSchema, draft, 'Person');
  const now = ctx.now();
  const p: Person = { id: ctx.newId(), name: d.name, role: d.role ?? '', email: d.email ?? '', phone: d.phone ?? '', createdAt: now, updatedAt: now };
  await guard(ctx, `Person ${d.name}`, async () => await insertPerson(ctx, p));
  return p;
}
export async function updatePerson(ctx: StoreContext, id: Id, patch: Partial<PersonDraft>): Promise<Person> {
  const p = parseOrThrow(PersonPatchSchema, patch, 'Person changes');
  const prev = await getPerson(ctx, id);
  const next: Person = { ...prev, ...stripUndefined(p), updatedAt: laterStamp(ctx.now(), prev.updatedAt) };
  await guard(ctx, 'Person', async () =>
    await ctx.q.run(...named('UPDATE person SET name=@name, role=@role, email=@email, phone=@phone, updated_at=@updatedAt WHERE id=@id', next)),
  );
  return next;
}

// ---------------------------------------------------------------- snapshot for an assessment

/** The room's in-service lasers and its site's eyewear, as the core's RoomInput. */
export async function roomInputFromRegister(ctx: StoreContext, roomId: Id): Promise<RoomInput> {
  const room = await getRoom(ctx, roomId);
  const lasers = (await listInstallations(ctx, roomId))
    .filter((i) => i.status === 'in-service')
    .map((i) => i.laser);
  // Eyewear stored under an older, looser rule (e.g. an RB6 marking; EN 208 ends at RB5) would make
  // the calculation refuse every new assessment of the site: it is left out (no protection is
  // claimed for it) and stays on the shelf for correction. Lasers are all kept: a laser left out
  // silently could hide a hazard; the workspace names what to fix. Damaged or withdrawn eyewear is
  // never offered as protection (EN 207: damaged filters must not be used).
  const eyewear = (await listEyewear(ctx, room.siteId))
    .filter((e) => e.condition !== 'damaged' && e.condition !== 'withdrawn')
    .map((e) => e.spec)
    .filter((spec) => EyewearSpecSchema.safeParse(spec).success);
  return { lasers, eyewear };
}

function stripUndefined<T extends object>(o: T): { [K in keyof T]: Exclude<T[K], undefined> } {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as { [K in keyof T]: Exclude<T[K], undefined> };
}
