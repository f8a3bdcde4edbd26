/**
 * The InputError a call throws, for the refusal tables (the field, code and words the officer meets).
 * Anything else thrown, or nothing thrown, fails the case with a message saying so.
 */
import { InputError } from '../../core/index.js';

export function refusal(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw new Error(`expected an InputError, got ${String(e)}`, { cause: e });
  }
  throw new Error('expected an InputError, nothing was thrown');
}
