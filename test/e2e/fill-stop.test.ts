/**
 * The demo ammonia nurse tank, end to end on a 360×740 phone: the stop-at percent shown is at or
 * below the rule's volume limit, and the line saying why is on screen. The nurse tank is an
 * invented demo scenario (pwa/demo.ts): an uninsulated DOT cargo tank, liquid at 72 °F.
 * Limit: 87.5 % by volume, 49 CFR 173.315(a) table and Note 5 (CFR 2015 ed.; copied in
 * test/reference/trade/filling_density_other.csv), below the 56 % weight limit (~91.9 % here).
 */
import { describe, expect, it } from 'vitest';
import { byTestId, cutOffElements, horizontalOverflow, useApp } from './harness.js';

const app = useApp();
const NOTE_5_VOLUME_PERCENT = 87.5;

describe('demo nurse tank', () => {
  it('stops at or below the 87.5 % volume limit and says the volume limit binds', async () => {
    const { page, requests } = await app.open('/');
    await byTestId(page, 'tank-item').first().waitFor();
    await page.getByRole('button', { name: /^Check Demo: ammonia nurse tank/ }).click();
    const stop = byTestId(page, 'fill-stop-percent');
    await stop.waitFor();
    const si = Number(await stop.getAttribute('data-si'));
    expect(si).toBeGreaterThan(0);
    expect(si).toBeLessThanOrEqual(NOTE_5_VOLUME_PERCENT);
    expect(await stop.textContent()).toContain('87.5');
    const why = byTestId(page, 'fill-stop-why');
    await why.waitFor({ state: 'visible' });
    expect(await why.textContent()).toContain('volume limit at this temperature');
    expect(await byTestId(page, 'fill-binding').getAttribute('data-si')).toBe('nh3-cargo-volume');
    // The key bar repeats the same stop.
    await expect.poll(() => byTestId(page, 'key-bar').textContent()).toContain('87.5');
    expect(await horizontalOverflow(page)).toBe(0);
    expect(await cutOffElements(page)).toEqual([]);
    expect(requests.errors).toEqual([]);
  });
});
