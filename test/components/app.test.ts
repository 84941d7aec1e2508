/// <reference types="mocha" />
// <tankside-app> end to end inside one page, each test on its own random database: first start
// (demo site), routes, create a tank and save a check that survives a "reload" (a new app element
// on the same database), backup export → clear → import, and the field-use rules (48 px targets,
// no sideways scroll at 320 px). Kind: behaviour.
import { expect, fixtureSync, html, waitUntil } from '@open-wc/testing';
import { deleteDB } from 'idb';
import '../../pwa/tankside-app.js';
import type { TanksideApp } from '../../pwa/tankside-app.js';
import { Store } from '../../pwa/storage.js';
import { byTestId, deep, deepAll, settleAll, typeText } from './dom.js';

const names: string[] = [];
function dbName(): string {
  const n = `app-test-${Math.random().toString(36).slice(2)}`;
  names.push(n);
  return n;
}

after(async () => {
  location.hash = '';
  for (const n of names) await deleteDB(n).catch(() => undefined);
});

async function start(db: string, width = 360): Promise<TanksideApp> {
  // fixtureSync: the async fixture waits an animation frame for a plain <div>, and a page that
  // runs in the background (test files run two at a time) gets no animation frames.
  const wrap = fixtureSync<HTMLDivElement>(
    html`<div style="width:${width}px"><tankside-app db-name=${db}></tankside-app></div>`,
  );
  const app = wrap.querySelector('tankside-app')!;
  await waitUntil(() => byTestIdOrNull(app, 'app')?.dataset.ready === 'true', 'app ready', {
    timeout: 5000,
  });
  await settleAll(app.shadowRoot!);
  return app;
}

function byTestIdOrNull(el: Element, id: string): HTMLElement | null {
  return deep(el, `[data-testid="${id}"]`);
}

async function go(app: TanksideApp, hash: string): Promise<void> {
  location.hash = hash;
  await new Promise((r) => setTimeout(r, 30));
  await settleAll(app.shadowRoot!);
}

async function waitFor(app: TanksideApp, id: string): Promise<HTMLElement> {
  await waitUntil(() => byTestIdOrNull(app, id) !== null, `[data-testid=${id}]`, { timeout: 5000 });
  await settleAll(app.shadowRoot!);
  return byTestId(app, id);
}

