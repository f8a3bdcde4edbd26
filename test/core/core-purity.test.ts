// The calculation core is pure TypeScript: it runs unchanged in the renderer and in Node, so no file
// under core/ may import Node built-ins, Electron, SQLite, Svelte or the PDF library, nor touch DOM
// or Node globals (project rule; DEVELOPERS.md "core/ is fenced three ways", this is the third).
// The files are read with node:fs here, in the test, never by the core itself.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const CORE = join(ROOT, 'core');

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? walk(p) : /\.(ts|js|mjs|cjs|json)$/.test(name) ? [p] : [];
  });
}

/**
 * Drop comments (string-aware, so '//' inside a URL string is kept); with keepStrings false also the
 * contents of string literals, so a word in prose or in a message is not mistaken for code.
 */
export function codeOnly(src: string, keepStrings = false): string {
  let out = '';
  let i = 0;
  while (i < src.length) {
    const c = src[i] as string;
    const n = src[i + 1];
    if (c === '/' && n === '/') {
      while (i < src.length && src[i] !== '\n') i++;
    } else if (c === '/' && n === '*') {
      i += 2;
      while (i < src.length && !(src[i] === '*' && src[i + 1] === '/')) i++;
      i += 2;
    } else if (c === '"' || c === "'" || c === '`') {
      const start = i;
      i++;
      while (i < src.length && src[i] !== c) {
        if (src[i] === '\\') i++;
        i++;
      }
      i++;
      out += keepStrings ? src.slice(start, i) : c + c;
    } else {
      out += c;
      i++;
    }
  }
  return out;
}

/** Module specifiers of import/export-from statements and dynamic imports/requires. */
export function importsOf(src: string): string[] {
  const out: string[] = [];
  const re = /(?:import|export)\s[^'"`;]*?from\s*['"]([^'"]+)['"]|import\s*['"]([^'"]+)['"]|import\s*\(\s*['"]([^'"]+)['"]\s*\)|require\s*\(\s*['"]([^'"]+)['"]\s*\)/g;
  for (const m of src.matchAll(re)) out.push((m[1] ?? m[2] ?? m[3] ?? m[4]) as string);
  return out;
}

const BANNED_MODULE = /^(node:|fs$|fs\/|path$|path\/|os$|child_process$|crypto$|url$|electron(\/|$)|better-sqlite3$|svelte(\/|$)|pdfmake(\/|$))/;
const ALLOWED_PACKAGES = new Set(['decimal.js']);
const GLOBAL_NAMES = ['window', 'document', 'localStorage', 'sessionStorage', 'navigator', 'process', 'Buffer', '__dirname', '__filename', 'require'];

/**
 * DOM or Node globals used in code: the name, not after a dot (a property such as x.window is fine)
 * and not declared in the file itself (a local 'const window = 10' is a number, not the DOM).
 */
export function globalsUsed(code: string): string[] {
  return GLOBAL_NAMES.filter((name) => new RegExp(`(?<![.\\w$])${name}\\b`).test(code) && !new RegExp(`\\b(?:const|let|var)\\s+${name}\\b`).test(code));
}

describe('the checker itself', () => {
  it.each([
    { src: "import fs from 'node:fs';", bad: true },
    { src: "import { readFileSync } from 'fs';", bad: true },
    { src: "import type { Database } from 'better-sqlite3';", bad: true },
    { src: "export * from 'electron';", bad: true },
    { src: "const m = await import('pdfmake');", bad: true },
    { src: "import { mount } from 'svelte';", bad: true },
    { src: "import { join } from 'path';", bad: true },
    { src: "import DecimalBase from 'decimal.js';", bad: false },
    { src: "import { x } from '../numeric/decimal.js';", bad: false },
  ])('$src -> banned: $bad', ({ src, bad }) => {
    expect(importsOf(codeOnly(src, true)).some((m) => BANNED_MODULE.test(m))).toBe(bad);
  });
  it.each([
    { src: 'window.alert(1)', bad: true },
    { src: 'const x = document.body;', bad: true },
    { src: 'process.env.X', bad: true },
    { src: "// the published document says\nconst a = 'a document';", bad: false },
    { src: "const url = 'http://example.org'; window.x = 1;", bad: true },
    { src: 'const span = win.window;', bad: false },
    { src: 'const window = 10; const n = 2 * window;', bad: false },
  ])('$src -> global: $bad', ({ src, bad }) => {
    expect(globalsUsed(codeOnly(src)).length > 0).toBe(bad);
  });
});

describe('no file under core/ imports Node, Electron, SQLite, Svelte or pdfmake, nor uses DOM/Node globals', () => {
  const files = walk(CORE).filter((f) => !f.endsWith('.json'));
  it('core/ holds the engine files', () => {
    expect(files.length).toBeGreaterThan(10);
  });
  it.each(files.map((f) => ({ f, name: relative(ROOT, f) })))('$name', ({ f }) => {
    const text = readFileSync(f, 'utf8');
    const code = codeOnly(text);
    const mods = importsOf(codeOnly(text, true));
    const banned = mods.filter((m) => BANNED_MODULE.test(m));
    const packages = mods.filter((m) => !m.startsWith('.') && !ALLOWED_PACKAGES.has(m));
    expect(banned).toEqual([]);
    expect(packages).toEqual([]);
    expect(globalsUsed(code)).toEqual([]);
  });
});
