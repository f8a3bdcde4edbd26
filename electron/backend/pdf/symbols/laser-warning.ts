/**
 * The laser warning symbol (ISO 7010 W004 "Warning; laser beam", domain reference 5.2) drawn as our
 * own vector art: a yellow equilateral triangle with rounded corners and a black border, and a black
 * pictogram of a radiating source with a beam pointing to the right. Colours per ISO 3864-1
 * (safety yellow on black), as commonly reproduced in sRGB.
 */
const YELLOW = '#F9C300';
const BLACK = '#111111';

function polar(cx: number, cy: number, r: number, deg: number): [number, number] {
  const a = (deg * Math.PI) / 180;
  return [cx + r * Math.cos(a), cy - r * Math.sin(a)];
}

function f(n: number): string {
  return n.toFixed(2);
}

/** SVG text of the symbol; `size` is the printed width in points (height is 0.88 of it). */
export function laserWarningSymbolSvg(size: number): string {
  // Triangle in a 100 x 88 box: apex at top, base at the bottom.
  const outer = 'M50 3 L97 85 L3 85 Z';
  const inner = 'M50 14 L87.6 79.5 L12.4 79.5 Z'; // outer scaled by 0.8 about its centroid (50, 57.7)
  const cx = 41;
  const cy = 60;
  const rays: string[] = [];
  for (let i = 0; i < 16; i++) {
    const deg = i * 22.5;
    if (deg === 0) continue; // the beam takes this direction
    const long = i % 2 === 0;
    const [x1, y1] = polar(cx, cy, 6, deg);
    const [x2, y2] = polar(cx, cy, long ? 15 : 11, deg);
    rays.push(`<line x1="${f(x1)}" y1="${f(y1)}" x2="${f(x2)}" y2="${f(y2)}" stroke="${BLACK}" stroke-width="${long ? 2.2 : 1.6}" stroke-linecap="round"/>`);
  }
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${f(size * 0.88)}" viewBox="0 0 100 88">`,
    `<path d="${outer}" fill="${BLACK}" stroke="${BLACK}" stroke-width="6" stroke-linejoin="round"/>`,
    `<path d="${inner}" fill="${YELLOW}" stroke="${YELLOW}" stroke-width="4" stroke-linejoin="round"/>`,
    `<circle cx="${cx}" cy="${cy}" r="4" fill="${BLACK}"/>`,
    ...rays,
    `<line x1="${cx}" y1="${cy}" x2="78" y2="${cy}" stroke="${BLACK}" stroke-width="2.6" stroke-linecap="round"/>`,
    '</svg>',
  ].join('');
}

/** The ANSI Z535 safety alert symbol: a triangle with an exclamation mark, in the panel's colours. */
export function safetyAlertSymbolSvg(size: number, triangle: string, mark: string): string {
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${f(size * 0.88)}" viewBox="0 0 100 88">`,
    `<path d="M50 5 L95 83 L5 83 Z" fill="${triangle}" stroke="${triangle}" stroke-width="8" stroke-linejoin="round"/>`,
    `<path d="M45 30 L55 30 L53 60 L47 60 Z" fill="${mark}"/>`,
    `<circle cx="50" cy="71" r="5.5" fill="${mark}"/>`,
    '</svg>',
  ].join('');
}
