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

export interface LimitRow {
  readonly id: string;
  readonly band_nm: Interval;
  readonly t_s: Interval;
  /** H: radiant exposure J/m²; E: irradiance W/m²; ref: use the rows of the other tissue table. */
  readonly quantity: 'H' | 'E' | 'ref';
  readonly expr: string;
  readonly unit: string;
  readonly effect: string;
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
  readonly repetitivePulses: Readonly<Record<string, unknown>>;
}
