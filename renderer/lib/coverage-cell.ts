/**
 * The short reason shown inside a coverage-matrix cell, so the officer reads it in place: the OD
 * margin rounded DOWN (a margin is never shown larger than it is), a shortfall rounded UP, or what
 * is missing. The full reason and the EN 207 scale-number checks are one click or key press away.
 */
import { dec, roundPlaces } from '../../core/index.js';
import type { EyewearVerdict } from '../../core/model/results.js';

export function cellReason(v: EyewearVerdict, wavelength_nm: number): string {
  if (v.adequate) {
    if (v.reason.startsWith('the exposure does not exceed')) return 'no filter needed';
    if (v.odMargin === null) return 'protects';
    const m = roundPlaces(dec(v.odMargin), 1, 'down');
    return `OD margin +${m.toFixed(1)}${v.reason.includes('not rated under EN 207') ? ', EN 207 not marked' : ''}`;
  }
  if (v.odMargin === null) return `no OD stated at ${wavelength_nm} nm`;
  const margin = dec(v.odMargin);
  if (margin.lt(0)) return `OD short by ${roundPlaces(margin.neg(), 1, 'up').toFixed(1)}`;
  return 'EN 207 scale number too low';
}
