/**
 * What the desktop app opens at start, and the error box it shows when it cannot: kept apart from
 * main.ts (which imports Electron) so the wording an officer reads is tested on the real server
 * without Electron's binary. The order is --db, BEAMWARDEN_DB, the saved institution register
 * setting, then the default file; a register that cannot be opened stops the start with the
 * reason and never falls back to a local file.
 */
import { chooseRegister, openRecordStore, RecordError, type RecordStore, type RegisterSource } from '../backend/records/index.js';

export const START_ERROR_TITLE = 'Beamwarden cannot open the records';

export type StartOpen =
  | { readonly ok: true; readonly store: RecordStore; readonly open: () => Promise<RecordStore>; readonly source: RegisterSource }
  | { readonly ok: false; readonly title: string; readonly message: string };

/** `--db <location>` or `--db=<location>` on the desktop app's command line, when given. */
export function dbOption(argv: readonly string[]): string | undefined {
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] ?? '';
    if (a === '--db') return argv[i + 1];
    if (a.startsWith('--db=')) return a.slice('--db='.length);
  }
  return undefined;
}

/**
 * The error box's text for a failed start: the records layer's own plain sentence; anything else
 * (a fault of this program, not of the register) says so instead of showing a developer message.
 */
export function startErrorMessage(e: unknown): string {
  if (e instanceof RecordError) return e.message;
  const detail = e instanceof Error ? e.message : String(e);
  return `An unexpected problem stopped the start. Nothing was changed; start Beamwarden again, and if this repeats, report it with this detail: ${detail}`;
}

export async function openAtStart(opts: {
  readonly argv: readonly string[];
  readonly env: string | undefined;
  readonly settingsDir: string;
  readonly nativeBinding?: string;
  /** Where the trust list and signing log are kept (the user-data folder unless given: tests). */
  readonly keyDir?: string;
}): Promise<StartOpen> {
  try {
    const choice = chooseRegister({ db: dbOption(opts.argv), env: opts.env, settingsDir: opts.settingsDir });
    const location = choice.location;
    const open = () =>
      openRecordStore({
        ...(location !== undefined ? { path: location } : {}),
        ...(opts.nativeBinding ? { nativeBinding: opts.nativeBinding } : {}),
        ...(opts.keyDir !== undefined ? { keyDir: opts.keyDir } : {}),
      });
    return { ok: true, store: await open(), open, source: choice.source };
  } catch (e) {
    return { ok: false, title: START_ERROR_TITLE, message: startErrorMessage(e) };
  }
}
