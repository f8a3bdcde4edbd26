/**
 * The invented demo site (assets/demo/demo-scenario.json; every name, room and device is invented)
 * loaded into the register on request, with one assessment per room so the screens and printed
 * documents have something to show. The first room's assessment is signed by the demo officer.
 *
 * On a fresh database (no trust list, nobody registered) the demo officer gets a real personal key,
 * sealed with DEMO_PASSPHRASE (published in the README), which becomes that demo installation's
 * trust anchor, and signs through the app's own sign-off: the demo verifies as trusted. Where a
 * trust list already exists the demo never admits a key whose passphrase is public: its record is
 * signed with a throwaway key and shows as an unverified signature.
 */
import { z } from 'zod';
import demoScenario from '../../../assets/demo/demo-scenario.json' with { type: 'json' };
import { EyewearSpecSchema, RoomInputSchema } from '../schemas/inputs.js';
import { parseOrThrow, transact, type StoreContext } from './context.js';
import { generateKeyPairSync } from 'node:crypto';
import { createAssessment, newAssessmentContent, signAssessment, signDraftWith } from './assessments.js';
import { createPersonalKey, signerFromKey } from './personal-keys.js';
import { loadTrust, registerAnchors } from './trust-store.js';
import { createEyewear, createInstallation, createPerson, createRoom, createSite, listSites } from './register.js';
import type { AssessmentContent, ControlChoice, Site } from './types.js';
import type { RoomPlan } from '../../../core/plan/plan-model.js';
import { withEmergencyContact } from './emergency-contact.js';

/** Our own asset: validated, but extra fields are ignored so the scenario can grow. */
export const DemoScenarioSchema = z.object({
  about: z.string(),
  site: z.object({ name: z.string().min(1), building: z.string(), kind: z.string(), emergencyContact: z.string().optional() }),
  officer: z.object({ name: z.string().min(1), phone: z.string().optional(), email: z.string().optional() }),
  deputy: z.object({ name: z.string().min(1) }).optional(),
  eyewear: z.array(EyewearSpecSchema),
  rooms: z.array(
    z.object({ code: z.string().min(1), name: z.string(), responsible: z.string(), notes: z.string(), input: RoomInputSchema }),
  ),
});
export type DemoScenario = z.infer<typeof DemoScenarioSchema>;

/** Typical controls for a Class 4 area (domain reference section 4), as an officer might record them. */
const DEMO_CONTROLS: readonly ControlChoice[] = [
  { category: 'engineering', measure: 'Interlocked entry door with warning light', decision: 'accepted', implementation: 'in-place' },
  { category: 'engineering', measure: 'Beam enclosures and beam stops at the table edge', decision: 'accepted', implementation: 'to-do', owner: 'Responsible person', due: '2027-03-31' },
  { category: 'administrative', measure: 'Written procedure for beam alignment', decision: 'accepted', implementation: 'in-place' },
  { category: 'administrative', measure: 'Access restricted to authorised, trained users', decision: 'accepted', implementation: 'in-place' },
  { category: 'ppe', measure: 'Laser eyewear as listed on the eyewear sheet', decision: 'accepted', implementation: 'in-place' },
  { category: 'engineering', measure: 'Remote viewing by camera', decision: 'rejected', reason: 'Experiments need direct access to the optics; enclosures and eyewear used instead.' },
];

/** The invented demo officer's passphrase (published in the README): only ever on a database made for the demo. */
export const DEMO_PASSPHRASE = 'demo passphrase, invented site';
const DEMO_STATEMENT = 'I have evaluated the laser hazards of this area with the inputs and assumptions recorded here and approve the controls listed.';

