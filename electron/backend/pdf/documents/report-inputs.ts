/** Report: the inputs and assumptions behind every number (domain reference 6.2 items 3-6). */
import type { Content, TableCell } from 'pdfmake/interfaces';
import type { BeamInput, ViewingConditions } from '../../../../core/model/inputs.js';
import { dec, roundPlaces } from '../../../../core/numeric/decimal.js';
import { dominantToleranceWords } from '../../../../core/model/input-words.js';
import { formatSI, plain } from '../../../../core/units/quantities.js';
import type { UnitHabit } from '../../../../core/units/quantities.js';
import type { DocumentInput } from '../document-input.js';
import { assumedDefaults } from '../../records/older-content.js';
import { bullets, gridTable, heading, headingOnNewPage, headingWith, paragraph } from '../blocks.js';
import * as fmt from '../format.js';
import { COLOR } from '../page.js';
import type { RoomView } from '../room-view.js';

const DEFINITION: Readonly<Record<string, string>> = { '1/e': '1/e', '1/e2': '1/e²', d63: 'D63' };

function beamGeometry(b: BeamInput): string {
  const def = DEFINITION[b.beam.definition] ?? b.beam.definition;
  return `${formatSI(String(b.beam.diameter_m), 'm', 3, 'up')} (${def}), ${formatSI(String(b.beam.divergence_rad), 'rad', 3, 'up')} full angle`;
}

function viewingText(v: ViewingConditions | undefined): string {
  if (v === undefined) return 'direct beam only';
  const parts: string[] = ['direct beam'];
  if (v.diffuse) {
    const angle = v.diffuse.viewingAngle_rad === undefined ? '' : `, viewed at ${plain(dec(v.diffuse.viewingAngle_rad).mul(180).div(Math.PI).toDecimalPlaces(1))}°`;
    parts.push(`diffuse reflection ρ = ${v.diffuse.reflectance}${angle}`);
  }
  if (v.specular) parts.push(`specular reflection ρ = ${v.specular.reflectance}`);
  if (v.lens) parts.push(`lens f = ${formatSI(String(v.lens.focalLength_m), 'm')}`);
  if (v.fiber) parts.push(`${v.fiber.kind} fibre, NA ${v.fiber.numericalAperture}`);
  if (v.aided) parts.push(`optical aid ${v.aided.magnification}×, ${formatSI(String(v.aided.objectiveDiameter_m), 'm')} objective`);
  if (v.attenuation_per_m !== undefined) parts.push(`atmospheric attenuation ${v.attenuation_per_m} /m credited`);
  if (v.closestApproach_m !== undefined) parts.push(`closest approach ${formatSI(String(v.closestApproach_m), 'm')}`);
  return parts.join('; ');
}

function tolerancesText(b: BeamInput): string {
  const t = b.tolerances;
  if (t === undefined) return 'none given';
  const parts = Object.entries(t)
    .filter((e): e is [string, number] => typeof e[1] === 'number')
    .map(([k, v]) => `${k} ±${plain(dec(v).mul(100))} %`);
  return parts.length === 0 ? 'none given' : parts.join(', ');
}

