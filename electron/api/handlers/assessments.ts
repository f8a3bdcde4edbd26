import { z } from 'zod';
import { AssessmentContentSchema, IdSchema, SignOffSchema } from '../../backend/schemas/index.js';
import type { AssessmentHandlers } from '../contracts/assessments.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { ByIdSchema } from '../schemas/common.js';
import { SaveBaseSchema, WorkSaveSchema } from '../../backend/records/save-work.js';
import { CountersignSchema } from '../../backend/records/co-signatures.js';

const RoomRef = z.strictObject({ roomId: IdSchema });

export const assessmentTable: AreaTable<AssessmentHandlers, ApiContext> = {
  'room-input-from-register': { input: RoomRef, run: (a, { store }) => store.roomInputFromRegister(a.roomId) },
  'assessment-new-content': {
    input: z.strictObject({ roomId: IdSchema, installationId: IdSchema.nullable().optional() }),
    run: (a, { store }) => store.newAssessmentContent(a.roomId, a.installationId ?? null),
  },
  'assessment-create': {
    input: z.strictObject({ roomId: IdSchema, installationId: IdSchema.nullable().optional(), content: AssessmentContentSchema }),
    run: (a, { store }) => store.createAssessment({ roomId: a.roomId, installationId: a.installationId ?? null, content: a.content }),
  },
  'assessment-get': { input: ByIdSchema, run: (a, { store }) => store.getAssessment(a.id) },
  'assessments-list': { input: RoomRef, run: (a, { store }) => store.listAssessments(a.roomId) },
  'assessment-save': {
    input: z.strictObject({ id: IdSchema, content: AssessmentContentSchema, expected: SaveBaseSchema }),
    run: (a, { store }) => store.saveAssessment(a.id, a.content, a.expected),
  },
  'work-save': { input: WorkSaveSchema, run: (a, { store }) => store.saveWork(a) },
  'assessment-discard-draft': { input: ByIdSchema, run: (a, { store }) => store.discardDraft(a.id) },
  'revisions-list': { input: z.strictObject({ assessmentId: IdSchema }), run: (a, { store }) => store.listRevisions(a.assessmentId) },
  'revision-get': { input: z.strictObject({ revisionId: IdSchema }), run: (a, { store }) => store.getRevision(a.revisionId) },
  'revisions-compare': {
    input: z.strictObject({ fromRevisionId: IdSchema, toRevisionId: IdSchema }),
    run: (a, { store }) => store.compareRevisions(a.fromRevisionId, a.toRevisionId),
  },
  'assessment-changes-since': {
    input: z.strictObject({ id: IdSchema, seen: AssessmentContentSchema }),
    run: (a, { store }) => store.changesSince(a.id, a.seen),
  },
  'assessment-sign': {
    input: z.strictObject({ id: IdSchema, signOff: SignOffSchema, reviewed: SaveBaseSchema }),
    run: (a, { store }) => store.signAssessment(a.id, a.signOff, a.reviewed),
  },
  'assessment-verify': {
    input: z.strictObject({ assessmentId: IdSchema, revisionId: IdSchema.optional() }),
    run: (a, { store }) => store.verify(a.assessmentId, a.revisionId),
  },
  'revision-countersign': {
    input: CountersignSchema,
    run: (a, { store }) => store.countersign(a),
  },
  'revision-co-signatures': {
    input: z.strictObject({ revisionId: IdSchema }),
    run: (a, { store }) => store.listCoSignatures(a.revisionId),
  },
};
