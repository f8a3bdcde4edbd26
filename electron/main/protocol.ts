/**
 * Serves dist/renderer on the private beamwarden://app/ scheme with the same security headers as
 * the loopback host. Registered as standard and secure so that relative URLs, workers and
 * localStorage behave as on https, but it never reaches the network.
 */
import { protocol } from 'electron';
import { SECURITY_HEADERS } from '../api/content-security.js';
import { loadStatic } from '../host/static-files.js';
import { APP_HOST, APP_SCHEME } from './security.js';

/** Must run before the app is ready. */
export function registerSchemePrivileges(): void {
  protocol.registerSchemesAsPrivileged([
    { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true, corsEnabled: false, stream: false } },
  ]);
}

export function serveRenderer(rendererDir: string): void {
  protocol.handle(APP_SCHEME, async (request) => {
    const url = new URL(request.url);
    if (url.host !== APP_HOST || request.method !== 'GET') return new Response('not found', { status: 404 });
    const file = await loadStatic(rendererDir, url.pathname);
    if (!file) return new Response('not found', { status: 404, headers: SECURITY_HEADERS });
    return new Response(new Uint8Array(file.body), { status: 200, headers: { ...SECURITY_HEADERS, 'Content-Type': file.type } });
  });
}
