/**
 * Plot 2 of the report: the exposure the direct beam delivers at the eye against distance from the
 * exit, for the limit criterion that sets the NOHD, with that limit and the NOHD marked.
 * The curve is drawn with the core's own beam model and exposure function (range-equation growth,
 * averaging over the limiting aperture), so it crosses the limit at the core's NOHD; the reported
 * (rounded-up) NOHD is drawn as the vertical line.
 */
import { exposureAlongBeam, type BeamInput, type BeamResult, type ExposureAlongBeam, type LimitSettings, type UnitHabit } from '../../../../core/index.js';
import * as fmt from '../format.js';
import type { ContentStack } from 'pdfmake/interfaces';
import { logPlot } from './log-plot.js';
import { BoundedMemo } from './curve-cache.js';

/** Exposure curves across renders, keyed by everything `exposureAlongBeam` reads. */
const ALONG = new BoundedMemo<ExposureAlongBeam | null>(64);

export function exposureVsDistancePlot(beam: BeamResult, input: BeamInput | null, units: UnitHabit, width: number, settings?: LimitSettings): ContentStack | null {
  if (input === null) return null;
  const scale = units === 'ANSI' ? 1e-4 : 1;
  const nohdNum = Number(beam.nohd_m_reported);
  const rMax = nohdNum > 0 ? Math.max(nohdNum * 10, 1) : 100;
  const rMin = nohdNum > 0 ? Math.min(nohdNum / 100, 0.01) : 0.01;
  const distances: number[] = [];
  const steps = 48;
  for (let i = 0; i <= steps; i++) distances.push(rMin * (rMax / rMin) ** (i / steps));
  // The criterion drawn is the one that sets the NOHD (highest exposure-to-limit ratio there).
  const key = JSON.stringify([input, beam.ruleSet, settings ?? null, beam.nohd_m, distances]);
  const along = ALONG.get(key, () => exposureAlongBeam({ input, ruleSet: beam.ruleSet, settings, nohd_m: beam.nohd_m }, distances));
  if (along === null) return null;
  const points = along.points.map(([r, x]) => [r, x * scale] as const);
  const unit = `${along.quantity === 'E' ? 'W' : 'J'}/${units === 'ANSI' ? 'cm²' : 'm²'}`;
  const what = along.quantity === 'E' ? 'E at the eye' : 'H per pulse at the eye';
  const limitText = along.quantity === 'E' ? fmt.limitE(along.limit, units) : fmt.limitH(along.limit, units);
  return logPlot({
    width,
    height: width * 0.68,
    xLabel: 'distance from the exit r / m',
    yLabel: `${what} / ${unit}`,
    series: [{ label: `direct beam, ${along.aperture_mm} mm aperture`, points, color: '#0B5394' }],
    hLines: [{ at: Number(along.limit) * scale, label: `limit ${limitText} (${along.rule})`, color: '#C8102E' }],
    vLines: nohdNum > 0 ? [{ at: nohdNum, label: `NOHD ${fmt.distance(beam.nohd_m_reported)}`, color: '#C8102E' }] : [],
    ...(nohdNum > 0 ? {} : { note: 'NOHD 0 m: the limit is not exceeded at any distance' }),
  });
}
