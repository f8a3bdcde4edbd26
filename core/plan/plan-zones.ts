/**
 * Hazard zones on the plan, from the same evaluation as the numbers (never re-derived in the UI):
 * - direct beam: along the traced path up to the NOHD (rounded up; the upper bound from the input
 *   tolerances where larger), as wide as the region where the exposure exceeds the limit, plus a
 *   placement margin, cut at the walls, curtains and barriers beside it or at its end
 *   (core/plan/beam-strip.ts);
 * - diffuse reflection: a polygon around the circle of the diffuse NHZ (rounded up) about every
 *   mirror and target the beam reaches, every point where it ends on a wall or barrier, and every
 *   reflection point the officer marked.
 * Every zone is widened by 1 mm and its corners rounded to the millimetre, so no zone is drawn
 * smaller than computed (derived: rounding a corner to 1 mm moves it by at most 0.71 mm).
 */
import { Dec } from '../numeric/decimal.js';
import { distanceReported } from '../beam/format.js';
import { SQRT2 } from '../beam/beam-model.js';
import type { BeamInput } from '../model/inputs.js';
import type { BeamResult } from '../model/results.js';
import { DecGeo, add, box, boxOf, boxesApart, circleOutside, distanceSqToSegment, edges, insideBox, pointInPolygon, rayHitsSegment, scale, sub, unit, type Box, type P } from './geometry.js';
import { screensOf, visibleRegion, type ScreenSeg } from './visibility.js';
import { cutStrip, passedScreens, type StripPiece } from './beam-strip.js';
import type { PlanPointResult, PlanZone, RoomPlan } from './plan-model.js';
import { toP, type BandWidth, type Leg } from './trace-path.js';

/** Placement margin on each side of a drawn beam path, m (ours: a drawn plan is good to a few centimetres). */
export const PATH_MARGIN_M = new Dec('0.05');
/** Widening before rounding corners to the millimetre (derived: covers the 0.71 mm a corner can move). */
const ROUNDING_PAD_M = new Dec('0.001');
/**
 * The band is taken this much wider, for tracing and for drawing (ours): the over-limit width is
 * computed, the surfaces are placed and the zones drawn to the millimetre, so whether a surface end
 * lies just inside or just outside the band is decided by roundings within half a millimetre. An end
 * within 0.5 mm outside the computed band counts as inside it (part of the beam passes), the safe side.
 */
export const BAND_EDGE_ROUNDING_M = new Dec('0.0005');
/** Corners of the polygon drawn around a circle. */
export const CIRCLE_CORNERS = 24;

const SQRT_E = new Dec(1).exp().sqrt();

export function roundPoint(p: P): PlanPointResult {
  return { x_m: p.x.toDecimalPlaces(3).toString(), y_m: p.y.toDecimalPlaces(3).toString() };
}

/** The direct-beam distance to draw: the NOHD rounded up, or the tolerance upper bound where larger. */
export function directLength(b: BeamResult): Dec {
  const nominal = new Dec(b.nohd_m_reported);
  const upper = new Dec(distanceReported(new Dec(b.bounds.nohd_m.conservative)));
  return Dec.max(nominal, upper);
}

/** Diffuse NHZ radius rounded up, or null when no diffuse reflection was assessed. */
export function diffuseRadius(b: BeamResult): Dec | null {
  return b.nhzDiffuse_m === null ? null : new Dec(distanceReported(new Dec(b.nhzDiffuse_m)));
}

/**
 * Beam diameter at the 1/e irradiance points, at the exit and its growth per metre (larger axis for
 * elliptical beams). A 1/e² diameter is 1/e diameter × √2 for a Gaussian beam (derived); 'd63' is
 * taken as the 1/e diameter (IEC 60825-1 d63 equals it for a Gaussian beam).
 */
