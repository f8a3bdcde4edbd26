/**
 * A laser edited on the Register reaches the room's assessments: each assessment that evaluates it
 * is saved with the new values (a signed one gets a new draft revision through the store's own
 * rule; the signed revision stays unchanged), keeping each beam's exposure duration, which is an
 * assumption of the assessment rather than a property of the laser.
 */
import { quantityText, type BeamInput, type LaserInput } from '../../core/index.js';
import { invoke } from './api.js';

export function mergeLaser(used: LaserInput, registered: LaserInput): LaserInput {
  return {
    ...registered,
    beams: registered.beams.map((b) => {
      const old = used.beams.find((x) => x.id !== undefined && x.id === b.id);
      return old?.exposureDuration_s !== undefined ? { ...b, exposureDuration_s: old.exposureDuration_s } : b;
    }),
  };
}

/** Returns how many assessments were saved with the new values. */
export async function bringLaserIntoAssessments(roomId: string, laser: LaserInput): Promise<number> {
  let saved = 0;
  for (const s of await invoke('assessments-list', { roomId })) {
    const a = await invoke('assessment-get', { id: s.id });
    const content = a.current.content;
    const i = content.input.lasers.findIndex((l) => l.id === laser.id);
    const used = content.input.lasers[i];
    if (!used) continue;
    const merged = mergeLaser(used, laser);
    if (JSON.stringify(merged) === JSON.stringify(used)) continue;
    const lasers = content.input.lasers.map((l, k) => (k === i ? merged : l));
    await invoke('assessment-save', { id: a.id, content: { ...content, input: { ...content.input, lasers } }, expected: { revisionId: a.current.id, version: a.version } });
    saved++;
  }
  return saved;
}

function beamLine(b: BeamInput): string {
  const e = b.emission;
  const out =
    e.kind === 'cw'
      ? `CW ${quantityText(e.power_W, 'W')}`
      : `${quantityText(e.pulseEnergy_J, 'J')} per pulse, ${quantityText(e.pulseDuration_s, 's')}${e.repetitionRate_Hz !== undefined ? `, ${quantityText(e.repetitionRate_Hz, 'Hz')}` : ', single pulse'}`;
  return `${quantityText(b.wavelength_nm, 'nm')} ${out}, ${quantityText(b.beam.diameter_m, 'm')}, ${quantityText(b.beam.divergence_rad, 'rad')}`;
}

/** "class 3R · 632.8 nm CW 2 mW, 800 µm, 1.2 mrad" for a laser's history line. */
export function laserValuesLine(l: LaserInput): string {
  return [l.classAsLabelled ? `class ${l.classAsLabelled}` : 'class not known', ...l.beams.map(beamLine)].join(' · ');
}
