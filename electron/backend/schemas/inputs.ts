/**
 * Zod schemas for the core's input types (core/model/inputs.ts), used wherever inputs arrive from
 * outside: IPC and HTTP payloads, export files, CSV rows, stored records. Objects are strict
 * (unknown fields are rejected: a misspelt field must not be silently ignored in a safety record).
 * Every range, length and cross-field rule comes from the core's one table (core/model/input-rules.ts)
 * and the core's own checks, so a value accepted here is accepted by the calculation and the reverse
 * (property test: test/backend/records/schema-core-agreement.test.ts).
 * The assertions at the end fail to compile if a schema drifts from the core type.
 */
import { MAX_ROW_CHECKS, ROW_CHECK_TEXT, readableDocumentValue } from '../../../core/model/validate-settings.js';
import { z } from 'zod';
import type {
  BeamGeometry,
  BeamInput,
  Emission,
  EyewearSpec,
  InputTolerances,
  LaserInput,
  LimitSettings,
  RoomInput,
  RuleSetId,
  Tissue,
  ViewingConditions,
} from '../../../core/model/inputs.js';
import {
  EN207_MODES,
  INPUT_RULES,
  LASER_CLASS_LABELS,
  SCALE_NUMBERS,
  TEXT_RULES,
  textProblem,
  type TextRule,
} from '../../../core/model/input-rules.js';
import { SINGLE_MODE_NEEDS_MFD, exposureVsPulseProblem, pulseTrainProblem } from '../../../core/beam/validate-beam.js';
import { assertType, type SameShape } from './type-equality.js';
import { RoomPlanSchema } from './plan.js';
import { numberByRule } from './number-by-rule.js';

/** A number checked against its rule in the one table (core/model/input-rules.ts). */
const num = numberByRule;
const text = (rule: TextRule) =>
  z.string({ error: `${rule.label} must be text` }).superRefine((x, c) => {
    const problem = textProblem(rule, x);
    if (problem) c.addIssue({ code: 'custom', message: problem });
  });
const R = INPUT_RULES;

/** 180 nm to 1 mm: the span of the ICNIRP 2013 / EU 2006 limit tables. */
export const WavelengthNmSchema = num(R.wavelength_nm);

export const RuleSetIdSchema = z.enum(['icnirp2013', 'eu2006']);
export const TissueSchema = z.enum(['eye', 'skin']);

/**
 * A signed check of a limit-table entry as a revision used it (issue 12; core RowCheck). The same
 * rules as the core's validator (core/model/validate-settings.ts): a 'differs' check carries the
 * published value, a 'matches' check none.
 */
export const RowCheckSchema = z
  .strictObject({
    key: z.string().min(1).max(ROW_CHECK_TEXT.key),
    verdict: z.enum(['matches', 'differs']),
    documentExpr: z.string().min(1).max(ROW_CHECK_TEXT.documentExpr).refine(readableDocumentValue, 'must be written as in the tables (numbers, + - * / ^, parentheses and the tables’ symbols)').optional(),
    checkId: z.string().min(1).max(ROW_CHECK_TEXT.checkId),
    reference: z.string().min(1).max(ROW_CHECK_TEXT.reference),
    checkedBy: z.string().min(1).max(ROW_CHECK_TEXT.checkedBy),
    checkedOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date YYYY-MM-DD'),
  })
  .superRefine((c, ctx) => {
    if (c.verdict === 'differs' && c.documentExpr === undefined) ctx.addIssue({ code: 'custom', path: ['documentExpr'], message: 'must give what the published document says when it differs' });
    if (c.verdict === 'matches' && c.documentExpr !== undefined) ctx.addIssue({ code: 'custom', path: ['documentExpr'], message: 'is only given when the published document differs' });
  });

export const LimitSettingsSchema = z.strictObject({
  conservative: z.boolean().optional(),
  verifiedRows: z.array(z.string().min(1)).optional(),
  rowChecks: z.array(RowCheckSchema).max(MAX_ROW_CHECKS).optional(),
});

export const EmissionSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('cw'), power_W: num(R.power_W) }),
  z
    .strictObject({
      kind: z.literal('pulsed'),
      pulseEnergy_J: num(R.pulseEnergy_J),
      pulseDuration_s: num(R.pulseDuration_s),
      repetitionRate_Hz: num(R.repetitionRate_Hz).optional(),
    })
    .superRefine((e, c) => {
      const problem = pulseTrainProblem(e);
      if (problem) c.addIssue({ code: 'custom', message: problem, path: ['repetitionRate_Hz'] });
    }),
]);

