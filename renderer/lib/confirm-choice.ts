/**
 * Asking the officer before a choice that loses or replaces work, in the app's own dialog
 * (components/ChoiceDialog.svelte) instead of the browser's confirm/alert/prompt boxes: those show
 * the program's internal title, cannot say what exactly is lost, and some browsers block them for
 * the loopback host (the lint configuration forbids them in renderer/).
 *
 *   if (!(await confirmChoice({ title, consequences, kept, confirmLabel: 'Discard changes', danger: true }))) return;
 *
 * One dialog at a time: a second request waits until the first is answered. The dialog is mounted
 * on document.body when asked and removed when answered, so it works on every screen and in
 * component tests without a host component; focus goes back where it was.
 */
import { mount, unmount } from 'svelte';
import ChoiceDialog from '../components/ChoiceDialog.svelte';

export interface ChoiceRequest {
  /** The question, e.g. "Discard the unsaved changes?". */
  readonly title: string;
  /** A plain sentence before the list of what is lost (optional). */
  readonly body?: string;
  /** The line above the list, e.g. "These 3 unsaved changes are lost:". */
  readonly consequencesIntro?: string;
  /** What is lost, one line each. */
  readonly consequences?: readonly string[];
  /** What is kept, in one sentence (e.g. "Signed assessments keep their own copy."). */
  readonly kept?: string;
  /** The confirm button names the action ("Discard changes"); absent for a message with only Close. */
  readonly confirmLabel?: string;
  /** The safe choice; "Cancel" unless given. */
  readonly cancelLabel?: string;
  /** Loses work or deletes: the confirm button is drawn in the warning colour. */
  readonly danger?: boolean;
  /** Asks for a short text (its label and the longest length the register accepts). */
  readonly text?: { readonly label: string; readonly maxLength?: number };
}

interface Answer {
  readonly ok: boolean;
  readonly text: string;
}

let queue: Promise<unknown> = Promise.resolve();
/** Raised by cancelOpenChoices: requests made before it are answered Cancel without being shown. */
let generation = 0;
/** The dialog on screen: answering it Cancel from outside. */
let shownCancel: (() => void) | null = null;

function ask(request: ChoiceRequest): Promise<Answer> {
  const asked = generation;
  const turn = queue.then(
    () =>
      new Promise<Answer>((resolve) => {
        if (asked !== generation) {
          resolve({ ok: false, text: '' });
          return;
        }
        const returnTo = document.activeElement instanceof HTMLElement ? document.activeElement : null;
        const target = document.createElement('div');
        target.className = 'choice-host';
        document.body.append(target);
        let done = false;
        const finish = (ok: boolean, text: string): void => {
          if (done) return;
          done = true;
          shownCancel = null;
          void unmount(shown);
          target.remove();
          if (returnTo?.isConnected) returnTo.focus();
          resolve({ ok, text });
        };
        const shown = mount(ChoiceDialog, { target, props: { request, onanswer: finish } });
        shownCancel = () => finish(false, '');
      }),
  );
  queue = turn;
  return turn;
}

/**
 * Answers Cancel to the dialog on screen and to every request still waiting (the safe choice), e.g.
 * when the records are replaced underneath or a component test ends.
 */
export function cancelOpenChoices(): void {
  generation++;
  shownCancel?.();
}

/** Asks before a choice that loses or replaces work; true when the officer chose the named action. */
export async function confirmChoice(request: ChoiceRequest & { readonly confirmLabel: string }): Promise<boolean> {
  return (await ask(request)).ok;
}

/** Asks for a short text (the name of a new site); null when cancelled. */
export async function askText(request: ChoiceRequest & { readonly confirmLabel: string; readonly text: { readonly label: string; readonly maxLength?: number } }): Promise<string | null> {
  const a = await ask(request);
  return a.ok && a.text !== '' ? a.text : null;
}

/** Tells the officer why a choice cannot be made (only a Close button); resolves when closed. */
export async function tellWhy(request: Omit<ChoiceRequest, 'confirmLabel' | 'text'>): Promise<void> {
  await ask({ cancelLabel: 'Close', ...request });
}
