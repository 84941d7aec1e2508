/**
 * The page's Content-Security-Policy (index.html): an injected inline script does not run, and
 * a request to another origin is refused by the browser itself (a `securitypolicyviolation`
 * for connect-src; the target server, on another loopback address, sees nothing). Both checks
 * run before and after the service worker controls the page.
 */
import { createServer, type Server } from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { byTestId, useApp, waitForServiceWorker } from './harness.js';

const app = useApp();
let other: Server;
let hits = 0;
let otherUrl = '';

beforeAll(async () => {
  // Another origin on this machine: plain HTTP on 127.0.0.2 is outside the policy.
  other = createServer((_req, res) => {
    hits++;
    res.setHeader('access-control-allow-origin', '*');
    res.end('reached');
  });
  await new Promise<void>((resolve) => other.listen(0, '127.0.0.2', resolve));
  const addr = other.address();
  otherUrl = `http://127.0.0.2:${typeof addr === 'object' && addr ? addr.port : 0}/`;
});
afterAll(() => new Promise<void>((resolve) => other.close(() => resolve())));

describe('content security policy', () => {
  it('an injected inline script does not run and a fetch to another origin is refused', async () => {
    const { page } = await app.open('/');
    await byTestId(page, 'tank-item').first().waitFor();
    for (const phase of ['first load', 'under the service worker']) {
      if (phase !== 'first load') {
        await waitForServiceWorker(page);
        await page.reload();
        await byTestId(page, 'tank-item').first().waitFor();
      }
      const outcome = await page.evaluate(async (url) => {
        const violations: string[] = [];
        document.addEventListener('securitypolicyviolation', (e) =>
          violations.push(e.effectiveDirective),
        );
        const w = window as unknown as { injectedRan?: boolean };
        const s = document.createElement('script');
        s.textContent = 'window.injectedRan = true';
        document.body.append(s);
        const handler = document.createElement('img');
        handler.setAttribute('onerror', 'window.injectedRan = true');
        handler.src = 'data:,not-an-image';
        document.body.append(handler);
        let fetched = 'refused';
        try {
          await fetch(url);
          fetched = 'reached';
        } catch {
          // refused by the policy
        }
        await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
        return { ran: w.injectedRan === true, fetched, violations };
      }, otherUrl);
      expect(outcome.ran, phase).toBe(false);
      expect(outcome.fetched, phase).toBe('refused');
      expect(outcome.violations, phase).toContain('connect-src');
      expect(outcome.violations, phase).toContain('script-src-elem');
    }
    expect(hits).toBe(0);
  });
});
