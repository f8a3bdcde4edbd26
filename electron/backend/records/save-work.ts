/**
 * Saving the workspace: the assessment together with the register changes it makes (lasers added
 * or edited in the workspace) as ONE back-end operation in ONE transaction. Before this, the
 * window made several calls (create laser, update laser, save assessment) and a failure half-way
 * left new lasers in the register without the assessment that used them, or the reverse.
 *
 * Every part carries what it started from: the assessment its revision id and save counter, each
 * edited laser its `updatedAt`. If anything changed underneath, the whole save is refused with
 * the time and nothing is written (optimistic concurrency).
 */
import { z } from 'zod';
import type { LaserInput } from '../../../core/model/inputs.js';
import { AssessmentContentSchema, IdSchema, TimestampSchema, LaserInstallationDraftSchema } from '../schemas/records.js';
import { LaserInputSchema, StoredLaserInputSchema } from '../schemas/inputs.js';
import { whatChanged } from './register-versions.js';
import { assertNotStale, clockTime, createAssessment, getAssessment, saveAssessment } from './assessments.js';
import { inTransaction, lockRow, parseOrThrow, type StoreContext } from './context.js';
import { createInstallation, getInstallation, getRoom, listInstallations, updateInstallation } from './register.js';
import { RecordError, type Assessment, type AssessmentContent, type Id, type LaserInstallation, type SaveBase, type Timestamp } from './types.js';

export interface WorkSave {
  readonly roomId: Id;
  /** null: the first save of a new assessment. */
  readonly assessmentId: Id | null;
  /** Required with `assessmentId`: the revision and save counter the officer opened. */
  readonly expected: SaveBase | null;
  readonly content: AssessmentContent;
  /** Lasers added in the workspace; `draftId` is the id the content uses for it until saved. */
  readonly newLasers: ReadonlyArray<{ readonly draftId: string; readonly laser: LaserInput; readonly laserType?: string }>;
  /**
   * Register lasers edited in the workspace, each with the `updatedAt` it was opened at and, to say
   * what someone else changed when that is out of date, the laser as it was opened (`seenLaser`).
   */
  readonly changedLasers: ReadonlyArray<{ readonly id: Id; readonly laser: LaserInput; readonly expectedUpdatedAt: Timestamp; readonly seenLaser?: LaserInput }>;
}

export interface WorkSaved {
  readonly assessment: Assessment;
  /** The room's register after the save. */
  readonly installations: readonly LaserInstallation[];
  /** Register id given to each new laser, by its draft id. */
  readonly laserIds: Readonly<Record<string, Id>>;
}

export const SaveBaseSchema = z.strictObject({ revisionId: IdSchema, version: z.number().int().min(1) });

export const WorkSaveSchema = z.strictObject({
  roomId: IdSchema,
  assessmentId: IdSchema.nullable(),
  expected: SaveBaseSchema.nullable(),
  content: AssessmentContentSchema,
  newLasers: z.array(z.strictObject({ draftId: IdSchema, laser: LaserInputSchema, laserType: LaserInstallationDraftSchema.shape.laserType })).max(1000),
  changedLasers: z
    .array(z.strictObject({ id: IdSchema, laser: LaserInputSchema, expectedUpdatedAt: TimestampSchema, seenLaser: StoredLaserInputSchema.optional() }))
    .max(1000),
});

/** Times compared as instants: "10:00-05:00" is later than "14:00Z" (not as text). */
export function sameInstant(a: Timestamp, b: Timestamp): boolean {
  return Date.parse(a) === Date.parse(b);
}

