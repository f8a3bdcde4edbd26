// Lint configuration (flat config), run by `npm run lint` with --config from the repository root,
// so the patterns below are relative to the root. TypeScript: typescript-eslint's strict set, no
// `any` anywhere (project rule: no `any` at a boundary, and none inside either). The core is fenced:
// no Node built-ins, Electron, SQLite, Svelte or pdfmake under core/ (DEVELOPERS.md; the same rule
// is checked again by test/core/core-purity.test.ts). Svelte components are linted with
// eslint-plugin-svelte's recommended rules.
import { fileURLToPath } from 'node:url';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import svelte from 'eslint-plugin-svelte';

const CORE_BANNED = {
  paths: ['fs', 'path', 'os', 'child_process', 'crypto', 'url', 'electron', 'better-sqlite3', 'svelte', 'pdfmake'].map((name) => ({
    name,
    message: 'core/ is pure TypeScript (runs in the renderer and in Node): decimal.js only.',
  })),
  patterns: [
    { group: ['node:*'], message: 'core/ must not use Node built-ins.' },
    { group: ['electron/*', 'svelte/*', 'pdfmake/*', 'fs/*', 'path/*'], message: 'core/ is pure TypeScript: decimal.js only.' },
  ],
};

const NATIVE_BOXES = ['confirm', 'alert', 'prompt'];
const NATIVE_BOX_MESSAGE = "Use the app's dialog (renderer/lib/confirm-choice.ts: confirmChoice, askText, tellWhy), never the browser's confirm/alert/prompt.";

export default tseslint.config(
  {
    ignores: ['**/node_modules/**', '**/dist/**', '**/out/**', '**/.vite/**', 'test/artifacts/**', '**/*.d.ts'],
  },
  {
    files: ['**/*.ts', '**/*.js', '**/*.mjs', '**/*.cjs'],
    extends: [...tseslint.configs.strict],
    languageOptions: {
      ecmaVersion: 2022,
      sourceType: 'module',
      globals: { ...globals.node },
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': ['error', { prefer: 'type-imports', fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/no-non-null-assertion': 'error',
      'no-restricted-globals': 'off',
      eqeqeq: ['error', 'always'],
      'prefer-const': 'error',
    },
  },
  {
    // The record store is asynchronous (one SQL port, SQLite or PostgreSQL): a store call that is not
    // awaited would let a refused save or sign pass unseen, so every promise must be awaited or handled.
    // (The fence probe is a virtual file linted by test/electron/renderer-fence.test.ts.)
    files: ['electron/**/*.ts', 'renderer/**/*.ts', 'test/**/*.ts'],
    languageOptions: { parserOptions: { projectService: { allowDefaultProject: ['renderer/lib/fence-probe.ts'] }, tsconfigRootDir: fileURLToPath(new URL('../..', import.meta.url)) } },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/await-thenable': 'error',
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: false }],
    },
  },
  {
    // The calculation core: pure TypeScript, no Node/DOM/Electron/Svelte/pdfmake/SQLite.
    files: ['core/**/*.ts'],
    languageOptions: { globals: {} },
    rules: {
      'no-restricted-imports': ['error', CORE_BANNED],
      '@typescript-eslint/no-restricted-imports': 'off',
      'no-restricted-globals': ['error', 'window', 'document', 'localStorage', 'sessionStorage', 'navigator', 'process', 'Buffer', '__dirname', '__filename', 'require'],
    },
  },
  {
    // Tests may assert presence with '!' and delete fields to build bad inputs.
    files: ['test/**/*.ts'],
    rules: {
      '@typescript-eslint/no-non-null-assertion': 'off',
      '@typescript-eslint/no-dynamic-delete': 'off',
    },
  },
  {
    files: ['renderer/**/*.ts', 'renderer/**/*.js'],
    languageOptions: { globals: { ...globals.browser } },
  },
  {
    // The renderer sees the back end only through the contracts (electron/api/contracts): never the
    // record store, SQLite or the PDF code (issue 13).
    files: ['renderer/**/*.ts', 'renderer/**/*.js', 'renderer/**/*.svelte'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ regex: '(^|/)electron/backend(/|$)', message: 'renderer/ must not import the back end: use the shared types in electron/api/contracts.' }] }],
      // The browser's own boxes show the program's internal title, cannot say what is lost, and are
      // blocked by some browsers for the loopback host: ask with confirmChoice/askText/tellWhy.
      'no-restricted-globals': ['error', ...NATIVE_BOXES.map((name) => ({ name, message: NATIVE_BOX_MESSAGE }))],
      'no-restricted-properties': [
        'error',
        ...['window', 'globalThis', 'self', 'top', 'parent'].flatMap((object) => NATIVE_BOXES.map((property) => ({ object, property, message: NATIVE_BOX_MESSAGE }))),
      ],
    },
  },
  ...svelte.configs['flat/recommended'].map((c) => ({ ...c, files: c.files ?? ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'] })),
  {
    files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
    plugins: { '@typescript-eslint': tseslint.plugin },
    languageOptions: {
      globals: { ...globals.browser },
      parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.svelte'] },
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
);
