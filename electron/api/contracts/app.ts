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

export type AppHandlers = {
  'app-info': (args: Record<string, never>) => Promise<AppInfo>;
};
