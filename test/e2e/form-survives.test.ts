/**
 * A half-typed form must survive whatever the shell does around it. Found while writing the
 * create-tank flow: the "works offline" notice of the first install re-renders the shell, and
 * the new-tank form used to be handed a fresh blank tank on every render, which wiped what was
 * typed. This failed every time before that was fixed.
 */
import { describe, expect, it } from 'vitest';
import { byTestId, useApp, waitForServiceWorker } from './harness.js';

const app = useApp();

describe('forms keep what was typed', () => {
  it('a half-typed new tank survives the first-install notice appearing', async () => {
    const { page } = await app.open('/');
    await byTestId(page, 'tank-item').first().waitFor();
    await byTestId(page, 'tank-add').click();
    await byTestId(page, 'tank-name').fill('Half typed');
    // The first install ends with the "works offline" notice: the shell re-renders around the form.
    await waitForServiceWorker(page);
    await page.locator('[data-testid="notice"][data-kind="offline-ready"]').waitFor();
    await page.waitForTimeout(300);
    expect(await byTestId(page, 'tank-name').inputValue()).toBe('Half typed');
  });
});
