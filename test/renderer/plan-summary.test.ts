/**
 * The room plan at a glance in the results panel: the lines the officer reads, counted from the
 * core's findings on a plan placed by hand (derived geometry, stated with each case).
 * Beam A (invented): 5 mW CW at 633 nm, 1 mm, 1 mrad (1/e): NOHD 14.9 m (ICNIRP 2013 Table 5,
 * visible 0.25 s, derived in test/core/plan/plan-zones.test.ts); diffuse reflectance 0.1 gives a
 * diffuse radius of a few millimetres, so only the direct beam reaches the doors here.
 */
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type RoomPlan } from '../../core/index.js';
import { planSummary } from '../../renderer/lib/plan-summary.js';

const beamA: BeamInput = { id: 'a', label: 'beam A', wavelength_nm: 633, emission: { kind: 'cw', power_W: 0.005 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }, viewing: { diffuse: { reflectance: 0.1 } } };
const p = (x_m: number, y_m: number) => ({ x_m, y_m });
// 8 m × 5 m; door D1 on the east wall at y 1–2 m, door D2 on the north wall at x 1–2 m; desk P1 at (4, 3).
const base: RoomPlan = {
  outline: [p(0, 0), p(8, 0), p(8, 5), p(0, 5)],
  doors: [{ id: 'D1', label: 'D1 corridor', a: p(8, 1), b: p(8, 2) }, { id: 'D2', label: 'D2 store', a: p(1, 5), b: p(2, 5), interlocked: true }],
  windows: [],
  walls: [],
  barriers: [],
  workPositions: [{ id: 'P1', label: 'desk', at: p(4, 3) }],
  enclosures: [],
  paths: [],
  reflectionPoints: [],
};

function lines(plan: RoomPlan): string[] {
  const r = evaluateRoom({ lasers: [{ id: 'L1', name: 'Laser 1', beams: [beamA] }, { id: 'L2', name: 'Laser 2', beams: [{ ...beamA, id: 'b', label: 'beam B' }] }], plan });
  return planSummary(plan, r.plan!, new Map(r.beams.map((b) => [b.beamId, b.label])), new Map([['L1', 'Laser 1'], ['L2', 'Laser 2']])).map((l) => `${l.tone}: ${l.text}`);
}

describe('room plan at a glance (derived geometry)', () => {
  it('a 6 mm beam dump 3 m from the exit, where beam A is 6.65 mm wide: the beam goes on past it and leaves through door D1', () => {
    // Derived in test/core/plan/plan-dump-aperture.test.ts: beam A is above the limit across 6.645 mm 3 m from its exit.
    expect(lines({ ...base, paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [{ kind: 'dump', at: p(4, 1.5), aperture_m: 0.006 }] }] })).toEqual([
      'hazard: Entrances inside a hazard zone: 1 of 2 doors (D1 corridor).',
      'ok: No work position lies inside a hazard zone (1 position drawn).',
      'hazard: Beam paths leaving the room above the limit: beam A (through door D1 corridor).',
      'hazard: Beams wider than their beam dump or target, taken to go on past it: beam A.',
      'check: No laser controlled area has been accepted yet.',
      'check: 1 laser is not placed on the plan.',
    ]);
  });

  it('an open beam along y = 1.5 m leaves through door D1 7 m from the exit (< 14.9 m); the desk 1.5 m off the line is clear', () => {
    expect(lines({ ...base, paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }] })).toEqual([
      'hazard: Entrances inside a hazard zone: 1 of 2 doors (D1 corridor).',
      'ok: No work position lies inside a hazard zone (1 position drawn).',
      'hazard: Beam paths leaving the room above the limit: beam A (through door D1 corridor).',
      'check: No laser controlled area has been accepted yet.',
      'check: 1 laser is not placed on the plan.',
    ]);
  });

  it('a curtain at x = 6 m stops it: no entrance in a zone, the curtain to check, the room accepted as the controlled area', () => {
    const plan: RoomPlan = {
      ...base,
      barriers: [{ id: 'C1', label: 'C1', kind: 'curtain', rating: 'maker rating 100 W/m² for 60 s', a: p(6, 0), b: p(6, 3) }],
      paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }, { laserId: 'L2', exit: p(1, 4), elements: [{ kind: 'dump', at: p(3, 4) }] }],
      controlledArea: { outline: base.outline, acceptedBy: 'I. Calloway-Senn' },
    };
    expect(lines(plan)).toEqual([
      'ok: No entrance lies inside a hazard zone (2 doors drawn).',
      'ok: No work position lies inside a hazard zone (1 position drawn).',
      'check: Beam paths ending on a curtain or barrier (check its rating): beam A on curtain C1.',
      'ok: Every hazard zone stays inside the accepted laser controlled area.',
    ]);
  });

  it('a curtain ending 30 mm past the beam does not stop it: the beam is said to go on past it, through door D1 (derived: curtain x = 6 m from y = 1.47 m; the band there is over 54 mm, test/core/plan/plan-surface-ends.test.ts)', () => {
    const plan: RoomPlan = {
      ...base,
      barriers: [{ id: 'C1', label: 'C1', kind: 'curtain', rating: 'maker rating 100 W/m² for 60 s', a: p(6, 1.47), b: p(6, 3) }],
      paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }, { laserId: 'L2', exit: p(1, 4), elements: [{ kind: 'dump', at: p(3, 4) }] }],
    };
    const said = lines(plan);
    expect(said).toContain('hazard: Beam paths meeting a wall, curtain or barrier near its end or a corner, taken to go on past it: beam A.');
    expect(said).toContain('hazard: Beam paths leaving the room above the limit: beam A (through door D1 corridor).');
    expect(said.join(' ')).not.toMatch(/ending on a curtain/);
  });

  it('a beam dump drawn beyond the east wall: the drawing is to be checked (derived: the beam along y = 3 m meets x = 8 m before the dump at x = 9 m)', () => {
    const plan: RoomPlan = { ...base, paths: [{ laserId: 'L1', exit: p(1, 3), elements: [{ kind: 'dump', at: p(9, 3) }] }, { laserId: 'L2', exit: p(1, 4), elements: [{ kind: 'dump', at: p(3, 4) }] }], controlledArea: { outline: base.outline, acceptedBy: 'I. Calloway-Senn' } };
    expect(lines(plan)).toContain('check: Beam paths drawn through a wall before their end (check the drawing; the wall is taken to stop the beam): Laser 1.');
  });
});
