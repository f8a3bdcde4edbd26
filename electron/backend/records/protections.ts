/**
 * The database's own protections: the immutability triggers that the migrations create. Another
 * SQLite tool can drop or rewrite them; this compares what the file holds with what the migrations
 * define (name and text), so a removed or weakened trigger is reported at open and by `verify`.
 */
import type { Db } from './database.js';
import { MIGRATIONS } from './migrations/index.js';

const normalise = (sql: string): string => sql.replace(/\s+/g, ' ').replace(/;\s*$/, '').trim();

/**
 * normalise() of trigger texts as read from the file, remembered by their exact text: verify asks
 * for every assessment, and the same few texts come back each time (the text itself is still read
 * and compared every time, so a changed trigger is seen at once).
 */
const normalised = new Map<string, string>();
function normaliseRead(sql: string): string {
  let n = normalised.get(sql);
  if (n === undefined) {
    n = normalise(sql);
    if (normalised.size > 1000) normalised.clear();
    normalised.set(sql, n);
  }
  return n;
}

/** Trigger name -> normalised CREATE TRIGGER text, as the migrations up to `version` leave them. */
const expectedCache = new Map<number, Map<string, string>>();
function expectedTriggers(version: number): Map<string, string> {
  const hit = expectedCache.get(version);
  if (hit) return hit;
  const out = new Map<string, string>();
  expectedCache.set(version, out);
  for (const m of MIGRATIONS) {
    if (m.version > version) break;
    const re = /CREATE TRIGGER (\w+)[\s\S]*?\bEND;|DROP TRIGGER (?:IF EXISTS )?(\w+);/g;
    for (const match of m.sql.matchAll(re)) {
      if (match[1]) out.set(match[1], normalise(match[0]));
      else if (match[2]) out.delete(match[2]);
    }
  }
  return out;
}

/** Names of triggers that are missing or differ from their definition; empty when all are in place. */
export function missingProtections(db: Db): string[] {
  const version = db.pragma('user_version', { simple: true });
  const expected = expectedTriggers(typeof version === 'number' ? version : 0);
  const present = new Map(
    (db.prepare("SELECT name, sql FROM sqlite_schema WHERE type = 'trigger'").all() as Array<{ name: string; sql: string }>).map((t) => [t.name, normaliseRead(t.sql)]),
  );
  const out: string[] = [];
  for (const [name, sql] of expected) {
    const have = present.get(name);
    if (have === undefined) out.push(`trigger ${name} is missing`);
    else if (have !== sql) out.push(`trigger ${name} was altered`);
  }
  return out;
}
