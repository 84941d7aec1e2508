/**
 * End-to-end harness: serves the BUILT app (dist/) on 127.0.0.1 with vite's preview API and drives
 * Debian's Chromium through playwright-core. Playwright's CSS, role, label and test-id locators pierce
 * open shadow roots, so `page.getByTestId('fill-limit')` finds an element inside a lit component.
 *
 * Typical test file:
 *
 *   const app = useApp();                       // server + browser for the whole file
 *   it('…', async () => {
 *     const { page, requests } = await app.open('/'); // phone-sized page, every request recorded
 *     await waitForServiceWorker(page);
 *     …
 *   });                                          // afterEach: asserts no request left the origin
 */
import { execSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, afterEach, beforeAll, expect } from 'vitest';
import { preview, type PreviewServer } from 'vite';
import {
  chromium,
  type Browser,
  type BrowserContext,
  type BrowserContextOptions,
  type Locator,
  type Page,
} from 'playwright-core';

export const ROOT = fileURLToPath(new URL('../../', import.meta.url));
/** The build to serve: dist/, or E2E_DIST (scripts/test-all.mjs builds into a folder of its own). */
export const DIST = resolve(ROOT, process.env.E2E_DIST ?? 'dist') + '/';

/** A phone in portrait: the narrowest common width the app must fit without sideways scrolling. */
export const PHONE: BrowserContextOptions = {
  viewport: { width: 360, height: 740 },
  deviceScaleFactor: 2,
  isMobile: true,
  hasTouch: true,
};

export const CHROMIUM_ARGS = [
  '--headless=new',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking', // the browser itself must not call home either
  '--disable-component-update',
  '--disable-sync',
  '--disable-quic',
  '--no-first-run',
];

export function chromePath(): string {
  const fromEnv = process.env.CHROME_PATH;
  if (fromEnv) return fromEnv;
  try {
    return execSync('command -v chromium', { encoding: 'utf8', shell: '/bin/sh' }).trim();
  } catch {
    throw new Error('No Chromium: install Debian `chromium` or set CHROME_PATH.');
  }
}

export interface AppServer {
  url: string;
  origin: string;
  /** Text appended to dist/sw.js as served: a byte-different worker, i.e. a new version. */
  setServiceWorkerSuffix(suffix: string): void;
  close(): Promise<void>;
}

/** Serves dist/ on 127.0.0.1 at a free port. Throws if the app has not been built. */
export async function startServer(): Promise<AppServer> {
  for (const f of ['index.html', 'sw.js']) {
    if (!existsSync(`${DIST}${f}`))
      throw new Error(`dist/${f} is missing: run \`npm run build\` first`);
  }
  let swSuffix = '';
  const server: PreviewServer = await preview({
    configFile: false,
    root: ROOT,
    logLevel: 'warn',
    build: { outDir: DIST },
    preview: { host: '127.0.0.1', port: 0, strictPort: true },
    plugins: [
      {
        name: 'e2e-sw-version',
        configurePreviewServer(s) {
          s.middlewares.use((req, res, next) => {
            if (!swSuffix || !req.url?.startsWith('/sw.js')) return next();
            res.setHeader('content-type', 'text/javascript');
            res.setHeader('cache-control', 'no-cache');
            res.end(readFileSync(`${DIST}sw.js`, 'utf8') + swSuffix);
          });
        },
      },
    ],
  });
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('vite preview reported no local URL');
  return {
    url,
    origin: new URL(url).origin,
    setServiceWorkerSuffix(suffix) {
      swSuffix = suffix;
    },
    close: () => server.close(),
  };
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: chromePath(), headless: true, args: CHROMIUM_ARGS });
}

/** Every URL the context asked for, from pages and from the service worker. */
export interface RequestLog {
  urls: string[];
  /** Uncaught exceptions and console errors on any page of the context. */
  errors: string[];
}

export function recordRequests(context: BrowserContext): RequestLog {
  const log: RequestLog = { urls: [], errors: [] };
  context.on('request', (r) => log.urls.push(r.url()));
  const watch = (page: Page) => {
    page.on('request', (r) => log.urls.push(r.url()));
    page.on('pageerror', (e) => log.errors.push(`pageerror: ${e.message}`));
    page.on('console', (m) => {
      if (m.type() === 'error') log.errors.push(`console: ${m.text()}`);
    });
  };
  context.pages().forEach(watch);
  context.on('page', watch);
  return log;
}

/** URLs in the log that are not on `origin` (data: and blob: URLs never touch the network). */
export function foreignRequests(log: RequestLog, origin: string): string[] {
  return [...new Set(log.urls)].filter(
    (u) => !u.startsWith('data:') && !u.startsWith('blob:') && new URL(u).origin !== origin,
  );
}

