// Published worked examples for hazard distances, optical density and EN 207 scale numbers
// (test/fixtures/worked-examples.json: every case of kind irradiance, nohd, diffuse, lens, fiber,
// od and scale_number, each with its source, edition, URL and tolerance). Cases with provenance
// 'derived_from_memory' (diffuse, lens, fibre) have no published output: they are SELF-CONSISTENCY
// checks of the formulas recalled from ANSI Z136.1 App. B / Z136.2, until someone reads the standard.
import { describe, expect, it } from 'vitest';
import {
  Dec,
  diffuseWithLimit,
  en207Band,
  en207Column,
  evaluateBeam,
  fiberWithLimit,
  lensWithLimit,
  nohdWithLimit,
  opticalDensity,
  scaleFor,
  type BeamInput,
  type En207Mode,
} from '../../../core/index.js';
import cases from '../../fixtures/worked-examples.json' with { type: 'json' };

interface Case {
  id: string;
  kind: string;
  source: string;
  provenance: string;
  inputs: Record<string, unknown>;
  expected: Record<string, number>;
  tolerance_rel: number | null;
  tolerance_abs: number | null;
}
const ALL = cases as unknown as Case[];
const num = (x: unknown): number => {
  if (typeof x !== 'number') throw new Error(`not a number: ${String(x)}`);
  return x;
};
const KINDS = ['irradiance', 'nohd', 'diffuse', 'lens', 'fiber', 'od', 'scale_number'];
const mine = ALL.filter((c) => KINDS.includes(c.kind));

function withinRel(got: number, expected: number, c: Case): void {
  const tol = c.tolerance_rel ?? 0;
  expect(Math.abs(got / expected - 1), `${c.id} (${c.source}): got ${got}, expected ${expected} ± ${tol * 100} %`).toBeLessThanOrEqual(tol + 1e-12);
}
function withinAbs(got: number, expected: number, c: Case): void {
  const tol = c.tolerance_abs ?? 0;
  expect(Math.abs(got - expected), `${c.id} (${c.source}): got ${got}, expected ${expected} ± ${tol}`).toBeLessThanOrEqual(tol + 1e-12);
}

/** How each case is run. The source of every case is printed in the fixture and in failure messages. */
const RUNNERS: Record<string, (c: Case) => void> = {
  // Australian university 'Appendix X - Sample Calculations' (2015), p.1: 10 W over a 1 cm disc.
  // Run through evaluateBeam: a 10 mm top-hat is larger than the 7 mm aperture, so the exposure at
  // the exit is the beam's own irradiance P/(pi d^2/4).
  'au-appx-x-irradiance-10W-1cm': (c) => {
    const r = evaluateBeam({ wavelength_nm: 1064, emission: { kind: 'cw', power_W: num(c.inputs['power_W']) }, beam: { diameter_m: num(c.inputs['beam_diameter_m']), divergence_rad: 1e-3, definition: 'd63', profile: 'tophat' } });
    withinRel(Number(r.od.exposure), num(c.expected['irradiance_W_per_m2']), c);
  },
  // The Laser-IPL Guys, ch. 1 p.110: 1 W, 1 mrad, visible, 0.25 s -> 225 m. Exit diameter 0 (case note);
  // divergence taken as the 1/e full angle of the standard formula; 532 nm stands for 'visible'.
  'lipg-ch1-nohd-1W-1mrad': (c) => {
    const r = evaluateBeam({ wavelength_nm: 532, emission: { kind: 'cw', power_W: num(c.inputs['power_W']) }, beam: { diameter_m: 0, divergence_rad: num(c.inputs['divergence_rad']), definition: '1/e' }, exposureDuration_s: num(c.inputs['exposure_duration_s']) });
    withinRel(Number(r.nohd_m), num(c.expected['nohd_m']), c);
  },
  // Derived from memory (ANSI Z136.1 App. B): self-consistency. The case states MPE = 50 W/m².
  'derived-diffuse-1064nm-10W': (c) => {
    const d = diffuseWithLimit({ source: num(c.inputs['power_W']), limit: num(c.inputs['mpe_W_per_m2']), quantity: 'E' }, num(c.inputs['reflectivity']), num(c.inputs['viewing_angle_rad']));
    withinRel(Number(d.distance_m), num(c.expected['nhz_radius_m']), c);
    // Same through evaluateBeam under EU 2006/25/EC, whose 10 s limit at 1064 nm is 50 W/m².
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 1064, emission: { kind: 'cw', power_W: 10 }, beam: { diameter_m: 0.003, divergence_rad: 1e-3, definition: '1/e' }, exposureDuration_s: 10, viewing: { diffuse: { reflectance: 1, viewingAngle_rad: 0 } } });
    withinRel(Number(r.nhzDiffuse_m), num(c.expected['nhz_radius_m']), c);
  },
  'derived-lens-1064nm-10W-f200mm': (c) => {
    const d = lensWithLimit({ source: num(c.inputs['power_W']), limit: num(c.inputs['mpe_W_per_m2']), quantity: 'E' }, num(c.inputs['focal_length_m']), num(c.inputs['beam_diameter_at_lens_m']));
    withinRel(Number(d.distance_m), num(c.expected['nhz_m']), c);
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 1064, emission: { kind: 'cw', power_W: 10 }, beam: { diameter_m: 0.003, divergence_rad: 1e-3, definition: '1/e' }, exposureDuration_s: 10, viewing: { lens: { focalLength_m: 0.2, beamDiameterAtLens_m: 0.003 } } });
    const lens = r.distances.find((x) => x.kind === 'lens');
    withinRel(Number(lens?.distance_m), num(c.expected['nhz_m']), c);
  },
  'derived-fiber-mm-1064nm-1W-NA0p2': (c) => {
    const d = fiberWithLimit({ source: num(c.inputs['power_W']), limit: num(c.inputs['mpe_W_per_m2']), quantity: 'E' }, { kind: 'multimode', numericalAperture: num(c.inputs['fiber_NA']) });
    withinRel(Number(d.distance_m), num(c.expected['nohd_m']), c);
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 1064, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 5e-5, divergence_rad: 0.2, definition: '1/e' }, exposureDuration_s: 10, viewing: { fiber: { kind: 'multimode', numericalAperture: 0.2 } } });
    withinRel(Number(r.distances.find((x) => x.kind === 'fiber')?.distance_m), num(c.expected['nohd_m']), c);
  },
  // Appendix X p.2: OD = log10(3800 mW/cm² / 2.55 mW/cm²) = 3.17, printed 3.2.
  'au-appx-x-od-488nm': (c) => {
    withinAbs(opticalDensity(num(c.inputs['worst_case_exposure_W_per_m2']), num(c.inputs['mpe_W_per_m2'])).toNumber(), num(c.expected['od']), c);
  },
  // The Laser-IPL Guys, ch. 1 p.111-112: 12.5 J/cm² against 5e-6 J/cm² -> OD 6.4.
  'lipg-ch1-od-1064nm-1ns': (c) => {
    withinAbs(opticalDensity(num(c.inputs['incident_radiant_exposure_J_per_m2']), num(c.inputs['mpe_J_per_m2'])).toNumber(), num(c.expected['od']), c);
  },
};

