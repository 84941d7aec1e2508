/**
 * A hotter forecast never reads safer, end to end on a 360×740 phone: the demo CO2 cylinder (an
 * invented tank) at 50 °F with the float gauge at 85 % and no sun allowance shows a DANGER at a
 * forecast peak of 87.5 °F (liquid-full) and still at 88.5 °F, past CO2's critical temperature
 * of 87.76 °F (304.1282 K, Span & Wagner 1996; test/reference/fluids.csv), where the tank is full
 * of dense fluid. The cautions are written in °F and psig, with no kelvin.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { byTestId, typeInto, useApp } from './harness.js';

const app = useApp();

async function peakShown(page: Page, peak_F: number): Promise<void> {
  const K = (peak_F - 32) / 1.8 + 273.15;
  await typeInto(byTestId(page, 'peak-air-temperature'), String(peak_F));
  await expect
    .poll(async () =>
      Number(await byTestId(page, 'peak-liquid-temperature').getAttribute('data-si')),
    )
    .toBeCloseTo(K, 6);
}

describe('a hotter forecast never reads safer', () => {
  it('the demo CO2 cylinder shows a danger at 87.5 °F and at 88.5 °F', async () => {
    const { page } = await app.open('/');
    await byTestId(page, 'tank-item').first().waitFor();
    await page.getByRole('button', { name: /^Check Demo: CO2 cylinder/ }).click();
    await byTestId(page, 'contents-mode-gaugePercent').click();
    await typeInto(byTestId(page, 'liquid-temperature'), '50');
    await typeInto(byTestId(page, 'gauge-percent'), '85');
    await typeInto(byTestId(page, 'sun-allowance'), '0');

    await peakShown(page, 87.5);
    const first = page.locator('[data-testid="caution"]').first();
    await expect.poll(() => first.getAttribute('data-level')).toBe('danger');
    expect(await first.getAttribute('data-code')).toBe('liquid-full-at-peak');

    await peakShown(page, 88.5);
    await expect.poll(() => first.getAttribute('data-code')).toBe('dense-fluid-at-peak');
    expect(await first.getAttribute('data-level')).toBe('danger');
    const text = (await first.textContent()) ?? '';
    expect(text).toContain('full of dense fluid');
    expect(text).toContain('88.5 °F');
    expect(text).not.toMatch(/\d\s*K\b/);
  });

  it('with metric settings no caution shows psig, °F, US gal or lb, and none shows kelvin', async () => {
    const { page } = await app.open('/');
    await byTestId(page, 'tank-item').first().waitFor();
    await byTestId(page, 'nav-settings').click();
    for (const [key, unit] of [
      ['pressure', 'kPag'],
      ['temperature', 'C'],
      ['volume', 'L'],
      ['mass', 'kg'],
      ['length', 'cm'],
    ] as const) {
      await byTestId(page, `unit-${key}`).selectOption(unit);
      await expect.poll(() => byTestId(page, `unit-${key}`).inputValue()).toBe(unit);
    }
    await byTestId(page, 'nav-tanks').click();
    await page.getByRole('button', { name: /^Check Demo: CO2 cylinder/ }).click();
    await byTestId(page, 'contents-mode-gaugePercent').click();
    await typeInto(byTestId(page, 'liquid-temperature'), '10');
    await typeInto(byTestId(page, 'gauge-percent'), '85');
    await typeInto(byTestId(page, 'sun-allowance'), '0');
    await typeInto(byTestId(page, 'peak-air-temperature'), '31.5');
    // 31.5 °C is past CO2's critical temperature of 30.98 °C (Span & Wagner 1996).
    const first = page.locator('[data-testid="caution"]').first();
    await expect.poll(() => first.getAttribute('data-code')).toBe('dense-fluid-at-peak');
    const texts = await page.locator('[data-testid="caution"]').allTextContents();
    expect(texts.length).toBeGreaterThan(1);
    for (const t of texts) {
      expect(t).not.toMatch(/psi|°F|US gal|\blb\b/);
      expect(t).not.toMatch(/\d\s*K\b/);
    }
    expect(texts[0]).toContain('31.5 °C');
  });
});
