import { defineConfig } from 'vitest/config';
import { svelte } from '@sveltejs/vite-plugin-svelte';
import { svelteTesting } from '@testing-library/svelte/vite';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));

export default defineConfig({
  root,
  test: {
    testTimeout: 60_000,
    hookTimeout: 60_000,
    projects: [
      {
        extends: true,
        test: {
          name: 'node',
          include: ['test/**/*.test.ts'],
          exclude: ['test/e2e/**', 'test/renderer/**', 'node_modules/**'],
          environment: 'node',
        },
      },
      {
        // Svelte components in happy-dom; svelteTesting() adds the browser condition (toolchain notes section 4).
        extends: true,
        plugins: [svelte({ configFile: false, compilerOptions: { runes: true } }), svelteTesting()],
        test: {
          name: 'renderer',
          include: ['test/renderer/**/*.test.ts'],
          environment: 'happy-dom',
        },
      },
    ],
  },
});
