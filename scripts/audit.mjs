// `npm run audit`: a report, not a test. Builds the app, serves dist/ on 127.0.0.1 and measures
//   1. JS + CSS bytes on first load, raw and gzip (target ≤ 60 kB gzip),
//   2. Lighthouse 12 mobile scores: performance, accessibility, best practices (system Chromium),
//   3. input-to-result latency under 4× CPU throttling, for every demo tank: a key typed into the
//      liquid-temperature field until the screen shows the result for the new reading.
// Figures go to stdout and to .reports/audit.json.
//   npm run audit -- --latency-only            (skips the byte count and Lighthouse)
//   npm run audit -- --no-build --dist DIR     (serves an existing build, e.g. of another commit)
//   npm run audit -- --latency-only --compare DIR [--runs N] [--tank TEXT]
//       before and after back to back: every demo tank is timed on DIR (another build, "before")
//       and on this one ("after") in turn, N rounds (default 3), so both see the same machine
//       load; prints each tank's median and p90 per round and their medians over the rounds.
// Code inside page.evaluate() runs in the browser:
/* global MutationObserver, requestAnimationFrame */
import { execSync, spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { chromium } from 'playwright-core';
import { preview } from 'vite';

const FLAGS = [
  '--headless=new',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-quic',
  '--no-first-run',
];
const PHONE = {
  viewport: { width: 360, height: 740 },
  deviceScaleFactor: 2,
  isMobile: true,
  hasTouch: true,
};
const SAMPLES = 30;
const args = process.argv.slice(2);
const LATENCY_ONLY = args.includes('--latency-only');
const NO_BUILD = args.includes('--no-build');
const DIST = args.includes('--dist') ? args[args.indexOf('--dist') + 1] : 'dist';
const COMPARE = args.includes('--compare') ? args[args.indexOf('--compare') + 1] : null;
const RUNS = args.includes('--runs') ? Number(args[args.indexOf('--runs') + 1]) : 3;
const TANK = args.includes('--tank') ? args[args.indexOf('--tank') + 1] : '';

const chromePath =
  process.env.CHROME_PATH ||
  execSync('command -v chromium', { encoding: 'utf8', shell: '/bin/sh' }).trim();

if (!NO_BUILD) {
  console.log('building…');
  const build = spawnSync('node_modules/.bin/vite', ['build', '--logLevel', 'warn'], {
    stdio: 'inherit',
  });
  if (build.status !== 0) process.exit(build.status ?? 1);
}

const serve = (outDir) =>
  preview({
    configFile: false,
    logLevel: 'warn',
    build: { outDir },
    preview: { host: '127.0.0.1', port: 0, strictPort: true },
  });
const server = await serve(DIST);
let url = server.resolvedUrls.local[0];
const report = {
  url,
  date: new Date().toISOString(),
  chromium: '',
  firstLoad: {},
  lighthouse: {},
  latency: {},
};

const browser = await chromium.launch({ executablePath: chromePath, headless: true, args: FLAGS });
report.chromium = browser.version();
if (COMPARE) {
  await compareBuilds();
  await browser.close();
  await server.close();
  process.exit(0);
}
try {
  if (!LATENCY_ONLY) report.firstLoad = await measureFirstLoad();
  report.latency = await measureLatencyAll();
} finally {
  await browser.close();
}
if (!LATENCY_ONLY) report.lighthouse = await runLighthouse();
await server.close();

mkdirSync('.reports', { recursive: true });
writeFileSync('.reports/audit.json', JSON.stringify(report, null, 2));
print(report);

/** Every script and stylesheet the page fetches on a cold first load (worker blocked, so its precache does not count). */
async function measureFirstLoad() {
  const context = await browser.newContext({ ...PHONE, serviceWorkers: 'block' });
  const page = await context.newPage();
  const files = [];
  page.on('response', async (response) => {
    const type = response.request().resourceType();
    if (type !== 'script' && type !== 'stylesheet') return;
    const body = await response.body().catch(() => Buffer.alloc(0));
    files.push({
      url: new URL(response.url()).pathname,
      type,
      raw: body.length,
      gzip: gzipSync(body).length,
    });
  });
  await page.goto(url, { waitUntil: 'networkidle' });
  await context.close();
  const sum = (k) => files.reduce((s, f) => s + f[k], 0);
  return { files, rawBytes: sum('raw'), gzipBytes: sum('gzip'), targetGzipBytes: 60_000 };
}

/** Names of the demo tanks: the shell seeds them on first start; each is a button "Check <name>, <product>". */
async function demoTankNames() {
  const context = await browser.newContext(PHONE);
  const page = await context.newPage();
  try {
    await page.goto(url, { waitUntil: 'load' });
    const buttons = page.getByRole('button', { name: /^Check Demo: / });
    await buttons.first().waitFor({ timeout: 15_000 });
    const labels = await buttons.evaluateAll((els) =>
      els.map((e) => e.getAttribute('aria-label') ?? e.textContent ?? ''),
    );
    return labels.map((l) => /^Check (Demo: [^,]+)/.exec(l.trim())?.[1]).filter(Boolean);
  } finally {
    await context.close();
  }
}

/** `--compare`: before (COMPARE) and after (DIST) on every demo tank in turn, RUNS rounds. */
async function compareBuilds() {
  const other = await serve(COMPARE);
  const urls = { before: other.resolvedUrls.local[0], after: server.resolvedUrls.local[0] };
  url = urls.after;
  const names = (await demoTankNames()).filter((n) => n.includes(TANK));
  const rows = new Map(names.map((n) => [n, { before: [], after: [] }]));
  for (let run = 1; run <= RUNS; run++) {
    for (const name of names) {
      for (const which of run % 2 ? ['before', 'after'] : ['after', 'before']) {
        url = urls[which];
        const load = loadAverage();
        const r = await measureLatency(name);
        const f = r.toNextFrameMs;
        rows.get(name)[which].push(f ? { ...f, load } : { error: r.error, load });
        console.log(
          `round ${run} ${which.padEnd(6)} ${name.padEnd(36)} ${f ? `median ${f.median} ms, p90 ${f.p90} ms` : r.error} (load ${load})`,
        );
      }
    }
  }
  await other.close();
  const mid = (xs) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];
  const span = (xs) => `${Math.min(...xs)}–${Math.max(...xs)}`;
  console.log(`\nnext painted frame, median over ${RUNS} rounds (range), ms: before → after`);
  for (const [name, { before, after }] of rows) {
    const ok = (xs) => xs.filter((x) => x.median !== undefined);
    const fmt = (xs, k) => `${mid(ok(xs).map((x) => x[k]))} (${span(ok(xs).map((x) => x[k]))})`;
    console.log(
      `  ${name.padEnd(36)} median ${fmt(before, 'median')} → ${fmt(after, 'median')}; p90 ${fmt(before, 'p90')} → ${fmt(after, 'p90')}`,
    );
  }
  mkdirSync('.reports', { recursive: true });
  writeFileSync('.reports/audit-compare.json', JSON.stringify([...rows], null, 2));
}

