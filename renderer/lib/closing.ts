/**
 * Closing the window while the open assessment has unsaved changes. A browser (loopback host)
 * answers a prevented unload with its own leave-page question, which no page can replace. The
 * desktop shell (Electron) shows nothing and silently keeps the window open, so the officer would
 * not know why it does not close: there the app asks in its own dialog, listing the changes, and
 * closes the window itself when the officer chooses to discard them.
 */
import { session } from './session.svelte.js';

let leaving = false;
let asking = false;

export function guardUnload(e: Event, shell: 'electron' | 'loopback', close: () => void = () => window.close()): void {
  if (!session.dirty || leaving) return;
  e.preventDefault();
  if (shell !== 'electron' || asking) return;
  asking = true;
  void session.confirmClose().then((ok) => {
    asking = false;
    if (!ok) return;
    leaving = true;
    close();
  });
}
