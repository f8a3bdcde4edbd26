/**
 * The beam as the hazard formulas see it (domain notes section 1.1 and 1.2.2):
 *  - every diameter and divergence converted to the 1/e irradiance (= d63 for a Gaussian)
 *    convention, in which 4*Phi/(pi*d^2) is the PEAK irradiance of a Gaussian and the true
 *    irradiance of a top-hat;
 *  - the beam grows linearly, d(r) = a + r*phi (the standards' range-equation model);
 *  - exposure is averaged over the limiting aperture, not over the beam: a beam smaller than the
 *    aperture delivers its power over the aperture area (cap max(d, D_f) on each axis).
 * The peak-over-aperture form is never below the exact Gaussian aperture average
 * Phi*(1 - exp(-D_f^2/d^2))/A_f, so it is the conservative choice (derived).
 */
import { Dec, PI } from '../numeric/decimal.js';
import type { BeamDefinition, BeamGeometry } from '../model/inputs.js';
import { fmt } from './format.js';

export const SQRT2 = new Dec(2).sqrt();

export interface BeamModel {
  /** 1/e (d63) diameter at the exit, x axis, m. */
  readonly a: Dec;
  /** 1/e (d63) diameter at the exit, y axis, m (= a for a round beam). */
  readonly ay: Dec;
  /** 1/e full-angle divergence, x axis, rad. */
  readonly phi: Dec;
  readonly phiy: Dec;
  readonly elliptical: boolean;
  readonly profile: 'gaussian' | 'tophat';
  readonly definition: BeamDefinition;
  /** Factor applied to the input diameter and divergence to reach the 1/e convention. */
  readonly factor: Dec;
  /** One sentence for the trace saying what conversion was made and why. */
  readonly conversion: string;
  /** Set when the stated definition cannot be converted for this profile. */
  readonly definitionWarning: string | null;
}

/**
 * Factor from the stated definition to the 1/e convention for a Gaussian beam (derived, domain
 * notes 1.1): d(1/e) = d(1/e^2)/sqrt(2); d63 = d(1/e). A top-hat has no conversion: its edge is
 * the diameter whatever the definition says.
 */
export function definitionFactor(definition: BeamDefinition, profile: 'gaussian' | 'tophat'): { factor: Dec; conversion: string; warning: string | null } {
  if (profile === 'tophat') {
    return {
      factor: new Dec(1),
      conversion: `top-hat profile: the diameter is the edge of a uniform beam, no conversion (irradiance 4*Phi/(pi*d^2) everywhere inside)`,
      warning:
        definition === 'd63'
          ? null
          : `The beam is marked top-hat but its diameter is given at the ${definition === '1/e2' ? '1/e²' : '1/e'} irradiance points, a Gaussian definition; it was taken as the edge of the flat top. Check the data sheet.`,
    };
  }
  switch (definition) {
    case '1/e':
      return { factor: new Dec(1), conversion: 'diameter and divergence given at the 1/e irradiance points: used as they are (4*Phi/(pi*d^2) is the peak irradiance of a Gaussian beam)', warning: null };
    case 'd63':
      return { factor: new Dec(1), conversion: 'd63 (63 % of the power inside) equals the 1/e irradiance diameter of a Gaussian beam: used as it is', warning: null };
    case '1/e2':
      return {
        factor: new Dec(1).div(SQRT2),
        conversion: 'diameter and divergence given at the 1/e² points: divided by sqrt(2) to reach the 1/e (= d63) convention of the hazard formulas; an unconverted 1/e² value would make the NOHD too short by sqrt(2)',
        warning: null,
      };
  }
}

export function beamModel(g: BeamGeometry): BeamModel {
  const profile = g.profile ?? 'gaussian';
  const { factor, conversion, warning } = definitionFactor(g.definition, profile);
  const a = new Dec(g.diameter_m).mul(factor);
  const phi = new Dec(g.divergence_rad).mul(factor);
  const ay = g.diameterY_m !== undefined ? new Dec(g.diameterY_m).mul(factor) : a;
  const phiy = g.divergenceY_rad !== undefined ? new Dec(g.divergenceY_rad).mul(factor) : phi;
  const elliptical = !ay.eq(a) || !phiy.eq(phi);
  return { a, ay, phi, phiy, elliptical, profile, definition: g.definition, factor, conversion, definitionWarning: warning };
}

export function describeBeam(m: BeamModel): string {
  return m.elliptical
    ? `a = ${fmt(m.a.mul(1000))} x ${fmt(m.ay.mul(1000))} mm, phi = ${fmt(m.phi.mul(1000))} x ${fmt(m.phiy.mul(1000))} mrad (1/e)`
    : `a = ${fmt(m.a.mul(1000))} mm, phi = ${fmt(m.phi.mul(1000))} mrad (1/e)`;
}

/** Geometry of a (possibly elliptical) beam that grows linearly from the exit. */
export interface Spread {
  readonly a: Dec;
  readonly ay: Dec;
  readonly phi: Dec;
  readonly phiy: Dec;
}

export function spreadOf(m: BeamModel): Spread {
  return { a: m.a, ay: m.ay, phi: m.phi, phiy: m.phiy };
}

/**
 * Exposure (W/m² or J/m²) at distance r from a beam carrying S (W or J) through an aperture of
 * diameter cap, peak convention: 4*S*exp(-mu*r) / (pi * max(dx, cap) * max(dy, cap)).
 */
export function exposureAt(S: Dec, s: Spread, cap: Dec, r: Dec, mu?: Dec): Dec {
  const dx = Dec.max(s.a.plus(s.phi.mul(r)), cap);
  const dy = Dec.max(s.ay.plus(s.phiy.mul(r)), cap);
  let x = S.mul(4).div(PI.mul(dx).mul(dy));
  if (mu && !mu.isZero()) x = x.mul(mu.mul(r).neg().exp());
  return x;
}
