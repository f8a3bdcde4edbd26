/**
 * The zod schemas at the boundary: they accept the invented demo inputs, reject unknown fields and
 * out-of-range values with the path and a plain problem. Ranges: 180 nm - 1 mm is the span of the
 * ICNIRP 2013 and EU 2006/25/EC limit tables; reflectance and transmission are fractions 0-1;
 * numerical aperture at most 1 in air; EN 207 test conditions D, I, R, M (EN 207:2017, 4.2).
 * The compile-time equality with the core types is in electron/backend/schemas/*.ts itself.
 */
import { describe, expect, it } from 'vitest';
import { formatZodIssues, RoomInputSchema, BeamInputSchema, EyewearSpecSchema } from '../../../electron/backend/schemas/index.js';
import { scenario } from './helpers.js';

const beam = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 5 }, beam: { diameter_m: 0.0023, divergence_rad: 0.0004, definition: '1/e2' } };

describe('input schemas', () => {
  it('accept every invented demo room', () => {
    for (const r of scenario.rooms) expect(RoomInputSchema.safeParse({ ...r.input, eyewear: scenario.eyewear }).success).toBe(true);
  });

  it.each([
    ['unknown field', { ...beam, colour: 'green' }, '(document)', /unknown field\(s\) "colour"/],
    ['misspelt nested field', { ...beam, beam: { ...beam.beam, diameter_mm: 2 } }, 'beam', /unknown field\(s\) "diameter_mm"/],
    ['wavelength above 1 mm', { ...beam, wavelength_nm: 2e6 }, 'wavelength_nm', /to 1000000 nm/],
    ['reflectance above 1', { ...beam, viewing: { diffuse: { reflectance: 1.5 } } }, 'viewing.diffuse.reflectance', /from 0 to 1/],
    ['numerical aperture above 1', { ...beam, viewing: { fiber: { kind: 'singlemode', numericalAperture: 1.4 } } }, 'viewing.fiber.numericalAperture', /at most 1/],
    ['NaN power', { ...beam, emission: { kind: 'cw', power_W: Number.NaN } }, 'emission.power_W', /must be a number \(W\)/],
    ['unknown emission kind', { ...beam, emission: { kind: 'qcw', power_W: 1 } }, 'emission.kind', /Expected 'cw' \| 'pulsed'/],
    ['tolerance of 100 %', { ...beam, tolerances: { power: 1 } }, 'tolerances.power', /from 0 to 0.99/],
  ] as const)('BeamInput rejects %s', (_n, value, path, problem) => {
    const r = BeamInputSchema.safeParse(value);
    expect(r.success).toBe(false);
    if (r.success) return;
    const issues = formatZodIssues(r.error);
    expect(issues.map((i) => i.path)).toContain(path);
    expect(issues.find((i) => i.path === path)?.problem).toMatch(problem);
  });

  it.each([
    ['band upside down', { id: 'X', label: 'X', od: [{ from_nm: 700, to_nm: 600, od: 5 }] }, 'od[0].to_nm', /from the shorter to the longer wavelength/],
    ['unknown EN 207 letter', { id: 'X', label: 'X', en207: [{ from_nm: 532, to_nm: 532, modes: 'DX', scale: 5 }] }, 'en207[0].modes', /D, I, R, M/],
    ['scale number 0', { id: 'X', label: 'X', en208: [{ from_nm: 633, to_nm: 633, scale: 0 }] }, 'en208[0].scale', /RB1 to RB5 \(EN 208:2009\)/],
  ] as const)('EyewearSpec rejects %s', (_n, value, path, problem) => {
    const r = EyewearSpecSchema.safeParse(value);
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(formatZodIssues(r.error).find((i) => i.path === path)?.problem).toMatch(problem);
  });
});
