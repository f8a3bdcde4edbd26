// The renderer asks before losing work in its own dialog (renderer/lib/confirm-choice.ts), never
// with the browser's confirm/alert/prompt boxes (they show the program's internal title, cannot
// say what is lost, and some browsers block them for the loopback host): the lint configuration
// refuses them in renderer/, in TypeScript and in Svelte components, and no renderer file has one.
import { describe, expect, it } from 'vitest';
import { ESLint } from 'eslint';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));
const eslint = new ESLint({ cwd: root, overrideConfigFile: path.join(root, 'test/lint/eslint.config.js') });

const CASES: ReadonlyArray<readonly [string, string]> = [
  ['window.confirm', "if (window.confirm('Discard?')) console.log('gone');"],
  ['bare confirm', "if (confirm('Discard?')) console.log('gone');"],
  ['window.alert', "window.alert('Saved');"],
  ['globalThis.prompt', "console.log(globalThis.prompt('Name of the site'));"],
  ['bare prompt', "console.log(prompt('Name of the site'));"],
];

describe('no browser confirm/alert/prompt boxes in renderer/', () => {
  it.each(CASES)('a Svelte component with %s is refused', async (_name, code) => {
    const [r] = await eslint.lintText(`<script lang="ts">\n  ${code}\n</script>\n`, { filePath: path.join(root, 'renderer/components/NativeBoxProbe.svelte') });
    expect(r?.messages.map((m) => m.ruleId)).toEqual(expect.arrayContaining([expect.stringMatching(/^no-restricted-(globals|properties)$/)]));
  });
  it('the app\'s own dialog passes', async () => {
    const code = "<script lang=\"ts\">\n  import { confirmChoice } from '../lib/confirm-choice.js';\n  void confirmChoice({ title: 'Discard?', confirmLabel: 'Discard changes' });\n</script>\n";
    const [r] = await eslint.lintText(code, { filePath: path.join(root, 'renderer/components/NativeBoxProbe.svelte') });
    expect(r?.messages).toEqual([]);
  });
  it('no renderer source calls one', () => {
    const files = (readdirSync(path.join(root, 'renderer'), { recursive: true }) as string[]).filter((f) => /\.(ts|svelte)$/.test(f));
    expect(files.length).toBeGreaterThan(10);
    const offenders = files.filter((f) => /(^|[^\w.])(window\.|globalThis\.)?(confirm|alert|prompt)\(/.test(readFileSync(path.join(root, 'renderer', f), 'utf8').replace(/function confirm\(|\bconfirm\(\)/g, '')));
    expect(offenders).toEqual([]);
  });
});
