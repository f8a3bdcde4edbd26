/**
 * Schema version 2:
 * - `revision.title` and `revision.review_by`, copied out of the content JSON, so that lists and
 *   "due for review" queries do not parse every record (benchmark: list a room's assessments);
 *   backfilled for existing rows. The immutability trigger is rebuilt to cover the new columns —
 *   it has to be dropped for the backfill because it refuses any UPDATE of a signed revision.
 * - `audit_event`: an append-only log of what happened to records (created, saved, signed,
 *   imported, restored), refused UPDATE and DELETE like signatures.
 */
export const name = 'list_columns_and_audit_log';

export const sql = `
ALTER TABLE revision ADD COLUMN title TEXT NOT NULL DEFAULT '';
ALTER TABLE revision ADD COLUMN review_by TEXT;

DROP TRIGGER revision_signed_immutable;
UPDATE revision SET
  title = coalesce(json_extract(content_json, '$.title'), ''),
  review_by = json_extract(content_json, '$.reviewBy');

CREATE TRIGGER revision_signed_immutable BEFORE UPDATE ON revision
WHEN OLD.status <> 'draft' AND NOT (
  OLD.status = 'signed' AND NEW.status = 'superseded'
  AND NEW.id IS OLD.id AND NEW.assessment_id IS OLD.assessment_id AND NEW.revision_no IS OLD.revision_no
  AND NEW.content_json IS OLD.content_json AND NEW.results_z IS OLD.results_z
  AND NEW.calculated_with IS OLD.calculated_with AND NEW.based_on IS OLD.based_on
  AND NEW.created_at IS OLD.created_at AND NEW.updated_at IS OLD.updated_at
  AND NEW.title IS OLD.title AND NEW.review_by IS OLD.review_by)
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signed revision cannot be changed; save creates a new draft revision'); END;

CREATE INDEX revision_review_by ON revision(review_by) WHERE review_by IS NOT NULL;

CREATE TABLE audit_event (
  seq INTEGER PRIMARY KEY AUTOINCREMENT,
  at TEXT NOT NULL,
  action TEXT NOT NULL,
  entity TEXT NOT NULL,
  entity_id TEXT NOT NULL,
  detail TEXT NOT NULL DEFAULT ''
) STRICT;
CREATE INDEX audit_event_entity ON audit_event(entity, entity_id);

CREATE TRIGGER audit_event_no_update BEFORE UPDATE ON audit_event
BEGIN SELECT RAISE(ABORT, 'beamwarden: the audit log is append-only'); END;
CREATE TRIGGER audit_event_no_delete BEFORE DELETE ON audit_event
BEGIN SELECT RAISE(ABORT, 'beamwarden: the audit log is append-only'); END;
`;

/**
 * PostgreSQL: the same columns and log. The immutability function compares whole rows (0001), so
 * it covers the new columns as it is; it is only switched off around the backfill, like SQLite's.
 */
export const postgresql = `
ALTER TABLE revision ADD COLUMN title text NOT NULL DEFAULT '';
ALTER TABLE revision ADD COLUMN review_by text;

ALTER TABLE revision DISABLE TRIGGER revision_signed_immutable;
UPDATE revision SET
  title = coalesce(content_json::jsonb ->> 'title', ''),
  review_by = content_json::jsonb ->> 'reviewBy';
ALTER TABLE revision ENABLE TRIGGER revision_signed_immutable;

CREATE INDEX revision_review_by ON revision(review_by) WHERE review_by IS NOT NULL;

CREATE TABLE audit_event (
  seq bigserial PRIMARY KEY,
  at text NOT NULL,
  action text NOT NULL,
  entity text NOT NULL,
  entity_id text NOT NULL,
  detail text NOT NULL DEFAULT '',
  -- The database account that wrote the event (several officers share one register).
  db_role text NOT NULL DEFAULT session_user
);
CREATE INDEX audit_event_entity ON audit_event(entity, entity_id);

CREATE FUNCTION bw_audit_event_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: the audit log is append-only';
END $$;
CREATE TRIGGER audit_event_no_update BEFORE UPDATE ON audit_event
FOR EACH ROW EXECUTE FUNCTION bw_audit_event_append_only();
CREATE TRIGGER audit_event_no_delete BEFORE DELETE ON audit_event
FOR EACH ROW EXECUTE FUNCTION bw_audit_event_append_only();
`;
