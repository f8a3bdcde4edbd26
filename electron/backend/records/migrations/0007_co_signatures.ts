/**
 * Schema version 7: co-signatures. A second person (a lab head, a deputy officer) may countersign a
 * signed revision with their own personal key: the countersignature covers the revision's record
 * fingerprint and the link (hash) of the main signed statement, so it stands or falls with that
 * signature. Append-only like the signatures: never changed, never deleted.
 */
export const name = 'co_signatures';

export const sql = `
CREATE TABLE co_signature (
  revision_id   TEXT NOT NULL REFERENCES revision(id),
  person_id     TEXT NOT NULL REFERENCES person(id),
  name          TEXT NOT NULL,
  role          TEXT NOT NULL,
  signed_at     TEXT NOT NULL,
  statement     TEXT NOT NULL,
  signed_link   TEXT NOT NULL,
  fingerprint   TEXT NOT NULL,
  key_id        TEXT NOT NULL,
  trust_anchor  TEXT NOT NULL,
  signature     TEXT NOT NULL,
  PRIMARY KEY (revision_id, person_id)
);

CREATE TRIGGER co_signature_no_update BEFORE UPDATE ON co_signature
BEGIN SELECT RAISE(ABORT, 'beamwarden: a co-signature cannot be changed'); END;

CREATE TRIGGER co_signature_no_delete BEFORE DELETE ON co_signature
BEGIN SELECT RAISE(ABORT, 'beamwarden: a co-signature cannot be deleted'); END;
`;

/** PostgreSQL: the same table and refusals, written only within the officer's sites (0001). */
export const postgresql = `
CREATE TABLE co_signature (
  revision_id   text NOT NULL REFERENCES revision(id),
  person_id     text NOT NULL REFERENCES person(id),
  name          text NOT NULL,
  role          text NOT NULL,
  signed_at     text NOT NULL,
  statement     text NOT NULL,
  signed_link   text NOT NULL,
  fingerprint   text NOT NULL,
  key_id        text NOT NULL,
  trust_anchor  text NOT NULL,
  signature     text NOT NULL,
  PRIMARY KEY (revision_id, person_id)
);

CREATE FUNCTION bw_co_signature_no_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a co-signature cannot be changed';
END $$;
CREATE TRIGGER co_signature_no_update BEFORE UPDATE ON co_signature
FOR EACH ROW EXECUTE FUNCTION bw_co_signature_no_update();

CREATE FUNCTION bw_co_signature_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a co-signature cannot be deleted';
END $$;
CREATE TRIGGER co_signature_no_delete BEFORE DELETE ON co_signature
FOR EACH ROW EXECUTE FUNCTION bw_co_signature_no_delete();

ALTER TABLE co_signature ENABLE ROW LEVEL SECURITY;
CREATE POLICY co_signature_read ON co_signature FOR SELECT USING (true);
CREATE POLICY co_signature_insert ON co_signature FOR INSERT WITH CHECK (bw_may_write_site(bw_revision_site(revision_id)));

CREATE TRIGGER co_signature_recorded AFTER INSERT OR UPDATE OR DELETE ON co_signature FOR EACH ROW EXECUTE FUNCTION bw_record_write('revision_id');
`;