/** The 1-minute load average (what `uptime` shows first). */
function loadAverage() {
  return readFileSync('/proc/loadavg', 'utf8').split(' ')[0];
}

/** Latency on every demo tank, one fresh page each. */
async function measureLatencyAll() {
  const names = await demoTankNames();
  const tanks = [];
  for (const name of names) tanks.push({ name, ...(await measureLatency(name)) });
  return { cpuThrottling: 4, samples: SAMPLES, targetMs: 50, tanks };
}

/** Opens a demo tank's check screen. */
async function openDemoCheck(page, name) {
  await page.goto(url, { waitUntil: 'load' });
  await page
    .getByRole('button', {
      name: new RegExp(`^Check ${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')},`),
    })
    .click({ timeout: 15_000 });
  const field = page.getByTestId('liquid-temperature');
  await field.waitFor({ timeout: 15_000 });
  return field;
}

/**
 * Latency of one keystroke: from the `input` event on the field (its timeStamp is when the
 * browser created it, i.e. when the key was handled) until the check screen has rendered the
 * result for the new reading, and until the frame after that (what the eye can see). CPU
 * slowed 4× through CDP. The change watched is the screen's `data-check-input` attribute (the
 * engine input behind the figures on screen, set once they are rendered): every tank has it,
 * whatever figures its contents give.
 */
async function measureLatency(name) {
  const context = await browser.newContext(PHONE);
  const page = await context.newPage();
  try {
    const field = await openDemoCheck(page, name);
    const result = page.locator('check-screen');
    await page.locator('check-screen[data-check-input]').waitFor({ timeout: 15_000 });
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });

    const dom = [];
    const frame = [];
    // Alternate between 70 and 75 (°F, the default unit). Each edit replaces the selected text in
    // one input event, so no intermediate value (such as "7") is computed in between.
    await field.fill('70');
    await page.waitForTimeout(500);
    for (let i = 0; i < SAMPLES; i++) {
      await field.focus();
      await field.selectText();
      // Arm the observer on the figure, then make the edit that changes the result.
      const figureHandle = await result.elementHandle();
      const inputHandle = await field.elementHandle();
      // The listener captures on the input's own shadow root, so it runs before the field's
      // handler (whose render then lands in the microtasks that follow that handler).
      // Armed first (awaited), so the observer is in place before the key is sent.
      await page.evaluate(
        ([el, input]) => {
          globalThis.__tanksideLatency = new Promise((resolve, reject) => {
            const before = el.getAttribute('data-check-input');
            let tInput = null;
            const onInput = (e) => {
              tInput = e.timeStamp;
            };
            const inputRoot = input.getRootNode();
            inputRoot.addEventListener('input', onInput, { capture: true });
            const observer = new MutationObserver(() => {
              const now = el.getAttribute('data-check-input');
              if (!now || now === before || tInput === null) return;
              const tDom = performance.now();
              observer.disconnect();
              inputRoot.removeEventListener('input', onInput, { capture: true });
              requestAnimationFrame(() =>
                setTimeout(
                  () => resolve({ dom: tDom - tInput, frame: performance.now() - tInput }),
                  0,
                ),
              );
            });
            observer.observe(el, { attributes: true, attributeFilter: ['data-check-input'] });
            setTimeout(() => reject(new Error('the result did not change within 5 s')), 5000);
          });
        },
        [figureHandle, inputHandle],
      );
      await page.keyboard.insertText(i % 2 === 0 ? '75' : '70');
      const t = await page.evaluate(() => globalThis.__tanksideLatency);
      dom.push(t.dom);
      frame.push(t.frame);
      await page.waitForTimeout(150);
    }
    return { toDomMs: stats(dom), toNextFrameMs: stats(frame) };
  } catch (error) {
    return {
      error: `not measured: ${error instanceof Error ? error.message.split('\n')[0] : error}`,
    };
  } finally {
    await context.close();
  }
}

