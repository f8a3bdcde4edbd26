/**
 * Crash safety: a child process writing assessments in a loop is killed with SIGKILL at arbitrary
 * moments. Afterwards every committed assessment is there, the file passes integrity_check, and
 * nothing half-written is visible. Relies on SQLite's atomic commit in WAL mode (SQLite
 * documentation, "Atomic Commit In SQLite" and "Write-Ahead Logging") and on each store write
 * being one transaction.
 */
import Database from 'better-sqlite3';
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { decodeResults } from '../../../electron/backend/records/assessments.js';
import { afterAll, describe, expect, it } from 'vitest';
import { openRecordStore } from '../../../electron/backend/records/index.js';
import { tempDir } from './helpers.js';

const writer = fileURLToPath(new URL('./crash-writer.ts', import.meta.url));
const t = tempDir('bw-crash-');
afterAll(() => t.cleanup());

interface Commit {
  id: string;
  revisionNo: number;
  status: string;
  counter: number;
}

/** Run the writer until it has reported `minCommits` commits plus a random delay, then SIGKILL it. */
function runAndKill(dbPath: string, minCommits: number): Promise<Commit[]> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', writer, dbPath, join(t.dir, 'keys')], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const commits: Commit[] = [];
    let buf = '';
    let stderr = '';
    let killScheduled = false;
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.stdout.on('data', (d: Buffer) => {
      buf += d.toString();
      let nl: number;
      while ((nl = buf.indexOf('\n')) >= 0) {
        const line = buf.slice(0, nl);
        buf = buf.slice(nl + 1);
        const m = /^committed (\S+) (\d+) (\S+) (\d+)$/.exec(line);
        if (m) commits.push({ id: m[1] ?? '', revisionNo: Number(m[2]), status: m[3] ?? '', counter: Number(m[4]) });
      }
      if (!killScheduled && commits.length >= minCommits) {
        killScheduled = true;
        // A random moment: mid-evaluation, mid-transaction or mid-commit.
        setTimeout(() => child.kill('SIGKILL'), Math.floor(Math.random() * 40));
      }
    });
    child.on('exit', (code, signal) => {
      if (signal === 'SIGKILL') resolve(commits);
      else reject(new Error(`writer exited by itself (code ${String(code)}): ${stderr}`));
    });
  });
}

describe('crash safety', () => {
  it('SIGKILL during a write loop loses nothing committed and leaves nothing half-written', async () => {
    const dbPath = join(t.dir, 'crash.sqlite');
    const reported: Commit[] = [];
    for (let round = 0; round < 4; round++) {
      reported.push(...(await runAndKill(dbPath, 10 + round * 7)));
    }
    expect(reported.length).toBeGreaterThan(40);

    // 1. The file is sound.
    const raw = new Database(dbPath);
    expect(raw.pragma('integrity_check', { simple: true })).toBe('ok');
    expect(raw.pragma('foreign_key_check')).toEqual([]);

    // 2. Every committed state is there (or a later one committed just before the kill).
    const latest = new Map<string, Commit>();
    for (const c of reported) latest.set(c.id, c);
    const revStmt = raw.prepare('SELECT revision_no, status, content_json FROM revision WHERE assessment_id = ? ORDER BY revision_no');
    for (const c of latest.values()) {
      const revs = revStmt.all(c.id) as Array<{ revision_no: number; status: string; content_json: string }>;
      expect(revs.length, `assessment ${c.id}`).toBeGreaterThanOrEqual(c.revisionNo);
      const newest = revs[revs.length - 1];
      const notes = (JSON.parse(newest?.content_json ?? '{}') as { notes: string }).notes;
      expect(Number(notes.slice(1))).toBeGreaterThanOrEqual(c.counter);
    }

    // 3. Nothing half-written: each assessment has revisions 1..n, at most one draft (the newest),
    //    every non-draft revision has its signature, every results blob decodes.
    const assessments = raw.prepare('SELECT id FROM assessment').all() as Array<{ id: string }>;
    expect(assessments.length).toBeGreaterThanOrEqual(latest.size);
    for (const { id } of assessments) {
      const revs = raw.prepare('SELECT id, revision_no, status, results_z FROM revision WHERE assessment_id = ? ORDER BY revision_no').all(id) as Array<{
        id: string;
        revision_no: number;
        status: string;
        results_z: Buffer;
      }>;
      expect(revs.map((r) => r.revision_no)).toEqual(revs.map((_, i) => i + 1));
      revs.forEach((r, i) => {
        if (r.status === 'draft') expect(i).toBe(revs.length - 1);
        else expect(raw.prepare('SELECT 1 FROM signature WHERE revision_id = ?').get(r.id)).toBeDefined();
        expect(() => decodeResults(r.results_z)).not.toThrow();
      });
    }
    raw.close();

    // 4. The store opens it and every signed record still verifies.
    const store = await openRecordStore({ path: dbPath, keyDir: join(t.dir, 'keys') });
    try {
      const signedIds = [...new Set(reported.filter((c) => c.status === 'signed').map((c) => c.id))];
      expect(signedIds.length).toBeGreaterThan(0);
      for (const id of signedIds) expect(await store.verify(id)).toMatchObject({ ok: true });
    } finally {
      await store.close();
    }
  });
});
