/**
 * A register of 5,000 invented tanks with 5,000 saved checks (scripts/lib/register-seed.mjs: copies
 * of the demo nameplates under made-up names and sites): after a reload the list shows its first
 * rows, the search box finds a tank by its name, its site and its product, and a tank found in the
 * virtualised list still opens with its history. Waits for states only; the timings are measured
 * by scripts/register-bench.mjs, never here.
 */
import { describe, expect, it } from 'vitest';
import { byTestId, useApp } from './harness.js';
// @ts-expect-error -- a plain .mjs helper shared with the bench script, no type declarations
import { saveOneCheck, seedRegister } from '../../scripts/lib/register-seed.mjs';

const app = useApp();

describe('a register of thousands', () => {
  it('finds a tank by name, site and product and opens it from the virtualised list', async () => {
    const { page, context } = await app.open('/');
    context.setDefaultTimeout(60_000);
    await byTestId(page, 'tank-item').first().waitFor();
    await saveOneCheck(page);
    await seedRegister(page, { tanks: 5000, checks: 5000, sites: 250 });
    await page.goto(new URL('/', app.server.url).href);
    await byTestId(page, 'tank-item').first().waitFor();
    const search = byTestId(page, 'tank-search');
    const found = byTestId(page, 'tank-found');
    // The first screen comes before the whole register is read: then every tank is counted.
    await page.locator('[data-testid="tank-found"]', { hasText: '5008 tanks.' }).waitFor();
    // Virtualised: a screen's worth of rows in the DOM, not 5,000.
    expect(await byTestId(page, 'tank-item').count()).toBeLessThan(200);
    // By name: "Register tank 4321" is tank index 4320, the only name with 4321 in it.
    await search.fill('register tank 4321');
    await expect.poll(() => found.textContent()).toContain('1 of 5008 tanks');
    // By site: tank i is at "Customer site (i mod 250) + 1", so site 250 holds i = 249, 499, …,
    // 4999: 20 tanks (no demo tank is at a customer site). Every word typed must be found, in
    // any of name, site and product: "Register tank 2501" … "2509" (i = 2500 … 2508, sites 1 … 9)
    // hold "250" in their names and are found too: 29 in all.
    await search.fill('customer site 250');
    await expect.poll(() => found.textContent()).toContain('29 of 5008 tanks');
    // By product: the demo tanks are copied in turn (i mod 8 = index of the demo tank), so the
    // one demo tank of anhydrous ammonia gives 5000 / 8 = 625 copies, plus the demo tank itself.
    await search.fill('ammonia');
    await expect.poll(() => found.textContent()).toContain('626 of 5008 tanks');

    await search.fill('register tank 4321');
    await page.locator('[data-testid="tank-item"][data-tank-id="reg-4320"] button.open').click();
    await expect
      .poll(() => byTestId(page, 'tank-heading').textContent())
      .toContain('Register tank 4321');
    // Its saved check (check k goes to tank k mod 5000) is in its history.
    await byTestId(page, 'history-item').first().waitFor();
  }, 240_000); // seeding 10,000 records on a loaded 2-core machine
});
