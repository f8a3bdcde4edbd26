/**
 * Editing the room plan: pure functions that return a new plan (the draft keeps the plan as plain
 * data, so every edit is one assignment and the live evaluation sees it). Points are addressed by
 * a key such as "doors.1.a" or "paths.0.elements.2.at"; each has a label in officer words.
 */
import { planMiddle, type PathElementKind, type PlanPoint, type RoomPlan } from '../../core/index.js';

type Json = Record<string, unknown>;
const copy = <T>(x: T): T => JSON.parse(JSON.stringify(x)) as T;
const p = (x_m: number, y_m: number): PlanPoint => ({ x_m, y_m });

/** Coordinates typed or dragged are kept to the centimetre (a drawn plan is not better than that). */
export function toCm(v: number): number {
  return Math.round(v * 100) / 100;
}

export interface LaserRef {
  readonly id: string;
  readonly name: string;
}

export interface Handle {
  readonly key: string;
  readonly label: string;
  readonly point: PlanPoint;
}

export const ELEMENT_NAME: Readonly<Record<PathElementKind, string>> = { mirror: 'mirror', dump: 'beam dump', target: 'target' };

/** A 6 m × 4 m room with one door, and every laser on a bench ending in a beam dump (a start to edit). */
export function newPlan(lasers: readonly LaserRef[]): RoomPlan {
  return {
    outline: [p(0, 0), p(6, 0), p(6, 4), p(0, 4)],
    doors: [{ id: 'D1', label: 'D1', a: p(6, 0.4), b: p(6, 1.3) }],
    windows: [],
    walls: [],
    barriers: [],
    workPositions: [],
    enclosures: [],
    paths: lasers.map((l, i) => ({ laserId: l.id, exit: p(1, toCm(1.5 + 0.5 * i)), elements: [{ kind: 'dump' as const, at: p(4.5, toCm(1.5 + 0.5 * i)) }] })),
    reflectionPoints: [],
  };
}

/** Paths for lasers added since, and none for lasers removed (a plan never names a missing laser). */
export function planForLasers(plan: RoomPlan, lasers: readonly LaserRef[]): RoomPlan {
  const ids = new Set(lasers.map((l) => l.id));
  const paths = plan.paths.filter((x) => ids.has(x.laserId));
  const reflectionPoints = plan.reflectionPoints.filter((x) => ids.has(x.laserId));
  if (paths.length === plan.paths.length && reflectionPoints.length === plan.reflectionPoints.length) return plan;
  return { ...plan, paths, reflectionPoints };
}

export function placeLaser(plan: RoomPlan, laserId: string): RoomPlan {
  if (plan.paths.some((x) => x.laserId === laserId)) return plan;
  const ys = plan.outline.map((q) => q.y_m);
  const xs = plan.outline.map((q) => q.x_m);
  const y = toCm((Math.min(...ys) + Math.max(...ys)) / 2);
  const x0 = Math.min(...xs);
  const w = Math.max(...xs) - x0;
  return { ...plan, paths: [...plan.paths, { laserId, exit: p(toCm(x0 + w * 0.2), y), elements: [{ kind: 'dump', at: p(toCm(x0 + w * 0.7), y) }] }] };
}

/**
 * The words for the two points of a door, window, wall, curtain or barrier, the same on the drawn
 * handles, the typed-coordinate fields and the refusals: a door or window is an opening between two
 * sides; a wall, curtain or barrier runs from one end to the other.
 */
export function endWords(group: 'doors' | 'windows' | 'walls' | 'barriers', which: 'a' | 'b'): string {
  const opening = group === 'doors' || group === 'windows';
  return which === 'a' ? (opening ? 'one side' : 'one end') : opening ? 'other side' : 'other end';
}

/** A curtain or barrier by its kind and name ("Curtain C1"). */
export const barrierName = (b: { readonly kind: 'curtain' | 'barrier'; readonly label: string }): string => `${b.kind === 'curtain' ? 'Curtain' : 'Barrier'} ${b.label}`;

