/**
 * evaluatePlan: the room plan against the room's evaluation. Zones (core/plan/plan-zones.ts),
 * the beam runs, and findings in officer words with the control each suggests. Results support,
 * and do not replace, the judgement of the site laser safety officer and the local regulations.
 */
import { Dec } from '../numeric/decimal.js';
import type { RoomInput } from '../model/inputs.js';
import type { BeamResult } from '../model/results.js';
import { asRectangle, boxesApart, boxOf, insideBox, insideOutline, segmentTouchesPolygon, withinOfPolygon, type P } from './geometry.js';
import type { PlanBeamRun, PlanFinding, PlanResult, RoomPlan } from './plan-model.js';
import { tracePath, toP, type Leg } from './trace-path.js';
import { BAND_EDGE_ROUNDING_M, CIRCLE_CORNERS, PATH_MARGIN_M, bandOf, beamWidthsAt, passesAperture, diffuseRadius, directLength, directZones, diffuseZones, insideEnclosure, roundPoint, type BeamOnPlan, type ZoneWithShape } from './plan-zones.js';

/** Eye level of standing and seated people, about 1.2 m to 1.8 m above the floor (domain.md 4.3, [STAN-OLD]). */
export const EYE_LEVEL_M: readonly [number, number] = [1.2, 1.8];

/** A distance for a sentence: metres, or kilometres from 1 km, 3 significant figures (already rounded up). */
function metres(d: Dec): string {
  return d.gte(1000) ? `${d.div(1000).toSignificantDigits(3, Dec.ROUND_UP).toString()} km` : `${d.toSignificantDigits(3, Dec.ROUND_UP).toString()} m`;
}

function zoneWords(z: ZoneWithShape): string {
  return z.kind === 'direct' ? `the direct-beam zone of ${beamName(z)}` : `the diffuse-reflection zone of ${beamName(z)}`;
}

const names = new WeakMap<ZoneWithShape, string>();
function beamName(z: ZoneWithShape): string {
  return names.get(z) ?? z.beamId;
}

export const PLAN_METHOD: readonly string[] = [
  `Direct-beam zones follow the drawn beam path up to the NOHD (rounded up, or the upper bound from the input tolerances where larger), stopped by beam dumps, targets, walls and barriers; doors and windows are taken as open.`,
  `Their width is where the exposure of a Gaussian beam exceeds the limit (derived from the beam diameter, divergence and NOHD), plus ${PATH_MARGIN_M.mul(1000).toString()} mm on each side for the accuracy of the drawing and ${BAND_EDGE_ROUNDING_M.mul(1000).toString()} mm for rounding (a surface end within it counts as inside the band). Every line of that band runs parallel to the drawn beam until the first wall, curtain or barrier it meets, and the zone ends 1 mm beyond that surface.`,
  'A wall, curtain or barrier stops the beam only where it spans the whole band: where the beam meets one within the band of its end, a corner of the room or the edge of a door or window, part of the beam may pass, and the path and zone go on past it (the finding says so).',
  'A beam dump or target with its aperture stated takes the whole beam only where the beam there is narrower than the aperture: the beam is taken as wide as the larger of its 1/e² diameter (growing linearly with the divergence from the exit, as in the hazard distance) and the width across which it exceeds the limit; where it is as wide or wider, part of it passes, and the path and zone go on past the dump (the finding says so).',
  `Diffuse-reflection zones are drawn around a circle of the diffuse NHZ (rounded up) about every mirror and target the beam reaches, every point where it ends on a wall or barrier, and every reflection point marked on the plan (a ${CIRCLE_CORNERS}-sided polygon outside the circle).`,
  'Walls, curtains and barriers are taken as opaque to scattered light: a diffuse-reflection zone covers only what its reflection point can see in a straight line, cut at the room outline (of any shape), interior walls, curtains, barriers and the enclosure the point lies in, 1 mm beyond the surface along the line of sight; a spot on a wall or barrier is seen from the side the beam comes from; a door or window the zone reaches is reported.',
  'Every zone is widened by 1 mm before its corners are rounded to the millimetre, so no zone is drawn smaller than computed. Heights are not modelled except for the eye-level check of a stated beam height.',
];

