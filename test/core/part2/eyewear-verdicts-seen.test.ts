// Eyewear verdicts as the officer sees them in the room's coverage matrix (through evaluateRoom):
// adequate or not, the OD margin, the per-mode scale checks and the reason. Rules (core/eyewear/
// adequacy.ts header): the eyewear's OD at the beam's wavelength is the highest of its OD bands and
// LB markings that contain it (LB n means transmittance <= 10^-n: DGUV Information 203-042 section
// 5.1 and [WIKI-EN207], read; worked-examples.md lb-means-od); ODs at other wavelengths count for
// nothing; a marking at one wavelength covers it +-1 nm (ours); EN 208 RB is checked and reported but
// alignment eyewear is never full protection (EN 208:2009 section 1).
// The beam: 532 nm, 1 W CW, 1 mm, 1 mrad, 0.25 s: required OD log10(4 W/(pi (7 mm)²) / 25.456 W/m²)
// = 3.009, shown rounded up 3.1 (worked-examples.md od-formula; domain notes 2.1 item 7); EN 207 D:
// 1 W over pi/4 (1 mm)² = 1.27e6 W/m² -> LB6 (315-1400 nm: LBn up to 10^(n+1) W/m², [WIKI-EN207]);
// EN 208: 1 W -> RB3 (up to 1 W, EN 208:2009 Table B.1 decade pattern). Eyewear invented.
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type EyewearSpec, type BeamInput } from '../../../core/index.js';

const beam: BeamInput['beam'] = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' };
const green: BeamInput = { id: 'g', wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam };
// Visible, above the limit over 100 s, but at or below the Class 2 level: RB0 applies (no alignment filter needed).
const dim: BeamInput = { id: 'dim', wavelength_nm: 633, exposureDuration_s: 100, emission: { kind: 'cw', power_W: 9e-4 }, beam };
// Below the limit: no filter needed.
const weak: BeamInput = { id: 'weak', wavelength_nm: 1064, emission: { kind: 'cw', power_W: 1e-6 }, beam };
const OD_REQ = 3.1;

function verdict(ew: EyewearSpec, b: BeamInput = green) {
  const r = evaluateRoom({ lasers: [{ id: 'L', name: 'Bench laser (invented)', beams: [b] }], eyewear: [ew] });
  const v = r.coverage.find((x) => x.beamId === b.id && x.eyewearId === ew.id);
  if (!v) throw new Error('no verdict');
  return v;
}
const ew = (x: Omit<EyewearSpec, 'id' | 'label'>): EyewearSpec => ({ id: 'E', label: 'invented goggles', ...x });
const margin = (v: { odMargin: string | null }): number => Number(v.odMargin);

describe('the OD the eyewear provides at the beam wavelength', () => {
  it.each([
    ['the highest of two OD bands holding 532 nm counts (OD 7, not OD 4)', ew({ od: [{ from_nm: 500, to_nm: 540, od: 7 }, { from_nm: 190, to_nm: 600, od: 4 }] }), 7 - OD_REQ],
    ['an OD band starting exactly at 532 nm holds it', ew({ od: [{ from_nm: 532, to_nm: 600, od: 5 }] }), 5 - OD_REQ],
    ['an OD band ending exactly at 532 nm holds it', ew({ od: [{ from_nm: 400, to_nm: 532, od: 5 }] }), 5 - OD_REQ],
    ['an LB6 marking at 532 nm gives OD 6, the higher of two markings (not LB4 over 190-1100 nm)', ew({ en207: [{ from_nm: 532, to_nm: 532, modes: 'D', scale: 6 }, { from_nm: 190, to_nm: 1100, modes: 'D', scale: 4 }] }), 6 - OD_REQ],
    ['a marking at 533 nm covers 532 nm (+-1 nm)', ew({ en207: [{ from_nm: 533, to_nm: 533, modes: 'D', scale: 6 }] }), 6 - OD_REQ],
  ] as const)('%s', (_name, e, m) => {
    expect(margin(verdict(e))).toBeCloseTo(m, 9);
  });
  it('OD only at other wavelengths: no protection assumed', () => {
    const v = verdict(ew({ od: [{ from_nm: 600, to_nm: 700, od: 7 }], en207: [{ from_nm: 534, to_nm: 534, modes: 'D', scale: 6 }] }));
    expect([v.adequate, v.odMargin]).toEqual([false, null]);
    expect(v.reason).toBe('no optical density stated at 532 nm: no protection assumed (OD 3.1 needed)');
  });
  it.each([
    ['a single-wavelength marking by its wavelength', { from_nm: 533, to_nm: 533 }, 'LB6 marking at 533 nm'],
    ['a band marking by its band', { from_nm: 190, to_nm: 1100 }, 'LB6 marking at 190-1100 nm'],
  ] as const)('the reason names %s', (_name, band, words) => {
    const v = verdict(ew({ en207: [{ ...band, modes: 'D', scale: 6 }] }));
    expect(v.reason.startsWith(`${words} (LB n means OD >= n) >= required OD 3.1`)).toBe(true);
  });
});

