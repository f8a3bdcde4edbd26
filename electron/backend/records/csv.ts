/**
 * CSV import of a laser inventory into one room: one row per beam (a laser with two wavelengths
 * or modes takes two rows with the same `laser` name). The columns are documented in README.md,
 * "CSV columns for laser inventory import". Cells with quantities take a unit ("5 mW",
 * "10.6 µm", "35 fs"); a bare number is read in the column's default unit.
 *
 * Policy: every row is checked first and every problem is reported with its spreadsheet row
 * number (the header is row 1), column and problem; if any row is bad nothing is imported.
 * Otherwise all lasers are added in one transaction.
 */
import type { BeamInput, LaserInput } from '../../../core/model/inputs.js';
import { TEXT_RULES, textProblem, type TextRule } from '../../../core/model/input-rules.js';
import { BeamInputSchema, LaserClassSchema } from '../schemas/inputs.js';
import { QUANTITY_COLUMNS, readQuantityCell } from './csv-cells.js';
import { inTransaction, type StoreContext } from './context.js';
import { getRoom, insertInstallation } from './register.js';
import { RecordError, type CsvExistingChoice, type CsvImportReport, type Id, type LaserInstallation } from './types.js';

// ---------------------------------------------------------------- RFC 4180 parsing

/** Parse CSV text into records of cells. Handles quotes, doubled quotes, CRLF and a UTF-8 BOM. */
export function parseCsv(text: string, delimiter: ',' | ';'): string[][] {
  const records: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  // Where the open quote started, as a spreadsheet shows it (row from 1, column from 1).
  let line = 1;
  let openedAt = { row: 1, column: 1 };
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  for (; i < text.length; i++) {
    const ch = text[i];
    if (ch === '\n' || (ch === '\r' && text[i + 1] !== '\n')) line++;
    if (quoted) {
      if (ch === '"') {
        if (text[i + 1] === '"') {
          cell += '"';
          i++;
        } else quoted = false;
      } else cell += ch;
    } else if (ch === '"' && cell === '') {
      quoted = true;
      openedAt = { row: records.length + 1, column: row.length + 1 };
    }
    else if (ch === delimiter) {
      row.push(cell);
      cell = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(cell);
      records.push(row);
      row = [];
      cell = '';
    } else cell += ch;
  }
  void line;
  if (quoted) {
    const problem = 'a quoted cell is not closed (missing ")';
    throw new RecordError('invalid', `CSV row ${openedAt.row}, column ${openedAt.column}: ${problem}`, [{ path: `row ${openedAt.row}, column ${openedAt.column}`, problem }]);
  }
  if (cell !== '' || row.length > 0) {
    row.push(cell);
    records.push(row);
  }
  return records;
}

/** Spreadsheets in decimal-comma locales write ';' between cells. */
function detectDelimiter(headerLine: string): ',' | ';' {
  const commas = headerLine.split(',').length;
  const semis = headerLine.split(';').length;
  return semis > commas ? ';' : ',';
}

// ---------------------------------------------------------------- columns

const TEXT_COLUMNS = [
  'laser',
  'laser_type',
  'maker',
  'model',
  'serial_number',
  'registration_number',
  'class',
  'status',
  'laser_notes',
  'beam_id',
  'beam_label',
  'emission',
  'beam_definition',
] as const;
export const CSV_COLUMNS: readonly string[] = [...TEXT_COLUMNS, ...Object.keys(QUANTITY_COLUMNS)];
const REQUIRED = ['laser', 'wavelength', 'emission', 'beam_diameter', 'divergence', 'beam_definition'] as const;
/** Columns describing the laser, not the beam: rows of one laser must agree on them. */
const LASER_LEVEL = ['laser_type', 'maker', 'model', 'serial_number', 'registration_number', 'class', 'status', 'laser_notes'] as const;

export { QUANTITY_COLUMNS };

/** Length limits of the text columns: the register's own (schemas/records.ts), so nothing imported is refused later. */
const TEXT_LIMITS: Readonly<Partial<Record<(typeof TEXT_COLUMNS)[number], TextRule>>> = {
  laser: TEXT_RULES.laserName,
  laser_type: { label: 'Laser type', required: false, max: 200 },
  maker: { label: 'Maker', required: false, max: 200 },
  model: { label: 'Model', required: false, max: 200 },
  serial_number: { label: 'Serial number', required: false, max: 200 },
  registration_number: { label: 'Registration number', required: false, max: 200 },
  laser_notes: { label: 'Notes', required: false, max: 10_000 },
  beam_id: TEXT_RULES.beamId,
  beam_label: TEXT_RULES.beamLabel,
};

