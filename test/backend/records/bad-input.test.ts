/**
 * Bad input at the import boundary: malformed JSON, wrong format or version, unknown fields,
 * out-of-range numbers, broken references, files altered after signing. Each is refused with a
 * message naming the path and the problem, and the database is left exactly as it was (import is
 * one transaction; validation happens before it). Ranges: wavelengths 180 nm - 1 mm are the span
 * of the ICNIRP 2013 and EU 2006/25/EC limit tables; OD at most 20 and scale numbers 1-10 (EN 207).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RecordError, type ExportDocument, type RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, snapshotOn, tempDir } from './helpers.js';
import { forEachEngine } from './engines.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let source: RecordStore;
  let target: RecordStore;
  let doc: ExportDocument;

  beforeAll(async () => {
    t = tempDir('bw-bad-');
    source = await openTemp(t.dir, 'source.sqlite', engine);
    const { site, room } = await registerRoom(source, 'A0.07');
    const c = await source.newAssessmentContent(room.id);
    const a = await source.createAssessment({
      roomId: room.id,
      content: { ...c, controls: [{ category: 'engineering', measure: 'Fibre connector shutters', decision: 'accepted', implementation: 'in-place' }] },
    });
    await source.signAssessment(a.id, (await makeSigner(source)).signOff());
    doc = await source.exportSite(site.id);
    // The target already holds other records, which must survive every failed import untouched.
    target = await openTemp(t.dir, 'target.sqlite', engine);
    await registerRoom(target, 'C1.03');
  });
  afterAll(async () => {
    await source.close();
    await target.close();
    t.cleanup();
  });

  const REMOVE = Symbol('remove');
  type Key = string | number;

  /** A deep copy of the valid document with the value at `path` replaced (or removed). */
  function edited(path: readonly Key[], value: unknown): unknown {
    const copy: unknown = JSON.parse(JSON.stringify(doc));
    let node: unknown = copy;
    for (const key of path.slice(0, -1)) node = (node as Record<Key, unknown>)[key];
    const last = path[path.length - 1] ?? '';
    const parent = node as Record<Key, unknown>;
    if (value === REMOVE) delete parent[last];
    else parent[last] = value;
    return copy;
  }

  async function importError(input: unknown): Promise<RecordError> {
    try {
      await target.importDocument(input);
    } catch (e) {
      if (e instanceof RecordError) return e;
      throw e;
    }
    throw new Error('import was accepted');
  }

  describe('export document import refuses bad input and changes nothing', () => {
    const cases: Array<[name: string, input: () => unknown, path: string, problem: RegExp]> = [
      ['malformed JSON', () => '{"format": "beamwarden-export", "version": 1,', '(document)', /not valid JSON/],
      ['not an object', () => '[1, 2, 3]', '(document)', /JSON object with "format"/],
      ['another format', () => edited(['format'], 'spreadsheet-dump'), 'format', /must be "beamwarden-export"/],
      ['newer export version', () => edited(['version'], 3), 'version', /^The export file is format version 3, written by a newer Beamwarden; this Beamwarden reads export format versions 1 and 2\. Update Beamwarden to import it\.$/],
      ['older export version', () => edited(['version'], 0), 'version', /^The export file is format version 0, older than any Beamwarden release wrote; this Beamwarden reads export format versions 1 and 2\.$/],
      ['no export version', () => edited(['version'], REMOVE), 'version', /^The export file does not say which format version it is/],
      ['version as a string', () => edited(['version'], '1'), 'version', /^The export file gives its format version as "1", which is not a version number Beamwarden writes/],
      ['unknown top-level field', () => edited(['comment'], 'hi'), '(document)', /unknown field\(s\) "comment"/],
      ['unknown nested field', () => edited(['rooms', 0, 'colour'], 'blue'), 'rooms[0]', /unknown field\(s\) "colour"/],
      ['missing field', () => edited(['rooms', 0, 'code'], REMOVE), 'rooms[0].code', /expected string/i],
      ['wavelength below the tables', () => edited(['installations', 0, 'laser', 'beams', 0, 'wavelength_nm'], 50), 'installations[0].laser.beams[0].wavelength_nm', /from 180 nm to 1000000 nm/],
      ['negative power', () => edited(['installations', 0, 'laser', 'beams', 0, 'emission', 'power_W'], -1), 'installations[0].laser.beams[0].emission.power_W', /more than 0 W/],
      ['optical density out of range', () => edited(['eyewear', 0, 'spec', 'od', 0, 'od'], 25), 'eyewear[0].spec.od[0].od', /from 0 to 20/],
      ['scale number out of range', () => edited(['eyewear', 0, 'spec', 'en207', 0, 'scale'], 11), 'eyewear[0].spec.en207[0].scale', /whole number from LB1 to LB10/],
      ['review date in another format', () => edited(['assessments', 0, 'revisions', 0, 'content', 'reviewBy'], '31/12/2027'), 'assessments[0].revisions[0].content.reviewBy', /calendar date/],
      [
        'rejected control without a reason',
        () => edited(['assessments', 0, 'revisions', 0, 'content', 'controls', 0, 'decision'], 'rejected'),
        'assessments[0].revisions[0].content.controls[0].reason',
        /needs a reason/,
      ],
      ['reference to a missing site', () => edited(['rooms', 0, 'siteId'], 'no-such-site'), 'rooms[0].siteId', /neither in the file nor in this database/],
      [
        'signed content edited in the file',
        () => edited(['assessments', 0, 'revisions', 0, 'content', 'notes'], 'quietly changed'),
        'assessments[0].revisions[0].signature.fingerprint',
        /changed after signing/,
      ],
      [
        'signer edited in the file',
        () => edited(['assessments', 0, 'revisions', 0, 'signature', 'name'], 'Someone Else'),
        'assessments[0].revisions[0].signature.signature',
        /signature is not valid/,
      ],
      [
        'revision numbering broken',
        () => edited(['assessments', 0, 'revisions', 0, 'revisionNo'], 3),
        'assessments[0].revisions[0].revisionNo',
        /must be 1/,
      ],
    ];

    it.each(cases)('%s', async (_name, input, path, problem) => {
      const before = await snapshotOn(engine, t.dir, 'target.sqlite');
      const err = await importError(input());
      expect(err.code).toBe('invalid');
      expect(err.message).toMatch(/nothing was changed/i);
      const issue = err.issues.find((i) => i.path === path);
      expect(issue, `issues: ${JSON.stringify(err.issues)}`).toBeDefined();
      expect(issue?.problem).toMatch(problem);
      expect(await snapshotOn(engine, t.dir, 'target.sqlite')).toBe(before);
    });

    it('the unchanged document imports (the cases above fail for their own reason only)', async () => {
      const other = await openTemp(t.dir, `fresh-${Date.now()}.sqlite`, engine);
      try {
        expect((await other.importDocument(JSON.stringify(doc))).revisions).toBe(1);
      } finally {
        await other.close();
      }
    });
  });

  describe('store methods validate their arguments', () => {
    it('unknown field in assessment content', async () => {
      const { room } = await registerRoom(target, 'B2.16');
      const c = await target.newAssessmentContent(room.id);
      const before = await snapshotOn(engine, t.dir, 'target.sqlite');
      await expect(target.createAssessment({ roomId: room.id, content: { ...c, colour: 'red' } as typeof c })).rejects.toThrow(/Assessment content is not valid: \(document\): unknown field\(s\) "colour"/);
      await expect(
        target.createAssessment({ roomId: room.id, content: { ...c, eyewearChosen: [{ eyewearTag: 'EW-Z', beamIds: [], note: '' }] } }),
      ).rejects.toThrow(/eyewearChosen\[0\]\.eyewearTag: no eyewear "EW-Z"/);
      expect(await snapshotOn(engine, t.dir, 'target.sqlite')).toBe(before);
    });

    it('duplicate room code in a site', async () => {
      const site = await target.createSite({ name: 'Invented Annex' });
      await target.createRoom({ siteId: site.id, code: 'X1' });
      await expect(target.createRoom({ siteId: site.id, code: 'X1' })).rejects.toThrow(/Room X1: already exists/);
    });

    it('empty sign-off fields', async () => {
      const { room } = await registerRoom(target, 'A0.07');
      const a = await target.createAssessment({ roomId: room.id, content: await target.newAssessmentContent(room.id) });
      const signer = await makeSigner(target, 'A. Officer');
      await expect(target.signAssessment(a.id, { ...signer.signOff(), statement: ' ' })).rejects.toThrow(/Sign-off is not valid: [Ss]tatement: must not be empty/);
    });
  });

  describe('import conflicts', () => {
    it('two databases that revised the same assessment separately: the signed revision comes in, our draft is kept beside it', async () => {
      const t2 = tempDir('bw-conflict-');
      const a = await openTemp(t2.dir, 'a.sqlite', engine);
      const b = await openTemp(t2.dir, 'b.sqlite', engine);
      try {
        const { site, room } = await registerRoom(a, 'A0.07');
        const made = await a.createAssessment({ roomId: room.id, content: await a.newAssessmentContent(room.id) });
        const officer = await makeSigner(a, 'A. Officer');
        await a.signAssessment(made.id, officer.signOff());
        await b.importDocument(await a.exportSite(site.id));
        // Both sides start revision 2 of the same assessment on their own.
        await a.saveAssessment(made.id, { ...(await a.getAssessment(made.id)).current.content, notes: 'revised in A' });
        await b.saveAssessment(made.id, { ...(await b.getAssessment(made.id)).current.content, notes: 'revised in B' });
        await a.signAssessment(made.id, officer.signOff());
        const summary = await b.importDocument(await a.exportAssessment(made.id));
        expect((await b.getAssessment(made.id)).current).toMatchObject({ revisionNo: 2, status: 'signed' });
        expect(summary.keptDrafts).toHaveLength(1);
        expect((await b.getAssessment(summary.keptDrafts[0]?.keptAs ?? '')).current.content.notes).toBe('revised in B');
        expect(await b.listAssessments(room.id)).toHaveLength(2);
      } finally {
        await a.close();
        await b.close();
        t2.cleanup();
      }
    });
  });
});
