/**
 * End to end, in Debian's chromium against the loopback host on a temporary database: an officer
 * creates a site, eyewear, a person and a room, adds a pulsed and a CW laser in the workspace, sees
 * the NOHD and OD the core computes, picks eyewear, signs, saves the report PDF, reloads and finds
 * it signed, then edits and gets a new draft revision. Bad input in a field shows its error and
 * changes nothing. The expected numbers come from the core itself (evaluateRoom on the same
 * inputs): the published checks of those numbers live in test/core.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { evaluateRoom, type RoomInput } from '../../core/index.js';
import { launch } from './browser.js';
import { requireTool } from '../support/required-tool.js';
import { LISTEN_PREFIX, removeDir, startHost, type HostHandle } from './host-process.js';

let host: HostHandle;
/** Invented for the test. */
const PASSPHRASE = 'quill and feather 2026';
let ctx: BrowserContext;
let page: Page;
const pageErrors: string[] = [];
const downloads = mkdtempSync(path.join(os.tmpdir(), 'beamwarden-e2e-downloads-'));

// The two lasers as typed by the officer, and the same inputs for the core.
const PULSED = { name: 'Nd:YAG test laser', wavelength: '1064 nm', energy: '20 mJ', tau: '10 ns', prf: '10 Hz', d: '5 mm', div: '0.5 mrad' };
const CW = { name: 'DPSS test laser', wavelength: '532 nm', power: '50 mW', d: '2 mm', div: '1 mrad' };
const EYEWEAR_SPEC = { id: 'EW-T1', label: 'test goggles', od: [{ from_nm: 400, to_nm: 1100, od: 10 }], en207: [{ from_nm: 400, to_nm: 1100, modes: 'DIR', scale: 10 }] };
const coreInput = (cwPower: number): RoomInput => ({
  ruleSet: 'icnirp2013',
  lasers: [
    { id: 'a', name: PULSED.name, beams: [{ id: 'p', wavelength_nm: 1064, emission: { kind: 'pulsed', pulseEnergy_J: 0.02, pulseDuration_s: 1e-8, repetitionRate_Hz: 10 }, beam: { diameter_m: 0.005, divergence_rad: 0.0005, definition: '1/e2' } }] },
    { id: 'b', name: CW.name, beams: [{ id: 'c', wavelength_nm: 532, emission: { kind: 'cw', power_W: cwPower }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e2' } }] },
  ],
  eyewear: [EYEWEAR_SPEC],
});

function card(name: string): Locator {
  return page.getByRole('article', { name: new RegExp(name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')) });
}

async function fill(label: string | RegExp, value: string, scope: Page | Locator = page): Promise<void> {
  const box = scope.getByLabel(label, { exact: typeof label === 'string' });
  await box.fill(value);
}

beforeAll(async () => {
  host = await startHost();
  ctx = await launch({ width: 1280, height: 800 }, downloads);
  page = ctx.pages()[0] ?? (await ctx.newPage());
  page.on('pageerror', (e) => pageErrors.push(e.message));
  await page.goto(host.url);
});

afterAll(async () => {
  await ctx?.close();
  await host?.stop();
  if (host) removeDir(host.dir);
  removeDir(downloads);
});

describe('an officer assesses a new room', () => {
  it('the host printed exactly one line with the address and token', () => {
    expect(host.stdoutLines).toHaveLength(1);
    expect(host.stdoutLines[0]?.startsWith(LISTEN_PREFIX)).toBe(true);
    expect(host.token.length).toBeGreaterThanOrEqual(32);
  });

  it('first start offers the demo; the officer starts with an own site, eyewear and a person', async () => {
    await page.getByRole('heading', { name: 'Welcome to Beamwarden' }).waitFor();
    await expect(page.getByRole('button', { name: 'Load the demo site' }).isVisible()).resolves.toBe(true);
    await fill('Site (institution or building)', 'Testwood Optics Institute');
    await page.getByRole('button', { name: 'Create site' }).click();
    await page.getByRole('heading', { level: 1, name: 'Register' }).waitFor();

    await page.getByRole('tab', { name: 'Eyewear shelf' }).click();
    await fill('Tag on the frame *', EYEWEAR_SPEC.id);
    await fill('Description', EYEWEAR_SPEC.label);
    await fill('Optical density by band', '400-1100 nm OD 10');
    await fill('EN 207 markings', '400-1100 nm DIR LB10');
    await page.getByRole('button', { name: 'Add to shelf' }).click();
    await page.getByRole('cell', { name: EYEWEAR_SPEC.id, exact: true }).waitFor();

    await page.getByRole('tab', { name: 'People' }).click();
    await fill('Name *', 'Ada Quillfeather');
    await page.getByRole('button', { name: 'Add person' }).click();
    await page.getByRole('cell', { name: 'Ada Quillfeather', exact: true }).waitFor();

    // Her own signing key: the installation's first, so its fingerprint becomes the trust anchor.
    await page.getByLabel('Person', { exact: true }).selectOption({ label: 'Ada Quillfeather (Laser safety officer)' });
    await page.getByLabel('Passphrase', { exact: true }).fill(PASSPHRASE);
    await page.getByLabel('Passphrase again', { exact: true }).fill(PASSPHRASE);
    await page.getByRole('button', { name: 'Create key' }).click();
    const made = page.getByTestId('new-key');
    await made.waitFor();
    const fingerprint = /([0-9a-f]{4}(?: [0-9a-f]{4}){4})/.exec((await made.textContent()) ?? '')?.[1] ?? '';
    expect(fingerprint).not.toBe('');
    expect(await made.textContent()).toContain('this is the trust anchor; write down its full fingerprint');
    // The full fingerprint (64 hex digits) is what the other desks of a register are configured with.
    expect(await made.textContent()).toMatch(/its full fingerprint, [0-9a-f]{4}(?: [0-9a-f]{4}){15}, and keep it/);
    await expect.poll(() => page.getByTestId('nav-anchor').textContent()).toContain(fingerprint);
  });

  it('creates a room and opens it in the workspace', async () => {
    await page.getByRole('tab', { name: 'Rooms & lasers' }).click();
    await fill('Room code *', 'T1.01');
    await fill('Name', 'Test bench room', page.locator('form').filter({ hasText: 'Add room' }));
    await page.getByRole('button', { name: 'Add room' }).click();
    await page.getByRole('heading', { name: /Room T1\.01/ }).waitFor();
    await page.getByRole('button', { name: 'Open in workspace' }).click();
    await page.getByRole('heading', { level: 1, name: 'Workspace · T1.01' }).waitFor();
  });

  it('adds a pulsed and a CW laser and sees the NOHD and OD the core computes', async () => {
    await page.getByRole('button', { name: '+ Pulsed laser' }).click();
    await page.getByRole('textbox', { name: /^Laser 1/ }).fill(PULSED.name);
    await fill('Wavelength (nm)', PULSED.wavelength);
    await fill('Energy per pulse', PULSED.energy);
    await fill('Pulse duration', PULSED.tau);
    await fill('Repetition rate (Hz)', PULSED.prf);
    await fill('Beam diameter (mm)', PULSED.d);
    await fill('Divergence, full angle (mrad)', PULSED.div);

    await page.getByRole('button', { name: '+ CW laser' }).click();
    await page.getByRole('textbox', { name: /^Laser 2/ }).fill(CW.name);
    await fill('Wavelength (nm)', CW.wavelength);
    await fill('Power', CW.power);
    await fill('Beam diameter (mm)', CW.d);
    await fill('Divergence, full angle (mrad)', CW.div);

    const core = evaluateRoom(coreInput(0.05));
    const [p, c] = core.beams;
    if (!p || !c) throw new Error('core gave no beams');
    await expect.poll(() => card(PULSED.name).getByTestId('nohd').getAttribute('data-value'), { timeout: 30_000 }).toBe(p.nohd_m_reported);
    await expect.poll(() => card(CW.name).getByTestId('nohd').getAttribute('data-value'), { timeout: 30_000 }).toBe(c.nohd_m_reported);
    expect(await card(PULSED.name).getByTestId('od').getAttribute('data-value')).toBe(p.odRequired);
    expect(await card(CW.name).getByTestId('od').getAttribute('data-value')).toBe(c.odRequired);
    expect(await card(CW.name).getByTestId('od').textContent()).toBe(`OD ${c.odRequired}`);
    // the caution is on the screen with the results
    expect(await page.getByRole('note', { name: 'Caution' }).count()).toBeGreaterThan(0);
  });

  it('bad input in a field shows its error and changes nothing', async () => {
    const nohd = card(CW.name).getByTestId('nohd');
    const before = await nohd.getAttribute('data-value');
    const power = page.getByLabel('Power', { exact: true });
    await power.fill('50 parsecs');
    const alert = page.getByRole('alert').filter({ hasText: 'parsecs' });
    await alert.waitFor();
    expect(await alert.textContent()).toContain('Power: "50 parsecs" is not a power unit');
    expect(await power.getAttribute('aria-invalid')).toBe('true');
    // Wait for the state, not a time: no evaluation in flight (the results are not busy), and the
    // shown NOHD is still the one computed before the bad input.
    await expect.poll(() => page.getByRole('region', { name: 'Results' }).getAttribute('aria-busy'), { timeout: 30_000 }).toBe('false');
    expect(await nohd.getAttribute('data-value')).toBe(before);
    // and it cannot be saved like that
    await page.keyboard.press('Control+s');
    await page.getByRole('alert').filter({ hasText: 'Not saved' }).waitFor();
    await power.fill(CW.power);
    await expect.poll(() => power.getAttribute('aria-invalid')).toBe('false');
    expect(await nohd.getAttribute('data-value')).toBe(before);
  });

  it('saves revision 1, picks eyewear that protects against both beams', async () => {
    await page.keyboard.press('Control+s');
    await page.getByTestId('record-status').filter({ hasText: 'revision 1 · draft' }).waitFor();
    await page.keyboard.press('Alt+3');
    await page.getByRole('heading', { level: 1, name: /^Eyewear/ }).waitFor();
    const row = (label: string): Locator => page.getByRole('row').filter({ has: page.getByRole('rowheader', { name: new RegExp(label) }) });
    await expect.poll(() => row('Beam 1|1064|test').count()).toBeGreaterThan(0);
    // each coverage cell is a button that names the verdict and its reason in place
    expect(await page.getByRole('button', { name: /^✔ protects/ }).count()).toBe(2);
    // the gap is shown first (so its disappearance below means something), then closed by the choice
    const gap = page.getByRole('status').filter({ hasText: 'No chosen eyewear protects against' });
    await expect.poll(() => gap.count(), { timeout: 30_000 }).toBe(1);
    const box = page.getByRole('checkbox', { name: /EW-T1/ });
    await box.check();
    expect(await box.isChecked()).toBe(true);
    await expect.poll(() => gap.count(), { timeout: 30_000 }).toBe(0);
    expect(await page.getByRole('alert').filter({ hasText: 'does not protect' }).count()).toBe(0);
  });

  it('signs the assessment', async () => {
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { level: 1, name: /^Review & sign/ }).waitFor();
    await page.getByRole('button', { name: 'Save', exact: true }).first().click();
    await page.getByTestId('review-status').filter({ hasText: 'draft' }).waitFor();
    await page.getByLabel('Signer').selectOption({ label: 'Ada Quillfeather (Laser safety officer)' });
    // A wrong passphrase is refused and nothing is signed.
    await page.getByLabel('Passphrase of the signing key').fill('not her passphrase');
    await page.getByRole('button', { name: 'Review what is signed…' }).click();
    const confirm = page.getByTestId('sign-confirm');
    await confirm.waitFor();
    // The confirmation shows exactly what is signed: room, revision, headline results, statement.
    const shown = (await confirm.textContent()) ?? '';
    expect(shown).toContain('T1.01');
    expect(shown).toMatch(/Revision\s*1, calculated with/);
    expect(shown).toMatch(/NOHD .* m, eyewear OD/);
    expect(shown).toContain('I have assessed the laser hazards of room T1.01');
    await page.getByRole('button', { name: 'Sign revision 1' }).click();
    await page.getByRole('alert').filter({ hasText: 'The passphrase is not correct' }).waitFor();
    expect(await page.getByTestId('review-status').textContent()).toContain('draft');
    await page.getByLabel('Passphrase of the signing key').fill(PASSPHRASE);
    await page.getByRole('button', { name: 'Review what is signed…' }).click();
    await page.getByRole('button', { name: 'Sign revision 1' }).click();
    await page.getByTestId('review-status').filter({ hasText: 'signed' }).waitFor();
    expect(await page.getByTestId('signed-by').textContent()).toContain('Ada Quillfeather');
    const fp = (await page.getByTestId('fingerprint').textContent()) ?? '';
    expect(fp).toMatch(/^[0-9a-f]{64}$/);
    await page.getByRole('button', { name: 'Verify the newest signed revision' }).click();
    expect(await page.getByTestId('verify-result').textContent()).toMatch(/Verified/);
  });

  it('produces the report PDF of the signed revision', async () => {
    await page.keyboard.press('Alt+6');
    await page.getByRole('heading', { level: 1, name: /^Print & export/ }).waitFor();
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 60_000 }),
      page.getByRole('listitem').filter({ hasText: 'Assessment report' }).getByRole('button', { name: 'Save PDF…' }).click(),
    ]);
    const file = path.join(downloads, download.suggestedFilename());
    await download.saveAs(file);
    expect(download.suggestedFilename()).toMatch(/^assessment-report-T1\.01-rev1-signed\.pdf$/);
    const bytes = readFileSync(file);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    const pdftotext = requireTool('pdftotext', 'poppler-utils', 'to read the saved report back');
    const text = execFileSync(pdftotext, ['-layout', file, '-']).toString();
    expect(text).toContain('T1.01');
    expect(text).toContain('Ada Quillfeather');
    expect(text).not.toMatch(/\bDRAFT\b/);
  });

  it('after a reload the room opens again and is signed', async () => {
    await page.reload();
    await page.keyboard.press('Alt+5');
    await page.getByTestId('review-status').filter({ hasText: 'signed' }).waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('signed-by').textContent()).toContain('Ada Quillfeather');
  });

  it('an edit after signing makes a new draft revision and shows what changed', async () => {
    await page.keyboard.press('Alt+2');
    await page.getByRole('heading', { level: 1, name: 'Workspace · T1.01' }).waitFor();
    await page.getByRole('button', { name: /^Beam 1.*532 nm/ }).click();
    await page.getByLabel('Power', { exact: true }).fill('60 mW');
    const c = evaluateRoom(coreInput(0.06)).beams[1];
    await expect.poll(() => card(CW.name).getByTestId('nohd').getAttribute('data-value'), { timeout: 30_000 }).toBe(c?.nohd_m_reported);
    await page.keyboard.press('Control+s');
    await page.getByTestId('record-status').filter({ hasText: 'revision 2 · draft' }).waitFor();
    await page.keyboard.press('Alt+5');
    await page.getByRole('heading', { name: 'Changes since the last signed revision' }).waitFor();
    // the change reads as on the form: the field label and the value with its unit, never a stored path
    await page.getByRole('cell', { name: 'Power', exact: true }).first().waitFor();
    expect(await page.getByRole('cell', { name: '60 mW', exact: true }).count()).toBeGreaterThan(0);
    expect(await page.getByRole('cell', { name: /power_W/ }).count()).toBe(0);
  });

  it('no script errors on the page', () => {
    expect(pageErrors).toEqual([]);
  });
});

