/**
 * The plots on screen place their labels with the same placer as the printed report
 * (core/plot/label-placement.ts): no label covers a curve, the limit line, the NOHD line or
 * another label. Beams: the ten lasers of the invented demo (test/backend/pdf/ten-laser-room.ts),
 * evaluated by the real core, both plots each. Label boxes from the drawn text position and the
 * width the screen measured it with (renderer/lib/label-measure.ts). (Self-consistency check of
 * the drawing; no published source.)
 */
import { render } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import BeamPlots from '../../renderer/components/BeamPlots.svelte';
import { evaluateRoom } from '../../core/index.js';
import { boxesOverlapArea, linesLengthInBox, textBoxSize, type LabelBox, type PlotPoint } from '../../core/plot/label-placement.js';
import { labelWidth } from '../../renderer/lib/label-measure.js';
import { tenLaserRoom } from '../backend/pdf/ten-laser-room.js';

const LABEL_PX = 10.5;
const input = tenLaserRoom();
const room = evaluateRoom(input);

const num = (el: Element, a: string): number => Number(el.getAttribute(a));

describe('screen plots: labels cover no curve, line or other label', () => {
  it.each(input.lasers.map((l, i) => ({ name: l.name, i })))('$name', ({ i }) => {
    const beamInput = input.lasers[i]?.beams[0];
    const beam = room.beams.find((b) => b.beamId === beamInput?.id);
    if (beamInput === undefined || beam === undefined) throw new Error('beam missing');
    const { container } = render(BeamPlots, { props: { beam, input: beamInput, settings: undefined, habit: 'SI' } });
    const svgs = [...container.querySelectorAll('svg')];
    expect(svgs.length).toBe(2);
    for (const svg of svgs) {
      const lines: PlotPoint[][] = [];
      for (const p of svg.querySelectorAll('path.line')) {
        lines.push([...(p.getAttribute('d') ?? '').matchAll(/[ML]([-\d.]+),([-\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) })));
      }
      for (const l of svg.querySelectorAll('line.marker')) lines.push([{ x: num(l, 'x1'), y: num(l, 'y1') }, { x: num(l, 'x2'), y: num(l, 'y2') }]);
      const labels = [...svg.querySelectorAll('text.mlabel')].map((t) => {
        const text = t.textContent ?? '';
        const box: LabelBox = { x: num(t, 'x'), y: num(t, 'y') - LABEL_PX * 0.95, w: labelWidth(text, LABEL_PX), h: textBoxSize(text, LABEL_PX).height };
        return { text, box };
      });
      expect(labels.length).toBeGreaterThan(0);
      for (const l of labels) expect({ label: l.text, crossing: linesLengthInBox(lines, l.box) }).toEqual({ label: l.text, crossing: 0 });
      for (const [k, a] of labels.entries()) for (const b of labels.slice(k + 1)) expect({ pair: [a.text, b.text], shared: boxesOverlapArea(a.box, b.box) }).toEqual({ pair: [a.text, b.text], shared: 0 });
    }
  });
});
