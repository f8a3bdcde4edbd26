// The room plan through evaluateRoom: zones, runs and findings, with the geometry checked by hand.
// Beam A (HeNe-like, 5 mW CW at 633 nm, 1 mm, 1 mrad, 1/e): NOHD = (√(4P/(π·E_L)) − a)/φ with
// E_L = 18·t^0.75/t W/m² at t = 0.25 s (ICNIRP 2013 Table 5, visible, C6 = 1) = 25.46 W/m²
// → (0.01581 − 0.001)/0.001 = 14.81 m, reported 14.9 m (rounded up, 3 figures).
import { describe, expect, it } from 'vitest';
import { evaluateRoom, InputError, type BeamInput, type PlanFinding, type RoomInput, type RoomPlan } from '../../../core/index.js';
import { beamA, eastDoorRoom, p } from './east-door-room.js';

// Its diffuse NHZ at ρ = 0.1 is √(0.1·0.005/(π·25.46)) = 2.5 mm (domain notes 1.4).
// Beam B: 5 W CW at 532 nm, diffuse reflectance 1 at normal view: for accidental viewing (0.25 s) NHZ = √(ρ·P/(π·E_L)) = √(5/(π·25.46)) = 0.250 m (domain notes 1.4); the core also weighs deliberate viewing of the spot (domain errata), which can only make it larger.
const beamB: BeamInput = { id: 'b', label: 'beam B', wavelength_nm: 532, emission: { kind: 'cw', power_W: 5 }, beam: { diameter_m: 0.0023, divergence_rad: 0.0004, definition: '1/e2' }, viewing: { diffuse: { reflectance: 1 } } };

/** The shared 8 m × 5 m room with door D1 in the east wall at y 1–2, and window W1 in the north wall at x 5–6. */
const emptyPlan: RoomPlan = { ...eastDoorRoom, windows: [{ id: 'W1', label: 'W1', a: p(5, 5), b: p(6, 5) }] };

function room(beam: BeamInput, plan: Partial<RoomPlan>): RoomInput {
  return { lasers: [{ id: 'L1', name: 'Laser 1', beams: [beam] }], plan: { ...emptyPlan, ...plan } };
}
const kinds = (fs: readonly PlanFinding[]) => fs.map((f) => `${f.kind}:${f.subjectId}`).sort();
const xs = (poly: ReadonlyArray<{ x_m: string }>) => poly.map((q) => Number(q.x_m));
const ys = (poly: ReadonlyArray<{ y_m: string }>) => poly.map((q) => Number(q.y_m));

