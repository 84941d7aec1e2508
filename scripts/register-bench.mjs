/* global location, requestAnimationFrame, window -- run inside the page by playwright */
// A register of 5,000 invented tanks and 5,000 checks in the built app (dist/), in headless
// Chromium on a 360×740 phone page at 4× CPU throttling: how long the list takes to show its
// first screen when opened from a tank, how long a reload takes to show it, the frames while it
// scrolls, and a search as you type. Run after `npm run build`:
//   node scripts/register-bench.mjs [runs] [dist-dir]
// (dist-dir: another build to time instead, e.g. of an earlier commit, for before and after.)
// Reported figures, never a timed test (they depend on the machine and its load).
import { serveAndLaunch } from './lib/bench-browser.mjs';
import { saveOneCheck, seedRegister } from './lib/register-seed.mjs';

const RUNS = Number(process.argv[2] ?? 3);
const outDir = process.argv[3] ?? 'dist';
const { url, browser, close } = await serveAndLaunch(outDir);
const PHONE = { viewport: { width: 360, height: 740 }, deviceScaleFactor: 2, isMobile: true };
const median = (xs) => xs.slice().sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];
const FIRST_ROW = '[data-testid=tank-item]';

/** ms from `start` (page time) until a tank row is painted. */
async function untilFirstRow(page) {
  await page.locator(FIRST_ROW).first().waitFor({ timeout: 300_000 });
  return page.evaluate(
    () =>
      new Promise((res) =>
        requestAnimationFrame(() => setTimeout(() => res(performance.now()), 0)),
      ),
  );
}

async function openFromTank(page) {
  // From a tank's screen back to the list, as a user taps "Tanks".
  await page.evaluate(() => (location.hash = '#/tank/reg-0'));
  await page.locator('check-screen').waitFor({ timeout: 300_000 });
  const t0 = await page.evaluate(() => {
    const t = performance.now();
    location.hash = '#/';
    return t;
  });
  return (await untilFirstRow(page)) - t0;
}

async function reload(page) {
  await page.reload({ waitUntil: 'commit' });
  // From the navigation's start (performance.now() counts from it).
  return untilFirstRow(page);
}

/** Frame intervals while the list scrolls 6,000 px, ms: median and worst. */
async function scroll(page) {
  return page.evaluate(
    () =>
      new Promise((res) => {
        const gaps = [];
        let last = performance.now();
        let y = 0;
        const step = () => {
          const now = performance.now();
          gaps.push(now - last);
          last = now;
          y += 60;
          window.scrollTo(0, y);
          if (y < 6000) requestAnimationFrame(step);
          else {
            gaps.sort((a, b) => a - b);
            res({
              median: gaps[gaps.length >> 1],
              p90: gaps[Math.floor(gaps.length * 0.9)],
              max: gaps.at(-1),
            });
          }
        };
        requestAnimationFrame(step);
      }),
  );
}

/** ms from typing a name into the search until the one row found is painted. */
async function search(page) {
  const box = page.getByTestId('tank-search');
  if ((await box.count()) === 0) return NaN; // a build without the search box
  await box.fill('');
  const t0 = await page.evaluate(() => performance.now());
  await box.pressSequentially('tank 4321', { delay: 0 });
  await page
    .locator('[data-testid=tank-item][data-tank-id=reg-4320]')
    .waitFor({ timeout: 300_000 });
  const t1 = await page.evaluate(
    () =>
      new Promise((res) =>
        requestAnimationFrame(() => setTimeout(() => res(performance.now()), 0)),
      ),
  );
  return t1 - t0;
}

const context = await browser.newContext(PHONE);
const page = await context.newPage();
await page.goto(url);
await page.locator(FIRST_ROW).first().waitFor({ timeout: 300_000 });
await saveOneCheck(page);
await seedRegister(page, { tanks: 5000, checks: 5000 });
await page.goto(url);
await page.locator(FIRST_ROW).first().waitFor({ timeout: 300_000 });
const cdp = await context.newCDPSession(page);
await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
const r = { open: [], reload: [], scroll: [], search: [], rowsInDom: 0 };
for (let i = 0; i < RUNS; i++) {
  r.reload.push(await reload(page));
  r.open.push(await openFromTank(page));
  r.rowsInDom = await page.locator(FIRST_ROW).count();
  r.scroll.push(await scroll(page));
  await page.evaluate(() => window.scrollTo(0, 0));
  r.search.push(await search(page));
}
const f = (x) => x.toFixed(0);
console.log(`build: ${outDir}`);
console.log(`register of 5,000 tanks and 5,000 checks, 4× CPU throttling, ${RUNS} runs (median):`);
console.log(
  `  list opened from a tank → first rows painted: ${f(median(r.open))} ms  [${r.open.map(f).join(', ')}]`,
);
console.log(
  `  reload → first rows painted:                  ${f(median(r.reload))} ms  [${r.reload.map(f).join(', ')}]`,
);
console.log(`  rows in the DOM:                              ${r.rowsInDom}`);
console.log(
  `  scrolling 6,000 px, frame interval:            median ${f(median(r.scroll.map((s) => s.median)))} ms, p90 ${f(median(r.scroll.map((s) => s.p90)))} ms, worst ${f(Math.max(...r.scroll.map((s) => s.max)))} ms`,
);
console.log(
  `  search "tank 4321" typed → row painted:        ${f(median(r.search))} ms  [${r.search.map(f).join(', ')}]`,
);
await close();
