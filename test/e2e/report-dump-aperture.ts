/**
 * The report of demo room B2.14 with a 12 mm aperture typed for beam dump BD2, written for a person to
 * look at (not part of `npm test`):
 *   tsx test/e2e/report-dump-aperture.ts -> test/artifacts/pdf/dump-aperture/report.pdf and page PNGs
 * Invented demo site. The plan pages are found by their heading and rendered with pdftoppm.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { openRecordStore } from '../../electron/backend/records/index.js';
import { documentInputFromAssessment, renderReport } from '../../electron/backend/pdf/index.js';
import { REPO } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'pdf', 'dump-aperture');

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const dir = mkdtempSync(path.join(tmpdir(), 'bw-dump-report-'));
  const store = await openRecordStore({ path: path.join(dir, 'demo.sqlite'), keyDir: path.join(dir, 'keys') });
  try {
    const site = await store.seedDemo();
    const room = (await store.listRooms(site.id)).find((r) => r.code === 'B2.14');
    const a = room && (await store.listAssessments(room.id))[0];
    if (!a) throw new Error('demo room B2.14 has no assessment');
    const content = (await store.getAssessment(a.id)).current.content;
    const plan = content.input.plan;
    if (!plan) throw new Error('demo room B2.14 has no plan');
    const paths = plan.paths.map((p) => ({ ...p, elements: p.elements.map((e) => (e.label === 'BD2' ? { ...e, aperture_m: 0.012 } : e)) }));
    await store.saveAssessment(a.id, { ...content, input: { ...content.input, plan: { ...plan, paths } } });
    const pdf = await renderReport(await documentInputFromAssessment(store, a.id), { paper: 'A4', units: 'SI' });
    const file = path.join(OUT, 'report.pdf');
    writeFileSync(file, pdf);
    const pages = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).split('\f');
    const planPages = pages.map((t, i) => (/Room plan and hazard zones|wider than beam dump/.test(t) ? i + 1 : 0)).filter((n) => n > 0);
    for (const n of planPages) {
      execFileSync('pdftoppm', ['-png', '-r', '80', '-f', String(n), '-l', String(n), file, path.join(OUT, `page`)]);
      process.stdout.write(`page ${n}\n`);
    }
  } finally {
    await store.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

void main();
