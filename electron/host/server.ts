/**
 * The loopback host: a Node HTTP server bound to 127.0.0.1 only that serves the built renderer and
 * the same handler table as the Electron main process. Every API call must carry the random
 * per-start token; the Host and Origin headers must name this loopback address (a web page on
 * another origin, or a DNS-rebinding name, cannot call the API even if it guesses the port).
 */
import http from 'node:http';
import { timingSafeEqual } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { dispatch } from '../api/dispatch.js';
import type { HandlerTable } from '../api/operation.js';
import type { ApiErrorCode, Reply } from '../api/reply.js';
import { SECURITY_HEADERS } from '../api/content-security.js';
import { loadStatic } from './static-files.js';

const STATUS_OF: Readonly<Record<ApiErrorCode, number>> = {
  invalid_input: 400,
  unknown_operation: 404,
  input_error: 400,
  not_found: 400,
  conflict: 400,
  stale: 409,
  'in-use': 423,
  storage: 507,
  forbidden: 403,
  internal: 500,
};

export const TOKEN_HEADER = 'x-beamwarden-token';
/** Large enough for a whole-site JSON import; anything bigger is refused before parsing. */
export const MAX_BODY_BYTES = 32 * 1024 * 1024;

export interface LoopbackHostOptions<C> {
  readonly table: HandlerTable<C>;
  readonly ctx: C;
  readonly token: string;
  /** Absolute path of dist/renderer. */
  readonly rendererDir: string;
  readonly port: number;
}

export interface RunningHost {
  readonly server: http.Server;
  readonly port: number;
  readonly url: string;
  close(): Promise<void>;
}

function sameToken(given: string | undefined, token: string): boolean {
  if (given === undefined) return false;
  const a = Buffer.from(given);
  const b = Buffer.from(token);
  return a.length === b.length && timingSafeEqual(a, b);
}

function send(res: http.ServerResponse, status: number, type: string, body: string | Buffer, extra: Record<string, string> = {}): void {
  res.writeHead(status, { ...SECURITY_HEADERS, 'Content-Type': type, 'Cache-Control': 'no-store', ...extra });
  res.end(body);
}

function sendReply(res: http.ServerResponse, status: number, reply: Reply<unknown>): void {
  send(res, status, 'application/json; charset=utf-8', JSON.stringify(reply));
}

function refuse(res: http.ServerResponse, status: number, message: string): void {
  sendReply(res, status, { ok: false, error: { code: 'forbidden', message } });
}

async function readBody(req: http.IncomingMessage): Promise<Buffer | null> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const b = chunk as Buffer;
    size += b.length;
    if (size > MAX_BODY_BYTES) return null;
    chunks.push(b);
  }
  return Buffer.concat(chunks);
}

export function startLoopbackHost<C>(opts: LoopbackHostOptions<C>): Promise<RunningHost> {
  let port = opts.port;
  const allowedHosts = (): Set<string> => new Set([`127.0.0.1:${port}`, `localhost:${port}`]);

  const server = http.createServer((req, res) => {
    void handle(req, res).catch((e: unknown) => {
      // Last resort: a bug in the host itself must not take the process down.
      if (!res.headersSent) sendReply(res, 500, { ok: false, error: { code: 'internal', message: e instanceof Error ? e.message : String(e) } });
      else res.destroy();
    });
  });

  async function handle(req: http.IncomingMessage, res: http.ServerResponse): Promise<void> {
    const host = req.headers.host ?? '';
    if (!allowedHosts().has(host)) return refuse(res, 421, `this server answers only on 127.0.0.1:${port}`);
    const origin = req.headers.origin;
    if (origin !== undefined && origin !== `http://127.0.0.1:${port}` && origin !== `http://localhost:${port}`) {
      return refuse(res, 403, 'cross-origin requests are refused');
    }
    const url = new URL(req.url ?? '/', `http://${host}`);
    if (url.pathname.startsWith('/api/')) {
      if (req.method !== 'POST') return refuse(res, 405, 'API calls use POST');
      const tokenHeader = req.headers[TOKEN_HEADER];
      if (!sameToken(typeof tokenHeader === 'string' ? tokenHeader : undefined, opts.token)) {
        return refuse(res, 401, 'missing or wrong token: open the address printed when the host started');
      }
      const ctype = req.headers['content-type'] ?? '';
      if (!ctype.toLowerCase().startsWith('application/json')) return refuse(res, 415, 'API calls send application/json');
      const body = await readBody(req);
      if (body === null) return sendReply(res, 413, { ok: false, error: { code: 'invalid_input', message: `request larger than ${MAX_BODY_BYTES} bytes` } });
      let payload: unknown;
      try {
        payload = body.length === 0 ? {} : JSON.parse(body.toString('utf8'));
      } catch (e) {
        return sendReply(res, 400, { ok: false, error: { code: 'invalid_input', message: `request body is not JSON: ${e instanceof Error ? e.message : String(e)}` } });
      }
      const name = url.pathname.slice('/api/'.length);
      const reply = await dispatch(opts.table, opts.ctx, name, payload);
      const status = reply.ok ? 200 : STATUS_OF[reply.error.code];
      return sendReply(res, status, reply);
    }
    if (req.method !== 'GET' && req.method !== 'HEAD') return refuse(res, 405, 'only GET for files');
    const file = await loadStatic(opts.rendererDir, url.pathname);
    if (!file) return send(res, 404, 'text/plain; charset=utf-8', 'not found');
    res.writeHead(200, { ...SECURITY_HEADERS, 'Content-Type': file.type, 'Cache-Control': 'no-cache' });
    res.end(req.method === 'HEAD' ? undefined : file.body);
  }

  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, '127.0.0.1', () => {
      port = (server.address() as AddressInfo).port;
      resolve({
        server,
        port,
        url: `http://127.0.0.1:${port}/?token=${opts.token}`,
        close: () =>
          new Promise<void>((r) => {
            server.close(() => r());
            server.closeAllConnections();
          }),
      });
    });
  });
}
