/**
 * The start-up every screenshot script shares (not part of `npm test`): a loopback host on a
 * temporary database, Debian's chromium, one page that reports page errors, and a `shot` that lets
 * the screen settle before writing `<folder>/<name>.png`.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, startHost, type HostHandle, type HostOptions } from './host-process.js';

export interface ScreenshotSession {
  readonly host: HostHandle;
  readonly ctx: BrowserContext;
  readonly page: Page;
  /** Waits `settleMs`, then writes the page (or the whole page with `full`) to `<out>/<name>.png`. */
  shot(name: string, full?: boolean): Promise<void>;
  /** Closes the browser and stops the host. */
  close(): Promise<void>;
}

export async function openScreenshotSession(opts: {
  readonly out: string;
  readonly host?: HostOptions;
  readonly viewport?: { readonly width: number; readonly height: number };
  readonly settleMs?: number;
}): Promise<ScreenshotSession> {
  mkdirSync(opts.out, { recursive: true });
  const host = await startHost(opts.host ?? {});
  const ctx = await launch(opts.viewport ? { ...opts.viewport } : undefined);
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  return {
    host,
    ctx,
    page,
    async shot(name, full = false) {
      await page.waitForTimeout(opts.settleMs ?? 400);
      await page.screenshot({ path: path.join(opts.out, `${name}.png`), fullPage: full });
      process.stdout.write(`${path.relative(REPO, opts.out)}/${name}.png\n`);
    },
    async close() {
      await ctx.close();
      await host.stop();
    },
  };
}
