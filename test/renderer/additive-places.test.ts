/**
 * The additive rule by place on screen: two lasers default to their own paths (nothing added);
 * the officer puts both beams at a new named place and the sum appears, named with the place, as
 * the core computes it (limit specification section 3, "Multiple wavelengths"); a room with one
 * beam shows no additive section. Beams invented (532 nm and 633 nm, 0.1 mW each).
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import { evaluateRoom, numberText, type BeamInput, type RoomInput } from '../../core/index.js';
import AdditiveHarness from './AdditiveHarness.svelte';

const beam = (id: string, nm: number): BeamInput => ({ id, label: `${nm} nm`, wavelength_nm: nm, emission: { kind: 'cw', power_W: 0.0001 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } });
const input: RoomInput = {
  lasers: [
    { id: 'A', name: 'Green pointer', beams: [beam('g', 532)] },
    { id: 'B', name: 'Red module', beams: [beam('r', 633)] },
  ],
};

describe('AdditivePlaces', () => {
  it('adds the two beams once the officer puts them at one named place', async () => {
    render(AdditiveHarness, { props: { input } });
    expect(screen.getByTestId('additive-none')).toBeTruthy();
    await fireEvent.change(screen.getByLabelText('Place of Green pointer · 532 nm'), { target: { value: 'new' } });
    await fireEvent.input(screen.getByLabelText('Name of place 1'), { target: { value: 'the sample stage' } });
    await fireEvent.change(screen.getByLabelText('Place of Red module · 633 nm'), { target: { value: '0' } });
    const sums = (screen.getByTestId('additive-sums').textContent ?? '').replace(/\s+/g, ' ');
    const core = evaluateRoom({ ...input, exposurePlaces: [{ place: 'the sample stage', beamIds: ['g', 'r'] }] });
    const thermal = core.additive.find((g) => g.effect.includes('retina, thermal'));
    if (!thermal) throw new Error('core gave no retinal thermal sum');
    expect(sums).toContain('At the sample stage');
    expect(sums).toContain(`Green pointer · 532 nm + Red module · 633 nm — sum of fractions ${numberText(thermal.sumOfFractions, { round: 'up' })}`);
  });

  it('a room with one beam shows no additive section', () => {
    render(AdditiveHarness, { props: { input: { lasers: [input.lasers[0]!] } } });
    expect(screen.queryByTestId('additive-places')).toBeNull();
  });
});
