/**
 * End to end in Debian's chromium against the loopback host, on the invented demo site: the
 * officer's daily work of issue "register editing, records search, eyewear upkeep": edit a laser on
 * the Register and read the assessment's changes since the signed revision in form words and
 * units; search by wavelength; record an eyewear inspection that is due and see the reminder on the
 * Register; put beams of two lasers at one place and read the additive sum for that place.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openDemoSite, type DemoSession } from './demo-session.js';
import { wcagViolations } from './axe.js';

let session: DemoSession | undefined;
let page: Page;
const pageErrors: string[] = [];
/** The browser's own boxes (confirm, alert, prompt): the app asks in its own dialog, so none may appear. */
const nativeBoxes: string[] = [];

function isoDaysFromToday(days: number): string {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

beforeAll(async () => {
  session = await openDemoSite({
    viewport: { width: 1280, height: 800 },
    beforeLoad: (p) => {
      p.on('pageerror', (e) => pageErrors.push(e.message));
      p.on('dialog', (d) => {
        nativeBoxes.push(`${d.type()}: ${d.message()}`);
        void d.dismiss();
      });
    },
  });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe("an officer's daily work on the Register", () => {
  it('the demo on a fresh database: the demo officer\'s key is the trust anchor shown in the side bar', async () => {
    await expect.poll(() => page.getByTestId('nav-anchor').textContent()).toMatch(/Trust anchor: [0-9a-f]{4}(?: [0-9a-f]{4}){4}/);
  });

  it('the signed room reads "signed rev 1 in force"', async () => {
    await expect(page.getByRole('button', { name: /^B2\.14/ }).textContent()).resolves.toMatch(/signed rev 1 in force \(\d{4}-\d{2}-\d{2}\)/);
  });

  it('edits a laser on the Register and reads the change since the signed revision in form words and units', async () => {
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Edit He-Ne alignment laser' }).click();
    const editor = page.getByTestId('laser-editor');
    await editor.getByRole('button', { name: /^Beam 1/ }).click();
    await editor.getByLabel('Power', { exact: true }).fill('3 mW');
    await editor.getByLabel('Serial number').fill('HN-7731');
    await editor.getByRole('button', { name: 'Save laser' }).click();
    await page.getByText(/He-Ne alignment laser saved in the register; 1 assessment updated/).waitFor();
    await expect(page.getByRole('button', { name: /^B2\.14/ }).textContent()).resolves.toMatch(/signed rev 1 in force .*draft rev 2 open/);
    await page.getByRole('button', { name: 'Dismiss message' }).click();

    await page.getByRole('row', { name: /Laser hazard evaluation, room B2\.14/ }).getByRole('button', { name: 'Open' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.14/ }).waitFor();
    await page.getByTestId('record-status').filter({ hasText: 'revision 2' }).waitFor();
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { name: 'Changes since the last signed revision' }).waitFor();
    const changes = page.getByTestId('changes');
    const power = changes.getByRole('row', { name: /He-Ne alignment laser · He-Ne 632\.8 nm Power/ });
    await expect(power.textContent()).resolves.toMatch(/2 mW\s*3 mW/);
    const all = (await changes.textContent()) ?? '';
    expect(all).not.toMatch(/_W\b|_m\b|_reported|\[\d+\]|emission\.|nhzDiffuse/);
    expect(all).toMatch(/Result: NOHD, direct beam\s*[\d.]+ m\s*[\d.]+ m/);
  });

  it('searches by wavelength and opens the room of the laser found', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
    await page.keyboard.press('/');
    await page.keyboard.type('1000-1100 nm');
    const lasers = page.getByRole('list', { name: 'Lasers' });
    await expect(lasers.getByRole('button').allTextContents()).resolves.toEqual([
      expect.stringMatching(/^Q-switched Nd:YAG.*1064 nm.*room B2\.16/),
      expect.stringMatching(/^Fibre laser with 160 mm focusing head.*1070 nm.*room C1\.03/),
    ]);
    await expect(page.getByRole('list', { name: 'Eyewear' }).getByRole('button').first().textContent()).resolves.toMatch(/^EW-A/);
    await lasers.getByRole('button', { name: /Fibre laser/ }).click();
    await page.getByRole('heading', { name: /Room C1\.03/ }).waitFor();
  });

  it('records an eyewear inspection due in 10 days and sees the reminder on the Register', async () => {
    await page.getByRole('tab', { name: 'Eyewear shelf' }).click();
    await page.getByRole('button', { name: 'Edit EW-B' }).click();
    await page.getByLabel('Last inspected').fill(isoDaysFromToday(-355));
    await page.getByLabel('Condition found').selectOption('worn');
    await page.getByLabel('Next inspection due').fill(isoDaysFromToday(10));
    await page.getByRole('button', { name: 'Save eyewear' }).click();
    await page.getByText('Eyewear EW-B updated.').waitFor();
    await page.getByRole('tab', { name: 'Rooms & lasers' }).click();
    await expect(page.getByTestId('eyewear-reminder').textContent()).resolves.toContain(`EW-B (inspection due ${isoDaysFromToday(10)})`);
    await page.getByRole('tab', { name: /^Due for review/ }).click();
    await expect(page.getByTestId('eyewear-due').textContent()).resolves.toMatch(/EW-B.*worn.*due soon/s);
    expect(await wcagViolations(page)).toEqual([]);
  });

  it('puts two lasers at one place and reads the additive sum for that place', async () => {
    await page.getByRole('tab', { name: 'Rooms & lasers' }).click();
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.16/ }).waitFor();
    const places = page.getByTestId('additive-places');
    await places.waitFor({ timeout: 60_000 });
    await places.getByLabel('Place of Diode-pumped solid-state laser · DPSS 532 nm').selectOption('new');
    await places.getByLabel('Name of place 1').fill('the Raman sample stage');
    await places.getByLabel('Place of Diode laser module · Diode module 405 nm').selectOption({ label: 'the Raman sample stage' });
    await expect
      .poll(async () => ((await places.getByTestId('additive-sums').textContent()) ?? '').replace(/\s+/g, ' '), { timeout: 30_000 })
      .toMatch(/At the Raman sample stage, eye, [a-z, ]+: Diode-pumped solid-state laser · DPSS 532 nm \+ Diode laser module · Diode module 405 nm — sum of fractions [\d. ]+/);
    expect(await wcagViolations(page)).toEqual([]);
    expect(pageErrors).toEqual([]);
    expect(nativeBoxes).toEqual([]);
  });
});
