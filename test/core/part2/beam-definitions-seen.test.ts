// The beam as the hazard formulas see it (core/beam/beam-model.ts), checked through what the officer
// reads: the NOHD, the warnings, the "Definition" line of the derivation and the exposure curve.
// Sources: domain notes = the project's hazard-distance reference notes (domain.md of the shared reference material
// in the development set-up), sections 1.1 (definitions) and 1.2 (range equation).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, exposureAlongBeam, type BeamInput } from '../../../core/index.js';

/** 532 nm, 0.25 s: E = 18 t^0.75 / t = 25.46 W/m² (EU Directive 2006/25/EC Table 2.2, read). */
const E = (18 * 0.25 ** 0.75) / 0.25;
/** Range equation for a round beam: r = (sqrt(4 S/(pi E)) - a)/phi (domain notes 1.2, ANSI Z136.1 App. B). */
const nohd = (a: number, phi: number): number => (Math.sqrt(4 / (Math.PI * E)) - a) / phi;
const green = (beam: BeamInput['beam']): BeamInput => ({ wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam });
const stepOf = (r: ReturnType<typeof evaluateBeam>, label: string): string | undefined => r.trace.steps.find((s) => s.label === label)?.detail;

// A Gaussian beam given at 1/e² is converted to the 1/e (= d63) convention by 1/sqrt(2), diameter and
// divergence alike (domain notes 1.1, derived); 1/e and d63 are used as they are. A top-hat's
// diameter is its edge whatever the definition says: no conversion, and a warning unless d63.
describe('532 nm, 1 W, 2 mm, 2 mrad: the NOHD under each definition and profile', () => {
  const k = Math.SQRT1_2;
  const TOPHAT_WARNING = (def: string): string =>
    `The beam is marked top-hat but its diameter is given at the ${def} irradiance points, a Gaussian definition; it was taken as the edge of the flat top. Check the data sheet.`;
  it.each([
    ['gaussian', '1/e', nohd(0.002, 0.002), []],
    ['gaussian', 'd63', nohd(0.002, 0.002), []],
    ['gaussian', '1/e2', nohd(0.002 * k, 0.002 * k), []],
    ['tophat', '1/e', nohd(0.002, 0.002), [TOPHAT_WARNING('1/e')]],
    ['tophat', 'd63', nohd(0.002, 0.002), []],
    ['tophat', '1/e2', nohd(0.002, 0.002), [TOPHAT_WARNING('1/e²')]],
  ] as const)('%s given at %s: NOHD %d m', (profile, definition, want, warnings) => {
    const r = evaluateBeam(green({ diameter_m: 0.002, divergence_rad: 0.002, definition, profile }));
    expect(Math.abs(Number(r.nohd_m) / want - 1)).toBeLessThan(1e-9);
    expect(r.warnings).toEqual(warnings);
  });
  it('the profile defaults to Gaussian: 1/e² without a profile is converted', () => {
    const r = evaluateBeam(green({ diameter_m: 0.002, divergence_rad: 0.002, definition: '1/e2' }));
    expect(Math.abs(Number(r.nohd_m) / nohd(0.002 * k, 0.002 * k) - 1)).toBeLessThan(1e-9);
  });
});

// The derivation's "Definition" line names the beam the formulas use, in the 1/e convention: one
// figure per quantity for a round beam, "x by y" for an elliptical one (ours, domain notes 1.1).
describe('the "Definition" line of the derivation', () => {
  it.each([
    ['round, 1/e', { diameter_m: 0.002, divergence_rad: 0.002, definition: '1/e' }, ': a = 2 mm, phi = 2 mrad (1/e)'],
    ['round, 1/e²: both divided by sqrt(2)', { diameter_m: 0.002, divergence_rad: 0.002, definition: '1/e2' }, ': a = 1.41421 mm, phi = 1.41421 mrad (1/e)'],
    ['second diameter only', { diameter_m: 0.002, diameterY_m: 0.004, divergence_rad: 0.002, definition: '1/e' }, ': a = 2 x 4 mm, phi = 2 x 2 mrad (1/e)'],
    ['second divergence only', { diameter_m: 0.002, divergence_rad: 0.002, divergenceY_rad: 0.003, definition: '1/e' }, ': a = 2 x 2 mm, phi = 2 x 3 mrad (1/e)'],
    ['both axes given equal: round', { diameter_m: 0.002, diameterY_m: 0.002, divergence_rad: 0.002, divergenceY_rad: 0.002, definition: '1/e' }, ': a = 2 mm, phi = 2 mrad (1/e)'],
    ['elliptical at 1/e²: the second axis converted as well', { diameter_m: 0.002, diameterY_m: 0.004, divergence_rad: 0.002, divergenceY_rad: 0.004, definition: '1/e2' }, ': a = 1.41421 x 2.82843 mm, phi = 1.41421 x 2.82843 mrad (1/e)'],
  ] as const)('%s', (_n, beam, tail) => {
    expect(stepOf(evaluateBeam(green(beam)), 'Definition')?.endsWith(tail)).toBe(true);
  });
});

