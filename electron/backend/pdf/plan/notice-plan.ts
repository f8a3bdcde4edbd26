/**
 * The small plan on the door notice: the room, the laser controlled area the officer accepted, the
 * hazard zones, and "You are here" at the entrance the notice is for (the door the officer chose
 * on the print screen, or the plan's first door).
 */
import type { Column } from 'pdfmake/interfaces';
import type { DocumentInput } from '../document-input.js';
import type { RoomView } from '../room-view.js';
import { laserNames } from './report-plan.js';
import { planSvg } from './plan-svg.js';

export function noticePlan(doc: DocumentInput, view: RoomView, width: number, height: number, entranceId?: string): Column | null {
  const plan = doc.content.input.plan;
  if (!plan) return null;
  const entrance = plan.doors.find((d) => d.id === entranceId) ?? plan.doors[0];
  const fig = planSvg(plan, doc.results.plan, { maxWidth: width, maxHeight: height - 18, compact: true, laserNames: laserNames(view), ...(entrance ? { entranceId: entrance.id } : {}) });
  return {
    width,
    stack: [
      { svg: fig.svg, width: fig.width },
      {
        text: `Room plan: hazard zones shaded${plan.controlledArea ? ', laser controlled area dash-dot' : ''}${entrance ? `; you are here: door ${entrance.label} (solid black, black dot)` : ''}.`,
        fontSize: 6.5,
        lineHeight: 1,
        margin: [0, 1, 0, 0],
      },
    ],
  };
}
