/**
 * Saves PNGs of a beam's two plots on screen (workspace, demo room B2.16) for a person to look at
 * the label placement (not part of `npm test`): npm run build && npx tsx test/e2e/screenshots-plots.ts
 * -> test/artifacts/screens/plots/*.png
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { launch } from './browser.js';
import { REPO, removeDir, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'plots');

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const host = await startHost();
  const ctx = await launch({ width: 1280, height: 900 });
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  try {
    await page.goto(host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Dismiss message' }).click();
    for (const room of ['B2.16', 'B2.14']) {
      await page.getByRole('button', { name: new RegExp(`^${room.replace('.', '\\.')}`) }).click();
      await page.getByRole('button', { name: 'Open in workspace' }).click();
      await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
      await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
      await page.getByRole('button', { name: 'Show plots' }).first().click();
      const figures = page.locator('figure.plot');
      await figures.first().waitFor();
      for (let i = 0; i < (await figures.count()); i++) {
        await figures.nth(i).scrollIntoViewIfNeeded();
        const file = path.join(OUT, `${room}-plot-${i + 1}.png`);
        await figures.nth(i).screenshot({ path: file });
        process.stdout.write(`${path.relative(REPO, file)}\n`);
      }
      await page.keyboard.press('Alt+1');
      await page.getByRole('heading', { name: 'Register' }).waitFor();
    }
  } finally {
    await ctx.close();
    await host.stop();
    removeDir(host.dir);
  }
}

await main();
