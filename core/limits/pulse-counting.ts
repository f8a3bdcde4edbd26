/**
 * Counting pulses for the repetitive-pulse rules: how many pulses fall within a time window, how
 * many arrive within the grouping time (T_i in ICNIRP 2013 / IEC 60825-1:2014, T_min in EU
 * Directive 2006/25/EC Table 2.6), and how many groups a window holds.
 *
 * Counts are rounded UP: a window of length T can hold ceil(f*T) pulses of a regular train
 * (a partial period still starts a pulse), and a larger count is the stricter one for every rule
 * that divides by it or raises it to a negative power (ours; the standards leave the rounding open).
 */
import { Dec } from '../numeric/decimal.js';

/** Pulses of a regular train at rate f (Hz) that fall within a window of `window_s` seconds, at least 1. */
export function pulsesIn(rate_Hz: Dec, window_s: Dec): Dec {
  return Dec.max(1, rate_Hz.mul(window_s).ceil());
}

export interface Grouping {
  /** Pulses that arrive within one grouping time and are counted as one pulse (>= 2). */
  readonly groupedPulses: Dec;
  /** Duration of the grouped pulse: the grouping time, or the exposure if that is shorter. */
  readonly groupDuration_s: Dec;
}

/**
 * Pulses closer together than the grouping time T_g (period 1/f < T_g) are one pulse for the pulse
 * rules. Returns null when the period is not shorter than T_g (each pulse stands alone).
 * The group never holds more pulses than the whole exposure (N_T) nor lasts longer than it.
 */
export function groupWithin(rate_Hz: Dec, groupTime_s: Dec, exposure_s: Dec, pulsesInExposure: Dec): Grouping | null {
  // f * T_g <= 1 (period not shorter than T_g) gives ceil(f * T_g) <= 1: no group, by the test below.
  const n = Dec.min(rate_Hz.mul(groupTime_s).ceil(), pulsesInExposure);
  if (n.lte(1)) return null;
  return { groupedPulses: n, groupDuration_s: Dec.min(groupTime_s, exposure_s) };
}

/** Number of groups of `perGroup` pulses among `pulses` (rounded up: a partial group is a group). */
export function groupsAmong(pulses: Dec, perGroup: Dec): Dec {
  return Dec.max(1, pulses.div(perGroup).ceil());
}