function oneOverE(beam: BeamInput): { d0: Dec; phi: Dec } {
  const d = Dec.max(beam.beam.diameter_m, beam.beam.diameterY_m ?? 0);
  const f = Dec.max(beam.beam.divergence_rad, beam.beam.divergenceY_rad ?? 0);
  const k = beam.beam.definition === '1/e2' ? new Dec(2).sqrt() : new Dec(1);
  return { d0: d.div(k), phi: f.div(k) };
}

/**
 * Largest half-width of the over-limit region between path distances z1 and z2. For a Gaussian
 * beam of 1/e diameter D whose on-axis exposure reaches the limit at diameter D_L = D0 + φ·NOHD,
 * the exposure exceeds the limit out to r = (D/2)·√(2·ln(D_L/D)) (derived from
 * E(r) = E0·exp(−4r²/D²) and E0 ∝ 1/D²); r is largest, D_L/(2√e), where D = D_L/√e.
 * With no divergence D_L is unknown and three beam diameters are used (ours).
 */
function halfWidth(d0: Dec, phi: Dec, nohd: Dec, z1: Dec, z2: Dec): Dec {
  // The same beam over the same stretch gives the same width: kept, because a live edit of the plan
  // (a door dragged) re-evaluates every beam with unchanged inputs, and ln at 20 digits is slow.
  const key = `${d0.toString()}|${phi.toString()}|${nohd.toString()}|${z1.toString()}|${z2.toString()}`;
  const hit = widths.get(key);
  if (hit) return hit;
  const w = computeHalfWidth(d0, phi, nohd, z1, z2);
  if (widths.size >= WIDTHS_KEPT) widths.clear();
  widths.set(key, w);
  return w;
}
const widths = new Map<string, Dec>();
const WIDTHS_KEPT = 5000;

function computeHalfWidth(d0: Dec, phi: Dec, nohd: Dec, z1: Dec, z2: Dec): Dec {
  if (phi.isZero()) return d0.mul(3);
  const DL = d0.add(phi.mul(nohd));
  // ln and √ at 20 digits (DecGeo), rounded up: the width is then never below the 40-digit value.
  const r = (D: Dec) => (D.gte(DL) ? new Dec(0) : new Dec(new DecGeo(DL.div(D)).ln().mul(2).sqrt()).mul(D.div(2)).toSignificantDigits(15, Dec.ROUND_UP));
  const D1 = d0.add(phi.mul(z1));
  const D2 = d0.add(phi.mul(z2));
  const Dstar = DL.div(SQRT_E);
  if (D2.lte(Dstar)) return r(D2);
  if (D1.gte(Dstar)) return r(D1);
  return DL.div(SQRT_E.mul(2));
}

/**
 * Half-width of the band a laser's beams are traced as (core/plan/trace-path.ts) between two path
 * distances: the widest of its beams' zones there (over-limit half-width, drawing margin and pad).
 */
export function bandOf(beams: readonly BeamOnPlan[]): BandWidth {
  const shapes = beams.map((b) => ({ ...oneOverE(b.input), H: directLength(b.result) }));
  return (z1, z2) => shapes.reduce((m, b) => Dec.max(m, halfWidth(b.d0, b.phi, b.H, z1, z2)), new Dec(0)).add(PATH_MARGIN_M).add(ROUNDING_PAD_M).add(BAND_EDGE_ROUNDING_M);
}

/**
 * How wide the beam is where it meets a beam dump or target `z` metres along its path, m: the
 * larger of
 * - the width across which it exceeds the limit, 2·r with r = (D/2)·√(2·ln(D_L/D)) as for the
 *   zone (halfWidth; zero beyond the drawn hazard distance), and
 * - its beam diameter there, for a Gaussian beam at the 1/e² points (the diameter a dump's maker
 *   sizes against, holding 86 % of the power; d(1/e²) = √2·d(1/e), domain.md 1.1), for a top-hat
 *   its edge;
 * larger axis of an elliptical beam. The beam grows as in the evaluation, d(z) = a + z·φ (domain.md
 * 1.2.1, the standards' linear model, core/beam/beam-model.ts); the quadrature form √(a² + (z·φ)²)
 * gives a narrower beam at every z, so it is not used here (the safe side is the wider beam).
 * Rounded up to 15 significant figures, so digits lost in the 40-digit arithmetic never make it narrower.
 */
