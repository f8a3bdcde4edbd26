/**
 * Width of a plot label as the screen will draw it, for the label placer
 * (core/plot/label-placement.ts). The screen font differs between machines (system UI face), so
 * the text is measured with a canvas in the page's own font; where no canvas is available (tests
 * without a layout engine) the placer's generous estimate is used, widened by a fifth for wide
 * system faces. Bold (600) as the labels are drawn.
 */
import { textBoxSize } from '../../core/plot/label-placement.js';

let ctx: CanvasRenderingContext2D | null | undefined;

function context(): CanvasRenderingContext2D | null {
  if (ctx !== undefined) return ctx;
  try {
    ctx = typeof document === 'undefined' ? null : document.createElement('canvas').getContext('2d');
  } catch {
    ctx = null;
  }
  return ctx;
}

export function labelWidth(text: string, px: number): number {
  const estimate = textBoxSize(text, px).width * 1.2;
  const c = context();
  if (c === null) return estimate;
  const family = getComputedStyle(document.body).fontFamily || 'sans-serif';
  c.font = `600 ${px}px ${family}`;
  const measured = c.measureText(text).width;
  // A canvas that cannot measure (0 or not a number) falls back to the estimate; a little margin otherwise.
  return Number.isFinite(measured) && measured > 0 ? measured + 2 : estimate;
}
