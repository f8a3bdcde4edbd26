/**
 * Door-notice signal word and colours by class. Sources: domain reference 5.1 — ANSI Z136.1-2014
 * with the ANSI Z535.2 format as summarised by [SUP-SIGN] (read) and [PH-SIGN] (read): WARNING for
 * Class 3B and most Class 4, DANGER only where serious injury will occur (the officer's call),
 * CAUTION for Class 2, 2M and 3R; colours red / orange / yellow / blue per [Z535-SUM] (secondary).
 * The 3R split (WARNING above the MPE) is an open doubt, from memory; we take the safe side.
 * Class 1M -> CAUTION and Class 1 -> NOTICE are ours.
 */
import { describe, expect, it } from 'vitest';
import type { LaserClass } from '../../../core/model/results.js';
import { precautionFor, signalWordFor, type SignalWord } from '../../../electron/backend/pdf/signal-word.js';

describe('signal word by class (domain reference 5.1)', () => {
  const cases: ReadonlyArray<[LaserClass, boolean, 'DANGER' | undefined, SignalWord, string]> = [
    ['4', false, undefined, 'WARNING', 'Z136.1-2014: WARNING for most Class 4 [PH-SIGN]'],
    ['4', false, 'DANGER', 'DANGER', 'DANGER only by the officer, Class 4 [SUP-SIGN]'],
    ['3B', false, undefined, 'WARNING', 'all Class 3B [SUP-SIGN]'],
    ['3R', false, undefined, 'CAUTION', 'Class 3R [Z535-SUM]'],
    ['3R', true, undefined, 'WARNING', '3R above the MPE: safe side of the open doubt (from memory)'],
    ['2M', false, undefined, 'CAUTION', 'Class 2M [Z535-SUM]'],
    ['2', false, undefined, 'CAUTION', 'Class 2 [Z535-SUM]'],
    ['1M', false, undefined, 'CAUTION', 'ours: optics can make a 1M beam hazardous'],
    ['1', false, undefined, 'NOTICE', 'ours: information only'],
  ];
  it.each(cases)('class %s (3R above limit: %s, override %s) -> %s — %s', (cls, above, override, word) => {
    expect(signalWordFor(cls, above, override).style.word).toBe(word);
  });

  const colours: ReadonlyArray<[LaserClass, string, boolean]> = [
    ['4', '#FF7900', true], // WARNING: orange panel, safety alert symbol [PH-SIGN]
    ['2', '#FFD100', true], // CAUTION: yellow [Z535-SUM]
    ['1', '#0057B8', false], // NOTICE: blue, no safety alert symbol [Z535-SUM]
  ];
  it.each(colours)('class %s panel colour %s, alert symbol %s', (cls, panel, alert) => {
    const s = signalWordFor(cls, false).style;
    expect(s.panel).toBe(panel);
    expect(s.alertSymbol).toBe(alert);
  });
});

describe('precautionary phrase by class (domain reference 5.1, conventional phrasing, from memory)', () => {
  const cases: ReadonlyArray<[LaserClass, string]> = [
    ['4', 'Avoid eye or skin exposure to direct or scattered radiation'],
    ['3B', 'Avoid exposure to the beam'],
    ['3R', 'Avoid direct eye exposure'],
    ['2', 'Do not stare into the beam'],
  ];
  it.each(cases)('class %s: %s', (cls, phrase) => {
    expect(precautionFor(cls)).toBe(phrase);
  });
});
