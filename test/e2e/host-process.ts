/**
 * Starts the loopback host (`electron/host/serve.ts`) as a child process on a temporary database
 * and reads the one line it prints. Used by the end-to-end tests and the screenshot script.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const REPO = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const LISTEN_PREFIX = 'Beamwarden listening at http://127.0.0.1:';

export interface HostHandle {
  readonly url: string;
  readonly origin: string;
  readonly token: string;
  readonly dir: string;
  readonly db: string;
  readonly child: ChildProcess;
  /** Lines the host wrote to stdout (must be exactly one). */
  readonly stdoutLines: string[];
  stop(): Promise<void>;
}

export interface HostOptions {
  readonly demo?: boolean;
  /** The desk's user-data folder (trust list, signing log, settings); a new temporary one if left out. */
  readonly dir?: string;
  /** A database address given with --db (a postgres:// address for an institution register); the folder's records.sqlite if left out. */
  readonly db?: string;
}

export async function startHost(opts: HostOptions = {}): Promise<HostHandle> {
  const dir = opts.dir ?? mkdtempSync(path.join(os.tmpdir(), 'beamwarden-e2e-'));
  const db = opts.db ?? path.join(dir, 'records.sqlite');
  const args = [path.join(REPO, 'node_modules', 'tsx', 'dist', 'cli.mjs'), path.join(REPO, 'electron', 'host', 'serve.ts'), '--db', db, '--port', '0'];
  if (opts.demo) args.push('--demo');
  const child = spawn(process.execPath, args, { cwd: REPO, stdio: ['ignore', 'pipe', 'pipe'], env: { ...process.env, BEAMWARDEN_DATA_DIR: dir } });
  const stdoutLines: string[] = [];
  let stderr = '';
  child.stderr?.on('data', (d: Buffer) => (stderr += d.toString()));
  const line = await new Promise<string>((resolve, reject) => {
    let buf = '';
    const timer = setTimeout(() => reject(new Error(`host did not start within 60 s; stderr: ${stderr}`)), 60_000);
    child.stdout?.on('data', (d: Buffer) => {
      buf += d.toString();
      let i: number;
      while ((i = buf.indexOf('\n')) >= 0) {
        const l = buf.slice(0, i);
        buf = buf.slice(i + 1);
        stdoutLines.push(l);
        if (l.startsWith(LISTEN_PREFIX)) {
          clearTimeout(timer);
          resolve(l);
        }
      }
    });
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`host exited with ${code}; stderr: ${stderr}`));
    });
  });
  const url = line.slice('Beamwarden listening at '.length).trim();
  const u = new URL(url);
  return {
    url,
    origin: u.origin,
    token: u.searchParams.get('token') ?? '',
    dir,
    db,
    child,
    stdoutLines,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

export function removeDir(dir: string): void {
  rmSync(dir, { recursive: true, force: true });
}
