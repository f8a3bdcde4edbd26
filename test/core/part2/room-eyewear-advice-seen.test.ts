// What a room needs in eyewear, as the officer reads it on the eyewear sheet and in the room result
// (through evaluateRoom): the eyewear needed per wavelength (the highest OD and, per test condition,
// the highest scale number any beam there needs; ODs never summed across wavelengths [USAPHC], read),
// and the purchase advice (which shelf eyewear covers every beam; else the smallest combination from
// the shelf, picked greedily, ours; the beams nothing covers; what one new pair must have).
// Beams, 1 mm (1/e), 1 mrad, CW, at the exit:
//   532 nm 1 W: OD log10(4 W/(pi (7 mm)²) / 25.46 W/m²) = 3.009 -> 3.1 (EU Table 2.2, 0.25 s, read;
//     worked-examples.md od-formula); D LB6 (1.27e6 W/m² over 1 mm, LBn up to 10^(n+1) W/m²
//     [WIKI-EN207], read); RB3 (1 W, EN 208:2009 Table B.1 decade pattern).
//   532 nm 5 W: OD log10(5104) = 3.708 -> 3.8; D LB6 (6.37e6 W/m²); RB4 (5 W).
//   1064 nm 1 W over the default 10 s: 10 C_A C_C = 50 W/m² (C_A = 5, C_C = 1; ICNIRP 2013 Table 5,
//     from memory): OD log10(25 984 / 50) = 2.716 -> 2.8; D LB6; no RB (EN 208 covers 400-700 nm).
//   1064 nm 1 uW: below the limit, OD 0.
//   633 nm 0.9 mW over 100 s: 23.39 W/m² against 18 T2^-0.25 = 10.12 W/m² (T2 = 10 s; ICNIRP 2013
//     Table 5, from memory): OD log10(2.31) = 0.364 -> 0.4; D LB3 (1146 W/m²); at or below the Class 2
//     level, so RB0: no alignment rating is named (EN 208:2009 section 1, ours: RB0 is no requirement).
// Eyewear invented.
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type EyewearSpec } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } as const;
const cw = (id: string, wavelength_nm: number, power_W: number): BeamInput => ({ id, wavelength_nm, emission: { kind: 'cw', power_W }, beam });
const g = cw('g', 532, 1);
const g5 = cw('g5', 532, 5);
const ir = cw('ir', 1064, 1);
const weak = cw('weak', 1064, 1e-6);
const dim: BeamInput = { ...cw('dim', 633, 9e-4), exposureDuration_s: 100 };
const odAt = (id: string, from_nm: number, to_nm: number, od: number, extra: Partial<EyewearSpec> = {}): EyewearSpec => ({ id, label: `Goggles ${id}`, od: [{ from_nm, to_nm, od }], ...extra });
const advice = (beams: BeamInput[], eyewear?: EyewearSpec[]): readonly string[] => evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams }], ...(eyewear ? { eyewear } : {}) }).purchaseAdvice;

describe('eyewear needed per wavelength', () => {
  it('the highest OD and scale numbers per wavelength, shortest wavelength first, whatever the order of the beams', () => {
    const r = evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams: [weak, ir, g5, g] }] });
    expect(r.requiredEyewear.map((w) => [w.wavelength_nm, w.odRequired, w.scaleNumbers.map((s) => `${s.mode} ${s.scale}`)])).toEqual([
      [532, '3.8', ['D 6', 'RB 4']],
      [1064, '2.8', ['D 6']],
    ]);
  });
});

