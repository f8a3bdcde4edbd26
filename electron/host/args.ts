/** Command-line options of `npm run serve`, validated like any other outside input. */
import { z } from 'zod';
import { describeIssues, issuesOf } from '../api/dispatch.js';

export interface HostOptions {
  /** 0 = let the system pick a free port. */
  readonly port: number;
  /** Database file; undefined = the default user-data location. */
  readonly db: string | undefined;
  /** Seed the invented demo scenario into an empty database. */
  readonly demo: boolean;
}

const Schema = z.strictObject({
  port: z.coerce.number().int().min(0).max(65535).default(0),
  db: z.string().min(1).optional(),
  demo: z.boolean().default(false),
});

export const HOST_USAGE = 'usage: npm run serve -- [--port <0-65535>] [--db <file>] [--demo]';

export function parseHostArgs(argv: readonly string[]): HostOptions {
  const raw: Record<string, string | boolean> = {};
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] ?? '';
    const eq = /^--([a-z]+)=(.*)$/.exec(a);
    if (eq?.[1] !== undefined) {
      raw[eq[1]] = eq[2] ?? '';
    } else if (a === '--demo') {
      raw['demo'] = true;
    } else if (a === '--port' || a === '--db') {
      const v = argv[i + 1];
      if (v === undefined) throw new Error(`${a} needs a value. ${HOST_USAGE}`);
      raw[a.slice(2)] = v;
      i++;
    } else {
      throw new Error(`unknown option ${JSON.stringify(a)}. ${HOST_USAGE}`);
    }
  }
  const parsed = Schema.safeParse(raw);
  if (!parsed.success) throw new Error(`${describeIssues(issuesOf(parsed.error))}. ${HOST_USAGE}`);
  return { port: parsed.data.port, db: parsed.data.db, demo: parsed.data.demo };
}
