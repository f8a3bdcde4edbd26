/**
 * End to end, in Debian's chromium against the loopback host: the officer opens a demo room, starts
 * a room plan, lets the DPSS beam run open toward the east wall, types the door's place so the beam
 * meets it, and finds the door inside the direct-beam zone; the plan is saved with the revision.
 * Also saves screenshots of the plan panel (test/artifacts/screens/plan-*.png) to look at.
 * Geometry of the check (derived): the default plan puts the first laser's exit at (1, 1.5) m,
 * the room's east wall at x = 6 m; a door typed from y = 1.2 m to 2.1 m on that wall lies across
 * the beam line y = 1.5 m, 5 m from the exit, well inside the NOHD of a 5 W CW beam.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { openDemoSite, type DemoSession } from './demo-session.js';
import { REPO } from './host-process.js';

let session: DemoSession | undefined;
let page: Page;
const pageErrors: string[] = [];
const SHOTS = path.join(REPO, 'test', 'artifacts', 'screens');

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  session = await openDemoSite({ viewport: { width: 1400, height: 1000 }, beforeLoad: (p) => p.on('pageerror', (e) => pageErrors.push(e.message)) });
  page = session.page;
});

afterAll(async () => {
  await session?.close();
});

describe('the room plan in the workspace', () => {
  it('opens the signed demo room with its plan and shows its findings', async () => {
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace/ }).waitFor();
    const panel = page.getByRole('region', { name: 'Room plan' });
    await panel.getByRole('group', { name: /Room plan, top view/ }).waitFor();
    const findings = panel.getByRole('region', { name: 'Findings from the plan' });
    await findings.getByText(/Door D2 to B2\.16 is inside the direct-beam zone of He-Ne/).waitFor({ timeout: 60_000 });
    await panel.getByRole('group', { name: /Room plan, top view/ }).scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await page.screenshot({ path: path.join(SHOTS, 'plan-ultrafast.png') });
    await panel.getByRole('group', { name: /Room plan, top view/ }).screenshot({ path: path.join(SHOTS, 'plan-ultrafast-drawing.png') });
    // The plan's suggestions reach the Controls screen.
    await page.keyboard.press('Alt+4');
    const sugg = page.getByRole('region', { name: 'Suggested by the room plan' });
    await sugg.getByText('Interlock door D2 to B2.16 so the beam stops or is blocked when it opens, or put a rated curtain or barrier inside it.').waitFor();
    await sugg.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, 'plan-controls.png') });
    await page.keyboard.press('Alt+2');
  });

  it('draws a plan for a room, places the demo laser and finds the door inside the zone', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^B2\.16/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.16/ }).waitFor();
    const panel = page.getByRole('region', { name: 'Room plan' });
    await panel.getByRole('button', { name: 'Start a room plan' }).click();
    await panel.getByText('Coordinates and details (typed)').click();
    await panel.getByLabel('Diode-pumped solid-state laser: how the beam path ends').selectOption('open');
    await panel.getByLabel('Door D1, one side, y in metres').fill('1.2');
    await panel.getByLabel('Door D1, one side, y in metres').press('Enter');
    await panel.getByLabel('Door D1, other side, y in metres').fill('2.1');
    await panel.getByLabel('Door D1, other side, y in metres').press('Enter');
    const findings = panel.getByRole('region', { name: 'Findings from the plan' });
    await findings.getByText('Door D1 is inside the direct-beam zone of DPSS 532 nm.').waitFor({ timeout: 60_000 });
    // Keyboard: move the work position added from the toolbar with the arrow keys.
    await panel.getByRole('button', { name: '+ Work position' }).click();
    const handle = panel.getByRole('button', { name: /^Work position P1: x 3\.00 m, y 3\.00 m/ });
    await handle.focus();
    await page.keyboard.press('ArrowDown');
    await panel.getByRole('button', { name: /^Work position P1: x 3\.00 m, y 2\.90 m/ }).waitFor();
    await panel.getByRole('group', { name: /Room plan, top view/ }).scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await page.screenshot({ path: path.join(SHOTS, 'plan-new-room.png') });
    // Saved with the revision: after saving and reopening the room the door finding is still there.
    await page.keyboard.press('Control+s');
    await page.getByText(/saved/i).first().waitFor({ timeout: 30_000 });
    await page.reload();
    await page.keyboard.press('Alt+2');
    await page.getByRole('region', { name: 'Room plan' }).getByText('Door D1 is inside the direct-beam zone of DPSS 532 nm.').waitFor({ timeout: 60_000 });
  });

  it('makes the room L-shaped with the keyboard, undoes a step, and reads the plan at a glance in the results', async () => {
    const panel = page.getByRole('region', { name: 'Room plan' });
    // 6 m × 4 m: a + in the middle of the north side adds corner (3, 4); typed to the L (derived by hand):
    // (0,0) (6,0) (6,4) (3,4) (0,4) → (6,2) and a new corner (3,2): the notch is the north-east quarter.
    await panel.getByRole('button', { name: 'Add a room corner between corners 3 and 4' }).focus();
    await page.keyboard.press('Enter');
    await panel.getByRole('button', { name: 'Add a room corner between corners 3 and 4' }).focus();
    await page.keyboard.press('Enter');
    await panel.getByRole('button', { name: 'Undo: add a room corner' }).click();
    await panel.getByRole('button', { name: 'Redo: add a room corner' }).click();
    await panel.getByText('Coordinates and details (typed)').click();
    for (const [label, value] of [
      ['Room corner 4, y in metres', '2'],
      ['Room corner 3, y in metres', '2'],
      ['Room corner 4, x in metres', '3'],
    ] as const) {
      await panel.getByLabel(label).fill(value);
      await panel.getByLabel(label).press('Enter');
    }
    const glance = page.getByRole('region', { name: 'Room plan at a glance' });
    await glance.getByText(/Entrances inside a hazard zone: 1 of 1 door \(D1\)/).waitFor({ timeout: 60_000 });
    await panel.getByRole('group', { name: /Room plan, top view/ }).scrollIntoViewIfNeeded();
    await page.waitForTimeout(300);
    await page.screenshot({ path: path.join(SHOTS, 'plan-l-shaped.png') });
    await glance.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, 'plan-at-a-glance.png') });
    // The room accepted as the controlled area: its corner 1 lies on room corner 1 (0, 0) and is drawn
    // beside it. Dragged 0.5 m west with the mouse, the point moves 0.5 m (not onto the pointer), and the
    // drawing keeps its scale while the corner runs past the old edge (derived: 6 m between room corners 1 and 2).
    await panel.getByLabel('Accept the room as the laser controlled area, by').fill('I. Calloway-Senn');
    await panel.getByRole('button', { name: 'Accept boundary' }).click();
    const caCorner = panel.getByRole('button', { name: /^Controlled area corner 1: x 0\.00 m, y 0\.00 m/ });
    await caCorner.scrollIntoViewIfNeeded();
    const c1 = (await panel.getByRole('button', { name: /^Room corner 1: / }).boundingBox())!;
    const c2 = (await panel.getByRole('button', { name: /^Room corner 2: / }).boundingBox())!;
    const pxPerM = (c2.x - c1.x) / 6;
    const from = (await caCorner.boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    await page.mouse.move(from.x + from.width / 2 - pxPerM * 0.5, from.y + from.height / 2, { steps: 5 });
    await page.mouse.up();
    const moved = await panel.getByRole('button', { name: /^Controlled area corner 1: / }).getAttribute('aria-label');
    const [, x, y] = /x (-?[\d.]+) m, y (-?[\d.]+) m/.exec(moved ?? '') ?? [];
    expect(Number(x)).toBeCloseTo(-0.5, 1);
    expect(Number(y)).toBeCloseTo(0, 1);
    await page.keyboard.press('Control+s');
    await page.getByText(/saved/i).first().waitFor({ timeout: 30_000 });
  });

  it('on the print screen the officer chooses the entrance the door notice is for', async () => {
    await page.keyboard.press('Alt+1');
    await page.getByRole('button', { name: /^B2\.14/ }).click();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: /Workspace · B2\.14/ }).waitFor();
    await page.keyboard.press('Alt+6');
    const entrance = page.getByLabel('For the entrance');
    await entrance.waitFor();
    expect(await entrance.locator('option').allTextContents()).toEqual(['door D1 corridor', 'door D2 to B2.16']);
    await entrance.selectOption({ label: 'door D2 to B2.16' });
    await entrance.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, 'print-entrance.png') });
  });

  it('no script errors on the page', () => {
    expect(pageErrors).toEqual([]);
  });
});
