/**
 * Eyewear markings printed as they stand on the frame (core/eyewear/marking-text.ts), the one form
 * the eyewear sheet, the report and the door notice use.
 * Source: EN 207:2017 clause 7 (marking: test conditions, wavelength or band in nm, scale number LB,
 * e.g. "D 1064 LB7", "IR 315–532 LB6"); EN 208:2009 clause 7 (alignment eyewear: wavelength and
 * scale number RB; power and energy also on the frame, not kept on the shelf record). The " + "
 * between markings of one frame is common practice for listing several marking lines on one line.
 */
import { describe, expect, it } from 'vitest';
import { en207MarkingText, en208MarkingText, frameMarkingText } from '../../core/eyewear/marking-text.js';

describe('EN 207 marking as on the frame', () => {
  const cases = [
    { m: { from_nm: 1064, to_nm: 1064, modes: 'D', scale: 7 }, text: 'D 1064 LB7', why: 'one wavelength (EN 207:2017 cl. 7)' },
    { m: { from_nm: 315, to_nm: 532, modes: 'IR', scale: 6 }, text: 'IR 315–532 LB6', why: 'a band with an en dash (EN 207:2017 cl. 7 example)' },
    { m: { from_nm: 10600, to_nm: 10600, modes: 'DIR', scale: 5 }, text: 'DIR 10600 LB5', why: 'the far infrared stays in nm on the frame' },
  ] as const;
  for (const c of cases) it(c.why, () => expect(en207MarkingText(c.m)).toBe(c.text));
});

describe('EN 208 marking as on the frame', () => {
  const cases = [
    { m: { from_nm: 633, to_nm: 633, scale: 2 }, text: '633 RB2', why: 'one wavelength (EN 208:2009 cl. 7)' },
    { m: { from_nm: 520, to_nm: 532, scale: 3 }, text: '520–532 RB3', why: 'a band' },
  ] as const;
  for (const c of cases) it(c.why, () => expect(en208MarkingText(c.m)).toBe(c.text));
});

describe('every marking of one frame, EN 207 first', () => {
  const cases = [
    { e: { en207: [{ from_nm: 740, to_nm: 1100, modes: 'D', scale: 5 }, { from_nm: 740, to_nm: 1100, modes: 'IR', scale: 7 }], en208: [{ from_nm: 633, to_nm: 633, scale: 2 }] }, text: 'D 740–1100 LB5 + IR 740–1100 LB7 + 633 RB2' },
    { e: { en208: [{ from_nm: 633, to_nm: 633, scale: 2 }] }, text: '633 RB2' },
    { e: {}, text: '' },
  ] as const;
  for (const c of cases) it(c.text === '' ? 'no marking recorded: nothing printed' : c.text, () => expect(frameMarkingText(c.e)).toBe(c.text));
});
