/**
 * The officer's signed checks of the limit tables (issue 12, schema 8), through the handler table
 * the app uses: a check recorded with the officer's passphrase feeds the assessments evaluated on
 * the register afterwards, the revision records the checks it used, verify checks each signature,
 * and export/import keeps them. Real SQLite files and real keys in temporary folders (no mocks).
 *
 * The beam (invented, demo style): 532 nm, one 100 ps pulse of 1 µJ. Row H-E-VIS-2 of set (a)
 * (400-700 nm, 10 ps - 1 ns) reads H = 2e-3*C_E J/m² as written in the tables (from memory:
 * self-consistency, not a published check value); its stricter alternative is the EU value
 * 2.7e4*t^0.75*C_E J/m² (Directive 2006/25/EC Annex II Table 2.2, read in the official text,
 * the exposure-limit specification (exposure-limits.md) section 5.2a, row EU-E-VIS-2): 2.7e4*(1e-10)^0.75 = 8.538e-4 J/m².
 */
import { afterEach, describe, expect, it } from 'vitest';
import { dispatch } from '../../../electron/api/dispatch.js';
import { handlerTable } from '../../../electron/api/table.js';
import type { ApiContext } from '../../../electron/api/context.js';
import type { ArgsOf, OperationName, ResultOf } from '../../../electron/api/operation.js';
import type { ExportDocument, RecordStore, Room } from '../../../electron/backend/records/index.js';
import { gunzipSync } from 'node:zlib';
import type { LaserInput } from '../../../core/index.js';
import { makeSigner, openTemp, tempDir } from './helpers.js';
import { runVerify } from '../../../electron/cli/verify.js';

const REFERENCE = 'IEC 60825-1:2014 Table A.1';

