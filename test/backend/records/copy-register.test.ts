/**
 * `npm run copy-register`: a desk's register file (the invented demo site, with a signed and a
 * superseded revision, a countersignature and a draft) into a new institution register on a real
 * PostgreSQL server. Everything arrives (the export of the site is the same from both), every
 * signed revision checks the same on the server, the file is not changed, and a register that
 * already holds records is refused. "derived: a copy is the identity" for all cases.
 */
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main as copyRegisterCli } from '../../../electron/cli/copy-register.js';
import { openRecordStore } from '../../../electron/backend/records/index.js';
import { DEMO_PASSPHRASE } from '../../../electron/backend/records/demo.js';
import { adminQuery, PG_ADDRESS, PG_SKIP_REASON, pgAddress } from './engines.js';
import { makeSigner, snapshot, STATEMENT, tempDir } from './helpers.js';

const skip = PG_ADDRESS === '';
const CLOCK = '2026-11-30T09:00:00.000Z';

describe.skipIf(skip)(`copy-register into an institution register on PostgreSQL${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  let t: ReturnType<typeof tempDir>;
  let file: string;
  let siteId: string;
  beforeAll(async () => {
    t = tempDir('bw-copy-');
    file = join(t.dir, 'desk.sqlite');
    const desk = await openRecordStore({ path: file, keyDir: t.dir, now: () => CLOCK });
    try {
      siteId = (await desk.seedDemo()).id;
      // A second signed revision (the first becomes superseded), a countersignature and an open draft.
      const signed = (await desk.listAllAssessments()).find((a) => a.status === 'signed');
      if (!signed) throw new Error('the demo signs one assessment');
      const cur = await desk.getAssessment(signed.id);
      const saved = await desk.saveAssessment(signed.id, { ...cur.current.content, notes: 'Annual review: interlocks tested.' });
      const head = await makeSigner(desk, 'Prof. Oona Brightwater-Hale', { person: { id: cur.current.signature?.personId ?? '' }, passphrase: DEMO_PASSPHRASE });
      const resigned = await desk.signAssessment(signed.id, { personId: cur.current.signature?.personId ?? '', passphrase: DEMO_PASSPHRASE, statement: STATEMENT }, { revisionId: saved.current.id, version: saved.version });
      await desk.countersign({ revisionId: resigned.current.id, personId: head.person.id, passphrase: head.passphrase, statement: 'Countersigned as head of the laboratory.' });
    } finally {
      await desk.close();
    }
  }, 300_000);
  afterAll(() => t?.cleanup());

  async function run(to: string): Promise<{ code: number; lines: string[] }> {
    const lines: string[] = [];
    const code = await copyRegisterCli(['--from', file, '--to', to, '--key-dir', t.dir], (l) => lines.push(l));
    return { code, lines };
  }

  it('copies the demo site: the same records, every signature checks alike, the file unchanged', async () => {
    const before = snapshot(file);
    const to = await pgAddress(`t_copy_${randomBytes(4).toString('hex')}`);
    const { code, lines } = await run(to);
    expect(lines.join('\n')).toMatch(/Every record was carried over\./);
    expect(code).toBe(0);
    expect(lines.join('\n')).toMatch(/Signed revisions checked again on the server: (\d+) of \1 check the same as on the file\./);
    expect(snapshot(file)).toBe(before);

    const desk = await openRecordStore({ path: file, keyDir: t.dir, readonly: true, now: () => CLOCK });
    const server = await openRecordStore({ path: to, keyDir: t.dir, now: () => CLOCK });
    try {
      expect(server.info.warnings).toEqual([]);
      expect(await server.listAllAssessments()).toEqual(await desk.listAllAssessments());
      expect(await server.listPeople()).toEqual(await desk.listPeople());
      expect(await server.listPersonKeys()).toEqual(await desk.listPersonKeys());
      // The endorsements travel with the register (issue 15 item 4): another desk, given the anchor, trusts the same keys.
      const other = await openRecordStore({ path: to, keyDir: join(t.dir, 'desk-B') });
      try {
        await other.setTrustAnchor({ fingerprint: (await desk.trustList()).anchor ?? '' });
        expect((await other.listPersonKeys()).map((k) => [k.keyId, k.trusted])).toEqual((await desk.listPersonKeys()).map((k) => [k.keyId, true]));
      } finally {
        await other.close();
      }
      expect(JSON.stringify(await server.exportSite(siteId))).toBe(JSON.stringify(await desk.exportSite(siteId)));
      for (const a of await desk.listAllAssessments()) {
        for (const r of await desk.listRevisions(a.id)) {
          expect(await server.listCoSignatures(r.id)).toEqual(await desk.listCoSignatures(r.id));
        }
      }
      // The lasers keep the order they were registered in (the server numbers them as copied).
      for (const room of await desk.listRooms(siteId)) {
        expect((await server.listInstallations(room.id)).map((i) => i.id)).toEqual((await desk.listInstallations(room.id)).map((i) => i.id));
      }
    } finally {
      await desk.close();
      await server.close();
    }
  }, 300_000);

  it('refuses a register that already holds records, and copies nothing', async () => {
    const schema = `t_copy_full_${randomBytes(4).toString('hex')}`;
    const to = await pgAddress(schema);
    const s = await openRecordStore({ path: to, keyDir: t.dir });
    await s.createSite({ name: 'Existing site (invented)' });
    await s.close();
    const { code, lines } = await run(to);
    expect(code).toBe(2);
    expect(lines.join('\n')).toMatch(/already holds records.*nothing was copied/);
    expect(await adminQuery(schema, 'SELECT count(*)::int AS n FROM site')).toEqual([{ n: 1 }]);
  });

  it.each([
    [['--from', 'x.sqlite', '--to', '/tmp/other.sqlite'], /--to must be a server address/],
    [['--from', 'postgres://a@b/c', '--to', 'postgres://a@b/c'], /--from must be a register file/],
    [['--to', 'postgres://a@b/c'], /--from <file.sqlite> is required/],
  ])('usage: %j', async (argv, message) => {
    const lines: string[] = [];
    expect(await copyRegisterCli(argv, (l) => lines.push(l))).toBe(2);
    expect(lines.join('\n')).toMatch(message);
  });
});
