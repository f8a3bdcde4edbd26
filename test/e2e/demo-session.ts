/**
 * One set-up for the end-to-end files that start on the invented demo site: a loopback host on a
 * fresh records folder, Debian's chromium, the demo site loaded and the Register on screen with its
 * welcome message dismissed. `close()` ends the browser and the host and removes the folder; a
 * set-up that fails half-way cleans up what it started before it throws.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { launch } from './browser.js';
import { removeDir, startHost, type HostHandle } from './host-process.js';

export interface DemoSession {
  readonly host: HostHandle;
  readonly ctx: BrowserContext;
  readonly page: Page;
  close(): Promise<void>;
}

export interface DemoSessionOptions {
  readonly viewport?: { readonly width: number; readonly height: number };
  /** Listeners to attach before the first page load (page errors, dialogs). */
  readonly beforeLoad?: (page: Page) => void;
}

export async function openDemoSite(options: DemoSessionOptions = {}): Promise<DemoSession> {
  const host = await startHost();
  let ctx: BrowserContext | undefined;
  const close = async (): Promise<void> => {
    await ctx?.close();
    await host.stop();
    removeDir(host.dir);
  };
  try {
    ctx = await launch({ ...(options.viewport ?? { width: 1280, height: 800 }) });
    const page = ctx.pages()[0] ?? (await ctx.newPage());
    options.beforeLoad?.(page);
    await page.goto(host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Dismiss message' }).click();
    return { host, ctx, page, close };
  } catch (e) {
    await close();
    throw e;
  }
}
