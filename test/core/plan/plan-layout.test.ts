// Layout rules shared by the plan on screen and on paper: labels go on the room side of a door or
// window, and an open beam's arrow points the way it was drawn. Cases derived by hand.
import { describe, expect, it } from 'vitest';
import { labelSide, onwardEnd, onwardStop, planMiddle, type RoomPlan } from '../../../core/index.js';

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

describe('the drawn arrow of an open beam stops at the first wall or barrier, and passes an open door (derived)', () => {
  const plan = (extra: Partial<RoomPlan>): RoomPlan => ({ outline: room, doors: [], windows: [], walls: [], barriers: [], workPositions: [], enclosures: [], paths: [], reflectionPoints: [], ...extra });
  const east = { laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 };
  const cases: Array<{ name: string; extra: Partial<RoomPlan>; to: [number, number] }> = [
    { name: 'east along y = 1.5 m: ends on the east wall at (8, 1.5)', extra: {}, to: [8, 1.5] },
    { name: 'through door D1 in the east wall (y 1–2 m): runs on, 20 m from the exit', extra: { doors: [{ id: 'D1', label: 'D1', a: p(8, 1), b: p(8, 2) }] }, to: [21, 1.5] },
    { name: 'a curtain across x = 4 m: ends on it at (4, 1.5)', extra: { barriers: [{ id: 'C1', label: 'C1', kind: 'curtain', rating: '', a: p(4, 0), b: p(4, 3) }] }, to: [4, 1.5] },
  ];
  for (const c of cases) {
    it(c.name, () => {
      const a = onwardStop(plan(c.extra), east, 20)!;
      expect(a.from).toEqual(p(1, 1.5));
      expect(a.to.x_m).toBeCloseTo(c.to[0], 9);
      expect(a.to.y_m).toBeCloseTo(c.to[1], 9);
    });
  }
});
