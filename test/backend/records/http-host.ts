/**
 * The real loopback host (electron/host/server.ts) in this process, over real HTTP, serving the ONE
 * handler table on a real record store: for tests of what an officer's browser sees.
 */
import { randomBytes } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { ApiContext } from '../../../electron/api/context.js';
import type { Reply } from '../../../electron/api/reply.js';
import { handlerTable } from '../../../electron/api/table.js';
import { startLoopbackHost, TOKEN_HEADER } from '../../../electron/host/server.js';
import type { RecordStore } from '../../../electron/backend/records/index.js';

export interface TestHost {
  call<T = unknown>(name: string, args: unknown): Promise<{ status: number; reply: Reply<T> }>;
  /** Calls that must succeed. */
  ok<T = unknown>(name: string, args: unknown): Promise<T>;
  readonly ctx: ApiContext;
  close(): Promise<void>;
}

export async function startTestHost(store: RecordStore, extra: Partial<ApiContext> = {}): Promise<TestHost> {
  const token = randomBytes(16).toString('base64url');
  const ctx: ApiContext = { shell: 'loopback', version: 'test', databasePath: store.info.path, store, ...extra };
  const host = await startLoopbackHost({ table: handlerTable, ctx, token, rendererDir: mkdtempSync(join(tmpdir(), 'bw-empty-ui-')), port: 0 });
  const call = async <T>(name: string, args: unknown) => {
    const res = await fetch(`http://127.0.0.1:${host.port}/api/${name}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', [TOKEN_HEADER]: token },
      body: JSON.stringify(args),
    });
    return { status: res.status, reply: (await res.json()) as Reply<T> };
  };
  return {
    ctx,
    call,
    async ok<T>(name: string, args: unknown) {
      const { reply } = await call<T>(name, args);
      if (!reply.ok) throw new Error(`${name}: ${reply.error.message}`);
      return reply.value;
    },
    close: () => host.close(),
  };
}
