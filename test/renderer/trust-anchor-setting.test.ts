/**
 * Settings & about, "Trust anchor of this desk" (issue 15 item 4, trust across desks; issue 10, a
 * trust anchor outside the database): a second desk of one register shows that it trusts nothing
 * until its anchor is entered, refuses a mistyped fingerprint in the officer's words, accepts the
 * fingerprint typed as on paper (groups of four, any case), and says plainly when the anchor entered
 * is not the one the register was set up with. Real handler table over a real register shared by
 * two desks (two folders), no mock. A security property of the records, not a physics result.
 */
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { openRecordStore, type RecordStore } from '../../electron/backend/records/index.js';
import AboutPanel from '../../renderer/components/AboutPanel.svelte';
import { makeSigner, openTemp, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let deskA: RecordStore;
let deskB: RecordStore;
let anchor: string;

beforeAll(async () => {
  t = tempDir();
  deskA = await openTemp(t.dir);
  await makeSigner(deskA);
  anchor = (await deskA.trustList()).anchor ?? '';
  deskB = await openRecordStore({ path: join(t.dir, 'records.sqlite'), keyDir: join(t.dir, 'desk-B') });
  installStoreBridge(deskB, { settingsDir: join(t.dir, 'settings'), registerSource: 'default' });
});
afterEach(() => cleanup());
afterAll(async () => {
  await deskB.close();
  await deskA.close();
  t.cleanup();
});

const text = (id: string): string => screen.queryByTestId(id)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
const alerts = (): string => screen.queryAllByRole('alert').map((a) => a.textContent ?? '').join(' ');
const groups = (hex: string): string => (hex.match(/.{4}/g) ?? []).join(' ');

async function opened(): Promise<void> {
  const view = render(AboutPanel);
  await view.component.open();
  await until(() => text('desk-anchor') !== '');
}

async function enter(fingerprint: string): Promise<void> {
  await fireEvent.input(screen.getByLabelText('Fingerprint of the trust anchor (64 hexadecimal digits, as on paper)'), { target: { value: fingerprint } });
  await fireEvent.click(screen.getByRole('button', { name: 'Use this anchor on this desk' }));
}

describe('Settings & about: the trust anchor of this desk', () => {
  it('a desk without an anchor says it trusts nothing, and names the register\'s anchor to compare with paper', async () => {
    await opened();
    expect(text('desk-anchor')).toBe('No trust anchor is configured on this desk: no signature is trusted here.');
    expect(text('register-anchor')).toBe(`The register in use was set up with the anchor ${groups(anchor)}. Compare it with your paper copy; do not copy it from here.`);
    expect(alerts()).toMatch(/This desk has no trust anchor configured, so no signature in this register is trusted here\./);
  });

  it.each([
    ['3f2a 9c1e', 'The fingerprint must be 64 hexadecimal digits; 8 were given. Nothing was changed.'],
    ['zz'.repeat(32), 'The fingerprint may hold only the digits 0-9 and the letters a-f (spaces between groups are fine). Nothing was changed.'],
  ])('a mistyped fingerprint %j is refused in the officer\'s words', async (typed, said) => {
    await opened();
    await enter(typed);
    await until(() => /Nothing was changed/.test(text('trust-anchor-result')));
    expect(text('trust-anchor-result')).toBe(said);
    expect(text('desk-anchor')).toBe('No trust anchor is configured on this desk: no signature is trusted here.');
  });

  it('the fingerprint typed as on paper is saved; a different one is reported plainly', async () => {
    await opened();
    await enter(groups(anchor.toUpperCase()));
    await until(() => /Saved/.test(text('trust-anchor-result')));
    expect(text('trust-anchor-result')).toBe('Saved. 1 signing key is trusted here.');
    expect(text('desk-anchor')).toMatch(/; 1 signing key is trusted here\):$/);
    // The 64 digits on two lines of eight groups, as on the paper copy.
    const shown = screen.getByTestId('desk-anchor-fingerprint');
    expect(shown.innerHTML.replace(/<!--.*?-->/g, '')).toBe(`${groups(anchor.slice(0, 32))}<br>${groups(anchor.slice(32))}`);
    expect(alerts()).toBe('');
    await enter('0'.repeat(64));
    await until(() => /see the message above/.test(text('trust-anchor-result')));
    expect(alerts()).toMatch(/^This register's signatures are endorsed by a key this desk does not recognise: the register was set up with the trust anchor [0-9a-f ]+, but this desk is configured with 0000 0000 0000 0000 0000\./);
  });
});
