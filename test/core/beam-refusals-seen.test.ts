// Refusals of a beam input as the officer meets them: evaluateBeam and evaluateRoom refuse every
// unusable input with an InputError that names the field by the path the form shows (a room adds the
// laser's and the beam's position), a code, and the valid range in words. The ranges are the one
// input-rule table (core/model/input-rules.ts, ours, citing the limit tables' coverage where that sets
// them: 180 nm to 1 mm, 1e-13 s to 30 000 s); the single-mode fibre rule is domain notes 1.6.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, type BeamInput, type RoomInput } from '../../core/index.js';
import { refusal } from './refusal.js';


const cw: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.001 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } };
const pulsed: BeamInput = { ...cw, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3 } };
type Loose = Record<string, unknown>;
const withBeam = (g: Loose): unknown => ({ ...cw, beam: { ...cw.beam, ...g } });
const withViewing = (v: Loose): unknown => ({ ...cw, viewing: v });

const CASES: ReadonlyArray<readonly [string, string, string, unknown]> = [
  ['no beam input at all', '(beam input)', 'missing', null],
  ['an unknown rule set', 'ruleSet', 'invalid_choice', { ...cw, ruleSet: 'ansi1986' }],
  ['an empty id', 'id', 'missing', { ...cw, id: '' }],
  ['a label of 201 characters', 'label', 'missing', { ...cw, label: 'x'.repeat(201) }],
  ['no wavelength', 'wavelength_nm', 'missing', { ...cw, wavelength_nm: undefined }],
  ['wavelength NaN', 'wavelength_nm', 'not_finite', { ...cw, wavelength_nm: Number.NaN }],
  ['wavelength 179 nm', 'wavelength_nm', 'out_of_range', { ...cw, wavelength_nm: 179 }],
  ['no emission', 'emission', 'missing', { ...cw, emission: undefined }],
  ['an unknown emission kind', 'emission.kind', 'invalid_choice', { ...cw, emission: { kind: 'qcw', power_W: 1 } }],
  ['no emission kind', 'emission.kind', 'missing', { ...cw, emission: { power_W: 1 } }],
  ['power 0 W', 'emission.power_W', 'not_positive', { ...cw, emission: { kind: 'cw', power_W: 0 } }],
  ['pulse energy missing', 'emission.pulseEnergy_J', 'missing', { ...pulsed, emission: { kind: 'pulsed', pulseDuration_s: 1e-3 } }],
  ['pulse duration 0 s', 'emission.pulseDuration_s', 'not_positive', { ...pulsed, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 0 } }],
  ['repetition rate 0 Hz', 'emission.repetitionRate_Hz', 'not_positive', { ...pulsed, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3, repetitionRate_Hz: 0 } }],
  ['1 ms pulses at 2 kHz overlap', 'emission.repetitionRate_Hz', 'out_of_range', { ...pulsed, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3, repetitionRate_Hz: 2000 } }],
  ['no beam geometry', 'beam', 'missing', { ...cw, beam: undefined }],
  ['diameter -1 mm', 'beam.diameter_m', 'out_of_range', withBeam({ diameter_m: -0.001 })],
  ['divergence missing', 'beam.divergence_rad', 'missing', withBeam({ divergence_rad: undefined })],
  ['no beam definition', 'beam.definition', 'missing', withBeam({ definition: undefined })],
  ['an unknown beam definition', 'beam.definition', 'invalid_choice', withBeam({ definition: 'FWHM' })],
  ['an unknown profile', 'beam.profile', 'invalid_choice', withBeam({ profile: 'donut' })],
  ['second diameter -1 mm', 'beam.diameterY_m', 'out_of_range', withBeam({ diameterY_m: -0.001 })],
  ['second divergence NaN', 'beam.divergenceY_rad', 'not_finite', withBeam({ divergenceY_rad: Number.NaN })],
  ['exposure 40 000 s', 'exposureDuration_s', 'out_of_range', { ...cw, exposureDuration_s: 4e4 }],
  ['exposure 0.5 ms for 1 ms pulses', 'exposureDuration_s', 'out_of_range', { ...pulsed, exposureDuration_s: 5e-4 }],
  ['source angle 4 rad (beyond pi)', 'sourceAngle_rad', 'out_of_range', { ...cw, sourceAngle_rad: 4 }],
  ['skin area 11 m²', 'skinArea_m2', 'out_of_range', { ...cw, skinArea_m2: 11 }],
  ['viewing not an object', 'viewing', 'missing', { ...cw, viewing: 5 }],
  ['tolerances not an object', 'tolerances', 'missing', { ...cw, tolerances: 'ten per cent' }],
  ['power tolerance 100 %', 'tolerances.power', 'out_of_range', { ...cw, tolerances: { power: 1 } }],
  ['repetition-rate tolerance -1 %', 'tolerances.repetitionRate', 'out_of_range', { ...cw, tolerances: { repetitionRate: -0.01 } }],
  ['settings not an object', 'settings', 'missing', { ...cw, settings: 7 }],
  ['diffuse not an object', 'viewing.diffuse', 'missing', withViewing({ diffuse: true })],
  ['diffuse reflectance 1.2', 'viewing.diffuse.reflectance', 'out_of_range', withViewing({ diffuse: { reflectance: 1.2 } })],
  ['viewing angle 2 rad (beyond pi/2)', 'viewing.diffuse.viewingAngle_rad', 'out_of_range', withViewing({ diffuse: { reflectance: 1, viewingAngle_rad: 2 } })],
  ['target distance -1 m', 'viewing.diffuse.targetDistance_m', 'out_of_range', withViewing({ diffuse: { reflectance: 1, targetDistance_m: -1 } })],
  ['viewer distance 0 m', 'viewing.diffuse.viewerDistance_m', 'not_positive', withViewing({ diffuse: { reflectance: 1, viewerDistance_m: 0 } })],
  ['deliberate viewing 0.1 ms', 'viewing.diffuse.deliberateDuration_s', 'out_of_range', withViewing({ diffuse: { reflectance: 1, deliberateDuration_s: 1e-4 } })],
  ['an unknown governing case', 'viewing.diffuse.governs', 'invalid_choice', withViewing({ diffuse: { reflectance: 1, governs: 'both' } })],
  ['specular not an object', 'viewing.specular', 'missing', withViewing({ specular: 1 })],
  ['specular reflectance 1.5', 'viewing.specular.reflectance', 'out_of_range', withViewing({ specular: { reflectance: 1.5 } })],
  ['path to the mirror -2 m', 'viewing.specular.pathToSurface_m', 'out_of_range', withViewing({ specular: { reflectance: 1, pathToSurface_m: -2 } })],
  ['lens not an object', 'viewing.lens', 'missing', withViewing({ lens: 'f100' })],
  ['focal length 0 m', 'viewing.lens.focalLength_m', 'not_positive', withViewing({ lens: { focalLength_m: 0 } })],
  ['beam on the lens 0 m', 'viewing.lens.beamDiameterAtLens_m', 'not_positive', withViewing({ lens: { focalLength_m: 0.1, beamDiameterAtLens_m: 0 } })],
  ['fibre not an object', 'viewing.fiber', 'missing', withViewing({ fiber: [] })],
  ['an unknown fibre kind', 'viewing.fiber.kind', 'invalid_choice', withViewing({ fiber: { kind: 'graded', numericalAperture: 0.2 } })],
  ['NA 1.2', 'viewing.fiber.numericalAperture', 'out_of_range', withViewing({ fiber: { kind: 'multimode', numericalAperture: 1.2 } })],
  ['single-mode without its mode-field diameter', 'viewing.fiber.modeFieldDiameter_m', 'missing', withViewing({ fiber: { kind: 'singlemode', numericalAperture: 0.14 } })],
  ['mode-field diameter 2 mm', 'viewing.fiber.modeFieldDiameter_m', 'out_of_range', withViewing({ fiber: { kind: 'multimode', numericalAperture: 0.2, modeFieldDiameter_m: 0.002 } })],
  ['aided not an object', 'viewing.aided', 'missing', withViewing({ aided: 7 })],
  ['magnification 0.5', 'viewing.aided.magnification', 'out_of_range', withViewing({ aided: { magnification: 0.5, objectiveDiameter_m: 0.05 } })],
  ['objective 0 m', 'viewing.aided.objectiveDiameter_m', 'not_positive', withViewing({ aided: { magnification: 7, objectiveDiameter_m: 0 } })],
  ['transmission 0', 'viewing.aided.transmission', 'not_positive', withViewing({ aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0 } })],
  ['attenuation 2 1/m', 'viewing.attenuation_per_m', 'out_of_range', withViewing({ attenuation_per_m: 2 })],
  ['closest approach -1 m', 'viewing.closestApproach_m', 'out_of_range', withViewing({ closestApproach_m: -1 })],
];

