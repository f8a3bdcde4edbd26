/**
 * PNGs of the limit table checks screen for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-checks.ts -> test/artifacts/screens/4*.png
 * The list of open entries, the check form with a typed published value and its preview, and the
 * recorded checks after signing. Loopback host on a temporary database with the invented demo site.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');
const DEMO_PASSPHRASE = 'demo passphrase, invented site';

async function shot(page: Page, name: string, full = false): Promise<void> {
  await page.waitForTimeout(400);
  await page.screenshot({ path: path.join(OUT, `${name}.png`), fullPage: full });
  process.stdout.write(`${name}.png\n`);
}

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const host = await startHost({ demo: true });
  const ctx = await launch();
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  try {
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.keyboard.press('Alt+7');
    await page.getByRole('heading', { level: 1, name: 'Limit table checks' }).waitFor();
    await page.getByTestId('check-counts').getByText(/not yet checked/).waitFor();
    await page.locator('li[data-entry="H-E-UV-180"] table.samples').waitFor();
    await shot(page, '40-limit-checks-list');

    const entry = page.locator('li[data-entry="H-E-VIS-2"]');
    await entry.scrollIntoViewIfNeeded();
    await entry.getByRole('button', { name: 'Check this entry' }).click();
    await page.getByLabel('Published document and table checked against').fill('IEC 60825-1:2014 Table A.1');
    await page.getByLabel('differs from it').check();
    await page.getByLabel(/What the published document gives/).fill('1e-3*CE');
    await page.getByLabel('Checked by').selectOption({ label: 'Dr. Imre Calloway-Senn (Laser safety officer)' });
    await page.getByLabel('Passphrase of your signing key').fill(DEMO_PASSPHRASE);
    await page.getByTestId('typed-preview').waitFor();
    await entry.scrollIntoViewIfNeeded();
    await shot(page, '41-limit-checks-form');
    await page.getByRole('button', { name: 'Sign the check' }).click();
    await page.getByTestId('recorded-checks').waitFor();
    const cf = page.locator('li[data-entry="factor:CC[1200-1400 nm]"]');
    await cf.getByRole('button', { name: 'Check this entry' }).click();
    await page.getByLabel('Published document and table checked against').fill('IEC 60825-1:2014 Table A.6');
    await page.getByLabel('matches the formula above').check();
    await page.getByLabel('Checked by').selectOption({ label: 'Dr. Imre Calloway-Senn (Laser safety officer)' });
    await page.getByLabel('Passphrase of your signing key').fill(DEMO_PASSPHRASE);
    await page.getByRole('button', { name: 'Sign the check' }).click();
    await page.getByTestId('recorded-checks').getByText(/factor CC/).waitFor();
    await page.getByTestId('recorded-checks').scrollIntoViewIfNeeded();
    await shot(page, '42-limit-checks-recorded');
  } finally {
    await ctx.close();
    await host.stop();
  }
}

await main();