export async function saveWork(ctx: StoreContext, raw: WorkSave): Promise<WorkSaved> {
  const w = parseOrThrow(WorkSaveSchema, raw, 'Save');
  if (w.assessmentId !== null && w.expected === null) {
    throw new RecordError('invalid', 'Save: the version of the assessment you opened is missing (reload it and save again)');
  }
  const room = await getRoom(ctx, w.roomId).catch(async (e: unknown) => {
    throw await goneRefusal(ctx, w, e);
  });
  const laserIds: Record<string, Id> = {};
  const assessment = await inTransaction(ctx, `Assessment of room ${room.code}`, async (ctx): Promise<Assessment> => {
    // 1. Nothing is written unless every part is still as the officer opened it.
    if (w.assessmentId !== null) {
      await lockRow(ctx, 'assessment', w.assessmentId);
      await assertNotStale(ctx, w.assessmentId, w.expected ?? undefined);
    }
    for (const c of w.changedLasers) {
      await lockRow(ctx, 'laser_installation', c.id);
      const now = await getInstallation(ctx, c.id);
      if (now.roomId !== room.id) throw new RecordError('invalid', `Laser "${now.laser.name}" is not in room ${room.code}`);
      if (!sameInstant(now.updatedAt, c.expectedUpdatedAt)) {
        const changed = c.seenLaser !== undefined ? whatChanged({ laser: c.seenLaser }, { laser: now.laser }) : [];
        // On an institution register the account that saved is named too (several officers share it).
        const by = await ctx.engine.lastWriter(ctx.q, 'laser_installation', c.id);
        throw new RecordError(
          'stale',
          `Laser "${now.laser.name}" in the register was changed by someone else${by !== null ? ` (${by})` : ''} at ${clockTime(now.updatedAt)}${changed.length > 0 ? ` (${changed.join('; ')})` : ''} — reload and compare before saving again. Nothing was overwritten.`,
        );
      }
    }
    // 2. Register changes, then the assessment that refers to them.
    for (const n of w.newLasers) {
      const made = await createInstallation(ctx, { roomId: room.id, laser: n.laser, laserType: n.laserType ?? n.laser.name });
      laserIds[n.draftId] = made.id;
    }
    for (const c of w.changedLasers) await updateInstallation(ctx, c.id, { laser: c.laser });
    const content: AssessmentContent = {
      ...w.content,
      input: { ...w.content.input, lasers: w.content.input.lasers.map((l) => (laserIds[l.id] ? { ...l, id: laserIds[l.id] ?? l.id } : l)) },
    };
    return w.assessmentId === null
      ? await createAssessment(ctx, { roomId: room.id, content })
      : await saveAssessment(ctx, w.assessmentId, content, w.expected ?? undefined);
  }).catch(async (e: unknown) => {
    throw await goneRefusal(ctx, w, e);
  });
  return { assessment: await getAssessment(ctx, assessment.id), installations: await listInstallations(ctx, room.id), laserIds };
}

/**
 * A save into a room or an assessment that is no longer in the register (deleted on another desk,
 * or in another window of this host, after it was opened here): said in officer words, naming the
 * account that deleted it on a server, instead of "No room with id …". Looked up only after a
 * refusal, so a save that goes through costs no extra query. Any other error is passed on as it is.
 */
async function goneRefusal(ctx: StoreContext, w: WorkSave, e: unknown): Promise<unknown> {
  // An assessment deleted between the room read and the version check reads as one without
  // revisions ('corrupt-database'): only when it is still there is that damage.
  if (!(e instanceof RecordError) || (e.code !== 'not-found' && e.code !== 'corrupt-database')) return e;
  const roomThere = (await ctx.q.get('SELECT id FROM room WHERE id = ?', w.roomId)) !== undefined;
  const assessmentThere = w.assessmentId === null || (await ctx.q.get('SELECT id FROM assessment WHERE id = ?', w.assessmentId)) !== undefined;
  if (roomThere && assessmentThere) return e;
  const by = await ctx.engine.lastWriter(ctx.q, roomThere ? 'assessment' : 'room', roomThere ? (w.assessmentId ?? '') : w.roomId);
  const byWhom = by !== null ? ` by ${by}` : '';
  const what = roomThere
    ? `“${w.content.title}” is no longer in the register: its draft was discarded${byWhom} after it was opened here.`
    : `The room of “${w.content.title}” is no longer in the register: it was deleted${byWhom} after it was opened here.`;
  return new RecordError('not-found', `Not saved. ${what} Nothing was written; keep your version as an assessment of its own.`);
}
