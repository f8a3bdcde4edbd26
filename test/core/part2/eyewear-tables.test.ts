// EN 207 (LB1-LB10) and EN 208 (RB1-RB5) tables checked at every row boundary.
// Sources: the expanded EN 207 table of the project's domain notes section 2.2, derived there from
// the row formulas of EN 207:2017 as summarised by Wikipedia 'EN 207' (mirrors wikiblah.com,
// cavac.at; secondary); EN 208 section 2.3: RB1 and the 2e-4 s split read from a supplier's
// explainer of EN 208:2009 Table B.1, RB2-RB4 by the decade pattern (secondary), RB5 from memory.
// Rule: a density exactly on a row's limit needs that row; just above it needs the next one.
import { describe, expect, it } from 'vitest';
import { Dec, en207Band, en207Limit, en207Mode, en208Limit, scaleFor, evaluateBeam, type En207Band, type En207Mode } from '../../../core/index.js';

// Domain notes 2.2, expanded table, LB1..LB10 per column (as printed there).
const TABLE_207: ReadonlyArray<{ band: En207Band; mode: En207Mode; values: readonly string[] }> = [
  { band: '180-315', mode: 'D', values: ['0.01', '0.1', '1', '10', '1e2', '1e3', '1e4', '1e5', '1e6', '1e7'] },
  { band: '180-315', mode: 'I', values: ['3e2', '3e3', '3e4', '3e5', '3e6', '3e7', '3e8', '3e9', '3e10', '3e11'] },
  { band: '180-315', mode: 'M', values: ['3e11', '3e12', '3e13', '3e14', '3e15', '3e16', '3e17', '3e18', '3e19', '3e20'] },
  { band: '315-1400', mode: 'D', values: ['1e2', '1e3', '1e4', '1e5', '1e6', '1e7', '1e8', '1e9', '1e10', '1e11'] },
  { band: '315-1400', mode: 'R', values: ['0.05', '0.5', '5', '50', '5e2', '5e3', '5e4', '5e5', '5e6', '5e7'] },
  { band: '315-1400', mode: 'M', values: ['1.5e-3', '1.5e-2', '0.15', '1.5', '15', '1.5e2', '1.5e3', '1.5e4', '1.5e5', '1.5e6'] },
  { band: '1400-1e6', mode: 'D', values: ['1e4', '1e5', '1e6', '1e7', '1e8', '1e9', '1e10', '1e11', '1e12', '1e13'] },
  { band: '1400-1e6', mode: 'I', values: ['1e3', '1e4', '1e5', '1e6', '1e7', '1e8', '1e9', '1e10', '1e11', '1e12'] },
  { band: '1400-1e6', mode: 'M', values: ['1e12', '1e13', '1e14', '1e15', '1e16', '1e17', '1e18', '1e19', '1e20', '1e21'] },
];

const rows207 = TABLE_207.flatMap((col) => col.values.map((v, i) => ({ ...col, N: i + 1, value: v })));

describe('EN 207 scale-number table (domain notes 2.2, from [WIKI-EN207], EN 207:2017)', () => {
  it.each(rows207)('$band nm $mode LB$N = $value', ({ band, mode, N, value }) => {
    expect(en207Limit(band, mode, N, false).eq(value)).toBe(true);
    // exactly on the boundary: that LB; just above: the next
    expect(scaleFor(new Dec(value), en207Limit(band, mode, 1, false)).n).toBe(N);
    expect(scaleFor(new Dec(value).mul('1.000001'), en207Limit(band, mode, 1, false)).n).toBe(N + 1);
    expect(scaleFor(new Dec(value).mul('0.999999'), en207Limit(band, mode, 1, false)).n).toBe(N);
  });
  it('I and R share a column in every band', () => {
    for (const band of ['180-315', '315-1400', '1400-1e6'] as const) for (let N = 1; N <= 10; N++) expect(en207Limit(band, 'I', N, false).eq(en207Limit(band, 'R', N, false))).toBe(true);
  });
  it('conservative mode takes the stricter UV M entry 1e(N+10) of the other revision (worked-examples notes, edition traps)', () => {
    expect(en207Limit('180-315', 'M', 1, true).eq('1e11')).toBe(true);
    expect(en207Limit('180-315', 'M', 1, false).eq('3e11')).toBe(true);
  });
  it.each([
    [180, '180-315'], [315, '180-315'], [315.1, '315-1400'], [1400, '315-1400'], [1400.1, '1400-1e6'], [10600, '1400-1e6'],
  ] as const)('band of %s nm is %s (EN 207 band edges: 180-315, >315-1400, >1400 nm)', (nm, band) => {
    expect(en207Band(nm)).toBe(band);
  });
  it.each([
    [null, 'D'], [0.26, 'D'], [0.25, 'I'], [1.01e-6, 'I'], [1e-6, 'R'], [1.01e-9, 'R'], [1e-9, 'M'], [1e-13, 'M'],
  ] as const)('mode of a %s s pulse is %s (EN 207:2017 modes, DGUV 203-042; 1 ns rated M, the stricter)', (t, mode) => {
    expect(en207Mode(t)).toBe(mode);
  });
});

const TABLE_208 = [
  { N: 1, power: '0.01', energy: '2e-6', src: 'read (EN 208:2009 Table B.1 via supplier explainer)' },
  { N: 2, power: '0.1', energy: '2e-5', src: 'secondary (decade pattern, ISHN alignment bands)' },
  { N: 3, power: '1', energy: '2e-4', src: 'secondary (decade pattern)' },
  { N: 4, power: '10', energy: '2e-3', src: 'secondary (decade pattern)' },
  { N: 5, power: '100', energy: '2e-2', src: 'from memory' },
];

describe('EN 208 alignment table (domain notes 2.3)', () => {
  it.each(TABLE_208)('RB$N: $power W, $energy J ($src)', ({ N, power, energy }) => {
    expect(en208Limit('power', N).eq(power)).toBe(true);
    expect(en208Limit('energy', N).eq(energy)).toBe(true);
    expect(scaleFor(new Dec(power), en208Limit('power', 1)).n).toBe(N);
    expect(scaleFor(new Dec(power).mul('1.000001'), en208Limit('power', 1)).n).toBe(N + 1);
    expect(scaleFor(new Dec(energy), en208Limit('energy', 1)).n).toBe(N);
  });
  // Through evaluateBeam: a small visible CW beam's full power enters the 7 mm aperture.
  it.each([
    [0.0009, 0, 'at or below 1 mW (Class 2 level): none'],
    [0.01, 1, 'RB1 up to 10 mW'],
    [0.0100001, 2, 'just above RB1'],
    [0.1, 2, 'RB2 up to 0.1 W'],
    [1, 3, 'RB3 up to 1 W'],
    [10, 4, 'RB4 up to 10 W'],
  ] as const)('CW 633 nm %s W -> RB%s (%s)', (P, N, _why) => {
    const r = evaluateBeam({ wavelength_nm: 633, emission: { kind: 'cw', power_W: P }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } });
    expect(r.scaleNumbers.find((s) => s.mode === 'RB')?.scale).toBe(N);
  });
  it('no RB requirement outside 400-700 nm', () => {
    const r = evaluateBeam({ wavelength_nm: 1064, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } });
    expect(r.scaleNumbers.some((s) => s.mode === 'RB')).toBe(false);
  });
});
