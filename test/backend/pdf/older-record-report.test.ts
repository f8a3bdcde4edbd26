/**
 * A revision saved by an older calculation (before the irradiated skin area, the deliberate viewing
 * duration and the diffuse viewing case existed) prints, in its report, which defaults were assumed
 * for it, in the same words as the workspace (issue 11). A revision saved by this version prints
 * none. Real SQLite store opened as an older build writes (calculatedWith 0.1.0), real pdfmake,
 * read back with pdftotext. Defaults: SAFETY.md "Decisions on open physics points" (600 s
 * deliberate viewing, customary value; the larger diffuse distance governs when no case is chosen;
 * no skin area = the large-area skin limit is not applied).
 */
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRecordStore } from '../../../electron/backend/records/store.js';
import type { AssessmentContent, RecordStore } from '../../../electron/backend/records/index.js';
import { documentInputFromAssessment, renderReport } from '../../../electron/backend/pdf/index.js';
import { openTemp, registerRoom, tempDir } from '../records/helpers.js';
import { pageTexts } from './pdf-tools.js';

const OLD = 'beamwarden-core 0.1.0';

function withDiffuse(c: AssessmentContent): AssessmentContent {
  const l0 = c.input.lasers[0];
  const b0 = l0?.beams[0];
  if (!l0 || !b0) throw new Error('room has a beam');
  const beam = { ...b0, viewing: { ...b0.viewing, diffuse: { reflectance: 0.9 } } };
  return { ...c, input: { ...c.input, lasers: [{ ...l0, beams: [beam, ...l0.beams.slice(1)] }, ...c.input.lasers.slice(1)] } };
}

/** Compare ignoring white space and soft hyphens (pdftotext breaks lines where the page did). */
const squash = (s: string): string => s.replace(/[\s\u00ad]+/g, '');

let t: ReturnType<typeof tempDir>;
const stores: RecordStore[] = [];
let olderText = '';
let currentText = '';

beforeAll(async () => {
  t = tempDir('bw-older-report-');
  const older = await openRecordStore({ path: join(t.dir, 'older.sqlite'), keyDir: join(t.dir, 'keys-older'), calculatedWith: OLD });
  stores.push(older);
  const { room } = await registerRoom(older);
  const made = await older.createAssessment({ roomId: room.id, content: withDiffuse(await older.newAssessmentContent(room.id)) });
  olderText = pageTexts(await renderReport(await documentInputFromAssessment(older, made.id), { paper: 'A4', units: 'SI' })).join(' ');
  const now = await openTemp(t.dir, 'now.sqlite');
  stores.push(now);
  const r2 = (await registerRoom(now)).room;
  const same = await now.createAssessment({ roomId: r2.id, content: withDiffuse(await now.newAssessmentContent(r2.id)) });
  currentText = pageTexts(await renderReport(await documentInputFromAssessment(now, same.id), { paper: 'A4', units: 'SI' })).join(' ');
}, 180_000);

afterAll(async () => {
  for (const s of stores) await s.close();
  t?.cleanup();
});

describe('report of an older record names the defaults assumed', () => {
  it.each([
    'Assumed for this older record',
    'This revision was saved by an older version of Beamwarden, before the inputs below existed.',
    'Irradiated skin area: not given, so the large-area skin limit (IEC 60825-1 / ANSI Z136.1, more than 10 s over more than 0.01 m²) is not applied — saved by version 0.1.0 of the Beamwarden calculation, before this input existed',
    'Deliberate viewing duration: 600 s (the customary value for looking at a diffuse spot on purpose; not yet checked against the published text) — saved by version 0.1.0 of the Beamwarden calculation, before this input existed (Erbium fibre amplifier, Erbium fibre amplifier 1550 nm).',
    'Case that sets the diffuse hazard distance: the larger of the accidental and the deliberate viewing distances — saved by version 0.1.0 of the Beamwarden calculation',
  ])('older record prints: %s', (sentence) => {
    expect(squash(olderText)).toContain(squash(sentence));
  });

  it('the same content saved by this version prints no assumed defaults', () => {
    expect(currentText).toContain('Who and what was assumed');
    expect(currentText).not.toContain('Assumed for this older record');
    expect(currentText).not.toContain('before this input existed');
  });
});