// EN 207 scale numbers (Wikipedia 'EN 207', EN 207:2017 table): the unrounded N and the LB.
function runScale(c: Case): void {
  const modeText = String(c.inputs['mode']);
  const mode: En207Mode = modeText === 'I/R' ? 'I' : (modeText as En207Mode);
  const X = num(c.inputs['power_density_W_per_m2'] ?? c.inputs['energy_density_J_per_m2']);
  const { X1 } = en207Column(en207Band(num(c.inputs['wavelength_nm'])), mode, false);
  const s = scaleFor(new Dec(X), X1);
  expect(s.n, `${c.id} (${c.source})`).toBe(num(c.expected['lb_scale_number']));
  withinAbs(s.unrounded.toNumber(), num(c.expected['n_unrounded']), c);
}

describe('worked examples: hazard distances, OD, scale numbers (test/fixtures/worked-examples.json)', () => {
  it('covers every case of the kinds this module owns', () => {
    for (const c of mine) expect(c.kind === 'scale_number' || c.id in RUNNERS, `no runner for ${c.id}`).toBe(true);
    expect(mine.length).toBeGreaterThanOrEqual(11);
  });
  it.each(mine.map((c) => [c.id, c] as const))('%s', (_id, c) => {
    if (c.kind === 'scale_number') runScale(c);
    else (RUNNERS[c.id] as (c: Case) => void)(c);
  });
});

// Illustrations of the domain notes (derived there from the same formulas; self-consistency).
describe('domain notes illustrations (derived, self-consistency)', () => {
  const base: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } };
  it.each([
    ['1.2.5 NOHD 532 nm 1 W 1 mm 1 mrad 0.25 s', () => Number(evaluateBeam(base).nohd_m), 222.6, 0.001],
    ['1.7 ENOHD with 7x50 binoculars (K = 49)', () => Number(evaluateBeam({ ...base, viewing: { aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 1 } } }).distances.find((d) => d.kind === 'aided')?.distance_m), 1565, 0.003],
    ['2.1 item 7 OD 532 nm 1 W 1 mm = 3.009', () => Number(evaluateBeam(base).od.od), 3.009, 0.001],
    ['1.3 lens 1064 nm 10 W f 0.1 m b0 3 mm, E 50.61 W/m²', () => Number(lensWithLimit({ source: 10, limit: 50.61, quantity: 'E' }, 0.1, 0.003).distance_m), 16.72, 0.003],
    ['1.4 diffuse rho 1', () => Number(diffuseWithLimit({ source: 10, limit: 50.61, quantity: 'E' }, 1, 0).distance_m), 0.2508, 0.003],
    ['1.4 diffuse rho 0.5 at 45 deg', () => Number(diffuseWithLimit({ source: 10, limit: 50.61, quantity: 'E' }, 0.5, Math.PI / 4).distance_m), 0.149, 0.005],
    ['1.6 single-mode 1064 nm 1 W w0 5 um', () => Number(fiberWithLimit({ source: 1, limit: 50.61, quantity: 'E' }, { kind: 'singlemode', numericalAperture: 0.14, modeFieldDiameter_m: 10e-6, wavelength_nm: 1064 }).distance_m), 1.66, 0.005],
    ['2.2 EN 207 D for 1 W, 1 mm, 532 nm: LB6', () => evaluateBeam(base).scaleNumbers.find((s) => s.mode === 'D')?.scale ?? 0, 6, 0],
  ] as const)('%s', (_name, f, expected, rel) => {
    const got = f();
    expect(Math.abs(got / expected - 1)).toBeLessThanOrEqual(rel);
  });
  it('nohdWithLimit agrees with the closed form (sqrt(4P/(pi E)) - a)/phi', () => {
    const d = nohdWithLimit({ source: 1, limit: 25, quantity: 'E' }, { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' });
    expect(Number(d.distance_m)).toBeCloseTo((Math.sqrt(4 / (Math.PI * 25)) - 0.002) / 0.001, 9);
  });
});
