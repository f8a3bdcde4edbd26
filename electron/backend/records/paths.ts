/**
 * Where the records live by default: the platform's user-data folder, the same place Electron's
 * `app.getPath('userData')` uses for an app named Beamwarden (computed here without Electron so the
 * CLI and the loopback host find the same database):
 * - Linux and other Unix: $XDG_CONFIG_HOME/Beamwarden, else ~/.config/Beamwarden (XDG Base Directory spec);
 * - macOS: ~/Library/Application Support/Beamwarden;
 * - Windows: %APPDATA%\Beamwarden, else <home>\AppData\Roaming\Beamwarden.
 * BEAMWARDEN_DATA_DIR overrides all of these (tests, portable installs).
 */
import { homedir } from 'node:os';
import path from 'node:path';

export const APP_FOLDER = 'Beamwarden';
export const DATABASE_FILE = 'beamwarden.sqlite';

export interface PlatformEnv {
  readonly platform: NodeJS.Platform;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly home: string;
}

export function defaultDataDir(
  p: PlatformEnv = { platform: process.platform, env: process.env, home: homedir() },
): string {
  const override = p.env['BEAMWARDEN_DATA_DIR'];
  if (override) return override;
  if (p.platform === 'win32') {
    const appData = p.env['APPDATA'] || path.win32.join(p.home, 'AppData', 'Roaming');
    return path.win32.join(appData, APP_FOLDER);
  }
  if (p.platform === 'darwin') return path.posix.join(p.home, 'Library', 'Application Support', APP_FOLDER);
  // XDG: a relative XDG_CONFIG_HOME is invalid and must be ignored.
  const xdg = p.env['XDG_CONFIG_HOME'];
  const base = xdg && path.posix.isAbsolute(xdg) ? xdg : path.posix.join(p.home, '.config');
  return path.posix.join(base, APP_FOLDER);
}

export function defaultDatabasePath(p?: PlatformEnv): string {
  const dir = defaultDataDir(p);
  return (p?.platform ?? process.platform) === 'win32' ? path.win32.join(dir, DATABASE_FILE) : path.join(dir, DATABASE_FILE);
}
