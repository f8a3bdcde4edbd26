/**
 * PNGs of the app's confirmation dialog for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-confirm.ts  -> test/artifacts/screens/confirm/*.png
 * Loopback host on a temporary database with the invented demo site: removing a laser in the
 * workspace, discarding unsaved changes, removing eyewear from the shelf, restoring a backup, and
 * naming a new site.
 */
import path from 'node:path';
import { REPO, removeDir } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'confirm');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, viewport: { width: 1280, height: 800 }, settleMs: 300 });
  const { host, page } = s;
  page.on('dialog', (d) => {
    process.stderr.write(`native ${d.type()} box: ${d.message()}\n`);
    void d.dismiss();
  });
  const dialog = page.getByRole('alertdialog');
  try {
    await s.loadDemo();

    // the workspace: remove a laser with two beams
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.16/ }).waitFor();
    await page.getByRole('button', { name: 'Remove Q-switched Nd:YAG' }).click();
    await dialog.waitFor();
    await s.shot('01-remove-laser');
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'detached' });

    // unsaved changes, then another assessment
    await page.getByLabel('Assessment title').fill('Raman laboratory, new sample stage');
    await page.getByRole('button', { name: '+ Pulsed laser' }).click();
    await page.getByRole('button', { name: 'New assessment' }).click();
    await dialog.waitFor();
    await s.shot('02-discard-unsaved-changes');
    await dialog.getByRole('button', { name: 'Keep editing' }).click();

    // Print & export: back up, then restore with unsaved changes open
    await page.keyboard.press('Alt+6');
    await page.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    await page.getByRole('button', { name: 'Back up now' }).first().click();
    await page.getByText(/Backed up and checked/).waitFor();
    await page.locator('#safekeeping').getByRole('button', { name: 'Restore…' }).first().click();
    await dialog.waitFor();
    await s.shot('03-restore-backup');
    await page.keyboard.press('Escape');

    // the eyewear shelf
    await page.keyboard.press('Alt+1');
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await page.getByRole('tab', { name: 'Eyewear shelf' }).click();
    await page.getByRole('button', { name: /^Remove EW-/ }).last().click();
    await dialog.waitFor();
    await s.shot('04-remove-eyewear');
    await page.keyboard.press('Escape');

    // naming a new site
    await page.getByRole('tab', { name: 'Rooms & lasers' }).click();
    await page.getByRole('button', { name: '+ Add a site' }).click();
    await dialog.waitFor();
    await page.keyboard.type('Harwick Vale Photonics Centre, Building C');
    await s.shot('05-new-site-name');
    await page.keyboard.press('Escape');
  } finally {
    await s.close();
    removeDir(host.dir);
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exit(1);
});
