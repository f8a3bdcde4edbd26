/**
 * Co-signature (schema 7): a responsible person (lab head) countersigns a signed revision with their
 * own personal key; verify reports each signature; changing a co-signature, moving it to another
 * revision or signing without a trusted key is detected or refused. Real SQLite files and real keys
 * in temporary folders (no mocks); invented people and the invented demo room A0.07.
 */
import Database from 'better-sqlite3';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { MIGRATIONS } from '../../../electron/backend/records/migrations/index.js';
import { makeSigner, openTemp, registerRoom, snapshot, STATEMENT, tempDir } from './helpers.js';

const CO_STATEMENT = 'As head of the laboratory I have read this assessment and accept the controls listed.';

let t: ReturnType<typeof tempDir> | null = null;
let store: RecordStore | null = null;
afterEach(async () => {
  await store?.close();
  t?.cleanup();
  store = null;
  t = null;
});

/** A signed assessment of A0.07 by the officer, and a lab head whose key the officer endorsed. */
async function setUp() {
  t = tempDir();
  const s = await openTemp(t.dir);
  store = s;
  const { room } = await registerRoom(s);
  const officer = await makeSigner(s, 'Dr. Imre Calloway-Senn');
  const head = await makeSigner(s, 'Prof. Oona Brightwater-Hale');
  const a = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
  await s.signAssessment(a.id, officer.signOff(STATEMENT));
  const revisionId = (await s.getAssessment(a.id)).current.id;
  return { s, officer, head, assessmentId: a.id, revisionId, dbPath: join(t.dir, 'records.sqlite') };
}

function trigger(name: string): string {
  for (const m of MIGRATIONS) {
    const match = new RegExp(`CREATE TRIGGER ${name}\\b[\\s\\S]*?\\bEND;`).exec(m.sql);
    if (match) return match[0];
  }
  throw new Error(`no trigger ${name}`);
}

describe('countersigning a signed revision', () => {
  it('the lab head countersigns; verify reports both signatures, each valid and trusted', async () => {
    const { s, officer, head, assessmentId, revisionId } = await setUp();
    const co = await s.countersign({ revisionId, personId: head.person.id, passphrase: head.passphrase, statement: CO_STATEMENT });
    expect(co.name).toBe('Prof. Oona Brightwater-Hale');
    const report = await s.verify(assessmentId);
    expect(report.ok).toBe(true);
    expect(report.signer?.name).toBe(officer.person.name);
    expect(report.coSignatures.map((c) => [c.name, c.ok, c.signatureValid, c.keyTrusted, c.coversThisSignature])).toEqual([['Prof. Oona Brightwater-Hale', true, true, true, true]]);
    expect(report.checks.filter((c) => c.check === 'co-signature').map((c) => c.ok)).toEqual([true]);
    expect(await s.listCoSignatures(revisionId)).toHaveLength(1);
  });

  // [case, what is tried, expected refusal]
  const REFUSALS: ReadonlyArray<readonly [string, (x: Awaited<ReturnType<typeof setUp>>) => Promise<unknown>, RegExp]> = [
    ['the main signer countersigns', async (x) => x.s.countersign({ revisionId: x.revisionId, personId: x.officer.person.id, passphrase: x.officer.passphrase, statement: CO_STATEMENT }), /must come from another person/],
    ['a wrong passphrase', async (x) => x.s.countersign({ revisionId: x.revisionId, personId: x.head.person.id, passphrase: 'not the passphrase', statement: CO_STATEMENT }), /passphrase is not correct/],
    [
      'a draft revision',
      async (x) => {
        const draft = await x.s.saveAssessment(x.assessmentId, { ...(await x.s.getAssessment(x.assessmentId)).current.content, notes: 'changed' });
        await x.s.countersign({ revisionId: draft.current.id, personId: x.head.person.id, passphrase: x.head.passphrase, statement: CO_STATEMENT });
      },
      /only a signed revision can be countersigned/,
    ],
    [
      'a key not on the trust list',
      async (x) => {
        const p = await x.s.createPerson({ name: 'Mr. Ulric Fenwhistle', role: 'Technician' });
        await x.s.createPersonKey({ personId: p.id, passphrase: 'an unendorsed passphrase', passphraseAgain: 'an unendorsed passphrase' });
        await x.s.countersign({ revisionId: x.revisionId, personId: p.id, passphrase: 'an unendorsed passphrase', statement: CO_STATEMENT });
      },
      /not admitted to this installation's trust list/,
    ],
  ];
  it.each(REFUSALS)('refused: %s (nothing stored)', async (_name, attempt, refusal) => {
    const x = await setUp();
    await expect(attempt(x)).rejects.toThrow(refusal);
    expect(await x.s.listCoSignatures(x.revisionId)).toEqual([]);
  });

  it('the same person cannot countersign twice; the database refuses to change or delete a co-signature', async () => {
    const x = await setUp();
    await x.s.countersign({ revisionId: x.revisionId, personId: x.head.person.id, passphrase: x.head.passphrase, statement: CO_STATEMENT });
    const before = snapshot(x.dbPath);
    await expect(x.s.countersign({ revisionId: x.revisionId, personId: x.head.person.id, passphrase: x.head.passphrase, statement: CO_STATEMENT })).rejects.toThrow(/already countersigned/);
    const raw = new Database(x.dbPath);
    try {
      expect(() => raw.prepare("UPDATE co_signature SET statement = 'x'").run()).toThrow(/co-signature cannot be changed/);
      expect(() => raw.prepare('DELETE FROM co_signature').run()).toThrow(/co-signature cannot be deleted/);
    } finally {
      raw.close();
    }
    expect(snapshot(x.dbPath)).toBe(before);
  });
});

