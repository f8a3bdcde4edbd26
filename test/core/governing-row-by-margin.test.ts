// The limit summary names the GOVERNING row: where several limit rows (or pulse rules) apply, each
// over its own limiting aperture, the one with the lowest margin (highest exposure/limit ratio at the
// worst reachable position) governs, which is not always the row with the lowest limit value
// (EU Directive 2006/25/EC Annex II Table 2.2 note a: the more restrictive limit applies; the
// apertures of Table 2.2 note b, read). The summary's limit, aperture and row belong together.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, type BeamInput } from '../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' as const };
const edge1400: BeamInput = { id: 'edge', ruleSet: 'eu2006', wavelength_nm: 1400, emission: { kind: 'cw', power_W: 0.01 }, beam, exposureDuration_s: 30000 };
const train1550: BeamInput = { id: 'train', ruleSet: 'eu2006', wavelength_nm: 1550, emission: { kind: 'pulsed', pulseEnergy_J: 1e-5, pulseDuration_s: 1e-8, repetitionRate_Hz: 1 }, beam, exposureDuration_s: 10 };

// [name, input, governing rule, governing row, limit (E W/m² for CW, H J/m² per pulse), aperture m, derivation]
const CASES: ReadonlyArray<readonly [string, BeamInput, string, string, number, number, string]> = [
  [
    'EU exactly 1400 nm, 30 000 s, 10 mW, 1 mm beam: the cornea row over 3.5 mm governs, not the lower retinal limit over 7 mm',
    edge1400, 'cw', 'EU-E-IR1400-long', 1000, 0.0035,
    'derived: EU-E-NIR2-5p 10*C_A*C_C = 400 W/m² over 7 mm: 4*0.01/(pi*0.007^2) = 259.8 W/m², ratio 0.650; EU-E-IR1400-long 1000 W/m² over 3.5 mm: 1039.4 W/m², ratio 1.039 (higher)',
  ],
  [
    'EU 1550 nm, 10 ns, 10 µJ, 1 Hz, 10 s: one pulse over 1 mm governs, not the lower 10 s limits over 3.5 mm',
    train1550, 'single-pulse', 'EU-E-IR1500-1', 10000, 0.001,
    'derived: rule 1 H = 1e4 J/m² over 1 mm (EU Table 2.2 note b, t < 0.3 s): 4*1e-5/(pi*0.001^2) = 12.73 J/m², ratio 1.27e-3; rules 2 and pulse group 1000 J/m² per pulse over 3.5 mm: 1.039 J/m², ratio 1.04e-3',
  ],
];

describe('the limit summary names the row with the lowest margin (through evaluateBeam)', () => {
  it.each(CASES)('%s', (_name, x, rule, row, limit, aperture, _derivation) => {
    const r = evaluateBeam(x);
    expect(r.mpe.governingRule).toBe(rule);
    expect(r.mpe.governingRow).toBe(row);
    expect(Number(r.mpe.aperture_m)).toBe(aperture);
    expect(Number(rule === 'cw' ? r.mpe.E_Wm2 : r.mpe.H_Jm2)).toBeCloseTo(limit, 6);
    // the summary's limit is the one the required OD was computed with
    expect(Number(r.od.limit)).toBeCloseTo(limit, 6);
  });

  it('the trace says why the named row governs although another row has a lower limit', () => {
    const text = JSON.stringify(evaluateBeam(edge1400).trace);
    expect(text).toMatch(/Governing row","detail":"EU-E-IR1400-long \(cornea thermal\) over 3\.5 mm: highest exposure\/limit ratio/);
    expect(text).toMatch(/lowest limit value is row EU-E-NIR2-5p/);
  });

  it('a row with both the lowest limit and the highest ratio is named as before (EU 532 nm, 1 mW, 0.25 s)', () => {
    // EU Table 2.2 (read): 18*t^0.75 J/m² at 0.25 s = 6.364 J/m², E = 25.46 W/m², one row, 7 mm
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.001 }, beam });
    expect(r.mpe.governingRow).toBe('EU-E-VIS-4');
    expect(Number(r.mpe.E_Wm2)).toBeCloseTo(25.4558, 3);
  });
});

describe('the limit summary names the row with the lowest margin (through evaluateRoom)', () => {
  it('both beams of a room name their governing rows', () => {
    const room = evaluateRoom({ ruleSet: 'eu2006', lasers: [{ id: 'A', name: 'Fibre laser A', beams: [edge1400, train1550] }] });
    expect(room.beams.map((b) => [b.beamId, b.mpe.governingRow, b.mpe.aperture_m])).toEqual([
      ['edge', 'EU-E-IR1400-long', '0.0035'],
      ['train', 'EU-E-IR1500-1', '0.001'],
    ]);
  });
});

