/**
 * Input that cannot be misread (issue 11, item 1): every quantity field shows how it was read, in
 * full ("= 200 mJ per pulse"); a bare number is read only where the label states the unit; an
 * allowed but unusual value asks "Is this right?" at the field without refusing it; a comma that
 * looks like a thousands separator is refused as ambiguous; an empty required field is marked as
 * needed and its placeholder never looks like a value. SI prefixes: BIPM SI Brochure, 9th edition,
 * Table 7. Plausibility thresholds are ours (core/model/input-rules.ts), chosen from common practice.
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import QuantityHarness from './QuantityHarness.svelte';
import { F, fieldLabel, type FieldSpec } from '../../renderer/lib/fields.js';

function input(): HTMLInputElement {
  return screen.getByRole('textbox') as HTMLInputElement;
}
async function type(spec: FieldSpec, text: string, initial?: number): Promise<void> {
  render(QuantityHarness, { props: { spec, ...(initial !== undefined ? { initial } : {}) } });
  await fireEvent.input(input(), { target: { value: text } });
}
const value = (): string => screen.getByTestId('value').textContent ?? '';

describe('a bare number is read only where the label states its unit', () => {
  it.each([
    { spec: F.energy, text: '200', why: 'issue 11: "200" in Energy per pulse was read as 200 J (NOHD 355 km)' },
    { spec: F.pulseDuration, text: '8', why: 'issue 11: "8" in Pulse duration was read as 8 s' },
    { spec: F.power, text: '5', why: 'power: W, mW and kW are all common; no unit is assumed' },
  ])('"$text" in $spec.label is refused: type the unit ($why)', async ({ spec, text }) => {
    await type(spec, text, 0.002);
    expect(screen.getByRole('alert').textContent).toMatch(new RegExp(`${spec.label}: type the unit, e\\.g\\. \\d`));
    expect(Number(value())).toBe(0.002);
    expect(fieldLabel(spec)).toBe(spec.label);
  });

  it.each([
    { spec: F.wavelength, text: '1064', label: 'Wavelength (nm)', echo: '= 1064 nm', source: 'label states nm' },
    { spec: F.diameter, text: '2.5', label: 'Beam diameter (mm)', echo: '= 2.5 mm at the exit', source: 'label states mm' },
    { spec: F.divergence, text: '0.5', label: 'Divergence, full angle (mrad)', echo: '= 0.5 mrad full angle', source: 'label states mrad' },
    { spec: F.repetitionRate, text: '10', label: 'Repetition rate (Hz)', echo: '= 10 Hz pulses per second', source: 'label states Hz' },
    { spec: F.exposureDuration, text: '0.25', label: 'Exposure duration (s)', echo: '= 250 ms', source: 'label states s' },
  ])('"$text" in $label is read and echoed: $echo', async ({ spec, text, label, echo }) => {
    await type(spec, text);
    expect(screen.getByLabelText(label)).toBe(input());
    expect(screen.getByTestId('field-echo').textContent).toBe(echo);
  });
});

describe('every good value is echoed in full, with the unit made visible', () => {
  it.each([
    { spec: F.energy, text: '200 mJ', echo: '= 200 mJ per pulse', source: 'SI Brochure Table 7: m = 1e-3' },
    { spec: F.energy, text: '0.2 J', echo: '= 200 mJ per pulse', source: 'same energy typed in J' },
    { spec: F.pulseDuration, text: '10 ns', echo: '= 10 ns per pulse', source: 'SI Brochure Table 7: n = 1e-9' },
    { spec: F.power, text: '1.23456 W', echo: '= 1.23456 W output power', source: 'in full: an input is never rounded' },
    { spec: F.wavelength, text: '10.6 µm', echo: '= 10.6 µm', source: 'SI Brochure Table 7: µ = 1e-6' },
    { spec: F.diffuseReflectance, text: '0.15', echo: '= 15 %', source: 'ISO 80000-1: % = 0.01' },
  ])('$text -> "$echo"', async ({ spec, text, echo }) => {
    await type(spec, text);
    expect(screen.getByTestId('field-echo').textContent).toBe(echo);
    expect(input().getAttribute('aria-describedby')).toBeTruthy();
  });
});

describe('an unusual value asks "Is this right?" at the field and is still used', () => {
  it.each([
    { spec: F.energy, text: '200 MJ', si: 2e8, source: 'issue 11: 200 MJ was taken without a question (OD 15)' },
    { spec: F.energy, text: '20 J', si: 20, source: 'above 10 J per pulse' },
    { spec: F.power, text: '200 kW', si: 2e5, source: 'above 100 kW CW' },
    { spec: F.divergence, text: '150 mrad', si: 0.15, source: 'above 100 mrad' },
    { spec: F.pulseDuration, text: '2 s', si: 2, source: 'a pulse above 1 s' },
  ])('$text ($source)', async ({ spec, text, si }) => {
    await type(spec, text);
    expect(screen.getByTestId('field-question').textContent).toMatch(/^Is this right\?/);
    expect(screen.queryByRole('alert')).toBeNull();
    expect(Number(value())).toBeCloseTo(si, 9);
  });

  it.each([
    { spec: F.energy, text: '450 mJ' },
    { spec: F.power, text: '5 W' },
    { spec: F.divergence, text: '1.2 mrad' },
    { spec: F.pulseDuration, text: '6 ns' },
  ])('$text asks nothing', async ({ spec, text }) => {
    await type(spec, text);
    expect(screen.queryByTestId('field-question')).toBeNull();
  });
});

describe('commas', () => {
  it('"1,500 mW" is refused as ambiguous, naming both readings', async () => {
    await type(F.power, '1,500 mW', 0.005);
    expect(screen.getByRole('alert').textContent).toMatch(/"1,500" could be read two ways: write 1500 mW or 1\.5 W/);
    expect(Number(value())).toBe(0.005);
  });
  it('"1,5 mW" is a decimal comma (common EU practice)', async () => {
    await type(F.power, '1,5 mW');
    expect(Number(value())).toBeCloseTo(0.0015, 12);
  });
});

describe('empty fields never look like values', () => {
  it('a required field left empty is marked as needed, not filled by its placeholder', async () => {
    render(QuantityHarness, { props: { spec: F.diffuseReflectance } });
    expect(input().value).toBe('');
    expect(screen.getByTestId('field-needed').textContent).toMatch(/^Needed/);
    expect(value()).toBe('none');
  });
  it.each(Object.entries(F))('%s: placeholder is words or "e.g. …"', (_k, spec) => {
    const p = spec.placeholder ?? '';
    expect(p === '' || /^e\.g\. /.test(p) || !/\d/.test(p) || /\(.*\d.*\)/.test(p)).toBe(true);
  });
});
