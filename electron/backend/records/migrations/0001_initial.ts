/**
 * Schema version 1: the register, assessments with revisions, signatures and signing keys, and the
 * triggers that make signed content immutable in the database itself (not only in our code), so
 * another SQLite tool cannot change or remove a signed record without first dropping them — and
 * then `verify` reports the change through the fingerprint and signature.
 *
 * Every table is STRICT (SQLite >= 3.37): a value of the wrong type is refused, not coerced.
 * Foreign keys RESTRICT deletion: a site, room, installation or person that a record refers to
 * cannot vanish underneath it (retire an installation instead).
 */
export const name = 'initial';

export const sql = `
CREATE TABLE schema_migrations (
  version INTEGER PRIMARY KEY,
  name TEXT NOT NULL,
  applied_at TEXT NOT NULL
) STRICT;

CREATE TABLE site (
  id TEXT PRIMARY KEY,
  name TEXT NOT NULL,
  building TEXT NOT NULL DEFAULT '',
  address TEXT NOT NULL DEFAULT '',
  notes TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL
) STRICT;

CREATE TABLE person (
  id TEXT PRIMARY KEY,
  name TEXT NOT NULL,
  role TEXT NOT NULL DEFAULT '',
  email TEXT NOT NULL DEFAULT '',
  phone TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL
) STRICT;

CREATE TABLE room (
  id TEXT PRIMARY KEY,
  site_id TEXT NOT NULL REFERENCES site(id) ON DELETE RESTRICT,
  code TEXT NOT NULL,
  name TEXT NOT NULL DEFAULT '',
  responsible_person TEXT NOT NULL DEFAULT '',
  contact TEXT NOT NULL DEFAULT '',
  notes TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  UNIQUE (site_id, code)
) STRICT;

CREATE TABLE laser_installation (
  id TEXT PRIMARY KEY,
  room_id TEXT NOT NULL REFERENCES room(id) ON DELETE RESTRICT,
  laser_type TEXT NOT NULL DEFAULT '',
  maker TEXT NOT NULL DEFAULT '',
  model TEXT NOT NULL DEFAULT '',
  serial_number TEXT NOT NULL DEFAULT '',
  registration_number TEXT NOT NULL DEFAULT '',
  laser_json TEXT NOT NULL CHECK (json_valid(laser_json)),
  class_as_labelled TEXT CHECK (class_as_labelled IN ('1','1M','2','2M','3R','3B','4')),
  status TEXT NOT NULL DEFAULT 'in-service' CHECK (status IN ('in-service','retired')),
  notes TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL
) STRICT;
CREATE INDEX laser_installation_room ON laser_installation(room_id);

CREATE TABLE eyewear (
  id TEXT PRIMARY KEY,
  site_id TEXT NOT NULL REFERENCES site(id) ON DELETE RESTRICT,
  tag TEXT NOT NULL,
  spec_json TEXT NOT NULL CHECK (json_valid(spec_json)),
  location TEXT NOT NULL DEFAULT '',
  quantity INTEGER NOT NULL DEFAULT 1 CHECK (quantity >= 0),
  notes TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  UNIQUE (site_id, tag)
) STRICT;

CREATE TABLE signing_key (
  key_id TEXT PRIMARY KEY,
  public_key TEXT NOT NULL,
  origin TEXT NOT NULL CHECK (origin IN ('this-database','imported')),
  added_at TEXT NOT NULL
) STRICT;

CREATE TABLE assessment (
  id TEXT PRIMARY KEY,
  room_id TEXT NOT NULL REFERENCES room(id) ON DELETE RESTRICT,
  installation_id TEXT REFERENCES laser_installation(id) ON DELETE RESTRICT,
  created_at TEXT NOT NULL
) STRICT;
CREATE INDEX assessment_room ON assessment(room_id);

CREATE TABLE revision (
  id TEXT PRIMARY KEY,
  assessment_id TEXT NOT NULL REFERENCES assessment(id) ON DELETE RESTRICT,
  revision_no INTEGER NOT NULL CHECK (revision_no >= 1),
  status TEXT NOT NULL CHECK (status IN ('draft','signed','superseded')),
  content_json TEXT NOT NULL CHECK (json_valid(content_json)),
  -- The core's RoomResult as JSON, Brotli-compressed (RFC 7932): results carry full derivation
  -- traces (tens to hundreds of kB per room) and compress ten- to thirtyfold; they are derived data,
  -- recomputable from content_json, and exports carry them as plain JSON.
  results_z BLOB NOT NULL CHECK (length(results_z) > 0),
  calculated_with TEXT NOT NULL,
  based_on TEXT REFERENCES revision(id) ON DELETE RESTRICT,
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  UNIQUE (assessment_id, revision_no)
) STRICT;
-- At most one open draft per assessment.
CREATE UNIQUE INDEX revision_one_draft ON revision(assessment_id) WHERE status = 'draft';

CREATE TABLE signature (
  revision_id TEXT PRIMARY KEY REFERENCES revision(id) ON DELETE RESTRICT,
  person_id TEXT REFERENCES person(id) ON DELETE RESTRICT,
  name TEXT NOT NULL,
  role TEXT NOT NULL,
  signed_at TEXT NOT NULL,
  statement TEXT NOT NULL,
  fingerprint TEXT NOT NULL,
  algorithm TEXT NOT NULL CHECK (algorithm = 'Ed25519'),
  signature TEXT NOT NULL,
  key_id TEXT NOT NULL REFERENCES signing_key(key_id) ON DELETE RESTRICT
) STRICT;

-- ---- immutability of signed content ----------------------------------------------------------
-- A revision is inserted as a draft; it becomes signed only once its signature row exists.
CREATE TRIGGER revision_insert_as_draft BEFORE INSERT ON revision
WHEN NEW.status <> 'draft'
BEGIN SELECT RAISE(ABORT, 'beamwarden: a revision is created as a draft and signed afterwards'); END;

-- Signed and superseded revisions: nothing may change except signed -> superseded.
CREATE TRIGGER revision_signed_immutable BEFORE UPDATE ON revision
WHEN OLD.status <> 'draft' AND NOT (
  OLD.status = 'signed' AND NEW.status = 'superseded'
  AND NEW.id IS OLD.id AND NEW.assessment_id IS OLD.assessment_id AND NEW.revision_no IS OLD.revision_no
  AND NEW.content_json IS OLD.content_json AND NEW.results_z IS OLD.results_z
  AND NEW.calculated_with IS OLD.calculated_with AND NEW.based_on IS OLD.based_on
  AND NEW.created_at IS OLD.created_at AND NEW.updated_at IS OLD.updated_at)
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signed revision cannot be changed; save creates a new draft revision'); END;

-- A draft becomes signed (or superseded) only with its signature in place.
CREATE TRIGGER revision_sign_needs_signature BEFORE UPDATE OF status ON revision
WHEN OLD.status = 'draft' AND NEW.status <> 'draft'
  AND NOT EXISTS (SELECT 1 FROM signature WHERE revision_id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'beamwarden: a revision is signed by adding its signature first'); END;

CREATE TRIGGER revision_signed_no_delete BEFORE DELETE ON revision
WHEN OLD.status <> 'draft'
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signed revision cannot be deleted'); END;

CREATE TRIGGER signature_only_on_draft BEFORE INSERT ON signature
WHEN (SELECT status FROM revision WHERE id = NEW.revision_id) IS NOT 'draft'
BEGIN SELECT RAISE(ABORT, 'beamwarden: only a draft revision can be signed'); END;

CREATE TRIGGER signature_no_update BEFORE UPDATE ON signature
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signature cannot be changed'); END;

CREATE TRIGGER signature_no_delete BEFORE DELETE ON signature
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signature cannot be deleted'); END;

CREATE TRIGGER signing_key_no_update BEFORE UPDATE OF key_id, public_key ON signing_key
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signing key cannot be changed'); END;

CREATE TRIGGER signing_key_no_delete BEFORE DELETE ON signing_key
WHEN EXISTS (SELECT 1 FROM signature WHERE key_id = OLD.key_id)
BEGIN SELECT RAISE(ABORT, 'beamwarden: a signing key that signed records cannot be deleted'); END;

CREATE TRIGGER assessment_signed_no_update BEFORE UPDATE ON assessment
WHEN EXISTS (SELECT 1 FROM revision WHERE assessment_id = OLD.id AND status <> 'draft')
BEGIN SELECT RAISE(ABORT, 'beamwarden: an assessment with a signed revision cannot be changed'); END;

CREATE TRIGGER assessment_signed_no_delete BEFORE DELETE ON assessment
WHEN EXISTS (SELECT 1 FROM revision WHERE assessment_id = OLD.id AND status <> 'draft')
BEGIN SELECT RAISE(ABORT, 'beamwarden: an assessment with a signed revision cannot be deleted'); END;
`;
