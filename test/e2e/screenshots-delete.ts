/**
 * PNGs of the register's delete confirmations for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-delete.ts  -> test/artifacts/screens/delete/*.png
 * Loopback host on a temporary database with the invented demo site: a room with signed
 * assessments (refused), a room with lasers and a draft only (confirmation), the site (refused).
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'delete');

async function shot(page: Page, name: string): Promise<void> {
  await page.waitForTimeout(300);
  await page.screenshot({ path: path.join(OUT, `${name}.png`) });
  process.stdout.write(`${path.relative(REPO, OUT)}/${name}.png\n`);
}

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const host = await startHost();
  const ctx = await launch({ width: 1280, height: 800 });
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  try {
    await page.goto(host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Dismiss message' }).click();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Delete room…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await page.getByRole('alertdialog').scrollIntoViewIfNeeded();
    await shot(page, '01-room-with-signed-assessments');
    await page.getByRole('alertdialog').getByRole('button', { name: 'Close' }).click();

    // A0.07 has two lasers and a draft only: the confirmation names them.
    await page.getByRole('button', { name: /^A0\.07/ }).click();
    await page.getByRole('button', { name: 'Delete room…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await page.getByRole('alertdialog').scrollIntoViewIfNeeded();
    await shot(page, '02-draft-only-room-confirmation');
    await page.getByRole('alertdialog').getByRole('button', { name: 'Cancel' }).click();

    const site = page.locator('.site-btn').first();
    await site.click();
    await page.getByRole('button', { name: 'Delete site…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await page.getByRole('alertdialog').scrollIntoViewIfNeeded();
    await shot(page, '03-site-refused');
  } finally {
    await ctx.close();
    await host.stop();
  }
}

await main();
