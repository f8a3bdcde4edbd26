/**
 * Report section: the room plan to scale with the hazard zones the core computed, the laser
 * controlled area the officer accepted, and the findings with the controls they suggest.
 */
import type { Content, TableCell } from 'pdfmake/interfaces';
import type { DocumentInput } from '../document-input.js';
import { bullets, gridTable, heading, paragraph } from '../blocks.js';
import { COLOR } from '../page.js';
import type { RoomView } from '../room-view.js';
import { planSvg } from './plan-svg.js';

export function laserNames(view: RoomView): Map<string, string> {
  return new Map(view.lasers.map((l) => [l.laser.id, l.laser.name]));
}

export function planSection(doc: DocumentInput, view: RoomView, width: number): Content[] {
  const plan = doc.content.input.plan;
  if (!plan) return [];
  const result = doc.results.plan;
  const fig = planSvg(plan, result, { maxWidth: width, maxHeight: 470, laserNames: laserNames(view) });
  const ca = plan.controlledArea;
  const out: Content[] = [
    {
      unbreakable: true,
      stack: [
    heading('Room plan and hazard zones'),
    paragraph(
      `Top view, north up, drawn to scale 1:${fig.ratio} when printed at 100 %. The zones are computed by the calculation core from the same evaluation as the figures in this report; they show where the exposure can exceed the limit at the height of the beam, and support, not replace, the officer's judgement on site.`,
      { fontSize: 8, color: COLOR.muted },
    ),
    { svg: fig.svg, width: fig.width, alignment: 'center', margin: [0, 4, 0, 6] },
      ],
    },
    paragraph(
      ca
        ? [{ text: 'Laser controlled area: ', bold: true }, `boundary drawn on the plan (dash-dot blue line), accepted by ${ca.acceptedBy}${ca.note ? ` — ${ca.note.replace(/\.$/, '')}` : ''}.`]
        : [{ text: 'Laser controlled area: ', bold: true }, { text: 'no boundary has been accepted on the plan.', color: COLOR.bad, bold: true }],
      { fontSize: 9 },
    ),
  ];
  if (!result) {
    out.push(paragraph([{ text: 'The zones were not computed for this record (it was evaluated without the plan).', color: COLOR.bad }], { fontSize: 9 }));
    return out;
  }
  const findings = [...result.findings].sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'hazard' ? -1 : 1));
  if (findings.length === 0) {
    out.push(paragraph('Findings from the plan: no door, window or work position lies in a hazard zone, and every zone stays inside the accepted laser controlled area.', { fontSize: 9 }));
  } else {
    const rows: TableCell[][] = findings.map((f, i) => [
      `${i + 1}`,
      { text: f.severity === 'hazard' ? 'Hazard' : 'Check', bold: true, color: f.severity === 'hazard' ? COLOR.bad : COLOR.cautionEdge },
      f.text,
      f.suggestion,
    ]);
    out.push(heading('Findings from the plan', 2), gridTable(['#', 'Kind', 'Finding', 'Suggested control'], rows, [14, 34, '*', '*'], 7.5));
  }
  out.push(heading('How the zones are drawn', 3), bullets(result.method, 7.5));
  return out;
}
