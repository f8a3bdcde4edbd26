/**
 * Plot 2 of the report: the exposure the direct beam delivers at the eye against distance from the
 * exit, for the limit criterion that sets the NOHD, with that limit and the NOHD marked.
 * The curve is drawn with the core's own beam model and exposure function (range-equation growth,
 * averaging over the limiting aperture), so it crosses the limit at the core's NOHD; the reported
 * (rounded-up) NOHD is drawn as the vertical line.
 */
import { Dec } from '../../../../core/numeric/decimal.js';
import { beamModel, exposureAt, spreadOf } from '../../../../core/beam/beam-model.js';
import { eyeLimitsOf } from '../../../../core/beam/core-numbers.js';
import type { BeamInput, LimitSettings } from '../../../../core/model/inputs.js';
import type { BeamResult } from '../../../../core/model/results.js';
import type { UnitHabit } from '../../../../core/units/quantities.js';
import * as fmt from '../format.js';
import { logPlotSvg } from './log-plot.js';

export function exposureVsDistanceSvg(beam: BeamResult, input: BeamInput | null, units: UnitHabit, width: number, settings?: LimitSettings): string | null {
  if (input === null) return null;
  let eye;
  try {
    eye = eyeLimitsOf(input, beam.ruleSet, input.settings ?? settings);
  } catch {
    return null;
  }
  const m = beamModel(input.beam);
  const spread = spreadOf(m);
  const mu = input.viewing?.attenuation_per_m ? new Dec(input.viewing.attenuation_per_m) : undefined;
  const nohd = new Dec(beam.nohd_m);
  // The criterion that sets the NOHD is the one with the highest exposure-to-limit ratio there.
  let gov = eye.criteria[0];
  let best = new Dec(-1);
  for (const c of eye.criteria) {
    const ratio = exposureAt(eye.S, spread, c.aperture_m, nohd, mu).div(c.L);
    if (ratio.gt(best)) {
      best = ratio;
      gov = c;
    }
  }
  if (gov === undefined) return null;
  const criterion = gov;
  const scale = units === 'ANSI' ? 1e-4 : 1;
  const unit = `${eye.quantity === 'E' ? 'W' : 'J'}/${units === 'ANSI' ? 'cm²' : 'm²'}`;
  const nohdNum = Number(beam.nohd_m_reported);
  const rMax = nohdNum > 0 ? Math.max(nohdNum * 10, 1) : 100;
  const rMin = nohdNum > 0 ? Math.min(nohdNum / 100, 0.01) : 0.01;
  const points: Array<readonly [number, number]> = [];
  const steps = 48;
  for (let i = 0; i <= steps; i++) {
    const r = rMin * (rMax / rMin) ** (i / steps);
    points.push([r, exposureAt(eye.S, spread, criterion.aperture_m, new Dec(r), mu).toNumber() * scale] as const);
  }
  const what = eye.quantity === 'E' ? 'E at the eye' : 'H per pulse at the eye';
  const limitText = eye.quantity === 'E' ? fmt.limitE(criterion.L.toString(), units) : fmt.limitH(criterion.L.toString(), units);
  return logPlotSvg({
    width,
    height: width * 0.68,
    xLabel: 'distance from the exit r / m',
    yLabel: `${what} / ${unit}`,
    series: [{ label: `direct beam, ${criterion.aperture_m.mul(1000).toString()} mm aperture`, points, color: '#0B5394' }],
    hLines: [{ at: criterion.L.toNumber() * scale, label: `limit ${limitText} (${criterion.rule})`, color: '#C8102E' }],
    vLines: nohdNum > 0 ? [{ at: nohdNum, label: `NOHD ${fmt.distance(beam.nohd_m_reported)}`, color: '#C8102E' }] : [],
    ...(nohdNum > 0 ? {} : { note: 'NOHD 0 m: the limit is not exceeded at any distance' }),
  });
}
