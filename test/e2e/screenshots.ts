/**
 * Saves a PNG of each main screen at 1280x800 and 1920x1080 for a person to look at (not part of `npm test`):
 *   npm run screenshots            -> test/artifacts/screens/1280x800/*.png, .../1920x1080/*.png
 * Uses the loopback host on a temporary database with the invented demo site.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { launch } from './browser.js';
import { REPO, removeDir, startHost } from './host-process.js';

const ROOT = path.join(REPO, 'test', 'artifacts', 'screens');
let OUT = ROOT;

async function shot(page: Page, name: string): Promise<void> {
  await page.waitForTimeout(400);
  await page.screenshot({ path: path.join(OUT, `${name}.png`) });
  process.stdout.write(`${path.relative(REPO, OUT)}/${name}.png\n`);
}

async function main(): Promise<void> {
  for (const viewport of [{ width: 1280, height: 800 }, { width: 1920, height: 1080 }]) await run(viewport);
}

async function run(viewport: { width: number; height: number }): Promise<void> {
  OUT = path.join(ROOT, `${viewport.width}x${viewport.height}`);
  mkdirSync(OUT, { recursive: true });
  const empty = await startHost();
  const ctx = await launch(viewport);
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  page.on('console', (m) => {
    if (m.type() === 'error') process.stderr.write(`console: ${m.text()}\n`);
  });
  try {
    await page.goto(empty.url);
    await page.getByRole('heading', { name: 'Welcome to Beamwarden' }).waitFor();
    await shot(page, '00-first-start');
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Dismiss message' }).click();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await shot(page, '01-register');
    await page.getByRole('tab', { name: 'Eyewear shelf' }).click();
    await shot(page, '02-register-eyewear');
    await page.getByRole('tab', { name: 'Rooms & lasers' }).click();
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
    await page.getByRole('button', { name: /^Beam 1/ }).first().click();
    await shot(page, '03-workspace');
    await page.getByRole('button', { name: 'Show plots' }).first().click();
    await page.locator('figure.plot').first().waitFor();
    await page.locator('figure.plot').first().scrollIntoViewIfNeeded();
    await shot(page, '04-workspace-plots');
    await page.locator('figure.plot').nth(1).scrollIntoViewIfNeeded();
    await shot(page, '04b-workspace-distance-plot');
    await page.getByRole('button', { name: 'derivation', exact: true }).first().click();
    await page.getByRole('dialog').waitFor();
    await shot(page, '05-derivation');
    await page.getByTestId('derivation-body').evaluate((el) => el.scrollTo(0, el.scrollHeight));
    await page.keyboard.press('Escape');
    await page.getByRole('button', { name: 'Full derivation' }).first().click();
    await page.getByRole('dialog').waitFor();
    await shot(page, '05b-derivation-full');
    await page.keyboard.press('Escape');
    await page.getByRole('button', { name: 'Settings & about' }).click();
    await shot(page, '05c-settings-about');
    await page.keyboard.press('Escape');
    await page.keyboard.press('Alt+3');
    await page.getByRole('heading', { level: 1, name: /^Eyewear/ }).waitFor();
    await shot(page, '06-eyewear');
    await page.keyboard.press('Alt+4');
    await page.getByRole('heading', { level: 1, name: /^Controls/ }).waitFor();
    await shot(page, '07-controls');
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { level: 1, name: /^Review/ }).waitFor();
    await shot(page, '08-review');
    await page.keyboard.press('Alt+6');
    await page.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    await shot(page, '09-print-export');
    // the signed demo room (B2.14): the review screen with its signature block
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
    await shot(page, '10-workspace-ultrafast');
    await page.keyboard.press('Alt+5');
    await page.getByTestId('review-status').waitFor();
    await page.getByRole('button', { name: 'Verify the newest signed revision' }).click();
    await page.getByTestId('verify-result').waitFor();
    await page.getByTestId('verify-result').scrollIntoViewIfNeeded();
    await shot(page, '11-review-signed');
    // an edit after sign-off: a new draft revision and what changed
    await page.keyboard.press('Alt+2');
    await page.getByRole('button', { name: /^Beam 1: He-Ne/ }).click();
    await page.getByLabel('Power', { exact: true }).fill('3 mW');
    await page.keyboard.press('Control+s');
    await page.getByTestId('record-status').filter({ hasText: 'revision 2' }).waitFor();
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { name: 'Changes since the last signed revision' }).waitFor();
    await page.getByRole('heading', { name: 'Changes since the last signed revision' }).scrollIntoViewIfNeeded();
    await shot(page, '12-review-changes');
    // signing keys in the register: the demo seed gave the demo officer this temporary installation's
    // first key (its anchor), sealed with the demo passphrase published in the README
    const passphrase = 'demo passphrase, invented site';
    await page.keyboard.press('Alt+1');
    await page.getByRole('tab', { name: 'People' }).click();
    await page.getByTestId('signing-keys').scrollIntoViewIfNeeded();
    await shot(page, '13-people-signing-keys');
    // the sign dialog: passphrase, then exactly what is signed before confirming
    await page.keyboard.press('Alt+5');
    await page.getByTestId('review-status').filter({ hasText: 'draft' }).waitFor();
    await page.getByLabel('Signer').selectOption({ index: 1 });
    await page.getByLabel('Passphrase of the signing key').fill(passphrase);
    await page.getByRole('button', { name: 'Review what is signed…' }).click();
    await page.getByTestId('sign-confirm').waitFor();
    await page.getByTestId('sign-confirm').scrollIntoViewIfNeeded();
    await shot(page, '14-sign-confirm');
    await page.getByRole('button', { name: /^Sign revision/ }).click();
    await page.getByTestId('review-status').filter({ hasText: 'signed' }).waitFor();
    await page.getByRole('button', { name: 'Verify the newest signed revision' }).click();
    await page.getByTestId('verify-result').waitFor();
    await page.getByTestId('verify-result').scrollIntoViewIfNeeded();
    await shot(page, '15-review-verified-chain');
  } finally {
    await ctx.close();
    await empty.stop();
    removeDir(empty.dir);
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exit(1);
});
