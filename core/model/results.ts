/**
 * Results of an evaluation: the contract between the core and its consumers (records, printed
 * documents, UI, IPC). Plain JSON-compatible data; every number is a DECIMAL STRING in SI units
 * (full precision for records) with a `_reported` twin rounded in the safe direction for display:
 * limits DOWN, distances / optical densities / scale numbers UP.
 */
import type { Trace } from '../trace/trace.js';
import type { RuleSetId, Tissue } from './inputs.js';
import type { PlanResult } from '../plan/plan-model.js';

export type LaserClass = '1' | '1M' | '2' | '2M' | '3R' | '3B' | '4';
export type PulseRule = 'cw' | 'single-pulse' | 'average-power' | 'pulse-train';
export type En207Mode = 'D' | 'I' | 'R' | 'M';

/** The governing exposure limit for one tissue, with the pulse rules where they apply. */
export interface LimitSummary {
  readonly tissue: Tissue;
  /** Exposure duration evaluated, s, and why (given by the caller, or the common-practice default). */
  readonly exposureDuration_s: number;
  readonly durationWhy: string;
  /** Per-pulse limit for pulsed beams, or the limit over the exposure duration for CW, J/m². */
  readonly H_Jm2: string;
  readonly H_Jm2_reported: string;
  /** Mean irradiance limit (for pulses: per-pulse limit times repetition rate), W/m². */
  readonly E_Wm2: string;
  readonly E_Wm2_reported: string;
  readonly governingRule: PulseRule;
  readonly governingRow: string;
  readonly governingEffect: string;
  /** Every pulse rule evaluated (per-pulse H limits), so the report shows all three. */
  readonly rules: ReadonlyArray<{ readonly rule: PulseRule; readonly H_Jm2: string; readonly applies: boolean; readonly detail: string }>;
  readonly aperture_m: string;
  readonly conservativeReplacements: readonly string[];
}

export type DistanceKind = 'direct' | 'diffuse' | 'specular' | 'lens' | 'fiber' | 'aided' | 'skin';

export interface DistanceResult {
  readonly kind: DistanceKind;
  readonly label: string;
  /** Hazard distance, m (full precision); "0" when the exposure never exceeds the limit. */
  readonly distance_m: string;
  /** Rounded UP (safe direction). */
  readonly distance_m_reported: string;
  readonly zero: boolean;
  /** For a pulsed beam: which criterion gave the largest distance. */
  readonly governingRule: PulseRule;
  /** Where the distance is measured from (exit aperture, focal point, fibre end, reflecting surface). */
  readonly measuredFrom: string;
  /** Diffuse reflections: which viewing case this is (both are evaluated). */
  readonly viewing?: 'accidental' | 'deliberate';
  /** Diffuse reflections: the viewing duration the limit was taken for, s. */
  readonly exposureDuration_s?: number;
  /** Diffuse reflections: whether this case governs (the officer's choice, or the larger distance). */
  readonly governs?: boolean;
  readonly trace: Trace;
}

export interface OdRequirement {
  readonly wavelength_nm: number;
  /** Exposure at the eye through the limiting aperture at the worst reachable position (H per pulse or E), SI. */
  readonly exposure: string;
  readonly limit: string;
  readonly quantity: 'H' | 'E';
  readonly position_m: string;
  /** log10(exposure / limit), full precision; may be <= 0 (no filter needed). */
  readonly od: string;
  /** Rounded UP to one decimal place, never below 0. */
  readonly odRequired_reported: string;
  readonly trace: Trace;
}

export interface ScaleNumberRequirement {
  /** EN 207 mode; 'RB' entries are EN 208 alignment requirements. */
  readonly mode: En207Mode | 'RB';
  /** Required scale number (LB n or RB n), rounded up to the next table step; 0 = none needed. */
  readonly scale: number;
  /** The power (W/m²) or energy (J/m²) density or power/energy used to enter the table. */
  readonly density: string;
  readonly densityUnit: string;
  readonly applies: boolean;
  readonly note: string;
}

