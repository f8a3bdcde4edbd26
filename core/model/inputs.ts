/**
 * Inputs of an evaluation: beams, lasers, viewing conditions, eyewear and rooms.
 * Plain JSON-compatible data (numbers in SI units, suffixes name the unit) so that the same object
 * is typed in the UI, validated at the IPC/HTTP boundary, stored in a record and recomputed by
 * `verify`. Field names of `BeamInput` are the public API of issue 'Calculation core, part 2'.
 */

import type { RoomPlan } from '../plan/plan-model.js';

export type RuleSetId = 'icnirp2013' | 'eu2006';
export type Tissue = 'eye' | 'skin';

/** Conservative mode (limit specification, section 0): on by default. */
export interface LimitSettings {
  /** false turns conservative mode off entirely (not recommended). Default true. */
  readonly conservative?: boolean;
  /**
   * Ids of table rows (or 'factor:CC', 'rule:CP', 'aperture:<tissue>:<lo>-<hi>') that a named
   * person has checked against the published document: for those, the remembered value is used
   * instead of the stricter alternative.
   */
  readonly verifiedRows?: readonly string[];
  /**
   * The register's signed checks of limit-table entries against the published document (issue 12),
   * as the revision used them. A check, either verdict, ends the stricter replacement of that entry;
   * 'differs' also evaluates what the document gives and keeps the lower limit, so a check never
   * raises a limit above the value as written in the table (SAFETY.md, "Checks of the limit tables").
   * Unlike verifiedRows, a check never switches a row to its less strict alternative reading.
   */
  readonly rowChecks?: readonly RowCheck[];
}

/** One signed check of a limit-table row or factor piece, as evaluation and documents use it. */
export interface RowCheck {
  /** The entry: a row id ('H-E-VIS-4') or a factor key (see factorPieceKey in core/limits/factors.ts). */
  readonly key: string;
  readonly verdict: 'matches' | 'differs';
  /**
   * 'differs' only: what the published document gives, as an expression in the entry's quantity and
   * unit with the table's variables (t, lambda, alpha, CA, CB, CC, CE, T1, T2 ...).
   */
  readonly documentExpr?: string;
  /** The check's id in the register (the revision records which checks it used). */
  readonly checkId: string;
  /** The published document and table as the officer cited it ("IEC 60825-1:2014 Table A.1"). */
  readonly reference: string;
  readonly checkedBy: string;
  /** Calendar date of the signature, YYYY-MM-DD. */
  readonly checkedOn: string;
}

export type Emission =
  | { readonly kind: 'cw'; readonly power_W: number }
  | {
      readonly kind: 'pulsed';
      readonly pulseEnergy_J: number;
      readonly pulseDuration_s: number;
      /** Missing means a single pulse. */
      readonly repetitionRate_Hz?: number;
    };

export type BeamDefinition = '1/e' | '1/e2' | 'd63';

export interface BeamGeometry {
  /** Diameter at the exit aperture (or waist), metres. */
  readonly diameter_m: number;
  /** Full-angle divergence, radians. */
  readonly divergence_rad: number;
  /** Which points the diameter and divergence refer to. */
  readonly definition: BeamDefinition;
  readonly profile?: 'gaussian' | 'tophat';
  /** Elliptical beams: diameter along the second axis, metres (same definition); default round. */
  readonly diameterY_m?: number;
  /** Elliptical beams: full-angle divergence along the second axis, radians; default = divergence_rad. */
  readonly divergenceY_rad?: number;
}

/** Relative tolerances (0.1 = ±10 %) on inputs, for the conservative bound. */
export interface InputTolerances {
  readonly power?: number;
  readonly energy?: number;
  readonly divergence?: number;
  readonly diameter?: number;
  readonly pulseDuration?: number;
  readonly repetitionRate?: number;
}

