// @vitest-environment node
/**
 * The officer's checks of the limit tables on paper (issue 12): an assessment evaluated on the
 * register after a check is printed by the real pdfmake and read back with pdftotext. The report's
 * list of rows used and its source list cite the check in words ("checked against IEC
 * 60825-1:2014 Table A.1 by <name> on <date>"); an unchecked row says "not yet checked against
 * the published text — the stricter value is used"; a 'differs' check is flagged on the results;
 * the door notice and the eyewear sheet name the check. Source of the rule: SAFETY.md, "Sources and their status" and
 * "Checks of the limit tables" (derived). Beam (invented): 532 nm, one 100 ps pulse of 1 µJ, so row
 * H-E-VIS-2 of set (a) governs the eye limit.
 */
import { afterEach, describe, expect, it } from 'vitest';
import type { LaserInput } from '../../../core/index.js';
import type { RecordStore } from '../../../electron/backend/records/index.js';
import { documentInputFromAssessment, renderDoorNotice, renderEyewearSheet, renderReport } from '../../../electron/backend/pdf/index.js';
import { makeSigner, openTemp, scenario, tempDir } from '../records/helpers.js';
import { collapse, pageTexts } from './pdf-tools.js';

const SEED: LaserInput = {
  id: 'seed',
  name: 'Picosecond seed laser',
  classAsLabelled: '3B',
  beams: [{ id: 'seed-532', label: '532 nm', wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-10 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }],
};

let t: ReturnType<typeof tempDir> | null = null;
let store: RecordStore | null = null;
afterEach(async () => {
  await store?.close();
  t?.cleanup();
  store = null;
  t = null;
});

async function printed(check: { verdict: 'matches' | 'differs'; documentExpr?: string } | null) {
  t = tempDir();
  const s = await openTemp(t.dir);
  store = s;
  const officer = await makeSigner(s, 'Dr. Imre Calloway-Senn');
  const site = await s.createSite({ name: 'Harwick Vale Photonics Centre', building: 'Building B' });
  const room = await s.createRoom({ siteId: site.id, code: 'B2.14', name: 'Ultrafast laboratory', responsiblePerson: 'Dr. Tomasz Ferreira-Lund' });
  await s.createInstallation({ roomId: room.id, laser: SEED, laserType: SEED.name });
  // the invented demo shelf (an eyewear sheet of a site without any eyewear is not printable today)
  for (const spec of scenario.eyewear) await s.createEyewear({ siteId: site.id, spec });
  let on = '';
  if (check) {
    const rec = await s.recordRowCheck({ ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', ...check, reference: 'IEC 60825-1:2014 Table A.1', personId: officer.person.id, passphrase: officer.passphrase });
    on = rec.signedAt.slice(0, 10);
  }
  const a = await s.createAssessment({ roomId: room.id, content: await s.newAssessmentContent(room.id) });
  await s.signAssessment(a.id, officer.signOff());
  const doc = await documentInputFromAssessment(s, a.id);
  const opts = { paper: 'A4', units: 'SI' } as const;
  return {
    on,
    report: collapse(pageTexts(await renderReport(doc, opts)).join('\n')),
    notice: collapse(pageTexts(await renderDoorNotice(doc, opts)).join('\n')),
    sheet: collapse(pageTexts(await renderEyewearSheet(doc, opts)).join('\n')),
  };
}

describe('checked rows on paper', () => {
  it('an unchecked row: the stricter value is used, and the report says so', async () => {
    const p = await printed(null);
    expect(p.report).toContain('not yet checked against the published text — the stricter value is used');
    expect(p.report).not.toMatch(/checked against IEC 60825-1:2014 Table A\.1 by/);
    expect(p.notice).not.toContain('Limit-table entries checked by the officer');
    expect(p.sheet).not.toContain('Limit-table entries checked by the officer');
  });

  it('a "matches" check is cited in words in the rows used, the source list and on the door notice', async () => {
    const p = await printed({ verdict: 'matches' });
    const words = `checked against IEC 60825-1:2014 Table A.1 by Dr. Imre Calloway-Senn on ${p.on}`;
    // rows-used list (group header) and the appendix source list ([n] ... — checked against ...)
    expect(p.report.split(words).length - 1).toBeGreaterThanOrEqual(2);
    expect(p.report).toMatch(/\[\d+\] [^[]*— checked against IEC 60825-1:2014 Table A\.1 by Dr\. Imre Calloway-Senn/);
    expect(p.notice).toContain(`Limit-table entries checked by the officer: row H-E-VIS-2 ${words}.`);
    expect(p.sheet).toContain(`Limit-table entries checked by the officer: row H-E-VIS-2 ${words}.`);
  });

  it('a "differs" check: the lower published value is used and every result that uses the row is flagged', async () => {
    const p = await printed({ verdict: 'differs', documentExpr: '1e-3*CE' });
    // the published expression in the standards' notation (core/units/formula-text.ts), exponent and subscript read back inline
    expect(p.report).toContain(`checked against IEC 60825-1:2014 Table A.1 by Dr. Imre Calloway-Senn on ${p.on}; the published text differs (10−3 × CE): the lower of the two values is used`);
    // the flag among the beam's warnings on the front pages
    expect(p.report).toMatch(/Beam 1 \(532 nm\): Limit-table row H-E-VIS-2 was checked against IEC 60825-1:2014 Table A\.1 by Dr\. Imre Calloway-Senn on \S+, and the published text differs/);
  });
});