export function evaluatePlan(plan: RoomPlan, input: RoomInput, beams: readonly BeamResult[]): PlanResult {
  // Beams in evaluation order, with their inputs (evaluateRoom keeps the lasers × beams order).
  const onPlan: BeamOnPlan[] = [];
  let k = 0;
  for (const laser of input.lasers) {
    for (const b of laser.beams) {
      const result = beams[k++];
      if (result) onPlan.push({ laserId: laser.id, laserName: laser.name, input: b, result });
    }
  }
  const findings: PlanFinding[] = [];
  const zones: ZoneWithShape[] = [];
  const runs: PlanBeamRun[] = [];

  for (const laser of input.lasers) {
    const path = plan.paths.find((p) => p.laserId === laser.id);
    if (!path) {
      findings.push({ kind: 'path-not-placed', severity: 'check', subjectId: laser.id, zoneIds: [], text: `${laser.name} is not placed on the plan, so its hazard zones are not drawn.`, suggestion: `Place ${laser.name} and its beam path on the plan.` });
      continue;
    }
    const mine = onPlan.filter((b) => b.laserId === laser.id);
    const far = mine.reduce((m, b) => Dec.max(m, directLength(b.result)), new Dec(1)).add(1);
    const traced = tracePath(plan, path, far, bandOf(mine), (z, aperture) => mine.some((b) => passesAperture(b, z, aperture)));
    const short = pathMeetsWall(plan, path, traced, laser.name);
    if (short) findings.push(short);
    for (const b of mine) {
      // The laser's path goes on past a dump or target that one of its beams is wider than; a beam that it takes whole ends there.
      const legs = legsOfBeam(traced, b);
      const { zones: dz, run } = directZones(plan, b, legs);
      const fz = diffuseZones(plan, b, legs);
      for (const z of [...dz, ...fz]) names.set(z, b.result.label);
      zones.push(...dz, ...fz);
      const last = legs[legs.length - 1];
      if (last && run.points.length > 1) runs.push(runOf(plan, b, last, run.points, run.length));
      beamFindings(plan, b, legs, dz, findings, path.height_m, path);
      if (diffuseRadius(b.result) === null) {
        findings.push({ kind: 'no-diffuse-distance', severity: 'check', subjectId: b.result.beamId, zoneIds: [], text: `No diffuse reflection was assessed for ${b.result.label}, so no diffuse-reflection zone is drawn for it.`, suggestion: `Add a diffuse reflection to the viewing conditions of ${b.result.label} (reflectance of the surfaces the beam can meet).` });
      }
    }
  }

  placeFindings(plan, zones, findings);
  controlledAreaFindings(plan, zones, findings);

  const suggestions: string[] = [];
  for (const f of findings) if (f.suggestion && !suggestions.includes(f.suggestion)) suggestions.push(f.suggestion);
  return {
    zones: zones.map(({ shape: _shape, box: _box, ...z }) => z),
    runs,
    findings,
    suggestions,
    method: PLAN_METHOD,
  };
}

/** A wall this far or more before the point the leg was drawn to is a drawing to check (ours: 1 cm, the drawing's resolution). */
const DRAWN_TO_TOLERANCE_M = new Dec('0.01');

/** A wall or barrier in officer words. */
function surfaceWords(plan: RoomPlan, kind: 'wall' | 'barrier', id: string): string {
  if (kind === 'wall') {
    const w = plan.walls.find((x) => x.id === id);
    return w ? `interior wall ${w.label}` : 'the room wall';
  }
  const b = plan.barriers.find((x) => x.id === id);
  return b ? `${b.kind} ${b.label}` : 'a barrier';
}

