/**
 * Data for the two plots of a beam, computed with the core itself so the curves agree with the
 * numbers in the results:
 *  1. the eye limit H against exposure duration (core exposureLimit along the duration axis), with
 *     the operating point (duration assessed, limit there) and, for pulses, the per-pulse limit;
 *  2. the direct beam's exposure at the eye against distance (core beam model and exposure
 *     function, averaged over the governing criterion's aperture), with the limit and the NOHD.
 */
import {
  DURATION_RANGE_S,
  defaultExposureDuration,
  exposureAlongBeam,
  limitAgainstDuration,
  type BeamInput,
  type BeamResult,
  type LimitSettings,
  type RuleSetId,
} from '../../core/index.js';

export type Points = ReadonlyArray<readonly [number, number]>;

const curveCache = new Map<string, Points>();

function hAt(ruleSet: RuleSetId, wl: number, t: number, alpha: number | undefined, settings: LimitSettings | undefined): number | null {
  const [p] = limitAgainstDuration(
    { ruleSet, tissue: 'eye', wavelength_nm: wl, ...(alpha === undefined ? {} : { sourceAngle_rad: alpha }), ...(settings === undefined ? {} : { settings }) },
    [t],
  );
  return p === undefined || p.H_Jm2 === null ? null : Number(p.H_Jm2); // null: outside the tables, no point
}

/** H(t) sampled per half decade and refined where the log-log curve bends (table breakpoints). */
export function limitCurve(ruleSet: RuleSetId, wl: number, alpha: number | undefined, settings: LimitSettings | undefined): Points {
  const key = JSON.stringify([ruleSet, wl, alpha ?? null, settings ?? null]);
  const hit = curveCache.get(key);
  if (hit) return hit;
  const lo = Math.log10(DURATION_RANGE_S[0]);
  const hi = Math.log10(DURATION_RANGE_S[1]);
  const f = (e: number): number | null => hAt(ruleSet, wl, 10 ** e, alpha, settings);
  const base: Array<[number, number | null]> = [];
  for (let e = lo; e < hi; e += 0.5) base.push([e, f(e)]);
  base.push([hi, f(hi)]);
  const refine = (a: [number, number | null], b: [number, number | null], depth: number): Array<[number, number | null]> => {
    if (depth === 0 || a[1] === null || b[1] === null || a[1] <= 0 || b[1] <= 0) return [];
    const m = (a[0] + b[0]) / 2;
    const v = f(m);
    if (v === null || v <= 0) return [[m, v]];
    if (Math.abs(Math.log10(v) - (Math.log10(a[1]) + Math.log10(b[1])) / 2) < 0.005) return [];
    return [...refine(a, [m, v], depth - 1), [m, v], ...refine([m, v], b, depth - 1)];
  };
  const all: Array<[number, number | null]> = [];
  for (let i = 0; i < base.length; i++) {
    const p = base[i];
    if (!p) continue;
    all.push(p);
    const q = base[i + 1];
    if (q) all.push(...refine(p, q, 4));
  }
  const pts = all.filter((p): p is [number, number] => p[1] !== null && p[1] > 0).map(([e, h]) => [10 ** e, h] as const);
  if (curveCache.size > 200) curveCache.clear();
  curveCache.set(key, pts);
  return pts;
}

export interface LimitPlotData {
  readonly curve: Points;
  readonly operating: { readonly t: number; readonly H: number } | null;
  readonly perPulse: { readonly t: number; readonly H: number; readonly rule: string } | null;
}

export function limitPlot(beam: BeamResult, input: BeamInput, settings: LimitSettings | undefined): LimitPlotData {
  const s = input.settings ?? settings;
  const curve = limitCurve(beam.ruleSet, beam.wavelength_nm, input.sourceAngle_rad, s);
  const T = input.exposureDuration_s ?? defaultExposureDuration(input.wavelength_nm).duration_s;
  const pulsed = input.emission.kind === 'pulsed';
  const H_T = pulsed ? hAt(beam.ruleSet, beam.wavelength_nm, T, input.sourceAngle_rad, s) : Number(beam.mpe.E_Wm2) * T;
  return {
    curve,
    operating: H_T === null ? null : { t: T, H: H_T },
    perPulse: input.emission.kind === 'pulsed' ? { t: input.emission.pulseDuration_s, H: Number(beam.mpe.H_Jm2), rule: beam.mpe.governingRule } : null,
  };
}

export interface DistancePlotData {
  readonly curve: Points;
  readonly limit: number;
  readonly quantity: 'H' | 'E';
  readonly apertureMm: string;
  readonly nohd: number;
}

/** Exposure of the direct beam against distance for the criterion that sets the NOHD. */
export function distancePlot(beam: BeamResult, input: BeamInput, settings: LimitSettings | undefined): DistancePlotData | null {
  const n = Number(beam.nohd_m_reported);
  const rMax = n > 0 ? Math.max(n * 10, 1) : 100;
  const rMin = n > 0 ? Math.min(n / 100, 0.01) : 0.01;
  const distances: number[] = [];
  for (let i = 0; i <= 40; i++) distances.push(rMin * (rMax / rMin) ** (i / 40));
  const along = exposureAlongBeam({ input, ruleSet: beam.ruleSet, settings, nohd_m: beam.nohd_m }, distances);
  if (along === null) return null;
  return { curve: along.points, limit: Number(along.limit), quantity: along.quantity, apertureMm: along.aperture_mm, nohd: n };
}
