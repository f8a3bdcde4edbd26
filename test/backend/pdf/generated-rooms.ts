/**
 * Generated rooms for the layout and wording tests of the printed documents: 1 to 20 lasers built
 * from the invented demo site (assets/demo/demo-scenario.json), wavelengths spread from the
 * ultraviolet to the far infrared, optionally with very long names and every control of the
 * catalogue accepted. Evaluated by the real core; invented names; not a check of physics.
 */
import demo from '../../../assets/demo/demo-scenario.json' with { type: 'json' };
import { evaluateRoom } from '../../../core/index.js';
import type { LaserInput, RoomInput, RuleSetId } from '../../../core/model/inputs.js';
import { DemoScenarioSchema } from '../../../electron/backend/records/demo.js';
import type { DocumentInput } from '../../../electron/backend/pdf/index.js';
import type { ControlChoice } from '../../../electron/backend/records/types.js';
import { CONTROL_CATALOGUE } from '../../../renderer/lib/controls-catalogue.js';
import { benchDocument } from './ten-laser-room.js';

export interface RoomShape {
  readonly lasers: number;
  readonly longNames?: boolean;
  readonly allControls?: boolean;
  readonly ruleSet?: RuleSetId;
}

const WAVELENGTHS = [266, 355, 405, 445, 488, 515, 532, 561, 589, 633, 660, 785, 808, 905, 980, 1030, 1064, 1320, 1550, 2940, 10600];
const LONG = 'tunable optical parametric oscillator with second-harmonic and sum-frequency modules on the north optical table';

export function generatedLasers(shape: RoomShape): LaserInput[] {
  const scenario = DemoScenarioSchema.parse(demo);
  const pool = scenario.rooms.flatMap((r) => r.input.lasers).map((l) => ({ ...l, beams: l.beams.slice(0, 1) }));
  return Array.from({ length: shape.lasers }, (_, i) => {
    const base = pool[i % pool.length] as LaserInput;
    const beam = base.beams[0];
    if (beam === undefined) throw new Error('demo laser without a beam');
    const wavelength_nm = i < pool.length ? beam.wavelength_nm : (WAVELENGTHS[i % WAVELENGTHS.length] as number);
    const name = shape.longNames ? `${base.name} — ${LONG} (${i + 1})` : i < pool.length ? base.name : `${base.name} ${i + 1}`;
    return { ...base, id: `gen-${i + 1}`, name, beams: [{ ...beam, id: `gen-${i + 1}-b1`, label: `${name} ${wavelength_nm} nm`, wavelength_nm }] };
  });
}

export function generatedDocument(shape: RoomShape): DocumentInput {
  const scenario = DemoScenarioSchema.parse(demo);
  const input: RoomInput = { ruleSet: shape.ruleSet ?? 'icnirp2013', lasers: generatedLasers(shape), eyewear: scenario.eyewear };
  const base = benchDocument(input);
  const controls: readonly ControlChoice[] = shape.allControls
    ? CONTROL_CATALOGUE.map((c) => ({ category: c.category, measure: c.measure, decision: 'accepted', implementation: 'in-place' }))
    : base.content.controls;
  const room = shape.longNames
    ? { ...base.room, name: 'Shared ultrafast spectroscopy and laser materials processing laboratory, east wing', responsiblePerson: 'Prof. Dr. Annemarie Vandersloot-Okonkwo-Hargreaves' }
    : base.room;
  return { ...base, room, content: { ...base.content, controls }, results: evaluateRoom(input) };
}
