/**
 * Accessible emission limits (AEL) of IEC 60825-1:2014, as far as the class ESTIMATE needs them
 * (domain notes 3.2). Most values are FROM MEMORY (domain notes section 10 item 6): only Class 1
 * visible CW (0.39 mW), Class 2 (1 mW), 3R (5x) and 3B CW (0.5 W) were confirmed in secondary
 * sources. Each value carries its confidence into the trace.
 *
 * Class 1 and Class 2 (pulsed) AELs are DERIVED from the exposure limit: for small sources the
 * Class 1 AEL (W or J) equals the MPE (W/m² or J/m², all pulse rules) at the class's time base
 * times the area of the measurement aperture; checked against 10 W/m² x A(7 mm) = 0.385 mW (Class
 * 1 visible CW, quoted 0.39 mW [HIKARI], secondary) and 1000 W/m² x A(3.5 mm) = 9.6 mW (Class 1 at
 * 10.6 um, quoted 10 mW [SUP-EN207], read).
 */
import { Dec } from '../numeric/decimal.js';
import { evalFactor } from '../limits/factors.js';
import { ruleSetTable } from '../limits/rule-sets.js';

export interface FixedAel {
  readonly value: Dec;
  readonly unit: 'W' | 'J';
  readonly text: string;
  readonly confidence: string;
}

/** Class 2 AEL for visible CW (t >= 0.25 s): 1 mW (lasersafe.de; Seibersdorf Laboratories), published. */
export const CLASS2_CW_W = new Dec('0.001');
/** Class 3R visible CW: 5 mW (5 x Class 2; lasersafe.de; Seibersdorf Laboratories), published. */
export const CLASS3R_VISIBLE_CW_W = new Dec('0.005');

/** Time base for Class 1 (IEC 60825-1:2014 section 4.3, FROM MEMORY, domain notes 3.2). */
export function classTimeBase(wavelength_nm: number): { T: number; why: string } {
  if (wavelength_nm < 400) return { T: 30000, why: 'time base 30 000 s below 400 nm (IEC 60825-1:2014 4.3, from memory)' };
  return { T: 100, why: 'time base 100 s above 400 nm (IEC 60825-1:2014 4.3, from memory)' };
}

/**
 * The limit tables whose correction factors the AELs use: IEC 60825-1:2014 builds its AELs on the
 * ICNIRP 2013 exposure limits, whatever rule set the room uses for the limits themselves.
 */
const AEL_FACTOR_TABLE = ruleSetTable('icnirp2013');

/**
 * C4 of IEC 60825-1:2014 is the limit tables' C_A (10^(0.002(lambda-700)) in 700-1050 nm, 5 in
 * 1050-1400 nm, 1 below 700 nm): read from the table's factor, never computed here a second time.
 */
function c4(wavelength_nm: number): Dec {
  const lambda = new Dec(wavelength_nm);
  const ca = evalFactor(AEL_FACTOR_TABLE, 'CA', { lambda, t: new Dec(1), alpha: new Dec(0) }, undefined);
  if (!ca) throw new Error(`internal: no C4 (C_A) at ${wavelength_nm} nm`);
  return ca.value;
}

/** Class 3B AEL for CW (and for the mean power of a train). */
export function class3bCw(wavelength_nm: number): FixedAel {
  if (wavelength_nm < 302.5) {
    return { value: new Dec('1.5e-3'), unit: 'W', text: '1.5 mW (below 302.5 nm)', confidence: 'from memory, uncertain (value not recalled reliably; domain notes 3.2)' };
  }
  return { value: new Dec('0.5'), unit: 'W', text: '0.5 W', confidence: 'secondary (APINEX; lasersafe.de; Seibersdorf Laboratories)' };
}

/**
 * Class 3B AEL per pulse, for pulses shorter than 0.25 s (FROM MEMORY, domain notes 3.2):
 * 400-700 nm 0.03 J; 700-1050 nm 0.03*C4 J; 1050-1400 nm 0.15 J; 302.5-400 nm and 1400 nm-1 mm
 * 0.125 J. Below 302.5 nm no value is recalled: 5 x the Class 1 AEL is used as a strict
 * placeholder (ours). Pulses of 0.25 s or more: the CW value times the pulse duration (ours).
 */
export function class3bPulse(wavelength_nm: number, pulseDuration_s: number, class1PerPulse_J: Dec): FixedAel {
  const conf = 'from memory (domain notes section 10 item 6)';
  if (pulseDuration_s >= 0.25) {
    const cw = class3bCw(wavelength_nm);
    return { value: cw.value.mul(pulseDuration_s), unit: 'J', text: `${cw.text} x pulse duration`, confidence: `${cw.confidence}; applied over the pulse (ours)` };
  }
  if (wavelength_nm < 302.5) return { value: class1PerPulse_J.mul(5), unit: 'J', text: '5 x Class 1 per pulse (no 3B pulse value recalled below 302.5 nm; strict placeholder)', confidence: 'ours' };
  if (wavelength_nm < 400 || wavelength_nm >= 1400) return { value: new Dec('0.125'), unit: 'J', text: '0.125 J per pulse', confidence: conf };
  if (wavelength_nm < 700) return { value: new Dec('0.03'), unit: 'J', text: '0.03 J per pulse', confidence: conf };
  if (wavelength_nm < 1050) {
    const v = c4(wavelength_nm).mul('0.03');
    return { value: v, unit: 'J', text: `0.03*C4 = ${v.toSignificantDigits(4).toString()} J per pulse`, confidence: conf };
  }
  return { value: new Dec('0.15'), unit: 'J', text: '0.15 J per pulse', confidence: conf };
}

/** Bands where the M classes (telescope condition) and 3R exist (IEC 60825-1:2014, domain notes 3.1). */
export function hasMClasses(wavelength_nm: number): boolean {
  return wavelength_nm >= 302.5 && wavelength_nm <= 4000;
}
export function has3R(wavelength_nm: number): boolean {
  return wavelength_nm >= 302.5;
}
export function isClass2Band(wavelength_nm: number): boolean {
  return wavelength_nm >= 400 && wavelength_nm <= 700;
}
