// The limiting aperture the officer sees beside the governing limit (evaluateBeam(...).mpe.aperture_m)
// where core/limits/apertures.ts chooses between rows: the stricter ultraviolet value of conservative
// mode, and the IEC switch at 0.35 s. Source: limit spec = the project's exposure-limit specification
// (exposure-limits.md), section 4.5 "Limiting apertures" (IEC 60825-1:2014 Annex A aperture table,
// from memory; BGV B2 Tabelle 5, read, for the older edition's 1 mm in the ultraviolet).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type LimitSettings } from '../../core/index.js';

const beam = { diameter_m: 0.0005, divergence_rad: 0.001, definition: '1/e' as const };
const x = (wavelength_nm: number, exposureDuration_s: number, settings?: LimitSettings): BeamInput => ({ wavelength_nm, emission: { kind: 'cw', power_W: 1 }, beam, exposureDuration_s, ...(settings ? { settings } : {}) });
const aperture = (b: BeamInput): number => Number(evaluateBeam(b).mpe.aperture_m);

describe('ultraviolet eye aperture: 1 mm in conservative mode until verified, the remembered value otherwise (limit spec 4.5; SAFETY.md "Conservative mode")', () => {
  it.each([
    ['355 nm over 30 000 s, conservative (default): 1 mm (older IEC editions, BGV B2 Tab. 5, read)', x(355, 30000), 1e-3],
    ['355 nm over 30 000 s, conservative mode off: 3.5 mm (IEC 60825-1:2014, from memory, t >= 10 s)', x(355, 30000, { conservative: false }), 3.5e-3],
    ['355 nm over 5 s, conservative (default): 1 mm', x(355, 5), 1e-3],
    ['355 nm over 5 s, conservative mode off: 1.5 x 5^0.375 mm = 2.743 mm (0.35 s to 10 s)', x(355, 5, { conservative: false }), 1.5e-3 * 5 ** 0.375],
  ] as const)('%s', (_name, b, want) => {
    expect(Math.abs(aperture(b) / want - 1)).toBeLessThan(1e-12);
  });
});

describe('1400 nm - 0.1 mm at the IEC switch 0.35 s: the smaller of the two apertures (limit spec 4.5; apertures.ts: ours, the safe side)', () => {
  // 1 mm up to 0.35 s, 1.5 t^0.375 mm from 0.35 s: 1.5 x 0.35^0.375 = 1.0119 mm. On the switch the
  // 1500-1800 nm limit row (1e-9 s to 10 s) touches both aperture rows; the smaller averages over the
  // smaller area and never lowers the exposure.
  it('1550 nm over exactly 0.35 s: 1 mm', () => {
    expect(aperture(x(1550, 0.35))).toBe(1e-3);
  });
  it('1550 nm just above 0.35 s: 1.5 t^0.375 mm', () => {
    const t = 0.35 * (1 + 1e-6);
    expect(Math.abs(aperture(x(1550, t)) / (1.5e-3 * t ** 0.375) - 1)).toBeLessThan(1e-9);
  });
});

describe('180-302.5 nm at exactly 10 s, conservative mode off: 3.5 mm, the smaller of 1.5 x 10^0.375 = 3.557 mm and 3.5 mm (limit spec 4.5; ours, the safe side)', () => {
  // The 30 J/m² row (H-E-UV-180, 1e-9 s to 30 000 s; limit spec) spans the aperture switch at 10 s,
  // so both aperture rows touch the point.
  it('266 nm over exactly 10 s: 3.5 mm', () => {
    expect(aperture(x(266, 10, { conservative: false }))).toBe(3.5e-3);
  });
});
