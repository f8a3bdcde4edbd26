// The pulsed limit's derivation as the officer reads it (core/limits/pulse-rules.ts, through
// evaluateBeam): the conservative-mode warning names the unverified entries replaced by their
// stricter values, and appears only where one was replaced (SAFETY.md "Conservative mode").
import { describe, expect, it } from 'vitest';
import { evaluateBeam, factorPieceKey, ruleSetTable, type BeamInput, type Trace } from '../../../core/index.js';

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

// Two signed 'differs' checks of pulse-timing factors on one train (SAFETY.md "Checks of the limit
// tables"; test/core/pulse-timing-checks.test.ts has each alone): both reach the pulse rules and each
// is named once in the warnings. 532 nm, 1 ns pulses at 1 kHz for 100 s (rule 3, N counted within
// T2 = 10 s, ICNIRP 2013 from memory); published T2 = 30 s and T_i = 18 us (invented checks).
it('two timing checks (T2 and T_i) on one train: each named once in the warnings', () => {
  const table = ruleSetTable('icnirp2013');
  const key = (name: string): string => factorPieceKey(name, table.factors[name]?.pieces?.[0]);
  const check = (k: string, documentExpr: string, checkId: string) => ({ key: k, verdict: 'differs' as const, documentExpr, checkId, reference: 'IEC 60825-1:2014 Table A.1 (invented check)', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-12-02' });
  const r = evaluateBeam({
    wavelength_nm: 532,
    emission: { kind: 'pulsed', pulseEnergy_J: 1e-7, pulseDuration_s: 1e-9, repetitionRate_Hz: 1e3 },
    beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
    exposureDuration_s: 100,
    settings: { rowChecks: [check(key('T2'), '30', 'chk-invented-1'), check(key('T_i'), '18e-6', 'chk-invented-2')] },
  });
  const said = r.warnings.filter((w) => /pulse rules for the eye/.test(w));
  expect(said.filter((w) => /break-point time T_2/.test(w))).toHaveLength(1);
  expect(said.filter((w) => /pulse grouping time T_i/.test(w))).toHaveLength(1);
});
