/**
 * PNGs of the record-keeping screens for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-records.ts -> test/artifacts/screens/2*.png
 * The backup reminder, the Backups panel before and after "Back up now", and the message of a
 * stale save from a second browser tab. Loopback host on a temporary database with the demo site.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');

async function shot(page: Page, name: string): Promise<void> {
  await page.waitForTimeout(400);
  await page.screenshot({ path: path.join(OUT, `${name}.png`) });
  process.stdout.write(`${name}.png\n`);
}

async function openRoom(page: Page, url: string): Promise<void> {
  await page.goto(url);
  await page.getByRole('heading', { name: 'Register' }).waitFor();
  await page.getByRole('button', { name: /^A0\.07/ }).click();
  await page.getByRole('button', { name: 'Open in workspace' }).click();
  await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
}

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const host = await startHost({ demo: true });
  const ctx = await launch();
  const a = ctx.pages()[0] ?? (await ctx.newPage());
  a.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  try {
    await a.goto(host.url);
    await a.getByRole('heading', { name: 'Register' }).waitFor();
    await a.getByTestId('backup-reminder').waitFor();
    await shot(a, '20-backup-reminder');
    await a.keyboard.press('Alt+6');
    await a.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    await a.locator('#safekeeping').scrollIntoViewIfNeeded();
    await shot(a, '21-backups-panel');
    await a.locator('#safekeeping').getByRole('button', { name: 'Back up now' }).click();
    await a.locator('#safekeeping table').waitFor();
    await a.locator('#safekeeping').scrollIntoViewIfNeeded();
    await shot(a, '22-backups-after-backup');

    // Two tabs on one assessment: the second save is refused.
    await openRoom(a, host.url);
    const b = await ctx.newPage();
    await openRoom(b, host.url);
    const nameA = a.locator('input[id$="-name"]').first();
    await nameA.fill('Telecom bench laser (renamed in tab A)');
    await a.getByRole('button', { name: 'Save', exact: true }).click();
    await a.getByText(/^Saved: revision/).waitFor();
    const nameB = b.locator('input[id$="-name"]').first();
    await nameB.fill('Telecom bench laser (renamed in tab B)');
    await b.getByRole('button', { name: 'Save', exact: true }).click();
    await b.getByText(/changed by someone else/).waitFor();
    await shot(b, '23-stale-save');
  } finally {
    await ctx.close();
    await host.stop();
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exit(1);
});
