/** Debian's chromium driven by playwright-core (never a browser download; toolchain notes section 5). */
import { chromium, type BrowserContext } from 'playwright-core';
import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { requireTool } from '../support/required-tool.js';

export const CHROMIUM = process.env['BEAMWARDEN_CHROMIUM'] ?? '/usr/bin/chromium';

export async function launch(viewport = { width: 1280, height: 800 }, downloadsPath?: string): Promise<BrowserContext> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-chromium-'));
  return chromium.launchPersistentContext(profile, {
    executablePath: requireTool(CHROMIUM, 'chromium', 'to drive the interface (set BEAMWARDEN_CHROMIUM to use another build)'),
    headless: true,
    viewport,
    acceptDownloads: true,
    ...(downloadsPath ? { downloadsPath } : {}),
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}
