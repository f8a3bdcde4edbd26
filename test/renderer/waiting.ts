/** Waiting for the screen in component tests: one short pause, and polling until a condition holds. */

export const tick = (ms = 0): Promise<void> => new Promise((r) => setTimeout(r, ms));

/** Polls `check` every 20 ms until it holds; fails with 'timed out' after `ms`. */
export async function until(check: () => boolean | Promise<boolean>, ms = 5000): Promise<void> {
  const end = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > end) throw new Error('timed out');
    await tick(20);
  }
}
