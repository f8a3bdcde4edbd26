/**
 * EN 208 alignment eyewear (RB1-RB5), visible 400-700 nm only: the filter cuts a visible beam down
 * to Class 2 levels so the spot stays visible; not for looking into the beam (EN 208:1994 section 1,
 * read; domain notes 2.3).
 *   RB n: CW and pulses > 2e-4 s up to 0.01*10^(n-1) W; pulses 1e-9..2e-4 s up to 2e-6*10^(n-1) J.
 * Sources: RB1 row and the 2e-4 s split from an EN 208:2009 Table B.1 explainer (read); RB2-RB4 by
 * the decade pattern (secondary: trade article alignment bands); RB5 FROM MEMORY (domain notes
 * section 10 item 5). Selection (EN 208 Annex B, read via the explainer): the power (or energy)
 * through a 7 mm aperture when the beam is larger; pulsed: energy times N^(1/4), N = pulses in 10 s.
 * For pulses longer than 2e-4 s the larger of the pulse's peak power and the mean power is used
 * (ours, stricter). For trains of 1 ns - 2e-4 s pulses the mean power is also checked as for CW and
 * the higher RB governs (ours, stricter; a 1 W train of 10 ns pulses needs at least what 1 W CW
 * needs). Pulses shorter than 1 ns are outside EN 208.
 */
import { Dec } from '../numeric/decimal.js';
import type { ScaleNumberRequirement } from '../model/results.js';
import type { BeamModel } from '../beam/beam-model.js';
import type { Emission } from '../model/inputs.js';
import { fmt, fourthRoot, rec, tenTo } from '../beam/format.js';
import { scaleFor } from './en207.js';

export const RB1_POWER_W = new Dec('0.01');
export const RB1_ENERGY_J = new Dec('2e-6');
export const RB_MAX = 5;
export const RB_CONFIDENCE: Readonly<Record<number, string>> = {
  1: 'read (EN 208:2009 Table B.1 via a supplier explainer)',
  2: 'secondary (decade pattern)',
  3: 'secondary (decade pattern)',
  4: 'secondary (decade pattern)',
  5: 'from memory',
};

export function en208Limit(kind: 'power' | 'energy', n: number): Dec {
  return (kind === 'power' ? RB1_POWER_W : RB1_ENERGY_J).mul(tenTo(n - 1));
}

export function isVisible(wavelength_nm: number): boolean {
  return wavelength_nm >= 400 && wavelength_nm <= 700;
}

const SEVEN_MM = new Dec('0.007');

export interface En208Input {
  readonly wavelength_nm: number;
  readonly model: BeamModel;
  readonly position_m: number;
  readonly emission: Emission;
}

/** RB requirement for a visible beam; null outside 400-700 nm. */
export function en208Requirement(x: En208Input): ScaleNumberRequirement | null {
  if (!isVisible(x.wavelength_nm)) return null;
  const r = new Dec(x.position_m);
  const dx = Dec.max(x.model.a.plus(x.model.phi.mul(r)), SEVEN_MM);
  const dy = Dec.max(x.model.ay.plus(x.model.phiy.mul(r)), SEVEN_MM);
  const share = SEVEN_MM.mul(SEVEN_MM).div(dx.mul(dy)); // fraction through 7 mm (peak convention)
  const e = x.emission;
  let X: Dec;
  let kind: 'power' | 'energy';
  let why: string;
  if (e.kind === 'cw') {
    X = new Dec(e.power_W).mul(share);
    kind = 'power';
    why = 'CW power through a 7 mm aperture';
  } else {
    const Q = new Dec(e.pulseEnergy_J).mul(share);
    const tp = new Dec(e.pulseDuration_s);
    const f = e.repetitionRate_Hz !== undefined ? new Dec(e.repetitionRate_Hz) : null;
    if (tp.lt('1e-9')) {
      return { mode: 'RB', scale: 0, density: '0', densityUnit: 'J', applies: false, note: 'EN 208 covers pulses from 1 ns; shorter pulses need EN 207 eyewear' };
    }
    if (tp.lte('2e-4')) {
      const N = f ? Dec.max(new Dec(1), f.mul(10).floor()) : new Dec(1);
      X = Q.mul(fourthRoot(N));
      kind = 'energy';
      why = `pulse energy through a 7 mm aperture times N^(1/4) (N = ${N.toString()} pulses in 10 s)`;
      if (f) {
        // A fast train also carries its mean power: checked as for CW, the higher RB governs (as
        // EN 207 requires D for trains; ours for EN 208, the stricter reading).
        const pulse = requirementFor(X, 'energy', why);
        const mean = requirementFor(Q.mul(f), 'power', 'mean power of the train through a 7 mm aperture, checked as for CW');
        const governing = mean.scale > pulse.scale ? mean : pulse;
        const other = governing === mean ? pulse : mean;
        return { ...governing, note: `${governing.note} [governs; also checked: ${other.note}]` };
      }
    } else {
      X = Q.div(tp);
      if (f) X = Dec.max(X, Q.mul(f));
      kind = 'power';
      why = 'pulse longer than 2e-4 s: larger of the peak and the mean power through 7 mm (ours, stricter)';
    }
  }
  return requirementFor(X, kind, why);
}

/** RB number for a power (W) or energy (J) through 7 mm, with the note for the trace. */
function requirementFor(X: Dec, kind: 'power' | 'energy', why: string): ScaleNumberRequirement {
  const X1 = kind === 'power' ? RB1_POWER_W : RB1_ENERGY_J;
  const unit = kind === 'power' ? 'W' : 'J';
  // At or below one tenth of RB1 (1 mW, the Class 2 level) no alignment filter is needed.
  if (X.lte(X1.div(10))) {
    return { mode: 'RB', scale: 0, density: rec(X), densityUnit: unit, applies: true, note: `${why} = ${fmt(X)} ${unit}: at or below the Class 2 level, no alignment filter needed` };
  }
  const { n, unrounded } = scaleFor(X, X1);
  const scale = Math.max(1, n);
  const note =
    `${why} = ${fmt(X)} ${unit}; RB1 = ${fmt(X1)} ${unit}; N = ceil(log10(X/X1)) + 1, unrounded ${fmt(unrounded)}` +
    (scale > RB_MAX ? '; above RB5: no EN 208 alignment filter can bring this beam to Class 2 levels, use EN 207 eyewear' : `; RB${scale} row: ${RB_CONFIDENCE[scale] ?? ''}`);
  return { mode: 'RB', scale, density: rec(X), densityUnit: unit, applies: true, note };
}
