/**
 * Bundles the Electron main process (ES module, dependencies left to node_modules) and the preload
 * (one CommonJS file: a sandboxed preload cannot load modules) into dist/electron. Run by
 * electron/cli/start.mjs before Electron starts, and by test/electron to check the preload bundle.
 */
import { build } from 'vite';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const ELECTRON_OUT = path.join(ROOT, 'dist', 'electron');

const NODE_BUILTIN = /^node:/;

export async function buildElectron(outDir = ELECTRON_OUT): Promise<void> {
  await build({
    configFile: false,
    root: ROOT,
    logLevel: 'warn',
    build: {
      ssr: path.join(ROOT, 'electron', 'main', 'main.ts'),
      outDir,
      emptyOutDir: false,
      target: 'node22',
      minify: false,
      rollupOptions: {
        external: (id) => id === 'electron' || NODE_BUILTIN.test(id) || /^[a-z@][^:]*$/.test(id) && !id.startsWith('.') && !path.isAbsolute(id),
        output: { format: 'es', entryFileNames: 'main.js' },
      },
    },
  });
  await build({
    configFile: false,
    root: ROOT,
    logLevel: 'warn',
    ssr: { noExternal: true },
    build: {
      ssr: path.join(ROOT, 'electron', 'main', 'preload.ts'),
      outDir,
      emptyOutDir: false,
      target: 'chrome130',
      minify: false,
      rollupOptions: {
        external: ['electron'],
        output: { format: 'cjs', entryFileNames: 'preload.cjs' },
      },
    },
  });
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  buildElectron().catch((e: unknown) => {
    process.stderr.write(`${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  });
}
