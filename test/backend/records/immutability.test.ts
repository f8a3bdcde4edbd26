/**
 * Signed records are immutable in the database itself: raw SQL from any SQLite tool is refused by
 * the triggers of migration 0001. With the triggers dropped (someone determined to edit the file),
 * `verify` reports the change through the SHA-256 fingerprint (FIPS 180-4) and the Ed25519
 * signature (RFC 8032), or through recomputation with the core.
 */
import Database from 'better-sqlite3';
import { join } from 'node:path';
import { decodeResults, encodeResults } from '../../../electron/backend/records/assessments.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Assessment, RecordStore } from '../../../electron/backend/records/index.js';
import { openRecordStore } from '../../../electron/backend/records/store.js';
import { evaluateRoom } from '../../../core/index.js';
import type { RoomResult } from '../../../core/model/results.js';
import { makeSigner, openTemp, registerRoom, snapshot, tempDir } from './helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let signed: Assessment;
let signer: Awaited<ReturnType<typeof makeSigner>>;
let dbPath: string;

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  dbPath = join(t.dir, 'records.sqlite');
  const { room } = await registerRoom(store);
  const a = await store.createAssessment({ roomId: room.id, content: await store.newAssessmentContent(room.id) });
  signer = await makeSigner(store);
  signed = await store.signAssessment(a.id, signer.signOff());
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

describe('the database refuses changes to signed content (raw SQL, triggers of migration 0001)', () => {
  const cases: Array<[string, string, (a: Assessment) => unknown[]]> = [
    ['change the content of a signed revision', "UPDATE revision SET content_json = json_set(content_json, '$.notes', 'edited') WHERE id = ?", (a) => [a.current.id]],
    ['change the compressed results', "UPDATE revision SET results_z = x'00' WHERE id = ?", (a) => [a.current.id]],
    ['set a signed revision back to draft', "UPDATE revision SET status = 'draft' WHERE id = ?", (a) => [a.current.id]],
    ['change the title column', "UPDATE revision SET title = 'other' WHERE id = ?", (a) => [a.current.id]],
    ['change the review date column', "UPDATE revision SET review_by = '2099-01-01' WHERE id = ?", (a) => [a.current.id]],
    ['delete a signed revision', 'DELETE FROM revision WHERE id = ?', (a) => [a.current.id]],
    ['change the signer name', "UPDATE signature SET name = 'Someone Else' WHERE revision_id = ?", (a) => [a.current.id]],
    ['delete a signature', 'DELETE FROM signature WHERE revision_id = ?', (a) => [a.current.id]],
    ['move the assessment to another room', "UPDATE assessment SET room_id = room_id || '' WHERE id = ?", (a) => [a.id]],
    ['delete the assessment', 'DELETE FROM assessment WHERE id = ?', (a) => [a.id]],
    ['delete the signing key', 'DELETE FROM signing_key WHERE key_id = ?', (a) => [a.current.signature?.keyId]],
    ['replace the public key', "UPDATE signing_key SET public_key = 'x' WHERE key_id = ?", (a) => [a.current.signature?.keyId]],
    ['insert a revision already signed', `INSERT INTO revision (id, assessment_id, revision_no, status, content_json, results_z, calculated_with, created_at, updated_at)
       SELECT 'x', assessment_id, 9, 'signed', content_json, results_z, calculated_with, created_at, updated_at FROM revision WHERE id = ?`, (a) => [a.current.id]],
  ];
  it.each(cases)('refuses: %s', async (_name, sql, params) => {
    const before = snapshot(dbPath);
    const raw = new Database(dbPath);
    try {
      expect(() => raw.prepare(sql).run(...params(signed))).toThrow(/beamwarden: /);
    } finally {
      raw.close();
    }
    expect(snapshot(dbPath)).toBe(before);
    expect((await store.verify(signed.id)).ok).toBe(true);
  });

  it('refuses a second signature on a signed revision', () => {
    const raw = new Database(dbPath);
    try {
      expect(() =>
        raw
          .prepare(
            `INSERT INTO signature (revision_id, person_id, name, role, signed_at, statement, fingerprint, algorithm, signature, key_id)
             SELECT revision_id, person_id, 'Other', role, signed_at, statement, fingerprint, algorithm, signature, key_id FROM signature WHERE revision_id = ?`,
          )
          .run(signed.current.id),
      ).toThrow(/beamwarden: only a draft revision can be signed|UNIQUE/);
    } finally {
      raw.close();
    }
  });

  it('the store itself answers an attempt with a clear error', async () => {
    await expect(store.signAssessment(signed.id, signer.signOff('z'))).rejects.toThrow(/already signed/);
  });
});

