/**
 * Closing the browser window (or tab) of the loopback host while the open assessment has unsaved
 * changes, in Debian's chromium (issue 11, item 4: no silent loss). The app holds the unload
 * (renderer/lib/closing.ts, wired in App.svelte), so the browser asks its own leave-page question,
 * which no page can replace; in a browser the app adds no dialog of its own. The window is closed
 * as its close button does: the page's unload handlers run first (page.close with runBeforeUnload).
 * The desktop shell's way (the app's own dialog, then the window closed by the app) needs the
 * Electron binary, which is not available here: it is tested in test/renderer/closing.test.ts.
 * Invented demo room A0.07.
 * Source for every case: derived: no silent loss (issue 11, item 4); the browser's question is the
 * HTML Standard's "prompt to unload a document" (beforeunload event canceled).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openDemoSite, type DemoSession } from './demo-session.js';

let session: DemoSession | undefined;
beforeAll(async () => {
  session = await openDemoSite();
});
afterAll(async () => {
  await session?.close();
});

const laserName = (page: Page) => page.locator('input[id$="-name"]').first();

/** A further window on the demo site with room A0.07 open in the workspace. */
async function openWorkspace(): Promise<Page> {
  if (!session) throw new Error('no demo session');
  const page = await session.ctx.newPage();
  await page.goto(session.host.url);
  await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
  await page.getByRole('button', { name: /^A0\.07/ }).click();
  await page.getByRole('button', { name: 'Open in workspace' }).click();
  await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
  return page;
}

const cases = [
  { name: 'nothing changed: the window closes without a question', typed: null, save: false, answer: 'leave', asked: [], closes: true },
  { name: 'changes saved first: the window closes without a question', typed: 'Telecom bench laser (saved before closing)', save: true, answer: 'leave', asked: [], closes: true },
  { name: 'unsaved changes, the officer stays: the browser asks, and the window stays open with the typing', typed: 'Telecom bench laser (typed, kept on screen)', save: false, answer: 'stay', asked: ['beforeunload'], closes: false },
  { name: 'unsaved changes, the officer leaves: the browser asks, then the window closes', typed: 'Telecom bench laser (typed, then left)', save: false, answer: 'leave', asked: ['beforeunload'], closes: true },
] as const;

describe('closing the window of the loopback host', () => {
  it.each(cases)('$name', async ({ typed, save, answer, asked, closes }) => {
    const page = await openWorkspace();
    const storedName = await laserName(page).inputValue();
    if (typed !== null) {
      // A click first: a browser asks before unloading only a page the user has interacted with.
      await laserName(page).click();
      await laserName(page).fill(typed);
    }
    if (save) {
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      await page.getByText(/^Saved: revision/).waitFor();
    }
    const questions: string[] = [];
    let answered!: () => void;
    const questionAnswered = new Promise<void>((resolve) => (answered = resolve));
    page.on('dialog', (d) => {
      questions.push(d.type());
      void (answer === 'leave' ? d.accept() : d.dismiss()).then(answered);
    });
    const closed = new Promise<void>((resolve) => page.once('close', () => resolve()));
    await page.close({ runBeforeUnload: true });
    if (closes) {
      await closed;
      expect(questions).toEqual(asked);
    } else {
      // A window that closes without asking ends the wait too (and fails here).
      await Promise.race([questionAnswered, closed]);
      expect(questions).toEqual(asked);
      expect(page.isClosed()).toBe(false);
      expect(await laserName(page).inputValue()).toBe(typed);
      // The browser's question only: the app adds no dialog of its own in a browser.
      expect(await page.getByRole('alertdialog').count()).toBe(0);
      await page.getByRole('button', { name: 'Save', exact: true }).click();
      await page.getByText(/^Saved: revision/).waitFor();
      await page.close();
    }
    // What a window that left without saving typed is stored nowhere; what was saved is.
    const next = await openWorkspace();
    expect(await laserName(next).inputValue()).toBe(save || !closes ? typed : storedName);
    await next.close();
  });
});
