// What the officer reads in a room's result (through evaluateRoom): the labelled-class remarks and
// the highest class, the place each default sum is named after, the room's own settings reaching
// its beams, the additive sums for pulsed beams, for the skin and with a lens on the path, and the
// largest hazard distance. Beams and lasers invented; each case names the rule or the derivation.
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type LaserClass, type RoomInput } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } as const;
const cw = (id: string, wavelength_nm: number, power_W: number, extra: Partial<BeamInput> = {}): BeamInput => ({ id, wavelength_nm, emission: { kind: 'cw', power_W }, beam, ...extra });
const oneLaser = (beams: BeamInput[], classAsLabelled?: LaserClass): RoomInput => ({
  lasers: [{ id: 'L', name: 'Bench laser', beams, ...(classAsLabelled ? { classAsLabelled } : {}) }],
});
const sumOf = (room: ReturnType<typeof evaluateRoom>, effect: string): number => Number(room.additive.find((g) => g.effect === effect)?.sumOfFractions);
const classRemarks = (room: ReturnType<typeof evaluateRoom>): string[] => room.beams.flatMap((b) => b.warnings).filter((w) => w.startsWith('Class estimate'));

// The manufacturer classifies the product (IEC 60825-1:2014 clause 4, from memory); the tool's
// estimate only checks the label. 532 nm, 0.1 W CW: above the Class 3R AEL 5 mW and within the
// Class 3B AEL 0.5 W (IEC 60825-1:2014 Table 8, from memory): estimate 3B.
describe('the labelled class beside the estimate', () => {
  it.each([
    ['labelled 2, estimated 3B: the officer is told to check the data sheet', '2', ['Class estimate 3B is higher than the labelled class 2: check the data sheet and the classification.'], '3B'],
    ['labelled 4, estimated 3B: the labelled class governs', '4', ["Class estimate 3B is lower than the labelled class 4; the labelled (manufacturer's) class governs."], '4'],
    ['labelled 3B as estimated: nothing to remark', '3B', [], '3B'],
    ['no labelled class: nothing to remark', undefined, [], '3B'],
  ] as const)('%s', (_n, label, remarks, highest) => {
    const room = evaluateRoom(oneLaser([cw('g', 532, 0.1)], label));
    expect(classRemarks(room)).toEqual(remarks);
    expect(room.highestClass).toBe(highest);
  });

  it('the officer adds the label to a laser already evaluated: the remark appears at once (the remembered result is not reused)', () => {
    expect(classRemarks(evaluateRoom(oneLaser([cw('g', 532, 0.1)])))).toEqual([]);
    expect(classRemarks(evaluateRoom(oneLaser([cw('g', 532, 0.1)], '2')))).toHaveLength(1);
  });

  // 1064 nm, 1 uW: far below the Class 1 AEL (3.9e-4 C_4 W with C_4 = 10^(0.002 (1064 - 700)) = 5.35,
  // about 2 mW; IEC 60825-1:2014 Table 3, from memory): Class 1. The highest class of the room is that of its most hazardous laser, whatever
  // the order of the lasers (ours).
  it('the highest class of the room: 3B from the first laser, although the last one is Class 1', () => {
    const room = evaluateRoom({
      lasers: [
        { id: 'A', name: 'Laser A', beams: [cw('a', 532, 0.1)] },
        { id: 'B', name: 'Laser B', beams: [cw('b', 1064, 1e-6)] },
      ],
    });
    expect(room.beams.map((b) => b.classEstimate.estimate)).toEqual(['3B', '1']);
    expect(room.highestClass).toBe('3B');
  });
});

// By default the beams of one laser share its path and are summed there (common practice; SAFETY.md
// "Additive rule by place"); the place is named after the laser's name, not its id (the officer's words).
describe('the place of a default sum', () => {
  it('two beams of the second laser: summed at "the path of Bench laser B"', () => {
    const room = evaluateRoom({
      lasers: [
        { id: 'A', name: 'Laser A', beams: [cw('a', 532, 1e-4)] },
        { id: 'B', name: 'Bench laser B', beams: [cw('b1', 532, 1e-4), cw('b2', 532, 1e-4)] },
      ],
    });
    expect(room.additive.map((g) => [g.place, g.effect, g.beamIds])).toEqual([
      ['the path of Bench laser B', 'eye, retina, thermal', ['b1', 'b2']],
      ['the path of Bench laser B', 'skin', ['b1', 'b2']],
    ]);
  });
  it('a place with one beam adds nothing: no sum in the result and no additive section in the derivation', () => {
    const room = evaluateRoom({
      lasers: [
        { id: 'A', name: 'Laser A', beams: [cw('a', 532, 1e-4)] },
        { id: 'B', name: 'Laser B', beams: [cw('b', 532, 1e-4)] },
      ],
    });
    expect(room.additive).toEqual([]);
    expect(room.trace.children.filter((c) => c.title.includes('sum of fractions'))).toEqual([]);
  });
  // 532 nm acts on the retina, 1550 nm on the cornea (ICNIRP 2013 Table 5, read); both on the skin.
  // Only the skin group has two beams; a group with one beam is its own limit check (ours).
  it('532 nm and 1550 nm on one path: only the skin sum is shown', () => {
    const room = evaluateRoom(oneLaser([cw('g', 532, 1e-3), cw('ir', 1550, 1e-3)]));
    expect(room.additive.map((g) => [g.effect, g.beamIds])).toEqual([['skin', ['g', 'ir']]]);
  });
});

