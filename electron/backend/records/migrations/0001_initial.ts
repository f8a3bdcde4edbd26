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

/**
 * The same schema on PostgreSQL (institution register). Types: TEXT as text, INTEGER as integer,
 * BLOB as bytea; `json_valid` becomes bw_json_valid (PostgreSQL 15 has no IS JSON); each SQLite
 * trigger becomes a PL/pgSQL function with a trigger of the same name and the same words, so the
 * records logic reads the same refusal ("beamwarden: ...") from either engine.
 *
 * A signed revision is compared column by column through its JSON image minus `status`, so a
 * column added by a later migration is covered without rebuilding the trigger.
 *
 * Access (README "Institution register"): members of beamwarden_reader read, members of
 * beamwarden_officer write within the sites assigned to them in officer_site (row-level security:
 * policies below), and every write is recorded with the database account that made it
 * (write_record, filled by a trigger the writer cannot bypass). The register's owner (the account
 * that migrates) is not bound by the policies: it is the administrator.
 */
export const postgresql = `
CREATE TABLE schema_migrations (
  version integer PRIMARY KEY,
  name text NOT NULL,
  applied_at text NOT NULL
);

CREATE FUNCTION bw_json_valid(t text) RETURNS boolean LANGUAGE plpgsql IMMUTABLE AS $$
BEGIN
  PERFORM t::jsonb;
  RETURN true;
EXCEPTION WHEN others THEN
  RETURN false;
END $$;

CREATE TABLE site (
  id text PRIMARY KEY,
  name text NOT NULL,
  building text NOT NULL DEFAULT '',
  address text NOT NULL DEFAULT '',
  notes text NOT NULL DEFAULT '',
  created_at text NOT NULL,
  updated_at text NOT NULL
);

CREATE TABLE person (
  id text PRIMARY KEY,
  name text NOT NULL,
  role text NOT NULL DEFAULT '',
  email text NOT NULL DEFAULT '',
  phone text NOT NULL DEFAULT '',
  created_at text NOT NULL,
  updated_at text NOT NULL
);

CREATE TABLE room (
  id text PRIMARY KEY,
  site_id text NOT NULL REFERENCES site(id) ON DELETE RESTRICT,
  code text NOT NULL,
  name text NOT NULL DEFAULT '',
  responsible_person text NOT NULL DEFAULT '',
  contact text NOT NULL DEFAULT '',
  notes text NOT NULL DEFAULT '',
  created_at text NOT NULL,
  updated_at text NOT NULL,
  UNIQUE (site_id, code)
);

CREATE TABLE laser_installation (
  id text PRIMARY KEY,
  room_id text NOT NULL REFERENCES room(id) ON DELETE RESTRICT,
  laser_type text NOT NULL DEFAULT '',
  maker text NOT NULL DEFAULT '',
  model text NOT NULL DEFAULT '',
  serial_number text NOT NULL DEFAULT '',
  registration_number text NOT NULL DEFAULT '',
  laser_json text NOT NULL CHECK (bw_json_valid(laser_json)),
  class_as_labelled text CHECK (class_as_labelled IN ('1','1M','2','2M','3R','3B','4')),
  status text NOT NULL DEFAULT 'in-service' CHECK (status IN ('in-service','retired')),
  notes text NOT NULL DEFAULT '',
  created_at text NOT NULL,
  updated_at text NOT NULL,
  -- Insertion order for rows that share a timestamp (SQLite uses its rowid; context.ts insertionOrder).
  insert_seq bigserial NOT NULL
);
CREATE INDEX laser_installation_room ON laser_installation(room_id);

CREATE TABLE eyewear (
  id text PRIMARY KEY,
  site_id text NOT NULL REFERENCES site(id) ON DELETE RESTRICT,
  tag text NOT NULL,
  spec_json text NOT NULL CHECK (bw_json_valid(spec_json)),
  location text NOT NULL DEFAULT '',
  quantity integer NOT NULL DEFAULT 1 CHECK (quantity >= 0),
  notes text NOT NULL DEFAULT '',
  created_at text NOT NULL,
  updated_at text NOT NULL,
  UNIQUE (site_id, tag)
);

CREATE TABLE signing_key (
  key_id text PRIMARY KEY,
  public_key text NOT NULL,
  origin text NOT NULL CHECK (origin IN ('this-database','imported')),
  added_at text NOT NULL
);

CREATE TABLE assessment (
  id text PRIMARY KEY,
  room_id text NOT NULL REFERENCES room(id) ON DELETE RESTRICT,
  installation_id text REFERENCES laser_installation(id) ON DELETE RESTRICT,
  created_at text NOT NULL
);
CREATE INDEX assessment_room ON assessment(room_id);

CREATE TABLE revision (
  id text PRIMARY KEY,
  assessment_id text NOT NULL REFERENCES assessment(id) ON DELETE RESTRICT,
  revision_no integer NOT NULL CHECK (revision_no >= 1),
  status text NOT NULL CHECK (status IN ('draft','signed','superseded')),
  content_json text NOT NULL CHECK (bw_json_valid(content_json)),
  results_z bytea NOT NULL CHECK (octet_length(results_z) > 0),
  calculated_with text NOT NULL,
  based_on text REFERENCES revision(id) ON DELETE RESTRICT,
  created_at text NOT NULL,
  updated_at text NOT NULL,
  UNIQUE (assessment_id, revision_no)
);
CREATE UNIQUE INDEX revision_one_draft ON revision(assessment_id) WHERE status = 'draft';

CREATE TABLE signature (
  revision_id text PRIMARY KEY REFERENCES revision(id) ON DELETE RESTRICT,
  person_id text REFERENCES person(id) ON DELETE RESTRICT,
  name text NOT NULL,
  role text NOT NULL,
  signed_at text NOT NULL,
  statement text NOT NULL,
  fingerprint text NOT NULL,
  algorithm text NOT NULL CHECK (algorithm = 'Ed25519'),
  signature text NOT NULL,
  key_id text NOT NULL REFERENCES signing_key(key_id) ON DELETE RESTRICT
);

-- ---- immutability of signed content ----------------------------------------------------------
CREATE FUNCTION bw_revision_insert_as_draft() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.status <> 'draft' THEN
    RAISE EXCEPTION 'beamwarden: a revision is created as a draft and signed afterwards';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER revision_insert_as_draft BEFORE INSERT ON revision
FOR EACH ROW EXECUTE FUNCTION bw_revision_insert_as_draft();

CREATE FUNCTION bw_revision_signed_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  -- Drafts are saved often and carry large results: the whole-row comparison runs for signed rows only.
  IF OLD.status <> 'draft' THEN
    IF NOT (OLD.status = 'signed' AND NEW.status = 'superseded'
            AND (to_jsonb(NEW) - 'status') = (to_jsonb(OLD) - 'status')) THEN
      RAISE EXCEPTION 'beamwarden: a signed revision cannot be changed; save creates a new draft revision';
    END IF;
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER revision_signed_immutable BEFORE UPDATE ON revision
FOR EACH ROW EXECUTE FUNCTION bw_revision_signed_immutable();

CREATE FUNCTION bw_revision_sign_needs_signature() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.status = 'draft' AND NEW.status <> 'draft'
     AND NOT EXISTS (SELECT 1 FROM signature WHERE revision_id = NEW.id) THEN
    RAISE EXCEPTION 'beamwarden: a revision is signed by adding its signature first';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER revision_sign_needs_signature BEFORE UPDATE OF status ON revision
FOR EACH ROW EXECUTE FUNCTION bw_revision_sign_needs_signature();

CREATE FUNCTION bw_revision_signed_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.status <> 'draft' THEN
    RAISE EXCEPTION 'beamwarden: a signed revision cannot be deleted';
  END IF;
  RETURN OLD;
END $$;
CREATE TRIGGER revision_signed_no_delete BEFORE DELETE ON revision
FOR EACH ROW EXECUTE FUNCTION bw_revision_signed_no_delete();

CREATE FUNCTION bw_signature_only_on_draft() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF (SELECT status FROM revision WHERE id = NEW.revision_id) IS DISTINCT FROM 'draft' THEN
    RAISE EXCEPTION 'beamwarden: only a draft revision can be signed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER signature_only_on_draft BEFORE INSERT ON signature
FOR EACH ROW EXECUTE FUNCTION bw_signature_only_on_draft();

CREATE FUNCTION bw_signature_no_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signature cannot be changed';
END $$;
CREATE TRIGGER signature_no_update BEFORE UPDATE ON signature
FOR EACH ROW EXECUTE FUNCTION bw_signature_no_update();

CREATE FUNCTION bw_signature_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signature cannot be deleted';
END $$;
CREATE TRIGGER signature_no_delete BEFORE DELETE ON signature
FOR EACH ROW EXECUTE FUNCTION bw_signature_no_delete();

CREATE FUNCTION bw_signing_key_no_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: a signing key cannot be changed';
END $$;
CREATE TRIGGER signing_key_no_update BEFORE UPDATE OF key_id, public_key ON signing_key
FOR EACH ROW EXECUTE FUNCTION bw_signing_key_no_update();

CREATE FUNCTION bw_signing_key_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM signature WHERE key_id = OLD.key_id) THEN
    RAISE EXCEPTION 'beamwarden: a signing key that signed records cannot be deleted';
  END IF;
  RETURN OLD;
END $$;
CREATE TRIGGER signing_key_no_delete BEFORE DELETE ON signing_key
FOR EACH ROW EXECUTE FUNCTION bw_signing_key_no_delete();

CREATE FUNCTION bw_assessment_signed_no_update() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM revision WHERE assessment_id = OLD.id AND status <> 'draft') THEN
    RAISE EXCEPTION 'beamwarden: an assessment with a signed revision cannot be changed';
  END IF;
  RETURN NEW;
END $$;
CREATE TRIGGER assessment_signed_no_update BEFORE UPDATE ON assessment
FOR EACH ROW EXECUTE FUNCTION bw_assessment_signed_no_update();

CREATE FUNCTION bw_assessment_signed_no_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM revision WHERE assessment_id = OLD.id AND status <> 'draft') THEN
    RAISE EXCEPTION 'beamwarden: an assessment with a signed revision cannot be deleted';
  END IF;
  RETURN OLD;
END $$;
CREATE TRIGGER assessment_signed_no_delete BEFORE DELETE ON assessment
FOR EACH ROW EXECUTE FUNCTION bw_assessment_signed_no_delete();

-- ---- who may write where (PostgreSQL only: several officers on one register) ---------------------
-- The sites each officer's database account may change; '*' for every site.
CREATE TABLE officer_site (
  db_role text NOT NULL,
  site_id text NOT NULL,
  PRIMARY KEY (db_role, site_id)
);

-- Every change with the account that made it; filled by bw_record_write, append-only.
CREATE TABLE write_record (
  seq bigserial PRIMARY KEY,
  at timestamptz NOT NULL DEFAULT clock_timestamp(),
  db_role text NOT NULL DEFAULT session_user,
  table_name text NOT NULL,
  operation text NOT NULL,
  row_key text NOT NULL
);

CREATE FUNCTION bw_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'beamwarden: the record of changes is append-only';
END $$;
CREATE TRIGGER write_record_append_only BEFORE UPDATE OR DELETE ON write_record
FOR EACH ROW EXECUTE FUNCTION bw_append_only();

-- SECURITY DEFINER: writers need no right on write_record, and cannot leave a change unrecorded.
-- The trigger's argument names the row's key column; only that column is read (a revision row
-- carries tens of kB of content and results).
CREATE FUNCTION bw_record_write() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER SET search_path FROM CURRENT AS $$
DECLARE
  k text;
BEGIN
  IF TG_OP = 'DELETE' THEN
    EXECUTE format('SELECT ($1).%I::text', TG_ARGV[0]) USING OLD INTO k;
  ELSE
    EXECUTE format('SELECT ($1).%I::text', TG_ARGV[0]) USING NEW INTO k;
  END IF;
  INSERT INTO write_record (db_role, table_name, operation, row_key)
  VALUES (session_user, TG_TABLE_NAME, TG_OP, coalesce(k, ''));
  -- Open screens of other officers learn of the change when it commits (LISTEN/NOTIFY; a register
  -- per schema, so the channel carries the schema's name).
  PERFORM pg_notify('bw_changes_' || current_schema(),
    json_build_object('table', TG_TABLE_NAME, 'key', coalesce(k, ''), 'operation', TG_OP, 'by', session_user)::text);
  RETURN NULL;
END $$;

-- Who last wrote a row, for refusals that name the other officer (write_record itself is not readable).
CREATE FUNCTION bw_last_writer(p_table text, p_key text) RETURNS text LANGUAGE sql STABLE SECURITY DEFINER SET search_path FROM CURRENT AS $$
  SELECT db_role FROM write_record WHERE table_name = p_table AND row_key = p_key ORDER BY seq DESC LIMIT 1
$$;

-- The site a row belongs to (SECURITY DEFINER: the lookup itself is not filtered).
CREATE FUNCTION bw_room_site(p_room text) RETURNS text LANGUAGE sql STABLE SECURITY DEFINER SET search_path FROM CURRENT AS $$
  SELECT site_id FROM room WHERE id = p_room
$$;
CREATE FUNCTION bw_assessment_site(p_assessment text) RETURNS text LANGUAGE sql STABLE SECURITY DEFINER SET search_path FROM CURRENT AS $$
  SELECT r.site_id FROM assessment a JOIN room r ON r.id = a.room_id WHERE a.id = p_assessment
$$;
CREATE FUNCTION bw_revision_site(p_revision text) RETURNS text LANGUAGE sql STABLE SECURITY DEFINER SET search_path FROM CURRENT AS $$
  SELECT r.site_id FROM revision v JOIN assessment a ON a.id = v.assessment_id JOIN room r ON r.id = a.room_id WHERE v.id = p_revision
$$;
CREATE FUNCTION bw_may_write_site(p_site text) RETURNS boolean LANGUAGE sql STABLE SECURITY DEFINER SET search_path FROM CURRENT AS $$
  SELECT EXISTS (SELECT 1 FROM officer_site o WHERE o.db_role = session_user AND (o.site_id = p_site OR o.site_id = '*'))
$$;

-- Grants to the group roles the administrator made (README); called again after every migration.
CREATE FUNCTION bw_grant_access() RETURNS void LANGUAGE plpgsql AS $$
DECLARE
  t text;
BEGIN
  IF EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'beamwarden_reader') THEN
    EXECUTE format('GRANT USAGE ON SCHEMA %I TO beamwarden_reader', current_schema());
    FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = current_schema() AND tablename <> 'write_record' LOOP
      EXECUTE format('GRANT SELECT ON %I TO beamwarden_reader', t);
    END LOOP;
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

-- Row-level security on the tables that belong to a site: everyone with SELECT reads, officers
-- write only within their sites. An UPDATE is checked on the row as it is and as it would be, so a
-- row can neither be changed nor moved out of (or into) a site the officer does not hold.
ALTER TABLE site ENABLE ROW LEVEL SECURITY;
CREATE POLICY site_read ON site FOR SELECT USING (true);
CREATE POLICY site_insert ON site FOR INSERT WITH CHECK (bw_may_write_site(id));
CREATE POLICY site_update ON site FOR UPDATE USING (true) WITH CHECK (bw_may_write_site(id));
CREATE POLICY site_delete ON site FOR DELETE USING (bw_may_write_site(id));

ALTER TABLE room ENABLE ROW LEVEL SECURITY;
CREATE POLICY room_read ON room FOR SELECT USING (true);
CREATE POLICY room_insert ON room FOR INSERT WITH CHECK (bw_may_write_site(site_id));
CREATE POLICY room_update ON room FOR UPDATE USING (true) WITH CHECK (bw_may_write_site(site_id));
CREATE POLICY room_delete ON room FOR DELETE USING (bw_may_write_site(site_id));

ALTER TABLE laser_installation ENABLE ROW LEVEL SECURITY;
CREATE POLICY laser_installation_read ON laser_installation FOR SELECT USING (true);
CREATE POLICY laser_installation_insert ON laser_installation FOR INSERT WITH CHECK (bw_may_write_site(bw_room_site(room_id)));
CREATE POLICY laser_installation_update ON laser_installation FOR UPDATE USING (true) WITH CHECK (bw_may_write_site(bw_room_site(room_id)));
CREATE POLICY laser_installation_delete ON laser_installation FOR DELETE USING (bw_may_write_site(bw_room_site(room_id)));

ALTER TABLE eyewear ENABLE ROW LEVEL SECURITY;
CREATE POLICY eyewear_read ON eyewear FOR SELECT USING (true);
CREATE POLICY eyewear_insert ON eyewear FOR INSERT WITH CHECK (bw_may_write_site(site_id));
CREATE POLICY eyewear_update ON eyewear FOR UPDATE USING (true) WITH CHECK (bw_may_write_site(site_id));
CREATE POLICY eyewear_delete ON eyewear FOR DELETE USING (bw_may_write_site(site_id));

ALTER TABLE assessment ENABLE ROW LEVEL SECURITY;
CREATE POLICY assessment_read ON assessment FOR SELECT USING (true);
CREATE POLICY assessment_insert ON assessment FOR INSERT WITH CHECK (bw_may_write_site(bw_room_site(room_id)));
CREATE POLICY assessment_update ON assessment FOR UPDATE USING (true) WITH CHECK (bw_may_write_site(bw_room_site(room_id)));
CREATE POLICY assessment_delete ON assessment FOR DELETE USING (bw_may_write_site(bw_room_site(room_id)));

ALTER TABLE revision ENABLE ROW LEVEL SECURITY;
CREATE POLICY revision_read ON revision FOR SELECT USING (true);
CREATE POLICY revision_insert ON revision FOR INSERT WITH CHECK (bw_may_write_site(bw_assessment_site(assessment_id)));
CREATE POLICY revision_update ON revision FOR UPDATE USING (true) WITH CHECK (bw_may_write_site(bw_assessment_site(assessment_id)));
CREATE POLICY revision_delete ON revision FOR DELETE USING (bw_may_write_site(bw_assessment_site(assessment_id)));

ALTER TABLE signature ENABLE ROW LEVEL SECURITY;
CREATE POLICY signature_read ON signature FOR SELECT USING (true);
CREATE POLICY signature_insert ON signature FOR INSERT WITH CHECK (bw_may_write_site(bw_revision_site(revision_id)));

-- The record of who wrote: on every table of the register.
CREATE TRIGGER site_recorded AFTER INSERT OR UPDATE OR DELETE ON site FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER person_recorded AFTER INSERT OR UPDATE OR DELETE ON person FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER room_recorded AFTER INSERT OR UPDATE OR DELETE ON room FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER laser_installation_recorded AFTER INSERT OR UPDATE OR DELETE ON laser_installation FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER eyewear_recorded AFTER INSERT OR UPDATE OR DELETE ON eyewear FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER signing_key_recorded AFTER INSERT OR UPDATE OR DELETE ON signing_key FOR EACH ROW EXECUTE FUNCTION bw_record_write('key_id');
CREATE TRIGGER assessment_recorded AFTER INSERT OR UPDATE OR DELETE ON assessment FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER revision_recorded AFTER INSERT OR UPDATE OR DELETE ON revision FOR EACH ROW EXECUTE FUNCTION bw_record_write('id');
CREATE TRIGGER signature_recorded AFTER INSERT OR UPDATE OR DELETE ON signature FOR EACH ROW EXECUTE FUNCTION bw_record_write('revision_id');
CREATE TRIGGER officer_site_recorded AFTER INSERT OR UPDATE OR DELETE ON officer_site FOR EACH ROW EXECUTE FUNCTION bw_record_write('db_role');
`;
