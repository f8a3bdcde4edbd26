/**
 * Canonical serialisation (what the SHA-256 fingerprint covers) and the field-by-field diff.
 * The canonical form follows the ideas of RFC 8785 (JSON Canonicalization Scheme): sorted keys,
 * no whitespace, ECMAScript number serialisation; strings — including the core's decimal strings —
 * are written exactly as stored. SHA-256 test vector "abc" from FIPS 180-4 / NIST CSRC examples.
 */
import { describe, expect, it } from 'vitest';
import { canonicalJson, diffValues } from '../../../electron/backend/records/index.js';
import { sha256Hex } from '../../../electron/backend/records/signing.js';

describe('canonicalJson', () => {
  it.each([
    ['keys sorted, no whitespace', { b: 1, a: { d: [1, 2], c: 'x' } }, '{"a":{"c":"x","d":[1,2]},"b":1}'],
    ['decimal strings kept as-is (trailing zeros, exponent)', { nohd_m: '12.50', e: '1.0e-7' }, '{"e":"1.0e-7","nohd_m":"12.50"}'],
    ['numbers in shortest round-trip form (RFC 8785 3.2.2.3)', { a: 1e21, b: 0.1, c: -0, d: 5e-324 }, '{"a":1e+21,"b":0.1,"c":0,"d":5e-324}'],
    ['undefined properties left out', { a: undefined, b: null }, '{"b":null}'],
    ['unicode escaped as JSON.stringify does', { s: 'µ "q" \n' }, '{"s":"µ \\"q\\" \\n"}'],
    ['key order of UTF-16 code units', { é: 1, z: 2, Z: 3 }, '{"Z":3,"z":2,"é":1}'],
  ] as const)('%s', (_n, value, expected) => {
    expect(canonicalJson(value)).toBe(expected);
  });

  // Strings and keys written by the quick path must be the bytes JSON.stringify writes
  // (ECMA-262, QuoteJSONString: quote, backslash and code units below U+0020 escaped, unpaired
  // surrogates written as \uXXXX since ES2019 "well-formed JSON.stringify"; U+2028/U+2029 and
  // paired surrogates left as they are).
  it.each([
    ['plain text as it is', 'W/m² at 1064 nm', '"W/m² at 1064 nm"'],
    ['backslash', 'a\\b', '"a\\\\b"'],
    ['control character U+001F', 'a\u001fb', '"a\\u001fb"'],
    ['tab', 'a\tb', '"a\\tb"'],
    ['U+007F left as it is', 'a\u007fb', '"a\u007fb"'],
    ['U+2028 left as it is', 'a\u2028b', '"a\u2028b"'],
    ['paired surrogates left as they are', 'beam 🔴', '"beam 🔴"'],
    ['unpaired high surrogate escaped', 'a\ud800b', '"a\\ud800b"'],
    ['unpaired low surrogate escaped', 'a\udfffb', '"a\\udfffb"'],
  ] as const)('string and key: %s', (_n, text, quoted) => {
    expect(canonicalJson([text])).toBe(`[${quoted}]`);
    expect(canonicalJson({ [text]: text })).toBe(`{${quoted}:${quoted}}`);
    expect(quoted).toBe(JSON.stringify(text));
  });

  it.each([
    ['NaN', { a: Number.NaN }, /\$\.a is NaN/],
    ['Infinity', [Number.POSITIVE_INFINITY], /\$\[0\] is Infinity/],
    ['a Date', { d: new Date(0) }, /\$\.d is not a plain object/],
    ['a bigint', { n: 1n }, /\$\.n has type bigint/],
  ] as const)('refuses %s', (_n, value, message) => {
    expect(() => canonicalJson(value)).toThrow(message);
  });

  it('same record, different key order: same fingerprint', () => {
    expect(sha256Hex(canonicalJson({ x: 1, y: [{ b: 2, a: 1 }] }))).toBe(sha256Hex(canonicalJson({ y: [{ a: 1, b: 2 }], x: 1 })));
  });

  it('SHA-256 of "abc" (FIPS 180-4 example)', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});

describe('diffValues', () => {
  it.each([
    ['equal', { a: 1 }, { a: 1 }, []],
    ['changed leaf', { a: { b: 1 } }, { a: { b: 2 } }, [{ path: 'a.b', old: 1, new: 2 }]],
    ['added and removed keys', { a: 1 }, { b: 2 }, [{ path: 'a', old: 1, new: undefined }, { path: 'b', old: undefined, new: 2 }]],
    ['array element changed and appended', { l: [1, 2] }, { l: [1, 3, 4] }, [{ path: 'l[1]', old: 2, new: 3 }, { path: 'l[2]', old: undefined, new: 4 }]],
    ['type change object -> string', { a: { b: 1 } }, { a: 'x' }, [{ path: 'a', old: { b: 1 }, new: 'x' }]],
    ['whole value', 1, 2, [{ path: '(whole value)', old: 1, new: 2 }]],
  ] as const)('%s', (_n, a, b, expected) => {
    expect(diffValues(a, b)).toEqual(expected);
  });
});
