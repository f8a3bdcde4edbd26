/**
 * Moving a desk's register (an SQLite file) into the institution register on PostgreSQL:
 * every row of every table, as it is (ids, revisions, signatures, keys, co-signatures, audit log),
 * then every signed revision verified again on the server and compared with the same check on the
 * file. The file is opened read-only and never changed.
 *
 * Rows are copied as stored, so a signed revision arrives signed: for the copy only, the two
 * refusals that make a revision start as a draft (revision_insert_as_draft, signature_only_on_draft)
 * are switched off inside the copying transaction and on again before it commits (ALTER TABLE is
 * transactional in PostgreSQL, and no other session sees the register in between). Every other
 * protection stays on. Each assessment (with its revisions and signatures) is copied under its own
 * savepoint: one that cannot be carried over is reported and left out, and the rest is copied.
 */
import Database from 'better-sqlite3';
import { existsSync } from 'node:fs';
import type pg from 'pg';
import { LATEST_VERSION } from './migrations/index.js';
import { openPgEngine } from './pg-engine.js';
import { openRecordStore } from './store.js';
import { RecordError, type RecordStore } from './types.js';

/** Tables in the order their foreign keys need, with the order rows were written in the file. */
const REGISTER_TABLES = ['site', 'person', 'room', 'laser_installation', 'eyewear', 'signing_key', 'person_key', 'trust_anchor_pin', 'trust_anchor_setup', 'trust_endorsement', 'trust_retirement'] as const;
const ASSESSMENT_TABLES = ['assessment', 'revision', 'signature', 'co_signature'] as const;
/** Columns the server numbers itself. */
const SERVER_NUMBERED = new Set(['insert_seq', 'seq', 'db_role']);
const SWITCHED_OFF = [
  ['revision', 'revision_insert_as_draft'],
  ['signature', 'signature_only_on_draft'],
] as const;

export interface CopyProblem {
  readonly what: string;
  readonly reason: string;
}

export interface CopyReport {
  readonly from: string;
  readonly to: string;
  /** Rows copied per table. */
  readonly rows: Readonly<Record<string, number>>;
  readonly signedRevisions: number;
  /** Signed revisions whose check on the server is the same as on the file. */
  readonly verifiedAlike: number;
  /** Records that were not carried over, or whose check on the server differs from the file's. */
  readonly problems: readonly CopyProblem[];
}

type Row = Record<string, unknown>;

function sqliteColumns(db: Database.Database, table: string): string[] {
  return (db.prepare('SELECT name FROM pragma_table_info(?)').all(table) as Array<{ name: string }>).map((c) => c.name);
}

async function insertRow(client: pg.PoolClient, table: string, columns: readonly string[], row: Row): Promise<void> {
  const list = columns.map((c) => `"${c}"`).join(', ');
  const values = columns.map((_c, i) => `$${i + 1}`).join(', ');
  await client.query(`INSERT INTO ${table} (${list}) VALUES (${values})`, columns.map((c) => row[c] ?? null));
}

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message.replace(/^beamwarden: /, '') : String(e);
}

