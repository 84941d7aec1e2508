/**
 * The answer first, on a 360×740 phone: a driver opens a demo tank, types the liquid
 * temperature and the float gauge, and reads the stop-at percent and the room left (in US
 * gallons at 60 °F, or litres at 15 °C in metric units) without scrolling — also with the
 * on-screen keyboard taking half the screen. The figures are compared with `checkTank` run here
 * on the same input (independent of the screen). And readings have a time: a tank reopened days
 * later starts blank, with the last check dated and one tap to reuse it.
 */
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { checkTank } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { byTestId, cutOffElements, horizontalOverflow, typeInto, useApp } from './harness.js';

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
  peakAir_F: 93,
};
/** The app's default sun allowance (components/types.ts), K. */
const SUN_ALLOWANCE_K = 5;
const VIEW = { width: 360, height: 740 };
/** About half the screen is left with the on-screen keyboard up. */
const KEYBOARD_UP = { width: 360, height: 370 };

function expected(liquidTemperature: number, gaugePercent: number) {
  return checkTank({
    tank: DEMO_HOME.tank,
    product: 'propane',
    liquidTemperature,
    contents: { gaugePercent },
    peakTemperature: toSI('temperature', DEMO_HOME.peakAir_F, 'F') + SUN_ALLOWANCE_K,
    pressureGauge: { accuracy: 0.02 },
  });
}

async function openDemoHome(page: Page): Promise<void> {
  await byTestId(page, 'tank-item').first().waitFor();
  await page.getByRole('button', { name: /^Check Demo: small home tank/ }).click();
  await byTestId(page, 'check-screen').waitFor();
}

async function si(figure: Locator): Promise<number> {
  return Number(await figure.getAttribute('data-si'));
}

/** The figure lies wholly inside the viewport's height (no scrolling needed to read it). */
async function expectInView(page: Page, figure: Locator, height: number, what: string) {
  const box = await figure.boundingBox();
  expect(box, `${what}: not rendered`).not.toBeNull();
  expect(box!.y, `${what}: above the screen`).toBeGreaterThanOrEqual(0);
  expect(box!.y + box!.height, `${what}: below the fold`).toBeLessThanOrEqual(height);
  expect(box!.x + box!.width, `${what}: off to the side`).toBeLessThanOrEqual(VIEW.width);
}

async function useMetric(page: Page): Promise<void> {
  await page.goto(new URL('#/settings', page.url()).href);
  for (const [id, v] of [
    ['unit-temperature', 'C'],
    ['unit-pressure', 'kPag'],
    ['unit-volume', 'L'],
    ['unit-mass', 'kg'],
    ['unit-length', 'cm'],
  ] as const)
    await byTestId(page, id).selectOption(v);
  await page.goto(new URL('#/', page.url()).href);
}

describe('the answer first on a 360×740 phone', () => {
  for (const metric of [false, true]) {
    const units = metric ? 'metric' : 'US';
    it(`typing temperature and gauge shows checkTank’s stop-at percent and room left in view (${units})`, async () => {
      const { page, requests } = await app.open('/');
      await byTestId(page, 'tank-item').first().waitFor();
      if (metric) await useMetric(page);
      await openDemoHome(page);
      const [typedT, T] = metric
        ? ['18', toSI('temperature', 18, 'C')]
        : ['64', toSI('temperature', 64, 'F')];
      const gauge = 85;
      const want = expected(T, gauge);
      const wantRoom = metric
        ? want.fillLimit.roomLeftVolumeAt15C
        : want.fillLimit.roomLeftVolumeAt60F;

      await typeInto(byTestId(page, 'liquid-temperature'), typedT);
      await typeInto(byTestId(page, 'gauge-percent'), String(gauge));
      const stop = byTestId(page, 'key-stop-percent');
      const room = byTestId(page, 'key-room-left-volume');
      await expect.poll(() => si(room), { timeout: 10_000 }).toBe(wantRoom);
      expect(await si(stop)).toBe(want.fillLimit.stopAtGaugePercent);
      // The unit a driver reads: gallons at 60 °F, or litres at 15 °C.
      const bar = (await byTestId(page, 'key-bar').innerText()).replace(/\s+/g, ' ');
      expect(bar).toContain(metric ? '15 °C' : '60 °F');
      expect(await room.innerText()).toMatch(metric ? / L$/ : / US gal$/);
      // 85 % is over this tank's limit at this temperature: worded so, never a negative room.
      expect(wantRoom).toBeLessThan(0);
      expect(bar).toContain('Over the limit by');
      expect(bar).not.toMatch(/[-−]\d/);

      await expectInView(page, stop, VIEW.height, 'stop-at percent');
      await expectInView(page, room, VIEW.height, 'room left');
      // With the keyboard up, the gauge field in focus at the bottom of what is left.
      await page.setViewportSize(KEYBOARD_UP);
      await byTestId(page, 'gauge-percent').focus();
      await byTestId(page, 'gauge-percent').scrollIntoViewIfNeeded();
      await expectInView(page, stop, KEYBOARD_UP.height, 'stop-at percent, keyboard up');
      await expectInView(page, room, KEYBOARD_UP.height, 'room left, keyboard up');
      await page.setViewportSize(VIEW);
      expect(await horizontalOverflow(page)).toBe(0);
      expect(await cutOffElements(page)).toEqual([]);
      expect(requests.errors).toEqual([]);
    });
  }
});

describe('readings have a time', () => {
  it('a tank reopened two days later starts blank with the last check dated, one tap to reuse it', async () => {
    const { page } = await app.open('/');
    await openDemoHome(page);
    const T = toSI('temperature', 70, 'F');
    const gauge = 60;
    const typedFrom = Date.now();
    await typeInto(byTestId(page, 'liquid-temperature'), '70');
    await typeInto(byTestId(page, 'gauge-percent'), String(gauge));
    const want = expected(T, gauge);
    const stop = byTestId(page, 'key-stop-percent');
    await expect.poll(() => si(stop)).toBe(want.fillLimit.stopAtGaugePercent);
    await byTestId(page, 'check-save').click();
    await expect.poll(() => byTestId(page, 'check-status').innerText()).toContain('saved');
    const typedTo = Date.now();

    // Two days on: back to the list and into the same tank.
    await page.clock.setSystemTime(typedTo + 2 * 86_400_000);
    await byTestId(page, 'nav-tanks').click();
    await openDemoHome(page);
    const card = byTestId(page, 'last-check');
    await card.waitFor();
    expect(await byTestId(page, 'liquid-temperature').inputValue()).toBe('');
    expect(await byTestId(page, 'gauge-percent').inputValue()).toBe('');
    expect(await byTestId(page, 'key-stop-percent').count()).toBe(0);
    const at = Date.parse((await card.getAttribute('data-at'))!);
    expect(at).toBeGreaterThanOrEqual(typedFrom - 1000);
    expect(at).toBeLessThanOrEqual(typedTo + 1000);
    const text = (await card.innerText()).replace(/\s+/g, ' ');
    expect(text).toContain('Last check,');
    expect(text).toContain('2 days ago');
    expect(text).toContain('70.0 °F');

    await byTestId(page, 'last-check-reuse').click();
    await expect
      .poll(() => si(byTestId(page, 'key-stop-percent')))
      .toBe(want.fillLimit.stopAtGaugePercent);
    expect(await byTestId(page, 'key-stale').innerText()).toContain('2 days old');
    expect(await byTestId(page, 'readings-age').innerText()).toContain('not now');
  });
});
