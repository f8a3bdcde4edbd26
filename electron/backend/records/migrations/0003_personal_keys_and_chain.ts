/**
 * Schema version 3: personal signing keys and the revision chain.
 * - `person_key`: one Ed25519 key pair per signer, the private key sealed with the owner's
 *   passphrase (key-encryption.ts); at most one active key per person; a retired key stays
 *   retired, and no key row is deleted or given to another person.
 * - `signature` gains the statement version, the chain link to the previous signed revision and
 *   the trust anchor it was signed under (all inside the signed statement from version 2 on).
 * - `trust_anchor_pin`: the anchor(s) of the trust list this database was set up with, append-only,
 *   so a replaced trust list file is reported.
 * Whether a key is trusted is NOT stored here: the trust list lives outside the database.
 */
export const name = 'personal_keys_and_chain';

export const sql = `
CREATE TABLE person_key (
  key_id TEXT PRIMARY KEY REFERENCES signing_key(key_id) ON DELETE RESTRICT,
  person_id TEXT NOT NULL REFERENCES person(id) ON DELETE RESTRICT,
  sealed_private_key TEXT NOT NULL CHECK (json_valid(sealed_private_key)),
  created_at TEXT NOT NULL,
  retired_at TEXT,
  retired_reason TEXT NOT NULL DEFAULT ''
) STRICT;
CREATE UNIQUE INDEX person_key_one_active ON person_key(person_id) WHERE retired_at IS NULL;

CREATE TRIGGER person_key_retired_stays BEFORE UPDATE ON person_key
WHEN OLD.retired_at IS NOT NULL
BEGIN SELECT RAISE(ABORT, 'beamwarden: a retired signing key cannot be changed or brought back'); END;

CREATE TRIGGER person_key_owner_fixed BEFORE UPDATE OF key_id, person_id ON person_key
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signing key cannot be given to another person'); END;

CREATE TRIGGER person_key_no_delete BEFORE DELETE ON person_key
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signing key is retired, never deleted'); END;

ALTER TABLE signature ADD COLUMN statement_version INTEGER NOT NULL DEFAULT 1 CHECK (statement_version IN (1, 2));
ALTER TABLE signature ADD COLUMN previous_link TEXT;
ALTER TABLE signature ADD COLUMN trust_anchor TEXT;

CREATE TABLE trust_anchor_pin (
  anchor TEXT PRIMARY KEY,
  pinned_at TEXT NOT NULL
) STRICT;
CREATE TRIGGER trust_anchor_pin_no_update BEFORE UPDATE ON trust_anchor_pin
BEGIN SELECT RAISE(ABORT, 'beamwarden: the trust anchor record is append-only'); END;
CREATE TRIGGER trust_anchor_pin_no_delete BEFORE DELETE ON trust_anchor_pin
BEGIN SELECT RAISE(ABORT, 'beamwarden: the trust anchor record is append-only'); END;
`;

/** PostgreSQL: the same tables, columns and refusals. */
export const postgresql = `
CREATE TABLE person_key (
  key_id text PRIMARY KEY REFERENCES signing_key(key_id) ON DELETE RESTRICT,
  person_id text NOT NULL REFERENCES person(id) ON DELETE RESTRICT,
  sealed_private_key text NOT NULL CHECK (bw_json_valid(sealed_private_key)),
  created_at text NOT NULL,
  retired_at text,
  retired_reason text NOT NULL DEFAULT ''
);
CREATE UNIQUE INDEX person_key_one_active ON person_key(person_id) WHERE retired_at IS NULL;

CREATE FUNCTION bw_person_key_retired_stays() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.retired_at IS NOT NULL THEN
    RAISE EXCEPTION 'beamwarden: a retired signing key cannot be changed or brought back';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER person_key_retired_stays BEFORE UPDATE ON person_key
FOR EACH ROW EXECUTE FUNCTION bw_person_key_retired_stays();

CREATE FUNCTION bw_person_key_owner_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signing key cannot be given to another person';
END $$;
CREATE TRIGGER person_key_owner_fixed BEFORE UPDATE OF key_id, person_id ON person_key
FOR EACH ROW EXECUTE FUNCTION bw_person_key_owner_fixed();

CREATE FUNCTION bw_person_key_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signing key is retired, never deleted';
END $$;
CREATE TRIGGER person_key_no_delete BEFORE DELETE ON person_key
FOR EACH ROW EXECUTE FUNCTION bw_person_key_no_delete();

ALTER TABLE signature ADD COLUMN statement_version integer NOT NULL DEFAULT 1 CHECK (statement_version IN (1, 2));
ALTER TABLE signature ADD COLUMN previous_link text;
ALTER TABLE signature ADD COLUMN trust_anchor text;

CREATE TABLE trust_anchor_pin (
  anchor text PRIMARY KEY,
  pinned_at text NOT NULL
);
CREATE FUNCTION bw_trust_anchor_pin_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: the trust anchor record is append-only';
END $$;
CREATE TRIGGER trust_anchor_pin_no_update BEFORE UPDATE ON trust_anchor_pin
FOR EACH ROW EXECUTE FUNCTION bw_trust_anchor_pin_append_only();
CREATE TRIGGER trust_anchor_pin_no_delete BEFORE DELETE ON trust_anchor_pin
FOR EACH ROW EXECUTE FUNCTION bw_trust_anchor_pin_append_only();

CREATE TRIGGER person_key_recorded AFTER INSERT OR UPDATE OR DELETE ON person_key FOR EACH ROW EXECUTE FUNCTION bw_record_write('key_id');
CREATE TRIGGER trust_anchor_pin_recorded AFTER INSERT OR UPDATE OR DELETE ON trust_anchor_pin FOR EACH ROW EXECUTE FUNCTION bw_record_write('anchor');
`;
