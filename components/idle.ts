/** Work put off to the browser's idle moments (a timer where there is no idle callback). */

/** Runs `work` when the page is idle, or after `timeout` ms at the latest. */
export function whenIdle(work: () => void, timeout = 1000): void {
  if (typeof requestIdleCallback === 'function') requestIdleCallback(work, { timeout });
  else setTimeout(work, 1);
}

/** Resolves when the page is next idle (after the frames now due are painted). */
export const idle = (timeout?: number): Promise<void> =>
  new Promise((done) => whenIdle(done, timeout));