describe('direct-beam zone along the drawn path (issue 16 cases; derived geometry)', () => {
  it('the NOHD of beam A is 14.9 m, as derived above (ICNIRP 2013 Table 5, domain notes 1.2.1)', () => {
    expect(evaluateRoom(room(beamA, {})).beams[0]!.nohd_m_reported).toBe('14.9');
  });

  const cases: Array<{ name: string; source: string; plan: Partial<RoomPlan>; maxX?: number; maxY?: number; endsAt: string; findings: string[] }> = [
    {
      name: 'a beam along a 6 m bench ending in a dump: the zone ends at the dump (plus the 50 mm drawing margin and 1 mm pad)',
      source: 'derived: exit x = 1 m, dump x = 7 m < NOHD; zone end 7 + 0.05 + 0.001 = 7.051 m',
      plan: { paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [{ kind: 'dump', at: p(7, 1.5) }] }] },
      maxX: 7.051,
      endsAt: 'dump',
      findings: ['no-controlled-area:plan'],
    },
    {
      name: 'a mirror turning the beam toward a door 4 m away with an NOHD of 14.9 m: the door is inside',
      source: 'derived: 1.5 m to the mirror + 4 m to door D1 = 5.5 m < 14.9 m; the beam leaves through the door',
      plan: { doors: [{ id: 'D1', label: 'D1', a: p(1.5, 5), b: p(2.5, 5) }], paths: [{ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'mirror', at: p(2, 1) }], onward_deg: 90 }] },
      endsAt: 'nohd',
      maxY: 1 + 14.9 - 1.5 + 0.051,
      findings: ['door-in-zone:D1', 'leaves-room:D1', 'no-controlled-area:plan'],
    },
    {
      name: 'the same beam without a door in its way ends on the wall, and its zone 1 mm beyond it (the wall stops the beam and the drawing margin)',
      source: 'derived: the north wall at y = 5 m is 4 m from the mirror; no opening there; 5 + 0.001 m',
      plan: { paths: [{ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'mirror', at: p(2, 1) }], onward_deg: 90 }] },
      endsAt: 'wall',
      maxY: 5.001,
      findings: ['no-controlled-area:plan'],
    },
    {
      name: 'a curtain across the bench stops the beam before door D1; the rating must be checked',
      source: 'derived: curtain at x = 4 m lies between the exit (x = 1 m) and door D1 (x = 8 m) on the line y = 1.5 m; the zone ends 1 mm beyond it, 4.001 m',
      plan: {
        barriers: [{ id: 'C1', label: 'C1', kind: 'curtain', rating: 'maker rating 100 W/m² for 60 s', a: p(4, 0), b: p(4, 3) }],
        paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }],
      },
      maxX: 4.001,
      endsAt: 'barrier',
      findings: ['no-controlled-area:plan', 'stopped-by-barrier:C1'],
    },
    {
      name: 'an open beam through door D1 leaves the room and reaches the door',
      source: 'derived: the door crossing at x = 8 m is 7 m from the exit, inside the 14.9 m NOHD',
      plan: { paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }] },
      maxX: 1 + 14.9 + 0.051,
      endsAt: 'nohd',
      findings: ['door-in-zone:D1', 'leaves-room:D1', 'no-controlled-area:plan'],
    },
    {
      name: 'a beam leaving its enclosure is found; a door behind the dump is not',
      source: 'derived: the enclosure spans x 0.5–3 m; the dump is at x = 6 m; door D1 is at x = 8 m',
      plan: { enclosures: [{ id: 'E1', label: 'E1', min: p(0.5, 1), max: p(3, 2) }], paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [{ kind: 'dump', at: p(6, 1.5) }] }] },
      maxX: 6.051,
      endsAt: 'dump',
      findings: ['leaves-enclosure:E1', 'no-controlled-area:plan'],
    },
  ];
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      const plan = evaluateRoom(room(beamA, c.plan)).plan!;
      const direct = plan.zones.filter((z) => z.kind === 'direct');
      expect(direct.length).toBeGreaterThan(0);
      if (c.maxX !== undefined) expect(Math.max(...direct.flatMap((z) => xs(z.polygon)))).toBeCloseTo(c.maxX, 6);
      if (c.maxY !== undefined) expect(Math.max(...direct.flatMap((z) => ys(z.polygon)))).toBeCloseTo(c.maxY, 6);
      expect(plan.runs[0]!.endsAt).toBe(c.endsAt);
      expect(kinds(plan.findings)).toEqual(c.findings);
    });
  }

  it('the zone is never narrower than the over-limit region: half-width at the NOHD end ≥ D_L/(2√e) + margin where D ≈ D_L/√e (derived)', () => {
    const plan = evaluateRoom(room(beamA, { paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }] })).plan!;
    // D_L = 0.001 + 0.001 × 14.9 = 0.0159 m; largest half-width 0.0159/(2·1.6487) = 4.82 mm; + 50 mm + 1 mm + 0.5 mm (band-edge rounding).
    const halves = plan.zones.filter((q) => q.kind === 'direct').map((z) => (Math.max(...ys(z.polygon)) - Math.min(...ys(z.polygon))) / 2);
    expect(Math.max(...halves)).toBeGreaterThanOrEqual(0.0159 / (2 * Math.sqrt(Math.E)) + 0.051 - 0.0005);
    expect(Math.max(...halves)).toBeLessThan(0.06);
    // The first metre: D(1 m) = 2 mm, r = 1 mm × √(2·ln(15.9/2)) = 2.04 mm, half-width 53.5 mm (derived).
    expect(halves[0]).toBeCloseTo(0.00204 + 0.0515, 3);
  });

  it('a work position beside the beam at eye level is found, with the eye-level check (domain notes 4.3: eye level about 1.2–1.8 m [STAN-OLD])', () => {
    const plan = evaluateRoom(
      room(beamA, { workPositions: [{ id: 'P1', label: 'P1', at: p(4, 1.52) }, { id: 'P2', label: 'P2', at: p(4, 2.5) }], paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [{ kind: 'dump', at: p(7, 1.5) }], height_m: 1.5 }] }),
    ).plan!;
    expect(kinds(plan.findings)).toEqual(['beam-at-eye-level:L1', 'no-controlled-area:plan', 'work-position-in-zone:P1']);
    expect(plan.suggestions.join(' ')).toMatch(/raise the beam height/);
  });
});

