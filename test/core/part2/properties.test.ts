// Properties of the hazard core (fast-check), each stating why it must hold:
//  - NOHD never decreases when the power (energy) grows or the divergence shrinks: the exposure at
//    every distance grows with power and with a narrower beam (range equation, domain notes 1.2);
//  - the required OD never decreases when the power grows (OD = log10(exposure/limit), 2.1);
//  - the conservative bound is never below the nominal value (worst-case stack-up, ours);
//  - every number of a result is a finite decimal for every valid input;
//  - every invalid input gets an InputError naming its field.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Dec, evaluateBeam, InputError, type BeamInput, type BeamResult } from '../../../core/index.js';

const WAVELENGTHS = [266, 355, 405, 532, 633, 800, 1064, 1310, 1550, 2000, 10600];
const definition = fc.constantFrom('1/e' as const, '1/e2' as const, 'd63' as const);
const profile = fc.constantFrom('gaussian' as const, 'tophat' as const);
const cw = fc.record({ kind: fc.constant('cw' as const), power_W: fc.double({ min: 1e-6, max: 1e4, noNaN: true }) });
const pulsed = fc
  .record({
    kind: fc.constant('pulsed' as const),
    pulseEnergy_J: fc.double({ min: 1e-9, max: 10, noNaN: true }),
    pulseDuration_s: fc.constantFrom(1e-13, 1e-12, 6e-9, 1e-6, 1e-3),
    repetitionRate_Hz: fc.option(fc.constantFrom(1, 10, 1000, 1e5), { nil: undefined }),
  })
  .filter((e) => e.repetitionRate_Hz === undefined || e.repetitionRate_Hz * e.pulseDuration_s <= 1)
  .map((e) => (e.repetitionRate_Hz === undefined ? { kind: e.kind, pulseEnergy_J: e.pulseEnergy_J, pulseDuration_s: e.pulseDuration_s } : e));
const beam = fc.record({ diameter_m: fc.double({ min: 0, max: 0.02, noNaN: true }), divergence_rad: fc.double({ min: 1e-4, max: 0.2, noNaN: true }), definition, profile });
const input = fc.record({ wavelength_nm: fc.constantFrom(...WAVELENGTHS), emission: fc.oneof(cw, pulsed), beam }) as fc.Arbitrary<BeamInput>;

const d = (s: string): Dec => new Dec(s);
const RUNS = { numRuns: 60 };

function scaleEmission(x: BeamInput, k: number): BeamInput {
  const e = x.emission;
  return { ...x, emission: e.kind === 'cw' ? { ...e, power_W: e.power_W * k } : { ...e, pulseEnergy_J: e.pulseEnergy_J * k } };
}

describe('monotonic hazard distances and OD', () => {
  it('NOHD and OD never decrease when power or energy grows', () => {
    fc.assert(
      fc.property(input, fc.double({ min: 1, max: 100, noNaN: true }), (x, k) => {
        const a = evaluateBeam(x);
        const b = evaluateBeam(scaleEmission(x, k));
        expect(d(b.nohd_m).gte(d(a.nohd_m))).toBe(true);
        expect(d(b.od.od).gte(d(a.od.od))).toBe(true);
        expect(d(b.skinHazardDistance_m).gte(d(a.skinHazardDistance_m))).toBe(true);
      }),
      RUNS,
    );
  });
  it('NOHD never decreases when the divergence shrinks', () => {
    fc.assert(
      fc.property(input, fc.double({ min: 0.01, max: 1, noNaN: true }), (x, k) => {
        const a = evaluateBeam(x);
        const b = evaluateBeam({ ...x, beam: { ...x.beam, divergence_rad: x.beam.divergence_rad * k } });
        expect(d(b.nohd_m).gte(d(a.nohd_m))).toBe(true);
      }),
      RUNS,
    );
  });
});

