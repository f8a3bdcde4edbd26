// The additive rule as the officer sees it in a room (through evaluateRoom): the groups of beams
// that add, their sums of fractions, and the derivation lines of each sum. The rule: exposures of
// several wavelengths on the same tissue add as fractions of their own limits, the sum must not
// exceed 1 (limit specification section 3, "Multiple wavelengths"; EU Directive 2006/25/EC and
// IEC 60825-1 state the same principle). The grouping (retina thermal, retina photochemical, cornea
// and lens, skin) is OURS, pending the additivity table of IEC 60825-1 (open point 10.9); a pulsed
// beam is compared with its governing per-pulse limit in every group it touches (ours, the header
// of core/limits/additive.ts). Expected sums are computed here from the published rows:
//  - exposure-limits.md 4.2 (ICNIRP 2013 / IEC 60825-1:2014, from memory): H-E-VIS-3 2e-3 J/m²
//    (1 ns - 5 us), H-E-VIS-4 18 t^0.75 J/m² (worked-examples.md au-appx-x-mpe-488nm-0p25s, published),
//    H-E-VIS-5p 10 W/m² (10 s on), H-E-PC-1 100 C_B J/m² (10 - 100 s, C_B = 1 at 450 nm),
//    H-E-NIR2-3 2e-2 C_C J/m², H-E-NIR2-4 90 t^0.75 C_C J/m², H-E-NIR2-5p 10 C_A C_C W/m² (C_A = 5,
//    C_C = 1 at 1064 nm; worked-examples.md tros2-5p1: 50 W/m²).
//  - exposure-limits.md 4.3 (skin, from memory): H-S-400-2 / H-S-700-2 1.1e4 C_A t^0.25 J/m²,
//    H-S-700-1 200 C_A J/m².
//  - exposure-limits.md 4.6: C_P = N^-0.25 in conservative mode, N counted within T2 = 10 s.
//  - A beam narrower than the limiting aperture: its whole power over the aperture's area (common
//    practice; worked-examples.md tros2-5p1-1064nm-100mW-d63-2mm). The 2 mm beams here are narrower
//    than the 3.5 mm and 7 mm apertures at the laser's exit, the worst reachable position.
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type RoomInput, type RoomResult, type TraceStep } from '../../../core/index.js';

const cw = (id: string, wavelength_nm: number, power_W: number, exposureDuration_s?: number): BeamInput => ({
  id,
  wavelength_nm,
  emission: { kind: 'cw', power_W },
  beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
  ...(exposureDuration_s !== undefined ? { exposureDuration_s } : {}),
});
const pulsed = (id: string, wavelength_nm: number, pulseEnergy_J: number, repetitionRate_Hz?: number, exposureDuration_s?: number): BeamInput => ({
  ...cw(id, wavelength_nm, 0, exposureDuration_s),
  emission: { kind: 'pulsed', pulseEnergy_J, pulseDuration_s: 1e-8, ...(repetitionRate_Hz !== undefined ? { repetitionRate_Hz } : {}) },
});
const room = (beams: BeamInput[]): RoomInput => ({ lasers: [{ id: 'L', name: 'bench laser', beams }] });
/** Exposure over a limiting aperture of D metres from a beam narrower than it (J/m² per J, W/m² per W). */
const overAperture = (D: number): number => 1 / ((Math.PI * D * D) / 4);
const A7 = overAperture(0.007);
const A35 = overAperture(0.0035);

const group = (r: RoomResult, tissue: string, effect: string) => r.additive.find((g) => g.tissue === tissue && g.effect === effect);
/** The derivation of the additive rule for one tissue at the laser's path (room trace). */
function sumSteps(r: RoomResult, tissue: 'eye' | 'skin'): TraceStep[] {
  const kids = r.trace.children.filter((c) => c.title.startsWith('Several wavelengths') && c.title.endsWith('at the path of bench laser'));
  // evaluateRoom sums the eye first, then the skin
  const t = kids[tissue === 'eye' ? 0 : 1];
  if (!t) throw new Error(`no additive derivation for the ${tissue}`);
  return t.steps;
}
const step = (steps: TraceStep[], label: string): TraceStep | undefined => steps.find((s) => s.label === label);
const rel = (got: string | undefined, want: number): number => Math.abs(Number(got) / want - 1);
/**
 * The room is evaluated inside each case that reads it: neither while the file is collected nor
 * kept between cases (the mutation runs re-run the cases in the same module, one mutant at a time).
 */
function inCase(input: RoomInput): () => RoomResult {
  return () => evaluateRoom(input);
}