/** Every point the officer can move, with its label. */
export function handles(plan: RoomPlan, lasers: readonly LaserRef[]): Handle[] {
  const name = new Map(lasers.map((l) => [l.id, l.name]));
  const out: Handle[] = [];
  plan.outline.forEach((q, i) => out.push({ key: `outline.${i}`, label: `Room corner ${i + 1}`, point: q }));
  const two = (group: 'doors' | 'windows' | 'walls' | 'barriers', i: number, name: string, d: { readonly a: PlanPoint; readonly b: PlanPoint }) =>
    out.push({ key: `${group}.${i}.a`, label: `${name}, ${endWords(group, 'a')}`, point: d.a }, { key: `${group}.${i}.b`, label: `${name}, ${endWords(group, 'b')}`, point: d.b });
  plan.doors.forEach((d, i) => two('doors', i, `Door ${d.label}`, d));
  plan.windows.forEach((d, i) => two('windows', i, `Window ${d.label}`, d));
  plan.walls.forEach((d, i) => two('walls', i, `Wall ${d.label}`, d));
  plan.barriers.forEach((d, i) => two('barriers', i, barrierName(d), d));
  plan.workPositions.forEach((w, i) => out.push({ key: `workPositions.${i}.at`, label: `Work position ${w.label}`, point: w.at }));
  plan.enclosures.forEach((e, i) => out.push({ key: `enclosures.${i}.min`, label: `Enclosure ${e.label}, lower left corner`, point: e.min }, { key: `enclosures.${i}.max`, label: `Enclosure ${e.label}, upper right corner`, point: e.max }));
  plan.paths.forEach((x, i) => {
    const n = name.get(x.laserId) ?? x.laserId;
    out.push({ key: `paths.${i}.exit`, label: `${n}, beam exit`, point: x.exit });
    x.elements.forEach((e, k) => out.push({ key: `paths.${i}.elements.${k}.at`, label: `${n}, ${ELEMENT_NAME[e.kind]} ${k + 1}`, point: e.at }));
  });
  plan.reflectionPoints.forEach((r, i) => out.push({ key: `reflectionPoints.${i}.at`, label: `Reflection point ${r.label}`, point: r.at }));
  plan.controlledArea?.outline.forEach((q, i) => out.push({ key: `controlledArea.outline.${i}`, label: `Controlled area corner ${i + 1}`, point: q }));
  return out;
}

/** The plan with the point at `key` moved to `to` (to the centimetre). */
export function movePoint(plan: RoomPlan, key: string, to: PlanPoint): RoomPlan {
  const next = copy(plan) as unknown as Json;
  const parts = key.split('.');
  let node: unknown = next;
  for (const part of parts.slice(0, -1)) node = (node as Json)[part];
  const last = parts[parts.length - 1] ?? '';
  const target = node as Json;
  if (!(last in target)) return plan;
  target[last] = { x_m: toCm(to.x_m), y_m: toCm(to.y_m) };
  // An enclosure keeps its lower-left corner below and left of the other.
  for (const e of (next['enclosures'] as Array<{ min: PlanPoint; max: PlanPoint }>) ?? []) {
    const lo = { x_m: Math.min(e.min.x_m, e.max.x_m), y_m: Math.min(e.min.y_m, e.max.y_m) };
    const hi = { x_m: Math.max(e.min.x_m, e.max.x_m), y_m: Math.max(e.min.y_m, e.max.y_m) };
    e.min = lo;
    e.max = hi;
  }
  return next as unknown as RoomPlan;
}

export type OutlineOwner = 'outline' | 'controlledArea';

function outlineOf(plan: RoomPlan, owner: OutlineOwner): readonly PlanPoint[] {
  return owner === 'outline' ? plan.outline : (plan.controlledArea?.outline ?? []);
}

function withOutline(plan: RoomPlan, owner: OutlineOwner, outline: PlanPoint[]): RoomPlan {
  if (owner === 'outline') return { ...plan, outline };
  return plan.controlledArea ? { ...plan, controlledArea: { ...plan.controlledArea, outline } } : plan;
}

/** A new corner halfway along the side from corner `index` to the next one (an L-shaped room starts here). */
export function addCorner(plan: RoomPlan, owner: OutlineOwner, index: number): RoomPlan {
  const pts = [...outlineOf(plan, owner)];
  const a = pts[index];
  const b = pts[(index + 1) % pts.length];
  if (!a || !b) return plan;
  pts.splice(index + 1, 0, p(toCm((a.x_m + b.x_m) / 2), toCm((a.y_m + b.y_m) / 2)));
  return withOutline(plan, owner, pts);
}

/** The outline without corner `index`; an outline keeps at least 3 corners. */
export function removeCorner(plan: RoomPlan, owner: OutlineOwner, index: number): RoomPlan {
  const pts = outlineOf(plan, owner);
  if (pts.length <= 3 || index < 0 || index >= pts.length) return plan;
  return withOutline(plan, owner, pts.filter((_, i) => i !== index));
}

