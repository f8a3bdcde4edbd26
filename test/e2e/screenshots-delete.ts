/**
 * PNGs of the register's delete confirmations for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-delete.ts  -> test/artifacts/screens/delete/*.png
 * Loopback host on a temporary database with the invented demo site: a room with signed
 * assessments (refused), a room with lasers and a draft only (confirmation), the site (refused).
 */
import path from 'node:path';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'delete');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, viewport: { width: 1280, height: 800 }, settleMs: 300 });
  const { page } = s;
  try {
    await s.loadDemo();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Delete room…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await page.getByRole('alertdialog').scrollIntoViewIfNeeded();
    await s.shot('01-room-with-signed-assessments');
    await page.getByRole('alertdialog').getByRole('button', { name: 'Close' }).click();

    // A0.07 has two lasers and a draft only: the confirmation names them.
    await page.getByRole('button', { name: /^A0\.07/ }).click();
    await page.getByRole('button', { name: 'Delete room…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await page.getByRole('alertdialog').scrollIntoViewIfNeeded();
    await s.shot('02-draft-only-room-confirmation');
    await page.getByRole('alertdialog').getByRole('button', { name: 'Cancel' }).click();

    const site = page.locator('.site-btn').first();
    await site.click();
    await page.getByRole('button', { name: 'Delete site…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await page.getByRole('alertdialog').scrollIntoViewIfNeeded();
    await s.shot('03-site-refused');
  } finally {
    await s.close();
  }
}

await main();
