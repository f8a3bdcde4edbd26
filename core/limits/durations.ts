/**
 * Default exposure durations when the caller gives none (common practice, limit specification
 * section 1.2.3 of the domain notes and the trade facts):
 * - 0.25 s for unintended viewing of visible beams (aversion response, 400-700 nm);
 * - 10 s for near and far infrared (no aversion response; eye movements limit longer exposure);
 * - 30 000 s (an 8 h working day) for ultraviolet and for intended long viewing.
 */
export type ViewingIntent = 'unintended' | 'intended';

export interface DefaultDuration {
  readonly duration_s: number;
  readonly why: string;
  readonly basis: 'common practice';
}

export function defaultExposureDuration(wavelength_nm: number, intent: ViewingIntent = 'unintended'): DefaultDuration {
  if (intent === 'intended') {
    return { duration_s: 30000, why: 'intended long viewing: a full working day of 30 000 s', basis: 'common practice' };
  }
  if (wavelength_nm < 400) {
    return { duration_s: 30000, why: 'ultraviolet: effects add up over the day, so 30 000 s (8 h)', basis: 'common practice' };
  }
  if (wavelength_nm < 700) {
    return { duration_s: 0.25, why: 'visible beam, unintended viewing: aversion response within 0.25 s', basis: 'common practice' };
  }
  return { duration_s: 10, why: 'infrared: no aversion response; 10 s for unintended viewing', basis: 'common practice' };
}
