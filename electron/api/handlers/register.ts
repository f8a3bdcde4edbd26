import { z } from 'zod';
import {
  CalendarDateSchema,
  EyewearDraftSchema,
  EyewearPatchSchema,
  IdSchema,
  LaserInstallationDraftSchema,
  LaserInstallationPatchSchema,
  PersonDraftSchema,
  PersonPatchSchema,
  RoomDraftSchema,
  RoomPatchSchema,
  SiteDraftSchema,
  SitePatchSchema,
} from '../../backend/schemas/index.js';
import type { RegisterHandlers } from '../contracts/register.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { ByIdSchema, checkedDeleteOf, checkedPatchOf } from '../schemas/common.js';
import {
  EyewearBaseSchema,
  InstallationBaseSchema,
  PersonBaseSchema,
  RoomBaseSchema,
  SiteBaseSchema,
} from '../../backend/records/register-versions.js';

export const registerTable: AreaTable<RegisterHandlers, ApiContext> = {
  'register-overview': {
    input: z.strictObject({ dueBy: CalendarDateSchema }),
    run: async ({ dueBy }, { store }) => {
      const sites = [];
      for (const site of await store.listSites()) {
        const rooms = [];
        for (const room of await store.listRooms(site.id)) {
          rooms.push({ room, installations: await store.listInstallations(room.id), assessments: await store.listAssessments(room.id) });
        }
        sites.push({ site, rooms, eyewear: await store.listEyewear(site.id) });
      }
      return { sites, people: await store.listPeople(), dueForReview: await store.listDueForReview(dueBy), dueBy };
    },
  },

  'site-create': { input: SiteDraftSchema, run: (a, { store }) => store.createSite(a) },
  'site-update': { input: checkedPatchOf(SitePatchSchema, SiteBaseSchema), run: (a, { store }) => store.updateSite(a.id, a.patch, a.expected) },
  'site-delete': { input: checkedDeleteOf(SiteBaseSchema), run: (a, { store }) => store.deleteSite(a.id, a.expected) },

  'room-get': { input: ByIdSchema, run: (a, { store }) => store.getRoom(a.id) },
  'room-create': { input: RoomDraftSchema, run: (a, { store }) => store.createRoom(a) },
  'room-update': { input: checkedPatchOf(RoomPatchSchema, RoomBaseSchema), run: (a, { store }) => store.updateRoom(a.id, a.patch, a.expected) },
  'room-delete': { input: checkedDeleteOf(RoomBaseSchema), run: (a, { store }) => store.deleteRoom(a.id, a.expected) },

  'installations-list': { input: z.strictObject({ roomId: IdSchema }), run: (a, { store }) => store.listInstallations(a.roomId) },
  'installation-create': { input: LaserInstallationDraftSchema, run: (a, { store }) => store.createInstallation(a) },
  'installation-update': {
    input: checkedPatchOf(LaserInstallationPatchSchema, InstallationBaseSchema),
    run: (a, { store }) => store.updateInstallation(a.id, a.patch, a.expected),
  },
  'installation-delete': { input: checkedDeleteOf(InstallationBaseSchema), run: (a, { store }) => store.deleteInstallation(a.id, a.expected) },
  'installation-history': { input: ByIdSchema, run: (a, { store }) => store.laserHistory(a.id) },

  'eyewear-list': { input: z.strictObject({ siteId: IdSchema }), run: (a, { store }) => store.listEyewear(a.siteId) },
  'eyewear-create': { input: EyewearDraftSchema, run: (a, { store }) => store.createEyewear(a) },
  'eyewear-update': { input: checkedPatchOf(EyewearPatchSchema, EyewearBaseSchema), run: (a, { store }) => store.updateEyewear(a.id, a.patch, a.expected) },
  'eyewear-delete': { input: checkedDeleteOf(EyewearBaseSchema), run: (a, { store }) => store.deleteEyewear(a.id, a.expected) },

  'person-create': { input: PersonDraftSchema, run: (a, { store }) => store.createPerson(a) },
  'person-update': { input: checkedPatchOf(PersonPatchSchema, PersonBaseSchema), run: (a, { store }) => store.updatePerson(a.id, a.patch, a.expected) },
  'person-delete': { input: checkedDeleteOf(PersonBaseSchema), run: (a, { store }) => store.deletePerson(a.id, a.expected) },

  'register-delete-impact': {
    input: z.strictObject({ kind: z.enum(['site', 'room', 'person'], { error: 'must be site, room or person' }), id: IdSchema }),
    run: (a, { store }) => store.deletionImpact(a.kind, a.id),
  },
};