describe('with the triggers dropped, verify reports tampering', () => {
  /** Each case edits a fresh copy of the signed record with the triggers dropped. */
  const cases: Array<{ name: string; sql: string; expect: Partial<Record<'fingerprintMatches' | 'signatureValid' | 'resultsMatchCore' | 'keyKnown', boolean>> }> = [
    {
      name: 'content edited (notes)',
      sql: "UPDATE revision SET content_json = json_set(content_json, '$.notes', 'edited after signing') WHERE id = @rev",
      expect: { fingerprintMatches: false, signatureValid: true, resultsMatchCore: true },
    },
    {
      name: 'input edited (power halved) — results no longer match the inputs either',
      sql: "UPDATE revision SET content_json = json_set(content_json, '$.input.lasers[0].beams[0].emission.power_W', 0.001) WHERE id = @rev",
      expect: { fingerprintMatches: false, resultsMatchCore: false },
    },
    {
      name: 'signer name edited',
      sql: "UPDATE signature SET name = 'Someone Else' WHERE revision_id = @rev",
      expect: { fingerprintMatches: true, signatureValid: false },
    },
    {
      name: 'signing date edited',
      sql: "UPDATE signature SET signed_at = '2020-01-01T00:00:00.000Z' WHERE revision_id = @rev",
      expect: { fingerprintMatches: true, signatureValid: false },
    },
    {
      name: 'fingerprint replaced by one of the edited content',
      sql: "UPDATE signature SET fingerprint = '0000000000000000000000000000000000000000000000000000000000000000' WHERE revision_id = @rev",
      expect: { fingerprintMatches: false, signatureValid: false },
    },
  ];
  it.each(cases)('$name', async ({ sql, expect: expected }) => {
    const copy = join(t.dir, `tamper-${Math.random().toString(36).slice(2)}.sqlite`);
    const src = new Database(dbPath, { readonly: true });
    src.prepare('VACUUM INTO ?').run(copy);
    src.close();
    const raw = new Database(copy);
    for (const { name } of raw.prepare("SELECT name FROM sqlite_schema WHERE type = 'trigger'").all() as Array<{ name: string }>) {
      raw.exec(`DROP TRIGGER "${name}"`);
    }
    raw.prepare(sql).run({ rev: signed.current.id });
    raw.close();
    const s = await openRecordStore({ path: copy, keyDir: join(t.dir, 'keys') });
    try {
      const r = await s.verify(signed.id);
      expect(r.ok).toBe(false);
      expect(r).toMatchObject(expected);
      expect(r.findings.join(' ')).toMatch(/changed/);
    } finally {
      await s.close();
    }
  });

  it('results edited to a larger limit: reported field by field', async () => {
    const copy = join(t.dir, 'tamper-results.sqlite');
    const src = new Database(dbPath, { readonly: true });
    src.prepare('VACUUM INTO ?').run(copy);
    src.close();
    const raw = new Database(copy);
    raw.exec('DROP TRIGGER revision_signed_immutable');
    const row = raw.prepare('SELECT results_z FROM revision WHERE id = ?').get(signed.current.id) as { results_z: Buffer };
    const results = decodeResults(row.results_z) as RoomResult;
    const original = results.beams[0]?.nohd_m_reported;
    const tampered: RoomResult = { ...results, beams: results.beams.map((b, i) => (i === 0 ? { ...b, nohd_m_reported: '0.001' } : b)) };
    raw.prepare('UPDATE revision SET results_z = ? WHERE id = ?').run(encodeResults(tampered), signed.current.id);
    raw.close();
    const s = await openRecordStore({ path: copy, keyDir: join(t.dir, 'keys') });
    try {
      const r = await s.verify(signed.id);
      expect(r).toMatchObject({ ok: false, fingerprintMatches: false, resultsMatchCore: false });
      expect(r.differences).toEqual([{ path: 'results.beams[0].nohd_m_reported', old: '0.001', new: original }]);
      expect(r.findings.join(' ')).toMatch(/same core version: the stored results were changed/);
    } finally {
      await s.close();
    }
  });

  it('a different core version is named as such, not as tampering of the signature', async () => {
    // Stand-in for a future core whose rounding changed: the real core's results, one value altered.
    const s = await openRecordStore({
      path: dbPath,
      keyDir: join(t.dir, 'keys'),
      calculatedWith: 'beamwarden-core 9.9.9',
      evaluate: (input) => {
        const r = evaluateRoom(input);
        return { ...r, largestHazardDistance_m: `${r.largestHazardDistance_m}1` };
      },
    });
    try {
      const r = await s.verify(signed.id);
      expect(r).toMatchObject({ ok: false, fingerprintMatches: true, signatureValid: true, resultsMatchCore: false, verifiedWith: 'beamwarden-core 9.9.9' });
      expect(r.differences.map((d) => d.path)).toEqual(['results.largestHazardDistance_m']);
      expect(r.findings.join(' ')).toMatch(/Recomputing with beamwarden-core 9.9.9 gives different results/);
    } finally {
      await s.close();
    }
  });
});
