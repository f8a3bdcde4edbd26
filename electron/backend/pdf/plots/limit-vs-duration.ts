/**
 * Plot 1 of the report: the eye exposure limit as radiant exposure H against exposure duration,
 * evaluated by the core's `exposureLimit` along the duration axis, with the operating point
 * (the exposure duration assessed and the limit there) and, for a pulsed beam, the per-pulse limit
 * that governs after the pulse rules.
 */
import {
  DURATION_RANGE_S,
  dec,
  limitAgainstDuration,
  ruleSetTable,
  type BeamInput,
  type BeamResult,
  type LimitSettings,
  type RuleSetId,
  type UnitHabit,
} from '../../../../core/index.js';
import { limitH, duration, wavelength } from '../format.js';
import type { ContentStack } from 'pdfmake/interfaces';
import { logPlot } from './log-plot.js';
import { BoundedMemo } from './curve-cache.js';

export type CurveCache = Map<string, ReadonlyArray<readonly [number, number]>>;

type Curve = ReadonlyArray<readonly [number, number]>;

/** Curves across renders (a 10-laser room has at most 10 distinct ones per rule set). */
const CURVES = new BoundedMemo<Curve>(64);
/** The limit over the assessed duration of a pulsed beam, across renders. */
const POINTS = new BoundedMemo<string | null>(64);

/** J/m² -> the habit's unit for H (J/m² or J/cm²). */
function hScale(units: UnitHabit): { factor: number; unit: string } {
  return units === 'ANSI' ? { factor: 1e-4, unit: 'J/cm²' } : { factor: 1, unit: 'J/m²' };
}

function limitAt(ruleSet: RuleSetId, wavelength_nm: number, t: number, sourceAngle_rad: number | undefined, settings: LimitSettings | undefined): string | null {
  const key = JSON.stringify([ruleSet, wavelength_nm, t, sourceAngle_rad ?? null, settings ?? null]);
  return POINTS.get(key, () => limitsAt(ruleSet, wavelength_nm, [t], sourceAngle_rad, settings)[0]?.H_Jm2 ?? null);
}

function limitsAt(ruleSet: RuleSetId, wavelength_nm: number, ts: readonly number[], sourceAngle_rad: number | undefined, settings: LimitSettings | undefined) {
  return limitAgainstDuration({ ruleSet, tissue: 'eye', wavelength_nm, ...(sourceAngle_rad === undefined ? {} : { sourceAngle_rad }), ...(settings === undefined ? {} : { settings }) }, ts);
}

/**
 * Durations where the limit can change form at this wavelength: the ends of every table row and
 * factor piece whose band holds the wavelength. Between two neighbours every candidate row is a
 * power law in t, i.e. a straight line on the log-log plot.
 */
function breakpoints(ruleSet: RuleSetId, wavelength_nm: number, from_s: number): number[] {
  const table = ruleSetTable(ruleSet);
  const inBand = (b: readonly [number, number] | undefined): boolean => b === undefined || (wavelength_nm >= b[0] && wavelength_nm <= b[1]);
  const ts = new Set<number>([from_s, DURATION_RANGE_S[1]]);
  const add = (iv: readonly [number, number] | undefined): void => {
    if (iv === undefined) return;
    for (const t of iv) if (t > from_s && t < DURATION_RANGE_S[1]) ts.add(t);
  };
  for (const row of [...table.eye, ...table.skin]) if (inBand(row.band_nm)) add(row.t_s);
  for (const f of Object.values(table.factors)) for (const piece of f.pieces ?? []) if (inBand(piece.band_nm)) add(piece.t_s);
  return [...ts].sort((a, b) => a - b);
}

/**
 * H(t) at each breakpoint, just below the next one (limits can step there), and at the log-midpoint
 * between them (where a dual limit can cross over). Far fewer look-ups than a dense grid, and exact
 * at the corners.
 */
export function limitCurve(ruleSet: RuleSetId, wavelength_nm: number, sourceAngle_rad: number | undefined, settings: LimitSettings | undefined, from_s: number, cache?: CurveCache): ReadonlyArray<readonly [number, number]> {
  const lo = Math.max(from_s, DURATION_RANGE_S[0]);
  const key = JSON.stringify([ruleSet, wavelength_nm, sourceAngle_rad ?? null, settings ?? null, lo]);
  const hit = cache?.get(key);
  if (hit) return hit;
  const curve = CURVES.get(key, () => sampleCurve(ruleSet, wavelength_nm, sourceAngle_rad, settings, lo));
  cache?.set(key, curve);
  return curve;
}

function sampleCurve(ruleSet: RuleSetId, wavelength_nm: number, sourceAngle_rad: number | undefined, settings: LimitSettings | undefined, lo: number): Curve {
  const bps = breakpoints(ruleSet, wavelength_nm, lo);
  const ts: number[] = [];
  for (let i = 0; i < bps.length; i++) {
    const a = bps[i];
    const b = bps[i + 1];
    if (a === undefined) continue;
    ts.push(a);
    if (b === undefined) continue;
    ts.push(Math.sqrt(a * b));
    ts.push(b * (1 - 1e-9));
  }
  const curve: Array<readonly [number, number]> = [];
  // Outside the rule set's range the curve simply has no point.
  for (const p of limitsAt(ruleSet, wavelength_nm, ts, sourceAngle_rad, settings)) if (p.H_Jm2 !== null) curve.push([p.t_s, Number(p.H_Jm2)] as const);
  return curve;
}

export function limitVsDurationPlot(beam: BeamResult, input: BeamInput | null, settings: LimitSettings | undefined, units: UnitHabit, width: number, cache?: CurveCache): ContentStack {
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
  return logPlot({
    width,
    height: width * 0.68,
    xLabel: 'exposure duration t / s',
    yLabel: `eye limit H / ${unit}`,
    series: [{ label: `eye limit, ${wavelength(beam.wavelength_nm)}`, points: curve.map(([t, h]) => [t, h * factor] as const), color: '#111111' }],
    markers,
  });
}
