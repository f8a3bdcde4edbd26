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
let store: RecordStore;
let assessmentId = '';
const squash = (s: string): string => s.replace(/[\s\u00ad-]+/g, '');

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'bw-cosign-pdf-'));
  store = openRecordStore({ path: join(dir, 'records.sqlite'), keyDir: join(dir, 'keys') });
  const { room } = registerRoom(store);
  const officer = makeSigner(store, 'Dr. Imre Calloway-Senn');
  const head = makeSigner(store, 'Prof. Oona Brightwater-Hale');
  const a = store.createAssessment({ roomId: room.id, content: store.newAssessmentContent(room.id) });
  assessmentId = a.id;
  store.signAssessment(a.id, officer.signOff(STATEMENT));
  store.countersign({ revisionId: store.getAssessment(a.id).current.id, personId: head.person.id, passphrase: head.passphrase, statement: 'As head of the laboratory I accept the controls listed.' });
}, 120_000);

afterAll(() => {
  store?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('documents name the signer and the co-signer', () => {
  it('report: status line and sign-off table', async () => {
    const doc = documentInputFromAssessment(store, assessmentId);
    const text = squash(pageTexts(await renderReport(doc, { paper: 'A4', units: 'SI' })).join(' '));
    expect(text).toContain(squash('by Dr. Imre Calloway-Senn; co-signed by Prof. Oona Brightwater-Hale'));
    for (const needle of ['Co-signed by', 'Prof. Oona Brightwater-Hale, Laser safety officer', 'Co-signer confirms', 'As head of the laboratory I accept the controls listed.']) {
      expect(text, needle).toContain(squash(needle));
    }
    expect(text).not.toContain('UNVERIFIEDCO');
  });

  it('door notice: co-signed by, on the one page', async () => {
    const doc = documentInputFromAssessment(store, assessmentId);
    const pages = pageTexts(await renderDoorNotice(doc, { paper: 'A4', units: 'SI' }));
    expect(pages).toHaveLength(1);
    expect(squash(pages.join(' '))).toContain(squash('co-signed by Prof. Oona Brightwater-Hale'));
  });
});
