/**
 * Storage errors said plainly (issue 11, item 7), each a defect seen before:
 * - a healthy database on a read-only file system was reported as damaged ("restore it from a backup");
 * - an immutable database file let the host start, and the first save failed;
 * - a full disk came back over HTTP as code "internal";
 * - a full disk while the signing key was created left a temporary key file behind;
 * - a missing folder (drive not connected) was silently created elsewhere.
 * Real file systems: a small tmpfs mounted for the test (full disk, read-only remount) and the
 * ext4 immutable attribute (chattr +i). Both need root; where the machine does not allow them the
 * case is skipped with the reason. Cases "derived: say what the disk refused".
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openRecordStore, RecordError, type RecordStore } from '../../../electron/backend/records/index.js';
import { registerRoom, tempDir } from './helpers.js';
import { startTestHost } from './http-host.js';

function can(cmd: string, args: string[]): boolean {
  try {
    execFileSync(cmd, args, { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

const probe = tempDir('bw-probe-');
mkdirSync(join(probe.dir, 'm'));
const CAN_MOUNT = can('mount', ['-t', 'tmpfs', '-o', 'size=64k', 'tmpfs', join(probe.dir, 'm')]) && can('umount', [join(probe.dir, 'm')]);
writeFileSync(join(probe.dir, 'f'), '');
const CAN_CHATTR = can('chattr', ['+i', join(probe.dir, 'f')]) && can('chattr', ['-i', join(probe.dir, 'f')]);
probe.cleanup();

let t: ReturnType<typeof tempDir>;
const mounted: string[] = [];
const immutable: string[] = [];
beforeEach(() => {
  t = tempDir('bw-storage-');
});
afterEach(() => {
  for (const f of immutable.splice(0)) can('chattr', ['-i', f]);
  for (const m of mounted.splice(0).reverse()) can('umount', ['-l', m]);
  t.cleanup();
});

function smallDisk(name: string, size: string): string {
  const dir = join(t.dir, name);
  mkdirSync(dir);
  execFileSync('mount', ['-t', 'tmpfs', '-o', `size=${size}`, 'tmpfs', dir]);
  mounted.push(dir);
  return dir;
}

/** Write until the disk refuses (ENOSPC). */
function fill(dir: string): void {
  const chunk = Buffer.alloc(64 * 1024, 1);
  for (let i = 0; i < 100_000; i++) {
    try {
      writeFileSync(join(dir, `filler-${i}`), chunk);
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'ENOSPC') {
        // Top up the last few free bytes too.
        for (const size of [4096, 512, 1]) {
          try {
            writeFileSync(join(dir, `filler-${i}-${size}`), Buffer.alloc(size));
          } catch {
            /* full */
          }
        }
        return;
      }
      throw e;
    }
  }
  throw new Error('the disk never filled');
}

async function errorOf(fn: () => unknown): Promise<RecordError> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof RecordError) return e;
    throw e;
  }
  throw new Error('expected a RecordError');
}

const open = (path: string, keyDir = join(t.dir, 'keys')): Promise<RecordStore> => openRecordStore({ path, keyDir });

describe('at start', () => {
  it.skipIf(!CAN_MOUNT)('a healthy database on a read-only disk: told read-only, never "damaged"', async () => {
    const disk = smallDisk('ro', '8m');
    const path = join(disk, 'records.sqlite');
    const s = await open(path);
    await registerRoom(s);
    await s.close();
    execFileSync('mount', ['-o', 'remount,ro', disk]);
    const err = await errorOf(() => open(path));
    expect(err.code).toBe('storage');
    expect(err.message).toMatch(/is on a read-only disk or share: Beamwarden can read there but not save/);
    expect(err.message).not.toMatch(/restore it from a backup|is damaged|failed its integrity check/);
    expect(err.message).toMatch(/not damaged/);
    // Opening it read-only (SQLite's write-ahead log needs its shared-memory file beside it) is
    // refused with the same plain words, never as damage.
    const ro = await errorOf(() => openRecordStore({ path, readonly: true }));
    expect(ro.message).toMatch(/read-only disk or share.*not damaged/);
  });

  it.skipIf(!CAN_CHATTR)('an immutable database file: refused at start with its own message (not at the first save)', async () => {
    const path = join(t.dir, 'records.sqlite');
    const s = await open(path);
    await registerRoom(s);
    await s.close();
    execFileSync('chattr', ['+i', path]);
    immutable.push(path);
    const err = await errorOf(() => open(path));
    expect(err.code).toBe('storage');
    expect(err.message).toMatch(/is marked unchangeable \(immutable, or locked by the system\): Beamwarden can read it but cannot save into it/);
    expect(err.message).toMatch(/chattr -i/);
  });

  it('a folder that does not exist (drive not connected): said so, and not created elsewhere', async () => {
    const path = join(t.dir, 'usb-stick-not-mounted', 'Beamwarden', 'records.sqlite');
    const err = await errorOf(() => open(path));
    expect(err.code).toBe('storage');
    expect(err.message).toMatch(/The folder .*usb-stick-not-mounted.Beamwarden does not exist \(is the drive or network share connected\?\)/);
    expect(existsSync(join(t.dir, 'usb-stick-not-mounted'))).toBe(false);
  });

  it('a folder whose parent exists is made (a new data folder)', async () => {
    const s = await open(join(t.dir, 'new-folder', 'records.sqlite'));
    expect(await s.listSites()).toEqual([]);
    await s.close();
  });
});

describe('at the failing action', () => {
  it.skipIf(!CAN_MOUNT)('a full disk while saving, over HTTP: code "storage" with the plain message, nothing half-written', async () => {
    const disk = smallDisk('full', '4m');
    const path = join(disk, 'records.sqlite');
    const s = await open(path, join(t.dir, 'keys'));
    const { room } = await registerRoom(s);
    const host = await startTestHost(s);
    try {
      fill(disk);
      const before = (await s.listInstallations(room.id)).length;
      // Large notes: the write needs new pages the disk no longer has.
      let reply: Awaited<ReturnType<typeof host.call>>['reply'] | null = null;
      for (let i = 0; i < 20; i++) {
        const r = await host.call('site-create', { name: `Annex ${i}`, notes: 'n'.repeat(9_000) });
        if (!r.reply.ok) {
          reply = r.reply;
          expect(r.status).toBe(507);
          break;
        }
      }
      expect(reply).not.toBeNull();
      if (reply && !reply.ok) {
        expect(reply.error.code).toBe('storage');
        expect(reply.error.message).toMatch(/The disk holding .* is full: .* could not be saved, and nothing of it was written\. Free some space/);
      }
      expect(await s.listInstallations(room.id)).toHaveLength(before);
    } finally {
      await host.close();
      await s.close();
    }
  });

  it.skipIf(!CAN_MOUNT)('a full disk while the signing key is made: plain message, no stray temporary file, no key half made', async () => {
    const keys = smallDisk('keys', '64k');
    const s = await open(join(t.dir, 'records.sqlite'), keys);
    try {
      const person = await s.createPerson({ name: 'Dr. Imre Calloway-Senn', role: 'LSO' });
      fill(keys);
      const pass = 'a passphrase for the test';
      const err = await errorOf(() => s.createPersonKey({ personId: person.id, passphrase: pass, passphraseAgain: pass }));
      expect(err.code).toBe('storage');
      expect(err.message).toMatch(/is full: This desk's trust anchor setting could not be saved/);
      expect(readdirSync(keys).filter((f) => f.endsWith('.tmp'))).toEqual([]);
      expect(await s.listPersonKeys()).toEqual([]);
    } finally {
      await s.close();
    }
  });
});
