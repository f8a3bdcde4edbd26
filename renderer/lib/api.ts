/**
 * The renderer's typed client: `invoke(name, args)` for every operation of the contract, over the
 * Electron preload when it is there, otherwise over HTTP to the loopback host with the per-start
 * token taken from the address the host printed. Also the few things that differ between the two
 * shells: saving a file, printing, native menu commands.
 */
import type { ArgsOf, OperationName, ResultOf } from '../../electron/api/operation.js';
import type { ApiErrorBody, ApiIssue, Reply } from '../../electron/api/reply.js';
import type { DesktopApi, MenuCommand, SaveFileResult } from '../../electron/api/desktop-api.js';

declare global {
  interface Window {
    beamwarden?: DesktopApi;
  }
}

/** An error the officer can act on: the message names the field where there is one. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly code: ApiErrorBody['code'];
  readonly field: string | undefined;
  readonly issues: readonly ApiIssue[];
  constructor(body: ApiErrorBody) {
    super(body.message);
    this.code = body.code;
    this.field = body.field;
    this.issues = body.issues ?? [];
  }
}

const TOKEN_HEADER = 'x-beamwarden-token';

function loopbackToken(): string {
  return new URLSearchParams(window.location.search).get('token') ?? '';
}

async function httpInvoke(name: string, args: unknown): Promise<Reply<unknown>> {
  let res: Response;
  try {
    res = await fetch(`./api/${encodeURIComponent(name)}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', [TOKEN_HEADER]: loopbackToken() },
      body: JSON.stringify(args),
      cache: 'no-store',
    });
  } catch (e) {
    return { ok: false, error: { code: 'internal', message: `cannot reach the Beamwarden host (is "npm run serve" still running?): ${String(e)}` } };
  }
  const text = await res.text();
  try {
    return JSON.parse(text) as Reply<unknown>;
  } catch {
    return { ok: false, error: { code: 'internal', message: `unexpected answer from the host (${res.status}): ${text.slice(0, 200)}` } };
  }
}

export function shellKind(): 'electron' | 'loopback' {
  return window.beamwarden ? 'electron' : 'loopback';
}

export async function invoke<K extends OperationName>(name: K, args: ArgsOf<K>): Promise<ResultOf<K>> {
  const reply = window.beamwarden ? await window.beamwarden.invoke(name, args) : ((await httpInvoke(name, args)) as Reply<ResultOf<K>>);
  if (!reply.ok) throw new ApiError(reply.error);
  return reply.value;
}

function bytesFromBase64(base64: string): Uint8Array<ArrayBuffer> {
  const bin = atob(base64);
  const out = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) out[i] = bin.charCodeAt(i);
  return out;
}

export function base64FromBytes(bytes: Uint8Array): string {
  let bin = '';
  for (let i = 0; i < bytes.length; i += 0x8000) bin += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return btoa(bin);
}

/** Save a file: native save-as dialog in Electron, the browser's download otherwise. */
export async function saveFile(suggestedName: string, mime: string, base64: string, extension: string): Promise<SaveFileResult> {
  if (window.beamwarden) {
    return window.beamwarden.saveFile({ suggestedName, filter: { name: extension.toUpperCase() + ' file', extensions: [extension] }, base64 });
  }
  const url = URL.createObjectURL(new Blob([bytesFromBase64(base64)], { type: mime }));
  const a = document.createElement('a');
  a.href = url;
  a.download = suggestedName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
  return { saved: true, path: suggestedName };
}

/** Open a PDF for printing: the system viewer in Electron, a browser tab otherwise. */
export async function openPdfForPrint(suggestedName: string, base64: string): Promise<void> {
  if (window.beamwarden) return window.beamwarden.openForPrint({ suggestedName, base64 });
  const url = URL.createObjectURL(new Blob([bytesFromBase64(base64)], { type: 'application/pdf' }));
  window.open(url, '_blank', 'noopener');
  setTimeout(() => URL.revokeObjectURL(url), 300_000);
}

/** Show the records folder in the file manager (desktop only; the loopback host has no file manager). */
export async function openDataFolder(): Promise<boolean> {
  if (!window.beamwarden) return false;
  await window.beamwarden.openDataFolder();
  return true;
}

export async function printScreen(): Promise<void> {
  if (window.beamwarden) return window.beamwarden.printScreen();
  window.print();
}

export function onMenuCommand(listener: (c: MenuCommand) => void): () => void {
  return window.beamwarden ? window.beamwarden.onMenuCommand(listener) : () => {};
}

/**
 * A file's bytes for an import: gzip-compressed as they are, plain JSON compressed here first, so
 * a large export from an older Beamwarden still fits in one request.
 */
export async function importFileBase64(file: Blob): Promise<string> {
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (bytes.length >= 2 && bytes[0] === 0x1f && bytes[1] === 0x8b) return base64FromBytes(bytes);
  const gz = await new Response(new Blob([bytes]).stream().pipeThrough(new CompressionStream('gzip'))).arrayBuffer();
  return base64FromBytes(new Uint8Array(gz));
}

/** Plain message of anything thrown, for an alert line. */
export function messageOf(e: unknown): string {
  if (e instanceof ApiError && e.issues.length > 0) return `${e.message}`;
  return e instanceof Error ? e.message : String(e);
}
