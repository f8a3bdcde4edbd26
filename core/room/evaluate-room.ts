/**
 * evaluateRoom: every beam of every laser in a room, the additive rule across beams acting on the
 * same tissue and effect (core/limits/additive.ts), the eyewear coverage matrix and what the room
 * needs, the largest hazard distance, and the highest class. Results support, and do not replace,
 * the judgement of the site laser safety officer and the local regulations.
 */
import { Dec, PI } from '../numeric/decimal.js';
import type { BeamInput, ExposurePlace, RoomInput } from '../model/inputs.js';
import { RESULT_CAUTION, type AdditiveGroup, type BeamResult, type LaserClass, type RoomResult } from '../model/results.js';
import { RULE_SET_NAME } from '../limits/rule-sets.js';
import { additiveFractions, type AdditiveItem } from '../limits/additive.js';
import { addStep, newTrace } from '../trace/trace.js';
import { evaluateBeamDetailed, type BeamContext, type BeamEvaluation } from '../beam/evaluate-beam.js';
import { exposureAt, spreadOf } from '../beam/beam-model.js';
import type { TissueLimits } from '../beam/tissue-limits.js';
import { distanceReported, fmt, rec } from '../beam/format.js';
import { classRank } from '../classes/estimate.js';
import { validateRoomShape } from './validate-room.js';
import { planOfRoom } from '../plan/room-hook.js';
import { coverageMatrix, coveringAll, purchaseAdvice, requiredByWavelength } from './coverage.js';

const itemMemo = new WeakMap<TissueLimits, AdditiveItem>();

/** Exposure at the worst reachable position through the governing limit's aperture, for the additive rule. */
function additiveItem(ev: BeamEvaluation, tl: TissueLimits): AdditiveItem {
  const hit = itemMemo.get(tl);
  if (hit) return hit;
  const item = computeAdditiveItem(ev, tl);
  itemMemo.set(tl, item);
  return item;
}

function computeAdditiveItem(ev: BeamEvaluation, tl: TissueLimits): AdditiveItem {
  const r0 = new Dec(ev.od.requirement.position_m);
  const D = new Dec(tl.governingLimit.aperture.diameter_m);
  let X = exposureAt(tl.S, spreadOf(ev.model), D, r0);
  if (tl.tissue === 'eye' && ev.lensPresent) {
    X = Dec.max(X, tl.S.mul(4).div(PI.mul(D).mul(D)));
  }
  const label = ev.result.beamId;
  // The same exposure over any row's own aperture (rows of one group can differ at an exact edge).
  // Memoised per aperture: the item is kept per beam (itemMemo), and the room's additive rule is
  // reassembled on every keystroke (speed, see npm run bench).
  const overMemo = new Map<string, Dec>();
  const over = (aperture_m: string): Dec => {
    const hit = overMemo.get(aperture_m);
    if (hit) return hit;
    const v = overUncached(aperture_m);
    overMemo.set(aperture_m, v);
    return v;
  };
  const overUncached = (aperture_m: string): Dec => {
    const Da = new Dec(aperture_m);
    let Xa = exposureAt(tl.S, spreadOf(ev.model), Da, r0);
    if (tl.tissue === 'eye' && ev.lensPresent) Xa = Dec.max(Xa, tl.S.mul(4).div(PI.mul(Da).mul(Da)));
    return tl.pulsed ? Xa.div(tl.shortPulseFactor) : Xa.mul(tl.governingLimit.duration_s);
  };
  if (tl.pulsed) {
    // Per-pulse exposure; for pulses shorter than the tables the limit was scaled by k in this
    // module, so the exposure is divided by k to keep the fraction the same (ours).
    return { label, H_Jm2: rec(X.div(tl.shortPulseFactor)), pulsed: tl.pulsed, exposureOver: over };
  }
  return { label, H_Jm2: rec(X.mul(tl.governingLimit.duration_s)), limit: tl.governingLimit, exposureOver: over };
}

