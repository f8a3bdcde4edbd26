// Lines of sight on the room plan, through evaluateRoom: a curtain or barrier shades the
// diffuse-reflection zone behind it, and an L-shaped room cuts beams and zones at its own walls.
// Every position is placed by hand against the geometry stated beside it (derived), and the finding
// the officer reads is what is checked.
//
// Beam C: 200 W CW at 532 nm, 2 mm, 1 mrad (1/e), diffuse reflectance 1. Its diffuse NHZ for
// deliberate viewing of the spot (visible: 600 s, domain notes 1.4 and its viewing-time note, from
// memory) is √(ρ·P/(π·E_L)) with E_L = 10 W/m² (ICNIRP 2013 Table 5, visible, t ≥ 10 s, small
// source) = √(200/(10π)) = 2.523 m, reported 2.53 m (rounded up).
import { describe, expect, it } from 'vitest';
import { evaluateRoom, InputError, type BeamInput, type PlanFinding, type RoomInput, type RoomPlan } from '../../../core/index.js';

const beamC: BeamInput = { id: 'c', label: 'beam C', wavelength_nm: 532, emission: { kind: 'cw', power_W: 200 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' }, viewing: { diffuse: { reflectance: 1 } } };

const p = (x_m: number, y_m: number) => ({ x_m, y_m });
const none = { doors: [], windows: [], walls: [], barriers: [], workPositions: [], enclosures: [], paths: [], reflectionPoints: [] };

function room(plan: Omit<RoomPlan, keyof typeof none> & Partial<RoomPlan>): RoomInput {
  return { lasers: [{ id: 'L1', name: 'Laser 1', beams: [beamC] }], plan: { ...none, ...plan } };
}
const kinds = (fs: readonly PlanFinding[]) => fs.map((f) => `${f.kind}:${f.subjectId}`).sort();

describe('beam C diffuse radius (the zone the cases below are placed against)', () => {
  it('is 2.53 m: √(200/(10π)) = 2.523 m rounded up (ICNIRP 2013 Table 5; domain notes 1.4)', () => {
    const r = evaluateRoom(room({ outline: [p(0, 0), p(8, 0), p(8, 5), p(0, 5)], reflectionPoints: [{ id: 'R1', label: 'card', at: p(4, 2.5), laserId: 'L1' }], paths: [{ laserId: 'L1', exit: p(1, 1), elements: [{ kind: 'dump', at: p(2, 1) }] }] }));
    expect(r.plan!.zones.find((z) => z.kind === 'diffuse')!.radius_m).toBe('2.53');
  });
});

describe('a curtain shades the diffuse-reflection zone behind it (common practice: curtains and walls are opaque to scattered light)', () => {
  // An 8 m × 5 m room; door D1 in the east wall at y 1–2 m. The beam runs east along y = 1.5 m.
  const base = { outline: [p(0, 0), p(8, 0), p(8, 5), p(0, 5)], doors: [{ id: 'D1', label: 'D1', a: p(8, 1), b: p(8, 2) }] };
  // Curtain C1 along x = 7.2 m from the south wall (y = 0) to y = 3 m.
  const curtain = { id: 'C1', label: 'C1', kind: 'curtain' as const, rating: 'maker rating 100 W/m² for 60 s', a: p(7.2, 0), b: p(7.2, 3) };
  // P1 at (5.5, 2.5): 1.41 m from the spot, in plain sight. P2 at (7.6, 1.5): 1.1 m from the spot, behind the curtain.
  const positions = [{ id: 'P1', label: 'P1', at: p(5.5, 2.5) }, { id: 'P2', label: 'P2', at: p(7.6, 1.5) }];
  const toTarget = [{ laserId: 'L1', exit: p(1, 1.5), elements: [{ kind: 'target' as const, at: p(6.5, 1.5) }] }];

  const cases: Array<{ name: string; source: string; plan: Partial<RoomPlan>; findings: string[] }> = [
    {
      name: 'target at (6.5, 1.5) without the curtain: door D1 (1.5 m away) and both desks are inside the zone',
      source: 'derived: |(8, 1.5) − (6.5, 1.5)| = 1.5 m, |P1| = 1.41 m, |P2| = 1.1 m, all < 2.53 m, nothing between',
      plan: { workPositions: positions, paths: toTarget },
      findings: ['door-in-zone:D1', 'no-controlled-area:plan', 'work-position-in-zone:P1', 'work-position-in-zone:P2'],
    },
    {
      name: 'the same target with curtain C1 between it and the door: the door and P2 are shaded, P1 is not',
      source:
        'derived: sight lines from (6.5, 1.5) to the door (x = 8, y 1–2) cross x = 7.2 at y 1.27–1.73 (on the curtain); the line past the curtain end (7.2, 3) reaches the east wall at y = 4.71, above the door; P2 is on the far side of x = 7.2 at y = 1.5',
      plan: { barriers: [curtain], workPositions: positions, paths: toTarget },
      findings: ['no-controlled-area:plan', 'work-position-in-zone:P1'],
    },
    {
      name: 'the open beam stopped by curtain C1: the spot on the curtain scatters back into the room, not through it',
      source: 'derived: the beam meets x = 7.2 at (7.2, 1.5); door D1 (0.8 m) and P2 (0.4 m) are behind the curtain; P1 at 1.97 m in front of it',
      plan: { barriers: [curtain], workPositions: positions, paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }] },
      findings: ['no-controlled-area:plan', 'stopped-by-barrier:C1', 'work-position-in-zone:P1'],
    },
  ];
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      const plan = evaluateRoom(room({ ...base, ...c.plan })).plan!;
      expect(kinds(plan.findings)).toEqual(c.findings);
    });
  }

  it('no corner of the shaded zone lies behind the curtain, beyond its 1 mm allowance (derived: the region x > 7.201 m, y < 2.9 m is out of sight of (6.5, 1.5))', () => {
    const plan = evaluateRoom(room({ ...base, barriers: [curtain], paths: toTarget })).plan!;
    const zone = plan.zones.find((z) => z.kind === 'diffuse')!;
    const behind = zone.polygon.filter((q) => Number(q.x_m) > 7.2015 && Number(q.y_m) < 2.9);
    expect(behind).toEqual([]);
    // …and the zone still reaches past the curtain's free end, where the spot is in sight (derived: (7.3, 3.5) is 1.97 m away, the line to it passes above (7.2, 3)).
    expect(zone.polygon.some((q) => Number(q.x_m) > 7.3 && Number(q.y_m) > 3.5)).toBe(true);
  });
});

