#!/usr/bin/env node
/**
 * `npm start` (after `npm run build`): start Beamwarden in Electron when Electron's binary is on
 * this machine; otherwise say why and start the loopback host instead (open the printed address
 * in a browser). Extra arguments go to the loopback host (e.g. `npm start -- --port 8080`).
 *
 * With Electron, the native SQLite addon must be built for Electron's ABI. That copy lives in
 * electron/native/<electron version>/ (git-ignored), made here with better-sqlite3's own
 * prebuild step for the Electron runtime; node_modules keeps the Node build that `npm test` and
 * the loopback host use (toolchain notes section 8).
 */
import { spawn, spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const args = process.argv.slice(2);
const say = (s) => process.stderr.write(`beamwarden: ${s}\n`);

/** The Electron executable if it is installed, without triggering electron's lazy download. */
function electronBinary() {
  const pkgDir = path.join(ROOT, 'node_modules', 'electron');
  const pathFile = path.join(pkgDir, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const rel = readFileSync(pathFile, 'utf8').trim();
  const base = process.env.ELECTRON_OVERRIDE_DIST_PATH || path.join(pkgDir, 'dist');
  const bin = path.join(base, rel);
  return existsSync(bin) ? bin : null;
}

function electronVersion() {
  return JSON.parse(readFileSync(path.join(ROOT, 'node_modules', 'electron', 'package.json'), 'utf8')).version;
}

/** Make electron/native/<version>/better_sqlite3.node once; returns false if it cannot be made. */
function ensureElectronSqlite(version) {
  const target = path.join(ROOT, 'electron', 'native', version, 'better_sqlite3.node');
  if (existsSync(target)) return true;
  const work = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-native-'));
  try {
    const copy = path.join(work, 'better-sqlite3');
    cpSync(path.join(ROOT, 'node_modules', 'better-sqlite3'), copy, { recursive: true, filter: (p) => !p.includes(`${path.sep}build${path.sep}`) });
    const prebuild = path.join(ROOT, 'node_modules', 'prebuild-install', 'bin.js');
    const r = spawnSync(process.execPath, [prebuild, '--runtime', 'electron', '--target', version, '--arch', process.arch], { cwd: copy, stdio: 'inherit' });
    const built = path.join(copy, 'build', 'Release', 'better_sqlite3.node');
    if (r.status !== 0 || !existsSync(built)) return false;
    mkdirSync(path.dirname(target), { recursive: true });
    cpSync(built, target);
    return true;
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

function startLoopbackHost(reason) {
  say(reason);
  say('starting the loopback host instead: open the address below in your browser (see README, "Running without Electron").');
  const tsx = path.join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs');
  const child = spawn(process.execPath, [tsx, path.join(ROOT, 'electron', 'host', 'serve.ts'), ...args], { stdio: 'inherit', cwd: ROOT });
  const forward = (sig) => () => child.kill(sig);
  process.on('SIGINT', forward('SIGINT'));
  process.on('SIGTERM', forward('SIGTERM'));
  child.on('exit', (code) => process.exit(code ?? 0));
}

function startElectron(bin) {
  const version = electronVersion();
  const tsx = path.join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs');
  const b = spawnSync(process.execPath, [tsx, path.join(ROOT, 'electron', 'main', 'build.ts')], { stdio: 'inherit', cwd: ROOT });
  if (b.status !== 0) return startLoopbackHost('building the Electron main process failed.');
  if (!ensureElectronSqlite(version)) {
    return startLoopbackHost(`could not get better-sqlite3 built for Electron ${version} (it needs the prebuilt binary or Electron's headers from the internet).`);
  }
  const child = spawn(bin, [path.join(ROOT, 'dist', 'electron', 'main.js')], { stdio: 'inherit', cwd: ROOT, env: { ...process.env, ELECTRON_RUN_AS_NODE: '' } });
  child.on('exit', (code) => process.exit(code ?? 0));
}

/**
 * Electron 42 and later fetch their binary on first use rather than at install. Try that once
 * (it fails within seconds without internet); BEAMWARDEN_NO_ELECTRON=1 skips Electron entirely.
 */
function fetchElectronOnce() {
  const installer = path.join(ROOT, 'node_modules', 'electron', 'install.js');
  if (!existsSync(installer)) return;
  say("fetching Electron's binary (first start only)…");
  spawnSync(process.execPath, [installer], { stdio: 'inherit', cwd: path.dirname(installer), timeout: 600_000 });
}

let bin = null;
if (process.env.BEAMWARDEN_NO_ELECTRON !== '1') {
  bin = electronBinary();
  if (!bin) {
    fetchElectronOnce();
    bin = electronBinary();
  }
}
if (bin) startElectron(bin);
else if (process.env.BEAMWARDEN_NO_ELECTRON === '1') startLoopbackHost('BEAMWARDEN_NO_ELECTRON=1 is set.');
else startLoopbackHost("Electron's binary is not installed on this machine (npm's electron package downloads it from GitHub on first use).");
