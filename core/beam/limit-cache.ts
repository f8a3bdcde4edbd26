/**
 * Memoised exposure-limit look-ups. A limit depends only on (rule set, tissue, wavelength,
 * durations, source size, settings), not on power or beam size, so while an officer edits a power
 * or a divergence, every limit of a room is reused and the room recomputes within one frame.
 * Results are treated as read-only by every caller in the core.
 */
import { exposureLimit, type ExposureLimitQuery, type ExposureLimitResult } from '../limits/exposure-limit.js';
import { pulsedExposureLimit, type PulsedLimitQuery, type PulsedLimitResult } from '../limits/pulse-rules.js';

const MAX_ENTRIES = 1000;
const cwCache = new Map<string, ExposureLimitResult>();
const pulsedCache = new Map<string, PulsedLimitResult>();

function keyOf(q: object): string {
  return JSON.stringify(q);
}

export function cachedExposureLimit(q: ExposureLimitQuery): ExposureLimitResult {
  const k = keyOf(q);
  const hit = cwCache.get(k);
  if (hit) return hit;
  const r = exposureLimit(q);
  // Stryker disable next-line ConditionalExpression,EqualityOperator: memory only; the key holds the whole query, so a kept or renewed entry is the same value (test/mutation/EQUIVALENT.md)
  if (cwCache.size >= MAX_ENTRIES) cwCache.clear();
  cwCache.set(k, r);
  return r;
}

export function cachedPulsedLimit(q: PulsedLimitQuery): PulsedLimitResult {
  const k = keyOf(q);
  const hit = pulsedCache.get(k);
  if (hit) return hit;
  const r = pulsedExposureLimit(q);
  // Stryker disable next-line ConditionalExpression,EqualityOperator: memory only, as for the CW memo above
  if (pulsedCache.size >= MAX_ENTRIES) pulsedCache.clear();
  pulsedCache.set(k, r);
  return r;
}

/** Empty the limit caches (core/caches.ts empties every memo of the core at once). */
// Stryker disable next-line BlockStatement: a kept entry is the same value (its key is the whole query); only the benchmark's cold runs and the tests' fresh start call this
export function clearLimitCache(): void {
  cwCache.clear();
  pulsedCache.clear();
}