describe('each unusable input is refused, naming its field', () => {
  it.each(CASES)('%s -> %s (%s)', (_n, field, code, input) => {
    const e = refusal(() => evaluateBeam(input as BeamInput));
    expect([e.field, e.code]).toEqual([field, code]);
  });
});

// Every optional field of the table accepted at a valid value (the refusal above is not a refusal of
// the field's mere presence): one beam with all of them evaluates.
it('a beam with every optional field at a valid value is evaluated', () => {
  const full: BeamInput = {
    ...pulsed,
    id: 'b1',
    label: 'Probe beam',
    ruleSet: 'eu2006',
    emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3, repetitionRate_Hz: 100 },
    beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e', profile: 'gaussian', diameterY_m: 0.002, divergenceY_rad: 0.002 },
    exposureDuration_s: 10,
    sourceAngle_rad: 0.001,
    skinArea_m2: 0.001,
    viewing: {
      diffuse: { reflectance: 0.5, viewingAngle_rad: 0.1, targetDistance_m: 1, viewerDistance_m: 1, deliberateDuration_s: 60, governs: 'deliberate' },
      specular: { reflectance: 0.04, pathToSurface_m: 1 },
      lens: { focalLength_m: 0.1, beamDiameterAtLens_m: 0.001 },
      fiber: { kind: 'singlemode', numericalAperture: 0.14, modeFieldDiameter_m: 1e-5 },
      aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0.9 },
      attenuation_per_m: 0.001,
      closestApproach_m: 0.5,
    },
    tolerances: { power: 0.1, energy: 0.1, divergence: 0.1, diameter: 0.1, pulseDuration: 0.1, repetitionRate: 0.1 },
    settings: { conservative: true },
  };
  const r = evaluateBeam(full);
  expect([r.beamId, r.label, r.ruleSet]).toEqual(['b1', 'Probe beam', 'eu2006']);
});

