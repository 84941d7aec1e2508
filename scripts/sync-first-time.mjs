/* global document, indexedDB -- the timing functions run in the page */
// Measures a phone's first sync of a large team register (by hand; never a timed test):
// starts the embedded team server, fills the team with N invented tanks and N checks, then opens
// the built app in headless Chromium, connects, and times Connect → "Up to date" with every
// record in the phone's store.   node scripts/sync-first-time.mjs [N=5000]   (after npm run build)
import { chromium } from 'playwright-core';
import { preview } from 'vite';
import { startSyncServer } from './sync/server.mjs';
import { setupTeam } from './sync/team-setup.mjs';

const N = Number(process.argv[2] ?? 5000);
const ADMIN = 'measure:measure-pass';
const auth = `Basic ${Buffer.from(ADMIN).toString('base64')}`;

function tank(i) {
  const id = `inv-tank-${i}`;
  return {
    id,
    site: `Invented site ${i % 50}`,
    name: `Invented tank ${i}`,
    notes: '',
    nameplate: { waterCapacity: 1.9, designPressureGauge: 1.72e6 },
    productId: 'propane',
    demo: false,
    createdAt: '2026-06-01T08:00:00.000Z',
    updatedAt: '2026-06-01T08:00:00.000Z',
  };
}
function check(i) {
  return {
    id: `inv-check-${i}`,
    tankId: `inv-tank-${i}`,
    at: '2026-06-02T09:00:00.000Z',
    readings: {
      liquidTemperature: 293.15,
      contentsMode: 'gaugePercent',
      gaugePercent: 40,
      levelHeight: null,
      netMass: null,
      pressureReadingGauge: null,
      peakAirTemperature: 308.15,
      sunAllowance: 8,
    },
    productLabel: 'Propane',
    summary: {
      phase: 'two-phase',
      pGauge: 7e5,
      totalMass: 400,
      liquidVolume: 0.76,
      fillingDensity: 0.2,
      maxMass: 800,
      roomLeftMass: 400,
      stopAtGaugePercent: 80,
      binding: 'weight',
      peakTemperature: 316,
      peakGauge: 1.3e6,
      peakLiquidFraction: 0.45,
      headroomToDesign: 4e5,
      headroomToRelief: 3e5,
      liquidFullTemperature: 340,
      topLevel: null,
      cautions: [],
    },
    demo: false,
  };
}

const sync = await startSyncServer({ port: 0, admin: ADMIN });
const dbUrl = await setupTeam({
  url: sync.url,
  admin: ADMIN,
  team: 'measure',
  users: ['ann:ann-pass'],
});
let t0 = Date.now();
for (let start = 0; start < N; start += 500) {
  const docs = [];
  for (let i = start; i < Math.min(N, start + 500); i++) {
    docs.push({ _id: `tank:inv-tank-${i}`, v: 1, kind: 'tank', record: tank(i) });
    docs.push({ _id: `check:inv-check-${i}`, v: 1, kind: 'check', record: check(i) });
  }
  const res = await fetch(`${dbUrl}/_bulk_docs`, {
    method: 'POST',
    headers: { authorization: auth, 'content-type': 'application/json' },
    body: JSON.stringify({ docs }),
  });
  const out = await res.json();
  const bad = out.filter((r) => r.error);
  if (bad.length) throw new Error(`seeding refused: ${JSON.stringify(bad[0])}`);
}
console.log(`seeded ${N} tanks + ${N} checks in ${((Date.now() - t0) / 1000).toFixed(1)} s`);

const app = await preview({
  configFile: false,
  logLevel: 'warn',
  build: { outDir: 'dist' },
  preview: { host: '127.0.0.1', port: 0 },
});
const appUrl = app.resolvedUrls.local[0];
const browser = await chromium.launch({
  executablePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
  args: ['--headless=new', '--disable-gpu', '--disable-dev-shm-usage', '--no-first-run'],
});
try {
  const page = await (
    await browser.newContext({ viewport: { width: 360, height: 740 } })
  ).newPage();
  await page.goto(`${appUrl}#/data`);
  await page.getByTestId('sync-url').fill(dbUrl);
  await page.getByTestId('sync-user').fill('ann');
  await page.getByTestId('sync-password').fill('ann-pass');
  t0 = Date.now();
  await page.getByTestId('sync-connect').click();
  const done = (n) =>
    new Promise((resolve) => {
      const el = document
        .querySelector('tankside-app')
        ?.shadowRoot?.querySelector('team-panel')
        ?.shadowRoot?.querySelector('[data-testid="sync-status"]');
      if (el?.getAttribute('data-state') !== 'paused') return resolve(false);
      const r = indexedDB.open('tankside');
      r.onsuccess = () => {
        const tx = r.result.transaction(['tanks', 'checks']);
        const a = tx.objectStore('tanks').count();
        const b = tx.objectStore('checks').count();
        tx.oncomplete = () => {
          r.result.close();
          resolve(a.result >= n && b.result >= n);
        };
      };
    });
  // Polled from here (each evaluation awaits the page's answer), every half second.
  for (;;) {
    if (await page.evaluate(done, N)) break;
    if (Date.now() - t0 > 1_800_000) throw new Error('no full sync within 30 min');
    if (process.env.DEBUG_SYNC)
      console.log(
        await page.evaluate(() => {
          const el = document
            .querySelector('tankside-app')
            ?.shadowRoot?.querySelector('team-panel')
            ?.shadowRoot?.querySelector('[data-testid="sync-status"]');
          return `${el?.getAttribute('data-state')} ${el?.textContent?.trim()}`;
        }),
      );
    await new Promise((r) => setTimeout(r, 500));
  }
  const secs = (Date.now() - t0) / 1000;
  console.log(
    `first sync of ${N} tanks + ${N} checks: ${secs.toFixed(1)} s (Connect → up to date, all in the phone's store)`,
  );
} finally {
  await browser.close();
  await app.close();
  await sync.close();
}
