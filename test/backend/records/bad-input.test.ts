/**
 * Bad input at the import boundary: malformed JSON, wrong format or version, unknown fields,
 * out-of-range numbers, broken references, files altered after signing. Each is refused with a
 * message naming the path and the problem, and the database is left exactly as it was (import is
 * one transaction; validation happens before it). Ranges: wavelengths 180 nm - 1 mm are the span
 * of the ICNIRP 2013 and EU 2006/25/EC limit tables; OD at most 20 and scale numbers 1-10 (EN 207).
 */
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RecordError, type ExportDocument, type RecordStore } from '../../../electron/backend/records/index.js';
import { makeSigner, openTemp, registerRoom, snapshot, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let source: RecordStore;
let target: RecordStore;
let targetPath: string;
let doc: ExportDocument;

beforeAll(() => {
  t = tempDir('bw-bad-');
  source = openTemp(t.dir, 'source.sqlite');
  const { site, room } = registerRoom(source, 'A0.07');
  const c = source.newAssessmentContent(room.id);
  const a = source.createAssessment({
    roomId: room.id,
    content: { ...c, controls: [{ category: 'engineering', measure: 'Fibre connector shutters', decision: 'accepted', implementation: 'in-place' }] },
  });
  source.signAssessment(a.id, makeSigner(source).signOff());
  doc = source.exportSite(site.id);
  // The target already holds other records, which must survive every failed import untouched.
  targetPath = join(t.dir, 'target.sqlite');
  target = openTemp(t.dir, 'target.sqlite');
  registerRoom(target, 'C1.03');
});
afterAll(() => {
  source.close();
  target.close();
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

function importError(input: unknown): RecordError {
  try {
    target.importDocument(input);
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
    ['newer export version', () => edited(['version'], 2), 'version', /^The export file is format version 2, written by a newer Beamwarden; this Beamwarden reads export format version 1\. Update Beamwarden to import it\.$/],
    ['older export version', () => edited(['version'], 0), 'version', /^The export file is format version 0, older than any Beamwarden release wrote; this Beamwarden reads export format version 1\.$/],
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

  it.each(cases)('%s', (_name, input, path, problem) => {
    const before = snapshot(targetPath);
    const err = importError(input());
    expect(err.code).toBe('invalid');
    expect(err.message).toMatch(/nothing was changed/i);
    const issue = err.issues.find((i) => i.path === path);
    expect(issue, `issues: ${JSON.stringify(err.issues)}`).toBeDefined();
    expect(issue?.problem).toMatch(problem);
    expect(snapshot(targetPath)).toBe(before);
  });

  it('the unchanged document imports (the cases above fail for their own reason only)', () => {
    const other = openTemp(t.dir, `fresh-${Date.now()}.sqlite`);
    try {
      expect(other.importDocument(JSON.stringify(doc)).revisions).toBe(1);
    } finally {
      other.close();
    }
  });
});

describe('store methods validate their arguments', () => {
  it('unknown field in assessment content', () => {
    const { room } = registerRoom(target, 'B2.16');
    const c = target.newAssessmentContent(room.id);
    const before = snapshot(targetPath);
    expect(() => target.createAssessment({ roomId: room.id, content: { ...c, colour: 'red' } as typeof c })).toThrow(/Assessment content is not valid: \(document\): unknown field\(s\) "colour"/);
    expect(() =>
      target.createAssessment({ roomId: room.id, content: { ...c, eyewearChosen: [{ eyewearTag: 'EW-Z', beamIds: [], note: '' }] } }),
    ).toThrow(/eyewearChosen\[0\]\.eyewearTag: no eyewear "EW-Z"/);
    expect(snapshot(targetPath)).toBe(before);
  });

  it('duplicate room code in a site', () => {
    const site = target.createSite({ name: 'Invented Annex' });
    target.createRoom({ siteId: site.id, code: 'X1' });
    expect(() => target.createRoom({ siteId: site.id, code: 'X1' })).toThrow(/Room X1: already exists/);
  });

  it('empty sign-off fields', () => {
    const { room } = registerRoom(target, 'A0.07');
    const a = target.createAssessment({ roomId: room.id, content: target.newAssessmentContent(room.id) });
    const signer = makeSigner(target, 'A. Officer');
    expect(() => target.signAssessment(a.id, { ...signer.signOff(), statement: ' ' })).toThrow(/Sign-off is not valid: [Ss]tatement: must not be empty/);
  });
});

describe('import conflicts', () => {
  it('two databases that revised the same assessment separately: the signed revision comes in, our draft is kept beside it', () => {
    const t2 = tempDir('bw-conflict-');
    const a = openTemp(t2.dir, 'a.sqlite');
    const b = openTemp(t2.dir, 'b.sqlite');
    try {
      const { site, room } = registerRoom(a, 'A0.07');
      const made = a.createAssessment({ roomId: room.id, content: a.newAssessmentContent(room.id) });
      const officer = makeSigner(a, 'A. Officer');
      a.signAssessment(made.id, officer.signOff());
      b.importDocument(a.exportSite(site.id));
      // Both sides start revision 2 of the same assessment on their own.
      a.saveAssessment(made.id, { ...a.getAssessment(made.id).current.content, notes: 'revised in A' });
      b.saveAssessment(made.id, { ...b.getAssessment(made.id).current.content, notes: 'revised in B' });
      a.signAssessment(made.id, officer.signOff());
      const summary = b.importDocument(a.exportAssessment(made.id));
      expect(b.getAssessment(made.id).current).toMatchObject({ revisionNo: 2, status: 'signed' });
      expect(summary.keptDrafts).toHaveLength(1);
      expect(b.getAssessment(summary.keptDrafts[0]?.keptAs ?? '').current.content.notes).toBe('revised in B');
      expect(b.listAssessments(room.id)).toHaveLength(2);
    } finally {
      a.close();
      b.close();
      t2.cleanup();
    }
  });
});
