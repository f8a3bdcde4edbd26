/**
 * Search across the register on the invented demo site (assets/demo/demo-scenario.json), through
 * the real handler table and store: by wavelength or range, class, serial, record status and name;
 * results grouped by kind; "/" focuses the search box. Expected lasers are the demo's own entries.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { installStoreBridge } from './store-bridge.js';
import type { RecordStore } from '../../electron/backend/records/index.js';
import type { RegisterOverview } from '../../electron/api/contracts/register.js';
import RegisterScreen from '../../renderer/screens/RegisterScreen.svelte';
import { searchRegister } from '../../renderer/lib/register-search.js';
import { session } from '../../renderer/lib/session.svelte.js';
import { openTemp, tempDir } from '../backend/records/helpers.js';

let t: ReturnType<typeof tempDir>;
let store: RecordStore;
let overview: RegisterOverview;
const TODAY = '2026-12-02';

beforeAll(async () => {
  t = tempDir();
  store = await openTemp(t.dir);
  await store.seedDemo();
  installStoreBridge(store);
  await session.refreshOverview();
  if (!session.overview) throw new Error('no overview');
  overview = session.overview;
});
afterAll(async () => {
  delete window.beamwarden;
  await store.close();
  t.cleanup();
});

const titles = (q: string, kind: string): string[] =>
  searchRegister(overview, q, TODAY)
    .find((g) => g.kind === kind)
    ?.hits.map((h) => h.title)
    .sort() ?? [];

describe('searchRegister', () => {
  it.each([
    { q: '1064 nm', kind: 'laser', want: ['Q-switched Nd:YAG'], source: 'demo scenario: the only 1064 nm beam' },
    { q: '1000-1100 nm', kind: 'laser', want: ['Fibre laser with 160 mm focusing head', 'Q-switched Nd:YAG'], source: 'demo: 1064 and 1070 nm' },
    { q: '10.6 µm', kind: 'laser', want: ['CO₂ laser'], source: 'demo: 10 600 nm typed in µm' },
    { q: '1550 nm', kind: 'laser', want: ['Erbium fibre amplifier', 'Optical parametric amplifier (signal and idler, tunable 1150-2600 nm)'], source: 'demo: two 1550 nm beams' },
    { q: 'class 3B', kind: 'laser', want: ['Diode laser module', 'Erbium fibre amplifier'], source: 'demo: the two class 3B lasers' },
    { q: '1064 nm', kind: 'eyewear', want: ['EW-A'], source: 'demo: EW-A covers 740-1100 nm', prefix: true },
    { q: 'Ferreira', kind: 'room', want: ['B2.14 Ultrafast laboratory'], source: 'demo: responsible person of B2.14' },
  ])('"$q" finds $kind: $want [$source]', ({ q, kind, want, prefix }) => {
    const got = titles(q, kind);
    if (prefix) expect(got.map((x) => x.split(' ')[0])).toEqual(want);
    else expect(got).toEqual(want);
  });

  it('a wavelength search lists no rooms or people (grouped by kind, only kinds that match)', () => {
    const kinds = searchRegister(overview, '532 nm', TODAY).map((g) => g.kind);
    expect(kinds).toEqual(['laser', 'eyewear']);
  });
});

describe('the Register search box', () => {
  it('"/" focuses it and typing shows results grouped by kind; a hit opens its room', async () => {
    render(RegisterScreen);
    const box = screen.getByRole('searchbox', { name: 'Search the register' });
    await fireEvent.keyDown(window, { key: '/' });
    expect(document.activeElement).toBe(box);
    await fireEvent.input(box, { target: { value: '1064 nm' } });
    const results = screen.getByTestId('search-results');
    const lasers = within(results).getByRole('list', { name: 'Lasers' });
    expect(within(lasers).getByRole('button', { name: /Q-switched Nd:YAG/ }).textContent).toMatch(/1064 nm.*class 4.*room B2\.16/);
    await fireEvent.click(within(lasers).getByRole('button', { name: /Q-switched Nd:YAG/ }));
    expect(screen.getByRole('heading', { name: /Room B2\.16/ })).toBeTruthy();
  });
});
