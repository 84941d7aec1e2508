/**
 * A site's own stricter rule end to end on a 360×740 phone: on the demo site's board the user
 * enters a company limit of 80 % by volume; the small home propane tank, opened from the board,
 * stops at 80.0 % and says that this site's own rule sets it. The rule set's own limits for that
 * tank are above 80 % (the LP-gas volume limit of 29 CFR 1910.110(b)(19)(v) at the demo's liquid
 * temperature, checked here with checkTank on the stored readings without the site rule), so 80
 * is the site's figure, not the rule's. The demo readings are invented inputs, never check values.
 */
import { describe, expect, it } from 'vitest';
import { checkTank } from '../../thermo/index.js';
import { productFor } from '../../components/products.js';
import type { Readings, TankRecord } from '../../components/types.js';
import { byTestId, cutOffElements, useApp, waitForServiceWorker } from './harness.js';

const app = useApp();

describe('a site’s own stricter rule', () => {
  it('an 80 % company limit sets the stop at 80.0 % and is named on the check', async () => {
    const { page } = await app.open('/', { locale: 'en-US' });
    await byTestId(page, 'tank-item').first().waitFor();
    await waitForServiceWorker(page);
    await byTestId(page, 'walkdown-start').first().click();
    await byTestId(page, 'walkdown-forecast-air').fill('95');
    await byTestId(page, 'site-max-fill-percent').fill('80');
    // Stored with the site record once the field has taken it.
    await expect
      .poll(() =>
        page.evaluate(async () => {
          const db = await new Promise<IDBDatabase>((res) => {
            const r = indexedDB.open('tankside');
            r.onsuccess = () => res(r.result);
          });
          const sites = await new Promise<{ siteRule?: { maxFillPercent?: number } }[]>((res) => {
            const r = db.transaction('sites').objectStore('sites').getAll();
            r.onsuccess = () => res(r.result as never);
          });
          db.close();
          return sites[0]?.siteRule?.maxFillPercent ?? null;
        }),
      )
      .toBe(80);

    const stored = await page.evaluate(async () => {
      const db = await new Promise<IDBDatabase>((res) => {
        const r = indexedDB.open('tankside');
        r.onsuccess = () => res(r.result);
      });
      const all = (n: string) =>
        new Promise<unknown[]>((res) => {
          const r = db.transaction(n).objectStore(n).getAll();
          r.onsuccess = () => res(r.result);
        });
      const out = { tanks: await all('tanks'), drafts: await all('drafts') };
      db.close();
      return out as { tanks: TankRecord[]; drafts: { tankId: string; readings: Readings }[] };
    });
    const home = stored.tanks.find((t) => t.name === 'Demo: small home tank')!;
    const r = stored.drafts.find((d) => d.tankId === home.id)!.readings;
    // Without the site rule, the rule set's own stop for this tank is above 80 %.
    const own = checkTank({
      tank: home.nameplate,
      product: productFor(home.productId)!,
      liquidTemperature: r.liquidTemperature!,
      contents: { gaugePercent: r.gaugePercent! },
      peakTemperature: r.liquidTemperature!,
    });
    expect(own.fillLimit.stopAtGaugePercent).toBeGreaterThan(80);

    await page
      .locator(`[data-testid="walkdown-row"][data-tank-id="${home.id}"] button.open`)
      .click();
    const stop = byTestId(page, 'key-stop-percent');
    await expect.poll(() => stop.getAttribute('data-si')).toBe('80');
    expect(await stop.textContent()).toContain('80.0 %');
    await byTestId(page, 'key-site-rule').waitFor();
    expect(await byTestId(page, 'fill-binding').getAttribute('data-si')).toBe(
      'site-max-fill-percent',
    );
    const notice = page.locator('[data-testid="caution"][data-code="site-rule-binds"]');
    expect(await notice.textContent()).toContain('Limited by this site’s own rule: 80');
    expect(await cutOffElements(page)).toEqual([]);
  });
});