export interface ClassEstimate {
  readonly estimate: LaserClass;
  /** Which accessible emission limit decided, e.g. "Class 3B AEL 0.5 W exceeded". */
  readonly decidedBy: string;
  readonly caveat: string;
  readonly trace: Trace;
}

export interface UncertaintyBounds {
  readonly nohd_m: { readonly nominal: string; readonly conservative: string };
  readonly odRequired: { readonly nominal: string; readonly conservative: string };
  readonly limit_E_Wm2: { readonly nominal: string; readonly conservative: string };
  /** Input whose tolerance moves the NOHD the most (none when no tolerances were given). */
  readonly dominantInput: string | null;
  /** What the dominant input moved most: the NOHD, or (where no tolerance moves the NOHD) the OD. */
  readonly dominantMoves?: 'NOHD' | 'OD';
}

export interface BeamResult {
  readonly beamId: string;
  readonly label: string;
  readonly laserId?: string;
  readonly ruleSet: RuleSetId;
  readonly ruleSetName: string;
  readonly wavelength_nm: number;
  readonly emissionSummary: string;
  /** Eye limit (public API name `mpe`). */
  readonly mpe: LimitSummary;
  readonly skinMpe: LimitSummary;
  /** Direct-beam NOHD, m (full precision) and rounded up. */
  readonly nohd_m: string;
  readonly nohd_m_reported: string;
  /** Required OD at the worst reachable position, rounded up to one decimal (public API name). */
  readonly odRequired: string;
  readonly od: OdRequirement;
  readonly distances: readonly DistanceResult[];
  /** Largest hazard distance of the diffuse reflection (the NHZ radius for diffuse viewing), m. */
  readonly nhzDiffuse_m: string | null;
  readonly skinHazardDistance_m: string;
  readonly scaleNumbers: readonly ScaleNumberRequirement[];
  readonly classEstimate: ClassEstimate;
  readonly bounds: UncertaintyBounds;
  /** Unusual inputs (pulse shorter than the tables, invisible beam with 0.25 s ...), plain sentences. */
  readonly warnings: readonly string[];
  readonly trace: Trace;
}

export interface EyewearVerdict {
  readonly beamId: string;
  readonly eyewearId: string;
  readonly adequate: boolean;
  /** OD margin (provided - required), decimal string, or null if no OD given for that wavelength. */
  readonly odMargin: string | null;
  /** Per-mode scale number check, e.g. "D: LB5 >= LB4 ok". */
  readonly scaleChecks: readonly string[];
  readonly reason: string;
}

export interface AdditiveGroup {
  /** The place whose beams are summed (absent in results computed before places were asked for). */
  readonly place?: string;
  readonly tissue: Tissue;
  readonly effect: string;
  readonly beamIds: readonly string[];
  /** Sum of exposure/limit fractions at the worst position; > 1 means over the limit combined. */
  readonly sumOfFractions: string;
  readonly note: string;
}

export interface RoomResult {
  readonly ruleSet: RuleSetId;
  readonly ruleSetName: string;
  readonly beams: readonly BeamResult[];
  readonly additive: readonly AdditiveGroup[];
  readonly coverage: readonly EyewearVerdict[];
  /** Eyewear ids that cover every beam a person can meet in the room. */
  readonly eyewearCoveringAll: readonly string[];
  /** What the room needs: per wavelength the OD and scale numbers (rounded up). */
  readonly requiredEyewear: ReadonlyArray<{ readonly wavelength_nm: number; readonly odRequired: string; readonly scaleNumbers: readonly ScaleNumberRequirement[] }>;
  /** Advice when nothing on the shelf covers everything. */
  readonly purchaseAdvice: readonly string[];
  readonly largestHazardDistance_m: string;
  readonly highestClass: LaserClass;
  readonly caution: string;
  readonly trace: Trace;
  /** Hazard zones and findings on the room plan; present only when the input has a plan. */
  readonly plan?: PlanResult;
}

/** Printed on every result and document (SAFETY.md). */
export const RESULT_CAUTION =
  'These results support, and do not replace, the judgement of the site laser safety officer and the local regulations.';
