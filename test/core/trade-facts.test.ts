// Facts of the trade (test/fixtures/trade-facts.json, each with its published sources) that the
// limit core must reproduce. A fact no standard states as a number (the 0.25 s aversion response,
// the 10 s infrared and 30 000 s working-day durations, the 1 mW class 2 figure as MPE x pupil) is
// checked as COMMON PRACTICE. Facts about eyewear, classes and outdoor levels belong to other parts
// of the project and are not checked here.
import { describe, expect, it } from 'vitest';
import { defaultExposureDuration, exposureLimit, limitingAperture, pulsedExposureLimit } from '../../core/index.js';
import facts from '../fixtures/trade-facts.json' with { type: 'json' };

interface Fact {
  id: string;
  statement: string;
  value: unknown;
  unit: string;
  sources: string[];
  grade: string;
}

const FACTS = facts as Fact[];
function fact(id: string): Fact {
  const f = FACTS.find((x) => x.id === id);
  if (!f) throw new Error(`trade fact ${id} missing from the fixture`);
  return f;
}
const cite = (f: Fact): string => `${f.id} (${f.grade}): ${f.sources[0] ?? ''}`;
const n = (x: unknown): number => {
  if (typeof x !== 'number') throw new Error('not a number');
  return x;
};
const ns = (x: unknown): number[] => (Array.isArray(x) ? x.map(n) : []);
const PUPIL = Math.PI * 0.0035 ** 2;

describe('facts of the trade: exposure durations (common practice)', () => {
  it(`0.25 s for unintended viewing of a visible beam — common practice, ${cite(fact('aversion-response-time'))}`, () => {
    const d = defaultExposureDuration(532);
    expect(d.duration_s).toBe(n(fact('aversion-response-time').value));
    expect(d.basis).toBe('common practice');
  });
  it(`10 s for an invisible infrared beam — common practice, ${cite(fact('fault-case-10s-ir'))}`, () => {
    expect(defaultExposureDuration(1064).duration_s).toBe(n(fact('fault-case-10s-ir').value));
    expect(defaultExposureDuration(10600).duration_s).toBe(10);
  });
  it(`30 000 s working day for ultraviolet and intended viewing — common practice, ${cite(fact('workday-30000s'))}`, () => {
    const v = n(fact('workday-30000s').value);
    expect(defaultExposureDuration(355).duration_s).toBe(v);
    expect(defaultExposureDuration(633, 'intended').duration_s).toBe(v);
  });
});

describe('facts of the trade: limits and apertures', () => {
  it(`visible 0.25 s limit 25.46 W/m² in both rule sets — ${cite(fact('mpe-visible-0p25s'))}`, () => {
    for (const ruleSet of ['eu2006', 'icnirp2013'] as const) {
      const r = exposureLimit({ ruleSet, tissue: 'eye', wavelength_nm: 633, duration_s: 0.25 });
      expect(Number(r.E_Wm2)).toBeCloseTo(n(fact('mpe-visible-0p25s').value), 2);
    }
  });
  it(`7 mm limiting aperture for the eye at 400-1400 nm — ${cite(fact('limiting-aperture-eye'))}`, () => {
    for (const ruleSet of ['eu2006', 'icnirp2013'] as const) for (const [l, t] of [[400, 1e-9], [633, 0.25], [1064, 10], [1399, 3e4]] as const) {
      expect(Number(limitingAperture(ruleSet, 'eye', l, t).diameter_m)).toBe(n(fact('limiting-aperture-eye').value));
    }
  });
  it(`area of the 7 mm aperture 3.848e-5 m² — ${cite(fact('pupil-area'))}`, () => {
    expect(PUPIL / n(fact('pupil-area').value)).toBeCloseTo(1, 3);
  });
  it(`0.25 s limit times the 7 mm pupil ≈ 1 mW (0.98 mW), the class 2 figure — common practice, ${cite(fact('class2-equals-mpe-times-pupil'))}; ${cite(fact('class2-ael-visible'))}`, () => {
    for (const ruleSet of ['eu2006', 'icnirp2013'] as const) {
      const P = Number(exposureLimit({ ruleSet, tissue: 'eye', wavelength_nm: 532, duration_s: 0.25 }).E_Wm2) * PUPIL;
      expect(P / n(fact('class2-equals-mpe-times-pupil').value)).toBeCloseTo(1, 2);
      expect(Math.abs(P / n(fact('class2-ael-visible').value) - 1)).toBeLessThan(0.03);
    }
  });
  it(`alpha_min 1.5 mrad, alpha_max 100 mrad, C_E = 66.7 at alpha_max — ${cite(fact('alpha-min-max'))}`, () => {
    const [amin, amax, c6] = ns(fact('alpha-min-max').value) as [number, number, number];
    const at = (a: number): Record<string, string> => exposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 532, duration_s: 0.25, sourceAngle_rad: a }).factors;
    expect(Number(at(amin).CE)).toBe(1);
    expect(Number(at(amax).CE)).toBeCloseTo(c6, 1);
    expect(Number(at(amax).alpha_max)).toBe(amax * 1000);
  });
  it(`T2 = 10 s for a point source and 100 s at 100 mrad and above — ${cite(fact('T2-range'))}`, () => {
    const [lo, hi] = ns(fact('T2-range').value) as [number, number];
    const T2 = (a: number): number => Number(exposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 633, duration_s: 100, sourceAngle_rad: a }).factors['T2']);
    expect(T2(0)).toBe(lo);
    expect(T2(0.1)).toBeCloseTo(hi, 9);
    expect(T2(0.3)).toBe(hi);
  });
  it(`edition change: 2014 nanosecond retinal limits 2e-3 and 2e-2 J/m² — ${cite(fact('edition-2014-ns-change'))} (from memory; self-consistency check)`, () => {
    const [vis, nir] = ns(fact('edition-2014-ns-change').value) as [number, number];
    expect(Number(exposureLimit({ ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 532, duration_s: 1e-8 }).H_Jm2)).toBe(vis);
    expect(Number(exposureLimit({ ruleSet: 'icnirp2013', tissue: 'eye', wavelength_nm: 1064, duration_s: 1e-8 }).H_Jm2)).toBe(nir);
    // and the EU values are 2.5 times higher
    expect(Number(exposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 532, duration_s: 1e-8 }).H_Jm2)).toBe(vis * 2.5);
  });
});

