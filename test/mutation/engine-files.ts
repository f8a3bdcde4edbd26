// The engine files Stryker mutates and the groups that measure them. The file list is read from the
// `mutate` patterns of stryker.config.mjs (one place), expanded against the working tree; the groups
// come from groups.json (each: the files it mutates, the test files that check them).
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { z } from 'zod';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
export const MUTATION_DIR = join(ROOT, 'test', 'mutation');

const strykerConfigSchema = z.object({ mutate: z.array(z.string()).min(1) });

/** The `mutate` patterns of test/mutation/stryker.config.mjs. */
export async function strykerMutatePatterns(): Promise<string[]> {
  const mod: unknown = await import(pathToFileURL(join(MUTATION_DIR, 'stryker.config.mjs')).href);
  const parsed = z.object({ default: strykerConfigSchema }).safeParse(mod);
  if (!parsed.success) throw new Error('test/mutation/stryker.config.mjs: its default export has no `mutate` list of patterns');
  return parsed.data.default.mutate;
}

function walk(dir: string, recursive: boolean): string[] {
  if (!existsSync(dir)) return [];
  const out: string[] = [];
  for (const name of readdirSync(dir).sort()) {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) {
      if (recursive) out.push(...walk(full, true));
    } else {
      out.push(full);
    }
  }
  return out;
}

/**
 * Expands the forms of pattern the configuration uses: `dir/**\/*.ts`, `dir/*.ts`, a plain file and
 * the exclusion `!dir/**`. Any other form is refused rather than guessed, so a new pattern in the
 * configuration cannot silently measure a different set of files.
 */
export function expandPatterns(patterns: readonly string[], root: string = ROOT): string[] {
  const included = new Set<string>();
  const excludedPrefixes: string[] = [];
  for (const p of patterns) {
    const rel = (full: string): string => relative(root, full).split('\\').join('/');
    let m: RegExpExecArray | null;
    if ((m = /^!(.+)\/\*\*$/.exec(p))) {
      excludedPrefixes.push(`${m[1]}/`);
    } else if ((m = /^([\w./-]+)\/\*\*\/\*(\.\w+)$/.exec(p))) {
      const ext = m[2]!;
      for (const f of walk(join(root, m[1]!), true)) if (f.endsWith(ext)) included.add(rel(f));
    } else if ((m = /^([\w./-]+)\/\*(\.\w+)$/.exec(p))) {
      const ext = m[2]!;
      for (const f of walk(join(root, m[1]!), false)) if (f.endsWith(ext)) included.add(rel(f));
    } else if (!/[*!?[{]/.test(p)) {
      if (existsSync(join(root, p))) included.add(p);
    } else {
      throw new Error(`mutate pattern "${p}": only dir/**/*.ext, dir/*.ext, a file path and !dir/** are understood here`);
    }
  }
  return [...included].filter((f) => !excludedPrefixes.some((x) => f.startsWith(x))).sort();
}

/** Every engine file of core/ that a whole mutation run mutates. */
export async function engineFiles(): Promise<string[]> {
  return expandPatterns(await strykerMutatePatterns());
}

const groupSchema = z.object({
  mutate: z.array(z.string().regex(/^core\/[\w/-]+\.ts$/, 'an engine file path such as core/eyewear/od.ts')).min(1),
  tests: z.array(z.string().regex(/^test\/core\/[\w/.-]+\.test\.ts$/, 'a test file path such as test/core/curves.test.ts')).min(1),
});
const groupsSchema = z.record(z.string().regex(/^[a-z][a-z0-9-]*$/, 'a group name in lower-case words joined by -'), groupSchema);

export type MutationGroup = z.infer<typeof groupSchema>;
export type MutationGroups = Readonly<Record<string, MutationGroup>>;

/** test/mutation/groups.json, validated; an error names the group and the field. */
export function loadGroups(path: string = join(MUTATION_DIR, 'groups.json')): MutationGroups {
  const raw: unknown = JSON.parse(readFileSync(path, 'utf8'));
  const parsed = groupsSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new Error(`groups.json: ${issue.path.join('.') || '(top)'}: ${issue.message}`);
  }
  return parsed.data;
}

/** The group that mutates `file`, or undefined. */
export function groupOf(groups: MutationGroups, file: string): string | undefined {
  return Object.entries(groups).find(([, g]) => g.mutate.includes(file))?.[0];
}
