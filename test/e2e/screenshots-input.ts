/**
 * Screenshots of how input is read (issue 11), for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-input.ts   -> test/artifacts/screens/2x-*.png
 * The workspace with each field's echo ("= 450 mJ per pulse"), a plausibility question, a bare
 * number refused, a ticked viewing condition still to be completed, a CSV inventory as read (and a
 * thousands comma refused), and an empty room.
 * Loopback host on a temporary database with the invented demo site.
 */
import path from 'node:path';
import { REPO, removeDir } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, host: { demo: true }, settleMs: 500 });
  const { host, page } = s;
  try {
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
    await page.getByRole('button', { name: /^Beam 1: Nd:YAG 1064/ }).click();
    const energy = page.getByLabel('Energy per pulse', { exact: true });
    await energy.scrollIntoViewIfNeeded();
    await s.shot('20-input-echo');
    await energy.fill('200 MJ');
    await page.getByLabel('Pulse duration', { exact: true }).fill('8');
    await s.shot('21-input-question-and-bare-number');
    await page.getByLabel('Pulse duration', { exact: true }).fill('6 ns');
    await energy.fill('450 mJ');
    await page.getByLabel('Diffuse reflection').first().check();
    await page.getByLabel('Diffuse reflectance (% or fraction)').first().scrollIntoViewIfNeeded();
    await s.shot('22-input-diffuse-incomplete');
    // a CSV inventory: how each quantity cell was read, and a question for an unusual one
    await page.keyboard.press('Alt+6');
    await page.getByRole('heading', { level: 1, name: /^Print/ }).waitFor();
    const csv = 'laser,wavelength,emission,power,pulse_energy,pulse_duration,repetition_rate,beam_diameter,divergence,beam_definition\nBench Nd:YAG (invented),1064,pulsed,,200,6 ns,10,9,0.5,1/e2\nAlignment diode (invented),635 nm,cw,1 mW,,,,3,1.2,1/e2\n';
    await page.locator('#import-csv').setInputFiles({ name: 'inventory.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByTestId('csv-readings').waitFor();
    await page.getByTestId('csv-readings').scrollIntoViewIfNeeded();
    await s.shot('24-csv-readings');
    await page.locator('#import-csv').setInputFiles({ name: 'inventory.csv', mimeType: 'text/csv', buffer: Buffer.from(csv.replace('1 mW', '"1,500 mW"').replace(/\(invented\)/g, '(invented 2)')) });
    await page.getByRole('cell', { name: /comma/ }).waitFor();
    await page.getByRole('cell', { name: /comma/ }).scrollIntoViewIfNeeded();
    await s.shot('25-csv-comma-refused');
    // an empty room: a friendly start, not an error
    const overview = await fetch(`${host.origin}/api/register-overview`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-beamwarden-token': host.token }, body: JSON.stringify({ dueBy: '2099-01-01' }) });
    const siteId = ((await overview.json()) as { value: { sites: Array<{ site: { id: string } }> } }).value.sites[0]?.site.id ?? '';
    await fetch(`${host.origin}/api/room-create`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-beamwarden-token': host.token }, body: JSON.stringify({ siteId, code: 'Z9.99', name: 'New empty room' }) });
    page.once('dialog', (d) => void d.accept());
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^Z9\.99/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByTestId('room-start').waitFor({ timeout: 30_000 });
    await s.shot('23-empty-room');
  } finally {
    await s.close();
    removeDir(host.dir);
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exit(1);
});
