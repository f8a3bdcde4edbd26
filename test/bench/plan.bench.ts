/**
 * The room plan: evaluating the invented demo room B2.14 (4 lasers, 9 beams) with and without its
 * plan, beams already cached as in the live workspace, so the figure is the plan's own cost.
 * Target (ours): the plan adds no more than 100 ms to a live re-evaluation. The processor-time
 * entries say what the computation itself costs: on a loaded machine (many processes on 2 cores) the
 * wall-time median mostly measures waiting for a processor (load 18: wall 100–220 ms, processor 22–45 ms).
 */
import demo from '../../assets/demo/demo-scenario.json' with { type: 'json' };
import { evaluateRoom, type RoomInput } from '../../core/index.js';
import { cpuMedian, registerBench, timeMedian, type BenchEntry } from './registry.js';

function runPlanBench(): BenchEntry[] {
  const withPlan = demo.rooms[0]?.input as unknown as RoomInput;
  const { plan: _plan, ...without } = withPlan;
  evaluateRoom(withPlan); // beams and the polygon corners of circles cached, as after the first keystroke
  const runs = 9;
  const cpuRuns = 21;
  let moved = 0;
  const curtainMoved = (): RoomInput => {
    const plan = withPlan.plan;
    if (!plan) return withPlan;
    moved += 1;
    const shift = <T extends { x_m: number; y_m: number }>(q: T): T => ({ ...q, y_m: q.y_m + moved / 1000 });
    return { ...withPlan, plan: { ...plan, barriers: plan.barriers.map((b) => ({ ...b, a: shift(b.a), b: shift(b.b) })) } };
  };
  return [
    { name: 'room B2.14 re-evaluation without plan', median_ms: timeMedian(runs, () => evaluateRoom(without)), runs },
    { name: 'room B2.14 re-evaluation with plan (zones, findings)', median_ms: timeMedian(runs, () => evaluateRoom(withPlan)), runs, target_ms: 100 },
    // A curtain moved by 1 mm more each time: every diffuse zone's line-of-sight sweep runs again.
    { name: 'room B2.14 re-evaluation after a curtain is moved (every diffuse zone recomputed)', median_ms: timeMedian(runs, () => evaluateRoom(curtainMoved())), runs, target_ms: 100 },
    { name: 'room B2.14 re-evaluation with plan, processor time', median_ms: cpuMedian(cpuRuns, () => evaluateRoom(withPlan)), runs: cpuRuns, target_ms: 100 },
    { name: 'room B2.14 re-evaluation after a curtain is moved, processor time', median_ms: cpuMedian(cpuRuns, () => evaluateRoom(curtainMoved())), runs: cpuRuns, target_ms: 100 },
  ];
}

registerBench({ name: 'plan', run: runPlanBench });
