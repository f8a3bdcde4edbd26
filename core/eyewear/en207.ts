/**
 * EN 207 scale numbers (LB1-LB10) for laser protective filters.
 *
 * Table (EN 207:2017 as summarised by the Wikipedia article 'EN 207' [WIKI-EN207], secondary;
 * identical to the remembered EN 207:2009 table; domain notes 2.2): scale number N protects up to
 *   band          D (W/m²)      I, R (J/m²)     M
 *   180-315 nm    10^(N-3)      3x10^(N+1)      3x10^(N+10) W/m²
 *   >315-1400 nm  10^(N+1)      5x10^(N-3)      1.5x10^(N-4) J/m²
 *   >1400 nm-1mm  10^(N+3)      10^(N+2)        10^(N+11) W/m²
 * so the minimum scale number for a density X is N = ceil(log10(X/X1)) + 1 with X1 the LB1 entry;
 * a density exactly on a row boundary needs that row (domain notes 2.2, derived).
 *
 * Modes (EN 207:2017 [WIKI-EN207], secondary; DGUV 203-042): D t > 0.25 s; I 1 us < t <= 0.25 s;
 * R 1 ns < t <= 1 us; M t < 1 ns. A pulse of exactly 1 ns is rated as M, the stricter column (ours).
 * OPEN DOUBTS (domain notes section 10 item 4), marked in the trace:
 *  - the 2009 mode boundaries (D >= 5e-4 s) - FROM MEMORY;
 *  - repetitive pulses: per-pulse density times N^(1/4), N = pulses in the test time (5 s in
 *    EN 207:2017, 10 s in 2009) - FROM MEMORY; conservative mode uses 10 s (more pulses, higher N);
 *  - beam-size rule: the table is stated for the beam at the filter; the density is taken at the
 *    worst position over the beam's d63 (1/e) diameter but over no less than 1 mm - FROM MEMORY,
 *    uncertain (a 7 mm average would give lower numbers; this is the stricter reading);
 *  - the UV M entry differs between revisions (3x10^(N+10) vs 10^(N+10) W/m²); conservative mode
 *    uses the lower (stricter) one.
 */
import { Dec, PI } from '../numeric/decimal.js';
import type { En207Mode, ScaleNumberRequirement } from '../model/results.js';
import { displayLog10, fmt, fourthRoot, rec, tenTo } from '../beam/format.js';
import type { BeamModel } from '../beam/beam-model.js';
import type { Emission } from '../model/inputs.js';

export type En207Band = '180-315' | '315-1400' | '1400-1e6';

export function en207Band(wavelength_nm: number): En207Band {
  if (wavelength_nm <= 315) return '180-315';
  if (wavelength_nm <= 1400) return '315-1400';
  return '1400-1e6';
}

interface Column {
  /** LB1 entry. */
  readonly X1: string;
  readonly unit: 'W/m²' | 'J/m²';
  /** Stricter LB1 entry used in conservative mode, where the revisions differ. */
  readonly conservativeX1?: string;
}

/** LB1 entries of each band and mode (the rest follow by decades). Source: see file header. */
export const EN207_LB1: Readonly<Record<En207Band, Readonly<Record<'D' | 'IR' | 'M', Column>>>> = {
  '180-315': { D: { X1: '0.01', unit: 'W/m²' }, IR: { X1: '3e2', unit: 'J/m²' }, M: { X1: '3e11', unit: 'W/m²', conservativeX1: '1e11' } },
  '315-1400': { D: { X1: '1e2', unit: 'W/m²' }, IR: { X1: '5e-2', unit: 'J/m²' }, M: { X1: '1.5e-3', unit: 'J/m²' } },
  '1400-1e6': { D: { X1: '1e4', unit: 'W/m²' }, IR: { X1: '1e3', unit: 'J/m²' }, M: { X1: '1e12', unit: 'W/m²' } },
};

// Stryker disable next-line BooleanLiteral: every caller passes `conservative`; the default is never used (test/mutation/EQUIVALENT.md).
export function en207Column(band: En207Band, mode: En207Mode, conservative = true): { X1: Dec; unit: 'W/m²' | 'J/m²' } {
  const col = EN207_LB1[band][mode === 'I' || mode === 'R' ? 'IR' : mode];
  const X1 = new Dec(conservative && col.conservativeX1 ? col.conservativeX1 : col.X1);
  return { X1, unit: col.unit };
}

/** The most a filter of scale number N protects against (table entry). */
// Stryker disable next-line BooleanLiteral: every caller passes `conservative`; the default is never used (test/mutation/EQUIVALENT.md).
export function en207Limit(band: En207Band, mode: En207Mode, N: number, conservative = true): Dec {
  return en207Column(band, mode, conservative).X1.mul(tenTo(N - 1));
}

/** Mode of a pulse of duration t (s); CW is D. */
export function en207Mode(pulseDuration_s: number | null): En207Mode {
  if (pulseDuration_s === null) return 'D';
  if (pulseDuration_s > 0.25) return 'D';
  if (pulseDuration_s > 1e-6) return 'I';
  if (pulseDuration_s > 1e-9) return 'R';
  return 'M';
}

/**
 * Minimum scale number for density X against LB1 entry X1: the smallest integer N with
 * X <= X1*10^(N-1). Also the unrounded value log10(X/X1) + 1.
 */