/** A band half-width for a sentence: millimetres, 3 significant figures, rounded up. */
function millimetres(d: Dec): string {
  return `${d.mul(1000).toSignificantDigits(3, Dec.ROUND_UP).toString()} mm`;
}

/** The wall or barrier that stops a leg, in officer words. */
function stopWords(plan: RoomPlan, leg: Leg): string {
  if (leg.endsWith === 'wall' || leg.endsWith === 'barrier') return surfaceWords(plan, leg.endsWith, leg.endId);
  return leg.endsWith === 'dump' ? 'the beam dump' : leg.endsWith === 'target' ? 'the target' : leg.endId;
}

/**
 * The drawn path runs into a wall before a mirror, dump or target drawn beyond it: the trace takes
 * the wall to stop the beam (the zones end there), and the officer checks which the drawing meant.
 */
function pathMeetsWall(plan: RoomPlan, path: RoomPlan['paths'][number], legs: readonly Leg[], laserName: string): PlanFinding | null {
  const k = legs.length - 1;
  const last = legs[k];
  const el = path.elements[k];
  if (!last || !el || last.endsWith !== 'wall') return null;
  const [dx, dy] = [new Dec(el.at.x_m).sub(last.to.x), new Dec(el.at.y_m).sub(last.to.y)];
  if (dx.mul(dx).add(dy.mul(dy)).sqrt().lt(DRAWN_TO_TOLERANCE_M)) return null;
  const what = `${el.kind === 'dump' ? 'beam dump' : el.kind} ${el.label ?? k + 1}`;
  return {
    kind: 'path-meets-wall',
    severity: 'check',
    subjectId: path.laserId,
    zoneIds: [],
    text: `The drawn beam path of ${laserName} meets ${stopWords(plan, last)} ${metres(last.end)} along its path, before ${what}: the wall is taken to stop the beam there.`,
    suggestion: `Check the beam path of ${laserName} on the plan: move ${what} inside the room, or draw the opening the beam passes through.`,
  };
}

/** The legs a beam follows: up to the first beam dump or target it is narrower than. */
function legsOfBeam(legs: readonly Leg[], b: BeamOnPlan): readonly Leg[] {
  const k = legs.findIndex((l) => l.passedAperture !== null && !passesAperture(b, l.end, l.passedAperture));
  return k < 0 ? legs : legs.slice(0, k + 1);
}

/** An aperture for a sentence: millimetres, 3 significant figures, rounded down (the dump is never said to be wider than typed). */
function apertureWords(d: Dec): string {
  return `${d.mul(1000).toSignificantDigits(3, Dec.ROUND_DOWN).toString()} mm`;
}

function runOf(plan: RoomPlan, b: BeamOnPlan, last: Leg, points: P[], length: Dec): PlanBeamRun {
  const physicalEnd = last.end;
  const endsAt: PlanBeamRun['endsAt'] = length.lt(physicalEnd) || last.endsWith === 'open' || last.endsWith === 'mirror' ? 'nohd' : (last.endsWith as 'dump' | 'target' | 'wall' | 'barrier');
  const endDetail =
    endsAt === 'nohd'
      ? `The direct beam is above the limit for ${metres(length)} along its path.`
      : `The direct beam ends at ${stopWords(plan, last)} ${metres(last.end)} along its path.`;
  return { beamId: b.result.beamId, laserId: b.laserId, points: points.map(roundPoint), endsAt, endDetail };
}

