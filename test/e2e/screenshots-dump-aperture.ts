/**
 * Screenshots of a beam dump narrower than the beam, for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-dump-aperture.ts -> test/artifacts/screens/dump-aperture/*.png
 * Invented demo site, room B2.14: the officer types a 12 mm aperture for beam dump BD2 of the
 * second-harmonic output (3.2 m from its exit, where the beam is wider), and the zone goes on past the
 * dump to the east wall, with the finding that names both widths.
 */
import path from 'node:path';
import { REPO, removeDir } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'dump-aperture');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, viewport: { width: 1400, height: 1000 } });
  const { page } = s;
  try {
    await page.goto(s.host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    const panel = page.getByRole('region', { name: 'Room plan' });
    const findings = panel.getByRole('region', { name: 'Findings from the plan' });
    await findings.getByText(/Door D2 to B2\.16/).first().waitFor({ timeout: 60_000 });
    await panel.getByText('Coordinates and details (typed)').click();
    const field = panel.getByLabel(/^Second-harmonic output, beam dump 1, aperture/);
    await field.focus();
    await page.keyboard.type('12 mm');
    await page.keyboard.press('Enter');
    await findings.getByText(/wider than beam dump BD2/).waitFor({ timeout: 60_000 });
    await page.waitForTimeout(1500);
    const drawing = panel.getByRole('group', { name: /Room plan, top view/ });
    await drawing.scrollIntoViewIfNeeded();
    await drawing.screenshot({ path: path.join(OUT, 'drawing-bd2-12mm.png') });
    await field.scrollIntoViewIfNeeded();
    await s.shot('field-bd2-12mm');
    await findings.getByText(/wider than beam dump BD2/).scrollIntoViewIfNeeded();
    await s.shot('finding-bd2-12mm');
    // A text that is not a length: refused beside the field, the plan as it was.
    await field.fill('wide');
    await field.press('Enter');
    await field.evaluate((e) => e.scrollIntoView({ block: 'center' }));
    await s.shot('field-refused');
  } finally {
    await s.close();
    removeDir(s.host.dir);
  }
}

void main();
