/**
 * PNGs of the "Trust anchor of this desk" section of Settings & about for a person to look at (not
 * part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-trust-anchor.ts -> test/artifacts/screens/55-57*.png
 * With the anchor in place (the invented demo officer's key), after removing it from this desk, and
 * after entering an anchor the register was not set up with. Loopback host on a temporary database
 * with the invented demo site.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');

async function shot(page: Page, name: string): Promise<void> {
  await page.waitForTimeout(400);
  await page.getByTestId('trust-anchor-setting').scrollIntoViewIfNeeded();
  await page.getByTestId('trust-anchor-setting').screenshot({ path: path.join(OUT, `${name}.png`) });
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
    await page.getByRole('button', { name: 'Settings & about' }).click();
    await page.getByTestId('desk-anchor').waitFor();
    await shot(page, '55-trust-anchor-in-place');
    await page.getByRole('button', { name: 'Remove the anchor from this desk' }).click();
    await page.getByTestId('trust-anchor-result').getByText(/no trust anchor now/).waitFor();
    await shot(page, '56-trust-anchor-none');
    await page.getByLabel('Fingerprint of the trust anchor (64 hexadecimal digits, as on paper)').fill('0b7e 41c2 9d3a 5f80 c6e1 27b4 8a9d 3e52 f107 6cd8 4b2a 91e3 57f0 a8c6 2d4e 19b3');
    await page.getByRole('button', { name: 'Use this anchor on this desk' }).click();
    await page.getByTestId('trust-anchor-result').getByText(/see the message above/).waitFor();
    await shot(page, '57-trust-anchor-other-register');
  } finally {
    await ctx.close();
    await host.stop();
  }
}

await main();
