// Behaviour of the beam model, hazard distances, pulse criteria, warnings, class estimate and the
// room, each case citing where the rule comes from (domain notes = the project's reference
// notes on hazard methods; trade facts = test/fixtures/trade-facts.json; worked examples =
// test/fixtures/worked-examples.json).
import { describe, expect, it } from 'vitest';
import { allSteps, evaluateBeam, evaluateRoom, InputError, traceToText, type BeamInput, type RoomInput } from '../../../core/index.js';

const base: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } };
const nohd = (x: BeamInput): number => Number(evaluateBeam(x).nohd_m);

describe('beam definitions (domain notes 1.1, derived; trade fact d63-vs-1e2)', () => {
  it('1/e² values are divided by sqrt(2), and the trace says so', () => {
    const e2 = evaluateBeam({ ...base, beam: { diameter_m: 0.002 * Math.SQRT2, divergence_rad: 0.001 * Math.SQRT2, definition: '1/e2' } });
    expect(Number(e2.nohd_m)).toBeCloseTo(nohd(base), 6);
    // the plain-text trace writes the standards' notation (core/units/formula-text.ts): √(2)
    expect(traceToText(e2.trace)).toMatch(/divided by √\(2\)/);
  });
  it('d63 equals the 1/e diameter of a Gaussian beam', () => {
    expect(nohd({ ...base, beam: { ...base.beam, definition: 'd63' } })).toBeCloseTo(nohd(base), 9);
  });
  it('an unconverted 1/e² input would make the NOHD too short by sqrt(2) (a = 0)', () => {
    const b0 = { ...base, beam: { diameter_m: 0, divergence_rad: 0.001, definition: '1/e' as const } };
    expect(nohd(b0) / nohd({ ...b0, beam: { ...b0.beam, definition: '1/e2' } })).toBeCloseTo(1 / Math.SQRT2, 6);
  });
  it('a top-hat with a Gaussian definition is used unconverted, with a warning', () => {
    const r = evaluateBeam({ ...base, beam: { ...base.beam, definition: '1/e2', profile: 'tophat' } });
    expect(Number(r.nohd_m)).toBeCloseTo(nohd(base), 6);
    expect(r.warnings.join(' ')).toMatch(/top-hat/);
  });
});

describe('aperture averaging and the zero-NOHD rule (domain notes 1.2.2, 2.1)', () => {
  it('TROS Laserstrahlung Teil 2 5.1 example: 100 mW, d63 2 mm at 1064 nm averaged over 7 mm = 2598 W/m² (worked example tros2-5p1, 2 %)', () => {
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 1064, emission: { kind: 'cw', power_W: 0.1 }, beam: { diameter_m: 0.002, divergence_rad: 1e-4, definition: 'd63' }, exposureDuration_s: 10 });
    expect(Math.abs(Number(r.od.exposure) / 2598 - 1)).toBeLessThan(0.02);
    expect(Math.abs(10 ** Number(r.od.od) / 52 - 1)).toBeLessThan(0.02);
  });
  it('a beam smaller than the aperture gives the same exposure whatever its size', () => {
    const a = evaluateBeam({ ...base, beam: { ...base.beam, diameter_m: 0.001 } });
    const b = evaluateBeam({ ...base, beam: { ...base.beam, diameter_m: 0.005 } });
    expect(a.od.exposure).toBe(b.od.exposure);
  });
  it('below the limit at the exit: NOHD 0 and the trace says so', () => {
    const r = evaluateBeam({ ...base, emission: { kind: 'cw', power_W: 1e-4 } });
    expect(r.nohd_m).toBe('0');
    expect(r.distances[0]?.zero).toBe(true);
    expect(traceToText(r.trace)).toMatch(/not exceeded at any distance/);
    expect(r.odRequired).toBe('0');
    expect(r.scaleNumbers.every((s) => s.scale === 0)).toBe(true);
  });
  it('a closest approach lowers the required OD for a diverging beam', () => {
    const r0 = evaluateBeam({ ...base, emission: { kind: 'cw', power_W: 10 } });
    const r1 = evaluateBeam({ ...base, emission: { kind: 'cw', power_W: 10 }, viewing: { closestApproach_m: 50 } });
    expect(Number(r1.od.od)).toBeLessThan(Number(r0.od.od));
  });
});

