/**
 * End to end, in Debian's chromium against the loopback host (demo site, temporary database): two
 * browser tabs on one assessment. The second save is refused with the time of the first and
 * nothing is overwritten; "Keep my version as a copy" keeps what the second officer typed as an
 * assessment of its own. Then "Back up now" from the reminder, and the backup is listed.
 * Cases "derived: no silent loss".
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openDemoHost, type DemoSession } from './demo-session.js';
import type { HostHandle } from './host-process.js';

let session: DemoSession | undefined;
let host: HostHandle;
let ctx: BrowserContext;

beforeAll(async () => {
  session = await openDemoHost();
  ({ host, ctx } = session);
});
afterAll(async () => {
  await session?.close();
});

async function openRoom(page: Page): Promise<void> {
  await page.goto(host.url);
  await page.getByRole('heading', { name: 'Register' }).waitFor();
  await page.getByRole('button', { name: /^A0\.07/ }).click();
  await page.getByRole('button', { name: 'Open in workspace' }).click();
  await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
}

describe('two tabs on one assessment', () => {
  it('the later save is refused, nothing is overwritten, and the refused version can be kept', async () => {
    const a = ctx.pages()[0] ?? (await ctx.newPage());
    await openRoom(a);
    const b = await ctx.newPage();
    await openRoom(b);
    await a.locator('input[id$="-name"]').first().fill('Telecom bench laser (tab A)');
    await a.getByRole('button', { name: 'Save', exact: true }).click();
    await a.getByText(/^Saved: revision/).waitFor();

    await b.locator('input[id$="-name"]').first().fill('Telecom bench laser (tab B)');
    await b.getByRole('button', { name: 'Save', exact: true }).click();
    const banner = b.getByTestId('stale-save');
    await banner.waitFor();
    expect(await banner.textContent()).toMatch(/Not saved\. .* was changed by someone else at \d\d:\d\d .*— reload and compare before saving again\. Nothing was overwritten\./);

    await b.getByRole('button', { name: 'Keep my version as a copy, open the stored one' }).click();
    await b.getByText(/Your version is kept as/).waitFor();
    // The stored version (tab A's) is open in tab B now.
    expect(await b.locator('input[id$="-name"]').first().inputValue()).toBe('Telecom bench laser (tab A)');
    await b.keyboard.press('Alt+1');
    await b.getByRole('heading', { name: 'Register' }).waitFor();
    await b.getByRole('button', { name: /^A0\.07/ }).click();
    await b.getByRole('cell', { name: /— your version, kept when your save was refused/ }).waitFor();
    await b.close();
  });

  it('"Open the stored one, discard mine" asks first in the app\'s dialog, listing what is discarded', async () => {
    const a = ctx.pages()[0] ?? (await ctx.newPage());
    await openRoom(a);
    const b = await ctx.newPage();
    const boxes: string[] = [];
    b.on('dialog', (d) => {
      boxes.push(d.message());
      void d.dismiss();
    });
    await openRoom(b);
    await a.locator('input[id$="-name"]').first().fill('Telecom bench laser (tab A, again)');
    await a.getByRole('button', { name: 'Save', exact: true }).click();
    await a.getByText(/^Saved: revision/).waitFor();
    await b.locator('input[id$="-name"]').first().fill('Telecom bench laser (tab B, again)');
    await b.getByRole('button', { name: 'Save', exact: true }).click();
    await b.getByTestId('stale-save').waitFor();

    await b.getByRole('button', { name: 'Open the stored one, discard mine' }).click();
    const dialog = b.getByRole('alertdialog');
    await dialog.waitFor();
    expect(await dialog.getByRole('listitem').allTextContents()).toEqual(['Changes to laser “Telecom bench laser (tab B, again)”']);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect(await b.locator('input[id$="-name"]').first().inputValue()).toBe('Telecom bench laser (tab B, again)');

    await b.getByRole('button', { name: 'Open the stored one, discard mine' }).click();
    await dialog.getByRole('button', { name: 'Discard my changes and open the stored version' }).click();
    await expect.poll(() => b.locator('input[id$="-name"]').first().inputValue()).toBe('Telecom bench laser (tab A, again)');
    expect(boxes).toEqual([]);
    await b.close();
  });
});

describe('backups from the app', () => {
  it('the reminder shows until a backup is made, and the backup is listed', async () => {
    const page = ctx.pages()[0] ?? (await ctx.newPage());
    await page.goto(host.url);
    const reminder = page.getByTestId('backup-reminder');
    await reminder.waitFor();
    expect(await reminder.textContent()).toMatch(/never been backed up/);
    await reminder.getByRole('button', { name: 'Back up now' }).click();
    await page.getByText(/^Backed up and checked: .*beamwarden-backup-.*\.sqlite/).waitFor();
    await reminder.waitFor({ state: 'detached' });
    await page.keyboard.press('Alt+6');
    await page.locator('#safekeeping table').getByText(/beamwarden-backup-/).waitFor();
  });
});
