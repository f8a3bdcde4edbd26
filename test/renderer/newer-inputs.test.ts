/**
 * Form fields for the newer core inputs (issue 11, item 1: every quantity shows how it was read):
 * the irradiated skin area (large-area skin limit), the deliberate viewing duration of a diffuse
 * spot, and which diffuse viewing case sets the hazard distance. Ranges come from the one table of
 * input rules (core/model/input-rules.ts); what is typed is echoed in full. The workspace saves
 * them through the real handler table into a real SQLite store (test/renderer/store-bridge.ts),
 * and the stored result uses the chosen case. Invented demo room A0.07 (assets/demo).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import QuantityHarness from './QuantityHarness.svelte';
import { installStoreBridge } from './store-bridge.js';
import BeamEditor from '../../renderer/components/workspace/BeamEditor.svelte';
import { F, type FieldSpec } from '../../renderer/lib/fields.js';
import { session } from '../../renderer/lib/session.svelte.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import { openTemp, registerRoom, tempDir } from '../backend/records/helpers.js';

const good: ReadonlyArray<{ spec: FieldSpec; text: string; si: number; echo: string; source: string }> = [
  { spec: F.skinArea, text: '200 cm²', si: 0.02, echo: '= 200 cm² of skin in the beam', source: '1 cm² = (0.01 m)² = 1e-4 m² (BIPM SI brochure, 9th ed., 3 and Table 7)' },
  { spec: F.skinArea, text: '200', si: 0.02, echo: '= 200 cm² of skin in the beam', source: 'a bare number takes the unit the label states (cm²)' },
  { spec: F.skinArea, text: '0.1 m2', si: 0.1, echo: '= 1000 cm² of skin in the beam', source: 'derived: 0.1 m² = 1000 cm²' },
  { spec: F.skinArea, text: '150 mm²', si: 1.5e-4, echo: '= 1.5 cm² of skin in the beam', source: '1 mm² = 1e-6 m² (BIPM SI brochure)' },
  { spec: F.diffuseDeliberate, text: '10 min', si: 600, echo: '= 600 s looking at the spot', source: '1 min = 60 s (BIPM SI brochure Table 8)' },
  { spec: F.diffuseDeliberate, text: '30', si: 30, echo: '= 30 s looking at the spot', source: 'a bare number takes the unit the label states (s)' },
];

const bad: ReadonlyArray<{ spec: FieldSpec; text: string; message: RegExp; why: string }> = [
  { spec: F.skinArea, text: '20 m²', message: /^Irradiated skin area must be 0 cm² to 100000 cm²$/, why: 'above the 10 m² of the input rules (a whole body is about 2 m², common practice)' },
  { spec: F.skinArea, text: '200 mW', message: /Irradiated skin area: "200 mW" is not an area unit/, why: 'a unit of another quantity' },
  { spec: F.skinArea, text: '2 cm', message: /is not an area unit/, why: 'a length is not an area' },
  { spec: F.diffuseDeliberate, text: '0.1 ms', message: /^Deliberate viewing duration must be 1 ms to 30000 s$/, why: 'below the 1 ms of the input rules' },
  { spec: F.diffuseDeliberate, text: '10 h', message: /^Deliberate viewing duration must be 1 ms to 30000 s$/, why: 'beyond the 30 000 s where the limit tables end' },
];

describe('the newer fields read what officers type and say how they read it', () => {
  it.each(good)('"$text" -> $si [$source]', async ({ spec, text, si, echo }) => {
    const view = within(render(QuantityHarness, { props: { spec } }).container);
    await fireEvent.input(view.getByRole('textbox'), { target: { value: text } });
    expect(Number(view.getByTestId('value').textContent)).toBeCloseTo(si, 12);
    expect(view.getByTestId('field-echo').textContent).toBe(echo);
    expect(view.queryByRole('alert')).toBeNull();
  });

  it.each(bad)('"$text" is refused beside the field ($why)', async ({ spec, text, message }) => {
    const view = within(render(QuantityHarness, { props: { spec } }).container);
    await fireEvent.input(view.getByRole('textbox'), { target: { value: text } });
    expect(view.getByRole('alert').textContent).toMatch(message);
    expect(view.getByTestId('value').textContent).toBe('none');
  });

  it('labels state the unit a bare number is read in, and empty fields do not look like values', () => {
    for (const spec of [F.skinArea, F.diffuseDeliberate]) {
      const view = within(render(QuantityHarness, { props: { spec } }).container);
      const box = view.getByRole('textbox') as HTMLInputElement;
      expect(box.placeholder).not.toMatch(/\d/);
      expect(view.getByText(/\((cm²|s)\)/)).toBeTruthy();
    }
  });
});

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let roomId = '';

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  roomId = (await registerRoom(store)).room.id;
  installStoreBridge(store);
  await session.refreshOverview();
});
afterAll(async () => {
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

describe('in the workspace, through the real handler table', () => {
  it('skin area, deliberate duration and the chosen case are saved, and the stored result uses the chosen case', async () => {
    await session.openRoom(roomId);
    const beam = session.draft?.lasers[0]?.beams[0];
    if (!beam) throw new Error('demo room has a beam');
    const view = within(render(BeamEditor, { props: { beam, idp: 'b0' } }).container);
    await fireEvent.input(view.getByLabelText(/^Irradiated skin area \(cm²\)/), { target: { value: '300 cm²' } });
    await fireEvent.click(view.getByLabelText('Diffuse reflection'));
    await fireEvent.input(view.getByLabelText(/^Diffuse reflectance/), { target: { value: '90 %' } });
    await fireEvent.input(view.getByLabelText(/^Deliberate viewing duration \(s\)/), { target: { value: '1 min' } });
    const governs = view.getByLabelText('Case that sets the hazard distance') as HTMLSelectElement;
    await fireEvent.change(governs, { target: { value: 'deliberate' } });
    expect(view.getAllByTestId('field-echo').map((e) => e.textContent)).toEqual(
      expect.arrayContaining(['= 300 cm² of skin in the beam', '= 60 s looking at the spot']),
    );
    expect(await session.save()).toBe(true);

    const saved = (await store.listAssessments(roomId))[0];
    if (!saved) throw new Error('not saved');
    const a = await store.getAssessment(saved.id);
    const stored = a.current.content.input.lasers[0]?.beams[0];
    expect(stored?.skinArea_m2).toBeCloseTo(0.03, 12);
    expect(stored?.viewing?.diffuse).toMatchObject({ reflectance: 0.9, deliberateDuration_s: 60, governs: 'deliberate' });
    // derived: the officer's choice marks the deliberate case (60 s) as the one that sets the zone
    const r = a.current.results.beams[0];
    const diffuse = (r?.distances ?? []).filter((d) => d.viewing !== undefined);
    expect(diffuse.map((d) => [d.viewing, d.governs, d.exposureDuration_s])).toEqual([
      ['accidental', false, expect.any(Number)],
      ['deliberate', true, 60],
    ]);
    expect(r?.nhzDiffuse_m).toBe(diffuse[1]?.distance_m);

    // reopened, the form shows what was stored
    await session.openRoom(roomId, saved.id);
    const again = session.draft?.lasers[0]?.beams[0];
    expect(again?.f.skinArea.text).toBe('300 cm²');
    expect(again?.f.diffuseDeliberate.text).toBe('60 s');
    expect(again?.diffuseGoverns).toBe('deliberate');
    expect(screen).toBeTruthy();
  });
});
