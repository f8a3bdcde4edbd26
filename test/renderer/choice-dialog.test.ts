/**
 * The app's one confirmation dialog (renderer/components/ChoiceDialog.svelte through
 * renderer/lib/confirm-choice.ts), which replaced the browser's confirm/prompt boxes: a modal
 * alertdialog named by its question, the safe choice focused when it opens, Tab kept inside,
 * Escape answering Cancel, the confirm button naming the action, and what is lost and kept said
 * in words. The requirements are those of WAI-ARIA Authoring Practices 1.2, "Alert and Message
 * Dialogs Pattern" and "Dialog (Modal) Pattern" (focus moves into the dialog, Tab and Shift+Tab
 * wrap, Escape closes, focus returns to the control that opened it; a destructive action puts the
 * initial focus on the least destructive choice), recalled from memory: self-consistency checks
 * of the app's behaviour, not values from a published table.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, screen, within } from '@testing-library/svelte';
import { askText, cancelOpenChoices, confirmChoice, tellWhy } from '../../renderer/lib/confirm-choice.js';
import { until } from './waiting.js';

afterEach(() => {
  cancelOpenChoices();
  cleanup();
  document.body.innerHTML = '';
});

const dialog = () => screen.getByRole('alertdialog');
const shown = () => screen.queryByRole('alertdialog') !== null;

/** A button on the page that opens the dialog, so the test can see focus come back to it. */
function opener(): HTMLButtonElement {
  const b = document.createElement('button');
  b.textContent = 'Open';
  document.body.append(b);
  b.focus();
  return b;
}

const REQUEST = {
  title: 'Discard the unsaved changes?',
  body: 'The open assessment has changes that are not saved.',
  consequencesIntro: 'These 2 unsaved changes are lost:',
  consequences: ['Title changed', 'New laser “Bench diode” (not yet in the register)'],
  kept: 'The stored revision 3 and the register stay as they are.',
  confirmLabel: 'Discard changes',
  cancelLabel: 'Keep editing',
  danger: true,
} as const;

describe('the confirmation dialog', () => {
  it('is a modal alertdialog named by its question and described by what is lost and kept; the safe choice has the focus', async () => {
    const b = opener();
    const answer = confirmChoice(REQUEST);
    await until(shown);
    const d = dialog();
    expect(d.tagName).toBe('DIALOG');
    expect(d.getAttribute('aria-modal')).toBe('true');
    expect(document.getElementById(d.getAttribute('aria-labelledby') ?? '')?.textContent).toBe('Discard the unsaved changes?');
    const described = document.getElementById(d.getAttribute('aria-describedby') ?? '')?.textContent ?? '';
    expect(described).toContain('These 2 unsaved changes are lost:');
    expect(within(d).getAllByRole('listitem').map((li) => li.textContent)).toEqual(['Title changed', 'New laser “Bench diode” (not yet in the register)']);
    expect(described).toContain('The stored revision 3 and the register stay as they are.');
    expect(within(d).getAllByRole('button').map((x) => x.textContent)).toEqual(['Keep editing', 'Discard changes']);
    expect(document.activeElement).toBe(within(d).getByRole('button', { name: 'Keep editing' }));
    expect(b).not.toBe(document.activeElement);
    await fireEvent.click(within(d).getByRole('button', { name: 'Keep editing' }));
    await expect(answer).resolves.toBe(false);
  });

  it('Escape answers Cancel, removes the dialog and gives the focus back to the control that opened it', async () => {
    const b = opener();
    const answer = confirmChoice(REQUEST);
    await until(shown);
    await fireEvent.keyDown(document.activeElement ?? dialog(), { key: 'Escape' });
    await expect(answer).resolves.toBe(false);
    expect(shown()).toBe(false);
    expect(document.activeElement).toBe(b);
  });

  it('the browser closing the modal dialog (its cancel event) also answers Cancel', async () => {
    opener();
    const answer = confirmChoice(REQUEST);
    await until(shown);
    await fireEvent(dialog(), new Event('cancel', { cancelable: true }));
    await expect(answer).resolves.toBe(false);
  });

  it('the confirm button, named by the action, answers true', async () => {
    const b = opener();
    const answer = confirmChoice(REQUEST);
    await until(shown);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Discard changes' }));
    await expect(answer).resolves.toBe(true);
    expect(shown()).toBe(false);
    expect(document.activeElement).toBe(b);
  });

  it('Tab from the last button goes to the first, Shift+Tab from the first to the last: the focus stays inside', async () => {
    opener();
    const answer = confirmChoice(REQUEST);
    await until(shown);
    const d = within(dialog());
    const keep = d.getByRole('button', { name: 'Keep editing' });
    const discard = d.getByRole('button', { name: 'Discard changes' });
    await fireEvent.keyDown(keep, { key: 'Tab', shiftKey: true });
    expect(document.activeElement).toBe(discard);
    await fireEvent.keyDown(discard, { key: 'Tab' });
    expect(document.activeElement).toBe(keep);
    // focus that escaped the dialog somehow is brought back on the next Tab
    const outside = document.createElement('button');
    document.body.append(outside);
    outside.focus();
    await fireEvent.keyDown(dialog(), { key: 'Tab' });
    expect(document.activeElement).toBe(keep);
    await fireEvent.keyDown(keep, { key: 'Escape' });
    await expect(answer).resolves.toBe(false);
  });

  it('one dialog at a time: a second question waits until the first is answered', async () => {
    opener();
    const first = confirmChoice({ ...REQUEST, title: 'First question?' });
    const second = confirmChoice({ ...REQUEST, title: 'Second question?' });
    await until(shown);
    expect(screen.getAllByRole('alertdialog')).toHaveLength(1);
    expect(within(dialog()).getByRole('heading').textContent).toBe('First question?');
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Discard changes' }));
    await expect(first).resolves.toBe(true);
    await until(() => screen.queryByRole('heading', { name: 'Second question?' }) !== null);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Keep editing' }));
    await expect(second).resolves.toBe(false);
  });

  it('a refusal has only Close; a question for a name starts in its text box and cannot be confirmed empty', async () => {
    opener();
    const told = tellWhy({ title: 'Delete Room A0.07?', body: 'It has 1 signed assessment.' });
    await until(shown);
    expect(within(dialog()).getAllByRole('button').map((x) => x.textContent)).toEqual(['Close']);
    await fireEvent.click(within(dialog()).getByRole('button', { name: 'Close' }));
    await told;

    const name = askText({ title: 'Add a site to the register', text: { label: 'Name of the new site (institution or building)', maxLength: 200 }, confirmLabel: 'Add the site' });
    await until(shown);
    const box = within(dialog()).getByLabelText('Name of the new site (institution or building)') as HTMLInputElement;
    expect(document.activeElement).toBe(box);
    expect(box.maxLength).toBe(200);
    const add = within(dialog()).getByRole('button', { name: 'Add the site' }) as HTMLButtonElement;
    expect(add.disabled).toBe(true);
    await fireEvent.input(box, { target: { value: '  Harwick Vale Photonics Centre, Building C  ' } });
    expect(add.disabled).toBe(false);
    await fireEvent.submit(box.form ?? box);
    await expect(name).resolves.toBe('Harwick Vale Photonics Centre, Building C');
  });
});
