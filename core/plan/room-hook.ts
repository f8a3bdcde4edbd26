/** The one hook of the room plan into evaluateRoom: validate the plan, evaluate it, note it in the trace. */
import type { RoomInput } from '../model/inputs.js';
import type { BeamResult } from '../model/results.js';
import { addStep, type Trace } from '../trace/trace.js';
import { evaluatePlan } from './evaluate-plan.js';
import type { PlanResult } from './plan-model.js';
import { validatePlan } from './validate-plan.js';

export function planOfRoom(input: RoomInput, beams: readonly BeamResult[], trace: Trace): PlanResult | null {
  if (input.plan === undefined) return null;
  const plan = validatePlan(input.plan, new Set(input.lasers.map((l) => l.id)));
  const result = evaluatePlan(plan, input, beams);
  for (const f of result.findings) addStep(trace, { kind: f.severity === 'hazard' ? 'result' : 'note', label: 'Room plan', detail: f.text });
  return result;
}
