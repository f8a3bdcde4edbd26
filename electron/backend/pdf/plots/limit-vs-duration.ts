/**
 * Plot 1 of the report: the eye exposure limit as radiant exposure H against exposure duration,
 * evaluated by the core's `exposureLimit` along the duration axis, with the operating point
 * (the exposure duration assessed and the limit there) and, for a pulsed beam, the per-pulse limit
 * that governs after the pulse rules.
 */
import { exposureLimit } from '../../../../core/limits/exposure-limit.js';
import { DURATION_RANGE_S } from '../../../../core/limits/rule-sets.js';
import type { BeamInput, LimitSettings, RuleSetId } from '../../../../core/model/inputs.js';
import type { BeamResult } from '../../../../core/model/results.js';
import type { UnitHabit } from '../../../../core/units/quantities.js';
import { dec } from '../../../../core/numeric/decimal.js';
import { limitH, duration } from '../format.js';
import { logPlotSvg } from './log-plot.js';

export type CurveCache = Map<string, ReadonlyArray<readonly [number, number]>>;

/** J/m² -> the habit's unit for H (J/m² or J/cm²). */
function hScale(units: UnitHabit): { factor: number; unit: string } {
  return units === 'ANSI' ? { factor: 1e-4, unit: 'J/cm²' } : { factor: 1, unit: 'J/m²' };
}

function limitAt(ruleSet: RuleSetId, wavelength_nm: number, t: number, sourceAngle_rad: number | undefined, settings: LimitSettings | undefined): string | null {
  try {
    const r = exposureLimit({ ruleSet, tissue: 'eye', wavelength_nm, duration_s: t, ...(sourceAngle_rad === undefined ? {} : { sourceAngle_rad }), ...(settings === undefined ? {} : { settings }) });
    return r.H_Jm2;
  } catch {
    return null; // outside the rule set's range: the curve simply has no point there
  }
}

/**
 * Sample H(t) on a log grid (one point per decade), then halve intervals where the curve bends
 * (piecewise power laws are straight in log-log), so the kinks at table breakpoints are drawn
 * without evaluating hundreds of points.
 */
export function limitCurve(ruleSet: RuleSetId, wavelength_nm: number, sourceAngle_rad: number | undefined, settings: LimitSettings | undefined, from_s: number, cache?: CurveCache): ReadonlyArray<readonly [number, number]> {
  const key = JSON.stringify([ruleSet, wavelength_nm, sourceAngle_rad ?? null, settings ?? null, from_s]);
  const hit = cache?.get(key);
  if (hit) return hit;
  const lo = Math.log10(Math.max(from_s, DURATION_RANGE_S[0]));
  const hi = Math.log10(DURATION_RANGE_S[1]);
  const f = (e: number): number | null => {
    const h = limitAt(ruleSet, wavelength_nm, 10 ** e, sourceAngle_rad, settings);
    return h === null ? null : Number(h);
  };
  const pts: Array<[number, number | null]> = [];
  for (let e = lo; e < hi; e += 1) pts.push([e, f(e)]);
  pts.push([hi, f(hi)]);
  const refine = (a: [number, number | null], b: [number, number | null], depth: number): Array<[number, number | null]> => {
    if (depth === 0 || a[1] === null || b[1] === null) return [];
    const m = (a[0] + b[0]) / 2;
    const v = f(m);
    if (v === null) return [[m, v]];
    const straight = (Math.log10(a[1]) + Math.log10(b[1])) / 2;
    if (Math.abs(Math.log10(v) - straight) < 0.01) return [];
    return [...refine(a, [m, v], depth - 1), [m, v], ...refine([m, v], b, depth - 1)];
  };
  const out: Array<[number, number | null]> = [];
  for (let i = 0; i < pts.length; i++) {
    const p = pts[i];
    const q = pts[i + 1];
    if (p === undefined) continue;
    out.push(p);
    if (q !== undefined) out.push(...refine(p, q, 3));
  }
  const curve = out.filter((p): p is [number, number] => p[1] !== null).map(([e, v]) => [10 ** e, v] as const);
  cache?.set(key, curve);
  return curve;
}

export function limitVsDurationSvg(beam: BeamResult, input: BeamInput | null, settings: LimitSettings | undefined, units: UnitHabit, width: number, cache?: CurveCache): string {
  const { factor, unit } = hScale(units);
  const T = beam.mpe.exposureDuration_s;
  const pulse = input?.emission.kind === 'pulsed' ? input.emission.pulseDuration_s : null;
  const from = Math.min(T, pulse ?? T) / 100;
  const curve = limitCurve(beam.ruleSet, beam.wavelength_nm, input?.sourceAngle_rad, settings ?? input?.settings, from, cache);
  // CW: the core's limit over T. Pulsed: the limit for the whole exposure T (the average-power
  // rule compares the train's total with it); the per-pulse point is marked separately.
  const H_T = pulse === null ? dec(beam.mpe.E_Wm2).mul(T).toString() : limitAt(beam.ruleSet, beam.wavelength_nm, T, input?.sourceAngle_rad, settings ?? input?.settings);
  const markers: Array<{ x: number; y: number; label: string; color: string }> = [];
  if (H_T !== null) {
    markers.push({ x: T, y: Number(H_T) * factor, label: `assessed t = ${duration(T)}: ${limitH(H_T, units)}`, color: '#FF7900' });
  }
  if (pulse !== null) {
    markers.push({ x: pulse, y: Number(beam.mpe.H_Jm2) * factor, label: `per pulse (${beam.mpe.governingRule}): ${limitH(beam.mpe.H_Jm2, units)}`, color: '#0057B8' });
  }
  return logPlotSvg({
    width,
    height: width * 0.68,
    xLabel: 'exposure duration t / s',
    yLabel: `eye limit H / ${unit}`,
    series: [{ label: `eye limit, ${beam.wavelength_nm} nm`, points: curve.map(([t, h]) => [t, h * factor] as const), color: '#111111' }],
    markers,
  });
}