describe('the loopback host refuses what it must', () => {
  it.each([
    ['no token', {}, 401],
    ['a wrong token', { 'x-beamwarden-token': 'x'.repeat(32) }, 401],
  ])('an API call with %s is refused', async (_name, headers, status) => {
    const res = await fetch(`${host.origin}/api/app-info`, { method: 'POST', headers: { 'content-type': 'application/json', ...headers }, body: '{}' });
    expect(res.status).toBe(status);
  });

  it('a page of another origin cannot call it, even with the token', async () => {
    const res = await fetch(`${host.origin}/api/app-info`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-beamwarden-token': host.token, origin: 'http://evil.example' },
      body: '{}',
    });
    expect(res.status).toBe(403);
  });

  it('a bad payload gets an error naming the field, and the host keeps running', async () => {
    const res = await fetch(`${host.origin}/api/room-create`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-beamwarden-token': host.token },
      body: JSON.stringify({ siteId: 'x', code: '' }),
    });
    const body = (await res.json()) as { ok: boolean; error: { code: string; message: string } };
    expect(res.status).toBe(400);
    expect(body.error.code).toBe('invalid_input');
    expect(body.error.message).toMatch(/Code: must not be empty/);
    const again = await fetch(`${host.origin}/api/app-info`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-beamwarden-token': host.token }, body: '{}' });
    expect(again.status).toBe(200);
  });

  it('inline script injected into the page does not run (CSP)', async () => {
    const ran = await page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'document.body.dataset.injected = "yes"';
      document.body.appendChild(s);
      return document.body.dataset['injected'] ?? 'no';
    });
    expect(ran).toBe('no');
  });
});
