// Component and app-shell tests in real headless Chromium (Debian's `chromium`; no tool downloads
// a browser): test/components/ for the lit elements, test/pwa/ for the pwa/ modules (storage,
// backup, CSV, routes, demo site), which run there too (storage needs its IndexedDB).
//   npm run test:browser            all of test/components/**/*.test.ts and test/pwa/**/*.test.ts
//   npx wtr --files test/pwa/foo.test.ts
// Versions and flags: see the toolchain notes (WTR 0.20.x stays on Node 20).
import { execSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { esbuildPlugin } from '@web/dev-server-esbuild';
import { chromeLauncher } from '@web/test-runner-chrome';
import { defaultReporter } from '@web/test-runner';

function chromePath() {
  if (process.env.CHROME_PATH) return process.env.CHROME_PATH;
  try {
    return execSync('command -v chromium', { encoding: 'utf8', shell: '/bin/sh' }).trim();
  } catch {
    throw new Error('No Chromium: install Debian `chromium` or set CHROME_PATH.');
  }
}

export const chromiumArgs = [
  '--no-sandbox', // CI runs as root
  '--headless=new',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking', // no calls home: the machine has no network
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

/**
 * Writes pass/fail counts to WTR_RESULTS_FILE (used by scripts/test-all.mjs, since WTR prints
 * no closing line a CI parser can read). A file that fails to load counts as one failure.
 */
function countsReporter() {
  return {
    stop({ sessions }) {
      const file = process.env.WTR_RESULTS_FILE;
      if (!file) return;
      let passed = 0;
      let failed = 0;
      let skipped = 0;
      const failures = [];
      const walk = (suite, path, testFile) => {
        for (const t of suite.tests) {
          if (t.skipped) skipped++;
          else if (t.passed) passed++;
          else {
            failed++;
            failures.push(`${testFile}: ${[...path, t.name].join(' › ')}`);
          }
        }
        for (const s of suite.suites) walk(s, [...path, s.name], testFile);
      };
      for (const session of sessions) {
        if (session.testResults) walk(session.testResults, [], session.testFile);
        if (session.errors.length > 0) {
          failed++;
          failures.push(`${session.testFile}: ${session.errors.map((e) => e.message).join('; ')}`);
        }
      }
      mkdirSync(dirname(file), { recursive: true });
      writeFileSync(file, JSON.stringify({ passed, failed, skipped, failures }, null, 2));
    },
  };
}

export default {
  files: ['test/components/**/*.test.ts', 'test/pwa/**/*.test.ts'],
  nodeResolve: true,
  // 127.1 is 127.0.0.1: with '127.0.0.1' or 'localhost' WTR's server listens on all interfaces.
  hostname: '127.1',
  concurrency: 2,
  plugins: [esbuildPlugin({ ts: true, target: 'es2022', tsconfig: 'tsconfig.json' })],
  browsers: [
    chromeLauncher({
      launchOptions: { executablePath: chromePath(), headless: true, args: chromiumArgs },
    }),
  ],
  testFramework: { config: { timeout: 30_000 } }, // a bound on a loaded machine, never a wait
  filterBrowserLogs: ({ args }) => !String(args[0]).includes('Lit is in dev mode'),
  reporters: [defaultReporter(), countsReporter()],
};
