/**
 * Large irradiated skin areas (limit specification 4.3, from memory for IEC 60825-1 and ANSI
 * Z136.1): for exposures longer than 10 s at 1400 nm - 1 mm, when the irradiated skin area A_s
 * exceeds 0.01 m², the skin limit is reduced to E = 10/A_s W/m² (A_s in m²), and to 100 W/m² from
 * 0.1 m² on. Applied only when the officer gives the area (optional input skinArea_m2); added as one
 * more criterion (its own row id), so the skin distance takes it when it is the stricter.
 */
import { Dec } from '../numeric/decimal.js';
import { roundSig } from '../numeric/decimal.js';
import type { Emission } from '../model/inputs.js';
import type { PulseRule } from '../model/results.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import type { Criterion, TissueLimits } from './tissue-limits.js';
import { fmt, rec } from './format.js';

export const LARGE_AREA_ROW = 'skin-large-area';
const SOURCE = 'IEC 60825-1 and ANSI Z136.1 large-area skin note (from memory; limit specification 4.3)';

export function withLargeSkinArea(skin: TissueLimits, wavelength_nm: number, T: number, emission: Emission, area_m2: number | undefined): { skin: TissueLimits; trace: Trace | null } {
  if (area_m2 === undefined) return { skin, trace: null };
  const trace = newTrace('Large irradiated skin area');
  const A = new Dec(area_m2);
  const why =
    wavelength_nm < 1400 ? 'applies only from 1400 nm to 1 mm' : !(T > 10) ? `applies only to exposures longer than 10 s (here ${fmt(new Dec(T))} s)` : A.lte('0.01') ? 'applies only above 0.01 m²' : null;
  if (why !== null) {
    addStep(trace, { kind: 'note', label: 'Not applied', detail: `irradiated skin area ${fmt(A)} m²: the large-area reduction ${why}`, source: SOURCE, confidence: 'from memory' });
    return { skin, trace };
  }
  const E = A.gte('0.1') ? new Dec(100) : new Dec(10).div(A);
  const f = emission.kind === 'pulsed' && emission.repetitionRate_Hz !== undefined ? new Dec(emission.repetitionRate_Hz) : null;
  // Per pulse for a train (mean irradiance E over the train: E/f per pulse); over T for a single pulse or CW.
  const L = emission.kind === 'cw' ? E : f ? E.div(f) : E.mul(T);
  const rule: PulseRule = emission.kind === 'cw' ? 'cw' : 'average-power';
  const aperture = skin.criteria[0]?.aperture_m ?? new Dec('0.0035');
  const criterion: Criterion = { rule, L, aperture_m: aperture, rowId: LARGE_AREA_ROW, effect: 'skin thermal, large irradiated area', label: `large irradiated skin area ${fmt(A)} m²: E = ${A.gte('0.1') ? '100 W/m² (from 0.1 m²)' : `10/A_s = ${fmt(E)} W/m²`}` };
  addStep(trace, {
    kind: 'row',
    label: 'Large-area limit',
    detail: `irradiated skin area ${fmt(A)} m² > 0.01 m², t = ${fmt(new Dec(T))} s > 10 s, ${wavelength_nm} nm: E = 10/A_s W/m², at least 100 W/m² -> ${fmt(E)} W/m²`,
    value: fmt(E),
    unit: 'W/m²',
    source: SOURCE,
    confidence: 'from memory',
  });
  const H = emission.kind === 'cw' ? E.mul(T) : L;
  let summary = skin.summary;
  if (H.lt(summary.H_Jm2)) {
    const Emean = emission.kind === 'cw' ? E : f ? L.mul(f) : L.div(emission.pulseDuration_s);
    summary = {
      ...summary,
      H_Jm2: rec(H),
      H_Jm2_reported: roundSig(H, 3, 'down').toString(),
      E_Wm2: rec(Emean),
      E_Wm2_reported: roundSig(Emean, 3, 'down').toString(),
      governingRule: rule,
      governingRow: LARGE_AREA_ROW,
      governingEffect: criterion.effect,
    };
    addStep(trace, { kind: 'result', label: 'Governs', detail: `lower than the skin limit of the tables (${fmt(new Dec(skin.summary.E_Wm2))} W/m²)` });
  } else {
    addStep(trace, { kind: 'note', label: 'Does not govern', detail: `the skin limit of the tables is already lower (${fmt(new Dec(skin.summary.E_Wm2))} W/m²)` });
  }
  return { skin: { ...skin, criteria: [...skin.criteria, criterion], summary }, trace };
}
