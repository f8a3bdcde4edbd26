/**
 * The per-beam figures every document prints, formatted once so that the report summary, the door
 * notice and the eyewear sheet agree digit for digit.
 */
import type { BeamResult, DistanceKind } from '../../../../core/model/results.js';
import type { UnitHabit } from '../../../../core/units/quantities.js';
import { dec } from '../../../../core/numeric/decimal.js';
import * as fmt from '../format.js';

/** Largest reported distance of a kind (rounded up by the core); null when none was assessed. */
export function reportedDistance(beam: BeamResult, kind: DistanceKind): string | null {
  // a diffuse viewing case the officer did not take as governing is shown beside it, not here
  const ds = beam.distances.filter((d) => d.kind === kind && d.governs !== false);
  if (ds.length === 0) return null;
  let best = ds[0]?.distance_m_reported ?? '0';
  for (const d of ds) if (dec(d.distance_m_reported).gt(best)) best = d.distance_m_reported;
  return best;
}

export interface BeamFigures {
  readonly wavelength: string;
  /** Governing eye limit, rounded down, in the habit's units. */
  readonly limit: string;
  /** "single-pulse rule · row H-E-NIR1-5p · retinal thermal". */
  readonly governing: string;
  readonly nohd: string;
  readonly diffuse: string;
  /** Both diffuse viewing cases, e.g. "accidental 0.25 s: 0.107 m; deliberate 600 s: 0.17 m (governs)"; null without diffuse viewing. */
  readonly diffuseCases: string | null;
  readonly skin: string;
  readonly od: string;
  readonly scale: string;
  readonly classEstimate: string;
}

const RULE_NAME: Readonly<Record<BeamResult['mpe']['governingRule'], string>> = {
  cw: 'continuous exposure',
  'single-pulse': 'single-pulse rule',
  'average-power': 'average-power rule',
  'pulse-train': 'reduced single-pulse rule (pulse train)',
};

export function ruleName(rule: BeamResult['mpe']['governingRule']): string {
  return RULE_NAME[rule];
}

export function beamFigures(beam: BeamResult, units: UnitHabit): BeamFigures {
  const pulsed = beam.mpe.governingRule !== 'cw';
  const limit = pulsed
    ? `${fmt.limitH(beam.mpe.H_Jm2, units)} per pulse`
    : `${fmt.limitE(beam.mpe.E_Wm2, units)} over ${fmt.duration(beam.mpe.exposureDuration_s)}`;
  const diffuse = reportedDistance(beam, 'diffuse');
  const skin = reportedDistance(beam, 'skin');
  return {
    wavelength: fmt.wavelength(beam.wavelength_nm),
    limit,
    governing: `${RULE_NAME[beam.mpe.governingRule]} · row ${beam.mpe.governingRow} · ${beam.mpe.governingEffect}`,
    nohd: fmt.distance(beam.nohd_m_reported),
    diffuse: diffuse !== null ? fmt.distance(diffuse) : fmt.distanceFull(beam.nhzDiffuse_m),
    diffuseCases: diffuseCases(beam),
    skin: skin !== null ? fmt.distance(skin) : fmt.distanceFull(beam.skinHazardDistance_m),
    od: fmt.od(beam.odRequired),
    scale: fmt.scaleNumbers(beam.scaleNumbers),
    classEstimate: beam.classEstimate.estimate,
  };
}

/** One line naming both diffuse viewing cases and which governs (null when diffuse viewing was not assessed). */
export function diffuseCases(beam: BeamResult): string | null {
  const ds = beam.distances.filter((d) => d.kind === 'diffuse' && d.viewing !== undefined);
  if (ds.length === 0) return null;
  return ds
    .map((d) => `${d.viewing ?? ''}${d.exposureDuration_s !== undefined ? ` ${fmt.duration(d.exposureDuration_s)}` : ''}: ${fmt.distance(d.distance_m_reported)}${d.governs ? ' (governs)' : ''}`)
    .join('; ');
}