function beamFindings(plan: RoomPlan, b: BeamOnPlan, legs: readonly Leg[], dz: readonly ZoneWithShape[], out: PlanFinding[], height_m: number | undefined, path?: RoomPlan['paths'][number]): void {
  const H = directLength(b.result);
  const label = b.result.label;
  const ids = dz.map((z) => z.id);
  if (dz.length === 0) return;
  for (const leg of legs) {
    if (leg.start.gte(H)) break;
    // Leaving through a door or window while still above the limit.
    for (const o of leg.openings) {
      if (o.at.gt(H)) continue;
      const item = o.kind === 'door' ? plan.doors.find((d) => d.id === o.id) : plan.windows.find((w) => w.id === o.id);
      const name = `${o.kind === 'door' ? 'door' : 'window'} ${item?.label ?? o.id}`;
      out.push({
        kind: 'leaves-room',
        severity: 'hazard',
        subjectId: o.id,
        zoneIds: ids,
        text: `The direct beam of ${label} passes ${name} ${metres(o.at)} along its path, still above the limit (hazard distance ${metres(H)}${H.gt(b.result.nohd_m_reported) ? ', the upper bound from the input tolerances' : ''}).`,
        suggestion: `End the beam of ${label} in a beam dump before it reaches ${name}.`,
      });
    }
    // Met near an end, a corner or a door's edge: part of the beam may pass, and the path goes on.
    for (const g of leg.grazed) {
      if (g.at.gt(H)) continue;
      const band = millimetres(g.band);
      if (g.through) {
        const item = g.through.kind === 'door' ? plan.doors.find((d) => d.id === g.through?.id) : plan.windows.find((w) => w.id === g.through?.id);
        const name = `${g.through.kind} ${item?.label ?? g.through.id}`;
        out.push({
          kind: 'leaves-room',
          severity: 'hazard',
          subjectId: g.through.id,
          zoneIds: ids,
          text: `The direct beam of ${label} meets ${surfaceWords(plan, g.kind, g.id)} ${metres(g.at)} along its path within ${band} of ${name}, still above the limit (hazard distance ${metres(H)}${H.gt(b.result.nohd_m_reported) ? ', the upper bound from the input tolerances' : ''}): part of the beam may pass through ${name}.`,
          suggestion: `End the beam of ${label} in a beam dump before it reaches ${name}.`,
        });
        continue;
      }
      const where = g.corner ? 'a corner' : 'its end';
      const what = surfaceWords(plan, g.kind, g.id);
      out.push({
        kind: 'passes-surface-end',
        severity: 'hazard',
        subjectId: g.id,
        zoneIds: ids,
        text: `The direct beam of ${label} meets ${what} ${metres(g.at)} along its path within ${band} of ${where}: part of the beam may pass ${g.corner ? 'the corner' : 'the end'}, so it is taken to go on past it.`,
        suggestion: g.kind === 'barrier' ? `Extend ${what} well past the beam of ${label}, or end the beam in a beam dump before it.` : `End the beam of ${label} in a beam dump before it reaches ${what}, clear of ${where}.`,
      });
    }
    // A beam dump or target narrower than the beam where it meets it: the part that spills past is still above the limit.
    if (leg.passedAperture !== null && passesAperture(b, leg.end, leg.passedAperture)) {
      const k = path ? path.elements.findIndex((e, i) => e.kind !== 'mirror' && (e.label ?? `${e.kind} ${i + 1}`) === leg.endId) : -1;
      const el = path?.elements[k];
      const what = `${el?.kind === 'target' ? 'target' : 'beam dump'} ${el?.label ?? k + 1}`;
      const { width: w, governs } = beamWidthsAt(b, leg.end);
      const which = governs === 'over-limit' ? 'the width across which the beam is above the limit' : (b.input.beam.profile ?? 'gaussian') === 'tophat' ? 'the beam diameter' : 'the beam diameter at the 1/e² points';
      out.push({
        kind: 'wider-than-dump',
        severity: 'hazard',
        subjectId: b.laserId,
        zoneIds: ids,
        text: `The beam of ${label} is ${w.gt(leg.passedAperture) ? 'wider than' : 'as wide as'} ${what} where it meets it, ${metres(leg.end)} along its path (${millimetres(w)} against ${apertureWords(leg.passedAperture)}, ${which}): part of the beam passes it, still above the limit, so its hazard zone goes on past it.`,
        suggestion: `Replace ${what} by one with an aperture well over ${millimetres(w)}, or place it where the beam of ${label} is narrower.`,
      });
    }
    // Stopped by a barrier or curtain within the NOHD: the rating must hold.
    if (leg.endsWith === 'barrier' && leg.end.lte(H)) {
      const bar = plan.barriers.find((x) => x.id === leg.endId);
      const what = `${bar?.kind === 'curtain' ? 'curtain' : 'barrier'} ${bar?.label ?? leg.endId}`;
      out.push({
        kind: 'stopped-by-barrier',
        severity: 'check',
        subjectId: leg.endId,
        zoneIds: ids,
        text: `The direct beam of ${label} (${b.result.emissionSummary}) is stopped by ${what}${bar?.rating ? ` (rating: ${bar.rating})` : ' (no rating recorded)'}.`,
        suggestion: `Check that the rating of ${what} covers the beam of ${label} for the exposure time, or end the beam in a beam dump before it.`,
      });
    }
  }
  // Leaving an enclosure while above the limit: walk the run pieces by enclosure.
  for (const leg of legs) {
    if (leg.start.gte(H)) break;
    const fromIn = insideEnclosure(plan, leg.from);
    const endAlong = Dec.min(leg.end, H);
    const len = leg.end.sub(leg.start);
    const frac = len.isZero() ? new Dec(0) : endAlong.sub(leg.start).div(len);
    const endPt: P = { x: leg.from.x.add(leg.to.x.sub(leg.from.x).mul(frac)), y: leg.from.y.add(leg.to.y.sub(leg.from.y).mul(frac)) };
    const toIn = insideEnclosure(plan, endPt);
    if (fromIn !== null && toIn !== fromIn) {
      const enc = plan.enclosures.find((e) => e.id === fromIn);
      out.push({
        kind: 'leaves-enclosure',
        severity: 'hazard',
        subjectId: fromIn,
        zoneIds: ids,
        text: `The direct beam of ${label} leaves enclosure ${enc?.label ?? fromIn} while still above the limit.`,
        suggestion: `Close the opening of enclosure ${enc?.label ?? fromIn} or end the beam of ${label} inside it with a beam dump.`,
      });
    }
  }
  if (height_m !== undefined && height_m >= EYE_LEVEL_M[0] && height_m <= EYE_LEVEL_M[1] && dz.some((z) => !z.enclosed) && !out.some((f) => f.kind === 'beam-at-eye-level' && f.subjectId === b.laserId)) {
    out.push({
      kind: 'beam-at-eye-level',
      severity: 'check',
      subjectId: b.laserId,
      zoneIds: ids,
      text: `The open beam path of ${b.laserName} runs ${height_m} m above the floor, within eye level of standing and seated people (about ${EYE_LEVEL_M[0]} m to ${EYE_LEVEL_M[1]} m).`,
      suggestion: `Raise or lower the beam path of ${b.laserName} out of eye level, or enclose it.`,
    });
  }
}

