/**
 * The core refuses malformed limit settings, above all the register's signed checks of table
 * entries (`settings.rowChecks`), with an InputError naming the field, through evaluateBeam and
 * evaluateRoom, as for every other input. Why it matters: a check ends the stricter replacement of
 * its entry (SAFETY.md, "Checks of the limit tables"); a 'differs' check without the published
 * value would end it with nothing to compare the table's value with. The rules are the project's
 * own (a check as the register records it: electron/backend/records/limit-row-checks.ts); no
 * published source. The officer's words are checked too (no path reaches the screen).
 */
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, type BeamInput, type RoomInput } from '../../core/index.js';
import { officerWords } from '../../core/model/input-words.js';
import { refusal } from './refusal.js';

const BEAM: BeamInput = { wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.005 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } };
const CHECK = { key: 'H-E-VIS-4', verdict: 'matches', checkId: 'c1', reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-12-02' };


const CASES: ReadonlyArray<{ why: string; settings: unknown; field: string; code: string; words: RegExp }> = [
  { why: 'settings not an object', settings: 'conservative', field: 'settings', code: 'missing', words: /^Limit settings is needed/ },
  { why: 'unknown setting', settings: { conservatve: false }, field: 'settings.conservatve', code: 'invalid_choice', words: /^Limit settings must be a setting this version knows/ },
  { why: 'conservative mode as text', settings: { conservative: 'no' }, field: 'settings.conservative', code: 'invalid_choice', words: /^Conservative mode must be/ },
  { why: 'verified rows not a list', settings: { verifiedRows: 'H-E-VIS-4' }, field: 'settings.verifiedRows', code: 'missing', words: /^Table entries checked/ },
  { why: 'empty verified row', settings: { verifiedRows: ['H-E-VIS-4', ''] }, field: 'settings.verifiedRows[1]', code: 'missing', words: /^Table entries checked/ },
  { why: 'checks not a list', settings: { rowChecks: CHECK }, field: 'settings.rowChecks', code: 'missing', words: /^Limit table checks is needed/ },
  { why: 'a check not an object', settings: { rowChecks: [CHECK, 'H-E-VIS-4'] }, field: 'settings.rowChecks[1]', code: 'missing', words: /^Limit table checks is needed/ },
  { why: 'check without its entry', settings: { rowChecks: [{ ...CHECK, key: '' }] }, field: 'settings.rowChecks[0].key', code: 'missing', words: /^Limit table check: the table entry checked/ },
  { why: 'unknown verdict', settings: { rowChecks: [{ ...CHECK, verdict: 'close enough' }] }, field: 'settings.rowChecks[0].verdict', code: 'invalid_choice', words: /^Limit table check: the result/ },
  { why: "'differs' without the published value", settings: { rowChecks: [{ ...CHECK, verdict: 'differs' }] }, field: 'settings.rowChecks[0].documentExpr', code: 'missing', words: /^Limit table check: the value the published document gives is needed/ },
  { why: "'matches' with a published value", settings: { rowChecks: [{ ...CHECK, documentExpr: '18*t^0.75' }] }, field: 'settings.rowChecks[0].documentExpr', code: 'invalid_choice', words: /^Limit table check: the value the published document gives/ },
  { why: 'published value not in the tables’ grammar', settings: { rowChecks: [{ ...CHECK, verdict: 'differs', documentExpr: '18*t**0.75' }] }, field: 'settings.rowChecks[0].documentExpr', code: 'unparseable', words: /written as in the tables/ },
  { why: 'published value with an unknown symbol', settings: { rowChecks: [{ ...CHECK, verdict: 'differs', documentExpr: '18*t^0.75*K' }] }, field: 'settings.rowChecks[0].documentExpr', code: 'unparseable', words: /written as in the tables/ },
  { why: 'check without its record', settings: { rowChecks: [{ ...CHECK, checkId: undefined }] }, field: 'settings.rowChecks[0].checkId', code: 'missing', words: /^Limit table check: its record/ },
  { why: 'reference too long', settings: { rowChecks: [{ ...CHECK, reference: 'x'.repeat(301) }] }, field: 'settings.rowChecks[0].reference', code: 'missing', words: /^Limit table check: the published document and table/ },
  { why: 'no person named', settings: { rowChecks: [{ ...CHECK, checkedBy: '' }] }, field: 'settings.rowChecks[0].checkedBy', code: 'missing', words: /^Limit table check: the person who checked/ },
  { why: 'date not YYYY-MM-DD', settings: { rowChecks: [{ ...CHECK, checkedOn: '2.12.2026' }] }, field: 'settings.rowChecks[0].checkedOn', code: 'unparseable', words: /^Limit table check: the date of the check/ },
  { why: 'unknown field in a check', settings: { rowChecks: [{ ...CHECK, signature: 'abc' }] }, field: 'settings.rowChecks[0].signature', code: 'invalid_choice', words: /^Limit table checks must be a setting this version knows/ },
  { why: 'more than 1000 checks', settings: { rowChecks: Array.from({ length: 1001 }, (_, i) => ({ ...CHECK, checkId: `c${i}` })) }, field: 'settings.rowChecks', code: 'out_of_range', words: /^Limit table checks must be at most 1000 checks/ },
];

describe('limit settings: each malformed setting is refused naming its field', () => {
  it.each(CASES)('beam: $why -> $field', ({ settings, field, code, words }) => {
    const e = refusal(() => evaluateBeam({ ...BEAM, settings } as unknown as BeamInput));
    expect(e.field).toBe(field);
    expect(e.code).toBe(code);
    expect(officerWords(e)).toMatch(words);
    expect(officerWords(e)).not.toMatch(/settings\.|rowChecks|\[\d+\]/);
  });

  it.each(CASES)('room: $why -> $field', ({ settings, field, code }) => {
    const room = { lasers: [{ id: 'L1', name: 'Green pointer (invented)', beams: [BEAM] }], settings } as unknown as RoomInput;
    const e = refusal(() => evaluateRoom(room));
    expect(e.field).toBe(field);
    expect(e.code).toBe(code);
  });

  it('well-formed settings are accepted: a matching check, a differing one with its value, conservative off, verified rows', () => {
    const ok = [
      { rowChecks: [CHECK] },
      { rowChecks: [{ ...CHECK, verdict: 'differs', documentExpr: '18*t^0.75*CE' }] },
      { conservative: false },
      { verifiedRows: ['H-E-VIS-4'] },
      {},
    ] as const;
    for (const settings of ok) expect(Number(evaluateBeam({ ...BEAM, settings } as BeamInput).nohd_m)).toBeGreaterThan(0);
  });
});