export function scaleFor(X: Dec, X1: Dec): { n: number; unrounded: Dec } {
  // Stryker disable next-line LogicalOperator: the density is never zero or infinite here (inputs validated positive, the area at least pi/4 mm², EN 208 answers RB0 first); see test/mutation/EQUIVALENT.md.
  if (!X.gt(0) || !X.isFinite()) return { n: X.gt(0) ? 99 : 0, unrounded: X.gt(0) ? new Dec(99) : new Dec(0) };
  const ratio = X.div(X1);
  // Display value to 12 digits; the integer is then settled by exact decimal comparisons.
  const unrounded = displayLog10(ratio).plus(1);
  let n = Math.ceil(unrounded.toNumber());
  // exact decade boundaries: the row whose limit equals X is adequate
  // Stryker disable next-line ConditionalExpression,ArithmeticOperator,AssignmentOperator: the first estimate never overshoots (displayLog10 rounds down), so this loop never runs; see test/mutation/EQUIVALENT.md.
  while (X.lte(X1.mul(tenTo(n - 2)))) n -= 1;
  while (X.gt(X1.mul(tenTo(n - 1)))) n += 1;
  return { n, unrounded };
}

export interface En207Input {
  readonly wavelength_nm: number;
  readonly model: BeamModel;
  /** Position of the eyewear (worst reachable), m. */
  readonly position_m: number;
  readonly emission: Emission;
  /** False when the exposure never exceeds the limit: no filter needed (scale 0). */
  readonly needed: boolean;
  readonly conservative: boolean;
}

const ONE_MM = new Dec('0.001');

/** Density divisor: pi/4 * max(dx, 1 mm) * max(dy, 1 mm) at the position. */
function areaAt(m: BeamModel, r: Dec): Dec {
  const dx = Dec.max(m.a.plus(m.phi.mul(r)), ONE_MM);
  const dy = Dec.max(m.ay.plus(m.phiy.mul(r)), ONE_MM);
  return PI.mul(dx).mul(dy).div(4);
}

/** Scale numbers needed per EN 207 mode (D, I, R, M); only the beam's own modes apply. */
export function en207Requirements(x: En207Input): ScaleNumberRequirement[] {
  const band = en207Band(x.wavelength_nm);
  const area = areaAt(x.model, new Dec(x.position_m));
  const out: ScaleNumberRequirement[] = [];
  const e = x.emission;
  const densities = new Map<En207Mode, { X: Dec; unit: string; why: string }>();
  if (e.kind === 'cw') {
    densities.set('D', { X: new Dec(e.power_W).div(area), unit: 'W/m²', why: 'CW power density' });
  } else {
    const Q = new Dec(e.pulseEnergy_J);
    const tp = new Dec(e.pulseDuration_s);
    const mode = en207Mode(e.pulseDuration_s);
    const window = x.conservative ? 10 : 5;
    const f = e.repetitionRate_Hz !== undefined ? new Dec(e.repetitionRate_Hz) : null;
    const N = f ? Dec.max(new Dec(1), f.mul(window).floor()) : new Dec(1);
    const nFactor = fourthRoot(N);
    const H = Q.div(area);
    const col = en207Column(band, mode, x.conservative);
    if (mode === 'D') {
      densities.set('D', { X: H.div(tp), unit: 'W/m²', why: `pulse longer than 0.25 s: power density of the pulse, Q/(t*area)` });
    } else {
      const peak = col.unit === 'W/m²';
      const X = (peak ? H.div(tp) : H).mul(nFactor);
      densities.set(mode, {
        X,
        unit: col.unit,
        why:
          (peak ? 'peak power density of a pulse, Q/(t*area)' : 'energy density per pulse, Q/area') +
          (f ? ` times N^(1/4) = ${fmt(nFactor)} (N = ${N.toString()} pulses in ${window} s; rule from memory, ${x.conservative ? '10 s window of EN 207:2009, the stricter' : '5 s window of EN 207:2017'})` : ''),
      });
    }
    if (f && mode !== 'D') {
      densities.set('D', { X: Q.mul(f).div(area), unit: 'W/m²', why: 'mean power density of the train (the D requirement must also be met; from memory)' });
    }
  }
  for (const mode of ['D', 'I', 'R', 'M'] as const) {
    const d = densities.get(mode);
    if (!d) {
      out.push({ mode, scale: 0, density: '0', densityUnit: en207Column(band, mode, x.conservative).unit, applies: false, note: `mode ${mode} does not apply to this emission` });
      continue;
    }
    const { X1 } = en207Column(band, mode, x.conservative);
    const { n, unrounded } = scaleFor(d.X, X1);
    let scale = Math.max(1, n);
    let note = `${d.why}, over max(d63, 1 mm) at ${x.position_m} m (beam-size rule from memory, stricter reading); band ${band} nm, LB1 = ${fmt(X1)} ${d.unit}; N = ceil(log10(X/X1)) + 1, unrounded ${fmt(unrounded)}`;
    if (!x.needed) {
      scale = 0;
      note = `exposure below the limit: no filter needed (the table would give LB${Math.max(1, n)}); ${note}`;
    } else if (n > 10) {
      note = `above LB10: no EN 207 filter is adequate for this beam as it stands; ${note}`;
    }
    out.push({ mode, scale, density: rec(d.X), densityUnit: d.unit, applies: true, note });
  }
  return out;
}
