/**
 * Schema version 9: the endorsements of the trust list live in the register (issue 15, item 4,
 * building on the trust list of issue 10), so that every desk of an institution register sees the
 * same keys admitted; the trust ANCHOR stays outside the database, in each desk's own setting
 * (trust-anchor-setting.ts). A row here is only a claim: it is believed only when its Ed25519
 * endorsement verifies and the chain of endorsements leads to the anchor configured on the desk
 * reading it (trust-list.ts), so writing this table alone makes no key trusted.
 * - `trust_endorsement`: one row per endorsement (keyed by the key and the endorsement's signature,
 *   so a forged row can never take the place of a real one); the signed fields are those of the
 *   former trust list file's entries. A key may hold several endorsements: any one that leads to
 *   the desk's anchor makes it trusted, so a forged row beside a real one changes nothing.
 * - `trust_retirement`: a key retired (it signs nothing after that date; what it signed before stays
 *   valid). A retirement only ever takes trust away, so it is believed as written; it cannot be
 *   changed or removed (triggers), and a removed trigger is reported at open.
 * Both tables are append-only. They belong to the register, not to a site (no row-level policy).
 */
export const name = 'trust_endorsements';

export const sql = `
CREATE TABLE trust_endorsement (
  key_id       TEXT NOT NULL,
  endorsed_by  TEXT NOT NULL,
  public_key   TEXT NOT NULL,
  person_id    TEXT,
  person_name  TEXT NOT NULL,
  admitted_at  TEXT NOT NULL,
  endorsement  TEXT NOT NULL,
  PRIMARY KEY (key_id, endorsement)
) STRICT;

CREATE TRIGGER trust_endorsement_no_update BEFORE UPDATE ON trust_endorsement
BEGIN SELECT RAISE(ABORT, 'beamwarden: an endorsement of a signing key cannot be changed'); END;

CREATE TRIGGER trust_endorsement_no_delete BEFORE DELETE ON trust_endorsement
BEGIN SELECT RAISE(ABORT, 'beamwarden: an endorsement of a signing key cannot be deleted; retire the key instead'); END;

CREATE TABLE trust_retirement (
  key_id      TEXT PRIMARY KEY,
  retired_at  TEXT NOT NULL,
  reason      TEXT NOT NULL
) STRICT;

CREATE TRIGGER trust_retirement_no_update BEFORE UPDATE ON trust_retirement
BEGIN SELECT RAISE(ABORT, 'beamwarden: a retired signing key cannot be changed or brought back'); END;

CREATE TRIGGER trust_retirement_no_delete BEFORE DELETE ON trust_retirement
BEGIN SELECT RAISE(ABORT, 'beamwarden: a retired signing key cannot be changed or brought back'); END;
`;

/** PostgreSQL: the same tables and refusals; every write recorded with the account that made it. */
export const postgresql = `
CREATE TABLE trust_endorsement (
  key_id       text NOT NULL,
  endorsed_by  text NOT NULL,
  public_key   text NOT NULL,
  person_id    text,
  person_name  text NOT NULL,
  admitted_at  text NOT NULL,
  endorsement  text NOT NULL,
  PRIMARY KEY (key_id, endorsement)
);

CREATE FUNCTION bw_trust_endorsement_no_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: an endorsement of a signing key cannot be changed';
END $$;
CREATE TRIGGER trust_endorsement_no_update BEFORE UPDATE ON trust_endorsement
FOR EACH ROW EXECUTE FUNCTION bw_trust_endorsement_no_update();

CREATE FUNCTION bw_trust_endorsement_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: an endorsement of a signing key cannot be deleted; retire the key instead';
END $$;
CREATE TRIGGER trust_endorsement_no_delete BEFORE DELETE ON trust_endorsement
FOR EACH ROW EXECUTE FUNCTION bw_trust_endorsement_no_delete();

CREATE TABLE trust_retirement (
  key_id      text PRIMARY KEY,
  retired_at  text NOT NULL,
  reason      text NOT NULL
);

CREATE FUNCTION bw_trust_retirement_stays() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a retired signing key cannot be changed or brought back';
END $$;
CREATE TRIGGER trust_retirement_no_update BEFORE UPDATE ON trust_retirement
FOR EACH ROW EXECUTE FUNCTION bw_trust_retirement_stays();
CREATE TRIGGER trust_retirement_no_delete BEFORE DELETE ON trust_retirement
FOR EACH ROW EXECUTE FUNCTION bw_trust_retirement_stays();

CREATE TRIGGER trust_endorsement_recorded AFTER INSERT OR UPDATE OR DELETE ON trust_endorsement FOR EACH ROW EXECUTE FUNCTION bw_record_write('key_id');
CREATE TRIGGER trust_retirement_recorded AFTER INSERT OR UPDATE OR DELETE ON trust_retirement FOR EACH ROW EXECUTE FUNCTION bw_record_write('key_id');
`;
