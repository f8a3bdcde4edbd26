// Continuity of the limits at every duration breakpoint, following the self-check of the project's
// limit specification (section 8): 23 wavelengths, every row edge plus T1, T2, 625 µs and 0.25 s,
// alpha = 1 and 50 mrad, eye and skin, both rule sets, icnirp2013 as remembered and in conservative
// mode. A step of at most 2 % is the tables' own rounding and passes; every larger step must be one
// that section 8 lists (with its ratio), and no unlisted step may appear.
// Then property tests (fast-check) over random valid queries: finite and positive; the radiant
// exposure limit never decreases with duration by more than the largest published rounding step
// (set (a) retina at 5 µs: 2e-3 -> 1.90e-3 J/m², -4.8 %), except the inherent drop where the
// photochemical limit starts at 10 s for extended sources at 400-600 nm (section 8, "not an error").
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { exposureLimit, limitingAperture, RULE_SETS, type RuleSetId, type Tissue } from '../../core/index.js';

const LAMBDAS = [200, 302.7, 303.5, 305.5, 308, 310.5, 314.5, 355, 450, 475, 532, 633, 800, 1000, 1064, 1175, 1300, 1450, 1550, 2000, 3000, 10600, 200000];

interface Step {
  readonly ruleSet: RuleSetId;
  readonly remembered: boolean;
  readonly tissue: Tissue;
  readonly alpha: number;
  readonly lambda: number;
  readonly t: number;
  readonly ratio: number;
}

/** Steps larger than 2 % that limit specification section 8 lists, with the ratio it gives. */
interface Listed {
  readonly what: string;
  readonly matches: (s: Step) => boolean;
  /** Ratio above/below as printed in section 8 (or derived per step where it depends on the wavelength). */
  readonly ratio: number | ((s: Step) => number);
  /** Slack for the rounding of the printed figures. */
  readonly slack: number;
}

const near = (a: number, b: number): boolean => Math.abs(a / b - 1) < 1e-6;
const retinal = (l: number): boolean => l >= 400 && l < 1400;

/** 700-1400 nm extended-source limit at t (10 s <= t <= T2), 18*C_A*C_C*C_E*t^-0.25 W/m² (with set (a)'s corneal 2e3*C_A dual limit above 1200 nm). */
function uncappedAt(s: Step, t: number): number {
  const CA = s.lambda < 1050 ? 10 ** (0.002 * (s.lambda - 700)) : 5;
  const CC = s.lambda < 1150 ? 1 : s.lambda < 1200 ? 10 ** (0.018 * (s.lambda - 1150)) : 8;
  const E = 18 * CA * CC * (s.alpha * 1000 / 1.5) * t ** -0.25;
  return s.ruleSet === 'icnirp2013' && s.lambda >= 1200 ? Math.min(E, 2e3 * CA) : E;
}

/** The same limit just below 10 s (Table 2.2, no cap); set (a)'s corneal dual limit is there 19 561/20 000 of its 10 s value (the skin step listed below). */
function justBelow10(s: Step): number {
  const E = uncappedAt({ ...s, ruleSet: 'eu2006' }, 10);
  return s.ruleSet === 'icnirp2013' && s.lambda >= 1200 ? Math.min(E, 2e3 * 5 * (19561 / 20000)) : E;
}

