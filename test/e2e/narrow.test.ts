/**
 * Layout on the narrowest phones (320×640 and 360×740): no figure runs over its label (the
 * "exceeded by … psi" headroom and a blend's name did), no word is cut off in a button or a unit
 * box ("Duplicate", "US gal"), and no select shows its chosen text cut short. Checked on every
 * demo tank's check screen, the tank list, the new-tank form and the settings.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { byTestId, useApp } from './harness.js';

const app = useApp();

/** Label/figure pairs (dt and the dd after it) whose boxes overlap, anywhere in the page. */
function overlappingPairs(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const visit = (root: Document | ShadowRoot) => {
      for (const dt of root.querySelectorAll('dt')) {
        const dd = dt.nextElementSibling;
        if (!dd || dd.tagName !== 'DD') continue;
        const a = dt.getBoundingClientRect();
        const b = dd.getBoundingClientRect();
        const apart =
          a.right <= b.left + 0.5 ||
          b.right <= a.left + 0.5 ||
          a.bottom <= b.top + 0.5 ||
          b.bottom <= a.top + 0.5;
        if (!apart) out.push(`${dt.textContent?.trim()} | ${dd.textContent?.trim()}`);
        // Text running out of its own box lies over the other one.
        for (const cell of [dt, dd])
          if (cell.scrollWidth > cell.clientWidth + 1)
            out.push(`${cell.textContent?.trim()} runs out`);
      }
      for (const el of root.querySelectorAll('*')) if (el.shadowRoot) visit(el.shadowRoot);
    };
    visit(document);
    return out;
  });
}

/** Buttons, unit boxes and selects whose text does not fit in them. */
function cutWords(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const ctx = document.createElement('canvas').getContext('2d')!;
    const visit = (root: Document | ShadowRoot) => {
      for (const el of root.querySelectorAll<HTMLElement>('button, .unit, select')) {
        const r = el.getBoundingClientRect();
        if (r.width === 0) continue;
        if (el instanceof HTMLSelectElement) {
          const s = getComputedStyle(el);
          ctx.font = `${s.fontWeight} ${s.fontSize} ${s.fontFamily}`;
          const text = el.selectedOptions[0]?.text.trim() ?? '';
          // Room for the text: the box less its padding, borders and the arrow (about 1.5em).
          const room =
            el.clientWidth -
            parseFloat(s.paddingLeft) -
            parseFloat(s.paddingRight) -
            1.5 * parseFloat(s.fontSize);
          if (ctx.measureText(text).width > room) out.push(`select "${text}"`);
        } else if (el.scrollWidth > el.clientWidth + 1)
          out.push(`${el.tagName} "${el.textContent?.trim()}"`);
      }
      for (const el of root.querySelectorAll('*')) if (el.shadowRoot) visit(el.shadowRoot);
    };
    visit(document);
    return out;
  });
}

for (const viewport of [
  { width: 320, height: 640 },
  { width: 360, height: 740 },
]) {
  describe(`at ${viewport.width}×${viewport.height}`, () => {
    it('every demo tank’s check screen: no figure over its label, no cut-off word', async () => {
      const { page } = await app.open('/', { viewport });
      const items = byTestId(page, 'tank-item');
      await items.first().waitFor();
      expect(await cutWords(page), 'tank list').toEqual([]);
      const names = await page.getByRole('button', { name: /^Check / }).allInnerTexts();
      expect(names.length).toBeGreaterThan(3);
      for (let i = 0; i < names.length; i++) {
        await page
          .getByRole('button', { name: /^Check / })
          .nth(i)
          .click();
        await byTestId(page, 'results').waitFor();
        await byTestId(page, 'key-bar').waitFor();
        expect(await overlappingPairs(page), `check screen ${i}`).toEqual([]);
        expect(await cutWords(page), `check screen ${i}`).toEqual([]);
        await byTestId(page, 'nav-tanks').click();
        await items.first().waitFor();
      }
    });

    it('the new-tank form and the settings: no select or unit box cut short', async () => {
      const { page } = await app.open('/', { viewport });
      await byTestId(page, 'tank-item').first().waitFor();
      await byTestId(page, 'tank-add').click();
      await byTestId(page, 'tank-product').waitFor();
      // The longest product name the list offers.
      const longest = await byTestId(page, 'tank-product').evaluate(
        (s: HTMLSelectElement) =>
          [...s.options].reduce((a, o) => (o.text.length > a.text.length ? o : a)).value,
      );
      await byTestId(page, 'tank-product').selectOption(longest);
      const cut = await cutWords(page);
      // A long product name cannot fit a closed select: it is written out in full below it.
      const productCut = cut.filter((c) => c.startsWith('select') && c.includes('propane'));
      if (productCut.length) await byTestId(page, 'tank-product-name').waitFor();
      expect(
        cut.filter((c) => !productCut.includes(c)),
        'new tank',
      ).toEqual([]);
      await byTestId(page, 'nav-settings').click();
      await byTestId(page, 'unit-volume').waitFor();
      expect(await cutWords(page), 'settings').toEqual([]);
    });
  });
}
