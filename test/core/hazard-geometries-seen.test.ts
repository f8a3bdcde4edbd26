// The viewing geometries of a beam (core/hazard/geometries.ts) as the officer reads them through
// evaluateBeam: attenuation credited on the specular and aided paths, and the input lines at the head
// of each distance's trace (reflectance, path to the surface, beam on the lens, far field of a
// single-mode fibre, the instrument). Cases written for the survivors of a mutation run
// (test/mutation/RESULTS.md). Sources:
// - range equation with Beer-Lambert attenuation (ANSI Z136.1 App. B from memory; attenuation common
//   practice, ANSI Z136.6 from memory; domain notes 1.2.1, 1.8);
// - specular reflection: the direct beam with rho_s S (domain notes 1.5, derived);
// - aided viewing: X = tau 4S min(1, (D0/d)²) / (pi max(min(d, D0)/M, D_f)²) (domain notes 1.7, derived
//   from first-order optics; the gain K = min(M², (D0/D_f)²) as in IEC TR 60825-14, from memory);
// - lens: divergence b0/f past the focus (ANSI Z136.1 App. B, from memory, domain notes 1.3);
// - single-mode fibre: 1/e² half-angle lambda/(pi w0) (Gaussian optics, derived, domain notes 1.6);
// - 532 nm over 0.25 s: 18 t^0.75 J/m² / t = 25.456 W/m² over 7 mm (EU 2006/25/EC Table 2.2, read).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../core/index.js';

const L = (18 * 0.25 ** 0.75) / 0.25;
const rel = (got: number, want: number): number => Math.abs(got / want - 1);
const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } as const;
const green = (viewing: BeamInput['viewing'], power_W = 1): BeamInput => ({ wavelength_nm: 532, emission: { kind: 'cw', power_W }, beam, ...(viewing ? { viewing } : {}) });
const distance = (input: BeamInput, kind: string) => {
  const d = evaluateBeam(input).distances.find((x) => x.kind === kind);
  if (!d) throw new Error(`no ${kind} distance`);
  return d;
};
const inputLine = (d: ReturnType<typeof distance>, label: string): string | undefined => d.trace.steps.find((s) => s.kind === 'input' && s.label === label)?.detail;

describe('attenuation credited on the specular and aided paths (checked by substitution)', () => {
  const mu = 1e-3;
  it('specular, glass rho_s = 0.04, mu = 1e-3 /m: 4 rho S exp(-mu r)/(pi (a + r phi)²) = L at the distance, shorter than without', () => {
    const r = Number(distance(green({ specular: { reflectance: 0.04 }, attenuation_per_m: mu }), 'specular').distance_m);
    const r0 = Number(distance(green({ specular: { reflectance: 0.04 } }), 'specular').distance_m);
    const X = (4 * 0.04 * 1 * Math.exp(-mu * r)) / (Math.PI * (0.001 + r * 0.001) ** 2);
    expect(rel(X, L)).toBeLessThan(1e-9);
    expect(r).toBeLessThan(r0 * 0.99); // 43.7 m without attenuation, 42.8 m with it
  });
  it('7x50 binoculars, tau 0.9, mu = 1e-3 /m: the instrument formula with exp(-mu r) equals L at the distance, shorter than without', () => {
    const aided = { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0.9 };
    const r = Number(distance(green({ aided, attenuation_per_m: mu }), 'aided').distance_m);
    const r0 = Number(distance(green({ aided }), 'aided').distance_m);
    const d = 0.001 + r * 0.001;
    const X = (0.9 * 4 * 1 * Math.exp(-mu * r) * Math.min(1, (0.05 / d) ** 2)) / (Math.PI * Math.max(Math.min(d, 0.05) / 7, 0.007) ** 2);
    expect(rel(X, L)).toBeLessThan(1e-9);
    expect(r).toBeLessThan(r0 - 100); // about 1484 m without attenuation
  });
});

describe('the input lines at the head of each distance trace', () => {
  it('specular: the reflectance, and the path to the surface when given', () => {
    const d = distance(green({ specular: { reflectance: 0.04, pathToSurface_m: 2 } }), 'specular');
    expect(inputLine(d, 'Reflectance')).toBe('rho_s = 0.04');
    expect(inputLine(d, 'Path to the surface')).toBe('2 m from the exit; the reflected beam is hazardous only where the total path is shorter than the distance found');
    expect(inputLine(distance(green({ specular: { reflectance: 0.04 } }), 'specular'), 'Path to the surface')).toBeUndefined();
  });
  it('lens f = 0.1 m, 3 mm (1/e) on the lens: divergence past the focus b0/f = 30 mrad', () => {
    const d = distance(green({ lens: { focalLength_m: 0.1, beamDiameterAtLens_m: 0.003 } }), 'lens');
    expect(inputLine(d, 'Beam on the lens')).toBe('b0 = 3 mm (1/e); divergence after the focus b0/f = 30 mrad');
  });
  it('single-mode fibre, 10 um mode field at 532 nm: w0 = 5 um, lambda/(pi w0) = 33.868 mrad, the nominal NA not used', () => {
    const d = distance(green({ fiber: { kind: 'singlemode', numericalAperture: 0.12, modeFieldDiameter_m: 10e-6 } }), 'fiber');
    const line = inputLine(d, 'Far field') ?? '';
    expect(line).toMatch(/^w0 = 5 um; 1\/e² half-angle lambda\/\(pi\*w0\) = ([0-9.]+) mrad; nominal NA 0\.12 not used/);
    expect(rel(Number(/= ([0-9.]+) mrad/.exec(line)?.[1]), (532e-9 / (Math.PI * 5e-6)) * 1000)).toBeLessThan(1e-5);
  });
  it('7x50 binoculars, tau 0.9: M, D0, the exit pupil D0/M = 7.14286 mm and tau', () => {
    const d = distance(green({ aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0.9 } }), 'aided');
    expect(inputLine(d, 'Instrument')).toBe('M = 7, D0 = 50 mm, exit pupil D0/M = 7.14286 mm, transmission tau = 0.9');
  });
});
