/**
 * The derivation window: every step is one table row with its cells side by side (a step kind never
 * takes a layout class such as the flex ".row"), values in engineering notation with their unit, and
 * every figure the core wrote kept. Input: a 532 nm 10 ns pulse of 1 mJ, 2 mm (1/e), 1 mrad
 * (invented demo beam; the values shown are whatever the core computes, read back through the screen).
 */
import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import { evaluateRoom, type RoomInput } from '../../core/index.js';
import TraceView from '../../renderer/components/TraceView.svelte';

const input: RoomInput = {
  ruleSet: 'icnirp2013',
  lasers: [{ id: 'L1', name: 'Pulsed demo laser', classAsLabelled: '4', beams: [{ id: 'b1', label: 'green', wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 0.001, pulseDuration_s: 1e-8 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] }],
  eyewear: [],
};

describe('TraceView', () => {
  it('renders each step as a table row whose class is not a layout class', () => {
    const beam = evaluateRoom(input).beams[0];
    if (!beam) throw new Error('no beam');
    const { container } = render(TraceView, { props: { trace: beam.trace } });
    const rows = [...container.querySelectorAll('tbody tr')];
    expect(rows.length).toBeGreaterThan(5);
    for (const r of rows) {
      expect(r.classList.contains('row')).toBe(false); // derived: ".row" is display:flex in app.css
      expect(r.querySelectorAll('td').length).toBe(5);
    }
    expect(screen.getAllByText('table row').length).toBeGreaterThan(0);
  });

  it.each([
    { value: '0.000000008', unit: 's', text: '8 ns', source: 'SI prefix n (BIPM SI brochure Table 7)' },
    { value: '125000000000', unit: 'W/m²', text: '125 GW/m²', source: 'SI prefix G on the numerator' },
    { value: '0.0000083212345', unit: 'J/m² per pulse', text: '8.3212345 µJ/m² per pulse', source: 'the derivation keeps every figure written (issue 14, item 6)' },
    { value: '1762.3301', unit: 'm', text: '1762.3301 m', source: 'derived: plain metres below 10 km, every figure kept' },
  ])('a step value $value $unit reads "$text" [$source]', ({ value, unit, text }) => {
    render(TraceView, { props: { trace: { title: 'Example', steps: [{ kind: 'result', label: 'Value', detail: 'shown', value, unit }], children: [] } } });
    expect(screen.getByText(text)).toBeTruthy();
  });
});
