/** Contract of the 'connection' area: the app setting "Connect to an institution register". */

export type RegisterSourceName = 'option' | 'environment' | 'setting' | 'default';

export interface RegisterConnection {
  /** Where the register in force was named when this program started. */
  readonly source: RegisterSourceName;
  /** The register in force as shown to the officer (a file path, or an address without password). */
  readonly inForce: string;
  /** The saved address (applies at the next start unless --db or BEAMWARDEN_DB is given), or null. */
  readonly saved: string | null;
  /** The settings file could not be read: the plain reason. */
  readonly savedProblem: string | null;
}

export type ConnectionHandlers = {
  'register-connection': (args: Record<string, never>) => Promise<RegisterConnection>;
  /** Connects read-only and closes; fails with the server's refusal in plain words. */
  'register-connection-test': (args: { readonly address: string }) => Promise<{ readonly message: string }>;
  'register-connection-save': (args: { readonly address: string }) => Promise<RegisterConnection>;
  'register-connection-clear': (args: Record<string, never>) => Promise<RegisterConnection>;
};
