// Under-estimate 4: EN 208 alignment scale numbers for pulse trains of 1 ns - 200 us. The pulse
// criterion (energy through 7 mm times N^(1/4), N = pulses in 10 s) is checked, and the mean power of
// the train is also checked as for CW; the higher RB governs (as the core already does for EN 207 D
// with trains). EN 208 table: RB n up to 0.01*10^(n-1) W (CW, pulses > 200 us) and 2e-6*10^(n-1) J
// (1 ns - 200 us) (EN 208:2009 Table B.1 via a supplier explainer, RB1 read; RB2-RB4 decade pattern).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const rb = (x: BeamInput): number | undefined => evaluateBeam(x).scaleNumbers.find((s) => s.mode === 'RB')?.scale;

const CASES: ReadonlyArray<readonly [string, BeamInput, number, string]> = [
  ['532 nm, 10 ns at 10 MHz, 1 W mean: RB3 (was RB2)', { wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-7, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e7 } , beam }, 3, 'derived: pulses 1e-7 J * (1e8)^(1/4) = 1e-5 J -> RB2; mean 1 W -> RB3 (0.01*10^2 = 1 W)'],
  ['532 nm 1 W CW: RB3 (reference)', { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam }, 3, 'derived: 1 W <= 0.01*10^2 W'],
  ['532 nm, 1 us at 1 kHz, 1 mJ (1 W mean): RB5 from the pulses (unchanged)', { wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-6, repetitionRate_Hz: 1000 }, beam }, 5, 'derived: 1e-3 J * (1e4)^(1/4) = 1e-2 J <= 2e-6*10^4 J -> RB5; mean 1 W -> RB3'],
  ['633 nm, 50 ns at 100 kHz, 0.5 uJ (50 mW mean): RB2 from the mean power', { wavelength_nm: 633, emission: { kind: 'pulsed', pulseEnergy_J: 5e-7, pulseDuration_s: 5e-8, repetitionRate_Hz: 1e5 }, beam }, 2, 'derived: 5e-7 J * (1e6)^(1/4) = 1.58e-5 J -> RB2; mean 0.05 W -> RB2 (<= 0.1 W)'],
  ['532 nm, 10 ns at 100 MHz, 3 W mean: RB4 from the mean power', { wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 3e-8, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e8 }, beam }, 4, 'derived: 3e-8 J * (1e9)^(1/4) = 5.33e-6 J -> RB2; mean 3 W -> RB4 (<= 10 W)'],
];

describe('EN 208 alignment scale numbers for fast pulse trains (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, expected, _derivation) => {
    expect(rb(x)).toBe(expected);
  });
  it('the note names the mean-power check', () => {
    const r = evaluateBeam(CASES[0]?.[1] as BeamInput);
    expect(r.scaleNumbers.find((s) => s.mode === 'RB')?.note).toMatch(/mean power/);
  });
});
