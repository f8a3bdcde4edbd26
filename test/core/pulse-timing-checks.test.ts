/**
 * An officer's signed 'differs' check of a pulse-timing factor (the grouping time T_i, the T2 that
 * caps the window in which pulses are counted) applies to the pulse rules too: they are evaluated
 * with the table's value and with the published one, and the lower per-pulse limit is kept — a
 * check never raises a limit (SAFETY.md, "Checks of the limit tables"). Checked through
 * evaluateBeam, on the number the officer sees (the eye limit per pulse, the NOHD) and the warning.
 *
 * Sources of the expected numbers (all marked in the tables as from memory, so these are
 * self-consistency checks of the rule, not of the published values):
 *  - ICNIRP 2013 / IEC 60825-1:2014 Table A.1 (from memory): 400-700 nm, 1e-11 s to 5e-6 s,
 *    H = 2e-3 J/m² for one pulse (small source, C_E = 1);
 *  - IEC 60825-1:2014 clause 4.3 f) (from memory): C_P = N^-0.25 with N counted within min(T, T2);
 *    T2 = 10 s for alpha < 1.5 mrad (also EU Directive 2006/25/EC Table 2.5, read).
 * The checks and the people are invented (demo scenario).
 */
import { describe, expect, it } from 'vitest';
import { evaluateBeam, factorPieceKey, ruleSetTable, type BeamInput, type LimitSettings } from '../../core/index.js';

const table = ruleSetTable('icnirp2013');
const firstPiece = (name: string): string => {
  const p = table.factors[name]?.pieces?.[0];
  if (!p) throw new Error(`factor ${name} has no pieces`);
  return factorPieceKey(name, p);
};
const T2_SMALL_SOURCE = firstPiece('T2'); // alpha < 1.5 mrad
const T_I_VISIBLE = firstPiece('T_i'); // 400-1050 nm

function differs(key: string, documentExpr: string): LimitSettings {
  return { rowChecks: [{ key, verdict: 'differs', documentExpr, checkId: 'chk-invented-1', reference: 'IEC 60825-1:2014 Table A.1 (invented check)', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-12-02' }] };
}

/** 532 nm, 1 ns pulses at 1 kHz for 100 s, small source: rule 3 governs with N counted within T2. */
const TRAIN_100S: BeamInput = {
  wavelength_nm: 532,
  emission: { kind: 'pulsed', pulseEnergy_J: 1e-7, pulseDuration_s: 1e-9, repetitionRate_Hz: 1e3 },
  beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
  exposureDuration_s: 100,
};
/** 532 nm, 100 fs pulses at 80 MHz for 0.25 s: many pulses inside one T_i. */
const MODE_LOCKED: BeamInput = {
  wavelength_nm: 532,
  emission: { kind: 'pulsed', pulseEnergy_J: 1e-9, pulseDuration_s: 1e-13, repetitionRate_Hz: 8e7 },
  beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
  exposureDuration_s: 0.25,
};

const relClose = (a: string, b: number): void => expect(Math.abs(Number(a) / b - 1)).toBeLessThan(1e-9);

describe("a 'differs' check of a pulse-timing factor applies to the pulse rules", () => {
  it('table T2 = 10 s: N = 1e4 pulses, 2e-3 * 1e4^-0.25 = 2e-4 J/m² per pulse (no check)', () => {
    const r = evaluateBeam(TRAIN_100S);
    expect(r.mpe.governingRule).toBe('pulse-train');
    relClose(r.mpe.H_Jm2, 2e-4);
  });

  const CASES = [
    { why: 'published T2 = 30 s (longer window, more pulses counted): 2e-3 * 3e4^-0.25, lower, used', expr: '30', expected: 2e-3 * 3e4 ** -0.25, used: true },
    { why: 'published T2 = 3 s (shorter window): would raise the limit, the table’s 2e-4 is kept', expr: '3', expected: 2e-4, used: false },
  ] as const;
  it.each(CASES)('$why', ({ expr, expected, used }) => {
    const plain = evaluateBeam(TRAIN_100S);
    const r = evaluateBeam({ ...TRAIN_100S, settings: differs(T2_SMALL_SOURCE, expr) });
    relClose(r.mpe.H_Jm2, expected);
    expect(Number(r.mpe.H_Jm2)).toBeLessThanOrEqual(Number(plain.mpe.H_Jm2));
    if (used) expect(Number(r.nohd_m)).toBeGreaterThan(Number(plain.nohd_m));
    else expect(r.nohd_m).toBe(plain.nohd_m);
    const said = r.warnings.find((w) => /pulse rules for the eye/.test(w) && /break-point time T_2/.test(w));
    expect(said).toBeDefined();
    expect(said).toContain(`it gives ${expr}`);
    expect(said).toContain('Dr. Imre Calloway-Senn');
    expect(said).toContain(used ? 'the published value gives the lower limit and is used' : 'the value as written gives the lower (or the same) limit and is kept');
  });

  it('grouping time T_i: a longer published value is evaluated too and never raises the limit; a shorter one leaves it unchanged', () => {
    const plain = evaluateBeam(MODE_LOCKED);
    const longer = evaluateBeam({ ...MODE_LOCKED, settings: differs(T_I_VISIBLE, '18e-6') });
    const shorter = evaluateBeam({ ...MODE_LOCKED, settings: differs(T_I_VISIBLE, '1e-6') });
    expect(Number(longer.mpe.H_Jm2)).toBeLessThan(Number(plain.mpe.H_Jm2));
    expect(shorter.mpe.H_Jm2).toBe(plain.mpe.H_Jm2);
    for (const r of [longer, shorter]) expect(r.warnings.some((w) => /pulse grouping time T_i/.test(w) && /pulse rules for the eye/.test(w))).toBe(true);
  });

  it("a 'matches' check of T2 changes nothing in the pulse rules", () => {
    const plain = evaluateBeam(TRAIN_100S);
    const r = evaluateBeam({ ...TRAIN_100S, settings: { rowChecks: [{ key: T2_SMALL_SOURCE, verdict: 'matches', checkId: 'chk-invented-2', reference: 'IEC 60825-1:2014 (invented check)', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-12-02' }] } });
    expect(r.mpe.H_Jm2).toBe(plain.mpe.H_Jm2);
    expect(r.warnings.some((w) => /pulse rules/.test(w))).toBe(false);
  });
});
