/**
 * The site's route order end to end on a 360×740 phone: set with the Up/Down buttons, kept with
 * the site record across a reload, and followed by a walk started in route order (also after a
 * reload mid-walk); a walk started in board order still goes worst first. Kind: behaviour; the
 * demo tanks are invented placeholders, no physics is checked here.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { byTestId, cutOffElements, useApp, waitForServiceWorker } from './harness.js';

const app = useApp();

async function openBoard(page: Page): Promise<void> {
  await byTestId(page, 'tank-item').first().waitFor();
  await waitForServiceWorker(page);
  await byTestId(page, 'walkdown-start').first().click();
  await byTestId(page, 'walkdown-forecast-air').fill('105');
  await byTestId(page, 'walkdown-row').first().waitFor();
  await byTestId(page, 'walkdown-board-progress').waitFor({ state: 'detached' });
}

const ids = (page: Page, testid: string) =>
  byTestId(page, testid).evaluateAll((els) => els.map((e) => (e as HTMLElement).dataset.tankId!));

describe('site route order', () => {
  it('a route set with Up/Down survives a reload and the walk follows it', async () => {
    const { page } = await app.open('/', { locale: 'en-US' });
    await openBoard(page);
    const board = await ids(page, 'walkdown-row');
    expect(board.length).toBeGreaterThan(2);
    await byTestId(page, 'walkdown-route-edit').click();
    await expect.poll(() => ids(page, 'route-item')).toEqual(board);
    // The route: the board's order reversed, one Up press at a time.
    const want = [...board].reverse();
    for (let k = 0; k < want.length; k++) {
      for (;;) {
        const now = await ids(page, 'route-item');
        const at = now.indexOf(want[k]!);
        if (at === k) break;
        await page
          .locator(`[data-testid=route-item][data-tank-id="${want[k]}"]`)
          .getByTestId('route-up')
          .click();
        await expect
          .poll(async () => (await ids(page, 'route-item')).indexOf(want[k]!))
          .toBe(at - 1);
      }
    }
    expect(await ids(page, 'route-item')).toEqual(want);
    expect(await cutOffElements(page)).toEqual([]);

    // Kept with the site record: after a reload the route screen shows the same order.
    await page.reload();
    await byTestId(page, 'walkdown-board-progress').waitFor({ state: 'detached' });
    await byTestId(page, 'walkdown-route-edit').click();
    await expect.poll(() => ids(page, 'route-item')).toEqual(want);
    await byTestId(page, 'route-done').click();

    // The walk in route order: its stops and each tank on screen follow the route.
    await byTestId(page, 'walkdown-begin-route').click();
    await expect.poll(() => ids(page, 'walkdown-stop')).toEqual(want);
    expect(await byTestId(page, 'walkdown-tank').getAttribute('data-tank-id')).toBe(want[0]);
    await byTestId(page, 'walkdown-next').click();
    await expect
      .poll(() => byTestId(page, 'walkdown-tank').getAttribute('data-tank-id'))
      .toBe(want[1]);
    await page.reload();
    await expect
      .poll(() => byTestId(page, 'walkdown-tank').getAttribute('data-tank-id'))
      .toBe(want[1]);
    expect(await ids(page, 'walkdown-stop')).toEqual(want);
  });

  it('with a route set, a walk started in board order goes worst first', async () => {
    const { page } = await app.open('/', { locale: 'en-US' });
    await openBoard(page);
    const board = await ids(page, 'walkdown-row');
    await byTestId(page, 'walkdown-route-edit').click();
    // Move the worst tank to the end of the route.
    for (let i = 0; i < board.length - 1; i++) {
      await page
        .locator(`[data-testid=route-item][data-tank-id="${board[0]}"]`)
        .getByTestId('route-down')
        .click();
      await expect.poll(async () => (await ids(page, 'route-item')).indexOf(board[0]!)).toBe(i + 1);
    }
    await byTestId(page, 'route-done').click();
    await byTestId(page, 'walkdown-begin').click();
    await expect.poll(() => ids(page, 'walkdown-stop')).toEqual(board);
  });
});
