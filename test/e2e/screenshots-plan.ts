/**
 * Screenshots of the room plan editor for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-plan.ts -> test/artifacts/screens/plan/*.png
 * Invented demo site. An L-shaped room drawn with the keyboard (6 m × 4 m with the north-east quarter
 * cut out: the inner corner is (3, 2)); the DPSS beam runs open east along y = 1.97 m, 30 mm under the
 * inner wall; a door put on the middle of the north wall; the room accepted as the controlled area
 * (its corners on the room's, drawn beside them).
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { launch } from './browser.js';
import { REPO, removeDir, startHost } from './host-process.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens', 'plan');

async function main(): Promise<void> {
  mkdirSync(OUT, { recursive: true });
  const host = await startHost();
  const ctx = await launch({ width: 1400, height: 1000 });
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => process.stderr.write(`page error: ${e.message}\n`));
  const shot = async (name: string, zoom = false) => {
    const drawing = page.getByRole('region', { name: 'Room plan' }).getByRole('group', { name: /Room plan, top view/ });
    await drawing.scrollIntoViewIfNeeded();
    await page.waitForTimeout(400);
    await (zoom ? drawing.screenshot({ path: path.join(OUT, `${name}.png`) }) : page.screenshot({ path: path.join(OUT, `${name}.png`) }));
    process.stdout.write(`${path.relative(REPO, OUT)}/${name}.png\n`);
  };
  try {
    await page.goto(host.url);
    await page.getByRole('button', { name: 'Load the demo site' }).click();
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    const panel = page.getByRole('region', { name: 'Room plan' });
    await panel.getByRole('region', { name: 'Findings from the plan' }).getByText(/Door D2 to B2\.16/).first().waitFor({ timeout: 60_000 });
    await shot('demo-b214-drawing', true);

    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.16/ }).waitFor();
    await panel.getByRole('button', { name: 'Start a room plan' }).click();
    await panel.getByRole('button', { name: '+ Door' }).click();
    await panel.getByRole('button', { name: '+ Window' }).click();
    await panel.getByLabel('Accept the room as the laser controlled area, by').fill('I. Calloway-Senn');
    await panel.getByRole('button', { name: 'Accept boundary' }).click();
    await shot('handles-rectangle', true);
    await panel.getByRole('button', { name: 'Add a room corner between corners 3 and 4' }).focus();
    await page.keyboard.press('Enter');
    await panel.getByRole('button', { name: 'Add a room corner between corners 3 and 4' }).focus();
    await page.keyboard.press('Enter');
    await panel.getByText('Coordinates and details (typed)').click();
    const type = async (label: string, value: string) => {
      await panel.getByLabel(label).fill(value);
      await panel.getByLabel(label).press('Enter');
    };
    await type('Room corner 4, y in metres', '2');
    await type('Room corner 3, y in metres', '2');
    await type('Room corner 4, x in metres', '3');
    await panel.getByLabel('Diode-pumped solid-state laser: how the beam path ends').selectOption('open');
    await type('Diode-pumped solid-state laser, beam exit, y in metres', '1.97');
    // The diode module's bench moved south out of the way (y = 1 m).
    await type('Diode laser module, beam exit, y in metres', '1');
    await type('Diode laser module, beam dump 1, y in metres', '1');
    await page.waitForTimeout(1500);
    await shot('l-shaped-beam-under-inner-corner', true);
    await shot('l-shaped-page');
    // Close up of the inner corner (3, 2): the drawing's view box narrowed to 1.2 m × 0.6 m around it
    // (drawing units are metres; its y runs down from the top of the view, 4.6 m here).
    const drawing = panel.getByRole('group', { name: /Room plan, top view/ });
    await drawing.evaluate((svg) => svg.setAttribute('viewBox', '2.4 2.3 1.2 0.6'));
    await page.waitForTimeout(300);
    await drawing.screenshot({ path: path.join(OUT, 'l-shaped-inner-corner-close.png') });
    process.stdout.write(`${path.relative(REPO, OUT)}/l-shaped-inner-corner-close.png\n`);
  } finally {
    await ctx.close();
    await host.stop();
    removeDir(host.dir);
  }
}

void main();