function placeFindings(plan: RoomPlan, zones: readonly ZoneWithShape[], out: PlanFinding[]): void {
  const open = zones.filter((z) => !z.enclosed).map((z) => ({ z, box: z.box }));
  const seg = (kind: 'door' | 'window', id: string, label: string, a: P, b: P, interlocked?: boolean) => {
    const box = boxOf([a, b]);
    const inZones = open.filter((o) => !boxesApart(box, o.box, 0) && segmentTouchesPolygon(a, b, o.z.shape)).map((o) => o.z);
    for (const z of firstPerBeamKind(inZones)) {
      const Name = `${kind === 'door' ? 'Door' : 'Window'} ${label}`;
      out.push({
        kind: kind === 'door' ? 'door-in-zone' : 'window-in-zone',
        severity: 'hazard',
        subjectId: id,
        zoneIds: inZones.filter((x) => x.beamId === z.beamId && x.kind === z.kind).map((x) => x.id),
        text: `${Name} is inside ${zoneWords(z)}${kind === 'door' && interlocked ? ' (the door is interlocked)' : ''}.`,
        suggestion:
          kind === 'door'
            ? interlocked
              ? `Check that the interlock of door ${label} stops or blocks the beam before anyone in the doorway can be exposed.`
              : `Interlock door ${label} so the beam stops or is blocked when it opens, or put a rated curtain or barrier inside it.`
            : `Cover window ${label} with a rated blind or barrier, or stop the beam before it can reach the window.`,
      });
    }
  };
  for (const d of plan.doors) seg('door', d.id, d.label, toP(d.a), toP(d.b), d.interlocked);
  for (const w of plan.windows) seg('window', w.id, w.label, toP(w.a), toP(w.b));
  for (const w of plan.workPositions) {
    const at = toP(w.at);
    const reach = new Dec(w.reach_m ?? 0);
    const box = boxOf([at]);
    const inZones = open.filter((o) => !boxesApart(box, o.box, reach.toNumber()) && withinOfPolygon(at, o.z.shape, reach)).map((o) => o.z);
    for (const z of firstPerBeamKind(inZones)) {
      out.push({
        kind: 'work-position-in-zone',
        severity: 'hazard',
        subjectId: w.id,
        zoneIds: inZones.filter((x) => x.beamId === z.beamId && x.kind === z.kind).map((x) => x.id),
        text: `Work position ${w.label} is inside ${zoneWords(z)}.`,
        suggestion:
          z.kind === 'direct'
            ? `Move work position ${w.label} out of the beam path, or raise the beam height above eye level (about ${EYE_LEVEL_M[1]} m) or enclose the beam there.`
            : `Move work position ${w.label} away from the reflection point, or screen the reflection with a rated barrier; otherwise the eyewear chosen must be worn there.`,
      });
    }
  }
}

