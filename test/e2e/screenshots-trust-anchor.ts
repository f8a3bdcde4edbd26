/**
 * PNGs of the "Trust anchor of this desk" section of Settings & about for a person to look at (not
 * part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-trust-anchor.ts -> test/artifacts/screens/55-57*.png
 * With the anchor in place (the invented demo officer's key), after removing it from this desk, and
 * after entering an anchor the register was not set up with. Loopback host on a temporary database
 * with the invented demo site.
 */
import path from 'node:path';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, host: { demo: true } });
  const { host, page } = s;
  const section = page.getByTestId('trust-anchor-setting');
  try {
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: 'Settings & about' }).click();
    await page.getByTestId('desk-anchor').waitFor();
    await s.shot('55-trust-anchor-in-place', { element: section });
    await page.getByRole('button', { name: 'Remove the anchor from this desk' }).click();
    await page.getByTestId('trust-anchor-result').getByText(/no trust anchor now/).waitFor();
    await s.shot('56-trust-anchor-none', { element: section });
    await page.getByLabel('Fingerprint of the trust anchor (64 hexadecimal digits, as on paper)').fill('0b7e 41c2 9d3a 5f80 c6e1 27b4 8a9d 3e52 f107 6cd8 4b2a 91e3 57f0 a8c6 2d4e 19b3');
    await page.getByRole('button', { name: 'Use this anchor on this desk' }).click();
    await page.getByTestId('trust-anchor-result').getByText(/see the message above/).waitFor();
    await s.shot('57-trust-anchor-other-register', { element: section });
  } finally {
    await s.close();
  }
}

await main();
