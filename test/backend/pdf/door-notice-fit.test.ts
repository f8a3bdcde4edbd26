// @vitest-environment node
/**
 * The door notice is one page for any room (issue: printed documents an auditor accepts): 1, 2, 5,
 * 10 and 20 lasers, with long names and every control of the catalogue accepted, on A4 and Letter;
 * "Before you enter" holds instructions for entrants only (who may enter, which eyewear, what to do
 * in an emergency, whom to call), never the officer's administrative controls; the eyewear that
 * covers every beam is named by its label and frame marking; the emergency contact is printed.
 * Sources: ANSI Z535.2 / ANSI Z136.1-2014 sign content (signal word, hazard, eyewear, contact) as
 * common practice for entrance notices; one page is derived: a notice is posted as one sheet.
 */
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type RoomPlan } from '../../../core/index.js';
import { renderDoorNotice, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { CONTROL_CATALOGUE } from '../../../renderer/lib/controls-catalogue.js';
import { pageTexts, pdfInfo } from './pdf-tools.js';
import { generatedDocument } from './generated-rooms.js';
import { benchDocument } from './ten-laser-room.js';

function squash(s: string): string {
  return s.replace(/[\s\u00ad-]+/g, '');
}

const SIZES = [1, 2, 5, 10, 20] as const;
const PAPERS = ['A4', 'Letter'] as const;

describe('one page for every room size', () => {
  for (const paper of PAPERS)
    for (const lasers of SIZES)
      it(`${lasers} laser${lasers === 1 ? '' : 's'}, long names, every control accepted, ${paper}`, async () => {
        const doc = { ...generatedDocument({ lasers, longNames: true, allControls: true }), emergencyContact: 'Site security control room, extension 2222 (24 h)' };
        const opts: RenderOptions = { paper, units: 'SI' };
        const pdf = await renderDoorNotice(doc, opts);
        expect(pdfInfo(pdf).pages).toBe(1);
        const text = squash(pageTexts(pdf).join(' '));
        // every laser is still on the notice
        for (const l of doc.content.input.lasers) expect(text, l.name).toContain(squash(l.name));
        expect(text).toContain(squash('Site security control room, extension 2222 (24 h)'));
      }, 60_000);
});

describe('one page in the most crowded form', () => {
  // 20 lasers, long names, every control accepted, the signal word raised to DANGER, unsigned
  // (DRAFT mark) and in the ANSI unit habit: still one sheet for the door.
  for (const paper of PAPERS)
    it(`20 lasers, DANGER, draft, ANSI units, ${paper}`, async () => {
      const doc = { ...generatedDocument({ lasers: 20, longNames: true, allControls: true }), signature: null, emergencyContact: 'Site security control room, extension 2222 (24 h)' };
      const pdf = await renderDoorNotice(doc, { paper, units: 'ANSI', signalWord: 'DANGER' });
      expect(pdfInfo(pdf).pages).toBe(1);
      const text = squash(pageTexts(pdf).join(' '));
      expect(text).toContain('DANGER');
      expect(text).toContain('DRAFT');
      for (const l of doc.content.input.lasers) expect(text, l.name).toContain(squash(l.name));
    }, 60_000);
});

describe('one page with the room plan on the notice', () => {
  // The plan takes a slot beside the entry instructions (electron/backend/pdf/plan/notice-plan.ts):
  // an 8 m × 5 m room, a door in the east wall, each laser's beam along the room to a dump; still one sheet.
  for (const paper of PAPERS)
    for (const lasers of [1, 5, 20] as const)
      it(`${lasers} laser${lasers === 1 ? '' : 's'} with a room plan, long names, every control accepted, ${paper}`, async () => {
        const base = generatedDocument({ lasers, longNames: true, allControls: true });
        const p = (x_m: number, y_m: number) => ({ x_m, y_m });
        const plan: RoomPlan = {
          outline: [p(0, 0), p(8, 0), p(8, 5), p(0, 5)],
          doors: [{ id: 'D1', label: 'D1 corridor', a: p(8, 1), b: p(8, 2) }],
          windows: [],
          walls: [],
          barriers: [],
          workPositions: [],
          enclosures: [],
          paths: base.content.input.lasers.map((l, i) => ({ laserId: l.id, exit: p(0.5, 0.2 + (4.6 * i) / Math.max(1, lasers - 1)), elements: [{ kind: 'dump' as const, at: p(6, 0.2 + (4.6 * i) / Math.max(1, lasers - 1)) }] })),
          reflectionPoints: [],
          controlledArea: { outline: [p(0, 0), p(8, 0), p(8, 5), p(0, 5)], acceptedBy: 'I. Calloway-Senn' },
        };
        const input = { ...base.content.input, plan };
        const doc = { ...base, content: { ...base.content, input }, results: evaluateRoom(input), emergencyContact: 'Site security control room, extension 2222 (24 h)' };
        const pdf = await renderDoorNotice(doc, { paper, units: 'SI' });
        expect(pdfInfo(pdf).pages).toBe(1);
        const text = squash(pageTexts(pdf).join(' '));
        expect(text).toContain(squash('You are here: door D1 corridor'));
        for (const l of doc.content.input.lasers) expect(text, l.name).toContain(squash(l.name));
      }, 60_000);
});

describe('"Before you enter" is for the person at the door', () => {
  it('no administrative control of the officer is copied onto the notice; emergency and eyewear are', async () => {
    const doc = { ...generatedDocument({ lasers: 5, allControls: true }), emergencyContact: 'Security desk, extension 2222' };
    const text = squash(pageTexts(await renderDoorNotice(doc, { paper: 'A4', units: 'SI' })).join(' '));
    for (const c of CONTROL_CATALOGUE.filter((x) => x.category === 'administrative')) expect(text, c.measure).not.toContain(squash(c.measure));
    expect(text).toContain(squash('Authorised persons only'));
    expect(text).toContain(squash('Emergency: press the emergency beam-off button'));
    expect(text).toContain(squash('call Security desk, extension 2222'));
  }, 60_000);

  it('without a recorded emergency contact, a line to write the number in is printed', async () => {
    const doc = { ...generatedDocument({ lasers: 2 }), emergencyContact: null };
    const text = pageTexts(await renderDoorNotice(doc, { paper: 'A4', units: 'SI' })).join(' ');
    expect(text).toContain('Emergency number: ____');
  }, 60_000);

  it('the eyewear covering every beam is named by its label and frame marking (EN 207 style), not only its shelf code', async () => {
    // the first demo laser that one pair of the demo eyewear covers (a room of that laser alone)
    const pool = generatedDocument({ lasers: 10 });
    const base = pool.content.input.lasers
      .map((l) => benchDocument({ ...pool.content.input, lasers: [l] }))
      .find((d) => d.results.eyewearCoveringAll.length > 0);
    if (base === undefined) throw new Error('no demo laser is covered by one pair of the demo eyewear');
    const covering = base.results.eyewearCoveringAll;
    const text = squash(pageTexts(await renderDoorNotice(base, { paper: 'A4', units: 'SI' })).join(' '));
    const spec = (base.content.input.eyewear ?? []).find((e) => e.id === covering[0]);
    expect(spec).toBeDefined();
    expect(text).toContain(squash(spec?.label ?? ''));
    expect(text).toContain(squash('marked'));
    const first = spec?.en207?.[0];
    if (first) expect(text).toContain(squash(`${first.modes} ${first.from_nm}–${first.to_nm} LB${first.scale}`));
  }, 60_000);
});
