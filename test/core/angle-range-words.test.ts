// Angle ranges in officer words (issue 14 item 6: "ranges in sensible units", degrees accepted for
// angles): the bound of a full angle is written 180° and of a viewing angle 90°, the small end in
// mrad as typed; never "π rad". Checked through every place a refusal is worded: the core's
// validation (evaluateBeam), the zod schema at the IPC/HTTP boundary and the form field.
// Bounds: derived (a full angle cannot exceed 180°; a viewing angle from the normal at most 90°).
import { describe, expect, it } from 'vitest';
import { evaluateBeam, InputError, officerWords, type BeamInput } from '../../core/index.js';
import { BeamInputSchema } from '../../electron/backend/schemas/inputs.js';
import { F, parseField } from '../../renderer/lib/fields.js';

const beam: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.005 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } };

function coreRefusal(x: BeamInput): string {
  try {
    evaluateBeam(x);
  } catch (e) {
    if (e instanceof InputError) return officerWords(e);
    throw e;
  }
  throw new Error('accepted');
}
function schemaRefusal(x: unknown): string {
  const r = BeamInputSchema.safeParse(x);
  if (r.success) throw new Error('accepted');
  return r.error.issues.map((i) => i.message).join('; ');
}

describe('angle ranges in degrees and mrad, never "π rad"', () => {
  // [where, refusal text, expected words]
  const CASES: ReadonlyArray<readonly [string, () => string, RegExp]> = [
    ['core: divergence 0', () => coreRefusal({ ...beam, beam: { ...beam.beam, divergence_rad: 0 } }), /Divergence.* must be more than 0 mrad, at most 180°/],
    ['core: apparent source 4 rad', () => coreRefusal({ ...beam, sourceAngle_rad: 4 }), /Apparent source.* must be from 0 mrad to 180°/],
    ['schema: divergence 4 rad', () => schemaRefusal({ ...beam, beam: { ...beam.beam, divergence_rad: 4 } }), /must be more than 0 mrad, at most 180°/],
    ['schema: diffuse viewing angle 2 rad', () => schemaRefusal({ ...beam, viewing: { diffuse: { reflectance: 0.5, viewingAngle_rad: 2 } } }), /must be from 0° to 90°/],
    ['form: apparent source 200 deg', () => parseField(F.sourceAngle, '200 deg').error ?? '', /must be from 0 mrad to 180°/],
    ['form: divergence 0 mrad', () => parseField(F.divergence, '0 mrad').error ?? '', /must be more than 0 mrad, at most 180°/],
    ['form: viewing angle 100 deg', () => parseField(F.diffuseAngle, '100 deg').error ?? '', /must be from 0° to 90°/],
  ];
  it.each(CASES)('%s', (_where, refusal, words) => {
    const text = refusal();
    expect(text).toMatch(words);
    expect(text).not.toMatch(/π|3\.14|3141/);
  });
});
