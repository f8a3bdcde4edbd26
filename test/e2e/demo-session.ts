/**
 * One set-up for the end-to-end files that start on the invented demo site: a loopback host on a
 * fresh records folder and Debian's chromium. `openDemoSite` loads the demo from the first-start
 * screen, as an officer does, and leaves the Register on screen with its welcome message
 * dismissed; `openDemoHost` starts the host with the demo already in its records (--demo) and opens
 * no address, for files that open their own pages. `close()` ends the browser and the host and
 * removes the folder; a set-up that fails half-way cleans up what it started before it throws.
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

/** The host and chromium with one page; `prepare` runs on them before the session is handed out. */
async function openSession(demoInRecords: boolean, options: DemoSessionOptions, prepare: (s: DemoSession) => Promise<void>): Promise<DemoSession> {
  const host = await startHost({ demo: demoInRecords });
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
    const session = { host, ctx, page, close };
    await prepare(session);
    return session;
  } catch (e) {
    await close();
    throw e;
  }
}

export async function openDemoSite(options: DemoSessionOptions = {}): Promise<DemoSession> {
  return openSession(false, options, async ({ host, page }) => {
    await page.goto(host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Dismiss message' }).click();
  });
}

export async function openDemoHost(options: DemoSessionOptions = {}): Promise<DemoSession> {
  return openSession(true, options, async () => undefined);
}
