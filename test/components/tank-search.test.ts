/// <reference types="mocha" />
// The register at scale (components/tank-list.ts): 5,000 invented placeholder tanks (not demo
// data) are drawn virtualised — only rows near the screen are in the DOM — and the search box
// finds a tank by its name, its site or its product as you type; a found tank still opens.
// Expected hits are worked out by hand from how the fixture is built below.
import { expect, fixture, html, oneEvent, waitUntil } from '@open-wc/testing';
import '../../components/tank-list.js';
import type { TankList } from '../../components/tank-list.js';
import type { TankRecord } from '../../components/types.js';
import { deepAll, typeText } from './dom.js';

// Tank i: "Tank i", at "Yard X" with X the (i mod 26)-th letter, product ammonia for i mod 7 = 0, else propane,
// except tank 4321 which holds butane (the only butane tank).
function tanks(n: number): TankRecord[] {
  return Array.from({ length: n }, (_, i) => ({
    id: `t${i}`,
    name: `Tank ${i}`,
    site: `Yard ${String.fromCharCode(65 + (i % 26))}`,
    notes: '',
    nameplate: { waterCapacity: 1, designPressureGauge: 1.7e6 },
    productId: i === 4321 ? 'n-butane' : i % 7 === 0 ? 'ammonia' : 'propane',
    demo: false,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  })) as TankRecord[];
}

// The virtualiser resizes rows from a ResizeObserver callback; Chromium then reports "ResizeObserver
// loop completed with undelivered notifications" as a window error (a notice that the rest comes
// next frame, harmless by the spec). It is not a failure of the page.
window.addEventListener(
  'error',
  (e) => {
    if (e.message?.includes('ResizeObserver loop')) e.stopImmediatePropagation();
  },
  true,
);

const items = (el: Element) => deepAll(el, '[data-testid="tank-item"]');
const search = (el: TankList) =>
  el.shadowRoot!.querySelector<HTMLInputElement>('[data-testid="tank-search"]')!;
const found = (el: TankList) =>
  el.shadowRoot!.querySelector('[data-testid="tank-found"]')!.textContent!.trim();

describe('tank-list at scale', () => {
  it('draws 5,000 tanks virtualised and finds one by name, site or product as you type', async function () {
    this.timeout(60_000);
    const all = tanks(5000);
    const el = await fixture<TankList>(html`<tank-list .tanks=${all}></tank-list>`);
    await waitUntil(() => items(el).length > 0, 'first rows', { timeout: 30_000 });
    // A phone screen's worth of rows, not 5,000.
    expect(items(el).length).to.be.within(1, 200);

    typeText(search(el), 'tank 4321');
    await waitUntil(() => found(el).startsWith('1 of 5000'), 'name search', { timeout: 30_000 });
    await waitUntil(() => items(el).length === 1);
    expect(items(el)[0]!.dataset.tankId).to.equal('t4321');

    // Yard Q (i mod 26 = 16) holds tanks 16, 42, …, 4982: 192 tanks. No name or product label
    // holds a "q", so the words "yard" and "q" find only these.
    typeText(search(el), 'yard q');
    await waitUntil(() => found(el).startsWith('192 of 5000'), 'site search', { timeout: 30_000 });

    // Butane: only tank 4321.
    typeText(search(el), 'butane');
    await waitUntil(() => found(el).startsWith('1 of 5000'), 'product search', { timeout: 30_000 });
    await waitUntil(() => items(el)[0]?.dataset.tankId === 't4321');

    // Ammonia: i mod 7 = 0 for i < 5000 → 715 tanks (0, 7, …, 4998).
    typeText(search(el), 'ammonia');
    await waitUntil(() => found(el).startsWith('715 of 5000'), 'ammonia search', {
      timeout: 30_000,
    });

    // A found tank still opens.
    typeText(search(el), 'tank 4321');
    await waitUntil(() => items(el).length === 1);
    const opened = oneEvent(el, 'tank-open');
    items(el)[0]!.querySelector<HTMLButtonElement>('button.open')!.click();
    expect((await opened).detail).to.deep.equal({ id: 't4321' });
  });

  it('draws a short register whole, every tank in the DOM', async () => {
    const el = await fixture<TankList>(html`<tank-list .tanks=${tanks(8)}></tank-list>`);
    expect(items(el).length).to.equal(8);
    expect(found(el)).to.equal('8 tanks.');
  });

  it('shows a first screen while the rest is read, then the whole register', async () => {
    // The first screen as the shell reads it: every tank of the first site in the list's order
    // (Yard A: tanks 0, 26, 52, …, 4992, i.e. 193 tanks; here the 4 of tanks(100): 0, 26, 52, 78).
    const all = tanks(100);
    const first = all.filter((t) => t.site === 'Yard A');
    const el = await fixture<TankList>(
      html`<tank-list .tanks=${first} .partial=${true}></tank-list>`,
    );
    expect(found(el)).to.equal('Reading the rest of the register…');
    expect(items(el).map((i) => i.dataset.tankId)).to.deep.equal(['t0', 't26', 't52', 't78']);
    el.tanks = all;
    el.partial = false;
    await waitUntil(() => found(el) === '100 tanks.', 'whole register');
    typeText(search(el), 'yard z'); // tanks 25, 51, 77: not on the first screen
    await waitUntil(() => found(el).startsWith('3 of 100'), 'a tank of the rest found');
  });

  it('finds a tank added and no longer finds one deleted (the search follows the register)', async () => {
    const all = tanks(100);
    const el = await fixture<TankList>(html`<tank-list .tanks=${all}></tank-list>`);
    typeText(search(el), 'tank 99');
    await waitUntil(() => found(el).startsWith('1 of 100'), 'tank 99');
    // The shell hands a new array after every change.
    el.tanks = [...all, { ...all[0]!, id: 't-new', name: 'Tank 990' }];
    await waitUntil(() => found(el).startsWith('2 of 101'), 'added tank found');
    el.tanks = all.filter((t) => t.id !== 't99');
    await waitUntil(() => found(el).startsWith('0 of 99'), 'deleted tank gone');
    expect(items(el)).to.have.length(0);
  });
});
