/**
 * An R-410A recovery cylinder in a 140 °F van, end to end in the built app on a 360×740 phone:
 * the invented demo cylinder opened, readings typed, and the pressure, liquid-full temperature
 * and cautions read off the screen. Expected figures come from the reference table
 * test/reference/blends/r410a.csv (Lemmon & Jacobsen 2004 mixture model), not from the app.
 */
import { describe, expect, it } from 'vitest';
import type { Locator } from 'playwright-core';
import { readTable } from '../reference/measure.js';
import { toSI } from '../../thermo/units.js';
import { byTestId, cutOffElements, horizontalOverflow, typeInto, useApp } from './harness.js';

const app = useApp();
const rows = readTable('blends/r410a.csv');
const ref = (T: number) => rows.find((r) => Math.abs(+r.T_K! - T) < 1e-6)!;
/** The demo cylinder's water capacity (pwa/demo.ts: 6 US gal; an invented cylinder). */
const WC = toSI('volume', 6, 'usgal');
const ATM = 101_325;

async function si(l: Locator): Promise<number> {
  await expect.poll(() => l.getAttribute('data-si'), { timeout: 15_000 }).not.toBe(null);
  return Number(await l.getAttribute('data-si'));
}

describe('R-410A recovery cylinder in a 140 °F van', () => {
  it('shows the bubble pressure now, the liquid-full temperature and the liquid-full caution', async () => {
    const { page, requests } = await app.open('/');
    await page.getByTestId('tank-item').first().waitFor();
    await page.getByRole('button', { name: /^Check Demo: R-410A recovery cylinder/ }).click();
    await byTestId(page, 'result-pressure').waitFor();

    // 95 °F in the cylinder now (308.15 K, a reference row), 42 lb net, the van at 140 °F
    // with no sun allowance on top.
    await typeInto(byTestId(page, 'liquid-temperature'), '95');
    await typeInto(byTestId(page, 'net-mass'), '42');
    await typeInto(byTestId(page, 'sun-allowance'), '0');
    await typeInto(byTestId(page, 'peak-air-temperature'), '140');
    await expect
      .poll(async () => Number(await byTestId(page, 'peak-temperature').getAttribute('data-si')))
      .toBeCloseTo(333.15, 2);

    // Pressure now: the reference bubble pressure at 308.15 K, gauge at the standard barometer.
    const p = await si(byTestId(page, 'result-pressure'));
    const pRef = +ref(308.15).p_bubble_Pa! - ATM;
    expect(Math.abs(p / pRef - 1), `pressure ${p} Pa g vs ${pRef}`).toBeLessThan(0.006);

    // Liquid-full where the reference bubble-line density equals 42 lb in the cylinder
    // (linear between the 328.15 K and 333.15 K rows; the 1 K tolerance is the liquid-full target).
    const rho = toSI('mass', 42, 'lb') / WC;
    const a = ref(328.15);
    const b = ref(333.15);
    const Tlf =
      328.15 +
      (5 * (+a.rhoL_bubble_kg_m3! - rho)) / (+a.rhoL_bubble_kg_m3! - +b.rhoL_bubble_kg_m3!);
    const shown = await si(byTestId(page, 'liquid-full-temperature'));
    expect(Math.abs(shown - Tlf), `liquid-full ${shown} K vs ${Tlf} K`).toBeLessThan(1);

    const codes = await byTestId(page, 'caution').evaluateAll((els) =>
      els.map((e) => e.getAttribute('data-code')),
    );
    expect(codes).toContain('liquid-full-at-peak');
    await expect.poll(() => byTestId(page, 'standing-caution').count()).toBe(1);
    // 80 % of the volume at 95 °F (common practice) is below the not-liquid-full limit at 140 °F.
    expect(await byTestId(page, 'fill-binding').getAttribute('data-si')).toBe('recovery-cylinder');

    expect(await horizontalOverflow(page)).toBe(0);
    expect(await cutOffElements(page)).toEqual([]);
    await page.screenshot({ path: '/tmp/i13x/r410a.png', fullPage: true });
    expect(requests.errors).toEqual([]);
  });
});
