/**
 * The institution register's own protections, checked at open and by verify as on SQLite
 * (protections.ts): every trigger the PostgreSQL migrations create is present, switched on and
 * runs the function body the migrations define; row-level security is on where they turn it on.
 * A superuser can drop or alter them; this reports it, and verify then checks every signature.
 */
import type { SqlPort } from './sql-port.js';
import { MIGRATIONS } from './migrations/index.js';

const normalise = (sql: string): string => sql.replace(/\s+/g, ' ').trim();

interface Expected {
  readonly triggers: Map<string, { table: string; fn: string }>;
  readonly functions: Map<string, string>;
  readonly secured: Set<string>;
}

const cache = new Map<number, Expected>();
function expected(version: number): Expected {
  const hit = cache.get(version);
  if (hit) return hit;
  const out: Expected = { triggers: new Map(), functions: new Map(), secured: new Set() };
  for (const m of MIGRATIONS) {
    if (m.version > version) break;
    const sql = m.postgresql;
    for (const f of sql.matchAll(/CREATE (?:OR REPLACE )?FUNCTION (\w+)\(\) RETURNS trigger[\s\S]*?AS \$\$([\s\S]*?)\$\$;/g)) {
      if (f[1] && f[2] !== undefined) out.functions.set(f[1], normalise(f[2]));
    }
    for (const t of sql.matchAll(/CREATE TRIGGER (\w+)[^;]*? ON (\w+)\s+FOR EACH ROW EXECUTE FUNCTION (\w+)\([^)]*\);/g)) {
      if (t[1] && t[2] && t[3]) out.triggers.set(t[1], { table: t[2], fn: t[3] });
    }
    for (const d of sql.matchAll(/DROP TRIGGER (?:IF EXISTS )?(\w+)/g)) if (d[1]) out.triggers.delete(d[1]);
    for (const r of sql.matchAll(/ALTER TABLE (\w+) ENABLE ROW LEVEL SECURITY/g)) if (r[1]) out.secured.add(r[1]);
  }
  cache.set(version, out);
  return out;
}

interface TriggerRow {
  name: string;
  table_name: string;
  enabled: string;
  fn: string;
  body: string;
}

/** Names of protections that are missing, switched off or altered; empty when all are in place. */
export async function missingPgProtections(q: SqlPort, version: number): Promise<string[]> {
  const want = expected(version);
  const rows = await q.all<TriggerRow>(
    `SELECT t.tgname AS name, c.relname AS table_name, t.tgenabled AS enabled, p.proname AS fn, p.prosrc AS body
       FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid JOIN pg_proc p ON p.oid = t.tgfoid
      WHERE c.relnamespace = current_schema()::regnamespace AND NOT t.tgisinternal`,
  );
  const present = new Map(rows.map((r) => [`${r.table_name}.${r.name}`, r]));
  const out: string[] = [];
  for (const [name, t] of want.triggers) {
    const have = present.get(`${t.table}.${name}`);
    if (!have) out.push(`trigger ${name} is missing`);
    else if (have.enabled === 'D') out.push(`trigger ${name} is switched off`);
    else if (have.fn !== t.fn || (want.functions.has(t.fn) && normalise(have.body) !== want.functions.get(t.fn))) out.push(`trigger ${name} was altered`);
  }
  const secured = new Set(
    (await q.all<{ name: string }>(`SELECT relname AS name FROM pg_class WHERE relnamespace = current_schema()::regnamespace AND relkind = 'r' AND relrowsecurity`)).map((r) => r.name),
  );
  for (const table of want.secured) if (!secured.has(table)) out.push(`row-level security on ${table} is off`);
  return out;
}
