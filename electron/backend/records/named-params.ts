/**
 * Statements with many columns read better with names (`VALUES (@id, @name, ...)`) than with a row
 * of `?`. The SQL port takes `?` placeholders only (the common form of both engines), so a named
 * statement is turned into `?` form here, before it reaches the port, with its values in order:
 * `q.run(...named(sql, row))`. Extra properties of `params` are ignored; a missing one is a
 * programming error.
 */
import type { SqlValue } from './sql-port.js';

const converted = new Map<string, { sql: string; names: string[] }>();

export function named(sql: string, params: object): [string, ...SqlValue[]] {
  let c = converted.get(sql);
  if (!c) {
    const names: string[] = [];
    const text = sql.replace(/@([A-Za-z_][A-Za-z0-9_]*)/g, (_m, name: string) => {
      names.push(name);
      return '?';
    });
    c = { sql: text, names };
    converted.set(sql, c);
  }
  const values = params as Record<string, unknown>;
  const bound = c.names.map((n): SqlValue => {
    if (!(n in values)) throw new Error(`SQL parameter @${n} has no value`);
    return values[n] as SqlValue;
  });
  return [c.sql, ...bound];
}
