// @vitest-environment node
/**
 * A beam dump narrower than the beam, on paper: demo room B2.14 (invented) with a 12 mm aperture
 * typed for beam dump BD2 of the second-harmonic output. The report prints the core's finding word
 * for word (both widths), and the drawn plan carries the dashed line of the part that passes, from the
 * dump to where its zone ends. Rendered by the real pdfmake from a real record store, read back with
 * poppler (pdftotext); the widths themselves are checked by hand in test/core/plan/plan-dump-aperture.test.ts.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateRoom } from '../../../core/index.js';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import { documentInputFromAssessment, renderReport, type DocumentInput } from '../../../electron/backend/pdf/index.js';
import { planSvg } from '../../../electron/backend/pdf/plan/plan-svg.js';

let dir = '';
let store: RecordStore;
let doc: DocumentInput;
const squash = (s: string): string => s.replace(/[\s\u00ad-]+/g, '');

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'bw-dump-report-'));
  store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
  const site = await store.seedDemo();
  const room = (await store.listRooms(site.id)).find((r) => r.code === 'B2.14')!;
  const a = (await store.listAssessments(room.id))[0]!;
  const content = (await store.getAssessment(a.id)).current.content;
  const plan = content.input.plan!;
  const paths = plan.paths.map((p) => ({ ...p, elements: p.elements.map((e) => (e.label === 'BD2' ? { ...e, aperture_m: 0.012 } : e)) }));
  await store.saveAssessment(a.id, { ...content, input: { ...content.input, plan: { ...plan, paths } } });
  doc = await documentInputFromAssessment(store, a.id);
}, 120_000);

afterAll(async () => {
  await store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('a beam dump narrower than the beam in the report (demo room B2.14, BD2 typed 12 mm)', () => {
  it('prints the finding and its suggestion as the core words them', async () => {
    const finding = evaluateRoom(doc.content.input).plan!.findings.find((f) => f.kind === 'wider-than-dump');
    expect(finding?.text).toMatch(/^The beam of Second harmonic 400 nm is wider than beam dump BD2 where it meets it, 3\.2 m along its path \(\d/);
    const file = join(dir, 'report.pdf');
    writeFileSync(file, await renderReport(doc, { paper: 'A4', units: 'SI' }));
    const text = squash(execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }));
    expect(text).toContain(squash(finding!.text));
    expect(text).toContain(squash(finding!.suggestion));
  });

  it('draws the part that passes as a dashed beam line from the dump onward (east, along y = 4.2 m)', () => {
    const result = evaluateRoom(doc.content.input).plan!;
    const laserId = doc.content.input.plan!.paths.find((p) => p.elements.some((e) => e.label === 'BD2'))!.laserId;
    const run = result.runs.find((r) => r.laserId === laserId)!;
    // The run goes on past the dump at (4.4, 4.2) to the east wall, x = 8 m (the room is 8 m wide).
    expect(run.points.map((q) => [Number(q.x_m), Number(q.y_m)])).toEqual([[1.2, 4.2], [4.4, 4.2], [8, 4.2]]);
    const svg = planSvg(doc.content.input.plan!, result, { maxWidth: 500, maxHeight: 500, laserNames: new Map() }).svg;
    const without = planSvg(doc.content.input.plan!, { ...result, runs: result.runs.filter((r) => r.laserId !== laserId) }, { maxWidth: 500, maxHeight: 500, laserNames: new Map() }).svg;
    const dashed = (s: string) => (s.match(/stroke-dasharray="3 2"/g) ?? []).length;
    expect(dashed(svg)).toBe(dashed(without) + 1);
  });
});
