/**
 * Setting up the register's group roles and officers' login roles as a CREATEROLE role that is not
 * superuser, on this server and as PostgreSQL 16 and later would judge it. Source: PostgreSQL 16
 * release notes, "Migration to Version 16" (CREATEROLE restricted: adding members needs ADMIN
 * OPTION); PostgreSQL documentation, pg_has_role ('MEMBER WITH ADMIN OPTION'). Up to 15 CREATEROLE
 * alone may grant any non-superuser role (PostgreSQL 15 documentation, CREATE ROLE).
 */
import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { adminQuery, PG_ADDRESS, PG_SKIP_REASON } from './engines.js';
import { createLoginRole, ensureGroupRoles, mayGrant, serverVersionNum, type RoleQuery } from './pg-roles.js';

const skip = PG_ADDRESS === '';
const q: RoleQuery = (sql, params) => adminQuery('public', sql, params);

describe.skipIf(skip)(`group and login roles on PostgreSQL 15 and 16+${skip ? ` (${PG_SKIP_REASON})` : ''}`, () => {
  const made: string[] = [];
  afterAll(async () => {
    for (const r of made) await q(`DROP ROLE IF EXISTS ${r}`);
  });

  it('on this server: the group roles are there and a new officer login is a member of beamwarden_officer only', async () => {
    const version = await serverVersionNum(q);
    expect(version).toBeGreaterThanOrEqual(150000);
    await ensureGroupRoles(q);
    const owner = decodeURIComponent(new URL(PG_ADDRESS).username);
    const role = `${owner}_roles_${randomBytes(4).toString('hex')}`;
    made.push(role);
    await createLoginRole(q, role, randomBytes(12).toString('hex'), ['beamwarden_officer']);
    const rows = await q("SELECT pg_has_role($1, 'beamwarden_officer', 'MEMBER') AS officer, pg_has_role($1, 'beamwarden_reader', 'MEMBER') AS reader", [role]);
    expect(rows).toEqual([{ officer: true, reader: false }]);
  });

  it('as 16+ judges it: without ADMIN OPTION the set-up stops with the administrator\'s GRANT line; with it, it goes on', async () => {
    const me = decodeURIComponent(new URL(PG_ADDRESS).username);
    // Up to 15 CREATEROLE is enough, whatever the memberships.
    await expect(mayGrant(q, 'beamwarden_officer', 150000)).resolves.toBe(true);
    const officer = await mayGrant(q, 'beamwarden_officer', 160000);
    const reader = await mayGrant(q, 'beamwarden_reader', 160000);
    if (officer && reader) {
      await expect(ensureGroupRoles(q, 160000)).resolves.toBeUndefined();
    } else {
      const missing = [...(reader ? [] : ['beamwarden_reader']), ...(officer ? [] : ['beamwarden_officer'])].join(', ');
      await expect(ensureGroupRoles(q, 160000)).rejects.toThrow(
        `As the database administrator: GRANT ${missing} TO ${me} WITH ADMIN TRUE, INHERIT FALSE, SET FALSE;`,
      );
    }
  });
});
