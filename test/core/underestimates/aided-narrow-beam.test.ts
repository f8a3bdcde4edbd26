// Under-estimate 1: optically aided viewing of a beam narrower than the objective. The instrument
// collects the part of the beam inside the objective D0 and sends it out compressed to d/M (or to the
// exit pupil D0/M once the beam fills the objective); the eye averages it over its limiting aperture
// D_f. With the peak convention of the range equation this is the naked-eye exposure of a beam of
// diameter d/sqrt(K), K = min(M^2, (D0/D_f)^2), times the transmission tau (derived from first-order
// optics; the gain K itself is the form of IEC TR 60825-14 / ANSI Z136.6, from memory, domain
// notes 1.7). Beams: 1/e diameter 1 mm, divergence 1 mrad, CW; exposure duration by the default.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const aidedOf = (x: BeamInput): number => Number(x.viewing?.aided ? evaluateBeam(x).distances.find((d) => d.kind === 'aided')?.distance_m : NaN);

// limits used below: 1550 nm, 10 s: 1000 W/m² over 3.5 mm (ICNIRP 2013 / EU Table 2.3, from memory;
// limit specification rows H-E-IR1500-long); 532 nm, 0.25 s: 18*0.25^0.75/0.25 = 25.456 W/m² over
// 7 mm (EU Table 2.2, read; row H-E-VIS-4). d_L = sqrt(4P/(pi*L)).
const CASES: ReadonlyArray<readonly [string, BeamInput, number, string]> = [
  [
    '1550 nm 10 mW, 7x50 binoculars: about 24 m (was 0 m)',
    { wavelength_nm: 1550, emission: { kind: 'cw', power_W: 0.01 }, beam, viewing: { aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 1 } } },
    23.9777,
    'derived: K = min(49, (50/3.5)^2) = 49, cap M*D_f = 24.5 mm; r = (7*d_L - a)/phi = (7*3.5682 - 1) mm / 1 mrad',
  ],
  [
    '532 nm 5 mW, 2x50: 30.6 m (was 0 m)',
    { wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.005 }, beam, viewing: { aided: { magnification: 2, objectiveDiameter_m: 0.05, transmission: 1 } } },
    30.6283,
    'derived: K = min(4, (50/7)^2) = 4, cap 14 mm; r = (2*15.814 - 1) mm / 1 mrad',
  ],
  [
    '1550 nm 10 mW, 10x50: exit pupil 5 mm above 3.5 mm',
    { wavelength_nm: 1550, emission: { kind: 'cw', power_W: 0.01 }, beam, viewing: { aided: { magnification: 10, objectiveDiameter_m: 0.05 } } },
    34.6825,
    'derived: K = min(100, 204) = 100, cap 35 mm; r = (10*3.5682 - 1) mm / 1 mrad; tau not given = 1',
  ],
  [
    '532 nm 5 mW, 20x50 telescope: exit pupil 2.5 mm below 7 mm (unchanged)',
    { wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.005 }, beam, viewing: { aided: { magnification: 20, objectiveDiameter_m: 0.05, transmission: 1 } } },
    111.958,
    'derived: K = (D0/D_f)^2 = 51.02, cap D0 = 50 mm; r = (7.1429*15.814 - 1) mm / 1 mrad',
  ],
  [
    '532 nm 1 W, 7x50: beam wider than the objective far out (unchanged)',
    { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam, viewing: { aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 1 } } },
    1564.52,
    'domain notes 1.7 worked example (K = 49): r = (7*223.6 - 1) mm / 1 mrad',
  ],
  [
    '1550 nm 10 mW, 7x50, transmission 0.5: zero',
    { wavelength_nm: 1550, emission: { kind: 'cw', power_W: 0.01 }, beam, viewing: { aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0.5 } } },
    0,
    'derived: the whole beam at the eye, 4*0.005 W/(pi*(3.5 mm)^2) = 519.7 W/m² <= 1000 W/m²',
  ],
];

describe('aided viewing of a narrow beam (hand-computed, through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, input, expected, _derivation) => {
    const got = aidedOf(input);
    if (expected === 0) expect(got).toBe(0);
    else expect(Math.abs(got / expected - 1)).toBeLessThan(1e-4);
  });

  it('the trace states the model: collected part of the beam, compressed beam, limiting aperture, transmission', () => {
    const r = evaluateBeam(CASES[0]?.[1] as BeamInput);
    const t = r.distances.find((d) => d.kind === 'aided')?.trace;
    const text = JSON.stringify(t);
    expect(text).toMatch(/inside the objective/);
    expect(text).toMatch(/d\/M/);
    expect(text).toMatch(/limiting aperture/);
    expect(text).toMatch(/transmission/);
  });

  it('with transmission 1 the aided distance is not below the naked-eye NOHD (1550 nm case: 24 m vs 2.57 m)', () => {
    const r = evaluateBeam(CASES[0]?.[1] as BeamInput);
    expect(Number(r.distances.find((d) => d.kind === 'aided')?.distance_m)).toBeGreaterThanOrEqual(Number(r.nohd_m));
    expect(Number(r.nohd_m)).toBeCloseTo(2.5682, 3); // derived: (3.5682 - 1) mm / 1 mrad
  });
});
