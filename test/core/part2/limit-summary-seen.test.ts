// The limit summary the officer sees for a beam (through evaluateBeam): the governing row and its
// aperture, the list of pulse rules with the ones that apply, the exposure duration, the replaced
// entries and the warnings. Expected values are computed here from the published rows, never read
// back from the core. Sources:
//  - EU Directive 2006/25/EC Annex II Table 2.2 (read): 2600 nm - 1 mm, 1e-7 to 10 s: 5600 t^0.25 J/m²
//    (the icnirp2013 row has the same value, from memory); Table 2.6 rule 2 (read): per pulse H_T / N.
//  - IEC 60825-1:2014 Annex A aperture table (from memory, as the icnirp2013 table holds it):
//    1400 nm - 0.1 mm, 0.35 s to 10 s: 1.5 t^0.375 mm.
//  - ICNIRP 2013 / IEC 60825-1:2014 (from memory, the icnirp2013 table): 1050-1400 nm, 1 ns to
//    13 us: 2e-2 C_C J/m² (row H-E-NIR2-3), C_C = 1 below 1150 nm; C_P reduces retinal thermal
//    limits only (ILSC2019, read).
//  - Aversion response 0.25 s for visible beams (common practice; worked-examples.md
//    aversion-response-time); an exposure is never shorter than one pulse (derived).
import { describe, expect, it } from 'vitest';
import { clearCoreCaches, evaluateBeam, type BeamInput, type Trace } from '../../../core/index.js';

const rel = (got: string | number | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' };
const pulses = (pulseEnergy_J: number, pulseDuration_s: number, repetitionRate_Hz?: number): BeamInput['emission'] => ({
  kind: 'pulsed',
  pulseEnergy_J,
  pulseDuration_s,
  ...(repetitionRate_Hz !== undefined ? { repetitionRate_Hz } : {}),
});
function notes(t: Trace): string[] {
  return [...t.steps.map((s) => `${s.label}: ${s.detail ?? ''}`), ...t.children.flatMap(notes)];
}

describe('governing row and aperture belong to the governing rule', () => {
  it('10.6 um, 1 uJ, 1 us at 100 kHz over 5 s: rule 2 governs, over its own aperture 1.5 * 5^0.375 mm', () => {
    const r = evaluateBeam({ wavelength_nm: 10600, exposureDuration_s: 5, emission: pulses(1e-6, 1e-6, 1e5), beam });
    expect(r.mpe.governingRule).toBe('average-power');
    expect(rel(r.mpe.H_Jm2, (5600 * 5 ** 0.25) / 5e5)).toBeLessThan(1e-9);
    expect(rel(r.mpe.aperture_m, 1.5e-3 * 5 ** 0.375)).toBeLessThan(1e-9); // rule 1 (1 us) would be 1 mm
    // The three rules as listed: rule 1 5600 (1e-6)^0.25 = 177 J/m², rule 2, rule 3 not applying (cornea).
    expect(r.mpe.rules.map((x) => [x.rule, x.applies])).toEqual([['single-pulse', true], ['average-power', true], ['pulse-train', false]]);
    expect(rel(r.mpe.rules[0]?.H_Jm2, 5600 * 1e-6 ** 0.25)).toBeLessThan(1e-9);
    expect(r.warnings).toEqual([]);
  });
  it('1064 nm, 1 mJ, 10 ns at 1 kHz over 10 s: rule 3 governs, named with the single-pulse row 2e-2 C_C (not the 10 s row of rule 2)', () => {
    const r = evaluateBeam({ wavelength_nm: 1064, exposureDuration_s: 10, emission: pulses(1e-3, 1e-8, 1000), beam });
    expect(r.mpe.governingRule).toBe('pulse-train');
    expect(r.mpe.governingRow).toBe('H-E-NIR2-3');
    expect(rel(r.mpe.H_Jm2, 2e-2 * 1e4 ** -0.25)).toBeLessThan(1e-9); // conservative C_P = N^-0.25, N = 1e4 within T2 = 10 s
    expect(r.mpe.rules.map((x) => [x.rule, x.applies])).toEqual([['single-pulse', true], ['average-power', true], ['pulse-train', true]]);
  });
});

describe('CW summary', () => {
  it('1064 nm, 1 W CW over 10 s: one rule listed, the CW limit 10 C_A W/m² (C_A = 5) as 500 J/m², no warnings', () => {
    const r = evaluateBeam({ wavelength_nm: 1064, exposureDuration_s: 10, emission: { kind: 'cw', power_W: 1 }, beam });
    expect(r.mpe.rules.map((x) => [x.rule, x.applies])).toEqual([['cw', true]]);
    expect(rel(r.mpe.rules[0]?.H_Jm2, 500)).toBeLessThan(1e-9);
    expect(r.warnings).toEqual([]);
  });
});

describe('exposure duration never shorter than one pulse (derived)', () => {
  it('532 nm, one 0.5 s pulse, default 0.25 s: assessed over 0.5 s and the derivation says so', () => {
    const r = evaluateBeam({ wavelength_nm: 532, emission: pulses(1e-3, 0.5), beam });
    expect(r.mpe.exposureDuration_s).toBe(0.5);
    expect(notes(r.trace)).toContain('Exposure duration: raised to the pulse duration 0.5 s (an exposure cannot be shorter than one pulse)');
  });
  it('532 nm, 10 ns pulse: nothing raised', () => {
    const r = evaluateBeam({ wavelength_nm: 532, emission: pulses(1e-6, 1e-8), beam });
    expect(notes(r.trace).filter((n) => n.includes('raised to the pulse duration'))).toEqual([]);
  });
});

describe('pulses shorter than the tables (SAFETY.md: the 100 fs limit scaled by t / 100 fs, ours)', () => {
  it('800 nm, 50 fs: the replaced-entry list names the short-pulse scaling', () => {
    const r = evaluateBeam({ wavelength_nm: 800, emission: pulses(1e-6, 5e-14), beam });
    expect(r.mpe.conservativeReplacements).toContain('pulse-shorter-than-tables');
  });
});

// Self-consistency (derived): a beam's limit does not depend on the beam evaluated before it. The
// criteria are memoised on every input but the power; two beams differing only in repetition rate,
// source size or settings must not share them (a room evaluates its beams one after another).
describe('a beam evaluated after another gets its own limit', () => {
  const base: BeamInput = { wavelength_nm: 1064, exposureDuration_s: 10, emission: pulses(1e-3, 1e-8, 1000), beam };
  it.each([
    ['repetition rate', { ...base, emission: pulses(1e-3, 1e-8, 10) }],
    ['source size', { ...base, sourceAngle_rad: 0.05 }],
    ['settings (conservative mode off)', { ...base, settings: { conservative: false } }],
  ] as const)('differing only in %s', (_what, second) => {
    clearCoreCaches();
    const alone = evaluateBeam(second).mpe;
    clearCoreCaches();
    evaluateBeam(base);
    const after = evaluateBeam(second).mpe;
    expect(after.H_Jm2).toBe(alone.H_Jm2);
    expect(after.governingRule).toBe(alone.governingRule);
    expect(evaluateBeam(base).mpe.H_Jm2).not.toBe(alone.H_Jm2);
  });
});

// The governing-row note (EU Directive 2006/25/EC Annex II Table 2.2 notes a and b, read: each row
// over its own limiting aperture) names the limits in the unit of the comparison.
describe('units in the governing-row note', () => {
  const walk = (t: Trace): string[] => [...t.steps.filter((s) => s.label === 'Governing row').map((s) => s.detail ?? ''), ...t.children.flatMap(walk)];
  const b: BeamInput['beam'] = { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' };
  it.each([
    ['CW, 1400 nm, 100 s: W/m²', { ruleSet: 'eu2006', wavelength_nm: 1400, exposureDuration_s: 100, emission: { kind: 'cw', power_W: 1 }, beam: b } as BeamInput, /limit 1000 W\/m²;.*400 W\/m²\)/],
    ['0.5 s pulses at 1 Hz, 1400 nm, 30 000 s: J/m² per pulse', { ruleSet: 'eu2006', wavelength_nm: 1400, exposureDuration_s: 30000, emission: pulses(1e-3, 0.5, 1), beam: b } as BeamInput, /limit 1000 J\/m² per pulse;.*400 J\/m² per pulse\)/],
  ] as const)('%s', (_name, x, re) => {
    const n = walk(evaluateBeam(x).trace);
    expect(n.length).toBe(1);
    expect(n[0]).toMatch(re);
  });
});

