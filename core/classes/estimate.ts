/**
 * Class ESTIMATE from the accessible emission limits of IEC 60825-1:2014 (domain notes 3.1-3.3).
 * Always labelled an estimate: classification is the manufacturer's duty; the LSO verifies it.
 *
 * Accessible emission (AE) is the power or energy through a measurement aperture (peak convention,
 * never below the true fraction, so the estimate errs toward the higher class):
 *  - naked eye (Condition 3): the limiting aperture of the band at 100 mm from the exit;
 *  - telescope (Condition 1, 302.5-4000 nm): 50 mm at 2000 mm, compared with the same AELs.
 * Measurement conditions FROM MEMORY (IEC 60825-1:2014 Table 10; domain notes section 10 item 7).
 * A class holds when the AE stays within its AEL under EVERY limit criterion (for pulses: single
 * pulse, average power and pulse train, reused from the exposure-limit pulse rules, IEC 4.3 f).
 * Decision: 1 / 1M / 2 / 2M / 3R / 3B / 4 as in GOST IEC 60825-1-2013 (read) for the M classes.
 */
import { Dec, PI } from '../numeric/decimal.js';
import type { LimitSettings, RuleSetId } from '../model/inputs.js';
import type { ClassEstimate, LaserClass } from '../model/results.js';
import { addStep, newTrace } from '../trace/trace.js';
import type { BeamModel } from '../beam/beam-model.js';
import { tissueLimits, type Criterion, type TissueLimits, type TissueQuery } from '../beam/tissue-limits.js';
import { fmt } from '../beam/format.js';
import { CLASS2_CW_W, CLASS3R_VISIBLE_CW_W, class3bCw, class3bPulse, classTimeBase, has3R, hasMClasses, isClass2Band } from './aels.js';

export const CLASS_CAVEAT =
  "Estimate from the accessible emission limits of IEC 60825-1:2014 (many values from memory, verify before relying on them); the manufacturer's classification governs.";

export interface ClassQuery {
  readonly ruleSet: RuleSetId;
  readonly wavelength_nm: number;
  readonly emission: TissueQuery['emission'];
  readonly model: BeamModel;
  readonly sourceAngle_rad?: number;
  readonly settings?: LimitSettings;
}

const CLASS_ORDER: readonly LaserClass[] = ['1', '1M', '2', '2M', '3R', '3B', '4'];

export function classRank(c: LaserClass): number {
  return CLASS_ORDER.indexOf(c);
}

/** Fraction of the beam through an aperture D at distance z (peak convention, at most 1). */
function fractionThrough(m: BeamModel, D: Dec, z: Dec): Dec {
  const dx = m.a.plus(m.phi.mul(z));
  const dy = m.ay.plus(m.phiy.mul(z));
  const f = D.mul(D).div(Dec.max(dx, D).mul(Dec.max(dy, D)));
  return Dec.min(new Dec(1), f);
}

/** AEL per criterion (limit x aperture area), memoised per criteria list (independent of power and beam). */
const aelMemo = new WeakMap<readonly Criterion[], Dec[]>();
function aelsOf(criteria: readonly Criterion[]): Dec[] {
  let a = aelMemo.get(criteria);
  // Stryker disable next-line ConditionalExpression: the AEL memo: recomputed every time, the same values, only slower (test/mutation/EQUIVALENT.md)
  if (!a) {
    a = criteria.map((c) => c.L.mul(PI).mul(c.aperture_m).mul(c.aperture_m).div(4));
    aelMemo.set(criteria, a);
  }
  return a;
}

/** Largest AE/AEL over the criteria, AEL = limit x aperture area; AE through that aperture at z (or through D_fixed). */
function ratioOver(tl: TissueLimits, m: BeamModel, z: Dec, fixed?: Dec): { ratio: Dec; ael: Dec; ae: Dec } {
  let best: { ratio: Dec; ael: Dec; ae: Dec } | null = null;
  const aels = aelsOf(tl.criteria);
  for (let i = 0; i < tl.criteria.length; i++) {
    const c = tl.criteria[i] as Criterion;
    const ael = aels[i] as Dec;
    const ae = tl.S.mul(fractionThrough(m, fixed ?? c.aperture_m, z));
    const ratio = ae.div(ael);
    if (!best || ratio.gt(best.ratio)) best = { ratio, ael, ae };
  }
  if (!best) throw new Error('internal: no criteria');
  return best;
}

