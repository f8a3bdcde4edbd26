/**
 * The better-sqlite3 addon built for Electron's ABI is kept apart from the Node build in
 * node_modules (toolchain notes section 8): `npm start` puts it at electron/native/<electron
 * version>/better_sqlite3.node, and the main process opens the store with `nativeBinding` pointing
 * there. `npm test` and the loopback host never touch it.
 */
import { existsSync } from 'node:fs';
import path from 'node:path';

export function electronNativeBinding(repoRoot: string, electronVersion: string): string | undefined {
  const p = path.join(repoRoot, 'electron', 'native', electronVersion, 'better_sqlite3.node');
  return existsSync(p) ? p : undefined;
}