export const BeamDefinitionSchema = z.enum(['1/e', '1/e2', 'd63'], { error: 'must be "1/e", "1/e2" or "d63" (points where the beam diameter is measured)' });

export const BeamGeometrySchema = z.strictObject({
  diameter_m: num(R.diameter_m),
  divergence_rad: num(R.divergence_rad),
  definition: BeamDefinitionSchema,
  profile: z.enum(['gaussian', 'tophat']).optional(),
  diameterY_m: num(R.diameterY_m).optional(),
  divergenceY_rad: num(R.divergenceY_rad).optional(),
});

/** Relative tolerances: 0.1 = ±10 %; below 1 so the lower bound stays positive. */
const tolerance = num(R.tolerance);
export const InputTolerancesSchema = z.strictObject({
  power: tolerance.optional(),
  energy: tolerance.optional(),
  divergence: tolerance.optional(),
  diameter: tolerance.optional(),
  pulseDuration: tolerance.optional(),
  repetitionRate: tolerance.optional(),
});

export const ViewingConditionsSchema = z.strictObject({
  diffuse: z
    .strictObject({
      reflectance: num(R.diffuseReflectance),
      viewingAngle_rad: num(R.viewingAngle_rad).optional(),
      targetDistance_m: num(R.targetDistance_m).optional(),
      viewerDistance_m: num(R.viewerDistance_m).optional(),
      deliberateDuration_s: num(R.deliberateDuration_s).optional(),
      governs: z.enum(['accidental', 'deliberate'], { error: "must be 'accidental' or 'deliberate'" }).optional(),
    })
    .optional(),
  specular: z.strictObject({ reflectance: num(R.specularReflectance), pathToSurface_m: num(R.pathToSurface_m).optional() }).optional(),
  lens: z.strictObject({ focalLength_m: num(R.focalLength_m), beamDiameterAtLens_m: num(R.beamDiameterAtLens_m).optional() }).optional(),
  fiber: z
    .strictObject({
      kind: z.enum(['multimode', 'singlemode']),
      numericalAperture: num(R.numericalAperture),
      modeFieldDiameter_m: num(R.modeFieldDiameter_m).optional(),
    })
    .superRefine((f, c) => {
      if (f.kind === 'singlemode' && f.modeFieldDiameter_m === undefined) c.addIssue({ code: 'custom', message: SINGLE_MODE_NEEDS_MFD, path: ['modeFieldDiameter_m'] });
    })
    .optional(),
  aided: z
    .strictObject({
      magnification: num(R.magnification),
      objectiveDiameter_m: num(R.objectiveDiameter_m),
      transmission: num(R.transmission).optional(),
    })
    .optional(),
  attenuation_per_m: num(R.attenuation_per_m).optional(),
  closestApproach_m: num(R.closestApproach_m).optional(),
});

export const BeamInputSchema = z
  .strictObject({
    id: text(TEXT_RULES.beamId).optional(),
    label: text(TEXT_RULES.beamLabel).optional(),
    ruleSet: RuleSetIdSchema.optional(),
    wavelength_nm: WavelengthNmSchema,
    emission: EmissionSchema,
    beam: BeamGeometrySchema,
    exposureDuration_s: num(R.exposureDuration_s).optional(),
    sourceAngle_rad: num(R.sourceAngle_rad).optional(),
    viewing: ViewingConditionsSchema.optional(),
    skinArea_m2: num(R.skinArea_m2).optional(),
    tolerances: InputTolerancesSchema.optional(),
    settings: LimitSettingsSchema.optional(),
  })
  .superRefine((b, c) => {
    const problem = exposureVsPulseProblem(b);
    if (problem) c.addIssue({ code: 'custom', message: problem, path: ['exposureDuration_s'] });
  });

const band = { from_nm: WavelengthNmSchema, to_nm: WavelengthNmSchema };
const bandOrdered = (b: { from_nm: number; to_nm: number }) => b.from_nm <= b.to_nm;
const bandMessage = { message: 'the band must go from the shorter to the longer wavelength', path: ['to_nm'] };

const scaleNumber = (s: { readonly min: number; readonly max: number; readonly prefix: string; readonly standard: string }) => {
  const m = `must be a whole number from ${s.prefix}${s.min} to ${s.prefix}${s.max} (${s.standard})`;
  return z.number({ error: m }).int(m).min(s.min, m).max(s.max, m);
};

