import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  builtFiles,
  cutOffElements,
  foreignRequests,
  horizontalOverflow,
  useApp,
  waitForServiceWorker,
} from './harness.js';

const app = useApp();

/** Names of the caches on the origin, and the URLs (path only) in the app's precache. */
async function precacheContents(page: import('playwright-core').Page) {
  return page.evaluate(async () => {
    const names = await caches.keys();
    const mine = names.filter((n) => n.startsWith('tankside-precache-'));
    const paths: string[] = [];
    for (const name of mine) {
      const cache = await caches.open(name);
      for (const req of await cache.keys()) paths.push(new URL(req.url).pathname.slice(1));
    }
    return { names, mine, paths };
  });
}

describe('offline', () => {
  it('the first load installs a worker that controls the page without a reload', async () => {
    const { page } = await app.open('/');
    const navigations = await page.evaluate(
      () => performance.getEntriesByType('navigation').length,
    );
    await waitForServiceWorker(page);
    expect(navigations).toBe(1);
    expect(await page.evaluate(() => navigator.serviceWorker.controller?.scriptURL)).toBe(
      `${app.server.origin}/sw.js`,
    );
  });

  it('the precache holds every built file in one versioned tankside cache', async () => {
    const { page } = await app.open('/');
    await waitForServiceWorker(page);
    const { mine, paths } = await precacheContents(page);
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatch(/^tankside-precache-v[0-9a-f]{8}$/);
    const missing = builtFiles().filter((f) => !paths.includes(f));
    expect(missing, 'built files not precached').toEqual([]);
  });

  it('reloading offline still serves the app, from the worker, without errors', async () => {
    const { context, page, requests } = await app.open('/');
    await waitForServiceWorker(page);
    await context.setOffline(true);
    const failed: string[] = [];
    const notFromWorker: string[] = [];
    page.on('requestfailed', (r) => failed.push(r.url()));
    page.on('response', (r) => {
      if (!r.fromServiceWorker()) notFromWorker.push(r.url());
    });
    const response = await page.reload();
    expect(response?.status()).toBe(200);
    expect(await page.title()).toMatch(/Tankside/);
    await page.waitForLoadState('load');
    expect(failed, 'failed requests offline').toEqual([]);
    expect(notFromWorker, 'responses not served by the worker').toEqual([]);
    expect(requests.errors, 'page errors').toEqual([]);
    // The network really is off: a URL outside the precache fails.
    const fetched = await page.evaluate(() =>
      fetch('/not-in-the-precache.txt').then(
        () => 'fetched',
        () => 'failed',
      ),
    );
    expect(fetched).toBe('failed');
  });

  it('a deep link opens offline through the navigation fallback', async () => {
    const { context, page } = await app.open('/');
    await waitForServiceWorker(page);
    await context.setOffline(true);
    const response = await page.goto(`${app.server.url}tanks/demo-home/checks/42?from=e2e`);
    expect(response?.status()).toBe(200);
    expect(response?.fromServiceWorker()).toBe(true);
    expect(await page.title()).toMatch(/Tankside/);
  });

  it('a 360×740 phone viewport has no horizontal scroll', async () => {
    const { page } = await app.open('/');
    await page.waitForLoadState('load');
    expect(page.viewportSize()).toEqual({ width: 360, height: 740 });
    expect(await horizontalOverflow(page)).toBe(0);
    expect(await cutOffElements(page)).toEqual([]);
  });
});

