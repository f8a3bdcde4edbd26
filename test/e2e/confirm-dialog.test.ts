/**
 * The app's confirmation dialog in Debian's chromium against the loopback host, on the invented
 * demo site, where the browser's own confirm/prompt boxes were used before (some browsers block
 * those for a page on 127.0.0.1, and none can say what is lost): the safe choice has the focus,
 * Tab stays inside the modal dialog, Escape cancels and changes nothing, the open dialog passes the
 * WCAG 2.1 AA rules of axe-core, a new site is named in it, and restoring a backup is confirmed in
 * it and really replaces the records. No browser box may appear at any point.
 * Dialog behaviour: WAI-ARIA Authoring Practices 1.2, alert dialog and modal dialog patterns
 * (from memory; the checks are of this app's behaviour).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openDemoSite, type DemoSession } from './demo-session.js';
import { wcagViolations } from './axe.js';

let session: DemoSession | undefined;
let page: Page;
const nativeBoxes: string[] = [];
const pageErrors: string[] = [];

beforeAll(async () => {
  session = await openDemoSite({
    viewport: { width: 1280, height: 800 },
    beforeLoad: (p) => {
      p.on('pageerror', (e) => pageErrors.push(e.message));
      p.on('dialog', (d) => {
        nativeBoxes.push(`${d.type()}: ${d.message()}`);
        void d.dismiss();
      });
    },
  });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

const dialog = () => page.getByRole('alertdialog');
/** The focused element's text, and whether it is inside the open dialog. */
const focused = () =>
  page.evaluate(() => {
    const el = document.activeElement;
    return { text: el?.textContent?.trim() ?? '', inside: Boolean(el?.closest('dialog[open]')) };
  });

describe('the confirmation dialog in chromium', () => {
  it('removing a laser: Cancel focused, Tab stays inside, axe finds nothing, Escape keeps the laser', async () => {
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.16/ }).waitFor();
    await page.getByRole('button', { name: 'Remove Q-switched Nd:YAG' }).click();
    await dialog().waitFor();
    expect(await dialog().getByRole('heading').textContent()).toBe('Remove “Q-switched Nd:YAG” from this assessment?');
    expect(await focused()).toEqual({ text: 'Cancel', inside: true });
    for (let i = 0; i < 5; i++) {
      await page.keyboard.press(i % 2 === 0 ? 'Tab' : 'Shift+Tab');
      await page.keyboard.press('Tab');
      expect((await focused()).inside).toBe(true);
    }
    expect(await wcagViolations(page)).toEqual([]);
    await page.keyboard.press('Escape');
    await dialog().waitFor({ state: 'detached' });
    await expect(page.getByRole('button', { name: 'Remove Q-switched Nd:YAG' }).count()).resolves.toBe(1);
    // Escape left the workspace as it was: nothing to save
    await expect(page.getByText('Unsaved changes').count()).resolves.toBe(0);
  });

  it('names a new site in the dialog (typed, Enter)', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await page.getByRole('button', { name: '+ Add a site' }).click();
    await dialog().waitFor();
    expect(await focused()).toMatchObject({ inside: true });
    await page.keyboard.type('Harwick Vale Photonics Centre, Building C');
    await page.keyboard.press('Enter');
    await dialog().waitFor({ state: 'detached' });
    await page.getByText('Harwick Vale Photonics Centre, Building C').first().waitFor();
  });

  it('restores a backup after the dialog names its date: the site added after it is gone', async () => {
    // a backup without the site named below, then the site, then the restore
    await page.keyboard.press('Alt+6');
    await page.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    await page.locator('#safekeeping').getByRole('button', { name: 'Back up now' }).click();
    await page.getByText(/Backed up and checked/).waitFor();
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: '+ Add a site' }).click();
    await dialog().waitFor();
    await page.keyboard.type('Site added after the backup (invented)');
    await dialog().getByRole('button', { name: 'Add the site' }).click();
    await page.getByText('Site added after the backup (invented)').first().waitFor();

    await page.keyboard.press('Alt+6');
    await page.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    await page.locator('#safekeeping').getByRole('button', { name: 'Restore…' }).first().click();
    await dialog().waitFor();
    expect(await dialog().textContent()).toMatch(/The backup was made \d{4}-\d{2}-\d{2} \d{2}:\d{2}: beamwarden-backup-.+\.sqlite \(\d+\.\d MB\)\./);
    expect(await focused()).toEqual({ text: 'Cancel', inside: true });
    await dialog().getByRole('button', { name: 'Replace the records' }).click();
    await page.getByText(/^Restored from /).waitFor({ timeout: 60_000 });
    await page.keyboard.press('Alt+1');
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await page.getByRole('button', { name: /^B2\.16/ }).waitFor();
    await expect(page.getByText('Site added after the backup (invented)').count()).resolves.toBe(0);
    expect(nativeBoxes).toEqual([]);
    expect(pageErrors).toEqual([]);
  });
});
