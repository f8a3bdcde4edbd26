/**
 * Two revisions side by side on the Review screen (issue 11, item 4: conflicting drafts are kept
 * and shown): a signed revision against the draft made from it, and a draft kept as a copy in the
 * same room against the assessment. Only what differs is listed, by the form's labels with the
 * laser and beam by name, both values in engineering notation with units — never a stored path.
 * Real handler table over a real SQLite store (test/renderer/store-bridge.ts); invented demo room
 * A0.07 (assets/demo: Erbium fibre amplifier, 80 mW CW at 1550 nm).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, within } from '@testing-library/svelte';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';
import RevisionCompare from '../../renderer/components/review/RevisionCompare.svelte';
import type { AssessmentContent, RecordStore } from '../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, STATEMENT, tempDir } from '../backend/records/helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';
let assessmentId = '';


/** The first beam with another power and a skin area. */
function edited(c: AssessmentContent, power_W: number, skinArea_m2?: number): AssessmentContent {
  const l0 = c.input.lasers[0];
  const b0 = l0?.beams[0];
  if (!l0 || !b0) throw new Error('demo room has a beam');
  const beam = { ...b0, emission: { kind: 'cw' as const, power_W }, ...(skinArea_m2 !== undefined ? { skinArea_m2 } : {}) };
  return { ...c, input: { ...c.input, lasers: [{ ...l0, beams: [beam, ...l0.beams.slice(1)] }, ...c.input.lasers.slice(1)] } };
}

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  roomId = (await registerRoom(store)).room.id;
  const made = await store.createAssessment({ roomId, content: await store.newAssessmentContent(roomId) });
  assessmentId = made.id;
  const signed = await store.signAssessment(made.id, (await makeSigner(store)).signOff(STATEMENT));
  await store.saveAssessment(made.id, edited(signed.current.content, 0.16, 0.02));
  // a draft kept as a copy in the same room (as after a refused save)
  const c = await store.newAssessmentContent(roomId);
  await store.createAssessment({ roomId, content: { ...edited(c, 0.12), title: `${c.title} — your version, kept when your save was refused` } });
  installStoreBridge(store);
});
afterAll(async () => {
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

async function mount() {
  const others = (await store.listAssessments(roomId)).filter((a) => a.id !== assessmentId);
  return within(render(RevisionCompare, { props: { assessmentId, revisions: await store.listRevisions(assessmentId), others } }).container);
}

function rowsOf(view: Awaited<ReturnType<typeof mount>>): string[][] {
  return view
    .getAllByRole('row')
    .slice(1)
    .map((r) => [...r.querySelectorAll('td')].map((td) => td.textContent ?? ''));
}

describe('two revisions side by side', () => {
  it('the draft against the signed revision it was made from (the default pair)', async () => {
    const view = await mount();
    await fireEvent.click(view.getByRole('button', { name: 'Compare side by side' }));
    await until(() => view.queryByTestId('compare-table') !== null);
    const heads = view.getAllByRole('columnheader').map((h) => h.textContent ?? '');
    expect(heads[2]).toMatch(/^Revision 1 \(signed /);
    expect(heads[3]).toMatch(/^Revision 2 \(draft, saved /);
    const rows = rowsOf(view);
    // derived: 0.08 W and 0.16 W in engineering notation (BIPM SI brochure Table 7: m = 1e-3)
    expect(rows).toContainEqual(['Erbium fibre amplifier · Erbium fibre amplifier 1550 nm', 'Power', '80 mW', '160 mW']);
    // derived: 0.02 m² = 200 cm²
    expect(rows).toContainEqual(['Erbium fibre amplifier · Erbium fibre amplifier 1550 nm', 'Irradiated skin area', 'not applied', '200 cm²']);
    expect(rows.some((r) => r[1]?.startsWith('Result: '))).toBe(true);
    for (const r of rows) expect(r.join(' ')).not.toMatch(/\[\d+\]|_W\b|_m2\b|emission\.|input\./);
  });

  it('a kept copy in the same room against the assessment', async () => {
    const view = await mount();
    const right = view.getByLabelText('with') as HTMLSelectElement;
    await until(() => right.options.length === 3);
    const kept = [...right.options].find((o) => /kept when your save was refused — revision 1/.test(o.textContent ?? ''));
    if (!kept) throw new Error('kept copy not offered');
    await fireEvent.change(right, { target: { value: kept.value } });
    const left = view.getByLabelText('Compare') as HTMLSelectElement;
    const signedRev = [...left.options].find((o) => /^Revision 1 /.test(o.textContent ?? ''));
    await fireEvent.change(left, { target: { value: signedRev?.value ?? '' } });
    await fireEvent.click(view.getByRole('button', { name: 'Compare side by side' }));
    await until(() => view.queryByTestId('compare-table') !== null);
    const rows = rowsOf(view);
    expect(rows).toContainEqual(['Erbium fibre amplifier · Erbium fibre amplifier 1550 nm', 'Power', '80 mW', '120 mW']);
    expect(rows.some((r) => r[1] === 'Assessment title')).toBe(true);
  });

  it('the same revision on both sides is refused in words', async () => {
    const view = await mount();
    const left = view.getByLabelText('Compare') as HTMLSelectElement;
    const right = view.getByLabelText('with') as HTMLSelectElement;
    await fireEvent.change(left, { target: { value: right.value } });
    await fireEvent.click(view.getByRole('button', { name: 'Compare side by side' }));
    expect(view.getByRole('alert').textContent).toBe('Choose two different revisions to compare.');
  });

  it('revisions of assessments of two different rooms are not compared', async () => {
    const otherRoom = (await registerRoom(store, 'B2.16')).room;
    const there = await store.createAssessment({ roomId: otherRoom.id, content: await store.newAssessmentContent(otherRoom.id) });
    const here = await store.getAssessment(assessmentId);
    const reply = await window.beamwarden!.invoke('revisions-compare', { fromRevisionId: here.current.id, toRevisionId: there.current.id });
    expect(reply.ok).toBe(false);
    if (!reply.ok) expect(reply.error.message).toBe('Only revisions of assessments of the same room can be compared');
  });
});
