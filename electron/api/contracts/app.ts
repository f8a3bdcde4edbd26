/** Contract of the 'app' area: what the renderer learns about the running application. */
import type { RuleSetId } from '../../../core/model/inputs.js';
import type { ShellKind } from '../context.js';

export interface AppInfo {
  readonly name: 'Beamwarden';
  readonly version: string;
  readonly shell: ShellKind;
  readonly databasePath: string;
  readonly ruleSets: ReadonlyArray<{ readonly id: RuleSetId; readonly name: string }>;
  /** Short fingerprint of the trust list's anchor key (null before the first signing key exists). */
  readonly trustAnchorFingerprint: string | null;
  /** Found when the database was opened, plus trust list problems: shown to the officer. */
  readonly warnings: readonly string[];
}

/** One change to the register made by anyone (on an institution register: by any officer). */
export interface RegisterChange {
  /** Increases with every change this host has heard of. */
  readonly seq: number;
  /** The kind of record changed: site, room, laser_installation, eyewear, person, assessment, revision, signature ... */
  readonly table: string;
  readonly id: string;
  readonly operation: 'INSERT' | 'UPDATE' | 'DELETE';
  /** The database account that made the change. */
  readonly by: string;
}

export interface RegisterChanges {
  /** False on a register file: only this program writes it, so there is nothing to hear. */
  readonly live: boolean;
  /** The newest change heard of (pass it as `since` next time). */
  readonly seq: number;
  /** Changes after `since`, oldest first (at most the last 200). */
  readonly changes: readonly RegisterChange[];
}

export type AppHandlers = {
  'app-info': (args: Record<string, never>) => Promise<AppInfo>;
  /** Changes made to the register since `since` (institution register: heard with LISTEN/NOTIFY); `waitMs`: wait that long for the next one when there is none yet. */
  'register-changes': (args: { readonly since: number; readonly waitMs?: number }) => Promise<RegisterChanges>;
};
