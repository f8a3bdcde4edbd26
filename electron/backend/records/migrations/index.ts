/**
 * The numbered, forward-only migrations, in increasing version order; `PRAGMA user_version` holds
 * the version applied, and `schema_migrations` lists each applied migration by number and name so
 * that a database whose history is not a prefix of this list is refused (it came from another
 * build). Numbers are reserved per change while branches are worked on in parallel, so the list may
 * skip a number until the branches meet; a database's history must still be a prefix of the list.
 * Never edit or reorder an entry once released: add a new one.
 */
import * as m0001 from './0001_initial.js';
import * as m0002 from './0002_list_columns_and_audit_log.js';
import * as m0003 from './0003_personal_keys_and_chain.js';
import * as m0004 from './0004_revision_version.js';
import * as m0005 from './0005_eyewear_upkeep.js';
import * as m0007 from './0007_co_signatures.js';
import * as m0008 from './0008_limit_row_checks.js';
import * as m0009 from './0009_trust_endorsements.js';
import * as m0010 from './0010_write_record_lookup.js';
import * as m0011 from './0011_one_anchor_and_sealed_keys.js';

export interface Migration {
  readonly version: number;
  readonly name: string;
  /** SQLite's SQL (the embedded file). */
  readonly sql: string;
  /**
   * PostgreSQL's SQL for the same version (the institution register): the same tables, columns,
   * keys, checks and refusals (PL/pgSQL triggers with the same names and words), plus the
   * register's access rules (row-level security) for any table that belongs to a site.
   * DEVELOPERS.md "A new migration" says what it needs.
   */
  readonly postgresql: string;
}

export const MIGRATIONS: readonly Migration[] = [
  { version: 1, name: m0001.name, sql: m0001.sql, postgresql: m0001.postgresql },
  { version: 2, name: m0002.name, sql: m0002.sql, postgresql: m0002.postgresql },
  { version: 3, name: m0003.name, sql: m0003.sql, postgresql: m0003.postgresql },
  { version: 4, name: m0004.name, sql: m0004.sql, postgresql: m0004.postgresql },
  { version: 5, name: m0005.name, sql: m0005.sql, postgresql: m0005.postgresql },
  { version: 7, name: m0007.name, sql: m0007.sql, postgresql: m0007.postgresql },
  // 8, not 6: schema 7 was released first, and a released database's history must stay a prefix.
  { version: 8, name: m0008.name, sql: m0008.sql, postgresql: m0008.postgresql },
  { version: 9, name: m0009.name, sql: m0009.sql, postgresql: m0009.postgresql },
  { version: 10, name: m0010.name, sql: m0010.sql, postgresql: m0010.postgresql },
  { version: 11, name: m0011.name, sql: m0011.sql, postgresql: m0011.postgresql },
];

export const LATEST_VERSION = MIGRATIONS[MIGRATIONS.length - 1]?.version ?? 0;
