/**
 * The two banners that keep the officer's version as a copy of its own: after a save refused because
 * someone else saved first (StaleSaveBanner), and after the open assessment was deleted on another
 * desk (DeletedElsewhereBanner). Each says what happened, offers the keep-as-copy way on (named for
 * what it does), and refuses a second click while the back end is busy. The session's state is set
 * as the refusal sets it; the saves themselves are tested in test/e2e/records.test.ts and
 * test/e2e/two-hosts-register.test.ts. Invented demo room A0.07.
 * Source for every case: derived: optimistic concurrency (a write names the version it read);
 * nothing typed is lost without asking (DEVELOPERS.md, "Asking before work is lost").
 */
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import StaleSaveBanner from '../../renderer/components/safekeeping/StaleSaveBanner.svelte';
import DeletedElsewhereBanner from '../../renderer/components/safekeeping/DeletedElsewhereBanner.svelte';
import { session } from '../../renderer/lib/session.svelte.js';
import type { Room } from '../../electron/api/contracts/records.js';

const ROOM = { id: 'room-a007', code: 'A0.07' } as const satisfies Partial<Room>;

afterEach(() => {
  cleanup();
  session.stale = null;
  session.staleChanges = [];
  session.deletedElsewhere = null;
  session.room = null;
  session.busy = false;
});

const changed = (n: number) => ({ where: 'Telecom bench laser · Beam 1', what: 'Power', old: `${n} mW`, new: `${n + 1} mW`, result: false });

describe('a save refused because someone else saved first', () => {
  const cases = [
    { name: 'with what the other save changed', changes: [changed(10)], shown: ['Telecom bench laser · Beam 1 · Power: 10 mW → 11 mW'], more: null },
    { name: 'more changes than the banner lists', changes: Array.from({ length: 10 }, (_, i) => changed(i)), shown: ['Telecom bench laser · Beam 1 · Power: 7 mW → 8 mW'], more: 'and 2 more' },
    { name: 'what changed not known', changes: [], shown: [], more: null },
  ];
  it.each(cases)('$name: says it was not saved, and offers the copy and the discard', ({ changes, shown, more }) => {
    session.stale = 'Dr. Imre Calloway-Senn saved this assessment after you opened it.';
    session.staleChanges = changes;
    render(StaleSaveBanner);
    const banner = screen.getByRole('alert');
    expect(banner.dataset['testid']).toBe('stale-save');
    expect(banner.textContent).toContain('Not saved. Dr. Imre Calloway-Senn saved this assessment after you opened it.');
    for (const s of shown) expect(banner.textContent).toContain(s);
    expect(screen.queryAllByRole('listitem')).toHaveLength(Math.min(changes.length, 8));
    if (more) expect(banner.textContent).toContain(more);
    else expect(banner.textContent).not.toContain('more (compare');
    const keep = screen.getByRole('button', { name: 'Keep my version as a copy, open the stored one' });
    const discard = screen.getByRole('button', { name: 'Open the stored one, discard mine' });
    expect([keep, discard].map((b) => (b as HTMLButtonElement).disabled)).toEqual([false, false]);
    session.busy = true;
    flushSync();
    expect([keep, discard].map((b) => (b as HTMLButtonElement).disabled)).toEqual([true, true]);
  });

  it('nothing refused: no banner', () => {
    render(StaleSaveBanner);
    expect(screen.queryByRole('alert')).toBeNull();
  });
});

describe('the open assessment deleted on another desk', () => {
  const cases = [
    { name: 'its room still registered', room: null, label: 'Keep my version as an assessment of its own' },
    { name: 'its room deleted too', room: ROOM, label: 'Keep my version: register room A0.07 again with it' },
  ];
  it.each(cases)('$name: says so, and offers to keep what is on screen', ({ room, label }) => {
    session.room = room as Room | null;
    session.deletedElsewhere = 'The draft of room A0.07 was discarded on another desk. What is on screen is kept here until you keep it or leave it.';
    render(DeletedElsewhereBanner);
    const banner = screen.getByRole('alert');
    expect(banner.dataset['testid']).toBe('deleted-elsewhere');
    expect(banner.textContent).toContain('The draft of room A0.07 was discarded on another desk.');
    const keep = screen.getByRole('button', { name: label });
    expect(screen.getAllByRole('button')).toHaveLength(1);
    expect((keep as HTMLButtonElement).disabled).toBe(false);
    session.busy = true;
    flushSync();
    expect((keep as HTMLButtonElement).disabled).toBe(true);
  });

  it('nothing deleted: no banner', () => {
    render(DeletedElsewhereBanner);
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