describe('the sums of fractions (derived)', () => {
  // The skin: each 1 mm beam lies wholly inside the 3.5 mm skin aperture (ICNIRP 2013, IEC 60825-1
  // Table A.4, from memory), so each exposure is 4P/(pi (3.5 mm)²) against the skin limit shown
  // in the beam's skin summary; two equal beams double it (limit specification section 3).
  it('two 1 mW beams of 532 nm: skin sum 2 x 4P/(pi (3.5 mm)²) / E_skin', () => {
    const room = evaluateRoom(oneLaser([cw('x', 532, 1e-3), cw('y', 532, 1e-3)]));
    const E = Number(room.beams[0]?.skinMpe.E_Wm2);
    expect(sumOf(room, 'skin') / ((2 * 4 * 1e-3) / (Math.PI * 0.0035 ** 2) / E)).toBeCloseTo(1, 9);
  });

  // A lens on the path puts the whole beam into the eye's aperture, never into the skin's (the skin
  // is not behind the lens): domain notes 2.1 item 2, ours for the skin. 20 mm beams, 1 mW each,
  // 532 nm over 0.25 s: eye 2 x 4P/(pi (7 mm)²) / 25.46 W/m² (EU Table 2.2, read); without the lens,
  // and for the skin, a beam wider than the aperture gives its peak exposure 4P/(pi d²) with d the
  // 1/e diameter, 20 mm (the peak convention of core/beam/beam-model.ts, domain notes 1.1: the
  // Gaussian's peak is never below its mean over the aperture).
  const wide = (id: string, lens: boolean): BeamInput => ({
    ...cw(id, 532, 1e-3),
    beam: { diameter_m: 0.02, divergence_rad: 0.001, definition: '1/e' },
    ...(lens ? { viewing: { lens: { focalLength_m: 0.1 } } } : {}),
  });
  const E_eye = (18 * 0.25 ** 0.75) / 0.25;
  const peak = (4 * 1e-3) / (Math.PI * 0.02 ** 2);
  it.each([
    ['with a lens: the eye takes the whole beam, the skin does not', true, (2 * 4 * 1e-3) / (Math.PI * 0.007 ** 2) / E_eye],
    ['without a lens: the eye takes the peak of the 20 mm beam, (7/20)² of that', false, (2 * peak) / E_eye],
  ] as const)('two 20 mm beams, %s', (_n, lens, eye) => {
    const room = evaluateRoom(oneLaser([wide('x', lens), wide('y', lens)]));
    const E_skin = Number(room.beams[0]?.skinMpe.E_Wm2);
    expect(sumOf(room, 'eye, retina, thermal') / eye).toBeCloseTo(1, 9);
    expect(sumOf(room, 'skin') / ((2 * peak) / E_skin)).toBeCloseTo(1, 9);
  });

  // At exactly 1400 nm the cornea row (1400-1500 nm, 1000 W/m² over 3.5 mm) and the retina row
  // (10 C_A C_C = 400 W/m² over 7 mm) both apply (EU Table 2.2 note a: on a boundary the lower value
  // applies; ICNIRP 2013 Table 5, read). With a lens every row's aperture takes the whole beam:
  // cornea 2 x 4P/(pi (3.5 mm)²)/1000 = 2.4945 and retina 2 x 4P/(pi (7 mm)²)/400 = 1.559 for 12 mW,
  // 30 000 s, whatever the beam's own diameter (here 20 mm).
  it('two 20 mm beams of 12 mW at exactly 1400 nm with a lens: cornea 2.4945, retina 1.559', () => {
    const b = (id: string): BeamInput => ({ ...wide(id, true), wavelength_nm: 1400, emission: { kind: 'cw', power_W: 0.012 }, exposureDuration_s: 30000 });
    const room = evaluateRoom(oneLaser([b('x'), b('y')]));
    expect(sumOf(room, 'eye, cornea and lens') / ((2 * 4 * 0.012) / (Math.PI * 0.0035 ** 2) / 1000)).toBeCloseTo(1, 9);
    expect(sumOf(room, 'eye, retina, thermal') / ((2 * 4 * 0.012) / (Math.PI * 0.007 ** 2) / 400)).toBeCloseTo(1, 9);
  });

  // Exactly at 400 nm over 30 000 s the ultraviolet row governs, averaged over 1 mm in conservative
  // mode (BGV B2 Tabelle 5, read; SAFETY.md "Conservative mode"); the retinal rows of the same
  // wavelength are compared with an exposure never below the governing aperture's (ours, the safe
  // side: core/limits/additive.ts). With a lens the whole 1 mW enters 1 mm: 4P/(pi (1 mm)²) per beam,
  // against the retinal thermal 10 W/m² and the photochemical 1 W/m² for t >= 10^4 s (ICNIRP 2013
  // Table 5, small source, from memory).
  it('two 20 mm beams of 1 mW at exactly 400 nm over 30 000 s with a lens: retina 254.6 (thermal) and 2546 (photochemical)', () => {
    const b = (id: string): BeamInput => ({ ...wide(id, true), wavelength_nm: 400, exposureDuration_s: 30000 });
    const room = evaluateRoom(oneLaser([b('x'), b('y')]));
    expect(room.beams[0]?.mpe.aperture_m).toBe('0.001');
    const X = (2 * 4 * 1e-3) / (Math.PI * 0.001 ** 2);
    expect(sumOf(room, 'eye, retina, thermal') / (X / 10)).toBeCloseTo(1, 9);
    expect(sumOf(room, 'eye, retina, photochemical') / (X / 1)).toBeCloseTo(1, 9);
  });

  // Pulsed beams add per pulse: each beam's energy per pulse over the aperture against its governing
  // per-pulse limit (the limit the beam's summary shows), limit specification section 3; a 1 mm beam
  // lies wholly inside 7 mm, so each exposure is 4Q/(pi (7 mm)²).
  it('two pulsed beams of 532 nm, 1 uJ, 10 ns, 10 Hz: sum 2 x 4Q/(pi (7 mm)²) / H_pulse', () => {
    const p = (id: string): BeamInput => ({ id, wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-8, repetitionRate_Hz: 10 }, beam });
    const room = evaluateRoom(oneLaser([p('x'), p('y')]));
    const H = Number(room.beams[0]?.mpe.H_Jm2);
    expect(sumOf(room, 'eye, retina, thermal') / ((2 * 4 * 1e-6) / (Math.PI * 0.007 ** 2) / H)).toBeCloseTo(1, 9);
  });
});

