/**
 * PNGs for a person to look at (not part of `npm test`):
 *   npm run build && tsx test/e2e/screenshots-issue11.ts -> test/artifacts/screens/3*.png
 * A Register edit refused because a second tab changed the room first; the beam form's skin-area
 * and diffuse-viewing fields with their echoes; two revisions side by side on the Review screen
 * (the assessment against the copy kept after a refused save); the defaults named for records
 * written by an older version. Loopback host, demo site.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { openRecordStore } from '../../electron/backend/records/store.js';
import type { Page } from 'playwright-core';
import { REPO } from './host-process.js';
import { openScreenshotSession } from './screenshot-session.js';

const OUT = path.join(REPO, 'test', 'artifacts', 'screens');
const VIEWPORT = { width: 1280, height: 900 };

async function registerRoom(page: Page, url: string): Promise<void> {
  await page.goto(url);
  await page.getByRole('heading', { name: 'Register' }).waitFor();
  await page.getByRole('button', { name: /^A0\.07/ }).click();
  await page.getByLabel('Contact', { exact: true }).waitFor();
}

/** The first beam's form, opened if it is folded. */
async function openFirstBeam(page: Page): Promise<void> {
  const skin = page.getByLabel(/^Irradiated skin area \(cm²\)/).first();
  if ((await skin.count()) === 0 || !(await skin.isVisible())) await page.getByRole('button', { name: /^Beam 1|Erbium fibre amplifier 1550/ }).first().click();
  await skin.waitFor();
}

async function main(): Promise<void> {
  const s = await openScreenshotSession({ out: OUT, host: { demo: true }, viewport: VIEWPORT });
  const { host, page: a } = s;
  try {
    // 1. Two tabs on one room of the Register.
    await registerRoom(a, host.url);
    const b = await s.newPage();
    await registerRoom(b, host.url);
    await a.getByLabel('Responsible person', { exact: true }).fill('Dr. Imre Calloway-Senn');
    await a.getByRole('button', { name: 'Save room' }).click();
    await a.getByText(/^Room A0\.07 saved/).waitFor();
    await b.getByLabel('Contact', { exact: true }).fill('ext. 4471');
    await b.getByRole('button', { name: 'Save room' }).click();
    await b.getByTestId('register-stale').waitFor();
    await s.shot('30-register-stale', { page: b });
    await b.getByRole('button', { name: 'Reload the register' }).click();
    await b.getByTestId('register-stale').waitFor({ state: 'detached' });
    await s.shot('31-register-reloaded', { page: b });

    // 2. The beam form's newer fields.
    await a.getByRole('button', { name: 'Open in workspace' }).click();
    await a.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    await openFirstBeam(a);
    await a.getByLabel(/^Irradiated skin area \(cm²\)/).first().fill('300');
    await a.getByLabel('Diffuse reflection').first().check();
    await a.getByLabel(/^Diffuse reflectance/).first().fill('90 %');
    await a.getByLabel(/^Deliberate viewing duration \(s\)/).first().fill('1 min');
    await a.getByLabel('Case that sets the hazard distance').first().selectOption('deliberate');
    await a.getByLabel(/^Irradiated skin area/).first().scrollIntoViewIfNeeded();
    await s.shot('32-beam-newer-fields');
    await a.getByLabel(/^Deliberate viewing duration/).first().scrollIntoViewIfNeeded();
    await s.shot('33-beam-diffuse-case');
    await a.getByRole('button', { name: 'Save', exact: true }).click();
    await a.getByText(/^Saved: revision/).waitFor();

    // 3. A refused workspace save keeps a copy; the Review screen compares the two.
    const c = await s.newPage();
    await c.goto(host.url);
    await c.getByRole('heading', { name: 'Register' }).waitFor();
    await c.getByRole('button', { name: /^A0\.07/ }).click();
    await c.getByRole('button', { name: 'Open in workspace' }).click();
    await c.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    await a.getByLabel(/^Irradiated skin area/).first().fill('500 cm²');
    await a.getByRole('button', { name: 'Save', exact: true }).click();
    await a.getByText(/^Saved: revision/).waitFor();
    await openFirstBeam(c);
    await c.getByLabel(/^Irradiated skin area/).first().fill('0.2 m²');
    await c.getByRole('button', { name: 'Save', exact: true }).click();
    await c.getByTestId('stale-save').waitFor();
    await c.getByRole('button', { name: 'Keep my version as a copy, open the stored one' }).click();
    await c.getByText(/Your version is kept as/).waitFor();
    await c.keyboard.press('Alt+5');
    await c.getByRole('heading', { level: 1, name: /^Review/ }).waitFor();
    const cmp = c.getByTestId('revision-compare');
    await cmp.scrollIntoViewIfNeeded();
    const right = c.getByLabel('with', { exact: true });
    await c.waitForFunction(() => (document.querySelector('#cmp-right') as HTMLSelectElement | null)?.options.length === 2);
    const keptValue = await right.locator('option', { hasText: 'kept when your save was refused' }).getAttribute('value');
    await c.getByLabel('Compare', { exact: true }).selectOption(await c.locator('#cmp-left option').first().getAttribute('value') ?? '');
    await right.selectOption(keptValue ?? '');
    await c.getByRole('button', { name: 'Compare side by side' }).click();
    await c.getByTestId('compare-table').waitFor();
    await cmp.scrollIntoViewIfNeeded();
    await s.shot('34-revisions-side-by-side', { page: c });
  } finally {
    await s.close();
  }
  await olderRecords();
}

/** 4. Records written as an older version writes them: the workspace names the defaults assumed. */
async function olderRecords(): Promise<void> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-older-'));
  const older = await openRecordStore({ path: path.join(dir, 'records.sqlite'), keyDir: dir, calculatedWith: 'beamwarden-core 0.1.0' });
  await older.seedDemo();
  await older.close();
  const s = await openScreenshotSession({ out: OUT, host: { dir }, viewport: VIEWPORT });
  const { host, page } = s;
  try {
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByTestId('assumed-defaults').waitFor();
    await s.shot('35-older-record-defaults');
  } finally {
    await s.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exit(1);
});
