// Input tolerances (SAFETY.md "Room plan zones ... or the upper bound from the input tolerances"):
// each toleranced input is moved to both ends of its range, then all at once to the ends that
// lengthen the NOHD; the conservative bound is the worst of every evaluation (ours; common practice
// of a worst-case stack-up). Expected values from the range equation, never read back from the core:
//   NOHD = (sqrt(4 P / (pi E)) - a) / phi (domain notes 1.2, ANSI Z136.1 App. B from memory; the
//   beam at the NOHD is wider than the 7 mm aperture), E = 18 t^0.75 / t W/m² at t = 0.25 s for
//   400-700 nm (EU Table 2.2, read; ICNIRP 2013 same, from memory), aversion response 0.25 s
//   (common practice, worked-examples.md aversion-response-time);
//   OD = log10(4 P / (pi (7 mm)²) / E) for a beam narrower than the 7 mm aperture at the exit.
import { describe, expect, it } from 'vitest';
import { dominantToleranceWords, evaluateBeam, type BeamInput, type BeamResult } from '../../../core/index.js';

const E = (18 * 0.25 ** 0.75) / 0.25;
const nohd = (P: number, a: number, phi: number): number => (Math.sqrt((4 * P) / (Math.PI * E)) - a) / phi;
const od = (P: number): number => Math.log10((4 * P) / (Math.PI * 0.007 ** 2) / E);
const rel = (got: string | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const green = (tolerances: BeamInput['tolerances'], emission: BeamInput['emission'] = { kind: 'cw', power_W: 1 }): BeamInput => ({
  wavelength_nm: 532,
  emission,
  beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' },
  ...(tolerances ? { tolerances } : {}),
});

// [case, tolerances, conservative NOHD, conservative OD, dominant input]
const CASES: ReadonlyArray<readonly [string, BeamInput['tolerances'], number, number, string | null]> = [
  ['power ±10 %: 1.1 W', { power: 0.1 }, nohd(1.1, 0.001, 0.001), od(1.1), 'power'],
  ['divergence ±10 %: 0.9 mrad', { divergence: 0.1 }, nohd(1, 0.001, 0.0009), od(1), 'divergence'],
  ['diameter ±20 %: 0.8 mm exit (the OD at the exit does not change: the beam is inside 7 mm)', { diameter: 0.2 }, nohd(1, 0.0008, 0.001), od(1), 'diameter'],
  ['power ±10 % and divergence ±10 %: all at once 1.1 W and 0.9 mrad; divergence moves the NOHD more', { power: 0.1, divergence: 0.1 }, nohd(1.1, 0.001, 0.0009), od(1.1), 'divergence'],
  ['energy ±10 % on a CW beam: does not apply, bound = nominal', { energy: 0.1 }, nohd(1, 0.001, 0.001), od(1), null],
  ['no tolerances: bound = nominal', undefined, nohd(1, 0.001, 0.001), od(1), null],
];

describe('conservative bounds from input tolerances (532 nm, 1 W CW, 1 mm, 1 mrad, 0.25 s)', () => {
  it.each(CASES)('%s', (_name, tol, nohdC, odC, dominant) => {
    const b = evaluateBeam(green(tol)).bounds;
    expect(rel(b.nohd_m.nominal, nohd(1, 0.001, 0.001))).toBeLessThan(1e-9);
    expect(rel(b.nohd_m.conservative, nohdC)).toBeLessThan(1e-9);
    expect(rel(b.odRequired.nominal, od(1))).toBeLessThan(1e-9);
    expect(rel(b.odRequired.conservative, odC)).toBeLessThan(1e-9);
    expect(rel(b.limit_E_Wm2.conservative, E)).toBeLessThan(1e-9);
    expect(b.dominantInput).toBe(dominant);
  });
});

describe('pulsed inputs', () => {
  // The per-pulse limit H is taken from the nominal result (self-consistency, E = H / t for one pulse);
  // the tolerance moves only the energy, so the NOHD follows the range equation with 1.2 Q and the OD
  // rises by log10(1.2) (derived).
  it('energy ±20 % on a single pulse: NOHD (sqrt(1.2 * 4Q/(pi H)) - a)/phi, OD + log10(1.2)', () => {
    const x = green({ energy: 0.2 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 });
    const r = evaluateBeam(x);
    const H = Number(r.bounds.limit_E_Wm2.nominal) * 1e-8;
    expect(rel(r.bounds.nohd_m.conservative, (Math.sqrt((4 * 1.2e-3) / (Math.PI * H)) - 0.001) / 0.001)).toBeLessThan(1e-6);
    expect(rel(r.bounds.odRequired.conservative, Number(r.bounds.odRequired.nominal) + Math.log10(1.2))).toBeLessThan(1e-9);
    expect(r.bounds.dominantInput).toBe('energy');
  });
  it('pulse duration ±10 % on one 10 ns pulse at 532 nm: the limit is flat there (2e-3 C_E J/m² from 1 ns to 5 us; ICNIRP 2013, from memory), nothing moves, no dominant input', () => {
    const b = evaluateBeam(green({ pulseDuration: 0.1 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 })).bounds;
    expect(b.nohd_m.conservative).toBe(b.nohd_m.nominal);
    expect(b.odRequired.conservative).toBe(b.odRequired.nominal);
    expect(b.dominantInput).toBeNull();
  });
  it('power ±10 % on a pulsed beam: does not apply (energy is the input), bound = nominal', () => {
    const b = evaluateBeam(green({ power: 0.1 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 })).bounds;
    expect(b.nohd_m.conservative).toBe(b.nohd_m.nominal);
    expect(b.dominantInput).toBeNull();
  });
});

// ---------------------------------------------------------------------------------------------
// Each end of each tolerance, as the officer sees it: the conservative bound and the trace line of
// the input (which end is the worse one, and the numbers at that end). Expected values from the
// range equation and the limit formulas, never read back from the core.
// ---------------------------------------------------------------------------------------------
const toleranceSteps = (r: BeamResult): Array<{ label: string; detail: string }> => {
  const t = r.trace.children.find((c) => c.title.startsWith('Input tolerances'));
  if (!t) throw new Error('no tolerance trace');
  return t.steps.map((s) => ({ label: s.label, detail: s.detail }));
};
const stepOf = (r: BeamResult, label: string): string => {
  const s = toleranceSteps(r).find((x) => x.label === label);
  if (!s) throw new Error(`no trace step ${label}`);
  return s.detail;
};
// Elliptical beam, 1/e axes: (a_x + r phi_x)(a_y + r phi_y) = 4P/(pi E) (range equation with the
// elliptical spot area pi d_x d_y / 4; domain notes 1.2, derived). Returns r.
const ellipticalNohd = (P: number, ax: number, ay: number, px: number, py: number): number => {
  const K = (4 * P) / (Math.PI * E);
  const A = px * py;
  const B = ax * py + ay * px;
  const C = ax * ay - K;
  return (-B + Math.sqrt(B * B - 4 * A * C)) / (2 * A);
};

describe('pulse duration and repetition rate tolerances', () => {
  // One 10 ns pulse at 532 nm: the per-pulse limit H is flat from 1 ns to 5 us (ICNIRP 2013, from
  // memory; the test above), so the NOHD and OD do not move, but the limit as an irradiance E = H / t
  // is lowest at the LONGER pulse: the +10 % end is the worse one (lower limit at equal NOHD and OD).
  it('532 nm, 1 mJ, 10 ns, pulse duration ±10 %: limit bound H / 11 ns, worst at +10 %, NOHD and OD unchanged', () => {
    const r = evaluateBeam(green({ pulseDuration: 0.1 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 }));
    const H = Number(r.mpe.H_Jm2);
    expect(rel(r.bounds.limit_E_Wm2.nominal, H / 1e-8)).toBeLessThan(1e-12);
    expect(rel(r.bounds.limit_E_Wm2.conservative, H / 1.1e-8)).toBeLessThan(1e-12);
    expect(r.bounds.nohd_m.conservative).toBe(r.bounds.nohd_m.nominal);
    expect(r.bounds.odRequired.conservative).toBe(r.bounds.odRequired.nominal);
    // the trace line: tolerance and worse end in per cent, and that end's limit (6 significant figures)
    expect(stepOf(r, 'Pulse duration tolerance')).toMatch(/^±10 %: worst at \+10 %: .* limit 181818 W\/m²$/);
    expect(stepOf(r, 'Pulse duration tolerance')).not.toContain('skipped');
    expect(stepOf(r, 'Conservative bound')).toContain('the tolerance that moves the result most: none (no tolerance moves the result)');
  });

  // 532 nm, 1 mJ, 10 ns, 1 kHz over 0.25 s: the reduced single pulse governs, H = 2e-3 J/m² x C_P with
  // C_P = N^-0.25, N = f T (EU Directive 2006/25/EC Annex II Table 2.6 rule 3; C_P = N^-1/4 in
  // conservative mode, SAFETY.md "Pulse trains"). More pulses lower the per-pulse limit: NOHD and OD
  // are worst at +20 % (N = 300). The limit as an irradiance E = H f = 2e-3 f^0.75 T^-0.25 is LOWEST
  // at -20 % (N = 200): the bound takes each number at its own worst end.
  it('532 nm, 1 mJ, 10 ns, 1 kHz, repetition rate ±20 %: NOHD and OD at 1.2 kHz, limit at 800 Hz', () => {
    const x = green({ repetitionRate: 0.2 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 });
    const r = evaluateBeam(x);
    const H1 = Number(r.mpe.H_Jm2) * 250 ** 0.25; // the single-pulse limit behind the nominal C_P limit
    expect(rel(String(H1), 2e-3)).toBeLessThan(1e-9);
    const H = (f: number): number => 2e-3 * (f * 0.25) ** -0.25;
    const nohdQ = (Hf: number): number => (Math.sqrt((4 * 1e-3) / (Math.PI * Hf)) - 0.001) / 0.001;
    expect(rel(r.bounds.nohd_m.conservative, nohdQ(H(1200)))).toBeLessThan(1e-9);
    expect(rel(r.bounds.odRequired.conservative, Math.log10((4 * 1e-3) / (Math.PI * 0.007 ** 2) / H(1200)))).toBeLessThan(1e-9);
    expect(rel(r.bounds.limit_E_Wm2.conservative, H(800) * 800)).toBeLessThan(1e-9);
    expect(r.bounds.dominantInput).toBe('repetitionRate');
    expect(stepOf(r, 'Repetition rate tolerance')).toMatch(/^±20 %: worst at \+20 %: NOHD 1626\.72 m/);
    expect(stepOf(r, 'Conservative bound')).toContain('the tolerance that moves the result most: repetition rate (moves the NOHD most)');
    expect(r.bounds.dominantMoves).toBe('NOHD');
  });

  // 1550 nm, 1 J, 1 us pulses at 1 Hz over 10 s, 0.5 mm, 1 mrad (1/e). Rule 1: 1e4 J/m² over 1 mm
  // (1500-1800 nm, 1 ns-10 s; EU Directive Table 2.2, read; aperture 1 mm below 0.3 s, EU Table 2.2
  // note b, read). Rule 2: 1000 W/m² x 10 s / N = 1e4/N J/m² over 3.5 mm (EU Table 2.3, from memory;
  // N = f T). At 1.2 Hz (N = 12) rule 2 gives the longer NOHD; the OD at the exit stays with rule 1
  // over 1 mm (ratio 4Q/(pi (1 mm)²)/1e4 above 4Q/(pi (3.5 mm)²)/(1e4/12)); the limit E = (1e4/N) f
  // is 1000 W/m² at both ends. So only the NOHD decides: the worse end is +20 %.
  it('1550 nm, 1 J, 1 Hz over 10 s, repetition rate ±20 %: worst at +20 % by the NOHD alone (equal OD and limit)', () => {
    const r = evaluateBeam({
      wavelength_nm: 1550,
      emission: { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 1e-6, repetitionRate_Hz: 1 },
      beam: { diameter_m: 0.0005, divergence_rad: 0.001, definition: '1/e' },
      exposureDuration_s: 10,
      tolerances: { repetitionRate: 0.2 },
    });
    const nohd12 = (Math.sqrt((4 * 1) / (Math.PI * (1e4 / 12))) - 0.0005) / 0.001;
    expect(rel(r.bounds.nohd_m.conservative, nohd12)).toBeLessThan(1e-9);
    expect(rel(r.bounds.odRequired.conservative, Math.log10(4 / (Math.PI * 0.001 ** 2) / 1e4))).toBeLessThan(1e-9);
    expect(r.bounds.odRequired.conservative).toBe(r.bounds.odRequired.nominal);
    expect(rel(r.bounds.limit_E_Wm2.conservative, 1000)).toBeLessThan(1e-12);
    expect(stepOf(r, 'Repetition rate tolerance')).toMatch(/^±20 %: worst at \+20 %: NOHD 38\.5882 m/);
  });

  // 1064 nm, 1 uJ, 1 us at 900 kHz: +20 % would be 1.08 MHz, pulses of 1 us overlapping (input rule:
  // rate at most 1 / pulse duration). That end is skipped and says so; the bound is the worst of the
  // nominal value and the end that exists.
  it('1064 nm, 1 us at 900 kHz, repetition rate ±20 %: the overlapping end is skipped and named in the trace', () => {
    const x: BeamInput = { wavelength_nm: 1064, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-6, repetitionRate_Hz: 9e5 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }, tolerances: { repetitionRate: 0.2 } };
    const r = evaluateBeam(x);
    const lo = evaluateBeam({ ...x, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-6, repetitionRate_Hz: 9e5 * 0.8 }, tolerances: {} });
    expect(r.bounds.nohd_m.conservative).toBe(r.bounds.nohd_m.nominal); // fewer pulses: shorter NOHD
    expect(r.bounds.odRequired.conservative).toBe(r.bounds.odRequired.nominal);
    expect(r.bounds.limit_E_Wm2.conservative).toBe(lo.mpe.E_Wm2); // E = H f is lowest at 720 kHz
    expect(stepOf(r, 'Repetition rate tolerance')).toMatch(/^±20 %: worst at -20 %: .*\(one end left the valid range and was skipped\)$/);
  });
});

