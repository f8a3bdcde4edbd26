/**
 * Numbers in a laser inventory CSV that cannot be misread (issue 11, item 1). A comma inside a
 * quantity of a comma-separated file is a thousands separator that used to be read as a decimal
 * mark ("1,500 mW" stored as 1.5 mW: a 1000-fold under-estimate of a Class 4 laser); it is refused
 * with the row, the column and the two ways to write it. Decimal commas are read in semicolon files
 * only (README, "CSV columns for laser inventory import"). Messages are in officer words, never a
 * developer path. SI prefixes: BIPM SI Brochure, 9th edition, Table 7. Lasers are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordStore, Room } from '../../../electron/backend/records/index.js';
import { openTemp, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let room: Room;
beforeAll(async () => {
  t = tempDir('bw-csv-input-');
  store = await openTemp(t.dir);
  const site = await store.createSite({ name: 'Harwick Vale Photonics Centre' });
  room = await store.createRoom({ siteId: site.id, code: 'C1.02', name: 'Fibre laser bay' });
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

const HEADER = 'laser,wavelength,emission,power,pulse_energy,pulse_duration,repetition_rate,beam_diameter,divergence,beam_definition';
const row = (cells: Partial<Record<'laser' | 'wl' | 'em' | 'p' | 'e' | 'tp' | 'f' | 'd' | 'div' | 'def', string>>): string =>
  [cells.laser ?? 'Bench laser', cells.wl ?? '1070 nm', cells.em ?? 'cw', cells.p ?? '', cells.e ?? '', cells.tp ?? '', cells.f ?? '', cells.d ?? '5 mm', cells.div ?? '1 mrad', cells.def ?? '1/e2'].join(',');

describe('refused, with row and column, and nothing imported', () => {
  const CASES: Array<[name: string, line: string, column: string, problem: RegExp, source: string]> = [
    ['thousands comma in a power', row({ p: '"1,500 mW"' }), 'power', /comma.*write 1500 mW or 1\.5 W/, 'derived: 1,500 mW read as 1.5 mW is a 1000-fold under-estimate'],
    ['thousands comma in a repetition rate', row({ em: 'pulsed', e: '2 mJ', tp: '10 ns', f: '"2,000 Hz"' }), 'repetition_rate', /write 2000 Hz or 2 kHz/, 'derived: 2,000 Hz read as 2 Hz'],
    ['decimal comma in a comma-separated file', row({ wl: '"632,8 nm"' }), 'wavelength', /comma/, 'README: decimal commas only in semicolon files'],
    ['a power unit in the energy column', row({ em: 'pulsed', e: '200 mW', tp: '10 ns' }), 'pulse_energy', /'mW' is not an energy unit/, 'SI: W is a power unit, J an energy unit'],
    ['an energy unit in the power column', row({ p: '5 J' }), 'power', /'J' is not a power unit/, 'SI: J is not a power unit'],
    ['a thousands comma with a unit of another kind', row({ em: 'pulsed', e: '"1,500 mW"', tp: '10 ns' }), 'pulse_energy', /write 1500 mW"?$|write 1500 mW$/, 'derived: the hint never turns mW into J'],
    ['a divergence of 0', row({ p: '5 W', div: '0' }), 'divergence', /more than 0/, 'derived: 0 divergence makes every hazard distance infinite; the core refuses it'],
    ['overlapping pulses', row({ em: 'pulsed', e: '2 mJ', tp: '1 ms', f: '5 kHz' }), 'repetition_rate', /pulses would overlap/, 'derived: repetition rate × pulse duration must not exceed 1'],
    ['a 100 000-character laser name', row({ laser: 'N'.repeat(100_000), p: '5 W' }), 'laser', /at most 200 characters/, "the register's own limit (schemas/records.ts)"],
  ];
  it.each(CASES)('%s', async (_n, line, column, problem) => {
    const report = await store.importLaserCsv(room.id, `${HEADER}\n${line}\n`);
    expect(report.imported).toBe(0);
    expect(report.errors, JSON.stringify(report.errors).slice(0, 400)).toContainEqual({ row: 2, column, problem: expect.stringMatching(problem) });
    for (const e of report.errors) {
      // officer words: no developer path such as "emission.repetitionRate_Hz" or "lasers[1].beams[0]"
      expect(e.column).not.toMatch(/[.[\]]|_(W|J|s|Hz|m|rad|nm)$/);
      expect(e.problem).not.toMatch(/\w\.\w+_(W|J|s|Hz|m|rad|nm)\b|\[\d+\]/);
    }
  });
});

describe('read and shown as read', () => {
  it('semicolon files keep their decimal commas', async () => {
    const csv = ['laser;wavelength;emission;power;beam_diameter;divergence;beam_definition', 'Alignment He-Ne;632,8 nm;cw;1,5 mW;0,7;1,2;1/e2'].join('\n');
    const report = await store.importLaserCsv(room.id, csv);
    expect(report.errors).toEqual([]);
    const beam = (await store.getInstallation(report.installationIds[0] ?? '')).laser.beams[0];
    expect(beam).toMatchObject({ wavelength_nm: 632.8, emission: { kind: 'cw', power_W: 0.0015 }, beam: { diameter_m: 0.0007, divergence_rad: 0.0012 } });
  });

  it('each quantity cell is echoed in full, and an unusual value asks "is this right?" without refusing', async () => {
    const csv = [HEADER, row({ laser: 'Q-switched bench laser', wl: '1064', em: 'pulsed', e: '200', tp: '6 ns', f: '10', d: '9', div: '0.5' })].join('\n');
    const report = await store.importLaserCsv(room.id, csv);
    expect(report.errors).toEqual([]);
    const byColumn = new Map((report.readings ?? []).map((r) => [r.column, r]));
    // A bare 200 in pulse_energy is read in J (README column table): shown, and questioned.
    expect(byColumn.get('pulse_energy')).toMatchObject({ row: 2, text: '200', readAs: '200 J per pulse' });
    expect(byColumn.get('pulse_energy')?.question).toMatch(/Is this right\? More than 10 J per pulse/);
    expect(byColumn.get('wavelength')?.readAs).toBe('1064 nm');
    expect(byColumn.get('pulse_duration')).toMatchObject({ readAs: '6 ns per pulse', question: null });
    expect(byColumn.get('beam_diameter')?.readAs).toBe('9 mm at the exit');
    expect(byColumn.get('divergence')?.readAs).toBe('0.5 mrad full angle');
  });

  it('an exit diameter of 0 (a point-like source, as in published NOHD examples) is accepted', async () => {
    // The Laser-IPL Guys, Lasers and IPLs in Medical/Aesthetic Applications v1.2, ch. 1 p. 110:
    // 1 W, 1 mrad, exit diameter not given: use 0 (shared reference, worked example lipg-ch1-nohd-1W-1mrad).
    const report = await store.importLaserCsv(room.id, `${HEADER}\n${row({ laser: 'Point-like source', wl: '532 nm', p: '1 W', d: '0', div: '1 mrad' })}\n`);
    expect(report.errors).toEqual([]);
    expect((await store.getInstallation(report.installationIds[0] ?? '')).laser.beams[0]?.beam.diameter_m).toBe(0);
  });
});
