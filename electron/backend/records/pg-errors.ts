/**
 * What the PostgreSQL server (or the network to it) refused, in words an officer can act on:
 * cannot reach the server, login refused, no such database, no right to read or change, a change
 * outside the officer's sites, and the same refusals of signed content as on SQLite (our triggers
 * raise "beamwarden: ..."). PostgreSQL's SQLSTATE codes: PostgreSQL 15 documentation, Appendix A.
 */
import { RecordError } from './types.js';

function field(e: unknown, name: string): string {
  return typeof e === 'object' && e !== null && name in e ? String((e as Record<string, unknown>)[name]) : '';
}

const NETWORK = /^(ECONNREFUSED|ENOTFOUND|EAI_AGAIN|ETIMEDOUT|ECONNRESET|EHOSTUNREACH|ENETUNREACH|EPIPE)$/;

/** A failure to reach or log in to the server, or null when `e` is something else. */
export function connectionError(e: unknown, where: string): RecordError | null {
  const code = field(e, 'code');
  const message = e instanceof Error ? e.message : String(e);
  const noFallback = 'Beamwarden did not open a local file instead.';
  if (NETWORK.test(code) || /timeout expired|Connection terminated/i.test(message)) {
    const why =
      code === 'ECONNREFUSED' ? 'the server refused the connection (is PostgreSQL running and listening on that port?)'
      : code === 'ENOTFOUND' || code === 'EAI_AGAIN' ? 'the server name is not known on this network'
      : code === 'ETIMEDOUT' || /timeout/i.test(message) ? 'the server did not answer in time'
      : 'the connection was broken';
    return new RecordError('server', `Cannot reach the institution register at ${where}: ${why}. Check the address and your network, or ask your IT department. ${noFallback}`);
  }
  if (code === '28P01' || code === '28000') {
    return new RecordError('server', `The institution register at ${where} refused the login: wrong user name or password, or this account may not log in from this computer. ${noFallback}`);
  }
  if (code === '3D000') {
    return new RecordError('server', `The institution register at ${where} does not exist on that server (no such database). Check the database name in the address. ${noFallback}`);
  }
  if (code === '53300' || code === '57P03' || code === '57P01') {
    return new RecordError('server', `The institution register at ${where} is not accepting connections now (the server is starting, stopping or full). Try again in a minute. ${noFallback}`);
  }
  return null;
}

/** A database error during `what` as RecordError in plain words, or `e` unchanged. */
export function translatePgError(e: unknown, what: string, where: string): unknown {
  if (e instanceof RecordError || !(e instanceof Error)) return e;
  const code = field(e, 'code');
  if (e.message.startsWith('beamwarden: ')) return new RecordError('immutable', e.message.slice('beamwarden: '.length));
  const connection = connectionError(e, where);
  if (connection) return connection;
  if (code === '42501') {
    if (/row-level security/.test(e.message)) {
      return new RecordError('not-permitted', `${what}: your account may change records only of the sites assigned to you in the institution register. Nothing was changed; ask the register's administrator if this site is yours.`);
    }
    return new RecordError('not-permitted', `${what}: your account may read the institution register but not change it (${e.message.replace(/^permission denied for /, 'no right on ')}). Nothing was changed.`);
  }
  if (code === '25006') return new RecordError('not-permitted', `${what}: the institution register is open read-only. Nothing was changed.`);
  if (code === '23503') {
    return new RecordError('conflict', `${what} cannot be saved as it is: it refers to a record that is not in the register, or other records still refer to it. Nothing was changed.`);
  }
  if (code === '23505') return new RecordError('conflict', `${what}: already exists (${field(e, 'constraint') || 'unique key'}). Nothing was changed.`);
  if (code === '40001' || code === '40P01') {
    return new RecordError('stale', `${what}: another officer changed the same record at the same moment. Nothing was overwritten — reload and try again.`);
  }
  return e;
}
