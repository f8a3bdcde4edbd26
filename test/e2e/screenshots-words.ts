/**
 * Saves PNGs of the result cards with input tolerances and conservative-mode warnings, to check that
 * the officer reads words, never internal keys (issue 12). Not part of `npm test`:
 *   npm run build && tsx test/e2e/screenshots-words.ts -> test/artifacts/screens/words/*.png
 * Uses the loopback host on a temporary database with the invented demo site.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { launch } from './browser.js';
import { REPO, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'words');

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const host = await startHost();
  const ctx = await launch({ width: 1280, height: 800 });
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  try {
    await page.goto(host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Dismiss message' }).click();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
    const bounds = page.locator('p.bounds');
    const n = await bounds.count();
    for (let i = 0; i < n; i++) {
      const card = bounds.nth(i).locator('xpath=..');
      await card.scrollIntoViewIfNeeded();
      await page.waitForTimeout(300);
      await card.screenshot({ path: path.join(OUT, `card-${i + 1}.png`) });
      process.stdout.write(`${(await bounds.nth(i).innerText()).replace(/\s+/g, ' ')}\n`);
    }
  } finally {
    await ctx.close();
    await host.stop();
  }
}

void main();
