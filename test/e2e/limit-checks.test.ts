/**
 * End to end, in Debian's chromium against the loopback host (demo site, temporary database): the
 * demo officer opens "Limit table checks" from the side bar, checks row H-E-VIS-2 of set (a)
 * against the published document as matching, signs with the demo passphrase (published in the
 * README), and the check is listed as in use with the counts updated. The screen and its form pass
 * the WCAG 2.1 AA rules of axe-core.
 * Case "derived: the officer's check reaches the record".
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { HostHandle } from './host-process.js';
import { wcagViolations } from './axe.js';
import { openDemoHost, type DemoSession } from './demo-session.js';

const DEMO_PASSPHRASE = 'demo passphrase, invented site';

let session: DemoSession | undefined;
let host: HostHandle;
let page: Page;

beforeAll(async () => {
  session = await openDemoHost();
  ({ host, page } = session);
});
afterAll(async () => {
  await session?.close();
});

describe('checking a limit-table row against the published text', () => {
  it('records a signed check from the screen and lists it as in use', async () => {
    await page.goto(host.url);
    await page.getByRole('heading', { name: 'Register' }).waitFor();
    await page.getByRole('navigation', { name: 'Screens' }).getByRole('link', { name: /Limit table checks/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Limit table checks' }).waitFor();
    const counts = page.getByTestId('check-counts');
    await counts.getByText('79 not yet checked · 0 checked').waitFor();
    expect(await wcagViolations(page), 'limit table checks').toEqual([]);
    const entry = page.locator('li[data-entry="H-E-VIS-2"]');
    await entry.getByRole('button', { name: 'Check this entry' }).click();
    await page.getByLabel('Published document and table checked against').waitFor();
    expect(await wcagViolations(page), 'the check form').toEqual([]);
    await page.getByLabel('Published document and table checked against').fill('IEC 60825-1:2014 Table A.1');
    await page.getByLabel('matches the formula above').check();
    await page.getByLabel('Checked by').selectOption({ label: 'Dr. Imre Calloway-Senn (Laser safety officer)' });
    await page.getByLabel('Passphrase of your signing key').fill(DEMO_PASSPHRASE);
    await page.getByRole('button', { name: 'Sign the check' }).click();
    const row = page.getByTestId('recorded-checks').getByRole('row').filter({ hasText: 'row H-E-VIS-2' });
    await row.waitFor();
    expect(await row.textContent()).toMatch(/matches.*IEC 60825-1:2014 Table A\.1.*Dr\. Imre Calloway-Senn.*in use/s);
    await counts.getByText('78 not yet checked · 1 checked').waitFor();
    expect(await wcagViolations(page), 'the recorded checks').toEqual([]);
    expect(await page.locator('li[data-entry="H-E-VIS-2"]').count()).toBe(0);
  });
});
