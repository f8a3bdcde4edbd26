// The public plot curves of the core (core/beam/curves.ts), drawn on screen and in the report.
// Each case names its source; the curves must agree with the numbers the core reports beside them.
import { describe, expect, it } from 'vitest';
import { DURATION_RANGE_S, evaluateBeam, exposureAlongBeam, exposureLimit, limitAgainstDuration, type BeamInput } from '../../core/index.js';
import { limitVectors, queryOf } from './limit-vectors.js';

// Domain notes illustration 1.2.5: 532 nm, 1 W CW, 1 mm, 1 mrad (1/e), 0.25 s: NOHD 222.6 m where
// the 7 mm-averaged irradiance falls to the 0.25 s limit 25.456 W/m² (limit specification section 9:
// 25.46 W/m² at 633 nm 0.25 s, the same visible row).
const base: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } };
const result = evaluateBeam(base);

describe('exposureAlongBeam (domain notes 1.2: range equation averaged over the limiting aperture)', () => {
  const along = exposureAlongBeam({ input: base, ruleSet: result.ruleSet, nohd_m: result.nohd_m }, [0, 222.6, Number(result.nohd_m)]);
  it.each([
    ['limit of the criterion drawn is the 0.25 s limit 25.456 W/m² (domain notes 1.2.5; spec section 9)', () => Number(along?.limit), 25.456, 0.0005],
    ['exposure at the NOHD 222.6 m equals the limit (domain notes 1.2.5)', () => along?.points[1]?.[1] ?? 0, 25.456, 0.001],
    ['exposure at the core NOHD equals the curve limit (self-consistency: the curve crosses at the NOHD)', () => (along?.points[2]?.[1] ?? 0) / Number(along?.limit), 1, 1e-9],
    ['at the exit a 1 mm beam is spread over the 7 mm aperture: 4 W/(pi*(7 mm)^2) = 25984 W/m² (domain notes 1.2.2, derived)', () => along?.points[0]?.[1] ?? 0, 25984, 0.0005],
    ['limiting aperture 7 mm for the visible eye limit (spec apertures table; common practice)', () => Number(along?.aperture_mm), 7, 0],
  ] as const)('%s', (_name, f, expected, rel) => {
    const got = f();
    expect(Math.abs(got / expected - 1)).toBeLessThanOrEqual(rel);
  });
  it('gives E for a CW beam and keeps the distances in order (CW: irradiance criterion, domain notes 1.2)', () => {
    expect(along?.quantity).toBe('E');
    expect(along?.points.map((p) => p[0])).toEqual([0, 222.6, Number(result.nohd_m)]);
  });
});

const eyeCases = limitVectors.filter((c) => c.organ === 'eye');

describe('limitAgainstDuration matches exposureLimit at the limit specification section 9 vectors', () => {
  it.each(eyeCases)('$rule_set $mode $lambda_nm nm $t_s s alpha $alpha_mrad mrad', (c) => {
    const { duration_s, ...q } = queryOf(c);
    const [p] = limitAgainstDuration(q, [c.t_s]);
    expect(p?.t_s).toBe(duration_s);
    expect(p?.H_Jm2).toBe(exposureLimit({ ...q, duration_s }).H_Jm2);
    expect(Number(p?.H_Jm2) / c.expected_H_J_m2).toBeCloseTo(1, 3);
  });

  it('a duration beyond the rule set range gives no point instead of an error (spec section 3 duration range)', () => {
    const pts = limitAgainstDuration({ ruleSet: result.ruleSet, tissue: 'eye', wavelength_nm: 532 }, [0.25, DURATION_RANGE_S[1] * 10]);
    expect(Number(pts[0]?.H_Jm2) / 0.25).toBeCloseTo(25.456, 2);
    expect(pts[1]).toEqual({ t_s: DURATION_RANGE_S[1] * 10, H_Jm2: null });
  });
});

