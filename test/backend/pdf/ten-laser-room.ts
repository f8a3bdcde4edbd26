/**
 * A crowded room for the printed-output benchmark and layout tests: ten lasers of the invented demo
 * site (assets/demo/demo-scenario.json), first beam of each, with the demo eyewear, evaluated by the
 * real core, and a signed document input around it (invented names; not a check of physics).
 */
import demo from '../../../assets/demo/demo-scenario.json' with { type: 'json' };
import { evaluateRoom } from '../../../core/index.js';
import type { LaserInput, RoomInput } from '../../../core/model/inputs.js';
import { DemoScenarioSchema } from '../../../electron/backend/records/demo.js';
import type { DocumentInput } from '../../../electron/backend/pdf/index.js';

/** Ten lasers from the invented demo rooms, first beam of each, with the demo eyewear. */
export function tenLaserRoom(): RoomInput {
  const scenario = DemoScenarioSchema.parse(demo);
  const lasers: LaserInput[] = scenario.rooms
    .flatMap((r) => r.input.lasers)
    .slice(0, 10)
    .map((l) => ({ ...l, beams: l.beams.slice(0, 1) }));
  if (lasers.length !== 10) throw new Error(`the demo has ${lasers.length} lasers, need 10`);
  return { ruleSet: 'icnirp2013', lasers, eyewear: scenario.eyewear };
}

export function benchDocument(input: RoomInput): DocumentInput {
  const results = evaluateRoom(input);
  return {
    site: { name: 'Harwick Vale Photonics Centre', building: 'Building B', address: '' },
    room: { code: 'B9.99', name: 'Benchmark room (invented)', responsiblePerson: 'Dr. Tomasz Ferreira-Lund', contact: 'extension 4420' },
    officer: { name: 'Dr. Imre Calloway-Senn', role: 'Laser safety officer', email: 'lso@harwickvale.example', phone: 'extension 4417' },
    installations: [],
    eyewearLocations: {},
    assessment: { id: 'bench', revisionNo: 1, status: 'signed', createdAt: '2026-05-01T09:00:00.000Z', updatedAt: '2026-05-01T09:00:00.000Z', calculatedWith: 'bench' },
    content: {
      title: 'Benchmark: ten lasers',
      input,
      operatingStates: ['normal', 'alignment'],
      assumptions: { exposureDurations: [], personsPresent: 'trained users', opticalAidsPossible: false, other: [] },
      controls: [{ category: 'engineering', measure: 'Interlocked entry door', decision: 'accepted', implementation: 'in-place' }],
      nonBeamHazards: [{ kind: 'electrical', present: true, note: 'pump supplies', controls: ['covers on'] }],
      eyewearChosen: [],
      notes: '',
      reviewBy: '2027-05-01',
    },
    results,
    signature: {
      name: 'Dr. Imre Calloway-Senn',
      role: 'Laser safety officer',
      signedAt: '2026-05-01T10:00:00.000Z',
      statement: 'Benchmark statement.',
      fingerprint: '0f'.repeat(32),
      keyId: 'a1'.repeat(32),
      keyTrusted: true,
      trustAnchor: 'a1a1 a1a1 a1a1 a1a1 a1a1',
    },
  };
}
