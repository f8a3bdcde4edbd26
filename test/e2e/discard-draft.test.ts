/**
 * Discarding a draft in Debian's chromium against the loopback host, on the invented demo site:
 * the app's own dialog asks first (never a browser box), names what leaves the register and says
 * that signed revisions stay; the named action deletes the draft through the handler table.
 * B2.14's signed revision 1 gets a draft revision 2 (a new review date, saved), which is then
 * discarded from Review & sign: revision 1 is open again, still signed, and its fingerprint and
 * signature still verify. A0.07's only draft is discarded from the Workspace header: the room's
 * list no longer has it, and the room and its lasers stay.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openDemoSite, type DemoSession } from './demo-session.js';

let session: DemoSession | undefined;
let page: Page;
const nativeBoxes: string[] = [];
const pageErrors: string[] = [];

beforeAll(async () => {
  session = await openDemoSite({
    beforeLoad: (p) => {
      p.on('pageerror', (e) => pageErrors.push(e.message));
      p.on('dialog', (d) => {
        nativeBoxes.push(`${d.type()}: ${d.message()}`);
        void d.dismiss();
      });
    },
  });
  page = session.page;
}, 120_000);

afterAll(async () => {
  await session?.close();
});

const dialog = () => page.getByRole('alertdialog');

async function openRoom(code: string): Promise<void> {
  await page.keyboard.press('Alt+1');
  await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();
  await page.getByRole('button', { name: new RegExp(`^${code.replace('.', '\\.')}`) }).click();
  await page.getByRole('button', { name: 'Open in workspace' }).click();
  await page.getByRole('heading', { level: 1, name: new RegExp(`Workspace · ${code.replace('.', '\\.')}`) }).waitFor();
}

describe('discarding a draft in chromium', () => {
  it('a draft on top of a signed revision, from Review & sign: the signed revision opens again and still verifies', async () => {
    await openRoom('B2.14');
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { level: 1, name: /^Review & sign/ }).waitFor();
    await expect(page.getByTestId('review-status').textContent()).resolves.toBe('signed');
    await expect(page.getByRole('button', { name: 'Discard this draft…' }).count()).resolves.toBe(0);
    // A new review date makes a draft revision 2 once saved.
    await page.getByRole('button', { name: 'in 6 months' }).click();
    await page.locator('.alert.warn').getByRole('button', { name: 'Save' }).click();
    await page.getByText(/^Saved: revision 2 \(draft\)/).waitFor();
    await expect(page.getByTestId('review-status').textContent()).resolves.toBe('draft');

    await page.getByRole('button', { name: 'Discard this draft…' }).click();
    await dialog().waitFor();
    const heading = (await dialog().getByRole('heading').textContent()) ?? '';
    expect(heading).toMatch(/^Discard draft revision 2 of “.+”\?$/);
    const text = (await dialog().textContent()) ?? '';
    expect(text).toContain('Revision 2 of this assessment of room B2.14 is a draft made from signed revision 1.');
    expect(text).toContain('Signed revision 1 stays exactly as signed, and revision 1 opens again.');
    const focused = await page.evaluate(() => document.activeElement?.textContent?.trim() ?? '');
    expect(focused).toBe('Keep the draft');
    await dialog().getByRole('button', { name: 'Discard draft revision 2' }).click();
    await dialog().waitFor({ state: 'detached' });
    await page.getByText(/^Draft revision 2 of “.+” discarded; signed revision 1 is open again\.$/).waitFor();
    await expect(page.getByTestId('review-status').textContent()).resolves.toBe('signed');
    await page.getByRole('button', { name: 'Verify the newest signed revision' }).click();
    await page.getByTestId('verify-result').waitFor();
    expect(await page.getByTestId('verify-result').textContent()).toMatch(/^\s*Verified\s*— revision 1, signed by /);
  });

  it('a first draft, from the Workspace header: the assessment leaves the room, the room and its lasers stay', async () => {
    await openRoom('A0.07');
    await page.getByRole('button', { name: 'Discard this draft…' }).click();
    await dialog().waitFor();
    expect(await dialog().getByRole('heading').textContent()).toMatch(/^Discard the draft “.+”\?$/);
    expect(await dialog().getByTestId('choice-kept').textContent()).toBe(
      'Nothing signed is affected. Room A0.07, its lasers (also those added with this draft) and the eyewear shelf stay in the register.',
    );
    await dialog().getByRole('button', { name: 'Discard the draft' }).click();
    await dialog().waitFor({ state: 'detached' });
    await page.getByText(/^Draft “.+” discarded; it had no signed revision, so it is no longer in the register of room A0\.07\.$/).waitFor();
    // A fresh, unsaved draft of the room is on screen: nothing to discard until it is saved.
    await expect(page.getByRole('button', { name: 'Discard this draft…' }).count()).resolves.toBe(0);
    await page.getByRole('button', { name: 'Remove Erbium fibre amplifier' }).waitFor();
    expect(nativeBoxes).toEqual([]);
    expect(pageErrors).toEqual([]);
  });
});