export function inputsSection(doc: DocumentInput, view: RoomView, units: UnitHabit): Content[] {
  const c = doc.content;
  const chosen = new Map(c.assumptions.exposureDurations.map((d) => [d.beamId, d]));
  const beamRows: TableCell[][] = view.beams.map((b, i) => {
    const input = b.input;
    const em = input ? fmt.emission(input.emission) : null;
    const choice = chosen.get(b.result.beamId);
    const why = choice ? choice.why : b.result.mpe.durationWhy;
    return [
      `${i + 1}. ${b.result.label}`,
      fmt.wavelength(b.result.wavelength_nm),
      em ? `${em.output}\n${em.pulse}` : { text: 'input missing', color: COLOR.bad },
      input ? beamGeometry(input) : '–',
      { text: [{ text: fmt.duration(b.result.mpe.exposureDuration_s), bold: true }, `\n${why}`] },
      input ? viewingText(input.viewing) : '–',
      input ? tolerancesText(input) : '–',
    ];
  });

  const settings = c.input.settings;
  const conservative = settings?.conservative !== false;
  const replacements = [...new Set(view.beams.flatMap((b) => [...b.result.mpe.conservativeReplacements, ...b.result.skinMpe.conservativeReplacements]))];
  const boundRows: TableCell[][] = view.beams.map((b, i) => {
    const bd = b.result.bounds;
    return [
      `${i + 1}. ${b.result.label}`,
      `${fmt.distanceFull(bd.nohd_m.nominal)} / ${fmt.distanceFull(bd.nohd_m.conservative)}`,
      `${fmt.od(roundOd(bd.odRequired.nominal))} / ${fmt.od(roundOd(bd.odRequired.conservative))}`,
      `${fmt.limitE(bd.limit_E_Wm2.nominal, units)} / ${fmt.limitE(bd.limit_E_Wm2.conservative, units)}`,
      dominantToleranceWords(bd) ?? 'no tolerance moves the result',
    ];
  });
  const a = c.assumptions;
  // Only groups of two or more beams: a single beam is already compared with its own limit.
  const additive = doc.results.additive
    .filter((g) => g.beamIds.length > 1)
    .map((g) => {
      const effect = g.effect.toLowerCase().startsWith(g.tissue) ? g.effect : `${g.tissue}, ${g.effect}`;
      const over = dec(g.sumOfFractions).gt(1);
      // The core's note repeats the sum as plain digits; the page prints it once, in engineering notation.
      return `${effect[0]?.toUpperCase() ?? ''}${effect.slice(1)}: beams ${g.beamIds.map((id) => beamNumber(view, id)).join(', ')} — sum of exposure/limit fractions ${fmt.ratio(g.sumOfFractions)}${over ? ' (over the limit combined)' : ''}. ${g.place === undefined ? g.note : `Place: ${g.place}; each beam taken at its worst reachable position.`}`;
    });
  const inventoryRows: TableCell[][] = view.lasers.map((l) => {
    const i = l.installation;
    const makerModel = i ? [i.maker, i.model].filter((x) => x.trim() !== '').join(' ') : '';
    const ids = i ? [i.serialNumber && `serial ${i.serialNumber}`, i.registrationNumber && `reg. ${i.registrationNumber}`].filter((x) => x).join(', ') : '';
    const beamNos = l.beams.map((b) => view.beams.indexOf(b) + 1).join(', ');
    return [{ text: l.type, bold: true }, makerModel || '–', ids || '–', l.classAsLabelled === null ? 'not labelled' : `Class ${l.classAsLabelled}`, beamNos];
  });
  return [
    // a major section starts on a new page, so its first sub-heading cannot be stranded at a page foot
    headingOnNewPage('Inputs and assumptions'),
    heading('Lasers (inventory)', 2),
    gridTable(['Laser type', 'Maker and model', 'Serial / registration', 'Class as labelled', 'Beams'], inventoryRows, ['*', 110, 110, 60, 50], 8),
    heading('Beams', 2),
    gridTable(['Beam', 'Wave-length', 'Output', 'Beam at exit (definition)', 'Exposure duration and why', 'Viewing conditions', 'Tolerances'], beamRows, [66, 34, 62, 78, '*', 88, 48], 7.2), // '*': stays inside the margins on A4
    headingWith('Rule set and conservative mode', 2, paragraph([{ text: 'Rule set: ', bold: true }, doc.results.ruleSetName])),
    paragraph(
      conservative
        ? 'Conservative mode is on: where a table entry could not be checked against the published document, the stricter alternative was used.'
        : [{ text: 'Conservative mode is OFF: remembered table values were used where they could not be checked. This is not recommended.', bold: true, color: COLOR.bad }],
    ),
    replacements.length > 0
      ? paragraph([{ text: 'Unverified entries replaced by the stricter alternative: ', bold: true }, replacements.join(', ')], { fontSize: 8.5 })
      : paragraph('No table entry needed replacing.', { fontSize: 8.5 }),
    ...(settings?.verifiedRows && settings.verifiedRows.length > 0
      ? [paragraph([{ text: 'Entries checked by a named person and used as remembered: ', bold: true }, settings.verifiedRows.join(', ')], { fontSize: 8.5 })]
      : []),
    heading('Uncertainty bounds (nominal / with input tolerances)', 2),
    gridTable(['Beam', 'NOHD', 'Required OD', 'Eye limit as irradiance', 'Input tolerances'], boundRows, [110, 90, 90, 120, '*'], 7.5),
    headingWith(
      'Who and what was assumed',
      2,
      bullets(
        [
          `Persons who can be present: ${a.personsPresent || 'not stated'}.`,
          `Optical aids (binoculars, loupes, telescopes) ${a.opticalAidsPossible ? 'may be used in the area' : 'are not used in the area'}.`,
          ...a.other,
        ],
        9,
      ),
    ),
    ...olderRecordSection(doc),
    // kept with its few lines: alone at a page foot the heading reads as a missing section (common practice)
    ...(additive.length > 0 ? [headingWith('Beams acting on the same tissue and effect (added)', 2, bullets(additive, 8.5))] : []),
  ];
}

/**
 * A revision saved by an older version lacks inputs added since; the calculation used their
 * documented defaults (electron/backend/records/older-content.ts), and the paper says which, as
 * the workspace does, so the officer and an auditor can check them.
 */
function olderRecordSection(doc: DocumentInput): Content[] {
  const assumed = assumedDefaults(doc.content, doc.assessment.calculatedWith);
  if (assumed.length === 0) return [];
  return [
    headingWith(
      'Assumed for this older record',
      2,
      paragraph(
        'This revision was saved by an older version of Beamwarden, before the inputs below existed. The results use their defaults, as stated; check them and save a new revision to record your own values.',
        { fontSize: 8.5 },
      ),
    ),
    bullets(assumed, 8.5),
  ];
}

function beamNumber(view: RoomView, beamId: string): string {
  const i = view.beams.findIndex((b) => b.result.beamId === beamId);
  return i < 0 ? beamId : String(i + 1);
}

/** Bounds carry full-precision OD; print them rounded up to one decimal like the core's figure. */
function roundOd(v: string): string {
  return roundPlaces(v, 1, 'up').toString();
}
