// EN 207 / EN 208 scale numbers as the officer sees them (through evaluateBeam): the modes that
// apply, the density, the LB / RB number and the words of its note. Expected values are computed here
// from the published tables, never read back from the core:
//   EN 207 table (EN 207:2017 via the Wikipedia summary [WIKI-EN207], secondary; worked-examples.md
//   en207-* cases): 315-1400 nm D LBn up to 10^(n+1) W/m², I/R 5x10^(n-3) J/m², M 1.5x10^(n-4) J/m²;
//   above 1400 nm M LBn up to 10^(n+11) W/m² (a peak power density).
//   EN 207 modes (DGUV Information 203-042 section 5.1; worked-examples.md en207-modes): D > 0.25 s,
//   I 1 us - 0.25 s, R 1 ns - 1 us, M < 1 ns.
//   Repetitive pulses: the per-pulse density times N^(1/4), N = pulses in 10 s (EN 207:2009 test
//   time; EN 207:2017 has 5 s) - FROM MEMORY, conservative mode (the default) uses 10 s.
//   EN 208 (EN 208:2009 Table B.1 via a supplier explainer, RB1 read): RB1 up to 0.01 W (CW).
// Beams: 1/e diameters, the eyewear at the exit (closest approach 0), so the density divisor is
// pi/4 d² with d no less than 1 mm (EN 207 table stated for a 1 mm beam, from memory).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, type BeamInput, type Emission } from '../../../core/index.js';

const rel = (got: number, want: number): number => Math.abs(got / want - 1);
const area = (d: number): number => (Math.PI * d * d) / 4;
/** Smallest n with X <= X1 * 10^(n-1) (the table row that holds X), from the table itself. */
const row = (X: number, X1: number): number => {
  let n = -20;
  while (X > X1 * 10 ** (n - 1)) n += 1;
  return n;
};

function beam(wavelength_nm: number, emission: Emission, d = 0.002): BeamInput {
  return { wavelength_nm, emission, beam: { diameter_m: d, divergence_rad: 0.001, definition: '1/e' } };
}
const scale = (x: BeamInput, mode: string) => evaluateBeam(x).scaleNumbers.find((s) => s.mode === mode);

describe('EN 207 modes that apply (DGUV 203-042 section 5.1: a CW beam is rated in mode D only)', () => {
  it('1064 nm, 1 W CW: D applies, I, R and M do not', () => {
    const r = evaluateBeam(beam(1064, { kind: 'cw', power_W: 1 }));
    const applying = r.scaleNumbers.filter((s) => s.mode !== 'RB' && s.applies).map((s) => s.mode);
    expect(applying).toEqual(['D']);
  });
});

// [case, input, mode, expected density, LB1 entry X1 of that column, why]
const LB_CASES: ReadonlyArray<readonly [string, BeamInput, string, number, number, string]> = [
  [
    '1064 nm, 1 J pulses of 0.5 s at 1 Hz (mode D): power density of the pulse, no N^(1/4)',
    beam(1064, { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 0.5, repetitionRate_Hz: 1 }),
    'D', 1 / 0.5 / area(0.002), 100,
    'EN 207 mode D for t > 0.25 s: Q/(t area) = 6.37e5 W/m² -> LB5 (up to 1e6); with N^(1/4) = 10^(1/4) it would be LB6',
  ],
  [
    '1064 nm, 1 J pulses of 0.5 s at 0.1 Hz (mode D): the pulse, not the lower mean power, sets D',
    beam(1064, { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 0.5, repetitionRate_Hz: 0.1 }),
    'D', 1 / 0.5 / area(0.002), 100,
    'Q/(t area) = 6.37e5 W/m² -> LB5; the mean Q f/area = 3.18e4 W/m² alone would give LB4',
  ],
  [
    '1064 nm, 1 mJ, 10 ns at 10 Hz (mode R): energy density times N^(1/4), N = 100 pulses in 10 s',
    beam(1064, { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 10 }),
    'R', (1e-3 / area(0.002)) * 100 ** 0.25, 5e-2,
    '318 J/m² x 3.16 = 1007 J/m² -> LB6 (5e3); without N^(1/4) LB5 (5e2) - N^(1/4) rule from memory',
  ],
  [
    '1550 nm, 0.1 J single pulse of 0.5 ns (mode M above 1400 nm): PEAK power density',
    beam(1550, { kind: 'pulsed', pulseEnergy_J: 0.1, pulseDuration_s: 5e-10 }),
    'M', 0.1 / area(0.002) / 5e-10, 1e12,
    'above 1400 nm the M column is in W/m²: 6.37e13 W/m² -> LB3 (1e14); the energy density 3.18e4 J/m² read against it would give LB1',
  ],
  [
    '1064 nm, 1 J single pulse of 0.5 ns, 1 mm beam (mode M): exactly within LB10',
    beam(1064, { kind: 'pulsed', pulseEnergy_J: 1, pulseDuration_s: 5e-10 }, 0.001),
    'M', 1 / area(0.001), 1.5e-3,
    '1.27e6 J/m² <= 1.5e6 J/m² (LB10)',
  ],
  [
    '1064 nm, 2 J single pulse of 0.5 ns, 1 mm beam (mode M): beyond LB10',
    beam(1064, { kind: 'pulsed', pulseEnergy_J: 2, pulseDuration_s: 5e-10 }, 0.001),
    'M', 2 / area(0.001), 1.5e-3,
    '2.55e6 J/m² > 1.5e6 J/m²: the table would need LB11, no EN 207 filter is adequate',
  ],
];

