/**
 * Every screen passes an automated WCAG 2.1 AA check (axe-core rules for levels A and AA of WCAG
 * 2.0 and 2.1) with zero violations, on the invented demo site at 1280×800, including the derivation
 * window and the Settings & about dialog.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openDemoSite, type DemoSession } from './demo-session.js';
import { wcagViolations } from './axe.js';

let session: DemoSession | undefined;
let page: Page;

beforeAll(async () => {
  session = await openDemoSite({ viewport: { width: 1280, height: 800 } });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('WCAG 2.1 AA, zero violations (axe-core)', () => {
  it('Register: rooms (with a room selected), eyewear shelf, people, due for review', async () => {
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    expect(await wcagViolations(page)).toEqual([]);
    for (const tab of ['Eyewear shelf', 'People', 'Due for review']) {
      await page.getByRole('tab', { name: new RegExp(`^${tab}`) }).click();
      expect(await wcagViolations(page), tab).toEqual([]);
    }
    await page.getByRole('tab', { name: 'Rooms & lasers' }).click();
  });

  it('Workspace, its derivation window, and the other screens of an open room', async () => {
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    await page.locator('[data-testid="nohd"]').first().waitFor({ timeout: 60_000 });
    expect(await wcagViolations(page), 'workspace').toEqual([]);
    await page.getByRole('button', { name: 'derivation', exact: true }).first().click();
    await page.getByRole('dialog').waitFor();
    expect(await wcagViolations(page), 'derivation').toEqual([]);
    await page.keyboard.press('Escape');
    for (const [key, name] of [['3', /^Eyewear/], ['4', /^Controls/], ['5', /^Review/], ['6', /^Print/]] as const) {
      await page.keyboard.press(`Alt+${key}`);
      await page.getByRole('heading', { level: 1, name }).waitFor();
      expect(await wcagViolations(page), String(name)).toEqual([]);
    }
  });

  it('the room plan: its drawing with corner and side handles, undo, the plan at a glance, and the entrance choice for the door notice', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.14/ }).waitFor();
    await page.getByRole('region', { name: 'Room plan at a glance' }).waitFor({ timeout: 60_000 });
    expect(await wcagViolations(page), 'workspace with a room plan').toEqual([]);
    await page.keyboard.press('Alt+6');
    await page.getByLabel('For the entrance').waitFor();
    expect(await wcagViolations(page), 'print screen with the entrance choice').toEqual([]);
  });

  it('Settings & about', async () => {
    await page.getByRole('button', { name: 'Settings & about' }).click();
    await page.getByRole('dialog', { name: 'Settings & about' }).waitFor();
    expect(await wcagViolations(page)).toEqual([]);
    await page.keyboard.press('Escape');
  });
});