const LISTED: Listed[] = [
  { what: '(a) as remembered, retina at 1e-11 s: 1e-3 -> 2e-3 C_E (unverified; gone in conservative mode)', matches: (s) => s.ruleSet === 'icnirp2013' && s.remembered && s.tissue === 'eye' && retinal(s.lambda) && near(s.t, 1e-11), ratio: 2.0, slack: 0.005 },
  { what: '(a) and (b), alpha = 50 mrad, 450 nm at 10 s: thermal with C_E -> photochemical (inherent)', matches: (s) => s.tissue === 'eye' && s.alpha === 0.05 && s.lambda >= 400 && s.lambda < 600 && near(s.t, 10), ratio: 2066 / 3374, slack: 0.005 },
  { what: 'UV 302.5-400 nm at 1 ns: 30 -> 31.5 J/m² (+5 %), both sets', matches: (s) => s.lambda >= 302.5 && s.lambda < 400 && near(s.t, 1e-9), ratio: 31.5 / 30, slack: 0.005 },
  { what: '(b) retina at 1 ns: 4.8e-3 -> 5e-3 (+4 %)', matches: (s) => s.ruleSet === 'eu2006' && s.tissue === 'eye' && retinal(s.lambda) && near(s.t, 1e-9), ratio: 5 / 4.8, slack: 0.005 },
  { what: '(b) 1050-1400 nm at 50 µs: 5e-2 -> 5.35e-2 (+7 %)', matches: (s) => s.ruleSet === 'eu2006' && s.tissue === 'eye' && s.lambda >= 1050 && s.lambda < 1400 && near(s.t, 5e-5), ratio: 5.35 / 5, slack: 0.005 },
  { what: '(a) retina at 5 µs: 2e-3 -> 1.90e-3 (-5 %)', matches: (s) => s.ruleSet === 'icnirp2013' && s.tissue === 'eye' && s.lambda >= 400 && s.lambda < 1050 && near(s.t, 5e-6), ratio: 1.9 / 2, slack: 0.005 },
  { what: '(a) 1050-1400 nm at 13 µs (-2.6 %)', matches: (s) => s.ruleSet === 'icnirp2013' && s.tissue === 'eye' && s.lambda >= 1050 && s.lambda < 1400 && near(s.t, 1.3e-5), ratio: 0.974, slack: 0.005 },
  { what: 'skin 400-1400 nm at 0.1 µs: 200 -> 196 J/m² (-2 %), both sets (also the corneal dual limit of (a))', matches: (s) => retinal(s.lambda) && near(s.t, 1e-7), ratio: 196 / 200, slack: 0.005 },
  {
    // The note is given for the band's extended-source entries of Table 2.3 (t >= 10 s), so the cap
    // holds from 10 s (rows -5x and -6x); Table 2.2 (t < 10 s, read) has none: the step is at 10 s.
    what: 'EU Table 2.3 note (from memory; applied to set (a) in conservative mode): 700-1400 nm extended sources, t >= 10 s not above 1000 W/m²: step down at 10 s (issue 9)',
    matches: (s) => s.tissue === 'eye' && s.alpha === 0.05 && s.lambda >= 700 && s.lambda < 1400 && (s.ruleSet === 'eu2006' || !s.remembered) && near(s.t, 10),
    ratio: (s) => Math.min(1000, uncappedAt(s, 10)) / justBelow10(s),
    slack: 0.005,
  },
  { what: 'skin 400-1400 nm at 10 s: 19 561 -> 20 000 J/m² (+2 %), both sets (also the corneal dual limit of (a))', matches: (s) => retinal(s.lambda) && near(s.t, 10), ratio: 20000 / 19561, slack: 0.005 },
];

const ratioOf = (l: Listed, s: Step): number => (typeof l.ratio === 'number' ? l.ratio : l.ratio(s));

function breakpoints(ruleSet: RuleSetId): number[] {
  const s = new Set<number>([625e-6, 0.25]);
  for (const tissue of ['eye', 'skin'] as const) for (const r of RULE_SETS[ruleSet][tissue]) for (const t of r.t_s) s.add(t);
  s.delete(1e-13);
  s.delete(3e4);
  return [...s];
}