const SEED_LASER: LaserInput = {
  id: 'seed',
  name: 'Picosecond seed laser',
  beams: [{ id: 'seed-532', label: '532 nm', wavelength_nm: 532, emission: { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-10 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }],
};

let t: ReturnType<typeof tempDir> | null = null;
const stores: RecordStore[] = [];
afterEach(async () => {
  for (const s of stores.splice(0)) await s.close();
  t?.cleanup();
  t = null;
});

function api(store: RecordStore) {
  const ctx: ApiContext = { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store };
  return async <K extends OperationName>(name: K, args: ArgsOf<K>): Promise<ResultOf<K>> => {
    const reply = await dispatch(handlerTable, ctx, name, args);
    if (!reply.ok) throw new Error(`${name}: ${reply.error.message}`);
    return reply.value as ResultOf<K>;
  };
}

async function setUp(name = 'records.sqlite', laser: LaserInput = SEED_LASER) {
  t ??= tempDir();
  const store = await openTemp(t.dir, name);
  stores.push(store);
  const call = api(store);
  const officer = await makeSigner(store, 'Dr. Imre Calloway-Senn');
  const site = await store.createSite({ name: 'Harwick Vale Photonics Centre', building: 'Building B' });
  const room: Room = await store.createRoom({ siteId: site.id, code: 'B2.14', name: 'Ultrafast laboratory', responsiblePerson: 'Dr. Tomasz Ferreira-Lund' });
  await store.createInstallation({ roomId: room.id, laser, laserType: laser.name });
  /** A new assessment of the room evaluated on the register now: the eye limit as the officer reads it. */
  const evaluate = async () => {
    const content = await call('assessment-new-content', { roomId: room.id });
    const a = await call('assessment-create', { roomId: room.id, content });
    const beam = a.current.results.beams[0];
    if (!beam) throw new Error('no beam');
    return { a, limit: beam.mpe.H_Jm2_reported, replaced: beam.mpe.conservativeReplacements, warnings: beam.warnings, used: a.current.content.input.settings?.rowChecks ?? [] };
  };
  return { store, call, officer, room, evaluate };
}

describe('a check of a limit-table row changes the limit the officer reads, never above the value as written', () => {
  // [case, verdict, typed published value, expected eye limit J/m² (rounded down), flagged]
  const CASES: ReadonlyArray<readonly [string, 'matches' | 'differs' | null, string | undefined, string, boolean]> = [
    // EU Table 2.2 value 2.7e4*(1e-10)^0.75 = 8.538e-4, rounded down (Directive 2006/25/EC Annex II Table 2.2)
    ['not yet checked: the stricter alternative is used', null, undefined, '0.000853', false],
    // the row as written, 2e-3*C_E with C_E = 1 for a point source (tables, from memory: self-consistency)
    ['matches: the row is used as written', 'matches', undefined, '0.002', false],
    // the document gives more than the table: the table's 2e-3 is kept (never widened), and flagged
    ['differs, the published value larger: nothing changes but the flag', 'differs', '3e-3*CE', '0.002', true],
    // the document gives less: 1e-3 is used
    ['differs, the published value smaller: the lower value is used', 'differs', '1e-3*CE', '0.001', true],
  ];
  it.each(CASES)('%s', async (_name, verdict, typed, expected, flagged) => {
    const { call, officer, evaluate } = await setUp();
    if (verdict !== null) {
      const rec = await call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict, ...(typed ? { documentExpr: typed } : {}), reference: REFERENCE, personId: officer.person.id, passphrase: officer.passphrase });
      expect(rec.ok).toBe(true);
      expect(rec.name).toBe('Dr. Imre Calloway-Senn');
    }
    const r = await evaluate();
    expect(r.limit).toBe(expected);
    expect(r.replaced.includes('H-E-VIS-2')).toBe(verdict === null);
    expect(r.warnings.some((w) => /row H-E-VIS-2 was checked against IEC 60825-1:2014 Table A\.1 by Dr\. Imre Calloway-Senn on \d{4}-\d\d-\d\d, and the published text differs/.test(w))).toBe(flagged);
    // the revision records which checks it used
    expect(r.used.map((c) => [c.key, c.verdict, c.reference, c.checkedBy])).toEqual(verdict === null ? [] : [['H-E-VIS-2', verdict, REFERENCE, 'Dr. Imre Calloway-Senn']]);
  });

  // A correction-factor piece: C_C for 1200-1400 nm reads 8+10^(0.04*(lambda-1250)) as written
  // (from memory: self-consistency), 108 at 1300 nm; its stricter alternative is 8. Row H-E-NIR2-4,
  // H = 90*t^0.75*C_C J/m² (from memory), at 1 s: 720 J/m² with 8, 9720 J/m² with 108.
  const DIODE: LaserInput = { id: 'diode', name: 'Telecom test diode', beams: [{ id: 'diode-1300', wavelength_nm: 1300, exposureDuration_s: 1, emission: { kind: 'cw', power_W: 1e-3 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] };
  const FACTOR_CASES: ReadonlyArray<readonly [string, 'matches' | 'differs' | null, string | undefined, string, boolean]> = [
    ['factor not yet checked: C_C = 8 (the stricter alternative)', null, undefined, '720', false],
    ['factor matches: C_C = 108 as written', 'matches', undefined, '9720', false],
    ['factor differs, published 200 (larger): 108 is kept, flagged', 'differs', '200', '9720', true],
    ['factor differs, published 50 (smaller): 90 * 50 = 4500 J/m², flagged', 'differs', '50', '4500', true],
  ];
  it.each(FACTOR_CASES)('%s', async (_name, verdict, typed, expected, flagged) => {
    const { call, officer, evaluate } = await setUp('records.sqlite', DIODE);
    if (verdict !== null) {
      await call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'factor:CC[1200-1400 nm]', verdict, ...(typed ? { documentExpr: typed } : {}), reference: 'IEC 60825-1:2014 Table A.6', personId: officer.person.id, passphrase: officer.passphrase });
    }
    const r = await evaluate();
    expect(r.limit).toBe(expected);
    expect(r.warnings.some((w) => /correction factor C_C \(1200-1400 nm\) was checked against IEC 60825-1:2014 Table A\.6 .* the published text differs/.test(w))).toBe(flagged);
  });

  it('a check never switches a row to its less strict reading: UV-A 315-400 nm eye over 1000 s stays 1e4 J/m² (SAFETY.md decision)', async () => {
    const { store, call, officer, room } = await setUp();
    await call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-UVA-long', verdict: 'matches', reference: 'ICNIRP 2013, Table 5', personId: officer.person.id, passphrase: officer.passphrase });
    const uv: LaserInput = { id: 'uv', name: 'UV lamp laser', beams: [{ id: 'uv-355', wavelength_nm: 355, exposureDuration_s: 3000, emission: { kind: 'cw', power_W: 1e-3 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } }] };
    await store.createInstallation({ roomId: room.id, laser: uv, laserType: uv.name });
    const content = await call('assessment-new-content', { roomId: room.id });
    const a = await call('assessment-create', { roomId: room.id, content });
    const beam = a.current.results.beams.find((b) => b.wavelength_nm === 355);
    // 1e4 J/m² over 3000 s (the stricter reading kept); the relaxed 10 W/m² * 3000 s = 3e4 J/m² is not used
    expect(beam?.mpe.H_Jm2_reported).toBe('10000');
  });

  it('refuses a typed value the tables cannot read, naming the field; nothing is stored', async () => {
    const { call, officer } = await setUp();
    await expect(call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict: 'differs', documentExpr: '1e-3*XY', reference: REFERENCE, personId: officer.person.id, passphrase: officer.passphrase })).rejects.toThrow(/uses XY, which the tables do not define/);
    await expect(call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict: 'differs', reference: REFERENCE, personId: officer.person.id, passphrase: officer.passphrase })).rejects.toThrow(/what the published document says/);
    await expect(call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict: 'matches', reference: REFERENCE, personId: officer.person.id, passphrase: 'wrong passphrase' })).rejects.toThrow(/passphrase/i);
    expect(await call('limit-checks-list', {})).toEqual([]);
  });
});