describe('an L-shaped room: beams and zones stop at its own walls (derived geometry)', () => {
  // Corners (0, 0), (8, 0), (8, 3), (3, 3), (3, 7), (0, 7): the inner corner is (3, 3); the square
  // x > 3 m, y > 3 m is outside the room (the office next door).
  const L = [p(0, 0), p(8, 0), p(8, 3), p(3, 3), p(3, 7), p(0, 7)];
  const short = [{ laserId: 'L1', exit: p(0.5, 0.5), elements: [{ kind: 'dump' as const, at: p(1, 0.5) }] }];

  const runs: Array<{ name: string; source: string; exit: { x_m: number; y_m: number }; deg: number; end: [string, string] }> = [
    { name: 'east along y = 5 m in the west wing', source: 'derived: the inner wall x = 3 m spans y 3–7 m', exit: p(1, 5), deg: 0, end: ['3', '5'] },
    { name: 'north along x = 5 m in the south wing', source: 'derived: the wall y = 3 m spans x 3–8 m', exit: p(5, 1), deg: 90, end: ['5', '3'] },
    { name: 'at 45° from (1, 2)', source: 'derived: y = x + 1 meets x = 3 at y = 4, inside 3–7 m, after passing (2, 3) inside the room', exit: p(1, 2), deg: 45, end: ['3', '4'] },
    { name: 'east along y = 1 m under the inner corner', source: 'derived: y = 1 m passes below the corner (3, 3) to the east wall x = 8 m', exit: p(1, 1), deg: 0, end: ['8', '1'] },
  ];
  for (const r of runs) {
    it(`a beam ${r.name} ends on the wall at (${r.end.join(', ')}) (${r.source})`, () => {
      const plan = evaluateRoom(room({ outline: L, paths: [{ laserId: 'L1', exit: r.exit, elements: [], onward_deg: r.deg }] })).plan!;
      const run = plan.runs[0]!;
      expect(run.endsAt).toBe('wall');
      const last = run.points[run.points.length - 1]!;
      expect([Number(last.x_m), Number(last.y_m)]).toEqual([Number(r.end[0]), Number(r.end[1])]);
    });
  }

  it('the diffuse zone of a spot at (2, 2) reaches both wings but not the office behind the inner corner', () => {
    // derived: P1 (2.5, 4) is 2.06 m away in the west wing; P2 (4, 2.6) is 2.09 m away in the south wing;
    // P3 (3.4, 3.6) is 2.13 m and P4 (3.8, 3.3) 2.22 m away, both in the office (x > 3, y > 3): within
    // 2.53 m, but the sight lines meet the inner wall x = 3 m at y = 3.14 m and the wall y = 3 m at x = 3.38 m.
    const plan = evaluateRoom(
      room({
        outline: L,
        reflectionPoints: [{ id: 'R1', label: 'alignment card', at: p(2, 2), laserId: 'L1' }],
        workPositions: [{ id: 'P1', label: 'P1', at: p(2.5, 4) }, { id: 'P2', label: 'P2', at: p(4, 2.6) }, { id: 'P3', label: 'P3', at: p(3.4, 3.6) }, { id: 'P4', label: 'P4', at: p(3.8, 3.3) }],
        controlledArea: { outline: L, acceptedBy: 'I. Calloway-Senn' },
        paths: short,
      }),
    ).plan!;
    // The accepted boundary is the L itself, so no zone reaches outside it (the zone is cut at the walls).
    expect(kinds(plan.findings)).toEqual(['work-position-in-zone:P1', 'work-position-in-zone:P2']);
  });

  it('a door in the inner wall is reached from the west wing, and one in the office is not', () => {
    // derived: D1 on x = 3 m, y 4–5 m, is 2.24 m from (2, 2) at its nearest end, in sight from the west
    // wing; D2 on the office's far side of the wall y = 3 m (x 3.5–4.5 m, y = 3.2 m) is 1.92 m away at its nearest end but
    // behind that wall (a door of the next room, drawn for the check).
    const plan = evaluateRoom(
      room({
        outline: L,
        doors: [{ id: 'D1', label: 'D1', a: p(3, 4), b: p(3, 5) }, { id: 'D2', label: 'D2', a: p(3.5, 3.2), b: p(4.5, 3.2) }],
        reflectionPoints: [{ id: 'R1', label: 'alignment card', at: p(2, 2), laserId: 'L1' }],
        paths: short,
      }),
    ).plan!;
    expect(kinds(plan.findings)).toEqual(['door-in-zone:D1', 'no-controlled-area:plan']);
  });

  // The direct-beam zone is the beam's over-limit width plus 50 mm each side for the drawing; walls
  // the beam runs beside or ends on stop it (the beam cannot reach behind them), 1 mm beyond the surface.
  // Beam C's half-width here is under 16 mm (derived: D_L/(2√e) with the beam ≤ 12 mm wide over 8 m), so
  // the zone edge lies 51–67 mm from the drawn line.
  const y0 = 2.97;
  const under = [{ laserId: 'L1', exit: p(1, y0), elements: [], onward_deg: 0 }];
  const zoneOf = (paths: RoomPlan['paths'], extra: Partial<RoomPlan> = {}) =>
    evaluateRoom(room({ outline: L, controlledArea: { outline: L, acceptedBy: 'I. Calloway-Senn' }, paths, ...extra })).plan!;
  const cornersOf = (plan: ReturnType<typeof zoneOf>) => plan.zones.filter((z) => z.kind === 'direct').flatMap((z) => z.polygon.map((q) => [Number(q.x_m), Number(q.y_m)] as const));

  it('a beam 30 mm under the inner corner: its zone keeps its width in the west wing and stops 1 mm into the wall y = 3 m beside the office, and 1 mm into the east wall', () => {
    // derived: the beam runs along y = 2.97 m from x = 1 m to the east wall x = 8 m; its zone edge
    // (y ≥ 2.97 + 0.051 = 3.021 m) would lie in the office (x > 3 m, y > 3 m) over x 3–8 m.
    const plan = zoneOf(under, { workPositions: [{ id: 'P1', label: 'office desk', at: p(5, 3.01) }, { id: 'P2', label: 'west wing bench', at: p(2.5, 3.01) }] });
    const corners = cornersOf(plan);
    // Lines of the band above y = 3 m stop 1 mm into the wall x = 3 m (corners rounded to the millimetre).
    expect(corners.filter(([x, y]) => x > 3.0015 && y > 3.0015)).toEqual([]);
    expect(Math.max(...corners.map(([x]) => x))).toBeLessThanOrEqual(8.001);
    expect(Math.max(...corners.filter(([x]) => x < 3).map(([, y]) => y))).toBeGreaterThanOrEqual(3.021);
    // The officer reads: the bench in the west wing 40 mm from the beam is inside, the desk behind the wall is not,
    // and the zone stays inside the accepted boundary (the L itself).
    expect(kinds(plan.findings)).toEqual(['work-position-in-zone:P2']);
  });

  it('a beam meeting the inner wall 20 mm above the inner corner: the part under the corner goes on through the south wing to the east wall; the office is not reached', () => {
    // derived: the beam east along y = 3.02 m meets the wall x = 3 m (y 3–7 m) at (3, 3.02), 20 mm above
    // the corner (3, 3), inside its band (over 51 mm each side). The lines of the band above y = 3 m stop
    // 1 mm into that wall; those below it run on through the south wing to the east wall x = 8 m, 7 m
    // from the exit (inside the NOHD), and stop 1 mm into it. The office (x > 3 m, y > 3 m) is not reached.
    const plan = zoneOf([{ laserId: 'L1', exit: p(1, 3.02), elements: [], onward_deg: 0 }], { workPositions: [{ id: 'P1', label: 'office desk', at: p(3.03, 3.04) }, { id: 'P2', label: 'south wing bench', at: p(6, 2.99) }] });
    expect(plan.runs[0]!.endsAt).toBe('wall');
    const corners = cornersOf(plan);
    expect(corners.filter(([x, y]) => x > 3.0015 && y > 3.0015)).toEqual([]);
    expect(Math.max(...corners.map(([x]) => x))).toBeCloseTo(8.001, 6);
    // P2, 30 mm under the drawn line, is in the direct-beam zone, and 2.0 m from where the part under the
    // corner meets the east wall, inside the 2.53 m diffuse zone there.
    expect(kinds(plan.findings)).toEqual(['passes-surface-end:outline', 'work-position-in-zone:P2', 'work-position-in-zone:P2']);
    expect(plan.findings.filter((f) => f.subjectId === 'P2').map((f) => f.text)).toEqual(['Work position south wing bench is inside the direct-beam zone of beam C.', 'Work position south wing bench is inside the diffuse-reflection zone of beam C.']);
  });

  it('a small diffuse zone where a beam ends on the inner wall is cut 1 mm beyond the wall, so it stays inside the accepted boundary', () => {
    // Beam E (invented): 100 mW CW at 405 nm, 2.3 mm, 0.4 mrad (1/e²), diffuse reflectance 0.2: a diffuse
    // radius under 0.1 m (√(ρ·P/(π·E_L)), domain notes 1.4). It runs east along y = 3.5 m and ends on the
    // inner wall x = 3 m at (3, 3.5); the spot is seen from the west wing (derived), so no corner of its zone
    // lies beyond x = 3.0015 m (1 mm beyond the wall plus the rounding to the millimetre).
    const beamE: BeamInput = { id: 'e', label: 'beam E', wavelength_nm: 405, emission: { kind: 'cw', power_W: 0.1 }, beam: { diameter_m: 0.0023, divergence_rad: 0.0004, definition: '1/e2' }, viewing: { diffuse: { reflectance: 0.2 } } };
    const input: RoomInput = { lasers: [{ id: 'L1', name: 'Laser 1', beams: [beamE] }], plan: { ...none, outline: L, controlledArea: { outline: L, acceptedBy: 'I. Calloway-Senn' }, paths: [{ laserId: 'L1', exit: p(0.5, 3.5), elements: [], onward_deg: 0 }] } };
    const plan = evaluateRoom(input).plan!;
    const zone = plan.zones.find((z) => z.kind === 'diffuse')!;
    expect(Number(zone.radius_m)).toBeLessThan(0.1);
    expect(Math.max(...zone.polygon.map((q) => Number(q.x_m)))).toBeLessThanOrEqual(3.0015);
    expect(kinds(plan.findings)).toEqual([]);
  });

  it('an outline whose sides cross is refused, naming the outline (ours: a room outline is a simple polygon)', () => {
    try {
      evaluateRoom(room({ outline: [p(0, 0), p(4, 4), p(4, 0), p(0, 4)], paths: short }));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).field).toBe('plan.outline');
    }
  });
});

