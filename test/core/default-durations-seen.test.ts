// The exposure duration the eye limit is taken over when the officer gives none
// (core/limits/durations.ts), read where the officer reads it: the eye limit's duration and its
// reason on the result, on both sides of the band edges 400 nm and 700 nm. Sources (common practice,
// the trade-facts reference, copied in test/fixtures/trade-facts.json): 0.25 s for a glance into a visible beam
// (aversion-response-time; TROS Laserstrahlung Teil 2, 4.1 and Table 2); 10 s for an invisible
// infrared beam (fault-case-10s-ir; TROS Teil 2, 5.1 example; ANSI Z136.1 from memory); 30 000 s, a
// working day, for ultraviolet (workday-30000s; TROS Teil 2, 4.1; AS/NZS IEC 60825.14:2011 5.1). The
// visible band is 400-700 nm; at exactly 700 nm the infrared 10 s is taken (the longer duration gives
// the lower limit there: 10 W/m² x C_A against 25.5 W/m² at 0.25 s, the safe side).
import { describe, expect, it } from 'vitest';
import { evaluateBeam } from '../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } as const;

describe('default exposure duration of the eye limit, either side of the band edges', () => {
  it.each([
    [399, 30000, /^ultraviolet: effects add up over the day, so 30 000 s \(8 h\)/],
    [400, 0.25, /^visible beam, unintended viewing: aversion response within 0\.25 s/],
    [699, 0.25, /^visible beam, unintended viewing/],
    [700, 10, /^infrared: no aversion response; 10 s for unintended viewing/],
    [1064, 10, /^infrared/],
  ] as const)('%s nm: %s s', (nm, T, why) => {
    const r = evaluateBeam({ wavelength_nm: nm, emission: { kind: 'cw', power_W: 1e-3 }, beam });
    expect(r.mpe.exposureDuration_s).toBe(T);
    expect(r.mpe.durationWhy).toMatch(why);
  });
});
