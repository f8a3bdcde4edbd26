/**
 * The register's two group roles and the login roles of officers and readers that the server tests
 * make, on PostgreSQL 15 and on 16 and later, as the test's role (CREATEROLE, not superuser).
 *
 * PostgreSQL 16 release notes, "Migration to Version 16": the privileges of CREATEROLE are
 * restricted; changes to another role, including adding members, now require ADMIN OPTION on it.
 * A CREATEROLE role holds that option on the roles it created itself (granted back to it on
 * creation), not on roles made by others. Up to 15, CREATEROLE alone let a role grant any
 * non-superuser role. So on 16+ the test role may put a login role into beamwarden_officer only
 * when it made the group role itself, or when the administrator gave it the option
 * (`.ci/run` does: GRANT … WITH ADMIN TRUE, INHERIT FALSE, SET FALSE); without it the set-up stops
 * with the one SQL line that fixes it, instead of PostgreSQL's "permission denied to grant role".
 */
export type RoleQuery = (sql: string, params?: unknown[]) => Promise<ReadonlyArray<Record<string, unknown>>>;

export const GROUP_ROLES = ['beamwarden_reader', 'beamwarden_officer'] as const;
export type GroupRole = (typeof GROUP_ROLES)[number];

/** server_version_num of the server (150000 for 15.0, 160000 for 16.0). */
export async function serverVersionNum(q: RoleQuery): Promise<number> {
  const rows = await q("SELECT current_setting('server_version_num')::int AS v");
  return Number(rows[0]?.['v'] ?? 0);
}

/**
 * Whether the current role may grant membership in `group`: always up to 15 (CREATEROLE), and on
 * 16 and later only with ADMIN OPTION on it (pg_has_role … 'MEMBER WITH ADMIN OPTION').
 */
export async function mayGrant(q: RoleQuery, group: GroupRole, version: number): Promise<boolean> {
  if (version < 160000) return true;
  const rows = await q("SELECT rolsuper OR pg_has_role(current_user, $1, 'MEMBER WITH ADMIN OPTION') AS ok FROM pg_roles WHERE rolname = current_user", [group]);
  return rows[0]?.['ok'] === true;
}

/**
 * The README's group roles, made where missing (cluster-wide, kept between runs; the role that makes
 * one holds ADMIN OPTION on it on 16+), then checked: on 16+ without ADMIN OPTION the set-up stops
 * with the administrator's line to run.
 */
export async function ensureGroupRoles(q: RoleQuery, asVersion?: number): Promise<void> {
  for (const g of GROUP_ROLES) {
    await q(`DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${g}') THEN CREATE ROLE ${g} NOLOGIN; END IF; END $$`);
  }
  // `asVersion` reads the server as another major version would (tests of the 16+ check on a 15 server).
  const version = asVersion ?? (await serverVersionNum(q));
  const me = String((await q('SELECT current_user AS me'))[0]?.['me'] ?? '');
  const missing: GroupRole[] = [];
  for (const g of GROUP_ROLES) if (!(await mayGrant(q, g, version))) missing.push(g);
  if (missing.length > 0) {
    throw new Error(
      `PostgreSQL ${Math.floor(version / 10000)}: the test role ${me} may not add members to ${missing.join(' and ')} (since PostgreSQL 16 CREATEROLE needs ADMIN OPTION on a role it did not create). ` +
        `As the database administrator: GRANT ${missing.join(', ')} TO ${me} WITH ADMIN TRUE, INHERIT FALSE, SET FALSE;`,
    );
  }
}

/** A login role in the given group roles (call ensureGroupRoles first); `CREATE ROLE … IN ROLE` works on 15 and 16+. */
export async function createLoginRole(q: RoleQuery, name: string, password: string, groups: readonly GroupRole[]): Promise<void> {
  if (!/^[a-z_][a-z0-9_]*$/.test(name) || !/^[A-Za-z0-9]+$/.test(password)) throw new Error(`not a plain role name or password: ${name}`);
  await q(`CREATE ROLE ${name} LOGIN PASSWORD '${password}'${groups.length > 0 ? ` IN ROLE ${groups.join(', ')}` : ''}`);
}
