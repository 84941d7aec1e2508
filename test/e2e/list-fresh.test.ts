/**
 * The tank list is kept while the app runs (pwa/tanks-screen.ts) and its search is built once per
 * register: going back to it must still show the register as it is now. On the invented demo
 * site: a search stays typed across a visit to a tank; a tank added, a tank deleted and the undo
 * of that delete each show in the list at once. Waits for states only.
 */
import { describe, it } from 'vitest';
import { byTestId, typeInto, useApp } from './harness.js';

const app = useApp();

describe('the kept tank list', () => {
  it('shows a tank added, deleted and put back, and keeps the search across a visit', async () => {
    const { page } = await app.open('/');
    const item = (name: string) => byTestId(page, 'tank-item').filter({ hasText: name });
    const found = (text: string) =>
      page.locator('[data-testid="tank-found"]', { hasText: text }).waitFor();
    await byTestId(page, 'tank-item').first().waitFor();
    // The whole register is in once the count shows (not "Reading the rest of the register…").
    await page.locator('[data-testid="tank-found"]', { hasText: /\d+ tanks\./ }).waitFor();
    const total = Number((await byTestId(page, 'tank-found').textContent())!.match(/\d+/)![0]);

    // A search, a visit to the tank found, back: the search and its one match are still there.
    const first = (await byTestId(page, 'tank-item').first().locator('.name').textContent())!;
    await byTestId(page, 'tank-search').fill(first);
    await found(`1 of ${total} tanks match`);
    await item(first).locator('button.open').click();
    await byTestId(page, 'tank-heading').waitFor();
    await byTestId(page, 'nav-tanks').click();
    await found(`1 of ${total} tanks match`);
    await byTestId(page, 'tank-search').fill('');

    // Added: the new tank is listed and found.
    await byTestId(page, 'tank-add').click();
    await byTestId(page, 'tank-site').fill('Fresh yard');
    await byTestId(page, 'tank-name').fill('Fresh tank 1');
    await byTestId(page, 'tank-product').selectOption('propane');
    await typeInto(byTestId(page, 'tank-water-capacity'), '250');
    await typeInto(byTestId(page, 'tank-design-pressure'), '250');
    await byTestId(page, 'tank-save').click();
    await byTestId(page, 'tank-heading').filter({ hasText: 'Fresh tank 1' }).waitFor();
    await byTestId(page, 'nav-tanks').click();
    await found(`${total + 1} tanks.`);
    await byTestId(page, 'tank-search').fill('fresh yard');
    await found(`1 of ${total + 1} tanks match`);
    await item('Fresh tank 1').waitFor();

    // Deleted with the search still typed: gone from the list and the count; undo puts it back.
    await item('Fresh tank 1').getByTestId('tank-delete').click();
    await found(`0 of ${total} tanks match`);
    await item('Fresh tank 1').waitFor({ state: 'detached' });
    await page.locator('[data-testid="notice"][data-kind="undo"]').waitFor();
    await byTestId(page, 'notice-action').click();
    await found(`1 of ${total + 1} tanks match`);
    await item('Fresh tank 1').waitFor();
  });
});
