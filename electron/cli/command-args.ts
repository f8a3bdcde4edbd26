/**
 * The one command-line reader of Beamwarden's commands (report, verify, backup, restore, serve):
 * "--name value" and "--name=value"; the names listed as switches ("--demo", "--all") take no value.
 * A stray word or a value option without its value is refused with the usage. The options are then
 * validated with the command's zod schema, like any other input from outside, and the first problem
 * is named in words ("--out <folder> is required", "unknown option --colour"), never as a path.
 */
import type { z } from 'zod';

export type RawFlags = Record<string, string | boolean>;

/** "--db x --all --out=y" -> { db: 'x', all: true, out: 'y' } (switches: ['all']). */
export function readFlags(argv: readonly string[], usage: string, switches: readonly string[] = []): RawFlags {
  const raw: RawFlags = {};
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] ?? '';
    const m = /^--([a-z][a-z-]*)(?:=(.*))?$/s.exec(a);
    if (!m?.[1]) throw new Error(`unexpected argument ${JSON.stringify(a)}\n${usage}`);
    const name = m[1];
    if (switches.includes(name)) {
      if (m[2] !== undefined) throw new Error(`--${name} takes no value\n${usage}`);
      raw[name] = true;
      continue;
    }
    const value = m[2] ?? argv[++i];
    if (value === undefined || (m[2] === undefined && value.startsWith('--'))) throw new Error(`--${name} needs a value\n${usage}`);
    raw[name] = value;
  }
  return raw;
}

/** Read and validate a command's options; throws an Error whose message names the problem and ends with the usage. */
export function parseCommandArgs<S extends z.ZodType>(schema: S, argv: readonly string[], usage: string, switches: readonly string[] = []): z.output<S> {
  const r = schema.safeParse(readFlags(argv, usage, switches));
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  let msg = 'invalid options';
  if (issue?.code === 'unrecognized_keys') msg = `unknown option ${issue.keys.map((k) => `--${k}`).join(', ')}`;
  else if (issue) {
    const field = issue.path.length ? `--${String(issue.path[0])}` : '';
    msg = field && !issue.message.includes(field) ? `${field}: ${issue.message}` : issue.message;
  }
  throw new Error(`${msg}\n${usage}`);
}