describe('a mirror turning the beam toward a door, NOHD just under 10 m (issue 16 case; derived geometry)', () => {
  // Beam D: 2.4 mW CW at 633 nm, 1 mm, 1 mrad (1/e). E_L = 25.46 W/m² (ICNIRP 2013 Table 5, visible,
  // 0.25 s, as for beam A above); NOHD = (√(4·0.0024/(π·25.46)) − 0.001)/0.001 = (0.010956 − 0.001)/0.001
  // = 9.956 m, reported 9.96 m (rounded up, 3 figures).
  const beamD: BeamInput = { ...beamA, id: 'd', label: 'beam D', emission: { kind: 'cw', power_W: 0.0024 } };
  const base = { outline: [p(0, 0), p(12, 0), p(12, 5), p(0, 5)], doors: [] };
  const turned = (mirrorX: number) => ({ ...base, doors: [{ id: 'D1', label: 'D1', a: p(mirrorX - 0.5, 5), b: p(mirrorX + 0.5, 5) }], paths: [{ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'mirror' as const, at: p(mirrorX, 1) }], onward_deg: 90 }] });
  const cases: Array<{ name: string; source: string; mirrorX: number; inside: boolean }> = [
    { name: 'the door 4 m past a mirror 1.5 m from the exit is inside the direct-beam zone', source: 'derived: 1.5 + 4 = 5.5 m along the path < 9.96 m', mirrorX: 2, inside: true },
    { name: 'the same door 4 m past a mirror 6.5 m from the exit is beyond the NOHD', source: 'derived: 6.5 + 4 = 10.5 m along the path > 9.96 m + 51 mm drawing margin', mirrorX: 7, inside: false },
  ];
  it('beam D has an NOHD of 9.96 m (derived above)', () => {
    expect(evaluateRoom(room(beamD, base)).beams[0]!.nohd_m_reported).toBe('9.96');
  });
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      const plan = evaluateRoom(room(beamD, turned(c.mirrorX))).plan!;
      const doorFindings = plan.findings.filter((f) => f.subjectId === 'D1').map((f) => f.text);
      expect(doorFindings).toEqual(c.inside ? ['The direct beam of beam D passes door D1 5.5 m along its path, still above the limit (hazard distance 9.96 m).', 'Door D1 is inside the direct-beam zone of beam D.'] : []);
      expect(plan.runs[0]!.endsAt).toBe('nohd');
    });
  }
});

describe('a drawn path that runs into a wall before its beam dump (derived geometry)', () => {
  const cases: Array<{ name: string; source: string; dumpX: number; text: string[] }> = [
    {
      name: 'a dump drawn 1 m beyond the east wall: the wall is taken to stop the beam, and the officer is asked to check the drawing',
      source: 'derived: exit x = 1 m, east wall x = 8 m, dump x = 9 m; the beam meets the wall 7 m along its path',
      dumpX: 9,
      text: ['The drawn beam path of Laser 1 meets the room wall 7 m along its path, before beam dump 1: the wall is taken to stop the beam there.'],
    },
    { name: 'a dump drawn on the east wall itself ends the path there: nothing to check', source: 'derived: the dump at x = 8 m lies on the wall', dumpX: 8, text: [] },
  ];
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      // Along y = 3 m, clear of door D1 (y 1–2 m) in the east wall.
      const plan = evaluateRoom(room(beamA, { paths: [{ laserId: 'L1', exit: p(1, 3), elements: [{ kind: 'dump', at: p(c.dumpX, 3) }] }] })).plan!;
      expect(plan.findings.filter((f) => f.kind === 'path-meets-wall').map((f) => f.text)).toEqual(c.text);
      expect(plan.runs[0]!.endDetail).toBe('The direct beam ends at the room wall 7 m along its path.');
    });
  }
});

