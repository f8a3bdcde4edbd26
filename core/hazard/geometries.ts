/**
 * The viewing geometries of one beam, each as a range-equation set-up (domain notes 1.2-1.9).
 * Formulas recalled from ANSI Z136.1 App. B / IEC TR 60825-14 are marked FROM MEMORY (domain notes
 * section 10 items 1-3) in these comments and in the trace's confidence field.
 */
import { Dec, PI } from '../numeric/decimal.js';
import { spreadOf, SQRT2, type BeamModel, type Spread } from '../beam/beam-model.js';
import type { Criterion } from '../beam/tissue-limits.js';
import { fmt } from '../beam/format.js';
import type { DistanceSpec } from './distance.js';

const ZERO = new Dec(0);

function pointSource(phi: Dec): Spread {
  return { a: ZERO, ay: ZERO, phi, phiy: phi };
}

/** Direct (intrabeam) viewing: NOHD = (sqrt(4S/(pi L)) - a)/phi. */
export function directSpec(m: BeamModel, S: Dec, mu: Dec | undefined): DistanceSpec {
  return {
    kind: 'direct',
    label: 'Direct beam (NOHD)',
    measuredFrom: 'the laser exit aperture (or the beam waist the divergence refers to)',
    formula:
      'NOHD = (1/phi) * (sqrt(4*S/(pi*L)) - a), exposure averaged over the limiting aperture (a beam smaller than the aperture is spread over the aperture); zero when the exposure at the exit is below the limit' +
      (m.elliptical ? '; elliptical beam: positive root of (a_x + r*phi_x)(a_y + r*phi_y) = 4S/(pi*L)' : ''),
    source: 'ANSI Z136.1-2014 App. B; IEC TR 60825-14 (domain notes 1.2.1, 1.2.2)',
    confidence: 'from memory (standard form; zero-NOHD rule derived)',
    setup: (c: Criterion) => ({ S, cap: c.aperture_m, spread: spreadOf(m), ...(mu ? { mu } : {}) }),
  };
}

/** Skin: the same range equation with the skin limits and the skin aperture (3.5 mm). */
export function skinSpec(m: BeamModel, S: Dec, mu: Dec | undefined): DistanceSpec {
  return {
    ...directSpec(m, S, mu),
    kind: 'skin',
    label: 'Skin hazard distance',
    source: 'ANSI Z136.1-2014 Table 8 skin aperture; AURPO guidance (domain notes 1.9)',
    confidence: 'from memory',
  };
}

/** Specular reflection from a flat surface: the direct beam with rho_s*S, over the TOTAL path. */
export function specularSpec(m: BeamModel, S: Dec, rho: Dec, path: Dec | undefined, mu: Dec | undefined): DistanceSpec {
  return {
    kind: 'specular',
    label: `Specular reflection (reflectance ${fmt(rho)})`,
    measuredFrom: 'the laser exit, along the total path laser -> surface -> eye',
    formula: 'r = (1/phi) * (sqrt(4*rho_s*S/(pi*L)) - a): a flat mirror-like surface returns the direct beam with power rho_s*S',
    source: 'domain notes 1.5 (derived); specular reflections treated as intrabeam in ANSI Z136.1 section 3',
    confidence: 'derived',
    notes: [
      { label: 'Reflectance', detail: `rho_s = ${fmt(rho)}` },
      ...(path ? [{ label: 'Path to the surface', detail: `${fmt(path)} m from the exit; the reflected beam is hazardous only where the total path is shorter than the distance found` }] : []),
    ],
    setup: (c: Criterion) => ({ S: S.mul(rho), cap: c.aperture_m, spread: spreadOf(m), ...(mu ? { mu } : {}) }),
  };
}

/**
 * Lens on the laser: past the focus the beam diverges at b0/f from a (near) point:
 * r = (f/b0)*sqrt(4S/(pi L)), measured from the focal point. FROM MEMORY (ANSI Z136.1 App. B;
 * domain notes section 10 item 2). A focused spot never raises the exposure above S/A_f.
 */
export function lensSpec(S: Dec, f: Dec, b0: Dec, b0Text: string): DistanceSpec {
  const phi = b0.div(f);
  return {
    kind: 'lens',
    label: `Focused beam behind a lens (f = ${fmt(f.mul(1000))} mm)`,
    measuredFrom: `the focal point (add f = ${fmt(f)} m for the distance from the lens)`,
    formula: 'r = (f/b0) * sqrt(4*S/(pi*L)); past the focus the beam diverges at b0/f; zero when S/A_f <= L',
    source: 'ANSI Z136.1 App. B (domain notes 1.3)',
    confidence: 'from memory (not re-read; domain notes section 10 item 2)',
    notes: [{ label: 'Beam on the lens', detail: `b0 = ${b0Text}; divergence after the focus b0/f = ${fmt(phi.mul(1000))} mrad` }],
    setup: (c: Criterion) => ({ S, cap: c.aperture_m, spread: pointSource(phi) }),
  };
}

/**
 * Multimode fibre: r = (1.7/NA)*sqrt(S/(pi L)), i.e. a point source with 1/e full divergence
 * 2*NA/1.7. FROM MEMORY (ANSI Z136.1 App. B, ANSI Z136.2; domain notes section 10 item 2).
 */