/** Copy the file `from` into the empty register at `to`; `keyDir` holds the desk's trust list (for the checks). */
export async function copyRegister(from: string, to: string, keyDir: string): Promise<CopyReport> {
  if (!existsSync(from)) throw new RecordError('not-found', `There is no register file at ${from}.`);
  // The file's own checks first, read-only: it must be at this build's schema version.
  let source: RecordStore;
  try {
    source = await openRecordStore({ path: from, keyDir, readonly: true });
  } catch (e) {
    if (e instanceof RecordError && e.code === 'migration-failed') {
      throw new RecordError('migration-failed', `${e.message} (Open it once with this Beamwarden, then copy it.)`);
    }
    throw e;
  }
  const engine = await openPgEngine(to);
  const rows: Record<string, number> = {};
  const problems: CopyProblem[] = [];
  const db = new Database(from, { readonly: true, fileMustExist: true });
  let target: RecordStore | null = null;
  try {
    if (engine.schemaVersion !== LATEST_VERSION) throw new RecordError('migration-failed', 'The institution register is not at this build\'s schema version.');
    const client = await engine.port.pool.connect();
    try {
      const filled = await client.query<{ n: number }>('SELECT (SELECT count(*) FROM site) + (SELECT count(*) FROM person) + (SELECT count(*) FROM assessment) AS n');
      if ((filled.rows[0]?.n ?? 0) > 0) {
        throw new RecordError('conflict', `The institution register at ${engine.seam.location} already holds records. Copy a desk's register only into a new, empty register; nothing was copied.`);
      }
      const targetColumns = async (table: string) =>
        new Set((await client.query<{ c: string }>('SELECT column_name AS c FROM information_schema.columns WHERE table_schema = current_schema() AND table_name = $1', [table])).rows.map((r) => r.c));
      const columnsOf = async (table: string) => {
        const there = await targetColumns(table);
        return sqliteColumns(db, table).filter((c) => there.has(c) && !SERVER_NUMBERED.has(c));
      };
      await client.query('BEGIN');
      for (const [table, trigger] of SWITCHED_OFF) await client.query(`ALTER TABLE ${table} DISABLE TRIGGER ${trigger}`);
      for (const table of REGISTER_TABLES) {
        const columns = await columnsOf(table);
        rows[table] = 0;
        for (const row of db.prepare(`SELECT * FROM ${table} ORDER BY rowid`).iterate() as Iterable<Row>) {
          await client.query('SAVEPOINT one_row');
          try {
            await insertRow(client, table, columns, row);
            await client.query('RELEASE SAVEPOINT one_row');
            rows[table] += 1;
          } catch (e) {
            await client.query('ROLLBACK TO SAVEPOINT one_row');
            problems.push({ what: `${table} ${String(row['id'] ?? row['key_id'] ?? row['anchor'] ?? '')}`.trim(), reason: messageOf(e) });
          }
        }
      }
      // One statement at a time on the copying connection.
      const columns = { assessment: await columnsOf('assessment'), revision: await columnsOf('revision'), signature: await columnsOf('signature'), co_signature: await columnsOf('co_signature') };
      for (const t of ASSESSMENT_TABLES) rows[t] = 0;
      const revisionsOf = db.prepare('SELECT * FROM revision WHERE assessment_id = ? ORDER BY revision_no');
      const signatureOf = db.prepare('SELECT * FROM signature WHERE revision_id = ?');
      const coSignaturesOf = db.prepare('SELECT * FROM co_signature WHERE revision_id = ? ORDER BY rowid');
      for (const a of db.prepare('SELECT * FROM assessment ORDER BY rowid').iterate() as Iterable<Row>) {
        const counted: Record<string, number> = { assessment: 0, revision: 0, signature: 0, co_signature: 0 };
        await client.query('SAVEPOINT one_assessment');
        try {
          await insertRow(client, 'assessment', columns.assessment, a);
          counted['assessment'] = 1;
          for (const r of revisionsOf.all(a['id']) as Row[]) {
            await insertRow(client, 'revision', columns.revision, r);
            counted['revision'] = (counted['revision'] ?? 0) + 1;
            const s = signatureOf.get(r['id']) as Row | undefined;
            if (s) {
              await insertRow(client, 'signature', columns.signature, s);
              counted['signature'] = (counted['signature'] ?? 0) + 1;
            }
            for (const c of coSignaturesOf.all(r['id']) as Row[]) {
              await insertRow(client, 'co_signature', columns.co_signature, c);
              counted['co_signature'] = (counted['co_signature'] ?? 0) + 1;
            }
          }
          await client.query('RELEASE SAVEPOINT one_assessment');
          for (const [t, n] of Object.entries(counted)) rows[t] = (rows[t] ?? 0) + n;
        } catch (e) {
          await client.query('ROLLBACK TO SAVEPOINT one_assessment');
          problems.push({ what: `assessment ${String(a['id'])}`, reason: messageOf(e) });
        }
      }
      const auditColumns = await columnsOf('audit_event');
      rows['audit_event'] = 0;
      for (const e of db.prepare('SELECT * FROM audit_event ORDER BY seq').iterate() as Iterable<Row>) {
        await insertRow(client, 'audit_event', auditColumns, e);
        rows['audit_event'] += 1;
      }
      await client.query("INSERT INTO audit_event (at, action, entity, entity_id, detail) VALUES ($1, 'copied', 'register', '', $2)", [new Date().toISOString(), `from the file ${from}`]);
      for (const [table, trigger] of SWITCHED_OFF) await client.query(`ALTER TABLE ${table} ENABLE TRIGGER ${trigger}`);
      await client.query('COMMIT');
    } catch (e) {
      await client.query('ROLLBACK').catch(() => undefined);
      throw e;
    } finally {
      client.release();
    }
    // Fresh statistics for the planner: the tables were empty when the copy started.
    await engine.port.run('ANALYZE');
    // Every signed revision checked again on the server, and compared with the same check on the file.
    target = await openRecordStore({ path: to, keyDir });
    let signedRevisions = 0;
    let verifiedAlike = 0;
    const copied = new Set((await target.listAllAssessments()).map((a) => a.id));
    for (const a of await source.listAllAssessments()) {
      if (!copied.has(a.id)) continue;
      for (const r of await source.listRevisions(a.id)) {
        if (r.status === 'draft') continue;
        signedRevisions += 1;
        const here = await source.verify(a.id, r.id);
        const there = await target.verify(a.id, r.id);
        const same = here.ok === there.ok && here.signatureValid === there.signatureValid && here.fingerprintMatches === there.fingerprintMatches && here.keyTrusted === there.keyTrusted;
        if (same) verifiedAlike += 1;
        else problems.push({ what: `"${a.title}" revision ${r.revisionNo}`, reason: `its check on the server (${there.ok ? 'valid' : there.checks.filter((c) => !c.ok).map((c) => c.finding).join('; ')}) differs from the check on the file (${here.ok ? 'valid' : 'not valid'})` });
        if (!there.signatureValid || !there.fingerprintMatches) problems.push({ what: `"${a.title}" revision ${r.revisionNo}`, reason: 'its signature does not verify on the server' });
      }
    }
    const missing = target.info.warnings.filter((w) => /protections/.test(w));
    for (const w of missing) problems.push({ what: 'the register\'s protections', reason: w });
    return { from, to: engine.seam.location, rows, signedRevisions, verifiedAlike, problems };
  } finally {
    db.close();
    await source.close();
    await target?.close();
    await engine.close();
  }
}
