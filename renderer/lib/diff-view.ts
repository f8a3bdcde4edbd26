/**
 * Makes a revision comparison readable: changes to what the officer entered first, then the
 * headline results that moved (limits, distances, OD, scale numbers, class), and the rest (the
 * derivation steps that follow from them) only counted. Paths name lasers and beams by name.
 */
import type { AssessmentContent, FieldDifference } from '../../electron/api/contracts/records.js';

const HEADLINE = /\.(nohd_m_reported|odRequired|odRequired_reported|H_Jm2_reported|E_Wm2_reported|distance_m_reported|skinHazardDistance_m|nhzDiffuse_m|estimate|scale|largestHazardDistance_m|highestClass|eyewearCoveringAll|purchaseAdvice|adequate)(\[\d+\])?$/;

export interface DiffView {
  readonly content: readonly FieldDifference[];
  readonly headline: readonly FieldDifference[];
  /** Other result values (derivation steps, full-precision twins) that changed with them. */
  readonly otherResults: number;
}

export function diffView(diff: readonly FieldDifference[]): DiffView {
  const content = diff.filter((d) => !d.path.startsWith('results'));
  const results = diff.filter((d) => d.path.startsWith('results'));
  const headline = results.filter((d) => !/\.trace\b/.test(d.path) && HEADLINE.test(d.path));
  return { content, headline, otherResults: results.length - headline.length };
}

/** "content.input.lasers[1].beams[0].emission.power_W" -> "DPSS laser / 532 nm: emission.power_W". */
export function describePath(path: string, content: AssessmentContent | undefined): string {
  let p = path.replace(/^content\./, '').replace(/^input\./, '');
  const m = /^lasers\[(\d+)\](?:\.beams\[(\d+)\])?\.?(.*)$/.exec(p);
  if (m && content) {
    const laser = content.input.lasers[Number(m[1])];
    const beam = m[2] !== undefined ? laser?.beams[Number(m[2])] : undefined;
    const who = [laser?.name ?? `laser ${Number(m[1]) + 1}`, beam ? (beam.label ?? `${beam.wavelength_nm} nm`) : null].filter(Boolean).join(' / ');
    p = `${who}${m[3] ? `: ${m[3]}` : ''}`;
  }
  const r = /^results\.beams\[(\d+)\]\.?(.*)$/.exec(p);
  if (r && content) {
    const beams = content.input.lasers.flatMap((l) => l.beams.map((b) => `${l.name} / ${b.label ?? `${b.wavelength_nm} nm`}`));
    p = `result ${beams[Number(r[1])] ?? `beam ${Number(r[1]) + 1}`}: ${r[2]}`;
  }
  return p.replace(/^results\./, 'result: ');
}
