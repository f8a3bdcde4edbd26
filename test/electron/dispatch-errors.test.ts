/**
 * Errors a handler throws reach the officer mapped by their CLASS (electron/api/dispatch.ts): the
 * caller's errors keep field and message; anything else is "internal" with one plain sentence, never
 * a developer message, a stack or a file path (owner rules: "never a JSON path or developer message
 * on screen"). Every case runs through dispatch() with a real handler table entry.
 */
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { InputError } from '../../core/index.js';
import { dispatch, INTERNAL_MESSAGE } from '../../electron/api/dispatch.js';
import { ApiFailure, type ApiErrorBody } from '../../electron/api/reply.js';
import { RecordError } from '../../electron/backend/records/types.js';
import type { HandlerTable } from '../../electron/api/operation.js';

async function replyTo(thrown: unknown): Promise<ApiErrorBody> {
  const table = { 'app-info': { input: z.object({}), run: () => { throw thrown; } } } as unknown as HandlerTable<null>;
  const spy = vi.spyOn(console, 'error').mockImplementation(() => undefined);
  try {
    const r = await dispatch(table, null, 'app-info', {});
    if (r.ok) throw new Error('expected a failure');
    return r.error;
  } finally {
    spy.mockRestore();
  }
}

const withPath = Object.assign(new Error("ENOENT: no such file or directory, open '/home/officer/records/secret.sqlite'"), { code: 'ENOENT', path: '/home/officer/records/secret.sqlite' });
const notFoundNamed = Object.assign(new Error('something invalid happened in /srv/x'), { code: 'invalid_schema_not_found' });

describe('dispatch maps thrown errors by class', () => {
  it.each([
    ['ApiFailure keeps code and field', new ApiFailure('conflict', 'Revision 2 is signed and cannot be changed', 'revisionId'), { code: 'conflict', message: 'Revision 2 is signed and cannot be changed', field: 'revisionId' }],
    ['InputError (core) keeps the field', new InputError('out_of_range', 'wavelength_nm', 99, '180 to 1e6 nm'), { code: 'input_error', field: 'wavelength_nm' }],
    ['RecordError not-found', new RecordError('not-found', 'No room with id r1'), { code: 'not_found', message: 'No room with id r1' }],
    ['RecordError invalid keeps its issues', new RecordError('invalid', 'bad CSV', [{ path: 'row 3: power', problem: 'not a number' }]), { code: 'invalid_input', issues: [{ path: 'row 3: power', message: 'not a number' }] }],
    ['RecordError immutable', new RecordError('immutable', 'signed'), { code: 'conflict' }],
  ] as const)('%s', async (_name, thrown, expected) => {
    expect(await replyTo(thrown)).toMatchObject(expected);
  });

  it.each([
    ['a Node error carrying a file path', withPath],
    ['an error whose code merely contains "not_found"', notFoundNamed],
    ['a TypeError', new TypeError("Cannot read properties of undefined (reading 'id')")],
    ['a thrown string', 'boom at /tmp/x'],
  ])('%s is internal, with no field and no path', async (_name, thrown) => {
    const body = await replyTo(thrown);
    expect(body).toEqual({ code: 'internal', message: INTERNAL_MESSAGE });
    expect(JSON.stringify(body)).not.toMatch(/\/home|\/tmp|\/srv|ENOENT|TypeError|undefined/);
  });
});

describe('a refused input is told in officer words, without the operation name', () => {
  // Owner rules: never an internal key on screen; the operation name is the handler table's key.
  it('the message names the field and the problem only', async () => {
    const table = { 'register-connection-save': { input: z.strictObject({ address: z.string().min(1, 'must not be empty') }), run: () => 'saved' } } as unknown as HandlerTable<null>;
    const r = await dispatch(table, null, 'register-connection-save', { address: '' });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('invalid_input');
      expect(r.error.message).not.toContain('register-connection-save');
      expect(r.error.message).toMatch(/must not be empty/);
      expect(r.error.issues?.[0]?.path).toBe('address');
    }
  });
});
