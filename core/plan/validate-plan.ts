/**
 * Validation of the room plan's own fields, with the field named as in every other input error
 * (e.g. 'plan.doors[1].a.x_m'). Ranges are ours: a room plan spans at most a kilometre each way.
 */
import { InputError, requireInRange } from '../errors.js';
import { requireRule } from '../beam/validate-beam.js';
import { INPUT_RULES } from '../model/input-rules.js';
import { isSimpleOutline } from './geometry.js';
import type { PlanPoint, RoomPlan } from './plan-model.js';
import { toP } from './trace-path.js';

export const PLAN_COORDINATE_RANGE_M: readonly [number, number] = [-1000, 1000];
export const PLAN_HEIGHT_RANGE_M: readonly [number, number] = [0, 20];
export const PLAN_REACH_RANGE_M: readonly [number, number] = [0, 10];

type Obj = Record<string, unknown>;
const isObject = (x: unknown): x is Obj => typeof x === 'object' && x !== null && !Array.isArray(x);

function object(field: string, x: unknown, what: string): Obj {
  if (!isObject(x)) throw new InputError('missing', field, x, what);
  return x;
}

function list(field: string, x: unknown): unknown[] {
  if (!Array.isArray(x)) throw new InputError('missing', field, x, 'a list');
  return x;
}

function text(field: string, x: unknown, nonEmpty: boolean): string {
  if (typeof x !== 'string' || (nonEmpty && x.trim() === '')) throw new InputError('missing', field, x, nonEmpty ? 'a non-empty text' : 'a text');
  return x;
}

function point(field: string, x: unknown): void {
  const p = object(field, x, 'a point {x_m, y_m}');
  requireInRange(`${field}.x_m`, p['x_m'], PLAN_COORDINATE_RANGE_M[0], PLAN_COORDINATE_RANGE_M[1], 'm');
  requireInRange(`${field}.y_m`, p['y_m'], PLAN_COORDINATE_RANGE_M[0], PLAN_COORDINATE_RANGE_M[1], 'm');
}

function samePoint(a: Obj, b: Obj): boolean {
  return a['x_m'] === b['x_m'] && a['y_m'] === b['y_m'];
}

function outline(field: string, x: unknown): void {
  const pts = list(field, x);
  if (pts.length < 3) throw new InputError('missing', field, pts.length, 'at least 3 corners');
  pts.forEach((p, i) => point(`${field}[${i}]`, p));
  if (!isSimpleOutline(pts.map((p) => toP(p as PlanPoint)))) throw new InputError('invalid_choice', field, pts.length, 'an outline whose sides do not cross one another');
}

/** Ids must be unique across the whole plan (a finding names its subject by id). */
function segmentList(field: string, x: unknown, ids: Set<string>, extra?: (o: Obj, f: string) => void): void {
  list(field, x).forEach((s, i) => {
    const f = `${field}[${i}]`;
    const o = object(f, s, 'an entry {id, label, a, b}');
    uniqueId(`${f}.id`, o['id'], ids);
    text(`${f}.label`, o['label'], true);
    point(`${f}.a`, o['a']);
    point(`${f}.b`, o['b']);
    if (samePoint(o['a'] as Obj, o['b'] as Obj)) throw new InputError('invalid_choice', `${f}.b`, o['b'], 'an end point different from the start point');
    extra?.(o, f);
  });
}

function uniqueId(field: string, x: unknown, ids: Set<string>): void {
  const id = text(field, x, true);
  if (ids.has(id)) throw new InputError('invalid_choice', field, id, 'an id not used by another item of the plan');
  ids.add(id);
}

