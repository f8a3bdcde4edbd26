// The additive rule applies to exposures that can reach the same place together (limit
// specification section 3, "Multiple wavelengths"; EU Directive 2006/25/EC Annex II and IEC
// 60825-1 state the same principle: exposures add only where they act on the same tissue at the
// same time). The officer names the places; by default the beams of one laser share its path
// (common practice). A place with one beam has nothing to add.
import { describe, expect, it } from 'vitest';
import { evaluateRoom, InputError, type BeamInput, type RoomInput } from '../../core/index.js';

const beam = (id: string, power_W: number): BeamInput => ({ id, wavelength_nm: 532, emission: { kind: 'cw', power_W }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } });
const two = (places?: RoomInput['exposurePlaces']): RoomInput => ({
  lasers: [
    { id: 'A', name: 'Laser A', beams: [beam('a1', 0.0001)] },
    { id: 'B', name: 'Laser B', beams: [beam('b1', 0.0001)] },
  ],
  ...(places ? { exposurePlaces: places } : {}),
});

describe('additive rule by place', () => {
  it.each([
    { name: 'a room with one beam shows no additive group', input: { lasers: [{ id: 'A', name: 'Laser A', beams: [beam('a1', 1)] }] }, groups: 0, source: 'derived: one exposure has nothing to add' },
    { name: 'two lasers, each on its own path (default): no group', input: two(), groups: 0, source: 'derived: default places are one per laser' },
    { name: 'two beams of one laser share its path (default): one eye group per effect', input: { lasers: [{ id: 'A', name: 'Laser A', beams: [beam('a1', 0.0001), beam('a2', 0.0001)] }] }, groups: 2, source: 'common practice: beams of one laser on a common path' },
    { name: 'the officer splits the two beams of one laser into two places: no group', input: { lasers: [{ id: 'A', name: 'Laser A', beams: [beam('a1', 0.0001), beam('a2', 0.0001)] }], exposurePlaces: [{ place: 'table 1', beamIds: ['a1'] }, { place: 'table 2', beamIds: ['a2'] }] }, groups: 0, source: 'derived: beams that cannot meet do not add' },
  ])('$name [$source]', ({ input, groups }) => {
    expect(evaluateRoom(input as RoomInput).additive).toHaveLength(groups);
  });

  it('the officer puts two lasers at one place: the sum is named with the place and is the sum of the two fractions', () => {
    const r = evaluateRoom(two([{ place: 'the sample stage', beamIds: ['a1', 'b1'] }]));
    const thermal = r.additive.find((g) => g.tissue === 'eye' && g.effect.includes('retina, thermal'));
    expect(thermal?.place).toBe('the sample stage');
    expect(thermal?.beamIds).toEqual(['a1', 'b1']);
    expect(thermal?.note).toContain('at the sample stage');
    // derived: equal beams, so the sum is twice the fraction of one beam from a room where both beams share one laser
    const same = evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams: [beam('a1', 0.0001), beam('a2', 0.0001)] }] });
    const ref = same.additive.find((g) => g.tissue === 'eye' && g.effect.includes('retina, thermal'));
    expect(Number(thermal?.sumOfFractions)).toBeCloseTo(Number(ref?.sumOfFractions), 12);
  });

  it.each([
    { places: [{ place: 'x', beamIds: ['nope'] }], field: 'exposurePlaces[0].beamIds[0]', why: 'an unknown beam' },
    { places: [{ place: 'x', beamIds: ['a1'] }, { place: 'y', beamIds: ['a1'] }], field: 'exposurePlaces[1].beamIds[0]', why: 'a beam in two places' },
  ])('refuses $why, naming the field', ({ places, field }) => {
    try {
      evaluateRoom(two(places));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).field).toBe(field);
    }
  });
});
