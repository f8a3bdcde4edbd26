/**
 * Static check of the Electron shell's security settings (Electron's binary cannot run here):
 * the window options, the Content-Security-Policy in both shells and in index.html, the one
 * preload object, navigation and new-window denial, and that Electron is imported only in
 * electron/main. The checklist follows Electron's security recommendations (electronjs.org,
 * "Security" tutorial: context isolation, sandbox, no Node integration, CSP, no navigation, no new
 * windows, validate IPC senders) and the issue 'The desktop app'.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { mainWindowOptions } from '../../electron/main/window-options.js';
import { CONTENT_SECURITY_POLICY, SECURITY_HEADERS } from '../../electron/api/content-security.js';
import { isAppUrl, trustedSender } from '../../electron/main/security.js';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const read = (p: string): string => readFileSync(path.join(ROOT, p), 'utf8');

function directives(csp: string): Map<string, string[]> {
  return new Map(
    csp
      .split(';')
      .map((d) => d.trim())
      .filter(Boolean)
      .map((d) => {
        const [name, ...values] = d.split(/\s+/);
        return [name ?? '', values] as const;
      }),
  );
}

function filesUnder(dir: string, exts: readonly string[]): string[] {
  const out: string[] = [];
  for (const name of readdirSync(path.join(ROOT, dir))) {
    const rel = path.join(dir, name);
    if (statSync(path.join(ROOT, rel)).isDirectory()) out.push(...filesUnder(rel, exts));
    else if (exts.some((e) => name.endsWith(e))) out.push(rel);
  }
  return out;
}

describe('window options', () => {
  const web = mainWindowOptions('/app/preload.cjs', { width: 1280, height: 800 }).webPreferences ?? {};
  const expected: ReadonlyArray<[keyof typeof web, unknown]> = [
    ['contextIsolation', true],
    ['sandbox', true],
    ['nodeIntegration', false],
    ['nodeIntegrationInWorker', false],
    ['nodeIntegrationInSubFrames', false],
    ['webSecurity', true],
    ['allowRunningInsecureContent', false],
    ['webviewTag', false],
    ['experimentalFeatures', false],
    ['navigateOnDragDrop', false],
    ['preload', '/app/preload.cjs'],
  ];
  it.each(expected)('%s is %s', (key, value) => {
    expect(web[key]).toBe(value);
  });
  it('opens at the size the UI is designed for and cannot shrink below a usable size', () => {
    const o = mainWindowOptions('/p', { width: 1280, height: 800 });
    expect([o.width, o.height]).toEqual([1280, 800]);
    expect(o.minWidth).toBeGreaterThanOrEqual(1024);
    expect(o.minHeight).toBeGreaterThanOrEqual(640);
  });
});

describe('Content-Security-Policy', () => {
  const csp = directives(CONTENT_SECURITY_POLICY);
  it.each([
    ['default-src', ["'none'"]],
    ['script-src', ["'self'"]],
    ['style-src', ["'self'"]],
    ['connect-src', ["'self'"]],
    ['object-src', ["'none'"]],
    ['base-uri', ["'none'"]],
    ['form-action', ["'none'"]],
    ['frame-ancestors', ["'none'"]],
  ] as const)('%s is %j', (name, values) => {
    expect(csp.get(name)).toEqual(values);
  });
  it('allows no inline code, no eval and no remote origin anywhere', () => {
    expect(CONTENT_SECURITY_POLICY).not.toMatch(/unsafe-inline|unsafe-eval|unsafe-hashes|wasm-unsafe-eval|\*|https?:|wss?:/);
  });
  it('is sent as a header by both shells', () => {
    expect(SECURITY_HEADERS['Content-Security-Policy']).toBe(CONTENT_SECURITY_POLICY);
    expect(read('electron/main/protocol.ts')).toMatch(/SECURITY_HEADERS/);
    expect(read('electron/host/server.ts')).toMatch(/SECURITY_HEADERS/);
  });
  it('is repeated in index.html (frame-ancestors is header-only: browsers ignore it in a meta tag)', () => {
    const m = /http-equiv="Content-Security-Policy" content="([^"]+)"/.exec(read('renderer/index.html'));
    expect(m).not.toBeNull();
    const meta = directives(m?.[1] ?? '');
    const header = directives(CONTENT_SECURITY_POLICY);
    header.delete('frame-ancestors');
    expect(meta).toEqual(header);
  });
  it('index.html has no inline script or style', () => {
    const html = read('renderer/index.html');
    expect(html).not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/);
    expect(html).not.toMatch(/<style|\sstyle="/);
  });
});

describe('main process', () => {
  const main = read('electron/main/main.ts');
  it('denies new windows and navigation away from the app scheme', () => {
    expect(main).toMatch(/setWindowOpenHandler\([\s\S]*?return \{ action: 'deny' \}/);
    expect(main).toMatch(/'will-navigate', \(e, url\) => \{\s*if \(!isAppUrl\(url\)\) e\.preventDefault\(\);/);
    expect(main).toMatch(/'will-redirect'/);
    expect(main).toMatch(/'will-attach-webview', \(e\) => e\.preventDefault\(\)/);
    expect(main).toMatch(/setPermissionRequestHandler\(\(_wc, _perm, cb\) => cb\(false\)\)/);
  });
  it('loads only the app scheme, never file:// or http(s)', () => {
    expect(main).toMatch(/loadURL\(APP_ENTRY\)/);
    expect(main).not.toMatch(/loadFile|loadURL\(['"`]https?:/);
  });
  it('checks the sender of every IPC handler', () => {
    const ipc = read('electron/main/ipc.ts');
    const handlers = ipc.match(/ipcMain\.handle\(/g) ?? [];
    const checks = ipc.match(/if \(!trusted\(e\)\)/g) ?? [];
    expect(handlers.length).toBeGreaterThan(0);
    expect(checks.length).toBe(handlers.length);
    expect(ipc).not.toMatch(/ipcMain\.on\(/);
  });
});

describe('sender check', () => {
  const frame = { url: 'beamwarden://app/index.html' };
  const good = { senderFrame: frame, sender: { id: 7, mainFrame: frame } };
  const cases: ReadonlyArray<[string, Parameters<typeof trustedSender>[0], number | null, boolean]> = [
    ['main frame of the app window on the app scheme', good, 7, true],
    ['another window', good, 8, false],
    ['no window yet', good, null, false],
    ['a sub-frame', { senderFrame: { url: 'beamwarden://app/x.html' }, sender: { id: 7, mainFrame: frame } }, 7, false],
    ['a page navigated to https', { senderFrame: { url: 'https://example.invalid/' }, sender: { id: 7, mainFrame: { url: 'x' } } }, 7, false],
    ['a destroyed frame', { senderFrame: null, sender: { id: 7, mainFrame: frame } }, 7, false],
  ];
  it.each(cases)('%s -> %s', (_name, event, id, ok) => {
    expect(trustedSender(event, id)).toBe(ok);
  });
  it.each([
    ['beamwarden://app/index.html', true],
    ['beamwarden://other/index.html', false],
    ['file:///etc/passwd', false],
    ['http://127.0.0.1:8080/', false],
    ['not a url', false],
  ])('isAppUrl(%s) = %s', (url, ok) => {
    expect(isAppUrl(url)).toBe(ok);
  });
});

describe('preload and imports', () => {
  it('the preload exposes exactly one object, typed against the contract', () => {
    const preload = read('electron/main/preload.ts');
    expect(preload.match(/exposeInMainWorld\(/g)).toHaveLength(1);
    expect(preload).toMatch(/satisfies DesktopApi/);
    expect(preload).not.toMatch(/from 'node:|require\(/);
  });
  it('electron is imported only in electron/main (the app code everywhere else runs without it)', () => {
    const files = ['core', 'renderer', 'electron'].flatMap((d) => filesUnder(d, ['.ts', '.svelte', '.mjs', '.js']));
    const runtimeImport = /^\s*import\s+(?!type\b)[^;]*from\s+['"]electron['"]|require\(['"]electron['"]\)/m;
    const offenders = files.filter((f) => !f.startsWith(path.join('electron', 'main') + path.sep) && runtimeImport.test(read(f)));
    expect(offenders).toEqual([]);
    // and electron/main itself does import it at run time (the check above is not vacuous)
    expect(runtimeImport.test(read('electron/main/main.ts'))).toBe(true);
  });
});