describe('tolerances', () => {
  const tol = fc.record({
    power: fc.option(fc.double({ min: 0, max: 0.5, noNaN: true }), { nil: undefined }),
    energy: fc.option(fc.double({ min: 0, max: 0.5, noNaN: true }), { nil: undefined }),
    divergence: fc.option(fc.double({ min: 0, max: 0.5, noNaN: true }), { nil: undefined }),
    diameter: fc.option(fc.double({ min: 0, max: 0.5, noNaN: true }), { nil: undefined }),
    pulseDuration: fc.option(fc.double({ min: 0, max: 0.5, noNaN: true }), { nil: undefined }),
  });
  it('the conservative bound is never below the nominal value', () => {
    fc.assert(
      fc.property(input, tol, (x, t) => {
        const clean = Object.fromEntries(Object.entries(t).filter(([, v]) => v !== undefined));
        const r = evaluateBeam({ ...x, tolerances: clean });
        expect(d(r.bounds.nohd_m.conservative).gte(d(r.bounds.nohd_m.nominal))).toBe(true);
        expect(d(r.bounds.odRequired.conservative).gte(d(r.bounds.odRequired.nominal))).toBe(true);
        expect(d(r.bounds.limit_E_Wm2.conservative).lte(d(r.bounds.limit_E_Wm2.nominal))).toBe(true);
        expect(r.bounds.nohd_m.nominal).toBe(r.nohd_m);
      }),
      { numRuns: 30 },
    );
  });
  it('names the dominant input (power +-50 % against divergence +-1 %)', () => {
    const r = evaluateBeam({ wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }, tolerances: { power: 0.5, divergence: 0.01 } });
    expect(r.bounds.dominantInput).toBe('power');
    expect(Number(r.bounds.nohd_m.conservative)).toBeGreaterThan(Number(r.nohd_m) * 1.2);
  });
});

/** Every decimal string of a result (recursively, except traces and free text). */
function decimals(r: BeamResult): string[] {
  const out: string[] = [r.nohd_m, r.nohd_m_reported, r.odRequired, r.skinHazardDistance_m, r.mpe.H_Jm2, r.mpe.E_Wm2, r.skinMpe.H_Jm2, r.skinMpe.E_Wm2, r.od.exposure, r.od.limit, r.od.od, r.od.odRequired_reported];
  for (const x of r.distances) out.push(x.distance_m, x.distance_m_reported);
  for (const s of r.scaleNumbers) out.push(s.density);
  out.push(r.bounds.nohd_m.nominal, r.bounds.nohd_m.conservative, r.bounds.odRequired.conservative, r.bounds.limit_E_Wm2.conservative);
  if (r.nhzDiffuse_m !== null) out.push(r.nhzDiffuse_m);
  return out;
}

