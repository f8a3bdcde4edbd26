// @vitest-environment node
/**
 * The room plan on paper: the demo room B2.14 (invented; assets/demo/demo-scenario.json) has a
 * plan. Its report carries the plan section with every finding the core gives, word for word, the
 * accepted controlled area and the scale; the door notice stays one page and marks the entrance it
 * is for; a room without a plan prints no plan section. Rendered by the real pdfmake from a real
 * record store, read back with poppler (pdftotext). The findings are the core's own (evaluateRoom
 * on the stored inputs); test/core/plan checks their geometry by hand.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateRoom } from '../../../core/index.js';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import { documentInputFromAssessment, renderDoorNotice, renderReport, type DocumentInput } from '../../../electron/backend/pdf/index.js';
import { doorNoticeDefinition } from '../../../electron/backend/pdf/documents/door-notice.js';
import { renderPdf } from '../../../electron/backend/pdf/runtime.js';
import { pageTexts, pdfInfo } from './pdf-tools.js';
import { planSvg } from '../../../electron/backend/pdf/plan/plan-svg.js';
import { documentTable } from '../../../electron/api/handlers/documents.js';
import type { ApiContext } from '../../../electron/api/context.js';

let dir = '';
let store: RecordStore;
const docs = new Map<string, DocumentInput>();
const squash = (s: string): string => s.replace(/[\s\u00ad-]+/g, '');
/** Text in the order it was drawn (pdftotext -raw): table cells stay whole instead of interleaving side by side. */
function drawnText(pdf: Buffer): string {
  const file = join(dir, 'out.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'bw-plan-docs-'));
  store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
  const site = await store.seedDemo();
  for (const room of await store.listRooms(site.id)) {
    const a = (await store.listAssessments(room.id))[0];
    if (a) docs.set(room.code, await documentInputFromAssessment(store, a.id));
  }
}, 120_000);