describe('elliptical beams: both axes move with the tolerance (range equation for an elliptical spot)', () => {
  // 532 nm, 1 W CW, axes 1 mm x 2 mm, 1 mrad x 2 mrad (1/e), E = 25.5 W/m² at 0.25 s (EU Table 2.2).
  const ell = (tolerances: BeamInput['tolerances']): BeamInput => ({
    wavelength_nm: 532,
    emission: { kind: 'cw', power_W: 1 },
    beam: { diameter_m: 0.001, diameterY_m: 0.002, divergence_rad: 0.001, divergenceY_rad: 0.002, definition: '1/e' },
    ...(tolerances ? { tolerances } : {}),
  });
  const CASES: ReadonlyArray<readonly [string, BeamInput['tolerances'], number, string]> = [
    ['divergence ±10 %: 0.9 x 1.8 mrad', { divergence: 0.1 }, ellipticalNohd(1, 0.001, 0.002, 0.0009, 0.0018), 'divergence'],
    ['diameter ±20 %: 0.8 x 1.6 mm', { diameter: 0.2 }, ellipticalNohd(1, 0.0008, 0.0016, 0.001, 0.002), 'diameter'],
    ['both: all at once 0.8 x 1.6 mm and 0.9 x 1.8 mrad', { divergence: 0.1, diameter: 0.2 }, ellipticalNohd(1, 0.0008, 0.0016, 0.0009, 0.0018), 'divergence'],
  ];
  it.each(CASES)('%s', (_n, tol, nohdC, dominant) => {
    const r = evaluateBeam(ell(tol));
    expect(rel(r.bounds.nohd_m.nominal, ellipticalNohd(1, 0.001, 0.002, 0.001, 0.002))).toBeLessThan(1e-9);
    expect(rel(r.bounds.nohd_m.conservative, nohdC)).toBeLessThan(1e-9);
    expect(r.bounds.dominantInput).toBe(dominant);
  });
});