export function beamWidthAt(b: BeamOnPlan, z: Dec): Dec {
  return beamWidthsAt(b, z).width;
}

/** The two widths of beamWidthAt and the larger (which the finding names). */
export function beamWidthsAt(b: BeamOnPlan, z: Dec): { readonly width: Dec; readonly governs: 'over-limit' | 'diameter' } {
  const H = directLength(b.result);
  const { d0, phi } = oneOverE(b.input);
  const over = z.gte(H) ? new Dec(0) : halfWidth(d0, phi, H, z, z).mul(2);
  const g = b.input.beam;
  const along = (d: number, f: number) => new Dec(d).add(new Dec(f).mul(z));
  const edge = Dec.max(along(g.diameter_m, g.divergence_rad), along(g.diameterY_m ?? g.diameter_m, g.divergenceY_rad ?? g.divergence_rad));
  // A 1/e² input is already the 1/e² diameter (taken as typed, so a beam typed 10 mm wide is exactly 10 mm, not 9.999…).
  const diameter = (g.profile ?? 'gaussian') === 'tophat' || g.definition === '1/e2' ? edge : edge.mul(SQRT2);
  return { width: Dec.max(over, diameter).toSignificantDigits(15, Dec.ROUND_UP), governs: over.gt(diameter) ? 'over-limit' : 'diameter' };
}

/**
 * Does part of the beam pass a beam dump or target of aperture `aperture` met `z` metres along the
 * path while still above the limit? A beam exactly as wide as the aperture counts as passing (ours:
 * the safe side; a dump as wide as the beam's 1/e² diameter already lets 14 % of a Gaussian beam past).
 */
export function passesAperture(b: BeamOnPlan, z: Dec, aperture: Dec): boolean {
  return z.lt(directLength(b.result)) && beamWidthAt(b, z).gte(aperture);
}

export interface BeamOnPlan {
  readonly laserId: string;
  readonly laserName: string;
  readonly input: BeamInput;
  readonly result: BeamResult;
}

export interface ZoneWithShape extends PlanZone {
  readonly shape: readonly P[];
  /** Its bounding box in ordinary numbers, worked out once (quick tests only). */
  readonly box: Box;
}

/** Split points along a leg where it crosses an enclosure wall (fractions 0..1 of the leg). */
function enclosureCuts(plan: RoomPlan, a: P, b: P, len: Dec): Dec[] {
  const cuts: Dec[] = [];
  const u = unit(a, b);
  for (const e of plan.enclosures) {
    for (const [p, q] of edges(box(toP(e.min), toP(e.max)))) {
      const t = rayHitsSegment(a, u, p, q);
      if (t !== null && t.gt(0) && t.lt(len)) cuts.push(t);
    }
  }
  return cuts.sort((x, y) => x.cmp(y));
}

export function insideEnclosure(plan: RoomPlan, p: P): string | null {
  for (const e of plan.enclosures) if (pointInPolygon(p, box(toP(e.min), toP(e.max)))) return e.id;
  return null;
}

function wholeInsideEnclosure(plan: RoomPlan, shape: readonly P[], b: Box): boolean {
  return plan.enclosures.some((e) => insideBox(shape, toP(e.min), toP(e.max), ROUNDING_PAD_M.mul(2), b));
}

function zone(base: Omit<ZoneWithShape, 'polygon' | 'enclosed' | 'box'>, plan: RoomPlan): ZoneWithShape {
  const b = boxOf(base.shape);
  return { ...base, box: b, polygon: base.shape.map(roundPoint), enclosed: wholeInsideEnclosure(plan, base.shape, b) };
}

