/**
 * "Changes since the last signed revision" as the officer reads it: the form's field labels, the
 * laser and beam by name, values in engineering notation with units, limits rounded down and
 * distances up (SAFETY.md). Real database (no mocks): sign the invented demo room A0.07, change an
 * input, compare through the store, and describe each difference as the Review screen does.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { describeChange, diffView, type ChangeRow } from '../../../renderer/lib/diff-view.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let rows: ChangeRow[];

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  const { room } = await registerRoom(store);
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  const signed = await store.signAssessment(a.id, (await makeSigner(store)).signOff(STATEMENT));
  const c = signed.current.content;
  const l0 = c.input.lasers[0];
  const b0 = l0?.beams[0];
  if (!l0 || !b0) throw new Error('demo room without a beam');
  const emission = b0.emission.kind === 'cw' ? { kind: 'cw' as const, power_W: b0.emission.power_W * 2 } : { ...b0.emission, pulseEnergy_J: b0.emission.pulseEnergy_J * 2 };
  const edited = {
    ...c,
    input: { ...c.input, lasers: [{ ...l0, beams: [{ ...b0, emission, beam: { ...b0.beam, divergence_rad: 0.0025 } }, ...l0.beams.slice(1)] }, ...c.input.lasers.slice(1)] },
  };
  const draft = await store.saveAssessment(a.id, edited);
  const diff = await store.compareRevisions(signed.current.id, draft.current.id);
  const view = diffView(diff);
  rows = [...view.content, ...view.headline].map((d) => describeChange(d, draft.current.content, draft.current.results));
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

describe('changed-since-signed list', () => {
  it('names fields by their form labels and lasers/beams by name, never a stored path', () => {
    expect(rows.length).toBeGreaterThan(2);
    for (const r of rows) {
      expect(`${r.where} ${r.what} ${r.old} ${r.new}`).not.toMatch(/_W\b|_m\b|_rad\b|_reported|\[\d+\]|emission\.|nhzDiffuse|\.power/);
      expect(r.where).not.toMatch(/^laser \d|^beam \d/i);
    }
  });

  it.each([
    { what: 'Divergence (full angle)', now: '2.5 mrad', source: 'SI prefix m on the radian (BIPM SI brochure Table 7)' },
  ])('$what reads "$now" [$source]', ({ what, now }) => {
    const r = rows.find((x) => x.what === what);
    expect(r?.new).toBe(now);
  });

  it('results that moved carry units (distances in m or km, rounded up)', () => {
    const nohd = rows.find((x) => x.what === 'NOHD, direct beam');
    expect(nohd?.result).toBe(true);
    expect(nohd?.new).toMatch(/^[\d.\u202f]+ (m|km|mm)$/);
    const power = rows.find((x) => x.what === 'Power' || x.what === 'Energy per pulse');
    expect(power?.new).toMatch(/^[\d.]+ [mµnk]?[WJ]$/);
  });
});