describe('tankside-app', () => {
  beforeEach(() => {
    location.hash = '';
  });

  it('tankside-app shows the invented demo site on first start, once', async () => {
    const db = dbName();
    const app = await start(db);
    const items = deepAll(app, '[data-testid="tank-item"]');
    // Six tanks at the invented yard, two cylinders on the invented refrigeration van (pwa/demo.ts).
    expect(items).to.have.length(8);
    expect(items.every((i) => i.dataset.demo === 'true')).to.equal(true);
    // Clear the demo; a restart does not bring it back.
    byTestId(app, 'demo-clear').click();
    // It asks once before removing anything.
    const yes = (await waitFor(app, 'confirm-yes')) as HTMLButtonElement;
    expect(deepAll(app, '[data-testid="tank-item"]')).to.have.length(8);
    yes.click();
    await waitUntil(() => deepAll(app, '[data-testid="tank-item"]').length === 0, 'demo cleared');
    app.parentElement!.remove();
    const again = await start(db);
    expect(deepAll(again, '[data-testid="tank-item"]')).to.have.length(0);
  });

  it('tankside-app opens a demo tank with results at once and keeps the standing caution in view', async () => {
    const app = await start(dbName());
    const item = deepAll(app, '[data-testid="tank-item"]').find((i) =>
      i.dataset.tankId!.startsWith('demo-lpg-home-'),
    )!;
    item.querySelector<HTMLButtonElement>('button.open')!.click();
    const fill = await waitFor(app, 'fill-limit');
    expect(Number(fill.dataset.si)).to.be.greaterThan(0);
    expect(byTestId(app, 'standing-caution').textContent).to.contain('never replace');
    expect(byTestId(app, 'key-bar').textContent).to.contain('site procedures');
    expect(location.hash).to.match(/^#\/tank\/demo-lpg-home-/);
  });

  it('tankside-app creates a tank, saves a check, and both are there after a reload', async () => {
    const db = dbName();
    let app = await start(db);
    byTestId(app, 'tank-add').click();
    await waitFor(app, 'tank-name');
    typeText(byTestId(app, 'tank-name') as HTMLInputElement, 'Bench tank');
    typeText(byTestId(app, 'tank-site') as HTMLInputElement, 'Test site');
    typeText(byTestId(app, 'tank-water-capacity') as HTMLInputElement, '250');
    typeText(byTestId(app, 'tank-design-pressure') as HTMLInputElement, '250');
    await settleAll(app.shadowRoot!);
    byTestId(app, 'tank-save').click();
    const temp = (await waitFor(app, 'liquid-temperature')) as HTMLInputElement;
    typeText(temp, '50');
    typeText(byTestId(app, 'gauge-percent') as HTMLInputElement, '40');
    await settleAll(app.shadowRoot!);
    const save = await waitFor(app, 'check-save');
    expect((save as HTMLButtonElement).disabled).to.equal(false);
    save.click();
    await waitUntil(
      () => deepAll(app, '[data-testid="history-item"]').length === 1,
      'check in history',
      { timeout: 5000 },
    );
    const tankId = decodeURIComponent(location.hash.split('/')[2]!);

    // Reload: a fresh app element on the same database.
    app.parentElement!.remove();
    location.hash = '';
    app = await start(db);
    const mine = deepAll(app, '[data-testid="tank-item"]').find((i) => i.dataset.tankId === tankId);
    expect(mine, 'the new tank is listed').to.not.equal(undefined);
    await go(app, `#/tank/${tankId}`);
    await waitFor(app, 'history-item');
    expect(deepAll(app, '[data-testid="history-item"]')).to.have.length(1);
    // The draft kept the readings too.
    expect((byTestId(app, 'liquid-temperature') as HTMLInputElement).value).to.equal('50');
  });

  it('tankside-app exports a backup, clears everything, and the import brings it all back', async () => {
    const db = dbName();
    const app = await start(db);
    await go(app, '#/data');
    let blob: Blob | null = null;
    const original = URL.createObjectURL;
    URL.createObjectURL = (b: Blob | MediaSource) => {
      blob = b as Blob;
      return 'blob:stub';
    };
    try {
      (await waitFor(app, 'backup-export')).click();
      await waitUntil(() => blob !== null, 'export written');
    } finally {
      URL.createObjectURL = original;
    }
    const before = await (await Store.open(db)).exportAll();
    byTestId(app, 'data-clear').click();
    await settleAll(app.shadowRoot!);
    byTestId(app, 'data-clear-confirm').click();
    await waitUntil(async () => (await (await Store.open(db)).listTanks()).length === 0, 'cleared');
    // The app has finished clearing (its message is up) before the next file comes in.
    await waitUntil(
      () => (byTestIdOrNull(app, 'data-message')?.textContent ?? '').includes('were deleted'),
      'cleared message',
    );

    // A foreign file is refused and changes nothing.
    const panel = deep(app, 'backup-panel')!;
    panel.dispatchEvent(
      new CustomEvent('backup-import', {
        detail: { file: new File(['{"a":1}'], 'x.json') },
        bubbles: true,
        composed: true,
      }),
    );
    await waitUntil(
      () => (byTestIdOrNull(app, 'data-message')?.textContent ?? '').includes('not a backup'),
      'refused',
    );
    expect((await (await Store.open(db)).listTanks()).length).to.equal(0);

    const file = new File([await blob!.text()], 'backup.json', { type: 'application/json' });
    panel.dispatchEvent(
      new CustomEvent('backup-import', { detail: { file }, bubbles: true, composed: true }),
    );
    await waitUntil(
      () => (byTestIdOrNull(app, 'data-message')?.textContent ?? '').includes('Imported'),
      'imported',
    );
    const after = await (await Store.open(db)).exportAll();
    const byId = <T extends { id: string }>(l: T[]) =>
      [...l].sort((a, b) => a.id.localeCompare(b.id));
    expect(byId(after.tanks)).to.deep.equal(byId(before.tanks));
    expect(byId(after.checks)).to.deep.equal(byId(before.checks));
  });

  it('tankside-app offers an update and reloads only when asked', async () => {
    const app = await start(dbName());
    let applied = 0;
    app.offerUpdate(() => applied++);
    await settleAll(app.shadowRoot!);
    const notice = byTestId(app, 'notice');
    expect(notice.dataset.kind).to.equal('update');
    expect(notice.textContent).to.contain('A new version is ready — reload when you’re done');
    expect(applied).to.equal(0);
    byTestId(app, 'notice-action').click();
    expect(applied).to.equal(1);
  });

  it('tankside-app says once that it works offline', async () => {
    const db = dbName();
    const app = await start(db);
    await app.offlineReady();
    await settleAll(app.shadowRoot!);
    expect(
      deepAll(app, '[data-testid="notice"]').some((n) => n.dataset.kind === 'offline-ready'),
    ).to.equal(true);
    app.parentElement!.remove();
    const again = await start(db);
    await again.offlineReady();
    await settleAll(again.shadowRoot!);
    expect(
      deepAll(again, '[data-testid="notice"]').some((n) => n.dataset.kind === 'offline-ready'),
    ).to.equal(false);
  });

  it('tankside-app deletes a tank with its checks and undoes it on request', async () => {
    const db = dbName();
    const app = await start(db);
    const first = deepAll(app, '[data-testid="tank-item"]')[0]!;
    const id = first.dataset.tankId!;
    first.querySelector<HTMLButtonElement>('[data-testid="tank-delete"]')!.click();
    await waitUntil(
      () => !deepAll(app, '[data-testid="tank-item"]').some((i) => i.dataset.tankId === id),
      'deleted',
    );
    const notice = await waitFor(app, 'notice');
    expect(notice.dataset.kind).to.equal('undo');
    byTestId(app, 'notice-action').click();
    await waitUntil(
      () => deepAll(app, '[data-testid="tank-item"]').some((i) => i.dataset.tankId === id),
      'restored',
    );
    expect((await (await Store.open(db)).getDraft(id))?.tankId).to.equal(id);
  });

  it('tankside-app duplicates a tank as a new, non-demo tank and opens it for editing', async () => {
    const app = await start(dbName());
    const first = deepAll(app, '[data-testid="tank-item"]')[0]!;
    first.querySelector<HTMLButtonElement>('[data-testid="tank-duplicate"]')!.click();
    const name = (await waitFor(app, 'tank-name')) as HTMLInputElement;
    expect(name.value).to.match(/\(copy\)$/);
    expect(location.hash).to.match(/\/edit$/);
  });

  it('tankside-app keeps a half-typed new tank when a notice re-renders the shell', async () => {
    const app = await start(dbName());
    await go(app, '#/tank/new');
    typeText((await waitFor(app, 'tank-name')) as HTMLInputElement, 'Half typed');
    await app.offlineReady();
    app.offerUpdate(() => undefined);
    await settleAll(app.shadowRoot!);
    expect((byTestId(app, 'tank-name') as HTMLInputElement).value).to.equal('Half typed');
  });

  it('tankside-app says when a tank in a link does not exist', async () => {
    const app = await start(dbName());
    await go(app, '#/tank/no-such-tank');
    expect((await waitFor(app, 'not-found')).textContent).to.contain('Tank not found');
  });

  for (const hash of ['#/', 'demo', '#/tank/new', '#/settings', '#/data']) {
    it(`tankside-app at 320 px wide: no sideways scroll and every target at least 48 px (${hash})`, async () => {
      const app = await start(dbName(), 320);
      if (hash === 'demo') {
        deepAll(app, '[data-testid="tank-item"] button.open')[0]!.click();
        await waitFor(app, 'fill-limit');
        await new Promise((r) => setTimeout(r, 300)); // the chart
      } else await go(app, hash);
      await settleAll(app.shadowRoot!);
      const host = app.parentElement!;
      expect(host.scrollWidth, 'no overflow to the side').to.be.at.most(320);
      const small: string[] = [];
      for (const el of deepAll(app, 'button, a, select, input, textarea, summary')) {
        if (el.closest('.visually-hidden') || el.classList.contains('visually-hidden')) continue;
        const target =
          el instanceof HTMLInputElement && (el.type === 'checkbox' || el.type === 'radio')
            ? (el.closest('label') ?? el)
            : el;
        const r = target.getBoundingClientRect();
        if (r.width === 0 && r.height === 0) continue; // not shown
        if (r.height < 47.5 || r.width < 47.5)
          small.push(
            `${el.tagName} "${(target.textContent ?? '').trim().slice(0, 30)}" ${r.width.toFixed(0)}×${r.height.toFixed(0)}`,
          );
      }
      expect(small, 'targets under 48 px').to.deep.equal([]);
    });
  }
});
