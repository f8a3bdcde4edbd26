/**
 * evaluateBeam: everything an officer needs for one beam (one wavelength, one operating mode):
 * the eye and skin limits with all pulse rules, the direct NOHD, the hazard distances of every
 * stated viewing condition, the required OD and EN 207 / EN 208 scale numbers, a class estimate,
 * the bounds from input tolerances, warnings for unusual inputs, and the full trace.
 * Results support, and do not replace, the judgement of the site laser safety officer.
 */
import { Dec } from '../numeric/decimal.js';
import { InputError } from '../errors.js';
import type { BeamInput, LimitSettings, RuleSetId } from '../model/inputs.js';
import { RESULT_CAUTION, type BeamResult, type DistanceResult } from '../model/results.js';
import { RULE_SET_NAME } from '../limits/rule-sets.js';
import { defaultExposureDuration } from '../limits/durations.js';
import { formatSI } from '../units/quantities.js';
import { numberText, odText, quantityText } from '../units/display.js';
import { addStep, allSteps, newTrace } from '../trace/trace.js';
import { beamModel, describeBeam, type BeamModel } from './beam-model.js';
import { tissueLimits, type TissueLimits } from './tissue-limits.js';
import { validateBeamInput } from './validate-beam.js';
import { entryWords } from '../model/input-words.js';
import { withLargeSkinArea } from './skin-large-area.js';
import { distanceReported, fmt, maxOf, rec } from './format.js';
import { computeBounds } from './bounds.js';
import { summaryByMargin } from './governing-by-margin.js';
import { distanceOver } from '../hazard/distance.js';
import { aidedGain, aidedSpec, directSpec, lensSpec, multimodeFiberSpec, singlemodeFiberSpec, skinSpec, specularSpec } from '../hazard/geometries.js';
import { diffuseDistance } from '../hazard/diffuse.js';
import { requiredOd, type OdOutcome } from '../eyewear/od.js';
import { en207Requirements } from '../eyewear/en207.js';
import { en208Requirement } from '../eyewear/en208.js';
import { classRank, estimateClass } from '../classes/estimate.js';
import { onBandEdge } from '../limits/rule-sets.js';

/** Band edges of the class estimate's own tables (core/classes/aels.ts). */
const CLASS_BAND_EDGES_NM: readonly number[] = [302.5, 400, 700, 1050, 1400, 4000];

export interface BeamContext {
  /** Path prefix for field names in errors, e.g. 'lasers[2].beams[0].'. */
  readonly fieldPrefix?: string;
  readonly laserId?: string;
  readonly roomRuleSet?: RuleSetId;
  readonly roomSettings?: LimitSettings;
  readonly fallbackId?: string;
}

/** Map a field named by a limit function to the beam input's own path. */
// Stryker disable next-line ObjectLiteral: a static table, and unreachable: every field a limit function refuses is refused first by validateBeamInput with the full path (test/mutation/EQUIVALENT.md)
const LIMIT_FIELD: Readonly<Record<string, string>> = {
  wavelength_nm: 'wavelength_nm',
  duration_s: 'exposureDuration_s',
  exposureDuration_s: 'exposureDuration_s',
  pulseDuration_s: 'emission.pulseDuration_s',
  repetitionRate_Hz: 'emission.repetitionRate_Hz',
  sourceAngle_rad: 'sourceAngle_rad',
  ruleSet: 'ruleSet',
  tissue: 'tissue',
};

function rethrowWithPath<T>(prefix: string, fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    // Stryker disable next-line BlockStatement: unreachable mapping: validation refuses first with the full path; the lens error already carries the prefix and is rethrown the same (test/mutation/EQUIVALENT.md)
    if (err instanceof InputError) {
      // Stryker disable next-line ConditionalExpression: unreachable mapping, as above (test/mutation/EQUIVALENT.md)
      const field = err.field.startsWith(prefix) && prefix !== '' ? err.field : `${prefix}${LIMIT_FIELD[err.field] ?? err.field}`;
      // Stryker disable next-line ConditionalExpression,EqualityOperator: unreachable mapping, as above: every variant rethrows an error with the same code, field, value and range (test/mutation/EQUIVALENT.md)
      if (field === err.field) throw err;
      throw new InputError(err.code, field, err.value, err.validRange);
    }
    throw err;
  }
}

