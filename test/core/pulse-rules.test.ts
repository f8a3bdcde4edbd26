// The repetitive-pulse rules (core/limits/pulse-rules.ts). Sources:
//  - EU Directive 2006/25/EC Annex II Table 2.6 (read; limit specification 5.6): rules 1-3,
//    C_P = N^-0.25 for every THERMAL limit, T_min grouping;
//  - BGI 832 (read; practice after IEC 60825-1:2001): N counted up to T2 (400-1400 nm) or 10 s,
//    C_P only for pulses < 0.25 s, grouping inside T_min only for pulses longer than 1 ns;
//  - ICNIRP 2013 / IEC 60825-1:2014 4.3 f) (from memory; limit specification 4.6): C_P for retinal
//    thermal limits only (scope read in ILSC2019), alpha-dependent C_P with caps (uncertain ->
//    conservative N^-0.25 unless 'rule:CP' is verified), N within min(T, T2), grouping inside T_i.
// Values are hand-computed from those rules; each case names the rule it checks.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { exposureLimit, pulsedExposureLimit, traceToText, allSteps, type PulsedLimitQuery } from '../../core/index.js';

const rel = (a: string | number | undefined, b: number): number => Math.abs(Number(a) / b - 1);

describe('single pulse (rule 1 only)', () => {
  it('no repetition rate: rules 2 and 3 do not arise; mean irradiance = H / pulse duration [spec 4.6 rule 1]', () => {
    const r = pulsedExposureLimit({ tissue: 'eye', wavelength_nm: 1064, pulseDuration_s: 1e-8, exposureDuration_s: 10 });
    expect(r.averagePower).toBeNull();
    expect(r.pulseTrain).toBeNull();
    expect(r.grouping).toBeNull();
    expect(r.governingRule).toBe('single-pulse');
    expect(r.perPulse_H_Jm2).toBe(r.singlePulse.limit.H_Jm2);
    expect(rel(r.perPulse_H_Jm2, 2e-2)).toBeLessThan(1e-12); // H-E-NIR2-3, 2e-2 C_C C_E (from memory)
    expect(rel(r.average_E_Wm2, 2e-2 / 1e-8)).toBeLessThan(1e-12);
  });
});

interface Case {
  readonly why: string;
  readonly source: string;
  readonly q: PulsedLimitQuery;
  readonly expect: {
    readonly governing?: 'single-pulse' | 'average-power' | 'pulse-train';
    readonly rule1?: number;
    readonly rule2?: number;
    readonly N2?: number;
    readonly N3?: number;
    readonly CP?: number;
    readonly rule3?: number;
    readonly applies?: boolean;
    readonly grouped?: number | null;
    readonly replaced?: boolean;
  };
}