/**
 * Cuts at path distances 1, 2, 4, 8 ... m so the zone widens in steps with the beam instead of
 * taking its widest point along the whole leg (each step still takes the widest point of its own
 * stretch, so no step is narrower than the over-limit region).
 */
function taperCuts(legStart: Dec, pieceLen: Dec): Dec[] {
  const out: Dec[] = [];
  for (let d = new Dec(1); d.lt(legStart.add(pieceLen)); d = d.mul(2)) {
    const t = d.sub(legStart);
    if (t.gt(0)) out.push(t);
  }
  return out;
}

export interface DirectRun {
  readonly points: P[];
  /** Where the drawn direct zone ends along the path, m. */
  readonly length: Dec;
}

/** Direct-beam zone pieces of one beam along its traced legs. */
export function directZones(plan: RoomPlan, beam: BeamOnPlan, legs: readonly Leg[]): { zones: ZoneWithShape[]; run: DirectRun } {
  const H = directLength(beam.result);
  const { d0, phi } = oneOverE(beam.input);
  const zones: ZoneWithShape[] = [];
  const points: P[] = [];
  let n = 0;
  for (const leg of legs) {
    if (leg.start.gte(H)) break;
    const legLen = leg.end.sub(leg.start);
    const pieceLen = Dec.min(legLen, H.sub(leg.start));
    if (pieceLen.lte(0)) break;
    const u = unit(leg.from, leg.to);
    const end = add(leg.from, scale(u, pieceLen));
    const passed = passedOf(plan, leg);
    // A surface the drawn line passes near its end (or a corner) still stops the lines of the band that meet it;
    // one it passes at a door or window in it is an opening (the screens do not hold the openings).
    const grazedAt = leg.grazed.filter((g) => g.through === null).map((g) => g.point);
    const keep = (sc: ScreenSeg) => grazedAt.some((q) => distanceSqToSegment(q, sc.a, sc.b).lte(GRAZE_ON_SCREEN_M2));
    const screens = roomScreens(plan).filter((sc) => !passed.has(sc) || keep(sc));
    if (points.length === 0) points.push(leg.from);
    points.push(end);
    const cuts = [new Dec(0), ...enclosureCuts(plan, leg.from, end, pieceLen), ...taperCuts(leg.start, pieceLen), pieceLen]
      .sort((x, y) => x.cmp(y))
      .filter((c, k, all) => k === 0 || !c.eq(all[k - 1] ?? c));
    for (let i = 0; i + 1 < cuts.length; i++) {
      const t1 = cuts[i];
      const t2 = cuts[i + 1];
      if (!t1 || !t2 || t2.sub(t1).lte(0)) continue;
      const w = halfWidth(d0, phi, H, leg.start.add(t1), leg.start.add(t2)).add(PATH_MARGIN_M).add(ROUNDING_PAD_M).add(BAND_EDGE_ROUNDING_M);
      // Pieces meet edge to edge inside a leg; only the leg's own ends get the placement margin.
      // Walls, curtains and barriers beside the beam or at its end cut the strip (core/plan/beam-strip.ts).
      const ext = PATH_MARGIN_M.add(ROUNDING_PAD_M);
      const piece = { origin: leg.from, from: add(leg.from, scale(u, t1)), to: add(leg.from, scale(u, t2)), w, ext, capStart: i === 0, capEnd: i + 2 === cuts.length };
      for (const shape of stripShapes(piece, screens)) {
        n += 1;
        zones.push(
          zone(
            {
              id: `${beam.result.beamId}:direct:${n}`,
              kind: 'direct',
              beamId: beam.result.beamId,
              laserId: beam.laserId,
              label: `Direct beam of ${beam.result.label}`,
              shape,
            },
            plan,
          ),
        );
      }
    }
  }
  const last = legs[legs.length - 1];
  return { zones, run: { points, length: Dec.min(H, last ? last.end : new Dec(0)) } };
}

