// The required optical density as the officer sees it (through evaluateBeam): the limit it is
// computed against and the units of its derivation. Expected values are computed here from the
// published formulas, never read back from the core:
//   OD = log10(H0 / MPE), exposure and limit in the same units (worked-examples.md od-formula;
//   ANSI Z136.1 section 4.6.2, from memory), the exposure through the 7 mm limiting aperture
//   (the larger of the beam and the limiting aperture, domain notes 2.1).
//   EU Table 2.6 rule 2 (read): the train over T against the limit for T, per pulse H_T / N.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type Trace } from '../../../core/index.js';

const rel = (got: string | number | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' };
const steps = (t: Trace): string[] => t.steps.map((s) => `${s.label}: ${s.detail ?? ''}`);

describe('required OD against the governing criterion, not the last one listed', () => {
  // 2600 nm - 1 mm, 1e-7 to 10 s: 5600 t^0.25 J/m² (EU Table 2.2, read; the icnirp2013 row has the
  // same value, from memory). Rule 3 (C_P) does not apply: icnirp2013 reduces retinal thermal limits
  // only (ILSC2019, read). The 5 mm beam is wider than every aperture here, so X = 4Q/(pi d²).
  it('10.6 um, 0.1 J, 1 us at 1 Hz over 5 s: the single pulse governs (rule 2 listed after it is higher)', () => {
    const r = evaluateBeam({ wavelength_nm: 10600, exposureDuration_s: 5, emission: { kind: 'pulsed', pulseEnergy_J: 0.1, pulseDuration_s: 1e-6, repetitionRate_Hz: 1 }, beam: { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' } });
    const X = (4 * 0.1) / (Math.PI * 0.005 ** 2);
    const L = 5600 * 1e-6 ** 0.25; // rule 1: 177 J/m²; rule 2: 5600 * 5^0.25 / 5 pulses = 1675 J/m² per pulse
    expect(r.mpe.governingRule).toBe('single-pulse');
    expect(rel(r.od.exposure, X)).toBeLessThan(1e-9);
    expect(rel(r.od.limit, L)).toBeLessThan(1e-9);
    expect(rel(r.od.od, Math.log10(X / L))).toBeLessThan(1e-9);
    expect(r.odRequired).toBe((Math.ceil(Math.log10(X / L) * 10) / 10).toFixed(1));
  });
});

describe('units in the OD derivation (exposure and limit in the same units: od-formula)', () => {
  it.each([
    ['532 nm, 1 W CW: irradiance, W/m²', { wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam } as BeamInput, 'W/m²', 'J/m²'],
    ['532 nm, 1 mJ single pulse of 10 ns: radiant exposure, J/m²', { wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 }, beam } as BeamInput, 'J/m²', 'W/m²'],
  ] as const)('%s', (_name, x, unit, other) => {
    const lines = steps(evaluateBeam(x).od.trace).filter((l) => l.includes('exposure 4*S'));
    expect(lines.length).toBeGreaterThan(0);
    for (const l of lines) {
      expect(l).toMatch(new RegExp(` ${unit}; / limit [^ ]+ ${unit}$`));
      expect(l).not.toContain(other);
    }
  });
});