function emissionSummary(input: BeamInput): string {
  const e = input.emission;
  if (e.kind === 'cw') return `CW ${formatSI(String(e.power_W), 'W')}`;
  return `pulsed ${formatSI(String(e.pulseEnergy_J), 'J')} per pulse, ${formatSI(String(e.pulseDuration_s), 's')}` + (e.repetitionRate_Hz !== undefined ? `, ${formatSI(String(e.repetitionRate_Hz), 'Hz')}` : ', single pulse');
}

/** Public API: evaluate one beam. Throws InputError naming the field for any invalid input. */
export function evaluateBeam(input: BeamInput): BeamResult {
  return evaluateBeamIn(input, {});
}

export function evaluateBeamIn(input: BeamInput, ctx: BeamContext): BeamResult {
  return evaluateBeamDetailed(input, ctx).result;
}

/** The result plus the internal pieces a room evaluation needs (limits, OD outcome). */
export interface BeamEvaluation {
  readonly result: BeamResult;
  readonly eye: TissueLimits;
  readonly skin: TissueLimits;
  readonly od: OdOutcome;
  readonly model: BeamModel;
  /** A lens is on the beam path (its focus can bring the whole beam inside the aperture). */
  readonly lensPresent: boolean;
}

export function evaluateBeamDetailed(input: BeamInput, ctx: BeamContext): BeamEvaluation {
  const prefix = ctx.fieldPrefix ?? '';
  const ruleSet = validateBeamInput(input, prefix, ctx.roomRuleSet);
  return rethrowWithPath(prefix, () => evaluateValid(input, ruleSet, input.settings ?? ctx.roomSettings, ctx));
}

