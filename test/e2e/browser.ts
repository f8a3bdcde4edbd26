/** Debian's chromium driven by playwright-core (never a browser download; toolchain notes section 5). */
import { chromium, type BrowserContext } from 'playwright-core';
import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export const CHROMIUM = process.env['BEAMWARDEN_CHROMIUM'] ?? '/usr/bin/chromium';

export async function launch(viewport = { width: 1280, height: 800 }, downloadsPath?: string): Promise<BrowserContext> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-chromium-'));
  return chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport,
    acceptDownloads: true,
    ...(downloadsPath ? { downloadsPath } : {}),
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}
