/**
 * Non-beam hazards an assessment should list, with what to note (domain reference section 7, each
 * line's sources there: [REED], [UCB], [SL-16], [ISU-34], [CTO], [WIS], [UCHI], [EU-AOR]).
 */
import type { NonBeamHazard, NonBeamHazardKind } from '../../electron/api/contracts/records.js';

export interface HazardInfo {
  readonly kind: NonBeamHazardKind;
  readonly name: string;
  readonly prompt: string;
}

export const NON_BEAM_HAZARDS: readonly HazardInfo[] = [
  { kind: 'electrical', name: 'Electrical', prompt: 'High-voltage supplies, capacitor banks, water cooling; lock-out/tag-out during service.' },
  { kind: 'x-rays', name: 'X-rays', prompt: 'Supplies above about 15 kV may emit X-rays.' },
  { kind: 'collateral-optical', name: 'Collateral UV, visible or RF radiation', prompt: 'Pump lamps and discharge tubes; UV and blue light from plasma at the target.' },
  { kind: 'air-contaminants', name: 'Laser-generated air contaminants (plume)', prompt: 'Class 4 beams on plastics, metals, tissue; extraction; the plume area can exceed the NHZ.' },
  { kind: 'biological', name: 'Biological', prompt: 'Viable material in the plume from biological or medical targets.' },
  { kind: 'dyes-solvents', name: 'Dyes and solvents', prompt: 'Toxic or carcinogenic dyes, flammable solvents; safety data sheets at hand.' },
  { kind: 'gases', name: 'Compressed and laser gases', prompt: 'Toxic or corrosive gases in gas and excimer lasers; cylinders secured.' },
  { kind: 'cryogens', name: 'Cryogens', prompt: 'Liquid nitrogen or helium: cold burns, asphyxiation, pressure.' },
  { kind: 'fire-explosion', name: 'Fire and explosion', prompt: 'Class 4 beams ignite materials; treat output above about 0.5 W as an ignition source.' },
  { kind: 'photosensitisation', name: 'Photosensitisation', prompt: 'Chemicals or medication that raise sensitivity to UV and visible light.' },
  { kind: 'glare', name: 'Temporary blinding and glare', prompt: 'Indirect effects on tasks, drivers or pilots (outdoors).' },
  { kind: 'other', name: 'Other physical hazards', prompt: 'Noise, trailing cables, ergonomics at optical tables, heavy equipment (common practice).' },
];

/** The hazards list of a draft, one entry per kind (kinds missing from a stored record are added as not present). */
export function completeHazards(list: readonly NonBeamHazard[]): NonBeamHazard[] {
  return NON_BEAM_HAZARDS.map((h) => {
    const found = list.find((x) => x.kind === h.kind);
    return found ? { ...found, controls: [...found.controls] } : { kind: h.kind, present: false, note: '', controls: [] };
  });
}
