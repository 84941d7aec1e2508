/**
 * The record of one walkdown prints on one or two pages: the demo site (six invented tanks) walked
 * against 105 °F, every tank checked, one not-reached reason and a note, then printed by headless
 * Chromium to PDF on A4 (210 × 297 mm, ISO 216) and US Letter (8.5 × 11 in, ANSI/ASME Y14.1).
 * The pages are counted from the PDF's page objects (ISO 32000-1:2008 §7.7.3.3: each page is a
 * dictionary of `/Type /Page`). Kind: behaviour (layout); no figure is checked here.
 * Set WALKDOWN_PDF_DIR to keep the PDFs for a look.
 */
import { writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { byTestId, useApp, waitForServiceWorker } from './harness.js';

const app = useApp();

/** Page objects in a PDF: `/Type /Page` not followed by `s` (that is the page tree). */
function pageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g)?.length ?? 0;
}

describe('walkdown report in print', () => {
  it('the demo site’s record prints on one or two A4 and Letter pages, without the app’s chrome', async () => {
    const { page } = await app.open('/', { locale: 'en-US' });
    await byTestId(page, 'tank-item').first().waitFor();
    await waitForServiceWorker(page);
    await byTestId(page, 'walkdown-start').first().click();
    await byTestId(page, 'walkdown-forecast-air').fill('105');
    await byTestId(page, 'walkdown-row').first().waitFor();
    await byTestId(page, 'walkdown-board-progress').waitFor({ state: 'detached' });
    const tanks = await byTestId(page, 'walkdown-row').count();
    expect(tanks).toBe(6);
    await byTestId(page, 'walkdown-begin').click();
    const note = byTestId(page, 'walkdown-note');
    await note.fill('Paint blistered near the relief valve stack');
    await note.blur();
    for (let i = 1; i < tanks; i++) {
      await byTestId(page, 'walkdown-next').click();
      await expect
        .poll(() => byTestId(page, 'walkdown-progress').getAttribute('data-done'))
        .toBe(String(i));
    }
    await page
      .locator('details:has([data-testid="walkdown-skip"])')
      .evaluate((d) => ((d as HTMLDetailsElement).open = true));
    await byTestId(page, 'walkdown-skip-reason').fill('Gate locked, key holder away');
    await byTestId(page, 'walkdown-skip').click();
    await expect
      .poll(() => byTestId(page, 'walkdown-progress').getAttribute('data-done'))
      .toBe(String(tanks));
    await byTestId(page, 'walkdown-checked-by').fill('Test Walker');
    await byTestId(page, 'walkdown-finish').click();
    await byTestId(page, 'walkdown-report').waitFor();
    expect(await byTestId(page, 'walkdown-report-row').count()).toBe(tanks);

    await page.emulateMedia({ media: 'print' });
    // The app's chrome and the report's buttons are not printed.
    expect(await page.locator('header').first().isVisible()).toBe(false);
    expect(await byTestId(page, 'walkdown-print').isVisible()).toBe(false);
    expect(await byTestId(page, 'walkdown-report').isVisible()).toBe(true);
    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await page.pdf({ format, preferCSSPageSize: false });
      const dir = process.env.WALKDOWN_PDF_DIR;
      if (dir) writeFileSync(`${dir}/walkdown-${format}.pdf`, pdf);
      const pages = pageCount(pdf);
      expect(pages, `${format} pages`).toBeGreaterThanOrEqual(1);
      expect(pages, `${format} pages`).toBeLessThanOrEqual(2);
    }
  });
});