function survey(): Step[] {
  const steps: Step[] = [];
  const H = (ruleSet: RuleSetId, remembered: boolean, tissue: Tissue, lambda: number, t: number, alpha: number): number =>
    Number(exposureLimit({ ruleSet, tissue, wavelength_nm: lambda, duration_s: t, sourceAngle_rad: alpha, settings: { conservative: !remembered } }).H_Jm2);
  for (const ruleSet of ['icnirp2013', 'eu2006'] as const) {
    const bps = breakpoints(ruleSet);
    for (const remembered of ruleSet === 'icnirp2013' ? [false, true] : [false]) {
      for (const tissue of ['eye', 'skin'] as const) for (const alpha of [0.001, 0.05]) for (const lambda of LAMBDAS) {
        const extra = [...(lambda >= 302.5 && lambda < 315 ? [10 ** (0.8 * (lambda - 295)) * 1e-15] : []), ...(alpha === 0.05 ? [10 * 10 ** ((50 - 1.5) / 98.5)] : [])];
        for (const t of [...bps, ...extra]) {
          const below = H(ruleSet, remembered, tissue, lambda, t * (1 - 1e-7), alpha);
          const above = H(ruleSet, remembered, tissue, lambda, t * (1 + 1e-7), alpha);
          steps.push({ ruleSet, remembered, tissue, alpha, lambda, t, ratio: above / below });
        }
      }
    }
  }
  return steps;
}

describe('continuity at duration breakpoints (limit specification section 8)', () => {
  const steps = survey();
  const big = steps.filter((s) => Math.abs(s.ratio - 1) > 0.02);

  it('the survey covers both rule sets, both tissues and thousands of breakpoints', () => {
    expect(steps.length).toBeGreaterThan(2000);
  });

  it('every step larger than 2 % is one that section 8 lists, with the listed ratio', () => {
    const unexplained = big.filter((s) => !LISTED.some((l) => l.matches(s) && Math.abs(s.ratio / ratioOf(l, s) - 1) <= l.slack));
    expect(unexplained.map((s) => `${s.ruleSet}${s.remembered ? ' remembered' : ''} ${s.tissue} ${s.lambda} nm alpha ${s.alpha} at ${s.t} s: ratio ${s.ratio.toFixed(4)}`)).toEqual([]);
  });

  it('no step exceeds 10 % except the two section 8 names (remembered 1e-11 s step; photochemical onset for extended sources) and the EU Table 2.3 cap at 10 s', () => {
    const over10 = big.filter((s) => Math.abs(s.ratio - 1) > 0.1);
    expect(over10.length).toBeGreaterThan(0);
    for (const s of over10) expect([...LISTED.slice(0, 2), ...LISTED.filter((l) => l.what.startsWith('EU Table 2.3 note'))].some((l) => l.matches(s))).toBe(true);
  });

  it.each(LISTED)('listed step occurs: $what', (l) => {
    expect(steps.some((s) => l.matches(s) && Math.abs(s.ratio / ratioOf(l, s) - 1) <= l.slack)).toBe(true);
  });

  it('in conservative mode the remembered 1e-11 s step of set (a) is gone (section 8)', () => {
    expect(steps.filter((s) => s.ruleSet === 'icnirp2013' && !s.remembered && near(s.t, 1e-11) && Math.abs(s.ratio - 1) > 0.02)).toEqual([]);
  });
});

describe('aperture step named in section 8 (not a limit value, but worth a test)', () => {
  it('eu2006 eye aperture at 0.3 s: 1 mm below, 1.5*0.3^0.375 = 0.95 mm above (-5 %; EU limiting apertures, spec 5.5)', () => {
    // 1e-6 either side: clear of the edge (values within 1e-9 ARE the edge, core/limits/intervals.ts)
    const below = Number(limitingAperture('eu2006', 'eye', 1550, 0.3 * (1 - 1e-6)).diameter_mm);
    const above = Number(limitingAperture('eu2006', 'eye', 1550, 0.3 * (1 + 1e-6)).diameter_mm);
    const on = Number(limitingAperture('eu2006', 'eye', 1550, 0.3).diameter_mm);
    expect(below).toBe(1);
    expect(above / (1.5 * 0.3 ** 0.375)).toBeCloseTo(1, 5);
    expect(above / below).toBeCloseTo(0.955, 3);
    // on the edge: the interval that starts there, [0.3 s, 10 s) (the one boundary convention)
    expect(on / (1.5 * 0.3 ** 0.375)).toBeCloseTo(1, 5); // diameter_mm carries 6 figures
  });
});

