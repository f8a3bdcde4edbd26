/**
 * Benchmarks of the calculation core, part 2 (hazard distances, eyewear, class, room):
 *  - one evaluateBeam with every viewing condition (diffuse, specular, lens, fibre, aided,
 *    attenuation) and tolerances;
 *  - a 20-laser room (22 beams, 5 eyewear) - target below 16 ms (one frame at 60 Hz), so the UI
 *    can recompute on every keystroke.
 * Cases: "keystroke" - one laser's power changes per run, as when the officer types (memoised
 * limits and beam evaluations: only that beam is recomputed, the room reassembled);
 * "every beam changed" - all powers change, limits memoised; "cold" - every memo emptied first
 * (the first evaluation of a new room). Medians over repeated runs. Speed targets live here,
 * never in timed tests.
 * Run with every suite: npm run bench (test/bench/run.ts finds runPart2Bench); alone:
 * npx tsx test/bench/part2.bench.ts
 */
import { clearCoreCaches, evaluateBeam, evaluateRoom, type BeamInput, type EyewearSpec, type LaserInput, type RoomInput } from '../../core/index.js';
import { timeMedian, type BenchEntry } from './registry.js';

/** `time(runs, prepare, f)`: median wall time of f, prepare untimed (registry.timeMedian). */
function time(runs: number, prepare: (i: number) => void, f: (i: number) => void): number {
  return timeMedian(runs, f, prepare);
}

export function allReflectionsBeam(power_W: number): BeamInput {
  return {
    wavelength_nm: 1064,
    emission: { kind: 'cw', power_W },
    beam: { diameter_m: 0.003, divergence_rad: 0.001, definition: '1/e2' },
    viewing: {
      diffuse: { reflectance: 0.8, viewingAngle_rad: 0.3, viewerDistance_m: 0.5 },
      specular: { reflectance: 0.04, pathToSurface_m: 1 },
      lens: { focalLength_m: 0.1 },
      fiber: { kind: 'multimode', numericalAperture: 0.22 },
      aided: { magnification: 7, objectiveDiameter_m: 0.05, transmission: 0.9 },
      attenuation_per_m: 1e-5,
    },
    tolerances: { power: 0.1, divergence: 0.2 },
  };
}

const EYEWEAR: EyewearSpec[] = [
  { id: 'A', label: 'A', od: [{ from_nm: 740, to_nm: 1100, od: 7 }], en207: [{ from_nm: 740, to_nm: 1100, modes: 'DIR', scale: 6 }] },
  { id: 'B', label: 'B', od: [{ from_nm: 190, to_nm: 540, od: 6 }] },
  { id: 'C', label: 'C', od: [{ from_nm: 9000, to_nm: 11000, od: 7 }] },
  { id: 'D', label: 'D', od: [{ from_nm: 620, to_nm: 680, od: 5 }], en208: [{ from_nm: 633, to_nm: 633, scale: 2 }] },
  { id: 'E', label: 'E', od: [{ from_nm: 1300, to_nm: 1700, od: 4 }] },
];

