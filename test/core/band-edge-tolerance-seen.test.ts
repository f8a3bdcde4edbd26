// A wavelength close to a band edge but not on it is evaluated where it is: the class estimate is
// taken beside the wavelength (and the higher class reported) only on an edge, within 1e-9 relative
// (SAFETY.md "Exact boundaries"; the tolerance is ours). The quick reject of core/limits/intervals.ts
// (onAnyEdge) passes anything within 1e-6 relative to the exact decimal test; that test, not the
// quick reject, decides. Checked through evaluateBeam, the class the officer reads.
import { describe, expect, it } from 'vitest';
import { evaluateBeam } from '../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } as const;

// Class 1 AEL of a CW point source over 700-1050 nm: 10 C_A W/m² over the 7 mm aperture, with
// C_A = 10^(0.002 (lambda - 700)) (EU Directive 2006/25/EC Table 2.3 and Table 2.5, read; the
// same AEL as the 1000 nm case of test/core/part2/beam-result-seen.test.ts). It rises with the
// wavelength: 1e-8 relative beside 700.0005 nm (7e-6 nm) it is 3.2e-8 lower, so a power 1e-8
// below the AEL at the wavelength itself would exceed the AEL just below it (Class 3R).
const aelClass1 = (nm: number): number => 10 * 10 ** (0.002 * (nm - 700)) * Math.PI * 0.0035 ** 2;

describe('near a band edge, not on it: the class at the wavelength itself', () => {
  // 700.0005 nm is 7.1e-7 relative above the 700 nm edge: inside the quick reject's 1e-6, outside
  // the 1e-9 edge tolerance. Taken beside it (as on an edge) the estimate would be Class 3R.
  it('700.0005 nm, 1e-8 below the Class 1 AEL there: Class 1, no band-edge remark', () => {
    const P = aelClass1(700.0005) * (1 - 1e-8);
    const c = evaluateBeam({ wavelength_nm: 700.0005, emission: { kind: 'cw', power_W: P }, beam }).classEstimate;
    expect(c.estimate).toBe('1');
    expect(c.decidedBy).not.toContain('band edge');
  });
});