// Random valid queries. Wavelength and durations log-uniform over the whole coverage.
const logUniform = (lo: number, hi: number): fc.Arbitrary<number> =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((x) => Math.min(hi, Math.max(lo, 10 ** x)));
const query = fc.record({
  ruleSet: fc.constantFrom<RuleSetId>('icnirp2013', 'eu2006'),
  tissue: fc.constantFrom<Tissue>('eye', 'skin'),
  wavelength_nm: logUniform(180, 1e6),
  duration_s: logUniform(1e-13, 3e4),
  sourceAngle_rad: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 0.5, noNaN: true })),
  conservative: fc.boolean(),
});

describe('properties over random valid queries (fast-check)', () => {
  it('the limit is finite and positive, as H and as E, and the reported values never exceed the exact ones', () => {
    fc.assert(
      fc.property(query, (q) => {
        const r = exposureLimit({ ...q, settings: { conservative: q.conservative } });
        for (const v of [r.H_Jm2, r.E_Wm2, r.H_Jm2_reported, r.E_Wm2_reported]) {
          const x = Number(v);
          if (!Number.isFinite(x) || x <= 0) return false;
        }
        return Number(r.H_Jm2_reported) <= Number(r.H_Jm2) && Number(r.E_Wm2_reported) <= Number(r.E_Wm2);
      }),
      { numRuns: 2000 },
    );
  });

  it('conservative mode never gives a higher limit than the remembered values', () => {
    fc.assert(
      fc.property(query, (q) => {
        const cons = Number(exposureLimit({ ...q, settings: { conservative: true } }).H_Jm2);
        const mem = Number(exposureLimit({ ...q, settings: { conservative: false } }).H_Jm2);
        return cons <= mem;
      }),
      { numRuns: 1000 },
    );
  });

  // Pairs of durations: either two random durations, or two close ones straddling a row edge of
  // either rule set (where the published rounding steps are; random pairs almost never land there).
  const edgesAll = [...new Set([...breakpoints('icnirp2013'), ...breakpoints('eu2006')])];
  const pair = fc.oneof(
    fc.tuple(logUniform(1e-13, 3e4), logUniform(1e-13, 3e4)).map(([a, b]): [number, number] => (a <= b ? [a, b] : [b, a])),
    fc.tuple(fc.constantFrom(...edgesAll), fc.double({ min: 1e-9, max: 0.05, noNaN: true })).map(([e, d]): [number, number] => [e * (1 - d), Math.min(3e4, e * (1 + d))]),
  );

  it('H never decreases with duration by more than 4.9 % (largest published rounding step), photochemical onset excepted', () => {
    fc.assert(
      fc.property(query, pair, (q, [t1, t2]) => {
        // inherent: the photochemical limit starts at 10 s and does not scale with C_E (section 8)
        const photochemicalOnset = q.tissue === 'eye' && q.wavelength_nm >= 400 && q.wavelength_nm < 600 && q.sourceAngle_rad > 0.0015 && t1 < 10 && t2 >= 10;
        fc.pre(!photochemicalOnset);
        // EU Table 2.3 note: from 10 s the 700-1400 nm extended-source limit is capped at 1000 W/m² (issue 9)
        const capAt10 = q.tissue === 'eye' && q.wavelength_nm >= 700 && q.wavelength_nm <= 1400 && q.sourceAngle_rad > 0.0015 && t1 < 10 && t2 >= 10;
        fc.pre(!capAt10);
        const H = (t: number): number => Number(exposureLimit({ ...q, duration_s: t, settings: { conservative: q.conservative } }).H_Jm2);
        return H(t2) >= H(t1) * (1 - 0.049);
      }),
      { numRuns: 2000 },
    );
  });
});
