/**
 * Times of register entries and revisions as versions: compared as instants (an offset such as
 * "-05:00" is not compared as text), and moved strictly forward on every write, so that two saves
 * in the same millisecond still leave two different versions.
 */
import type { Timestamp } from './types.js';

/** "10:00-05:00" and "15:00Z" are the same instant. */
export function sameInstant(a: Timestamp, b: Timestamp): boolean {
  return Date.parse(a) === Date.parse(b);
}

/** The clock's time, or one millisecond after `previous` when the clock has not passed it. */
export function laterStamp(now: Timestamp, previous: Timestamp): Timestamp {
  const n = Date.parse(now);
  const p = Date.parse(previous);
  if (Number.isNaN(p) || n > p) return now;
  return new Date(p + 1).toISOString();
}
