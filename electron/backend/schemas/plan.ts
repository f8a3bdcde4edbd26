/**
 * Zod schemas for the room plan (core/plan/plan-model.ts): the drawing stored in the revision's
 * input snapshot, and the zones and findings the core computes from it. Strict objects, messages in
 * officer words; the core checks the plan again against the room's lasers (core/plan/validate-plan.ts).
 */
import { z } from 'zod';
import type {
  PathElement,
  PlanBarrier,
  PlanBeamPath,
  PlanBeamRun,
  PlanControlledArea,
  PlanDoor,
  PlanEnclosure,
  PlanFinding,
  PlanPoint,
  PlanReflectionPoint,
  PlanResult,
  PlanSegment,
  PlanWorkPosition,
  PlanZone,
  RoomPlan,
} from '../../../core/plan/plan-model.js';
import { INPUT_RULES } from '../../../core/model/input-rules.js';
import { numberByRule } from './number-by-rule.js';
import { assertType, type SameShape } from './type-equality.js';

const coordinate = z
  .number({ error: 'must be a number (m)' })
  .min(-1000, 'must be at least −1000 m (a plan spans at most a kilometre each way)')
  .max(1000, 'must be at most 1000 m (a plan spans at most a kilometre each way)');
const name = z.string().min(1, 'must not be empty');

export const PlanPointSchema = z.strictObject({ x_m: coordinate, y_m: coordinate });
const segment = { id: name, label: name, a: PlanPointSchema, b: PlanPointSchema };
export const PlanSegmentSchema = z.strictObject(segment);
export const PlanDoorSchema = z.strictObject({ ...segment, interlocked: z.boolean().optional() });
export const PlanBarrierSchema = z.strictObject({ ...segment, kind: z.enum(['curtain', 'barrier'], { error: 'must be a curtain or a barrier' }), rating: z.string() });
export const PlanWorkPositionSchema = z.strictObject({
  id: name,
  label: name,
  at: PlanPointSchema,
  reach_m: z.number({ error: 'must be a number (m)' }).min(0, 'must be 0 m or more').max(10, 'must be at most 10 m').optional(),
});
export const PlanEnclosureSchema = z.strictObject({ id: name, label: name, min: PlanPointSchema, max: PlanPointSchema });
export const PathElementSchema = z.strictObject({
  kind: z.enum(['mirror', 'dump', 'target'], { error: 'must be a mirror, a beam dump or a target' }),
  at: PlanPointSchema,
  label: z.string().optional(),
  aperture_m: numberByRule(INPUT_RULES.planAperture_m).optional(),
}).refine((e) => e.aperture_m === undefined || e.kind !== 'mirror', { message: 'only a beam dump or a target has an aperture', path: ['aperture_m'] });
export const PlanBeamPathSchema = z.strictObject({
  laserId: name,
  exit: PlanPointSchema,
  elements: z.array(PathElementSchema),
  onward_deg: z.number({ error: 'must be a number (°)' }).min(-360, 'must be at least −360°').max(360, 'must be at most 360°').optional(),
  height_m: z.number({ error: 'must be a number (m)' }).min(0, 'must be 0 m or more').max(20, 'must be at most 20 m').optional(),
});
export const PlanReflectionPointSchema = z.strictObject({ id: name, label: name, at: PlanPointSchema, laserId: name });
export const PlanControlledAreaSchema = z.strictObject({
  outline: z.array(PlanPointSchema).min(3, 'needs at least 3 corners'),
  acceptedBy: z.string().min(1, 'must name the officer who accepted the boundary'),
  note: z.string().optional(),
});

export const RoomPlanSchema = z.strictObject({
  outline: z.array(PlanPointSchema).min(3, 'the room outline needs at least 3 corners'),
  doors: z.array(PlanDoorSchema),
  windows: z.array(PlanSegmentSchema),
  walls: z.array(PlanSegmentSchema),
  barriers: z.array(PlanBarrierSchema),
  workPositions: z.array(PlanWorkPositionSchema),
  enclosures: z.array(PlanEnclosureSchema),
  paths: z.array(PlanBeamPathSchema),
  reflectionPoints: z.array(PlanReflectionPointSchema),
  controlledArea: PlanControlledAreaSchema.optional(),
});

// ---- results
const decimal = z.string().regex(/^-?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i, 'must be a decimal number written as a string, e.g. "0.0125"');
const pointResult = z.strictObject({ x_m: decimal, y_m: decimal });
export const PlanZoneSchema = z.strictObject({
  id: z.string(),
  kind: z.enum(['direct', 'diffuse']),
  beamId: z.string(),
  laserId: z.string(),
  label: z.string(),
  polygon: z.array(pointResult),
  enclosed: z.boolean(),
  radius_m: decimal.optional(),
});
export const PlanBeamRunSchema = z.strictObject({
  beamId: z.string(),
  laserId: z.string(),
  points: z.array(pointResult),
  endsAt: z.enum(['dump', 'target', 'wall', 'barrier', 'nohd']),
  endDetail: z.string(),
});
export const PlanFindingSchema = z.strictObject({
  kind: z.enum([
    'door-in-zone',
    'window-in-zone',
    'work-position-in-zone',
    'leaves-enclosure',
    'leaves-room',
    'stopped-by-barrier',
    'passes-surface-end',
    'wider-than-dump',
    'beam-at-eye-level',
    'outside-controlled-area',
    'no-controlled-area',
    'no-diffuse-distance',
    'path-not-placed',
    'path-meets-wall',
  ]),
  severity: z.enum(['hazard', 'check']),
  subjectId: z.string(),
  zoneIds: z.array(z.string()),
  text: z.string(),
  suggestion: z.string(),
});
export const PlanResultSchema = z.strictObject({
  zones: z.array(PlanZoneSchema),
  runs: z.array(PlanBeamRunSchema),
  findings: z.array(PlanFindingSchema),
  suggestions: z.array(z.string()),
  method: z.array(z.string()),
});

// ---- compile-time proof that the schemas are the core types (fails to compile on drift)
assertType<SameShape<z.infer<typeof PlanPointSchema>, PlanPoint>>(true);
assertType<SameShape<z.infer<typeof PlanSegmentSchema>, PlanSegment>>(true);
assertType<SameShape<z.infer<typeof PlanDoorSchema>, PlanDoor>>(true);
assertType<SameShape<z.infer<typeof PlanBarrierSchema>, PlanBarrier>>(true);
assertType<SameShape<z.infer<typeof PlanWorkPositionSchema>, PlanWorkPosition>>(true);
assertType<SameShape<z.infer<typeof PlanEnclosureSchema>, PlanEnclosure>>(true);
assertType<SameShape<z.infer<typeof PathElementSchema>, PathElement>>(true);
assertType<SameShape<z.infer<typeof PlanBeamPathSchema>, PlanBeamPath>>(true);
assertType<SameShape<z.infer<typeof PlanReflectionPointSchema>, PlanReflectionPoint>>(true);
assertType<SameShape<z.infer<typeof PlanControlledAreaSchema>, PlanControlledArea>>(true);
assertType<SameShape<z.infer<typeof RoomPlanSchema>, RoomPlan>>(true);
assertType<SameShape<z.infer<typeof PlanZoneSchema>, PlanZone>>(true);
assertType<SameShape<z.infer<typeof PlanBeamRunSchema>, PlanBeamRun>>(true);
assertType<SameShape<z.infer<typeof PlanFindingSchema>, PlanFinding>>(true);
assertType<SameShape<z.infer<typeof PlanResultSchema>, PlanResult>>(true);