afterAll(async () => {
  await store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the room plan on paper (demo room B2.14)', () => {
  it('the report prints every finding of the plan as the core words it, and the accepted boundary and scale', async () => {
    const doc = docs.get('B2.14')!;
    const core = evaluateRoom(doc.content.input).plan!;
    expect(core.findings.length).toBeGreaterThan(3);
    const text = squash(drawnText(await renderReport(doc, { paper: 'A4', units: 'SI' })));
    expect(text).toContain(squash('Room plan and hazard zones'));
    for (const f of core.findings) {
      expect(text, f.text).toContain(squash(f.text));
      expect(text, f.suggestion).toContain(squash(f.suggestion));
    }
    expect(text).toContain(squash('accepted by Dr. Imre Calloway-Senn'));
    expect(text).toMatch(/drawntoscale1:\d+whenprintedat100%/);
  });

  it('the door notice stays one page and says "You are here" at the entrance it is for (first door by default)', async () => {
    const doc = docs.get('B2.14')!;
    const first = await renderDoorNotice(doc, { paper: 'A4', units: 'SI' });
    expect(pdfInfo(first).pages).toBe(1);
    const text = squash(pageTexts(first).join(' '));
    expect(text).toContain(squash('You are here: door D1 corridor'));
    expect(text).toContain(squash('Hazard zones shaded; laser controlled area dash-dot.'));
  });

  it('the plan on the door notice is drawn large enough to read at the door: over 140 pt (49 mm) wide on A4 and 110 pt (39 mm) on Letter at the level the notice is set, its words 7.5 pt or more (the earlier small plan: 108 pt, 5.5 pt words)', async () => {
    const doc = docs.get('B2.14')!;
    for (const [paper, least] of [['A4', 140], ['Letter', 110]] as const) {
      // The level the notice is set at: the first whose document is one page (as renderDoorNotice does).
      let fit = 0;
      while (pdfInfo(await renderPdf(doorNoticeDefinition(doc, { paper, units: 'SI' }, fit))).pages > 1) fit++;
      const svgs: Array<{ svg: string; width: number }> = [];
      const walk = (node: unknown): void => {
        if (Array.isArray(node)) node.forEach(walk);
        else if (node && typeof node === 'object') {
          const o = node as Record<string, unknown>;
          if (typeof o.svg === 'string' && o.svg.includes('You are here')) svgs.push({ svg: o.svg, width: Number(/width="([\d.]+)"/.exec(o.svg)?.[1]) });
          Object.values(o).forEach(walk);
        }
      };
      walk(doorNoticeDefinition(doc, { paper, units: 'SI' }, fit).content);
      expect(svgs, paper).toHaveLength(1);
      expect(svgs[0]!.width, `${paper} at level ${fit}`).toBeGreaterThan(least);
      const sizes = [...svgs[0]!.svg.matchAll(/font-size="([\d.]+)"/g)].map((m) => Number(m[1]));
      expect(Math.min(...sizes), paper).toBeGreaterThanOrEqual(7.5);
    }
  });

  it('the officer chooses the entrance on the print screen: the API prints the notice for door D2, and refuses a door not on the plan', async () => {
    const room = (await store.listRooms((await store.listSites())[0]!.id)).find((r) => r.code === 'B2.14')!;
    const assessmentId = (await store.listAssessments(room.id))[0]!.id;
    const ctx: ApiContext = { shell: 'loopback', version: 'test', databasePath: join(dir, 'demo.sqlite'), store };
    const op = documentTable['document-render'];
    const file = await op.run(op.input.parse({ kind: 'door-notice', assessmentId, paper: 'Letter', units: 'SI', entranceId: 'D2' }), ctx);
    const pdf = Buffer.from(file.base64, 'base64');
    expect(pdfInfo(pdf).pages).toBe(1);
    expect(squash(pageTexts(pdf).join(' '))).toContain(squash('You are here: door D2 to B2.16'));
    await expect(op.run(op.input.parse({ kind: 'door-notice', assessmentId, paper: 'A4', units: 'SI', entranceId: 'D9' }), ctx)).rejects.toThrow(/not a door on the room plan/);
  });

  it('"You are here" on the small plan lies outside the room, beside the dot (south door D1 and east door D2 of B2.14)', () => {
    // The drawing as it goes into the notice (108 pt wide, as door-notice.ts sets it): the label's box
    // (turned upright beside a north–south wall) must not overlap the room outline's box (ours: words never cover the room).
    const doc = docs.get('B2.14')!;
    const plan = doc.content.input.plan!;
    for (const entranceId of ['D1', 'D2']) {
      const { svg } = planSvg(plan, doc.results.plan, { maxWidth: 108, maxHeight: 110, compact: true, entranceId, laserNames: new Map() });
      const room = /<polygon points="([^"]+)" fill="none" stroke="#222222"/.exec(svg)![1]!.split(' ').map((q) => q.split(',').map(Number) as [number, number]);
      const [rx0, rx1, ry0, ry1] = [Math.min(...room.map((q) => q[0])), Math.max(...room.map((q) => q[0])), Math.min(...room.map((q) => q[1])), Math.max(...room.map((q) => q[1]))];
      const m = /<g transform="translate\(([\d.]+) ([\d.]+)\)( rotate\(-90\))?"><rect x="[-\d.]+" y="[-\d.]+" width="([\d.]+)" height="([\d.]+)"/.exec(svg);
      expect(m, entranceId).not.toBeNull();
      const [x, y, upright, w, h] = [Number(m![1]), Number(m![2]), m![3] !== undefined, Number(m![4]), Number(m![5])];
      const [hw, hh] = upright ? [h / 2, w / 2] : [w / 2, h / 2];
      const apart = x + hw <= rx0 || x - hw >= rx1 || y + hh <= ry0 || y - hh >= ry1;
      expect(apart, `${entranceId}: label at (${x}, ${y}) against the room ${rx0}–${rx1} × ${ry0}–${ry1}`).toBe(true);
      expect(upright).toBe(entranceId === 'D2');
    }
  });

  it('a room without a plan prints no plan section', async () => {
    const text = pageTexts(await renderReport(docs.get('B2.16')!, { paper: 'A4', units: 'SI' })).join(' ');
    expect(text).not.toContain('Room plan and hazard zones');
  });
});