/** Check a plan against the room's lasers (every path belongs to a laser of the room, once). */
export function validatePlan(x: unknown, laserIds: ReadonlySet<string>): RoomPlan {
  const plan = object('plan', x, 'a room plan {outline, doors, windows, ...}');
  outline('plan.outline', plan['outline']);
  const ids = new Set<string>();
  segmentList('plan.doors', plan['doors'], ids, (o, f) => {
    if (o['interlocked'] !== undefined && typeof o['interlocked'] !== 'boolean') throw new InputError('invalid_choice', `${f}.interlocked`, o['interlocked'], 'yes or no');
  });
  segmentList('plan.windows', plan['windows'], ids);
  segmentList('plan.walls', plan['walls'], ids);
  segmentList('plan.barriers', plan['barriers'], ids, (o, f) => {
    if (o['kind'] !== 'curtain' && o['kind'] !== 'barrier') throw new InputError('invalid_choice', `${f}.kind`, o['kind'], "'curtain' | 'barrier'");
    text(`${f}.rating`, o['rating'], false);
  });
  list('plan.workPositions', plan['workPositions']).forEach((w, i) => {
    const f = `plan.workPositions[${i}]`;
    const o = object(f, w, 'a work position {id, label, at}');
    uniqueId(`${f}.id`, o['id'], ids);
    text(`${f}.label`, o['label'], true);
    point(`${f}.at`, o['at']);
    if (o['reach_m'] !== undefined) requireInRange(`${f}.reach_m`, o['reach_m'], PLAN_REACH_RANGE_M[0], PLAN_REACH_RANGE_M[1], 'm');
  });
  list('plan.enclosures', plan['enclosures']).forEach((e, i) => {
    const f = `plan.enclosures[${i}]`;
    const o = object(f, e, 'an enclosure {id, label, min, max}');
    uniqueId(`${f}.id`, o['id'], ids);
    text(`${f}.label`, o['label'], true);
    point(`${f}.min`, o['min']);
    point(`${f}.max`, o['max']);
    const lo = o['min'] as Obj;
    const hi = o['max'] as Obj;
    if (!((lo['x_m'] as number) < (hi['x_m'] as number) && (lo['y_m'] as number) < (hi['y_m'] as number))) {
      throw new InputError('invalid_choice', `${f}.max`, o['max'], 'a corner right of and above the first corner');
    }
  });
  const placed = new Set<string>();
  list('plan.paths', plan['paths']).forEach((p, i) => {
    const f = `plan.paths[${i}]`;
    const o = object(f, p, 'a beam path {laserId, exit, elements}');
    const laserId = text(`${f}.laserId`, o['laserId'], true);
    if (!laserIds.has(laserId)) throw new InputError('invalid_choice', `${f}.laserId`, laserId, 'a laser of this room');
    if (placed.has(laserId)) throw new InputError('invalid_choice', `${f}.laserId`, laserId, 'a laser not placed twice on the plan');
    placed.add(laserId);
    point(`${f}.exit`, o['exit']);
    let prev = o['exit'] as Obj;
    const els = list(`${f}.elements`, o['elements']);
    els.forEach((e, k) => {
      const g = `${f}.elements[${k}]`;
      const el = object(g, e, 'a path element {kind, at}');
      if (el['kind'] !== 'mirror' && el['kind'] !== 'dump' && el['kind'] !== 'target') throw new InputError('invalid_choice', `${g}.kind`, el['kind'], "'mirror' | 'dump' | 'target'");
      if (el['kind'] !== 'mirror' && k !== els.length - 1) throw new InputError('invalid_choice', `${g}.kind`, el['kind'], 'a mirror (a beam dump or target ends the path, so it must come last)');
      point(`${g}.at`, el['at']);
      if (samePoint(prev, el['at'] as Obj)) throw new InputError('invalid_choice', `${g}.at`, el['at'], 'a point different from the previous point of the path');
      if (el['label'] !== undefined) text(`${g}.label`, el['label'], false);
      if (el['aperture_m'] !== undefined) {
        if (el['kind'] === 'mirror') throw new InputError('invalid_choice', `${g}.aperture_m`, el['aperture_m'], 'nothing (only a beam dump or a target has an aperture)');
        requireRule(`${g}.aperture_m`, el['aperture_m'], INPUT_RULES.planAperture_m);
      }
      prev = el['at'] as Obj;
    });
    const last = els[els.length - 1] as Obj | undefined;
    const ends = last !== undefined && last['kind'] !== 'mirror';
    if (ends && o['onward_deg'] !== undefined) throw new InputError('invalid_choice', `${f}.onward_deg`, o['onward_deg'], 'nothing (the path ends in a beam dump or target)');
    if (!ends) requireInRange(`${f}.onward_deg`, o['onward_deg'], -360, 360, '° (direction of the beam after the last point)');
    if (o['height_m'] !== undefined) requireInRange(`${f}.height_m`, o['height_m'], PLAN_HEIGHT_RANGE_M[0], PLAN_HEIGHT_RANGE_M[1], 'm');
  });
  list('plan.reflectionPoints', plan['reflectionPoints']).forEach((r, i) => {
    const f = `plan.reflectionPoints[${i}]`;
    const o = object(f, r, 'a reflection point {id, label, at, laserId}');
    uniqueId(`${f}.id`, o['id'], ids);
    text(`${f}.label`, o['label'], true);
    point(`${f}.at`, o['at']);
    const laserId = text(`${f}.laserId`, o['laserId'], true);
    if (!laserIds.has(laserId)) throw new InputError('invalid_choice', `${f}.laserId`, laserId, 'a laser of this room');
  });
  if (plan['controlledArea'] !== undefined) {
    const c = object('plan.controlledArea', plan['controlledArea'], 'a boundary {outline, acceptedBy}');
    outline('plan.controlledArea.outline', c['outline']);
    text('plan.controlledArea.acceptedBy', c['acceptedBy'], true);
    if (c['note'] !== undefined) text('plan.controlledArea.note', c['note'], false);
  }
  return plan as unknown as RoomPlan;
}
