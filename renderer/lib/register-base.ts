/**
 * What a register edit or deletion started from (optimistic concurrency, issue 11 item 4): the
 * entry's version as the form opened it (`updatedAt`) and the fields the officer saw, so that a
 * refusal can say what someone else changed meanwhile. The back end decides by the version alone.
 */
import type { Eyewear, LaserInstallation, Person, Room, Site } from '../../electron/api/contracts/records.js';

export const siteBase = (s: Site) => ({ updatedAt: s.updatedAt, seen: { name: s.name, building: s.building, address: s.address, notes: s.notes } });

export const roomBase = (r: Room) => ({
  updatedAt: r.updatedAt,
  seen: { code: r.code, name: r.name, responsiblePerson: r.responsiblePerson, contact: r.contact, notes: r.notes },
});

export const installationBase = (i: LaserInstallation) => ({
  updatedAt: i.updatedAt,
  seen: {
    laser: i.laser,
    laserType: i.laserType,
    maker: i.maker,
    model: i.model,
    serialNumber: i.serialNumber,
    registrationNumber: i.registrationNumber,
    status: i.status,
    notes: i.notes,
  },
});

export const eyewearBase = (e: Eyewear) => ({
  updatedAt: e.updatedAt,
  seen: { spec: e.spec, location: e.location, quantity: e.quantity, notes: e.notes, inspectedOn: e.inspectedOn, condition: e.condition, nextInspection: e.nextInspection },
});

export const personBase = (p: Person) => ({ updatedAt: p.updatedAt, seen: { name: p.name, role: p.role, email: p.email, phone: p.phone } });
