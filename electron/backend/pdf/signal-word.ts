/**
 * Signal word and colours of the door notice by laser class, after the ANSI Z535.2 sign format
 * adopted by ANSI Z136.1-2014 (domain reference 5.1, [SUP-SIGN], [PH-SIGN], [Z535-SUM]):
 * - DANGER (red): Class 4 only, where death or serious injury WILL occur without controls. The
 *   officer decides that; it is never chosen automatically.
 * - WARNING (orange): Class 3B and most Class 4.
 * - CAUTION (yellow): Class 2, 2M and 3R. Open doubt (domain 5.1, from memory): Z136.1-2014 may
 *   split 3R into CAUTION (irradiance <= MPE) and WARNING (above MPE); we take the safe side and
 *   print WARNING for a Class 3R beam with a non-zero NOHD.
 * - NOTICE (blue, no safety alert symbol): a temporary laser controlled area, or a room with only
 *   Class 1 products. Class 1M gets CAUTION (ours: its beam can injure a viewer using optics).
 * The colours are the Z535 hues as commonly reproduced in sRGB (common practice, not measured).
 */
import type { LaserClass } from '../../../core/model/results.js';

export type SignalWord = 'DANGER' | 'WARNING' | 'CAUTION' | 'NOTICE';

export interface SignalStyle {
  readonly word: SignalWord;
  readonly panel: string;
  readonly text: string;
  /** The safety alert symbol (triangle with exclamation mark) precedes every word but NOTICE. */
  readonly alertSymbol: boolean;
}

export const SIGNAL_STYLE: Readonly<Record<SignalWord, SignalStyle>> = {
  DANGER: { word: 'DANGER', panel: '#C8102E', text: '#FFFFFF', alertSymbol: true },
  WARNING: { word: 'WARNING', panel: '#FF7900', text: '#000000', alertSymbol: true },
  CAUTION: { word: 'CAUTION', panel: '#FFD100', text: '#000000', alertSymbol: true },
  NOTICE: { word: 'NOTICE', panel: '#0057B8', text: '#FFFFFF', alertSymbol: false },
};

export interface SignalChoice {
  readonly style: SignalStyle;
  readonly why: string;
}

export function signalWordFor(highestClass: LaserClass, class3RAboveLimit: boolean, override?: 'DANGER'): SignalChoice {
  if (override === 'DANGER') {
    return { style: SIGNAL_STYLE.DANGER, why: 'DANGER chosen by the officer (Class 4 with serious injury certain without controls)' };
  }
  switch (highestClass) {
    case '4':
    case '3B':
      return { style: SIGNAL_STYLE.WARNING, why: `Class ${highestClass}: WARNING (ANSI Z136.1-2014 with Z535.2 format)` };
    case '3R':
      return class3RAboveLimit
        ? { style: SIGNAL_STYLE.WARNING, why: 'Class 3R with exposure above the limit: WARNING (safe side of an open doubt)' }
        : { style: SIGNAL_STYLE.CAUTION, why: 'Class 3R: CAUTION' };
    case '2M':
    case '2':
    case '1M':
      return { style: SIGNAL_STYLE.CAUTION, why: `Class ${highestClass}: CAUTION` };
    case '1':
      return { style: SIGNAL_STYLE.NOTICE, why: 'Class 1 only: NOTICE' };
  }
}

/**
 * The conventional precautionary phrase by class (domain reference 5.1, from memory; also used on
 * IEC 60825-1 labels).
 */
export function precautionFor(c: LaserClass): string {
  switch (c) {
    case '4':
      return 'Avoid eye or skin exposure to direct or scattered radiation';
    case '3B':
      return 'Avoid exposure to the beam';
    case '3R':
      return 'Avoid direct eye exposure';
    case '2M':
      return 'Do not stare into the beam or view it directly with optical instruments';
    case '2':
      return 'Do not stare into the beam';
    case '1M':
      return 'Do not view the beam with optical instruments';
    case '1':
      return 'Class 1 laser products';
  }
}
