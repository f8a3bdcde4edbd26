/**
 * Is a given pair of eyewear adequate for a beam? (domain notes 2.4, 2.6; pain points 7 and 12)
 *  - OD: the eyewear's OD at the beam's wavelength (the highest of the bands that contain it; a
 *    scale number LB n also means transmittance <= 10^-n, i.e. OD >= n at the marked wavelengths
 *    [WIKI-EN207; DGUV 203-042], read) must reach the required OD (rounded up). ODs at other
 *    wavelengths count for nothing [USAPHC] (read).
 *  - EN 207: where the eyewear carries a marking for the beam's wavelength and a mode the beam
 *    needs, its LB must reach the required LB. A missing marking is reported, not failed: the OD
 *    check still decides (an OD-only filter is not rated for damage resistance; noted).
 *  - EN 208: an RB marking is checked against the RB requirement of a visible beam and reported;
 *    alignment eyewear is not full protection, so it never makes eyewear adequate on its own.
 * Markings at a single wavelength (e.g. "633 nm") cover that wavelength +-1 nm, so a 632.8 nm He-Ne
 * is covered by a 633 nm marking (ours: markings carry nominal wavelengths).
 */
import { Dec } from '../numeric/decimal.js';
import type { EyewearSpec } from '../model/inputs.js';
import type { EyewearVerdict, ScaleNumberRequirement } from '../model/results.js';
import { fmt } from '../beam/format.js';

const POINT_TOLERANCE_NM = 1;

export function bandContains(from_nm: number, to_nm: number, wavelength_nm: number): boolean {
  if (from_nm === to_nm) return Math.abs(wavelength_nm - from_nm) <= POINT_TOLERANCE_NM;
  return wavelength_nm >= Math.min(from_nm, to_nm) && wavelength_nm <= Math.max(from_nm, to_nm);
}

export interface BeamNeed {
  readonly beamId: string;
  readonly wavelength_nm: number;
  /** Required OD, rounded up (decimal string); "0" = none needed. */
  readonly odRequired: string;
  readonly scaleNumbers: readonly ScaleNumberRequirement[];
}

/** Highest OD the eyewear provides at the wavelength, from its OD bands and its LB markings. */
export function providedOd(ew: EyewearSpec, wavelength_nm: number): { od: Dec; from: string } | null {
  let best: { od: Dec; from: string } | null = null;
  for (const b of ew.od ?? []) {
    if (bandContains(b.from_nm, b.to_nm, wavelength_nm) && (!best || new Dec(b.od).gt(best.od))) best = { od: new Dec(b.od), from: `OD ${b.od} at ${b.from_nm}-${b.to_nm} nm` };
  }
  for (const m of ew.en207 ?? []) {
    if (bandContains(m.from_nm, m.to_nm, wavelength_nm) && (!best || new Dec(m.scale).gt(best.od))) {
      best = { od: new Dec(m.scale), from: `LB${m.scale} marking at ${m.from_nm === m.to_nm ? m.from_nm : `${m.from_nm}-${m.to_nm}`} nm (LB n means OD >= n)` };
    }
  }
  return best;
}

function markedScale(ew: EyewearSpec, wavelength_nm: number, mode: string): number | null {
  let best: number | null = null;
  if (mode === 'RB') {
    for (const m of ew.en208 ?? []) if (bandContains(m.from_nm, m.to_nm, wavelength_nm)) best = Math.max(best ?? 0, m.scale);
    return best;
  }
  for (const m of ew.en207 ?? []) {
    if (!bandContains(m.from_nm, m.to_nm, wavelength_nm)) continue;
    if (m.modes.toUpperCase().includes(mode)) best = Math.max(best ?? 0, m.scale);
  }
  return best;
}

export function eyewearVerdict(need: BeamNeed, ew: EyewearSpec): EyewearVerdict {
  const required = new Dec(need.odRequired);
  const prov = providedOd(ew, need.wavelength_nm);
  const scaleChecks: string[] = [];
  let lbFails = 0;
  for (const s of need.scaleNumbers) {
    if (!s.applies || s.scale === 0) continue;
    const marked = markedScale(ew, need.wavelength_nm, s.mode);
    const tag = s.mode === 'RB' ? 'RB' : 'LB';
    if (marked === null) {
      // EN 208 (RB) rates alignment filters, which let part of a visible beam through on purpose;
      // full-protection eyewear without an RB marking is not short of anything, so this is a note.
      scaleChecks.push(
        s.mode === 'RB'
          ? `RB: no EN 208 alignment rating (RB${s.scale} would be needed only to use it as alignment eyewear)`
          : `${s.mode}: needs ${tag}${s.scale}; not marked for ${need.wavelength_nm} nm`,
      );
      continue;
    }
    const ok = marked >= s.scale;
    if (!ok && s.mode !== 'RB') lbFails += 1;
    scaleChecks.push(`${s.mode}: ${tag}${marked} ${ok ? '>=' : '<'} ${tag}${s.scale} ${ok ? 'ok' : s.mode === 'RB' ? 'too low for alignment' : 'TOO LOW'}`);
  }
  if (required.lte(0)) {
    return {
      beamId: need.beamId,
      eyewearId: ew.id,
      adequate: true,
      odMargin: prov ? prov.od.minus(required).toString() : null,
      scaleChecks,
      reason: 'the exposure does not exceed the limit: no filter needed for this beam',
    };
  }
  if (!prov) {
    return { beamId: need.beamId, eyewearId: ew.id, adequate: false, odMargin: null, scaleChecks, reason: `no optical density stated at ${need.wavelength_nm} nm: no protection assumed (OD ${fmt(required)} needed)` };
  }
  const margin = prov.od.minus(required);
  const odOk = margin.gte(0);
  const adequate = odOk && lbFails === 0;
  const reason = adequate
    ? `${prov.from} >= required OD ${fmt(required)} (margin ${fmt(margin)})` + (scaleChecks.some((c) => c.includes('not marked')) ? '; not rated under EN 207 for every mode the beam needs' : '')
    : !odOk
      ? `${prov.from} < required OD ${fmt(required)} (short by ${fmt(margin.neg())})`
      : `OD sufficient (${prov.from}, margin ${fmt(margin)}) but the EN 207 scale number is too low for ${lbFails} mode(s)`;
  return { beamId: need.beamId, eyewearId: ew.id, adequate, odMargin: margin.toString(), scaleChecks, reason };
}