export const EyewearSpecSchema = z.strictObject({
  id: text(TEXT_RULES.eyewearTag),
  label: text(TEXT_RULES.eyewearLabel),
  od: z.array(z.strictObject({ ...band, od: num(R.opticalDensity) }).refine(bandOrdered, bandMessage)).optional(),
  en207: z
    .array(
      z
        .strictObject({
          ...band,
          modes: z.string().regex(EN207_MODES, 'must be letters from D, I, R, M (e.g. "D" or "IR")'),
          scale: scaleNumber(SCALE_NUMBERS.en207),
        })
        .refine(bandOrdered, bandMessage),
    )
    .optional(),
  en208: z.array(z.strictObject({ ...band, scale: scaleNumber(SCALE_NUMBERS.en208) }).refine(bandOrdered, bandMessage)).optional(),
  visibleTransmission: num(R.visibleTransmission).optional(),
});

export const LaserClassSchema = z.enum(LASER_CLASS_LABELS);

export const LaserInputSchema = z
  .strictObject({
    id: text(TEXT_RULES.laserId),
    name: text(TEXT_RULES.laserName),
    classAsLabelled: LaserClassSchema.optional(),
    beams: z.array(BeamInputSchema).min(1, 'a laser needs at least one beam (wavelength / mode)'),
  })
  .superRefine((l, c) => {
    const seen = new Set<string>();
    l.beams.forEach((b, i) => {
      if (b.id === undefined) return;
      if (seen.has(b.id)) c.addIssue({ code: 'custom', message: `beam id "${b.id}" is used twice in this laser`, path: ['beams', i, 'id'] });
      seen.add(b.id);
    });
  });

export const ExposurePlaceSchema = z.strictObject({
  place: z.string().trim().min(1, { message: 'name the place' }).max(200),
  beamIds: z.array(z.string().min(1).max(100)).max(500),
});

export const RoomInputSchema = z.strictObject({
  ruleSet: RuleSetIdSchema.optional(),
  settings: LimitSettingsSchema.optional(),
  lasers: z.array(LaserInputSchema),
  eyewear: z.array(EyewearSpecSchema).optional(),
  plan: RoomPlanSchema.optional(),
  exposurePlaces: z.array(ExposurePlaceSchema).max(500).optional(),
});

/**
 * Reading back what the register stored before these rules were one: the shape only. A laser or
 * eyewear stored under an older, looser rule (an RB6 marking, an empty name) must still open in
 * the register so the officer can correct it; every write goes through the strict schemas above.
 */
const isRecord = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);
export const StoredLaserInputSchema = z.custom<LaserInput>(
  (x) => isRecord(x) && typeof x['id'] === 'string' && typeof x['name'] === 'string' && Array.isArray(x['beams']) && x['beams'].every(isRecord),
  { message: 'is not a stored laser (id, name, beams)' },
);
export const StoredEyewearSpecSchema = z.custom<EyewearSpec>((x) => isRecord(x) && typeof x['id'] === 'string' && typeof x['label'] === 'string', {
  message: 'is not a stored eyewear specification (id, label)',
});

// ---- compile-time proof that the schemas are the core types (fails to compile on drift)
assertType<SameShape<z.infer<typeof RuleSetIdSchema>, RuleSetId>>(true);
assertType<SameShape<z.infer<typeof TissueSchema>, Tissue>>(true);
assertType<SameShape<z.infer<typeof LimitSettingsSchema>, LimitSettings>>(true);
assertType<SameShape<z.infer<typeof EmissionSchema>, Emission>>(true);
assertType<SameShape<z.infer<typeof BeamGeometrySchema>, BeamGeometry>>(true);
assertType<SameShape<z.infer<typeof InputTolerancesSchema>, InputTolerances>>(true);
assertType<SameShape<z.infer<typeof ViewingConditionsSchema>, ViewingConditions>>(true);
assertType<SameShape<z.infer<typeof BeamInputSchema>, BeamInput>>(true);
assertType<SameShape<z.infer<typeof EyewearSpecSchema>, EyewearSpec>>(true);
assertType<SameShape<z.infer<typeof LaserInputSchema>, LaserInput>>(true);
assertType<SameShape<z.infer<typeof RoomInputSchema>, RoomInput>>(true);
