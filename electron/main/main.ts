/**
 * The Electron main process: one window with the hardened options of window-options.ts, the
 * renderer on the private app scheme, the ONE handler table on IPC, native menus, and the window
 * size remembered. Electron is imported only in electron/main.
 */
import { app, BrowserWindow, dialog, Menu, session as electronSession, shell } from 'electron';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defaultDataDir } from '../backend/records/index.js';
import { openAtStart } from './open-at-start.js';
import { handlerTable } from '../api/table.js';
import type { ApiContext } from '../api/context.js';
import { buildMenu } from './menu.js';
import { registerIpc } from './ipc.js';
import { registerSchemePrivileges, serveRenderer } from './protocol.js';
import { APP_ENTRY, isAppUrl } from './security.js';
import { mainWindowOptions } from './window-options.js';
import { loadWindowState, saveWindowState } from './window-state.js';
import { electronNativeBinding } from './native-binding.js';
import { packageVersion } from '../host/paths.js';

// dist/electron/main.js -> repository root two levels up
const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const RENDERER_DIR = path.join(ROOT, 'dist', 'renderer');
const PRELOAD = path.join(ROOT, 'dist', 'electron', 'preload.cjs');

app.setName('Beamwarden');
registerSchemePrivileges();
if (!app.requestSingleInstanceLock()) app.quit();

let win: BrowserWindow | null = null;

function harden(): void {
  // No permission (camera, notifications, geolocation ...) is ever granted to the renderer.
  electronSession.defaultSession.setPermissionRequestHandler((_wc, _perm, cb) => cb(false));
  electronSession.defaultSession.setPermissionCheckHandler(() => false);
  app.on('web-contents-created', (_e, contents) => {
    contents.on('will-navigate', (e, url) => {
      if (!isAppUrl(url)) e.preventDefault();
    });
    contents.on('will-redirect', (e, url) => {
      if (!isAppUrl(url)) e.preventDefault();
    });
    contents.on('will-attach-webview', (e) => e.preventDefault());
    contents.setWindowOpenHandler(({ url }) => {
      // New windows are denied; a plain https link is handed to the system browser instead.
      if (/^https:\/\//.test(url)) void shell.openExternal(url);
      return { action: 'deny' };
    });
  });
}

function createWindow(): void {
  const stateFile = path.join(app.getPath('userData'), 'window-state.json');
  const state = loadWindowState(stateFile);
  const { maximized, ...bounds } = state;
  win = new BrowserWindow(mainWindowOptions(PRELOAD, bounds));
  if (maximized) win.maximize();
  win.once('ready-to-show', () => win?.show());
  const remember = (): void => {
    if (win && !win.isDestroyed()) saveWindowState(stateFile, win.getNormalBounds(), win.isMaximized());
  };
  win.on('resize', remember);
  win.on('move', remember);
  win.on('close', remember);
  win.on('closed', () => {
    win = null;
  });
  void win.loadURL(APP_ENTRY);
}

void app.whenReady().then(async () => {
  harden();
  const nativeBinding = electronNativeBinding(ROOT, process.versions.electron ?? '');
  // --db, else BEAMWARDEN_DB, else the saved institution register setting, else the default file
  // (made with its parents on first start; a folder named in --db or BEAMWARDEN_DB must exist).
  // A saved register that cannot be reached stops the start with the reason: never a silent
  // fallback to the local file.
  const settingsDir = defaultDataDir();
  const started = await openAtStart({ argv: process.argv, env: process.env['BEAMWARDEN_DB'], settingsDir, ...(nativeBinding ? { nativeBinding } : {}) });
  if (!started.ok) {
    dialog.showErrorBox(started.title, started.message);
    app.exit(1);
    return;
  }
  const { store, open, source } = started;
  const ctx: ApiContext = {
    shell: 'electron',
    version: packageVersion(),
    databasePath: store.info.path,
    store,
    openStore: open,
    registerSource: source,
    settingsDir,
    ...(nativeBinding ? { nativeBinding } : {}),
  };
  registerIpc(handlerTable, ctx, () => win);
  serveRenderer(RENDERER_DIR);
  Menu.setApplicationMenu(buildMenu(() => win, process.platform === 'darwin'));
  createWindow();
  app.on('second-instance', () => {
    if (win) {
      if (win.isMinimized()) win.restore();
      win.focus();
    }
  });
  app.on('activate', () => {
    if (BrowserWindow.getAllWindows().length === 0) createWindow();
  });
  // The store closes asynchronously (it waits for running work): quit again once it is closed.
  let closed = false;
  app.on('will-quit', (event) => {
    if (closed) return;
    event.preventDefault();
    void ctx.store.close().finally(() => {
      closed = true;
      app.quit();
    });
  });
});

app.on('window-all-closed', () => {
  if (process.platform !== 'darwin') app.quit();
});