export async function seedDemo(ctx: StoreContext, raw: unknown = demoScenario): Promise<Site> {
  const scenario = parseOrThrow(DemoScenarioSchema, raw, 'Demo scenario');
  const sites = await listSites(ctx);
  const existing = sites.find((s) => s.name === scenario.site.name && s.building === scenario.site.building);
  if (existing) return existing;
  // A database made for the demo: no trust anchor (here or in the register) and nobody registered yet.
  const fresh = (await loadTrust(ctx)).list === null && (await registerAnchors(ctx)).length === 0 && sites.length === 0 && (await ctx.q.get('SELECT 1 AS one FROM person LIMIT 1')) === undefined;
  let toSign: { assessmentId: string; personId: string } | null = null;
  const seeded = await transact(ctx, async (ctx) => {
    const site = await createSite(ctx, { name: scenario.site.name, building: scenario.site.building, notes: withEmergencyContact(`${scenario.site.kind}. ${scenario.about}`, scenario.site.emergencyContact ?? '') });
    const officer = await createPerson(ctx, {
      name: scenario.officer.name,
      role: 'Laser safety officer',
      ...(scenario.officer.email ? { email: scenario.officer.email } : {}),
      ...(scenario.officer.phone ? { phone: scenario.officer.phone } : {}),
    });
    if (scenario.deputy) await createPerson(ctx, { name: scenario.deputy.name, role: 'Deputy laser safety officer' });
    for (const spec of scenario.eyewear) await createEyewear(ctx, { siteId: site.id, spec, location: 'Eyewear cabinet, corridor B2' });
    for (const [index, r] of scenario.rooms.entries()) {
      const room = await createRoom(ctx, { siteId: site.id, code: r.code, name: r.name, responsiblePerson: r.responsible, notes: r.notes });
      const laserIds = new Map<string, string>();
      for (const laser of r.input.lasers) {
        laserIds.set(laser.id, (await createInstallation(ctx, { roomId: room.id, laser, laserType: laser.name })).id);
      }
      const skeleton = await newAssessmentContent(ctx, room.id);
      const content: AssessmentContent = {
        ...skeleton,
        input: {
          ...skeleton.input,
          ...(r.input.ruleSet ? { ruleSet: r.input.ruleSet } : {}),
          ...(r.input.settings ? { settings: r.input.settings } : {}),
          ...(r.input.plan ? { plan: planForRegister(r.input.plan, laserIds) } : {}),
        },
        controls: DEMO_CONTROLS,
        notes: r.notes,
        reviewBy: '2027-06-30',
      };
      const assessment = await createAssessment(ctx, { roomId: room.id, content });
      if (index === 0 && fresh) toSign = { assessmentId: assessment.id, personId: officer.id };
      else if (index === 0) {
        // An installation with its own trust list: a throwaway key on no trust list, so the invented
        // record shows as an unverified signature and no key with a public passphrase is admitted.
        await signDraftWith(ctx, assessment.id, DEMO_STATEMENT, signerFromKey(ctx, officer, generateKeyPairSync('ed25519').privateKey));
      }
    }
    await ctx.audit('seeded-demo', 'site', site.id, scenario.site.name);
    return site;
  });
  const demo = toSign as { assessmentId: string; personId: string } | null;
  if (demo) {
    // The demo installation's first key (its trust anchor), then the app's own sign-off path.
    await createPersonalKey(ctx, { personId: demo.personId, passphrase: DEMO_PASSPHRASE, passphraseAgain: DEMO_PASSPHRASE });
    await signAssessment(ctx, demo.assessmentId, { personId: demo.personId, passphrase: DEMO_PASSPHRASE, statement: DEMO_STATEMENT });
  }
  return seeded;
}

/** The demo plan names lasers by their scenario ids; the register gives each installation its own id. */
function planForRegister(plan: RoomPlan, ids: ReadonlyMap<string, string>): RoomPlan {
  const to = (id: string) => ids.get(id) ?? id;
  return {
    ...plan,
    paths: plan.paths.map((x) => ({ ...x, laserId: to(x.laserId) })),
    reflectionPoints: plan.reflectionPoints.map((x) => ({ ...x, laserId: to(x.laserId) })),
  };
}