/** The screens a leg passes, worked out once per leg: the beams of one laser share its legs. */
function passedOf(plan: RoomPlan, leg: Leg): Set<ScreenSeg> {
  let s = passedByLeg.get(leg);
  if (!s) {
    s = passedScreens(leg.from, leg.to, roomScreens(plan));
    passedByLeg.set(leg, s);
  }
  return s;
}
const passedByLeg = new WeakMap<Leg, Set<ScreenSeg>>();

/** A grazed point within 2 mm of a screen lies on it (its free end is taken 1 mm in); squared, m². */
const GRAZE_ON_SCREEN_M2 = new Dec('4e-6');

/**
 * The cut strip of one beam piece, kept by its inputs (the piece and every screen): a live edit that
 * moves a door or a desk leaves it as it was, and the end pieces' sight-line sweep is slow.
 */
function stripShapes(piece: StripPiece, allScreens: readonly ScreenSeg[]): P[][] {
  // Only screens that can reach the strip matter (its box widened by its half-width and end margin).
  const b = boxOf([piece.origin, piece.from, piece.to]);
  const screens = allScreens.filter((sc) => !boxesApart(sc.box, b, piece.w.add(piece.ext).toNumber()));
  const q = (p: P) => `${p.x.toString()},${p.y.toString()}`;
  const key = `${q(piece.origin)}|${q(piece.from)}|${q(piece.to)}|${piece.w.toString()}|${piece.ext.toString()}|${piece.capStart}|${piece.capEnd}|${screensKey(screens)}`;
  const hit = strips.get(key);
  if (hit) return hit;
  const shapes = cutStrip(piece, screens, ROUNDING_PAD_M);
  if (strips.size >= SHAPES_KEPT) strips.clear();
  strips.set(key, shapes);
  return shapes;
}
const strips = new Map<string, P[][]>();

/** How far in front of a wall or barrier a spot on it is seen from, m (ours). */
const SURFACE_STANDOFF_M = new Dec('0.001');

/**
 * Reflection points a beam reaches: mirrors and targets on its path, where it ends on a wall or
 * barrier, and marked points. A spot on a wall or barrier is seen from 1 mm in front of it, on the
 * side the beam comes from (ours: the surface scatters back into the room, not through itself).
 */
export function reflectionPointsOf(plan: RoomPlan, laserId: string, legs: readonly Leg[]): Array<{ key: string; at: P; seenFrom: P; what: string }> {
  const out: Array<{ key: string; at: P; seenFrom: P; what: string }> = [];
  legs.forEach((leg, i) => {
    if (leg.endsWith === 'mirror' || leg.endsWith === 'target') out.push({ key: `p${i + 1}`, at: leg.to, seenFrom: leg.to, what: leg.endId });
    const u = () => unit(leg.from, leg.to);
    // Part of the beam meets a surface it may pass near its end: that spot scatters too.
    leg.grazed.forEach((g, k) => {
      const front = sub(g.point, scale(u(), Dec.min(SURFACE_STANDOFF_M, g.at.sub(leg.start).div(2))));
      out.push({ key: `p${i + 1}g${k + 1}`, at: g.point, seenFrom: front, what: `where the beam meets ${g.kind === 'wall' ? 'the wall' : 'the barrier'} near its end` });
    });
    if (leg.endsWith === 'wall' || leg.endsWith === 'barrier') {
      // Where the last passing part of the band is stopped, when that is off the drawn line.
      const spot = leg.endSpot ?? leg.to;
      const front = sub(spot, scale(u(), Dec.min(SURFACE_STANDOFF_M, leg.end.sub(leg.start).div(2))));
      out.push({ key: `p${i + 1}`, at: spot, seenFrom: front, what: `where the beam meets ${leg.endsWith === 'wall' ? 'the wall' : 'the barrier'}` });
    }
  });
  for (const r of plan.reflectionPoints) if (r.laserId === laserId) out.push({ key: r.id, at: toP(r.at), seenFrom: toP(r.at), what: r.label });
  return out;
}
/**
 * Walls, curtains and barriers are opaque to scattered light: a diffuse zone is what the reflection
 * point sees of its circle past the room outline (of any shape), the interior walls, the curtains and
 * barriers, and the walls of the enclosure it lies in (core/plan/visibility.ts). Doors and windows in
 * the walls are reported when a zone reaches them.
 */
