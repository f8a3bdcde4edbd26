/**
 * The room plan at a glance, for the results panel: a few lines counted from the core's findings
 * (never from the zones themselves): entrances, windows and work positions inside a hazard zone,
 * beams that leave the room, end on a curtain or barrier, pass one near its end, are wider than
 * their beam dump or leave their enclosure, paths drawn through
 * a wall before their end, and whether the
 * accepted laser controlled area holds every zone.
 */
import type { PlanFinding, PlanFindingKind, PlanResult, RoomPlan } from '../../core/index.js';

export interface SummaryLine {
  /** 'hazard' lines are shown in the hazard colour; 'ok' and 'check' in plain text. */
  readonly tone: 'hazard' | 'check' | 'ok';
  readonly text: string;
}

const list = (xs: readonly string[]): string => (xs.length <= 1 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`);
const unique = <T>(xs: readonly T[]): T[] => [...new Set(xs)];
const plural = (n: number, one: string, many: string): string => `${n} ${n === 1 ? one : many}`;

/** Beam id of a finding's zones ("<beamId>:direct:1" → "<beamId>"). */
function beamsOf(f: PlanFinding): string[] {
  return unique(f.zoneIds.map((z) => z.split(':')[0] ?? z));
}

export function planSummary(plan: RoomPlan, result: PlanResult, beamLabel: ReadonlyMap<string, string>, laserName: ReadonlyMap<string, string> = new Map()): SummaryLine[] {
  const of = (k: PlanFindingKind) => result.findings.filter((f) => f.kind === k);
  const subjects = (k: PlanFindingKind) => new Set(of(k).map((f) => f.subjectId));
  const out: SummaryLine[] = [];

  const doorsIn = plan.doors.filter((d) => subjects('door-in-zone').has(d.id));
  if (plan.doors.length === 0) out.push({ tone: 'check', text: 'No door is drawn on the plan.' });
  else if (doorsIn.length === 0) out.push({ tone: 'ok', text: `No entrance lies inside a hazard zone (${plural(plan.doors.length, 'door', 'doors')} drawn).` });
  else out.push({ tone: 'hazard', text: `Entrances inside a hazard zone: ${doorsIn.length} of ${plural(plan.doors.length, 'door', 'doors')} (${list(doorsIn.map((d) => `${d.label}${d.interlocked ? ', interlocked' : ''}`))}).` });

  const windowsIn = plan.windows.filter((w) => subjects('window-in-zone').has(w.id));
  if (windowsIn.length > 0) out.push({ tone: 'hazard', text: `Windows inside a hazard zone: ${windowsIn.length} of ${plan.windows.length} (${list(windowsIn.map((w) => w.label))}).` });

  const workIn = plan.workPositions.filter((w) => subjects('work-position-in-zone').has(w.id));
  if (workIn.length > 0) out.push({ tone: 'hazard', text: `Work positions inside a hazard zone: ${workIn.length} of ${plan.workPositions.length} (${list(workIn.map((w) => w.label))}).` });
  else if (plan.workPositions.length > 0) out.push({ tone: 'ok', text: `No work position lies inside a hazard zone (${plural(plan.workPositions.length, 'position', 'positions')} drawn).` });

  const name = (id: string) => beamLabel.get(id) ?? id;
  const openingName = (id: string) => {
    const d = plan.doors.find((x) => x.id === id);
    if (d) return `door ${d.label}`;
    const w = plan.windows.find((x) => x.id === id);
    return w ? `window ${w.label}` : id;
  };
  const leaving = new Map<string, string[]>();
  for (const f of of('leaves-room')) for (const b of beamsOf(f)) leaving.set(b, unique([...(leaving.get(b) ?? []), openingName(f.subjectId)]));
  if (leaving.size > 0) out.push({ tone: 'hazard', text: `Beam paths leaving the room above the limit: ${list([...leaving].map(([b, via]) => `${name(b)} (through ${list(via)})`))}.` });

  const enclosed = unique(of('leaves-enclosure').flatMap(beamsOf));
  if (enclosed.length > 0) out.push({ tone: 'hazard', text: `Beam paths leaving their enclosure above the limit: ${list(enclosed.map(name))}.` });

  const stopped = new Map<string, string[]>();
  for (const f of of('stopped-by-barrier')) {
    const bar = plan.barriers.find((x) => x.id === f.subjectId);
    for (const b of beamsOf(f)) stopped.set(b, unique([...(stopped.get(b) ?? []), `${bar?.kind === 'curtain' ? 'curtain' : 'barrier'} ${bar?.label ?? f.subjectId}`]));
  }
  if (stopped.size > 0) out.push({ tone: 'check', text: `Beam paths ending on a curtain or barrier (check its rating): ${list([...stopped].map(([b, on]) => `${name(b)} on ${list(on)}`))}.` });

  const passing = unique(of('passes-surface-end').flatMap(beamsOf));
  if (passing.length > 0) out.push({ tone: 'hazard', text: `Beam paths meeting a wall, curtain or barrier near its end or a corner, taken to go on past it: ${list(passing.map(name))}.` });

  const spilling = unique(of('wider-than-dump').flatMap(beamsOf));
  if (spilling.length > 0) out.push({ tone: 'hazard', text: `Beams wider than their beam dump or target, taken to go on past it: ${list(spilling.map(name))}.` });

  const throughWall = unique(of('path-meets-wall').map((f) => laserName.get(f.subjectId) ?? f.subjectId));
  if (throughWall.length > 0) out.push({ tone: 'check', text: `Beam paths drawn through a wall before their end (check the drawing; the wall is taken to stop the beam): ${list(throughWall)}.` });

  if (!plan.controlledArea) out.push({ tone: 'check', text: 'No laser controlled area has been accepted yet.' });
  else {
    const outside = unique(of('outside-controlled-area').map((f) => f.subjectId));
    out.push(
      outside.length === 0
        ? { tone: 'ok', text: 'Every hazard zone stays inside the accepted laser controlled area.' }
        : { tone: 'hazard', text: `Hazard zones reaching outside the accepted laser controlled area: ${list(outside.map(name))}.` },
    );
  }
  const unplaced = of('path-not-placed').length;
  if (unplaced > 0) out.push({ tone: 'check', text: `${plural(unplaced, 'laser is', 'lasers are')} not placed on the plan.` });
  return out;
}
