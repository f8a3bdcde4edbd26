/**
 * The one object the Electron preload exposes to the renderer (`window.beamwarden`). The preload
 * must `satisfies DesktopApi`; the renderer's client uses the same type. The loopback host offers
 * the same `invoke` over HTTP and the browser's own download/print for the rest.
 */
import type { ArgsOf, OperationName, ResultOf } from './operation.js';
import type { Reply } from './reply.js';

/** Commands the native menu sends to the renderer (accelerators in electron/main/menu.ts). */
export const MENU_COMMANDS = [
  'go-register',
  'go-workspace',
  'go-eyewear',
  'go-controls',
  'go-review',
  'go-documents',
  'go-checks',
  'save',
  'print-screen',
  'export-json',
  'import-json',
  'backup-now',
  'restore-backup',
] as const;
export type MenuCommand = (typeof MENU_COMMANDS)[number];

export interface SaveFileRequest {
  readonly suggestedName: string;
  /** e.g. { name: 'PDF document', extensions: ['pdf'] } */
  readonly filter: { readonly name: string; readonly extensions: readonly string[] };
  /** File bytes, base64. */
  readonly base64: string;
}

export type SaveFileResult = { readonly saved: true; readonly path: string } | { readonly saved: false };

export interface DesktopApi {
  invoke<K extends OperationName>(name: K, args: ArgsOf<K>): Promise<Reply<ResultOf<K>>>;
  /** Native save-as dialog, then write the bytes (main process). */
  saveFile(request: SaveFileRequest): Promise<SaveFileResult>;
  /** Open a PDF in the system viewer for printing (written to a private temporary file). */
  openForPrint(request: { readonly suggestedName: string; readonly base64: string }): Promise<void>;
  /** Print the current screen with the system dialog. */
  printScreen(): Promise<void>;
  /** Show the folder holding the records database in the system file manager. */
  openDataFolder(): Promise<void>;
  /** Subscribe to native menu commands; returns the unsubscribe function. */
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
}

/** IPC channel names, one place (main and preload import them). */
export const IPC = {
  invoke: 'bw:invoke',
  saveFile: 'bw:save-file',
  openForPrint: 'bw:open-for-print',
  printScreen: 'bw:print-screen',
  openDataFolder: 'bw:open-data-folder',
  menu: 'bw:menu',
} as const;
