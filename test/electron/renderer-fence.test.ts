// The renderer reaches the back end only through the contracts in electron/api/contracts (issue 13):
// the lint rule refuses an import of electron/backend from renderer/, and no renderer file has one.
import { describe, expect, it } from 'vitest';
import { ESLint } from 'eslint';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe('renderer fence', () => {
  it('the lint configuration refuses renderer/ importing electron/backend/', async () => {
    const eslint = new ESLint({ cwd: root, overrideConfigFile: path.join(root, 'test/lint/eslint.config.js') });
    const code = "import type { RecordStore } from '../../electron/backend/records/types.js';\nexport type Store = RecordStore;\n";
    const [bad] = await eslint.lintText(code, { filePath: path.join(root, 'renderer/lib/fence-probe.ts') });
    expect(bad?.messages.map((m) => m.ruleId)).toContain('no-restricted-imports');
    const [ok] = await eslint.lintText(code.replace('backend/records/types.js', 'api/contracts/records.js').replace('RecordStore', 'Site').replace('RecordStore', 'Site'), { filePath: path.join(root, 'renderer/lib/fence-probe.ts') });
    expect(ok?.messages).toEqual([]);
  });
  it('no renderer source imports the back end', () => {
    const files = (readdirSync(path.join(root, 'renderer'), { recursive: true }) as string[]).filter((f) => /\.(ts|svelte)$/.test(f));
    expect(files.length).toBeGreaterThan(10);
    const offenders = files.filter((f) => /from\s+'[^']*electron\/backend\//.test(readFileSync(path.join(root, 'renderer', f), 'utf8')));
    expect(offenders).toEqual([]);
  });
});
