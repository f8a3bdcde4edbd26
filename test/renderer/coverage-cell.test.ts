/**
 * The reason shown inside a coverage cell, read from the core's own verdicts (evaluateRoom): the
 * OD margin rounded DOWN, a shortfall rounded UP (SAFETY.md, safe direction), or "no OD stated".
 * Beam: invented 532 nm, 1 W CW, 2 mm, 1 mrad; eyewear invented. The required OD is whatever the
 * core computes (checked against published cases in test/core); here only its wording is checked.
 */
import { describe, expect, it } from 'vitest';
import { dec, evaluateRoom, type RoomInput } from '../../core/index.js';
import { cellReason } from '../../renderer/lib/coverage-cell.js';

const input: RoomInput = {
  ruleSet: 'icnirp2013',
  lasers: [{ id: 'L', name: 'Green', beams: [{ id: 'g', wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
  eyewear: [
    { id: 'EW-HIGH', label: 'OD 10', od: [{ from_nm: 190, to_nm: 540, od: 10 }] },
    { id: 'EW-LOW', label: 'OD 2', od: [{ from_nm: 190, to_nm: 540, od: 2 }] },
    { id: 'EW-IR', label: 'IR only', od: [{ from_nm: 1000, to_nm: 1100, od: 7 }] },
  ],
};

describe('coverage cell reason', () => {
  const room = evaluateRoom(input);
  const required = dec(room.beams[0]!.od.od);
  const v = (tag: string) => room.coverage.find((c) => c.eyewearId === tag)!;

  it.each([
    { tag: 'EW-HIGH', want: () => `OD margin +${dec(10).minus(required).toDecimalPlaces(1, 1).toFixed(1)}, EN 207 not marked`, source: 'derived: margin = 10 − required OD, rounded down; no EN 207 marking given' },
    { tag: 'EW-LOW', want: () => `OD short by ${required.minus(2).toDecimalPlaces(1, 0).toFixed(1)}`, source: 'derived: shortfall = required OD − 2, rounded up' },
    { tag: 'EW-IR', want: () => 'no OD stated at 532 nm', source: 'derived: no band covers 532 nm' },
  ])('$tag [$source]', ({ tag, want }) => {
    expect(cellReason(v(tag), 532)).toBe(want());
  });
});
