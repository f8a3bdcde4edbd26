// Layout rules shared by the plan on screen and on paper: labels go on the room side of a door or
// window, and an open beam's arrow points the way it was drawn. Cases derived by hand.
import { describe, expect, it } from 'vitest';
import { labelSide, onwardEnd, planMiddle } from '../../../core/index.js';

const p = (x_m: number, y_m: number) => ({ x_m, y_m });
const room = [p(0, 0), p(8, 0), p(8, 5), p(0, 5)]; // middle (4, 2.5)

describe('label side of a door or window (derived: toward the middle (4, 2.5) of an 8 m × 5 m room)', () => {
  const cases: Array<{ name: string; a: { x_m: number; y_m: number }; b: { x_m: number; y_m: number }; vertical: boolean; toward: 1 | -1 }> = [
    { name: 'east wall door: label to the west', a: p(8, 1), b: p(8, 2), vertical: true, toward: -1 },
    { name: 'west wall door: label to the east', a: p(0, 3), b: p(0, 4), vertical: true, toward: 1 },
    { name: 'north wall window: label to the south', a: p(5, 5), b: p(6, 5), vertical: false, toward: -1 },
    { name: 'south wall door: label to the north', a: p(1, 0), b: p(2, 0), vertical: false, toward: 1 },
  ];
  for (const c of cases) {
    it(c.name, () => {
      expect(planMiddle(room)).toEqual({ x: 4, y: 2.5 });
      expect(labelSide(c.a, c.b, planMiddle(room))).toMatchObject({ vertical: c.vertical, toward: c.toward });
    });
  }
});

describe('arrow of an open beam path (derived: 90° is north, so the end is straight up)', () => {
  it('from the last mirror, 10 m north', () => {
    const end = onwardEnd({ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'mirror', at: p(2, 1) }], onward_deg: 90 }, 10)!;
    expect(end.from).toEqual(p(2, 1));
    expect(end.to.x_m).toBeCloseTo(2, 12);
    expect(end.to.y_m).toBeCloseTo(11, 12);
  });
  it('none for a path ending in a beam dump', () => {
    expect(onwardEnd({ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'dump', at: p(2, 1) }] }, 10)).toBeNull();
  });
});
