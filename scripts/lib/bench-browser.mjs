/**
 * The set-up the timing scripts share (scripts/register-bench.mjs, scripts/walkdown-board-time.mjs):
 * a built app served on 127.0.0.1 and headless Chromium to drive it.
 */
import { preview } from 'vite';
import { chromium } from 'playwright-core';

/**
 * Serves a build (default dist/, or another one for a before-and-after) on a free port and opens
 * headless Chromium (CHROME_PATH, else /usr/bin/chromium).
 * @returns {Promise<{ url: string, browser: import('playwright-core').Browser, close: () => Promise<void> }>}
 */
export async function serveAndLaunch(outDir = 'dist') {
  const server = await preview({
    configFile: false,
    root: new URL('../../', import.meta.url).pathname,
    build: { outDir },
    preview: { port: 0, host: '127.0.0.1' },
    logLevel: 'silent',
  });
  const browser = await chromium.launch({
    executablePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
    args: ['--headless=new', '--no-sandbox', '--disable-gpu'],
  });
  return {
    url: server.resolvedUrls.local[0],
    browser,
    close: async () => {
      await browser.close();
      await server.close();
    },
  };
}
