/**
 * Registers the ONE handler table on ipcMain with a single loop-free entry point: every call
 * arrives on one channel with the operation name, is sender-checked, then dispatched (zod
 * validation inside `dispatch`). The few shell-only channels (save dialog, print) get the same
 * sender check and their own schemas.
 */
import { dialog, ipcMain, shell, type BrowserWindow, type IpcMainInvokeEvent } from 'electron';
import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { z } from 'zod';
import { dispatch, describeIssues, issuesOf } from '../api/dispatch.js';
import type { HandlerTable } from '../api/operation.js';
import type { Reply } from '../api/reply.js';
import { IPC, type SaveFileResult } from '../api/desktop-api.js';
import { trustedSender } from './security.js';

const SaveFileSchema = z.strictObject({
  suggestedName: z.string().min(1).max(200),
  filter: z.strictObject({ name: z.string().max(100), extensions: z.array(z.string().regex(/^[a-z0-9]{1,8}$/)).min(1).max(5) }),
  base64: z.string().max(200_000_000),
});
const OpenForPrintSchema = z.strictObject({ suggestedName: z.string().min(1).max(200), base64: z.string().max(200_000_000) });

const FORBIDDEN_MESSAGE = 'IPC from an unexpected sender was refused';
const FORBIDDEN: Reply<never> = { ok: false, error: { code: 'forbidden', message: FORBIDDEN_MESSAGE } };

/** Only a plain file name (no folders) is ever offered in a dialog or written to a temp folder. */
function baseName(name: string): string {
  return path.basename(name).replace(/[^A-Za-z0-9._ -]+/g, '-') || 'document';
}

export function registerIpc<C extends { readonly databasePath: string }>(table: HandlerTable<C>, ctx: C, window: () => BrowserWindow | null): void {
  const trusted = (e: IpcMainInvokeEvent): boolean => trustedSender(e, window()?.webContents.id ?? null);

  ipcMain.handle(IPC.invoke, async (e, name: unknown, args: unknown): Promise<Reply<unknown>> => {
    if (!trusted(e)) return FORBIDDEN;
    if (typeof name !== 'string') return { ok: false, error: { code: 'unknown_operation', message: 'operation name must be text' } };
    return dispatch(table, ctx, name, args);
  });

  ipcMain.handle(IPC.saveFile, async (e, raw: unknown): Promise<SaveFileResult> => {
    if (!trusted(e)) throw new Error(FORBIDDEN_MESSAGE);
    const p = SaveFileSchema.safeParse(raw);
    if (!p.success) throw new Error(describeIssues(issuesOf(p.error)));
    const win = window();
    const opts = { defaultPath: baseName(p.data.suggestedName), filters: [{ name: p.data.filter.name, extensions: [...p.data.filter.extensions] }] };
    const res = win ? await dialog.showSaveDialog(win, opts) : await dialog.showSaveDialog(opts);
    if (res.canceled || !res.filePath) return { saved: false };
    writeFileSync(res.filePath, Buffer.from(p.data.base64, 'base64'));
    return { saved: true, path: res.filePath };
  });

  ipcMain.handle(IPC.openForPrint, async (e, raw: unknown): Promise<void> => {
    if (!trusted(e)) throw new Error(FORBIDDEN_MESSAGE);
    const p = OpenForPrintSchema.safeParse(raw);
    if (!p.success) throw new Error(describeIssues(issuesOf(p.error)));
    // A private temporary folder (mode 0700 by mkdtemp) so other users cannot swap the file.
    const dir = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-print-'));
    const file = path.join(dir, baseName(p.data.suggestedName).replace(/(\.pdf)?$/i, '.pdf'));
    writeFileSync(file, Buffer.from(p.data.base64, 'base64'), { mode: 0o600 });
    const err = await shell.openPath(file);
    if (err) throw new Error(`cannot open the PDF viewer: ${err}`);
  });

  // The database path comes from the main process's own context, never from the renderer.
  ipcMain.handle(IPC.openDataFolder, async (e): Promise<void> => {
    if (!trusted(e)) throw new Error(FORBIDDEN_MESSAGE);
    shell.showItemInFolder(ctx.databasePath);
  });

  ipcMain.handle(IPC.printScreen, async (e): Promise<void> => {
    if (!trusted(e)) throw new Error(FORBIDDEN_MESSAGE);
    const win = window();
    if (!win) return;
    await new Promise<void>((resolve, reject) => {
      win.webContents.print({ silent: false, printBackground: true }, (ok, reason) => (ok || reason === 'cancelled' ? resolve() : reject(new Error(reason))));
    });
  });
}
