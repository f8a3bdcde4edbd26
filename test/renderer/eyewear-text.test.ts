/**
 * Eyewear markings typed on the shelf are checked by the same rules as the register and the
 * calculation (core/model/input-rules.ts): EN 208:2009 alignment scale numbers run RB1 to RB5
 * (Table B.1; shared reference domain.md, section 2.3), EN 207:2017 scale numbers LB1 to LB10, and
 * the limit tables span 180 nm to 1 mm (limit specification, section 0). Before, the shelf took RB6
 * to RB10, and every new assessment of the site was then refused.
 */
import { describe, expect, it } from 'vitest';
import { evaluateRoom } from '../../core/index.js';
import { parseEn207, parseEn208, parseOdBands } from '../../renderer/lib/eyewear-text.js';

const laser = { id: 'L', name: 'He-Ne', beams: [{ id: 'b', wavelength_nm: 633, emission: { kind: 'cw' as const, power_W: 0.001 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const } }] };
const coreTakes = (en208: Array<{ from_nm: number; to_nm: number; scale: number }>): boolean => {
  try {
    evaluateRoom({ lasers: [laser], eyewear: [{ id: 'AL', label: 'alignment', en208 }] });
    return true;
  } catch {
    return false;
  }
};

describe('the shelf field and the calculation agree', () => {
  it.each([
    ['633 nm RB5', true],
    ['633 nm RB6', false],
    ['633 nm RB10', false],
    ['633 nm RB1', true],
  ] as const)('%s: accepted = %s', (text, accepted) => {
    const r = parseEn208(text);
    expect(r.ok).toBe(accepted);
    if (!r.ok) expect(r.error).toMatch(/EN 208:2009 scale numbers run from RB1 to RB5/);
    const scale = Number(/RB(\d+)/.exec(text)?.[1]);
    expect(coreTakes([{ from_nm: 633, to_nm: 633, scale }])).toBe(accepted);
  });
  it('EN 207 LB10 is the top of the scale; LB11 is refused', () => {
    expect(parseEn207('1064 nm DIR LB10').ok).toBe(true);
    expect(parseEn207('1064 nm DIR LB11')).toMatchObject({ ok: false, error: expect.stringMatching(/LB1 to LB10/) });
  });
  it('an OD above 20 is refused like the register refuses it', () => {
    expect(parseOdBands('1064 nm OD 25')).toMatchObject({ ok: false, error: expect.stringMatching(/0 to 20/) });
  });
});
