/**
 * Zod schemas for the core's result contract (core/model/results.ts) and the derivation trace
 * (core/trace/trace.ts). Used when results arrive from outside: export files being imported and
 * rows read back from a database that may have been edited by other tools. Decimal strings are
 * kept as strings (records keep full precision; `verify` recomputes them anyway).
 */
import { z } from 'zod';
import type {
  AdditiveGroup,
  BeamResult,
  ClassEstimate,
  DistanceResult,
  EyewearVerdict,
  LimitSummary,
  OdRequirement,
  RoomResult,
  ScaleNumberRequirement,
  UncertaintyBounds,
} from '../../../core/model/results.js';
import type { Trace, TraceStep } from '../../../core/trace/trace.js';
import { LaserClassSchema, RuleSetIdSchema, TissueSchema } from './inputs.js';
import { assertType, type SameShape } from './type-equality.js';
import { PlanResultSchema } from './plan.js';

/** A decimal string as the core writes it ("0.0125", "1.2e-7", "-3"). */
export const DecimalStringSchema = z
  .string()
  .regex(/^-?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i, 'must be a decimal number written as a string, e.g. "0.0125"');

export const TraceStepSchema = z.strictObject({
  kind: z.enum(['input', 'assumption', 'row', 'factor', 'formula', 'result', 'rounding', 'conservative', 'warning', 'note']),
  label: z.string(),
  detail: z.string(),
  value: z.string().optional(),
  unit: z.string().optional(),
  source: z.string().optional(),
  confidence: z.string().optional(),
});

export interface TraceShape {
  title: string;
  steps: z.infer<typeof TraceStepSchema>[];
  children: TraceShape[];
}
export const TraceSchema: z.ZodType<TraceShape> = z.strictObject({
  title: z.string(),
  steps: z.array(TraceStepSchema),
  get children() {
    return z.array(TraceSchema);
  },
});

export const PulseRuleSchema = z.enum(['cw', 'single-pulse', 'average-power', 'pulse-train']);
export const En207ModeSchema = z.enum(['D', 'I', 'R', 'M']);

export const LimitSummarySchema = z.strictObject({
  tissue: TissueSchema,
  exposureDuration_s: z.number(),
  durationWhy: z.string(),
  H_Jm2: DecimalStringSchema,
  H_Jm2_reported: DecimalStringSchema,
  E_Wm2: DecimalStringSchema,
  E_Wm2_reported: DecimalStringSchema,
  governingRule: PulseRuleSchema,
  governingRow: z.string(),
  governingEffect: z.string(),
  rules: z.array(z.strictObject({ rule: PulseRuleSchema, H_Jm2: DecimalStringSchema, applies: z.boolean(), detail: z.string() })),
  aperture_m: DecimalStringSchema,
  conservativeReplacements: z.array(z.string()),
});

export const DistanceResultSchema = z.strictObject({
  kind: z.enum(['direct', 'diffuse', 'specular', 'lens', 'fiber', 'aided', 'skin']),
  label: z.string(),
  distance_m: DecimalStringSchema,
  distance_m_reported: DecimalStringSchema,
  zero: z.boolean(),
  governingRule: PulseRuleSchema,
  measuredFrom: z.string(),
  trace: TraceSchema,
  // Diffuse viewing cases, after the trace: the core writes them in this order, and a record must
  // re-export byte for byte (zod returns the keys in the schema's order).
  viewing: z.enum(['accidental', 'deliberate']).optional(),
  exposureDuration_s: z.number().optional(),
  governs: z.boolean().optional(),
});

export const OdRequirementSchema = z.strictObject({
  wavelength_nm: z.number(),
  exposure: DecimalStringSchema,
  limit: DecimalStringSchema,
  quantity: z.enum(['H', 'E']),
  position_m: DecimalStringSchema,
  od: DecimalStringSchema,
  odRequired_reported: DecimalStringSchema,
  trace: TraceSchema,
});

export const ScaleNumberRequirementSchema = z.strictObject({
  mode: z.union([En207ModeSchema, z.literal('RB')]),
  scale: z.number().int().nonnegative(),
  density: DecimalStringSchema,
  densityUnit: z.string(),
  applies: z.boolean(),
  note: z.string(),
});

