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
import { ByIdSchema, patchOf } from '../schemas/common.js';

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
  'site-update': { input: patchOf(SitePatchSchema), run: (a, { store }) => store.updateSite(a.id, a.patch) },
  'site-delete': { input: ByIdSchema, run: (a, { store }) => store.deleteSite(a.id) },

  'room-get': { input: ByIdSchema, run: (a, { store }) => store.getRoom(a.id) },
  'room-create': { input: RoomDraftSchema, run: (a, { store }) => store.createRoom(a) },
  'room-update': { input: patchOf(RoomPatchSchema), run: (a, { store }) => store.updateRoom(a.id, a.patch) },
  'room-delete': { input: ByIdSchema, run: (a, { store }) => store.deleteRoom(a.id) },

  'installations-list': { input: z.strictObject({ roomId: IdSchema }), run: (a, { store }) => store.listInstallations(a.roomId) },
  'installation-create': { input: LaserInstallationDraftSchema, run: (a, { store }) => store.createInstallation(a) },
  'installation-update': { input: patchOf(LaserInstallationPatchSchema), run: (a, { store }) => store.updateInstallation(a.id, a.patch) },
  'installation-delete': { input: ByIdSchema, run: (a, { store }) => store.deleteInstallation(a.id) },
  'installation-history': { input: ByIdSchema, run: (a, { store }) => store.laserHistory(a.id) },

  'eyewear-list': { input: z.strictObject({ siteId: IdSchema }), run: (a, { store }) => store.listEyewear(a.siteId) },
  'eyewear-create': { input: EyewearDraftSchema, run: (a, { store }) => store.createEyewear(a) },
  'eyewear-update': { input: patchOf(EyewearPatchSchema), run: (a, { store }) => store.updateEyewear(a.id, a.patch) },
  'eyewear-delete': { input: ByIdSchema, run: (a, { store }) => store.deleteEyewear(a.id) },

  'person-create': { input: PersonDraftSchema, run: (a, { store }) => store.createPerson(a) },
  'person-update': { input: patchOf(PersonPatchSchema), run: (a, { store }) => store.updatePerson(a.id, a.patch) },
  'person-delete': { input: ByIdSchema, run: (a, { store }) => store.deletePerson(a.id) },
};
