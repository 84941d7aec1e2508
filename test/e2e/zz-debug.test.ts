import { it } from 'vitest';
// @ts-expect-error -- js
import { startSyncServer } from '../../scripts/sync/server.mjs';
// @ts-expect-error -- js
import { setupTeam } from '../../scripts/sync/team-setup.mjs';
import { PHONE, byTestId, launchBrowser, startServer, typeInto } from './harness.js';
it('debug', async () => {
  const sync = await startSyncServer({ port: 0, admin: 'x:y' });
  const dbUrl = await setupTeam({ url: sync.url, admin: 'x:y', team: 'dbg', users: ['ann:pw', 'bob:pw'] });
  const app = await startServer();
  const browser = await launchBrowser();
  const ps = [];
  for (const u of ['ann', 'bob']) {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    page.on('pageerror', (e) => console.log(u, 'PAGEERROR', e.message));
    await page.goto(app.url + '#/data');
    await byTestId(page, 'sync-url').fill(dbUrl);
    await byTestId(page, 'sync-user').fill(u);
    await byTestId(page, 'sync-password').fill('pw');
    await byTestId(page, 'sync-connect').click();
    await page.waitForTimeout(4000);
    ps.push({ page, context });
  }
  const page = ps[0]!.page;
  await page.goto(app.url + '#/tank/new');
  await byTestId(page, 'tank-site').fill('Yard');
  await byTestId(page, 'tank-name').fill('North');
  await byTestId(page, 'tank-product').selectOption('propane');
  await typeInto(byTestId(page, 'tank-water-capacity'), '500');
  await typeInto(byTestId(page, 'tank-design-pressure'), '250');
  await byTestId(page, 'tank-save').click();
  await page.waitForTimeout(4000);
  const id = decodeURIComponent(new URL(page.url()).hash.split('/')[2] ?? '');
  for (const { context } of ps) await context.setOffline(true);
  for (const [i, { page: p }] of ps.entries()) {
    await p.goto(app.url + `#/tank/${id}/edit`);
    await byTestId(p, 'tank-name').fill('North ' + i);
    await byTestId(p, 'tank-save').click();
    await p.waitForTimeout(1500);
  }
  for (const { page: p } of ps) await p.evaluate(() => { window.addEventListener('online', () => console.log('ONLINE EVENT')); });
  for (const { page: p } of ps) p.on('console', (m) => console.log('CONSOLE', m.text()));
  for (const { context } of ps) await context.setOffline(false);
  for (const { page: p } of ps) console.log('ONLINE?', await p.evaluate(async (u) => [navigator.onLine, !!navigator.serviceWorker.controller, await fetch(u, { credentials: 'include' }).then((r) => r.status, (e) => String(e)), await fetch(u + '/_revs_diff', { method: 'POST', credentials: 'include', headers: {'content-type': 'application/json'}, body: '{}' }).then((r) => r.status, (e) => String(e))], dbUrl));
  await page.waitForTimeout(8000);
  const auth = 'Basic ' + Buffer.from('x:y').toString('base64');
  console.log('SERVER', await (await fetch(dbUrl + '/tank%3A' + id + '?conflicts=true', { headers: { authorization: auth } })).text());
  for (const { page: p } of ps) {
    console.log('MARKS', await p.evaluate(async () => new Promise((res) => { const r = indexedDB.open('tankside-sync'); r.onsuccess = () => { const g = r.result.transaction('meta').objectStore('meta').getAll(); g.onsuccess = () => res(JSON.stringify(g.result)); }; })));
    console.log('REPLICA', await p.evaluate(async () => new Promise((res) => { const r = indexedDB.open('_pouch_tankside-team'); r.onsuccess = () => { const names = [...r.result.objectStoreNames]; const g = r.result.transaction('document-store').objectStore('document-store').getAll(); g.onsuccess = () => res(JSON.stringify({names, docs: g.result.map((d: {id: string; rev: string; seq: number; winningRev?: string}) => [d.id, d.winningRev ?? d.rev, d.seq])})); }; })));
    await p.goto(app.url + '#/data');
    console.log(await byTestId(p, 'sync-status').textContent());
  }
  await browser.close(); await app.close(); await sync.close();
}, 160000);
