/**
 * What would be lost if the open draft were discarded, one line per part of the assessment, in the
 * words of the workspace ("New laser "Bench diode" (not yet in the register)", "Changes to the room
 * plan"), so the confirmation before discarding can say exactly what goes and the officer can
 * cancel and save instead. Compares the draft's content with the content as last saved (both as
 * the session normalises them); a draft never saved loses everything entered.
 */
import type { AssessmentContent } from '../../electron/api/contracts/records.js';

interface LaserSeen {
  readonly id: string;
  readonly name: string;
  readonly isNew: boolean;
}

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
const quoted = (name: string): string => `“${name.trim() || 'Unnamed laser'}”`;

/** Parts of the content other than the lasers and the plan, with the name the officer knows them by. */
const PARTS: ReadonlyArray<readonly [string, (c: AssessmentContent) => unknown]> = [
  ['Rule set or conservative mode', (c) => [c.input.ruleSet, c.input.settings ?? null]],
  ['Eyewear taken from the shelf', (c) => c.input.eyewear ?? []],
  ['Places where beams add up', (c) => c.input.exposurePlaces ?? []],
  ['Operating states', (c) => c.operatingStates],
  ['Assumptions (exposure durations, persons present, optical aids)', (c) => c.assumptions],
  ['Decisions on the controls', (c) => c.controls],
  ['Other hazards', (c) => c.nonBeamHazards],
  ['Eyewear chosen for the beams', (c) => c.eyewearChosen],
  ['Notes', (c) => c.notes],
  ['Review-by date', (c) => c.reviewBy],
];

/**
 * The unsaved changes, one line each. `saved` is the content as last saved (null: never saved);
 * `lasers` are the draft's lasers, which know whether they are new to the register.
 */
export function unsavedChanges(saved: AssessmentContent | null, now: AssessmentContent, lasers: readonly LaserSeen[]): string[] {
  const out: string[] = [];
  const newOnes = lasers.filter((l) => l.isNew).map((l) => `New laser ${quoted(l.name)} (not yet in the register)`);
  if (saved === null) {
    return [`Everything entered in the new assessment “${now.title}”: it has never been saved`, ...newOnes];
  }
  if (saved.title !== now.title) out.push(`Title “${saved.title}” changed to “${now.title}”`);
  const before = new Map(saved.input.lasers.map((l) => [l.id ?? l.name, l]));
  const after = new Map(now.input.lasers.map((l) => [l.id ?? l.name, l]));
  for (const l of lasers) {
    const b = before.get(l.id);
    const a = after.get(l.id);
    if (l.isNew) out.push(`New laser ${quoted(l.name)} (not yet in the register)`);
    else if (!b) out.push(`Laser ${quoted(l.name)} taken into the assessment`);
    else if (!same(b, a)) out.push(`Changes to laser ${quoted(l.name)}`);
  }
  for (const [id, b] of before) if (!lasers.some((l) => l.id === id)) out.push(`Removal of laser ${quoted(b.name)} from the assessment`);
  const pb = saved.input.plan;
  const pa = now.input.plan;
  if (!pb && pa) out.push('The new room plan');
  else if (pb && !pa) out.push('Removal of the room plan');
  else if (!same(pb, pa)) out.push('Changes to the room plan');
  for (const [name, part] of PARTS) if (!same(part(saved), part(now))) out.push(name);
  // a part not named above (the order of the lasers, a field added later) is still said
  if (out.length === 0 && !same(saved, now)) out.push('Other changes to the assessment');
  return out;
}

/** "These 3 unsaved changes are lost:" / "This unsaved change is lost:". */
export function unsavedIntro(n: number): string {
  return n === 1 ? 'This unsaved change is lost:' : `These ${n} unsaved changes are lost:`;
}
