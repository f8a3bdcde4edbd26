/**
 * The IPC entry of the Electron main process, run under Node with Electron's module replaced by
 * a recorder (its binary cannot run here; toolchain notes section 1): every channel answers only
 * the app window's main frame on the app scheme, and the one handler table answers with the real
 * record store in a temporary folder (no database mock).
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

type Handler = (event: unknown, ...args: unknown[]) => Promise<unknown>;
const handlers = new Map<string, Handler>();
const shown: string[] = [];

vi.mock('electron', () => ({
  ipcMain: { handle: (channel: string, fn: Handler) => handlers.set(channel, fn), on: () => undefined },
  dialog: { showSaveDialog: async () => ({ canceled: true }) },
  shell: { openPath: async () => '', showItemInFolder: (p: string) => shown.push(p) },
  BrowserWindow: vi.fn(),
}));

const { registerIpc } = await import('../../electron/main/ipc.js');
const { handlerTable } = await import('../../electron/api/table.js');
const { openRecordStore } = await import('../../electron/backend/records/index.js');
const { IPC } = await import('../../electron/api/desktop-api.js');

const dir = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-ipc-'));
const store = await openRecordStore({ path: path.join(dir, 'records.sqlite') });
const appFrame = { url: 'beamwarden://app/index.html' };
const window = { webContents: { id: 3 } };

function event(frame: { url: string } | null, id = 3, mainFrame: object = appFrame): unknown {
  return { senderFrame: frame, sender: { id, mainFrame } };
}

beforeAll(() => {
  registerIpc(handlerTable, { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store }, () => window as never);
});
afterAll(async () => {
  await store.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('IPC', () => {
  it('registers the invoke channel and the shell channels, nothing else', () => {
    expect([...handlers.keys()].sort()).toEqual([IPC.invoke, IPC.openDataFolder, IPC.openForPrint, IPC.printScreen, IPC.saveFile].sort());
  });

  it('shows the database folder from the main process context only, and only to the app frame', async () => {
    await handlers.get(IPC.openDataFolder)?.(event(appFrame));
    expect(shown).toEqual([store.info.path]);
    await expect(handlers.get(IPC.openDataFolder)?.(event({ url: 'https://example.invalid/' }))).rejects.toThrow(/unexpected sender/);
    expect(shown).toHaveLength(1);
  });

  it('answers the app page with the handler table', async () => {
    const reply = (await handlers.get(IPC.invoke)?.(event(appFrame), 'app-info', {})) as { ok: boolean; value: { shell: string } };
    expect(reply.ok).toBe(true);
    expect(reply.value.shell).toBe('electron');
  });

  it.each([
    ['another window', event(appFrame, 4)],
    ['a sub-frame', event({ url: 'beamwarden://app/index.html' }, 3, { url: 'x' })],
    ['a page that navigated elsewhere', event({ url: 'https://example.invalid/' }, 3, { url: 'https://example.invalid/' })],
  ])('refuses %s', async (_name, ev) => {
    const reply = (await handlers.get(IPC.invoke)?.(ev, 'app-info', {})) as { ok: boolean; error: { code: string } };
    expect(reply).toEqual({ ok: false, error: { code: 'forbidden', message: 'IPC from an unexpected sender was refused' } });
    await expect(handlers.get(IPC.saveFile)?.(ev, { suggestedName: 'a.pdf', filter: { name: 'PDF', extensions: ['pdf'] }, base64: '' })).rejects.toThrow(/unexpected sender/);
  });

  it.each([
    ['an unknown operation', 'drop-tables', {}, 'unknown_operation', /unknown operation "drop-tables"/],
    ['a missing field', 'room-create', { siteId: 'x' }, 'invalid_input', /Code/],
    ['an unknown field', 'site-create', { name: 'A', colour: 'red' }, 'invalid_input', /unknown field|colour/],
    ['a record that does not exist', 'room-get', { id: 'nope' }, 'not_found', /nope|not found/i],
  ])('answers %s with a clear error, not a crash', async (_name, op, args, code, message) => {
    const reply = (await handlers.get(IPC.invoke)?.(event(appFrame), op, args)) as { ok: boolean; error: { code: string; message: string } };
    expect(reply.ok).toBe(false);
    expect(reply.error.code).toBe(code);
    expect(reply.error.message).toMatch(message);
  });
});