describe('scale checks per mode', () => {
  it('LB6 in D at 532 nm and RB3 at 532 nm: both exactly enough; markings at other wavelengths do not count', () => {
    const v = verdict(ew({
      od: [{ from_nm: 190, to_nm: 540, od: 6 }],
      en207: [{ from_nm: 1064, to_nm: 1064, modes: 'D', scale: 9 }, { from_nm: 532, to_nm: 532, modes: 'D', scale: 6 }],
      en208: [{ from_nm: 633, to_nm: 633, scale: 5 }, { from_nm: 532, to_nm: 532, scale: 3 }],
    }));
    expect(v.scaleChecks).toEqual(['D: LB6 >= LB6 ok', 'RB: RB3 >= RB3 ok']);
    expect(v.adequate).toBe(true);
  });
  it('D marked LB5 where LB6 is needed: inadequate although the OD suffices, one mode named', () => {
    const v = verdict(ew({ od: [{ from_nm: 190, to_nm: 540, od: 6 }], en207: [{ from_nm: 532, to_nm: 532, modes: 'D', scale: 5 }] }));
    expect(v.adequate).toBe(false);
    expect(v.scaleChecks[0]).toBe('D: LB5 < LB6 TOO LOW');
    expect(v.reason).toMatch(/but the EN 207 scale number is too low for 1 mode\(s\)$/);
  });
  it('RB2 where RB3 would be needed: reported as too low for alignment, the eyewear stays adequate', () => {
    const v = verdict(ew({ od: [{ from_nm: 190, to_nm: 540, od: 6 }], en208: [{ from_nm: 532, to_nm: 532, scale: 2 }] }));
    expect(v.scaleChecks).toContain('RB: RB2 < RB3 too low for alignment');
    expect(v.adequate).toBe(true);
  });
  it('OD 2 at 532 nm: short by 1.1, the reason says so', () => {
    const v = verdict(ew({ od: [{ from_nm: 190, to_nm: 540, od: 2 }] }));
    expect(v.adequate).toBe(false);
    expect(v.reason).toBe('OD 2 at 190-540 nm < required OD 3.1 (short by 1.1)');
  });
  it('a beam at or below the Class 2 level needs no alignment rating: RB0 is not checked', () => {
    const v = verdict(ew({ od: [{ from_nm: 190, to_nm: 700, od: 6 }], en208: [{ from_nm: 633, to_nm: 633, scale: 1 }] }), dim);
    expect(v.scaleChecks.filter((c) => c.startsWith('RB'))).toEqual([]);
  });
  it('a beam below the limit: no filter needed, whatever the eyewear', () => {
    const v = verdict(ew({ od: [{ from_nm: 190, to_nm: 540, od: 2 }] }), weak);
    expect(v.adequate).toBe(true);
    expect(v.reason).toBe('the exposure does not exceed the limit: no filter needed for this beam');
    expect(v.scaleChecks).toEqual([]);
  });
});
