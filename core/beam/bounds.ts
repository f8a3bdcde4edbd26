/**
 * Input tolerances -> nominal value and conservative bound (largest NOHD and OD, smallest limit),
 * and the input that dominates. Each toleranced input is moved to both ends of its range on its
 * own; then all at once, to every combination of the ends. The bound is the worst of every
 * evaluation, so it is never below the nominal value (ours; common practice of a worst-case
 * stack-up).
 */
import { Dec } from '../numeric/decimal.js';
import type { BeamInput, Emission, InputTolerances, LimitSettings, RuleSetId } from '../model/inputs.js';
import type { UncertaintyBounds } from '../model/results.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import { InputError } from '../errors.js';
import { toleranceWords } from '../model/input-words.js';
import { coreNumbers, type CoreNumbers } from './core-numbers.js';
import { fmt, rec } from './format.js';

type Key = keyof InputTolerances;

function perturb(input: BeamInput, key: Key, factor: number): BeamInput | null {
  const e = input.emission;
  const withEmission = (em: Emission): BeamInput => ({ ...input, emission: em });
  switch (key) {
    case 'power':
      return e.kind === 'cw' ? withEmission({ ...e, power_W: e.power_W * factor }) : null;
    case 'energy':
      return e.kind === 'pulsed' ? withEmission({ ...e, pulseEnergy_J: e.pulseEnergy_J * factor }) : null;
    case 'pulseDuration':
      return e.kind === 'pulsed' ? withEmission({ ...e, pulseDuration_s: e.pulseDuration_s * factor }) : null;
    case 'repetitionRate':
      return e.kind === 'pulsed' && e.repetitionRate_Hz !== undefined ? withEmission({ ...e, repetitionRate_Hz: e.repetitionRate_Hz * factor }) : null;
    case 'divergence':
      return {
        ...input,
        beam: { ...input.beam, divergence_rad: input.beam.divergence_rad * factor, ...(input.beam.divergenceY_rad !== undefined ? { divergenceY_rad: input.beam.divergenceY_rad * factor } : {}) },
      };
    case 'diameter':
      return {
        ...input,
        beam: { ...input.beam, diameter_m: input.beam.diameter_m * factor, ...(input.beam.diameterY_m !== undefined ? { diameterY_m: input.beam.diameterY_m * factor } : {}) },
      };
  }
}

/** 'repetitionRate' -> 'Repetition rate tolerance' (a trace step's label). */
function toleranceLabel(key: Key): string {
  const w = toleranceWords(key);
  return `${w.charAt(0).toUpperCase()}${w.slice(1)} tolerance`;
}

function safeNumbers(x: BeamInput, ruleSet: RuleSetId, settings: LimitSettings | undefined): CoreNumbers | null {
  try {
    return coreNumbers(x, ruleSet, settings);
  } catch (err) {
    if (err instanceof InputError) return null; // a perturbed value left the valid range
    throw err;
  }
}

/** Worse of two outcomes: longer NOHD, then higher OD, then lower limit. */
function worse(a: CoreNumbers, b: CoreNumbers): boolean {
  if (!a.nohd.eq(b.nohd)) return a.nohd.gt(b.nohd);
  if (!a.od.eq(b.od)) return a.od.gt(b.od);
  return a.limitE.lt(b.limitE);
}

