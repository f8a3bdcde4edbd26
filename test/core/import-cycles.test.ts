// The core's modules import each other without circles (derived: a circle makes module start-up
// order matter, and a cache or constant read before its module ran is undefined; issue 13 found
// limit-cache <-> tissue-limits). Static imports only, read from the sources.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../core', import.meta.url));
const files = (readdirSync(root, { recursive: true }) as string[]).filter((f) => f.endsWith('.ts')).map((f) => path.join(root, f));
const graph = new Map<string, string[]>();
for (const f of files) {
  const deps = [...readFileSync(f, 'utf8').matchAll(/^(?:import|export)\s[^;]*?from\s+'(\.{1,2}\/[^']+)'/gms)]
    .filter((m) => !/^import\s+type\s/.test(m[0]) && !/^export\s+type\s/.test(m[0]))
    .map((m) => path.resolve(path.dirname(f), (m[1] as string).replace(/\.js$/, '.ts')));
  graph.set(f, deps);
}

function cycles(): string[][] {
  const found: string[][] = [];
  const state = new Map<string, 'open' | 'done'>();
  const stack: string[] = [];
  const visit = (f: string): void => {
    state.set(f, 'open');
    stack.push(f);
    for (const d of graph.get(f) ?? []) {
      if (state.get(d) === 'open') found.push([...stack.slice(stack.indexOf(d)), d].map((x) => path.relative(root, x)));
      else if (!state.has(d)) visit(d);
    }
    stack.pop();
    state.set(f, 'done');
  };
  for (const f of graph.keys()) if (!state.has(f)) visit(f);
  return found;
}

describe('core import graph', () => {
  it('has no circles (value imports; type-only imports vanish at run time)', () => {
    expect(graph.size).toBeGreaterThan(30);
    expect(cycles()).toEqual([]);
  });
});
