// A beam dump or target narrower than the beam where the beam meets it: part of the beam passes it,
// still above the limit, so the path and the hazard zone go on past it. Checked through evaluateRoom,
// on the findings, runs and zones the officer sees; every width derived by hand beside its case.
//
// Beam A (5 mW CW at 633 nm, 1 mm, 1 mrad, 1/e): E_L = 18·t^0.75 J/m² over t = 0.25 s = 25.46 W/m²
// (ICNIRP 2013 Table 5, visible, 0.25 s); NOHD = (√(4P/(π·E_L)) − a)/φ = (15.81 mm − 1 mm)/1 mrad
// = 14.81 m, reported 14.9 m (rounded up) (domain.md 1.2.1, range equation).
// Beam B: the same laser given at the 1/e² points, 2 mm and 2 mrad: 1/e 1.414 mm, 1.414 mrad
// (d(1/e) = d(1/e²)/√2, domain.md 1.1); NOHD = (15.81 − 1.414)/1.414 = 10.18 m, reported 10.2 m.
//
// The beam at z metres from the exit grows as in the evaluation, d(z) = a + z·φ (domain.md 1.2.1,
// the standards' linear model; the quadrature form √(a² + (z·φ)²) is narrower at every z, so it is
// not the safe side). Its width at a dump is the larger of
//   its 1/e² diameter, √2·d_1/e(z) (domain.md 1.1), and
//   the width across which it exceeds the limit, 2r = D·√(2·ln(D_L/D)), D = d_1/e(z), D_L = a + φ·H,
//   H the drawn hazard distance (derived from the Gaussian profile E(r) = E0·exp(−4r²/D²), as for the zone).
//   A at 3 m: D = 4 mm, D_L = 15.9 mm: 2r = 4·√(2·ln 3.975) = 6.645 mm; 1/e² diameter 5.657 mm → 6.65 mm.
//   B at 4 m: D = 1.414·5 = 7.071 mm, D_L = 1.414·11.2 = 15.84 mm: 2r = 7.071·√(2·ln 2.240) = 8.980 mm;
//             1/e² diameter 2 mm + 4 m·2 mrad = 10 mm exactly → 10 mm.
// Rule (ours, the safe side): a beam exactly as wide as the aperture counts as passing it.
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type PathElement, type PlanFinding, type RoomInput, type RoomPlan } from '../../../core/index.js';
import { beamA, eastDoorRoom, p } from './east-door-room.js';

const beamB: BeamInput = { ...beamA, id: 'b', label: 'beam B', beam: { diameter_m: 0.002, divergence_rad: 0.002, definition: '1/e2' } };

/** An 8 m × 5 m room, door D1 in the east wall at y 1–2 m; the beam runs east along y = 1.5 m from (1, 1.5). */
const base = eastDoorRoom;
const room = (beam: BeamInput, end: PathElement, plan: Partial<RoomPlan> = {}): RoomInput => ({
  lasers: [{ id: 'L2', name: 'Laser 2', beams: [beam] }],
  plan: { ...base, ...plan, paths: [{ laserId: 'L2', exit: p(1, 1.5), elements: [end] }] },
});
const dump = (x: number, aperture_m?: number): PathElement => ({ kind: 'dump', at: p(x, 1.5), label: 'B1', ...(aperture_m === undefined ? {} : { aperture_m }) });
const kinds = (fs: readonly PlanFinding[]) => fs.map((f) => `${f.kind}:${f.subjectId}`).sort();

