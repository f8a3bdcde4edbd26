/** Placeholder until the core's beam model is public; see the commit that replaces it. */
import type { BeamInput } from '../../../../core/model/inputs.js';
import type { BeamResult } from '../../../../core/model/results.js';
import type { UnitHabit } from '../../../../core/units/quantities.js';

export function exposureVsDistanceSvg(_beam: BeamResult, _input: BeamInput | null, _units: UnitHabit, _width: number): string | null {
  return null;
}