describe('EN 207 scale numbers through evaluateBeam (EN 207:2017 table via [WIKI-EN207], secondary)', () => {
  it.each(LB_CASES)('%s', (_name, x, mode, X, X1, _why) => {
    const s = scale(x, mode);
    expect(s?.applies).toBe(true);
    expect(rel(Number(s?.density), X)).toBeLessThan(1e-9);
    const n = row(X, X1);
    expect(s?.scale).toBe(n);
    // Above LB10 the note says that no EN 207 filter is adequate, and only then.
    if (n > 10) expect(s?.note).toMatch(/^above LB10: no EN 207 filter is adequate/);
    else expect(s?.note).not.toMatch(/above LB10/);
    // The note's unrounded scale number log10(X/X1) + 1, shown to 6 significant figures (derived from
    // the same table: N = ceil(log10(X/X1)) + 1).
    const shown = /unrounded (-?[0-9.]+(?:e-?\d+)?)/.exec(s?.note ?? '')?.[1];
    const want = Math.log10(X / X1) + 1;
    expect(Math.abs(Number(shown) - want), `note: ${s?.note ?? ''}`).toBeLessThan(Math.max(Math.abs(want), 1e-3) * 1e-5);
  });
});

describe('EN 207 for a beam below the limit (no filter needed; derived: OD 0 needs no filter)', () => {
  it('1064 nm, 1 uW CW, 2 mm: scale 0 and the note names the table row LB1 (density 0.32 W/m² is far below LB1)', () => {
    const s = scale(beam(1064, { kind: 'cw', power_W: 1e-6 }), 'D');
    expect(s?.scale).toBe(0);
    expect(s?.note).toMatch(/^exposure below the limit: no filter needed \(the table would give LB1\)/);
  });
});

describe('EN 208 just above a table row (EN 208:2009 Table B.1 via a supplier explainer, RB1 read)', () => {
  // 1e-9 above RB1's 0.01 W: the beam is not within RB1, so RB2 (rounded in the safe direction).
  it.each([
    ['633 nm, 0.01 W CW: within RB1', 0.01, 1],
    ['633 nm, 0.01000000001 W CW: above RB1 by 1e-9, RB2', 0.01000000001, 2],
  ] as const)('%s', (_name, P, rb) => {
    expect(scale(beam(633, { kind: 'cw', power_W: P }), 'RB')?.scale).toBe(rb);
  });
});

// EN 208 alignment eyewear (EN 208:2009 section 1 and Table B.1 via a supplier explainer: RB1 read,
// RB2-RB4 by the decade pattern, RB5 from memory): RB n up to 0.01*10^(n-1) W (CW, pulses > 2e-4 s)
// and 2e-6*10^(n-1) J (1 ns - 2e-4 s), visible 400-700 nm only, the beam through a 7 mm aperture.
// All beams here are narrower than 7 mm, so the whole power or energy counts.
const rbOf = (x: BeamInput) => evaluateBeam(x).scaleNumbers.find((s) => s.mode === 'RB');
const green = (emission: Emission, extra: Partial<BeamInput> = {}): BeamInput => ({ ...beam(532, emission), ...extra });

