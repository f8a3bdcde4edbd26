/**
 * Default data location per platform. Sources: XDG Base Directory Specification 0.8
 * ($XDG_CONFIG_HOME, default ~/.config; relative paths are invalid); Apple File System Programming
 * Guide (~/Library/Application Support); Windows Known Folders (FOLDERID_RoamingAppData = %APPDATA%).
 * These are also the folders Electron's app.getPath('userData') uses for an app named Beamwarden.
 */
import { mkdtempSync, existsSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultDataDir, defaultDatabasePath, openRecordStore } from '../../../electron/backend/records/index.js';

describe('default data folder', () => {
  it.each([
    ['linux, XDG_CONFIG_HOME set', 'linux', { XDG_CONFIG_HOME: '/home/ana/.cfg' }, '/home/ana', '/home/ana/.cfg/Beamwarden'],
    ['linux, XDG_CONFIG_HOME unset', 'linux', {}, '/home/ana', '/home/ana/.config/Beamwarden'],
    ['linux, relative XDG_CONFIG_HOME ignored', 'linux', { XDG_CONFIG_HOME: 'cfg' }, '/home/ana', '/home/ana/.config/Beamwarden'],
    ['freebsd like linux', 'freebsd', {}, '/home/ana', '/home/ana/.config/Beamwarden'],
    ['macOS', 'darwin', { XDG_CONFIG_HOME: '/ignored' }, '/Users/ana', '/Users/ana/Library/Application Support/Beamwarden'],
    ['Windows, APPDATA', 'win32', { APPDATA: 'C:\\Users\\ana\\AppData\\Roaming' }, 'C:\\Users\\ana', 'C:\\Users\\ana\\AppData\\Roaming\\Beamwarden'],
    ['Windows, APPDATA unset', 'win32', {}, 'C:\\Users\\ana', 'C:\\Users\\ana\\AppData\\Roaming\\Beamwarden'],
    ['override for portable installs and tests', 'linux', { BEAMWARDEN_DATA_DIR: '/media/usb/bw' }, '/home/ana', '/media/usb/bw'],
  ] as const)('%s', (_name, platform, env, home, expected) => {
    expect(defaultDataDir({ platform, env, home })).toBe(expected);
  });

  it('the database file sits in that folder', () => {
    expect(defaultDatabasePath({ platform: 'win32', env: { APPDATA: 'C:\\R' }, home: 'C:\\U' })).toBe('C:\\R\\Beamwarden\\beamwarden.sqlite');
    expect(defaultDatabasePath({ platform: 'linux', env: {}, home: '/home/ana' })).toBe('/home/ana/.config/Beamwarden/beamwarden.sqlite');
  });

  it('first start creates the folder and the database there; the demo loads on request', async () => {
    const root = mkdtempSync(join(tmpdir(), 'bw-first-'));
    const saved = process.env['BEAMWARDEN_DATA_DIR'];
    process.env['BEAMWARDEN_DATA_DIR'] = join(root, 'nested', 'Beamwarden');
    try {
      const store = await openRecordStore();
      expect(store.info.path).toBe(join(root, 'nested', 'Beamwarden', 'beamwarden.sqlite'));
      expect(existsSync(store.info.path)).toBe(true);
      expect(await store.listSites()).toEqual([]);
      const site = await store.seedDemo();
      expect(site.name).toBe('Harwick Vale Photonics Centre');
      expect((await store.seedDemo()).id).toBe(site.id); // idempotent
      const rooms = await store.listRooms(site.id);
      expect(rooms.map((r) => r.code)).toEqual(['A0.07', 'B2.14', 'B2.16', 'C1.03']);
      const statuses = (await Promise.all(rooms.map(async (r) => (await store.listAssessments(r.id)).map((a) => a.status)))).flat();
      expect(statuses.filter((s) => s === 'signed')).toHaveLength(1);
      await store.close();
    } finally {
      if (saved === undefined) delete process.env['BEAMWARDEN_DATA_DIR'];
      else process.env['BEAMWARDEN_DATA_DIR'] = saved;
      rmSync(root, { recursive: true, force: true });
    }
  });
});
