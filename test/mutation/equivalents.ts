// The lines test/mutation/EQUIVALENT.md lists as holding equivalent mutants, read from the first
// column of its tables ("core/hazard/range.ts:49, 65", "core/hazard/diffuse.ts:53-67",
// "core/beam/validate-beam.ts:94 (and 110 since the fourth session)"). A parenthesis is a remark
// (an old line number, a function name) unless it starts with "and", which adds lines.
// A surviving mutant on a listed line counts as listed-equivalent in scores.json; the score without
// them is shown beside Stryker's own, never instead of it.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { MUTATION_DIR } from './engine-files.js';

export type ListedLines = ReadonlyMap<string, ReadonlySet<number>>;

function linesOf(spec: string): number[] {
  const kept = spec.replace(/\(([^)]*)\)/g, (_all, inner: string) => (/^\s*and\b/.test(inner) ? `, ${inner.replace(/^\s*and\b/, '')}` : ''));
  const out: number[] = [];
  for (const m of kept.matchAll(/(\d+)(?:\s*-\s*(\d+))?/g)) {
    const from = Number(m[1]);
    const to = m[2] === undefined ? from : Number(m[2]);
    for (let l = from; l <= to; l++) out.push(l);
  }
  return out;
}

export function parseListedLines(markdown: string): ListedLines {
  const listed = new Map<string, Set<number>>();
  for (const row of markdown.split('\n')) {
    const m = /^\|\s*(core\/[\w/-]+\.ts):((?:[^|\\]|\\.)*)\|/.exec(row);
    if (!m) continue;
    const set = listed.get(m[1]!) ?? new Set<number>();
    for (const l of linesOf(m[2]!)) set.add(l);
    listed.set(m[1]!, set);
  }
  return listed;
}

export function loadListedLines(path: string = join(MUTATION_DIR, 'EQUIVALENT.md')): ListedLines {
  return parseListedLines(readFileSync(path, 'utf8'));
}
