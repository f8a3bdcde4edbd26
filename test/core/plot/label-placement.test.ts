/**
 * The plot label placer (core/plot/label-placement.ts), shared by the printed report and the
 * screen. Geometry cases worked by hand (self-consistency checks: no published source; the
 * placement rule, that a label never covers a curve, a line or another label, is ours, issue 12).
 */
import { createRequire } from 'node:module';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  boxesOverlapArea,
  candidatesAlongHorizontal,
  candidatesAlongVertical,
  candidatesAroundPoint,
  linesLengthInBox,
  placeLabels,
  segmentLengthInBox,
  textWidthEm,
} from '../../../core/plot/label-placement.js';

const box = { x: 5, y: 5, w: 10, h: 10 };

describe('length of a segment inside a box (hand-worked)', () => {
  it.each([
    { what: 'horizontal, through the middle', p: { x: 0, y: 10 }, q: { x: 20, y: 10 }, len: 10 },
    { what: 'diagonal from a corner, (5,5) to (15,15)', p: { x: 0, y: 0 }, q: { x: 20, y: 20 }, len: 10 * Math.SQRT2 },
    { what: 'diagonal ending inside, (5,5) to (10,10)', p: { x: 0, y: 0 }, q: { x: 10, y: 10 }, len: 5 * Math.SQRT2 },
    { what: 'wholly inside, 3-4-5', p: { x: 6, y: 6 }, q: { x: 9, y: 10 }, len: 5 },
    { what: 'outside, above', p: { x: 0, y: 2 }, q: { x: 20, y: 2 }, len: 0 },
    { what: 'outside, diagonal past the corner', p: { x: 0, y: 12 }, q: { x: 4, y: 16 }, len: 0 },
    { what: 'vertical, along the left edge', p: { x: 5, y: 0 }, q: { x: 5, y: 20 }, len: 10 },
    { what: 'a point', p: { x: 8, y: 8 }, q: { x: 8, y: 8 }, len: 0 },
  ])('$what: $len', ({ p, q, len }) => {
    expect(segmentLengthInBox(p, q, box)).toBeCloseTo(len, 9);
    expect(segmentLengthInBox(q, p, box)).toBeCloseTo(len, 9); // direction does not matter
  });

  it('a polyline adds its segments: a zig-zag crossing the box twice, 10 + 10', () => {
    const zig = [{ x: 0, y: 7 }, { x: 20, y: 7 }, { x: 20, y: 12 }, { x: 0, y: 12 }];
    expect(linesLengthInBox([zig], box)).toBeCloseTo(20, 9);
  });

  it.each([
    { a: { x: 0, y: 0, w: 10, h: 10 }, b: { x: 5, y: 5, w: 10, h: 10 }, area: 25 },
    { a: { x: 0, y: 0, w: 10, h: 10 }, b: { x: 10, y: 0, w: 10, h: 10 }, area: 0 },
    { a: { x: 0, y: 0, w: 10, h: 10 }, b: { x: 2, y: 3, w: 4, h: 2 }, area: 8 },
  ])('boxes share area $area', ({ a, b, area }) => {
    expect(boxesOverlapArea(a, b)).toBe(area);
  });
});

const frame = { x: 0, y: 0, w: 100, h: 100 };
const limitLine = [{ x: 0, y: 50 }, { x: 100, y: 50 }];