/**
 * Beam evaluations memoised on the beam's input and its place in the room: when an officer edits
 * one value, only that beam is recomputed and the room result is reassembled (the UI recomputes on
 * every keystroke). Results are read-only data; the room never mutates a cached one.
 */
const BEAM_CACHE_MAX = 300; // a few rooms of beams; each evaluation with its trace is ~50 kB
const beamCache = new Map<string, BeamEvaluation>();

// Stryker disable next-line BlockStatement: equivalent, the memo's key holds the beam, its context and the labelled class, so a kept entry is the same value; only the benchmark's cold runs (npm run bench) and the tests' fresh start call it
export function clearBeamCache(): void {
  beamCache.clear();
}

function cachedBeam(beam: BeamInput, ctx: BeamContext, classAsLabelled: LaserClass | undefined): BeamEvaluation {
  const key = JSON.stringify([beam, ctx, classAsLabelled ?? null]);
  const hit = beamCache.get(key);
  if (hit) return hit;
  const ev = evaluateBeamDetailed(beam, ctx);
  let result = ev.result;
  const est = result.classEstimate.estimate;
  if (classAsLabelled && classAsLabelled !== est) {
    const w =
      classRank(est) > classRank(classAsLabelled)
        ? `Class estimate ${est} is higher than the labelled class ${classAsLabelled}: check the data sheet and the classification.`
        : `Class estimate ${est} is lower than the labelled class ${classAsLabelled}; the labelled (manufacturer's) class governs.`;
    result = { ...result, warnings: [...result.warnings, w] };
  }
  const out: BeamEvaluation = { ...ev, result };
  // Stryker disable next-line ConditionalExpression,EqualityOperator: equivalent, when the memo is emptied changes memory and speed only (npm run bench); a kept entry is the same value
  if (beamCache.size >= BEAM_CACHE_MAX) beamCache.clear();
  beamCache.set(key, out);
  return out;
}

function maxClass(a: LaserClass, b: LaserClass): LaserClass {
  return classRank(a) >= classRank(b) ? a : b;
}

/**
 * The places the officer named, with beams not named anywhere each in their laser's own place;
 * without any, one place per laser ("path of <laser>": its beams share a path, the default).
 */
function exposurePlaces(input: RoomInput, evaluations: readonly BeamEvaluation[]): ExposurePlace[] {
  const given = (input.exposurePlaces ?? []).map((p) => ({ place: p.place, beamIds: [...p.beamIds] }));
  const named = new Set(given.flatMap((p) => p.beamIds));
  const byLaser = new Map<string, ExposurePlace & { beamIds: string[] }>();
  for (const ev of evaluations) {
    if (named.has(ev.result.beamId)) continue;
    const laserId = ev.result.laserId ?? '';
    const name = input.lasers.find((l) => l.id === laserId)?.name ?? laserId;
    // Stryker disable next-line ArrayDeclaration: equivalent, a place's beam ids are only read to pick its members from the room's beams (validated unique ids), and an id that is no beam picks none
    const p = byLaser.get(laserId) ?? { place: `the path of ${name}`, beamIds: [] };
    p.beamIds.push(ev.result.beamId);
    byLaser.set(laserId, p);
  }
  return [...given, ...byLaser.values()];
}

