/**
 * The unit-aware field: what an officer types is read with the core's parseQuantity into SI; a text
 * that does not read shows its error at the field and keeps the last good value (so the results do
 * not change). SI prefixes and unit factors: BIPM SI Brochure, 9th edition (2019), tables 7 and 8
 * (milli = 1e-3, micro = 1e-6, nano = 1e-9); percent = 0.01 (ISO 80000-1, annex).
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import QuantityHarness from './QuantityHarness.svelte';
import { F, type FieldSpec } from '../../renderer/lib/fields.js';

const good: ReadonlyArray<{ spec: FieldSpec; text: string; si: number; source: string }> = [
  { spec: F.power, text: '5 mW', si: 0.005, source: 'SI Brochure table 7: m = 1e-3' },
  { spec: F.power, text: '1.5 W', si: 1.5, source: 'SI base unit' },
  { spec: F.wavelength, text: '1064 nm', si: 1.064e-6, source: 'SI Brochure table 7: n = 1e-9' },
  { spec: F.wavelength, text: '10.6 µm', si: 1.06e-5, source: 'SI Brochure table 7: µ = 1e-6' },
  { spec: F.wavelength, text: '632.8', si: 6.328e-7, source: 'bare number in a wavelength field is nm (the field says so)' },
  { spec: F.pulseDuration, text: '10 ns', si: 1e-8, source: 'SI Brochure table 7: n = 1e-9' },
  { spec: F.energy, text: '450 mJ', si: 0.45, source: 'SI Brochure table 7' },
  { spec: F.repetitionRate, text: '1 kHz', si: 1000, source: 'SI Brochure table 7: k = 1e3' },
  { spec: F.divergence, text: '0.5 mrad', si: 5e-4, source: 'SI Brochure table 7' },
  { spec: F.diameter, text: '2.3 mm', si: 0.0023, source: 'SI Brochure table 7' },
  { spec: F.diffuseReflectance, text: '15 %', si: 0.15, source: 'ISO 80000-1: % = 0.01' },
  { spec: F.diffuseReflectance, text: '0.15', si: 0.15, source: 'plain ratio' },
  { spec: F.diffuseAngle, text: '60 deg', si: Math.PI / 3, source: '1 degree = pi/180 rad (SI Brochure table 8)' },
];

const bad: ReadonlyArray<{ spec: FieldSpec; text: string; message: RegExp; why: string }> = [
  { spec: F.power, text: '5 parsecs', message: /Power: "5 parsecs" is not a power unit/, why: 'unknown unit' },
  { spec: F.wavelength, text: '1064 mW', message: /Wavelength: "1064 mW" is not a wavelength unit/, why: 'unit of another dimension' },
  { spec: F.power, text: 'five', message: /Power: cannot read "five"/, why: 'not a number' },
  { spec: F.power, text: '-1 W', message: /Power must be more than 0 W/, why: 'power must be positive' },
  { spec: F.wavelength, text: '100 nm', message: /Wavelength must be 180 nm to 1000 µm/, why: 'below the 180 nm start of the limit tables (ICNIRP 2013)' },
  { spec: F.diffuseReflectance, text: '150 %', message: /Diffuse reflectance must be 0 % to 100 %/, why: 'a reflectance cannot exceed 1' },
  { spec: F.power, text: '', message: /Power is required/, why: 'a required field left empty' },
];

function input(): HTMLInputElement {
  return screen.getByRole('textbox') as HTMLInputElement;
}

describe('QuantityField reads what officers type', () => {
  it.each(good)('$text -> $si ($source)', async ({ spec, text, si }) => {
    render(QuantityHarness, { props: { spec } });
    await fireEvent.input(input(), { target: { value: text } });
    const shown = Number(screen.getByTestId('value').textContent);
    expect(shown).toBeCloseTo(si, 12);
    expect(input().getAttribute('aria-invalid')).toBe('false');
    expect(screen.queryByRole('alert')).toBeNull();
  });
});

describe('QuantityField: bad input shows its error and changes nothing', () => {
  it.each(bad)('"$text" is refused ($why)', async ({ spec, text, message }) => {
    // Start from a good value, as when an officer edits an existing beam.
    const initial = spec === F.wavelength ? 5.32e-7 : spec === F.diffuseReflectance ? 0.15 : 0.005;
    render(QuantityHarness, { props: { spec, initial } });
    expect(Number(screen.getByTestId('value').textContent)).toBe(initial);
    await fireEvent.input(input(), { target: { value: text } });
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toMatch(message);
    expect(input().getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(input().getAttribute('aria-describedby') ?? '')?.contains(alert)).toBe(true);
    // the last good value is kept: the evaluation does not move
    expect(Number(screen.getByTestId('value').textContent)).toBe(initial);
  });

  it('an optional field left empty means "use the default", not an error', async () => {
    render(QuantityHarness, { props: { spec: F.exposureDuration, initial: 10 } });
    await fireEvent.input(input(), { target: { value: '' } });
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByTestId('value').textContent).toBe('none');
  });

  it('a corrected text clears the error and takes the new value', async () => {
    render(QuantityHarness, { props: { spec: F.power, initial: 0.005 } });
    await fireEvent.input(input(), { target: { value: '5 mV' } });
    expect(screen.getByRole('alert')).toBeTruthy();
    await fireEvent.input(input(), { target: { value: '7 mW' } });
    expect(screen.queryByRole('alert')).toBeNull();
    expect(Number(screen.getByTestId('value').textContent)).toBeCloseTo(0.007, 12);
  });
});
