// Pulses shorter than 100 fs (below the limit tables): the 100 fs limit is used, scaled by t/1e-13 in
// conservative mode (ours: the 100 fs limit read as a peak irradiance), and the top of the beam's trace
// carries a warning (issue 9 decision, SAFETY.md).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput } from '../../../core/index.js';

const beam = { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' as const };
const pulse = (pulseDuration_s: number, conservative = true): BeamInput => ({ wavelength_nm: 800, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s }, beam, settings: { conservative } });

describe('pulses shorter than 100 fs', () => {
  it.each([
    ['50 fs, conservative: limit halved (t/1e-13 = 0.5)', pulse(5e-14), 0.5, true],
    ['50 fs, conservative mode off: 100 fs limit unchanged', pulse(5e-14, false), 1, true],
    ['100 fs: no flag', pulse(1e-13), 1, false],
  ] as const)('%s', (_name, x, ratio, flagged) => {
    const at100 = Number(evaluateBeam({ ...x, emission: { ...x.emission, pulseDuration_s: 1e-13 } as BeamInput['emission'] }).mpe.H_Jm2);
    const r = evaluateBeam(x);
    expect(Number(r.mpe.H_Jm2) / at100).toBeCloseTo(ratio, 9); // derived: k = t/1e-13 on the per-pulse limit
    expect(r.trace.steps.some((s) => s.kind === 'warning' && s.label === 'Pulse shorter than 100 fs')).toBe(flagged);
  });
});
