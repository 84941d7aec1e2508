/**
 * The app's main flows, end to end in the built app on a 360×740 phone: the demo tank offline,
 * a new tank and a saved check that survive a reload, backup export/clear/import, the update and
 * offline notices, and no cut-off content on any screen. Selectors are the components'
 * documented `data-testid`s and accessible names (they pierce shadow roots).
 */
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { checkTank } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import {
  byTestId,
  cutOffElements,
  horizontalOverflow,
  typeInto,
  useApp,
  waitForServiceWorker,
} from './harness.js';

const app = useApp();

/** The demo LP-gas home tank, as pwa/demo.ts describes it (an invented tank). */
const DEMO_HOME = {
  name: 'Demo: small home tank',
  tank: {
    waterCapacity: toSI('volume', 500, 'usgal'),
    designPressureGauge: toSI('gaugePressure', 250, 'psig'),
    placement: 'aboveground' as const,
    containerClass: 'storage' as const,
  },
  product: 'propane',
  gaugePercent: 58,
  peakAir_F: 93,
};
/** The app's default settings (components/types.ts): °F, a 5 K sun allowance, 2 % gauge accuracy. */
const SUN_ALLOWANCE_K = 5;
const GAUGE_ACCURACY = 0.02;

/** The tank list has loaded (the demo site is seeded on first start). */
async function tankList(page: Page): Promise<Locator> {
  const items = byTestId(page, 'tank-item');
  await items.first().waitFor();
  return items;
}

function openTank(page: Page, name: string): Promise<void> {
  return page.getByRole('button', { name: new RegExp(`^Check ${escape(name)}`) }).click();
}

function escape(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

async function siOf(figure: Locator): Promise<number> {
  const raw = await figure.getAttribute('data-si');
  if (raw === null || raw === '') throw new Error('figure has no data-si value');
  return Number(raw);
}

/**
 * Waits until the figure's SI value is `expected` to within `tol` (the figure for the whole
 * typed text: a figure that merely changed may still be the one for its first keys, drawn
 * before the last key arrived), and returns it.
 */
async function settlesAt(figure: Locator, expected: number, tol: number): Promise<number> {
  await expect
    .poll(async () => Math.abs(Number(await figure.getAttribute('data-si')) - expected), {
      timeout: 10_000,
    })
    .toBeLessThan(tol);
  return siOf(figure);
}

async function expectFitsPhone(page: Page, where: string): Promise<void> {
  expect(await horizontalOverflow(page), `${where}: sideways scroll`).toBe(0);
  expect(await cutOffElements(page), `${where}: cut-off elements`).toEqual([]);
}

describe('demo tank offline', () => {
  it('the demo LP-gas tank opens offline and its fill limit follows the temperature exactly as checkTank gives it', async () => {
    const { context, page, requests } = await app.open('/');
    await waitForServiceWorker(page);
    await tankList(page);
    await context.setOffline(true);
    await page.reload();
    await openTank(page, DEMO_HOME.name);

    const fillLimit = byTestId(page, 'fill-limit');
    const stopAt = byTestId(page, 'fill-stop-percent');
    await stopAt.waitFor();
    const before = await stopAt.getAttribute('data-si');

    // The mass limit is set by the filling density; the float-gauge percent to stop at moves
    // with the liquid temperature, so that is the figure to watch.
    const typed_F = 81;
    const expected = checkTank({
      tank: DEMO_HOME.tank,
      product: DEMO_HOME.product,
      liquidTemperature: toSI('temperature', typed_F, 'F'),
      contents: { gaugePercent: DEMO_HOME.gaugePercent },
      peakTemperature: toSI('temperature', DEMO_HOME.peakAir_F, 'F') + SUN_ALLOWANCE_K,
      pressureGauge: { accuracy: GAUGE_ACCURACY },
    });
    await typeInto(byTestId(page, 'liquid-temperature'), String(typed_F));
    // Same code, same inputs, same JS engine family: agreement to rounding noise is expected,
    // so 1e-9 leaves room only for float-to-string round trips, not for a wrong input. Waited
    // for: until the screen shows the figure for "81", not the one for "8" drawn on the way.
    const shownStop = await settlesAt(stopAt, expected.fillLimit.stopAtGaugePercent, 1e-9);
    const shownLimit = await siOf(fillLimit);
    expect(Math.abs(shownLimit / expected.fillLimit.maxMass - 1)).toBeLessThan(1e-9);
    // And it really moved: the same check at the demo's own temperature gives another figure.
    expect(shownStop).not.toBe(Number(before));
    await expect.poll(() => byTestId(page, 'standing-caution').count()).toBe(1);
    expect(requests.errors).toEqual([]);
  });
});

describe('tanks and checks', () => {
  it('a new tank and a saved check are still there after a reload', async () => {
    const { page, requests } = await app.open('/');
    await tankList(page);
    // Start once the first install has settled: typing through it is form-survives.test.ts.
    await waitForServiceWorker(page);
    await page.locator('[data-testid="notice"][data-kind="offline-ready"]').waitFor();
    await byTestId(page, 'tank-add').click();
    await byTestId(page, 'tank-site').fill('E2E yard');
    await byTestId(page, 'tank-name').fill('E2E tank 7');
    await byTestId(page, 'tank-product').selectOption('propane');
    await typeInto(byTestId(page, 'tank-water-capacity'), '250');
    await typeInto(byTestId(page, 'tank-design-pressure'), '250');
    await byTestId(page, 'tank-save').click();

    await expect.poll(() => byTestId(page, 'tank-heading').textContent()).toContain('E2E tank 7');
    await typeInto(byTestId(page, 'liquid-temperature'), '70');
    await typeInto(byTestId(page, 'gauge-percent'), '40');
    await byTestId(page, 'fill-limit').waitFor();
    const limit = await siOf(byTestId(page, 'fill-limit'));
    await byTestId(page, 'check-save').click();
    await expect.poll(() => byTestId(page, 'history-item').count()).toBe(1);

    await page.reload();
    await expect.poll(() => byTestId(page, 'tank-heading').textContent()).toContain('E2E tank 7');
    await expect.poll(() => byTestId(page, 'history-item').count()).toBe(1);
    expect(await byTestId(page, 'history-item').textContent()).toContain('Fill limit');

    await page.goto(new URL('#/', app.server.url).href);
    const names = await (await tankList(page)).allTextContents();
    expect(names.some((n) => n.includes('E2E tank 7'))).toBe(true);
    expect(limit).toBeGreaterThan(0);
    expect(requests.errors).toEqual([]);
  });

  it('export, delete everything, import: every tank is back', async () => {
    const { page, requests } = await app.open('/');
    const names = async () => (await (await tankList(page)).allTextContents()).sort();
    const before = await names();
    expect(before.length).toBeGreaterThan(0);

    await page.goto(new URL('#/data', app.server.url).href);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      byTestId(page, 'backup-export').click(),
    ]);
    const file = join(mkdtempSync(join(tmpdir(), 'tankside-e2e-')), download.suggestedFilename());
    await download.saveAs(file);
    const backup = JSON.parse(readFileSync(file, 'utf8')) as { tanks: unknown[] };
    expect(backup.tanks).toHaveLength(before.length);

    await byTestId(page, 'data-clear').click();
    await byTestId(page, 'data-clear-confirm').click();
    await expect.poll(() => byTestId(page, 'data-message').textContent()).toMatch(/deleted/i);
    await page.goto(new URL('#/', app.server.url).href);
    await expect.poll(() => byTestId(page, 'tank-item').count()).toBe(0);

    await page.goto(new URL('#/data', app.server.url).href);
    await byTestId(page, 'backup-import').setInputFiles(file);
    await expect.poll(() => byTestId(page, 'data-message').textContent()).toMatch(/Imported/);
    await page.goto(new URL('#/', app.server.url).href);
    expect(await names()).toEqual(before);
    expect(requests.errors).toEqual([]);
  });
});