/** "outline.3" → the owner and index of a corner handle, or null for any other point. */
export function cornerOf(key: string): { owner: OutlineOwner; index: number } | null {
  const m = /^(outline|controlledArea\.outline)\.(\d+)$/.exec(key);
  return m ? { owner: m[1] === 'outline' ? 'outline' : 'controlledArea', index: Number(m[2]) } : null;
}

function nextId(plan: RoomPlan, prefix: string): string {
  const used = new Set<string>([
    ...plan.doors.map((x) => x.id),
    ...plan.windows.map((x) => x.id),
    ...plan.walls.map((x) => x.id),
    ...plan.barriers.map((x) => x.id),
    ...plan.workPositions.map((x) => x.id),
    ...plan.enclosures.map((x) => x.id),
    ...plan.reflectionPoints.map((x) => x.id),
  ]);
  for (let n = 1; ; n++) if (!used.has(`${prefix}${n}`)) return `${prefix}${n}`;
}

function centre(plan: RoomPlan): PlanPoint {
  const m = planMiddle(plan.outline);
  return p(toCm(m.x), toCm(m.y));
}

export type AddKind = 'door' | 'window' | 'wall' | 'curtain' | 'barrier' | 'workPosition' | 'enclosure';

/** Add an item near the middle of the room (the officer then drags it or types its place). */
export function addItem(plan: RoomPlan, kind: AddKind): RoomPlan {
  const c = centre(plan);
  const seg = (id: string) => ({ id, label: id, a: p(toCm(c.x_m - 0.5), c.y_m), b: p(toCm(c.x_m + 0.5), c.y_m) });
  switch (kind) {
    case 'door': {
      const id = nextId(plan, 'D');
      return { ...plan, doors: [...plan.doors, { ...seg(id), a: p(c.x_m, Math.max(...plan.outline.map((q) => q.y_m))), b: p(toCm(c.x_m + 0.9), Math.max(...plan.outline.map((q) => q.y_m))) }] };
    }
    case 'window': {
      const id = nextId(plan, 'W');
      const y = Math.min(...plan.outline.map((q) => q.y_m));
      return { ...plan, windows: [...plan.windows, { ...seg(id), a: p(toCm(c.x_m - 0.6), y), b: p(toCm(c.x_m + 0.6), y) }] };
    }
    case 'wall':
      return { ...plan, walls: [...plan.walls, seg(nextId(plan, 'IW'))] };
    case 'curtain':
    case 'barrier': {
      const id = nextId(plan, kind === 'curtain' ? 'C' : 'B');
      return { ...plan, barriers: [...plan.barriers, { ...seg(id), a: p(c.x_m, toCm(c.y_m - 0.6)), b: p(c.x_m, toCm(c.y_m + 0.6)), kind, rating: '' }] };
    }
    case 'workPosition': {
      const id = nextId(plan, 'P');
      return { ...plan, workPositions: [...plan.workPositions, { id, label: id, at: p(c.x_m, toCm(c.y_m + 1)) }] };
    }
    case 'enclosure': {
      const id = nextId(plan, 'E');
      return { ...plan, enclosures: [...plan.enclosures, { id, label: id, min: p(toCm(c.x_m - 0.5), toCm(c.y_m - 0.3)), max: p(toCm(c.x_m + 0.5), toCm(c.y_m + 0.3)) }] };
    }
  }
}

export type Group = 'doors' | 'windows' | 'walls' | 'barriers' | 'workPositions' | 'enclosures' | 'reflectionPoints';

export function removeItem(plan: RoomPlan, group: Group, index: number): RoomPlan {
  return { ...plan, [group]: (plan[group] as readonly unknown[]).filter((_, i) => i !== index) };
}

/** Change fields of one item (label, rating, interlocked, kind ...). */
export function patchItem<G extends Group>(plan: RoomPlan, group: G, index: number, patch: Partial<RoomPlan[G][number]>): RoomPlan {
  return { ...plan, [group]: (plan[group] as ReadonlyArray<object>).map((x, i) => (i === index ? { ...x, ...patch } : x)) };
}

