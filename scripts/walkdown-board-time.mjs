/* global document, indexedDB, location, requestAnimationFrame -- run inside the page by playwright */
// Measures how long the site board takes to appear (every tank by name, "working…"), to show its
// first computed rows and all of them (ranked) for a site of 6 and of 200 tanks, in the
// built app (dist/) in headless Chromium at 4× CPU throttling (a phone-class CPU), and the
// longest main-thread task while it fills in. Run by hand after `npm run build`:
//   node scripts/walkdown-board-time.mjs [runs]
// Never a timed test: the figures depend on the machine. The tanks are invented copies of the
// demo tanks' nameplates and readings.
import { serveAndLaunch } from './lib/bench-browser.mjs';

const RUNS = Number(process.argv[2] ?? 3);
const { url, browser, close } = await serveAndLaunch();

/** Copies the demo tanks (with their demo readings) into a site of `n` tanks. */
async function seed(page, site, n) {
  await page.evaluate(
    async ([siteName, count]) => {
      const db = await new Promise((res) => {
        const r = indexedDB.open('tankside');
        r.onsuccess = () => res(r.result);
      });
      const get = (store) =>
        new Promise((res) => {
          const r = db.transaction(store).objectStore(store).getAll();
          r.onsuccess = () => res(r.result);
        });
      const demo = (await get('tanks')).filter((t) => t.demo);
      const drafts = await get('drafts');
      const tx = db.transaction(['tanks', 'drafts'], 'readwrite');
      for (let i = 0; i < count; i++) {
        const t = demo[i % demo.length];
        const d = drafts.find((x) => x.tankId === t.id);
        const id = `bench-${count}-${i}`;
        tx.objectStore('tanks').put({ ...t, id, site: siteName, name: `Bench tank ${i + 1}` });
        tx.objectStore('drafts').put({ ...d, tankId: id, updatedAt: new Date().toISOString() });
      }
      await new Promise((res) => (tx.oncomplete = res));
      db.close();
    },
    [site, n],
  );
}

/** Time from opening the board to its last row, ms, and the longest task meanwhile. */
async function measure(page, site) {
  await page.goto(url);
  await page.waitForSelector('[data-testid=app][data-ready=true]');
  // Load the walkdown chunk once, so the figure is the board's work, not the download.
  await page.evaluate(() => import(document.querySelector('script[type=module]').src));
  return page.evaluate(async (s) => {
    const long = [];
    const obs = new PerformanceObserver((l) =>
      long.push(
        ...l.getEntries().map((e) => [Math.round(e.startTime - start), Math.round(e.duration)]),
      ),
    );
    obs.observe({ type: 'longtask' });
    const start = performance.now();
    let first = null;
    let shown = null;
    document.addEventListener('board-shown', () => (shown ??= performance.now() - start), {
      once: true,
    });
    document.addEventListener('board-first', () => (first ??= performance.now() - start), {
      once: true,
    });
    const done = new Promise((res) =>
      document.addEventListener('board-ready', res, { once: true }),
    );
    location.hash = `#/site/${encodeURIComponent(s)}`;
    await done;
    await new Promise((res) => requestAnimationFrame(() => setTimeout(res, 0)));
    const ms = performance.now() - start;
    obs.disconnect();
    return {
      ms,
      shown: shown ?? ms,
      first: first ?? ms,
      longest: Math.max(0, ...long.map((l) => l[1])),
      long,
    };
  }, site);
}

const results = [];
for (const n of [6, 200]) {
  const context = await browser.newContext({ viewport: { width: 360, height: 740 } });
  const page = await context.newPage();
  await page.goto(url);
  await page.waitForSelector('[data-testid=app][data-ready=true]');
  const site = `Bench site ${n}`;
  await seed(page, site, n);
  const cdp = await context.newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
  const runs = [];
  for (let i = 0; i < RUNS; i++) runs.push(await measure(page, site));
  if (process.env.DEBUG) console.log(JSON.stringify(runs));
  const ms = runs.map((r) => r.ms).sort((a, b) => a - b);
  const median = (k) => runs.map((r) => r[k]).sort((a, b) => a - b)[Math.floor(runs.length / 2)];
  results.push({
    tanks: n,
    boardShownMs: Math.round(median('shown')),
    firstRowsMs: Math.round(
      runs.map((r) => r.first).sort((a, b) => a - b)[Math.floor(runs.length / 2)],
    ),
    allRowsMs: Math.round(ms[Math.floor(ms.length / 2)]),
    allMs: ms.map(Math.round),
    longestTaskMs: Math.round(Math.max(...runs.map((r) => r.longest))),
  });
  await context.close();
}
console.table(results);
await close();