describe('notices', () => {
  it('the first install says once that the app works offline', async () => {
    const { page } = await app.open('/');
    await waitForServiceWorker(page);
    const offlineReady = page.locator('[data-testid="notice"][data-kind="offline-ready"]');
    await offlineReady.waitFor();
    await page.reload();
    await tankList(page);
    await page.waitForTimeout(1000);
    expect(await offlineReady.count()).toBe(0);
  });

  it('a new version is offered and installed only when the user taps reload; typed readings stay until then', async () => {
    const { page } = await app.open('/');
    await waitForServiceWorker(page);
    await openTank(page, DEMO_HOME.name);
    await typeInto(byTestId(page, 'liquid-temperature'), '77');

    app.server.setServiceWorkerSuffix('\n// release 2\n');
    try {
      await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
      const update = page.locator('[data-testid="notice"][data-kind="update"]');
      await update.waitFor({ timeout: 20_000 });
      await page.waitForTimeout(500);
      // Nothing reloaded on its own: the half-typed reading is still in the field.
      expect(await byTestId(page, 'liquid-temperature').inputValue()).toBe('77');

      const navigated = page.waitForEvent('framenavigated');
      await update.getByTestId('notice-action').click();
      await navigated;
      await page.waitForLoadState('load');
      const state = await page.evaluate(async () => {
        const reg = await navigator.serviceWorker.getRegistration();
        return {
          waiting: reg?.waiting ?? null,
          controlled: navigator.serviceWorker.controller !== null,
        };
      });
      expect(state).toEqual({ waiting: null, controlled: true });
    } finally {
      app.server.setServiceWorkerSuffix('');
    }
  });
});

describe('phone layout', () => {
  it('no screen scrolls sideways or cuts content off at 360×740', async () => {
    const { page } = await app.open('/');
    await tankList(page);
    await expectFitsPhone(page, 'tank list');
    await openTank(page, DEMO_HOME.name);
    await byTestId(page, 'fill-limit').waitFor();
    await expectFitsPhone(page, 'check screen');
    for (const [hash, ready] of [
      ['#/tank/new', 'tank-name'],
      ['#/settings', 'unit-temperature'],
      ['#/data', 'backup-export'],
    ] as const) {
      await page.goto(new URL(hash, app.server.url).href);
      await byTestId(page, ready).waitFor();
      await expectFitsPhone(page, hash);
    }
  });
});
