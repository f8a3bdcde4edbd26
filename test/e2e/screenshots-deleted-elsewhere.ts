/**
 * PNGs of the banner shown when the room open on this screen was deleted in another window (not part
 * of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-deleted-elsewhere.ts  -> test/artifacts/screens/deleted-elsewhere/*.png
 * One loopback host on a temporary database with the invented demo site, two windows: the first has
 * room A0.07's draft open with an edited title; the second deletes the room; the first saves, is
 * refused, and keeps its version (the room is registered again).
 */
import path from 'node:path';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'deleted-elsewhere');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, viewport: { width: 1280, height: 800 }, settleMs: 300 });
  const { host, page, ctx } = s;
  try {
    await s.loadDemo();
    await page.getByRole('button', { name: /^A0\.07/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · A0\.07/ }).waitFor();
    await page.getByLabel('Assessment title').fill('Telecom bench, annual check (edited in window 1)');

    const other = await ctx.newPage();
    await other.goto(host.url);
    await other.getByRole('heading', { name: 'Register' }).waitFor();
    await other.getByRole('button', { name: /^A0\.07/ }).click();
    await other.getByRole('button', { name: 'Delete room…' }).click();
    await other.getByRole('alertdialog').getByRole('button', { name: 'Delete room' }).click();
    await other.getByRole('alertdialog').waitFor({ state: 'detached' });
    await other.close();

    await page.bringToFront();
    await page.getByRole('button', { name: 'Save', exact: true }).first().click();
    await page.getByTestId('deleted-elsewhere').waitFor();
    await s.shot('01-save-refused-room-deleted-in-another-window');
    await page.getByTestId('deleted-elsewhere').getByRole('button').click();
    await page.getByText(/registered again/).waitFor();
    await s.shot('02-kept-room-registered-again');
  } finally {
    await s.close();
  }
}

await main();
