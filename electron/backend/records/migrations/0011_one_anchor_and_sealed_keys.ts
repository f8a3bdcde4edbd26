/**
 * Schema version 11: the register's trust anchor is set up once, and readers of an institution
 * register cannot read the sealed private keys.
 * - `trust_anchor_setup`: at most one row (its key is the constant 1), written in the same
 *   transaction as the first key's self-endorsement and its `trust_anchor_pin` (personal-keys.ts,
 *   setUpTrustList). Two desks creating a register's first key at the same moment then cannot both
 *   commit: on SQLite the second writer's transaction starts after the first commits (BEGIN
 *   IMMEDIATE) and meets the row; on PostgreSQL the second insert of the same primary key waits for
 *   the first transaction and fails once it commits (unique index, at any isolation level:
 *   PostgreSQL 15 documentation 13.2 and "Unique Indexes"), so the loser's key, endorsement and pin
 *   are rolled back. Append-only. Backfilled from the earliest pin of an existing register (a
 *   register that already holds several pins keeps them all: they are reported as before).
 * - PostgreSQL only: the group role `beamwarden_reader` reads `person_key` without its
 *   `sealed_private_key` column (column privileges; bw_grant_access is redefined so every later
 *   migration run keeps it so). Officers keep the column: signing and countersigning open the
 *   signer's sealed key through the account of the desk where the passphrase is typed (a co-signer
 *   types theirs at the officer's desk), and a person is not tied to a database account, so a
 *   row-level "own key only" rule would refuse every co-signature. Readers never sign (they cannot
 *   write a signature either).
 */
export const name = 'one_anchor_and_sealed_keys';

export const sql = `
CREATE TABLE trust_anchor_setup (
  only_row   INTEGER PRIMARY KEY CHECK (only_row = 1),
  anchor     TEXT NOT NULL,
  set_up_at  TEXT NOT NULL
) STRICT;

CREATE TRIGGER trust_anchor_setup_no_update BEFORE UPDATE ON trust_anchor_setup
BEGIN SELECT RAISE(ABORT, 'beamwarden: the register''s trust anchor is set up once and cannot be changed'); END;
CREATE TRIGGER trust_anchor_setup_no_delete BEFORE DELETE ON trust_anchor_setup
BEGIN SELECT RAISE(ABORT, 'beamwarden: the register''s trust anchor is set up once and cannot be changed'); END;

INSERT INTO trust_anchor_setup (only_row, anchor, set_up_at)
SELECT 1, anchor, pinned_at FROM trust_anchor_pin ORDER BY pinned_at, anchor LIMIT 1;
`;

export const postgresql = `
CREATE TABLE trust_anchor_setup (
  only_row   integer PRIMARY KEY CHECK (only_row = 1),
  anchor     text NOT NULL,
  set_up_at  text NOT NULL
);

CREATE FUNCTION bw_trust_anchor_setup_stays() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: the register''s trust anchor is set up once and cannot be changed';
END $$;
CREATE TRIGGER trust_anchor_setup_no_update BEFORE UPDATE ON trust_anchor_setup
FOR EACH ROW EXECUTE FUNCTION bw_trust_anchor_setup_stays();
CREATE TRIGGER trust_anchor_setup_no_delete BEFORE DELETE ON trust_anchor_setup
FOR EACH ROW EXECUTE FUNCTION bw_trust_anchor_setup_stays();

INSERT INTO trust_anchor_setup (only_row, anchor, set_up_at)
SELECT 1, anchor, pinned_at FROM trust_anchor_pin ORDER BY pinned_at, anchor LIMIT 1;

CREATE TRIGGER trust_anchor_setup_recorded AFTER INSERT OR UPDATE OR DELETE ON trust_anchor_setup FOR EACH ROW EXECUTE FUNCTION bw_record_write('anchor');

-- Readers: every table but write_record, and person_key without the sealed private keys.
CREATE OR REPLACE FUNCTION bw_grant_access() RETURNS void LANGUAGE plpgsql AS $$
DECLARE
  t text;
BEGIN
  IF EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'beamwarden_reader') THEN
    EXECUTE format('GRANT USAGE ON SCHEMA %I TO beamwarden_reader', current_schema());
    FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = current_schema() AND tablename NOT IN ('write_record', 'person_key') LOOP
      EXECUTE format('GRANT SELECT ON %I TO beamwarden_reader', t);
    END LOOP;
    -- Revoking the table's SELECT also revokes its column privileges; then the readable columns.
    EXECUTE format('REVOKE SELECT ON %I.person_key FROM beamwarden_reader', current_schema());
    EXECUTE format('GRANT SELECT (key_id, person_id, created_at, retired_at, retired_reason) ON %I.person_key TO beamwarden_reader', current_schema());
  END IF;
  IF EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'beamwarden_officer') THEN
    EXECUTE format('GRANT USAGE ON SCHEMA %I TO beamwarden_officer', current_schema());
    FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = current_schema()
             AND tablename NOT IN ('write_record', 'officer_site', 'schema_migrations') LOOP
      EXECUTE format('GRANT SELECT, INSERT, UPDATE, DELETE ON %I TO beamwarden_officer', t);
    END LOOP;
    EXECUTE format('GRANT SELECT ON %I.officer_site, %I.schema_migrations TO beamwarden_officer', current_schema(), current_schema());
    EXECUTE format('GRANT USAGE ON ALL SEQUENCES IN SCHEMA %I TO beamwarden_officer', current_schema());
  END IF;
END $$;
`;
