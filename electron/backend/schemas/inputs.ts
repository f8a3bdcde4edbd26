/**
 * Zod schemas for the core's input types (core/model/inputs.ts), used wherever inputs arrive from
 * outside: IPC and HTTP payloads, export files, CSV rows, stored records. Objects are strict
 * (unknown fields are rejected: a misspelt field must not be silently ignored in a safety record).
 * Ranges are the physical ones; the core still applies the rule-set ranges and says which row.
 * The assertions at the end fail to compile if a schema drifts from the core type.
 */
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
import { assertType, type SameShape } from './type-equality.js';

const positive = (unit: string) => z.number({ error: `must be a number (${unit})` }).positive(`must be greater than 0 ${unit}`);
const nonNegative = (unit: string) => z.number({ error: `must be a number (${unit})` }).nonnegative(`must be 0 or more ${unit}`);
const fraction = (what: string) =>
  z.number({ error: `must be a number (${what})` }).min(0, `must be between 0 and 1 (${what})`).max(1, `must be between 0 and 1 (${what})`);

/** 180 nm to 1 mm: the span of the ICNIRP 2013 / EU 2006 limit tables. */
export const WavelengthNmSchema = z
  .number({ error: 'must be a number (nm)' })
  .min(180, 'must be at least 180 nm (the limit tables start at 180 nm)')
  .max(1_000_000, 'must be at most 1 000 000 nm (1 mm, where the limit tables end)');

export const RuleSetIdSchema = z.enum(['icnirp2013', 'eu2006']);
export const TissueSchema = z.enum(['eye', 'skin']);

export const LimitSettingsSchema = z.strictObject({
  conservative: z.boolean().optional(),
  verifiedRows: z.array(z.string().min(1)).optional(),
});

export const EmissionSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('cw'), power_W: positive('W') }),
  z.strictObject({
    kind: z.literal('pulsed'),
    pulseEnergy_J: positive('J'),
    pulseDuration_s: positive('s'),
    repetitionRate_Hz: positive('Hz').optional(),
  }),
]);

export const BeamDefinitionSchema = z.enum(['1/e', '1/e2', 'd63'], { error: 'must be "1/e", "1/e2" or "d63" (points where the beam diameter is measured)' });

export const BeamGeometrySchema = z.strictObject({
  diameter_m: positive('m'),
  divergence_rad: nonNegative('rad').max(Math.PI, 'must be at most π rad (full angle)'),
  definition: BeamDefinitionSchema,
  profile: z.enum(['gaussian', 'tophat']).optional(),
  diameterY_m: positive('m').optional(),
  divergenceY_rad: nonNegative('rad').max(Math.PI, 'must be at most π rad (full angle)').optional(),
});

/** Relative tolerances: 0.1 = ±10 %; below 1 so the lower bound stays positive. */
const tolerance = z.number({ error: 'must be a number (relative, 0.1 = ±10 %)' }).min(0, 'must be 0 or more').lt(1, 'must be below 1 (1 = ±100 %)');
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
      reflectance: fraction('reflectance'),
      viewingAngle_rad: nonNegative('rad').max(Math.PI / 2, 'must be at most π/2 rad (90° from the normal)').optional(),
      targetDistance_m: nonNegative('m').optional(),
      viewerDistance_m: nonNegative('m').optional(),
      deliberateDuration_s: positive('s').max(30000, 'must be at most 30 000 s (a working day)').optional(),
      governs: z.enum(['accidental', 'deliberate'], { error: "must be 'accidental' or 'deliberate'" }).optional(),
    })
    .optional(),
  specular: z.strictObject({ reflectance: fraction('reflectance'), pathToSurface_m: nonNegative('m').optional() }).optional(),
  lens: z.strictObject({ focalLength_m: positive('m'), beamDiameterAtLens_m: positive('m').optional() }).optional(),
  fiber: z
    .strictObject({
      kind: z.enum(['multimode', 'singlemode']),
      numericalAperture: positive('NA').max(1, 'must be at most 1 (numerical aperture in air)'),
      modeFieldDiameter_m: positive('m').optional(),
    })
    .optional(),
  aided: z
    .strictObject({
      magnification: z.number({ error: 'must be a number (×)' }).min(1, 'must be at least 1 (×)'),
      objectiveDiameter_m: positive('m'),
      transmission: fraction('transmission').optional(),
    })
    .optional(),
  attenuation_per_m: nonNegative('1/m').optional(),
  closestApproach_m: nonNegative('m').optional(),
});

export const BeamInputSchema = z.strictObject({
  id: z.string().min(1).optional(),
  label: z.string().optional(),
  ruleSet: RuleSetIdSchema.optional(),
  wavelength_nm: WavelengthNmSchema,
  emission: EmissionSchema,
  beam: BeamGeometrySchema,
  exposureDuration_s: positive('s').optional(),
  sourceAngle_rad: nonNegative('rad').optional(),
  viewing: ViewingConditionsSchema.optional(),
  skinArea_m2: nonNegative('m²').max(10, 'must be at most 10 m² (irradiated skin area)').optional(),
  tolerances: InputTolerancesSchema.optional(),
  settings: LimitSettingsSchema.optional(),
});

const band = { from_nm: WavelengthNmSchema, to_nm: WavelengthNmSchema };
const bandOrdered = (b: { from_nm: number; to_nm: number }) => b.from_nm <= b.to_nm;
const bandMessage = { message: 'from_nm must not be above to_nm', path: ['to_nm'] };

/** EN 207 scale numbers LB1..LB10, EN 208 RB1..RB10 (EN 207:2017 / EN 208:2009 tables). */
const scaleNumber = z
  .number({ error: 'must be a whole number 1 to 10' })
  .int('must be a whole number 1 to 10')
  .min(1, 'must be a whole number 1 to 10')
  .max(10, 'must be a whole number 1 to 10');

export const EyewearSpecSchema = z.strictObject({
  id: z.string().min(1, 'must not be empty (the tag on the frame)'),
  label: z.string(),
  od: z
    .array(
      z.strictObject({ ...band, od: nonNegative('OD').max(20, 'must be at most 20 (OD)') }).refine(bandOrdered, bandMessage),
    )
    .optional(),
  en207: z
    .array(
      z
        .strictObject({
          ...band,
          // EN 207 test conditions: D (continuous), I (pulsed), R (Q-switched), M (mode-locked); "IR" = I and R.
          modes: z.string().regex(/^[DIRM]+$/, 'must be letters from D, I, R, M (e.g. "D" or "IR")'),
          scale: scaleNumber,
        })
        .refine(bandOrdered, bandMessage),
    )
    .optional(),
  en208: z.array(z.strictObject({ ...band, scale: scaleNumber }).refine(bandOrdered, bandMessage)).optional(),
  visibleTransmission: fraction('visible transmission').optional(),
});

export const LaserClassSchema = z.enum(['1', '1M', '2', '2M', '3R', '3B', '4']);

export const LaserInputSchema = z.strictObject({
  id: z.string().min(1, 'must not be empty'),
  name: z.string(),
  classAsLabelled: LaserClassSchema.optional(),
  beams: z.array(BeamInputSchema).min(1, 'a laser needs at least one beam (wavelength / mode)'),
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
  exposurePlaces: z.array(ExposurePlaceSchema).max(500).optional(),
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
