/**
 * Field-by-field comparison of two JSON values (revision contents, stored vs recomputed results).
 * Paths read like code: `input.lasers[0].beams[1].wavelength_nm`. Arrays are compared by position,
 * which is what an officer reading "beam 2 changed" expects; a removed or added element shows as
 * old/new `undefined`.
 */
import type { FieldDifference } from './types.js';

export function diffValues(oldValue: unknown, newValue: unknown, basePath = ''): FieldDifference[] {
  const out: FieldDifference[] = [];
  walk(oldValue, newValue, basePath, out);
  return out;
}

function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function join(base: string, key: string): string {
  return base === '' ? key : `${base}.${key}`;
}

function walk(a: unknown, b: unknown, path: string, out: FieldDifference[]): void {
  if (Object.is(a, b)) return;
  if (Array.isArray(a) && Array.isArray(b)) {
    const n = Math.max(a.length, b.length);
    for (let i = 0; i < n; i++) walk(a[i], b[i], `${path}[${i}]`, out);
    return;
  }
  if (isObject(a) && isObject(b)) {
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
    for (const k of keys) walk(a[k], b[k], join(path, k), out);
    return;
  }
  out.push({ path: path === '' ? '(whole value)' : path, old: a, new: b });
}
