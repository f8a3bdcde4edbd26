/**
 * Saves PNGs of the derivation window, to look at the formulas in the standards' notation
 * (exponents raised, subscripts lowered, λ, ×; a number kept on its line with its unit). Not part of
 * `npm test`:
 *   npm run build && tsx test/e2e/screenshots-formulas.ts -> test/artifacts/screens/formulas/*.png
 * Uses the loopback host on a temporary database with the invented demo site.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { launch } from './browser.js';
import { REPO, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'formulas');

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
    for (const room of ['A0.07', 'C1.03']) {
      await page.getByRole('button', { name: new RegExp(`^${room.replace('.', '\\.')}`) }).click();
      await page.getByRole('button', { name: 'Open in workspace' }).click();
      await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
      const warnings = page.locator('ul.warnings').first();
      if ((await warnings.count()) > 0) {
        await warnings.scrollIntoViewIfNeeded();
        await page.screenshot({ path: path.join(OUT, `${room}-card.png`) });
      }
      await page.getByRole('button', { name: 'Full derivation' }).first().click();
      await page.getByRole('dialog').waitFor();
      const body = page.getByTestId('derivation-body');
      const height = await body.evaluate((el) => el.scrollHeight);
      for (let i = 0; i < 4; i++) {
        await body.evaluate((el, y) => el.scrollTo(0, y), Math.round((height * i) / 4));
        await page.waitForTimeout(300);
        await page.screenshot({ path: path.join(OUT, `${room}-derivation-${i + 1}.png`) });
        process.stdout.write(`${room}-derivation-${i + 1}.png\n`);
      }
      await page.keyboard.press('Escape');
      await page.keyboard.press('Alt+1');
      await page.getByRole('heading', { name: 'Register' }).waitFor();
    }
  } finally {
    await ctx.close();
    await host.stop();
  }
}

void main();
