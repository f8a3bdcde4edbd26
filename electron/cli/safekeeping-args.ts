/** Command-line options of `npm run backup` and `npm run restore`, validated like any other outside input. */
import { z } from 'zod';

/** "--db x --out y" or "--db=x" -> { db: 'x', out: 'y' }; refuses positional arguments and flags without a value. */
export function parseFlags(argv: readonly string[], usage: string): Record<string, string> {
  const raw: Record<string, string> = {};
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] ?? '';
    const m = /^--([a-z]+)(?:=(.*))?$/.exec(a);
    if (!m?.[1]) throw new Error(`unexpected argument ${JSON.stringify(a)}\n${usage}`);
    const value = m[2] ?? argv[++i];
    if (value === undefined || value.startsWith('--')) throw new Error(`--${m[1]} needs a value\n${usage}`);
    raw[m[1]] = value;
  }
  return raw;
}

const path = (what: string) => z.string().min(1, `${what} must not be empty`).max(4096);

export const BackupArgsSchema = z.strictObject({ db: path('--db').optional(), out: path('--out').optional() });
export const RestoreArgsSchema = z.strictObject({ db: path('--db').optional(), from: path('--from').optional() });

export function parseWith<S extends z.ZodType>(schema: S, argv: readonly string[], usage: string): z.output<S> {
  const r = schema.safeParse(parseFlags(argv, usage));
  if (!r.success) {
    const msg = r.error.issues.map((i) => (i.code === 'unrecognized_keys' ? `unknown option ${i.keys.map((k) => `--${k}`).join(', ')}` : i.message)).join('; ');
    throw new Error(`${msg}\n${usage}`);
  }
  return r.data;
}