describe('finite results', () => {
  const wide = fc.record({
    wavelength_nm: fc.double({ min: 180, max: 1e6, noNaN: true }),
    emission: fc.oneof(cw, pulsed),
    beam,
    viewing: fc.record({
      diffuse: fc.record({ reflectance: fc.double({ min: 0, max: 1, noNaN: true }), viewingAngle_rad: fc.double({ min: 0, max: Math.PI / 2, noNaN: true }) }),
      specular: fc.record({ reflectance: fc.double({ min: 0, max: 1, noNaN: true }) }),
      lens: fc.record({ focalLength_m: fc.double({ min: 0.01, max: 2, noNaN: true }), beamDiameterAtLens_m: fc.double({ min: 1e-4, max: 0.05, noNaN: true }) }),
      aided: fc.record({ magnification: fc.double({ min: 1, max: 50, noNaN: true }), objectiveDiameter_m: fc.double({ min: 0.005, max: 0.2, noNaN: true }) }),
      attenuation_per_m: fc.constantFrom(0, 1e-4),
    }),
  }) as fc.Arbitrary<BeamInput>;
  it('every number is a finite decimal, distances and densities >= 0', () => {
    fc.assert(
      fc.property(wide, (x) => {
        const r = evaluateBeam(x);
        for (const s of decimals(r)) {
          const v = new Dec(s);
          expect(v.isFinite(), s).toBe(true);
        }
        for (const x2 of r.distances) expect(new Dec(x2.distance_m).gte(0)).toBe(true);
        expect(new Dec(r.mpe.H_Jm2).gt(0)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});

const VALID: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } };
const PULSED: BeamInput = { wavelength_nm: 1064, emission: { kind: 'pulsed', pulseEnergy_J: 0.1, pulseDuration_s: 1e-8, repetitionRate_Hz: 10 }, beam: { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e2' } };
const bad = (over: Record<string, unknown>, base: BeamInput = VALID): unknown => ({ ...base, ...over });
const badBeam = (over: Record<string, unknown>): unknown => ({ ...VALID, beam: { ...VALID.beam, ...over } });

// Each invalid input and the field its InputError must name (input validation rules: this module).
const INVALID: ReadonlyArray<readonly [string, unknown, string]> = [
  ['wavelength below 180 nm', bad({ wavelength_nm: 100 }), 'wavelength_nm'],
  ['wavelength missing', bad({ wavelength_nm: undefined }), 'wavelength_nm'],
  ['wavelength NaN', bad({ wavelength_nm: Number.NaN }), 'wavelength_nm'],
  ['rule set unknown', bad({ ruleSet: 'ansi1986' }), 'ruleSet'],
  ['emission missing', bad({ emission: undefined }), 'emission'],
  ['emission kind unknown', bad({ emission: { kind: 'qcw', power_W: 1 } }), 'emission.kind'],
  ['power zero', bad({ emission: { kind: 'cw', power_W: 0 } }), 'emission.power_W'],
  ['power negative', bad({ emission: { kind: 'cw', power_W: -1 } }), 'emission.power_W'],
  ['power infinite', bad({ emission: { kind: 'cw', power_W: Number.POSITIVE_INFINITY } }), 'emission.power_W'],
  ['pulse energy missing', bad({ emission: { kind: 'pulsed', pulseDuration_s: 1e-8 } }), 'emission.pulseEnergy_J'],
  ['pulse duration zero', bad({ emission: { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 0 } }), 'emission.pulseDuration_s'],
  ['pulses overlap', bad({ emission: { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 1e-3, repetitionRate_Hz: 2000 } }), 'emission.repetitionRate_Hz'],
  ['repetition rate negative', bad({ emission: { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 1e-8, repetitionRate_Hz: -5 } }), 'emission.repetitionRate_Hz'],
  ['beam missing', bad({ beam: undefined }), 'beam'],
  ['diameter negative', badBeam({ diameter_m: -0.001 }), 'beam.diameter_m'],
  ['divergence zero', badBeam({ divergence_rad: 0 }), 'beam.divergence_rad'],
  ['divergence missing', badBeam({ divergence_rad: undefined }), 'beam.divergence_rad'],
  ['definition missing (never guessed)', badBeam({ definition: undefined }), 'beam.definition'],
  ['definition unknown', badBeam({ definition: 'fwhm' }), 'beam.definition'],
  ['profile unknown', badBeam({ profile: 'bessel' }), 'beam.profile'],
  ['second-axis divergence zero', badBeam({ divergenceY_rad: 0 }), 'beam.divergenceY_rad'],
  ['exposure duration too long', bad({ exposureDuration_s: 1e6 }), 'exposureDuration_s'],
  ['exposure shorter than the pulse', bad({ exposureDuration_s: 1e-9 }, PULSED), 'exposureDuration_s'],
  ['source angle negative', bad({ sourceAngle_rad: -0.1 }), 'sourceAngle_rad'],
  ['diffuse reflectance above 1', bad({ viewing: { diffuse: { reflectance: 1.5 } } }), 'viewing.diffuse.reflectance'],
  ['viewing angle beyond 90 deg', bad({ viewing: { diffuse: { reflectance: 0.5, viewingAngle_rad: 2 } } }), 'viewing.diffuse.viewingAngle_rad'],
  ['specular reflectance missing', bad({ viewing: { specular: {} } }), 'viewing.specular.reflectance'],
  ['focal length zero', bad({ viewing: { lens: { focalLength_m: 0 } } }), 'viewing.lens.focalLength_m'],
  ['fibre kind unknown', bad({ viewing: { fiber: { kind: 'plastic', numericalAperture: 0.2 } } }), 'viewing.fiber.kind'],
  ['fibre NA above 1', bad({ viewing: { fiber: { kind: 'multimode', numericalAperture: 1.2 } } }), 'viewing.fiber.numericalAperture'],
  ['single-mode without mode-field diameter', bad({ viewing: { fiber: { kind: 'singlemode', numericalAperture: 0.14 } } }), 'viewing.fiber.modeFieldDiameter_m'],
  ['magnification below 1', bad({ viewing: { aided: { magnification: 0.5, objectiveDiameter_m: 0.05 } } }), 'viewing.aided.magnification'],
  ['transmission zero', bad({ viewing: { aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0 } } }), 'viewing.aided.transmission'],
  ['attenuation negative', bad({ viewing: { attenuation_per_m: -1 } }), 'viewing.attenuation_per_m'],
  ['closest approach negative', bad({ viewing: { closestApproach_m: -1 } }), 'viewing.closestApproach_m'],
  ['tolerance 100 %', bad({ tolerances: { power: 1 } }), 'tolerances.power'],
  ['lens on a beam of zero diameter', { ...VALID, beam: { ...VALID.beam, diameter_m: 0 }, viewing: { lens: { focalLength_m: 0.1 } } }, 'viewing.lens.beamDiameterAtLens_m'],
];

describe('invalid input -> InputError naming the field', () => {
  it.each(INVALID)('%s', (_name, x, field) => {
    let err: unknown;
    try {
      evaluateBeam(x as BeamInput);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).field).toBe(field);
  });
  it('not an object at all', () => {
    expect(() => evaluateBeam(null as unknown as BeamInput)).toThrow(InputError);
  });
});