function evaluateValid(input: BeamInput, ruleSet: RuleSetId, settings: LimitSettings | undefined, ctx: BeamContext): BeamEvaluation {
  const lambda = input.wavelength_nm;
  const beamId = input.id ?? ctx.fallbackId ?? `beam-${lambda}nm`;
  const label = input.label ?? `${lambda} nm ${input.emission.kind === 'cw' ? 'CW' : 'pulsed'}`;
  const warnings: string[] = [];
  const trace = newTrace(`Beam ${label} (${RULE_SET_NAME[ruleSet]})`);
  addStep(trace, { kind: 'note', label: 'Caution', detail: RESULT_CAUTION });
  addStep(trace, { kind: 'input', label: 'Wavelength', detail: `${lambda} nm`, value: String(lambda), unit: 'nm' });
  addStep(trace, { kind: 'input', label: 'Emission', detail: emissionSummary(input) });
  const m = beamModel(input.beam);
  addStep(trace, { kind: 'input', label: 'Beam', detail: `diameter ${input.beam.diameter_m} m, divergence ${input.beam.divergence_rad} rad, definition ${input.beam.definition}, profile ${m.profile}${m.elliptical ? `, second axis ${input.beam.diameterY_m ?? input.beam.diameter_m} m / ${input.beam.divergenceY_rad ?? input.beam.divergence_rad} rad` : ''}` });
  addStep(trace, { kind: 'assumption', label: 'Definition', detail: `${m.conversion}: ${describeBeam(m)}`, source: 'domain notes 1.1 (derived)', confidence: 'derived' });
  if (m.definitionWarning) {
    warnings.push(m.definitionWarning);
    addStep(trace, { kind: 'warning', label: 'Beam definition', detail: m.definitionWarning });
  }

  // Exposure durations (common practice, core/limits/durations.ts).
  const dd = defaultExposureDuration(lambda);
  const T = input.exposureDuration_s ?? dd.duration_s;
  const durationWhy = input.exposureDuration_s !== undefined ? 'given by the caller' : `${dd.why} (${dd.basis})`;
  const visible = lambda >= 400 && lambda <= 700;
  if (!visible && T === 0.25) {
    const w = `Exposure duration 0.25 s for an invisible beam (${lambda} nm): the aversion response only works for visible light; 10 s (infrared) or 30 000 s (ultraviolet) is the usual assumption.`;
    warnings.push(w);
    addStep(trace, { kind: 'warning', label: 'Exposure duration', detail: w });
  }
  if (visible && input.exposureDuration_s === undefined) {
    addStep(trace, { kind: 'note', label: 'Exposure duration', detail: 'the 0.25 s default covers unintended viewing only; deliberate viewing or tasks such as alignment need a longer duration (common practice)' });
  }
  const skinT = input.exposureDuration_s ?? (lambda < 400 ? 30000 : 10);
  const skinWhy = input.exposureDuration_s !== undefined ? 'given by the caller' : lambda < 400 ? 'ultraviolet: 30 000 s (common practice)' : 'skin: no aversion response, 10 s (common practice, ours)';
  const base = {
    ruleSet,
    wavelength_nm: lambda,
    emission: input.emission,
    ...(input.sourceAngle_rad !== undefined ? { sourceAngle_rad: input.sourceAngle_rad } : {}),
    ...(settings !== undefined ? { settings } : {}),
  };
  const eye: TissueLimits = tissueLimits({ ...base, tissue: 'eye', exposureDuration_s: T, durationWhy });
  const large = withLargeSkinArea(tissueLimits({ ...base, tissue: 'skin', exposureDuration_s: skinT, durationWhy: skinWhy }), lambda, skinT, input.emission, input.skinArea_m2);
  const skin: TissueLimits = large.skin;
  for (const w of eye.warnings) warnings.push(w);
  if (input.emission.kind === 'pulsed' && input.emission.pulseDuration_s < 1e-13) {
    // Decision (SAFETY.md): the tables stop at 100 fs; the 100 fs limit is kept and, in conservative
    // mode, scaled by t/1e-13 (read as a peak irradiance held constant, ours). Flagged at the top of the trace.
    addStep(trace, {
      kind: 'warning',
      label: 'Pulse shorter than 100 fs',
      detail: `pulse duration ${formatSI(String(input.emission.pulseDuration_s), 's')} is below the shortest row of the limit tables (100 fs); ${eye.shortPulseFactor.lt(1) ? `the 100 fs limits are scaled by t/1e-13 = ${fmt(eye.shortPulseFactor)} (conservative mode, ours)` : 'the 100 fs limits are used unchanged (conservative mode off)'}; no standard gives limits this short, verify with the laser safety officer`,
      confidence: 'ours',
    });
  }
  const replaced = [...new Set([...eye.summary.conservativeReplacements, ...skin.summary.conservativeReplacements])].filter((x) => x !== 'pulse-shorter-than-tables');
  if (replaced.length) {
    warnings.push(`Conservative mode: unverified limit-table entries were replaced by stricter values (${replaced.map(entryWords).join('; ')}); the limits may be lower than the published ones until verified.`);
  }
  // A row or factor the officer checked as 'differs' is flagged on every result that uses it (issue 12).
  const differs = new Set<string>();
  for (const st of [...allSteps(eye.trace), ...allSteps(skin.trace)]) {
    if (st.kind === 'warning' && (/^Checked row \S+ differs$/.test(st.label) || st.label.startsWith('Checked factor differs'))) differs.add(st.detail);
  }
  for (const d of differs) warnings.push(`Limit-table ${d}.`);
  trace.children.push(eye.trace, skin.trace);
  if (large.trace) trace.children.push(large.trace);

  const v = input.viewing ?? {};
  const mu = v.attenuation_per_m !== undefined && v.attenuation_per_m > 0 ? new Dec(v.attenuation_per_m) : undefined;
  if (mu) addStep(trace, { kind: 'assumption', label: 'Atmospheric attenuation', detail: `mu = ${fmt(mu)} 1/m credited on the direct, specular and aided paths (Beer-Lambert; optional, from memory for ANSI Z136.6; ignoring it is the conservative default)`, confidence: 'from memory' });

  const distances: DistanceResult[] = [];
  const direct = distanceOver(eye, directSpec(m, eye.S, mu));
  distances.push(direct.result);
  trace.children.push(direct.result.trace);

  let nhzDiffuse: Dec | null = null;
  if (v.diffuse) {
    // Two viewing cases (decision recorded in SAFETY.md): accidental viewing over the beam's exposure
    // duration, and deliberate viewing of the spot (alignment on a card or screen) over a long
    // duration, 600 s by default (customary for deliberate viewing of diffuse reflections, from
    // memory). Both are shown; the officer says which governs, else the larger distance does.
    const Td = v.diffuse.deliberateDuration_s ?? 600;
    const deliberateWhy = v.diffuse.deliberateDuration_s !== undefined ? 'deliberate viewing of the diffuse spot, given by the caller' : 'deliberate viewing of the diffuse spot: 600 s (customary value, from memory)';
    const eyeDeliberate = tissueLimits({ ...base, tissue: 'eye', exposureDuration_s: Td, durationWhy: deliberateWhy });
    const acc = diffuseDistance(eye, m, v.diffuse);
    const del = diffuseDistance(eyeDeliberate, m, v.diffuse);
    const choice = v.diffuse.governs ?? (del.r.gt(acc.r) ? 'deliberate' : 'accidental');
    const why = v.diffuse.governs !== undefined ? 'chosen by the officer' : 'the larger distance (no choice given)';
    const cases = [
      { o: acc, viewing: 'accidental' as const, T: eye.summary.exposureDuration_s, lim: eye },
      { o: del, viewing: 'deliberate' as const, T: eyeDeliberate.summary.exposureDuration_s, lim: eyeDeliberate },
    ];
    for (const c of cases) {
      const governs = c.viewing === choice;
      const t = c.o.result.trace;
      if (c.viewing === 'deliberate') t.children.unshift(eyeDeliberate.trace);
      addStep(t, {
        kind: 'assumption',
        label: 'Viewing case',
        detail: `${c.viewing === 'accidental' ? 'accidental viewing' : 'deliberate viewing of the spot'} over ${fmt(new Dec(c.T))} s (${c.lim.summary.durationWhy}); ${governs ? `this case governs: ${why}` : `shown for comparison; the ${choice} case governs (${why})`}`,
        confidence: c.viewing === 'deliberate' && v.diffuse.deliberateDuration_s === undefined ? 'from memory' : 'common practice',
      });
      // keys in the order of the result schema (trace last), so an export imported and exported again is byte-identical
      const { trace: caseTrace, ...head } = c.o.result;
      distances.push({ ...head, label: `${c.o.result.label}, ${c.viewing} viewing (${fmt(new Dec(c.T))} s)`, viewing: c.viewing, exposureDuration_s: c.T, governs, trace: caseTrace });
      trace.children.push(t);
      if (governs) {
        nhzDiffuse = c.o.r;
        const d = c.o;
        if (d.viewer && d.viewer.ratio.gt(1)) {
          // readable figures in the sentence (3 significant figures; ratio and OD rounded UP); the full values are in the trace
          warnings.push(`Diffuse reflection (${c.viewing} viewing, ${quantityText(new Dec(c.T), 's')}): ${quantityText(d.viewer.distance_m, 'm', { round: 'nearest' })} from the surface the exposure is ${numberText(d.viewer.ratio, { round: 'up' })} times the limit (OD ${odText(d.viewer.od)} needed for diffuse viewing there).`);
        }
      }
    }
  }
  if (v.specular) {
    const s = distanceOver(eye, specularSpec(m, eye.S, new Dec(v.specular.reflectance), v.specular.pathToSurface_m !== undefined ? new Dec(v.specular.pathToSurface_m) : undefined, mu));
    distances.push(s.result);
    trace.children.push(s.result.trace);
  }
  if (v.lens) {
    const f = new Dec(v.lens.focalLength_m);
    // b0: beam on the lens in the beam's own definition, converted like the exit diameter; default
    // the exit diameter (the beam only grows, so the exit value is the smaller, conservative b0).
    // Elliptical beam: the smaller axis (slower spread past the focus, longer distance).
    const b0 = v.lens.beamDiameterAtLens_m !== undefined ? new Dec(v.lens.beamDiameterAtLens_m).mul(m.factor) : Dec.min(m.a, m.ay);
    if (b0.isZero()) throw new InputError('missing', `${ctx.fieldPrefix ?? ''}viewing.lens.beamDiameterAtLens_m`, undefined, 'the beam diameter on the lens in m (the exit diameter is 0)');
    const b0Text = `${fmt(b0.mul(1000))} mm (1/e)` + (v.lens.beamDiameterAtLens_m === undefined ? ', taken as the exit diameter' : '');
    const l = distanceOver(eye, lensSpec(eye.S, f, b0, b0Text));
    distances.push(l.result);
    trace.children.push(l.result.trace);
  }
  if (v.fiber) {
    const NA = new Dec(v.fiber.numericalAperture);
    const spec = v.fiber.kind === 'multimode' ? multimodeFiberSpec(eye.S, NA) : singlemodeFiberSpec(eye.S, new Dec(lambda).mul('1e-9'), new Dec(v.fiber.modeFieldDiameter_m as number), NA);
    const fr = distanceOver(eye, spec);
    distances.push(fr.result);
    trace.children.push(fr.result.trace);
  }
  if (v.aided) {
    const M = new Dec(v.aided.magnification);
    const D0 = new Dec(v.aided.objectiveDiameter_m);
    const tau = new Dec(v.aided.transmission ?? 1);
    const a = distanceOver(eye, aidedSpec(m, eye.S, M, D0, tau, mu));
    distances.push(a.result);
    trace.children.push(a.result.trace);
    const gain = aidedGain(M, D0, tau, a.governing.aperture_m);
    if (gain.lte(1)) addStep(a.result.trace, { kind: 'note', label: 'Gain', detail: `K*tau = ${fmt(gain)} <= 1: the instrument collects no more than the naked eye; the direct NOHD governs` });
    if (v.aided.transmission === undefined) addStep(a.result.trace, { kind: 'assumption', label: 'Transmission', detail: 'not given: tau = 1 (the conservative value)' });
  }
  const skinD = distanceOver(skin, skinSpec(m, skin.S, mu));
  distances.push(skinD.result);
  trace.children.push(skinD.result.trace);

  // Required OD and scale numbers at the worst reachable position.
  const position = v.closestApproach_m ?? 0;
  const od = requiredOd(eye, m, lambda, position, v.lens !== undefined);
  trace.children.push(od.requirement.trace);
  // The summaries name the row with the lowest margin, which over its own aperture is not always the lowest limit.
  const eyeSummary = summaryByMargin(eye, od, input.emission);
  // Stryker disable next-line ConditionalExpression,EqualityOperator: the skin criteria share one aperture and one S, so the lowest-limit summary is the same with or without the lens bound; the skin OD is not reported (test/mutation/EQUIVALENT.md)
  const skinSummary = summaryByMargin(skin, requiredOd(skin, m, lambda, position, v.lens !== undefined), input.emission);
  for (const g of [eyeSummary, skinSummary]) if (g.step) addStep(trace, g.step);
  const conservative = settings?.conservative !== false;
  const scaleNumbers = en207Requirements({ wavelength_nm: lambda, model: m, position_m: position, emission: input.emission, needed: od.od.gt(0), conservative });
  const rb = en208Requirement({ wavelength_nm: lambda, model: m, position_m: position, emission: input.emission });
  if (rb) scaleNumbers.push(od.od.gt(0) || rb.scale === 0 ? rb : { ...rb, scale: 0, note: `exposure below the limit: no filter needed; ${rb.note}` });
  const snTrace = newTrace('EN 207 / EN 208 scale numbers');
  addStep(snTrace, {
    kind: 'formula',
    label: 'Method',
    detail: 'N = ceil(log10(X/X1)) + 1 from the EN 207 table (LB) or the EN 208 table (RB, visible only), rounded up to the next table step',
    source: 'EN 207:2017 via [WIKI-EN207] (secondary); EN 208:2009 Table B.1 via [SUP-EN208] (read, RB1)',
    confidence: 'secondary; mode boundaries, N^(1/4) rule and beam-size rule from memory (domain notes section 10 items 4, 5)',
  });
  for (const s of scaleNumbers) addStep(snTrace, { kind: s.applies ? 'result' : 'note', label: s.mode, detail: s.note, value: s.applies ? `${s.mode === 'RB' ? 'RB' : 'LB'}${s.scale}` : 'n/a' });
  trace.children.push(snTrace);

  const classQuery = { ruleSet, emission: input.emission, model: m, ...(input.sourceAngle_rad !== undefined ? { sourceAngle_rad: input.sourceAngle_rad } : {}), ...(settings !== undefined ? { settings } : {}) };
  let classEstimate = estimateClass({ ...classQuery, wavelength_nm: lambda });
  if (onBandEdge(ruleSet, lambda) || CLASS_BAND_EDGES_NM.includes(lambda)) {
    // Exactly on a band edge (400 nm: ultraviolet and visible rows; 700 nm; 1400 nm ...) the class
    // bands of both sides meet: the estimate is taken just beside the edge on either side as well,
    // and the highest class is reported (the safe side; the same rule as for the limits).
    for (const side of [lambda * (1 - 1e-8), lambda * (1 + 1e-8)]) {
      let other;
      try {
        other = estimateClass({ ...classQuery, wavelength_nm: side });
      } catch {
        continue; // beside the ends of the tables
      }
      if (classRank(other.estimate) > classRank(classEstimate.estimate)) {
        addStep(other.trace, { kind: 'note', label: 'Band edge', detail: `${lambda} nm is exactly on a band edge: the estimate just beside it (${side.toPrecision(10)} nm) is the higher one and is reported`, confidence: 'ours' });
        classEstimate = { ...other, decidedBy: `${other.decidedBy} (band edge at ${lambda} nm, evaluated on both sides)` };
      }
    }
  }
  trace.children.push(classEstimate.trace);

  const nominal = { nohd: direct.r, od: od.od, limitE: new Dec(eye.summary.E_Wm2) };
  const { bounds, trace: bTrace } = computeBounds(input, ruleSet, settings, nominal);
  trace.children.push(bTrace);

  const largest = maxOf(distances.filter((d) => d.kind !== 'skin' && d.governs !== false).map((d) => new Dec(d.distance_m)));
  addStep(trace, {
    kind: 'result',
    label: 'Summary',
    detail: `NOHD ${direct.result.distance_m_reported} m (${direct.result.governingRule}); largest ocular hazard distance ${distanceReported(largest)} m; required OD ${od.requirement.odRequired_reported}; skin ${skinD.result.distance_m_reported} m; class estimate ${classEstimate.estimate}`,
  });

  const result: BeamResult = {
    beamId,
    label,
    ...(ctx.laserId !== undefined ? { laserId: ctx.laserId } : {}),
    ruleSet,
    ruleSetName: RULE_SET_NAME[ruleSet],
    wavelength_nm: lambda,
    emissionSummary: emissionSummary(input),
    mpe: eyeSummary.summary,
    skinMpe: skinSummary.summary,
    nohd_m: direct.result.distance_m,
    nohd_m_reported: direct.result.distance_m_reported,
    odRequired: od.requirement.odRequired_reported,
    od: od.requirement,
    distances,
    nhzDiffuse_m: nhzDiffuse ? rec(nhzDiffuse) : null,
    skinHazardDistance_m: skinD.result.distance_m,
    scaleNumbers,
    classEstimate,
    bounds,
    warnings,
    trace,
  };
  return { result, eye, skin, od, model: m, lensPresent: v.lens !== undefined };
}