export function multimodeFiberSpec(S: Dec, NA: Dec): DistanceSpec {
  const phi = NA.mul(2).div('1.7');
  return {
    kind: 'fiber',
    label: `Multimode fibre end (NA ${fmt(NA)})`,
    measuredFrom: 'the fibre end',
    formula: 'r = (1.7/NA) * sqrt(S/(pi*L)) (equivalently a point source with 1/e full divergence 2*NA/1.7)',
    source: 'ANSI Z136.1 App. B; ANSI Z136.2 (domain notes 1.6)',
    confidence: 'from memory (factor 1.7 not re-read; domain notes section 10 item 2)',
    setup: (c: Criterion) => ({ S, cap: c.aperture_m, spread: pointSource(phi) }),
  };
}

/**
 * Single-mode fibre: Gaussian far field, 1/e^2 half-angle lambda/(pi*w0):
 * r = (pi*w0/lambda)*sqrt(2S/(pi L)). DERIVED from Gaussian optics, not read from ANSI Z136.2
 * (domain notes section 10 item 1). Uses the mode-field radius, never the nominal NA.
 */
export function singlemodeFiberSpec(S: Dec, lambda_m: Dec, mfd: Dec, NA: Dec): DistanceSpec {
  const w0 = mfd.div(2);
  const theta = lambda_m.div(PI.mul(w0)); // 1/e^2 half angle
  const phi = theta.mul(SQRT2); // 1/e full angle = 2*theta/sqrt(2)
  return {
    kind: 'fiber',
    label: `Single-mode fibre end (mode-field diameter ${fmt(mfd.mul(1e6))} um)`,
    measuredFrom: 'the fibre end',
    formula: 'r = (pi*w0/lambda) * sqrt(2*S/(pi*L)), from the Gaussian far-field 1/e² half-angle lambda/(pi*w0)',
    source: 'domain notes 1.6 (derived from Gaussian optics)',
    confidence: 'derived (not read from ANSI Z136.2; domain notes section 10 item 1)',
    notes: [
      { label: 'Far field', detail: `w0 = ${fmt(w0.mul(1e6))} um; 1/e² half-angle lambda/(pi*w0) = ${fmt(theta.mul(1000))} mrad; nominal NA ${fmt(NA)} not used (it overstates the spread)` },
    ],
    setup: (c: Criterion) => ({ S, cap: c.aperture_m, spread: pointSource(phi) }),
  };
}

/**
 * Optically aided viewing (binoculars, telescope, loupe) with magnification M, objective D0 and
 * transmission tau. Model (derived from first-order optics, stated in the trace):
 *  - the instrument collects the part of the beam inside the objective: all of it while the beam
 *    (1/e diameter d) is narrower than D0, else the share (D0/d)^2 (peak convention, conservative);
 *  - it sends that power out compressed by M: a beam of diameter d/M, or the exit pupil D0/M once the
 *    beam fills the objective;
 *  - the eye averages it over its limiting aperture D_f, times the transmission tau.
 * Exposure at the eye: tau * 4S * min(1, (D0/d)^2) / (pi * max(min(d, D0)/M, D_f)^2), which is the
 * range-equation set-up S_eff = K*tau*S over the cap D_c = D_f*sqrt(K), K = min(M^2, (D0/D_f)^2),
 * i.e. D_c = min(M*D_f, D0) (derived). Far from the laser this is the usual gain K*tau over the naked
 * eye (IEC TR 60825-14 / ANSI Z136.6 approach, from memory; domain notes 1.7 and section 10 item 3).
 * A beam narrower than the objective reaches the eye whole once d/M < D_f: spreading it over the
 * exit pupil (cap D0) under-estimates the hazard.
 */
export function aidedSpec(m: BeamModel, S: Dec, M: Dec, D0: Dec, tau: Dec, mu: Dec | undefined): DistanceSpec {
  return {
    kind: 'aided',
    label: `Optically aided viewing (${fmt(M)}x, objective ${fmt(D0.mul(1000))} mm)`,
    measuredFrom: 'the laser exit aperture',
    formula:
      'collected power = the part of the beam inside the objective D0 (all of it while d < D0, else (D0/d)^2); it leaves the eyepiece compressed to d/M ' +
      '(at most the exit pupil D0/M) and is averaged over the limiting aperture D_f of the eye, times the transmission tau: ' +
      'X = tau*4S*min(1,(D0/d)^2)/(pi*max(min(d,D0)/M, D_f)^2), solved as ENOHD = (1/phi)*(sqrt(K*tau*4*S/(pi*L)) - a) ' +
      'with K = min(M^2, (D0/D_f)^2) and the beam held at no less than D_c = min(M*D_f, D0)',
    source: 'domain notes 1.7 (derived from first-order optics; gain K as in IEC TR 60825-14 and ANSI Z136.6, from memory)',
    confidence: 'derived (gain model not read in the standards; domain notes section 10 item 3)',
    notes: [{ label: 'Instrument', detail: `M = ${fmt(M)}, D0 = ${fmt(D0.mul(1000))} mm, exit pupil D0/M = ${fmt(D0.div(M).mul(1000))} mm, transmission tau = ${fmt(tau)}` }],
    setup: (c: Criterion) => {
      const Df = c.aperture_m;
      const K = aidedK(M, D0, Df);
      return { S: S.mul(tau).mul(K), cap: Dec.min(M.mul(Df), D0), spread: spreadOf(m), ...(mu ? { mu } : {}) };
    },
  };
}

/** K = min(M^2, (D0/D_f)^2): the area gain of the instrument over the eye's limiting aperture. */
function aidedK(M: Dec, D0: Dec, Df: Dec): Dec {
  return Dec.min(D0.div(Df).pow(2), M.pow(2));
}

/** K*tau for the trace and warnings (largest over the criteria's apertures). */
export function aidedGain(M: Dec, D0: Dec, tau: Dec, Df: Dec): Dec {
  return aidedK(M, D0, Df).mul(tau);
}