const CASES: Case[] = [
  {
    why: 'eu2006 skin 1064 nm: C_P applies to skin (thermal) limits, no cap on N',
    source: 'EU 2006/25/EC Annex II Table 2.6 rule 3 (read): "limits protecting against thermal injury"',
    q: { ruleSet: 'eu2006', tissue: 'skin', wavelength_nm: 1064, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e4, exposureDuration_s: 10 },
    // single: 200*C_A = 1000 J/m²; average over exactly 10 s: the lower row at the edge,
    // 1.1e4*C_A*10^0.25 = 97 805 J/m² (EU Table 2.4 note a), over 1e5 pulses; C_P = 1e5^-0.25
    expect: { governing: 'average-power', rule1: 1000, rule2: (1.1e4 * 5 * 10 ** 0.25) / 1e5, N2: 1e5, N3: 1e5, CP: 1e5 ** -0.25, rule3: 1000 * 1e5 ** -0.25, applies: true, grouped: null },
  },
  {
    why: 'icnirp2013 skin: C_P does not apply (retinal thermal only)',
    source: 'ILSC2019 (read): C_P applied only to retinal thermal limits in ICNIRP/IEC/ANSI',
    q: { ruleSet: 'icnirp2013', tissue: 'skin', wavelength_nm: 1064, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e4, exposureDuration_s: 10 },
    expect: { governing: 'average-power', rule1: 1000, rule2: (1.1e4 * 5 * 10 ** 0.25) / 1e5, applies: false },
  },
  {
    why: 'icnirp2013 eye 1550 nm: corneal limits, C_P does not apply; the 100 pulses inside T_i = 10 s are one pulse (its limit ties with rule 2, the earlier rule is named)',
    source: 'ILSC2019 (read); limit specification 4.6 rule 3; T_i 1500-1800 nm = 10 s (from memory, = EU T_min, read)',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 1550, pulseDuration_s: 1e-8, repetitionRate_Hz: 10, exposureDuration_s: 10 },
    expect: { governing: 'single-pulse', rule1: 1e4, rule2: 1e4 / 100, grouped: 100, applies: false },
  },
  {
    why: 'eu2006 eye 2000 nm: corneal thermal limit, C_P applies; N counted within 10 s above 1400 nm',
    source: 'EU Table 2.6 rule 3 (read); BGI 832 (read) for the 10 s count; EU Table 2.2 1e3 J/m² (read)',
    q: { ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 2000, pulseDuration_s: 1e-8, repetitionRate_Hz: 10, exposureDuration_s: 100 },
    // rule 2 over 100 s: 1e3 W/m² * 100 s / 1000 pulses = 100 J/m² per pulse; rule 3: 1e3 * 100^-0.25 = 316
    expect: { governing: 'average-power', rule1: 1e3, rule2: 100, N2: 1000, N3: 100, CP: 100 ** -0.25, rule3: 1e3 * 100 ** -0.25, applies: true, grouped: null },
  },
  {
    why: 'eu2006 eye 1550 nm at 10 Hz: pulses inside T_min = 10 s are one 10 s pulse, so C_P (pulses < 0.25 s) does not apply',
    source: 'EU Table 2.6 T_min 1500-1800 nm = 10 s (read); BGI 832 (read): C_P only below 0.25 s',
    q: { ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 1550, pulseDuration_s: 1e-8, repetitionRate_Hz: 10, exposureDuration_s: 100 },
    expect: { rule1: 1e4, rule2: 100, N2: 1000, grouped: 100, applies: false },
  },
  {
    why: 'eu2006 eye 250 nm: photochemical UV limit, C_P does not apply',
    source: 'EU Table 2.6 rule 3 (read): thermal limits only; EU Table 2.2 (30 J/m², photochemical)',
    q: { ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 250, pulseDuration_s: 1e-8, repetitionRate_Hz: 100, exposureDuration_s: 1 },
    expect: { governing: 'average-power', rule1: 30, rule2: 30 / 100, applies: false },
  },
  {
    why: 'pulses of 0.3 s: C_P only for pulses shorter than 0.25 s',
    source: 'BGI 832 (read); limit specification 4.6 conditions',
    q: { ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 633, pulseDuration_s: 0.3, repetitionRate_Hz: 1, exposureDuration_s: 5 },
    expect: { applies: false, N2: 5 },
  },
  {
    why: 'icnirp2013 extended source (50 mrad): N counted within T2 = 10*10^((50-1.5)/98.5) = 31.07 s',
    source: 'limit specification 4.6 (from memory): N within min(T, T2); T2 from EU Table 2.5 (read)',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 1e-8, repetitionRate_Hz: 10, exposureDuration_s: 100, sourceAngle_rad: 0.05 },
    // alpha = 50 mrad > alpha_max(10 ns) = 5 mrad and N <= 625: the remembered form is N^-0.25 too,
    // so nothing is replaced
    expect: { N2: 1000, N3: 311, CP: 311 ** -0.25, applies: true, replaced: false },
  },
  {
    why: 'icnirp2013 C_P verified, 10 mrad source, 10 ms pulses, N = 100 > 40: C_P = 0.4 (5 mrad < alpha <= alpha_max)',
    source: 'IEC 60825-1:2014 4.3 f) C5 (from memory, uncertain); verified setting only',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 0.01, repetitionRate_Hz: 10, exposureDuration_s: 10, sourceAngle_rad: 0.01, settings: { verifiedRows: ['rule:CP'] } },
    expect: { N3: 100, CP: 0.4, applies: true, replaced: false },
  },
  {
    why: 'icnirp2013 same case in conservative mode: C_P = 100^-0.25 = 0.316 replaces the unverified 0.4',
    source: 'limit specification 4.6 conservative mode (ours)',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 0.01, repetitionRate_Hz: 10, exposureDuration_s: 10, sourceAngle_rad: 0.01 },
    expect: { N3: 100, CP: 100 ** -0.25, applies: true, replaced: true },
  },
  {
    why: 'icnirp2013 C_P verified, source larger than alpha_max, N = 1000 > 625: C_P = 0.2',
    source: 'IEC 60825-1:2014 4.3 f) C5 (from memory, uncertain); verified setting only',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 1e-6, repetitionRate_Hz: 100, exposureDuration_s: 10, sourceAngle_rad: 0.05, settings: { verifiedRows: ['rule:CP'] } },
    expect: { N3: 1000, CP: 0.2, applies: true, replaced: false },
  },
  {
    why: 'icnirp2013 C_P verified, point source: C_P = 1 (alpha <= 5 mrad)',
    source: 'IEC 60825-1:2014 4.3 f) C5 (from memory, uncertain); worked-examples edition note',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 1064, pulseDuration_s: 1e-8, repetitionRate_Hz: 100, exposureDuration_s: 10, settings: { verifiedRows: ['rule:CP'] } },
    expect: { CP: 1, rule3: 2e-2, applies: true, replaced: false },
  },
  {
    why: 'icnirp2013 80 MHz, 100 fs at 800 nm: 400 pulses inside T_i = 5 µs are one pulse; groups counted for C_P',
    source: 'limit specification 4.6 (from memory): pulses within T_i counted as one, energies summed against the limit for T_i',
    q: { ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 800, pulseDuration_s: 1e-13, repetitionRate_Hz: 8e7, exposureDuration_s: 10 },
    // rule 2: 10*C_A W/m² * 10 s / 8e8 pulses; groups: 8e8 / 400 = 2e6 within T2 = 10 s
    expect: { governing: 'average-power', rule2: (10 * 10 ** 0.2 * 10) / 8e8, N2: 8e8, N3: 2e6, grouped: 400, applies: true },
  },
  {
    why: 'eu2006 1 GHz train of 0.1 ns UV-A pulses: summed inside T_min = 1 ns, but pulses not longer than 1 ns are still counted singly for C_P',
    source: 'EU Table 2.6 T_min 315-400 nm = 1 ns (read); BGI 832 (read): grouping only for pulses longer than 1 ns',
    q: { ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 355, pulseDuration_s: 1e-10, repetitionRate_Hz: 2e9, exposureDuration_s: 1e-6 },
    expect: { N2: 2000, N3: 2000, grouped: 2, applies: true },
  },
];