describe('placing labels', () => {
  it('a label on the line moves to the clear candidate (second choice)', () => {
    const [p] = placeLabels([{ id: 'limit', width: 20, height: 10, candidates: [{ x: 40, y: 45 }, { x: 40, y: 30 }] }], { lines: [limitLine] }, { frame });
    expect(p?.box).toEqual({ x: 40, y: 30, w: 20, h: 10 });
    expect(p?.crossing).toBe(0);
  });

  it('the first clear candidate wins when several are clear', () => {
    const [p] = placeLabels([{ id: 'a', width: 20, height: 10, candidates: [{ x: 10, y: 10 }, { x: 60, y: 10 }] }], { lines: [limitLine] }, { frame });
    expect(p?.box.x).toBe(10);
  });

  it('a second label does not sit on the first: it takes its next candidate', () => {
    const same = [{ x: 10, y: 10 }, { x: 10, y: 70 }];
    const placed = placeLabels(
      [
        { id: 'first', width: 30, height: 10, candidates: same },
        { id: 'second', width: 30, height: 10, candidates: same },
      ],
      { lines: [] },
      { frame },
    );
    expect(placed.map((p) => p.box.y)).toEqual([10, 70]);
    expect(placed.every((p) => p.overlap === 0)).toBe(true);
  });

  it('labels keep 2 x pad apart: a candidate 2 units from a placed label is refused with pad 1.5', () => {
    const placed = placeLabels(
      [
        { id: 'first', width: 30, height: 10, candidates: [{ x: 10, y: 10 }] },
        { id: 'second', width: 30, height: 10, candidates: [{ x: 42, y: 10 }, { x: 10, y: 70 }] },
      ],
      { lines: [] },
      { frame, pad: 1.5 },
    );
    expect(placed[1]?.box).toMatchObject({ x: 10, y: 70 });
  });

  it('a candidate outside the frame is not taken while one inside is clear', () => {
    const [p] = placeLabels([{ id: 'a', width: 30, height: 10, candidates: [{ x: 90, y: 10 }, { x: 20, y: 10 }] }], { lines: [] }, { frame });
    expect(p?.box.x).toBe(20);
  });

  it('a marker box is avoided like a label', () => {
    const [p] = placeLabels([{ id: 'a', width: 20, height: 10, candidates: [{ x: 10, y: 10 }, { x: 50, y: 10 }] }], { lines: [], boxes: [{ x: 15, y: 12, w: 6, h: 6 }] }, { frame });
    expect(p?.box.x).toBe(50);
  });

  it('when every candidate is crossed, the least crossed one is taken (never dropped)', () => {
    // A vertical line at x = 30 crosses the whole height of the first box (10 + 2 x 1.5 padded =
    // 13) and only the padded corner band of the second (1.5 + ... ): the second crosses less.
    const vertical = [{ x: 30, y: 0 }, { x: 30, y: 100 }];
    const diagonalCorner = [{ x: 60, y: 58 }, { x: 64, y: 62 }];
    const placed = placeLabels(
      [{ id: 'a', width: 20, height: 10, candidates: [{ x: 20, y: 20 }, { x: 40, y: 50 }] }],
      { lines: [vertical, diagonalCorner] },
      { frame, pad: 1.5 },
    );
    expect(placed[0]?.box).toMatchObject({ x: 40, y: 50 });
    expect(placed[0]?.crossing).toBeGreaterThan(0);
    expect(placed[0]?.crossing).toBeLessThan(13);
  });
});

describe('candidate positions', () => {
  it('around a point of radius 3: first right-above at 5 units, then left-above', () => {
    const c = candidatesAroundPoint({ x: 50, y: 50 }, 20, 10, 3);
    expect(c[0]).toEqual({ x: 55, y: 35 });
    expect(c[1]).toEqual({ x: 25, y: 35 });
    expect(c[2]).toEqual({ x: 55, y: 55 });
  });

  it('along a horizontal line: first above its right end, then below it, last at the left end', () => {
    const c = candidatesAlongHorizontal(50, 0, 100, 20, 10, 2, 4);
    expect(c[0]).toEqual({ x: 78, y: 38 });
    expect(c[1]).toEqual({ x: 78, y: 52 });
    expect(c[c.length - 1]).toEqual({ x: 2, y: 52 });
  });

  it('along a vertical line: first right of its foot, then left of it, last at the top', () => {
    const c = candidatesAlongVertical(50, 0, 100, 20, 10, 3, 4);
    expect(c[0]).toEqual({ x: 53, y: 87 });
    expect(c[1]).toEqual({ x: 27, y: 87 });
    expect(c[c.length - 1]).toEqual({ x: 27, y: 3 });
  });
});

describe('text width estimate is never narrower than the printed text', () => {
  // Advance widths from the Roboto files the report is printed with (shipped inside pdfmake),
  // read with fontkit as pdfkit reads them.
  const fromPdfmake = createRequire(createRequire(import.meta.url).resolve('pdfmake/package.json'));
  const fontkit = createRequire(fromPdfmake.resolve('pdfkit'))('fontkit') as { openSync(file: string): { layout(t: string): { advanceWidth: number }; unitsPerEm: number } };
  const dir = path.join(path.dirname(fromPdfmake.resolve('./package.json')), 'fonts', 'Roboto');
  const faces = ['Roboto-Regular.ttf', 'Roboto-Medium.ttf'].map((f) => fontkit.openSync(path.join(dir, f)));
  it.each([
    'limit 8.32 µJ/m² (pulse-train)',
    'NOHD 70 km',
    'NOHD 3.19 km',
    'direct beam, 3.557 mm aperture',
    'assessed t = 10 s: 158 J/m²',
    'per pulse (pulse-train): 6.32 mJ/m²',
    'eye limit, 10600 nm',
    'NOHD 0 m: the limit is not exceeded at any distance',
    'WWWW MMMM mmmm %%%%',
    'ABCDEFGHIJKLMNOPQRSTUVWXYZ 0123456789',
  ])('%s', (text) => {
    for (const f of faces) expect(textWidthEm(text)).toBeGreaterThanOrEqual(f.layout(text).advanceWidth / f.unitsPerEm);
  });
});
