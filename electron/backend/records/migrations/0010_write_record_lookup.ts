/**
 * Schema version 10: an index for "who last wrote this row" on the institution register.
 * `bw_last_writer(table, key)` (migration 1) reads the newest `write_record` row of one table row
 * (`WHERE table_name = ? AND row_key = ? ORDER BY seq DESC LIMIT 1`) each time a save, register edit
 * or laser change is refused as stale, so the refusal can name the other officer's account.
 * `write_record` gains a row with every write of every officer and is never trimmed (append-only),
 * so without an index that lookup reads the whole table: it grows with the register's age.
 *
 * `write_record` exists only on PostgreSQL (a register file has one writer: this program), so the
 * SQLite part is a comment; the number is taken on both engines (one list of versions).
 */
export const name = 'write_record_lookup';

export const sql = `
-- Nothing to do in a register file: it has no record of database accounts (write_record is the server's).
`;

export const postgresql = `
CREATE INDEX write_record_row_newest ON write_record (table_name, row_key, seq DESC);
`;