describe('rules 2 and 3 and grouping, case by case', () => {
  it.each(CASES)('$why [$source]', ({ q, expect: e }) => {
    const r = pulsedExposureLimit(q);
    if (e.governing) expect(r.governingRule).toBe(e.governing);
    if (e.rule1 !== undefined) expect(rel(r.singlePulse.H_Jm2, e.rule1)).toBeLessThan(1e-9);
    if (e.rule2 !== undefined) expect(rel(r.averagePower?.H_Jm2, e.rule2)).toBeLessThan(1e-9);
    if (e.N2 !== undefined) expect(Number(r.averagePower?.N)).toBe(e.N2);
    if (e.N3 !== undefined) expect(Number(r.pulseTrain?.N)).toBe(e.N3);
    if (e.CP !== undefined) expect(rel(r.pulseTrain?.CP, e.CP)).toBeLessThan(1e-9);
    if (e.rule3 !== undefined) expect(rel(r.pulseTrain?.H_Jm2, e.rule3)).toBeLessThan(1e-9);
    if (e.applies !== undefined) expect(r.pulseTrain?.applies).toBe(e.applies);
    if (e.grouped === null) expect(r.grouping).toBeNull();
    else if (e.grouped !== undefined) expect(Number(r.grouping?.groupedPulses)).toBe(e.grouped);
    if (e.replaced !== undefined) expect(r.conservativeReplacements.includes('rule:CP')).toBe(e.replaced);
  });
});

describe('grouping inside T_i: the summed energy against the limit for T_i', () => {
  it('icnirp2013 800 nm, 80 MHz: per pulse = H(5 µs) / 400 [limit specification 4.6, from memory]', () => {
    const r = pulsedExposureLimit({ tissue: 'eye', wavelength_nm: 800, pulseDuration_s: 1e-13, repetitionRate_Hz: 8e7, exposureDuration_s: 10 });
    const H5us = Number(exposureLimit({ tissue: 'eye', wavelength_nm: 800, duration_s: 5e-6 }).H_Jm2);
    expect(rel(r.grouping?.perPulse_H_Jm2, H5us / 400)).toBeLessThan(1e-12);
    expect(Number(r.grouping?.groupDuration_s)).toBe(5e-6);
    expect(r.grouping?.why).toContain('T_i');
  });
  it('burst of 10 pulses 100 ns apart on the 1 ns-5 µs plateau: the group limit governs per pulse (2e-3/10)', () => {
    // 10 MHz for 1 µs = 10 pulses inside T_i = 5 µs; the plateau value 2e-3 J/m² holds for the whole burst
    const r = pulsedExposureLimit({ tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e7, exposureDuration_s: 1e-6 });
    expect(Number(r.grouping?.groupedPulses)).toBe(10);
    expect(rel(r.grouping?.perPulse_H_Jm2, 2e-4)).toBeLessThan(1e-12);
    expect(rel(r.perPulse_H_Jm2, Math.min(2e-4, Number(r.pulseTrain?.H_Jm2)))).toBeLessThan(1e-12);
    expect(r.singlePulse.H_Jm2).toBe(r.singlePulse.limit.H_Jm2); // rule 1 itself stays the plain single-pulse limit
  });
});

