// @vitest-environment node
/**
 * Provenance on paper (issue: printed documents an auditor accepts). All three documents of every
 * demo room (signed and draft) and of generated rooms (both rule sets, 1 to 20 lasers, long names,
 * every control accepted) are rendered by the real pdfmake and read back with pdftotext:
 *  - no internal source key, working-note reference, project file name or "from memory" wording;
 *  - the report lists every limit-table row its results use, each with a readable citation and a
 *    plain status ("checked against the published text" / "not yet checked ...").
 * Source of the rule: derived: SAFETY.md, "Sources and their status"; the wording list is in
 * test/support/internal-wording.ts.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import {
  documentInputFromAssessment,
  renderDoorNotice,
  renderEyewearSheet,
  renderReport,
  type DocumentInput,
} from '../../../electron/backend/pdf/index.js';
import { range, rowsUsed } from '../../../electron/backend/pdf/documents/report-rows.js';
import { citationLine } from '../../../core/provenance/citations.js';
import { INTERNAL_WORDING } from '../../support/internal-wording.js';
import { layoutText, pageTexts } from './pdf-tools.js';
import { generatedDocument } from './generated-rooms.js';

interface Printed {
  readonly name: string;
  readonly doc: DocumentInput;
  readonly report: string;
  /** The report in layout mode: a table line keeps its cells in order. */
  readonly reportLayout: string;
  readonly notice: string;
  readonly sheet: string;
}

let dir = '';
let store: RecordStore;
const printed: Printed[] = [];

async function print(name: string, doc: DocumentInput): Promise<Printed> {
  const opts = { paper: 'A4', units: 'SI' } as const;
  const [report, notice, sheet] = await Promise.all([renderReport(doc, opts), renderDoorNotice(doc, opts), renderEyewearSheet(doc, opts)]);
  return { name, doc, report: pageTexts(report).join('\n'), reportLayout: layoutText(report), notice: pageTexts(notice).join('\n'), sheet: pageTexts(sheet).join('\n') };
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'bw-provenance-'));
  store = await openRecordStore({ path: join(dir, 'demo.sqlite'), keyDir: join(dir, 'keys') });
  const site = await store.seedDemo();
  for (const room of await store.listRooms(site.id))
    for (const a of await store.listAssessments(room.id)) printed.push(await print(`demo ${room.code} (${a.status})`, await documentInputFromAssessment(store, a.id)));
  printed.push(await print('generated, 20 lasers, long names, every control, ICNIRP 2013', generatedDocument({ lasers: 20, longNames: true, allControls: true })));
  printed.push(await print('generated, 12 lasers, EU Directive', generatedDocument({ lasers: 12, ruleSet: 'eu2006' })));
}, 600_000);

afterAll(async () => {
  await store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

/** pdftotext joins wrapped lines with a space and drops the hyphen of a word broken at a line end. */
function squash(s: string): string {
  return s.replace(/[\s\u00ad-]+/g, '');
}

describe('no internal key or "from memory" wording on any document', () => {
  it('every document of the demo and of the generated rooms', () => {
    expect(printed.length).toBeGreaterThanOrEqual(6);
    const hits: string[] = [];
    for (const p of printed)
      for (const [kind, text] of [['report', p.report], ['door notice', p.notice], ['eyewear sheet', p.sheet]] as const)
        for (const re of INTERNAL_WORDING) {
          const m = re.exec(text);
          if (m) hits.push(`${p.name}, ${kind}: "${text.slice(Math.max(0, m.index - 60), m.index + 60)}"`);
        }
    expect(hits).toEqual([]);
  });
});

describe('every limit-table row used is cited with its status', () => {
  it('each report lists each row its results use, under its own citation and status', () => {
    // Signed documents only: the DRAFT watermark's letters fall between the table lines in poppler's text.
    const signedOnes = printed.filter((p) => p.doc.signature !== null);
    expect(signedOnes.length).toBeGreaterThanOrEqual(3);
    for (const p of signedOnes) {
      const rows = rowsUsed(p.doc);
      expect(rows.length, p.name).toBeGreaterThan(0);
      expect(p.report, p.name).toContain('Limit-table rows used');
      const flat = squash(p.reportLayout);
      const section = flat.slice(flat.indexOf(squash('Limit-table rows used')), flat.indexOf(squash('Appendix — derivations')) < 0 ? undefined : flat.lastIndexOf(squash('Sources of the derivations')));
      // every place a citation heading stands (a heading that is the start of a longer one is not counted there)
      const names = [...new Set(rows.map((r) => squash(citationLine({ text: r.citation, status: r.status }))))];
      const places: Array<{ h: string; at: number }> = [];
      for (const h of names)
        for (let at = section.indexOf(h); at >= 0; at = section.indexOf(h, at + 1))
          if (!names.some((longer) => longer.length > h.length && section.startsWith(longer, at))) places.push({ h, at });
      for (const h of names) expect(places.some((p) => p.h === h), `${p.name}: heading ${h}`).toBe(true);
      for (const r of rows) {
        const at = section.indexOf(squash(`${r.row.id} ${r.row.effect} ${range(r.row.band_nm[0], r.row.band_nm[1], 'nm')}`));
        expect(at, `${p.name}: row ${r.row.id}`).toBeGreaterThan(0);
        const own = places.filter((h) => h.at < at).sort((a, b) => b.at - a.at)[0]?.h;
        expect(own, `${p.name}: the citation and status printed above row ${r.row.id}`).toBe(squash(citationLine({ text: r.citation, status: r.status })));
      }
    }
  });
  it('a Directive row is cited by table and marked checked (Directive 2006/25/EC, Annex II, Table 2.2)', () => {
    const eu = printed.find((p) => p.doc.results.ruleSet === 'eu2006');
    expect(eu).toBeDefined();
    expect(squash(eu?.report ?? '')).toContain(squash('Directive 2006/25/EC, Annex II, Table 2.2'));
    expect(eu?.report).toContain('checked against the published text');
  });
});