describe("the room's settings and its largest hazard distance", () => {
  // 355 nm over 30 000 s: conservative mode (default) averages over the stricter 1 mm; with the
  // room's conservative mode off, over 3.5 mm (IEC 60825-1:2014 Annex A, from memory; as
  // test/core/apertures-seen.test.ts for one beam). The room's settings reach each of its beams.
  it.each([
    ['default settings: 1 mm', undefined, '0.001'],
    ['the room sets conservative mode off: 3.5 mm', { conservative: false }, '0.0035'],
  ] as const)('355 nm, 30 000 s, %s', (_n, settings, aperture) => {
    const room = evaluateRoom({ ...oneLaser([cw('uv', 355, 1e-6, { exposureDuration_s: 30000 })]), ...(settings ? { settings } : {}) });
    expect(room.beams[0]?.mpe.aperture_m).toBe(aperture);
  });

  // 1550 nm, 10 W, 100 s on 0.1 m² of skin: the skin distance (356 m) is no ocular distance; the
  // room's largest is the eye's 111.8 m (SAFETY.md "Large irradiated skin areas"; derivation as in
  // test/core/part2/beam-result-seen.test.ts).
  it('1550 nm, 10 W, 100 s, 0.1 m² of skin: the largest hazard distance is the ocular 112 m, not the skin 356 m', () => {
    const room = evaluateRoom(oneLaser([cw('ir', 1550, 10, { exposureDuration_s: 100, skinArea_m2: 0.1 })]));
    expect(Number(room.largestHazardDistance_m)).toBeCloseTo((Math.sqrt(40 / (Math.PI * 1000)) - 0.001) / 0.001, 6);
    expect(room.largestHazardDistance_m).toBe(room.beams[0]?.nohd_m);
  });
});
