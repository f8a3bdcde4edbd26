/**
 * PNGs of the record-keeping screens for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-records.ts -> test/artifacts/screens/2*.png
 * The backup reminder, the Backups panel before and after "Back up now", and a stale save from a
 * second browser tab with the officer's version kept as a copy. Loopback host on a temporary database with the demo site.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');

async function openRoom(page: Page, url: string): Promise<void> {
  await page.goto(url);
  await page.getByRole('heading', { name: 'Register' }).waitFor();
  await page.getByRole('button', { name: /^A0\.07/ }).click();
  await page.getByRole('button', { name: 'Open in workspace' }).click();
  await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
}

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, host: { demo: true } });
  const { host, page: a } = s;
  try {
    await a.goto(host.url);
    await a.getByRole('heading', { name: 'Register' }).waitFor();
    await a.getByTestId('backup-reminder').waitFor();
    await s.shot('20-backup-reminder');
    await a.keyboard.press('Alt+6');
    await a.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    await a.locator('#safekeeping').scrollIntoViewIfNeeded();
    await s.shot('21-backups-panel');
    await a.locator('#safekeeping').getByRole('button', { name: 'Back up now' }).click();
    await a.locator('#safekeeping table').waitFor();
    await a.locator('#safekeeping').scrollIntoViewIfNeeded();
    await s.shot('22-backups-after-backup');

    // Two tabs on one assessment: the second save is refused.
    await openRoom(a, host.url);
    const b = await s.newPage();
    await openRoom(b, host.url);
    const nameA = a.locator('input[id$="-name"]').first();
    await nameA.fill('Telecom bench laser (renamed in tab A)');
    await a.getByRole('button', { name: 'Save', exact: true }).click();
    await a.getByText(/^Saved: revision/).waitFor();
    const nameB = b.locator('input[id$="-name"]').first();
    await nameB.fill('Telecom bench laser (renamed in tab B)');
    await b.getByRole('button', { name: 'Save', exact: true }).click();
    await b.getByTestId('stale-save').waitFor();
    await s.shot('23-stale-save', { page: b });
    await b.getByRole('button', { name: 'Keep my version as a copy, open the stored one' }).click();
    await b.getByText(/Your version is kept as/).waitFor();
    await b.keyboard.press('Alt+1');
    await b.getByRole('heading', { name: 'Register' }).waitFor();
    await b.getByRole('button', { name: /^A0\.07/ }).click();
    await s.shot('24-stale-save-kept', { page: b });
  } finally {
    await s.close();
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exit(1);
});
