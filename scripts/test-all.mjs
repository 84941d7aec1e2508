// `npm test`: every suite in order, then one closing line CI can read: `N passed, N failed`.
//
//   1. typecheck   tsc -p tsconfig.json, tsc -p tsconfig.sw.json     (each: 1 passed or 1 failed)
//   2. unit        vitest (test/thermo, test/unit), JSON report in .reports/unit.json
//                  (1 and 2 run side by side: one core each)
//   3. build       vite build into .reports/dist-<pid>               (1 passed or 1 failed)
//   4. browser     web-test-runner in Chromium, counts in .reports/wtr.json
//   5. e2e         vitest -c vitest.e2e.config.ts against that build, JSON in .reports/e2e.json
//
// A stage that cannot report counts (a crash, no tests found) counts as 1 failed. e2e needs the
// build, so it does not run when the build failed. LINT_RESULT=passed|failed (set by .ci/run, which
// lints first) adds the lint outcome to the totals. Exit code: 0 only when nothing failed.
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';

const startedAt = Date.now();
const REPORTS = '.reports';
mkdirSync(REPORTS, { recursive: true });
const bin = (name) => `node_modules/.bin/${name}`;

/** Runs a command with inherited output; resolves to its exit code and wall time. */
function run(cmd, args, env = {}) {
  const started = Date.now();
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
    child.on('error', (error) => {
      console.error(`${cmd}: ${error.message}`);
      resolve({ code: 1, seconds: (Date.now() - started) / 1000 });
    });
    child.on('close', (code, signal) =>
      resolve({ code: code ?? (signal ? 1 : 0), seconds: (Date.now() - started) / 1000 }),
    );
  });
}

/** Runs a command with its output captured, to print later (for a stage run alongside another). */
function runQuiet(cmd, args) {
  const started = Date.now();
  return new Promise((resolve) => {
    let output = '';
    const child = spawn(cmd, args, { stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout.on('data', (d) => (output += d));
    child.stderr.on('data', (d) => (output += d));
    child.on('error', (error) => {
      resolve({
        code: 1,
        seconds: (Date.now() - started) / 1000,
        output: `${cmd}: ${error.message}`,
      });
    });
    child.on('close', (code, signal) =>
      resolve({ code: code ?? (signal ? 1 : 0), seconds: (Date.now() - started) / 1000, output }),
    );
  });
}

function readJson(file) {
  try {
    return JSON.parse(readFileSync(file, 'utf8'));
  } catch {
    return undefined;
  }
}

/** Counts from vitest's JSON reporter; a file that failed to load counts as one failure. */
function vitestCounts(file) {
  const report = readJson(file);
  if (!report) return undefined;
  let failed = report.numFailedTests ?? 0;
  for (const f of report.testResults ?? []) {
    const anyFailedTest = (f.assertionResults ?? []).some((a) => a.status === 'failed');
    if (f.status === 'failed' && !anyFailedTest) failed++;
  }
  return { passed: report.numPassedTests ?? 0, failed, skipped: report.numPendingTests ?? 0 };
}

const results = [];
function record(name, outcome, counts) {
  let {
    passed,
    failed,
    skipped = 0,
  } = counts ?? (outcome.code === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 });
  // Exit code and counts must agree: a non-zero exit with nothing failed is still a failure
  // (no tests found, a crash after the report, a reporter that lost a file).
  if (outcome.code !== 0 && failed === 0) failed = 1;
  results.push({ name, passed, failed, skipped, seconds: outcome.seconds });
}

function header(title) {
  console.log(`\n━━ ${title} ${'━'.repeat(Math.max(0, 70 - title.length))}`);
}

// 1 + 2. Typecheck (app, then worker: two configs, the worker has the WebWorker lib, not DOM)
// runs alongside the unit tests, which use the other core; its output is printed afterwards.
const typecheck = (async () => {
  const app = await runQuiet(bin('tsc'), ['-p', 'tsconfig.json']);
  const worker = await runQuiet(bin('tsc'), ['-p', 'tsconfig.sw.json']);
  return { app, worker };
})();

header('unit tests (vitest)');
{
  const file = `${REPORTS}/unit.json`;
  rmSync(file, { force: true });
  const outcome = await run(bin('vitest'), [
    'run',
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${file}`,
  ]);
  record('unit', outcome, vitestCounts(file) ?? { passed: 0, failed: 1 });
}

header('typecheck (tsc)');
{
  const { app, worker } = await typecheck;
  for (const [name, outcome] of [
    ['typecheck (app)', app],
    ['typecheck (worker)', worker],
  ]) {
    if (outcome.output.trim()) console.log(outcome.output.trimEnd());
    console.log(`${name}: ${outcome.code === 0 ? 'ok' : 'FAILED'}`);
    record(name, outcome);
  }
}

// 3. Build.
header('build (vite)');
// Built into a folder of this run's own: others working in the same tree may rebuild dist/
// while the e2e tests serve it.
const outDir = `${REPORTS}/dist-${process.pid}`;
const build = await run(bin('vite'), [
  'build',
  '--logLevel',
  'warn',
  '--outDir',
  outDir,
  '--emptyOutDir',
]);
record('build', build);

// 4. Component tests in Chromium.
header('component tests (web-test-runner)');
{
  const file = `${REPORTS}/wtr.json`;
  rmSync(file, { force: true });
  const outcome = await run(bin('wtr'), [], { WTR_RESULTS_FILE: file });
  record('browser', outcome, readJson(file) ?? { passed: 0, failed: 1 });
}

// 5. End-to-end against the build.
header('end-to-end (vitest + playwright-core)');
if (build.code === 0 && existsSync(`${outDir}/index.html`)) {
  const file = `${REPORTS}/e2e.json`;
  rmSync(file, { force: true });
  const outcome = await run(
    bin('vitest'),
    [
      'run',
      '--config',
      'vitest.e2e.config.ts',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${file}`,
    ],
    { E2E_DIST: outDir },
  );
  record('e2e', outcome, vitestCounts(file) ?? { passed: 0, failed: 1 });
} else {
  console.log('not run: the build failed');
}
rmSync(outDir, { recursive: true, force: true });

const lint = process.env.LINT_RESULT;
if (lint === 'passed' || lint === 'failed') {
  results.unshift({
    name: 'lint (run by .ci/run)',
    passed: lint === 'passed' ? 1 : 0,
    failed: lint === 'failed' ? 1 : 0,
    skipped: 0,
    seconds: 0,
  });
}

header('summary');
const pad = (s, n) => String(s).padEnd(n);
for (const r of results) {
  const time = r.seconds ? `${r.seconds.toFixed(1)} s` : '';
  console.log(
    `${pad(r.name, 24)} ${pad(`${r.passed} passed`, 12)} ${pad(`${r.failed} failed`, 10)} ${pad(r.skipped ? `${r.skipped} skipped` : '', 11)} ${time}`,
  );
}
const passed = results.reduce((s, r) => s + r.passed, 0);
const failed = results.reduce((s, r) => s + r.failed, 0);
console.log(`wall time ${((Date.now() - startedAt) / 1000).toFixed(1)} s`);
console.log(`${passed} passed, ${failed} failed`);
process.exitCode = failed === 0 ? 0 : 1;
