// @vitest-environment node
/**
 * The eyewear sheet by the rack (issue: printed documents an auditor accepts): one page for rooms
 * up to 10 lasers and 10 eyewear items (A4 and Letter, long names), and the pair that covers every
 * beam is shown first. derived: a sheet posted by the rack is read as one page; reaching for the
 * pair that covers everything first is common practice.
 */
import { describe, expect, it } from 'vitest';
import { renderEyewearSheet, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import type { EyewearSpec } from '../../../core/model/inputs.js';
import { evaluateRoom } from '../../../core/index.js';
import { layoutText, pdfInfo } from './pdf-tools.js';
import { generatedDocument } from './generated-rooms.js';
import { benchDocument } from './ten-laser-room.js';

describe('one page up to 10 lasers and 10 eyewear items', () => {
  for (const paper of ['A4', 'Letter'] as const)
    for (const lasers of [1, 2, 5, 10])
      it(`${lasers} laser${lasers === 1 ? '' : 's'}, 10 eyewear items, long names, ${paper}`, async () => {
        const doc = generatedDocument({ lasers, eyewear: 10, longNames: true });
        expect(doc.content.input.eyewear).toHaveLength(10);
        const opts: RenderOptions = { paper, units: 'SI' };
        expect(pdfInfo(await renderEyewearSheet(doc, opts)).pages).toBe(1);
      }, 60_000);
});

describe('the pair that covers every beam comes first', () => {
  it('in the matrix and the use list, ahead of the shelf order', async () => {
    const pool = generatedDocument({ lasers: 10 });
    const shelf = pool.content.input.eyewear ?? [];
    const doc = pool.content.input.lasers
      .map((l) => benchDocument({ ...pool.content.input, lasers: [l] }))
      .find((d) => d.results.eyewearCoveringAll.length > 0 && d.results.eyewearCoveringAll[0] !== shelf[0]?.id);
    if (doc === undefined) throw new Error('no demo laser is covered by one pair other than the first on the shelf');
    const tag = doc.results.eyewearCoveringAll[0] as string;
    const text = layoutText(await renderEyewearSheet(doc, { paper: 'A4', units: 'SI' }));
    const matrix = text.slice(text.indexOf('Which eyewear protects against which beam'));
    const firstRow = /^\s*(EW-[A-Z])\b/m.exec(matrix.slice(matrix.indexOf('Eyewear') + 'Eyewear'.length))?.[1];
    expect(firstRow).toBe(tag);
    const use = text.slice(text.indexOf('Use and do not use'));
    expect(/(EW-[A-Z])\b/.exec(use)?.[1]).toBe(tag);
    expect(text).toContain('Covers every beam here:');
  }, 60_000);
});

describe('a full room: 10 lasers, 10 eyewear items, the pair that covers every beam last on the shelf', () => {
  // Invented item for the layout check: one filter over 180 nm to 11 µm, OD 10 and LB10 for every
  // mode, so it covers every beam of the generated room (the core says so below).
  const fullRange: EyewearSpec = {
    id: 'EW-Z',
    label: 'EW-Z (black frame, full-range filter)',
    od: [{ from_nm: 180, to_nm: 11000, od: 10 }],
    en207: [{ from_nm: 180, to_nm: 11000, modes: 'DIRM', scale: 10 }],
    visibleTransmission: 0.02,
  };
  function fullRoom() {
    const base = generatedDocument({ lasers: 10, eyewear: 9, longNames: true });
    const input = { ...base.content.input, eyewear: [...(base.content.input.eyewear ?? []), fullRange] };
    return { ...base, content: { ...base.content, input }, results: evaluateRoom(input) };
  }

  for (const paper of ['A4', 'Letter'] as const)
    it(`${paper}: one page, and EW-Z heads the matrix and the use list`, async () => {
      const doc = fullRoom();
      expect(doc.content.input.lasers).toHaveLength(10);
      expect(doc.content.input.eyewear).toHaveLength(10);
      expect(doc.results.eyewearCoveringAll).toEqual(['EW-Z']);
      const pdf = await renderEyewearSheet(doc, { paper, units: 'SI' });
      expect(pdfInfo(pdf).pages).toBe(1);
      const text = layoutText(pdf);
      const matrix = text.slice(text.indexOf('Which eyewear protects against which beam'));
      expect(/^\s*(EW-[A-Z])\b/m.exec(matrix.slice(matrix.indexOf('Eyewear') + 'Eyewear'.length))?.[1]).toBe('EW-Z');
      const use = text.slice(text.indexOf('Use and do not use'));
      expect(/(EW-[A-Z])\b/.exec(use)?.[1]).toBe('EW-Z');
      expect(text).toContain('Covers every beam here:');
    }, 60_000);
});
