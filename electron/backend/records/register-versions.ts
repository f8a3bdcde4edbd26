/**
 * Optimistic concurrency for the register (issue 11, item 4): an edit or deletion of a site, room,
 * laser, eyewear item or person names the version the officer opened (the entry's `updatedAt`);
 * when the stored entry has moved on since (another window, host, import or officer), the change
 * is refused with code 'stale' and a sentence saying what the other person changed — nothing is
 * overwritten. Every write of an entry moves `updatedAt` strictly forward, so the version is
 * never repeated even by two saves in the same millisecond.
 */
import { z } from 'zod';
import { officerPath } from '../../../core/model/input-words.js';
import { quantityText, type DisplayUnit } from '../../../core/units/display.js';
import {
  EyewearPatchSchema,
  LaserInstallationPatchSchema,
  PersonPatchSchema,
  RoomPatchSchema,
  SitePatchSchema,
  TimestampSchema,
} from '../schemas/records.js';
import { StoredEyewearSpecSchema, StoredLaserInputSchema } from '../schemas/inputs.js';
import { clockTime } from './assessments.js';
import { diffValues } from './diff.js';
import { sameInstant } from './stamps.js';
import { RecordError, type RegisterBase, type Timestamp } from './types.js';

// What the officer saw: the editable fields of each kind. Lasers and eyewear markings are read with
// the lenient stored shape, so an entry saved under an older, looser rule can still be edited.
export const SiteSeenSchema = SitePatchSchema;
export const RoomSeenSchema = RoomPatchSchema;
export const PersonSeenSchema = PersonPatchSchema;
export const InstallationSeenSchema = LaserInstallationPatchSchema.extend({ laser: StoredLaserInputSchema.optional() });
export const EyewearSeenSchema = EyewearPatchSchema.extend({ spec: StoredEyewearSpecSchema.optional() });

const baseOf = <S extends z.ZodType>(seen: S) => z.strictObject({ updatedAt: TimestampSchema, seen: seen.optional() });
export const SiteBaseSchema = baseOf(SiteSeenSchema);
export const RoomBaseSchema = baseOf(RoomSeenSchema);
export const PersonBaseSchema = baseOf(PersonSeenSchema);
export const InstallationBaseSchema = baseOf(InstallationSeenSchema);
export const EyewearBaseSchema = baseOf(EyewearSeenSchema);

/** Field names in the register forms' words. */
const WORDS: Readonly<Record<string, string>> = {
  name: 'name',
  building: 'building',
  address: 'address',
  notes: 'notes',
  code: 'room code',
  responsiblePerson: 'responsible person',
  contact: 'contact',
  role: 'role',
  email: 'e-mail',
  phone: 'phone',
  laserType: 'laser type',
  maker: 'maker',
  model: 'model',
  serialNumber: 'serial number',
  registrationNumber: 'registration number',
  status: 'status',
  location: 'location',
  quantity: 'quantity',
  inspectedOn: 'last inspection',
  condition: 'condition',
  nextInspection: 'next inspection due',
};
/** Nested groups: their own fields are named through the calculation's words ("Beam 1, power"). */
const NESTED: Readonly<Record<string, string>> = { laser: 'laser', spec: 'marking' };
const NESTED_WORDS: Readonly<Record<string, string>> = { 'laser.name': 'laser name', 'laser.classAsLabelled': 'class as labelled', 'spec.id': 'tag', 'spec.label': 'description' };

const shown = (v: unknown): string => {
  if (v === undefined || v === null || v === '') return 'empty';
  if (v === 'in-service') return '"in service"';
  const s = String(v).replace(/\s+/g, ' ');
  return `"${s.length > 60 ? `${s.slice(0, 57)}…` : s}"`;
};

const UNIT_OF_SUFFIX: ReadonlyArray<readonly [RegExp, DisplayUnit]> = [
  [/_nm$/, 'nm'],
  [/_W$/, 'W'],
  [/_J$/, 'J'],
  [/_s$/, 's'],
  [/_Hz$/, 'Hz'],
  [/_rad$/, 'rad'],
  [/_m$/, 'm'],
];

