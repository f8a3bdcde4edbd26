/**
 * The limit table checks screen (issue 12) on the real handler table over a real SQLite store in a
 * temporary folder (the desktop bridge is the in-process dispatch, no mock): it lists the open row
 * H-E-VIS-2 with its band, durations, formula and the values the core computes; the officer records
 * that the published text differs, signs with their passphrase, and the check is listed as in use.
 *
 * Values shown (rounded down, 3 significant figures): at 400 nm and 10 ps the row as written gives
 * 2e-3 J/m² (tables, from memory: self-consistency), the stricter EU value 2.7e4*(1e-11)^0.75 =
 * 1.518e-4 J/m² -> "151 µJ/m²" (Directive 2006/25/EC Annex II Table 2.2, read;
 * the exposure-limit specification (exposure-limits.md), errata, gives 1.518e-4 J/m² at 1e-11 s).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import type { RecordStore } from '../../electron/backend/records/index.js';
import LimitChecksScreen from '../../renderer/screens/LimitChecksScreen.svelte';
import { makeSigner, openTemp, tempDir } from '../backend/records/helpers.js';
import { installStoreBridge } from './store-bridge.js';
import { until } from './waiting.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let officer: Awaited<ReturnType<typeof makeSigner>>;

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  officer = await makeSigner(store, 'Dr. Imre Calloway-Senn');
  installStoreBridge(store);
});
afterAll(async () => {
  await store.close();
  t.cleanup();
});

const entryOf = (key: string): HTMLElement => {
  const li = document.querySelector<HTMLElement>(`li[data-entry="${key}"]`);
  if (!li) throw new Error(`no entry ${key}`);
  return li;
};

describe('Limit table checks screen', () => {
  it('lists an open row with its band, durations, formula and sample values', async () => {
    render(LimitChecksScreen);
    await until(() => (screen.getByTestId('check-counts').textContent ?? '').includes('not yet checked') && screen.queryByTestId('no-checks') !== null, 10000);
    expect(screen.getByTestId('check-counts').textContent).toBe('79 not yet checked · 0 checked');
    await until(() => entryOf('H-E-VIS-2').querySelector('table.samples') !== null, 10000);
    const li = entryOf('H-E-VIS-2');
    expect(li.textContent).toContain('Eye, retinal thermal · table row H-E-VIS-2');
    expect(li.textContent).toContain('400 nm – 700 nm · 10 ps – 1 ns');
    // the standards' notation (core/units/formula-text.ts): 2 × 10^-3 × C_E, exponent raised, subscript lowered
    expect(li.textContent).toContain('H = 2 × 10−3 × CE J/m²');
    expect(li.querySelector('.formula sup')?.textContent).toBe('−3');
    expect(li.querySelector('.formula sub')?.textContent).toBe('E');
    const first = within(li).getAllByRole('row')[1];
    expect(first?.textContent).toBe('400 nm, 10 ps, α = 1 mrad2 mJ/m²151 µJ/m²');
  });

  it('records a "differs" check, signed with the passphrase; the entry leaves the open list', async () => {
    render(LimitChecksScreen);
    await until(() => document.querySelector('li[data-entry="H-E-VIS-2"]') !== null && screen.queryByTestId('no-checks') !== null, 10000);
    const li = entryOf('H-E-VIS-2');
    await fireEvent.click(within(li).getByRole('button', { name: 'Check this entry' }));
    await fireEvent.input(screen.getByLabelText('Published document and table checked against'), { target: { value: 'IEC 60825-1:2014 Table A.1' } });
    await fireEvent.click(screen.getByLabelText('differs from it'));
    await fireEvent.input(screen.getByLabelText(/What the published document gives/), { target: { value: '1e-3*CE' } });
    await until(() => screen.queryByTestId('typed-preview') !== null);
    expect(screen.getByTestId('typed-preview').textContent).toContain('400 nm, 10 ps, α = 1 mrad: published 1 mJ/m², as written 2 mJ/m² — the published value is lower and will be used');
    await fireEvent.change(screen.getByLabelText('Checked by'), { target: { value: officer.person.id } });
    await fireEvent.input(screen.getByLabelText('Passphrase of your signing key'), { target: { value: officer.passphrase } });
    await fireEvent.click(screen.getByRole('button', { name: 'Sign the check' }));
    await until(() => screen.queryByTestId('recorded-checks') !== null, 10000);
    const row = within(screen.getByTestId('recorded-checks')).getByText('row H-E-VIS-2').closest('tr');
    expect(row?.textContent).toMatch(/differs\s*10−3 × CE/);
    expect(row?.textContent).toContain('IEC 60825-1:2014 Table A.1');
    expect(row?.textContent).toContain('Dr. Imre Calloway-Senn');
    expect(row?.textContent).toContain('in use');
    expect(screen.getByTestId('check-counts').textContent).toBe('78 not yet checked · 1 checked');
    expect(document.querySelector('li[data-entry="H-E-VIS-2"]')).toBeNull();
    expect((await store.listRowChecks()).map((c) => [c.entryKey, c.verdict, c.documentExpr, c.ok])).toEqual([['H-E-VIS-2', 'differs', '1e-3*CE', true]]);
  });
});
