/**
 * Turn zod issues into plain "path: problem" messages an officer can act on, e.g.
 * `rooms[2].lasers[0].beams[0].wavelength_nm: must be at least 180 nm`.
 */
import type { z } from 'zod';

export interface PathedIssue {
  readonly path: string;
  readonly problem: string;
}

export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? '(document)' : out;
}

export function formatZodIssues(error: z.ZodError, prefix: ReadonlyArray<PropertyKey> = []): PathedIssue[] {
  return error.issues.map((issue) => {
    let problem = issue.message;
    if (issue.code === 'unrecognized_keys') problem = `unknown field(s) ${issue.keys.map((k) => `"${k}"`).join(', ')} (not part of this format)`;
    return { path: formatPath([...prefix, ...issue.path]), problem };
  });
}
