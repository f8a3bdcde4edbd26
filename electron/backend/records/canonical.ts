/**
 * Canonical serialisation for fingerprints and signatures: JSON with object keys sorted by UTF-16
 * code units, no whitespace, strings (including the core's decimal strings) written exactly as
 * stored, numbers in JavaScript's shortest round-trip form. Properties whose value is `undefined`
 * are left out (as JSON.stringify does), so an absent optional field and an undefined one hash alike.
 * Anything that JSON cannot carry exactly (NaN, Infinity, functions, bigint, non-plain objects)
 * is refused rather than silently changed, because a fingerprint must describe the record exactly.
 */
export function canonicalJson(value: unknown): string {
  try {
    return fast(value);
  } catch (e) {
    // Something JSON cannot carry: the slow writer names where it is.
    if (e instanceof NotJson) return write(value, '$');
    throw e;
  }
}

class NotJson extends Error {}

/**
 * The same output as `write`, without building a path for every node (a verify of a large room
 * spends most of its time here); on anything not representable it gives way to `write`.
 * Two shortcuts keep the output byte for byte that of `write` (the string cases of canonical-diff.test.ts compare them with JSON.stringify):
 * a string with no character that JSON.stringify escapes (quote, backslash, control characters
 * below U+0020, surrogates, which it writes as \u escapes when unpaired) is written between quotes
 * as it is, and each key's `"key":` text is made once per process (bounded). Three times quicker
 * on a room's results (npm run bench, verify).
 */
const PLAIN_STRING = /^[^"\\\u0000-\u001f\ud800-\udfff]*$/;
function str(s: string): string {
  return PLAIN_STRING.test(s) ? `"${s}"` : JSON.stringify(s);
}
const KEY_TEXT_MAX = 20_000;
const keyTexts = new Map<string, string>();
function keyText(k: string): string {
  let t = keyTexts.get(k);
  if (t === undefined) {
    t = `${str(k)}:`;
    if (keyTexts.size >= KEY_TEXT_MAX) keyTexts.clear();
    keyTexts.set(k, t);
  }
  return t;
}

function fast(value: unknown): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string':
      return str(value);
    case 'boolean':
      return value ? 'true' : 'false';
    case 'number':
      if (!Number.isFinite(value)) throw new NotJson();
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) {
        let s = '[';
        for (let i = 0; i < value.length; i++) {
          if (i > 0) s += ',';
          const v: unknown = value[i];
          s += v === undefined ? 'null' : fast(v);
        }
        return s + ']';
      }
      const proto: unknown = Object.getPrototypeOf(value);
      if (proto !== Object.prototype && proto !== null) throw new NotJson();
      const obj = value as Record<string, unknown>;
      const keys = Object.keys(obj).sort();
      let s = '{';
      let first = true;
      for (const k of keys) {
        const v = obj[k];
        if (v === undefined) continue;
        if (!first) s += ',';
        first = false;
        s += keyText(k);
        s += fast(v);
      }
      return s + '}';
    }
    default:
      throw new NotJson();
  }
}

function write(value: unknown, path: string): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string':
      return JSON.stringify(value);
    case 'boolean':
      return value ? 'true' : 'false';
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`canonicalJson: ${path} is ${value}, which JSON cannot represent`);
      // -0 and 0 are the same number in a record; JSON.stringify(-0) is "0" too.
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) {
        return `[${value.map((v, i) => (v === undefined ? 'null' : write(v, `${path}[${i}]`))).join(',')}]`;
      }
      const proto: unknown = Object.getPrototypeOf(value);
      if (proto !== Object.prototype && proto !== null) {
        throw new TypeError(`canonicalJson: ${path} is not a plain object`);
      }
      const obj = value as Record<string, unknown>;
      const keys = Object.keys(obj)
        .filter((k) => obj[k] !== undefined)
        .sort();
      return `{${keys.map((k) => `${JSON.stringify(k)}:${write(obj[k], `${path}.${k}`)}`).join(',')}}`;
    }
    default:
      throw new TypeError(`canonicalJson: ${path} has type ${typeof value}, which JSON cannot represent`);
  }
}
