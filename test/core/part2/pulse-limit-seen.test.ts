// The pulsed limit's derivation as the officer reads it (core/limits/pulse-rules.ts, through
// evaluateBeam): the conservative-mode warning names the unverified entries replaced by their
// stricter values, and appears only where one was replaced (SAFETY.md "Conservative mode").
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type Trace } from '../../../core/index.js';

const warnings = (x: BeamInput): string[] => {
  const out: string[] = [];
  const walk = (t: Trace): void => {
    for (const s of t.steps) if (s.kind === 'warning' && s.label === 'Conservative mode') out.push(s.detail);
    t.children.forEach(walk);
  };
  walk(evaluateBeam(x).trace);
  return out;
};
const train = (ruleSet: 'eu2006' | 'icnirp2013'): BeamInput => ({
  ruleSet,
  wavelength_nm: 532,
  exposureDuration_s: 0.25,
  emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 },
  beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
});

describe('the conservative-mode warning of a pulse train (532 nm, 1 mJ, 10 ns, 1 kHz over 0.25 s)', () => {
  // EU Directive 2006/25/EC Table 2.6 (read): C_P = N^-0.25, every entry used here read: nothing replaced.
  it('EU Directive: every entry used is read, so no conservative-mode warning', () => {
    expect(warnings(train('eu2006'))).toEqual([]);
  });
  // ICNIRP 2013 (from memory): C_P's piecewise form is unverified, N^-0.25 is used in conservative
  // mode (SAFETY.md "Pulse trains"; exposure-limits.md 4.6): the warning names it.
  it('ICNIRP 2013: the warning names the replaced pulse correction factor', () => {
    const w = warnings(train('icnirp2013'));
    expect(w.length).toBeGreaterThan(0);
    expect(w.every((d) => /^unverified entries replaced by the stricter value: \S/.test(d))).toBe(true);
  });
});