/** Viewing conditions beyond the direct beam. All optional; each present one adds a result. */
export interface ViewingConditions {
  readonly diffuse?: {
    readonly reflectance: number;
    /** Viewing angle from the surface normal, radians. */
    readonly viewingAngle_rad?: number;
    /** Distance from the laser to the reflecting surface, metres (beam size on the target). */
    readonly targetDistance_m?: number;
    /** Distance from the reflecting surface to a viewer to assess (e.g. a person at the table), metres. */
    readonly viewerDistance_m?: number;
    /**
     * Viewing duration for someone deliberately looking at the diffuse spot (alignment on a card or
     * screen), seconds; default 600 s (customary for deliberate viewing of diffuse reflections,
     * from memory). Both cases are evaluated and shown.
     */
    readonly deliberateDuration_s?: number;
    /** Which case the officer takes as governing; default: the one with the larger distance. */
    readonly governs?: 'accidental' | 'deliberate';
  };
  readonly specular?: { readonly reflectance: number; readonly pathToSurface_m?: number };
  readonly lens?: { readonly focalLength_m: number; readonly beamDiameterAtLens_m?: number };
  readonly fiber?: { readonly kind: 'multimode' | 'singlemode'; readonly numericalAperture: number; readonly modeFieldDiameter_m?: number };
  readonly aided?: { readonly magnification: number; readonly objectiveDiameter_m: number; readonly transmission?: number };
  /** Atmospheric attenuation coefficient, 1/m (long outdoor paths only). */
  readonly attenuation_per_m?: number;
  /** Closest distance a person can reach, metres; default 0 (at the aperture). */
  readonly closestApproach_m?: number;
}

/** One beam: one wavelength and one operating mode of a laser. */
export interface BeamInput {
  readonly id?: string;
  readonly label?: string;
  readonly ruleSet?: RuleSetId;
  readonly wavelength_nm: number;
  readonly emission: Emission;
  readonly beam: BeamGeometry;
  /** Exposure duration to evaluate; default by band (common practice, see core/limits/durations.ts). */
  readonly exposureDuration_s?: number;
  /** Angular subtense of the apparent source, radians; default point source. */
  readonly sourceAngle_rad?: number;
  readonly viewing?: ViewingConditions;
  /**
   * Irradiated skin area, m² (optional): above 0.01 m², for t > 10 s at 1400 nm - 1 mm, the skin
   * limit is reduced to 10/A_s W/m² (100 W/m² from 0.1 m²).
   */
  readonly skinArea_m2?: number;
  readonly tolerances?: InputTolerances;
  readonly settings?: LimitSettings;
}

/** Eyewear on the shelf: OD per band and/or EN 207/208 markings. */
export interface EyewearSpec {
  readonly id: string;
  readonly label: string;
  readonly od?: ReadonlyArray<{ readonly from_nm: number; readonly to_nm: number; readonly od: number }>;
  readonly en207?: ReadonlyArray<{
    readonly from_nm: number;
    readonly to_nm: number;
    readonly modes: string; // e.g. "DIR" or "DIRM"
    readonly scale: number; // LB number
  }>;
  readonly en208?: ReadonlyArray<{ readonly from_nm: number; readonly to_nm: number; readonly scale: number }>;
  readonly visibleTransmission?: number;
}

export interface LaserInput {
  readonly id: string;
  readonly name: string;
  readonly classAsLabelled?: '1' | '1M' | '2' | '2M' | '3R' | '3B' | '4';
  /** One entry per wavelength or operating mode. */
  readonly beams: readonly BeamInput[];
}

/**
 * Beams that can reach the same place (a person's eye or skin there can meet them together): the
 * additive rule sums exposures within a place only. Default when none is given: the beams of one
 * laser, on their common path.
 */
export interface ExposurePlace {
  /** Where, in the officer's words, e.g. "table 1, compressor line". */
  readonly place: string;
  readonly beamIds: readonly string[];
}

export interface RoomInput {
  readonly ruleSet?: RuleSetId;
  readonly settings?: LimitSettings;
  readonly lasers: readonly LaserInput[];
  readonly eyewear?: readonly EyewearSpec[];
  /** The room plan (top view) with the beam paths; zones and findings come back in RoomResult.plan. */
  readonly plan?: RoomPlan;
  /** The officer's grouping of beams by the place they can reach together; see ExposurePlace. */
  readonly exposurePlaces?: readonly ExposurePlace[];
}