describe('an accepted controlled area of any shape (derived geometry)', () => {
  // The room is 8 m × 5 m; the officer's controlled area leaves out a 0.4 m recess from the north wall
  // down to y = 1.6 m at x 3.1–3.5 m (a cupboard opening onto the corridor).
  const room8x5 = [p(0, 0), p(8, 0), p(8, 5), p(0, 5)];
  const withRecess = [p(0, 0), p(8, 0), p(8, 5), p(3.5, 5), p(3.5, 1.6), p(3.1, 1.6), p(3.1, 5), p(0, 5)];
  const along = (y: number) => [{ laserId: 'L1', exit: p(1, y), elements: [{ kind: 'dump' as const, at: p(7, y) }] }];
  const cases: Array<{ name: string; source: string; y: number; outside: boolean }> = [
    {
      name: 'a beam along y = 1.57 m: its zone reaches 22 mm into the recess, though no corner of the zone does',
      source: 'derived: half-width ≥ 50 mm + 1 mm + the beam, so the zone edge is at y ≥ 1.621 m over x 3.1–3.5 m; the zone piece from x = 3 m to 5 m has its corners and middle outside the recess',
      y: 1.57,
      outside: true,
    },
    { name: 'the same beam along y = 1.4 m stays clear of it', source: 'derived: the zone edge is at most 1.4 + 0.06 = 1.46 m < 1.6 m', y: 1.4, outside: false },
  ];
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      const plan = evaluateRoom(room({ outline: room8x5, controlledArea: { outline: withRecess, acceptedBy: 'I. Calloway-Senn' }, paths: along(c.y) })).plan!;
      expect(kinds(plan.findings).includes('outside-controlled-area:c')).toBe(c.outside);
    });
  }
});