export interface OpenedPage {
  context: BrowserContext;
  page: Page;
  requests: RequestLog;
}

export interface AppFixture {
  readonly server: AppServer;
  readonly browser: Browser;
  /** A new phone-sized context (own storage, own service worker) with `path` loaded. */
  open(path?: string, options?: BrowserContextOptions): Promise<OpenedPage>;
  /** Same, without navigating. */
  newContext(options?: BrowserContextOptions): Promise<OpenedPage>;
}

/**
 * Starts the server and the browser for the test file, closes every context after each test and
 * checks that none of its requests went to another origin.
 */
export function useApp(): AppFixture {
  let server: AppServer | undefined;
  let browser: Browser | undefined;
  const opened: OpenedPage[] = [];

  beforeAll(async () => {
    server = await startServer();
    browser = await launchBrowser();
  });
  afterEach(async () => {
    const pages = opened.splice(0);
    await Promise.all(pages.map((o) => o.context.close()));
    for (const o of pages) {
      expect(foreignRequests(o.requests, server!.origin), 'requests that left the origin').toEqual(
        [],
      );
    }
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  const fixture: AppFixture = {
    get server() {
      if (!server) throw new Error('server not started (use inside a test)');
      return server;
    },
    get browser() {
      if (!browser) throw new Error('browser not launched (use inside a test)');
      return browser;
    },
    async newContext(options = {}) {
      const context = await fixture.browser.newContext({ ...PHONE, ...options });
      // A step that hangs fails with its own locator in the message, well before the test timeout.
      context.setDefaultTimeout(15_000);
      const requests = recordRequests(context);
      const page = await context.newPage();
      const o = { context, page, requests };
      opened.push(o);
      return o;
    },
    async open(path = '/', options = {}) {
      const o = await fixture.newContext(options);
      await o.page.goto(new URL(path, fixture.server.url).href);
      return o;
    },
  };
  return fixture;
}

/** Waits until a service worker controls the page (the first install claims it, no reload). */
export async function waitForServiceWorker(page: Page, timeout = 15_000): Promise<void> {
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, null, { timeout });
}

/** Width the page can scroll sideways, in CSS px (0 when everything fits). */
export function horizontalOverflow(page: Page): Promise<number> {
  return page.evaluate(() => {
    const el = document.scrollingElement ?? document.documentElement;
    return el.scrollWidth - el.clientWidth;
  });
}

/**
 * Visible elements (shadow roots included) that stick out past the right edge of the viewport
 * without sitting in a box of their own that scrolls or clips sideways. `overflow-x: hidden` on
 * <html> or <body> hides the scroll bar but not the cut-off content, so those two do not count
 * as such a box. Each entry names the element and how far it sticks out.
 */
export function cutOffElements(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const out: string[] = [];
    const parentOf = (el: Element): Element | null =>
      el.parentElement ?? ((el.getRootNode() as ShadowRoot).host || null);
    const inSideScroller = (el: Element): boolean => {
      for (let p = parentOf(el); p; p = parentOf(p)) {
        if (p === document.body || p === document.documentElement) return false;
        if (['auto', 'scroll', 'hidden', 'clip'].includes(getComputedStyle(p).overflowX))
          return true;
      }
      return false;
    };
    const describe = (el: Element): string => {
      const id = el.id ? `#${el.id}` : '';
      const testid = el.getAttribute('data-testid');
      return `${el.tagName.toLowerCase()}${id}${testid ? `[data-testid=${testid}]` : ''}`;
    };
    const visit = (root: Document | ShadowRoot) => {
      for (const el of root.querySelectorAll('*')) {
        const r = el.getBoundingClientRect();
        if (r.width > 0 && r.height > 0 && r.right > width + 0.5 && !inSideScroller(el)) {
          out.push(`${describe(el)} +${Math.round(r.right - width)}px`);
        }
        if (el.shadowRoot) visit(el.shadowRoot);
      }
    };
    visit(document);
    return out;
  });
}

/** `data-testid` lookup that pierces shadow roots. */
export function byTestId(page: Page | Locator, id: string): Locator {
  return page.getByTestId(id);
}

/** Types into a (possibly shadowed) input the way a person does: clear, then key by key. */
export async function typeInto(input: Locator, text: string): Promise<void> {
  await input.fill('');
  await input.pressSequentially(text);
}

/** Files the build wrote, relative to dist/, as the precache should list them. */
export function builtFiles(): string[] {
  const out = execSync('find . -type f', { cwd: DIST, encoding: 'utf8' });
  return out
    .split('\n')
    .map((l) => l.replace(/^\.\//, ''))
    .filter((f) => f && f !== 'sw.js' && !f.endsWith('.map') && !f.startsWith('sw.'));
}