export function evaluateRoom(input: RoomInput): RoomResult {
  const ruleSet = validateRoomShape(input);
  const trace = newTrace(`Room evaluation (${RULE_SET_NAME[ruleSet]})`);
  addStep(trace, { kind: 'note', label: 'Caution', detail: RESULT_CAUTION });
  const evaluations: BeamEvaluation[] = [];
  const beams: BeamResult[] = [];
  let highest: LaserClass = '1';
  input.lasers.forEach((laser, i) => {
    laser.beams.forEach((beam, j) => {
      const ev = cachedBeam(
        beam,
        {
          fieldPrefix: `lasers[${i}].beams[${j}].`,
          laserId: laser.id,
          roomRuleSet: ruleSet,
          ...(input.settings !== undefined ? { roomSettings: input.settings } : {}),
          fallbackId: `${laser.id}-b${j}`,
        },
        laser.classAsLabelled,
      );
      const result = ev.result;
      const est = result.classEstimate.estimate;
      highest = maxClass(highest, maxClass(est, laser.classAsLabelled ?? est));
      evaluations.push(ev);
      beams.push(result);
    });
  });
  addStep(trace, { kind: 'input', label: 'Beams', detail: `${beams.length} beams from ${input.lasers.length} lasers` });

  // Additive rule per place, tissue and hazard group (grouping by core/limits/additive.ts): only
  // beams that can reach the same place add; a place with one beam has nothing to add.
  const additive: AdditiveGroup[] = [];
  for (const place of exposurePlaces(input, evaluations)) {
    const members = evaluations.filter((ev) => place.beamIds.includes(ev.result.beamId));
    if (members.length < 2) continue;
    for (const tissue of ['eye', 'skin'] as const) {
      const items = members.map((ev) => additiveItem(ev, tissue === 'eye' ? ev.eye : ev.skin));
      const res = additiveFractions(items);
      trace.children.push({ ...res.trace, title: `${res.trace.title}, at ${place.place}` });
      for (const g of res.groups) {
        const ids = [...new Set(g.terms.map((t) => t.label))];
        if (ids.length < 2) continue; // one beam in this effect group: compared with its own limit already
        additive.push({
          place: place.place,
          tissue: g.tissue,
          effect: g.label,
          beamIds: ids,
          sumOfFractions: g.sum,
          note: `${ids.length} beams at ${place.place}, each at its worst reachable position: sum of fractions ${g.sum_reported}${g.exceeds ? ' > 1: combined exposure above the limit' : ' <= 1'}`,
        });
      }
    }
  }

  const eyewear = input.eyewear ?? [];
  const coverage = coverageMatrix(beams, eyewear);
  const all = coveringAll(beams, eyewear, coverage);
  const advice = purchaseAdvice(beams, eyewear, coverage, all);
  for (const v of coverage) addStep(trace, { kind: 'result', label: `${v.beamId} x ${v.eyewearId}`, detail: `${v.adequate ? 'adequate' : 'NOT adequate'}: ${v.reason}${v.scaleChecks.length ? `; ${v.scaleChecks.join('; ')}` : ''}` });
  for (const a of advice) addStep(trace, { kind: 'note', label: 'Eyewear', detail: a });

  let largest = new Dec(0);
  let largestWhat = 'none';
  for (const b of beams) {
    for (const d of b.distances) {
      if (d.kind === 'skin' || d.governs === false) continue; // a diffuse case the officer did not take as governing
      const x = new Dec(d.distance_m);
      if (x.gt(largest)) {
        largest = x;
        largestWhat = `${b.label}: ${d.label}`;
      }
    }
  }
  addStep(trace, { kind: 'result', label: 'Largest hazard distance', detail: `${distanceReported(largest)} m (${largestWhat}); compare with the room's walls, doors and windows`, value: fmt(largest), unit: 'm' });
  addStep(trace, { kind: 'result', label: 'Highest class', detail: `${highest} (labelled class, or the estimate where higher)` });

  const plan = planOfRoom(input, beams, trace);
  return {
    ruleSet,
    ruleSetName: RULE_SET_NAME[ruleSet],
    beams,
    additive,
    coverage,
    eyewearCoveringAll: all,
    requiredEyewear: requiredByWavelength(beams),
    purchaseAdvice: advice,
    largestHazardDistance_m: rec(largest),
    highestClass: highest,
    caution: RESULT_CAUTION,
    trace,
    ...(plan ? { plan } : {}),
  };
}