describe('below the limit: the OD decides between equal NOHDs, and the dominant input', () => {
  // 532 nm, 10 uW CW, 1 mm, 1 mrad: 4P/(pi (7 mm)²) = 0.26 W/m² < 25.5 W/m², so the NOHD is 0 at
  // every end; the OD (negative: no filter needed) still moves with the power, log10(1.1) at +10 %.
  // Divergence moves nothing at the exit. The dominant input is the one that moves the OD, whatever
  // the order in which the tolerances were given.
  const low = (tolerances: BeamInput['tolerances']): BeamInput => ({ ...green(tolerances, { kind: 'cw', power_W: 1e-5 }) });
  const odLow = (P: number): number => Math.log10((4 * P) / (Math.PI * 0.007 ** 2) / E);
  // All at once, the corners tie in pairs (divergence moves nothing): the trace names the first worst
  // corner in the order the tolerances were given, lower ends first.
  it.each([
    ['power first', { power: 0.1, divergence: 0.1 }, 'power +10 %, divergence (full angle) -10 %'],
    ['divergence first', { divergence: 0.1, power: 0.1 }, 'divergence (full angle) -10 %, power +10 %'],
  ] as const)('10 uW, power ±10 %, divergence ±10 % (%s): NOHD 0, OD bound at 11 uW, dominant power', (_n, tol, corner) => {
    const r = evaluateBeam(low(tol));
    expect(r.bounds.nohd_m.conservative).toBe('0');
    expect(rel(r.bounds.odRequired.conservative, odLow(1.1e-5))).toBeLessThan(1e-9);
    expect(r.bounds.dominantInput).toBe('power');
    // chosen by its effect on the OD (no tolerance moves the NOHD of 0 m): the words say so
    expect(r.bounds.dominantMoves).toBe('OD');
    expect(dominantToleranceWords(r.bounds)).toBe('the power tolerance moves the OD most');
    expect(stepOf(r, 'Power tolerance')).toMatch(/^±10 %: worst at \+10 %: NOHD 0 m/);
    expect(stepOf(r, 'Divergence (full angle) tolerance')).toMatch(/^±10 %: worst at -10 %/);
    expect(stepOf(r, 'All at once')).toBe(`every combination of the ends; the worst is ${corner}: NOHD 0 m, OD -1.94968, limit 25.4558 W/m²`);
  });
});