/** A mirror halfway along the last leg of a laser's path; the beam then goes on at 90° to the left. */
export function addMirror(plan: RoomPlan, pathIndex: number): RoomPlan {
  const path = plan.paths[pathIndex];
  if (!path) return plan;
  const els = [...path.elements];
  const last = els[els.length - 1];
  const before = els[els.length - 2]?.at ?? path.exit;
  if (last && last.kind !== 'mirror') {
    const mid = p(toCm((before.x_m + last.at.x_m) / 2), toCm((before.y_m + last.at.y_m) / 2));
    const dx = last.at.x_m - mid.x_m;
    const dy = last.at.y_m - mid.y_m;
    els.splice(els.length - 1, 1, { kind: 'mirror', at: mid }, { ...last, at: p(toCm(mid.x_m - dy), toCm(mid.y_m + dx)) });
    return { ...plan, paths: plan.paths.map((x, i) => (i === pathIndex ? { ...x, elements: els } : x)) };
  }
  const from = last ? last.at : path.exit;
  const deg = path.onward_deg ?? 0;
  const at = p(toCm(from.x_m + Math.cos((deg * Math.PI) / 180)), toCm(from.y_m + Math.sin((deg * Math.PI) / 180)));
  return { ...plan, paths: plan.paths.map((x, i) => (i === pathIndex ? { ...x, elements: [...els, { kind: 'mirror', at }], onward_deg: (deg + 90) % 360 } : x)) };
}

/** How the path ends: in a beam dump or target (a point), or open in a direction. */
export function setPathEnd(plan: RoomPlan, pathIndex: number, end: 'dump' | 'target' | 'open'): RoomPlan {
  const path = plan.paths[pathIndex];
  if (!path) return plan;
  const els = [...path.elements];
  const last = els[els.length - 1];
  const lastIsEnd = last !== undefined && last.kind !== 'mirror';
  let next = { ...path };
  if (end === 'open') {
    if (lastIsEnd) els.pop();
    const from = els[els.length - 1]?.at ?? path.exit;
    const deg = lastIsEnd ? Math.round((Math.atan2(last.at.y_m - from.y_m, last.at.x_m - from.x_m) * 180) / Math.PI) : (path.onward_deg ?? 0);
    next = { ...path, elements: els, onward_deg: deg };
  } else if (lastIsEnd) {
    els[els.length - 1] = { ...last, kind: end };
    next = { ...path, elements: els };
  } else {
    const from = last ? last.at : path.exit;
    const deg = path.onward_deg ?? 0;
    const at = p(toCm(from.x_m + 1.5 * Math.cos((deg * Math.PI) / 180)), toCm(from.y_m + 1.5 * Math.sin((deg * Math.PI) / 180)));
    const { onward_deg: _drop, ...rest } = path;
    next = { ...rest, elements: [...els, { kind: end, at }] };
  }
  return { ...plan, paths: plan.paths.map((x, i) => (i === pathIndex ? next : x)) };
}

export function removeLastMirror(plan: RoomPlan, pathIndex: number): RoomPlan {
  const path = plan.paths[pathIndex];
  if (!path) return plan;
  const idx = path.elements.map((e) => e.kind).lastIndexOf('mirror');
  if (idx < 0) return plan;
  return { ...plan, paths: plan.paths.map((x, i) => (i === pathIndex ? { ...x, elements: x.elements.filter((_, k) => k !== idx) } : x)) };
}

export function patchPath(plan: RoomPlan, pathIndex: number, patch: { height_m?: number | null; onward_deg?: number }): RoomPlan {
  return {
    ...plan,
    paths: plan.paths.map((x, i) => {
      if (i !== pathIndex) return x;
      const { height_m: _h, ...rest } = x;
      const height = patch.height_m === undefined ? x.height_m : patch.height_m;
      return { ...rest, ...(height === null || height === undefined ? {} : { height_m: height }), ...(patch.onward_deg !== undefined ? { onward_deg: patch.onward_deg } : {}) };
    }),
  };
}

/** The aperture of a beam dump or target (m); null removes it (the element is then taken to take the whole beam). */
export function setElementAperture(plan: RoomPlan, pathIndex: number, elementIndex: number, aperture_m: number | null): RoomPlan {
  return {
    ...plan,
    paths: plan.paths.map((x, i) =>
      i !== pathIndex
        ? x
        : {
            ...x,
            elements: x.elements.map((e, k) => {
              if (k !== elementIndex || e.kind === 'mirror') return e;
              const { aperture_m: _old, ...rest } = e;
              return aperture_m === null ? rest : { ...rest, aperture_m };
            }),
          },
    ),
  };
}

