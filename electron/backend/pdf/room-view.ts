/**
 * Joins a room's results to its inputs and register entries once, so every document prints the
 * same laser name, class and beam for a result.
 */
import type { BeamInput, LaserInput } from '../../../core/model/inputs.js';
import type { BeamResult, LaserClass } from '../../../core/model/results.js';
import type { DocumentInput, InstallationInfo } from './document-input.js';
import { higherClass } from './format.js';

export interface BeamView {
  readonly result: BeamResult;
  /** null when the result names a beam the input no longer has (printed as such, never guessed). */
  readonly input: BeamInput | null;
  readonly laser: LaserInput | null;
  readonly installation: InstallationInfo | null;
  readonly classAsLabelled: LaserClass | null;
}

export interface LaserView {
  readonly laser: LaserInput;
  readonly installation: InstallationInfo | null;
  /** Laser type / medium as printed on the door. */
  readonly type: string;
  readonly classAsLabelled: LaserClass | null;
  readonly beams: readonly BeamView[];
}

export interface RoomView {
  readonly beams: readonly BeamView[];
  readonly lasers: readonly LaserView[];
  /** Highest of the labelled classes and the estimates (the safe side). */
  readonly highestClass: LaserClass;
  /** Some beam lies outside 400-700 nm (the notice then says INVISIBLE, domain 5.3). */
  readonly anyInvisible: boolean;
  readonly anyVisible: boolean;
}

export function isVisible(nm: number): boolean {
  return nm >= 400 && nm <= 700;
}

export function roomView(doc: DocumentInput): RoomView {
  const lasers = doc.content.input.lasers;
  const flat: Array<{ beam: BeamInput; laser: LaserInput; index: number }> = [];
  for (const laser of lasers) for (const [index, beam] of laser.beams.entries()) flat.push({ beam, laser, index });
  const installationOf = (laserId: string | undefined): InstallationInfo | null =>
    doc.installations.find((i) => i.id === laserId) ?? null;

  const beams: BeamView[] = doc.results.beams.map((result, i) => {
    const byId = flat.find((f) => f.beam.id !== undefined && f.beam.id === result.beamId);
    // Results are produced in input order; fall back to position only when the input has no ids.
    const byPos = byId === undefined && flat.every((f) => f.beam.id === undefined) ? flat[i] : undefined;
    const hit = byId ?? byPos;
    const laser = hit?.laser ?? lasers.find((l) => l.id === result.laserId) ?? null;
    const installation = installationOf(laser?.id);
    return {
      result,
      input: hit?.beam ?? null,
      laser,
      installation,
      classAsLabelled: installation?.classAsLabelled ?? laser?.classAsLabelled ?? null,
    };
  });

  const laserViews: LaserView[] = lasers.map((laser) => {
    const installation = installationOf(laser.id);
    const type = installation && installation.laserType.trim() !== '' ? installation.laserType : laser.name;
    return {
      laser,
      installation,
      type,
      classAsLabelled: installation?.classAsLabelled ?? laser.classAsLabelled ?? null,
      beams: beams.filter((b) => b.laser === laser),
    };
  });

  let highest: LaserClass = doc.results.highestClass;
  for (const b of beams) {
    highest = higherClass(highest, b.result.classEstimate.estimate);
    if (b.classAsLabelled !== null) highest = higherClass(highest, b.classAsLabelled);
  }
  for (const l of laserViews) if (l.classAsLabelled !== null) highest = higherClass(highest, l.classAsLabelled);

  const wavelengths = beams.map((b) => b.result.wavelength_nm);
  return {
    beams,
    lasers: laserViews,
    highestClass: highest,
    anyInvisible: wavelengths.some((w) => !isVisible(w)),
    anyVisible: wavelengths.some(isVisible),
  };
}
