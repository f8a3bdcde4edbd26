/**
 * PNGs of "Discard this draft…" for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-discard.ts  -> test/artifacts/screens/discard/*.png
 * Loopback host on a temporary database with the invented demo site: B2.14's signed revision gets
 * a draft revision 2 (a new review date), whose discard question is shown on Review & sign; then
 * A0.07's only draft, asked from the Workspace header.
 */
import path from 'node:path';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'discard');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, viewport: { width: 1280, height: 800 }, settleMs: 300 });
  const { page } = s;
  try {
    await s.loadDemo();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.14/ }).waitFor();
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { level: 1, name: /^Review & sign/ }).waitFor();
    await page.getByRole('button', { name: 'in 6 months' }).click();
    await page.locator('.alert.warn').getByRole('button', { name: 'Save' }).click();
    await page.getByText(/^Saved: revision 2 \(draft\)/).waitFor();
    await s.shot('01-review-draft-with-discard-button');
    await page.getByRole('button', { name: 'Discard this draft…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await s.shot('02-discard-revision-2-question');
    await page.getByRole('alertdialog').getByRole('button', { name: 'Discard draft revision 2' }).click();
    await page.getByText(/signed revision 1 is open again/).waitFor();
    await s.shot('03-signed-revision-open-again');

    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^A0\.07/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · A0\.07/ }).waitFor();
    await s.shot('04-workspace-header');
    await page.getByRole('button', { name: 'Discard this draft…' }).click();
    await page.getByRole('alertdialog').waitFor();
    await s.shot('05-discard-first-draft-question');
  } finally {
    await s.close();
  }
}

await main();