export function addReflectionPoint(plan: RoomPlan, laserId: string): RoomPlan {
  const id = nextId(plan, 'R');
  const c = centre(plan);
  return { ...plan, reflectionPoints: [...plan.reflectionPoints, { id, label: id, at: p(toCm(c.x_m + 0.5), toCm(c.y_m + 0.5)), laserId }] };
}

/** Record the room outline as the laser controlled area the officer accepts (editable afterwards). */
export function acceptControlledArea(plan: RoomPlan, acceptedBy: string): RoomPlan {
  return { ...plan, controlledArea: { outline: copy([...(plan.controlledArea?.outline ?? plan.outline)]), acceptedBy: acceptedBy.trim() } };
}

/** The officer's note on the accepted boundary (why it runs where it does); an empty note is removed. */
export function noteControlledArea(plan: RoomPlan, note: string): RoomPlan {
  if (!plan.controlledArea) return plan;
  const { note: _old, ...rest } = plan.controlledArea;
  const text = note.trim();
  return { ...plan, controlledArea: text ? { ...rest, note: text } : rest };
}

export function dropControlledArea(plan: RoomPlan): RoomPlan {
  const { controlledArea: _c, ...rest } = plan;
  return rest;
}

const GROUP_WORDS: Readonly<Record<string, string>> = {
  doors: 'Door',
  windows: 'Window',
  walls: 'Wall',
  barriers: 'Curtain or barrier',
  workPositions: 'Work position',
  enclosures: 'Enclosure',
  reflectionPoints: 'Reflection point',
};
const PART_WORDS: Readonly<Record<string, string>> = {
  at: 'place',
  min: 'lower left corner',
  max: 'upper right corner',
  exit: 'beam exit',
  x_m: 'x',
  y_m: 'y',
  onward_deg: 'direction of the open beam',
  height_m: 'beam height',
  aperture_m: 'aperture',
  laserId: 'laser',
  label: 'name',
  id: 'name',
  rating: 'rating',
  acceptedBy: 'accepted by',
};

/**
 * A core error about the plan in officer words: "plan.doors[1].b: ..." becomes "Door D2, other
 * side: ..." (the item's own name, never the field path).
 */
export function planErrorWords(message: string, field: string, plan: RoomPlan, lasers: readonly LaserRef[]): string {
  // "(got {...}; valid: ...)" shows raw data: keep only what is valid.
  const rest = (message.startsWith(field) ? message.slice(field.length) : `: ${message}`).replace(/\s*\(got .*; valid: (.*)\)$/, ' (expected $1)');
  const m = /^plan\.(\w+)(?:\[(\d+)\])?(.*)$/.exec(field);
  if (!m) return `Room plan${rest}`;
  const [, group = '', idx, tail = ''] = m;
  const i = idx === undefined ? -1 : Number(idx);
  let what = 'Room plan';
  if (group === 'outline') what = i >= 0 ? `Room corner ${i + 1}` : 'Room outline';
  else if (group === 'controlledArea') what = 'Laser controlled area';
  else if (group === 'paths') {
    const id = plan.paths[i]?.laserId ?? '';
    what = `Beam path of ${lasers.find((l) => l.id === id)?.name ?? 'a laser'}`;
  } else if (group === 'barriers' && plan.barriers[i]) {
    what = barrierName(plan.barriers[i]);
  } else if (GROUP_WORDS[group]) {
    const item = (plan[group as Group] as ReadonlyArray<{ label?: string }>)[i];
    what = `${GROUP_WORDS[group]} ${item?.label ?? i + 1}`;
  }
  const twoPoints = group === 'doors' || group === 'windows' || group === 'walls' || group === 'barriers' ? group : null;
  // A path element by its name on the list ("beam dump 2"), never "elements, point 2".
  let element: string | null = null;
  const el = /^\.elements\[(\d+)\](.*)$/.exec(tail);
  if (group === 'paths' && el) {
    const k = Number(el[1]);
    const kind = plan.paths[i]?.elements[k]?.kind;
    element = kind ? `${ELEMENT_NAME[kind]} ${k + 1}` : `point ${k + 1}`;
  }
  const parts = (element !== null && el ? (el[2] ?? '') : tail)
    .split(/[.[\]]/)
    .filter((x) => x !== '')
    .map((x) => (/^\d+$/.test(x) ? `point ${Number(x) + 1}` : twoPoints && (x === 'a' || x === 'b') ? endWords(twoPoints, x) : (PART_WORDS[x] ?? x)));
  return `${[what, ...(element !== null ? [element] : []), ...parts].join(', ')}${rest}`;
}
