/**
 * Builds the Svelte renderer into dist/renderer. `base: './'` keeps asset URLs relative, which the
 * Electron app scheme and the loopback host both serve from the same folder.
 */
import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  root: here,
  base: './',
  plugins: [svelte({ configFile: false, compilerOptions: { runes: true } })],
  build: {
    outDir: fileURLToPath(new URL('../dist/renderer', import.meta.url)),
    emptyOutDir: true,
    // No inline assets: the CSP allows only files served by the app itself (data: only for images).
    assetsInlineLimit: 0,
    modulePreload: { polyfill: false },
    target: 'chrome130',
    sourcemap: false,
  },
});
