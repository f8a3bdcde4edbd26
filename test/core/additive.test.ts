// Several wavelengths on the same tissue (core/limits/additive.ts). The rule: exposures whose effects
// act on the same tissue add as fractions of their own limits, and the sum must not exceed 1
// (limit specification section 3, "Multiple wavelengths"; BGI 832 Tabelle 1, read, layout garbled).
// WHICH bands add is the additivity table of IEC 60825-1, not reproduced in our specification
// (open point 10.9): the grouping tested here is OURS and broad on purpose (retina thermal, retina
// photochemical, cornea and lens, skin), so every check below is a self-consistency check of that
// choice, not a check against a published cell pattern.
import { describe, expect, it } from 'vitest';
import { additiveFractions, allSteps, exposureLimit, pulsedExposureLimit, type ExposureLimitResult } from '../../core/index.js';

const eye = (lambda: number, t: number, ruleSet: 'icnirp2013' | 'eu2006' = 'icnirp2013'): ExposureLimitResult => exposureLimit({ ruleSet, tissue: 'eye', wavelength_nm: lambda, duration_s: t });
const skin = (lambda: number, t: number): ExposureLimitResult => exposureLimit({ tissue: 'skin', wavelength_nm: lambda, duration_s: t });
const H = (r: ExposureLimitResult, fraction: number): string => String(Number(r.H_Jm2) * fraction);

describe('sums of fractions per tissue and hazard group (grouping ours, pending the IEC additivity table)', () => {
  it('two visible beams at 10 s on the retina: 0.5 + 0.3 = 0.8, within the limits', () => {
    const g = eye(532, 10);
    const r = eye(633, 10);
    const res = additiveFractions([
      { label: 'green', H_Jm2: H(g, 0.5), limit: g },
      { label: 'red', H_Jm2: H(r, 0.3), limit: r },
    ]);
    const thermal = res.groups.find((x) => x.group === 'eye:retina-thermal');
    expect(Number(thermal?.sum)).toBeCloseTo(0.8, 12);
    expect(thermal?.terms.map((t) => t.label)).toEqual(['green', 'red']);
    expect(res.withinLimits).toBe(true);
    expect(res.governing.group).toBe('eye:retina-thermal');
  });

  it('532 nm at 3e4 s also counts against the blue-light limit (dual limits act separately)', () => {
    const g = eye(532, 3e4);
    const b = eye(450, 3e4);
    const res = additiveFractions([
      { label: 'green', H_Jm2: H(g, 0.5), limit: g }, // 0.5 of the thermal limit (governing at 532 nm)
      { label: 'blue', H_Jm2: H(b, 0.6), limit: b }, // 0.6 of the photochemical limit (governing at 450 nm)
    ]);
    const pc = res.groups.find((x) => x.group === 'eye:retina-photochemical');
    const th = res.groups.find((x) => x.group === 'eye:retina-thermal');
    // green against the photochemical row: 0.5 * 10 W/m² / (1 * C_B) with C_B = 10^(0.02*82) = 43.65
    const greenPc = (0.5 * 10) / 10 ** (0.02 * 82);
    expect(Number(pc?.sum)).toBeCloseTo(0.6 + greenPc, 9);
    // blue against the thermal row: 0.6 * 1 W/m² / 10 W/m²
    expect(Number(th?.sum)).toBeCloseTo(0.5 + 0.06, 9);
    expect(res.governing.group).toBe('eye:retina-photochemical');
  });

  it('CO2 (cornea) and red (retina) do not add: 0.7 and 0.7, each within', () => {
    const c = eye(10600, 10);
    const g = eye(633, 10);
    const res = additiveFractions([
      { label: 'CO2', H_Jm2: H(c, 0.7), limit: c },
      { label: 'red', H_Jm2: H(g, 0.7), limit: g },
    ]);
    expect(res.groups.map((x) => x.group).sort()).toEqual(['eye:cornea-lens', 'eye:retina-thermal']);
    expect(Number(res.maxSum)).toBeCloseTo(0.7, 12);
    expect(res.withinLimits).toBe(true);
  });

  it('UV-A and CO2 both act on the front of the eye: 0.6 + 0.6 = 1.2 exceeds (broad grouping, ours)', () => {
    const u = eye(355, 10);
    const c = eye(10600, 10);
    const res = additiveFractions([
      { label: 'UV-A', H_Jm2: H(u, 0.6), limit: u },
      { label: 'CO2', H_Jm2: H(c, 0.6), limit: c },
    ]);
    expect(res.governing.group).toBe('eye:cornea-lens');
    expect(Number(res.maxSum)).toBeCloseTo(1.2, 12);
    expect(res.withinLimits).toBe(false);
    expect(res.governing.exceeds).toBe(true);
  });

  it('skin: every band adds (1064 nm and 10.6 µm, 0.6 + 0.6)', () => {
    const a = skin(1064, 10);
    const b = skin(10600, 10);
    const res = additiveFractions([
      { label: 'Nd:YAG', H_Jm2: H(a, 0.6), limit: a },
      { label: 'CO2', H_Jm2: H(b, 0.6), limit: b },
    ]);
    expect(res.groups.map((x) => x.group)).toEqual(['skin']);
    expect(Number(res.maxSum)).toBeCloseTo(1.2, 12);
    expect(res.withinLimits).toBe(false);
  });

  it('a pulsed beam is compared per pulse with its governing per-pulse limit', () => {
    const p = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000, exposureDuration_s: 0.25 });
    const cw = eye(633, 0.25, 'eu2006');
    const res = additiveFractions([
      { label: 'pulsed green', H_Jm2: String(Number(p.perPulse_H_Jm2) * 0.4), pulsed: p },
      { label: 'red pointer', H_Jm2: H(cw, 0.4), limit: cw },
    ]);
    const th = res.groups.find((x) => x.group === 'eye:retina-thermal');
    expect(Number(th?.sum)).toBeCloseTo(0.8, 12);
    expect(th?.terms[0]?.rowId).toContain('pulse-train');
  });

  it('the reported sum is rounded UP; the trace marks the grouping as ours and names the pending table', () => {
    const g = eye(532, 10);
    const res = additiveFractions([{ label: 'green', H_Jm2: H(g, 0.12341), limit: g }]);
    expect(res.maxSum_reported).toBe('0.124');
    const steps = allSteps(res.trace);
    expect(steps.find((s) => s.label === 'Grouping')?.source).toContain('IEC 60825-1');
    expect(steps.every((s) => s.kind !== 'formula' || s.confidence === 'ours')).toBe(true);
  });

  it('limits evaluated over different durations are flagged in the trace', () => {
    const a = eye(532, 10);
    const b = eye(633, 100);
    const res = additiveFractions([
      { label: 'a', H_Jm2: '1', limit: a },
      { label: 'b', H_Jm2: '1', limit: b },
    ]);
    expect(res.trace.steps.some((s) => s.kind === 'warning' && s.label === 'Durations differ')).toBe(true);
  });
});