describe('updates', () => {
  it('a new version waits for consent, then takes over and deletes older tankside caches', async () => {
    const { page } = await app.open('/');
    await waitForServiceWorker(page);
    // A cache from an older release, and a cache that is not ours (must survive).
    await page.evaluate(async () => {
      await (await caches.open('tankside-precache-v00000000')).put('/old', new Response('old'));
      await (await caches.open('someone-else')).put('/x', new Response('x'));
      (window as unknown as { marker: string }).marker = 'half-filled form';
    });

    app.server.setServiceWorkerSuffix('\n// release 2\n');
    try {
      await page.evaluate(async () => {
        const reg = await navigator.serviceWorker.getRegistration();
        await reg?.update();
      });
      await page.waitForFunction(
        async () => {
          const reg = await navigator.serviceWorker.getRegistration();
          return reg?.waiting != null;
        },
        null,
        { polling: 100 },
      );
      // Still waiting after a while: nothing swapped the worker or reloaded the page on its own.
      await page.waitForTimeout(500);
      const before = await page.evaluate(async () => {
        const reg = await navigator.serviceWorker.getRegistration();
        return {
          waiting: reg?.waiting?.state,
          marker: (window as unknown as { marker?: string }).marker,
          caches: await caches.keys(),
        };
      });
      expect(before.waiting).toBe('installed');
      expect(before.marker).toBe('half-filled form');
      expect(before.caches).toContain('tankside-precache-v00000000');

      // The user agrees: the page asks the waiting worker to take over.
      await page.evaluate(async () => {
        const reg = await navigator.serviceWorker.getRegistration();
        const changed = new Promise((r) =>
          navigator.serviceWorker.addEventListener('controllerchange', r, { once: true }),
        );
        reg?.waiting?.postMessage({ type: 'SKIP_WAITING' });
        await changed;
        // Control passes when the worker starts activating; the clean-up runs inside activate.
        const active = navigator.serviceWorker.controller;
        if (active && active.state !== 'activated') {
          await new Promise((r) => active.addEventListener('statechange', r));
        }
      });
      const after = await page.evaluate(() => caches.keys());
      expect(after).not.toContain('tankside-precache-v00000000');
      expect(after).toContain('someone-else');
      expect(after.filter((n) => n.startsWith('tankside-precache-'))).toHaveLength(1);
    } finally {
      app.server.setServiceWorkerSuffix('');
    }
  });
});

describe('no request leaves the origin', () => {
  // Another port is another origin. This loopback server counts what reaches it.
  let hits: string[] = [];
  let probe: Server | undefined;
  let probeOrigin = '';
  beforeAll(async () => {
    probe = createServer((req, res) => {
      hits.push(req.url ?? '');
      res.end('probe');
    });
    await new Promise<void>((r) => probe!.listen(0, '127.0.0.1', r));
    probeOrigin = `http://127.0.0.1:${(probe.address() as AddressInfo).port}`;
  });
  afterAll(() => new Promise<void>((r) => (probe ? probe.close(() => r()) : r())));
  beforeEach(() => {
    hits = [];
  });

  it('the request log catches a request to another origin (control for the per-test check)', async () => {
    const o = await app.newContext({ serviceWorkers: 'block' });
    await o.page.goto(app.server.url);
    await o.page.evaluate(
      (u) => fetch(u, { mode: 'no-cors' }).catch(() => undefined),
      `${probeOrigin}/control`,
    );
    expect(hits).toEqual(['/control']);
    expect(foreignRequests(o.requests, app.server.origin)).toEqual([`${probeOrigin}/control`]);
    // Seen and proven; keep the per-test origin check for the rest of the traffic.
    o.requests.urls = o.requests.urls.filter((u) => !u.startsWith(probeOrigin));
  });

  it('the worker refuses a request to another origin instead of sending it', async () => {
    const { page, requests } = await app.open('/');
    await waitForServiceWorker(page);
    const outcome = await page.evaluate(
      (u) =>
        fetch(u, { mode: 'no-cors' }).then(
          () => 'sent',
          () => 'refused',
        ),
      `${probeOrigin}/leak`,
    );
    expect(outcome).toBe('refused');
    expect(hits, 'requests that reached the other origin').toEqual([]);
    // The page asked (so the log has it); the worker answered with an error and nothing went out.
    requests.urls = requests.urls.filter((u) => !u.startsWith(probeOrigin));
  });
});
