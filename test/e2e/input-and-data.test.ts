/**
 * Numbers that cannot be misread, nothing deleted by one tap, and stored data that cannot break
 * the app: end to end in the built app on a 360×740 phone (en-US browser language).
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { checkClose } from '../helpers/check.js';
import { byTestId, horizontalOverflow, typeInto, useApp, waitForServiceWorker } from './harness.js';

const app = useApp();

/** The tank list has loaded and the first install has settled (typing through it is form-survives.test.ts). */
async function tankList(page: Page): Promise<Locator> {
  const items = byTestId(page, 'tank-item');
  await items.first().waitFor();
  await waitForServiceWorker(page);
  await page.locator('[data-testid="notice"][data-kind="offline-ready"]').waitFor();
  return items;
}

async function exportBackup(page: Page): Promise<{
  tanks: { id: string; name: string; demo: boolean; nameplate: { waterCapacity: number } }[];
}> {
  await page.goto(new URL('#/data', app.server.url).href);
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    byTestId(page, 'backup-export').click(),
  ]);
  const file = join(mkdtempSync(join(tmpdir(), 'tankside-e2e-')), download.suggestedFilename());
  await download.saveAs(file);
  return JSON.parse(readFileSync(file, 'utf8'));
}

describe('numbers', () => {
  it('"1,000" US gal typed as a water capacity saves a 1000 US gal tank, not a 1 US gal one', async () => {
    const { page, requests } = await app.open('/', { locale: 'en-US' });
    await tankList(page);
    await byTestId(page, 'tank-add').click();
    await byTestId(page, 'tank-name').fill('Thousand');
    await typeInto(byTestId(page, 'tank-water-capacity'), '1,000');
    await typeInto(byTestId(page, 'tank-design-pressure'), '250');
    await byTestId(page, 'tank-save').click();
    await expect.poll(() => byTestId(page, 'tank-heading').textContent()).toContain('Thousand');
    const backup = await exportBackup(page);
    const t = backup.tanks.find((x) => x.name === 'Thousand')!;
    checkClose({
      what: 'water capacity saved for "1,000" US gal',
      input: '1,000 US gal',
      actual: t.nameplate.waterCapacity,
      expected: 3.785411784, // 1000 × 231 in³ × 0.0254³ m³/in³
      rtol: 1e-9,
      kind: 'published',
      source: 'NIST SP 811 (2008) App. B: 1 US gal = 231 in³, 1 in = 0.0254 m (exact)',
      why: 'exact definitions; JSON round trip only',
    });
    expect(requests.errors).toEqual([]);
  });

  it('a 1 US gal storage tank is asked about, not saved silently', async () => {
    const { page } = await app.open('/', { locale: 'en-US' });
    await tankList(page);
    await byTestId(page, 'tank-add').click();
    await byTestId(page, 'tank-name').fill('Tiny');
    await typeInto(byTestId(page, 'tank-water-capacity'), '1.000');
    await typeInto(byTestId(page, 'tank-design-pressure'), '250');
    const ask = page.getByText('1 US gal is unusual for a storage tank');
    await ask.waitFor();
    expect(await ask.textContent()).toContain('Did you mean 1000 US gal?');
    await byTestId(page, 'tank-save').click();
    // Still on the form: nothing was saved.
    await expect.poll(() => byTestId(page, 'tank-water-capacity').count()).toBe(1);
    expect(await byTestId(page, 'tank-heading').count()).toBe(0);
    expect(await horizontalOverflow(page), 'sideways scroll on the form').toBe(0);
  });
});

describe('numbers in other formats', () => {
  it('with a German browser "1,000" L is refused as ambiguous and "1.000" L is one thousand', async () => {
    const { page } = await app.open('/', { locale: 'de-DE' });
    await tankList(page);
    await page.goto(new URL('#/settings', app.server.url).href);
    await byTestId(page, 'unit-volume').selectOption('L');
    await page.goto(new URL('#/tank/new', app.server.url).href);
    const wc = byTestId(page, 'tank-water-capacity');
    await typeInto(wc, '1,000');
    await expect.poll(() => wc.getAttribute('aria-invalid')).toBe('true');
    await page.getByText('is ambiguous').waitFor();
    await typeInto(wc, '1.000');
    await expect.poll(() => wc.getAttribute('aria-invalid')).toBe('false');
    expect(await horizontalOverflow(page), 'sideways scroll on the form').toBe(0);
  });

  it('"1,000" °F on the check screen is not read as 1 °F', async () => {
    const { page } = await app.open('/', { locale: 'en-US' });
    await tankList(page);
    await byTestId(page, 'tank-item').first().locator('button').first().click();
    const t = byTestId(page, 'liquid-temperature');
    await t.waitFor();
    await typeInto(t, '1,000');
    await expect.poll(() => t.getAttribute('aria-invalid')).toBe('true');
    // 1000 °F is above the engine's 400 K (260 °F): refused with the range, never 1 °F.
    await page.getByText(/Liquid temperature must be from/).waitFor();
  });
});

