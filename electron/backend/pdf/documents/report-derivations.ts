/** Report: per beam, the two plots and the core's derivation trace. */
import { checkForStep, checksOf } from '../row-checks.js';
import type { Content } from 'pdfmake/interfaces';
import type { UnitHabit } from '../../../../core/units/quantities.js';
import type { DocumentInput } from '../document-input.js';
import { heading, paragraph } from '../blocks.js';
import * as fmt from '../format.js';
import { COLOR } from '../page.js';
import type { RoomView } from '../room-view.js';
import { limitVsDurationPlot, type CurveCache } from '../plots/limit-vs-duration.js';
import { exposureVsDistancePlot } from '../plots/exposure-vs-distance.js';
import { TracePrinter } from './trace-content.js';
import { rowsUsedSection } from './report-rows.js';

export function plotsSection(doc: DocumentInput, view: RoomView, units: UnitHabit, width: number): Content[] {
  const cache: CurveCache = new Map();
  const plotW = (width - 12) / 2;
  const out: Content[] = [
    heading('Plots'),
    paragraph(
      'Left: the eye exposure limit against exposure duration, with the duration assessed marked (and, for pulsed beams, the per-pulse limit that governs). ' +
        'Right: the exposure the beam delivers at the eye against distance, with the limit and the NOHD.',
      { fontSize: 8, color: COLOR.muted },
    ),
  ];
  view.beams.forEach((b, i) => {
    const settings = doc.content.input.settings;
    const left = limitVsDurationPlot(b.result, b.input, b.input?.settings ?? settings, units, plotW, cache);
    const right = exposureVsDistancePlot(b.result, b.input, units, plotW, settings);
    out.push({
      unbreakable: true,
      stack: [
        { text: `${i + 1}. ${b.result.label} — ${fmt.wavelength(b.result.wavelength_nm)}`, bold: true, fontSize: 9.5, margin: [0, 6, 0, 2] },
        {
          columns: [
            { ...left, width: plotW },
            right === null
              ? { width: plotW, text: 'Exposure against distance: not drawn (no beam input for this result).', fontSize: 8, color: COLOR.muted }
              : { ...right, width: plotW },
          ],
          columnGap: 12,
        },
      ],
    });
  });
  // The heading and its note travel with the first pair of plots: a heading alone at the foot of a
  // page reads as a missing section (the plots are unbreakable blocks, so pdfmake's heading test
  // sees the note follow and would not move the heading).
  if (out.length > 2) return [{ stack: out.slice(0, 3), unbreakable: true }, ...out.slice(3)];
  return out;
}

export function derivationsSection(doc: DocumentInput, view: RoomView): Content[] {
  const out: Content[] = [
    heading('Appendix — derivations'),
    paragraph(
      'Every figure above, step by step as the calculation core made it: inputs, table rows, formulas with the numbers substituted, stricter values used in place of unchecked ones, and rounding. ' +
        `Rule set of every step: ${doc.results.ruleSetName}. A sub-derivation or step identical to one printed earlier is referred to by its number ("as in D1.2"); ` +
        'the numbers in brackets ([1], [2] ...) refer to the list of sources at the end of this appendix, each with whether it was checked against the published text.',
      { fontSize: 8, color: COLOR.muted },
    ),
  ];
  out.push(...rowsUsedSection(doc));
  const checks = checksOf(doc);
  const printer = new TracePrinter(doc.results.ruleSetName, (s) => checkForStep(checks, doc.results.ruleSet, s));
  view.beams.forEach((b, i) => {
    out.push(heading(`${i + 1}. ${b.result.label}`, 2));
    out.push(...printer.render(b.result.trace, `D${i + 1}`));
  });
  out.push(heading('Room', 2));
  out.push(...printer.render(doc.results.trace, 'R'));
  out.push(heading('Sources of the derivations', 2), ...printer.sourceList());
  return out;
}
