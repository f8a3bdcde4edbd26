/**
 * `npm run serve`: the loopback host. Prints exactly one line on stdout,
 *   Beamwarden listening at http://127.0.0.1:<port>/?token=<token>
 * which the officer opens in a browser (and the end-to-end tests parse). Everything else goes to
 * stderr.
 */
import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { chooseRegister, defaultDataDir, isServerAddress, openRecordStore } from '../backend/records/index.js';
import { handlerTable } from '../api/table.js';
import type { ApiContext } from '../api/context.js';
import { parseHostArgs } from './args.js';
import { packageVersion, RENDERER_DIST } from './paths.js';
import { startLoopbackHost } from './server.js';

async function main(): Promise<void> {
  const opts = parseHostArgs(process.argv.slice(2));
  if (!existsSync(path.join(RENDERER_DIST, 'index.html'))) {
    throw new Error(`the renderer is not built (${RENDERER_DIST}); run "npm run build" first (npm run serve does it for you)`);
  }
  // --db, else BEAMWARDEN_DB (as the desktop app), else the saved institution register setting,
  // else the default file. A file path is made absolute; a postgres:// address opens the institution
  // register and is never taken for a file. A saved register that cannot be reached, or a damaged
  // setting file, stops the start with the reason: never a silent fallback to the local file.
  const settingsDir = defaultDataDir();
  const choice = chooseRegister({ db: opts.db, env: process.env['BEAMWARDEN_DB'], settingsDir });
  const given = choice.location;
  const location = given === undefined ? undefined : isServerAddress(given) ? given : path.resolve(given);
  const open = () => openRecordStore(location === undefined ? {} : { path: location });
  const store = await open();
  if (opts.demo) await store.seedDemo();
  const ctx: ApiContext = { shell: 'loopback', version: packageVersion(), databasePath: store.info.path, store, openStore: open, registerSource: choice.source, settingsDir };
  // 24 random bytes: a new token on every start, so an old address stops working.
  const token = randomBytes(24).toString('base64url');
  const host = await startLoopbackHost({ table: handlerTable, ctx, token, rendererDir: RENDERER_DIST, port: opts.port });
  process.stdout.write(`Beamwarden listening at ${host.url}\n`);
  process.stderr.write(`database: ${store.info.path}\n`);
  let stopping = false;
  const stop = (): void => {
    if (stopping) return;
    stopping = true;
    void host
      .close()
      .then(() => ctx.store.close())
      .then(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((e: unknown) => {
  process.stderr.write(`beamwarden serve: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exit(1);
});