describe('tolerances that do not apply or are zero leave the trace without a bound', () => {
  it('energy ±10 % on a CW beam: the note names the tolerance in per cent', () => {
    const r = evaluateBeam(green({ energy: 0.1 }));
    expect(stepOf(r, 'Energy per pulse tolerance')).toBe('tolerance ±10 % given, but this input does not apply to the beam');
  });
  it.each([
    ['no tolerances', undefined],
    ['a tolerance of 0 %', { power: 0 }],
  ] as const)('%s: no evaluation at the ends and none all at once', (_n, tol) => {
    const r = evaluateBeam(green(tol));
    expect(toleranceSteps(r).map((s) => s.label)).toEqual(['Conservative bound']);
    expect(stepOf(r, 'Conservative bound')).toBe('no tolerances given: the conservative bound equals the nominal value');
  });
});

describe('all at once: every combination of the ends', () => {
  // DEFECT found by mutation testing (2026-12-02): the all-at-once evaluation used to move each input
  // to the end that was worse ON ITS OWN. 1550 nm, 8 mJ, 1 us pulses at 1 Hz over 10 s, 0.5 mm,
  // 1 mrad (1/e). Rule 1: 1e4 J/m² over 1 mm; rule 2: 1000 W/m² x 10 s / N over 3.5 mm, N = f T
  // (EU Directive Table 2.2 and note b, read; Table 2.3, from memory; Table 2.6 rules 1 and 2, read).
  // At 8 mJ the beam over 3.5 mm (4Q/(pi (3.5 mm)²) = 832 J/m²) stays below the rule-2 limit for
  // N = 8 to 12, so the NOHD (0.509 m) is set by rule 1 and the repetition rate moves nothing: its
  // "worse end" fell to -20 % by the tie-break. With the energy at +30 % (10.4 mJ, 1081 J/m² over
  // 3.5 mm) rule 2 sets the NOHD, and then +20 % (N = 12, 833 J/m²) is the worst: NOHD
  // (sqrt(4 x 10.4 mJ / (pi 833 J/m²)) - 0.5 mm) / 1 mrad = 3.486 m. The old bound was 3.139 m
  // (energy alone), 10 % short.
  it('1550 nm, 8 mJ, 1 Hz, energy ±30 % and repetition rate ±20 %: NOHD bound 3.486 m at +30 % and +20 %', () => {
    const r = evaluateBeam({
      wavelength_nm: 1550,
      emission: { kind: 'pulsed', pulseEnergy_J: 8e-3, pulseDuration_s: 1e-6, repetitionRate_Hz: 1 },
      beam: { diameter_m: 0.0005, divergence_rad: 0.001, definition: '1/e' },
      exposureDuration_s: 10,
      tolerances: { energy: 0.3, repetitionRate: 0.2 },
    });
    const Q = 8e-3 * 1.3;
    expect(rel(r.bounds.nohd_m.nominal, (Math.sqrt((4 * 8e-3) / (Math.PI * 1e4)) - 0.0005) / 0.001)).toBeLessThan(1e-9);
    expect(rel(r.bounds.nohd_m.conservative, (Math.sqrt((4 * Q) / (Math.PI * (1e4 / 12))) - 0.0005) / 0.001)).toBeLessThan(1e-9);
    // the OD at the exit stays with rule 1 over 1 mm: log10(4Q/(pi (1 mm)²) / 1e4)
    expect(rel(r.bounds.odRequired.conservative, Math.log10((4 * Q) / (Math.PI * 1e-6) / 1e4))).toBeLessThan(1e-9);
    expect(r.bounds.dominantInput).toBe('energy');
    expect(stepOf(r, 'All at once')).toMatch(/the worst is energy per pulse \+30 %, repetition rate \+20 %: NOHD 3\.48623 m/);
  });

  // Each input on its own can still give the worst number: the 1400-1500 nm limit dips at 1 ms, where
  // the rows 1e3 J/m² (below 1 ms) and 5.6e3 t^0.25 J/m² (from 1 ms) meet, both evaluated on the edge
  // (EU Directive Table 2.2, read; SAFETY.md "Exact boundaries"): 5.6e3 x (1e-3)^0.25 = 995.8 J/m².
  // At 0.99 ms the limit is 1e3, at 1.01 ms 5.6e3 x (1.01e-3)^0.25 = 998.3 J/m². With energy ±10 %,
  // the energy's own end (11 mJ at exactly 1 ms, 995.8 J/m²) is worse than every combination of the
  // ends (11 mJ at 1.01 ms, 998.3 J/m²). 1450 nm, 10 mJ, 1 ms, 0.5 mm, 1 mrad, aperture 1 mm (t < 0.3 s).
  it('1450 nm, 10 mJ, 1 ms, energy ±10 % and pulse duration ±1 %: NOHD and OD bounds at 11 mJ and exactly 1 ms', () => {
    const r = evaluateBeam({
      wavelength_nm: 1450,
      emission: { kind: 'pulsed', pulseEnergy_J: 1e-2, pulseDuration_s: 1e-3 },
      beam: { diameter_m: 0.0005, divergence_rad: 0.001, definition: '1/e' },
      tolerances: { energy: 0.1, pulseDuration: 0.01 },
    });
    const Hdip = 5.6e3 * 1e-3 ** 0.25;
    expect(rel(r.bounds.nohd_m.conservative, (Math.sqrt((4 * 1.1e-2) / (Math.PI * Hdip)) - 0.0005) / 0.001)).toBeLessThan(1e-9);
    expect(rel(r.bounds.odRequired.conservative, Math.log10((4 * 1.1e-2) / (Math.PI * 1e-6) / Hdip))).toBeLessThan(1e-9);
    // the limit as an irradiance is lowest at the longer pulse: 5.6e3 (1.01 ms)^0.25 / 1.01 ms
    expect(rel(r.bounds.limit_E_Wm2.conservative, (5.6e3 * 1.01e-3 ** 0.25) / 1.01e-3)).toBeLessThan(1e-9);
  });
});