/** One finding per beam and zone kind (a long beam has several pieces). */
function firstPerBeamKind(zs: readonly ZoneWithShape[]): ZoneWithShape[] {
  const seen = new Set<string>();
  const out: ZoneWithShape[] = [];
  for (const z of zs) {
    const key = `${z.beamId}|${z.kind}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(z);
  }
  return out;
}

function controlledAreaFindings(plan: RoomPlan, zones: readonly ZoneWithShape[], out: PlanFinding[]): void {
  const ca = plan.controlledArea;
  if (!ca) {
    out.push({
      kind: 'no-controlled-area',
      severity: 'check',
      subjectId: 'plan',
      zoneIds: [],
      text: 'No laser controlled area boundary has been accepted on the plan.',
      suggestion: 'Draw the laser controlled area boundary around every hazard zone (often the whole room) and record who accepted it.',
    });
    return;
  }
  const outline = ca.outline.map(toP);
  // A zone cut at a wall may overlap the wall line by its 1 mm pad: 5 mm is taken as on the boundary (ours).
  const tol = new Dec('0.005');
  const rect = asRectangle(outline);
  const inside = (x: ZoneWithShape) => (rect ? insideBox(x.shape, rect.min, rect.max, tol, x.box) : insideOutline(x.shape, outline, tol));
  const out_ = (x: ZoneWithShape) => !x.enclosed && !inside(x);
  const outside = firstPerBeamKind(zones.filter(out_));
  for (const z of outside) {
    out.push({
      kind: 'outside-controlled-area',
      severity: 'hazard',
      subjectId: z.beamId,
      zoneIds: zones.filter((x) => x.beamId === z.beamId && x.kind === z.kind && out_(x)).map((x) => x.id),
      text: `${capital(zoneWords(z))} reaches outside the accepted laser controlled area.`,
      suggestion: z.kind === 'direct' ? `Stop the beam of ${beamName(z)} inside the laser controlled area (beam dump or rated barrier), or enlarge the area.` : `Enlarge the laser controlled area to take in the diffuse-reflection zones of ${beamName(z)}, or screen them.`,
    });
  }
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