function screensFor(plan: RoomPlan, centre: P): ScreenSeg[] {
  const fixed = roomScreens(plan);
  const encl = plan.enclosures.find((e) => pointInPolygon(centre, box(toP(e.min), toP(e.max))));
  return encl ? [...fixed, ...screensOf(edges(box(toP(encl.min), toP(encl.max))), ROUNDING_PAD_M)] : fixed;
}
/** The room outline, interior walls, curtains and barriers as screens, worked out once per evaluation (every zone of the plan uses them). */
function roomScreens(plan: RoomPlan): ScreenSeg[] {
  let fixed = planScreens.get(plan);
  if (!fixed) {
    const segs: Array<readonly [P, P]> = [...edges(plan.outline.map(toP))];
    for (const w of plan.walls) segs.push([toP(w.a), toP(w.b)]);
    for (const b of plan.barriers) segs.push([toP(b.a), toP(b.b)]);
    fixed = screensOf(segs, ROUNDING_PAD_M);
    planScreens.set(plan, fixed);
  }
  return fixed;
}
const planScreens = new WeakMap<RoomPlan, ScreenSeg[]>();

/**
 * The diffuse zone's polygon: what `seenFrom` sees of the polygon around the circle of radius R
 * about `at`. Kept by its inputs (the point, the radius and every screen), because a live edit that
 * moves a door or a desk leaves every diffuse zone as it was, and the sweep is the plan's largest cost.
 */
function diffuseShape(plan: RoomPlan, at: P, seenFrom: P, R: Dec): P[] {
  const circle = circleOutside(at, R.add(ROUNDING_PAD_M), CIRCLE_CORNERS);
  // Keyed by the screens that reach the circle's box only: visibleRegion sweeps no other (the same
  // test), so a curtain moved across the room leaves a small zone elsewhere as it was.
  const around = boxOf(circle);
  const screens = screensFor(plan, seenFrom).filter((sc) => !boxesApart(sc.box, around, 0));
  const key = `${at.x.toString()},${at.y.toString()}|${seenFrom.x.toString()},${seenFrom.y.toString()}|${R.toString()}|${screensKey(screens)}`;
  const hit = shapes.get(key);
  if (hit) return hit;
  const shape = visibleRegion(seenFrom, circle, screens, ROUNDING_PAD_M);
  if (shapes.size >= SHAPES_KEPT) shapes.clear();
  shapes.set(key, shape);
  return shape;
}
const shapes = new Map<string, P[]>();
const SHAPES_KEPT = 2000;
const screenKeys = new WeakMap<readonly ScreenSeg[], string>();
function screensKey(screens: readonly ScreenSeg[]): string {
  let k = screenKeys.get(screens);
  if (k === undefined) {
    k = screens.map((s) => `${s.a.x.toString()},${s.a.y.toString()},${s.b.x.toString()},${s.b.y.toString()}`).join(';');
    screenKeys.set(screens, k);
  }
  return k;
}

export function diffuseZones(plan: RoomPlan, beam: BeamOnPlan, legs: readonly Leg[]): ZoneWithShape[] {
  const R = diffuseRadius(beam.result);
  if (R === null || R.isZero()) return [];
  return reflectionPointsOf(plan, beam.laserId, legs).map((p) =>
    zone(
      {
        id: `${beam.result.beamId}:diffuse:${p.key}`,
        kind: 'diffuse',
        beamId: beam.result.beamId,
        laserId: beam.laserId,
        label: `Diffuse reflection of ${beam.result.label} at ${p.what}`,
        shape: diffuseShape(plan, p.at, p.seenFrom, R),
        radius_m: R.toString(),
      },
      plan,
    ),
  );
}