/** Where a BeamInput schema problem is shown: the CSV column it came from. */
const COLUMN_OF_PATH: Readonly<Record<string, string>> = {
  wavelength_nm: 'wavelength',
  'emission.power_W': 'power',
  'emission.pulseEnergy_J': 'pulse_energy',
  'emission.pulseDuration_s': 'pulse_duration',
  'emission.repetitionRate_Hz': 'repetition_rate',
  'beam.diameter_m': 'beam_diameter',
  'beam.divergence_rad': 'divergence',
  'beam.definition': 'beam_definition',
  exposureDuration_s: 'exposure_duration',
  id: 'beam_id',
  label: 'beam_label',
};

type CsvError = { row: number; column: string; problem: string };
type CsvReading = { row: number; column: string; text: string; readAs: string; question: string | null };

const MAX_ROWS = 10_000;

interface LaserGroup {
  name: string;
  firstRow: number;
  fields: Partial<Record<(typeof LASER_LEVEL)[number], string>>;
  beams: Array<{ row: number; beam: BeamInput; givenId: string | null }>;
}

export async function importLaserCsv(ctx: StoreContext, roomId: Id, csvText: string, existing: CsvExistingChoice = 'ask'): Promise<CsvImportReport> {
  await getRoom(ctx, roomId);
  const firstLine = csvText.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  const delimiter = detectDelimiter(firstLine);
  let parsed: string[][];
  try {
    parsed = parseCsv(csvText, delimiter);
  } catch (e) {
    if (!(e instanceof RecordError)) throw e;
    const m = /row (\d+), column (\d+): (.*)$/.exec(e.message);
    return { imported: 0, errors: [{ row: Number(m?.[1] ?? 1), column: `(column ${m?.[2] ?? 1})`, problem: m?.[3] ?? e.message }], installationIds: [] };
  }
  // Blank lines are skipped but keep their place: every row number is the one the spreadsheet shows.
  const numbered = parsed.map((cells, i) => ({ cells, row: i + 1 })).filter((r) => r.cells.some((c) => c.trim() !== ''));
  const records = numbered.map((r) => r.cells);
  const headerRow = numbered[0]?.row ?? 1;
  const errors: CsvError[] = [];
  const readings: CsvReading[] = [];
  const header = (records[0] ?? []).map((h) => h.trim().toLowerCase());
  if (header.length === 0) return { imported: 0, errors: [{ row: 1, column: '(header)', problem: 'the file is empty: a header row is needed' }], installationIds: [] };
  if (records.length - 1 > MAX_ROWS) {
    return { imported: 0, errors: [{ row: MAX_ROWS + 2, column: '(file)', problem: `more than ${MAX_ROWS} rows; split the file` }], installationIds: [] };
  }
  header.forEach((h, i) => {
    if (!CSV_COLUMNS.includes(h)) errors.push({ row: headerRow, column: h || `(column ${i + 1})`, problem: `unknown column; known columns: ${CSV_COLUMNS.join(', ')}` });
    if (header.indexOf(h) !== i) errors.push({ row: headerRow, column: h, problem: 'column appears twice' });
  });
  for (const req of REQUIRED) if (!header.includes(req)) errors.push({ row: headerRow, column: req, problem: 'required column is missing' });
  if (errors.length) return { imported: 0, errors, installationIds: [] };
  if (records.length < 2) return { imported: 0, errors: [{ row: headerRow + 1, column: '(file)', problem: 'no data rows after the header' }], installationIds: [] };

  const groups = new Map<string, LaserGroup>();
  records.slice(1).forEach((cells, idx) => {
    const row = numbered[idx + 1]?.row ?? idx + 2;
    const cell = (col: string): string => {
      const i = header.indexOf(col);
      return i < 0 ? '' : (cells[i] ?? '').trim();
    };
    if (cells.length > header.length) errors.push({ row, column: `(column ${header.length + 1})`, problem: `more cells (${cells.length}) than header columns (${header.length})` });
    const rowErrors: CsvError[] = [];
    for (const req of REQUIRED) if (cell(req) === '') rowErrors.push({ row, column: req, problem: 'required, but empty' });

    for (const [col, rule] of Object.entries(TEXT_LIMITS)) {
      const text = cell(col);
      if (text === '') continue; // required columns are reported as empty above
      const problem = textProblem(rule, text);
      if (problem) rowErrors.push({ row, column: col, problem });
    }

    const q = (col: string): number | undefined => {
      const text = cell(col);
      if (text === '') return undefined;
      const r = readQuantityCell(col, text, delimiter);
      if (!r.ok) {
        rowErrors.push({ row, column: col, problem: r.problem });
        return undefined;
      }
      readings.push({ row, column: col, text, readAs: r.readAs, question: r.question });
      return r.stored;
    };
    const wavelength_nm = q('wavelength');
    const emissionKind = cell('emission').toLowerCase();
    const power_W = q('power');
    const pulseEnergy_J = q('pulse_energy');
    const pulseDuration_s = q('pulse_duration');
    const repetitionRate_Hz = q('repetition_rate');
    const diameter_m = q('beam_diameter');
    const divergence_rad = q('divergence');
    const exposureDuration_s = q('exposure_duration');

    if (emissionKind !== '' && emissionKind !== 'cw' && emissionKind !== 'pulsed') rowErrors.push({ row, column: 'emission', problem: `must be "cw" or "pulsed" (got "${cell('emission')}")` });
    if (emissionKind === 'cw') {
      if (cell('power') === '') rowErrors.push({ row, column: 'power', problem: 'required for a cw beam' });
      for (const c of ['pulse_energy', 'pulse_duration', 'repetition_rate']) if (cell(c) !== '') rowErrors.push({ row, column: c, problem: 'only for pulsed beams; leave empty for cw' });
    }
    if (emissionKind === 'pulsed') {
      if (cell('pulse_energy') === '') rowErrors.push({ row, column: 'pulse_energy', problem: 'required for a pulsed beam' });
      if (cell('pulse_duration') === '') rowErrors.push({ row, column: 'pulse_duration', problem: 'required for a pulsed beam' });
      if (cell('power') !== '') rowErrors.push({ row, column: 'power', problem: 'give pulse_energy (and repetition_rate) for a pulsed beam, not power' });
    }
    const cls = cell('class').toUpperCase();
    if (cls !== '' && !LaserClassSchema.safeParse(cls).success) rowErrors.push({ row, column: 'class', problem: `must be one of 1, 1M, 2, 2M, 3R, 3B, 4 (got "${cell('class')}")` });
    const status = cell('status').toLowerCase();
    if (status !== '' && status !== 'in-service' && status !== 'retired') rowErrors.push({ row, column: 'status', problem: 'must be "in-service" or "retired"' });

    if (rowErrors.length === 0) {
      const beamDraft: Record<string, unknown> = {
        wavelength_nm,
        emission:
          emissionKind === 'cw'
            ? { kind: 'cw', power_W }
            : { kind: 'pulsed', pulseEnergy_J, pulseDuration_s, ...(repetitionRate_Hz !== undefined ? { repetitionRate_Hz } : {}) },
        beam: { diameter_m: diameter_m !== undefined ? diameter_m : undefined, divergence_rad, definition: normaliseDefinition(cell('beam_definition')) },
        ...(cell('beam_label') !== '' ? { label: cell('beam_label') } : {}),
        ...(exposureDuration_s !== undefined ? { exposureDuration_s } : {}),
      };
      const parsed = BeamInputSchema.safeParse(beamDraft);
      if (!parsed.success) {
        for (const issue of parsed.error.issues) {
          const path = issue.path.map(String).join('.');
          // Never a developer path on screen: a problem no column explains is shown for the row.
          rowErrors.push({ row, column: COLUMN_OF_PATH[path] ?? '(row)', problem: issue.message });
        }
      } else {
        const name = cell('laser');
        let g = groups.get(name);
        if (!g) {
          g = { name, firstRow: row, fields: {}, beams: [] };
          groups.set(name, g);
        }
        for (const col of LASER_LEVEL) {
          let v = cell(col);
          if (col === 'class') v = cls;
          if (col === 'status') v = status;
          if (v === '') continue;
          const before = g.fields[col];
          if (before !== undefined && before !== v) rowErrors.push({ row, column: col, problem: `"${v}" differs from "${before}" on row ${g.firstRow} for the same laser "${name}"` });
          else g.fields[col] = v;
        }
        g.beams.push({ row, beam: parsed.data, givenId: cell('beam_id') || null });
      }
    }
    errors.push(...rowErrors);
  });

  // Lasers the room already has (same name, maker, serial number): importing a file twice must
  // not double the register, so the officer chooses to skip them or to add them again.
  const present = await alreadyInRoom(ctx, roomId, groups);
  const leaveOut = existing === 'add' ? new Set<LaserGroup>() : new Set(present.map((p) => p.group));
  for (const g of leaveOut) groups.delete(g.name);

  // Beam ids must be unique within the room (assessments refer to beams by id).
  const existingBeamIds = new Set<string>();
  for (const r of await ctx.q.all('SELECT laser_json FROM laser_installation WHERE room_id = ?', roomId) as Array<{ laser_json: string }>) {
    const l = JSON.parse(r.laser_json) as LaserInput;
    l.beams.forEach((b) => b.id !== undefined && existingBeamIds.add(b.id));
  }
  const seenIds = new Map<string, number>();
  for (const g of groups.values()) {
    for (const b of g.beams) {
      if (b.givenId === null) continue;
      if (existingBeamIds.has(b.givenId)) errors.push({ row: b.row, column: 'beam_id', problem: `beam id "${b.givenId}" is already used in this room` });
      const prev = seenIds.get(b.givenId);
      if (prev !== undefined) errors.push({ row: b.row, column: 'beam_id', problem: `beam id "${b.givenId}" is also on row ${prev}` });
      seenIds.set(b.givenId, b.row);
    }
  }

  const presentRows = present.map(({ group: _g, ...p }) => p);
  if (errors.length) {
    errors.sort((a, b) => a.row - b.row);
    return { imported: 0, errors, installationIds: [], readings };
  }
  if (existing === 'ask' && present.length > 0) {
    return { imported: 0, errors: [], installationIds: [], alreadyInRoom: presentRows, decisionNeeded: true, readings };
  }

  const now = ctx.now();
  const installations: LaserInstallation[] = [...groups.values()].map((g) => {
    const id = ctx.newId();
    const cls = g.fields.class;
    const laser: LaserInput = {
      id,
      name: g.name,
      ...(cls ? { classAsLabelled: LaserClassSchema.parse(cls) } : {}),
      beams: g.beams.map((b, i) => ({ ...b.beam, id: b.givenId ?? `${id.slice(0, 8)}-${i + 1}` })),
    };
    return {
      id,
      roomId,
      laserType: g.fields.laser_type ?? '',
      maker: g.fields.maker ?? '',
      model: g.fields.model ?? '',
      serialNumber: g.fields.serial_number ?? '',
      registrationNumber: g.fields.registration_number ?? '',
      laser,
      classAsLabelled: laser.classAsLabelled ?? null,
      status: g.fields.status === 'retired' ? 'retired' : 'in-service',
      notes: g.fields.laser_notes ?? '',
      createdAt: now,
      updatedAt: now,
    };
  });
  await inTransaction(ctx, 'CSV import (nothing was imported)', async (ctx) => {
    for (const inst of installations) await insertInstallation(ctx, inst);
    await ctx.audit('imported-csv', 'room', roomId, `${installations.length} lasers`);
  });
  return {
    imported: installations.length,
    errors: [],
    installationIds: installations.map((i) => i.id),
    alreadyInRoom: presentRows,
    skipped: leaveOut.size,
    readings,
  };
}

