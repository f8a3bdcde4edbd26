/**
 * Printed output (issue: Printed output): time to render
 *  - the assessment report of a 10-laser room (plots, derivations, sign-off) — target below 1.5 s;
 *  - the door notice of the same room — target below 0.5 s.
 * The room is made of ten lasers of the invented demo site (one beam each); the evaluation and
 * the document input are set up untimed. Medians over repeated runs after one warm-up render.
 * Run alone: npx tsx test/bench/pdf.bench.ts
 */
import demo from '../../assets/demo/demo-scenario.json' with { type: 'json' };
import { evaluateRoom } from '../../core/index.js';
import type { LaserInput, RoomInput } from '../../core/model/inputs.js';
import { DemoScenarioSchema } from '../../electron/backend/records/demo.js';
import { renderDoorNotice, renderReport, type DocumentInput, type RenderOptions } from '../../electron/backend/pdf/index.js';
import { median, type BenchEntry } from './registry.js';

const RUNS = 5;

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
    },
  };
}

async function timeAsync(runs: number, f: () => Promise<unknown>): Promise<number> {
  await f(); // warm-up: fonts, module code
  const xs: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await f();
    xs.push(performance.now() - t0);
  }
  return median(xs);
}

export async function runPdfBench(): Promise<BenchEntry[]> {
  const doc = benchDocument(tenLaserRoom());
  const opts: RenderOptions = { paper: 'A4', units: 'SI' };
  const report = await timeAsync(RUNS, () => renderReport(doc, opts));
  const notice = await timeAsync(RUNS, () => renderDoorNotice(doc, opts));
  return [
    { name: 'pdf: assessment report, 10-laser room', median_ms: report, runs: RUNS, target_ms: 1500 },
    { name: 'pdf: door notice, 10-laser room', median_ms: notice, runs: RUNS, target_ms: 500 },
  ];
}

if (process.argv[1]?.endsWith('pdf.bench.ts')) {
  for (const e of await runPdfBench()) console.log(`${e.name}: median ${e.median_ms.toFixed(1)} ms over ${e.runs} runs (target < ${e.target_ms} ms)`);
}
