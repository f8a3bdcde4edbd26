/**
 * The plan on the door notice: the room, the laser controlled area the officer accepted, the hazard
 * zones, a scale bar, and "You are here" at the entrance the notice is for (the door the officer chose
 * on the print screen, or the plan's first door). Set as large as the notice leaves room for, its
 * words 7.5–8.5 pt (ours: read at the door from arm's length, like the other details). The key goes
 * beside the drawing or below it, whichever leaves the room drawn larger.
 */
import type { Column, Content } from 'pdfmake/interfaces';
import type { DocumentInput } from '../document-input.js';
import type { RoomView } from '../room-view.js';
import { laserNames } from './report-plan.js';
import { planSvg } from './plan-svg.js';

/** Width kept for the key beside the drawing, pt (ours: about 8 words of 8 pt a line). */
const KEY_BESIDE_PT = 92;

export function noticePlan(doc: DocumentInput, view: RoomView, width: number, height: number, entranceId?: string, fontSize = 8.5): Column | null {
  const plan = doc.content.input.plan;
  if (!plan) return null;
  const entrance = plan.doors.find((d) => d.id === entranceId) ?? plan.doors[0];
  const caption = fontSize * 0.95;
  // Below about 60 pt the drawing has no room left beside its scale band: keep that much (ours).
  const slot = Math.max(height, 60 + caption * 3.6);
  const draw = (w: number, h: number) => planSvg(plan, doc.results.plan, { maxWidth: w, maxHeight: h, compact: true, fontSize, laserNames: laserNames(view), ...(entrance ? { entranceId: entrance.id } : {}) });
  const title: Content = { text: 'Room plan', bold: true, fontSize: fontSize * 1.3, lineHeight: 1, margin: [0, 0, 0, 2] };
  const here: Content[] = entrance ? [{ text: `You are here: door ${entrance.label}`, bold: true }] : [];
  const zones = `Hazard zones shaded${plan.controlledArea ? '; laser controlled area dash-dot' : ''}.`;
  // Key beside (the drawing takes the slot's whole height) or below (its whole width): whichever draws the room larger.
  const below = draw(width, slot - caption * 3.6 - fontSize * 1.3);
  const beside = width - KEY_BESIDE_PT - 8 >= 60 ? draw(width - KEY_BESIDE_PT - 8, slot) : null;
  if (beside && beside.width >= below.width) {
    return {
      width,
      columnGap: 8,
      columns: [
        { width: beside.width, svg: beside.svg },
        {
          width: '*',
          stack: [
            title,
            { text: [...here, ...(entrance ? [' (solid black line, black dot).'] : [])], fontSize: caption, lineHeight: 1.05, margin: [0, 0, 0, 3] },
            { text: zones, fontSize: caption, lineHeight: 1.05 },
          ],
        },
      ],
    };
  }
  return {
    width,
    stack: [
      title,
      { svg: below.svg, width: below.width },
      { text: [...here, ...(entrance ? [' (solid black line, black dot). '] : []), zones], fontSize: caption, lineHeight: 1, margin: [0, 2, 0, 0] },
    ],
  };
}