describe('diffuse-reflection zones (domain notes 1.4: NHZ = √(ρ·P·cosθ/(π·E_L)))', () => {
  it('beam B: the zone radius is the diffuse NHZ the officer sees, rounded up, at least the accidental-viewing value 0.250 m derived above', () => {
    const r = evaluateRoom(room(beamB, { paths: [{ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'mirror', at: p(2, 1) }], onward_deg: 90 }] }));
    const nhz = Number(r.beams[0]!.nhzDiffuse_m);
    expect(nhz).toBeGreaterThanOrEqual(0.25);
    const radius = Number(r.plan!.zones.find((z) => z.kind === 'diffuse')!.radius_m);
    expect(radius).toBeGreaterThanOrEqual(nhz);
    expect(radius).toBeLessThan(nhz * 1.01); // 3 significant figures, rounded up
  });
  it('a zone is drawn around each mirror and where the beam meets the wall; a work position 0.224 m from the mirror is inside, 0.8 m is not (derived: √(0.2² + 0.1²) = 0.224 m; the NHZ is 0.25–0.4 m)', () => {
    const plan = evaluateRoom(
      room(beamB, {
        workPositions: [{ id: 'P1', label: 'P1', at: p(2.2, 0.9) }, { id: 'P2', label: 'P2', at: p(2.8, 1) }],
        paths: [{ laserId: 'L1', exit: p(0.5, 1), elements: [{ kind: 'mirror', at: p(2, 1) }], onward_deg: 90 }],
      }),
    ).plan!;
    const diffuse = plan.zones.filter((z) => z.kind === 'diffuse');
    expect(diffuse.map((z) => z.id)).toEqual(['b:diffuse:p1', 'b:diffuse:p2']);
    // derived: the polygon's corners sit at r/cos(7.5°) from the centre, its sides at r (+1 mm pad).
    const mirror = diffuse[0]!;
    const far = Math.max(...mirror.polygon.map((q) => Math.hypot(Number(q.x_m) - 2, Number(q.y_m) - 1)));
    expect(far).toBeCloseTo((Number(mirror.radius_m) + 0.001) / Math.cos(Math.PI / 24), 2); // corners rounded to the millimetre
    const f = plan.findings.filter((x) => x.kind === 'work-position-in-zone');
    expect(f.map((x) => x.text)).toEqual(['Work position P1 is inside the diffuse-reflection zone of beam B.']);
  });
  it('the officer-marked reflection point gets a zone of its own', () => {
    const plan = evaluateRoom(room(beamB, { reflectionPoints: [{ id: 'R1', label: 'mount', at: p(3, 3), laserId: 'L1' }], paths: [{ laserId: 'L1', exit: p(1, 1), elements: [{ kind: 'dump', at: p(2, 1) }] }] })).plan!;
    expect(plan.zones.filter((z) => z.kind === 'diffuse').map((z) => z.label)).toEqual(['Diffuse reflection of beam B at mount']);
  });
  it('a beam with no diffuse reflection assessed says so instead of drawing nothing silently', () => {
    const plan = evaluateRoom(room({ ...beamA, viewing: {} }, { paths: [{ laserId: 'L1', exit: p(1, 1), elements: [{ kind: 'dump', at: p(2, 1) }] }] })).plan!;
    expect(plan.findings.map((f) => f.kind)).toContain('no-diffuse-distance');
  });
});