describe('the result shows all three rules and names the governing one', () => {
  const r = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000, exposureDuration_s: 0.25 });
  it('trace steps for rule 1, rule 2, rule 3 and the governing rule, with sources', () => {
    const labels = r.trace.steps.map((s) => s.label);
    expect(labels).toEqual(expect.arrayContaining(['Rule 1: single pulse', 'Rule 2: average power', 'Rule 3: pulse train', 'Governing']));
    const gov = r.trace.steps.find((s) => s.label === 'Governing');
    expect(gov?.detail).toContain('pulse-train');
    for (const l of ['Rule 1: single pulse', 'Rule 2: average power', 'Rule 3: pulse train']) expect(r.trace.steps.find((s) => s.label === l)?.source).toMatch(/Tableau 2\.6|Table 2\.6/);
    expect(r.trace.children.length).toBe(2); // the single-pulse and the exposure-duration limits
    expect(traceToText(r.trace)).toContain('Rule 3: pulse train');
  });
  it('mean irradiance = per-pulse limit * rate', () => {
    expect(rel(r.average_E_Wm2, Number(r.perPulse_H_Jm2) * 1000)).toBeLessThan(1e-12);
  });
  it('conservative replacements are named in the trace (icnirp2013, C_P unverified)', () => {
    const c = pulsedExposureLimit({ tissue: 'eye', wavelength_nm: 532, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000, exposureDuration_s: 0.25 });
    expect(c.conservativeReplacements).toContain('rule:CP');
    expect(allSteps(c.trace).some((s) => s.kind === 'warning' && s.detail.includes('the pulse correction factor C_P'))).toBe(true);
  });
});

const pulsedQuery = fc
  .record({
    ruleSet: fc.constantFrom('icnirp2013' as const, 'eu2006' as const),
    tissue: fc.constantFrom('eye' as const, 'skin' as const),
    lg_lambda: fc.double({ min: Math.log10(180), max: 6, noNaN: true }),
    lg_tp: fc.double({ min: -13, max: 0, noNaN: true }),
    lg_duty: fc.double({ min: -9, max: -0.001, noNaN: true }),
    lg_T: fc.double({ min: 0, max: 4.47, noNaN: true }),
    alpha: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 0.3, noNaN: true })),
    verified: fc.boolean(),
  })
  .map((x): PulsedLimitQuery => {
    const tp = 10 ** x.lg_tp;
    const T = Math.max(tp, Math.min(3e4, 10 ** x.lg_T));
    return {
      ruleSet: x.ruleSet,
      tissue: x.tissue,
      wavelength_nm: Math.max(180, Math.min(1e6, 10 ** x.lg_lambda)),
      pulseDuration_s: tp,
      repetitionRate_Hz: 10 ** x.lg_duty / tp,
      exposureDuration_s: T,
      sourceAngle_rad: x.alpha,
      ...(x.verified ? { settings: { verifiedRows: ['rule:CP'] } } : {}),
    };
  });

describe('properties over random pulse trains (fast-check)', () => {
  it('the governing per-pulse limit is finite, positive and never above any rule that applies', () => {
    fc.assert(
      fc.property(pulsedQuery, (q) => {
        const r = pulsedExposureLimit(q);
        const pp = Number(r.perPulse_H_Jm2);
        if (!(Number.isFinite(pp) && pp > 0 && Number.isFinite(Number(r.average_E_Wm2)))) return false;
        if (pp > Number(r.singlePulse.H_Jm2) * (1 + 1e-12)) return false;
        if (r.averagePower && pp > Number(r.averagePower.H_Jm2) * (1 + 1e-12)) return false;
        if (r.pulseTrain?.applies && pp > Number(r.pulseTrain.H_Jm2) * (1 + 1e-12)) return false;
        if (r.grouping && pp > Number(r.grouping.perPulse_H_Jm2) * (1 + 1e-12)) return false;
        const cp = Number(r.pulseTrain?.CP ?? 1);
        return cp > 0 && cp <= 1;
      }),
      { numRuns: 400 },
    );
  });
  it('conservative C_P is never larger than the verified piecewise C_P', () => {
    fc.assert(
      fc.property(pulsedQuery, (q) => {
        const cons = pulsedExposureLimit({ ...q, settings: {} });
        const ver = pulsedExposureLimit({ ...q, settings: { verifiedRows: ['rule:CP'] } });
        return Number(cons.perPulse_H_Jm2) <= Number(ver.perPulse_H_Jm2) * (1 + 1e-12);
      }),
      { numRuns: 300 },
    );
  });
});