export function estimateClass(q: ClassQuery): ClassEstimate {
  const trace = newTrace('Class estimate (IEC 60825-1:2014 accessible emission limits)');
  const lambda = q.wavelength_nm;
  const m = q.model;
  const unit = q.emission.kind === 'cw' ? 'W' : 'J';
  const tb = classTimeBase(lambda);
  const base = {
    ruleSet: q.ruleSet,
    tissue: 'eye' as const,
    wavelength_nm: lambda,
    emission: q.emission,
    ...(q.sourceAngle_rad !== undefined ? { sourceAngle_rad: q.sourceAngle_rad } : {}),
    ...(q.settings !== undefined ? { settings: q.settings } : {}),
  };
  addStep(trace, { kind: 'note', label: 'Estimate', detail: CLASS_CAVEAT, confidence: 'from memory' });
  const z100 = new Dec('0.1');
  const z2000 = new Dec('2');
  const D50 = new Dec('0.05');
  const tl1 = tissueLimits({ ...base, exposureDuration_s: tb.T, durationWhy: tb.why });
  trace.children.push(tl1.trace);
  const c1n = ratioOver(tl1, m, z100);
  const mBand = hasMClasses(lambda);
  const c1a = mBand ? ratioOver(tl1, m, z2000, D50) : null;
  addStep(trace, {
    kind: 'formula',
    label: 'Class 1',
    detail: `AEL = exposure limit at the time base x aperture area (derived) = ${fmt(c1n.ael)} ${unit}; naked eye (aperture at 100 mm) AE = ${fmt(c1n.ae)} ${unit}` + (c1a ? `; telescope (50 mm at 2 m) AE = ${fmt(c1a.ae)} ${unit}` : ''),
    value: fmt(c1n.ratio),
    unit: 'x AEL',
    source: 'IEC 60825-1:2014 4.3 and Table 10 (from memory; domain notes section 10 item 7); relation checked against 0.39 mW and 10 mW (domain notes 3.2)',
    confidence: 'derived / from memory',
  });

  // Class 2 (visible only): 1 mW for CW (published), the 0.25 s limit x 7 mm area for pulses (derived).
  let c2n: Dec | null = null;
  let c2a: Dec | null = null;
  let ael2Text = '';
  if (isClass2Band(lambda)) {
    if (q.emission.kind === 'cw') {
      const S = new Dec(q.emission.power_W);
      const D = new Dec(tl1.summary.aperture_m);
      c2n = S.mul(fractionThrough(m, D, z100)).div(CLASS2_CW_W);
      c2a = S.mul(fractionThrough(m, D50, z2000)).div(CLASS2_CW_W);
      ael2Text = '1 mW (published: lasersafe.de; Seibersdorf Laboratories)';
    } else {
      const tl2 = tissueLimits({ ...base, exposureDuration_s: 0.25, durationWhy: 'Class 2 time base 0.25 s (IEC 60825-1:2014 4.3, from memory)' });
      trace.children.push(tl2.trace);
      const r2 = ratioOver(tl2, m, z100);
      c2n = r2.ratio;
      c2a = ratioOver(tl2, m, z2000, D50).ratio;
      ael2Text = `${fmt(r2.ael)} J per pulse (0.25 s limit x aperture area, derived)`;
    }
    // Stryker disable next-line ConditionalExpression,EqualityOperator: the confidence wording of the Class 2 trace step only (test/mutation/EQUIVALENT.md)
    addStep(trace, { kind: 'formula', label: 'Class 2', detail: `AEL ${ael2Text}; naked eye ${fmt(c2n)} x AEL, telescope ${fmt(c2a)} x AEL`, value: fmt(c2n), unit: 'x AEL', confidence: q.emission.kind === 'cw' ? 'secondary' : 'derived' });
  }

  // Class 3R: 5 x Class 2 in 400-700 nm, 5 x Class 1 elsewhere from 302.5 nm (SCITEC, APINEX; secondary).
  let c3r: Dec | null = null;
  if (has3R(lambda)) {
    if (c2n && q.emission.kind === 'cw') {
      const S = new Dec(q.emission.power_W);
      c3r = S.mul(fractionThrough(m, new Dec(tl1.summary.aperture_m), z100)).div(CLASS3R_VISIBLE_CW_W);
    } else {
      c3r = (c2n ?? c1n.ratio).div(5);
    }
    addStep(trace, { kind: 'formula', label: 'Class 3R', detail: `AEL 5 x Class ${c2n ? '2' : '1'} (5 mW for visible CW); naked eye ${fmt(c3r)} x AEL`, value: fmt(c3r), unit: 'x AEL', source: 'lasersafe.de; Seibersdorf Laboratories (published)', confidence: 'secondary' });
  }

  // Class 3B: 0.5 W CW (published), pulse values from memory.
  const cw3b = class3bCw(lambda);
  const D = new Dec(tl1.summary.aperture_m);
  const fr = fractionThrough(m, D, z100);
  let c3b: Dec;
  let c3bA: Dec;
  let text3b: string;
  const fa = fractionThrough(m, D50, z2000);
  if (q.emission.kind === 'cw') {
    const S = new Dec(q.emission.power_W);
    c3b = S.mul(fr).div(cw3b.value);
    c3bA = S.mul(fa).div(cw3b.value);
    text3b = cw3b.text;
  } else {
    const e = q.emission;
    const Q = new Dec(e.pulseEnergy_J);
    const class1PerPulse = c1n.ael;
    const p3b = class3bPulse(lambda, e.pulseDuration_s, class1PerPulse);
    c3b = Q.mul(fr).div(p3b.value);
    c3bA = Q.mul(fa).div(p3b.value);
    text3b = p3b.text;
    if (e.repetitionRate_Hz !== undefined) {
      const mean = Q.mul(e.repetitionRate_Hz);
      c3b = Dec.max(c3b, mean.mul(fr).div(cw3b.value));
      c3bA = Dec.max(c3bA, mean.mul(fa).div(cw3b.value));
      text3b += ` and mean power ${cw3b.text}`;
    }
  }
  addStep(trace, { kind: 'formula', label: 'Class 3B', detail: `AEL ${text3b}; naked eye ${fmt(c3b)} x AEL`, value: fmt(c3b), unit: 'x AEL', confidence: q.emission.kind === 'cw' ? cw3b.confidence : 'from memory (domain notes section 10 item 6)' });

  let estimate: LaserClass;
  let decidedBy: string;
  const within = (r: Dec | null): boolean => r !== null && r.lte(1);
  if (within(c1n.ratio)) {
    if (!c1a || within(c1a.ratio)) {
      estimate = '1';
      decidedBy = `within the Class 1 AEL (${fmt(c1n.ael)} ${unit}) for the naked eye${c1a ? ' and with telescopic optics' : ''}`;
    } else if (c3bA.lte(1)) {
      estimate = '1M';
      decidedBy = `within the Class 1 AEL for the naked eye but ${fmt(c1a.ratio)} x it through telescopic optics (50 mm at 2 m)`;
    } else {
      estimate = '3B';
      decidedBy = 'within Class 1 for the naked eye, but above the Class 3B AEL through telescopic optics';
    }
  } else if (c2n !== null && within(c2n)) {
    if (within(c2a)) {
      estimate = '2';
      decidedBy = `above the Class 1 AEL but within the Class 2 AEL (${ael2Text})`;
    } else if (c3bA.lte(1)) {
      estimate = '2M';
      decidedBy = `within the Class 2 AEL for the naked eye but ${fmt(c2a ?? new Dec(0))} x it through telescopic optics`;
    } else {
      estimate = '3B';
      decidedBy = 'within Class 2 for the naked eye, but above the Class 3B AEL through telescopic optics';
    }
  } else if (c3r !== null && within(c3r)) {
    estimate = '3R';
    decidedBy = `above the Class ${c2n ? '2' : '1'} AEL, within 5 x it (Class 3R AEL)`;
  } else if (c3b.lte(1)) {
    estimate = '3B';
    decidedBy = `above the Class ${has3R(lambda) ? '3R' : '1'} AEL, within the Class 3B AEL (${text3b})`;
  } else {
    estimate = '4';
    decidedBy = `Class 3B AEL (${text3b}) exceeded ${fmt(c3b)} times`;
  }
  addStep(trace, { kind: 'result', label: 'Estimated class', detail: `${estimate}: ${decidedBy}`, value: estimate });
  return { estimate, decidedBy, caveat: CLASS_CAVEAT, trace };
}