// The limit bound can sit at one input's own end with the others nominal, below every corner: the
// pulse count N = ceil(f T) steps. 532 nm, 100 us pulses at 40.4 Hz over 0.25 s: N = 11 (10.1
// rounded up; at 39.6 Hz N = 10). The reduced single pulse governs: H = 18 t^0.75 J/m² x N^-0.25
// (ICNIRP 2013 from 5 us, from memory; EU Table 2.2 from 18 us, read; C_P = N^-1/4, EU Table 2.6
// rule 3), E = H f. Pulse duration -10 % with the rate nominal: E = 18 (90 us)^0.75 11^-0.25 x 40.4
// = 0.3690 W/m²; the corners give 0.3703 (39.6 Hz, N = 10) and 0.3763 (41.2 Hz), the nominal 0.3993.
it('532 nm, 100 us at 40.4 Hz, pulse duration ±10 % and repetition rate ±2 %: limit bound at 90 us and 40.4 Hz', () => {
  const r = evaluateBeam(green({ pulseDuration: 0.1, repetitionRate: 0.02 }, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-4, repetitionRate_Hz: 40.4 }));
  expect(rel(r.bounds.limit_E_Wm2.nominal, 18 * 1e-4 ** 0.75 * 11 ** -0.25 * 40.4)).toBeLessThan(1e-9);
  expect(rel(r.bounds.limit_E_Wm2.conservative, 18 * 9e-5 ** 0.75 * 11 ** -0.25 * 40.4)).toBeLessThan(1e-9);
});