export const ClassEstimateSchema = z.strictObject({
  estimate: LaserClassSchema,
  decidedBy: z.string(),
  caveat: z.string(),
  trace: TraceSchema,
});

const nominalConservative = z.strictObject({ nominal: DecimalStringSchema, conservative: DecimalStringSchema });
export const UncertaintyBoundsSchema = z.strictObject({
  nohd_m: nominalConservative,
  odRequired: nominalConservative,
  limit_E_Wm2: nominalConservative,
  dominantInput: z.string().nullable(),
  dominantMoves: z.enum(['NOHD', 'OD']).optional(),
});

export const BeamResultSchema = z.strictObject({
  beamId: z.string(),
  label: z.string(),
  laserId: z.string().optional(),
  ruleSet: RuleSetIdSchema,
  ruleSetName: z.string(),
  wavelength_nm: z.number(),
  emissionSummary: z.string(),
  mpe: LimitSummarySchema,
  skinMpe: LimitSummarySchema,
  nohd_m: DecimalStringSchema,
  nohd_m_reported: DecimalStringSchema,
  odRequired: DecimalStringSchema,
  od: OdRequirementSchema,
  distances: z.array(DistanceResultSchema),
  nhzDiffuse_m: DecimalStringSchema.nullable(),
  skinHazardDistance_m: DecimalStringSchema,
  scaleNumbers: z.array(ScaleNumberRequirementSchema),
  classEstimate: ClassEstimateSchema,
  bounds: UncertaintyBoundsSchema,
  warnings: z.array(z.string()),
  trace: TraceSchema,
});

export const EyewearVerdictSchema = z.strictObject({
  beamId: z.string(),
  eyewearId: z.string(),
  adequate: z.boolean(),
  odMargin: DecimalStringSchema.nullable(),
  scaleChecks: z.array(z.string()),
  reason: z.string(),
});

export const AdditiveGroupSchema = z.strictObject({
  place: z.string().optional(),
  tissue: TissueSchema,
  effect: z.string(),
  beamIds: z.array(z.string()),
  sumOfFractions: DecimalStringSchema,
  note: z.string(),
});

export const RoomResultSchema = z.strictObject({
  ruleSet: RuleSetIdSchema,
  ruleSetName: z.string(),
  beams: z.array(BeamResultSchema),
  additive: z.array(AdditiveGroupSchema),
  coverage: z.array(EyewearVerdictSchema),
  eyewearCoveringAll: z.array(z.string()),
  requiredEyewear: z.array(
    z.strictObject({ wavelength_nm: z.number(), odRequired: DecimalStringSchema, scaleNumbers: z.array(ScaleNumberRequirementSchema) }),
  ),
  purchaseAdvice: z.array(z.string()),
  largestHazardDistance_m: DecimalStringSchema,
  highestClass: LaserClassSchema,
  caution: z.string(),
  trace: TraceSchema,
  plan: PlanResultSchema.optional(),
});

// ---- compile-time proof that the schemas are the core types (fails to compile on drift)
assertType<SameShape<z.infer<typeof TraceStepSchema>, TraceStep>>(true);
assertType<SameShape<z.infer<typeof TraceSchema>, Trace>>(true);
assertType<SameShape<z.infer<typeof LimitSummarySchema>, LimitSummary>>(true);
assertType<SameShape<z.infer<typeof DistanceResultSchema>, DistanceResult>>(true);
assertType<SameShape<z.infer<typeof OdRequirementSchema>, OdRequirement>>(true);
assertType<SameShape<z.infer<typeof ScaleNumberRequirementSchema>, ScaleNumberRequirement>>(true);
assertType<SameShape<z.infer<typeof ClassEstimateSchema>, ClassEstimate>>(true);
assertType<SameShape<z.infer<typeof UncertaintyBoundsSchema>, UncertaintyBounds>>(true);
assertType<SameShape<z.infer<typeof BeamResultSchema>, BeamResult>>(true);
assertType<SameShape<z.infer<typeof EyewearVerdictSchema>, EyewearVerdict>>(true);
assertType<SameShape<z.infer<typeof AdditiveGroupSchema>, AdditiveGroup>>(true);
assertType<SameShape<z.infer<typeof RoomResultSchema>, RoomResult>>(true);
