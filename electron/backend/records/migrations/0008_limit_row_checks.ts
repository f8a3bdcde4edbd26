/**
 * Schema version 8: the officer's checks of the limit tables against the published documents
 * (issue 12). Each row records one check of one limit-table row or correction-factor piece of one
 * rule set: the verdict ('matches', or 'differs' with what the published text gives), the document
 * and table cited, and the signature of the person who checked it with their personal key (the
 * same keys, passphrase and trust list as a signed assessment). A new check of the same entry is a
 * new row (the newest valid one applies); a signed check is never changed and never deleted.
 *
 * Plain SQL that any engine reads (TEXT columns, a CHECK on the verdict); only the two triggers are
 * SQLite's own (a server engine writes its own equivalent).
 */
export const name = 'limit_row_checks';

export const sql = `
CREATE TABLE limit_row_checks (
  id             TEXT PRIMARY KEY,
  rule_set       TEXT NOT NULL,
  entry_key      TEXT NOT NULL,
  entry_expr     TEXT NOT NULL,
  verdict        TEXT NOT NULL CHECK (verdict IN ('matches', 'differs')),
  document_expr  TEXT,
  reference      TEXT NOT NULL,
  note           TEXT NOT NULL,
  person_id      TEXT NOT NULL,
  name           TEXT NOT NULL,
  role           TEXT NOT NULL,
  signed_at      TEXT NOT NULL,
  key_id         TEXT NOT NULL,
  trust_anchor   TEXT NOT NULL,
  signature      TEXT NOT NULL
);

CREATE INDEX limit_row_checks_entry ON limit_row_checks (rule_set, entry_key, signed_at);

CREATE TRIGGER limit_row_checks_no_update BEFORE UPDATE ON limit_row_checks
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signed check of a limit-table row cannot be changed'); END;

CREATE TRIGGER limit_row_checks_no_delete BEFORE DELETE ON limit_row_checks
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signed check of a limit-table row cannot be deleted'); END;
`;

/**
 * PostgreSQL: the same table, index and refusals. A check belongs to the register, not to a site
 * (like a person or a signing key), so no row-level policy narrows it to the officer's sites; the
 * change is recorded with the account that made it.
 */
export const postgresql = `
CREATE TABLE limit_row_checks (
  id             text PRIMARY KEY,
  rule_set       text NOT NULL,
  entry_key      text NOT NULL,
  entry_expr     text NOT NULL,
  verdict        text NOT NULL CHECK (verdict IN ('matches', 'differs')),
  document_expr  text,
  reference      text NOT NULL,
  note           text NOT NULL,
  person_id      text NOT NULL,
  name           text NOT NULL,
  role           text NOT NULL,
  signed_at      text NOT NULL,
  key_id         text NOT NULL,
  trust_anchor   text NOT NULL,
  signature      text NOT NULL
);

CREATE INDEX limit_row_checks_entry ON limit_row_checks (rule_set, entry_key, signed_at);

CREATE FUNCTION bw_limit_row_checks_no_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signed check of a limit-table row cannot be changed';
END $$;
CREATE TRIGGER limit_row_checks_no_update BEFORE UPDATE ON limit_row_checks
FOR EACH ROW EXECUTE FUNCTION bw_limit_row_checks_no_update();

CREATE FUNCTION bw_limit_row_checks_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signed check of a limit-table row cannot be deleted';
END $$;
CREATE TRIGGER limit_row_checks_no_delete BEFORE DELETE ON limit_row_checks
FOR EACH ROW EXECUTE FUNCTION bw_limit_row_checks_no_delete();

CREATE TRIGGER limit_row_checks_recorded AFTER INSERT OR UPDATE OR DELETE ON limit_row_checks FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
`;
