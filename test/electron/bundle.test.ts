/**
 * The Electron bundles build, and the preload is one CommonJS file that loads nothing but
 * 'electron' (a sandboxed preload cannot load other modules: Electron docs, "Process Sandboxing").
 */
import { afterAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildElectron } from '../../electron/main/build.js';

const out = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-electron-build-'));
afterAll(() => rmSync(out, { recursive: true, force: true }));

describe('Electron bundles', () => {
  it('build; the preload requires only electron and exposes one object', async () => {
    await buildElectron(out);
    const preload = readFileSync(path.join(out, 'preload.cjs'), 'utf8');
    const required = [...preload.matchAll(/require\(["']([^"']+)["']\)/g)].map((m) => m[1]);
    expect(required).toEqual(['electron']);
    expect(preload).not.toMatch(/^\s*import\s/m);
    expect(preload.match(/exposeInMainWorld\(/g)).toHaveLength(1);
    const main = readFileSync(path.join(out, 'main.js'), 'utf8');
    expect(main).toMatch(/from "electron"/);
    expect(main).toMatch(/beamwarden:\/\/app/);
  }, 120_000);
});
