/**
 * Team sync end to end: two browser contexts are two phones (own storage, own service worker)
 * on the built app, against the embedded team server (scripts/sync/server.mjs) that this file
 * starts on a free port and sets up with scripts/sync/team-setup.mjs. Every step waits for a
 * state (the status line's `data-state`, a list entry), never for a fixed time.
 */
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
// @ts-expect-error -- plain ES module script without types
import { startSyncServer } from '../../scripts/sync/server.mjs';
// @ts-expect-error -- plain ES module script without types
import { setupTeam } from '../../scripts/sync/team-setup.mjs';
import {
  PHONE,
  byTestId,
  foreignRequests,
  launchBrowser,
  recordRequests,
  startServer,
  typeInto,
  type AppServer,
  type OpenedPage,
} from './harness.js';

const SYNC_TIMEOUT = 60_000;
/** Two phones, several sync rounds: generous, since CI shares two cores. */
const TEST_TIMEOUT = 240_000;
const USERS = { ann: 'ann-e2e-pass', bob: 'bob-e2e-pass' } as const;

let app: AppServer;
let browser: Browser;
let sync: { url: string; close: () => Promise<void> };
let dbUrl = '';
const opened: OpenedPage[] = [];

beforeAll(async () => {
  sync = await startSyncServer({ port: 0, admin: 'e2e-admin:e2e-admin-pass' });
  dbUrl = await setupTeam({
    url: sync.url,
    admin: 'e2e-admin:e2e-admin-pass',
    team: 'invented-e2e',
    users: Object.entries(USERS).map(([u, p]) => `${u}:${p}`),
  });
  app = await startServer();
  browser = await launchBrowser();
}, 120_000);
afterEach(async () => {
  await Promise.all(opened.splice(0).map((o) => o.context.close()));
});
afterAll(async () => {
  await browser?.close();
  await app?.close();
  await sync?.close();
});

async function phone(): Promise<OpenedPage> {
  const context = await browser.newContext(PHONE);
  context.setDefaultTimeout(30_000);
  const requests = recordRequests(context);
  const page = await context.newPage();
  const o = { context, page, requests };
  opened.push(o);
  await page.goto(app.url);
  await byTestId(page, 'tank-item').first().waitFor();
  return o;
}

function state(page: Page): Promise<string | null> {
  return byTestId(page, 'sync-status').getAttribute('data-state');
}

async function connect(page: Page, user: keyof typeof USERS): Promise<void> {
  await page.goto(new URL('#/data', app.url).href);
  await expect.poll(() => state(page)).toBe('off');
  await byTestId(page, 'sync-url').fill(dbUrl);
  await byTestId(page, 'sync-user').fill(user);
  await byTestId(page, 'sync-password').fill(USERS[user]);
  await byTestId(page, 'sync-connect').click();
  await expect.poll(() => state(page), { timeout: SYNC_TIMEOUT }).toBe('paused');
  expect(await byTestId(page, 'sync-status').textContent()).toContain('Up to date');
}

/** Adds a tank through the form; returns its id (from the address of its screen). */
async function addTank(page: Page, name: string): Promise<string> {
  await page.goto(new URL('#/tank/new', app.url).href);
  await byTestId(page, 'tank-site').fill('Invented sync yard');
  await byTestId(page, 'tank-name').fill(name);
  await byTestId(page, 'tank-product').selectOption('propane');
  await typeInto(byTestId(page, 'tank-water-capacity'), '500');
  await typeInto(byTestId(page, 'tank-design-pressure'), '250');
  await byTestId(page, 'tank-save').click();
  await expect.poll(() => byTestId(page, 'tank-heading').textContent()).toContain(name);
  return decodeURIComponent(new URL(page.url()).hash.split('/')[2] ?? '');
}

async function renameTank(page: Page, id: string, name: string): Promise<void> {
  await page.goto(new URL(`#/tank/${encodeURIComponent(id)}/edit`, app.url).href);
  await byTestId(page, 'tank-name').fill(name);
  await byTestId(page, 'tank-save').click();
  await expect.poll(() => byTestId(page, 'tank-heading').textContent()).toContain(name);
}

function listed(page: Page, name: string) {
  return page.locator('[data-testid="tank-item"]', { hasText: name });
}