describe('a signed check is never changed or deleted (schema 8 triggers)', () => {
  it.each([
    ['the verdict rewritten', "UPDATE limit_row_checks SET verdict = 'matches'", /check of a limit-table row cannot be changed/],
    ['the check removed', 'DELETE FROM limit_row_checks', /check of a limit-table row cannot be deleted/],
  ])('%s is refused by the database', async (_n, sql, refusal) => {
    const { store, call, officer } = await setUp();
    await call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict: 'differs', documentExpr: '1e-3*CE', reference: REFERENCE, personId: officer.person.id, passphrase: officer.passphrase });
    const Database = (await import('better-sqlite3')).default;
    const raw = new Database(store.info.path);
    try {
      expect(() => raw.prepare(sql).run()).toThrow(refusal);
    } finally {
      raw.close();
    }
  });
});

describe('verify and exchange', () => {
  it('a signed revision verifies with the checks it used, and recomputes identically', async () => {
    const { store, call, officer, evaluate } = await setUp();
    await call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict: 'differs', documentExpr: '1e-3*CE', reference: REFERENCE, personId: officer.person.id, passphrase: officer.passphrase });
    const { a } = await evaluate();
    await store.signAssessment(a.id, officer.signOff());
    const report = await call('assessment-verify', { assessmentId: a.id });
    expect(report.ok).toBe(true);
    expect(report.checks.filter((c) => c.check === 'limit-table-check').map((c) => c.ok)).toEqual([true]);
  });

  it('a forged check (its key only in the database, not on the trust list) is not used and verify reports it', async () => {
    const { store, call, evaluate } = await setUp();
    // Someone with write access to the database adds a person with a key that no trusted key endorsed.
    const forger = await store.createPerson({ name: 'Mallory Unlisted', role: 'Visitor' });
    // Without an endorsement no key can be made for them through the app: the row is written directly.
    const { generateKeyPairSync, sign } = await import('node:crypto');
    const { canonicalJson } = await import('../../../electron/backend/records/canonical.js');
    const { keyIdOf } = await import('../../../electron/backend/records/signing.js');
    const { statementOf } = await import('../../../electron/backend/records/limit-row-checks.js');
    const { privateKey, publicKey } = generateKeyPairSync('ed25519');
    const pem = publicKey.export({ type: 'spki', format: 'pem' }).toString();
    const keyId = keyIdOf(pem);
    const row = {
      id: 'forged-check', rule_set: 'icnirp2013', entry_key: 'H-E-VIS-2', entry_expr: '2e-3*CE', verdict: 'matches', document_expr: null, reference: REFERENCE, note: '',
      person_id: forger.id, name: forger.name, role: forger.role, signed_at: '2026-12-01T09:00:00.000Z', key_id: keyId, trust_anchor: '', signature: '',
    };
    row.signature = sign(null, Buffer.from(canonicalJson(statementOf(row)), 'utf8'), privateKey).toString('base64');
    const Database = (await import('better-sqlite3')).default;
    const raw = new Database(store.info.path);
    raw.prepare('INSERT INTO signing_key (key_id, public_key, origin, added_at) VALUES (?, ?, ?, ?)').run(keyId, pem, 'this-database', row.signed_at);
    raw.prepare(`INSERT INTO limit_row_checks VALUES (@id, @rule_set, @entry_key, @entry_expr, @verdict, @document_expr, @reference, @note, @person_id, @name, @role, @signed_at, @key_id, @trust_anchor, @signature)`).run(row);
    raw.close();
    const listed = await call('limit-checks-list', { ruleSet: 'icnirp2013' });
    expect(listed.map((c) => [c.name, c.ok, c.keyTrusted])).toEqual([['Mallory Unlisted', false, false]]);
    expect(listed[0]?.finding).toMatch(/NOT on this installation's trust list\. It is not used/);
    // not used: the stricter alternative stays (8.53e-4 J/m², EU Table 2.2)
    const r = await evaluate();
    expect(r.limit).toBe('0.000853');
    expect(r.used).toEqual([]);
    // npm run verify reports it and fails
    const lines: string[] = [];
    const dbPath = store.info.path;
    const keyDir = store.info.keyDir;
    const code = await runVerify(['--db', dbPath, '--key-dir', keyDir, '--all'], (l) => lines.push(l));
    expect(code).toBe(1);
    expect(lines).toContainEqual(expect.stringMatching(/^FAILED {2}The check of row H-E-VIS-2 by Mallory Unlisted on 2026-12-01, key .* NOT on this installation's trust list\. It is not used\./));
    expect(lines.at(-1)).toBe('1 limit-table check(s): 0 in use, 1 failed.');
  });

  it('export and import into another installation keep the checks, re-verified there', async () => {
    const first = await setUp();
    await first.call('limit-check-record', { ruleSet: 'icnirp2013', entryKey: 'H-E-VIS-2', verdict: 'differs', documentExpr: '1e-3*CE', reference: REFERENCE, note: 'Read in the library copy.', personId: first.officer.person.id, passphrase: first.officer.passphrase });
    const { a } = await first.evaluate();
    await first.store.signAssessment(a.id, first.officer.signOff());
    const file = await first.call('export-json', { kind: 'assessment', id: a.id });
    const doc = JSON.parse(gunzipSync(Buffer.from(file.base64, 'base64')).toString('utf8')) as ExportDocument;
    expect(doc.limitRowChecks?.map((c) => [c.entryKey, c.verdict, c.documentExpr, c.note])).toEqual([['H-E-VIS-2', 'differs', '1e-3*CE', 'Read in the library copy.']]);

    const second = await setUp('other.sqlite');
    // the other installation has not admitted the first site's key: the check is kept, shown unverified, not used
    await second.call('import-json', { base64: file.base64 });
    const there = await second.call('limit-checks-list', {});
    expect(there.map((c) => [c.entryKey, c.verdict, c.name, c.ok, c.signatureValid])).toEqual([['H-E-VIS-2', 'differs', 'Dr. Imre Calloway-Senn', false, true]]);
    // importing the same file again adds nothing
    await second.call('import-json', { base64: file.base64 });
    expect(await second.call('limit-checks-list', {})).toHaveLength(1);
  });
});
