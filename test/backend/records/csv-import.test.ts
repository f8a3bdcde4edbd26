/**
 * CSV import of a laser inventory (columns: README "CSV columns for laser inventory import").
 * Per-row errors name the spreadsheet row (header = row 1), the column and the problem; if any row
 * is bad nothing is imported. CSV syntax per RFC 4180. Unit prefixes per SI (BIPM SI Brochure,
 * 9th edition): 5 mW = 0.005 W, 35 fs = 3.5e-14 s. Lasers are the invented demo ones.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordStore, Room } from '../../../electron/backend/records/index.js';
import { CSV_COLUMNS, parseCsv } from '../../../electron/backend/records/csv.js';
import { openTemp, snapshotOn, tempDir } from './helpers.js';
import { forEachEngine } from './engines.js';

forEachEngine((engine) => {
  let t: ReturnType<typeof tempDir>;
  let store: RecordStore;
  let room: Room;
  beforeAll(async () => {
    t = tempDir('bw-csv-');
    store = await openTemp(t.dir, undefined, engine);
    const site = await store.createSite({ name: 'Harwick Vale Photonics Centre' });
    room = await store.createRoom({ siteId: site.id, code: 'B2.16', name: 'Raman spectroscopy laboratory' });
  });
  afterAll(async () => {
    await store.close();
    t.cleanup();
  });

  const HEADER = 'laser,class,maker,serial_number,beam_label,wavelength,emission,power,pulse_energy,pulse_duration,repetition_rate,beam_diameter,divergence,beam_definition';

  describe('parseCsv (RFC 4180)', () => {
    it.each([
      ['plain', 'a,b\n1,2\n', ',', [['a', 'b'], ['1', '2']]],
      ['CRLF and BOM', '\uFEFFa,b\r\n1,2\r\n', ',', [['a', 'b'], ['1', '2']]],
      ['quoted delimiter and doubled quote', 'a,b\n"x, ""y""",2\n', ',', [['a', 'b'], ['x, "y"', '2']]],
      ['quoted line break', 'a\n"line 1\nline 2"\n', ',', [['a'], ['line 1\nline 2']]],
      ['semicolon', 'a;b\n1,5;2\n', ';', [['a', 'b'], ['1,5', '2']]],
      ['no final newline', 'a,b\n1,2', ',', [['a', 'b'], ['1', '2']]],
    ] as const)('%s', (_n, text, delim, expected) => {
      expect(parseCsv(text, delim)).toEqual(expected);
    });
  });

  describe('laser inventory CSV', () => {
    it('imports good rows: beams of one laser grouped, units converted', async () => {
      const csv = [
        HEADER,
        '"Q-switched Nd:YAG, lab 2",4,Invented Optics,SN-001,fundamental,1064 nm,pulsed,,450 mJ,6 ns,10 Hz,9,0.5,1/e2',
        '"Q-switched Nd:YAG, lab 2",4,,,second harmonic,532,pulsed,,200 mJ,6 ns,10,9 mm,0.5 mrad,1/e²',
        'Diode laser module,3B,,,,405,cw,100 mW,,,,1.5,1,1/e2',
      ].join('\n');
      const report = await store.importLaserCsv(room.id, csv);
      expect(report.errors).toEqual([]);
      expect(report.imported).toBe(2);
      const [yag, diode] = await Promise.all(report.installationIds.map((id) => store.getInstallation(id)));
      expect(yag?.laser.name).toBe('Q-switched Nd:YAG, lab 2');
      expect(yag?.classAsLabelled).toBe('4');
      expect(yag?.maker).toBe('Invented Optics');
      expect(yag?.laser.beams.map((b) => [b.wavelength_nm, b.emission, b.beam.diameter_m, b.beam.divergence_rad, b.beam.definition])).toEqual([
        [1064, { kind: 'pulsed', pulseEnergy_J: 0.45, pulseDuration_s: 6e-9, repetitionRate_Hz: 10 }, 0.009, 0.0005, '1/e2'],
        [532, { kind: 'pulsed', pulseEnergy_J: 0.2, pulseDuration_s: 6e-9, repetitionRate_Hz: 10 }, 0.009, 0.0005, '1/e2'],
      ]);
      expect(diode?.laser.beams[0]?.emission).toEqual({ kind: 'cw', power_W: 0.1 });
      expect(new Set(yag?.laser.beams.map((b) => b.id)).size).toBe(2);
      // The register feeds the next assessment.
      expect((await store.roomInputFromRegister(room.id)).lasers).toHaveLength(2);
    });

    it('reads semicolon files with decimal commas (spreadsheets in decimal-comma locales)', async () => {
      const csv = ['laser;wavelength;emission;power;beam_diameter;divergence;beam_definition', 'He-Ne;632,8 nm;cw;2 mW;0,7;1,2;1/e2'].join('\r\n');
      const report = await store.importLaserCsv(room.id, csv);
      expect(report.errors).toEqual([]);
      const laser = (await store.getInstallation(report.installationIds[0] ?? '')).laser;
      expect(laser.beams[0]).toMatchObject({ wavelength_nm: 632.8, emission: { kind: 'cw', power_W: 0.002 }, beam: { diameter_m: 0.0007, divergence_rad: 0.0012 } });
    });

    const GOOD = 'Good laser,4,,,,532,cw,5 W,,,,2.3,0.4,1/e2';
    const bad: Array<[name: string, lines: string[], errors: Array<{ row: number; column: string; problem: RegExp }>]> = [
      ['unknown column', ['laser,wavelength,emission,power,beam_diameter,divergence,beam_definition,colour', 'x,532,cw,1,1,1,1/e2,red'], [{ row: 1, column: 'colour', problem: /unknown column/ }]],
      ['missing required column', ['laser,wavelength,emission,power,beam_diameter,beam_definition', 'x,532,cw,1,1,1/e2'], [{ row: 1, column: 'divergence', problem: /required column is missing/ }]],
      ['unreadable number', [HEADER, GOOD, 'Bad,4,,,,green,cw,5 W,,,,2.3,0.4,1/e2'], [{ row: 3, column: 'wavelength', problem: /"green" is not a wavelength/ }]],
      ['wrong unit', [HEADER, 'Bad,4,,,,532,cw,5 J,,,,2.3,0.4,1/e2'], [{ row: 2, column: 'power', problem: /"5 J": 'J' is not a power unit/ }]],
      ['wavelength out of range', [HEADER, GOOD, GOOD.replace('Good', 'Short').replace(',532,', ',50,')], [{ row: 3, column: 'wavelength', problem: /read as 50 nm; wavelength must be from 180 nm/ }]],
      ['zero power', [HEADER, GOOD.replace('5 W', '0')], [{ row: 2, column: 'power', problem: /must be more than 0 W/ }]],
      ['cw without power', [HEADER, GOOD.replace('5 W', '')], [{ row: 2, column: 'power', problem: /required for a cw beam/ }]],
      ['pulsed with power only', [HEADER, 'P,4,,,,1064,pulsed,5 W,,,,9,0.5,1/e2'], [
        { row: 2, column: 'pulse_energy', problem: /required for a pulsed beam/ },
        { row: 2, column: 'pulse_duration', problem: /required for a pulsed beam/ },
        { row: 2, column: 'power', problem: /not power/ },
      ]],
      ['unknown emission', [HEADER, GOOD.replace(',cw,', ',qcw,')], [{ row: 2, column: 'emission', problem: /"cw" or "pulsed"/ }]],
      ['unknown class', [HEADER, GOOD.replace('Good laser,4', 'Good laser,5')], [{ row: 2, column: 'class', problem: /one of 1, 1M, 2, 2M, 3R, 3B, 4/ }]],
      ['unknown beam definition', [HEADER, GOOD.replace('1/e2', 'FWHM')], [{ row: 2, column: 'beam_definition', problem: /must be "1\/e", "1\/e2" or "d63"/ }]],
      ['rows of one laser disagree', [HEADER, GOOD, GOOD.replace('Good laser,4', 'Good laser,3B')], [{ row: 3, column: 'class', problem: /differs from "4" on row 2/ }]],
      ['empty required cell', [HEADER, GOOD.replace('2.3', '')], [{ row: 2, column: 'beam_diameter', problem: /required, but empty/ }]],
      ['no data rows', [HEADER], [{ row: 2, column: '(file)', problem: /no data rows/ }]],
    ];

    it.each(bad)('%s: reported per row and nothing imported', async (_name, lines, expected) => {
      const before = await snapshotOn(engine, t.dir);
      const report = await store.importLaserCsv(room.id, lines.join('\n'));
      expect(report.imported).toBe(0);
      expect(report.installationIds).toEqual([]);
      for (const e of expected) {
        expect(report.errors, JSON.stringify(report.errors)).toContainEqual({ row: e.row, column: e.column, problem: expect.stringMatching(e.problem) });
      }
      expect(report.errors).toHaveLength(expected.length);
      expect(await snapshotOn(engine, t.dir)).toBe(before);
    });

    it('an unclosed quote is reported with the row and column where it opens', async () => {
      const report = await store.importLaserCsv(room.id, `${HEADER}\n${GOOD}\n"unterminated,4`);
      expect(report.imported).toBe(0);
      expect(report.errors).toEqual([{ row: 3, column: '(column 1)', problem: expect.stringMatching(/quoted cell is not closed/) }]);
    });

    it('row numbers stay those the spreadsheet shows when blank lines are in between', async () => {
      const report = await store.importLaserCsv(room.id, [HEADER, '', GOOD, '', GOOD.replace('Good', 'Bad').replace(',532,', ',green,')].join('\n'));
      expect(report.errors).toEqual([{ row: 5, column: 'wavelength', problem: expect.stringMatching(/"green" is not a wavelength/) }]);
    });
  });

  describe('README section "CSV columns for laser inventory import"', () => {
    const readme = readFileSync(fileURLToPath(new URL('../../../README.md', import.meta.url)), 'utf8');
    const section = readme.slice(readme.indexOf('## CSV columns for laser inventory import'));

    it('documents every column the importer knows, and no other', () => {
      const documented = new Set<string>();
      for (const line of section.split('\n')) {
        if (!line.startsWith('| `')) continue;
        const first = line.split('|')[1] ?? '';
        for (const m of first.matchAll(/`([a-z_]+)`/g)) if (m[1]) documented.add(m[1]);
      }
      expect([...documented].sort()).toEqual([...CSV_COLUMNS].sort());
    });

    it('its example imports as written', async () => {
      const example = /```csv\n([\s\S]*?)```/.exec(section)?.[1] ?? '';
      // A room of its own: the shared one may already hold lasers of the same name.
      const fresh = await store.createRoom({ siteId: room.siteId, code: 'B2.17-readme' });
      const report = await store.importLaserCsv(fresh.id, example);
      expect(report.errors).toEqual([]);
      expect(report.imported).toBe(2);
    });
  });
});