// Large irradiated skin areas (IEC 60825-1 / ANSI Z136.1 large-area note, from memory; SAFETY.md):
// for t > 10 s at 1400 nm - 1 mm and A_s above 0.01 m², E = 10/A_s W/m², 100 W/m² from 0.1 m². The
// far-IR skin rows are the eye's (5600 t^0.25 J/m² for 1e-7 to 10 s, EU Table 2.2, read; 1000 W/m²
// from 10 s, from memory) over 3.5 mm.
describe('large-area skin limit in the summary', () => {
  const co2 = (emission: BeamInput['emission'], skinArea_m2: number, wavelength_nm = 10600): BeamInput => ({ wavelength_nm, exposureDuration_s: 100, skinArea_m2, emission, beam: { diameter_m: 0.01, divergence_rad: 0.001, definition: '1/e' } });
  it('exactly 1400 nm, 1 W CW, 0.05 m², 100 s: the rule applies from 1400 nm: 200 W/m², over 100 s 2e4 J/m²', () => {
    const s = evaluateBeam(co2({ kind: 'cw', power_W: 1 }, 0.05, 1400)).skinMpe;
    expect([s.governingRule, s.governingRow]).toEqual(['cw', 'skin-large-area']);
    expect(rel(s.E_Wm2, 200)).toBeLessThan(1e-9);
    expect(rel(s.H_Jm2, 200 * 100)).toBeLessThan(1e-9);
  });
  it('10.6 um, 1 ms pulses at 10 Hz, 0.05 m², 100 s: 200 W/m² as 20 J/m² per pulse governs (rule 2 of the tables: 1000 W/m² = 100 J/m² per pulse)', () => {
    const s = evaluateBeam(co2(pulses(0.01, 1e-3, 10), 0.05)).skinMpe;
    expect([s.governingRule, s.governingRow]).toEqual(['average-power', 'skin-large-area']);
    expect(rel(s.H_Jm2, 20)).toBeLessThan(1e-9);
    expect(rel(s.E_Wm2, 200)).toBeLessThan(1e-9);
  });
  it('10.6 um, 1 us pulses at 1 Hz, 0.02 m², 100 s: one pulse, 5600 (1e-6)^0.25 = 177 J/m², is already below 10/0.02 = 500 J/m² per pulse', () => {
    const s = evaluateBeam(co2(pulses(0.01, 1e-6, 1), 0.02)).skinMpe;
    expect(s.governingRule).toBe('single-pulse');
    expect(rel(s.H_Jm2, 5600 * 1e-6 ** 0.25)).toBeLessThan(1e-9);
  });
});
