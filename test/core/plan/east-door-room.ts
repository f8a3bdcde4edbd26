/**
 * The invented room the plan cases share: an 8 m × 5 m room with door D1 in the east wall at
 * y 1–2 m, and beam A (633 nm, 5 mW CW, 1 mm at 1/e, 1 mrad, a diffuse surface of reflectance 0.1).
 * Each case file adds its own path, screens and expected values (derived in that file).
 */
import type { BeamInput, RoomPlan } from '../../../core/index.js';

export const beamA: BeamInput = { id: 'a', label: 'beam A', wavelength_nm: 633, emission: { kind: 'cw', power_W: 0.005 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }, viewing: { diffuse: { reflectance: 0.1 } } };

export const p = (x_m: number, y_m: number) => ({ x_m, y_m });

/** An 8 m × 5 m room, door D1 in the east wall at y 1–2 m, nothing else placed. */
export const eastDoorRoom: RoomPlan = {
  outline: [p(0, 0), p(8, 0), p(8, 5), p(0, 5)],
  doors: [{ id: 'D1', label: 'D1', a: p(8, 1), b: p(8, 2) }],
  windows: [],
  walls: [],
  barriers: [],
  workPositions: [],
  enclosures: [],
  paths: [],
  reflectionPoints: [],
};