/** A 20-laser room (22 beams): CW and pulsed, visible, UV and IR, some with reflections. `edited` scales one laser only. */
export function twentyLaserRoom(scale = 1, edited?: number): RoomInput {
  const lasers: LaserInput[] = [];
  const cw = (nm: number, P: number): BeamInput => ({ wavelength_nm: nm, emission: { kind: 'cw', power_W: P * scale }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e2' } });
  const pulsed = (nm: number, Q: number, tp: number, f?: number): BeamInput => ({
    wavelength_nm: nm,
    emission: f === undefined ? { kind: 'pulsed', pulseEnergy_J: Q * scale, pulseDuration_s: tp } : { kind: 'pulsed', pulseEnergy_J: Q * scale, pulseDuration_s: tp, repetitionRate_Hz: f },
    beam: { diameter_m: 0.005, divergence_rad: 0.0008, definition: '1/e2' },
  });
  const specs: BeamInput[][] = [
    [cw(532, 5)], [cw(633, 0.002)], [cw(405, 0.1)], [cw(1064, 10)], [cw(1550, 0.08)],
    [cw(10600, 60)], [cw(808, 2)], [cw(445, 1)], [cw(1310, 0.01)], [cw(980, 0.5)],
    [pulsed(1064, 0.45, 6e-9, 10), pulsed(532, 0.2, 6e-9, 10)], [pulsed(800, 0.004, 1e-13, 1000)], [pulsed(355, 0.01, 1e-8, 20)],
    [pulsed(1550, 1e-5, 1e-9, 1e5)], [pulsed(2940, 0.5, 2e-4, 10)], [pulsed(694, 1, 1e-3)], [{ ...cw(1070, 500), viewing: { lens: { focalLength_m: 0.16 }, diffuse: { reflectance: 1 } } }],
    [{ ...cw(532, 0.5), viewing: { specular: { reflectance: 0.04 } } }], [{ ...cw(1064, 1), viewing: { fiber: { kind: 'multimode', numericalAperture: 0.22 } } }], [cw(266, 0.05), cw(532, 0.2)],
  ];
  specs.forEach((beams, i) =>
    lasers.push({
      id: `L${i + 1}`,
      name: `Laser ${i + 1}`,
      beams: beams.map((b, j) => {
        const e = b.emission;
        const k = edited === undefined || edited === i ? 1 : 1 / scale; // undo the scale on the lasers not edited
        const emission = e.kind === 'cw' ? { ...e, power_W: e.power_W * k } : { ...e, pulseEnergy_J: e.pulseEnergy_J * k };
        return { ...b, emission, id: `L${i + 1}-${j}` };
      }),
    }),
  );
  return { lasers, eyewear: EYEWEAR };
}

export function runPart2Bench(): BenchEntry[] {
  const out: BenchEntry[] = [];
  // warm-up (JIT)
  for (let i = 0; i < 5; i++) evaluateRoom(twentyLaserRoom(1 + i / 100));
  for (let i = 0; i < 5; i++) evaluateBeam(allReflectionsBeam(1 + i));
  out.push({ name: 'evaluateBeam, all reflections + tolerances (limits memoised)', runs: 40, median_ms: time(40, () => undefined, (i) => evaluateBeam(allReflectionsBeam(10 + i / 10))) });
  out.push({ name: 'evaluateBeam, all reflections + tolerances (cold)', runs: 15, median_ms: time(15, () => clearCoreCaches(), (i) => evaluateBeam(allReflectionsBeam(10 + i / 10))) });
  evaluateRoom(twentyLaserRoom(1));
  out.push({ name: '20-laser room, one power edited (keystroke)', runs: 60, target_ms: 16, median_ms: time(60, () => undefined, (i) => evaluateRoom(twentyLaserRoom(1 + (i + 1) / 1000, i % 20))) });
  out.push({ name: '20-laser room, every beam changed (limits memoised)', runs: 20, median_ms: time(20, () => undefined, (i) => evaluateRoom(twentyLaserRoom(1.5 + i / 1000))) });
  out.push({ name: '20-laser room, cold (new room, no memo)', runs: 8, median_ms: time(8, () => clearCoreCaches(), (i) => evaluateRoom(twentyLaserRoom(1 + i / 1000))) });
  return out;
}

const isMain = typeof process !== 'undefined' && process.argv[1] !== undefined && /part2\.bench\.ts$/.test(process.argv[1]);
if (isMain) {
  for (const e of runPart2Bench()) {
    const tgt = e.target_ms !== undefined ? `  (target < ${e.target_ms} ms: ${e.median_ms < e.target_ms ? 'met' : 'NOT met'})` : '';
    console.log(`${e.name.padEnd(58)} median ${e.median_ms.toFixed(2)} ms over ${e.runs}${tgt}`);
  }
}
