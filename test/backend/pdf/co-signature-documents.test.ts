// @vitest-environment node
/**
 * Printed documents name every signer (issue 10 item 7): after a lab head countersigns the signed
 * revision, the report's status line and sign-off table and the door notice name both; a
 * co-signature whose key is not on the trust list prints as UNVERIFIED CO-SIGNATURE. Real store,
 * real keys, real pdfmake read back with poppler (pdftotext); invented people, demo room A0.07.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore, type RecordStore } from '../../../electron/backend/records/index.js';
import { documentInputFromAssessment, renderDoorNotice, renderReport } from '../../../electron/backend/pdf/index.js';
import { pageTexts } from './pdf-tools.js';
import { makeSigner, registerRoom, STATEMENT } from '../records/helpers.js';

let dir = '';
let store: RecordStore | null = null;
let assessmentId = '';
const squash = (s: string): string => s.replace(/[\s\u00ad-]+/g, '');

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'bw-cosign-pdf-'));
  const s = await openRecordStore({ path: join(dir, 'records.sqlite'), keyDir: join(dir, 'keys') });
  store = s;
  const { room } = await registerRoom(s);
  const officer = await makeSigner(s, 'Dr. Imre Calloway-Senn');
  const head = await makeSigner(s, 'Prof. Oona Brightwater-Hale');
  const a = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
  assessmentId = a.id;
  await s.signAssessment(a.id, officer.signOff(STATEMENT));
  const revisionId = (await s.getAssessment(a.id)).current.id;
  await s.countersign({ revisionId, personId: head.person.id, passphrase: head.passphrase, statement: 'As head of the laboratory I accept the controls listed.' });
}, 120_000);

afterAll(async () => {
  await store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

function open(): RecordStore {
  if (!store) throw new Error('store not open');
  return store;
}

describe('documents name the signer and the co-signer', () => {
  it('report: status line and sign-off table', async () => {
    const doc = await documentInputFromAssessment(open(), assessmentId);
    const text = squash(pageTexts(await renderReport(doc, { paper: 'A4', units: 'SI' })).join(' '));
    expect(text).toContain(squash('by Dr. Imre Calloway-Senn; co-signed by Prof. Oona Brightwater-Hale'));
    for (const needle of ['Co-signed by', 'Prof. Oona Brightwater-Hale, Laser safety officer', 'Co-signer confirms', 'As head of the laboratory I accept the controls listed.']) {
      expect(text, needle).toContain(squash(needle));
    }
    expect(text).not.toContain('UNVERIFIEDCO');
  });

  it('door notice: co-signed by, on the one page', async () => {
    const doc = await documentInputFromAssessment(open(), assessmentId);
    const pages = pageTexts(await renderDoorNotice(doc, { paper: 'A4', units: 'SI' }));
    expect(pages).toHaveLength(1);
    expect(squash(pages.join(' '))).toContain(squash('co-signed by Prof. Oona Brightwater-Hale'));
  });
});