const sameText = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

async function alreadyInRoom(
  ctx: StoreContext,
  roomId: Id,
  groups: ReadonlyMap<string, LaserGroup>,
): Promise<Array<{ group: LaserGroup; row: number; name: string; maker: string; serialNumber: string }>> {
  const rows = await ctx.q.all('SELECT laser_json, maker, serial_number FROM laser_installation WHERE room_id = ?', roomId) as Array<{
    laser_json: string;
    maker: string;
    serial_number: string;
  }>;
  const known = rows.map((r) => ({ name: (JSON.parse(r.laser_json) as LaserInput).name, maker: r.maker, serial: r.serial_number }));
  const out: Array<{ group: LaserGroup; row: number; name: string; maker: string; serialNumber: string }> = [];
  for (const g of groups.values()) {
    const maker = g.fields.maker ?? '';
    const serial = g.fields.serial_number ?? '';
    if (known.some((k) => sameText(k.name, g.name) && sameText(k.maker, maker) && sameText(k.serial, serial))) {
      out.push({ group: g, row: g.firstRow, name: g.name, maker, serialNumber: serial });
    }
  }
  return out;
}

function normaliseDefinition(text: string): string {
  const t = text.replace(/\s+/g, '').replace('²', '2').replace('^2', '2').toLowerCase();
  return t === '1/e' || t === '1/e2' || t === 'd63' ? t : text;
}
