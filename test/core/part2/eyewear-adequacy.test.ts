// Eyewear adequacy: what a missing marking means. EN 208 (RB) rates alignment filters, which pass
// part of a visible beam on purpose (domain notes 2.3); a full-protection filter without an RB
// marking is not deficient. An EN 207 mode the beam needs but the frame is not marked for is
// reported (domain notes 2.2: the marking names the modes a filter was tested in).
import { describe, expect, it } from 'vitest';
import { eyewearVerdict, type EyewearSpec, type ScaleNumberRequirement } from '../../../core/index.js';

// Invented eyewear (demo data style); OD and markings chosen to isolate each case.
const fullProtection: EyewearSpec = {
  id: 'T-1',
  label: 'test filter',
  od: [{ from_nm: 190, to_nm: 540, od: 6 }],
  en207: [{ from_nm: 190, to_nm: 532, modes: 'D', scale: 5 }],
};
const need = (mode: ScaleNumberRequirement['mode'], scale: number): ScaleNumberRequirement => ({
  mode,
  scale,
  density: '1',
  densityUnit: 'W/m²',
  applies: true,
  note: '',
});

describe('eyewear adequacy and missing markings (domain notes 2.2, 2.3)', () => {
  it.each([
    // [case, scale needs, adequate, a note about EN 207 expected in the reason]
    ['visible CW beam needing D LB4 and RB2: no RB marking is only a note', [need('D', 4), need('RB', 2)], true, false],
    ['pulsed beam needing an R rating the frame lacks: reported', [need('D', 4), need('R', 5)], true, true],
    ['D rating below the need: inadequate', [need('D', 6)], false, false],
  ] as const)('%s', (_name, scales, adequate, en207Note) => {
    const v = eyewearVerdict({ beamId: 'b', wavelength_nm: 405, odRequired: '2.1', scaleNumbers: scales }, fullProtection);
    expect(v.adequate).toBe(adequate);
    expect(v.reason.includes('not rated under EN 207')).toBe(en207Note);
    expect(v.scaleChecks.some((c) => c.startsWith('RB') && c.includes('not marked'))).toBe(false);
  });
});