// Its first half says which conversion was made (domain notes 1.1): 1/e and d63 are both used as
// they are, but for different reasons, and the line says which.
it.each([
  ['1/e', 'diameter and divergence given at the 1/e irradiance points: used as they are (4*Phi/(pi*d^2) is the peak irradiance of a Gaussian beam): a = 2 mm, phi = 2 mrad (1/e)'],
  ['d63', 'd63 (63 % of the power inside) equals the 1/e irradiance diameter of a Gaussian beam: used as it is: a = 2 mm, phi = 2 mrad (1/e)'],
] as const)('the Definition line of a Gaussian beam given at %s', (definition, line) => {
  expect(stepOf(evaluateBeam(green({ diameter_m: 0.002, divergence_rad: 0.002, definition })), 'Definition')).toBe(line);
});

// An elliptical beam (domain notes 1.2.4): the exposure is 4 S/(pi d_x d_y), each axis growing on its
// own, so the NOHD solves (a_x + r phi_x)(a_y + r phi_y) = 4 S/(pi E). Given the second divergence
// only, the second diameter is the first one.
it('532 nm, 1 W, 2 mm, 2 x 3 mrad (1/e): NOHD from the quadratic', () => {
  const r = evaluateBeam(green({ diameter_m: 0.002, divergence_rad: 0.002, divergenceY_rad: 0.003, definition: '1/e' }));
  const [a, px, py] = [0.002, 0.002, 0.003];
  const A = px * py;
  const B = a * py + a * px;
  const C = a * a - 4 / (Math.PI * E);
  expect(Math.abs(Number(r.nohd_m) / ((-B + Math.sqrt(B * B - 4 * A * C)) / (2 * A)) - 1)).toBeLessThan(1e-9);
});

// The exposure curve along the beam with atmospheric attenuation (Beer-Lambert, exp(-mu r); ANSI
// Z136.6, from memory; domain notes 1.2): 532 nm, 1 W, 1 mm, 1 mrad, mu = 0.01 1/m. At 100 m the
// beam is 101 mm across: 4 S exp(-1)/(pi (0.101 m)²) = 45.88 W/m². At the exit the 1 mm beam is
// spread over the 7 mm aperture and nothing is lost yet: 4 S/(pi (7 mm)²) = 25 984 W/m².
it('exposure curve with mu = 0.01 1/m: 45.88 W/m² at 100 m, 25 984 W/m² at the exit', () => {
  const input: BeamInput = { ...green({ diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }), viewing: { attenuation_per_m: 0.01 } };
  const r = evaluateBeam(input);
  const along = exposureAlongBeam({ input, ruleSet: r.ruleSet, nohd_m: r.nohd_m }, [0, 100]);
  expect(Math.abs((along?.points[1]?.[1] ?? 0) / ((4 * Math.exp(-1)) / (Math.PI * 0.101 ** 2)) - 1)).toBeLessThan(1e-9);
  expect(Math.abs((along?.points[0]?.[1] ?? 0) / (4 / (Math.PI * 0.007 ** 2)) - 1)).toBeLessThan(1e-9);
  // no attenuation: 4 S/(pi (0.101 m)²) = 124.8 W/m² at 100 m
  const plain = exposureAlongBeam({ input: green(input.beam), ruleSet: r.ruleSet, nohd_m: r.nohd_m }, [100]);
  expect(Math.abs((plain?.points[0]?.[1] ?? 0) / (4 / (Math.PI * 0.101 ** 2)) - 1)).toBeLessThan(1e-9);
});
