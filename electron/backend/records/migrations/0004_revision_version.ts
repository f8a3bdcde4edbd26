/**
 * Schema version 4: `revision.version`, the save counter of a revision for optimistic concurrency.
 * Every save names the revision and version it started from; a save whose version is no longer
 * the newest is refused (someone else saved meanwhile) instead of overwriting their work. Existing
 * rows start at 1. Only drafts are ever saved, so the triggers on signed revisions need no change.
 */
export const name = 'revision_version';

export const sql = `
ALTER TABLE revision ADD COLUMN version INTEGER NOT NULL DEFAULT 1 CHECK (version >= 1);
`;

/** PostgreSQL: the same column. */
export const postgresql = `
ALTER TABLE revision ADD COLUMN version integer NOT NULL DEFAULT 1 CHECK (version >= 1);
`;