describe('a beam dump or target narrower than the beam lets part of it pass (derived widths)', () => {
  const cases: Array<{ name: string; source: string; input: RoomInput; endsAt: string; maxX: number; findings: string[]; text?: string; diffuseAt?: string }> = [
    {
      name: 'a dump with no aperture stated takes the whole beam, as before',
      source: 'ours: without an aperture the dump is taken as drawn; the zone ends 50 mm + 1 mm past it, x = 4.051 m',
      input: room(beamA, dump(4)),
      endsAt: 'dump',
      maxX: 4.051,
      findings: ['no-controlled-area:plan'],
    },
    {
      name: 'a 7 mm dump 3 m from the exit takes beam A (6.65 mm wide there)',
      source: 'derived: 6.645 mm < 7 mm',
      input: room(beamA, dump(4, 0.007)),
      endsAt: 'dump',
      maxX: 4.051,
      findings: ['no-controlled-area:plan'],
    },
    {
      name: 'a 6.6 mm dump 3 m from the exit: beam A (6.65 mm there) spills past it, through door D1 and on to its hazard distance',
      source: 'derived: 6.645 mm > 6.6 mm; past the dump the beam runs on along y = 1.5 m through door D1 (7 m along the path, inside the 14.9 m NOHD) to 1 m + 14.9 m + 51 mm',
      input: room(beamA, dump(4, 0.0066)),
      endsAt: 'nohd',
      maxX: 1 + 14.9 + 0.051,
      findings: ['door-in-zone:D1', 'leaves-room:D1', 'no-controlled-area:plan', 'wider-than-dump:L2'],
      text: 'The beam of beam A is wider than beam dump B1 where it meets it, 3 m along its path (6.65 mm against 6.6 mm, the width across which the beam is above the limit): part of the beam passes it, still above the limit, so its hazard zone goes on past it.',
    },
    {
      name: 'a 10 mm dump 4 m from the exit and beam B exactly 10 mm wide there: a beam as wide as the dump counts as passing',
      source: 'derived: 1/e² diameter 2 mm + 4 m × 2 mrad = 10 mm (over-limit width 8.98 mm); rule: equal widths pass (ours, the safe side); the zone runs on to 1 m + 10.2 m + 51 mm',
      input: room(beamB, dump(5, 0.01)),
      endsAt: 'nohd',
      maxX: 1 + 10.2 + 0.051,
      findings: ['door-in-zone:D1', 'leaves-room:D1', 'no-controlled-area:plan', 'wider-than-dump:L2'],
      text: 'The beam of beam B is as wide as beam dump B1 where it meets it, 4 m along its path (10 mm against 10 mm, the beam diameter at the 1/e² points): part of the beam passes it, still above the limit, so its hazard zone goes on past it.',
    },
    {
      name: 'a 10.001 mm dump at the same place takes beam B',
      source: 'derived: 10 mm < 10.001 mm; the zone ends 51 mm past the dump, x = 5.051 m',
      input: room(beamB, dump(5, 0.010001)),
      endsAt: 'dump',
      maxX: 5.051,
      findings: ['no-controlled-area:plan'],
    },
    {
      name: 'a small target 3 m from the exit: beam A spills past it as well, and the target still scatters',
      source: 'derived: 6.645 mm > 5 mm; the target keeps its diffuse-reflection zone',
      input: room(beamA, { kind: 'target', at: p(4, 1.5), label: 'T1', aperture_m: 0.005 }),
      endsAt: 'nohd',
      maxX: 1 + 14.9 + 0.051,
      findings: ['door-in-zone:D1', 'leaves-room:D1', 'no-controlled-area:plan', 'wider-than-dump:L2'],
      diffuseAt: 'Diffuse reflection of beam A at T1',
      text: 'The beam of beam A is wider than target T1 where it meets it, 3 m along its path (6.65 mm against 5 mm, the width across which the beam is above the limit): part of the beam passes it, still above the limit, so its hazard zone goes on past it.',
    },
    {
      name: 'a small dump beyond the hazard distance: the beam is below the limit there, nothing passes that matters',
      source: 'derived: beam B is above the limit for 10.2 m; the dump 1 mm wide is 11 m from the exit in a 14 m long room; the zone ends at 1 m + 10.2 m + 51 mm',
      input: room(beamB, { kind: 'dump', at: p(12, 1.5), label: 'B1', aperture_m: 0.001 }, { outline: [p(0, 0), p(14, 0), p(14, 5), p(0, 5)], doors: [] }),
      endsAt: 'nohd',
      maxX: 1 + 10.2 + 0.051,
      findings: ['no-controlled-area:plan'],
    },
  ];
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      const plan = evaluateRoom(c.input).plan!;
      const direct = plan.zones.filter((z) => z.kind === 'direct');
      expect(kinds(plan.findings)).toEqual(c.findings);
      expect(plan.runs[0]!.endsAt).toBe(c.endsAt);
      expect(Math.max(...direct.flatMap((z) => z.polygon.map((q) => Number(q.x_m))))).toBeCloseTo(c.maxX, 6);
      if (c.diffuseAt) expect(plan.zones.filter((z) => z.kind === 'diffuse').map((z) => z.label)).toContain(c.diffuseAt);
      if (c.text) expect(plan.findings.filter((f) => f.kind === 'wider-than-dump').map((f) => f.text)).toEqual([c.text]);
    });
  }
});

describe('the aperture is checked where it enters (field named)', () => {
  const cases: Array<{ name: string; source: string; end: unknown; field: RegExp }> = [
    { name: 'zero width', source: 'core/model/input-rules.ts planAperture_m: more than 0 m', end: { kind: 'dump', at: p(4, 1.5), aperture_m: 0 }, field: /plan\.paths\[0\]\.elements\[0\]\.aperture_m/ },
    { name: 'wider than 2 m', source: 'core/model/input-rules.ts planAperture_m: at most 2 m', end: { kind: 'dump', at: p(4, 1.5), aperture_m: 2.5 }, field: /plan\.paths\[0\]\.elements\[0\]\.aperture_m/ },
    { name: 'on a mirror', source: 'ours: a mirror turns the beam; only a dump or target has an aperture', end: { kind: 'mirror', at: p(4, 1.5), aperture_m: 0.01 }, field: /plan\.paths\[0\]\.elements\[0\]\.aperture_m/ },
    { name: 'not a number', source: 'core/model/input-rules.ts planAperture_m', end: { kind: 'target', at: p(4, 1.5), aperture_m: '5 mm' }, field: /plan\.paths\[0\]\.elements\[0\]\.aperture_m/ },
  ];
  for (const c of cases) {
    it(`${c.name} (${c.source})`, () => {
      const input = room(beamA, c.end as PathElement);
      const plan = input.plan!;
      const paths = c.end && (c.end as PathElement).kind === 'mirror' ? [{ ...plan.paths[0]!, onward_deg: 0 }] : plan.paths;
      expect(() => evaluateRoom({ ...input, plan: { ...plan, paths } })).toThrow(c.field);
    });
  }
});
