/**
 * The text `npm run demo` prints for one room: per beam the governing eye limit with its rule and
 * row, the NOHD, every reflection and viewing distance the officer needs (both diffuse viewing
 * cases, which one governs and why, specular, lens, fibre, aided viewing, skin), the required OD and
 * the class estimate. Numbers in engineering notation with units, rounded in the safe direction
 * (limits down, distances up).
 */
import { quantityText, type BeamResult, type RoomResult } from '../../core/index.js';

const RULE_WORDS: Readonly<Record<BeamResult['mpe']['governingRule'], string>> = {
  cw: 'continuous exposure',
  'single-pulse': 'single pulse',
  'average-power': 'average power of the train',
  'pulse-train': 'pulse train (reduced per pulse)',
};

function limitText(b: BeamResult): string {
  const perPulse = b.mpe.governingRule !== 'cw';
  const value = perPulse ? `${quantityText(b.mpe.H_Jm2, 'J/m²', { round: 'down' })} per pulse` : quantityText(b.mpe.E_Wm2, 'W/m²', { round: 'down' });
  return `${value} (${RULE_WORDS[b.mpe.governingRule]}, row ${b.mpe.governingRow}, ${b.mpe.governingEffect}, over ${quantityText(b.mpe.aperture_m, 'm')})`;
}

function distanceText(d: BeamResult['distances'][number]): string {
  const text = d.zero ? 'none (the exposure is below the limit)' : quantityText(d.distance_m, 'm', { round: 'up' });
  if (d.kind === 'direct' || d.kind === 'skin' || d.zero) return text; // from the exit, as every NOHD
  return `${text}, from ${d.measuredFrom}${d.kind !== 'diffuse' ? '' : d.governs ? ' (governs)' : ' (for comparison)'}`;
}

export function beamLines(b: BeamResult): string[] {
  const rows: Array<[string, string]> = [
    ['Eye limit', limitText(b)],
    ...b.distances.map((d): [string, string] => [d.kind === 'direct' ? 'NOHD (direct beam)' : d.label, distanceText(d)]),
    ['Required OD', `${b.odRequired} (at ${b.od.position_m === '0' ? 'the exit' : quantityText(b.od.position_m, 'm', { round: 'nearest' })})`],
    ['Class estimate', `${b.classEstimate.estimate} (the manufacturer's class governs)`],
  ];
  const width = Math.max(...rows.map(([k]) => k.length));
  const lines = [`  ${b.label}`, ...rows.map(([k, v]) => `    ${k.padEnd(width)}  ${v}`)];
  for (const w of b.warnings.filter((x) => x.startsWith('Diffuse reflection'))) lines.push(`    ${w}`);
  return lines;
}

export function roomLines(code: string, name: string, responsible: string, r: RoomResult): string[] {
  return [
    '',
    `${code} ${name} (responsible: ${responsible}); rule set: ${r.ruleSetName}`,
    ...r.beams.flatMap((b) => beamLines(b)),
    `  Largest hazard distance: ${quantityText(r.largestHazardDistance_m, 'm', { round: 'up' })} (rounded up); eyewear covering every beam: ${r.eyewearCoveringAll.join(', ') || 'none on the shelf'}`,
  ];
}