describe('green CW, 1064 nm CW and a 1064 nm pulse train at one path (icnirp2013)', () => {
  // g: 0.1 mW at 532 nm over the default 0.25 s; ir: 1 mW at 1064 nm over the default 10 s;
  // p: 1 uJ, 10 ns at 1 kHz at 1064 nm over 10 s (rule 3 governs: 2e-2 x (1e4)^-0.25 = 2e-3 J/m² per pulse).
  const r = inCase(room([cw('g', 532, 1e-4), cw('ir', 1064, 1e-3), pulsed('p', 1064, 1e-6, 1000)]));
  const eyeSum = (1e-4 * 0.25 * A7) / (18 * 0.25 ** 0.75) + (1e-3 * 10 * A7) / (10 * 5 * 10) + (1e-6 * A7) / (2e-2 * 1e4 ** -0.25);
  const skinLimit10s = (CA: number): number => 1.1e4 * CA * 10 ** 0.25;
  const skinSum = (1e-4 * 10 * A35) / skinLimit10s(1) + (1e-3 * 10 * A35) / skinLimit10s(5) + (1e-6 * A35) / (skinLimit10s(5) / 1e4);

  it.each([
    { tissue: 'eye', effect: 'eye, retina, thermal', sum: eyeSum, over: true, source: 'H-E-VIS-4, H-E-NIR2-5p, H-E-NIR2-3 with C_P (exposure-limits.md 4.2, 4.6)' },
    { tissue: 'skin', effect: 'skin', sum: skinSum, over: false, source: 'H-S-400-2, H-S-700-2 (exposure-limits.md 4.3); the train per pulse H_T / N (rule 2, 4.6)' },
  ])('$effect: the three beams add to $sum [$source]', ({ tissue, effect, sum, over }) => {
    const g = group(r(), tissue, effect);
    expect(g?.beamIds).toEqual(['g', 'ir', 'p']);
    expect(rel(g?.sumOfFractions, sum)).toBeLessThan(1e-9);
    expect(g?.note).toContain(over ? '> 1: combined exposure above the limit' : '<= 1');
  });

  it('the derivation names each term with its row, the pulse train with its governing rule, and warns of the different durations', () => {
    const eye = sumSteps(r(), 'eye');
    expect(step(eye, 'Sum, eye, retina, thermal')?.detail).toBe(
      'g (532 nm, row H-E-VIS-4): 0.649612 / 6.36396 + ir (1064 nm, row H-E-NIR2-5p): 259.845 / 500 + p (1064 nm, row H-E-NIR2-3 (governing per-pulse limit, pulse-train)): 0.0259845 / 0.002',
    );
    // the train is assessed over T = 10 s (rule 2's duration), not over one 10 ns pulse
    expect(step(eye, 'Durations differ')?.detail).toBe('eye: the limits were evaluated for different exposure durations (0.25, 10 s); each fraction is taken over its own duration');
    expect(step(eye, 'Largest sum')?.detail).toBe('eye, retina, thermal: above 1, the combined exposure exceeds the limit (rounded up: 13.7)');
    const skin = sumSteps(r(), 'skin');
    expect(step(skin, 'Sum, skin')?.detail).toContain('p (1064 nm, row H-S-700-1 (governing per-pulse limit, average-power))');
    // every skin exposure here is taken over 10 s: no warning
    expect(step(skin, 'Durations differ')).toBeUndefined();
  });
});

describe('a blue CW beam and a blue pulse train over 100 s: the train counts in the photochemical group through rule 2', () => {
  // c: 1 uW at 450 nm; p: 1 nJ, 10 ns at 1 kHz at 450 nm (rule 3: 2e-3 x (1e4)^-0.25 = 2e-4 J/m² per
  // pulse). One 10 ns pulse has no photochemical row (those start at 10 s); the train over 100 s has.
  const r = inCase(room([cw('c', 450, 1e-6, 100), pulsed('p', 450, 1e-9, 1000, 100)]));
  const perPulse = 2e-3 * 1e4 ** -0.25;
  it.each([
    { effect: 'eye, retina, thermal', sum: (1e-6 * 100 * A7) / (10 * 100) + (1e-9 * A7) / perPulse, source: 'H-E-VIS-5p, H-E-VIS-3 with C_P (exposure-limits.md 4.2, 4.6)' },
    { effect: 'eye, retina, photochemical', sum: (1e-6 * 100 * A7) / 100 + (1e-9 * A7) / perPulse, source: 'H-E-PC-1, C_B = 1 at 450 nm; the train at its governing per-pulse limit (ours)' },
  ])('$effect: both beams, sum $sum [$source]', ({ effect, sum }) => {
    const g = group(r(), 'eye', effect);
    expect(g?.beamIds).toEqual(['c', 'p']);
    expect(rel(g?.sumOfFractions, sum)).toBeLessThan(1e-9);
  });
  it('the train keeps its single-pulse row in the thermal group; both at 100 s: no duration warning', () => {
    const eye = sumSteps(r(), 'eye');
    expect(step(eye, 'Sum, eye, retina, thermal')?.detail).toContain('p (450 nm, row H-E-VIS-3 (governing per-pulse limit, pulse-train))');
    expect(step(eye, 'Sum, eye, retina, photochemical')?.detail).toContain('p (450 nm, row H-E-PC-1 (governing per-pulse limit, pulse-train))');
    expect(step(eye, 'Durations differ')).toBeUndefined();
  });
});

describe('one 1064 nm pulse, a 1064 nm CW beam over 1 s and a CO2 beam at one path', () => {
  // s: one 1 uJ, 10 ns pulse (no rule 2: a single pulse); q: 0.1 mW over 1 s; co2: 1 mW at 10.6 um over
  // the default 10 s, alone in the cornea group.
  const r = inCase(room([pulsed('s', 1064, 1e-6), cw('q', 1064, 1e-4, 1), cw('co2', 10600, 1e-3)]));
  it('the retinal thermal sum exceeds 1 while the cornea group is within: the largest sum is reported above 1 [H-E-NIR2-3, H-E-NIR2-4]', () => {
    const g = group(r(), 'eye', 'eye, retina, thermal');
    expect(g?.beamIds).toEqual(['s', 'q']);
    expect(rel(g?.sumOfFractions, (1e-6 * A7) / 2e-2 + (1e-4 * 1 * A7) / 90)).toBeLessThan(1e-9);
    const eye = sumSteps(r(), 'eye');
    expect(step(eye, 'Largest sum')?.detail).toMatch(/^eye, retina, thermal: above 1, the combined exposure exceeds the limit/);
    expect(step(eye, 'Sum, eye, cornea and lens')?.detail).toMatch(/^co2 \(10600 nm, row /);
    // the single pulse is assessed over its own 10 ns
    expect(step(eye, 'Durations differ')?.detail).toContain('(1e-8, 1, 10 s)');
  });
});