describe('facts of the trade: repetitive pulses', () => {
  const tmin = fact('Tmin-pulse-grouping');
  const bands = Object.entries(tmin.value as Record<string, number>);
  it.each(bands)(`T_min for %s nm = %s s: pulses closer together count as one — ${cite(tmin)}`, (band, T) => {
    const [lo, hi] = band.split('-').map(Number) as [number, number];
    const lambda = (lo + hi) / 2;
    const tp = Math.min(T / 10, 1e-9);
    // just faster than 1/T_min: two pulses inside T_min; just slower: no grouping
    const fast = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: lambda, pulseDuration_s: tp, repetitionRate_Hz: 1.5 / T, exposureDuration_s: Math.min(3e4, Math.max(10, 100 * T)) });
    const slow = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: lambda, pulseDuration_s: tp, repetitionRate_Hz: 0.9 / T, exposureDuration_s: Math.min(3e4, Math.max(10, 100 * T)) });
    expect(fast.grouping?.groupedPulses).toBe('2');
    expect(Number(fast.grouping?.groupDuration_s)).toBeCloseTo(T, 15);
    expect(slow.grouping).toBeNull();
  });
  it(`three rules, C_P = N^-0.25 for thermal limits — ${cite(fact('three-rules'))}`, () => {
    // 16 pulses of 1 µs at 1064 nm within 10 s: C_P = 16^-0.25 = 0.5
    const r = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 1064, pulseDuration_s: 1e-6, repetitionRate_Hz: 1.6, exposureDuration_s: 10 });
    expect(Number(r.pulseTrain?.N)).toBe(16);
    expect(Number(r.pulseTrain?.CP)).toBeCloseTo(16 ** n(fact('three-rules').value), 12);
    expect(r.singlePulse).toBeDefined();
    expect(r.averagePower).not.toBeNull();
  });
  it(`C_P only for pulses shorter than 0.25 s, N counted up to T2 (400-1400 nm) or 10 s (above) — ${cite(fact('C5-scope'))}`, () => {
    const long = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 633, pulseDuration_s: 0.3, repetitionRate_Hz: 1, exposureDuration_s: 100 });
    expect(long.pulseTrain?.applies).toBe(false);
    const vis = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 633, pulseDuration_s: 1e-6, repetitionRate_Hz: 10, exposureDuration_s: 100 });
    expect(vis.pulseTrain?.N).toBe('100'); // 10 Hz within T2 = 10 s
    const ir = pulsedExposureLimit({ ruleSet: 'eu2006', tissue: 'eye', wavelength_nm: 2000, pulseDuration_s: 1e-6, repetitionRate_Hz: 10, exposureDuration_s: 100 });
    expect(ir.pulseTrain?.N).toBe('100'); // 10 Hz within 10 s
  });
});