describe('pulsed beams: every criterion, the largest governs (domain notes 1.2.3)', () => {
  // Directive 2006/25/EC Table 2.6 case (worked example directive-rules-532nm-10ns-1kHz): rule 3 governs.
  const p: BeamInput = { ruleSet: 'eu2006', wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' }, exposureDuration_s: 0.25 };
  it('names the governing pulse rule of the limit and of the distance', () => {
    const r = evaluateBeam(p);
    expect(r.mpe.governingRule).toBe('pulse-train');
    expect(Number(r.mpe.H_Jm2)).toBeCloseTo(0.001257, 5);
    expect(r.distances[0]?.governingRule).toBe('pulse-train');
    expect(r.mpe.rules.map((x) => x.rule)).toEqual(['single-pulse', 'average-power', 'pulse-train']);
  });
  it('a single pulse has only rule 1', () => {
    const r = evaluateBeam({ ...p, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 } });
    expect(r.mpe.governingRule).toBe('single-pulse');
    expect(r.mpe.rules.length).toBe(1);
  });
  it('EN 207 needs the pulse mode (R for 10 ns) and D for the mean power', () => {
    const r = evaluateBeam(p);
    const modes = r.scaleNumbers.filter((s) => s.applies).map((s) => s.mode);
    expect(modes).toEqual(['D', 'R', 'RB']);
  });
});

describe('geometry', () => {
  it('an elliptical beam lies between the round beams of its two axes (domain notes 1.2.4)', () => {
    const ell = nohd({ ...base, beam: { ...base.beam, diameterY_m: 0.004, divergenceY_rad: 0.0005 } });
    const x = nohd(base);
    const y = nohd({ ...base, beam: { ...base.beam, diameter_m: 0.004, divergence_rad: 0.0005 } });
    expect(ell).toBeGreaterThan(Math.min(x, y));
    expect(ell).toBeLessThan(Math.max(x, y));
    expect(nohd({ ...base, beam: { ...base.beam, diameterY_m: 0.002, divergenceY_rad: 0.001 } })).toBeCloseTo(x, 9);
  });
  it('atmospheric attenuation shortens the NOHD; mu = 0 changes nothing (domain notes 1.8)', () => {
    const far = { ...base, emission: { kind: 'cw' as const, power_W: 10 } };
    const a = nohd({ ...far, viewing: { attenuation_per_m: 1e-4 } });
    expect(a).toBeLessThan(nohd(far));
    expect(nohd({ ...far, viewing: { attenuation_per_m: 0 } })).toBe(nohd(far));
    // at the root the attenuated exposure equals the limit (bisection, derived)
    const r = evaluateBeam({ ...far, viewing: { attenuation_per_m: 1e-4 } });
    const E = (4 * 10 * Math.exp(-1e-4 * a)) / (Math.PI * (0.002 + a * 0.001) ** 2);
    expect(E / Number(r.mpe.E_Wm2)).toBeCloseTo(1, 6);
  });
  it('specular reflection with reflectance 1 equals the direct NOHD (domain notes 1.5)', () => {
    const r = evaluateBeam({ ...base, viewing: { specular: { reflectance: 1 } } });
    expect(r.distances.find((d) => d.kind === 'specular')?.distance_m).toBe(r.nohd_m);
  });
  it('the skin distance uses the skin aperture of 3.5 mm (domain notes 1.9)', () => {
    const r = evaluateBeam(base);
    expect(r.skinMpe.aperture_m).toBe('0.0035');
  });
});