// The criterion drawn is the one that sets the NOHD (highest exposure/limit ratio there), wherever it
// stands in the list of criteria, and the room's settings reach it.
describe('exposureAlongBeam draws the criterion that sets the NOHD', () => {
  const along = (input: BeamInput, settings?: BeamInput['settings']) => {
    const r = evaluateBeam({ ...input, ...(settings ? { settings } : {}) });
    return exposureAlongBeam({ input, ruleSet: r.ruleSet, settings, nohd_m: r.nohd_m }, [0]);
  };
  it('EU, exactly 1400 nm, 10 mW CW over 30 000 s: the cornea row 1000 W/m² over 3.5 mm, not the lower retinal 400 W/m² over 7 mm (EU Table 2.2 notes a and b, read)', () => {
    const a = along({ ruleSet: 'eu2006', wavelength_nm: 1400, exposureDuration_s: 30000, emission: { kind: 'cw', power_W: 0.01 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } });
    expect([Number(a?.limit), a?.aperture_mm]).toEqual([1000, '3.5']);
  });
  it('10.6 um, 0.1 J, 1 us at 1 Hz over 5 s: rule 1, 5600 (1e-6)^0.25 J/m² (EU Table 2.2, read), listed before rule 2', () => {
    const a = along({ wavelength_nm: 10600, exposureDuration_s: 5, emission: { kind: 'pulsed', pulseEnergy_J: 0.1, pulseDuration_s: 1e-6, repetitionRate_Hz: 1 }, beam: { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' } });
    expect(a?.rule).toBe('single-pulse');
    expect(Math.abs(Number(a?.limit) / (5600 * 1e-6 ** 0.25) - 1)).toBeLessThan(1e-9);
  });
  it('the room settings reach the curve: 1064 nm, 1 mJ, 10 ns at 1 kHz over 10 s with conservative mode off, C_P = 1 for a small source (remembered piecewise form, from memory): 2e-2 J/m²', () => {
    const a = along({ wavelength_nm: 1064, exposureDuration_s: 10, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 }, beam: { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' } }, { conservative: false });
    expect(Math.abs(Number(a?.limit) / 2e-2 - 1)).toBeLessThan(1e-9);
  });
});

// The plot's curve is sampled at every row and factor edge and just below it (report plots), where
// the look-up takes its edge rules; limitAgainstDuration runs exposureLimit's look-up without its
// trace (exposureLimitH), so it must give exposureLimit's own digits there too (self-consistency:
// the curve agrees with the number printed beside it). Wavelengths: one in each band of the tables.
describe('limitAgainstDuration gives exposureLimit’s digits at table edges, both rule sets, conservative mode on and off', () => {
  const edges = [1e-13, 1e-11, 1e-9, 1e-9 * (1 - 1e-9), 1e-7, 5e-6, 1.3e-5, 1e-3, 0.25, 0.7, 10, 10 * (1 - 1e-9), 100, 1000, 3e4];
  const cases = (['icnirp2013', 'eu2006'] as const).flatMap((ruleSet) =>
    [250, 305, 355, 400, 450, 532, 700, 800, 1064, 1150, 1200, 1300, 1400, 1550, 2000, 10600].flatMap((wavelength_nm) =>
      [true, false].map((conservative) => ({ ruleSet, wavelength_nm, conservative })),
    ),
  );
  it.each(cases)('$ruleSet $wavelength_nm nm, conservative $conservative', ({ ruleSet, wavelength_nm, conservative }) => {
    const q = { ruleSet, tissue: 'eye' as const, wavelength_nm, sourceAngle_rad: 0.002, settings: { conservative } };
    const curve = limitAgainstDuration(q, edges);
    const full = edges.map((duration_s) => {
      try {
        return exposureLimit({ ...q, duration_s }).H_Jm2;
      } catch {
        return null;
      }
    });
    expect(curve.map((p) => p.H_Jm2)).toEqual(full);
    expect(full.filter((h) => h !== null).length).toBeGreaterThan(0);
  });
});