/** " 1550 nm → 1551 nm" for a changed quantity stored in SI units, in engineering notation; "" otherwise. */
function quantityChange(path: string, before: unknown, after: unknown): string {
  const unit = UNIT_OF_SUFFIX.find(([re]) => re.test(path))?.[1];
  if (unit === undefined) return '';
  const text = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? quantityText(v, unit) : 'empty');
  return ` ${text(before)} → ${text(after)}`;
}

const MAX_LISTED = 6;

/**
 * What differs between the fields the officer saw and the stored entry, in the register's words:
 * 'name "Optics lab" → "Laser lab", notes, beam 1, power'. Long or nested values are named only.
 */
export function whatChanged(seen: Readonly<Record<string, unknown>> | undefined, current: Readonly<Record<string, unknown>>): string[] {
  if (seen === undefined) return [];
  const out: string[] = [];
  for (const [key, before] of Object.entries(seen)) {
    if (before === undefined) continue;
    const now = current[key];
    const nested = NESTED[key];
    if (nested !== undefined) {
      for (const d of diffValues(before, now, key)) {
        const word = NESTED_WORDS[d.path];
        if (word !== undefined) out.push(`${word} ${shown(d.old)} → ${shown(d.new)}`);
        else out.push(`${nested}: ${officerPath(d.path).replace(/^./, (c) => c.toLowerCase())}${quantityChange(d.path, d.old, d.new)}`);
      }
      continue;
    }
    if (JSON.stringify(before) === JSON.stringify(now ?? '')) continue;
    const word = WORDS[key] ?? officerPath(key).toLowerCase();
    const long = typeof before === 'string' && (before.includes('\n') || before.length > 60 || String(now).includes('\n') || String(now).length > 60);
    out.push(long ? word : `${word} ${shown(before)} → ${shown(now)}`);
  }
  const unique = [...new Set(out)];
  return unique.length > MAX_LISTED ? [...unique.slice(0, MAX_LISTED), `and ${unique.length - MAX_LISTED} more`] : unique;
}

export interface StoredEntry {
  readonly updatedAt: Timestamp;
}

/**
 * Refuse an edit or deletion that started from an older version of the entry. `current` is null
 * when the entry is gone. `title` names the entry as the officer knows it ('Room B2.14').
 */
export function assertEntryCurrent<T extends StoredEntry>(
  title: string,
  action: 'edit' | 'delete',
  current: T | null,
  expected: RegisterBase<object> | undefined,
  /** On an institution register, the account that last wrote the entry (null on a file). */
  by: string | null = null,
): void {
  if (expected === undefined) return;
  const notDone = action === 'edit' ? 'Your changes were not saved' : 'It was not deleted';
  if (current === null) {
    throw new RecordError('stale', `${title} was deleted by someone else${by !== null ? ` (${by})` : ''} since you opened it. ${notDone}. Reload the register.`);
  }
  if (sameInstant(current.updatedAt, expected.updatedAt)) return;
  const changes = whatChanged(expected.seen as Readonly<Record<string, unknown>> | undefined, current as unknown as Readonly<Record<string, unknown>>);
  const what = changes.length > 0 ? changes.join('; ') : 'it was saved again (no field you see differs)';
  throw new RecordError(
    'stale',
    `${title} was changed by someone else since you opened it: ${what} (saved${by !== null ? ` by ${by}` : ''} at ${clockTime(current.updatedAt)}). ${notDone}; nothing was overwritten. Reload to see the stored version, then make your change again.`,
  );
}

/** True when `assertEntryCurrent` would refuse: only then is the last writer looked up. */
export function entryIsStale(current: StoredEntry | null, expected: RegisterBase<object> | undefined): boolean {
  return expected !== undefined && (current === null || !sameInstant(current.updatedAt, expected.updatedAt));
}
