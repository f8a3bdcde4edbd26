/**
 * One validation everywhere (issue 11, item 3): the register, the CSV import and the calculation
 * accept and refuse the same things, with the same length limits, so nothing stored can later
 * break an assessment. Real SQLite files, no mocks.
 * Sources: EN 208:2009 Table B.1, alignment scale numbers RB1 to RB5 (shared reference domain.md,
 * section 2.3); EN 207:2017 scale numbers LB1 to LB10; point-like source with exit diameter 0:
 * worked example lipg-ch1-nohd-1W-1mrad (The Laser-IPL Guys, 'Lasers and IPLs in Medical/Aesthetic
 * Applications' v1.2, ch. 1 p.110). The site, room and lasers are invented.
 */
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type EyewearSpec, type LaserInput } from '../../../core/index.js';
import type { RecordStore, Room, Site } from '../../../electron/backend/records/index.js';
import { openTemp, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let site: Site;
let room: Room;
beforeAll(async () => {
  t = tempDir('bw-one-validation-');
  store = await openTemp(t.dir);
  site = await store.createSite({ name: 'Harwick Vale Photonics Centre' });
  room = await store.createRoom({ siteId: site.id, code: 'D0.11', name: 'Teaching laboratory' });
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

const beam: BeamInput = { id: 'b1', wavelength_nm: 532, emission: { kind: 'cw', power_W: 1 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' }, exposureDuration_s: 0.25 };
const laser = (over: Partial<LaserInput>, b: Partial<BeamInput['beam']> = {}): LaserInput => ({ id: 'L', name: 'Green teaching laser', ...over, beams: [{ ...beam, beam: { ...beam.beam, ...b } }] });
const coreAccepts = (l: LaserInput, eyewear: EyewearSpec[] = []): boolean => {
  try {
    evaluateRoom({ lasers: [l], eyewear });
    return true;
  } catch {
    return false;
  }
};

describe('register and core agree on lasers', () => {
  const CASES: Array<[name: string, l: LaserInput, accepted: boolean, problem: RegExp | null, source: string]> = [
    ['an empty laser name', laser({ name: '' }), false, /Laser name must not be empty/, 'issue 11: accepted by the register, refused by the calculation'],
    ['a name of spaces only', laser({ name: '   ' }), false, /Laser name must not be empty/, 'derived: trimmed like every required text of the register'],
    ['a 100 000-character name', laser({ name: 'N'.repeat(100_000) }), false, /at most 200 characters/, "the register's text limit (schemas/records.ts)"],
    ['a divergence of 0', laser({}, { divergence_rad: 0 }), false, /more than 0 mrad, at most 180°/, 'derived: 0 makes every hazard distance infinite; angle range in officer words (issue 14)'],
    ['an exit diameter of 0 (point-like source)', laser({}, { diameter_m: 0 }), true, null, 'lipg-ch1-nohd-1W-1mrad: exit diameter 0'],
  ];
  it.each(CASES)('%s', async (_n, l, accepted, problem) => {
    expect(coreAccepts(l)).toBe(accepted);
    const create = () => store.createInstallation({ roomId: room.id, laser: l });
    if (accepted) expect((await create()).laser.beams[0]?.beam.diameter_m).toBe(0);
    else await expect(create()).rejects.toThrow(problem ?? /./);
  });
});

describe('the shelf and the core agree on eyewear', () => {
  const CASES: Array<[name: string, spec: EyewearSpec, accepted: boolean, problem: RegExp | null]> = [
    ['EN 208 RB5 (highest alignment scale number)', { id: 'AL-5', label: 'alignment glasses', en208: [{ from_nm: 633, to_nm: 633, scale: 5 }] }, true, null],
    ['EN 208 RB6 (no such scale number)', { id: 'AL-6', label: 'alignment glasses', en208: [{ from_nm: 633, to_nm: 633, scale: 6 }] }, false, /RB1 to RB5/],
    ['EN 208 RB10', { id: 'AL-10', label: 'alignment glasses', en208: [{ from_nm: 633, to_nm: 633, scale: 10 }] }, false, /RB1 to RB5/],
    ['an empty description', { id: 'EW-0', label: '', od: [{ from_nm: 1064, to_nm: 1064, od: 7 }] }, false, /must not be empty/],
    ['EN 207 LB10', { id: 'EW-10', label: 'goggles', en207: [{ from_nm: 1064, to_nm: 1064, modes: 'DIR', scale: 10 }] }, true, null],
  ];
  it.each(CASES)('%s', async (_n, spec, accepted, problem) => {
    expect(coreAccepts(laser({}), [spec])).toBe(accepted);
    const create = () => store.createEyewear({ siteId: site.id, spec });
    if (accepted) expect((await create()).spec.id).toBe(spec.id);
    else await expect(create()).rejects.toThrow(problem ?? /./);
  });
});

describe('an item stored under an older, looser rule never breaks the register or a new assessment', () => {
  it('an RB6 eyewear already on the shelf is listed for correction and left out of new assessments', async () => {
    const ok = await store.createEyewear({ siteId: site.id, spec: { id: 'AL-7', label: 'alignment glasses', en208: [{ from_nm: 633, to_nm: 633, scale: 2 }] } });
    await store.createInstallation({ roomId: room.id, laser: { ...laser({ id: 'L2', name: 'He-Ne alignment laser' }), beams: [{ ...beam, id: 'b2' }] } });
    // Written as the register accepted it before EN 208's RB1 to RB5 was applied there.
    const db = new Database(join(t.dir, 'records.sqlite'));
    db.prepare('UPDATE eyewear SET spec_json = ? WHERE id = ?').run(JSON.stringify({ ...ok.spec, en208: [{ from_nm: 633, to_nm: 633, scale: 6 }] }), ok.id);
    db.close();
    expect((await store.listEyewear(site.id)).map((e) => e.spec.id)).toContain('AL-7');
    const input = await store.roomInputFromRegister(room.id);
    expect((input.eyewear ?? []).map((e) => e.id)).not.toContain('AL-7');
    const content = await store.newAssessmentContent(room.id);
    const a = await store.createAssessment({ roomId: room.id, content });
    expect(a.current.status).toBe('draft');
  });
});

describe('beam ids: the register refuses what the calculation would refuse later', () => {
  it('a second laser of the room with a beam id already used there is refused when stored', async () => {
    const site2 = await store.createSite({ name: 'Harwick Vale annexe' });
    const room2 = await store.createRoom({ siteId: site2.id, code: 'E1.01', name: 'Optics workshop' });
    await store.createInstallation({ roomId: room2.id, laser: laser({ name: 'First laser' }) });
    await expect(store.createInstallation({ roomId: room2.id, laser: laser({ name: 'Second laser' }) })).rejects.toThrow(/beam id "b1" is already used by "First laser"/);
    // the room's next assessment still evaluates
    expect((await store.createAssessment({ roomId: room2.id, content: await store.newAssessmentContent(room2.id) })).current.status).toBe('draft');
  });
});

describe('refusals name the record in officer words, never a path', () => {
  it('an assessment with an RB6 marking: eyewear, marking and scale number in words', async () => {
    const content = await store.newAssessmentContent(room.id);
    const bad = { ...content, input: { ...content.input, eyewear: [{ id: 'AL-6', label: 'alignment glasses', en208: [{ from_nm: 633, to_nm: 633, scale: 6 }] }] } };
    let message = '';
    try {
      await store.createAssessment({ roomId: room.id, content: bad });
    } catch (e) {
      message = (e as Error).message;
    }
    expect(message).toMatch(/Eyewear 1, EN 208 marking 1, scale number: must be a whole number from RB1 to RB5 \(EN 208:2009\)/);
    expect(message).not.toMatch(/\[\d+\]|en208\./);
  });

  it('a rule only the calculation checks (one beam id per room): which laser and beam, in words', async () => {
    const content = await store.newAssessmentContent(room.id);
    const first = content.input.lasers[0];
    if (!first) throw new Error('the room has a laser');
    const twin = { ...first, id: 'twin', name: 'Second green laser', beams: first.beams.map((b) => ({ ...b, label: 'twin beam' })) };
    const bad = { ...content, input: { ...content.input, lasers: [first, twin] } };
    await expect(store.createAssessment({ roomId: room.id, content: bad })).rejects.toThrow(/The calculation refused the input\. Laser "Second green laser", beam "twin beam": Beam id must be an id not used by another beam of the room/);
  });
});