describe('laser controlled area boundary (domain notes 4.3)', () => {
  const whole = { outline: emptyPlan.outline, acceptedBy: 'I. Calloway-Senn' };
  it('zones inside the accepted area give no boundary finding', () => {
    const plan = evaluateRoom(room(beamA, { controlledArea: whole, paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [{ kind: 'dump', at: p(7, 1.5) }] }] })).plan!;
    expect(kinds(plan.findings)).toEqual([]);
  });
  it('a zone through the door reaches outside it', () => {
    const plan = evaluateRoom(room(beamA, { controlledArea: whole, paths: [{ laserId: 'L1', exit: p(1, 1.5), elements: [], onward_deg: 0 }] })).plan!;
    expect(kinds(plan.findings)).toEqual(['door-in-zone:D1', 'leaves-room:D1', 'outside-controlled-area:a']);
  });
  it('the plan with its boundary is kept in the room result, and a room without a plan has none', () => {
    expect(evaluateRoom({ lasers: [{ id: 'L1', name: 'Laser 1', beams: [beamA] }] }).plan).toBeUndefined();
  });
});

describe('plan input errors name the field (core validation)', () => {
  const bad: Array<{ plan: Partial<RoomPlan>; field: string }> = [
    { plan: { paths: [{ laserId: 'L9', exit: p(1, 1), elements: [], onward_deg: 0 }] }, field: 'plan.paths[0].laserId' },
    { plan: { paths: [{ laserId: 'L1', exit: p(1, 1), elements: [{ kind: 'dump', at: p(2, 1) }, { kind: 'mirror', at: p(3, 1) }], onward_deg: 0 }] }, field: 'plan.paths[0].elements[0].kind' },
    { plan: { paths: [{ laserId: 'L1', exit: p(1, 1), elements: [] }] }, field: 'plan.paths[0].onward_deg' },
    { plan: { outline: [p(0, 0), p(1, 0)] }, field: 'plan.outline' },
    { plan: { doors: [{ id: 'D1', label: 'D1', a: p(1, 1), b: p(1, 1) }] }, field: 'plan.doors[0].b' },
    { plan: { enclosures: [{ id: 'E1', label: 'E1', min: p(3, 3), max: p(1, 1) }] }, field: 'plan.enclosures[0].max' },
    { plan: { workPositions: [{ id: 'D1', label: 'desk', at: p(1, 1) }] }, field: 'plan.workPositions[0].id' },
  ];
  for (const b of bad) {
    it(`rejects ${b.field} (ours: ranges and shapes of a drawn plan)`, () => {
      try {
        evaluateRoom(room(beamA, b.plan));
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).field).toBe(b.field);
      }
    });
  }
});

describe('walls and enclosures stop scattered light (common practice: walls are opaque)', () => {
  it('a diffuse zone at a mirror 0.1 m from the south wall is cut at the wall (plus the 1 mm pad)', () => {
    // derived: the circle of 0.251 m about (2, 0.1) reaches y = −0.151 uncut; the wall is y = 0.
    const plan = evaluateRoom(room(beamB, { paths: [{ laserId: 'L1', exit: p(0.5, 0.1), elements: [{ kind: 'mirror', at: p(2, 0.1) }], onward_deg: 90 }] })).plan!;
    const z = plan.zones.find((q) => q.id === 'b:diffuse:p1')!;
    expect(Math.min(...ys(z.polygon))).toBeCloseTo(-0.001, 3);
    expect(Math.max(...ys(z.polygon))).toBeGreaterThan(0.1 + 0.25);
  });
  it('a reflection point inside an enclosure gives an enclosed zone, and no finding for a desk just outside', () => {
    // derived: the box spans x 1.8–2.6 m, y 0.8–1.15 m; desk P1 at (2.2, 1.2) is 0.05 m outside it and 0.2 m from the mirror (< 0.25 m).
    const plan = evaluateRoom(
      room(beamB, {
        enclosures: [{ id: 'E1', label: 'E1', min: p(1.8, 0.8), max: p(2.6, 1.15) }],
        workPositions: [{ id: 'P1', label: 'P1', at: p(2.2, 1.2) }],
        paths: [{ laserId: 'L1', exit: p(1.9, 1), elements: [{ kind: 'mirror', at: p(2.2, 1) }, { kind: 'dump', at: p(2.2, 0.9) }] }],
      }),
    ).plan!;
    expect(plan.zones.filter((q) => q.kind === 'diffuse').every((q) => q.enclosed)).toBe(true);
    expect(plan.findings.filter((f) => f.kind === 'work-position-in-zone')).toEqual([]);
  });
});