describe('warnings for unusual inputs', () => {
  it('pulse shorter than the limit tables (35 fs)', () => {
    const r = evaluateBeam({ wavelength_nm: 800, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 35e-15, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.007, divergence_rad: 5e-4, definition: '1/e2' } });
    expect(r.warnings.join(' ')).toMatch(/shorter than the limit tables/);
    // Officer's words: durations in engineering notation, never 3.5e-14 s (issue: readable numbers).
    expect(r.warnings.join(' ')).toMatch(/Pulse duration 35 fs is shorter than the limit tables \(100 fs\)\. The 100 fs limit was used, scaled by t\/\(100 fs\) = 0\.35 /);
    expect(r.mpe.conservativeReplacements).toContain('pulse-shorter-than-tables');
  });
  it('invisible beam with 0.25 s (trade fact aversion-response-time applies to visible light only)', () => {
    const r = evaluateBeam({ ...base, wavelength_nm: 1064, exposureDuration_s: 0.25 });
    expect(r.warnings.join(' ')).toMatch(/aversion response/);
  });
  it('class estimate lower than the labelled class in a room', () => {
    const room: RoomInput = { lasers: [{ id: 'L', name: 'pointer', classAsLabelled: '3B', beams: [{ ...base, emission: { kind: 'cw', power_W: 0.0005 } }] }] };
    const r = evaluateRoom(room);
    expect(r.beams[0]?.warnings.join(' ')).toMatch(/labelled \(manufacturer's\) class governs/);
    expect(r.highestClass).toBe('3B');
  });
});

describe('class estimate (IEC 60825-1:2014 AELs; trade facts class2-ael-visible, class3r-visible, class3b-upper; domain notes 3.2)', () => {
  const cwBeam = (nm: number, P: number): BeamInput => ({ wavelength_nm: nm, emission: { kind: 'cw', power_W: P }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } });
  it.each([
    [532, 0.0003, '1', 'Class 1 visible CW 0.39 mW [HIKARI], secondary'],
    [532, 0.0009, '2', 'Class 2 = 1 mW (lasersafe.de; Seibersdorf)'],
    [532, 0.004, '3R', 'Class 3R = 5 mW (lasersafe.de; Seibersdorf)'],
    [532, 0.4, '3B', 'Class 3B upper limit 0.5 W (lasersafe.de; Seibersdorf; TU Delft notes)'],
    [532, 0.6, '4', 'above 0.5 W'],
    [10600, 0.005, '1', 'Class 1 at 10.6 um about 10 mW [SUP-EN207], read'],
    [10600, 1, '4', 'above 0.5 W'],
    [1064, 0.0015, '1', 'Class 1 at 1064 nm about 2.0 mW (domain notes 3.2, derived)'],
  ] as const)('%s nm %s W -> %s (%s)', (nm, P, cls, _source) => {
    const r = evaluateBeam(cwBeam(nm, P));
    expect(r.classEstimate.estimate).toBe(cls);
    expect(r.classEstimate.caveat).toMatch(/manufacturer's classification governs/);
  });
  it('collimated 1 mW beam that exceeds Class 1 only through a telescope is 1M (GOST IEC 60825-1-2013 logic)', () => {
    // 1550 nm, 8 mW in a wide collimated beam: little enters a 3.5 mm aperture at 100 mm, a lot enters 50 mm at 2 m.
    const r = evaluateBeam({ wavelength_nm: 1550, emission: { kind: 'cw', power_W: 0.04 }, beam: { diameter_m: 0.03, divergence_rad: 1e-4, definition: '1/e' } });
    expect(r.classEstimate.estimate).toBe('1M');
  });
});

describe('room', () => {
  const beam = (nm: number, P: number, id: string): BeamInput => ({ id, wavelength_nm: nm, emission: { kind: 'cw', power_W: P }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } });
  it('errors name the beam by its path in the room', () => {
    const room = { lasers: [{ id: 'A', name: 'a', beams: [beam(532, 1, 'a1')] }, { id: 'B', name: 'b', beams: [{ ...beam(532, 1, 'b1'), wavelength_nm: 50 }] }] };
    try {
      evaluateRoom(room);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).field).toBe('lasers[1].beams[0].wavelength_nm');
    }
  });
  it.each([
    ['no lasers', { lasers: [] }, 'lasers'],
    ['laser without id', { lasers: [{ name: 'x', beams: [beam(532, 1, 'a')] }] }, 'lasers[0].id'],
    ['duplicate beam id', { lasers: [{ id: 'A', name: 'a', beams: [beam(532, 1, 'x'), beam(633, 1, 'x')] }] }, 'lasers[0].beams[1].id'],
    ['beam rule set differs from the room', { ruleSet: 'eu2006', lasers: [{ id: 'A', name: 'a', beams: [{ ...beam(532, 1, 'x'), ruleSet: 'icnirp2013' }] }] }, 'lasers[0].beams[0].ruleSet'],
    ['eyewear OD negative', { lasers: [{ id: 'A', name: 'a', beams: [beam(532, 1, 'x')] }], eyewear: [{ id: 'E', label: 'e', od: [{ from_nm: 500, to_nm: 600, od: -1 }] }] }, 'eyewear[0].od[0].od'],
    ['eyewear LB not whole', { lasers: [{ id: 'A', name: 'a', beams: [beam(532, 1, 'x')] }], eyewear: [{ id: 'E', label: 'e', en207: [{ from_nm: 500, to_nm: 600, modes: 'D', scale: 4.5 }] }] }, 'eyewear[0].en207[0].scale'],
    ['eyewear mode letters', { lasers: [{ id: 'A', name: 'a', beams: [beam(532, 1, 'x')] }], eyewear: [{ id: 'E', label: 'e', en207: [{ from_nm: 500, to_nm: 600, modes: 'X', scale: 4 }] }] }, 'eyewear[0].en207[0].modes'],
  ] as const)('%s -> %s', (_n, room, field) => {
    try {
      evaluateRoom(room as unknown as RoomInput);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).field).toBe(field);
    }
  });
  it('equal beams on the same tissue and effect add: three give 1.5 times the sum of two (additive rule, domain notes 2.4)', () => {
    // a single beam has no additive group (nothing to add); derived: n equal fractions sum to n times one
    const two = evaluateRoom({ lasers: [{ id: 'A', name: 'a', beams: [beam(532, 0.0001, 'x'), beam(532, 0.0001, 'y')] }] });
    const three = evaluateRoom({ lasers: [{ id: 'A', name: 'a', beams: [beam(532, 0.0001, 'x'), beam(532, 0.0001, 'y'), beam(532, 0.0001, 'z')] }] });
    const g2 = two.additive.find((g) => g.tissue === 'eye' && g.effect.includes('retina, thermal'));
    const g3 = three.additive.find((g) => g.tissue === 'eye' && g.effect.includes('retina, thermal'));
    expect(Number(g3?.sumOfFractions)).toBeCloseTo(1.5 * Number(g2?.sumOfFractions), 9);
    expect(g2?.beamIds).toEqual(['x', 'y']);
  });
  it('largest hazard distance and required eyewear per wavelength', () => {
    const r = evaluateRoom({ lasers: [{ id: 'A', name: 'a', beams: [beam(532, 1, 'x'), beam(532, 5, 'y'), beam(1064, 1, 'z')] }] });
    expect(r.largestHazardDistance_m).toBe(r.beams[1]?.nohd_m);
    expect(r.requiredEyewear.map((w) => w.wavelength_nm)).toEqual([532, 1064]);
    expect(r.requiredEyewear[0]?.odRequired).toBe(r.beams[1]?.odRequired);
    expect(r.purchaseAdvice[0]).toMatch(/No eyewear is listed/);
  });
  it('the trace marks formulas recalled from memory (domain notes section 10)', () => {
    const r = evaluateBeam({ ...base, viewing: { diffuse: { reflectance: 1 }, lens: { focalLength_m: 0.1 }, fiber: { kind: 'singlemode', numericalAperture: 0.14, modeFieldDiameter_m: 1e-5 }, aided: { magnification: 7, objectiveDiameter_m: 0.05 } } });
    const conf = allSteps(r.trace).map((s) => s.confidence ?? '');
    expect(conf.some((c) => c.includes('section 10 item 1'))).toBe(true);
    expect(conf.some((c) => c.includes('section 10 item 2'))).toBe(true);
    expect(conf.some((c) => c.includes('section 10 item 3'))).toBe(true);
    expect(conf.some((c) => c.includes('section 10 item 6'))).toBe(false); // CW: 3B 0.5 W is secondary
  });
});
