/**
 * The desktop bridge a component test's window talks to: the real handler table over a real
 * record store (no mock), with the file and print calls of the shell answered as "not saved".
 */
import { dispatch } from '../../electron/api/dispatch.js';
import { handlerTable } from '../../electron/api/table.js';
import type { ApiContext } from '../../electron/api/context.js';
import type { RecordStore } from '../../electron/backend/records/index.js';

export function installStoreBridge(store: RecordStore, extra: Pick<ApiContext, 'settingsDir' | 'registerSource'> = {}): void {
  const ctx: ApiContext = { shell: 'electron', version: '0.0.0-test', databasePath: store.info.path, store, ...extra };
  window.beamwarden = {
    invoke: (name, args) => dispatch(handlerTable, ctx, name, args) as never,
    saveFile: async () => ({ saved: false }),
    openForPrint: async () => undefined,
    printScreen: async () => undefined,
    openDataFolder: async () => undefined,
    onMenuCommand: () => () => undefined,
  };
}
