/** Serving the built renderer (dist/renderer) read-only, never outside that folder. */
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';

const MIME: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.ttf': 'font/ttf',
  '.json': 'application/json',
  '.txt': 'text/plain; charset=utf-8',
};

export interface StaticFile {
  readonly body: Buffer;
  readonly type: string;
}

/** Resolve a URL path inside `root`; null when it escapes the root or does not exist. */
export async function loadStatic(root: string, urlPath: string): Promise<StaticFile | null> {
  let rel: string;
  try {
    rel = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  if (rel.includes('\0')) return null;
  if (rel === '/' || rel === '') rel = '/index.html';
  const abs = path.resolve(root, '.' + path.posix.normalize(rel));
  if (abs !== root && !abs.startsWith(root + path.sep)) return null;
  try {
    const s = await stat(abs);
    if (!s.isFile()) return null;
    return { body: await readFile(abs), type: MIME[path.extname(abs).toLowerCase()] ?? 'application/octet-stream' };
  } catch {
    return null;
  }
}