describe('clearing', () => {
  it('clearing the demo asks once, can be undone, and keeps a demo tank the user edited', async () => {
    const { page, requests } = await app.open('/');
    const items = await tankList(page);
    const total = await items.count();
    // Six tanks at the invented yard and two cylinders on the invented van (pwa/demo.ts).
    expect(total).toBe(8);
    // Make one demo tank the user's own by editing it.
    const first = items.first();
    await first.getByTestId('tank-edit').click();
    await byTestId(page, 'tank-name').fill('My own home tank');
    await byTestId(page, 'tank-save').click();
    await expect.poll(() => byTestId(page, 'tank-heading').textContent()).toContain('My own');
    await page.goto(new URL('#/data', app.server.url).href);

    await byTestId(page, 'demo-clear').click();
    await byTestId(page, 'confirm-bar').waitFor();
    expect(await byTestId(page, 'confirm-bar').textContent()).toContain('Remove the invented demo');
    await byTestId(page, 'confirm-yes').click();
    await page.goto(new URL('#/', app.server.url).href);
    await expect.poll(() => byTestId(page, 'tank-item').count()).toBe(1);
    expect(await byTestId(page, 'tank-item').textContent()).toContain('My own home tank');
    expect(await byTestId(page, 'tank-item').getAttribute('data-demo')).toBe('false');

    // Undo puts the seven demo tanks back.
    await page.locator('[data-testid="notice"][data-kind="undo"]').waitFor();
    await byTestId(page, 'notice-action').click();
    await expect.poll(() => byTestId(page, 'tank-item').count()).toBe(total);
    expect(requests.errors).toEqual([]);
  });

  it('"Keep them" clears nothing', async () => {
    const { page } = await app.open('/');
    const total = await (await tankList(page)).count();
    await page.goto(new URL('#/data', app.server.url).href);
    await byTestId(page, 'demo-clear').click();
    await byTestId(page, 'confirm-no').click();
    await expect.poll(() => byTestId(page, 'confirm-bar').count()).toBe(0);
    await page.goto(new URL('#/', app.server.url).href);
    await expect.poll(() => byTestId(page, 'tank-item').count()).toBe(total);
  });
});

describe('stored data', () => {
  it('a backup with ids "__proto__" and "constructor" imports without blanking the tank list', async () => {
    const { page, requests } = await app.open('/');
    const before = await (await tankList(page)).count();
    const stamp = '2024-01-01T00:00:00.000Z';
    const tank = (id: string) => ({
      id,
      site: 'Odd ids',
      name: `Tank ${id}`,
      notes: '',
      nameplate: { waterCapacity: 2, designPressureGauge: 1.8e6 },
      productId: 'propane',
      demo: false,
      createdAt: stamp,
      updatedAt: stamp,
    });
    const file = join(mkdtempSync(join(tmpdir(), 'tankside-e2e-')), 'odd.json');
    writeFileSync(
      file,
      JSON.stringify({
        format: 'tankside-backup',
        version: 1,
        exportedAt: stamp,
        tanks: [tank('__proto__'), tank('constructor'), tank('toString')],
        checks: [],
        settings: null,
      }),
    );
    await page.goto(new URL('#/data', app.server.url).href);
    await byTestId(page, 'backup-import').setInputFiles(file);
    await expect.poll(() => byTestId(page, 'data-message').textContent()).toMatch(/Imported 3/);
    await page.goto(new URL('#/', app.server.url).href);
    await expect.poll(() => byTestId(page, 'tank-item').count()).toBe(before + 3);
    await page.reload();
    await expect.poll(() => byTestId(page, 'tank-item').count()).toBe(before + 3);
    for (const id of ['__proto__', 'constructor', 'toString'])
      expect(await page.getByText(`Tank ${id}`, { exact: true }).count()).toBe(1);
    expect(requests.errors).toEqual([]);
  });
});