// The toleranced evaluations see the same beam as the nominal one: its source size and the lens on
// the path reach every perturbed end (core/beam/core-numbers.ts), not only the nominal numbers.
describe('the source size and the lens reach the toleranced ends', () => {
  // 532 nm, 1 W, 0.25 s, a 10 mrad source: C_E = alpha/alpha_min = 10/1.5 (alpha_min = 1.5 mrad
  // below alpha_max = 100 mrad at 0.25 s; EU Directive 2006/25/EC Table 2.5, read, ICNIRP 2013 the
  // same, from memory), E = 18 t^0.75 C_E / t = 169.8 W/m². A point-source look-up at the +10 % end
  // (25.5 W/m²) would lower the bound's limit and lengthen its NOHD.
  it('a 10 mrad source, power ±10 %: limit bound 18 t^0.75 C_E / t, NOHD bound at 1.1 W with that limit', () => {
    const Ex = E * (10 / 1.5);
    const b = evaluateBeam({ ...green({ power: 0.1 }), sourceAngle_rad: 0.01 }).bounds;
    expect(rel(b.limit_E_Wm2.conservative, Ex)).toBeLessThan(1e-9);
    expect(rel(b.nohd_m.conservative, (Math.sqrt((4 * 1.1) / (Math.PI * Ex)) - 0.001) / 0.001)).toBeLessThan(1e-9);
    expect(rel(b.odRequired.conservative, Math.log10((4 * 1.1) / (Math.PI * 0.007 ** 2) / Ex))).toBeLessThan(1e-9);
  });
  // A 20 mm beam at 532 nm, 1 W, 0.25 s, power ±10 %. With a lens on the path the whole beam can
  // fall inside the 7 mm aperture: OD = log10(4 x 1.1 W / (pi (7 mm)²) / E) = 3.14; without, the
  // 7 mm aperture takes the part of the 20 mm beam it covers: log10(4 x 1.1 W / (pi (20 mm)²) / E) =
  // 2.14 (domain notes 2.1 item 2; ANSI Z136.1 section 4.6.2, from memory; derived).
  it.each([
    ['with a lens on the path', true, 0.007],
    ['without a lens', false, 0.02],
  ] as const)('a 20 mm beam %s, power ±10 %: OD bound log10(4.4 W / (pi d²) / E)', (_n, lens, d) => {
    const b = evaluateBeam({
      wavelength_nm: 532,
      emission: { kind: 'cw', power_W: 1 },
      beam: { diameter_m: 0.02, divergence_rad: 0.001, definition: '1/e' },
      tolerances: { power: 0.1 },
      ...(lens ? { viewing: { lens: { focalLength_m: 0.1 } } } : {}),
    }).bounds;
    expect(rel(b.odRequired.nominal, Math.log10(4 / (Math.PI * d ** 2) / E))).toBeLessThan(1e-9);
    expect(rel(b.odRequired.conservative, Math.log10((4 * 1.1) / (Math.PI * d ** 2) / E))).toBeLessThan(1e-9);
  });
});