describe('team sync, two phones', () => {
  it(
    'with no team set up the app makes no request to any other origin and loads no sync code',
    async () => {
      const a = await phone();
      await a.page.goto(new URL('#/data', app.url).href);
      await expect.poll(() => state(a.page)).toBe('off');
      await a.page.goto(new URL('#/', app.url).href);
      await byTestId(a.page, 'tank-item').first().waitFor();
      expect(foreignRequests(a.requests, app.origin)).toEqual([]);
      expect(a.requests.urls.filter((u) => /\/assets\/engine-/.test(u))).toEqual([]);
    },
    TEST_TIMEOUT,
  );

  it(
    'a tank added on one phone appears on the other; checks saved offline arrive after reconnecting',
    async () => {
      const a = await phone();
      const b = await phone();
      await connect(a.page, 'ann');
      await connect(b.page, 'bob');
      const id = await addTank(a.page, 'Invented north tank');
      await b.page.goto(new URL('#/', app.url).href);
      await listed(b.page, 'Invented north tank').waitFor({ timeout: SYNC_TIMEOUT });

      // Phone A loses signal, saves two checks, and gets it back.
      await a.context.setOffline(true);
      for (const gauge of ['40', '45']) {
        await typeInto(byTestId(a.page, 'liquid-temperature'), '70');
        await typeInto(byTestId(a.page, 'gauge-percent'), gauge);
        await byTestId(a.page, 'fill-limit').waitFor();
        const before = await byTestId(a.page, 'history-item').count();
        await byTestId(a.page, 'check-save').click();
        await expect.poll(() => byTestId(a.page, 'history-item').count()).toBe(before + 1);
      }
      await b.page.goto(new URL(`#/tank/${encodeURIComponent(id)}`, app.url).href);
      await byTestId(b.page, 'tank-heading').waitFor();
      expect(await byTestId(b.page, 'history-item').count()).toBe(0);
      await a.context.setOffline(false);
      await expect
        .poll(() => byTestId(b.page, 'history-item').count(), { timeout: SYNC_TIMEOUT })
        .toBe(2);
    },
    TEST_TIMEOUT,
  );

  it(
    'a nameplate edited on both phones while apart shows the conflict, and the choice settles it on both',
    async () => {
      const a = await phone();
      const b = await phone();
      await connect(a.page, 'ann');
      await connect(b.page, 'bob');
      const id = await addTank(a.page, 'Invented south tank');
      await b.page.goto(new URL('#/', app.url).href);
      await listed(b.page, 'Invented south tank').waitFor({ timeout: SYNC_TIMEOUT });

      await a.context.setOffline(true);
      await b.context.setOffline(true);
      await renameTank(a.page, id, 'Invented south tank A');
      await renameTank(b.page, id, 'Invented south tank B');
      await a.context.setOffline(false);
      await b.context.setOffline(false);

      for (const p of [a.page, b.page]) {
        await p.goto(new URL(`#/tank/${encodeURIComponent(id)}`, app.url).href);
        await byTestId(p, 'sync-conflict').waitFor({ timeout: SYNC_TIMEOUT });
      }
      const versions = byTestId(a.page, 'sync-version');
      await expect.poll(() => versions.count(), { timeout: SYNC_TIMEOUT }).toBe(2);
      const texts = await versions.allTextContents();
      expect(texts.some((t) => t.includes('Invented south tank A'))).toBe(true);
      expect(texts.some((t) => t.includes('Invented south tank B'))).toBe(true);
      await versions.filter({ hasText: 'Invented south tank B' }).getByTestId('sync-keep').click();
      for (const p of [a.page, b.page]) {
        await byTestId(p, 'sync-conflict').waitFor({ state: 'detached', timeout: SYNC_TIMEOUT });
        await expect
          .poll(() => byTestId(p, 'tank-heading').textContent(), { timeout: SYNC_TIMEOUT })
          .toContain('Invented south tank B');
      }
    },
    TEST_TIMEOUT,
  );
});

describe('team server', () => {
  async function session(user: string, password: string): Promise<string> {
    const res = await fetch(`${sync.url}/_session`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ name: user, password }),
    });
    return (res.headers.get('set-cookie') ?? '').split(';')[0] ?? '';
  }

  it('refuses a malformed record from a member and any write from a non-member', async () => {
    const put = async (cookie: string, body: object) =>
      (
        await fetch(`${dbUrl}/tank%3Abad`, {
          method: 'PUT',
          headers: { 'content-type': 'application/json', cookie },
          body: JSON.stringify(body),
        })
      ).status;
    const malformed = { v: 1, kind: 'tank', record: { id: 'bad', name: 'No nameplate' } };
    expect(await put(await session('ann', USERS.ann), malformed)).toBe(403);
    await setupTeam({
      url: sync.url,
      admin: 'e2e-admin:e2e-admin-pass',
      team: 'other-e2e',
      users: ['mallory:mallory-pass'],
    });
    expect([401, 403]).toContain(await put(await session('mallory', 'mallory-pass'), malformed));
  });
});