describe('purchase advice', () => {
  const OK = 'No beam exceeds its limit at the worst reachable position: no laser eyewear is needed for these beams.';
  const NONE = 'No single eyewear on the shelf covers every beam in this room.';
  const ZONES = 'different eyewear per task or zone, with the zones separated by enclosures or curtains, or new eyewear is needed.';
  it.each([
    ['every beam below its limit: none needed, whatever the shelf', [weak], [odAt('E', 190, 1100, 1)], [OK]],
    ['nothing on the shelf: what each beam needs', [g, weak], undefined, ['No eyewear is listed for this room. It needs, per beam:', '532 nm CW (532 nm): OD ≥ 3.1, D LB6, RB3 (alignment).']],
    ['nothing on the shelf, a beam needing no alignment rating: no RB named', [dim], undefined, ['No eyewear is listed for this room. It needs, per beam:', '633 nm CW (633 nm): OD ≥ 0.4, D LB3.']],
    ['one pair covers both beams', [g, ir], [odAt('E', 500, 1100, 4)], ['Eyewear covering every beam: E.']],
    [
      'one pair covers both beams, transmitting 15 % of visible light: the room lighting is named',
      [g, ir],
      [odAt('E', 500, 1100, 4, { visibleTransmission: 0.15 })],
      ['Eyewear covering every beam: E.', 'Goggles E transmits 15 % of visible light: check the room lighting (dark eyewear is the usual reason eyewear is not worn).'],
    ],
    [
      'of two pairs on the shelf only the second covers both beams: only it is named, with its own transmission',
      [g, ir],
      [odAt('G', 500, 560, 5, { visibleTransmission: 0.1 }), odAt('E', 500, 1100, 4, { visibleTransmission: 0.15 })],
      ['Eyewear covering every beam: E.', 'Goggles E transmits 15 % of visible light: check the room lighting (dark eyewear is the usual reason eyewear is not worn).'],
    ],
    ['one pair covers both beams, transmitting 20 %: no remark (ours: below 20 %)', [g, ir], [odAt('E', 500, 1100, 4, { visibleTransmission: 0.2 })], ['Eyewear covering every beam: E.']],
    [
      'the pair covering more beams is taken first (OD 5 at 532 nm covers 1 W and 5 W; OD 3.5 only 1 W), then the 1064 nm pair',
      [g, g5, ir],
      [odAt('G35', 500, 560, 3.5), odAt('G5', 500, 560, 5), odAt('IR', 1000, 1100, 3)],
      [NONE, `Smallest combination from the shelf: G5 + IR (covers 3 of 3 beams); ${ZONES}`, 'To cover all beams with one pair, buy eyewear with: 532 nm OD ≥ 3.8 D LB6; 1064 nm OD ≥ 2.8 D LB6.'],
    ],
    [
      'two pairs covering as many beams: the first on the shelf is taken first',
      [g, ir],
      [odAt('G', 500, 560, 5), odAt('IR', 1000, 1100, 3)],
      [NONE, `Smallest combination from the shelf: G + IR (covers 2 of 2 beams); ${ZONES}`, 'To cover all beams with one pair, buy eyewear with: 532 nm OD ≥ 3.1 D LB6; 1064 nm OD ≥ 2.8 D LB6.'],
    ],
    [
      'the shelf covers the green beams only: the 1064 nm beam is named, and what one pair for it needs',
      [ir, g, g5, weak],
      [{ id: 'E532', label: 'Green goggles', od: [{ from_nm: 500, to_nm: 560, od: 5 }], en207: [{ from_nm: 532, to_nm: 532, modes: 'D', scale: 7 }] }],
      [
        NONE,
        `Smallest combination from the shelf: E532 (covers 3 of 4 beams); ${ZONES}`,
        'Not covered by anything on the shelf: 1064 nm CW (1064 nm), needs OD ≥ 2.8, D LB6.',
        'To cover the remaining beams with one pair, buy eyewear with: 1064 nm OD ≥ 2.8 D LB6.',
      ],
    ],
    [
      'nothing on the shelf covers the beam: no combination is offered',
      [ir],
      [odAt('G', 500, 560, 5)],
      [NONE, 'Not covered by anything on the shelf: 1064 nm CW (1064 nm), needs OD ≥ 2.8, D LB6.', 'To cover the remaining beams with one pair, buy eyewear with: 1064 nm OD ≥ 2.8 D LB6.'],
    ],
  ] as const)('%s', (_n, beams, eyewear, lines) => {
    expect(advice([...beams], eyewear ? [...eyewear] : undefined)).toEqual(lines);
  });
});