// Pulses that just touch (f t_p = 1, a 100 % duty cycle) are still a train; only f t_p > 1 overlaps.
it('1 ms pulses at exactly 1 kHz: evaluated', () => {
  expect(evaluateBeam({ ...pulsed, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3, repetitionRate_Hz: 1000 } }).emissionSummary).toBe('pulsed 1 µJ per pulse, 1 ms, 1 kHz');
});

// An exposure of exactly one pulse is an exposure (the refusal is for one SHORTER than the pulse).
it('1 ms pulses over an exposure of exactly 1 ms: evaluated', () => {
  expect(evaluateBeam({ ...pulsed, exposureDuration_s: 1e-3 }).mpe.exposureDuration_s).toBe(1e-3);
});

describe('what the refusal says', () => {
  it('the range in words carries the reason where the table gives one (the limit tables cover 180 nm to 1 mm)', () => {
    expect(refusal(() => evaluateBeam({ ...cw, wavelength_nm: 179 })).validRange).toMatch(/\(the limit tables cover 180 nm to 1 mm\)$/);
    expect(refusal(() => evaluateBeam(withBeam({ diameterY_m: -1 }) as BeamInput)).validRange).not.toMatch(/\)$/);
  });
  it('an overlapping train names the largest rate: at most 1 / pulse duration = 1000 Hz', () => {
    const e = refusal(() => evaluateBeam({ ...pulsed, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-3, repetitionRate_Hz: 2000 } }));
    expect(e.validRange).toBe('at most 1 / pulse duration = 1000 Hz (pulses would overlap)');
    expect(refusal(() => evaluateBeam({ ...pulsed, exposureDuration_s: 5e-4 })).validRange).toBe('at least the pulse duration (0.001 s)');
  });
  it('a choice names the allowed values', () => {
    expect(refusal(() => evaluateBeam({ ...cw, emission: { kind: 'qcw', power_W: 1 } } as unknown as BeamInput)).validRange).toBe("'cw' | 'pulsed'");
    expect(refusal(() => evaluateBeam(withBeam({ definition: 'FWHM' }) as BeamInput)).validRange).toBe("'1/e' | '1/e2' | 'd63'");
  });
  it('an id is required text, a label is not; a long text is shown cut to 60 characters', () => {
    const empty = refusal(() => evaluateBeam({ ...cw, id: '' }));
    expect([empty.validRange, empty.value]).toEqual(['text of at most 200 characters, not empty', '']);
    const long = refusal(() => evaluateBeam({ ...cw, label: 'x'.repeat(201) }));
    expect(long.validRange).toBe('text of at most 200 characters');
    expect(long.value).toBe(`${'x'.repeat(60)}…`);
    expect(refusal(() => evaluateBeam({ ...cw, id: 7 } as unknown as BeamInput)).value).toBe(7);
  });
  it('the single-mode refusal says what is needed and why', () => {
    const e = refusal(() => evaluateBeam(withViewing({ fiber: { kind: 'singlemode', numericalAperture: 0.14 } }) as BeamInput));
    expect(e.validRange).toMatch(/^the mode-field diameter is needed for a single-mode fibre/);
  });
});

describe('in a room: the position of the laser and the beam, and the room\'s rule set', () => {
  const room = (b: unknown, ruleSet?: 'eu2006'): RoomInput => ({ ...(ruleSet ? { ruleSet } : {}), lasers: [{ id: 'A', name: 'Laser A', beams: [cw, b as BeamInput] }] });
  it.each([
    ['a beam that is not an object', 'lasers[0].beams[1]', 'beam'],
    ['a wavelength of 50 nm', 'lasers[0].beams[1].wavelength_nm', { ...cw, wavelength_nm: 50 }],
    ['a beam with its own rule set unlike the room\'s', 'lasers[0].beams[1].ruleSet', { ...cw, ruleSet: 'icnirp2013' }],
  ] as const)('%s -> %s', (_n, field, b) => {
    expect(refusal(() => evaluateRoom(room(b, 'eu2006'))).field).toBe(field);
  });
  it('a beam without a rule set takes the room\'s; the same rule set named on the beam is accepted', () => {
    const r = evaluateRoom(room({ ...cw, id: 'b2', ruleSet: 'eu2006' }, 'eu2006'));
    expect(r.beams.map((b) => b.ruleSet)).toEqual(['eu2006', 'eu2006']);
  });
});