export function computeBounds(input: BeamInput, ruleSet: RuleSetId, settings: LimitSettings | undefined, nominal: CoreNumbers): { bounds: UncertaintyBounds; trace: Trace } {
  const trace = newTrace('Input tolerances: nominal and conservative bound');
  const tol = input.tolerances ?? {};
  let nohd = nominal.nohd;
  let od = nominal.od;
  let limitE = nominal.limitE;
  let dominant: { key: Key; moveNohd: Dec; moveOd: Dec } | null = null;
  const applied: Array<{ key: Key; t: number }> = [];
  for (const key of Object.keys(tol) as Key[]) {
    const t = tol[key];
    if (t === undefined || t === 0) continue;
    const lo = perturb(input, key, 1 - t);
    const hi = perturb(input, key, 1 + t);
    if (!lo || !hi) {
      addStep(trace, { kind: 'note', label: toleranceLabel(key), detail: `tolerance ±${fmt(new Dec(t * 100))} % given, but this input does not apply to the beam` });
      continue;
    }
    applied.push({ key, t });
    const nLo = safeNumbers(lo, ruleSet, settings);
    const nHi = safeNumbers(hi, ruleSet, settings);
    const outs = [nLo, nHi].filter((x): x is CoreNumbers => x !== null);
    // Stryker disable next-line ConditionalExpression: both ends of one input are never refused together (a scaled input fails only an upper bound, and its lower end lies below the nominal value, which passed); see test/mutation/EQUIVALENT.md.
    if (outs.length === 0) continue;
    let w = outs[0] as CoreNumbers;
    for (const o of outs) if (worse(o, w)) w = o;
    const worstSide = w === nHi ? 1 + t : 1 - t;
    for (const o of outs) {
      if (o.nohd.gt(nohd)) nohd = o.nohd;
      if (o.od.gt(od)) od = o.od;
      if (o.limitE.lt(limitE)) limitE = o.limitE;
    }
    const moveNohd = w.nohd.minus(nominal.nohd).abs();
    const moveOd = w.od.minus(nominal.od).abs();
    addStep(trace, {
      kind: 'formula',
      label: toleranceLabel(key),
      detail: `±${fmt(new Dec(t * 100))} %: worst at ${worstSide > 1 ? '+' : '-'}${fmt(new Dec(t * 100))} %: NOHD ${fmt(w.nohd)} m (nominal ${fmt(nominal.nohd)}), OD ${fmt(w.od)} (nominal ${fmt(nominal.od)}), limit ${fmt(w.limitE)} W/m²` +
        (outs.length < 2 ? ' (one end left the valid range and was skipped)' : ''),
    });
    if (!dominant || moveNohd.gt(dominant.moveNohd) || (moveNohd.eq(dominant.moveNohd) && moveOd.gt(dominant.moveOd))) dominant = { key, moveNohd, moveOd };
  }
  // All at once: every corner of the tolerance box (each input at either end; at most 2^5 = 32
  // evaluations). The worse end of each input on its own is not enough: where an input's two ends
  // give the same NOHD, OD and limit at the nominal values of the others, it can still matter once
  // they move (a 1550 nm train whose NOHD is set by one pulse over 1 mm: the repetition rate moves
  // nothing, but with more energy the average-power limit over 3.5 mm sets the NOHD, and then more
  // pulses lengthen it).
  let worst: { n: CoreNumbers; sides: string } | null = null;
  const corners = applied.length > 0 ? 2 ** applied.length : 0; // none without a tolerance
  for (let mask = 0; mask < corners; mask++) {
    let x: BeamInput | null = input;
    const sides: string[] = [];
    applied.forEach(({ key, t }, i) => {
      const up = Math.floor(mask / 2 ** i) % 2 === 1;
      if (x) x = perturb(x, key, up ? 1 + t : 1 - t);
      sides.push(`${toleranceWords(key)} ${up ? '+' : '-'}${fmt(new Dec(t * 100))} %`);
    });
    const c = x ? safeNumbers(x, ruleSet, settings) : null;
    if (!c) continue;
    if (c.nohd.gt(nohd)) nohd = c.nohd;
    if (c.od.gt(od)) od = c.od;
    if (c.limitE.lt(limitE)) limitE = c.limitE;
    if (!worst || worse(c, worst.n)) worst = { n: c, sides: sides.join(', ') };
  }
  if (worst) addStep(trace, { kind: 'formula', label: 'All at once', detail: `every combination of the ends; the worst is ${worst.sides}: NOHD ${fmt(worst.n.nohd)} m, OD ${fmt(worst.n.od)}, limit ${fmt(worst.n.limitE)} W/m²` });
  const dominantInput = dominant && (dominant.moveNohd.gt(0) || dominant.moveOd.gt(0)) ? dominant.key : null;
  // The dominant input is chosen by how far it moves the NOHD, then (where no input moves the NOHD)
  // the OD: say which of the two it moved.
  const dominantMoves = dominant && dominantInput !== null ? (dominant.moveNohd.gt(0) ? 'NOHD' : 'OD') : null;
  addStep(trace, {
    kind: 'result',
    label: 'Conservative bound',
    detail: applied.length > 0
      ? `NOHD ${fmt(nohd)} m, OD ${fmt(od)}, limit ${fmt(limitE)} W/m²; the tolerance that moves the result most: ${dominantInput !== null && dominantMoves !== null ? `${toleranceWords(dominantInput)} (moves the ${dominantMoves} most)` : 'none (no tolerance moves the result)'}`
      : 'no tolerances given: the conservative bound equals the nominal value',
  });
  return {
    bounds: {
      nohd_m: { nominal: rec(nominal.nohd), conservative: rec(nohd) },
      odRequired: { nominal: rec(nominal.od), conservative: rec(od) },
      limit_E_Wm2: { nominal: rec(nominal.limitE), conservative: rec(limitE) },
      dominantInput,
      ...(dominantMoves !== null ? { dominantMoves } : {}),
    },
    trace,
  };
}