function stats(values) {
  const s = [...values].sort((a, b) => a - b);
  const q = (p) => s[Math.min(s.length - 1, Math.floor(p * s.length))];
  const r = (x) => Math.round(x * 10) / 10;
  return { median: r(q(0.5)), p90: r(q(0.9)), max: r(s[s.length - 1]) };
}

async function runLighthouse() {
  const chrome = await chromeLauncher.launch({
    chromePath,
    chromeFlags: FLAGS,
    logLevel: 'silent',
  });
  try {
    const result = await lighthouse(url, {
      port: chrome.port,
      output: 'json',
      logLevel: 'error',
      onlyCategories: ['performance', 'accessibility', 'best-practices'],
    });
    const lhr = result?.lhr;
    if (!lhr) return { error: 'no result' };
    const score = (id) =>
      lhr.categories[id]?.score == null ? null : Math.round(lhr.categories[id].score * 100);
    const failing = (id) =>
      (lhr.categories[id]?.auditRefs ?? [])
        .filter((ref) => ref.weight > 0 && (lhr.audits[ref.id]?.score ?? 1) < 1)
        .map((ref) => `${ref.id}: ${lhr.audits[ref.id].title}`);
    return {
      formFactor: lhr.configSettings.formFactor,
      throttling: lhr.configSettings.throttlingMethod,
      performance: score('performance'),
      accessibility: score('accessibility'),
      bestPractices: score('best-practices'),
      metrics: {
        fcpMs: Math.round(lhr.audits['first-contentful-paint']?.numericValue ?? NaN),
        lcpMs: Math.round(lhr.audits['largest-contentful-paint']?.numericValue ?? NaN),
        tbtMs: Math.round(lhr.audits['total-blocking-time']?.numericValue ?? NaN),
        cls: lhr.audits['cumulative-layout-shift']?.numericValue ?? null,
      },
      notPerfect: {
        performance: failing('performance'),
        accessibility: failing('accessibility'),
        bestPractices: failing('best-practices'),
      },
      targets: { performance: 95, accessibility: 100, bestPractices: 100 },
    };
  } catch (error) {
    return { error: String(error instanceof Error ? error.message : error) };
  } finally {
    await chrome.kill();
  }
}

function print(r) {
  const kB = (b) => `${(b / 1000).toFixed(1)} kB`;
  console.log('\nTankside audit');
  console.log(`  served at ${r.url} (Chromium ${r.chromium})`);
  if (r.firstLoad.files) {
    console.log(
      `  first load JS+CSS: ${kB(r.firstLoad.gzipBytes)} gzip (${kB(r.firstLoad.rawBytes)} raw), target ≤ 60 kB`,
    );
    for (const f of r.firstLoad.files)
      console.log(`    ${f.type.padEnd(10)} ${kB(f.gzip).padStart(9)} gzip  ${f.url}`);
  }
  const lh = r.lighthouse;
  if (!lh.formFactor && !lh.error) console.log('  lighthouse: not run');
  else if (lh.error) console.log(`  lighthouse: ${lh.error}`);
  else {
    console.log(
      `  lighthouse (${lh.formFactor}, ${lh.throttling}): performance ${lh.performance}, accessibility ${lh.accessibility}, best practices ${lh.bestPractices}  (targets 95 / 100 / 100)`,
    );
    console.log(
      `    FCP ${lh.metrics.fcpMs} ms, LCP ${lh.metrics.lcpMs} ms, TBT ${lh.metrics.tbtMs} ms, CLS ${lh.metrics.cls}`,
    );
    for (const [cat, list] of Object.entries(lh.notPerfect))
      for (const a of list) console.log(`    ${cat}: ${a}`);
  }
  const l = r.latency;
  console.log(
    `  input-to-result latency at ${l.cpuThrottling}× CPU, ${l.samples} keys per tank (target: next frame p90 ≤ ${l.targetMs} ms):`,
  );
  for (const t of l.tanks) {
    if (t.error) console.log(`    ${t.name}: ${t.error}`);
    else
      console.log(
        `    ${t.name.padEnd(36)} next frame median ${t.toNextFrameMs.median} ms, p90 ${t.toNextFrameMs.p90} ms (DOM median ${t.toDomMs.median}, p90 ${t.toDomMs.p90}, max ${t.toNextFrameMs.max})`,
      );
  }
  console.log('  written to .reports/audit.json');
}
