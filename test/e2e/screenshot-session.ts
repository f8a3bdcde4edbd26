/**
 * The start-up every screenshot script shares (not part of `npm test`): a loopback host on a
 * temporary database, Debian's chromium, pages that report page errors, and a `shot` that lets
 * the screen settle before writing `<folder>/<name>.png` (of the first page, another page of the
 * session, or one element).
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, startHost, type HostHandle, type HostOptions } from './host-process.js';

export interface ShotOptions {
  /** The whole scrolled page instead of the window. */
  readonly full?: boolean;
  /** Another page of the session (a second tab); the first page if left out. */
  readonly page?: Page;
  /** Only this element, scrolled into view first. */
  readonly element?: Locator;
}

export interface ScreenshotSession {
  readonly host: HostHandle;
  readonly ctx: BrowserContext;
  readonly page: Page;
  /** A further page (tab) of the same browser that reports its page errors too. */
  newPage(): Promise<Page>;
  /** Waits `settleMs`, then writes the page, the whole page or one element to `<out>/<name>.png`. */
  shot(name: string, what?: ShotOptions): Promise<void>;
  /** Opens the app on the first page, loads the invented demo site and dismisses its welcome message. */
  loadDemo(): Promise<void>;
  /** Closes the browser and stops the host. */
  close(): Promise<void>;
}

const reportErrors = (page: Page): Page => page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));

export async function openScreenshotSession(opts: {
  readonly out: string;
  readonly host?: HostOptions;
  readonly viewport?: { readonly width: number; readonly height: number };
  readonly settleMs?: number;
}): Promise<ScreenshotSession> {
  mkdirSync(opts.out, { recursive: true });
  const host = await startHost(opts.host ?? {});
  let ctx: BrowserContext | undefined;
  const close = async (): Promise<void> => {
    await ctx?.close();
    await host.stop();
  };
  try {
    ctx = await launch(opts.viewport ? { ...opts.viewport } : undefined);
    const browser = ctx;
    const page = reportErrors(ctx.pages()[0] ?? (await ctx.newPage()));
    return {
      host,
      ctx,
      page,
      newPage: async () => reportErrors(await browser.newPage()),
      async loadDemo() {
        await page.goto(host.url);
        await page.getByRole('button', { name: 'Load the demo site' }).click();
        await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
        await page.getByRole('button', { name: 'Dismiss message' }).click();
      },
      async shot(name, what = {}) {
        const file = path.join(opts.out, `${name}.png`);
        const shown = what.page ?? page;
        await shown.waitForTimeout(opts.settleMs ?? 400);
        if (what.element) {
          await what.element.scrollIntoViewIfNeeded();
          await what.element.screenshot({ path: file });
        } else await shown.screenshot({ path: file, fullPage: what.full ?? false });
        process.stdout.write(`${path.relative(REPO, opts.out)}/${name}.png\n`);
      },
      close,
    };
  } catch (e) {
    await close();
    throw e;
  }
}
