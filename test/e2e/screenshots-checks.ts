/**
 * PNGs of the limit table checks screen for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-checks.ts -> test/artifacts/screens/4*.png
 * The list of open entries, the check form with a typed published value and its preview, and the
 * recorded checks after signing. Loopback host on a temporary database with the invented demo site.
 */
import path from 'node:path';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');
const DEMO_PASSPHRASE = 'demo passphrase, invented site';

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, host: { demo: true }, settleMs: 400 });
  const { host, page } = s;
  try {
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.keyboard.press('Alt+7');
    await page.getByRole('heading', { level: 1, name: 'Limit table checks' }).waitFor();
    await page.getByTestId('check-counts').getByText(/not yet checked/).waitFor();
    await page.locator('li[data-entry="H-E-UV-180"] table.samples').waitFor();
    await s.shot('40-limit-checks-list');

    const entry = page.locator('li[data-entry="H-E-VIS-2"]');
    await entry.scrollIntoViewIfNeeded();
    await entry.getByRole('button', { name: 'Check this entry' }).click();
    await page.getByLabel('Published document and table checked against').fill('IEC 60825-1:2014 Table A.1');
    await page.getByLabel('differs from it').check();
    await page.getByLabel(/What the published document gives/).fill('1e-3*CE');
    await page.getByLabel('Checked by').selectOption({ label: 'Dr. Imre Calloway-Senn (Laser safety officer)' });
    await page.getByLabel('Passphrase of your signing key').fill(DEMO_PASSPHRASE);
    await page.getByTestId('typed-preview').waitFor();
    await entry.scrollIntoViewIfNeeded();
    await s.shot('41-limit-checks-form');
    await page.getByRole('button', { name: 'Sign the check' }).click();
    await page.getByTestId('recorded-checks').waitFor();
    const cf = page.locator('li[data-entry="factor:CC[1200-1400 nm]"]');
    await cf.getByRole('button', { name: 'Check this entry' }).click();
    await page.getByLabel('Published document and table checked against').fill('IEC 60825-1:2014 Table A.6');
    await page.getByLabel('matches the formula above').check();
    await page.getByLabel('Checked by').selectOption({ label: 'Dr. Imre Calloway-Senn (Laser safety officer)' });
    await page.getByLabel('Passphrase of your signing key').fill(DEMO_PASSPHRASE);
    await page.getByRole('button', { name: 'Sign the check' }).click();
    await page.getByTestId('recorded-checks').getByText(/correction factor C_C/).waitFor();
    await page.getByTestId('recorded-checks').scrollIntoViewIfNeeded();
    await s.shot('42-limit-checks-recorded');
  } finally {
    await s.close();
  }
}

await main();
