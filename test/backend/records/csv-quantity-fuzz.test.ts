/**
 * Fuzzing the quantity parser and the laser inventory CSV import with fast-check (issue 11, tests):
 * - round trip: a value written with an SI prefix (formatSI) or as the form echoes it (readBack)
 *   parses back to the same SI value (SI prefixes: BIPM SI Brochure, 9th edition, Table 7);
 * - no input crashes: any text gives a value or an InputError, any CSV gives a report;
 * - every CSV refusal names a spreadsheet row and a column, in officer words (no developer path).
 * Real SQLite file, no mocks. Lasers are invented.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Dec, InputError, formatSI, parseQuantity, readBack, type Dimension } from '../../../core/index.js';
import { RecordError, type RecordStore, type Room } from '../../../electron/backend/records/index.js';
import { CSV_COLUMNS } from '../../../electron/backend/records/csv.js';
import { openTemp, tempDir } from './helpers.js';

const UNITS: ReadonlyArray<[Dimension, string]> = [
  ['power', 'W'],
  ['energy', 'J'],
  ['time', 's'],
  ['frequency', 'Hz'],
  ['length', 'm'],
  ['angle', 'rad'],
];
/** A decimal value with up to 9 significant digits, from 1e-15 to 1e11. */
const value = fc.tuple(fc.integer({ min: 1, max: 999_999_999 }), fc.integer({ min: -24, max: 3 })).map(([m, e]) => new Dec(m).mul(new Dec(10).pow(e)));

describe('quantity parser', () => {
  it('format -> parse gives the same SI value (SI prefix form)', () => {
    fc.assert(
      fc.property(value, fc.constantFrom(...UNITS), (v, [dim, unit]) => {
        const text = formatSI(v, unit, 40);
        expect(parseQuantity('q', text, dim).value.eq(v), `${v.toString()} -> "${text}"`).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });

  it('format -> parse gives the same SI value (the field echo, 12 digits)', () => {
    const styles = [
      ['length', 'mm'],
      ['length', 'm'],
      ['angle', 'mrad'],
      ['wavelength', 'nm'],
      ['power', 'prefix'],
      ['time', 'prefix'],
    ] as const;
    fc.assert(
      fc.property(value, fc.constantFrom(...styles), (v, [dim, style]) => {
        const si = v.toNumber();
        const text = readBack(si, dim, style);
        const back = parseQuantity('q', text, dim).value.toNumber();
        expect(Math.abs(back - si) / si, `${si} -> "${text}" -> ${back}`).toBeLessThan(1e-11);
      }),
      { numRuns: 2000 },
    );
  });

  it('never crashes: any text is a value or an InputError', () => {
    const piece = fc.constantFrom('1', '0', '-', '+', '.', ',', 'e', 'E', '5', ' ', 'm', 'µ', 'μ', 'u', 'W', 'J', 'Hz', 's', 'nm', '/', 'cm', '²', '^2', '%', 'deg', 'NaN', 'Infinity', '1e400', '\u0000', '"', ';');
    const text = fc.oneof(fc.string(), fc.string({ unit: 'grapheme' }), fc.array(piece, { maxLength: 12 }).map((p) => p.join('')));
    fc.assert(
      fc.property(text, fc.constantFrom<Dimension>('power', 'energy', 'time', 'frequency', 'length', 'wavelength', 'angle', 'ratio', 'irradiance'), fc.constantFrom(undefined, 'nm', 'mm', 'W'), fc.constantFrom('decimal', 'refuse', 'guard' as const), (t, dim, def, comma) => {
        try {
          const q = parseQuantity('q', t, dim, def, comma);
          expect(q.value.isFinite()).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(InputError);
        }
      }),
      { numRuns: 5000 },
    );
  });
});

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let room: Room;
beforeAll(async () => {
  t = tempDir('bw-csv-fuzz-');
  store = await openTemp(t.dir);
  const site = await store.createSite({ name: 'Harwick Vale Photonics Centre' });
  room = await store.createRoom({ siteId: site.id, code: 'F2.20', name: 'Fuzzing bench' });
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

describe('laser inventory CSV', () => {
  const cell = fc.oneof(
    fc.constantFrom('', 'cw', 'pulsed', '532', '1064 nm', '5 mW', '"1,500 mW"', '1,5', '0', '-1', '2 mm', '0.5 mrad', '1/e2', 'FWHM', '10 ns', '10 Hz', '"x, y"', '"a ""b"""', '4', '3B', 'green', '200', '1e400', 'NaN', '"open'),
    fc.string({ maxLength: 12 }),
  );
  // Half the files have every column, so the rows themselves are read, not only the header.
  const header = fc.oneof(fc.shuffledSubarray([...CSV_COLUMNS, 'colour'], { minLength: 1 }), fc.shuffledSubarray([...CSV_COLUMNS], { minLength: CSV_COLUMNS.length }));

  it('never crashes, and every refusal names a row and a column in officer words', async () => {
    let rowLevel = 0;
    await fc.assert(
      fc.asyncProperty(header, fc.array(fc.array(cell, { maxLength: 24 }), { maxLength: 6 }), fc.constantFrom(',', ';'), async (cols, rows, d) => {
        const text = [cols.join(d), ...rows.map((r) => r.join(d))].join(d === ';' ? '\r\n' : '\n');
        let report;
        try {
          report = await store.importLaserCsv(room.id, text);
        } catch (e) {
          // Only the store's own refusals (never a crash); none is expected for a CSV text.
          expect(e).toBeInstanceOf(RecordError);
          throw e;
        }
        if (report.imported > 0) expect(report.errors).toEqual([]);
        if (cols.length === CSV_COLUMNS.length && rows.length > 0) rowLevel++;
        for (const e of report.errors) {
          expect(Number.isInteger(e.row) && e.row >= 1).toBe(true);
          expect(e.column.length).toBeGreaterThan(0);
          expect(e.column).not.toMatch(/[.[\]]/);
          // The officer's own text is echoed in quotes ("[0]" is not an angle); only the words around it must be free of paths.
          const words = e.problem.replace(/"[^"]*"/g, '""');
          expect(words).not.toMatch(/\[\d+\]|\b(emission|beam|viewing)\.\w+/);
        }
      }),
      { numRuns: 400 },
    );
    expect(rowLevel).toBeGreaterThan(50);
  });

  it('a quantity written out parses back to the same stored value (round trip through a CSV row)', async () => {
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: -6, max: 0 }), fc.constantFrom(',', ';'), async (m, e, d) => {
        const power = new Dec(m).mul(new Dec(10).pow(e));
        const text = formatSI(power, 'W', 40);
        const csv = [['laser', 'wavelength', 'emission', 'power', 'beam_diameter', 'divergence', 'beam_definition'].join(d), [`Fuzz ${m}e${e} ${d === ',' ? 'c' : 's'}`, '532 nm', 'cw', text, '2 mm', '1 mrad', '1/e2'].join(d)].join('\n');
        const report = await store.importLaserCsv(room.id, csv.replace(`Fuzz ${m}`, `Fuzz ${m} ${Math.random()}`));
        expect(report.errors).toEqual([]);
        const stored = (await store.getInstallation(report.installationIds[0] ?? '')).laser.beams[0]?.emission;
        expect(stored).toEqual({ kind: 'cw', power_W: power.toNumber() });
      }),
      { numRuns: 150 },
    );
  });
});
