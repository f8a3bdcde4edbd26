/**
 * Options of the one application window. Kept free of Electron runtime imports so that
 * test/electron can check them on a machine without the Electron binary.
 */
import type { BrowserWindowConstructorOptions } from 'electron';

export interface Bounds {
  readonly width: number;
  readonly height: number;
  readonly x?: number;
  readonly y?: number;
}

/** The smallest size the UI is designed for (issue: works at 1280x800 and larger). */
export const MIN_SIZE = { width: 1100, height: 700 } as const;
export const DEFAULT_SIZE = { width: 1280, height: 800 } as const;

export function mainWindowOptions(preloadPath: string, bounds: Bounds): BrowserWindowConstructorOptions {
  return {
    ...bounds,
    minWidth: MIN_SIZE.width,
    minHeight: MIN_SIZE.height,
    title: 'Beamwarden',
    show: false,
    backgroundColor: '#f4f6f8',
    autoHideMenuBar: false,
    webPreferences: {
      preload: preloadPath,
      // The renderer gets no Node, runs in Chromium's sandbox and sees the preload's one object
      // only through the context bridge.
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      experimentalFeatures: false,
      enableBlinkFeatures: '',
      spellcheck: false,
      safeDialogs: true,
      navigateOnDragDrop: false,
      devTools: process.env['BEAMWARDEN_DEVTOOLS'] === '1',
    },
  };
}