describe('attacks on a co-signature are reported by verify', () => {
  // [attack, SQL with the triggers dropped and put back exactly, expected finding]
  const ATTACKS: ReadonlyArray<readonly [string, string, RegExp]> = [
    ['the co-signer\'s statement rewritten', "UPDATE co_signature SET statement = 'I approve without reading.'", /Co-signature by .* is not valid for what it records/],
    ['the co-signature given another name', "UPDATE co_signature SET name = 'Dr. Someone Else'", /is not valid for what it records/],
    ['the co-signature pointed at another main signature', "UPDATE co_signature SET signed_link = '0000000000000000000000000000000000000000000000000000000000000000'", /is not valid for what it records/],
  ];
  it.each(ATTACKS)('%s', async (_name, sql, finding) => {
    const x = await setUp();
    await x.s.countersign({ revisionId: x.revisionId, personId: x.head.person.id, passphrase: x.head.passphrase, statement: CO_STATEMENT });
    await x.s.close();
    store = null;
    const raw = new Database(x.dbPath);
    try {
      raw.exec('DROP TRIGGER co_signature_no_update');
      raw.exec(sql);
      raw.exec(trigger('co_signature_no_update'));
    } finally {
      raw.close();
    }
    const again = await openTemp(t?.dir ?? '');
    store = again;
    const report = await again.verify(x.assessmentId);
    expect(report.ok).toBe(false);
    expect(report.checks.find((c) => c.check === 'co-signature')?.ok).toBe(false);
    expect(report.findings.join(' ')).toMatch(finding);
  });

  it('a valid co-signature copied onto another signed revision does not cover it', async () => {
    const x = await setUp();
    await x.s.countersign({ revisionId: x.revisionId, personId: x.head.person.id, passphrase: x.head.passphrase, statement: CO_STATEMENT });
    const draft = await x.s.saveAssessment(x.assessmentId, { ...(await x.s.getAssessment(x.assessmentId)).current.content, notes: 'revision 2' });
    await x.s.signAssessment(x.assessmentId, x.officer.signOff(STATEMENT));
    await x.s.close();
    store = null;
    const raw = new Database(x.dbPath);
    try {
      raw.prepare('INSERT INTO co_signature SELECT ?, person_id, name, role, signed_at, statement, signed_link, fingerprint, key_id, trust_anchor, signature FROM co_signature WHERE revision_id = ?').run(draft.current.id, x.revisionId);
    } finally {
      raw.close();
    }
    const again = await openTemp(t?.dir ?? '');
    store = again;
    const report = await again.verify(x.assessmentId);
    expect(report.revisionNo).toBe(2);
    expect(report.ok).toBe(false);
    expect(report.findings.join(' ')).toMatch(/Co-signature by Prof\. Oona Brightwater-Hale .* not valid for what it records/);
  });
});

describe('npm run verify names the co-signer', () => {
  it('one line per assessment: signed by the officer; co-signed by the lab head', async () => {
    const x = await setUp();
    await x.s.countersign({ revisionId: x.revisionId, personId: x.head.person.id, passphrase: x.head.passphrase, statement: CO_STATEMENT });
    await x.s.close();
    store = null;
    const { runVerify } = await import('../../../electron/cli/verify.js');
    const lines: string[] = [];
    const status = await runVerify(['--db', x.dbPath, '--key-dir', join(t?.dir ?? '', 'keys'), '--all'], (l) => lines.push(l));
    expect(status).toBe(0);
    expect(lines.find((l) => l.startsWith('ok'))).toMatch(/signed by Dr\. Imre Calloway-Senn on .*; co-signed by Prof\. Oona Brightwater-Hale on \d{4}-\d{2}-\d{2}, key /);
  });
});
