/**
 * Room eyewear: the coverage matrix of beams against the eyewear on the shelf, which eyewear
 * covers every beam a person can meet, what the room needs per wavelength, and what to buy when
 * nothing on the shelf covers everything (domain notes 2.4; pain points 4 and 7). ODs are never
 * summed across wavelengths; a high OD at the wrong wavelength is no protection [USAPHC] (read).
 */
import { Dec } from '../numeric/decimal.js';
import type { EyewearSpec } from '../model/inputs.js';
import type { BeamResult, EyewearVerdict, RoomResult, ScaleNumberRequirement } from '../model/results.js';
import { eyewearVerdict, type BeamNeed } from '../eyewear/adequacy.js';

export function needOf(b: BeamResult): BeamNeed {
  return { beamId: b.beamId, wavelength_nm: b.wavelength_nm, odRequired: b.odRequired, scaleNumbers: b.scaleNumbers };
}

/** Verdicts memoised per beam result (read-only, itself memoised) and eyewear specification. */
const verdictMemo = new WeakMap<BeamResult, Map<string, EyewearVerdict>>();

export function coverageMatrix(beams: readonly BeamResult[], eyewear: readonly EyewearSpec[]): EyewearVerdict[] {
  const out: EyewearVerdict[] = [];
  const keys = eyewear.map((ew) => JSON.stringify(ew));
  for (const b of beams) {
    let m = verdictMemo.get(b);
    // Stryker disable next-line ConditionalExpression: equivalent, a fresh memo only recomputes the same verdict (speed, npm run bench)
    if (!m) {
      m = new Map<string, EyewearVerdict>();
      verdictMemo.set(b, m);
    }
    eyewear.forEach((ew, k) => {
      const key = keys[k] as string;
      let v = m.get(key);
      // Stryker disable next-line ConditionalExpression: equivalent, the verdict is recomputed from the same beam need and eyewear (speed only)
      if (!v) {
        v = eyewearVerdict(needOf(b), ew);
        m.set(key, v);
      }
      out.push(v);
    });
  }
  return out;
}

export function coveringAll(beams: readonly BeamResult[], eyewear: readonly EyewearSpec[], matrix: readonly EyewearVerdict[]): string[] {
  // Stryker disable next-line ConditionalExpression,ArrayDeclaration: equivalent, unreachable: a room has at least one laser with at least one beam (validateRoomShape refuses 'lasers' and 'lasers[i].beams' empty)
  if (beams.length === 0) return [];
  return eyewear.filter((ew) => matrix.filter((v) => v.eyewearId === ew.id).every((v) => v.adequate)).map((ew) => ew.id);
}

/** Per wavelength: the highest OD and, per mode, the highest scale number any beam needs. */
export function requiredByWavelength(beams: readonly BeamResult[]): RoomResult['requiredEyewear'] {
  const by = new Map<number, { od: Dec; scales: Map<string, ScaleNumberRequirement> }>();
  for (const b of beams) {
    const cur = by.get(b.wavelength_nm) ?? { od: new Dec(0), scales: new Map<string, ScaleNumberRequirement>() };
    const od = new Dec(b.odRequired);
    if (od.gt(cur.od)) cur.od = od;
    for (const s of b.scaleNumbers) {
      if (!s.applies) continue;
      const prev = cur.scales.get(s.mode);
      if (!prev || s.scale > prev.scale) cur.scales.set(s.mode, s);
    }
    by.set(b.wavelength_nm, cur);
  }
  return [...by.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([wavelength_nm, v]) => ({ wavelength_nm, odRequired: v.od.toString(), scaleNumbers: [...v.scales.values()] }));
}

function needText(b: BeamResult): string {
  const lb = b.scaleNumbers.filter((s) => s.applies && s.scale > 0).map((s) => (s.mode === 'RB' ? `RB${s.scale} (alignment)` : `${s.mode} LB${s.scale}`));
  return `OD ≥ ${b.odRequired}${lb.length ? `, ${lb.join(', ')}` : ''}`;
}

/** Greedy smallest set of shelf eyewear covering the beams that some eyewear covers. */
function greedyCover(beams: readonly BeamResult[], eyewear: readonly EyewearSpec[], matrix: readonly EyewearVerdict[]): { set: string[]; covered: Set<string> } {
  const adequate = new Map<string, Set<string>>();
  for (const v of matrix) if (v.adequate) adequate.set(v.eyewearId, (adequate.get(v.eyewearId) ?? new Set<string>()).add(v.beamId));
  const covered = new Set<string>();
  const set: string[] = [];
  for (;;) {
    let best: { id: string; gain: number } | null = null;
    for (const ew of eyewear) {
      const gain = [...(adequate.get(ew.id) ?? [])].filter((b) => !covered.has(b)).length;
      if (gain > 0 && (!best || gain > best.gain)) best = { id: ew.id, gain };
    }
    if (!best) break;
    set.push(best.id);
    for (const b of adequate.get(best.id) ?? []) covered.add(b);
    if (covered.size === beams.length) break;
  }
  return { set, covered };
}

export function purchaseAdvice(beams: readonly BeamResult[], eyewear: readonly EyewearSpec[], matrix: readonly EyewearVerdict[], all: readonly string[]): string[] {
  const advice: string[] = [];
  const needing = beams.filter((b) => new Dec(b.odRequired).gt(0));
  if (needing.length === 0) return ['No beam exceeds its limit at the worst reachable position: no laser eyewear is needed for these beams.'];
  if (eyewear.length === 0) {
    advice.push('No eyewear is listed for this room. It needs, per beam:');
    for (const b of needing) advice.push(`${b.label} (${b.wavelength_nm} nm): ${needText(b)}.`);
    return advice;
  }
  if (all.length > 0) {
    advice.push(`Eyewear covering every beam: ${all.join(', ')}.`);
    for (const id of all) {
      const ew = eyewear.find((e) => e.id === id);
      if (ew?.visibleTransmission !== undefined && ew.visibleTransmission < 0.2) {
        advice.push(`${ew.label} transmits ${Math.round(ew.visibleTransmission * 100)} % of visible light: check the room lighting (dark eyewear is the usual reason eyewear is not worn).`);
      }
    }
    return advice;
  }
  const { set, covered } = greedyCover(beams, eyewear, matrix);
  const uncovered = beams.filter((b) => !covered.has(b.beamId));
  advice.push('No single eyewear on the shelf covers every beam in this room.');
  if (set.length > 0) {
    advice.push(`Smallest combination from the shelf: ${set.join(' + ')} (covers ${covered.size} of ${beams.length} beams); different eyewear per task or zone, with the zones separated by enclosures or curtains, or new eyewear is needed.`);
  }
  for (const b of uncovered) advice.push(`Not covered by anything on the shelf: ${b.label} (${b.wavelength_nm} nm), needs ${needText(b)}.`);
  const byWl = requiredByWavelength(uncovered.length ? uncovered : needing);
  advice.push(
    `To cover ${uncovered.length ? 'the remaining beams' : 'all beams'} with one pair, buy eyewear with: ` +
      byWl.map((w) => `${w.wavelength_nm} nm OD ≥ ${w.odRequired}${w.scaleNumbers.filter((s) => s.scale > 0 && s.mode !== 'RB').map((s) => ` ${s.mode} LB${s.scale}`).join('')}`).join('; ') +
      '.',
  );
  return advice;
}