// Two criteria with EXACTLY the same lowest limit over different apertures (the case line 34 of
// core/beam/governing-by-margin.ts decides): ICNIRP 2013 set without conservative mode, exactly
// 1400 nm, one 10 ns pulse. The cornea row of 1400-1500 nm gives 1e3 J/m² for 1 ns-1 ms (EU Directive
// Table 2.2, read; same value in ICNIRP 2013, from memory) over 1 mm (Table 2.2 note b, read); the
// skin limit used for the cornea from 1200 nm (ICNIRP 2013 recommendation, CORNEA2024 abstract, read)
// gives 200 C_A J/m² for 1 ns-100 ns with C_A = 5 at 1050-1400 nm (EU Table 2.4, read) = 1e3 J/m² too,
// over 3.5 mm (ours). A 0.5 mm beam puts the whole 1 mJ inside either aperture: 4Q/(pi (1 mm)²) =
// 1273 J/m² (ratio 1.27) against 4Q/(pi (3.5 mm)²) = 104 J/m² (ratio 0.104). The named row must be
// the 1 mm one with the HIGHER ratio of the two equal limits, so no "Governing row" correction is
// written: the summary already names the row that governs.
describe('equal lowest limits over different apertures', () => {
  const x: BeamInput = {
    ruleSet: 'icnirp2013',
    settings: { conservative: false },
    wavelength_nm: 1400,
    emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8 },
    beam: { diameter_m: 0.0005, divergence_rad: 0.001, definition: '1/e' },
  };
  it.each([
    ['one 10 ns pulse (one row on each side of 1400 nm)', 1e-8, 1e11],
    ['one 1 ns pulse (two rows on each side, duration edge)', 1e-9, 1e12],
  ] as const)('1400 nm, 1 mJ, %s: 1e3 J/m² over 1 mm, OD log10(1.273), no correction step', (_n, tp, E) => {
    const r = evaluateBeam({ ...x, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: tp } });
    expect(Number(r.mpe.H_Jm2)).toBe(1000);
    expect(Number(r.mpe.E_Wm2)).toBe(E);
    expect(r.mpe.aperture_m).toBe('0.001');
    expect(r.mpe.governingRow).toBe('H-E-IR1400-1');
    expect(Number(r.od.od)).toBeCloseTo(Math.log10(4e-3 / (Math.PI * 1e-6) / 1000), 12);
    expect(r.trace.steps.filter((s) => s.label === 'Governing row')).toEqual([]);
  });
});

// Equal limits again, the lower ratio LAST: 266 nm, 1 us pulses of 1 mJ at 1 Hz over 1 s (N = 1),
// 0.5 mm beam. Rule 1: 30 J/m² over 1 mm (t < 0.3 s); rule 2: 30 J/m² over 1.5 t^0.375 mm = 1.5 mm
// at 1 s (EU Directive Table 2.2 and its aperture column, read; 180-302 nm: 30 J/m² at every
// duration). Ratios 4Q/(pi (1 mm)²)/30 = 42.4 and 4Q/(pi (1.5 mm)²)/30 = 18.9: the summary names
// rule 1 over 1 mm and no correction is written; OD log10(42.4) = 1.63, reported 1.7.
describe('equal limits, the larger ratio first', () => {
  it('266 nm, 1 mJ, 1 us, 1 Hz over 1 s: rule 1, 30 J/m² over 1 mm, OD 1.7, no correction step', () => {
    const r = evaluateBeam({ ruleSet: 'icnirp2013', settings: { conservative: false }, wavelength_nm: 266, emission: { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-6, repetitionRate_Hz: 1 }, beam: { diameter_m: 0.0005, divergence_rad: 0.001, definition: '1/e' }, exposureDuration_s: 1 });
    expect([r.mpe.governingRule, Number(r.mpe.H_Jm2), r.mpe.aperture_m]).toEqual(['single-pulse', 30, '0.001']);
    expect(Number(r.od.od)).toBeCloseTo(Math.log10(4e-3 / (Math.PI * 1e-6) / 30), 12);
    expect(r.odRequired).toBe('1.7');
    expect(r.trace.steps.filter((s) => s.label === 'Governing row')).toEqual([]);
  });
  it('the correction step gives the limit in the quantity of the criteria: W/m² for CW, J/m² per pulse for pulses', () => {
    const step = (x: BeamInput): string => evaluateBeam(x).trace.steps.find((s) => s.label === 'Governing row')?.detail ?? '';
    expect(step(edge1400)).toContain('limit 1000 W/m²;');
    expect(step(train1550)).toContain('limit 10000 J/m² per pulse;');
  });
});