describe('EN 208 scope: visible beams, 400 to 700 nm inclusive (EN 208:2009 section 1)', () => {
  it.each([
    [399, false],
    [400, true],
    [700, true],
    [701, false],
  ] as const)('%s nm, 0.05 W CW: RB requirement %s', (lambda, has) => {
    const rb = rbOf(beam(lambda, { kind: 'cw', power_W: 0.05 }));
    expect(rb !== undefined).toBe(has);
    if (rb) expect([rb.scale, rb.applies, rb.densityUnit]).toEqual([2, true, 'W']);
  });
  it('532 nm, pulses of 0.5 ns: outside EN 208 (it covers pulses from 1 ns), no RB applies', () => {
    const rb = rbOf(green({ kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 5e-10 }));
    expect([rb?.scale, rb?.applies]).toEqual([0, false]);
    expect(rb?.note).toMatch(/EN 208 covers pulses from 1 ns; shorter pulses need EN 207 eyewear/);
  });
});

// [case, input, RB, unit, note must match, note must not match]
const RB_CASES: ReadonlyArray<readonly [string, BeamInput, number, string, RegExp, RegExp | null]> = [
  ['532 nm, 5 mW CW: RB1, a row read in the explainer', green({ kind: 'cw', power_W: 0.005 }), 1, 'W', /; RB1 row: read \(EN 208:2009 Table B\.1/, /above RB5/],
  ['532 nm, 100 W CW: RB5 exactly, a row from memory', green({ kind: 'cw', power_W: 100 }), 5, 'W', /; RB5 row: from memory$/, /above RB5/],
  ['532 nm, 200 W CW: beyond RB5 (table would need RB6)', green({ kind: 'cw', power_W: 200 }), 6, 'W', /above RB5: no EN 208 alignment filter can bring this beam to Class 2 levels, use EN 207 eyewear/, null],
  [
    '532 nm, 10 mJ pulses of 1 ms at 10 Hz: the pulse power Q/t = 10 W, not the 0.1 W mean, sets RB4',
    green({ kind: 'pulsed', pulseEnergy_J: 0.01, pulseDuration_s: 1e-3, repetitionRate_Hz: 10 }), 4, 'W', /larger of the peak and the mean power/, /above RB5/,
  ],
  [
    '532 nm, 1 uJ, 10 ns at 100 Hz: the pulse criterion (1e-6 J x 1000^(1/4) = 5.6e-6 J, RB2) governs, the mean 0.1 mW is also checked',
    green({ kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-8, repetitionRate_Hz: 100 }), 2, 'J',
    /^pulse energy through a 7 mm aperture times N\^\(1\/4\) \(N = 1000 pulses in 10 s\).*\[governs; also checked: mean power of the train/, null,
  ],
  [
    '532 nm, 0.1 uJ, 10 ns at 1 MHz: the pulse criterion 1e-7 J x 1e7^(1/4) = 5.6e-6 J and the mean 0.1 W both give RB2; on a tie the pulse criterion is named',
    green({ kind: 'pulsed', pulseEnergy_J: 1e-7, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e6 }), 2, 'J',
    /^pulse energy through a 7 mm aperture.*\[governs; also checked: mean power of the train/, null,
  ],
  [
    '532 nm, 0.1 uJ, 10 ns at 10 MHz: the mean 1 W (RB3) governs over the pulse criterion 1e-7 J x 1e8^(1/4) = 1e-5 J (RB2)',
    green({ kind: 'pulsed', pulseEnergy_J: 1e-7, pulseDuration_s: 1e-8, repetitionRate_Hz: 1e7 }), 3, 'W',
    /^mean power of the train through a 7 mm aperture, checked as for CW.*\[governs; also checked: pulse energy through a 7 mm aperture/, null,
  ],
  [
    '633 nm, 0.9 mW CW viewed for 100 s (above the limit, so eyewear is needed): at or below the Class 2 level of 1 mW, no alignment filter (RB0)',
    { ...beam(633, { kind: 'cw', power_W: 9e-4 }), exposureDuration_s: 100 }, 0, 'W', /at or below the Class 2 level, no alignment filter needed/, null,
  ],
];

describe('EN 208 scale numbers through evaluateBeam', () => {
  it.each(RB_CASES)('%s', (_name, x, scaleRb, unit, note, notNote) => {
    const r = evaluateBeam(x);
    const rb = r.scaleNumbers.find((s) => s.mode === 'RB');
    expect([rb?.scale, rb?.applies, rb?.densityUnit]).toEqual([scaleRb, true, unit]);
    expect(rb?.note).toMatch(note);
    if (notNote) expect(rb?.note).not.toMatch(notNote);
    if (scaleRb === 0) expect(Number(r.odRequired)).toBeGreaterThan(0);
  });
});
