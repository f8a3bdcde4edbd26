/** Shapes of the limit tables (see ./tables). Field names follow the project's limit specification. */

export type Confidence = 'read' | 'derived' | 'from memory' | 'from memory, uncertain' | 'ours';

/** A closed-open interval [lo, hi) as written in the specification. */
export type Interval = readonly [number, number];

export interface FactorPiece {
  readonly band_nm?: Interval;
  readonly t_s?: Interval;
  /** Condition on alpha (mrad), e.g. "alpha_min < alpha <= alpha_max". */
  readonly alpha_mrad?: string;
  readonly when?: string;
  readonly expr: string;
  readonly source?: string;
  readonly confidence?: string;
  readonly conservative_alt?: string;
}

export interface FactorDef {
  readonly pieces?: readonly FactorPiece[];
  readonly value?: number;
  readonly band_nm?: Interval;
  readonly expr?: string;
  readonly unit?: string;
  readonly source?: string;
  readonly confidence?: string;
  readonly note?: string;
  readonly [extra: string]: unknown;
}

/**
 * What a limit row protects against, as a typed class beside the row's effect text: the rules that
 * depend on it (the C_P scope of the pulse-train rule, the photochemical field of view, the
 * additive hazard groups) read this field, never the text. 'unstated': the source names the site
 * but not the mechanism (for example the UV rows shared by cornea and lens).
 */
export type EffectClass =
  | 'retina-thermal'
  | 'retina-photochemical'
  | 'cornea-lens-thermal'
  | 'cornea-lens-photochemical'
  | 'cornea-lens-thermal-photochemical'
  | 'cornea-lens-unstated'
  | 'skin-thermal'
  | 'skin-unstated';

export interface LimitRow {
  readonly id: string;
  readonly band_nm: Interval;
  readonly t_s: Interval;
  /** H: radiant exposure J/m²; E: irradiance W/m²; ref: use the rows of the other tissue table. */
  readonly quantity: 'H' | 'E' | 'ref';
  readonly expr: string;
  readonly unit: string;
  readonly effect: string;
  readonly effectClass: EffectClass;
  readonly source: string;
  readonly confidence: string;
  readonly when?: string;
  readonly conservative_alt?: string;
  readonly note?: string;
  /**
   * "Not to exceed" cap on the mean irradiance over the exposure duration, W/m² (for example EU
   * Table 2.3, 700-1400 nm extended sources: 1000 W/m²). conservativeOnly: applied only while the
   * row is unverified and conservative mode is on (a cap borrowed from the stricter rule set).
   */
  readonly max_E?: { readonly value: string; readonly source: string; readonly confidence: string; readonly conservativeOnly?: boolean };
  /**
   * A less strict reading of an uncertain row (for example an older edition), in the row's quantity,
   * where 'when' holds. The stricter expr is kept until a named person verifies the row with this
   * reading (settings.verifiedRows holds the row id); the trace always names it.
   */
  readonly relaxed_alt?: { readonly expr: string; readonly when: string; readonly source: string; readonly confidence: string };
}

export interface ApertureRow {
  readonly band_nm: Interval;
  readonly t_s: Interval;
  readonly diameter_mm: string;
  readonly source: string;
  readonly confidence: string;
  readonly conservative_alt?: string;
}

export interface RuleSetTable {
  readonly id: string;
  readonly specKey: string;
  readonly title: string;
  readonly status: string;
  readonly factors: Readonly<Record<string, FactorDef>>;
  readonly eye: readonly LimitRow[];
  readonly skin: readonly LimitRow[];
  readonly apertures: {
    readonly eye: readonly ApertureRow[];
    readonly skin: readonly ApertureRow[];
    readonly note?: string;
  };
  readonly repetitivePulses: RepetitivePulseRules;
}

/** A cited value or rule: where it comes from and how sure we are (see Confidence). */
export interface Cited {
  readonly source: string;
  readonly confidence: string;
}

/** One of the three repetitive-pulse rules as the rule set states it. */
export interface PulseRuleText extends Cited {
  readonly n: 1 | 2 | 3;
  readonly text: string;
  /** Citation printed in the derivation trace beside the value of rules 1 and 2 (rule 3 prints C_P's source). */
  readonly cite?: string;
}

/**
 * Window within which N is counted for the pulse-train rule, per wavelength band (closed-open
 * [lo, hi); the last band also holds its top edge). N is counted within min(T, cap); no cap means
 * over the whole exposure duration T.
 */
export interface CountingWindow extends Cited {
  readonly band_nm: Interval;
  readonly cap?:
    | { readonly factor: 'T2' }
    | { readonly seconds: string; readonly label: string };
  /** Why the count runs over the whole T where the rule set gives no cap (printed in the trace). */
  readonly uncappedNote?: string;
}

/** The pulse-train factor C_P and where it applies. */
export interface CpRuleData extends Cited {
  /** Expression used when no piecewise form is given, or in conservative mode. */
  readonly expr: string;
  /** A remembered piecewise form; used only once 'rule:CP' is verified (else conservative_alt). */
  readonly pieces?: ReadonlyArray<{ readonly when: string; readonly expr: string }>;
  readonly conservative_alt?: string;
  /** Effect classes of the limit rows that C_P reduces (rows of other classes are not reduced). */
  readonly appliesTo: readonly EffectClass[];
  /** Said when no row here is in appliesTo (officer words, with the citation). */
  readonly scopeNote: string;
  /** C_P applies only to pulses (or counted pulse groups) shorter than this, s. */
  readonly pulsesShorterThan_s: string;
  readonly note?: string;
}

/** Pulses closer together than the grouping time count as one pulse (T_i, T_min). */
export interface GroupingRule extends Cited {
  /** The factor (in `factors`) that holds the grouping time. */
  readonly factor: 'T_i' | 'T_min';
  /**
   * Which band's value applies exactly on a band edge: 'upper' (the band starting there, the
   * closed-open convention) or 'lower' (a table written lo < lambda <= hi).
   */
  readonly edgeSide: 'upper' | 'lower';
  /** Where the factor is not defined below a wavelength, the value used instead (null: no grouping). */
  readonly belowTable?: { readonly below_nm: number; readonly value_s: string; readonly source: string; readonly confidence: string };
  /** Grouped pulses count as ONE pulse for N only when each pulse is longer than this, s. */
  readonly countAsOneIfPulseLongerThan_s?: string;
}

/** The repetitive-pulse block of a rule set: the three rules, C_P, grouping and counting windows. */
export interface RepetitivePulseRules {
  readonly rules: readonly PulseRuleText[];
  readonly cp: CpRuleData;
  readonly grouping: GroupingRule;
  readonly countingWindows: readonly CountingWindow[];
  readonly notes?: readonly (Cited & { readonly text: string })[];
}
